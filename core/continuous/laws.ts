/**
 * The moment–curvature laws of a continuous beam's zones, from the section curves of core/section
 * (sagging and hogging), as the non-linear engine uses them.
 *
 * Hinge model (as for single spans, see DEVELOPERS.md): along the beam the curvature is the
 * section's actual curvature up to first yield M′y and its elastic extension φe = φ′y·M/M′y beyond;
 * at a plastic hinge the rest, θp = (κ − φe(M(κ)))·Lp, is lumped over the hinge length Lp, κ being
 * the hinge section's curvature on the full curve (rising, plateau and softening alike, so a hinge
 * past its peak moment is followed without switching unknowns). A direction without tension steel
 * is linear to its cracking moment, which is then its capacity (brittle).
 * Units: N·mm, 1/mm, mm, MPa.
 */
import type { BendingDirection, SectionModel } from '../section/model.ts';
import { tensionSteel } from '../section/model.ts';
import type { MomentCurvatureResult } from '../section/results.ts';
import type { DistributedLaw } from './structure.ts';

/** What a hinge-length expression needs of a hinge section (per direction). */
export interface HingeBars {
  /** Effective depth of the tension steel, mm. */
  readonly effectiveDepth: number;
  /** Largest main bar diameter, mm. */
  readonly barDiameter: number;
  /** fy and fu of the main bars, MPa. */
  readonly yieldStress: number;
  readonly ultimateStress: number;
  /** Strain at maximum force (rupture strain of the law) of the main bars, for the EN ductility class. */
  readonly ultimateStrain: number;
}

/** One direction's law, magnitudes. */
export interface DirectionLaw {
  /** Points of the moment–curvature curve, ascending in curvature from zero. */
  readonly curvature: readonly number[];
  readonly moment: readonly number[];
  readonly firstYieldCurvature: number;
  readonly firstYieldMoment: number;
  readonly peakMoment: number;
  readonly ultimateCurvature: number;
  readonly ultimateMoment: number;
  /** True when the direction has no tension steel (capacity = cracking moment, no rotation capacity). */
  readonly brittle: boolean;
  /**
   * The section at the code's crushing strain (ACI 0.003, EN εcu2): strain of the extreme tension
   * steel εt and neutral-axis depth c (mm) — for the code limits of redistribution; null when the
   * curve ends before it.
   */
  readonly codePoint: { readonly steelStrain: number; readonly neutralAxisDepth: number } | null;
  readonly bars: HingeBars;
}

export interface ZoneLaws {
  readonly sectionId: string;
  readonly sagging: DirectionLaw;
  readonly hogging: DirectionLaw;
  /** Concrete strength of the section, MPa (EN 1992-1-1 5.5(4) reads fck). */
  readonly concreteStrength?: number;
}

/** Main tension bars of a direction (bonded plates only where there are no bars). */
export function hingeBars(model: SectionModel, direction: BendingDirection): HingeBars {
  const all = tensionSteel(model, direction);
  const bars = all.filter((e) => e.kind === 'bar');
  const steel = bars.length > 0 ? bars : all;
  if (steel.length === 0) return { effectiveDepth: 0.9 * model.height, barDiameter: 0, yieldStress: 1, ultimateStress: 1, ultimateStrain: 0 };
  const area = steel.reduce((s, e) => s + e.area, 0);
  const centroid = steel.reduce((s, e) => s + e.area * e.depth, 0) / area;
  const main = steel.reduce((a, b) => (b.area > a.area ? b : a)).material as { yieldStress?: number; ultimateStress?: number; ruptureStrain?: number };
  return {
    effectiveDepth: direction === 'sagging' ? centroid : model.height - centroid,
    barDiameter: Math.max(...steel.map((e) => e.diameter ?? Math.sqrt((4 * e.area) / Math.PI))),
    yieldStress: main.yieldStress ?? 1,
    ultimateStress: main.ultimateStress ?? main.yieldStress ?? 1,
    ultimateStrain: main.ruptureStrain ?? 0,
  };
}

