/**
 * Checks of a section's geometry that the numbers of each field alone cannot catch (issue 17, "quiet
 * wrong answers"): a polygon that crosses itself, a void reaching outside the outline or into
 * another void, bars on top of each other within or between layers, bars in a void, bars closer
 * than the code's clear spacing, hoops with a fraction of a leg, a section without bars.
 *
 * Errors (the section cannot be analysed as it is) and warnings (analysed, but the engineer should
 * know) are Diagnostics with the field path and the values as quantities. Nothing is corrected:
 * the input stays as the user wrote it. The section builder (build.ts) takes the errors, so the
 * analysis refuses such a section; project validation takes both.
 * Units: mm; y down from the top fibre.
 */
import { diagnostic, type Diagnostic } from '../diagnostics.ts';
import type { CodeBasis } from '../materials/specs.ts';
import { phrase, q, type Text } from '../units/phrase.ts';
import { layerDiameter, type BarLayer, type HoopSet, type SectionDefinition } from './definition.ts';
import { circlePlacement, distanceToSegment, edgesFoldBack, geometryTolerance, pointInPolygon, polygonEdges, segmentsMeet } from './polygon.ts';
import { shapeOutline, type Point, type SectionShape } from './shapes.ts';

/** Most bar layers a section may have: a deep transfer girder with skin bars has a few dozen. */
export const MAX_BAR_LAYERS = 100;
/** Largest number of hoop legs in either direction (and the least: a closed hoop has 2). */
export const HOOP_LEGS_RANGE = { min: 2, max: 12 } as const;
/**
 * Maximum aggregate size assumed in the clear-spacing rules, mm: the project does not record it;
 * 20 mm (3/4 in.) is the common size of beam concrete (common practice, no source).
 */
export const ASSUMED_AGGREGATE_SIZE = 20;
/** Crossings reported per polygon (the rest are counted). */
const MAX_REPORTED = 5;

const len = (mm: number) => q('sectionLength', mm, { compact: true });
const pointText = (p: Point): Text => phrase`(x ${len(p.x)}, y ${len(p.y)})`;

/** An edge of a polygon in the file: from point `index` to point `end`. */
interface Edge {
  readonly index: number;
  readonly end: number;
  readonly a: Point;
  readonly b: Point;
}

/**
 * The outline without the zero-width vertical spikes that reach its top or bottom fibre: that is how
 * a strengthened section represents depth added by a new concrete layer, whose concrete is a part of
 * its own (core/retrofit/outline.ts). Each point keeps its index in the given list.
 */
function withoutDepthSpikes(points: readonly Point[], tol: number): { point: Point; index: number }[] {
  const list = points.map((point, index) => ({ point, index }));
  const ys = points.map((p) => p.y);
  const top = Math.min(...ys);
  const bottom = Math.max(...ys);
  for (let k = 0; list.length > 3 && k < list.length; k++) {
    const a = list[(k + list.length - 1) % list.length]!.point;
    const v = list[k]!.point;
    const b = list[(k + 1) % list.length]!.point;
    const spike = Math.hypot(a.x - b.x, a.y - b.y) <= tol && Math.abs(a.x - v.x) <= tol && (Math.abs(v.y - top) <= tol || Math.abs(v.y - bottom) <= tol);
    if (!spike) continue;
    // Remove the tip and the return point; look again from the point before.
    const second = (k + 1) % list.length;
    list.splice(Math.max(k, second), 1);
    list.splice(Math.min(k, second), 1);
    k = Math.max(-1, k - 2);
  }
  return list;
}
const edgeText = (e: Edge): Text => phrase`edge ${e.index} (point ${e.index} ${pointText(e.a)} to point ${e.end} ${pointText(e.b)})`;

const finitePoint = (p: unknown): p is Point => typeof p === 'object' && p !== null && Number.isFinite((p as Point).x) && Number.isFinite((p as Point).y);

