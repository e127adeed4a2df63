import { describe, expect, it } from 'vitest';
import { loadDeflectionChart } from '../../../core/charts/load-deflection.ts';
import { memberResult } from './fixtures.ts';
import type { MemberResult } from '../../../core/assessment/results.ts';

describe('load–deflection chart', () => {
  it('plots the total pattern load against the control-point deflection in kN and mm', () => {
    const m = memberResult('B-1');
    const spec = loadDeflectionChart(m, 'si');
    const points = spec.series.flatMap((s) => s.points);
    const last = m.loadDeflection.points[m.loadDeflection.points.length - 1]!;
    // N → kN: ÷ 1000 (SI prefix); deflection stays in mm
    expect(points).toContainEqual({ x: last.deflection, y: last.totalLoad / 1000 });
    expect(spec.x.label).toBe('Deflection Δ (mm)');
    expect(spec.y.label).toBe('Total load P (kN)');
  });

  it('draws the service level at λ = 1 from the load per unit load factor of the pattern', () => {
    const m = memberResult('B-1');
    const p = m.loadDeflection.points.find((q) => q.loadFactor > 0)!;
    const spec = loadDeflectionChart(m, 'si');
    const service = spec.referenceLines.find((r) => r.label === 'service load (λ = 1)')!;
    expect(service.axis).toBe('y');
    expect(service.value).toBeCloseTo(p.totalLoad / p.loadFactor / 1000, 9);
  });

  it('merges events at the same load level into one labelled marker with the most significant shape', () => {
    const m = memberResult('B-1');
    const ultimate = m.loadDeflection.events.find((e) => e.kind === 'ultimate')!;
    const near = (a: number, b: number) => Math.abs(a - b) <= 1e-6 * Math.max(1, Math.abs(a), Math.abs(b));
    const together = m.loadDeflection.events.filter((e) => near(e.loadFactor, ultimate.loadFactor) && near(e.deflection, ultimate.deflection));
    const spec = loadDeflectionChart(m, 'si');
    const marker = spec.markers.find((k) => k.label.includes('ultimate'))!;
    expect(marker.shape).toBe('cross');
    expect(marker.colour).toBe('red');
    expect(marker.label.split(' (x = ')[0]!.split(', ')).toHaveLength(new Set(together.map((e) => e.kind)).size);
    expect(spec.markers.length).toBeLessThan(m.loadDeflection.events.length + 1);
  });

  it('gives a stage that does not advance no series (and so no legend entry)', () => {
    const m = memberResult('B-1');
    const last = m.loadDeflection.points[m.loadDeflection.points.length - 1]!;
    const stuck = { ...last, stage: 'mechanism' as const };
    const withStuck: MemberResult = { ...m, loadDeflection: { ...m.loadDeflection, points: [...m.loadDeflection.points.map((p) => ({ ...p, stage: 'integration' as const })), stuck, stuck, stuck] } };
    const spec = loadDeflectionChart(withStuck, 'si');
    expect(spec.series.map((s) => s.label)).toEqual(['curvature integrated along the span']);
  });

  it('names a live-only pattern on the load axis', () => {
    const spec = loadDeflectionChart(memberResult('C-1'), 'us');
    expect(spec.y.label).toBe('Live load P (dead load held) (kip)');
    expect(spec.x.unit).toBe('in');
  });

  it('gives a reason instead of a curve for a member that was not analysed', () => {
    const m: MemberResult = { ...memberResult('X-1') };
    const spec = loadDeflectionChart(m, 'si');
    expect(spec.series).toHaveLength(0);
    expect(spec.emptyMessage).toBe('No load–deflection curve: not analysed.');
  });
});
