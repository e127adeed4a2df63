/**
 * Section outlines for the as-found and strengthened beams: cover removed from a face (spalling,
 * delamination) and depth added for a new concrete layer. Works on any shape whose every
 * horizontal cut is a single piece (rectangle, tee, inverted tee, ell, I, and such polygons); a box
 * or a polygon with voids is refused with a clear message.
 *
 * The result is a polygon outline (y down from the new top fibre, x as in the original shape, so
 * bars keep their horizontal positions). Depth added for a new layer is represented in the outline
 * by a zero-width edge reaching the new top or bottom fibre, so that the section's height, its
 * faces and its depth coordinates include the layer while the layer's concrete itself — with its
 * own law — is added as a separate part (core/section/build.ts `SectionAdditions`). Zero-width
 * strips carry no concrete (core/section/width-profile.ts drops them).
 *
 * Units: mm.
 */
import type { Point, SectionShape } from '../section/shapes.ts';
import { shapeOutline } from '../section/shapes.ts';
import { chordIntervals } from '../section/width-profile.ts';
import { phrase, q, type Text } from '../units/phrase.ts';

/** A section dimension in a message (mm, shown in the display unit of section lengths). */
const len = (mm: number) => q('sectionLength', mm, { compact: true });

/** Concrete lost from the side faces over a depth range (in the original section's depths), mm. */
export interface SideCut {
  readonly depth: number;
  readonly from: number;
  readonly to: number;
}

/** What to change in an outline: cover lost per face and depth added for a new layer, mm. */
export interface OutlineChange {
  /** Concrete lost from the top and bottom faces, mm (≥ 0). */
  readonly top: number;
  readonly bottom: number;
  readonly left: readonly SideCut[];
  readonly right: readonly SideCut[];
  /** Depth added above the top face and below the bottom face for a new concrete layer, mm (≥ 0). */
  readonly addTop: number;
  readonly addBottom: number;
}

/** An outline change that changes nothing (a base to spread over). */
export const NO_CHANGE: OutlineChange = { top: 0, bottom: 0, left: [], right: [], addTop: 0, addBottom: 0 };

/** The changed outline (a polygon, mm) with where the original concrete now lies, or why it cannot be changed. */
export type OutlineOutcome =
  | {
      readonly ok: true;
      readonly shape: SectionShape & { readonly kind: 'polygon' };
      /** New depth = original depth − shift (shift = top cut − depth added on top). */
      readonly shift: number;
      /** Depth of the original concrete's top and bottom faces in the new coordinates, mm. */
      readonly concreteTop: number;
      readonly concreteBottom: number;
      /** Total height of the new outline, mm. */
      readonly height: number;
      /** The remaining concrete's chord [x0, x1] at its top and bottom faces, mm. */
      readonly topChord: readonly [number, number];
      readonly bottomChord: readonly [number, number];
    }
  | { readonly ok: false; readonly message: Text };

/** Height of an outline: deepest point minus highest, mm. */
function outlineDepth(points: readonly Point[]): { top: number; bottom: number } {
  return { top: Math.min(...points.map((p) => p.y)), bottom: Math.max(...points.map((p) => p.y)) };
}

/**
 * Applies cuts and additions to a shape's outline. Side cuts remove `depth` from the outermost
 * concrete at each level inside their range (the web's side below a flange, the flange tip within
 * it). Returns a message instead of a shape when the shape is not single-piece at every level or
 * when a cut leaves no concrete.
 */
