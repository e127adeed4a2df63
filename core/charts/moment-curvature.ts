/**
 * Moment–curvature chart: the computed curve(s) of a section, the bilinear idealisation and the
 * key points (cracking, first yield, code crushing strain, nominal, peak, ultimate) as labelled
 * markers. Curvatures and moments are magnitudes in each curve's bending direction.
 */
import type { SectionResult } from '../member/results.ts';
import type { KeyPointName, MomentCurvatureResult } from '../section/results.ts';
import type { BendingDirection } from '../section/model.ts';
import { say } from '../units/phrase.ts';
import { KEY_POINT_LABELS } from './moment-names.ts';
import { SERIES_COLOURS } from './palette.ts';
import type { ChartPoint, ChartSpec, MarkerShape, MarkerSpec, SeriesSpec, UnitsInput } from './types.ts';
import { axisFor, axisScale, display, finite, resolveUnits, unitText } from './units.ts';

/** Order in which key points are listed and drawn. */
export const KEY_POINT_ORDER: readonly KeyPointName[] = ['cracking', 'firstYield', 'codeCrushing', 'nominal', 'peak', 'ultimate'];

/** Short marker label of each key point (one set of names: moment-names.ts). */
export { KEY_POINT_LABELS } from './moment-names.ts';

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
  /**
   * `panels`: each bending direction in a panel of its own, side by side, sharing the moment axis
   * and the curvature factor (a hogging curve that ends at a twentieth of the sagging curvature
   * still fills its panel); `overlay`: every curve on one pair of axes. Default: panels when the
   * curves are of both directions, else overlay.
   */
  readonly layout?: 'panels' | 'overlay';
  /**
   * Power-of-ten factor of the curvature (and the moment) axis, display units. Default: from the
   * curves drawn. Views of one section in one direction and in both pass the section's factor
   * (`sectionMomentCurvatureScales`), so that the same curvature reads the same in each.
   */
  readonly curvatureScale?: number;
  readonly momentScale?: number;
}

/** Curvature and moment factors of a section's curves in every direction it was analysed in (display units of `units`). */
export function sectionMomentCurvatureScales(section: SectionResult, unitsInput: UnitsInput): { curvatureScale: number; momentScale: number } {
  const units = resolveUnits(unitsInput);
  const curves = [section.sagging, section.hogging].filter((c): c is MomentCurvatureResult => c !== undefined);
  return scalesOf(curves, units);
}

function scalesOf(curves: readonly MomentCurvatureResult[], units: ReturnType<typeof resolveUnits>): { curvatureScale: number; momentScale: number } {
  const curvatureValues: number[] = [];
  const momentValues: number[] = [];
  for (const curve of curves) {
    for (const p of curve.points) {
      curvatureValues.push(display('curvature', p.curvature, units));
      momentValues.push(display('moment', p.moment, units));
    }
  }
  return { curvatureScale: axisScale(curvatureValues), momentScale: axisScale(momentValues) };
}

/**
 * Chart spec of one or more moment–curvature curves.
 * Units: the results' curvature (1/mm) and moment (N·mm) are converted to the display units of
 * `units` (e.g. 1/m and kN·m in SI; 1/in and kip·ft in US); a power-of-ten factor is moved into
 * the axis label when the numbers would be very small or large.
 * Layout: curves of both bending directions are drawn in two panels side by side (sagging left,
 * hogging right, on axes `x` and `x2`), sharing the moment axis and the curvature factor.
 * Degenerate cases: a curve with no points gives no series; when no curve has points the spec
 * carries `emptyMessage`. A curve that did not converge is plotted up to where it stopped and its
 * status message is added to `notes`.
 */
