/**
 * Small-sample statistics for test results (in-place concrete strength from cores): the normal,
 * Student t and noncentral t distributions, and the factors built on them.
 *
 * Everything here is dimensionless. Each function states its accuracy; all are deterministic and
 * never return NaN or Infinity for arguments inside their documented ranges (outside, they throw a
 * BugError: callers validate user input first).
 */
import { BugError } from '../diagnostics.ts';
import { brentRoot } from '../numeric/roots.ts';
import { GAUSS_4_NODES, GAUSS_4_WEIGHTS } from '../numeric/quadrature.ts';

/** Lanczos coefficients (g = 7, n = 9) for ln Γ. @see C. Lanczos (1964), SIAM J. Numer. Anal. B 1, 86–96; coefficients as tabulated by P. Godfrey (2001) */
const LANCZOS = [
  0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059,
  12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6, 1.5056327351493116e-7,
];

/**
 * Natural logarithm of the gamma function, ln Γ(x), for x > 0 (relative accuracy about 1e-15).
 * @see Lanczos (1964) approximation with g = 7
 */
export function logGamma(x: number): number {
  if (!(x > 0) || !Number.isFinite(x)) throw new BugError(`logGamma needs a finite x > 0, got ${x}`);
  if (x < 0.5) return Math.log(Math.PI / Math.sin(Math.PI * x)) - logGamma(1 - x); // reflection formula
  const z = x - 1;
  let sum = LANCZOS[0]!;
  for (let i = 1; i < LANCZOS.length; i++) sum += LANCZOS[i]! / (z + i);
  const t = z + 7.5;
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(sum);
}

/**
 * Regularised lower incomplete gamma function P(a, x) = γ(a, x)/Γ(a), a > 0, x ≥ 0
 * (series for x < a + 1, continued fraction otherwise; accuracy about 1e-14).
 * @see Abramowitz & Stegun (1964) 6.5.29 (series) and 6.5.31 (continued fraction)
 */
export function regularizedGammaP(a: number, x: number): number {
  if (!(a > 0) || !(x >= 0) || !Number.isFinite(x)) throw new BugError(`regularizedGammaP needs a > 0 and finite x ≥ 0, got a = ${a}, x = ${x}`);
  if (x === 0) return 0;
  const logPrefix = a * Math.log(x) - x - logGamma(a);
  if (x < a + 1) {
    let term = 1 / a;
    let sum = term;
    for (let n = 1; n < 500; n++) {
      term *= x / (a + n);
      sum += term;
      if (Math.abs(term) < Math.abs(sum) * 1e-16) break;
    }
    return Math.min(1, sum * Math.exp(logPrefix));
  }
  // Continued fraction for Q(a, x) by the modified Lentz method.
  const tiny = 1e-300;
  let b = x + 1 - a;
  let c = 1 / tiny;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i < 500; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < tiny) d = tiny;
    c = b + an / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return Math.max(0, 1 - Math.exp(logPrefix) * h);
}

/**
 * Standard normal distribution function Φ(z) = ½[1 + sign(z)·P(½, z²/2)] (accuracy about 1e-14).
 * @see Abramowitz & Stegun (1964) 26.2.2 and 6.5.16 (Φ in terms of the incomplete gamma function)
 */
export function normalCdf(z: number): number {
  if (Number.isNaN(z)) throw new BugError('normalCdf of NaN');
  if (z === Infinity) return 1;
  if (z === -Infinity) return 0;
  const p = regularizedGammaP(0.5, (z * z) / 2);
  return z >= 0 ? 0.5 * (1 + p) : 0.5 * (1 - p);
}

/** Standard normal quantile z with Φ(z) = p, 0 < p < 1 (Brent root of Φ, |z| ≤ 40, accuracy about 1e-12). */
export function normalQuantile(p: number): number {
  if (!(p > 0 && p < 1)) throw new BugError(`normalQuantile needs 0 < p < 1, got ${p}`);
  const f = (z: number) => normalCdf(z) - p;
  const root = brentRoot(f, -40, 40, f(-40), f(40), { xTolerance: 1e-13 });
  return root.x;
}

/**
 * Regularised incomplete beta function I_x(a, b), 0 ≤ x ≤ 1, a, b > 0 (continued fraction,
 * accuracy about 1e-14).
 * @see Abramowitz & Stegun (1964) 26.5.8 (continued fraction) and 26.5.2 (symmetry)
 */
export function regularizedBeta(x: number, a: number, b: number): number {
  if (!(x >= 0 && x <= 1) || !(a > 0) || !(b > 0)) throw new BugError(`regularizedBeta needs 0 ≤ x ≤ 1 and a, b > 0, got x = ${x}, a = ${a}, b = ${b}`);
  if (x === 0 || x === 1) return x;
  const logFront = logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log(1 - x);
  if (x > (a + 1) / (a + b + 2)) return 1 - regularizedBeta(1 - x, b, a);
  const tiny = 1e-300;
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  if (Math.abs(d) < tiny) d = tiny;
  d = 1 / d;
  let h = d;
  for (let m = 1; m < 500; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((a + m2 - 1) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + m2 + 1));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return (Math.exp(logFront) * h) / a;
}

/**
 * Student t distribution function with ν > 0 degrees of freedom:
 * F(t) = 1 − ½ I_{ν/(ν+t²)}(ν/2, ½) for t ≥ 0, symmetric for t < 0.
 * @see Abramowitz & Stegun (1964) 26.7.1 and 26.5.27
 */
