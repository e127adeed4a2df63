/**
 * Issue 17: fixed–fixed members with axial force reach an ultimate (before: 13 of 20 random ones
 * ended "no equilibrium under the constant loads", and every one with any axial force did once the
 * tension shift came in). A property test over random fixed–fixed beams with axial force.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import type { MemberDefinition } from '../../../core/project/types.ts';
import { member, smallProject } from '../../fixtures/projects.ts';

function withAxial(supports: MemberDefinition['supports'], s: { span: number; axial: number; live: number; bottom: number; top: number }) {
  const project = smallProject('ACI 318-19', [member('F', supports, s.span, 'r1', { loads: [{ kind: 'uniform', loadCase: 'superimposed', magnitude: 5 }, { kind: 'uniform', loadCase: 'live', magnitude: s.live }] })]);
  const [section, ...others] = project.sections;
  // Axial force N in N, compression positive; bars as the fixture's, counts varied.
  const changed = { ...section!, axialForce: s.axial, bars: [{ steelId: 'b500', depth: 540, count: s.bottom, diameter: 20 }, { steelId: 'b500', depth: 55, count: s.top, diameter: 16 }] };
  return analyzeProject({ ...project, sections: [changed, ...others] }).members[0]!;
}

const beams = fc.record({
  span: fc.integer({ min: 3000, max: 10000 }),
  // −300 kN (tension) to 1,500 kN (compression, about 0.28·f′c·Ag of the 300 × 600 section)
  axial: fc.integer({ min: -300, max: 1500 }).map((kN) => kN * 1000),
  live: fc.integer({ min: 2, max: 40 }),
  bottom: fc.integer({ min: 2, max: 6 }),
  top: fc.integer({ min: 2, max: 5 }),
});

describe('fixed–fixed members with axial force', () => {
  it('every random one reaches an ultimate, with finite ductility, like the same beam as a propped cantilever', () => {
    fc.assert(
      fc.property(beams, (s) => {
        for (const supports of ['fixed-fixed', 'propped-cantilever'] as const) {
          const r = withAxial(supports, s);
          expect(r.status, `${supports} ${JSON.stringify(s)}: ${r.loadDeflection.events.at(-1)?.description ?? 'no events'}`).not.toBe('not-converged');
          expect(r.loadDeflection.events.some((e) => e.kind === 'ultimate')).toBe(true);
          const mu = r.ductility.displacementDuctility;
          if (mu !== null) expect(Number.isFinite(mu) && mu > 0).toBe(true);
        }
      }),
      { numRuns: 12, seed: 17 },
    );
  });

  it('a member under its axial force alone at the first step: any small force, either sign', () => {
    for (const axial of [1000, -1000, 100e3]) {
      const r = withAxial('fixed-fixed', { span: 6000, axial, live: 12, bottom: 3, top: 2 });
      expect(r.status, `N = ${axial} N`).not.toBe('not-converged');
    }
  });
});
