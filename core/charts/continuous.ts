/**
 * Charts of a continuous beam (core/continuous results): the moment and shear envelopes of the
 * strength combination along the whole beam, with the supports marked — for the app (the governing
 * values per part) and, with the code's design option, for the report (the zones' design
 * resistances, the shear strengths, the governing station); and the load–deflection curve at the
 * control point with the hinges numbered in order of formation. Pure: the results are converted to
 * display units, nothing is recomputed. The report's elevation drawing is continuous-elevation.ts.
 */
import type { ContinuousMemberResult } from '../assessment/continuous-verdict.ts';
import type { CodeBasis } from '../materials/specs.ts';
import type { Quantity } from '../units/quantities.ts';
import type { ChartPoint, ChartSpec, MarkerSpec, ReferenceLineSpec, SeriesSpec, UnitsInput } from './types.ts';
import { axisFor, axisScale, display, finite, resolveUnits, unitText } from './units.ts';

export type EnvelopeQuantity = 'moment' | 'shear';

/**
 * What an envelope chart shows beyond the envelope itself. Without `design` (the app's workspace):
 * the largest and smallest moment or shear at every station, the extremes of each part marked. With
 * `design` (the report, in the words of that code): the moment envelope with the design resistance
 * of each zone in both senses and the governing station; the shear as |V| against the design and
 * nominal shear strength, with the shear at the largest load of the analysis to failure.
 */
export interface EnvelopeOptions {
  readonly design?: CodeBasis;
}

function empty(kind: ChartSpec['kind'], title: string, message: string): ChartSpec {
  return { kind, title, subtitle: '', x: axisFor('Position x', '', 1), y: axisFor('', '', 1), series: [], markers: [], bands: [], referenceLines: [], emptyMessage: message, notes: [] };
}

/**
 * The frame every envelope shares: positions (mm) and values of `quantity` (internal units) to
 * chart coordinates, scaled together with everything else the chart draws (`alsoScale`), the
 * supports as numbered vertical reference lines, and the x axis spanning the stations exactly
 * (chart.js would pad it). A station repeated at a support or point load breaks nothing (the jump
 * is drawn vertically).
 */
function envelopeFrame(result: ContinuousMemberResult, xs: readonly number[], quantity: Quantity, values: readonly number[], units: ReturnType<typeof resolveUnits>) {
  const shownX = xs.map((x) => display('spanLength', x, units));
  const xScale = axisScale(shownX);
  const yScale = axisScale(values.map((v) => display(quantity, v, units)));
  const X = (mm: number) => display('spanLength', mm, units) / xScale;
  const Y = (v: number) => display(quantity, v, units) / yScale;
  const line = (vs: readonly number[]): ChartPoint[] => vs.map((v, i) => {
    const x = X(xs[i]!);
    const y = Y(v);
    return finite(x) && finite(y) ? { x, y } : null;
  });
  const finiteXs = shownX.filter((x) => Number.isFinite(x));
  const ends = finiteXs.length < 2 ? {} : { min: Math.min(...finiteXs) / xScale, max: Math.max(...finiteXs) / xScale };
  return {
    X, Y, line, yScale,
    xAxis: axisFor('Position x from the left end', unitText('spanLength', units), xScale, ends),
    supports: result.supportX.map((x, i): ReferenceLineSpec => ({ axis: 'x', value: X(x), label: `support ${i + 1}`, colour: 'grey', style: 'dotted' })),
  };
}

const APP_ENVELOPE: Readonly<Record<EnvelopeQuantity, { quantity: Quantity; axis: string; title: string }>> = {
  moment: { quantity: 'moment', axis: 'Bending moment M, sagging +', title: 'Moment envelope' },
  shear: { quantity: 'force', axis: 'Shear force V', title: 'Shear envelope' },
};

/**
 * Envelope of the strength combination (every live-load arrangement of ACI 318-19 6.4.2 /
 * EN 1992-1-1 5.1.3) along the beam, for the app or (with `options.design`) for the report.
 * Units: positions mm → span units (m / ft); moment N·mm and shear N → display units.
 */
