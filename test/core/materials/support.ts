/** Small numerical helpers shared by the material tests. */

/** Central-difference derivative of f at x with step h. */
export function slope(f: (x: number) => number, x: number, h = 1e-7): number {
  return (f(x + h) - f(x - h)) / (2 * h);
}

/** One-sided slope just right of x (for a tangent at the origin or at a kink). */
export function rightSlope(f: (x: number) => number, x: number, h = 1e-8): number {
  return (f(x + h) - f(x)) / h;
}

/** Jump of f across x: |f(x + δ) − f(x − δ)| with a tiny δ. */
export function jumpAt(f: (x: number) => number, x: number, delta = 1e-12): number {
  return Math.abs(f(x + delta) - f(x - delta));
}

/** n + 1 evenly spaced points from a to b. */
export function linspace(a: number, b: number, n: number): number[] {
  return Array.from({ length: n + 1 }, (_, i) => (i === n ? b : a + ((b - a) * i) / n));
}

/** The maximum of f sampled on [a, b] and where it occurs. */
export function sampledMaximum(f: (x: number) => number, a: number, b: number, n = 4000): { x: number; value: number } {
  let best = { x: a, value: f(a) };
  for (const x of linspace(a, b, n)) {
    const value = f(x);
    if (value > best.value) best = { x, value };
  }
  return best;
}

/** Strains spanning every regime: zero, tiny, working, ultimate, absurdly large, both signs. */
export const PROBE_STRAINS: readonly number[] = [
  0, 1e-12, 1e-6, 5e-5, 1e-4, 2e-4, 5e-4, 0.001, 0.0015, 0.002, 0.0025, 0.003, 0.0035, 0.004, 0.005, 0.008, 0.01, 0.02, 0.05,
  0.1, 0.2, 1, 10, 1e6, 1e300, Number.MAX_VALUE,
].flatMap((s) => (s === 0 ? [0] : [s, -s]));
