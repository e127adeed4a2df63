/**
 * Existing beams: the design beam, the beam as found and each strengthening scheme on the same
 * charts (moment–curvature of one section and direction, load–deflection of the member), and
 * drawings of their sections with what the condition removed and what a scheme adds. Everything
 * is read from core/assessment's RetrofitResult (compact variants); nothing is recomputed.
 *
 * Units: curvature 1/mm, moment N·mm, deflection mm, load N → display units.
 */
import type { RetrofitResult, VariantResult, VariantSection } from '../assessment/results.ts';
import type { SectionDefinition } from '../section/definition.ts';
import type { BendingDirection } from '../section/model.ts';
import type { UltimateCause } from '../section/results.ts';
import { shapeOutline } from '../section/shapes.ts';
import { sectionDrawingSvg, type SectionDrawing, type SectionDrawingOptions } from './section-drawing.ts';
import type { ChartColour, ChartPoint, ChartSpec, LineStyle, MarkerSpec, SeriesSpec, UnitsInput } from './types.ts';
import { axisFor, axisScale, display, finite, resolveUnits, unitText } from './units.ts';

/** A variant as the charts and tables show it: its result, its name, and how it is drawn. */
export interface ShownVariant {
  readonly key: string;
  readonly label: string;
  readonly variant: VariantResult;
  readonly colour: ChartColour;
  readonly style: LineStyle;
  /** 'design' (the beam as designed, for reference), 'reference' (what the schemes are compared with) or 'scheme'. */
  readonly role: 'design' | 'reference' | 'scheme';
}

const SCHEME_COLOURS: readonly ChartColour[] = ['orange', 'green', 'purple', 'teal', 'red', 'gold'];

/** What ends a curve, in a few words (the chart's marker labels). */
export const ULTIMATE_WORDS: Readonly<Record<UltimateCause, string>> = {
  'concrete-crushing': 'concrete crushing',
  'core-crushing': 'core crushing',
  'steel-rupture': 'bar rupture',
  'frp-rupture': 'FRP rupture',
  'frp-debonding': 'FRP debonding',
  'moment-drop': 'moment drop',
};

/**
 * The variants of an existing beam in the order every view lists them: the design beam (only when
 * an as-found beam differs from it), the beam the schemes are compared with, then each scheme that
 * could be analysed.
 */
export function shownVariants(retrofit: RetrofitResult): ShownVariant[] {
  const out: ShownVariant[] = [];
  const asFound = retrofit.asFound?.variant ?? null;
  if (asFound && retrofit.original) out.push({ key: 'original', label: 'design beam', variant: retrofit.original, colour: 'grey', style: 'dotted', role: 'design' });
  const reference = asFound ?? retrofit.original;
  if (reference) out.push({ key: reference.key, label: asFound ? 'as found' : 'design beam', variant: reference, colour: 'blue', style: 'solid', role: 'reference' });
  retrofit.schemes.forEach((s, i) => {
    if (s.variant) out.push({ key: s.schemeId, label: s.name, variant: s.variant, colour: SCHEME_COLOURS[i % SCHEME_COLOURS.length]!, style: 'solid', role: 'scheme' });
  });
  return out;
}

/** The section of a variant that stands for a library section. */
export function variantSection(variant: VariantResult, baseSectionId: string): VariantSection | undefined {
  return variant.sections.find((s) => s.baseSectionId === baseSectionId);
}

/**
 * Moment–curvature of one section in one direction for every variant on one pair of axes, first
 * yield and ultimate of each marked.
 * Degenerate cases: no variant has the curve → `emptyMessage`.
 */
export function variantMomentCurvatureChart(retrofit: RetrofitResult, baseSectionId: string, direction: BendingDirection, unitsInput: UnitsInput): ChartSpec {
  const units = resolveUnits(unitsInput);
  const curves = shownVariants(retrofit).flatMap((v) => {
    const curve = variantSection(v.variant, baseSectionId)?.curves.find((c) => c.direction === direction);
    return curve && curve.points.length > 0 ? [{ v, curve }] : [];
  });
  const xScale = axisScale(curves.flatMap(({ curve }) => curve.points.map((p) => display('curvature', p.curvature, units))));
  const yScale = axisScale(curves.flatMap(({ curve }) => curve.points.map((p) => display('moment', p.moment, units))));
  const point = (curvature: number, moment: number): ChartPoint => {
    const x = display('curvature', curvature, units) / xScale;
    const y = display('moment', moment, units) / yScale;
    return finite(x) && finite(y) ? { x, y } : null;
  };
  const series: SeriesSpec[] = [];
  const markers: MarkerSpec[] = [];
  for (const { v, curve } of curves) {
    series.push({ id: `mc-${v.key}`, label: v.label, points: curve.points.map((p) => point(p.curvature, p.moment)), colour: v.colour, style: v.style, width: v.role === 'design' ? 1.3 : 1.8 });
    const fy = curve.keyPoints.find((k) => k.name === 'firstYield');
    const u = curve.keyPoints.find((k) => k.name === 'ultimate');
    const p1 = fy ? point(fy.curvature, fy.moment) : null;
    const p2 = u ? point(u.curvature, u.moment) : null;
    if (p1) markers.push({ ...p1, label: '', shape: 'triangle', colour: v.colour });
    if (p2) markers.push({ ...p2, label: v.role === 'scheme' && curve.ultimateCause ? ULTIMATE_WORDS[curve.ultimateCause] : '', shape: 'cross', colour: v.colour });
  }
  const spec: ChartSpec = {
    kind: 'moment-curvature',
    title: `Moment–curvature, section ${baseSectionId}, ${direction}`,
    subtitle: 'each variant: first yield (triangle), ultimate (cross)',
    x: axisFor('Curvature φ', unitText('curvature', units), xScale, { includeZero: true }),
    y: axisFor('Moment M', unitText('moment', units), yScale, { includeZero: true }),
    series,
    markers,
    bands: [],
    referenceLines: [],
    notes: [],
  };
  return series.length === 0 ? { ...spec, emptyMessage: `No ${direction} moment–curvature curve of section "${baseSectionId}" to compare.` } : spec;
}

