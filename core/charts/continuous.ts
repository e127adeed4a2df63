/**
 * Charts of a continuous beam (core/continuous results): the moment and shear envelopes of the
 * strength combination along the whole beam, with the supports marked and the governing values
 * per part; and the load–deflection curve at the control point with the hinges numbered in order
 * of formation. Pure: the results are converted to display units, nothing is recomputed.
 */
import type { ContinuousMemberResult } from '../assessment/continuous-verdict.ts';
import type { Quantity } from '../units/quantities.ts';
import type { ChartPoint, ChartSpec, MarkerSpec, ReferenceLineSpec, SeriesSpec, UnitsInput } from './types.ts';
import { axisFor, axisScale, display, finite, resolveUnits, unitText } from './units.ts';

export type EnvelopeQuantity = 'moment' | 'shear';

const ENVELOPE: Readonly<Record<EnvelopeQuantity, { quantity: Quantity; axis: string; title: string }>> = {
  moment: { quantity: 'moment', axis: 'Bending moment M, sagging +', title: 'Moment envelope' },
  shear: { quantity: 'force', axis: 'Shear force V', title: 'Shear envelope' },
};

function empty(kind: ChartSpec['kind'], title: string, message: string): ChartSpec {
  return { kind, title, subtitle: '', x: axisFor('Position x', '', 1), y: axisFor('', '', 1), series: [], markers: [], bands: [], referenceLines: [], emptyMessage: message, notes: [] };
}

/**
 * Envelope of the strength combination (every live-load arrangement of ACI 318-19 6.4.2 /
 * EN 1992-1-1 5.1.3) along the beam: largest and smallest moment (or shear) at every station.
 * Units: positions mm → span units (m / ft); moment N·mm and shear N → display units. Supports are
 * vertical reference lines; a station repeated at a support or point load breaks nothing (the
 * jump is drawn vertically).
 */
/** The fixed range of an axis over the finite values `xs` (display units), divided by `scale`; none when there are none. */
function axisEnds(xs: readonly number[], scale: number): { min?: number; max?: number } {
  const finiteXs = xs.filter((x) => Number.isFinite(x));
  if (finiteXs.length < 2) return {};
  return { min: Math.min(...finiteXs) / scale, max: Math.max(...finiteXs) / scale };
}

export function continuousEnvelopeChart(result: ContinuousMemberResult, which: EnvelopeQuantity, unitsInput: UnitsInput): ChartSpec {
  const { quantity, axis, title } = ENVELOPE[which];
  const elastic = result.elastic;
  if (!elastic) return empty('span-distribution', title, 'No envelope: the beam has input errors or could not be analysed.');
  const units = resolveUnits(unitsInput);
  const envelope = elastic.envelopes.strength;
  const side = which === 'moment' ? envelope.moment : envelope.shear;
  const xs = elastic.stations.x.map((x) => display('spanLength', x, units));
  const xScale = axisScale(xs);
  const yScale = axisScale([...side.max.value, ...side.min.value].map((v) => display(quantity, v, units)));
  const line = (values: readonly number[]): ChartPoint[] => values.map((v, i) => {
    const x = xs[i]! / xScale;
    const y = display(quantity, v, units) / yScale;
    return finite(x) && finite(y) ? { x, y } : null;
  });
  const series: SeriesSpec[] = [
    { id: 'max', label: which === 'moment' ? 'largest (sagging)' : 'largest', points: line(side.max.value), colour: 'blue', style: 'solid', width: 1.8 },
    { id: 'min', label: which === 'moment' ? 'smallest (hogging)' : 'smallest', points: line(side.min.value), colour: 'orange', style: 'solid', width: 1.8 },
  ];
  const referenceLines: ReferenceLineSpec[] = result.supportX.map((x, i) => ({ axis: 'x', value: display('spanLength', x, units) / xScale, label: `support ${i + 1}`, colour: 'grey', style: 'dotted' }));
  const markers: MarkerSpec[] = [];
  if (which === 'moment') {
    for (const part of elastic.parts) {
      for (const [extreme, sign] of [[part.maxSagging, 1], [part.maxHogging, -1]] as const) {
        if (!finite(extreme.value) || extreme.value * sign <= 0) continue;
        const x = display('spanLength', extreme.x, units) / xScale;
        const y = display(quantity, extreme.value, units) / yScale;
        if (finite(x) && finite(y)) markers.push({ x, y, label: '', shape: 'circle', colour: sign > 0 ? 'blue' : 'orange' });
      }
    }
  }
  return {
    kind: 'span-distribution',
    title,
    subtitle: envelope.description,
    // The axis spans the beam exactly, from its left end to its right end (chart.js would pad it).
    x: axisFor('Position x from the left end', unitText('spanLength', units), xScale, axisEnds(xs, xScale)),
    y: axisFor(axis, unitText(quantity, units), yScale, { includeZero: true }),
    series,
    markers,
    bands: [],
    referenceLines,
    notes: [],
  };
}

