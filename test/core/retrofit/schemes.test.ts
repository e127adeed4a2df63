/**
 * Scheme building blocks: the FRP helpers on a section analysis, and the steel plate scheme.
 */
import { describe, expect, it } from 'vitest';
import { say } from '../../../core/units/phrase.ts';
import { analyzeProject, sectionCache } from '../../../core/analysis.ts';
import { substrateStrainFromCurve } from '../../../core/retrofit/frp.ts';
import { faceOf } from '../../../core/retrofit/schemes.ts';
import { STANDARD_GRAVITY } from '../../../core/section/analyze.ts';
import { strainAtDepth } from '../../../core/section/state.ts';
import { PLATE_SCHEME, retrofitProject } from './retrofit-project.ts';
import { flexuralDesignResistance } from '../../../core/assessment/resistance.ts';

const project = retrofitProject();
const analysis = sectionCache(project)('r1')!;

describe('FRP helpers', () => {
  it('without FRP nothing is reduced by ψf: the design resistance is φ·Mn (core/assessment/resistance.ts)', () => {
    for (const dir of ['sagging', 'hogging'] as const) {
      const r = flexuralDesignResistance('ACI 318-19', analysis, dir);
      expect(r.frpMoment).toBe(0);
      expect(r.value).toBe(r.phi! * r.nominal!);
    }
  });

  it('the substrate strain read on the curve: zero at zero moment, the computed point\'s strain at a computed point, null beyond the peak', () => {
    const curve = analysis.curves.sagging!;
    const model = analysis.model!;
    expect(substrateStrainFromCurve(model, curve, 0, 600)).toBeCloseTo(0, 12);
    const p = curve.points[Math.floor(curve.points.length / 3)]!;
    const expected = strainAtDepth(model, p.referenceStrain, p.curvature, 600);
    expect(substrateStrainFromCurve(model, curve, p.moment, 600)).toBeCloseTo(expected, 12);
    expect(expected).toBeLessThan(0); // tension at the soffit
    expect(substrateStrainFromCurve(model, curve, 1.01 * curve.keyPoints.peak!.moment, 600)).toBeNull();
  });

  it('the face of a tee: 1200 mm at the top, the 300 mm web at the bottom', () => {
    const tee = project.sections.find((s) => s.id === 't1')!;
    expect(faceOf(tee, 'top')).toMatchObject({ depth: 0, width: 1200 });
    expect(faceOf(tee, 'bottom')).toMatchObject({ depth: 600, width: 300, x0: 450, x1: 750 });
  });
});

describe('bonded steel plate', () => {
  const r = analyzeProject(retrofitProject('ACI 318-19', { schemes: [PLATE_SCHEME] })).members[0]!;
  const s = r.retrofit!.schemes[0]!;

  it('is a plate element under the soffit, its centroid 3 mm below it, with the installation strain', () => {
    expect(s.errors).toEqual([]);
    const plate = s.variant!.sections[0]!.added.find((a) => a.kind === 'plate')!;
    expect(plate.depth).toBe(603);
    expect(plate.area).toBe(1200);
    expect(plate.initialStrain).toBe(s.installation[0]!.strain);
    expect(plate.limitCause).toBe('steel-rupture');
    expect(say(s.description, 'si')).toBe('bonded steel plate on the bottom face: 6 mm × 200 mm (s355)');
  });

  it('adds its weight, 7850 kg/m³ × g × 1200 mm², to the dead load: the factored midspan moment grows by 1.2 × w·L²/8', () => {
    const w = 7850 * STANDARD_GRAVITY * 1200 * 1e-9; // 0.0924 N/mm
    const grown = s.variant!.strength!.demand - r.retrofit!.original!.strength!.demand;
    expect(grown).toBeCloseTo((1.2 * w * 6000 ** 2) / 8, 0);
  });

  it('raises the flexural strength of the beam', () => {
    expect(s.comparison!.memberCapacity.gainPercent!).toBeGreaterThan(10);
    expect(s.variant!.sections[0]!.curves.find((c) => c.direction === 'sagging')!.status).toMatch(/^Ultimate/);
  });
});
