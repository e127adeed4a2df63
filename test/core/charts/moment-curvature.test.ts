import { describe, expect, it } from 'vitest';
import { KEY_POINT_ORDER, momentCurvatureChart, sectionMomentCurvatureChart } from '../../../core/charts/moment-curvature.ts';
import type { MomentCurvatureResult } from '../../../core/section/results.ts';
import { memberResult } from './fixtures.ts';

const section = () => memberResult('B-1').sections[0]!;

describe('moment–curvature chart', () => {
  it('plots every computed point in display units (1/m, kN·m)', () => {
    const curve = section().sagging!;
    const spec = momentCurvatureChart(curve, 'si');
    const series = spec.series.find((s) => s.id === 'curve-0')!;
    expect(series.points).toHaveLength(curve.points.length);
    const last = curve.points[curve.points.length - 1]!;
    // 1/mm → 1/m: × 1000; N·mm → kN·m: ÷ 10⁶ (SI prefixes)
    const end = series.points[series.points.length - 1]!;
    expect(end.x).toBeCloseTo(last.curvature * 1000, 12);
    expect(end.y).toBeCloseTo(last.moment / 1e6, 9);
    expect(spec.x.label).toBe('Curvature φ (1/m)');
    expect(spec.y.label).toBe('Moment M (kN·m)');
  });

  it('marks each key point of the result with its label and draws the bilinear idealisation through (0,0), (φy, My), (φu, Mu)', () => {
    const curve = section().sagging!;
    const spec = momentCurvatureChart(curve, 'si');
    const present = KEY_POINT_ORDER.filter((k) => curve.keyPoints[k]);
    expect(spec.markers.map((m) => m.label)).toEqual(present.map((k) => ({ cracking: 'cracking', firstYield: 'first yield M′y', codeCrushing: 'code crushing strain', nominal: 'limit strain εc 0.004 / εs 0.015', peak: 'peak Mmax', ultimate: 'ultimate' })[k]));
    const fy = curve.keyPoints.firstYield!;
    const marker = spec.markers.find((m) => m.label === 'first yield M′y')!;
    expect(marker.x).toBeCloseTo(fy.curvature * 1000, 12);
    expect(marker.y).toBeCloseTo(fy.moment / 1e6, 12);
    const b = curve.bilinear!;
    const bilinear = spec.series.find((s) => s.id === 'bilinear-0')!;
    expect(bilinear.style).toBe('dashed');
    const expected = [{ x: 0, y: 0 }, { x: b.yieldCurvature * 1000, y: b.yieldMoment / 1e6 }, { x: b.ultimateCurvature * 1000, y: b.ultimateMoment / 1e6 }];
    expect(bilinear.points).toHaveLength(3);
    bilinear.points.forEach((p, i) => {
      expect(p!.x).toBeCloseTo(expected[i]!.x, 12);
      expect(p!.y).toBeCloseTo(expected[i]!.y, 9);
    });
  });

  it('shows both bending directions side by side, each in its own panel, with one curvature factor', () => {
    const spec = sectionMomentCurvatureChart(section(), 'si');
    expect(spec.title).toContain(section().sectionName);
    expect(spec.series.map((s) => s.label)).toEqual(['computed, sagging', 'bilinear idealisation, sagging', 'computed, hogging', 'bilinear idealisation, hogging']);
    expect(spec.series.map((s) => s.xAxis ?? 'x')).toEqual(['x', 'x', 'x2', 'x2']);
    expect(spec.x.label).toMatch(/^Curvature φ, sagging/);
    expect(spec.x2!.label).toMatch(/^Curvature φ, hogging/);
    expect(spec.x.stack).toBe('panels');
    expect(spec.x2!.stack).toBe('panels');
    expect(spec.x2!.scale).toBe(spec.x.scale);
    // The panel names the direction; the marker says what happens.
    expect(spec.markers.filter((m) => m.xAxis === 'x2').map((m) => m.label)).toContain('ultimate');
    expect(spec.markers.some((m) => /\((sagging|hogging)\)/.test(m.label))).toBe(false);
  });

  it('draws one direction of a section with the factor of the whole section, so that views agree', () => {
    const both = sectionMomentCurvatureChart(section(), 'us');
    const sagging = sectionMomentCurvatureChart(section(), 'us', { directions: ['sagging'] });
    const hogging = sectionMomentCurvatureChart(section(), 'us', { directions: ['hogging'] });
    expect(sagging.x.scale).toBe(both.x.scale);
    expect(hogging.x.scale).toBe(both.x.scale);
    expect(hogging.subtitle).toBe('hogging bending');
    expect(hogging.x2).toBeUndefined();
    const kp = section().hogging!.keyPoints.ultimate!;
    const marker = hogging.markers.find((m) => m.label === 'ultimate')!;
    // 1/in = 25.4 × 1/mm (NIST SP 811 B.8: 1 in = 25.4 mm)
    expect(marker.x * hogging.x.scale).toBeCloseTo(kp.curvature * 25.4, 12);
  });

  it('names both directions on the markers when they share one pair of axes', () => {
    const spec = sectionMomentCurvatureChart(section(), 'si', { layout: 'overlay' });
    expect(spec.x2).toBeUndefined();
    expect(spec.markers.some((m) => m.label === 'ultimate (hogging)')).toBe(true);
  });

  it('uses US units and a power-of-ten factor for small curvatures', () => {
    const spec = momentCurvatureChart(section().sagging!, 'us');
    expect(spec.x.label).toBe('Curvature φ (×10⁻³ 1/in)');
    expect(spec.y.unit).toBe('kip·ft');
    const fy = section().sagging!.keyPoints.firstYield!;
    const marker = spec.markers.find((m) => m.label === 'first yield M′y')!;
    // 1/mm → 1/in: × 25.4 (NIST SP 811 B.8: 1 in = 25.4 mm), then ÷ 10⁻³ for the axis factor
    expect(marker.x).toBeCloseTo(fy.curvature * 25.4 * 1000, 9);
  });

  it('says why when there is nothing to plot, and carries the message of a curve that did not converge', () => {
    const empty: MomentCurvatureResult = {
      direction: 'sagging',
      status: { kind: 'not-converged', atCurvature: 0, message: 'No equilibrium at zero curvature: the axial force exceeds the squash load.' },
      concreteLimits: { codeCrushingStrain: 0.003, codeCrushingSource: 'ACI 318-19 22.2.2.1', ultimateStrain: null },
      points: [],
      keyPoints: {},
      curvatureDuctility: null,
      firstYieldCurvatureDuctility: null,
      warnings: [],
      solves: 0,
    };
    const spec = momentCurvatureChart(empty, 'si');
    expect(spec.series).toHaveLength(0);
    expect(spec.emptyMessage).toMatch(/No moment–curvature curve/);
    expect(spec.notes).toEqual(['sagging: No equilibrium at zero curvature: the axial force exceeds the squash load.']);
  });

  it('never puts a non-finite number in a spec', () => {
    const curve = section().sagging!;
    const broken: MomentCurvatureResult = { ...curve, points: [...curve.points, { ...curve.points[1]!, curvature: Number.NaN }, { ...curve.points[1]!, moment: Number.POSITIVE_INFINITY }] };
    const spec = momentCurvatureChart(broken, 'si');
    const numbers = JSON.stringify(spec);
    expect(numbers).not.toMatch(/NaN|Infinity|null/);
    expect(spec.series[0]!.points).toHaveLength(curve.points.length);
  });
});