/**
 * Load–deflection of every variant at its control point, the service load level (λ = 1 of the
 * beam the schemes are compared with) and each curve's ultimate marked.
 * Degenerate cases: no variant has points → `emptyMessage`.
 */
export function variantLoadDeflectionChart(retrofit: RetrofitResult, unitsInput: UnitsInput): ChartSpec {
  const units = resolveUnits(unitsInput);
  const variants = shownVariants(retrofit).filter((v) => v.variant.loadDeflection.points.length > 0);
  const xScale = axisScale(variants.flatMap((v) => v.variant.loadDeflection.points.map((p) => display('deflection', p.deflection, units))));
  const yScale = axisScale(variants.flatMap((v) => v.variant.loadDeflection.points.map((p) => display('force', p.totalLoad, units))));
  const point = (deflection: number, load: number): ChartPoint => {
    const x = display('deflection', deflection, units) / xScale;
    const y = display('force', load, units) / yScale;
    return finite(x) && finite(y) ? { x, y } : null;
  };
  const series: SeriesSpec[] = [];
  const markers: MarkerSpec[] = [];
  let service: number | null = null;
  for (const v of variants) {
    const ld = v.variant.loadDeflection;
    series.push({ id: `ld-${v.key}`, label: v.label, points: ld.points.map((p) => point(p.deflection, p.totalLoad)), colour: v.colour, style: v.style, width: v.role === 'design' ? 1.3 : 1.8 });
    const last = [...ld.points].reverse().find((p) => p.loadFactor > 0 && finite(p.totalLoad / p.loadFactor));
    const perFactor = last ? last.totalLoad / last.loadFactor : null;
    if (v.role === 'reference' && perFactor !== null) service = perFactor;
    const ultimate = ld.events.find((e) => e.kind === 'ultimate');
    const p = ultimate && perFactor !== null ? point(ultimate.deflection, ultimate.loadFactor * perFactor) : null;
    if (p) markers.push({ ...p, label: '', shape: 'cross', colour: v.colour });
  }
  const liveOnly = variants[0]?.variant.loadDeflection.pattern.startsWith('live') ?? false;
  const referenceLines = service !== null && finite(display('force', service, units) / yScale)
    ? [{ axis: 'y' as const, value: display('force', service, units) / yScale, label: 'service load (λ = 1)', colour: 'green' as const, style: 'dashed' as const }]
    : [];
  const spec: ChartSpec = {
    kind: 'load-deflection',
    title: 'Load–deflection of each variant',
    subtitle: 'ultimate of each curve (cross)',
    x: axisFor('Deflection Δ', unitText('deflection', units), xScale, { includeZero: true }),
    y: axisFor(liveOnly ? 'Live load P (dead load held)' : 'Total load P', unitText('force', units), yScale, { includeZero: true }),
    series,
    markers,
    bands: [],
    referenceLines,
    notes: [],
  };
  return series.length === 0 ? { ...spec, emptyMessage: 'No load–deflection curve to compare.' } : spec;
}

/**
 * Drawing of a variant's section: the derived definition as analysed, what the variant adds
 * (overlay, FRP, plate, new bars; bars left outside the concrete by spalling), and — for a beam
 * that lost concrete — the original outline dashed.
 * @param original the library section the variant's section derives from (for the lost outline)
 * @param shift how far the top fibre moved down (mm, RetrofitResult.asFound.sections[].shift)
 */
export function variantSectionDrawing(section: VariantSection, original: SectionDefinition | null, shift: number, unitsInput: UnitsInput, options: SectionDrawingOptions = {}): SectionDrawing {
  let ghost: { outline: { x: number; y: number }[]; label: string } | undefined;
  if (original) {
    try {
      const a = JSON.stringify(shapeOutline(original.shape).outline);
      const b = JSON.stringify(shapeOutline(section.definition.shape).outline);
      if (a !== b && section.added.every((i) => i.kind !== 'overlay')) {
        ghost = { outline: shapeOutline(original.shape).outline.map((p) => ({ x: p.x, y: p.y - shift })), label: 'outline before the concrete was lost' };
      }
    } catch {
      ghost = undefined;
    }
  }
  return sectionDrawingSvg(section.definition, unitsInput, { ...options, additions: { items: section.added, ...(ghost ? { ghost } : {}) } });
}
