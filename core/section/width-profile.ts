/**
 * Width of a cross-section as a function of depth, stored as horizontal strips in which the width
 * varies linearly. Any polygonal section (with voids) is exactly such a profile, so integrals of
 * stress over the section reduce to one-dimensional integrals over depth.
 * Units: mm; y is depth downward from the top fibre.
 */
import type { Point, ShapeOutline } from './shapes.ts';

export interface Strip {
  /** Depth of the strip's upper edge, mm. */
  readonly top: number;
  /** Depth of the strip's lower edge, mm (> top). */
  readonly bottom: number;
  /** Width just below the upper edge, mm. */
  readonly widthTop: number;
  /** Width just above the lower edge, mm. */
  readonly widthBottom: number;
}

/** Width of a strip at depth y (top ≤ y ≤ bottom), mm. */
export function stripWidthAt(strip: Strip, y: number): number {
  const t = strip.bottom - strip.top;
  return t > 0 ? strip.widthTop + ((strip.widthBottom - strip.widthTop) * (y - strip.top)) / t : strip.widthTop;
}

function edgesOf(polygon: readonly Point[]): [Point, Point][] {
  const edges: [Point, Point][] = [];
  for (let i = 0; i < polygon.length; i++) {
    const a = polygon[i]!;
    const b = polygon[(i + 1) % polygon.length]!;
    if (a.y !== b.y) edges.push([a, b]);
  }
  return edges;
}

function xOnEdge(a: Point, b: Point, y: number): number {
  return a.x + ((b.x - a.x) * (y - a.y)) / (b.y - a.y);
}

/**
 * Intervals [x0, x1] where the horizontal line at depth y lies inside the section (even–odd rule,
 * so voids are excluded). For y exactly at a vertex, call with a depth slightly inside a strip.
 */
export function chordIntervals(outline: ShapeOutline, y: number): [number, number][] {
  const xs: number[] = [];
  for (const polygon of [outline.outline, ...outline.voids]) {
    for (const [a, b] of edgesOf(polygon)) {
      const lo = Math.min(a.y, b.y);
      const hi = Math.max(a.y, b.y);
      if (y > lo && y < hi) xs.push(xOnEdge(a, b, y));
    }
  }
  xs.sort((p, q) => p - q);
  const intervals: [number, number][] = [];
  for (let i = 0; i + 1 < xs.length; i += 2) intervals.push([xs[i]!, xs[i + 1]!]);
  return intervals;
}

/** Builds the exact strip profile of a polygonal outline with voids. */
export function widthProfile(outline: ShapeOutline): Strip[] {
  const levels = [...new Set([outline.outline, ...outline.voids].flat().map((p) => p.y))].sort((a, b) => a - b);
  const polygons = [outline.outline, ...outline.voids];
  const strips: Strip[] = [];
  for (let i = 0; i + 1 < levels.length; i++) {
    const top = levels[i]!;
    const bottom = levels[i + 1]!;
    const mid = 0.5 * (top + bottom);
    // Edges spanning the whole slab, ordered by x at mid-depth; pairing them by the even–odd rule
    // gives the width at both ends of the slab exactly (no vertex lies inside the slab).
    const crossing: { xTop: number; xBottom: number; xMid: number }[] = [];
    for (const polygon of polygons) {
      for (const [a, b] of edgesOf(polygon)) {
        if (Math.min(a.y, b.y) <= top && Math.max(a.y, b.y) >= bottom) {
          crossing.push({ xTop: xOnEdge(a, b, top), xBottom: xOnEdge(a, b, bottom), xMid: xOnEdge(a, b, mid) });
        }
      }
    }
    crossing.sort((p, q) => p.xMid - q.xMid);
    let widthTop = 0;
    let widthBottom = 0;
    for (let k = 0; k + 1 < crossing.length; k += 2) {
      widthTop += crossing[k + 1]!.xTop - crossing[k]!.xTop;
      widthBottom += crossing[k + 1]!.xBottom - crossing[k]!.xBottom;
    }
    if (widthTop > 0 || widthBottom > 0) strips.push({ top, bottom, widthTop, widthBottom });
  }
  return strips;
}

/** Width of a profile at depth y, taking the strip that contains y (the lower one at a boundary). */
export function profileWidthAt(profile: readonly Strip[], y: number): number {
  for (const strip of profile) if (y >= strip.top && y < strip.bottom) return stripWidthAt(strip, y);
  const last = profile[profile.length - 1];
  return last && y === last.bottom ? last.widthBottom : 0;
}

/**
 * Difference of two profiles, a − b (e.g. the whole concrete minus the confined core gives the
 * cover). Widths stay linear inside every merged slab because both inputs are linear there.
 * Tiny negative widths from round-off are clipped to zero.
 */
export function subtractProfile(a: readonly Strip[], b: readonly Strip[]): Strip[] {
  const levels = [...new Set([...a, ...b].flatMap((s) => [s.top, s.bottom]))].sort((p, q) => p - q);
  const at = (profile: readonly Strip[], top: number, bottom: number, y: number): number => {
    for (const s of profile) if (s.top <= top && s.bottom >= bottom) return stripWidthAt(s, y);
    return 0;
  };
  const strips: Strip[] = [];
  for (let i = 0; i + 1 < levels.length; i++) {
    const top = levels[i]!;
    const bottom = levels[i + 1]!;
    const widthTop = at(a, top, bottom, top) - at(b, top, bottom, top);
    const widthBottom = at(a, top, bottom, bottom) - at(b, top, bottom, bottom);
    const clip = (w: number) => (w > 1e-9 ? w : 0);
    if (clip(widthTop) > 0 || clip(widthBottom) > 0) strips.push({ top, bottom, widthTop: clip(widthTop), widthBottom: clip(widthBottom) });
  }
  return strips;
}

/** ∫ w(y)·(y − yRef)^k dy over the profile for k = 0, 1, 2 (mm^(2+k)); exact (2-point Gauss on cubic integrands). */
export function profileMoments(profile: readonly Strip[], yRef = 0): { area: number; firstMoment: number; secondMoment: number } {
  const g = 1 / Math.sqrt(3);
  let area = 0;
  let firstMoment = 0;
  let secondMoment = 0;
  for (const s of profile) {
    const half = 0.5 * (s.bottom - s.top);
    const mid = 0.5 * (s.bottom + s.top);
    for (const xi of [-g, g]) {
      const y = mid + half * xi;
      const w = stripWidthAt(s, y) * half;
      const d = y - yRef;
      area += w;
      firstMoment += w * d;
      secondMoment += w * d * d;
    }
  }
  return { area, firstMoment, secondMoment };
}