/** Pairs of edges (one from each list, or two of one list) that meet, up to `limit`, and how many in all. */
function meetingEdges(a: readonly Edge[], b: readonly Edge[] | null, tol: number, limit: number): { pairs: [Edge, Edge][]; count: number } {
  const pairs: [Edge, Edge][] = [];
  let count = 0;
  const other = b ?? a;
  const n = a.length;
  const box = (e: Edge) => [Math.min(e.a.x, e.b.x) - tol, Math.max(e.a.x, e.b.x) + tol, Math.min(e.a.y, e.b.y) - tol, Math.max(e.a.y, e.b.y) + tol] as const;
  const boxes = other.map(box);
  a.forEach((e, i) => {
    const [x0, x1, y0, y1] = box(e);
    for (let j = b ? 0 : i + 1; j < other.length; j++) {
      const [u0, u1, v0, v1] = boxes[j]!;
      if (u0 > x1 || u1 < x0 || v0 > y1 || v1 < y0) continue;
      const f = other[j]!;
      let meet: boolean;
      if (!b && (j === i + 1 || (i === 0 && j === n - 1))) {
        // Neighbours share a vertex: they may meet there, but must not fold back along each other.
        const [first, second] = j === i + 1 ? [e, f] : [f, e];
        meet = edgesFoldBack(first.a, first.b, second.b, tol);
      } else {
        meet = segmentsMeet(e.a, e.b, f.a, f.b, tol);
      }
      if (!meet) continue;
      count++;
      if (pairs.length < limit) pairs.push([e, f]);
    }
  });
  return { pairs, count };
}

/**
 * The edges of a polygon (its points with their indices in the file, `count` in all), without the
 * zero-length ones (a repeated point is harmless). Edge i starts at point i.
 */
function edgesOf(points: readonly { point: Point; index: number }[], tol: number): Edge[] {
  return points
    .map(({ point, index }, k) => {
      const next = points[(k + 1) % points.length]!;
      return { index, end: next.index, a: point, b: next.point };
    })
    .filter((e) => Math.hypot(e.b.x - e.a.x, e.b.y - e.a.y) > tol);
}

/**
 * A polygon shape: its outline and each void must be simple polygons (no crossing or touching
 * edges), each void must lie inside the outline without touching it, and voids must neither
 * overlap nor nest. Call after the coordinates' own checks passed.
 * @param path the shape's path, e.g. `sections[2] "S-3".shape`
 */
export function polygonShapeProblems(shape: Extract<SectionShape, { kind: 'polygon' }>, path: string): Diagnostic[] {
  const out: Diagnostic[] = [];
  const outline = shape.outline;
  const voids = shape.voids ?? [];
  voids.forEach((v, k) => {
    if (!Array.isArray(v) || v.length < 3) out.push({ code: 'geometry', path: `${path}.voids[${k}]`, severity: 'error', message: `needs at least 3 points, got ${Array.isArray(v) ? v.length : 0}` });
    else v.forEach((p, i) => {
      if (!finitePoint(p)) out.push({ code: 'not-a-number', path: `${path}.voids[${k}][${i}]`, severity: 'error', message: 'must have finite x and y coordinates' });
    });
  });
  if (out.length > 0 || !outline.every(finitePoint)) return out;
  const tol = geometryTolerance([...outline, ...voids.flat()]);
  const polygons = [{ name: 'outline', field: 'outline', points: outline }, ...voids.map((points, k) => ({ name: `voids[${k}]`, field: `voids[${k}]`, points }))];
  const edges = polygons.map((p, k) => edgesOf(k === 0 ? withoutDepthSpikes(p.points, tol) : p.points.map((point, index) => ({ point, index })), tol));

  // Each polygon on its own.
  let simple = true;
  polygons.forEach((p, k) => {
    const { pairs, count } = meetingEdges(edges[k]!, null, tol, MAX_REPORTED);
    if (count === 0) return;
    simple = false;
    for (const [e, f] of pairs) {
      out.push(diagnostic('geometry', `${path}.${p.field}`, 'error', phrase`the ${k === 0 ? 'outline' : 'void'} crosses or touches itself: ${edgeText(e)} meets ${edgeText(f)}; it must be a simple polygon`));
    }
    if (count > pairs.length) out.push({ code: 'geometry', path: `${path}.${p.field}`, severity: 'error', message: `and ${count - pairs.length} more pairs of edges that meet` });
  });
  if (!simple) return out;

  // Voids inside the outline, apart from each other.
  const outlineEdges = edges[0]!;
  for (let k = 1; k < polygons.length; k++) {
    const v = polygons[k]!;
    const { pairs } = meetingEdges(edges[k]!, outlineEdges, tol, 1);
    if (pairs.length > 0) {
      const [e, f] = pairs[0]!;
      out.push(diagnostic('geometry', `${path}.${v.field}`, 'error', phrase`reaches the outline: its ${edgeText(e)} meets outline ${edgeText(f)}; a void must lie inside the outline without touching it`));
      continue;
    }
    if (!pointInPolygon(v.points[0]!, outline, tol)) {
      out.push(diagnostic('geometry', `${path}.${v.field}`, 'error', phrase`lies outside the outline (its point 0 at ${pointText(v.points[0]!)}); a void must lie inside the outline`));
      continue;
    }
    for (let m = 1; m < k; m++) {
      const w = polygons[m]!;
      const meet = meetingEdges(edges[k]!, edges[m]!, tol, 1).pairs[0];
      if (meet) {
        out.push(diagnostic('geometry', `${path}.${v.field}`, 'error', phrase`overlaps ${w.name}: its ${edgeText(meet[0])} meets ${w.name} ${edgeText(meet[1])}; voids must not overlap or touch`));
      } else if (pointInPolygon(v.points[0]!, w.points, tol) || pointInPolygon(w.points[0]!, v.points, tol)) {
        out.push({ code: 'geometry', path: `${path}.${v.field}`, severity: 'error', message: `lies inside ${w.name} or holds it: voids must not nest (give the concrete between them as a separate section part or draw one void)` });
      }
    }
  }
  return out;
}

