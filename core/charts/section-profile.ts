/**
 * Strain and stress over the depth of a section at one equilibrium state (e.g. at first yield or
 * at ultimate): the plane strain profile with the bars on it, and the concrete stress block with
 * the bar stresses on a second axis. Depth is drawn downward from the top fibre. Strains and
 * stresses keep the project's sign convention: compression positive.
 */
import type { SectionState } from '../section/results.ts';
import { formatQuantity } from '../units/format.ts';
import type { ChartSpec, MarkerSpec, ReferenceLineSpec, SeriesSpec, UnitsInput } from './types.ts';
import { SERIES_COLOURS } from './palette.ts';
import { axisFor, axisScale, display, engineeringText, finite, resolveUnits, unitFor, unitText } from './units.ts';
import type { DisplayUnits } from './types.ts';

export type ProfileKind = 'strain' | 'stress';

export interface SectionProfileOptions {
  /** Chart title (default `Strain over the depth` / `Stress over the depth`). */
  readonly title?: string;
  /** Subtitle (default: direction, curvature and moment of the state). */
  readonly subtitle?: string;
}

/** The short name of an element label: `layer 1: 3 × 20 mm` → `layer 1`. */
function shortLabel(label: string): string {
  const cut = label.indexOf(':');
  return cut > 0 ? label.slice(0, cut) : label;
}

function stateSubtitle(state: SectionState, units: DisplayUnits): string {
  const curvature = engineeringText(display('curvature', state.point.curvature, units), unitText('curvature', units));
  const moment = formatQuantity('moment', state.point.moment, units.system, { unit: unitFor('moment', units) });
  return `${state.direction}: φ = ${curvature}, M = ${moment}`;
}

/**
 * Chart spec of the strain (`kind = 'strain'`) or stress (`kind = 'stress'`) profile of a section
 * state. Units: depth mm → section display units (mm / in); strain → per mille by default; concrete
 * stress MPa → MPa / psi; steel stress MPa → MPa / ksi on the secondary (top) axis.
 * Degenerate cases: a state without concrete samples gives `emptyMessage`; a missing neutral axis
 * (zero curvature) draws no neutral-axis line.
 */
