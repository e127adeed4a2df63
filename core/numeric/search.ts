/**
 * Searches in ascending lists of numbers (knots of a piecewise law, stations).
 */

/** First index k with xs[k] > v (xs ascending; xs.length when none). Binary search. */
export function firstAbove(xs: ArrayLike<number>, v: number): number {
  let lo = 0;
  let hi = xs.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (xs[mid]! <= v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Appends to `out` the values of the ascending list `xs` strictly between lo and hi, in order. */
export function pushBetween(xs: ArrayLike<number>, lo: number, hi: number, out: number[]): void {
  for (let i = firstAbove(xs, lo); i < xs.length && xs[i]! < hi; i++) out.push(xs[i]!);
}