export function continuousEnvelopeChart(result: ContinuousMemberResult, which: EnvelopeQuantity, unitsInput: UnitsInput, options: EnvelopeOptions = {}): ChartSpec {
  const units = resolveUnits(unitsInput);
  if (options.design) return which === 'moment' ? designMomentChart(result, options.design, units) : designShearChart(result, options.design, units);
  const { quantity, axis, title } = APP_ENVELOPE[which];
  const elastic = result.elastic;
  if (!elastic) return empty('span-distribution', title, 'No envelope: the beam has input errors or could not be analysed.');
  const envelope = elastic.envelopes.strength;
  const side = which === 'moment' ? envelope.moment : envelope.shear;
  const frame = envelopeFrame(result, elastic.stations.x, quantity, [...side.max.value, ...side.min.value], units);
  const series: SeriesSpec[] = [
    { id: 'max', label: which === 'moment' ? 'largest (sagging)' : 'largest', points: frame.line(side.max.value), colour: 'blue', style: 'solid', width: 1.8 },
    { id: 'min', label: which === 'moment' ? 'smallest (hogging)' : 'smallest', points: frame.line(side.min.value), colour: 'orange', style: 'solid', width: 1.8 },
  ];
  const markers: MarkerSpec[] = [];
  if (which === 'moment') {
    for (const part of elastic.parts) {
      for (const [extreme, sign] of [[part.maxSagging, 1], [part.maxHogging, -1]] as const) {
        if (!finite(extreme.value) || extreme.value * sign <= 0) continue;
        const x = frame.X(extreme.x);
        const y = frame.Y(extreme.value);
        if (finite(x) && finite(y)) markers.push({ x, y, label: '', shape: 'circle', colour: sign > 0 ? 'blue' : 'orange' });
      }
    }
  }
  return {
    kind: 'span-distribution',
    title,
    subtitle: envelope.description,
    x: frame.xAxis,
    y: axisFor(axis, unitText(quantity, units), frame.yScale, { includeZero: true }),
    series,
    markers,
    bands: [],
    referenceLines: frame.supports,
    notes: [],
  };
}

/** The report's moment envelope: the strength envelope with the design resistance of each zone and the governing station. */
function designMomentChart(result: ContinuousMemberResult, code: CodeBasis, units: ReturnType<typeof resolveUnits>): ChartSpec {
  const title = 'Moment envelope along the beam';
  const yLabel = 'Moment M (sagging +)';
  const elastic = result.elastic;
  if (!elastic || elastic.stations.x.length === 0) {
    return { ...empty('span-distribution', title, 'No moment envelope: the beam was not analysed.'), x: axisFor('Position x from the left end', unitText('spanLength', units), 1, { includeZero: true }), y: axisFor(yLabel, unitText('moment', units), 1, { includeZero: true }) };
  }
  const env = elastic.envelopes.strength.moment;
  const checks = result.checks;
  const resistances = checks?.resistances ?? [];
  const frame = envelopeFrame(result, elastic.stations.x, 'moment', [...env.max.value, ...env.min.value, ...resistances.flatMap((r) => [r.sagging ?? 0, -(r.hogging ?? 0)])], units);
  const steps = (sense: 'sagging' | 'hogging'): ChartPoint[] => resistances.flatMap((r): ChartPoint[] => {
    const m = r[sense];
    if (m === null) return [null];
    const y = frame.Y(sense === 'sagging' ? m : -m);
    return [{ x: frame.X(r.from), y }, { x: frame.X(r.to), y }];
  });
  const resistanceName = code === 'ACI 318-19' ? 'φMn' : 'M_Rd';
  const series: SeriesSpec[] = [
    { id: 'sagging', label: 'largest sagging moment (strength combinations, every arrangement)', points: frame.line(env.max.value), colour: 'blue', style: 'solid', width: 1.8 },
    { id: 'hogging', label: 'largest hogging moment', points: frame.line(env.min.value), colour: 'red', style: 'solid', width: 1.8 },
  ];
  if (resistances.length > 0) {
    series.push({ id: 'resistance-sagging', label: `design resistance ${resistanceName}, sagging`, points: steps('sagging'), colour: 'green', style: 'dashed', width: 1.3 });
    series.push({ id: 'resistance-hogging', label: `design resistance ${resistanceName}, hogging`, points: steps('hogging'), colour: 'green', style: 'dotted', width: 1.3 });
  }
  const markers: MarkerSpec[] = [];
  if (checks) {
    const g = checks.flexureGoverning;
    const x = frame.X(g.x);
    const y = frame.Y(g.direction === 'sagging' ? g.demand : -g.demand);
    if (finite(x) && finite(y)) markers.push({ x, y, label: `governing: ${g.utilisation.toFixed(2)} (${g.part}, ${g.direction})`, shape: 'star', colour: checks.flexure.pass ? 'blue' : 'red' });
  }
  const n = elastic.arrangements.length;
  return {
    kind: 'span-distribution',
    title,
    subtitle: elastic.envelopes.strength.description,
    x: frame.xAxis,
    y: axisFor(yLabel, unitText('moment', units), frame.yScale, { includeZero: true }),
    series,
    markers,
    bands: [],
    referenceLines: frame.supports,
    notes: [`Elastic analysis on gross sections; envelope over ${n} live-load arrangement${n === 1 ? '' : 's'} (ACI 318-19 6.4.2, EN 1992-1-1 5.1.3).`],
  };
}

