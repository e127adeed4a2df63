/**
 * Scaled drawing of a cross-section as an SVG string: concrete outline (core/section/shapes.ts),
 * voids, hoop, bars at their positions (core/section/build.ts `barPositions`), overall dimensions
 * and a label per reinforcement layer. The drawing is to a true scale 1:n when shown at its stated
 * width and height in points (1 pt = 1/72 in), as in the report; the app may show it at any size.
 */
import { barDesignation } from '../section/bar-designations.ts';
import type { SectionDefinition } from '../section/definition.ts';
import { layerArea } from '../section/definition.ts';
import type { Point } from '../section/shapes.ts';
import { formatQuantity } from '../units/format.ts';
import { PALETTE } from './palette.ts';
import { addedFigure, labelNamesBars, sectionFigure, spreadLabels } from './section-geometry.ts';
import type { AddedItem } from '../retrofit/types.ts';
import type { UnitsInput } from './types.ts';
import { resolveUnits, unitFor } from './units.ts';

export interface SectionDrawingOptions {
  /** Largest width and height of the whole drawing (with dimensions and labels), points. Defaults 240 × 240. */
  readonly maxWidth?: number;
  readonly maxHeight?: number;
  /** Text size, points (default 7.5). */
  readonly fontSize?: number;
  /** Font family named in the SVG (default `Roboto`, the report font). */
  readonly fontFamily?: string;
  /** Label the reinforcement layers at the right (default true). */
  readonly layerLabels?: boolean;
  /**
   * What a strengthening scheme or an as-found condition adds (overlay, FRP, plate, new or exposed
   * bars; core/retrofit AddedItem), drawn in colour with a label each, and the outline the section
   * had before concrete was lost (`ghost`, mm in this definition's coordinates), dashed.
   */
  readonly additions?: {
    readonly items: readonly AddedItem[];
    readonly ghost?: { readonly outline: readonly Point[]; readonly label: string };
  };
}

export interface SectionDrawing {
  /** Standalone SVG document (UTF-8 text). */
  readonly svg: string;
  /** Size of the drawing, points (= CSS pixels in the app). */
  readonly width: number;
  readonly height: number;
  /** The drawing scale 1:n at the stated size (null when the section is too large for the candidate scales and was fitted instead). */
  readonly scale: number | null;
  /** E.g. `scale 1:10 at the printed size`. */
  readonly scaleText: string;
  /**
   * The labels of the drawing (layers, what was added or lost), top to bottom, with the colour each
   * is drawn in: the text alternative, and the legend where the labels are not drawn (`layerLabels: false`).
   */
  readonly labels: readonly { readonly text: string; readonly colour: string }[];
}

/** Drawing scales tried, 1:n (common drafting scales; // common practice, no source). */
const SCALES = [1, 2, 2.5, 5, 10, 15, 20, 25, 30, 40, 50, 75, 100, 150, 200, 250, 500];

const POINTS_PER_MM = 72 / 25.4;

function escapeXml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

/** Approximate advance width of text in a sans-serif font, points (average glyph ≈ 0.53 em). */
function textWidth(text: string, fontSize: number): number {
  return text.length * fontSize * 0.53;
}

const n2 = (v: number) => (Math.round(v * 100) / 100).toString();

/**
 * Draws a section. Units: the definition is in mm; dimensions and bar sizes print in the section
 * display unit of `units` (mm / in) and areas in mm² / in².
 * Degenerate cases: an outline without area or with non-finite coordinates gives a drawing that
 * says so instead of a shape; bar layers with non-finite data are left out.
 */
