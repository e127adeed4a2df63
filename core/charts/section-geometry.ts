/**
 * What a drawing of a cross-section shows, in the section's own millimetres: the concrete outline
 * and voids (core/section/shapes.ts), the hoop at its centreline (core/section/build.ts
 * `hoopCentreline`), the clear-cover line and the confined core, every bar at its position
 * (`barPositions`), and where layer labels go without overlapping. The report's SVG drawing
 * (section-drawing.ts) and the section editor's drawing (renderer/src/charts/section-geometry.ts)
 * both scale this to their own units; neither works the geometry out again.
 * Units: mm, x to the right from the left edge of the outline's bounding box, y down from the top.
 */
import type { SectionDefinition } from '../section/definition.ts';
import { hoopsConfine, layerDiameter } from '../section/definition.ts';
import { barPositions, hoopCentreline, shapeHeight, webExtent } from '../section/build.ts';
import { shapeOutline, type Point, type ShapeOutline } from '../section/shapes.ts';
import { chordIntervals } from '../section/width-profile.ts';
import type { AddedItem } from '../retrofit/types.ts';

export interface Rectangle {
  readonly x0: number;
  readonly x1: number;
  readonly y0: number;
  readonly y1: number;
}

export interface FigureLayer {
  /** Index of the layer in the definition's `bars`. */
  readonly index: number;
  readonly layer: SectionDefinition['bars'][number];
  readonly diameter: number;
  /** Horizontal positions of the bars, mm (finite values only). */
  readonly positions: readonly number[];
}

export interface SectionFigure {
  readonly outline: readonly Point[];
  readonly voids: readonly (readonly Point[])[];
  /** Bounding box: left and right edge, overall width and height, mm. */
  readonly xMin: number;
  readonly xMax: number;
  readonly width: number;
  readonly height: number;
  /** Horizontal extent of the web (the part the hoops enclose), when the shape has one. */
  readonly web: { readonly x0: number; readonly x1: number } | undefined;
  /** The hoop along its centreline, with its corner radius and bar diameter (mm), when it can be drawn. */
  readonly hoop: (Rectangle & { readonly radius: number; readonly diameter: number }) | null;
  /** Inner edge of the clear cover (outer face of the hoop), when there is a hoop around a web. */
  readonly cover: Rectangle | null;
  /** True when the core inside the hoop is analysed as confined. */
  readonly confinedCore: boolean;
  /** Layers that can be drawn (finite depth and bar size), in definition order. */
  readonly layers: readonly FigureLayer[];
  /** Why something could not be drawn (empty when everything is drawn). */
  readonly problems: readonly string[];
}

const finite = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

/** The figure of a section, or null when its outline has no area or is not made of finite numbers. */
export function sectionFigure(section: SectionDefinition): SectionFigure | null {
  let outline: readonly Point[];
  let voids: readonly (readonly Point[])[];
  try {
    ({ outline, voids } = shapeOutline(section.shape));
  } catch {
    return null;
  }
  const all = [...outline, ...voids.flat()];
  if (all.length < 3 || !all.every((p) => finite(p.x) && finite(p.y))) return null;
  const xMin = Math.min(...all.map((p) => p.x));
  const xMax = Math.max(...all.map((p) => p.x));
  const height = shapeHeight(section.shape);
  const width = xMax - xMin;
  if (!(width > 0) || !(height > 0)) return null;
  const problems: string[] = [];

  const web = webExtent(section.shape);
  const hoops = section.hoops;
  let hoop: SectionFigure['hoop'] = null;
  let cover: Rectangle | null = null;
  if (hoops && finite(hoops.clearCover) && finite(hoops.diameter) && hoops.diameter > 0) {
    const centreline = hoopCentreline(section.shape, hoops);
    if (centreline) {
      const { x0, x1, y0, y1 } = centreline;
      hoop = { x0, x1, y0, y1, radius: Math.min(2 * hoops.diameter, (x1 - x0) / 2, (y1 - y0) / 2), diameter: hoops.diameter };
      if (web) {
        const c = hoops.clearCover;
        cover = { x0: web.x0 + c, x1: web.x1 - c, y0: c, y1: height - c };
      }
    } else if (web) {
      problems.push('The hoops leave no core inside the cover.');
    }
  }

  const layers: FigureLayer[] = [];
  (section.bars ?? []).forEach((layer, index) => {
    const diameter = layerDiameter(layer);
    if (!finite(layer.depth) || !finite(diameter) || diameter <= 0) {
      problems.push(`Layer ${index + 1} cannot be drawn (its depth or bar size is missing).`);
      return;
    }
    let positions: number[];
    try {
      positions = barPositions(section, layer).filter(finite);
    } catch {
      positions = [];
    }
    layers.push({ index, layer, diameter, positions });
  });
  return { outline, voids, xMin, xMax, width, height, web, hoop, cover, confinedCore: hoop !== null && hoopsConfine(hoops), layers, problems };
}

/**
 * Label positions that never overlap: each label as near its wanted position as the one above it
 * allows (`gap` apart, in the caller's units), in ascending order of the wanted positions.
 * @returns the placed positions, in the order of `wanted`
 */
export function spreadLabels(wanted: readonly number[], gap: number): number[] {
  const order = wanted.map((y, i) => ({ y, i })).sort((a, b) => a.y - b.y);
  const placed = new Array<number>(wanted.length);
  let last = -Infinity;
  for (const { y, i } of order) {
    last = Math.max(y, last + gap);
    placed[i] = last;
  }
  return placed;
}

