/**
 * What the member engine needs from a section's moment–curvature curve in one direction, as fast
 * lookups on the tabulated curve (moment magnitudes m ≥ 0, curvature magnitudes, N·mm and 1/mm).
 *
 * Plastic hinge model (see DEVELOPERS.md "Member engine"):
 *  - up to first yield M′y the member uses the section's actual curvature (cracking, tension
 *    stiffening, everything the curve holds);
 *  - beyond M′y the distributed curvature follows the elastic extension φe = φ′y·m/M′y and the
 *    plastic part (φ − φe) at a critical section is lumped into a hinge of length Lp:
 *    θp = (φ − φe)·Lp — the decomposition behind θp = (φu − φy)·Lp of Park & Paulay (1975) and
 *    Priestley, Calvi & Kowalsky (2007);
 *  - past the peak moment the hinge moment follows the descending branch as θp grows, until the
 *    section's ultimate curvature: θp,u = (φu − φe(Mu))·Lp.
 * Under load control the curvature for a moment is taken on the ascending envelope, so a drop in
 * moment after cracking becomes a jump in curvature at constant moment, as it does in a test.
 */
import type { MomentCurvatureResult } from '../section/results.ts';
import { pushBetween } from '../numeric/search.ts';

export interface SectionResponse {
  /** Moment at zero curvature, N·mm (non-zero with axial load or shrinkage), signed in this direction. */
  readonly momentAtZero: number;
  readonly crackingMoment: number | null;
  readonly firstYieldMoment: number | null;
  readonly firstYieldCurvature: number | null;
  readonly peakMoment: number;
  readonly peakCurvature: number;
  readonly ultimateMoment: number;
  readonly ultimateCurvature: number;
  /** Nominal (idealised) yield curvature and moment of the bilinear idealisation. */
  readonly nominalYieldCurvature: number | null;
  readonly nominalMoment: number | null;
  /** Curvature on the ascending envelope for moment m (≤ peak); linear extrapolation below m(0). */
  actualCurvature(m: number): number;
  /** Curvature used for distributed integration: actual up to M′y, elastic extension beyond. */
  integrationCurvature(m: number): number;
  /** Lumped plastic rotation per unit hinge length (1/mm) for m between M′y and the peak. */
  plasticCurvature(m: number): number;
  /** integrationCurvature and its derivative dφ/dm (flexibility, 1/(N·mm²)) in one table search. */
  integration(m: number, out: ValueAndSlope): ValueAndSlope;
  /**
   * Moments strictly between `lo` and `hi` (magnitudes, ascending) where the integration curvature
   * changes slope: the member integrator splits segments there, so that curvature is integrated
   * exactly along the span whatever the spacing of the stations. Empty for smooth laws.
   */
  knots(lo: number, hi: number, out: number[]): void;
  /**
   * The knots themselves and the integration curvature there (ascending). A table piece index p
   * (ValueAndSlope.piece) lies between knotMoments[p] and knotMoments[p + 1]; the elastic extension
   * beyond M′y lies after the last knot.
   */
  readonly knotMoments: readonly number[];
  readonly knotCurvatures: readonly number[];
  /** plasticCurvature and its derivative in one table search. */
  plastic(m: number, out: ValueAndSlope): ValueAndSlope;
  /** Post-peak branch: plastic curvature (φ − φe) and moment pairs from the peak to ultimate, ascending in plastic curvature. */
  readonly softening: { readonly plastic: readonly number[]; readonly moment: readonly number[] };
  /** The ascending envelope up to the peak (strictly increasing moments, N·mm, and their curvatures, 1/mm), when built from a curve. */
  readonly envelope?: { readonly moments: readonly number[]; readonly curvatures: readonly number[] };
}

export interface ValueAndSlope {
  value: number;
  slope: number;
  /**
   * Which linear piece of the law the value came from (set by table lookups; −1 when unknown).
   * Two moments on the same piece have no knot between them, so a segment needs no splitting.
   */
  piece?: number;
}

