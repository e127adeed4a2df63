/**
 * Continuous beams with many loads and zones: the count limits of single members apply
 * (core/member/validate.ts MEMBER_LIMITS, checked by the shared checkZones / checkLoadCount), and
 * from 32 loads on a part the statics sum them by the sorted index of core/member/load-index.ts —
 * to round-off the same as the direct sums, and the same as the three-moment closed form.
 */
import { describe, expect, it } from 'vitest';
import { elasticSolver } from '../../../core/continuous/elastic.ts';
import { layoutOf } from '../../../core/continuous/layout.ts';
import { caseLoads } from '../../../core/continuous/loads.ts';
import type { ContinuousLoad } from '../../../core/continuous/definition.ts';
import { validateContinuousBeam } from '../../../core/continuous/validate.ts';
import { INDEXED_LOADS_FROM } from '../../../core/member/load-index.ts';
import { MEMBER_LIMITS } from '../../../core/member/validate.ts';
import { continuousBeam } from '../../fixtures/continuous.ts';

const L = 6000;
const EI = 4e13;

/** Point loads P on span `span` at positions a (mm from its left support). */
const points = (span: number, p: number, positions: readonly number[]): ContinuousLoad[] => positions.map((a) => ({ kind: 'point', loadCase: 'dead', span, magnitude: p, position: a }));

/** Support moment at the interior support of two equal spans (N·mm). */
function supportMoment(loads: readonly ContinuousLoad[]): number {
  const def = continuousBeam([L, L], loads);
  const layout = layoutOf(def);
  const byPart = caseLoads(def, layout, 'dead');
  const solver = elasticSolver(def, [EI], byPart, 16);
  const r = solver.solve(byPart);
  const i = solver.stations.x.findIndex((x) => Math.abs(x - L) < 1e-6);
  return r.moment[i]!;
}

describe('many loads and zones on a continuous beam', () => {
  it('40 point loads on each span (sorted sums) give the three-moment support moment and the direct sums', () => {
    const positions = Array.from({ length: 40 }, (_, k) => 75 + 150 * k);
    expect(positions.length).toBeGreaterThanOrEqual(INDEXED_LOADS_FROM);
    const p = 2000;
    const many = [...points(1, p, positions), ...points(2, p, positions)];
    // Two equal spans, load P at a from the end support of one span: M_B = −P·a·(L² − a²)/(4L²)
    // (three-moment equation; standard beam tables, from memory); by symmetry the loads on span 2
    // (at L − a from the end support) give the same.
    const hand = -positions.reduce((m, a) => m + (p * a * (L * L - a * a)) / (4 * L * L), 0) - positions.reduce((m, a) => m + (p * (L - a) * (L * L - (L - a) ** 2)) / (4 * L * L), 0);
    const indexed = supportMoment(many);
    expect(indexed / hand).toBeCloseTo(1, 9);
    // the same loads in sets below the threshold (direct sums), superposed
    const parts = [0, 10, 20, 30].map((k) => supportMoment([...points(1, p, positions.slice(k, k + 10)), ...points(2, p, positions.slice(k, k + 10))]));
    expect(indexed / parts.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 9);
  });

  it('refuses more zones or loads than a single member may have, with the field path', () => {
    const n = MEMBER_LIMITS.zones + 1;
    const zones = Array.from({ length: n }, (_, i) => ({ from: (2 * L * i) / n, to: (2 * L * (i + 1)) / n, sectionId: 's' }));
    const tooManyZones = validateContinuousBeam(continuousBeam([L, L], [], { zones }), 'continuousMembers[0] "CB"', new Set(['s']));
    expect(tooManyZones).toContainEqual(expect.objectContaining({ path: 'continuousMembers[0] "CB".zones', message: `a beam may have at most ${MEMBER_LIMITS.zones} zones, got ${n}` }));
    const loads = points(1, 1000, Array.from({ length: MEMBER_LIMITS.loads + 1 }, (_, k) => 1 + k * 2));
    const tooManyLoads = validateContinuousBeam(continuousBeam([L, L], loads), 'continuousMembers[0] "CB"', new Set(['s']));
    expect(tooManyLoads).toEqual([expect.objectContaining({ path: 'continuousMembers[0] "CB".loads', message: `a beam may have at most ${MEMBER_LIMITS.loads} loads, got ${MEMBER_LIMITS.loads + 1}` })]);
  });

  it('keeps the messages of the shared load and zone checks (a load past its span, a gap between zones)', () => {
    const def = continuousBeam([L, L], [{ kind: 'point', loadCase: 'live', span: 2, magnitude: 1000, position: L + 10 }], { zones: [{ from: 0, to: 5000, sectionId: 's' }, { from: 5500, to: 2 * L, sectionId: 's' }] });
    const problems = validateContinuousBeam(def, 'cb', new Set(['s']));
    expect(problems.map((d) => d.path)).toEqual(['cb.zones[1].from', 'cb.loads[0].position']);
    expect(JSON.stringify(problems[0]!.message)).toMatch(/zones must cover the beam without gaps/);
    expect(JSON.stringify(problems[1]!.message)).toMatch(/must lie on its span/);
  });
});