export function sectionDrawingSvg(definition: SectionDefinition, unitsInput: UnitsInput, options: SectionDrawingOptions = {}): SectionDrawing {
  const units = resolveUnits(unitsInput);
  const maxWidth = options.maxWidth ?? 240;
  const maxHeight = options.maxHeight ?? 240;
  const font = options.fontSize ?? 7.5;
  const family = options.fontFamily ?? 'Roboto';
  const lengthUnit = unitFor('sectionLength', units);
  // Whole millimetres print without decimals (300 mm, not 300.0 mm).
  const length = (mm: number) => formatQuantity('sectionLength', mm, units.system, { unit: lengthUnit, ...((lengthUnit ?? 'mm') === 'mm' && units.system === 'SI' && Math.abs(mm - Math.round(mm)) < 1e-6 ? { decimals: 0 } : {}) });
  const area = (mm2: number) => formatQuantity('area', mm2, units.system, { unit: unitFor('area', units) });

  const figure = sectionFigure(definition);
  if (!figure) {
    const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${maxWidth}" height="40" viewBox="0 0 ${maxWidth} 40"><text x="4" y="20" font-family="${escapeXml(family)}" font-size="${font}" fill="${PALETTE.ink}">The section outline cannot be drawn (no area).</text></svg>`;
    return { svg, width: maxWidth, height: 40, scale: null, scaleText: 'not to scale', labels: [] };
  }

  const { outline, voids, web } = figure;
  const added = options.additions ? addedFigure(definition, options.additions.items) : { rects: [], bars: [] };
  const ghost = options.additions?.ghost;
  // The drawing's extent: the outline, and anything added outside it (a plate, FRP, the lost concrete).
  const xs = [figure.xMin, figure.xMax, ...added.rects.flatMap((r) => [r.x0, r.x1]), ...added.bars.map((b) => b.x), ...(ghost?.outline.map((p) => p.x) ?? [])].filter(Number.isFinite);
  const ys = [0, figure.height, ...added.rects.flatMap((r) => [r.y0, r.y1]), ...(ghost?.outline.map((p) => p.y) ?? [])].filter(Number.isFinite);
  const xMin = Math.min(...xs);
  const xMax = Math.max(...xs);
  const yMin = Math.min(...ys);
  const width = xMax - xMin;
  const height = Math.max(...ys) - yMin;
  // Layer labels and their widths decide the right margin.
  // Added items are named from their data in the display units (the engine's own labels are in mm).
  const barsText = (count: number, diameter: number) => {
    const designation = barDesignation(diameter, units.system);
    return designation ? `${count} ${designation}` : `${count} × ${length(diameter)}`;
  };
  const rectText = (r: (typeof added.rects)[number]) => r.kind === 'overlay'
    ? `new concrete layer ${length(r.y1 - r.y0)}`
    : `${r.kind === 'frp' ? 'FRP' : 'steel plate'} ${length(r.y1 - r.y0)} × ${length(r.x1 - r.x0)}`;
  const addedLabels = [
    ...added.rects.map((r) => ({ depth: (r.y0 + r.y1) / 2, text: rectText(r), colour: r.kind === 'overlay' ? PALETTE.teal : r.kind === 'frp' ? PALETTE.purple : PALETTE.blue })),
    ...added.bars.filter((b) => b.first).map((b) => ({ depth: b.y, text: `${barsText(b.count, b.diameter)} ${b.exposed ? 'exposed by spalling' : 'in the new layer'}`, colour: b.exposed ? PALETTE.red : PALETTE.teal })),
    ...(ghost ? [{ depth: Math.max(...ghost.outline.map((p) => p.y)), text: ghost.label, colour: PALETTE.red }] : []),
  ];
  const layers = figure.layers.map(({ layer, index, diameter, positions }) => {
    const sized = layer.count !== undefined && layer.diameter !== undefined;
    // Bars as drawings write them (3 #8, 4 Ø20) when the diameter is a tabulated size.
    const designation = sized ? barDesignation(layer.diameter, units.system) : null;
    const bars = sized ? (designation ? `${layer.count} ${designation}` : `${layer.count} × ${length(layer.diameter!)}`) : 'area';
    // A label that already names the bars ("top 4 #8") is not followed by them again.
    const named = layer.label !== undefined && sized && labelNamesBars(layer.label, bars);
    const text = named ? `${layer.label} (${area(layerArea(layer))})` : `${layer.label ?? `layer ${index + 1}`}: ${bars} (${area(layerArea(layer))})`;
    return { layer, diameter, sized, text, positions };
  });
  const showLabels = options.layerLabels ?? true;
  const labelTexts = [...layers.map((l) => l.text), ...addedLabels.map((l) => l.text)];
  const labelWidth = showLabels && labelTexts.length > 0 ? Math.max(...labelTexts.map((t) => textWidth(t, font))) + 16 : 0;

  const bottomChord = definition.shape.kind === 'tee' || definition.shape.kind === 'ell' ? web : undefined;
  const marginLeft = font * 2 + 10;
  const marginTop = font * 2 + 8;
  const marginBottom = bottomChord ? font * 2 + 8 : 6;
  const marginRight = Math.max(labelWidth, 6);
  const availableWidth = maxWidth - marginLeft - marginRight;
  const availableHeight = maxHeight - marginTop - marginBottom;
  let scale: number | null = SCALES.find((n) => (width * POINTS_PER_MM) / n <= availableWidth && (height * POINTS_PER_MM) / n <= availableHeight) ?? null;
  const k = scale !== null ? POINTS_PER_MM / scale : Math.min(availableWidth / width, availableHeight / height);
  if (!(k > 0)) scale = null;
  const svgWidth = Math.ceil(marginLeft + width * k + marginRight);
  const svgHeight = Math.ceil(marginTop + height * k + marginBottom);
  const X = (x: number) => marginLeft + (x - xMin) * k;
  const Y = (y: number) => marginTop + (y - yMin) * k;
  const path = (points: readonly Point[]) => `M${points.map((p) => `${n2(X(p.x))} ${n2(Y(p.y))}`).join(' L')} Z`;

  const parts: string[] = [];
  parts.push(`<path d="${path(outline)}${voids.map((v) => ` ${path(v)}`).join('')}" fill="#e6e9ed" fill-rule="evenodd" stroke="${PALETTE.ink}" stroke-width="0.9"/>`);

  // Hoop along the web, at its centreline.
  const hoop = figure.hoop;
  if (hoop) {
    const { x0, x1, y0, y1 } = hoop;
    parts.push(`<rect x="${n2(X(x0))}" y="${n2(Y(y0))}" width="${n2((x1 - x0) * k)}" height="${n2((y1 - y0) * k)}" rx="${n2(hoop.radius * k)}" fill="none" stroke="${PALETTE.grey}" stroke-width="${n2(Math.max(hoop.diameter * k, 0.6))}"/>`);
  }

  // What a scheme adds, and the outline before concrete was lost.
  for (const r of added.rects) {
    const fill = r.kind === 'overlay' ? '#d5ece9' : r.kind === 'frp' ? PALETTE.purple : '#9fb3c8';
    const stroke = r.kind === 'overlay' ? PALETTE.teal : r.kind === 'frp' ? PALETTE.purple : PALETTE.blue;
    // A laminate a fraction of a millimetre thick is drawn at least 1.5 pt thick, outward from the face.
    const h = Math.max((r.y1 - r.y0) * k, r.kind === 'overlay' ? 0 : 1.5);
    const y = r.kind === 'frp' && r.y0 < 0 ? Y(r.y1) - h : Y(r.y0);
    parts.push(`<rect x="${n2(X(r.x0))}" y="${n2(y)}" width="${n2((r.x1 - r.x0) * k)}" height="${n2(h)}" fill="${fill}" fill-opacity="${r.kind === 'overlay' ? 0.85 : 1}" stroke="${stroke}" stroke-width="0.7"/>`);
  }
  if (ghost && ghost.outline.length >= 3) {
    parts.push(`<path d="${path(ghost.outline)}" fill="none" stroke="${PALETTE.red}" stroke-width="0.8" stroke-dasharray="3 2"/>`);
  }
  for (const b of added.bars) {
    const radius = Math.max((b.diameter / 2) * k, 1.2);
    parts.push(b.exposed
      ? `<circle cx="${n2(X(b.x))}" cy="${n2(Y(b.y))}" r="${n2(radius)}" fill="none" stroke="${PALETTE.red}" stroke-width="1"/>`
      : `<circle cx="${n2(X(b.x))}" cy="${n2(Y(b.y))}" r="${n2(radius)}" fill="${PALETTE.teal}"/>`);
  }

  // Bars.
  for (const { layer, diameter, sized, positions } of layers) {
    const radius = Math.max((diameter / 2) * k, 1.2);
    for (const x of positions) {
      parts.push(sized
        ? `<circle cx="${n2(X(x))}" cy="${n2(Y(layer.depth))}" r="${n2(radius)}" fill="${PALETTE.ink}"/>`
        : `<circle cx="${n2(X(x))}" cy="${n2(Y(layer.depth))}" r="${n2(radius)}" fill="none" stroke="${PALETTE.ink}" stroke-width="0.8"/>`);
    }
  }

  const text = (x: number, y: number, content: string, anchor: 'start' | 'middle' | 'end', rotate = false, colour: string = PALETTE.ink) =>
    `<text x="${n2(x)}" y="${n2(y)}" font-family="${escapeXml(family)}" font-size="${font}" fill="${colour}" text-anchor="${anchor}"${rotate ? ` transform="rotate(-90 ${n2(x)} ${n2(y)})"` : ''}>${escapeXml(content)}</text>`;
  const line = (x1: number, y1: number, x2: number, y2: number, w = 0.5) => `<path d="M${n2(x1)} ${n2(y1)} L${n2(x2)} ${n2(y2)}" stroke="${PALETTE.ink}" stroke-width="${w}" fill="none"/>`;
  const tick = (x: number, y: number) => line(x - 2.2, y + 2.2, x + 2.2, y - 2.2, 0.7);

  // Overall width above, height at the left, web width below (flanged shapes).
  const yDim = marginTop - 6;
  const cx0 = figure.xMin;
  const cx1 = figure.xMax;
  const ch = figure.height;
  parts.push(line(X(cx0), yDim, X(cx1), yDim), tick(X(cx0), yDim), tick(X(cx1), yDim));
  parts.push(line(X(cx0), yDim - 3, X(cx0), Y(0) - 1.5, 0.3), line(X(cx1), yDim - 3, X(cx1), Y(0) - 1.5, 0.3));
  parts.push(text((X(cx0) + X(cx1)) / 2, yDim - 3, length(cx1 - cx0), 'middle'));
  const xDim = marginLeft - 6;
  parts.push(line(xDim, Y(0), xDim, Y(ch)), tick(xDim, Y(0)), tick(xDim, Y(ch)));
  parts.push(text(xDim - 3, (Y(0) + Y(ch)) / 2, length(ch), 'middle', true));
  if (bottomChord) {
    const yb = Y(yMin + height) + 6;
    parts.push(line(X(bottomChord.x0), yb, X(bottomChord.x1), yb), tick(X(bottomChord.x0), yb), tick(X(bottomChord.x1), yb));
    parts.push(text((X(bottomChord.x0) + X(bottomChord.x1)) / 2, yb + font + 2, length(bottomChord.x1 - bottomChord.x0), 'middle'));
  }

  // Layer labels at the right, spread so that they never overlap, each with a leader.
  const all = [...layers.map((l) => ({ depth: l.layer.depth, text: l.text, colour: PALETTE.ink })), ...addedLabels];
  if (showLabels && all.length > 0) {
    const sorted = [...all].sort((a, b) => a.depth - b.depth);
    const placed = spreadLabels(sorted.map((l) => Y(l.depth) + font / 3), font + 2);
    // Pull the stack back up if it ran past the bottom of the drawing.
    const overflow = placed[placed.length - 1]! - (svgHeight - 2);
    if (overflow > 0) for (let i = 0; i < placed.length; i++) placed[i] = placed[i]! - overflow;
    const xLabel = X(xMax) + 14;
    sorted.forEach((l, i) => {
      const y = placed[i]!;
      parts.push(line(X(xMax) + 2, Y(l.depth), xLabel - 2, y - font / 3, 0.3));
      parts.push(text(xLabel, y, l.text, 'start', false, l.colour));
    });
  }

  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${svgWidth}" height="${svgHeight}" viewBox="0 0 ${svgWidth} ${svgHeight}">${parts.join('')}</svg>`;
  const labels = [...all].sort((a, b) => a.depth - b.depth).map((l) => ({ text: l.text, colour: l.colour }));
  return { svg, width: svgWidth, height: svgHeight, scale, scaleText: scale !== null ? `scale 1:${scale} at the printed size` : 'fitted to the space, not to a standard scale', labels };
}