/**
 * Load–deflection curve of the analysis to failure at the control point: total load of the pattern
 * against the deflection there, the hinges numbered in order of formation where they formed, the
 * peak and the end of the curve; the factored-load level when the pattern is proportional.
 * Units: deflection mm → mm / in; load N → kN / kip.
 */
export function continuousLoadDeflectionChart(result: ContinuousMemberResult, unitsInput: UnitsInput): ChartSpec {
  const capacity = result.capacity;
  const title = 'Load–deflection to failure';
  if (!capacity || capacity.points.length === 0) return empty('load-deflection', title, 'No analysis to failure: see the notes of the member.');
  const units = resolveUnits(unitsInput);
  const xScale = axisScale(capacity.points.map((p) => display('deflection', p.deflection, units)));
  const yScale = axisScale(capacity.points.map((p) => display('force', p.totalLoad, units)));
  const at = (deflection: number, load: number): NonNullable<ChartPoint> | null => {
    const x = display('deflection', deflection, units) / xScale;
    const y = display('force', load, units) / yScale;
    return finite(x) && finite(y) ? { x, y } : null;
  };
  const perFactor = capacity.patternTotal;
  const markers: MarkerSpec[] = [];
  for (const h of capacity.hinges) {
    const p = at(h.deflection, h.loadFactor * perFactor);
    if (p) markers.push({ ...p, label: `${h.order}`, shape: 'diamond', colour: h.direction === 'hogging' ? 'orange' : 'blue' });
  }
  const peak = capacity.points.reduce((a, b) => (b.totalLoad > a.totalLoad ? b : a));
  const pk = at(peak.deflection, peak.totalLoad);
  if (pk) markers.push({ ...pk, label: 'peak', shape: 'star', colour: 'ink' });
  if (capacity.ultimate) {
    const u = at(capacity.ultimate.deflection, capacity.ultimate.loadFactor * perFactor);
    if (u) markers.push({ ...u, label: 'end', shape: 'cross', colour: 'red' });
  }
  const referenceLines: ReferenceLineSpec[] = [];
  if (result.strengthLevel && finite(result.strengthLevel.factoredTotal)) {
    const y = display('force', result.strengthLevel.factoredTotal, units) / yScale;
    if (finite(y)) referenceLines.push({ axis: 'y', value: y, label: 'factored loads', colour: 'green', style: 'dashed' });
  }
  return {
    kind: 'load-deflection',
    title,
    subtitle: `${result.failureArrangement}; control point in ${capacity.controlPart}`,
    x: axisFor('Deflection at the control point, downward +', unitText('deflection', units), xScale, { includeZero: true }),
    y: axisFor('Total load of the pattern', unitText('force', units), yScale, { includeZero: true }),
    series: [{ id: 'curve', label: 'curvature integrated along the beam', points: capacity.points.map((p) => at(p.deflection, p.totalLoad)), colour: 'blue', style: 'solid', width: 1.8 }],
    markers,
    bands: [],
    referenceLines,
    notes: capacity.converged ? [] : [capacity.failureCause],
  };
}
