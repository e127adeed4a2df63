/**
 * A continuous beam of one span gives the single-span member engine's statics (core/member), for
 * each support type that both can describe.
 */
import { describe, expect, it } from 'vitest';
import { elasticSolver } from '../../../core/continuous/elastic.ts';
import { layoutOf } from '../../../core/continuous/layout.ts';
import { caseLoads } from '../../../core/continuous/loads.ts';
import { buildBeamModel } from '../../../core/member/beam-model.ts';
import type { SupportType } from '../../../core/member/definition.ts';
import { solveStatic } from '../../../core/member/static.ts';
import { releasedMoment } from '../../../core/member/statics.ts';
import { elasticZone } from '../../../core/member/zones.ts';
import type { ContinuousLoad, ContinuousSupport } from '../../../core/continuous/definition.ts';
import { continuousBeam, fixed, pinned } from '../../fixtures/continuous.ts';

const L = 7200;
const EI = 3e13;
const loads: ContinuousLoad[] = [
  { kind: 'uniform', loadCase: 'dead', span: 1, magnitude: 12 },
  { kind: 'uniform', loadCase: 'dead', span: 1, magnitude: 8, from: 1000, to: 4000 },
  { kind: 'point', loadCase: 'dead', span: 1, magnitude: 40000, position: 5200 },
];
const memberLoads = [
  { kind: 'uniform' as const, w: 12, from: 0, to: L },
  { kind: 'uniform' as const, w: 8, from: 1000, to: 4000 },
  { kind: 'point' as const, p: 40000, a: 5200 },
];

const cases: [SupportType, ContinuousSupport, ContinuousSupport][] = [
  ['simply-supported', pinned, pinned],
  ['propped-cantilever', fixed, pinned],
  ['fixed-fixed', fixed, fixed],
];

describe('one span of the continuous engine equals the member engine (elastic)', () => {
  for (const [support, left, right] of cases) {
    it(`${support}: moments and deflections at the same positions agree to 1e-4`, () => {
      const def = continuousBeam([L], loads, { supports: [left, right] });
      const layout = layoutOf(def);
      const partLoads = caseLoads(def, layout, 'dead');
      const solver = elasticSolver(def, [EI], partLoads, 60);
      const result = solver.solve(partLoads);
      const beam = buildBeamModel(support, L, [elasticZone('s', 0, L, EI)], [1000, 4000, 5200], 120);
      const member = solveStatic(beam, Float64Array.from(beam.x, (x) => releasedMoment(support, L, memberLoads, x)));
      expect(member.converged).toBe(true);
      const mRef = Math.max(...Array.from(member.moment, Math.abs));
      const vRef = Math.max(...Array.from(member.deflection, Math.abs));
      for (const x of [0, 1000, 2400, 3600, 4000, 5200, 6000, L]) {
        const i = solver.stations.x.findIndex((xi) => Math.abs(xi - x) < 1e-6);
        const k = Array.from(beam.x).findIndex((xi) => Math.abs(xi - x) < 1e-6);
        // The member engine takes the moment linear between its stations (L/120 apart), exact only
        // for point loads; this engine integrates the quadratic moment of uniform loads exactly. The
        // difference is the member engine's discretisation, ~5e-5 of the largest moment.
        expect(Math.abs(result.moment[i]! - member.moment[k]!)).toBeLessThan(1e-4 * mRef);
        expect(Math.abs(result.deflection[i]! - member.deflection[k]!)).toBeLessThan(1e-4 * vRef);
      }
    });
  }
});