export function studentTCdf(t: number, dof: number): number {
  if (!(dof > 0) || Number.isNaN(t)) throw new BugError(`studentTCdf needs ν > 0 and a number t, got ν = ${dof}, t = ${t}`);
  if (t === Infinity) return 1;
  if (t === -Infinity) return 0;
  const tail = 0.5 * regularizedBeta(dof / (dof + t * t), dof / 2, 0.5);
  return t >= 0 ? 1 - tail : tail;
}

/** Student t quantile: t with F(t) = p for ν degrees of freedom, 0 < p < 1 (accuracy about 1e-10). */
export function studentTQuantile(p: number, dof: number): number {
  if (!(p > 0 && p < 1) || !(dof > 0)) throw new BugError(`studentTQuantile needs 0 < p < 1 and ν > 0, got p = ${p}, ν = ${dof}`);
  const f = (t: number) => studentTCdf(t, dof) - p;
  let hi = 10;
  while (f(hi) < 0 && hi < 1e8) hi *= 4;
  let lo = -10;
  while (f(lo) > 0 && lo > -1e8) lo *= 4;
  return brentRoot(f, lo, hi, f(lo), f(hi), { xTolerance: 1e-12 }).x;
}

/**
 * Noncentral t distribution function with ν degrees of freedom and noncentrality δ:
 *   F(t) = ∫₀^∞ Φ(t·s − δ) g(s) ds,  g = density of S = √(χ²_ν/ν),
 *   g(s) = ν^(ν/2) s^(ν−1) e^(−ν s²/2) / (2^(ν/2−1) Γ(ν/2)).
 * Integrated by composite 4-point Gauss–Legendre over the body of g (absolute accuracy about 1e-10
 * for 1 ≤ ν ≤ 1000).
 * @see N. L. Johnson, S. Kotz & N. Balakrishnan, Continuous Univariate Distributions, vol. 2, 2nd ed. (1995), ch. 31 (definition of the noncentral t)
 */
export function noncentralTCdf(t: number, dof: number, noncentrality: number): number {
  if (!(dof >= 1) || !Number.isFinite(t) || !Number.isFinite(noncentrality)) throw new BugError(`noncentralTCdf needs ν ≥ 1 and finite t, δ; got ν = ${dof}, t = ${t}, δ = ${noncentrality}`);
  const logNorm = (dof / 2) * Math.log(dof) - (dof / 2 - 1) * Math.LN2 - logGamma(dof / 2);
  const density = (s: number) => (s > 0 ? Math.exp(logNorm + (dof - 1) * Math.log(s) - (dof * s * s) / 2) : 0);
  // S has mean ≈ 1 and standard deviation ≈ 1/√(2ν); ν = 1 has the heaviest tail (half-normal).
  const spread = 1 / Math.sqrt(2 * dof);
  const upper = Math.max(1 + 14 * spread, 8.5);
  const lower = Math.max(0, 1 - 14 * spread);
  const panels = 400;
  const h = (upper - lower) / panels;
  let sum = 0;
  for (let k = 0; k < panels; k++) {
    const mid = lower + (k + 0.5) * h;
    for (let g = 0; g < 4; g++) {
      const s = mid + 0.5 * h * GAUSS_4_NODES[g]!;
      sum += GAUSS_4_WEIGHTS[g]! * 0.5 * h * normalCdf(t * s - noncentrality) * density(s);
    }
  }
  return Math.min(1, Math.max(0, sum));
}

/** Quantile of the noncentral t distribution: t with F(t; ν, δ) = p, 0 < p < 1. */
export function noncentralTQuantile(p: number, dof: number, noncentrality: number): number {
  if (!(p > 0 && p < 1)) throw new BugError(`noncentralTQuantile needs 0 < p < 1, got ${p}`);
  const f = (t: number) => noncentralTCdf(t, dof, noncentrality) - p;
  let lo = noncentrality - 10;
  let hi = noncentrality + 10;
  while (f(lo) > 0 && lo > -1e6) lo -= 4 * (hi - lo);
  while (f(hi) < 0 && hi < 1e6) hi += 4 * (hi - lo);
  return brentRoot(f, lo, hi, f(lo), f(hi), { xTolerance: 1e-10 }).x;
}

/**
 * One-sided tolerance factor K for a normal population sampled n times: with confidence γ, at
 * most the fraction p of the population lies below x̄ − K·s.
 *   K = t′_γ(ν = n − 1, δ = z_(1−p)·√n) / √n, t′_γ the γ-quantile of the noncentral t.
 * @param count n ≥ 2
 * @param fractile p, 0 < p < 0.5 (e.g. 0.10)
 * @param confidence γ, 0.5 < γ < 1 (e.g. 0.75)
 * @see M. G. Natrella (1963), Experimental Statistics, NBS Handbook 91, §2-5 and Table A-7 (one-sided tolerance factors); D. B. Owen (1963), Factors for one-sided tolerance limits, Sandia SCR-607
 */
export function oneSidedToleranceFactor(count: number, fractile: number, confidence: number): number {
  if (!(Number.isInteger(count) && count >= 2)) throw new BugError(`oneSidedToleranceFactor needs an integer n ≥ 2, got ${count}`);
  if (!(fractile > 0 && fractile < 0.5) || !(confidence > 0.5 && confidence < 1)) throw new BugError(`oneSidedToleranceFactor needs 0 < p < 0.5 and 0.5 < γ < 1, got p = ${fractile}, γ = ${confidence}`);
  const root = Math.sqrt(count);
  const delta = normalQuantile(1 - fractile) * root;
  return noncentralTQuantile(confidence, count - 1, delta) / root;
}
