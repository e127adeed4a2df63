import { describe, expect, it } from 'vitest';
import { niceCeiling, sectionProfileChart } from '../../../core/charts/section-profile.ts';
import { memberResult } from './fixtures.ts';

const state = () => memberResult('B-1').sections[0]!.sagging!.keyPoints.firstYield!.state;

describe('strain and stress over the depth', () => {
  it('draws the plane strain profile with the bars on it, depth downward, strain per mille', () => {
    const s = state();
    const spec = sectionProfileChart(s, 'si', 'strain');
    expect(spec.y.reverse).toBe(true);
    expect(spec.series[0]!.points).toHaveLength(s.concrete.length);
    expect(spec.markers).toHaveLength(s.elements.length);
    const bottom = s.elements.find((e) => e.label.startsWith('bottom'))!;
    const marker = spec.markers.find((m) => m.label.startsWith('bottom bars'))!;
    // per mille: × 1000 (definition of ‰)
    expect(marker.x).toBeCloseTo(bottom.strain * 1000, 12);
    expect(marker.y).toBe(bottom.depth);
    expect(marker.label).toBe('bottom bars: -2.50 ‰');
  });

  it('marks the neutral axis at the depth of zero strain', () => {
    const s = state();
    const spec = sectionProfileChart(s, 'si', 'strain');
    const na = spec.referenceLines.find((r) => r.label.startsWith('neutral axis'))!;
    expect(na.value).toBeCloseTo(s.neutralAxisDepthFromTop!, 12);
  });

  it('puts concrete stress and bar stress on two axes symmetric about zero, so that their zeros line up', () => {
    const spec = sectionProfileChart(state(), 'si', 'stress');
    expect(spec.x.min).toBe(-spec.x.max!);
    expect(spec.x2!.min).toBe(-spec.x2!.max!);
    expect(spec.x2!.position).toBe('top');
    const steel = spec.series.filter((s) => s.xAxis === 'x2');
    expect(steel).toHaveLength(state().elements.length);
    for (const s of steel) expect(s.points[0]!.x).toBe(0);
  });

  it('rounds axis limits up to 1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6 or 8 times a power of ten', () => {
    // common practice, no source
    expect(niceCeiling(574)).toBe(600);
    expect(niceCeiling(26.9)).toBe(30);
    expect(niceCeiling(1.01)).toBe(1.2);
    expect(niceCeiling(0.0042)).toBe(0.005);
    expect(niceCeiling(0)).toBe(1);
    expect(niceCeiling(Number.NaN)).toBe(1);
  });
});
