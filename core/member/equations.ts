/**
 * The compatibility equations of the member engine and their Newton solution. The released
 * structure (core/member/statics.ts) carries the loads; the unknowns are the redundant support
 * moments, the rotations of plastic hinges past their peak moment, and — past a limit point — the
 * load factor λ. Curvature is integrated exactly for the piecewise-linear moment–curvature law
 * with the moment linear between stations (core/member/beam-model.ts).
 * Internal units: mm, N·mm, 1/mm, rad.
 */
import { solveLinear } from '../numeric/linear.ts';
import type { Text } from '../units/phrase.ts';
import type { BeamModel, ZoneResponse } from './beam-model.ts';
import { segmentIntegralsFromEnds, zoneCurvature, type SegmentIntegrals } from './beam-model.ts';
import { interpolateWithSlope, type SectionResponse, type ValueAndSlope } from './section-response.ts';
import { redundantField } from './statics.ts';

export type HingeSite = 'left' | 'right' | 'span';

export interface HingeState {
  readonly site: HingeSite;
  /** +1 sagging, −1 hogging. */
  readonly sign: 1 | -1;
  /**
   * Station index of the critical section (where the hinge moment is measured). A hinge inside
   * the span follows the largest moment of its sign as redistribution moves it.
   */
  station: number;
  zone: number;
  /** Hinge length, mm, and where the lumped rotation acts (mm from the left support). */
  readonly length: number;
  rotationPosition: number;
  readonly lengthFormula: Text;
  readonly shearSpan: number;
  /** 'hardening': θ follows the moment; 'softening': past the peak, θ is an unknown. */
  phase: 'hardening' | 'softening';
  /** Current plastic rotation, rad (≥ 0). */
  rotation: number;
  /** Rotation capacity, rad. */
  readonly capacity: number;
  /** λ and control deflection when the hinge became active. */
  readonly activatedAt: number;
}

/** Everything the solver needs besides the beam. */
export interface LoadingFields {
  /** Released-structure moment of loads held constant (dead load in a live-only pattern), N·mm per station. */
  readonly constant: Float64Array;
  /** Released-structure moment per unit λ of the pattern, N·mm per station. */
  readonly pattern: Float64Array;
  /** Total load of the constant part and of the pattern per unit λ, N. */
  readonly constantTotal: number;
  readonly patternTotal: number;
}

/** Scratch output of table lookups (the engine is single-threaded and synchronous). */
export const scratch: ValueAndSlope = { value: 0, slope: 0 };

export function responseOf(zone: ZoneResponse, sign: 1 | -1): SectionResponse {
  return sign > 0 ? zone.sagging : zone.hogging;
}

/**
 * Residual and Jacobian evaluator over the beam for a given set of hinges. Unknown vector:
 * [redundants…, rotations of softening hinges except the controlled one…, λ if λ is unknown].
 */
export class Equations {
  readonly n: number;
  readonly moment: Float64Array;
  private readonly seg: SegmentIntegrals = { i0: 0, i1: 0, j00: 0, j01: 0, j11: 0, phiA: 0, phiB: 0 };
  private readonly ends: ValueAndSlope[];
  constructor(readonly beam: BeamModel, readonly loads: LoadingFields) {
    this.n = beam.x.length;
    this.moment = new Float64Array(this.n);
    this.ends = Array.from({ length: this.n }, () => ({ value: 0, slope: 0, piece: -1 }));
  }

  /** Fills moments for redundants X and λ. */
  moments(redundants: readonly number[], lambda: number): Float64Array {
    const { constant, pattern } = this.loads;
    const fields = this.beam.redundantFields;
    for (let i = 0; i < this.n; i++) {
      let m = constant[i]! + lambda * pattern[i]!;
      for (let j = 0; j < fields.length; j++) m += redundants[j]! * fields[j]![i]!;
      this.moment[i] = m;
    }
    return this.moment;
  }

