/**
 * Bad input of the as-found condition and the schemes: every problem named by its path with the
 * value and the allowed range, all at once, and nothing else of the member lost.
 */
import { describe, expect, it } from 'vitest';
import { say } from '../../../core/units/phrase.ts';
import { analyzeProject } from '../../../core/analysis.ts';
import type { AsFoundCondition, StrengtheningScheme } from '../../../core/retrofit/types.ts';
import { validateAsFound, validateSchemes } from '../../../core/retrofit/validate.ts';
import { CORES_AND_DEFECTS, FRP_SCHEME, OVERLAY_SCHEME, plainAndFinite, retrofitProject } from './retrofit-project.ts';
import type { MemberResult } from '../../../core/assessment/results.ts';

const P = 'members[0] "B1"';
const run = (overrides: Parameters<typeof retrofitProject>[1]): MemberResult => analyzeProject(retrofitProject('ACI 318-19', overrides)).members[0]!;
const errorAt = (r: MemberResult, path: string) => r.errors.find((e) => e.path === path);

/** The rest of the member is still analysed: its flexure, service and shear results are there. */
function nothingLost(r: MemberResult) {
  expect(r.status).not.toBe('input-error');
  expect(r.loadDeflection.points.length).toBeGreaterThan(10);
  expect(r.service).not.toBeNull();
  expect(r.shear!.capacities.length).toBeGreaterThan(0);
  expect(plainAndFinite(r.retrofit)).toEqual([]);
}

/**
 * An input error of the as-found condition or a scheme (core/assessment/retrofit-input.ts, the checks
 * `validate` makes too): the member is an input error — the beam as it stands is not known, so no
 * design-beam verdict stands in for it — while the design beam's analysis is kept in retrofit.original.
 */
function inputErrorDesignKept(r: MemberResult) {
  expect(r.status).toBe('input-error');
  expect(r.strength).toBeNull();
  const design = r.retrofit!.original!;
  expect(design.status).not.toBe('input-error');
  expect(design.loadDeflection.points.length).toBeGreaterThan(10);
  expect(design.deflectionChecks.length).toBeGreaterThan(0);
  expect(design.shear!.capacities.length).toBeGreaterThan(0);
  expect(plainAndFinite(r.retrofit)).toEqual([]);
}

describe('the four cases of the issue', () => {
  it('FRP with no thickness: the error names schemes[0].plyThickness and its range', () => {
    const { plyThickness: _t, ...noThickness } = FRP_SCHEME;
    const r = run({ schemes: [noThickness as StrengtheningScheme] });
    const e = errorAt(r, `${P}.schemes[0].plyThickness`)!;
    expect(say(e.message, 'si')).toBe("must be a finite number (greater than 0 mm and at most 10 mm), got nothing");
    expect(r.retrofit!.errors[0]!.path).toBe(`${P}.schemes[0].plyThickness`);
    inputErrorDesignKept(r);
  });

  it('an FRP thickness of zero is refused the same way', () => {
    const r = run({ schemes: [{ ...FRP_SCHEME, plyThickness: 0 }] });
    expect(say(errorAt(r, `${P}.schemes[0].plyThickness`)!.message, 'si')).toMatch(/greater than 0 mm/);
  });

  it('section loss over 100 %: the error names defects[0].lossPercent, the value and 0–100 %', () => {
    const r = run({ asFound: { defects: [{ kind: 'section-loss', layer: 0, lossPercent: 120 }] } });
    const e = errorAt(r, `${P}.asFound.defects[0].lossPercent`)!;
    expect(say(e.message, 'si')).toBe('must be at least 0 % and at most 100 %, got 120 %');
    expect(r.retrofit!.basis).toBe('design'); // the as-found beam could not be built
    expect(r.retrofit!.asFound).toBeNull();
    inputErrorDesignKept(r);
  });

  it('losses on one layer adding up to more than 100 % are refused, naming both defects', () => {
    const r = run({ asFound: { defects: [{ kind: 'section-loss', layer: 0, lossPercent: 60 }, { kind: 'section-loss', layer: 0, lossPercent: 50 }] } });
    const e = errorAt(r, `${P}.asFound.defects[1].lossPercent`)!;
    expect(say(e.message, 'si')).toMatch(/defects\[0\] and defects\[1\] add up to 110\.0 %/);
  });

  it('a core set with one sample: at least 3 cores, with the reason', () => {
    const r = run({ asFound: { cores: [{ meanStrength: 28, count: 1, coefficientOfVariation: 0.1 }] } });
    const e = errorAt(r, `${P}.asFound.cores[0].count`)!;
    expect(say(e.message, 'si')).toMatch(/must be at least 3 cores, got 1/);
    expect(say(e.message, 'si')).toMatch(/standard deviation/);
    inputErrorDesignKept(r);
  });

  it('an installation load larger than the unstrengthened capacity: a clear message on schemes[0].installation; other schemes go on', () => {
    const heavy = { loads: [{ kind: 'uniform' as const, loadCase: 'superimposed' as const, magnitude: 8 }, { kind: 'uniform' as const, loadCase: 'live' as const, magnitude: 40 }] };
    const r = run({ ...heavy, schemes: [{ ...FRP_SCHEME, installation: { dead: 2, superimposed: 2, live: 2 } }, OVERLAY_SCHEME] });
    const e = errorAt(r, `${P}.schemes[0].installation`)!;
    expect(say(e.message, 'si')).toMatch(/exceeds the capacity of the unstrengthened section/);
    expect(say(e.message, 'si')).toMatch(/prop or unload/);
    expect(r.retrofit!.schemes[0]!.variant).toBeNull();
    expect(r.retrofit!.schemes[1]!.variant).not.toBeNull();
    nothingLost(r);
  });
});

