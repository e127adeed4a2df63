/**
 * Distributions along the span at chosen load levels: bending moment, curvature or deflection
 * against the position x from the left support, with the active plastic hinge zones shaded.
 */
import type { SpanDistribution } from '../member/results.ts';
import type { Quantity } from '../units/quantities.ts';
import { SERIES_COLOURS } from './palette.ts';
import type { BandSpec, ChartSpec, SeriesSpec, UnitsInput } from './types.ts';
import { axisFor, axisScale, display, finite, resolveUnits, unitText } from './units.ts';
import type { MemberResult } from '../assessment/results.ts';

export type SpanQuantity = 'moment' | 'curvature' | 'deflection';

const QUANTITY: Readonly<Record<SpanQuantity, { quantity: Quantity; axis: string; title: string }>> = {
  moment: { quantity: 'moment', axis: 'Bending moment M, sagging +', title: 'Bending moment along the span' },
  curvature: { quantity: 'curvature', axis: 'Curvature φ, sagging +', title: 'Curvature along the span' },
  deflection: { quantity: 'deflection', axis: 'Deflection, downward +', title: 'Deflection along the span' },
};

/** Which distributions to draw: one index into `member.distributions`, several, or all of them. */
export type DistributionSelection = number | readonly number[] | 'all';

function selected(member: MemberResult, which: DistributionSelection): SpanDistribution[] {
  const all = member.distributions;
  if (which === 'all') return [...all];
  const indices = typeof which === 'number' ? [which] : which;
  return indices.filter((i) => Number.isInteger(i) && i >= 0 && i < all.length).map((i) => all[i]!);
}

/**
 * Chart spec of moment, curvature or deflection along the span for the selected load levels.
 * Units: positions mm → span display units (m / ft); moment N·mm, curvature 1/mm and deflection mm
 * (downward positive, drawn downward on a reversed axis) → display units.
 * Degenerate cases: an index out of range is ignored; nothing selected → `emptyMessage`.
 */
export function spanDistributionChart(member: MemberResult, which: DistributionSelection, kind: SpanQuantity, unitsInput: UnitsInput): ChartSpec {
  const units = resolveUnits(unitsInput);
  const { quantity, axis, title } = QUANTITY[kind];
  const distributions = selected(member, which);
  const valuesOf = (d: SpanDistribution) => (kind === 'moment' ? d.moment : kind === 'curvature' ? d.curvature : d.deflection);
  const xScale = axisScale(distributions.flatMap((d) => d.x.map((x) => display('spanLength', x, units))));
  const yScale = axisScale(distributions.flatMap((d) => valuesOf(d).map((v) => display(quantity, v, units))));

  const series: SeriesSpec[] = distributions.map((d, i) => {
    const values = valuesOf(d);
    const points = d.x.flatMap((x, k) => {
      const px = display('spanLength', x, units) / xScale;
      const py = display(quantity, values[k] ?? Number.NaN, units) / yScale;
      return finite(px) && finite(py) ? [{ x: px, y: py }] : [];
    });
    const lambda = finite(d.loadFactor) ? ` (λ = ${d.loadFactor.toFixed(2)})` : '';
    return { id: `distribution-${i}`, label: `${d.label}${lambda}`, points, colour: SERIES_COLOURS[i % SERIES_COLOURS.length]!, style: 'solid', width: 1.6 };
  });

  const bands: BandSpec[] = [];
  for (const d of distributions) {
    for (const [start, end] of d.hingeZones) {
      const from = display('spanLength', start, units) / xScale;
      const to = display('spanLength', end, units) / xScale;
      if (!finite(from) || !finite(to)) continue;
      if (bands.some((b) => Math.abs(b.from - from) < 1e-9 && Math.abs(b.to - to) < 1e-9)) continue;
      bands.push({ axis: 'x', from, to, label: bands.length === 0 ? 'plastic hinge zone' : '', colour: 'red' });
    }
  }

  const spec: ChartSpec = {
    kind: 'span-distribution',
    title,
    subtitle: '',
    x: axisFor('Position x from the left support', unitText('spanLength', units), xScale, finite(member.span) && member.span > 0 ? { min: 0, max: display('spanLength', member.span, units) / xScale } : { includeZero: true }),
    y: axisFor(axis, unitText(quantity, units), yScale, { includeZero: true, ...(kind === 'deflection' ? { reverse: true } : {}) }),
    series: series.filter((s) => s.points.length > 0),
    markers: [],
    bands,
    referenceLines: [],
    notes: [],
  };
  return spec.series.length === 0 ? { ...spec, emptyMessage: 'No distribution along the span to show (the member was not analysed to this load level).' } : spec;
}

/**
 * Moment (upper panel) and curvature (lower panel) along the span in one chart with a shared
 * position axis, for the selected load levels, with the plastic hinge zones shaded across both.
 * Units and degenerate cases as for `spanDistributionChart`.
 */
export function spanPanelsChart(member: MemberResult, which: DistributionSelection, unitsInput: UnitsInput): ChartSpec {
  const moment = spanDistributionChart(member, which, 'moment', unitsInput);
  const curvature = spanDistributionChart(member, which, 'curvature', unitsInput);
  // chart.js stacks axes from the bottom up in the order they are declared: curvature (y) below,
  // moment (y2) above.
  return {
    ...moment,
    kind: 'span-panels',
    title: 'Bending moment and curvature along the span',
    y: { ...curvature.y, label: curvature.y.label.replace('Curvature φ, sagging +', 'φ, sagging +'), position: 'left', stack: 'span', stackWeight: 1 },
    y2: { ...moment.y, label: moment.y.label.replace('Bending moment M, sagging +', 'M, sagging +'), position: 'left', stack: 'span', stackWeight: 1 },
    series: [
      ...moment.series.map((s) => ({ ...s, yAxis: 'y2' as const })),
      ...curvature.series.map((s) => ({ ...s, id: `curvature-${s.id}`, hideInLegend: true })),
    ],
  };
}
