/**
 * Gauss–Legendre nodes and weights on [−1, 1].
 * @see Abramowitz & Stegun (1964), Table 25.4.
 */
export const GAUSS_4_NODES: readonly number[] = [
  -0.8611363115940526, -0.3399810435848563, 0.3399810435848563, 0.8611363115940526,
];
export const GAUSS_4_WEIGHTS: readonly number[] = [
  0.3478548451374538, 0.6521451548625461, 0.6521451548625461, 0.3478548451374538,
];

/** 3-point Gauss–Legendre (exact for polynomials up to degree 5). @see Abramowitz & Stegun (1964), Table 25.4. */
export const GAUSS_3_NODES: readonly number[] = [-0.7745966692414834, 0, 0.7745966692414834];
export const GAUSS_3_WEIGHTS: readonly number[] = [0.5555555555555556, 0.8888888888888888, 0.5555555555555556];

/**
 * Maximises a unimodal function on [a, b] by golden-section search.
 * @returns the abscissa and value of the maximum found, to within `xTolerance`.
 */
export function goldenSectionMaximum(
  f: (x: number) => number,
  a: number,
  b: number,
  xTolerance: number,
  maxIterations = 80,
): { x: number; fx: number } {
  const ratio = (Math.sqrt(5) - 1) / 2;
  let x1 = b - ratio * (b - a);
  let x2 = a + ratio * (b - a);
  let f1 = f(x1);
  let f2 = f(x2);
  for (let i = 0; i < maxIterations && Math.abs(b - a) > xTolerance; i++) {
    if (f1 < f2) {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + ratio * (b - a);
      f2 = f(x2);
    } else {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - ratio * (b - a);
      f1 = f(x1);
    }
  }
  return f1 > f2 ? { x: x1, fx: f1 } : { x: x2, fx: f2 };
}