export function changeOutline(shape: SectionShape, change: OutlineChange): OutlineOutcome {
  const outline = shapeOutline(shape);
  if (outline.voids.length > 0) return { ok: false, message: `a ${shape.kind} with voids cannot have cover removed or a layer added here (only sections whose every horizontal cut is one piece)` };
  const { top: y0, bottom: y1 } = outlineDepth(outline.outline);
  const h = y1 - y0;
  const cutTop = y0 + change.top;
  const cutBottom = y1 - change.bottom;
  if (!(cutBottom - cutTop > 1e-6)) return { ok: false, message: phrase`cover loss of ${len(change.top)} at the top and ${len(change.bottom)} at the bottom leaves nothing of the ${len(h)} deep section` };
  const levels = new Set<number>([cutTop, cutBottom]);
  for (const p of outline.outline) if (p.y > cutTop && p.y < cutBottom) levels.add(p.y);
  for (const c of [...change.left, ...change.right]) {
    for (const y of [c.from, c.to]) if (y > cutTop && y < cutBottom) levels.add(y);
  }
  const sorted = [...levels].sort((a, b) => a - b);
  const right: Point[] = [];
  const left: Point[] = [];
  for (let i = 0; i + 1 < sorted.length; i++) {
    const ya = sorted[i]!;
    const yb = sorted[i + 1]!;
    if (!(yb - ya > 1e-9)) continue;
    const c1 = chordIntervals(outline, ya + 0.25 * (yb - ya));
    const c2 = chordIntervals(outline, ya + 0.75 * (yb - ya));
    if (c1.length !== 1 || c2.length !== 1) {
      return { ok: false, message: phrase`the ${shape.kind} section is in ${Math.max(c1.length, c2.length)} pieces at depth ${len((ya + yb) / 2)}: cover loss and added layers are supported only where every horizontal cut is one piece` };
    }
    const [l1, r1] = c1[0]!;
    const [l2, r2] = c2[0]!;
    // Chords are linear within the band: extrapolate from the quarter points to its ends.
    const lAt = (t: number) => l1 + (l2 - l1) * (t - 0.25) * 2;
    const rAt = (t: number) => r1 + (r2 - r1) * (t - 0.25) * 2;
    const mid = 0.5 * (ya + yb);
    const cut = (list: readonly SideCut[]) => list.reduce((s, c) => (mid > c.from && mid < c.to ? Math.max(s, c.depth) : s), 0);
    const sl = cut(change.left);
    const sr = cut(change.right);
    const la = lAt(0) + sl;
    const lb = lAt(1) + sl;
    const ra = rAt(0) - sr;
    const rb = rAt(1) - sr;
    if (!(ra - la > 1e-6 && rb - lb > 1e-6)) {
      return { ok: false, message: phrase`side cover loss (${len(sl)} left, ${len(sr)} right) removes the whole width between depths ${len(ya)} and ${len(yb)}` };
    }
    right.push({ x: ra, y: ya }, { x: rb, y: yb });
    left.push({ x: la, y: ya }, { x: lb, y: yb });
  }
  const shift = cutTop - change.addTop;
  const move = (p: Point): Point => ({ x: p.x, y: p.y - shift });
  const points: Point[] = [];
  const push = (p: Point) => {
    const last = points[points.length - 1];
    if (!last || Math.abs(last.x - p.x) > 1e-9 || Math.abs(last.y - p.y) > 1e-9) points.push(p);
  };
  for (const p of right) push(move(p));
  const concreteTop = cutTop - shift;
  const concreteBottom = cutBottom - shift;
  const bottomRight = right[right.length - 1]!;
  const bottomLeft = left[left.length - 1]!;
  const topLeft = left[0]!;
  const topRight = right[0]!;
  if (change.addBottom > 0) {
    // Zero-width edge down to the new bottom fibre at the bottom-right corner.
    push({ x: bottomRight.x, y: concreteBottom + change.addBottom });
    points.push({ x: bottomRight.x, y: concreteBottom });
  }
  for (let i = left.length - 1; i >= 0; i--) push(move(left[i]!));
  if (change.addTop > 0) {
    // Zero-width edge up to the new top fibre (y = 0) at the top-left corner.
    push({ x: topLeft.x, y: 0 });
    points.push({ x: topLeft.x, y: concreteTop });
  }
  return {
    ok: true,
    shape: { kind: 'polygon', outline: points },
    shift,
    concreteTop,
    concreteBottom,
    height: concreteBottom + change.addBottom,
    topChord: [topLeft.x, topRight.x],
    bottomChord: [bottomLeft.x, bottomRight.x],
  };
}