/** The hoops' legs: whole numbers in HOOP_LEGS_RANGE (their range is the builder's own check). */
export function hoopLegProblems(hoops: HoopSet, path: string): Diagnostic[] {
  const out: Diagnostic[] = [];
  for (const field of ['verticalLegs', 'horizontalLegs'] as const) {
    const legs = hoops[field];
    if (typeof legs === 'number' && Number.isFinite(legs) && !Number.isInteger(legs)) {
      out.push({ code: 'must-be-integer', path: `${path}.hoops.${field}`, severity: 'error', message: `must be a whole number of legs from ${HOOP_LEGS_RANGE.min} to ${HOOP_LEGS_RANGE.max}, got ${legs}` });
    }
  }
  return out;
}

/** A layer whose numbers are sound, with its bars' centres. */
interface PlacedLayer {
  readonly index: number;
  readonly layer: BarLayer;
  readonly diameter: number;
  readonly depth: number;
  /** Bar centres across the width, ascending, mm. */
  readonly xs: readonly number[];
  /** Real bars (count and diameter) rather than a total area. */
  readonly bars: boolean;
}

function soundLayer(layer: BarLayer): boolean {
  if (typeof layer !== 'object' || layer === null || !Number.isFinite(layer.depth)) return false;
  if (layer.count === undefined && layer.diameter === undefined) return Number.isFinite(layer.area) && layer.area! > 0;
  return Number.isInteger(layer.count) && layer.count! >= 1 && layer.count! <= 100 && Number.isFinite(layer.diameter) && layer.diameter! > 0;
}

/** The least clear spacing of a code for two bars of diameters d1, d2 (same layer or not), mm, with its clause. */
export function minimumClearSpacing(code: CodeBasis, d1: number, d2: number, sameLayer: boolean): { spacing: number; clause: string } {
  const db = Math.max(d1, d2);
  const dagg = ASSUMED_AGGREGATE_SIZE;
  if (code === 'ACI 318-19') {
    // ACI 318-19 25.2.1 (bars in a layer) and 25.2.2 (between layers: 1 in., 25 mm in SI).
    return sameLayer
      ? { spacing: Math.max(25, db, (4 / 3) * dagg), clause: `ACI 318-19 25.2.1: the greatest of 25 mm, db and 4/3·dagg, with dagg = ${dagg} mm assumed` }
      : { spacing: 25, clause: 'ACI 318-19 25.2.2: 25 mm between layers' };
  }
  // EN 1992-1-1 8.2(2) with the recommended k1 = 1 and k2 = 5 mm, horizontally and vertically.
  return { spacing: Math.max(db, dagg + 5, 20), clause: `EN 1992-1-1 8.2(2): the greatest of k1·ø, dg + k2 and 20 mm (k1 = 1, k2 = 5 mm), with dg = ${dagg} mm assumed` };
}

