/**
 * The plastic part of a section's moment–curvature law, as the member engine spreads and localises
 * it (see DEVELOPERS.md "Member engine"):
 *
 *  - the curvature of a section is φ = φe(m) + φp(μ): φe the nonlinear-elastic part (the section's
 *    own curve up to first yield M′y, then the secant φ′y·m/M′y) and φp = φ − φe the plastic part,
 *    a function of μ, the largest moment the section has carried in that sense. A section that is
 *    loaded follows its curve (μ = m); one that unloads keeps its plastic curvature and unloads
 *    along the yield secant (Clough & Johnston 1966; the unloading stiffness of Takeda, Sozen &
 *    Nielsen 1970 with α = 0 — from memory). The plastic part is integrated along the member
 *    everywhere, so plasticity spreads over zones of near-constant moment;
 *  - the curve is followed this way up to the localisation moment: the first point of its ascending
 *    envelope within 0.1 % of the peak (a plateau flatter than that cannot spread plasticity;
 *    common practice, no source). Beyond it the section's further curvature localises in a hinge of
 *    length Lp: κ = φ − φe(m) − φp(M_loc), θ = κ·Lp, and the moment follows the rest of the curve
 *    (its descending branch) as κ grows, to the section's ultimate. Localising only the softening
 *    part over a length keeps the results independent of the station spacing (the plastic-hinge
 *    integration of Scott & Fenves 2006; the regularisation of softening sections of Coleman &
 *    Spacone 2001 — from memory).
 *
 * Units: moment N·mm (magnitudes in the law's own sense), curvature 1/mm.
 */
import type { MomentCurvatureResult, UltimateCause } from '../section/results.ts';
import { interpolateWithSlope, type SectionResponse, type ValueAndSlope } from './section-response.ts';
import { firstAbove } from '../numeric/search.ts';

/** Relative distance below the peak moment at which a section's deformation localises. */
export const LOCALISATION_TOLERANCE = 1e-3;

export interface PlasticLaw {
  /** First-yield moment M′y on the envelope (N·mm), or null when the section reaches its peak before the tension steel yields. */
  readonly yieldMoment: number | null;
  /** Peak moment of the curve, N·mm. */
  readonly peakMoment: number;
  /** Moment at which the deformation localises, N·mm, and the section's curvature there, 1/mm. */
  readonly localisationMoment: number;
  readonly localisationCurvature: number;
  /** Plastic curvature φp (1/mm) at the knots of the envelope from M′y (φp = 0) to the localisation moment (N·mm, ascending). Empty without yield. */
  readonly knotMoments: Float64Array;
  readonly knotPlastic: Float64Array;
  /** φp at the localisation moment, 1/mm. */
  readonly plasticAtLocalisation: number;
  /** After localisation: localised curvature κ (1/mm, ascending from 0) and the moment on the curve (N·mm), to its ultimate. */
  readonly softeningCurvature: Float64Array;
  readonly softeningMoment: Float64Array;
  /** κ at the end of the curve: the localised curvature the section can take, 1/mm. */
  readonly ultimateLocalised: number;
  /** The section's ultimate curvature, 1/mm, and what ends its curve (null: the plain-concrete response, which ends at cracking). */
  readonly ultimateCurvature: number;
  readonly ultimateCause: UltimateCause | null;
  /**
   * The code's crushing strain (the code ultimate of the section): reached on the spread branch when
   * the moment reaches `moment` (localised = null), or in the hinge when κ reaches `localised`.
   * Null when the curve ends before it.
   */
  readonly codeCrushing: { readonly moment: number; readonly localised: number | null; readonly curvature: number } | null;
}

/** φp and dφp/dμ at μ (0 below M′y, constant beyond the localisation moment). */
export function plasticAt(law: PlasticLaw, mu: number, out: ValueAndSlope): ValueAndSlope {
  if (law.knotMoments.length === 0 || mu <= law.knotMoments[0]!) {
    out.value = 0;
    out.slope = 0;
    return out;
  }
  return interpolateWithSlope(law.knotMoments, law.knotPlastic, mu, out);
}