/** Linear interpolation with the segment slope (0 outside the table, where values clamp). */
export function interpolateWithSlope(xs: ArrayLike<number>, ys: ArrayLike<number>, x: number, out: ValueAndSlope): ValueAndSlope {
  const n = xs.length;
  if (n === 0) {
    out.value = 0;
    out.slope = 0;
    out.piece = -1;
    return out;
  }
  if (x <= xs[0]! || x >= xs[n - 1]!) {
    out.value = x <= xs[0]! ? ys[0]! : ys[n - 1]!;
    out.slope = 0;
    out.piece = x <= xs[0]! ? -2 : -3;
    return out;
  }
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid]! <= x) lo = mid;
    else hi = mid;
  }
  const x0 = xs[lo]!;
  const x1 = xs[hi]!;
  out.slope = x1 > x0 ? (ys[hi]! - ys[lo]!) / (x1 - x0) : 0;
  out.value = ys[lo]! + out.slope * (x - x0);
  out.piece = lo;
  return out;
}

/** Linear interpolation in a table ascending in `xs`; clamps outside. */
export function interpolate(xs: readonly number[], ys: readonly number[], x: number): number {
  return interpolateWithSlope(xs, ys, x, { value: 0, slope: 0 }).value;
}

/** Relative width of the moment band over which a load-controlled jump in curvature is spread. */
export const REGAIN_BAND = 1e-3;

/**
 * A drop that starts below this share of the peak moment (a long-term curve whose restrained
 * shrinkage cracks the section at about zero moment) gets the band of a drop at this share.
 */
export const REGAIN_FLOOR = 1e-2;

/** Builds the lookup tables from a computed curve. */
export function sectionResponse(curve: MomentCurvatureResult): SectionResponse | undefined {
  const pts = curve.points;
  if (pts.length < 2) return undefined;
  const peak = curve.keyPoints.peak ?? pts.reduce((a, b) => (b.moment > a.moment ? b : a));
  const last = pts[pts.length - 1]!;
  const ultimate = curve.keyPoints.ultimate ?? last;
  const firstYield = curve.keyPoints.firstYield;
  // Ascending envelope up to the peak: strictly increasing moments.
  const envM: number[] = [pts[0]!.moment];
  const envPhi: number[] = [pts[0]!.curvature];
  for (let i = 1; i < pts.length; i++) {
    const p = pts[i]!;
    if (p.curvature > peak.curvature) break;
    const prevM = envM[envM.length - 1]!;
    if (p.moment > prevM) {
      const q = pts[i - 1]!;
      if (q.moment < prevM) {
        // Regaining the envelope after a drop: insert the curvature where the curve regains prevM.
        const phi = q.curvature + ((p.curvature - q.curvature) * (prevM - q.moment)) / (p.moment - q.moment);
        // The regained branch starts 0.1 % above the moment where the curve dropped: a steep but
        // finite flexibility, so that the redundants of an indeterminate beam can still be solved
        // by Newton's method when a section sits on the jump (common practice, no source).
        envM.push(prevM >= REGAIN_FLOOR * peak.moment ? prevM * (1 + REGAIN_BAND) : prevM + REGAIN_BAND * REGAIN_FLOOR * Math.abs(peak.moment));
        envPhi.push(phi);
      }
      if (p.moment > envM[envM.length - 1]!) {
        envM.push(p.moment);
        envPhi.push(p.curvature);
      }
    }
  }
  const m0 = envM[0]!;
  const slope0 = envPhi.length > 1 && envM[1]! > envM[0]! ? (envPhi[1]! - envPhi[0]!) / (envM[1]! - envM[0]!) : 0;
  const actualCurvature = (m: number) => (m < m0 ? envPhi[0]! + (m - m0) * slope0 : interpolate(envM, envPhi, m));
  // First yield as load control sees it: if the curve yields during a drop (the steel yields
  // while the section recovers its cracking moment), yield is reached on the envelope at the
  // moment where the envelope catches up. Taking φ′y on the envelope keeps the curvature used
  // for integration continuous at M′y.
  let my: number | null = null;
  let phiY: number | null = null;
  if (firstYield && firstYield.curvature <= peak.curvature) {
    let reached = firstYield.moment;
    for (let i = 0; i < envM.length; i++) if (envPhi[i]! <= firstYield.curvature) reached = Math.max(reached, envM[i]!);
    my = reached;
    phiY = actualCurvature(reached);
  }
  const elastic = (m: number) => (my !== null && phiY !== null ? (phiY * m) / my : actualCurvature(m));
  const integrationCurvature = (m: number) => (my !== null && m > my ? elastic(m) : actualCurvature(m));
  const plasticCurvature = (m: number) => (my !== null && m > my ? Math.max(actualCurvature(m) - elastic(m), 0) : 0);
  // Post-peak branch in terms of plastic curvature.
  const plastic: number[] = [];
  const moment: number[] = [];
  for (const p of pts) {
    if (p.curvature < peak.curvature || p.curvature > ultimate.curvature) continue;
    const k = Math.max(p.curvature - elastic(p.moment), 0);
    if (plastic.length === 0 || k > plastic[plastic.length - 1]!) {
      plastic.push(k);
      moment.push(p.moment);
    }
  }
  if (plastic.length === 0) {
    plastic.push(Math.max(peak.curvature - elastic(peak.moment), 0));
    moment.push(peak.moment);
  }
  const elasticSlope = my !== null && phiY !== null ? phiY / my : 0;
  const actualWithSlope = (m: number, out: ValueAndSlope) => {
    if (m < m0) {
      out.value = envPhi[0]! + (m - m0) * slope0;
      out.slope = slope0;
      out.piece = -4;
      return out;
    }
    return interpolateWithSlope(envM, envPhi, m, out);
  };
  const integration = (m: number, out: ValueAndSlope) => {
    if (my !== null && m > my) {
      out.value = elasticSlope * m;
      out.slope = elasticSlope;
      out.piece = 1_000_000;
      return out;
    }
    return actualWithSlope(m, out);
  };
  const plasticWithSlope = (m: number, out: ValueAndSlope) => {
    if (my === null || m <= my) {
      out.value = 0;
      out.slope = 0;
      return out;
    }
    actualWithSlope(m, out);
    out.value = Math.max(out.value - elasticSlope * m, 0);
    out.slope = out.value > 0 ? out.slope - elasticSlope : 0;
    return out;
  };
  // Knots of the integration curvature: the envelope points up to M′y, then M′y itself.
  const knotList = my !== null ? [...envM.filter((m) => m < my), my] : envM.slice();
  const knots = (lo: number, hi: number, out: number[]): void => {
    if (hi > lo) pushBetween(knotList, lo, hi, out);
  };
  const knotCurvatures = knotList.map((m, i) => (my !== null && i === knotList.length - 1 ? phiY! : envPhi[i]!));
  return {
    integration,
    knots,
    knotMoments: knotList,
    knotCurvatures,
    plastic: plasticWithSlope,
    momentAtZero: m0,
    crackingMoment: curve.keyPoints.cracking?.moment ?? null,
    firstYieldMoment: my,
    firstYieldCurvature: phiY,
    peakMoment: peak.moment,
    peakCurvature: peak.curvature,
    ultimateMoment: ultimate.moment,
    ultimateCurvature: ultimate.curvature,
    nominalYieldCurvature: curve.bilinear?.yieldCurvature ?? null,
    nominalMoment: curve.bilinear?.yieldMoment ?? null,
    actualCurvature,
    integrationCurvature,
    plasticCurvature,
    softening: { plastic, moment },
    envelope: { moments: envM, curvatures: envPhi },
  };
}