/**
 * Where `text` names the bars `bars` (as drawings write them, `3 #8`, `4 Ø20`): standing alone —
 * not inside `13 #8` or `3 #80` — with any spacing and case. The section drawing uses it not to
 * repeat bars a label already says; the editor, to keep a label naming the bars it names.
 */
export function barMentions(text: string, bars: string): { readonly index: number; readonly length: number }[] {
  const escaped = bars.trim().replace(/[.*+?^${}()|[\]\\]/g, '\\$&').replace(/\s+/g, '\\s*');
  if (escaped === '') return [];
  return [...text.matchAll(new RegExp(`(?<![\\p{L}\\d.])${escaped}(?![\\p{L}\\d.])`, 'giu'))].map((m) => ({ index: m.index, length: m[0].length }));
}

/** True when a layer's `label` already says its `bars` (`top 4 #8` says `4 #8`): the drawing then does not repeat them. */
export function labelNamesBars(label: string, bars: string): boolean {
  return barMentions(label, bars).length > 0;
}

/** What a strengthening scheme or an as-found condition adds to a drawing, mm (x as the section's, y down from its top fibre). */
export interface AddedFigure {
  /** Overlays, FRP laminates and plates as rectangles. */
  readonly rects: readonly (Rectangle & { readonly kind: 'overlay' | 'frp' | 'plate'; readonly label: string })[];
  /** Bars of a new layer, and bars left outside the concrete by spalling (`exposed`). */
  readonly bars: readonly { readonly x: number; readonly y: number; readonly diameter: number; readonly exposed: boolean; readonly label: string; readonly first: boolean; readonly count: number }[];
}

/**
 * Where the items a variant adds (core/retrofit AddedItem: overlay, FRP, plate, bars) go in the
 * drawing of its section. An item is centred on the face it is bonded to or cast on; FRP is drawn
 * with its true thickness outside the face, a plate about its centroid. Bars of a new layer are
 * spread evenly over the layer's width (their horizontal positions are not an input); exposed bars
 * keep their positions in the section.
 */
export function addedFigure(section: SectionDefinition, items: readonly AddedItem[]): AddedFigure {
  let outline: ShapeOutline;
  try {
    outline = shapeOutline(section.shape);
  } catch {
    return { rects: [], bars: [] };
  }
  const height = shapeHeight(section.shape);
  /** Centre of the concrete at depth y (the middle of its outermost chords), mm. */
  const centreAt = (y: number) => {
    const chords = chordIntervals(outline, Math.min(Math.max(y, 1e-6 * height), height * (1 - 1e-6)));
    return chords.length > 0 ? (chords[0]![0] + chords[chords.length - 1]![1]) / 2 : 0;
  };
  const rects: (Rectangle & { kind: 'overlay' | 'frp' | 'plate'; label: string })[] = [];
  const bars: { x: number; y: number; diameter: number; exposed: boolean; label: string; first: boolean; count: number }[] = [];
  let overlay: Rectangle | null = null;
  for (const item of items) {
    if (!finite(item.depth)) continue;
    if (item.kind === 'overlay' && finite(item.top) && finite(item.bottom) && finite(item.width)) {
      // Centred on the face the layer is cast on (the outline reaches the new face by a zero-width edge).
      const eps = 1e-3 * height;
      const c = centreAt(item.top <= eps ? item.bottom + eps : item.top - eps);
      overlay = { x0: c - item.width / 2, x1: c + item.width / 2, y0: item.top, y1: item.bottom };
      rects.push({ ...overlay, kind: 'overlay', label: item.label });
    } else if ((item.kind === 'frp' || item.kind === 'plate') && finite(item.width) && item.width > 0) {
      const t = item.area / item.width;
      const bottomFace = item.depth >= height / 2;
      const c = centreAt(bottomFace ? height : 0);
      const [y0, y1] = item.kind === 'frp' ? (bottomFace ? [height, height + t] : [-t, 0]) : [item.depth - t / 2, item.depth + t / 2];
      rects.push({ x0: c - item.width / 2, x1: c + item.width / 2, y0, y1, kind: item.kind, label: item.label });
    } else if (item.kind === 'bar') {
      const diameter = finite(item.diameter) && item.diameter > 0 ? item.diameter : Math.sqrt((4 * item.area) / Math.PI / Math.max(item.count ?? 1, 1));
      let xs = item.positions?.filter(finite) ?? [];
      if (xs.length === 0) {
        const count = Math.max(1, item.count ?? 1);
        const span = overlay ?? (() => {
          const chords = chordIntervals(outline, Math.min(Math.max(item.depth, 1e-6 * height), height * (1 - 1e-6)));
          return chords.length > 0 ? { x0: chords[0]![0], x1: chords[chords.length - 1]![1] } : { x0: 0, x1: 0 };
        })();
        const cover = Math.min(2 * diameter, (span.x1 - span.x0) / 4);
        const usable = span.x1 - span.x0 - 2 * cover;
        xs = Array.from({ length: count }, (_, i) => (count === 1 ? (span.x0 + span.x1) / 2 : span.x0 + cover + (usable * i) / (count - 1)));
      }
      xs.forEach((x, i) => bars.push({ x, y: item.depth, diameter, exposed: item.exposed === true, label: item.label, first: i === 0, count: xs.length }));
    }
  }
  return { rects, bars };
}