  /**
   * Residuals R and Jacobian J at the given unknowns.
   * layout: r redundants, then softening-hinge rotations (list `free`), then λ if `lambdaFree`.
   */
  evaluate(
    redundants: readonly number[],
    lambda: number,
    hinges: readonly HingeState[],
    free: readonly number[],
    lambdaFree: boolean,
    secant = false,
    controlled = -1,
  ): { residual: number[]; jacobian: number[][]; scale: number[] } {
    const beam = this.beam;
    const r = beam.redundants.length;
    const size = r + free.length + (lambdaFree ? 1 : 0);
    const residual = new Array<number>(size).fill(0);
    const jacobian = Array.from({ length: size }, () => new Array<number>(size).fill(0));
    const scale = new Array<number>(size).fill(0);
    // Hinge positions are held fixed during a solve (the caller moves span hinges to the new
    // moment maximum between solves), so the Jacobian is exact and Newton converges quadratically.
    const M = this.moments(redundants, lambda);
    const x = beam.x;
    const fields = beam.redundantFields;
    const pattern = this.loads.pattern;
    const lambdaCol = r + free.length;
    // Distributed curvature: ∫ φ m_i dx and its derivatives (exact for linear φ, m between stations).
    if (r > 0) {
      // Compatibility ∫ φ·m_i dx, integrated exactly for the piecewise-linear curvature law with the
      // moment linear between stations (segmentIntegrals splits each segment at the law's knots).
      const seg = this.seg;
      // Curvature at every station once (each ends one segment and starts the next).
      const ends = this.ends;
      for (let i = 0; i < this.n; i++) {
        const e = ends[i]!;
        zoneCurvature(beam.zones[beam.stationZone[i]!]!, M[i]!, e);
      }
      for (let k = 0; k < this.n - 1; k++) {
        const h = x[k + 1]! - x[k]!;
        if (h <= 0) continue;
        segmentIntegralsFromEnds(beam.zones[beam.segmentZone[k]!]!, M[k]!, M[k + 1]!, ends[k]!, ends[k + 1]!, secant, seg);
        const w0 = seg.i0 - seg.i1;
        const w1 = seg.i1;
        const magnitude = h * 0.5 * (Math.abs(seg.phiA) + Math.abs(seg.phiB));
        for (let i = 0; i < r; i++) {
          const ma = fields[i]![k]!;
          const mb = fields[i]![k + 1]!;
          residual[i]! += h * (ma * w0 + mb * w1);
          scale[i]! += magnitude * Math.max(Math.abs(ma), Math.abs(mb));
          for (let j = 0; j < r; j++) {
            const na = fields[j]![k]!;
            const nb = fields[j]![k + 1]!;
            jacobian[i]![j]! += h * (ma * na * seg.j00 + (ma * nb + mb * na) * seg.j01 + mb * nb * seg.j11);
          }
          if (lambdaFree) {
            const pa = pattern[k]!;
            const pb = pattern[k + 1]!;
            jacobian[i]![lambdaCol]! += h * (ma * pa * seg.j00 + (ma * pb + mb * pa) * seg.j01 + mb * pb * seg.j11);
          }
        }
      }
    }
    // Hinges.
    hinges.forEach((hinge, index) => {
      const zone = beam.zones[hinge.zone]!;
      const response = responseOf(zone, hinge.sign);
      const mc = hinge.sign * M[hinge.station]!;
      const freeIndex = free.indexOf(index);
      let theta = hinge.rotation;
      let dThetaDm = 0;
      if (hinge.phase === 'hardening') {
        response.plastic(mc, scratch);
        theta = hinge.length * scratch.value;
        dThetaDm = hinge.length * scratch.slope;
      }
      for (let i = 0; i < r; i++) {
        const mi = redundantField(beam.redundants[i]!, beam.span, hinge.rotationPosition);
        residual[i]! += hinge.sign * theta * mi;
        scale[i]! += Math.abs(theta * mi);
        if (hinge.phase === 'hardening') {
          for (let j = 0; j < r; j++) jacobian[i]![j]! += hinge.sign * mi * dThetaDm * hinge.sign * fields[j]![hinge.station]!;
          if (lambdaFree) jacobian[i]![lambdaCol]! += hinge.sign * mi * dThetaDm * hinge.sign * pattern[hinge.station]!;
        } else if (freeIndex >= 0) {
          jacobian[i]![r + freeIndex]! += hinge.sign * mi;
        }
      }
      const isControlled = lambdaFree && index === controlled;
      if (hinge.phase === 'softening' && (freeIndex >= 0 || isControlled)) {
        // Moment at the hinge follows the post-peak branch: s·M_c − M(θ/Lp) = 0. The controlled
        // hinge's equation is the row that determines λ in the mechanism stage.
        const row = isControlled ? lambdaCol : r + freeIndex;
        interpolateWithSlope(response.softening.plastic, response.softening.moment, theta / hinge.length, scratch);
        residual[row] = mc - scratch.value;
        scale[row] = Math.max(Math.abs(response.peakMoment), 1);
        for (let j = 0; j < r; j++) jacobian[row]![j] = hinge.sign * fields[j]![hinge.station]!;
        if (!isControlled) jacobian[row]![row] = -scratch.slope / hinge.length;
        if (lambdaFree) jacobian[row]![lambdaCol] = hinge.sign * pattern[hinge.station]!;
      }
    });
    return { residual, jacobian, scale };
  }
}

