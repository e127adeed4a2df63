import { describe, expect, it } from 'vitest';
import { spanDistributionChart, spanPanelsChart } from '../../../core/charts/span-distribution.ts';
import { memberResult } from './fixtures.ts';

describe('distributions along the span', () => {
  it('plots the chosen quantity at every station, positions in m', () => {
    const m = memberResult('F-1');
    const d = m.distributions[0]!;
    const spec = spanDistributionChart(m, 0, 'moment', 'si');
    expect(spec.series).toHaveLength(1);
    expect(spec.series[0]!.points).toHaveLength(d.x.length);
    // mm → m and N·mm → kN·m (SI prefixes)
    expect(spec.series[0]!.points[0]).toEqual({ x: d.x[0]! / 1000, y: d.moment[0]! / 1e6 });
    expect(spec.series[0]!.label).toBe(`${d.label} (λ = ${d.loadFactor.toFixed(2)})`);
    expect(spec.x.min).toBe(0);
    expect(spec.x.max).toBeCloseTo(m.span / 1000, 12);
  });

  it('shades the plastic hinge zones of the selected load levels, once each', () => {
    const m = memberResult('B-1');
    const spec = spanDistributionChart(m, 'all', 'curvature', 'si');
    const zones = new Set(m.distributions.flatMap((d) => d.hingeZones.map(([a, b]) => `${a.toFixed(3)}-${b.toFixed(3)}`)));
    expect(spec.bands).toHaveLength(zones.size);
    expect(zones.size).toBeGreaterThan(0);
    expect(spec.bands[0]!.label).toBe('plastic hinge zone');
  });

  it('draws deflection downward and ignores indices out of range', () => {
    const m = memberResult('B-1');
    const spec = spanDistributionChart(m, [0, 99, -1], 'deflection', 'si');
    expect(spec.y.reverse).toBe(true);
    expect(spec.series).toHaveLength(1);
    expect(spanDistributionChart(m, [99], 'deflection', 'si').emptyMessage).toMatch(/No distribution/);
  });

  it('stacks moment above curvature in one chart with a shared position axis', () => {
    const m = memberResult('F-1');
    const spec = spanPanelsChart(m, 'all', 'si');
    expect(spec.y.stack).toBe('span');
    expect(spec.y2?.stack).toBe('span');
    expect(spec.y2?.unit).toBe('kN·m');
    expect(spec.y.unit).toBe('1/m');
    expect(spec.series.filter((s) => s.yAxis === 'y2')).toHaveLength(m.distributions.length);
    expect(spec.series.filter((s) => !s.hideInLegend)).toHaveLength(m.distributions.length);
  });
});