/**
 * The moment of a localised hinge at localised curvature κ, and dM/dκ. At κ = 0 (a hinge that has
 * just formed; κ never falls below it) the slope is that of the first piece, taken to the right: a
 * clamped slope of 0 there would leave the hinge's equation without a derivative in its own
 * rotation, and Newton's method could not start the hinge rotating (issue 18, the cut-off beam).
 */
export function softeningAt(law: PlasticLaw, kappa: number, out: ValueAndSlope): ValueAndSlope {
  const xs = law.softeningCurvature;
  const ys = law.softeningMoment;
  interpolateWithSlope(xs, ys, kappa, out);
  if (xs.length >= 2 && kappa <= xs[0]! && xs[1]! > xs[0]!) out.slope = (ys[1]! - ys[0]!) / (xs[1]! - xs[0]!);
  return out;
}

/**
 * The plastic law of one direction of a section, from its curve and the response built on it.
 * `codeCrushingCurvature`: the curve's code crushing key point (absent when the curve ends before it).
 */
export function plasticLaw(curve: MomentCurvatureResult | undefined, response: SectionResponse): PlasticLaw {
  const env = response.envelope;
  const envM = env?.moments ?? [response.peakMoment];
  const envPhi = env?.curvatures ?? [response.peakCurvature];
  const peak = response.peakMoment;
  // Localisation: the first envelope point within the tolerance of the peak (interpolated on the envelope).
  const target = peak * (1 - LOCALISATION_TOLERANCE);
  let loc = envM.length - 1;
  for (let i = 0; i < envM.length; i++) {
    if (envM[i]! >= target) {
      loc = i;
      break;
    }
  }
  let locM = envM[loc]!;
  let locPhi = envPhi[loc]!;
  if (loc > 0 && envM[loc]! > target && envM[loc - 1]! < target) {
    const t = (target - envM[loc - 1]!) / (envM[loc]! - envM[loc - 1]!);
    locM = target;
    locPhi = envPhi[loc - 1]! + t * (envPhi[loc]! - envPhi[loc - 1]!);
  }
  const my = response.firstYieldMoment;
  const phiY = response.firstYieldCurvature;
  // A section that reaches its peak before its steel yields (it peaks at cracking, or crushes first)
  // has no plateau to spread over: it localises at the peak itself, so that the cracking (or the
  // brittle peak) is reached before the member's load can fall.
  if (my === null || my > peak) {
    locM = envM[envM.length - 1]!;
    locPhi = envPhi[envPhi.length - 1]!;
  }
  const elasticSlope = my !== null && phiY !== null && my > 0 ? phiY / my : 0;
  // A section whose steel yields within the tolerance below its peak localises at first yield (it
  // does yield before its peak: a hinge, not a brittle section).
  if (my !== null && phiY !== null && my >= locM && my <= peak) {
    locM = my;
    locPhi = phiY;
  }
  const knotsM: number[] = [];
  const knotsP: number[] = [];
  if (my !== null && my === locM) {
    knotsM.push(my);
    knotsP.push(0);
  } else if (my !== null && my < locM) {
    knotsM.push(my);
    knotsP.push(0);
    for (let i = 0; i < envM.length; i++) {
      const m = envM[i]!;
      if (m <= my || m >= locM) continue;
      knotsM.push(m);
      knotsP.push(Math.max(envPhi[i]! - elasticSlope * m, knotsP[knotsP.length - 1]!));
    }
    knotsM.push(locM);
    knotsP.push(Math.max(locPhi - elasticSlope * locM, knotsP[knotsP.length - 1]!));
  }
  const plasticAtLocalisation = knotsP.length > 0 ? knotsP[knotsP.length - 1]! : 0;
  // The nonlinear-elastic part φe(m): the response's integration curvature.
  const scratch: ValueAndSlope = { value: 0, slope: 0 };
  const elastic = (m: number) => response.integration(m, scratch).value;
  const base = (m: number) => elastic(m) + plasticAtLocalisation;
  const kappa: number[] = [0];
  const moment: number[] = [locM];
  const points = curve?.points ?? [];
  const ultimate = curve?.keyPoints.ultimate ?? points[points.length - 1];
  const ultimateCurvature = ultimate?.curvature ?? response.ultimateCurvature;
  for (const p of points) {
    if (p.curvature <= locPhi || p.curvature > ultimateCurvature) continue;
    const k = p.curvature - base(p.moment);
    if (k > kappa[kappa.length - 1]!) {
      kappa.push(k);
      moment.push(p.moment);
    }
  }
  let codeCrushing: PlasticLaw['codeCrushing'] = null;
  const cc = curve?.keyPoints.codeCrushing;
  if (cc && cc.curvature <= ultimateCurvature * (1 + 1e-9)) {
    if (cc.curvature <= locPhi) {
      // On the spread branch: the moment on the envelope where its curvature reaches the key point's.
      let m = envM[envM.length - 1]!;
      for (let i = 1; i < envPhi.length; i++) {
        if (envPhi[i]! >= cc.curvature) {
          const t = (cc.curvature - envPhi[i - 1]!) / Math.max(envPhi[i]! - envPhi[i - 1]!, 1e-300);
          m = envM[i - 1]! + t * (envM[i]! - envM[i - 1]!);
          break;
        }
      }
      codeCrushing = { moment: Math.min(m, locM), localised: null, curvature: cc.curvature };
    } else {
      codeCrushing = { moment: cc.moment, localised: Math.max(cc.curvature - base(cc.moment), 0), curvature: cc.curvature };
    }
  }
  return {
    yieldMoment: knotsM.length > 0 ? my : null,
    peakMoment: peak,
    localisationMoment: locM,
    localisationCurvature: locPhi,
    knotMoments: Float64Array.from(knotsM),
    knotPlastic: Float64Array.from(knotsP),
    plasticAtLocalisation,
    softeningCurvature: Float64Array.from(kappa),
    softeningMoment: Float64Array.from(moment),
    ultimateLocalised: kappa[kappa.length - 1]!,
    ultimateCurvature,
    ultimateCause: curve && curve.status.kind === 'complete' ? curve.status.ultimateCause : null,
    codeCrushing,
  };
}