/** The report's shear chart: |V| of the strength envelope against the design and nominal shear strength, and the shear at the largest load of the analysis to failure. */
function designShearChart(result: ContinuousMemberResult, code: CodeBasis, units: ReturnType<typeof resolveUnits>): ChartSpec {
  const title = 'Shear envelope along the beam';
  const yLabel = 'Shear |V|';
  const shear = result.checks?.shear;
  const d = shear?.diagram;
  if (!shear || !d || d.x.length === 0) {
    return { ...empty('shear-diagram', title, 'No shear envelope: the station checks were not made.'), x: axisFor('Position x from the left end', unitText('spanLength', units), 1, { includeZero: true }), y: axisFor(yLabel, unitText('force', units), 1, { includeZero: true }) };
  }
  const frame = envelopeFrame(result, d.x, 'force', [...d.factored, ...(d.mechanism ?? []), ...d.design, ...d.nominal], units);
  const aci = code === 'ACI 318-19';
  const series: SeriesSpec[] = [
    { id: 'design', label: `design shear strength ${aci ? 'φVn' : 'VRd'}`, points: frame.line(d.design), colour: 'green', style: 'solid', width: 1.8 },
    { id: 'nominal', label: `nominal shear strength ${aci ? 'Vn' : 'VRk (γ = 1)'}`, points: frame.line(d.nominal), colour: 'green', style: 'dotted', width: 1.4 },
    { id: 'factored', label: 'largest factored shear (every combination and arrangement)', points: frame.line(d.factored), colour: 'blue', style: 'solid', width: 1.8 },
  ];
  if (d.mechanism) series.push({ id: 'mechanism', label: 'shear at the largest load of the analysis to failure', points: frame.line(d.mechanism), colour: 'orange', style: 'dashed', width: 1.5 });
  const g = shear.governing;
  const gx = frame.X(g.x);
  const gy = frame.Y(g.demand);
  return {
    kind: 'shear-diagram',
    title,
    subtitle: aci ? 'ACI 318-19 22.5, φ = 0.75' : 'EN 1992-1-1 6.2',
    x: frame.xAxis,
    y: axisFor(yLabel, unitText('force', units), frame.yScale, { includeZero: true }),
    series,
    markers: finite(gx) && finite(gy) ? [{ x: gx, y: gy, label: `governing: ${g.utilisation.toFixed(2)} (${g.part})`, shape: 'star', colour: shear.pass ? 'blue' : 'red' }] : [],
    bands: [],
    referenceLines: frame.supports,
    notes: shear.governs === 'shear' ? ['Shear governs: the nominal shear strength is reached before the flexural mechanism (brittle).'] : [],
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