export function sectionProfileChart(state: SectionState, unitsInput: UnitsInput, kind: ProfileKind = 'strain', options: SectionProfileOptions = {}): ChartSpec {
  const units = resolveUnits(unitsInput);
  const depthScale = axisScale(state.concrete.map((s) => display('sectionLength', s.depth, units)));
  const depth = (y: number) => display('sectionLength', y, units) / depthScale;
  // Rounded to 6 figures so that float noise (24.000000000000004 in) never shows as a tick label.
  const depths = state.concrete.map((s) => Number(depth(s.depth).toPrecision(6))).filter(finite);
  const yAxis = axisFor('Depth below the top fibre', unitText('sectionLength', units), depthScale, depths.length > 0 ? { reverse: true, min: Math.min(...depths), max: Math.max(...depths) } : { reverse: true });
  const referenceLines: ReferenceLineSpec[] = [];
  const na = state.neutralAxisDepthFromTop;
  if (finite(na) && state.concrete.length > 0 && na >= state.concrete[0]!.depth && na <= state.concrete[state.concrete.length - 1]!.depth) {
    const naText = formatQuantity('sectionLength', na, units.system, { unit: unitFor('sectionLength', units) });
    referenceLines.push({ axis: 'y', value: depth(na), label: `neutral axis, ${naText} below the top`, colour: 'grey', style: 'dashed' });
  }
  const base = {
    subtitle: options.subtitle ?? stateSubtitle(state, units),
    y: yAxis,
    bands: [],
    notes: [] as string[],
  };
  const empty = state.concrete.length === 0 ? { emptyMessage: 'No section state to show.' } : {};

  if (kind === 'strain') {
    const xScale = axisScale([...state.concrete.map((s) => display('strain', s.strain, units)), ...state.elements.map((e) => display('strain', e.strain, units))]);
    const x = (strain: number) => display('strain', strain, units) / xScale;
    const series: SeriesSpec[] = [{
      id: 'concrete-strain',
      label: 'strain (plane section)',
      points: state.concrete.flatMap((s) => (finite(x(s.strain)) && finite(depth(s.depth)) ? [{ x: x(s.strain), y: depth(s.depth) }] : [])),
      colour: 'blue',
      style: 'solid',
      width: 1.8,
    }];
    const markers: MarkerSpec[] = state.elements.flatMap((e) => {
      const px = x(e.strain);
      const py = depth(e.depth);
      if (!finite(px) || !finite(py)) return [];
      const text = formatQuantity('strain', e.strain, units.system, { unit: unitFor('strain', units) });
      return [{ x: px, y: py, label: `${shortLabel(e.label)}: ${text}`, shape: e.kind === 'frp' ? 'square' as const : 'circle' as const, colour: 'ink' as const }];
    });
    referenceLines.push({ axis: 'x', value: 0, label: '', colour: 'ink', style: 'solid' });
    return {
      kind: 'strain-profile',
      title: options.title ?? 'Strain over the depth',
      x: axisFor('Strain ε, compression +', unitText('strain', units), xScale),
      series,
      markers,
      referenceLines,
      ...base,
      ...empty,
    };
  }

  // Stress: concrete parts grouped by role (cover / core / overlay), each contiguous run a closed block.
  const concreteScale = axisScale(state.concrete.flatMap((s) => s.stress.filter(finite).map((v) => display('concreteStress', v, units))));
  const steelScale = axisScale(state.elements.map((e) => display('stress', e.stress, units)));
  const cx = (stress: number) => display('concreteStress', stress, units) / concreteScale;
  const sx = (stress: number) => display('stress', stress, units) / steelScale;
  const roles: { role: string; label: string; indices: number[] }[] = [];
  state.concreteParts.forEach((part, i) => {
    const group = roles.find((r) => r.role === part.role);
    if (group) group.indices.push(i);
    else roles.push({ role: part.role, label: part.label.replace(/\s*\(tension-stiffening band\)/, ''), indices: [i] });
  });
  const series: SeriesSpec[] = [];
  roles.forEach((group, g) => {
    const colour = SERIES_COLOURS[g % SERIES_COLOURS.length]!;
    let run: { x: number; y: number }[] = [];
    let runs = 0;
    const close = () => {
      if (run.length >= 2) {
        const top = run[0]!.y;
        const bottom = run[run.length - 1]!.y;
        series.push({ id: `stress-${group.role}-${runs}`, label: group.label, points: [{ x: 0, y: top }, ...run, { x: 0, y: bottom }], colour, style: 'solid', width: 1.4, fill: true, hideInLegend: runs > 0 });
        runs += 1;
      }
      run = [];
    };
    for (const sample of state.concrete) {
      const value = group.indices.map((i) => sample.stress[i]).find((v): v is number => finite(v));
      const px = value === undefined ? Number.NaN : cx(value);
      const py = depth(sample.depth);
      if (finite(px) && finite(py)) run.push({ x: px, y: py });
      else close();
    }
    close();
  });
  const markers: MarkerSpec[] = [];
  state.elements.forEach((e, i) => {
    const px = sx(e.stress);
    const py = depth(e.depth);
    if (!finite(px) || !finite(py)) return;
    series.push({ id: `steel-${i}`, label: 'reinforcement stress (top axis)', points: [{ x: 0, y: py }, { x: px, y: py }], colour: 'ink', style: 'solid', width: 3, xAxis: 'x2', hideInLegend: i > 0 });
    const text = formatQuantity('stress', e.stress, units.system, { unit: unitFor('stress', units) });
    markers.push({ x: px, y: py, label: `${shortLabel(e.label)}: ${text}`, shape: 'circle', colour: 'ink', xAxis: 'x2' });
  });
  referenceLines.push({ axis: 'x', value: 0, label: '', colour: 'ink', style: 'solid' });
  // Both stress axes symmetric about zero, so that their zeros line up.
  const concreteLimit = niceCeiling(1.05 * Math.max(0, ...series.filter((s) => s.xAxis !== 'x2').flatMap((s) => s.points.map((p) => Math.abs(p?.x ?? 0)))));
  const steelLimit = niceCeiling(1.05 * Math.max(0, ...series.filter((s) => s.xAxis === 'x2').flatMap((s) => s.points.map((p) => Math.abs(p?.x ?? 0)))));
  return {
    kind: 'stress-profile',
    title: options.title ?? 'Stress over the depth',
    x: axisFor('Concrete stress σc, compression +', unitText('concreteStress', units), concreteScale, { min: -concreteLimit, max: concreteLimit }),
    x2: axisFor('Reinforcement stress σs, compression +', unitText('stress', units), steelScale, { min: -steelLimit, max: steelLimit, position: 'top' }),
    series,
    markers,
    referenceLines,
    ...base,
    ...empty,
  };
}

/**
 * Smallest "nice" number (1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6 or 8 times a power of ten) not below `value`; 1 for zero or a
 * non-finite value. // common practice, no source
 */
export function niceCeiling(value: number): number {
  if (!finite(value) || value <= 0) return 1;
  const power = 10 ** Math.floor(Math.log10(value));
  for (const step of [1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10]) if (step * power >= value * (1 - 1e-12)) return step * power;
  return 10 * power;
}

/** Strain profile of a state (see `sectionProfileChart`). */
export function strainProfileChart(state: SectionState, units: UnitsInput, options: SectionProfileOptions = {}): ChartSpec {
  return sectionProfileChart(state, units, 'strain', options);
}

/** Stress profile of a state (see `sectionProfileChart`). */
export function stressProfileChart(state: SectionState, units: UnitsInput, options: SectionProfileOptions = {}): ChartSpec {
  return sectionProfileChart(state, units, 'stress', options);
}