describe('every problem is reported at once', () => {
  it('one core, 120 % loss, an unknown section and a scheme without thickness: four errors', () => {
    const asFound: AsFoundCondition = {
      cores: [{ meanStrength: 28, count: 1, coefficientOfVariation: 0.1 }],
      defects: [{ kind: 'section-loss', layer: 0, lossPercent: 120 }, { kind: 'cover-loss', sectionId: 'nope', face: 'bottom', depth: 20 }],
    };
    const { plyThickness: _t, ...noThickness } = FRP_SCHEME;
    const r = run({ asFound, schemes: [noThickness as StrengtheningScheme] });
    const paths = r.errors.map((e) => e.path);
    expect(paths).toEqual(expect.arrayContaining([
      `${P}.asFound.cores[0].count`,
      `${P}.asFound.defects[0].lossPercent`,
      `${P}.asFound.defects[1].sectionId`,
      `${P}.schemes[0].plyThickness`,
    ]));
    // With the as-found condition broken, no scheme is analysed against the wrong beam.
    expect(r.retrofit!.schemes).toEqual([]);
    inputErrorDesignKept(r);
  });
});

describe('validation of each field', () => {
  const project = retrofitProject();
  const member = project.members[0]!;
  const found = (c: AsFoundCondition) => validateAsFound(c, member, project, 'a');
  const schemes = (s: unknown[]) => validateSchemes(s as StrengtheningScheme[], member, project, 's');

  it('NaN and Infinity are refused with the allowed range', () => {
    const d = found({ cores: [{ meanStrength: Number.NaN, count: 4, coefficientOfVariation: Infinity }], defects: [{ kind: 'cover-loss', face: 'left', depth: -Infinity }] });
    expect(d.map((x) => x.path)).toEqual(['a.cores[0].meanStrength', 'a.cores[0].coefficientOfVariation', 'a.defects[0].depth']);
    expect(say(d[0]!.message, 'si')).toMatch(/finite number \(at least 5 MPa and at most 150 MPa\), got NaN/);
    expect(say(d[1]!.message, 'si')).toMatch(/got Infinity/);
  });

  it('a bar layer index outside the section, stirrups on a section without them, a side range upside down', () => {
    const noHoops = { ...project, sections: project.sections.map((s) => (s.id === 'r1' ? { ...s, hoops: undefined } : s)) };
    const d = validateAsFound({ defects: [{ kind: 'section-loss', layer: 5, lossPercent: 10 }, { kind: 'section-loss', layer: 'hoops', lossPercent: 10 }, { kind: 'cover-loss', face: 'right', depth: 20, from: 500, to: 300 }] }, member, noHoops, 'a');
    expect(d.map((x) => x.path)).toEqual(['a.defects[0].layer', 'a.defects[1].layer', 'a.defects[2].to']);
    expect(say(d[0]!.message, 'si')).toMatch(/0 to 1\), got 5/);
  });

  it('core count must be whole; two core sets for one concrete are refused; unknown steel', () => {
    const d = found({ cores: [{ meanStrength: 30, count: 4.5, coefficientOfVariation: 0.1 }, { meanStrength: 30, count: 5, coefficientOfVariation: 0.1, concreteId: 'c30' }], steel: [{ steelId: 'x', source: 'coupons', yieldStress: 400 }] });
    expect(d.map((x) => x.code)).toEqual(['must-be-integer', 'duplicate-id', 'unknown-reference']);
  });

  it('schemes: unknown kind, duplicate ids, an unknown FRP, fractional plies, a bar outside its layer', () => {
    const d = schemes([
      { kind: 'glue', id: 'a', name: 'x' },
      { ...FRP_SCHEME, id: 'f', frpId: 'none', plies: 1.5 },
      { ...FRP_SCHEME, id: 'f' },
      { ...OVERLAY_SCHEME, id: 'o', bars: [{ steelId: 'b500', distanceFromFace: -5, count: 2, diameter: 12 }] },
    ]);
    expect(d.map((x) => x.path)).toEqual(['s[0].kind', 's[1].frpId', 's[1].plies', 's[2].id', 's[3].bars[0].distanceFromFace']);
  });

  it('a bar deeper than its layer is found when the layer is built, and named', () => {
    const r = run({ schemes: [{ ...OVERLAY_SCHEME, bars: [{ steelId: 'b500', distanceFromFace: 70, count: 2, diameter: 16 }] }] });
    expect(say(errorAt(r, `${P}.schemes[0].bars[0].distanceFromFace`)!.message, 'si')).toMatch(/sticks out of the 75 mm layer \(allowed 8 mm to 67 mm\)/);
  });

  it('an FRP wider than the soffit is named with the width of the face', () => {
    const r = run({ schemes: [{ ...FRP_SCHEME, width: 400 }] });
    expect(say(errorAt(r, `${P}.schemes[0].width`)!.message, 'si')).toBe('must be at most the 300 mm width of the bottom face of section "r1", got 400 mm');
  });

  it('a valid condition and valid schemes give no diagnostics', () => {
    expect(found(CORES_AND_DEFECTS)).toEqual([]);
    expect(schemes([FRP_SCHEME, OVERLAY_SCHEME])).toEqual([]);
  });
});
