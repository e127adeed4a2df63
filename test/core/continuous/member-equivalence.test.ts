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
import { capacityAnalysis } from '../../../core/continuous/capacity.ts';
import { directionLaw, hingeBars } from '../../../core/continuous/laws.ts';
import { capacityCurve } from '../../../core/member/capacity.ts';
import { buildSectionModel } from '../../../core/section/build.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import { momentCurvature } from '../../../core/section/moment-curvature.ts';
import { beamOf, fieldOf } from '../../fixtures/beams.ts';
import { fixedResolver } from '../../fixtures/sections.ts';
import { testConcrete, testSteel } from '../../fixtures/simple-materials.ts';

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

describe('one span of the continuous engine equals the member engine (to failure)', () => {
  // A real section (parabolic concrete, elastic–plastic steel) with top and bottom bars; fixed–pinned
  // span under uniform load: the member engine's propped cantilever.
  const concrete = testConcrete({ fc: 30, eps0: 0.002, epsCu: 0.0038, shape: 'parabola' });
  const steel = testSteel(500, 200000, 0.1);
  const resolver = fixedResolver(concrete, steel);
  const section: SectionDefinition = {
    id: 'r', name: 'r', shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c',
    bars: [{ steelId: 's', depth: 545, count: 4, diameter: 20 }, { steelId: 's', depth: 55, count: 4, diameter: 20 }],
  };
  it('propped cantilever: the same peak load (< 1 %) and the same hinge sequence', () => {
    const span = 6000;
    const lp = 400;
    const beam = beamOf('propped-cantilever', span, [{ from: 0, to: span, section }], resolver, 120);
    const pattern = fieldOf(beam, [{ kind: 'uniform', w: 1, from: 0, to: span }]);
    const member = capacityCurve(beam, { constant: new Float64Array(beam.x.length), pattern, constantTotal: 0, patternTotal: span }, { pattern: 'proportional', hingeLengthMethod: 'user', userHingeLength: lp });
    const memberPeak = Math.max(...member.points.map((p) => p.loadFactor));

    const { model } = buildSectionModel(section, resolver);
    const law = (dir: 'sagging' | 'hogging') => directionLaw(momentCurvature(model, dir, { codeCrushingStrain: 0.003 }), hingeBars(model, dir))!;
    const def = continuousBeam([span], [{ kind: 'uniform', loadCase: 'dead', span: 1, magnitude: 1 }], { supports: [fixed, pinned] });
    const layout = layoutOf(def);
    const result = capacityAnalysis({ definition: def, zones: [{ sectionId: 'r', sagging: law('sagging'), hogging: law('hogging') }], held: [[]], pattern: caseLoads(def, layout, 'dead'), hingeLengthMethod: 'user', userHingeLength: lp });
    expect(result.converged).toBe(true);
    expect(Math.abs(result.peakLoadFactor / memberPeak - 1)).toBeLessThan(0.01);
    expect(result.hinges.map((h) => h.direction)).toEqual(member.hinges.map((h) => h.direction));
    expect(Math.abs(result.hinges[0]!.position - member.hinges[0]!.position)).toBeLessThan(1);
  });
});
