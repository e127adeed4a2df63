/**
 * Charts of a continuous beam from real results (core/continuous through analyzeContinuousMembers):
 * the strength envelope in display units, the supports marked, and the load–deflection curve with
 * the hinges numbered in order of formation. Light inputs: two short spans, 16 segments.
 */
import { describe, expect, it } from 'vitest';
import { analyzeContinuousMembers } from '../../../core/analysis.ts';
import { continuousEnvelopeChart, continuousLoadDeflectionChart } from '../../../core/charts/continuous.ts';
import { demoProjectSI } from '../../../core/project/demo.ts';
import type { ContinuousMemberDefinition, Project } from '../../../core/project/types.ts';

const L = 5000; // mm
const w = 20; // N/mm = kN/m

/** Two equal spans on pins, one section, a uniform dead load only, unit strength factors. */
function twoSpans(): Project {
  const demo = demoProjectSI();
  const beam: ContinuousMemberDefinition = {
    id: 'T-1', name: 'T-1', spans: [L, L],
    supports: [{ kind: 'pinned' }, { kind: 'pinned' }, { kind: 'pinned' }],
    zones: [{ from: 0, to: 2 * L, sectionId: demo.continuousMembers![0]!.zones[0]!.sectionId }],
    loads: [1, 2].map((span) => ({ kind: 'uniform' as const, loadCase: 'dead' as const, span, magnitude: w })),
    includeSelfWeight: false,
    strengthFactors: { dead: 1, superimposed: 1, live: 1 },
    service: { sustainedLiveFraction: 0.3, durationMonths: 60, limitCases: ['en-appearance'] },
    capacity: { pattern: 'proportional', arrangement: { kind: 'all-spans' }, hingeLengthMethod: 'priestley-2007' },
  };
  return { ...demo, members: [], continuousMembers: [beam], settings: { ...demo.settings, stations: 16 } };
}

const [result] = analyzeContinuousMembers(twoSpans());

describe('continuous charts', () => {
  it('draws the moment envelope in kN·m with the handbook support moment of two equal spans', () => {
    expect(result!.errors).toEqual([]);
    const spec = continuousEnvelopeChart(result!, 'moment', 'si');
    expect(spec.emptyMessage).toBeUndefined();
    expect(spec.y.unit).toBe('kN·m');
    const min = spec.series.find((s) => s.id === 'min')!;
    const lowest = Math.min(...min.points.flatMap((p) => (p ? [p.y * spec.y.scale] : [])));
    // Two equal spans, uniform load on both: support moment −wL²/8 (handbook coefficient, common practice, no source).
    expect(lowest).toBeCloseTo((-w * L ** 2) / 8 / 1e6, 3);
    // Supports as reference lines at 0, L and 2L, in metres.
    expect(spec.referenceLines.map((r) => r.value * spec.x.scale)).toEqual([0, 5, 10]);
    // An EN project names its loads G and Q (EN 1990 6.10), not ACI's D and L; unit factors here.
    expect(spec.subtitle).toBe('1G + 1Q');
    // The position axis runs over the beam exactly, 0 to 10 m (chart.js padded it to −5 … 15 m).
    expect([spec.x.min! * spec.x.scale, spec.x.max! * spec.x.scale]).toEqual([0, 10]);
  });

  it('draws the shear envelope in kN, the largest at the inner support 5wL/8', () => {
    const spec = continuousEnvelopeChart(result!, 'shear', 'si');
    const values = spec.series.flatMap((s) => s.points.flatMap((p) => (p ? [Math.abs(p.y * spec.y.scale)] : [])));
    // Two equal spans: shear at the inner support 5wL/8 (handbook coefficient, common practice, no source).
    expect(Math.max(...values)).toBeCloseTo((5 * w * L) / 8 / 1000, 2);
  });

  it('numbers the hinges of the load–deflection curve in order of formation, in US units too', () => {
    const si = continuousLoadDeflectionChart(result!, 'si');
    const hinges = result!.capacity!.hinges;
    expect(hinges.length).toBeGreaterThan(0);
    expect(si.markers.filter((m) => m.shape === 'diamond').map((m) => m.label)).toEqual(hinges.map((h) => String(h.order)));
    const us = continuousLoadDeflectionChart(result!, 'us');
    expect(us.x.unit).toBe('in');
    expect(us.y.unit).toBe('kip');
    for (const spec of [si, us]) for (const p of spec.series[0]!.points) if (p) expect(Number.isFinite(p.x) && Number.isFinite(p.y)).toBe(true);
  });

  it('says why when there is nothing to draw', () => {
    const broken = { ...result!, elastic: null, capacity: null };
    expect(continuousEnvelopeChart(broken, 'moment', 'si').emptyMessage).toMatch(/input errors/);
    expect(continuousLoadDeflectionChart(broken, 'si').emptyMessage).toMatch(/No analysis to failure/);
  });
});
