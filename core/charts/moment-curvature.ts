/**
 * Moment–curvature chart: the computed curve(s) of a section, the bilinear idealisation and the
 * key points (cracking, first yield, code crushing strain, nominal, peak, ultimate) as labelled
 * markers. Curvatures and moments are magnitudes in each curve's bending direction.
 */
import type { SectionResult } from '../member/results.ts';
import type { KeyPointName, MomentCurvatureResult } from '../section/results.ts';
import { SERIES_COLOURS } from './palette.ts';
import type { ChartPoint, ChartSpec, MarkerShape, MarkerSpec, SeriesSpec, UnitsInput } from './types.ts';
import { axisFor, axisScale, display, finite, resolveUnits, unitText } from './units.ts';

/** Order in which key points are listed and drawn. */
export const KEY_POINT_ORDER: readonly KeyPointName[] = ['cracking', 'firstYield', 'codeCrushing', 'nominal', 'peak', 'ultimate'];

/** Short marker label of each key point (plain words; the report's table gives the definitions). */
export const KEY_POINT_LABELS: Readonly<Record<KeyPointName, string>> = {
  cracking: 'cracking',
  firstYield: 'first yield',
  codeCrushing: 'code crushing strain',
  nominal: 'nominal (Mn)',
  peak: 'peak',
  ultimate: 'ultimate',
};

const KEY_POINT_SHAPES: Readonly<Record<KeyPointName, MarkerShape>> = {
  cracking: 'circle',
  firstYield: 'triangle',
  codeCrushing: 'diamond',
  nominal: 'square',
  peak: 'star',
  ultimate: 'cross',
};

/** One curve to plot and the words that name it in the legend (e.g. `sagging`). */
export interface CurveInput {
  readonly curve: MomentCurvatureResult;
  readonly label?: string;
}

export interface MomentCurvatureChartOptions {
  /** Chart title (default `Moment–curvature`). */
  readonly title?: string;
  readonly subtitle?: string;
  /** Draw the bilinear idealisation (default true). */
  readonly showBilinear?: boolean;
  /** Key points drawn as markers (default all six). */
  readonly keyPoints?: readonly KeyPointName[];
}

/**
 * Chart spec of one or more moment–curvature curves.
 * Units: the results' curvature (1/mm) and moment (N·mm) are converted to the display units of
 * `units` (e.g. 1/m and kN·m in SI; 1/in and kip·ft in US); a power-of-ten factor is moved into
 * the axis label when the numbers would be very small or large.
 * Degenerate cases: a curve with no points gives no series; when no curve has points the spec
 * carries `emptyMessage`. A curve that did not converge is plotted up to where it stopped and its
 * status message is added to `notes`.
 */
export function momentCurvatureChart(result: MomentCurvatureResult | readonly CurveInput[], unitsInput: UnitsInput, options: MomentCurvatureChartOptions = {}): ChartSpec {
  const units = resolveUnits(unitsInput);
  const curves: readonly CurveInput[] = Array.isArray(result) ? (result as readonly CurveInput[]) : [{ curve: result as MomentCurvatureResult }];
  const wanted = options.keyPoints ?? KEY_POINT_ORDER;
  const curvatureValues: number[] = [];
  const momentValues: number[] = [];
  for (const { curve } of curves) {
    for (const p of curve.points) {
      curvatureValues.push(display('curvature', p.curvature, units));
      momentValues.push(display('moment', p.moment, units));
    }
  }
  const xScale = axisScale(curvatureValues);
  const yScale = axisScale(momentValues);
  const point = (curvature: number, moment: number): ChartPoint => {
    const x = display('curvature', curvature, units) / xScale;
    const y = display('moment', moment, units) / yScale;
    return finite(x) && finite(y) ? { x, y } : null;
  };

  const series: SeriesSpec[] = [];
  const markers: MarkerSpec[] = [];
  const notes: string[] = [];
  curves.forEach(({ curve, label }, index) => {
    const colour = SERIES_COLOURS[index % SERIES_COLOURS.length]!;
    const name = label ?? curve.direction;
    const points = curve.points.map((p) => point(p.curvature, p.moment)).filter((p): p is NonNullable<ChartPoint> => p !== null);
    if (points.length > 0) {
      series.push({ id: `curve-${index}`, label: `computed, ${name}`, points, colour, style: 'solid', width: 1.8 });
    }
    const bilinear = curve.bilinear;
    if ((options.showBilinear ?? true) && bilinear) {
      const idealised = [point(0, 0), point(bilinear.yieldCurvature, bilinear.yieldMoment), point(bilinear.ultimateCurvature, bilinear.ultimateMoment)].filter((p): p is NonNullable<ChartPoint> => p !== null);
      if (idealised.length === 3) series.push({ id: `bilinear-${index}`, label: `bilinear idealisation, ${name}`, points: idealised, colour, style: 'dashed', width: 1.2 });
    }
    for (const key of KEY_POINT_ORDER) {
      const kp = curve.keyPoints[key];
      if (!kp || !wanted.includes(key)) continue;
      const p = point(kp.curvature, kp.moment);
      if (!p) continue;
      markers.push({ x: p.x, y: p.y, label: curves.length > 1 ? `${KEY_POINT_LABELS[key]} (${name})` : KEY_POINT_LABELS[key], shape: KEY_POINT_SHAPES[key], colour });
    }
    if (curve.status.kind === 'not-converged') notes.push(`${name}: ${curve.status.message}`);
  });

  const spec: ChartSpec = {
    kind: 'moment-curvature',
    title: options.title ?? 'Moment–curvature',
    subtitle: options.subtitle ?? '',
    x: axisFor('Curvature φ', unitText('curvature', units), xScale, { includeZero: true }),
    y: axisFor('Moment M', unitText('moment', units), yScale, { includeZero: true }),
    series,
    markers,
    bands: [],
    referenceLines: [],
    notes,
  };
  return series.length === 0 ? { ...spec, emptyMessage: 'No moment–curvature curve to show (no tension reinforcement in this direction, or the section could not be analysed).' } : spec;
}

/**
 * Moment–curvature chart of a section with every direction it was analysed in (sagging and/or
 * hogging), titled with the section name. Units as for `momentCurvatureChart`.
 */
export function sectionMomentCurvatureChart(section: SectionResult, units: UnitsInput, options: MomentCurvatureChartOptions = {}): ChartSpec {
  const curves: CurveInput[] = [];
  if (section.sagging) curves.push({ curve: section.sagging, label: 'sagging' });
  if (section.hogging) curves.push({ curve: section.hogging, label: 'hogging' });
  return momentCurvatureChart(curves, units, { title: `Moment–curvature, section ${section.sectionName}`, ...options });
}
