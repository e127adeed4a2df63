/**
 * Geometry predicates of section outlines, in one place: which side of a line a point lies on,
 * whether two edges meet, whether a point or a bar's circle lies inside a region with voids.
 *
 * Robustness: every test takes a length tolerance `tol` (mm) and calls a point "on" a line or an
 * edge when it lies within `tol` of it, so round-off in the cross products never decides a verdict.
 * Callers scale it to the section (`geometryTolerance`: 10⁻⁹ of the section's size — far above the
 * round-off of coordinates up to 20 m, about 10⁻¹² of them, and far below any dimension built).
 * Units: mm; y down from the top fibre (the tests do not depend on the direction of y).
 */
import type { Point } from './shapes.ts';

/** Tolerance of the predicates for a set of points, mm: 10⁻⁹ of the diagonal of their bounding box (at least 10⁻⁹ mm). */
export function geometryTolerance(points: readonly Point[]): number {
  let x0 = Infinity;
  let x1 = -Infinity;
  let y0 = Infinity;
  let y1 = -Infinity;
  for (const p of points) {
    x0 = Math.min(x0, p.x);
    x1 = Math.max(x1, p.x);
    y0 = Math.min(y0, p.y);
    y1 = Math.max(y1, p.y);
  }
  const size = points.length > 0 ? Math.hypot(x1 - x0, y1 - y0) : 0;
  return 1e-9 * Math.max(size, 1);
}

/**
 * Side of point c from the line through a and b: +1 on the left (counter-clockwise turn a→b→c
 * in x–y axes), −1 on the right, 0 within `tol` of the line (or a and b closer than `tol`).
 */
export function orientation(a: Point, b: Point, c: Point, tol: number): -1 | 0 | 1 {
  const length = Math.hypot(b.x - a.x, b.y - a.y);
  if (length <= tol) return 0;
  const cross = (b.x - a.x) * (c.y - a.y) - (b.y - a.y) * (c.x - a.x);
  // cross / length is the signed distance of c from the line.
  if (Math.abs(cross) <= tol * length) return 0;
  return cross > 0 ? 1 : -1;
}

/** Distance from point p to the segment a–b, mm. */
export function distanceToSegment(p: Point, a: Point, b: Point): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const l2 = dx * dx + dy * dy;
  const t = l2 > 0 ? Math.min(Math.max(((p.x - a.x) * dx + (p.y - a.y) * dy) / l2, 0), 1) : 0;
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}

/**
 * Whether the closed segments p1–p2 and q1–q2 meet: cross, touch, or overlap along a line (within
 * `tol`). Proper crossings by orientation signs; contacts by distance of an end to the other segment.
 */
export function segmentsMeet(p1: Point, p2: Point, q1: Point, q2: Point, tol: number): boolean {
  const o1 = orientation(p1, p2, q1, tol);
  const o2 = orientation(p1, p2, q2, tol);
  const o3 = orientation(q1, q2, p1, tol);
  const o4 = orientation(q1, q2, p2, tol);
  if (o1 * o2 < 0 && o3 * o4 < 0) return true;
  return distanceToSegment(q1, p1, p2) <= tol || distanceToSegment(q2, p1, p2) <= tol
    || distanceToSegment(p1, q1, q2) <= tol || distanceToSegment(p2, q1, q2) <= tol;
}

/**
 * Whether two edges that share the vertex `v` (a → v → b) fold back onto each other: the turn at v
 * is a full reversal, so the edges overlap along a line (a spike of zero width).
 */
export function edgesFoldBack(a: Point, v: Point, b: Point, tol: number): boolean {
  return orientation(a, v, b, tol) === 0 && (a.x - v.x) * (b.x - v.x) + (a.y - v.y) * (b.y - v.y) > 0;
}

/** Whether p lies inside a closed polygon (even–odd rule; a point on an edge counts as inside). */
export function pointInPolygon(p: Point, polygon: readonly Point[], tol: number): boolean {
  let inside = false;
  for (let i = 0, j = polygon.length - 1; i < polygon.length; j = i++) {
    const a = polygon[j]!;
    const b = polygon[i]!;
    if (distanceToSegment(p, a, b) <= tol) return true;
    if ((a.y > p.y) !== (b.y > p.y) && p.x < a.x + ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y)) inside = !inside;
  }
  return inside;
}

/** The edges of a closed polygon: edge i runs from point i to point i + 1 (the last back to point 0). */
export function polygonEdges(polygon: readonly Point[]): { readonly index: number; readonly a: Point; readonly b: Point }[] {
  return polygon.map((a, index) => ({ index, a, b: polygon[(index + 1) % polygon.length]! }));
}

/**
 * Where a bar's circle (centre c, radius r) lies against a region (outline minus voids):
 * `inside`, `outside` (the centre is outside the outline or within a void) or `edge` (the centre
 * is inside but the circle crosses an edge of the outline or of a void). Exact for polygons.
 */
export function circlePlacement(c: Point, r: number, outline: readonly Point[], voids: readonly (readonly Point[])[], tol: number): 'inside' | 'outside' | 'edge' {
  if (!pointInPolygon(c, outline, -1) || voids.some((v) => pointInPolygon(c, v, -1))) return 'outside';
  for (const polygon of [outline, ...voids]) {
    for (const { a, b } of polygonEdges(polygon)) if (distanceToSegment(c, a, b) < r - tol) return 'edge';
  }
  return 'inside';
}
