/**
 * What the section drawing of the editor shows, as plain primitives in SVG pixels: the figure of
 * core/charts/section-geometry.ts (outline, hoop at its centreline, cover line, confined core, every
 * bar at its position) scaled to the space, with dimension lines, layer labels and a scale bar.
 * Drawn to scale: one factor for x and y.
 * Units: the definition in mm; labels in the display units of the project (core/units).
 */
import type { SectionDefinition } from '../../../core/section/definition.ts';
import type { Point } from '../../../core/section/shapes.ts';
import { labelNamesBars, sectionFigure, spreadLabels } from '../../../core/charts/section-geometry.ts';
import { barDesignation } from '../../../core/section/bar-designations.ts';
import { formatQuantity, toDisplay, unitLabel, fromDisplay } from '../../../core/units/index.ts';
import type { UnitSystem } from '../../../core/project/types.ts';
import { displaySystem } from '../project/units.ts';

export interface Rect { readonly x: number; readonly y: number; readonly w: number; readonly h: number }
export interface Dimension { readonly x1: number; readonly y1: number; readonly x2: number; readonly y2: number; readonly text: string; readonly vertical: boolean }
export interface DrawnBar { readonly cx: number; readonly cy: number; readonly r: number; readonly layer: number }
export interface LayerLabel { readonly layer: number; readonly text: string; readonly x: number; readonly y: number; readonly fromX: number; readonly fromY: number }

export interface SectionGeometry {
  readonly width: number;
  readonly height: number;
  readonly outline: string;
  readonly hoop: (Rect & { readonly rx: number; readonly stroke: number }) | null;
  /** Inner edge of the clear cover (outer face of the hoop), dashed. */
  readonly cover: Rect | null;
  /** The confined core (inside the hoop centreline), shaded when the core is modelled as confined. */
  readonly core: Rect | null;
  readonly bars: readonly DrawnBar[];
  readonly dimensions: readonly Dimension[];
  readonly labels: readonly LayerLabel[];
  readonly scaleBar: { readonly x: number; readonly y: number; readonly length: number; readonly text: string };
  /** Pixels per mm. */
  readonly scale: number;
  /** Why something could not be drawn (empty when all is drawn). */
  readonly problems: readonly string[];
}

export interface SectionGeometryOptions {
  /** Room for the whole drawing, pixels. */
  readonly maxWidth?: number;
  readonly maxHeight?: number;
  /** Width kept for the layer labels at the right, pixels. */
  readonly labelWidth?: number;
}

const finite = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);
/** Estimated advance of one character of the 11 px label font, pixels. */
const LABEL_CHAR_WIDTH = 6.2;

/** `bottom bars: 3 #8 at 21.5 in`, `3 × 23.7 mm at 545 mm` for a size without designation, or the area when the layer gives one. */
function layerText(layer: SectionDefinition['bars'][number], length: (mm: number) => string, display: 'SI' | 'US'): string {
  const designation = barDesignation(layer.diameter, display);
  const what = layer.count !== undefined && layer.diameter !== undefined
    ? designation ? `${layer.count} ${designation}` : `${layer.count} × ${length(layer.diameter)}`
    : formatQuantity('area', layer.area ?? 0, display);
  const at = `at ${finite(layer.depth) ? length(layer.depth) : '—'}`;
  // A label that already names the bars ("top 4 #8") is not followed by them again.
  if (layer.label && labelNamesBars(layer.label, what)) return `${layer.label} ${at}`;
  return `${layer.label ? `${layer.label}: ` : ''}${what} ${at}`;
}
const r2 = (v: number) => Math.round(v * 100) / 100;

/** A round length for the scale bar, display units: 1, 2 or 5 × a power of ten, the nearest (by ratio) to a quarter of `span`. */
export function roundLength(span: number): number {
  if (!(span > 0) || !Number.isFinite(span)) return 1;
  const target = span / 4;
  const power = 10 ** Math.floor(Math.log10(target));
  const candidates = [1, 2, 5, 10].map((step) => step * power);
  return candidates.reduce((best, c) => (Math.abs(Math.log(c / target)) < Math.abs(Math.log(best / target)) ? c : best));
}