/** Least centre distance across between two ascending lists of x, with the two positions. */
function nearest(a: readonly number[], b: readonly number[]): { dx: number; xa: number; xb: number } {
  let i = 0;
  let j = 0;
  let best = { dx: Infinity, xa: a[0]!, xb: b[0]! };
  while (i < a.length && j < b.length) {
    const dx = Math.abs(a[i]! - b[j]!);
    if (dx < best.dx) best = { dx, xa: a[i]!, xb: b[j]! };
    if (a[i]! < b[j]!) i++;
    else j++;
  }
  return best;
}

export interface BarLayoutOptions {
  /** The code whose clear spacing rules give warnings (none without a code). */
  readonly code?: CodeBasis;
  /**
   * Check that every bar's circle lies wholly in the concrete, exactly (with voids): for every layer,
   * or for the layers given by index (e.g. those the builder's own check let through).
   */
  readonly containment?: 'all' | ReadonlySet<number>;
}

/**
 * The bars of a section as placed (`positionsOf`: the builder's `barPositions`): too many layers;
 * a layer repeated; bars of two layers on top of each other (error); bars outside the concrete or
 * in a void (error, with `containment`); clear spacing below the code's minimum within a layer and
 * between layers (warning, with `code`); a section without bars (`no-tension-steel` warning).
 * Layers whose own numbers are wrong are left to their own checks.
 * @param path the section's path, e.g. `sections[2] "S-3"`
 */
