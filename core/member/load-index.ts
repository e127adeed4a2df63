/**
 * The loads of a member, sorted once, with prefix sums, so that the three sums statics needs at a
 * point x — the load on a stretch of the member, and its moment about x from the left or from the
 * right — cost O(log n) instead of O(n). Statics evaluates them at every station, and a point load
 * or a zone boundary is a station: with the plain loop, 10,000 point loads meant 10⁸ operations
 * per field (issue 17, "large inputs"); building the index is O(n log n).
 *
 * Point loads: sorted by position a, with prefix sums of p and p·a; a sum over the loads in
 * [lo, hi] about x is x·Σp − Σp·a.
 * Uniform loads: each is a step +w at its start and −w at its end; with prefix sums of w, w·s and
 * w·s² over the sorted steps s, the load density q(y) = Σ_{s ≤ y} w_s integrates in closed form:
 *   F(y) = ∫_{−∞}^{y} q = Σ_{s<y} w_s (y − s),   G(y) = ∫_{−∞}^{y} q·t dt = Σ_{s<y} w_s (y² − s²)/2,
 * so the load on [lo, hi] is F(hi) − F(lo) and its moment about x (lever x − y) is
 * x·(F(hi) − F(lo)) − (G(hi) − G(lo)).
 * The sums agree with the direct loops to round-off (test/core/member/load-index.test.ts).
 * Units: mm, N, N/mm, N·mm.
 */

/** A load as statics sees it (core/member/statics.ts StaticLoad, written out here so statics can import this file). */
export type StaticLoad =
  | { readonly kind: 'uniform'; readonly w: number; readonly from: number; readonly to: number }
  | { readonly kind: 'point'; readonly p: number; readonly a: number };

export interface LoadIndex {
  /**
   * Moment about x of the loads on [a, b] that lie left of x (point loads strictly left), N·mm:
   * Σ load × (x − position).
   */
  momentOfLoadsLeft(a: number, b: number, x: number): number;
  /** Moment about x of the loads on [a, b] right of x (point loads strictly right), N·mm: Σ load × (position − x). */
  momentOfLoadsRight(a: number, b: number, x: number): number;
  /** Load on [a, b] left of x, N; a point load at x counts when `inclusive`. */
  loadLeft(a: number, b: number, x: number, inclusive: boolean): number;
}

/** First index i with values[i] ≥ v (strict: > v). */
function bound(values: Float64Array, v: number, strict: boolean): number {
  let lo = 0;
  let hi = values.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (strict ? values[mid]! <= v : values[mid]! < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Prefix sums: out[k] = Σ_{i<k} f(i). */
function prefix(n: number, f: (i: number) => number): Float64Array {
  const out = new Float64Array(n + 1);
  for (let i = 0; i < n; i++) out[i + 1] = out[i]! + f(i);
  return out;
}

/** Builds the index of `loads` (uniform loads that end before they start carry nothing and are left out). */
export function buildLoadIndex(loads: readonly StaticLoad[]): LoadIndex {
  const points = loads.filter((l): l is Extract<StaticLoad, { kind: 'point' }> => l.kind === 'point').sort((p, q) => p.a - q.a);
  const position = Float64Array.from(points, (l) => l.a);
  const sumP = prefix(points.length, (i) => points[i]!.p);
  const sumPA = prefix(points.length, (i) => points[i]!.p * points[i]!.a);

  const steps: { s: number; w: number }[] = [];
  for (const l of loads) {
    if (l.kind === 'uniform' && l.to > l.from) steps.push({ s: l.from, w: l.w }, { s: l.to, w: -l.w });
  }
  steps.sort((p, q) => p.s - q.s);
  const stepAt = Float64Array.from(steps, (t) => t.s);
  const w0 = prefix(steps.length, (i) => steps[i]!.w);
  const w1 = prefix(steps.length, (i) => steps[i]!.w * steps[i]!.s);
  const w2 = prefix(steps.length, (i) => steps[i]!.w * steps[i]!.s * steps[i]!.s);

  /** F(y) and G(y) of the uniform loads. */
  const integrals = (y: number): [number, number] => {
    const k = bound(stepAt, y, false);
    return [y * w0[k]! - w1[k]!, 0.5 * (y * y * w0[k]! - w2[k]!)];
  };
  /** Load and moment about x (lever x − y) of the uniform loads on [lo, hi]. */
  const uniform = (lo: number, hi: number, x: number): [number, number] => {
    if (!(hi > lo)) return [0, 0];
    const [fHi, gHi] = integrals(hi);
    const [fLo, gLo] = integrals(lo);
    return [fHi - fLo, x * (fHi - fLo) - (gHi - gLo)];
  };
  /** Σp and Σp·a over the point loads at positions from index i to j (exclusive). */
  const pointSums = (i: number, j: number): [number, number] => (j > i ? [sumP[j]! - sumP[i]!, sumPA[j]! - sumPA[i]!] : [0, 0]);

  return {
    momentOfLoadsLeft(a, b, x) {
      // Point loads with a ≤ position ≤ b and position < x.
      const end = x <= b ? bound(position, x, false) : bound(position, b, true);
      const [p, pa] = pointSums(bound(position, a, false), end);
      return x * p - pa + uniform(a, Math.min(b, x), x)[1];
    },
    momentOfLoadsRight(a, b, x) {
      // Point loads with a ≤ position ≤ b and position > x.
      const start = x >= a ? bound(position, x, true) : bound(position, a, false);
      const [p, pa] = pointSums(start, bound(position, b, true));
      return pa - x * p - uniform(Math.max(a, x), b, x)[1];
    },
    loadLeft(a, b, x, inclusive) {
      const end = x <= b ? bound(position, x, inclusive) : bound(position, b, true);
      const [p] = pointSums(bound(position, a, false), end);
      return p + uniform(a, Math.min(b, x), x)[0];
    },
  };
}

/** Fewer loads than this are summed directly (a few loads: the loop is faster, and results stay bit-for-bit those of the loop). */
export const INDEXED_LOADS_FROM = 32;

const cache = new WeakMap<readonly StaticLoad[], { readonly length: number; readonly index: LoadIndex }>();

/**
 * The index of a list of loads, built once per list (lists of loads are plain data that statics
 * reads at every station and never changes), or null for a short list.
 */
export function loadIndexOf(loads: readonly StaticLoad[]): LoadIndex | null {
  if (loads.length < INDEXED_LOADS_FROM) return null;
  const cached = cache.get(loads);
  // The length guards against a list grown after it was indexed (lists are meant to stay as built).
  if (cached && cached.length === loads.length) return cached.index;
  const index = buildLoadIndex(loads);
  cache.set(loads, { length: loads.length, index });
  return index;
}