/** The drawing of a section, or null when its outline has no area or is not made of finite numbers. */
export function sectionGeometry(section: SectionDefinition, system: UnitSystem, options: SectionGeometryOptions = {}): SectionGeometry | null {
  const display = displaySystem(system);
  const length = (mm: number) => formatQuantity('sectionLength', mm, display);
  const figure = sectionFigure(section);
  if (!figure) return null;
  const { outline, voids, xMin, xMax, width: widthMm, height: depth, web } = figure;

  const maxWidth = options.maxWidth ?? 380;
  const maxHeight = options.maxHeight ?? 300;
  // Room for the layer labels: their estimated width (≈ 6.2 px a character at 11 px), at most half the drawing.
  const labelTexts = section.bars.map((layer) => layerText(layer, length, display));
  const estimated = labelTexts.length > 0 ? Math.max(...labelTexts.map((t) => t.length * LABEL_CHAR_WIDTH)) + 22 : 10;
  const labelWidth = Math.min(options.labelWidth ?? estimated, maxWidth * 0.5);
  const left = 34;
  const top = 30;
  const bottom = 58;
  const k = Math.min((maxWidth - left - labelWidth - 10) / widthMm, (maxHeight - top - bottom) / depth);
  const X = (x: number) => r2(left + (x - xMin) * k);
  const Y = (y: number) => r2(top + y * k);
  const path = (points: readonly Point[]) => `M${points.map((p) => `${X(p.x)} ${Y(p.y)}`).join(' L')} Z`;
  const r2k = (mm: number) => r2(mm * k);
  const rect = (r: { x0: number; x1: number; y0: number; y1: number }): Rect => ({ x: X(r.x0), y: Y(r.y0), w: r2k(r.x1 - r.x0), h: r2k(r.y1 - r.y0) });
  const hoop: SectionGeometry['hoop'] = figure.hoop && web ? { ...rect(figure.hoop), rx: r2k(figure.hoop.radius), stroke: r2(Math.max(figure.hoop.diameter * k, 1)) } : null;
  const cover: Rect | null = hoop && figure.cover ? rect(figure.cover) : null;
  const core: Rect | null = hoop && figure.confinedCore ? { x: hoop.x, y: hoop.y, w: hoop.w, h: hoop.h } : null;

  const bars: DrawnBar[] = [];
  const labels: LayerLabel[] = [];
  for (const { layer, index, diameter, positions } of figure.layers) {
    const r = Math.max((diameter / 2) * k, 1.5);
    for (const x of positions) bars.push({ cx: X(x), cy: Y(layer.depth), r: r2(r), layer: index });
    labels.push({ layer: index, text: labelTexts[index]!, x: X(xMax) + 16, y: Y(layer.depth), fromX: positions.length > 0 ? X(Math.max(...positions)) + r : X(xMax), fromY: Y(layer.depth) });
  }
  // Spread the labels so that they never overlap.
  const sorted = [...labels].sort((a, b) => a.y - b.y);
  const spread = spreadLabels(sorted.map((l) => l.y), 14);
  const placed: LayerLabel[] = sorted.map((label, i) => ({ ...label, y: spread[i]! }));
  const heightPx = Math.ceil(Math.max(Y(depth) + bottom, (placed[placed.length - 1]?.y ?? 0) + 12));

  const dimensions: Dimension[] = [];
  dimensions.push({ x1: X(xMin), y1: top - 14, x2: X(xMax), y2: top - 14, text: length(widthMm), vertical: false });
  dimensions.push({ x1: left - 16, y1: Y(0), x2: left - 16, y2: Y(depth), text: length(depth), vertical: true });
  const shape = section.shape;
  if ((shape.kind === 'tee' || shape.kind === 'ell') && web) {
    dimensions.push({ x1: X(web.x0), y1: Y(depth) + 14, x2: X(web.x1), y2: Y(depth) + 14, text: length(web.x1 - web.x0), vertical: false });
  }
  if (shape.kind === 'inverted-tee' && web) {
    dimensions.push({ x1: X(web.x0), y1: top - 14 + 0, x2: X(web.x1), y2: top - 14, text: length(web.x1 - web.x0), vertical: false });
    dimensions.shift();
    dimensions.push({ x1: X(xMin), y1: Y(depth) + 14, x2: X(xMax), y2: Y(depth) + 14, text: length(widthMm), vertical: false });
  }

  // Scale bar: a round length in display units, under the drawing.
  const unit = unitLabel('sectionLength', display);
  const roundDisplay = roundLength(toDisplay('sectionLength', widthMm, display));
  const barMm = fromDisplay('sectionLength', roundDisplay, display);
  const scaleBar = { x: left, y: heightPx - 10, length: r2(barMm * k), text: `${String(Number(roundDisplay.toPrecision(3)))} ${unit}` };

  const widthPx = Math.ceil(Math.max(X(xMax) + 16 + Math.max(0, ...placed.map((l) => l.text.length * LABEL_CHAR_WIDTH)) + 8, left + scaleBar.length + 60));
  return {
    width: widthPx,
    height: heightPx,
    outline: `${path(outline)}${voids.map((v) => ` ${path(v)}`).join('')}`,
    hoop,
    cover,
    core,
    bars,
    dimensions,
    labels: placed,
    scaleBar,
    scale: k,
    problems: figure.problems,
  };
}