/** Integrals of a quantity over one segment (t from 0 to 1): see addTableIntegrals. */
export interface TableIntegrals {
  i0: number;
  i1: number;
  j00: number;
  j01: number;
  j11: number;
}

const vs: ValueAndSlope = { value: 0, slope: 0 };

/**
 * Adds to `out` the exact integrals over t ∈ [t0, t1] of y(a + (b − a)·t), y the piecewise-linear
 * table (xs ascending, ys; clamped outside): i0 = ∫y dt, i1 = ∫y·t dt and, when `active`, the
 * Jacobian weights j00 = ∫f(1−t)² dt, j01 = ∫f·t(1−t) dt, j11 = ∫f·t² dt with f = dy/dx. The knots
 * inside are found by binary search and walked in the order t meets them (no scratch arrays).
 */
export function addTableIntegrals(xs: ArrayLike<number>, ys: ArrayLike<number>, a: number, b: number, t0: number, t1: number, active: boolean, out: TableIntegrals): void {
  if (!(t1 > t0)) return;
  const d = b - a;
  const xa = a + d * t0;
  const xb = a + d * t1;
  const yStart = interpolateWithSlope(xs, ys, xa, vs).value;
  const yEnd = interpolateWithSlope(xs, ys, xb, vs).value;
  let ta = t0;
  let ya = yStart;
  const lo = Math.min(xa, xb);
  const hi = Math.max(xa, xb);
  const n = xs.length;
  if (n > 0 && hi > xs[0]! && lo < xs[n - 1]!) {
    // Knots strictly inside (lo, hi), in the order t meets them.
    const first = firstAbove(xs, lo);
    let last = firstAbove(xs, hi) - 1;
    while (last >= 0 && xs[last]! >= hi) last--;
    if (d > 0) for (let k = first; k <= last; k++) {
      const tb = (xs[k]! - a) / d;
      addTablePiece(xs, ys, xa, ta, tb, ya, ys[k]!, d, active, out);
      ta = tb;
      ya = ys[k]!;
    }
    else for (let k = last; k >= first; k--) {
      const tb = (xs[k]! - a) / d;
      addTablePiece(xs, ys, xa, ta, tb, ya, ys[k]!, d, active, out);
      ta = tb;
      ya = ys[k]!;
    }
  }
  addTablePiece(xs, ys, xa, ta, t1, ya, yEnd, d, active, out);
}