/** A direction's law from its computed curve; undefined when the curve has no usable points. */
export function directionLaw(curve: MomentCurvatureResult, bars: HingeBars): DirectionLaw | undefined {
  const pts = curve.points;
  if (pts.length < 2) return undefined;
  const peak = curve.keyPoints.peak ?? pts.reduce((a, b) => (b.moment > a.moment ? b : a));
  const ultimate = curve.keyPoints.ultimate ?? pts[pts.length - 1]!;
  // Without a yield point (e.g. the curve ends by crushing first) the hinge starts at the peak.
  const firstYield = curve.keyPoints.firstYield ?? peak;
  const code = curve.keyPoints.codeCrushing;
  const points = pts.filter((p) => p.curvature <= ultimate.curvature + 1e-15);
  return {
    curvature: points.map((p) => p.curvature),
    moment: points.map((p) => p.moment),
    firstYieldCurvature: firstYield.curvature,
    firstYieldMoment: firstYield.moment,
    peakMoment: peak.moment,
    ultimateCurvature: ultimate.curvature,
    ultimateMoment: ultimate.moment,
    brittle: false,
    codePoint: code && code.neutralAxisDepth !== null ? { steelStrain: code.maxSteelTensileStrain, neutralAxisDepth: code.neutralAxisDepth } : null,
    bars,
  };
}

/** Plain concrete in a direction: linear (EI, N·mm²) to the cracking moment Mcr (N·mm), which is its capacity. */
export function brittleLaw(stiffness: number, crackingMoment: number, bars: HingeBars): DirectionLaw {
  const phi = crackingMoment / stiffness;
  return {
    curvature: [0, phi],
    moment: [0, crackingMoment],
    firstYieldCurvature: phi,
    firstYieldMoment: crackingMoment,
    peakMoment: crackingMoment,
    ultimateCurvature: phi,
    ultimateMoment: crackingMoment,
    brittle: true,
    codePoint: null,
    bars,
  };
}

/** An elastic–plastic law by its points (tests and idealised members): (0, 0), (φy, My), (φu, Mu). */
export function bilinearLaw(yieldCurvature: number, yieldMoment: number, ultimateCurvature: number, ultimateMoment: number, bars: HingeBars): DirectionLaw {
  return {
    curvature: [0, yieldCurvature, ultimateCurvature],
    moment: [0, yieldMoment, ultimateMoment],
    firstYieldCurvature: yieldCurvature,
    firstYieldMoment: yieldMoment,
    peakMoment: Math.max(yieldMoment, ultimateMoment),
    ultimateCurvature,
    ultimateMoment,
    brittle: false,
    codePoint: null,
    bars,
  };
}

/** Binary search: index i with xs[i] ≤ x < xs[i + 1], clamped to [0, n − 2]. */
function bracket(xs: readonly number[], x: number): number {
  let lo = 0;
  let hi = xs.length - 1;
  if (x <= xs[0]!) return 0;
  if (x >= xs[hi]!) return Math.max(hi - 1, 0);
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid]! <= x) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Tables of the distributed curvature: ascending moment envelope to first yield, then the elastic extension. */
interface DistributedTable {
  readonly moment: number[];
  readonly curvature: number[];
  /** φ′y / M′y, 1/(N·mm²). */
  readonly extension: number;
}

function distributedTable(law: DirectionLaw): DistributedTable {
  const moment: number[] = [0];
  const curvature: number[] = [0];
  for (let i = 1; i < law.curvature.length; i++) {
    const c = law.curvature[i]!;
    const m = law.moment[i]!;
    if (c >= law.firstYieldCurvature) break;
    // Keep the ascending envelope: a drop after cracking becomes a steep rise at the next higher moment.
    if (m > moment[moment.length - 1]! * (1 + 1e-9) + 1e-9) {
      moment.push(m);
      curvature.push(c);
    }
  }
  if (law.firstYieldMoment > moment[moment.length - 1]!) {
    moment.push(law.firstYieldMoment);
    curvature.push(law.firstYieldCurvature);
  }
  return { moment, curvature, extension: law.firstYieldCurvature / law.firstYieldMoment };
}

function distributedCurvature(table: DistributedTable, m: number, out: { value: number; slope: number }): void {
  const n = table.moment.length;
  const top = table.moment[n - 1]!;
  if (m >= top) {
    out.slope = table.extension;
    out.value = table.curvature[n - 1]! + (m - top) * table.extension;
    return;
  }
  const i = bracket(table.moment, m);
  const m0 = table.moment[i]!;
  const slope = (table.curvature[i + 1]! - table.curvature[i]!) / (table.moment[i + 1]! - m0);
  out.slope = slope;
  out.value = table.curvature[i]! + slope * (m - m0);
}

