/**
 * Load–deflection chart of a member: the capacity curve at the control point, its events
 * (cracking, first yield, hinges, peak, mechanism, ultimate) as labelled markers, the service
 * load level (λ = 1) and the nominal yield and ultimate deflections that define the displacement
 * ductility.
 */
import type { MemberEventKind } from '../member/results.ts';
import { OUTSIDE_SMALL_DEFLECTION, SMALL_DEFLECTION_RATIO } from '../member/small-deflection.ts';
import { formatQuantity } from '../units/format.ts';
import type { ChartPoint, ChartSpec, MarkerShape, MarkerSpec, ReferenceLineSpec, SeriesSpec, UnitsInput } from './types.ts';
import { axisFor, axisScale, display, finite, resolveUnits, unitFor, unitText } from './units.ts';
import type { MemberResult } from '../assessment/results.ts';

/** Short names of the load–deflection events, shared by the chart and the report's event table. */
export const EVENT_WORDS: Readonly<Record<MemberEventKind, string>> = {
  cracking: 'cracking',
  'first-yield': 'first yield',
  hinge: 'hinge at peak moment',
  'code-ultimate': 'code ultimate',
  peak: 'peak load',
  mechanism: 'mechanism',
  ultimate: 'ultimate',
};

const EVENT_SHAPES: Readonly<Record<MemberEventKind, MarkerShape>> = {
  cracking: 'circle',
  'first-yield': 'triangle',
  hinge: 'diamond',
  'code-ultimate': 'triangle',
  peak: 'star',
  mechanism: 'square',
  ultimate: 'cross',
};

/** Events from least to most significant: a shared marker takes the shape of the most significant. */
const EVENT_RANK: readonly MemberEventKind[] = ['cracking', 'first-yield', 'hinge', 'code-ultimate', 'peak', 'mechanism', 'ultimate'];

/**
 * Chart spec of a member's load–deflection curve.
 * Units: deflection (mm, downward positive) and total pattern load (N) are converted to display
 * units (mm / in, kN / kip); positions in marker labels in span units (m / ft).
 * Events at the same load factor and deflection share one marker whose label names them all. Degenerate cases: no points → `emptyMessage`; an analysis that
 * did not complete has its status in `notes`.
 */