export function barLayoutProblems(definition: SectionDefinition, path: string, positionsOf: (layer: BarLayer) => number[], options: BarLayoutOptions = {}): Diagnostic[] {
  const out: Diagnostic[] = [];
  const layers = definition.bars;
  if (!Array.isArray(layers)) return out;
  if (layers.length === 0) {
    out.push({ code: 'no-tension-steel', path: `${path}.bars`, severity: 'warning', message: 'the section has no bars: neither sagging nor hogging has tension steel, so it is plain concrete that fails as it cracks; reinforced-concrete results do not apply' });
    return out;
  }
  if (layers.length > MAX_BAR_LAYERS) {
    out.push({ code: 'out-of-range', path: `${path}.bars`, severity: 'error', message: `a section may have at most ${MAX_BAR_LAYERS} bar layers, got ${layers.length}` });
    return out;
  }
  const at = (i: number) => `${path}.bars[${i}]`;

  // Repeated layers: the same steel twice at the same place.
  const first = new Map<string, number>();
  const repeated = new Set<number>();
  layers.forEach((layer, i) => {
    if (!soundLayer(layer)) return;
    const key = JSON.stringify([layer.steelId, layer.depth, layer.count ?? null, layer.diameter ?? null, layer.count === undefined ? layer.area ?? null : null, layer.spread ?? 'web']);
    const earlier = first.get(key);
    if (earlier === undefined) first.set(key, i);
    else {
      repeated.add(i);
      out.push({ code: 'inconsistent', path: at(i), severity: 'error', message: `repeats bars[${earlier}] (same steel, depth and bars): the steel would be counted twice; remove one, or give the total in one layer` });
    }
  });

  const placed: PlacedLayer[] = [];
  layers.forEach((layer, i) => {
    if (repeated.has(i) || !soundLayer(layer)) return;
    const xs = positionsOf(layer).filter(Number.isFinite).sort((a, b) => a - b);
    if (xs.length === 0) return;
    placed.push({ index: i, layer, diameter: layerDiameter(layer), depth: layer.depth, xs, bars: layer.count !== undefined && layer.diameter !== undefined });
  });
  const tol = 1e-6;

  // Bars in the concrete (exact, voids included).
  if (options.containment) {
    const { outline, voids } = shapeOutline(definition.shape);
    const gtol = geometryTolerance(outline);
    const which = options.containment;
    for (const p of placed) {
      if (which !== 'all' && !which.has(p.index)) continue;
      const r = p.diameter / 2;
      for (let k = 0; k < p.xs.length; k++) {
        const c = { x: p.xs[k]!, y: p.depth };
        const where = circlePlacement(c, r, outline, voids, gtol);
        if (where === 'inside') continue;
        const hole = voids.findIndex((v) => pointInPolygon(c, v, -1) || polygonEdges(v).some((e) => distanceToSegment(c, e.a, e.b) < r - gtol));
        const what = where === 'outside' ? (hole >= 0 ? `lies in void ${hole}` : 'lies outside the concrete') : hole >= 0 ? `cuts into void ${hole}` : 'sticks out of the concrete';
        out.push(diagnostic('outside-section', at(p.index), 'error', phrase`bar ${k + 1} of ${p.xs.length} (${len(p.diameter)} at x ${len(c.x)}, depth ${len(c.y)}) ${what}`));
        break;
      }
    }
  }

  // Within a layer: clear spacing (overlap there is the builder's "do not fit").
  if (options.code) {
    for (const p of placed) {
      if (!p.bars || p.xs.length < 2) continue;
      let pitch = Infinity;
      for (let k = 1; k < p.xs.length; k++) pitch = Math.min(pitch, p.xs[k]! - p.xs[k - 1]!);
      const clear = pitch - p.diameter;
      const rule = minimumClearSpacing(options.code, p.diameter, p.diameter, true);
      if (clear >= -tol && clear < rule.spacing - tol) {
        out.push(diagnostic('geometry', at(p.index), 'warning', phrase`the clear spacing of its bars, ${len(Math.max(clear, 0))}, is less than ${len(rule.spacing)} (${rule.clause})`));
      }
    }
  }

  // Between layers: overlap (error) and clear distance (warning), once per layer.
  const byDepth = [...placed].sort((a, b) => a.depth - b.depth || a.index - b.index);
  const reach = Math.max(...placed.map((p) => p.diameter), 0) + Math.max(60, ASSUMED_AGGREGATE_SIZE * 2);
  const reported = new Set<number>();
  for (let s = 0; s < byDepth.length; s++) {
    const upper = byDepth[s]!;
    for (let t = s + 1; t < byDepth.length && byDepth[t]!.depth - upper.depth < reach; t++) {
      const lower = byDepth[t]!;
      const [later, earlier] = lower.index > upper.index ? [lower, upper] : [upper, lower];
      if (reported.has(later.index)) continue;
      const dy = lower.depth - upper.depth;
      const { dx, xa, xb } = nearest(later.xs, earlier.xs);
      const distance = Math.hypot(dx, dy);
      const needed = (later.diameter + earlier.diameter) / 2;
      const clear = distance - needed;
      const bar = (layer: PlacedLayer, x: number) => phrase`a ${len(layer.diameter)} bar at x ${len(x)}, depth ${len(layer.depth)}`;
      if (clear < -tol) {
        reported.add(later.index);
        out.push(diagnostic('geometry', at(later.index), 'error', phrase`its bars overlap those of bars[${earlier.index}]: ${bar(later, xa)} and ${bar(earlier, xb)} have centres ${len(distance)} apart, at least ${len(needed)} needed; the steel would be counted twice where it overlaps`));
        continue;
      }
      if (!options.code || !later.bars || !earlier.bars) continue;
      const rule = minimumClearSpacing(options.code, later.diameter, earlier.diameter, dy <= tol);
      if (clear < rule.spacing - tol) {
        reported.add(later.index);
        out.push(diagnostic('geometry', at(later.index), 'warning', phrase`the clear distance between its bars and those of bars[${earlier.index}] is ${len(Math.max(clear, 0))} (${bar(later, xa)} and ${bar(earlier, xb)}), less than ${len(rule.spacing)} (${rule.clause})`));
      }
    }
  }
  return out;
}