/**
 * Response of a section that has no tension steel in this direction: uncracked linear up to the
 * cracking moment, which is then also its peak and ultimate (plain concrete fails at cracking).
 * @param stiffness uncracked flexural stiffness EI, N·mm²
 * @param crackingMoment N·mm (0 when concrete tension is ignored)
 */
export function plainConcreteResponse(stiffness: number, crackingMoment: number): SectionResponse {
  const phiCr = crackingMoment / stiffness;
  const lin = (m: number) => m / stiffness;
  return {
    momentAtZero: 0,
    crackingMoment,
    firstYieldMoment: null,
    firstYieldCurvature: null,
    peakMoment: crackingMoment,
    peakCurvature: phiCr,
    ultimateMoment: crackingMoment,
    ultimateCurvature: phiCr,
    nominalYieldCurvature: null,
    nominalMoment: null,
    actualCurvature: lin,
    integrationCurvature: lin,
    plasticCurvature: () => 0,
    knots: () => undefined,
    knotMoments: [],
    knotCurvatures: [],
    integration: (m, out) => {
      out.value = m / stiffness;
      out.slope = 1 / stiffness;
      out.piece = 0;
      return out;
    },
    plastic: (_m, out) => {
      out.value = 0;
      out.slope = 0;
      return out;
    },
    softening: { plastic: [0], moment: [crackingMoment] },
  };
}