/** One linear piece of addTableIntegrals: y from ya at ta to yb at tb. */
function addTablePiece(xs: ArrayLike<number>, ys: ArrayLike<number>, xa: number, ta: number, tb: number, ya: number, yb: number, d: number, active: boolean, out: TableIntegrals): void {
  const span = tb - ta;
  if (!(span > 0)) return;
  out.i0 += (span * (ya + yb)) / 2;
  out.i1 += (span * (ya * (2 * ta + tb) + yb * (ta + 2 * tb))) / 6;
  if (!active) return;
  const f = d !== 0 ? (yb - ya) / (span * d) : interpolateWithSlope(xs, ys, xa, vs).slope;
  if (f === 0) return;
  out.j00 += (f * ((1 - ta) ** 3 - (1 - tb) ** 3)) / 3;
  out.j11 += (f * (tb ** 3 - ta ** 3)) / 3;
  out.j01 += f * ((tb * tb - ta * ta) / 2 - (tb ** 3 - ta ** 3) / 3);
}

/**
 * Adds the plastic part of one sense over a segment: φp(max(m(t), μ(t))) with the moment m and the
 * remembered moment μ both linear in t (magnitudes in the law's sense). Where the section is loaded
 * (m > μ) the part is active in the Jacobian; where it has unloaded it is a constant of the state.
 */
export function addPlasticSegment(law: PlasticLaw, ma: number, mb: number, mua: number, mub: number, out: TableIntegrals, inner?: Float64Array): void {
  const xs = law.knotMoments;
  if (xs.length === 0) return;
  const my = xs[0]!;
  // The remembered moment is convex along the segment: its largest value is at an end.
  if (Math.max(ma, mb, mua, mub) <= my) return;
  if (!inner) {
    addPlasticPiece(xs, law.knotPlastic, ma, mb, mua, mub, 0, 1, out);
    return;
  }
  // Piece by piece between the breakpoints of the remembered moment, each a line μ0 + s·t.
  let t0 = 0;
  let mu0 = mua;
  for (let j = 0; j <= inner.length; j += 2) {
    const t1 = j < inner.length ? inner[j]! : 1;
    const mu1 = j < inner.length ? inner[j + 1]! : mub;
    if (t1 > t0) {
      const slope = (mu1 - mu0) / (t1 - t0);
      const base = mu0 - slope * t0;
      addPlasticPiece(xs, law.knotPlastic, ma, mb, base, base + slope, t0, t1, out);
    }
    t0 = t1;
    mu0 = mu1;
  }
}

/** addPlasticSegment over t ∈ [t0, t1] with the remembered moment the line mua + (mub − mua)·t there. */
function addPlasticPiece(xs: ArrayLike<number>, ys: ArrayLike<number>, ma: number, mb: number, mua: number, mub: number, t0: number, t1: number, out: TableIntegrals): void {
  const d0 = t0 === 0 ? ma - mua : ma - mua + (mb - ma - (mub - mua)) * t0;
  const d1 = t1 === 1 ? mb - mub : ma - mua + (mb - ma - (mub - mua)) * t1;
  if (d0 >= 0 && d1 >= 0) {
    addTableIntegrals(xs, ys, ma, mb, t0, t1, true, out);
    return;
  }
  if (d0 <= 0 && d1 <= 0) {
    addTableIntegrals(xs, ys, mua, mub, t0, t1, false, out);
    return;
  }
  const tc = t0 + ((t1 - t0) * d0) / (d0 - d1);
  if (d0 > 0) {
    addTableIntegrals(xs, ys, ma, mb, t0, tc, true, out);
    addTableIntegrals(xs, ys, mua, mub, tc, t1, false, out);
  } else {
    addTableIntegrals(xs, ys, mua, mub, t0, tc, false, out);
    addTableIntegrals(xs, ys, ma, mb, tc, t1, true, out);
  }
}