export function momentCurvatureChart(result: MomentCurvatureResult | readonly CurveInput[], unitsInput: UnitsInput, options: MomentCurvatureChartOptions = {}): ChartSpec {
  const units = resolveUnits(unitsInput);
  const curves: readonly CurveInput[] = Array.isArray(result) ? (result as readonly CurveInput[]) : [{ curve: result as MomentCurvatureResult }];
  const wanted = options.keyPoints ?? KEY_POINT_ORDER;
  const own = scalesOf(curves.map((c) => c.curve), units);
  const xScale = options.curvatureScale ?? own.curvatureScale;
  const yScale = options.momentScale ?? own.momentScale;
  const directions = [...new Set(curves.filter((c) => c.curve.points.length > 0).map((c) => c.curve.direction))];
  const panels = (options.layout ?? (directions.length > 1 ? 'panels' : 'overlay')) === 'panels' && directions.length > 1;
  /** The x axis of a curve: the first direction on `x`, the second (hogging) on `x2` in panels. */
  const axisOf = (curve: MomentCurvatureResult): 'x' | 'x2' => (panels && curve.direction !== directions[0] ? 'x2' : 'x');
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
    const xAxis = axisOf(curve);
    const onAxis = xAxis === 'x2' ? { xAxis } : {};
    const points = curve.points.map((p) => point(p.curvature, p.moment)).filter((p): p is NonNullable<ChartPoint> => p !== null);
    if (points.length > 0) {
      series.push({ id: `curve-${index}`, label: `computed, ${name}`, points, colour, style: 'solid', width: 1.8, ...onAxis });
    }
    const bilinear = curve.bilinear;
    if ((options.showBilinear ?? true) && bilinear) {
      const idealised = [point(0, 0), point(bilinear.yieldCurvature, bilinear.yieldMoment), point(bilinear.ultimateCurvature, bilinear.ultimateMoment)].filter((p): p is NonNullable<ChartPoint> => p !== null);
      if (idealised.length === 3) series.push({ id: `bilinear-${index}`, label: `bilinear idealisation, ${name}`, points: idealised, colour, style: 'dashed', width: 1.2, ...onAxis });
    }
    for (const key of KEY_POINT_ORDER) {
      const kp = curve.keyPoints[key];
      if (!kp || !wanted.includes(key)) continue;
      const p = point(kp.curvature, kp.moment);
      if (!p) continue;
      // In panels the panel names the direction; on shared axes the label does.
      const text = curves.length > 1 && !panels ? `${KEY_POINT_LABELS[key]} (${name})` : KEY_POINT_LABELS[key];
      markers.push({ x: p.x, y: p.y, label: text, shape: KEY_POINT_SHAPES[key], colour, ...onAxis });
    }
    if (curve.status.kind === 'not-converged') notes.push(`${name}: ${say(curve.status.message, units.system)}`);
  });

  const curvatureUnit = unitText('curvature', units);
  const panelAxis = (direction: string) => axisFor(`Curvature φ, ${direction}`, curvatureUnit, xScale, { includeZero: true, stack: 'panels', panelMargin: 0.04 });
  const spec: ChartSpec = {
    kind: 'moment-curvature',
    title: options.title ?? 'Moment–curvature',
    subtitle: options.subtitle ?? '',
    x: panels ? panelAxis(directions[0]!) : axisFor('Curvature φ', curvatureUnit, xScale, { includeZero: true }),
    ...(panels ? { x2: panelAxis(directions[1]!) } : {}),
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
 * Moment–curvature chart of a section in the directions asked for (default: every direction it
 * was analysed in; both side by side in panels), titled with the section name. The axis factors
 * are those of the section's curves in every direction, whichever are drawn, so that a curvature
 * reads the same in the sagging, hogging and both-direction views. Units as for
 * `momentCurvatureChart`.
 */
export function sectionMomentCurvatureChart(section: SectionResult, units: UnitsInput, options: MomentCurvatureChartOptions & { readonly directions?: readonly BendingDirection[] } = {}): ChartSpec {
  const wanted = options.directions ?? ['sagging', 'hogging'];
  const curves: CurveInput[] = [];
  if (section.sagging && wanted.includes('sagging')) curves.push({ curve: section.sagging, label: 'sagging' });
  if (section.hogging && wanted.includes('hogging')) curves.push({ curve: section.hogging, label: 'hogging' });
  const subtitle = curves.length === 1 ? `${curves[0]!.label} bending` : undefined;
  return momentCurvatureChart(curves, units, {
    title: `Moment–curvature, section ${section.sectionName}`,
    ...(subtitle ? { subtitle } : {}),
    ...sectionMomentCurvatureScales(section, units),
    ...options,
  });
}