export function loadDeflectionChart(member: MemberResult, unitsInput: UnitsInput): ChartSpec {
  const units = resolveUnits(unitsInput);
  const ld = member.loadDeflection;
  const xValues = ld.points.map((p) => display('deflection', p.deflection, units));
  const yValues = ld.points.map((p) => display('force', p.totalLoad, units));
  const xScale = axisScale(xValues);
  const yScale = axisScale(yValues);
  const toPoint = (deflection: number, load: number): ChartPoint => {
    const x = display('deflection', deflection, units) / xScale;
    const y = display('force', load, units) / yScale;
    return finite(x) && finite(y) ? { x, y } : null;
  };
  // Load per unit load factor, N (the pattern is proportional to λ).
  const last = [...ld.points].reverse().find((p) => p.loadFactor > 0 && finite(p.totalLoad / p.loadFactor));
  const loadPerFactor = last ? last.totalLoad / last.loadFactor : null;
  const loadAt = (lambda: number) => (loadPerFactor === null ? null : lambda * loadPerFactor);

  // Series: the integration stage, then the mechanism stage (sharing the joint point).
  const series: SeriesSpec[] = [];
  const stages: { stage: 'integration' | 'mechanism'; points: NonNullable<ChartPoint>[] }[] = [];
  for (const p of ld.points) {
    const q = toPoint(p.deflection, p.totalLoad);
    if (!q) continue;
    const current = stages[stages.length - 1];
    if (!current || current.stage !== p.stage) {
      const joint = current?.points[current.points.length - 1];
      stages.push({ stage: p.stage, points: joint ? [joint, q] : [q] });
    } else {
      current.points.push(q);
    }
  }
  // A stage that does not advance (the mechanism stage of a beam whose last hinge ends the curve
  // at once) draws nothing: it gets no series and so no legend entry.
  const advances = (points: readonly NonNullable<ChartPoint>[]) => points.some((p) => p.x !== points[0]!.x || p.y !== points[0]!.y);
  stages.filter((s) => advances(s.points)).forEach((s, i, drawn) => {
    series.push({
      id: `stage-${i}`,
      label: s.stage === 'integration' ? 'curvature integrated along the span' : 'mechanism (hinge rotation control)',
      points: s.points,
      colour: s.stage === 'integration' ? 'blue' : 'orange',
      style: s.stage === 'integration' ? 'solid' : 'dashed',
      width: 1.8,
      hideInLegend: drawn.findIndex((t) => t.stage === s.stage) !== i,
    });
  });

  // Markers: events at the same load level and deflection (e.g. first yield at both supports of a
  // symmetric beam, or the last hinge, the mechanism and ultimate together) share one marker.
  const markers: MarkerSpec[] = [];
  const spanText = (x: number) => formatQuantity('spanLength', x, units.system, { decimals: 2, unit: unitFor('spanLength', units) });
  const near = (a: number, b: number) => Math.abs(a - b) <= 1e-6 * Math.max(1, Math.abs(a), Math.abs(b));
  const groups: { loadFactor: number; deflection: number; kinds: MemberEventKind[]; positions: number[] }[] = [];
  for (const e of ld.events) {
    const same = groups.find((g) => near(g.loadFactor, e.loadFactor) && near(g.deflection, e.deflection));
    const group = same ?? { loadFactor: e.loadFactor, deflection: e.deflection, kinds: [], positions: [] };
    if (!same) groups.push(group);
    if (!group.kinds.includes(e.kind)) group.kinds.push(e.kind);
    if (!group.positions.some((p) => near(p, e.position))) group.positions.push(e.position);
  }
  for (const g of groups) {
    const load = loadAt(g.loadFactor);
    if (load === null) continue;
    const p = toPoint(g.deflection, load);
    if (!p) continue;
    const main = [...g.kinds].sort((a, b) => EVENT_RANK.indexOf(b) - EVENT_RANK.indexOf(a))[0]!;
    markers.push({ x: p.x, y: p.y, label: `${g.kinds.map((k) => EVENT_WORDS[k]).join(', ')} (x = ${g.positions.map(spanText).join(' and ')})`, shape: EVENT_SHAPES[main], colour: main === 'ultimate' ? 'red' : 'ink' });
  }

  const referenceLines: ReferenceLineSpec[] = [];
  const service = loadAt(1);
  if (service !== null && ld.points.length > 0) {
    const y = display('force', service, units) / yScale;
    if (finite(y)) referenceLines.push({ axis: 'y', value: y, label: 'service load (λ = 1)', colour: 'green', style: 'dashed' });
  }
  const d = member.ductility;
  if (finite(d.yieldDeflection)) {
    referenceLines.push({ axis: 'x', value: display('deflection', d.yieldDeflection, units) / xScale, label: 'Δy (nominal yield)', colour: 'grey', style: 'dotted' });
  }
  if (finite(d.ultimateDeflection)) {
    referenceLines.push({ axis: 'x', value: display('deflection', d.ultimateDeflection, units) / xScale, label: 'Δu', colour: 'grey', style: 'dotted' });
  }

  // A curve beyond span/50 before its ultimate: the limit of the method drawn, the reason noted (no Δu line above).
  if (member.ultimateOutsideRange && member.span > 0) {
    const limit = display('deflection', member.span / SMALL_DEFLECTION_RATIO, units) / xScale;
    if (finite(limit)) referenceLines.push({ axis: 'x', value: limit, label: `span/${SMALL_DEFLECTION_RATIO}: end of the small-deflection range`, colour: 'red', style: 'dashed' });
  }
  const notes: string[] = [];
  if (ld.status !== 'complete' && ld.points.length > 0) notes.push(`Curve status: ${ld.status}.`);
  if (member.ultimateOutsideRange) notes.push(`Beyond span/${SMALL_DEFLECTION_RATIO} the curve is ${OUTSIDE_SMALL_DEFLECTION}: Δu and μΔ are not given.`);
  const liveOnly = ld.pattern.startsWith('live');
  const spec: ChartSpec = {
    kind: 'load-deflection',
    title: 'Load–deflection',
    subtitle: `${ld.pattern}; deflection at x = ${spanText(ld.controlPosition)}`,
    x: axisFor('Deflection Δ', unitText('deflection', units), xScale, { includeZero: true }),
    y: axisFor(liveOnly ? 'Live load P (dead load held)' : 'Total load P', unitText('force', units), yScale, { includeZero: true }),
    series,
    markers,
    bands: [],
    referenceLines,
    notes,
  };
  return series.length === 0 ? { ...spec, emptyMessage: `No load–deflection curve: ${ld.status}.` } : spec;
}