export interface NewtonResult {
  readonly converged: boolean;
  readonly redundants: number[];
  readonly lambda: number;
  readonly rotations: number[];
  readonly iterations: number;
  readonly residualNorm: number;
}

/** Newton iteration with backtracking on the scaled residual norm. */
export function newton(
  eq: Equations,
  hinges: readonly HingeState[],
  free: readonly number[],
  lambdaFree: boolean,
  start: { redundants: readonly number[]; lambda: number; rotations: readonly number[] },
  controlled = -1,
): NewtonResult {
  const r = eq.beam.redundants.length;
  let X = [...start.redundants];
  let lambda = start.lambda;
  let rot = [...start.rotations];
  const apply = (index: number, value: number) => {
    hinges[index]!.rotation = value;
  };
  free.forEach((h, i) => apply(h, rot[i]!));
  const norm = (res: number[], scale: number[]) => Math.max(0, ...res.map((v, i) => Math.abs(v) / Math.max(scale[i]!, 1e-300)));
  let current = eq.evaluate(X, lambda, hinges, free, lambdaFree, false, controlled);
  let currentNorm = norm(current.residual, current.scale);
  const size = current.residual.length;
  if (size === 0) return { converged: true, redundants: X, lambda, rotations: rot, iterations: 0, residualNorm: 0 };
  for (let iteration = 1; iteration <= 60; iteration++) {
    // Converged when the worst compatibility error is below 1e-9 of the rotations involved (far
    // below anything a deflection or redundant moment shows).
    if (currentNorm < 1e-9) return { converged: true, redundants: X, lambda, rotations: rot, iterations: iteration - 1, residualNorm: currentNorm };
    const step = solveLinear(current.jacobian.map((row) => [...row]), current.residual.map((v) => -v));
    if (!step) break;
    let factor = 1;
    let accepted = false;
    for (let tries = 0; tries < 30; tries++) {
      const X2 = X.map((v, i) => v + factor * step[i]!);
      const rot2 = rot.map((v, i) => Math.max(0, v + factor * step[r + i]!));
      const lambda2 = lambdaFree ? lambda + factor * step[size - 1]! : lambda;
      free.forEach((h, i) => apply(h, rot2[i]!));
      const trial = eq.evaluate(X2, lambda2, hinges, free, lambdaFree, false, controlled);
      const trialNorm = norm(trial.residual, trial.scale);
      if (trialNorm < currentNorm || trialNorm < 1e-10) {
        X = X2;
        rot = rot2;
        lambda = lambda2;
        current = trial;
        currentNorm = trialNorm;
        accepted = true;
        break;
      }
      factor /= 2;
    }
    if (!accepted) {
      free.forEach((h, i) => apply(h, rot[i]!));
      break;
    }
  }
  if (currentNorm >= 1e-8 && free.length === 0 && !lambdaFree) {
    // Fallback: secant-flexibility iterations. Robust where Newton stalls on the steep, kinked
    // stretches of the curves (load-controlled jumps in curvature at cracking).
    for (let iteration = 0; iteration < 400 && currentNorm >= 1e-10; iteration++) {
      const sec = eq.evaluate(X, lambda, hinges, free, lambdaFree, true);
      const step = solveLinear(sec.jacobian.map((row) => [...row]), sec.residual.map((v) => -v));
      if (!step) break;
      const X2 = X.map((v, i) => v + step[i]!);
      const trial = eq.evaluate(X2, lambda, hinges, free, lambdaFree);
      X = X2;
      current = trial;
      currentNorm = norm(trial.residual, trial.scale);
    }
  }
  return { converged: currentNorm < 1e-8, redundants: X, lambda, rotations: rot, iterations: 60, residualNorm: currentNorm };
}

