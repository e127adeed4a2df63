/**
 * validate and analyze agree on the input errors of an existing beam (issue 17, "validate and
 * analyze disagree"): the as-found condition and the schemes are checked by one rule set
 * (core/assessment/retrofit-input.ts) — the field checks and what the derivations find — so
 * `validate` reports every error `analyze` raises, with the same field paths, and such a member is
 * an input error, never the design beam's verdict in its place.
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import type { AsFoundCondition, StrengtheningScheme } from '../../../core/retrofit/types.ts';
import { analysisBlockers, validateProject } from '../../../core/project/validate.ts';
import type { Project } from '../../../core/project/types.ts';
import { member, smallProject } from '../../fixtures/projects.ts';

function project(extra: { asFound?: AsFoundCondition; schemes?: StrengtheningScheme[] }): Project {
  return smallProject('ACI 318-19', [member('A', 'simply-supported', 6000, 'r1', extra), member('B', 'simply-supported', 6000, 'r1')]);
}

// The three cases of the issue on the engine fixture's 300 × 600 section "r1" (bars at 540 and 55 mm).
const cases: [string, { asFound?: AsFoundCondition; schemes?: StrengtheningScheme[] }, string, RegExp][] = [
  ['a negative coupon yield stress', { asFound: { steel: [{ steelId: 'b500', source: 'coupons', yieldStress: -300 }] } }, 'members[0] "A".asFound.steel[0].yieldStress', /at least 200 MPa and at most 1000 MPa, got -300 MPa/],
  ['cover loss of 700 mm from a 600 mm section', { asFound: { defects: [{ kind: 'cover-loss', face: 'bottom', depth: 700 }] } }, 'members[0] "A".asFound.defects[0]', /leaves nothing of the 600 mm deep section/],
  ['overlay bars outside the new layer', { schemes: [{ id: 'ov', name: 'overlay', kind: 'concrete-layer', face: 'top', thickness: 80, concreteId: 'c30', bars: [{ steelId: 'b500', distanceFromFace: 150, count: 4, diameter: 12 }] }] }, 'members[0] "A".schemes[0].bars[0].distanceFromFace', /12 mm bar 150 mm from the face sticks out of the 80 mm layer \(allowed 6 mm to 74 mm\)/],
  ['an FRP sheet wider than the soffit', { schemes: [{ id: 'w', name: 'wide', kind: 'frp', frpId: 'cfrp', plyThickness: 0.165, plies: 1, width: 400 }] }, 'members[0] "A".schemes[0].width', /at most the 300 mm width of the bottom face of section "r1", got 400 mm/],
];

describe('validate and analyze agree on as-found and scheme errors', () => {
  it.each(cases)('%s: validate reports it at the field, analyze makes the member an input error with the same problem', (_name, extra, path, words) => {
    const base = project(extra);
    // a carbon sheet of common properties (common practice, no source): Ef = 230 GPa, ε*fu = 0.017; CE = 0.95 for interior exposure (ACI 440.2R-17 Table 9.4, from memory)
    const p: Project = extra.schemes?.some((s) => s.kind === 'frp')
      ? { ...base, materials: [...base.materials, { kind: 'frp', id: 'cfrp', name: 'carbon sheet', tensileModulus: 230_000, ruptureStrain: 0.017, environmentalFactor: 0.95 }] }
      : base;
    const errors = validateProject(p).filter((d) => d.severity === 'error');
    expect(errors.map((d) => d.path)).toEqual([path]);
    expect(errors[0]!.message).toMatch(words);
    // an error inside a member stops that member only
    expect(analysisBlockers(errors)).toEqual([]);

    const [a, b] = analyzeProject(p).members;
    expect(a!.status).toBe('input-error');
    expect(a!.errors.map((e) => e.path)).toEqual([path]);
    // not the design beam's numbers in place of the beam as it stands
    expect(a!.strength).toBeNull();
    expect(a!.loadDeflection.points).toEqual([]);
    expect(a!.retrofit!.original!.status).not.toBe('input-error');
    // the other member is analysed as usual
    expect(b!.status).not.toBe('input-error');
  });

  it('a valid condition and scheme give no error in either', () => {
    const p = project({
      asFound: { steel: [{ steelId: 'b500', source: 'coupons', yieldStress: 460 }], defects: [{ kind: 'cover-loss', face: 'bottom', depth: 20 }] },
      schemes: [{ id: 'ov', name: 'overlay', kind: 'concrete-layer', face: 'top', thickness: 80, concreteId: 'c30', bars: [{ steelId: 'b500', distanceFromFace: 40, count: 4, diameter: 12 }] }],
    });
    expect(validateProject(p).filter((d) => d.severity === 'error')).toEqual([]);
    const a = analyzeProject(p).members[0]!;
    expect(a.status).not.toBe('input-error');
    expect(a.errors).toEqual([]);
    expect(a.retrofit!.basis).toBe('as-found');
  });
});