/** The distributed law of every zone (sagging for M ≥ 0, hogging for M < 0). */
export function distributedLaw(zones: readonly ZoneLaws[]): DistributedLaw {
  const tables = zones.map((z) => ({ sagging: distributedTable(z.sagging), hogging: distributedTable(z.hogging) }));
  return {
    curvature(zone, moment, out) {
      const t = tables[zone]!;
      if (moment >= 0) distributedCurvature(t.sagging, moment, out);
      else {
        distributedCurvature(t.hogging, -moment, out);
        out.value = -out.value;
      }
    },
  };
}

/**
 * Hinge law of one direction for a hinge length Lp (mm): moment M(κ) on the curve from first yield
 * (linear below it) and the plastic rotation θp = Lp·(κ − φ′y·M(κ)/M′y) ≥ 0.
 */
export function hingeLaw(law: DirectionLaw, length: number) {
  const from = bracket(law.curvature, law.firstYieldCurvature);
  const kappa = [law.firstYieldCurvature];
  const moment = [law.firstYieldMoment];
  for (let i = from + 1; i < law.curvature.length; i++) {
    if (law.curvature[i]! <= law.firstYieldCurvature) continue;
    kappa.push(law.curvature[i]!);
    moment.push(law.moment[i]!);
  }
  const elastic = law.firstYieldMoment / law.firstYieldCurvature;
  const extension = law.firstYieldCurvature / law.firstYieldMoment;
  // A plateau that is exactly flat leaves two hinges forming together (a symmetric beam) free to
  // share their rotation in any proportion, and the equations singular. A hardening of 1e-5 of the
  // elastic stiffness makes the sharing unique and changes the moment by less than 1e-5·M′y·φu/φ′y
  // (4e-4·M′y at a curvature ductility of 40).
  for (let i = 1; i < kappa.length; i++) {
    const least = moment[i - 1]! + 1e-5 * elastic * (kappa[i]! - kappa[i - 1]!);
    if (moment[i]! >= moment[i - 1]! && moment[i]! < least) moment[i] = least;
  }
  const momentAt = (k: number, out: { value: number; slope: number }) => {
    if (k <= kappa[0]! || kappa.length < 2) {
      // Below first yield the hinge is elastic; past the last point the moment stays.
      if (k <= kappa[0]!) {
        out.slope = elastic;
        out.value = elastic * k;
      } else {
        out.slope = 0;
        out.value = moment[0]!;
      }
      return;
    }
    if (k >= kappa[kappa.length - 1]!) {
      // Past the ultimate curvature (the march interpolates back to it): the same least hardening.
      out.slope = 1e-5 * elastic;
      out.value = moment[moment.length - 1]! + out.slope * (k - kappa[kappa.length - 1]!);
      return;
    }
    const i = bracket(kappa, k);
    const slope = (moment[i + 1]! - moment[i]!) / (kappa[i + 1]! - kappa[i]!);
    out.slope = slope;
    out.value = moment[i]! + slope * (k - kappa[i]!);
  };
  return {
    moment: momentAt,
    plasticRotation(k: number, out: { value: number; slope: number }) {
      momentAt(k, out);
      const theta = length * (k - extension * out.value);
      if (k <= kappa[0]! || theta <= 0) {
        out.value = 0;
        out.slope = 0;
        return;
      }
      out.slope = length * (1 - extension * out.slope);
      out.value = theta;
    },
    /** Curvature on the rising part for a moment magnitude (to start a hinge that just formed). */
    curvatureFor(m: number): number {
      if (m <= moment[0]!) return m / elastic;
      for (let i = 0; i + 1 < kappa.length; i++) {
        if (moment[i + 1]! >= m) return kappa[i]! + ((m - moment[i]!) / (moment[i + 1]! - moment[i]!)) * (kappa[i + 1]! - kappa[i]!);
      }
      return kappa[kappa.length - 1]!;
    },
    /** Plastic rotation capacity θpu = Lp·(φu − φ′y·Mu/M′y), rad. */
    capacity: Math.max(length * (law.ultimateCurvature - extension * law.ultimateMoment), 0),
  };
}
export type HingeLaw = ReturnType<typeof hingeLaw>;
