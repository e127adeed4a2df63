/**
 * Nonlinear load–deflection analysis of a member, event to event:
 *
 * 1. Load control on the load factor λ. At each level the redundant end moments follow from
 *    compatibility with the current nonlinear flexibility (Newton's method with the exact
 *    tangent of the tabulated curves), so moments redistribute as sections crack and yield.
 *    Curvature is integrated along the span (exactly for curvature linear between stations).
 * 2. When a critical section (support face, or the most stressed section in the span) reaches
 *    first yield, a plastic hinge becomes active there: beyond M′y the distributed curvature
 *    follows the elastic extension and the plastic part is lumped as θp = (φ − φe)·Lp
 *    (core/member/section-response.ts).
 * 3. When a hinge reaches its section's peak moment it can take no more; its rotation becomes an
 *    unknown and its moment follows the descending branch. Once more hinges are past their peak
 *    than the beam has redundants, it is a mechanism: control switches from λ to the rotation of
 *    the newest hinge, and λ follows from equilibrium.
 * 4. Ultimate: a hinge reaches its rotation capacity θp,u = (φu − φe(Mu))·Lp, or a section with no
 *    hinge reaches its peak moment (e.g. at a bar cut-off).
 *
 * Internal units: mm, N·mm, 1/mm, rad.
 */
import { solveLinear } from '../numeric/linear.ts';
import type { QuantityText } from '../units/text.ts';
import type { BeamModel, ZoneResponse } from './beam-model.ts';
import { segmentIntegralsFromEnds, zoneCurvature, type SegmentIntegrals } from './beam-model.ts';
import { hingeLength, type HingeLengthInput } from './hinge-length.ts';
import type { CapacitySettings } from './definition.ts';
import type { LoadDeflectionPoint, MemberEvent, PlasticHinge, SpanDistribution } from './results.ts';
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
  readonly lengthFormula: string;
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

export interface SolvedState {
  readonly lambda: number;
  readonly redundants: readonly number[];
  readonly moment: Float64Array;
  /** Integration curvature at each station from the segment on its right (last: from the left). */
  readonly curvature: Float64Array;
  readonly deflection: Float64Array;
  readonly hinges: readonly { readonly index: number; readonly rotation: number }[];
}

const scratch: ValueAndSlope = { value: 0, slope: 0 };

function responseOf(zone: ZoneResponse, sign: 1 | -1): SectionResponse {
  return sign > 0 ? zone.sagging : zone.hogging;
}

/**
 * Residual and Jacobian evaluator over the beam for a given set of hinges. Unknown vector:
 * [redundants…, rotations of softening hinges except the controlled one…, λ if λ is unknown].
 */
class Equations {
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

/**
 * Moves each span hinge to the interior station where its moment (relative to the section's peak)
 * is largest, so that the hinge stays at the critical section while moments redistribute.
 */
export function trackSpanHinges(beam: BeamModel, moment: Float64Array, hinges: readonly HingeState[]): void {
  const n = moment.length;
  for (const h of hinges) {
    if (h.site !== 'span') continue;
    let best = -Infinity;
    for (let i = 1; i < n - 1; i++) {
      const z = beam.segmentZone[Math.min(i, n - 2)]!;
      const resp = h.sign > 0 ? beam.zones[z]!.sagging : beam.zones[z]!.hogging;
      const ratio = (h.sign * moment[i]!) / resp.peakMoment;
      if (ratio > best) {
        best = ratio;
        h.station = i;
        h.zone = z;
      }
    }
    // The lumped rotation acts at the true maximum of the moment, not at the nearest station: the
    // vertex of the parabola through the critical station and its neighbours (exact for uniform
    // load), so the deflections do not depend on where the stations happen to fall.
    const i = h.station;
    h.rotationPosition = beam.x[i]!;
    if (i > 0 && i < n - 1) {
      const x0 = beam.x[i - 1]!;
      const x1 = beam.x[i]!;
      const x2 = beam.x[i + 1]!;
      const m0 = h.sign * moment[i - 1]!;
      const m1 = h.sign * moment[i]!;
      const m2 = h.sign * moment[i + 1]!;
      const d01 = (m1 - m0) / (x1 - x0);
      const d12 = (m2 - m1) / (x2 - x1);
      const curvature = (d12 - d01) / (x2 - x0);
      if (x1 > x0 && x2 > x1 && curvature < 0) {
        const vertex = 0.5 * (x0 + x1) - d01 / (2 * curvature);
        if (vertex > x0 && vertex < x2) h.rotationPosition = vertex;
      }
    }
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
function newton(
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

/** Deflections (downward positive) at every station from curvature and hinge rotations. */
export function deflectionShape(beam: BeamModel, moment: Float64Array, hinges: readonly HingeState[], curvatureOut?: Float64Array): Float64Array {
  const x = beam.x;
  const n = x.length;
  const v = new Float64Array(n);
  trackSpanHinges(beam, moment, hinges);
  const jumps = hinges
    .filter((h) => h.rotation > 0 || h.phase === 'hardening')
    .map((h) => {
      let theta = h.rotation;
      if (h.phase === 'hardening') {
        responseOf(beam.zones[h.zone]!, h.sign).plastic(h.sign * moment[h.station]!, scratch);
        theta = h.length * scratch.value;
      }
      return { at: h.rotationPosition, theta: h.sign * theta };
    })
    .filter((j) => j.theta !== 0)
    .sort((a, b) => a.at - b.at);
  // v'' = −φ (downward positive deflection under sagging curvature); v(0) = 0, v'(0) = 0 first.
  let slope = 0;
  let jump = 0;
  const seg: SegmentIntegrals = { i0: 0, i1: 0, j00: 0, j01: 0, j11: 0, phiA: 0, phiB: 0 };
  let endA: ValueAndSlope = { value: 0, slope: 0, piece: -1 };
  let endB: ValueAndSlope = { value: 0, slope: 0, piece: -1 };
  zoneCurvature(beam.zones[beam.stationZone[0]!]!, moment[0]!, endB);
  for (let k = 0; k < n - 1; k++) {
    const h = x[k + 1]! - x[k]!;
    let dv = slope * h;
    let dSlope = 0;
    [endA, endB] = [endB, endA];
    zoneCurvature(beam.zones[beam.stationZone[k + 1]!]!, moment[k + 1]!, endB);
    if (h > 0) {
      segmentIntegralsFromEnds(beam.zones[beam.segmentZone[k]!]!, moment[k]!, moment[k + 1]!, endA, endB, false, seg);
      if (curvatureOut) {
        curvatureOut[k] = seg.phiA;
        curvatureOut[k + 1] = seg.phiB;
      }
      dv -= h * h * (seg.i0 - seg.i1);
      dSlope = -h * seg.i0;
    }
    while (jump < jumps.length && jumps[jump]!.at < x[k + 1]! + (k === n - 2 ? 1e-9 : 0) && jumps[jump]!.at >= x[k]!) {
      const j = jumps[jump]!;
      dv -= j.theta * (x[k + 1]! - j.at);
      dSlope -= j.theta;
      jump++;
    }
    v[k + 1] = v[k]! + dv;
    slope += dSlope;
  }
  if (beam.support !== 'cantilever') {
    // Enforce v(L) = 0 with a rigid rotation about x = 0.
    const span = x[n - 1]! - x[0]!;
    const end = v[n - 1]!;
    for (let i = 0; i < n; i++) v[i] = v[i]! - (end * (x[i]! - x[0]!)) / span;
  }
  return v;
}

export interface CapacityCurve {
  readonly points: LoadDeflectionPoint[];
  readonly events: MemberEvent[];
  readonly hinges: PlasticHinge[];
  readonly distributions: SpanDistribution[];
  readonly controlPosition: number;
  readonly status: string;
  readonly converged: boolean;
  readonly firstYield: { readonly lambda: number; readonly deflection: number } | null;
  readonly peak: { readonly lambda: number; readonly deflection: number };
  readonly ultimate: { readonly lambda: number; readonly deflection: number } | null;
  readonly failureCause: string;
  /**
   * The state at 75 % of the largest load, solved exactly (not read off the sampled curve), for the
   * nominal yield deflection; null when that load lies beyond a softening hinge.
   */
  readonly secantPoint: { readonly loadFactor: number; readonly totalLoad: number; readonly deflection: number } | null;
}

interface Snapshot {
  lambda: number;
  redundants: number[];
  rotations: Map<number, number>;
}

const SITE_WORDS: Record<HingeSite, string> = { left: 'left support', right: 'right support', span: 'span' };

/**
 * A position along the span in words without units (results are shown in SI or US customary;
 * numbers with units come from the numeric fields): "midspan", "0.42ℓ from the left support".
 */
export function describePosition(x: number, span: number, support: BeamModel['support']): string {
  if (x <= 1e-6 * span) return support === 'cantilever' ? 'the fixed end' : 'the left support';
  if (x >= span * (1 - 1e-6)) return support === 'cantilever' ? 'the free end' : 'the right support';
  if (Math.abs(x - span / 2) <= 0.005 * span && support !== 'cantilever') return 'midspan';
  return `${(x / span).toFixed(2)}ℓ from the ${support === 'cantilever' ? 'fixed end' : 'left support'}`;
}

/**
 * Runs the load–deflection analysis to ultimate.
 * @param loads   moment fields of the constant loads and of the pattern
 * @param capacity hinge length method etc.
 */
export function capacityCurve(beam: BeamModel, loads: LoadingFields, capacity: CapacitySettings, controlAt?: number, text?: QuantityText): CapacityCurve {
  const eq = new Equations(beam, loads);
  const n = beam.x.length;
  const r = beam.redundants.length;
  const span = beam.span;
  const events: MemberEvent[] = [];
  const points: LoadDeflectionPoint[] = [];
  const distributions: SpanDistribution[] = [];
  const hinges: HingeState[] = [];
  let status = 'complete';
  let converged = true;
  let failureCause = '';

  const sites: HingeSite[] = beam.support === 'cantilever' ? ['left'] : beam.support === 'simply-supported' ? ['span'] : beam.support === 'propped-cantilever' ? ['left', 'span'] : ['left', 'right', 'span'];
  const siteSign = (site: HingeSite): 1 | -1 => (site === 'span' ? 1 : -1);
  const stationZone = (i: number) => beam.segmentZone[Math.min(i, n - 2)]!;

  // --- helpers -----------------------------------------------------------------------------------
  /** Moves span hinges to the current moment maximum; true when any of them moved. */
  const retrack = (): boolean => {
    const before = hinges.map((h) => h.rotationPosition);
    trackSpanHinges(beam, eq.moment, hinges);
    // A shift of a hundred-thousandth of the span does not change any result worth showing.
    return hinges.some((h, i) => Math.abs(h.rotationPosition - before[i]!) > 1e-5 * span);
  };
  const solveAt = (lambda: number, guess: Snapshot): Snapshot | undefined => {
    const free = hinges.map((h, i) => (h.phase === 'softening' ? i : -1)).filter((i) => i >= 0);
    let start = { redundants: guess.redundants, lambda, rotations: free.map((i) => guess.rotations.get(i) ?? hinges[i]!.rotation) };
    let res = newton(eq, hinges, free, false, start);
    for (let pass = 0; pass < 2 && res.converged && retrack(); pass++) {
      start = { redundants: res.redundants, lambda, rotations: res.rotations };
      res = newton(eq, hinges, free, false, start);
    }
    hingeVersion++; // the solve overwrote the shared moment array and hinge rotations
    if (!res.converged) return undefined;
    const rotations = new Map<number, number>();
    free.forEach((h, i) => rotations.set(h, res.rotations[i]!));
    return { lambda, redundants: res.redundants, rotations };
  };
  // restore() is called for the same snapshot by several event functions in a row: remember the
  // last one (invalidated whenever the hinge set or a hinge's phase changes).
  let restored: Snapshot | undefined;
  let restoredVersion = -1;
  let hingeVersion = 0;
  const restore = (s: Snapshot) => {
    if (s === restored && restoredVersion === hingeVersion) return eq.moment;
    restored = s;
    restoredVersion = hingeVersion;
    for (const [i, v] of s.rotations) hinges[i]!.rotation = v;
    eq.moments(s.redundants, s.lambda);
    trackSpanHinges(beam, eq.moment, hinges);
    // hardening hinges' rotation values for reporting
    hinges.forEach((h) => {
      if (h.phase === 'hardening') {
        responseOf(beam.zones[h.zone]!, h.sign).plastic(h.sign * eq.moment[h.station]!, scratch);
        h.rotation = h.length * scratch.value;
      }
    });
    return eq.moment;
  };
  let controlIndex = -1;
  const deflectionAt = (s: Snapshot): Float64Array => deflectionShape(beam, restore(s), hinges);
  // The same state is asked for its control deflection several times (recorded point, event
  // descriptions): remember the last answer.
  let deflected: Snapshot | undefined;
  let deflectedVersion = -1;
  let deflectedValue = 0;
  const controlDeflection = (s: Snapshot) => {
    if (s !== deflected || deflectedVersion !== hingeVersion) {
      deflectedValue = deflectionAt(s)[controlIndex]!;
      deflected = s;
      deflectedVersion = hingeVersion;
    }
    return deflectedValue;
  };
  const loadControlStates: Snapshot[] = [];
  const record = (s: Snapshot, stage: 'integration' | 'mechanism') => {
    if (stage === 'integration') loadControlStates.push(s);
    points.push({ loadFactor: s.lambda, totalLoad: loads.constantTotal + s.lambda * loads.patternTotal, deflection: controlDeflection(s), stage });
  };
  const distribution = (label: string, s: Snapshot): SpanDistribution => {
    const curvature = new Float64Array(n);
    const moment = Float64Array.from(restore(s));
    const deflection = deflectionShape(beam, moment, hinges, curvature);
    const hingeZones: [number, number][] = [];
    for (const h of hinges) {
      if (h.rotation <= 0) continue;
      const a = Math.max(0, h.rotationPosition - h.length / 2);
      const b = Math.min(span, h.rotationPosition + h.length / 2);
      hingeZones.push([a, b]);
      for (let i = 0; i < n; i++) if (beam.x[i]! >= a && beam.x[i]! <= b) curvature[i] = curvature[i]! + (h.sign * h.rotation) / h.length;
    }
    return { label, loadFactor: s.lambda, x: [...beam.x], moment: [...moment], curvature: [...curvature], deflection: [...deflection], hingeZones };
  };

  /** Ratio functions: how far the most stressed station is from a section threshold. */
  const maxRatio = (s: Snapshot, pick: (resp: SectionResponse) => number | null, filter?: (i: number, sign: 1 | -1) => boolean) => {
    const M = restore(s);
    let best = -Infinity;
    let at = -1;
    let sign: 1 | -1 = 1;
    for (let i = 0; i < n; i++) {
      const m = M[i]!;
      const sg: 1 | -1 = m >= 0 ? 1 : -1;
      if (filter && !filter(i, sg)) continue;
      // A station at a zone boundary belongs to both zones: check the weaker.
      const left = beam.segmentZone[Math.max(i - 1, 0)]!;
      const right = stationZone(i);
      for (let pass = 0; pass < (left === right ? 1 : 2); pass++) {
        const threshold = pick(responseOf(beam.zones[pass === 0 ? right : left]!, sg));
        if (threshold === null || !(threshold > 0)) continue;
        const ratio = (sg * m) / threshold;
        if (ratio > best) {
          best = ratio;
          at = i;
          sign = sg;
        }
      }
    }
    return { ratio: best, station: at, sign };
  };

  /**
   * Load factor in [a, b] where the event function g crosses zero (g(a) < 0 ≤ g(b)), by regula
   * falsi with the Illinois modification (superlinear, always bracketed). Returns the bracketing
   * state on the event side.
   */
  const locate = (a: Snapshot, b: Snapshot, g: (s: Snapshot) => number): Snapshot => {
    let lo = a;
    let hi = b;
    let glo = g(lo);
    let ghi = g(hi);
    let side = 0;
    for (let it = 0; it < 60 && hi.lambda - lo.lambda > 1e-6 * Math.max(hi.lambda, 1e-12); it++) {
      let t = glo < 0 && ghi > 0 ? -glo / (ghi - glo) : 0.5;
      if (!(t > 0.001 && t < 0.999)) t = 0.5;
      const lambda = lo.lambda + t * (hi.lambda - lo.lambda);
      const s = solveAt(lambda, lo);
      if (!s) break;
      const gs = g(s);
      if (gs >= 0) {
        hi = s;
        ghi = gs;
        if (side === 1) glo /= 2;
        side = 1;
      } else {
        lo = s;
        glo = gs;
        if (side === -1) ghi /= 2;
        side = -1;
      }
      // Ratios to 1e-5: thresholds are known to 5 figures at best, and flat stretches (a section on
      // its cracking jump) would otherwise make the search crawl.
      if (gs >= 0 && gs < 1e-5) return s;
    }
    return hi;
  };

  // --- initial state and step size -------------------------------------------------------------------
  let state: Snapshot = { lambda: 0, redundants: new Array(r).fill(0), rotations: new Map() };
  const s0 = solveAt(0, state);
  if (!s0) return failed('no equilibrium under the constant loads');
  state = s0;
  // Reference λ: first station at its peak moment, estimated from a small elastic step.
  const probe = solveAt(1e-6, state);
  if (!probe) return failed('no equilibrium at the first load step');
  const Mprobe = Float64Array.from(restore(probe));
  const M0 = Float64Array.from(restore(state));
  let lambdaRef = Infinity;
  for (let i = 0; i < n; i++) {
    const dm = (Mprobe[i]! - M0[i]!) / 1e-6;
    if (Math.abs(dm) < 1e-9) continue;
    const sg: 1 | -1 = dm > 0 ? 1 : -1;
    const resp = responseOf(beam.zones[stationZone(i)]!, sg);
    const lam = (resp.peakMoment - sg * M0[i]!) / (sg * dm);
    if (lam > 0) lambdaRef = Math.min(lambdaRef, lam);
  }
  if (!Number.isFinite(lambdaRef)) return failed('the load pattern produces no moment in the member');
  const probeDeflection = deflectionAt(probe);
  const baseDeflection = deflectionAt(state);
  controlIndex = 0;
  let biggest = -Infinity;
  for (let i = 0; i < n; i++) {
    const d = Math.abs(probeDeflection[i]! - baseDeflection[i]!);
    if (d > biggest + 1e-12 * Math.abs(d)) {
      biggest = d;
      controlIndex = i;
    }
  }
  // Prefer exact midspan for symmetric cases (largest deflection within 0.01 % of it).
  const mid = beam.x.findIndex((xi) => Math.abs(xi - span / 2) < 1e-9);
  if (beam.support !== 'cantilever' && mid >= 0 && Math.abs(probeDeflection[mid]! - baseDeflection[mid]!) >= biggest * (1 - 1e-4)) controlIndex = mid;
  // A control position given by the caller (a station placed where the elastic deflection peaks)
  // keeps the curve independent of the station spacing.
  if (controlAt !== undefined) {
    const at = beam.x.findIndex((xi) => Math.abs(xi - controlAt) < 1e-6);
    if (at >= 0) controlIndex = at;
  }
  const controlPosition = beam.x[controlIndex]!;
  record(state, 'integration');

  let firstYield: { lambda: number; deflection: number } | null = null;
  let crackedYet = false;
  let peak = { lambda: 0, deflection: controlDeflection(state) };
  let ultimate: { lambda: number; deflection: number } | null = null;
  const crackingRatio = (s: Snapshot) => maxRatio(s, (resp) => resp.crackingMoment).ratio - 1;
  const yieldRatioFor = (site: HingeSite) => (s: Snapshot) => {
    const filter = (i: number, sg: 1 | -1) => {
      if (sg !== siteSign(site)) return false;
      if (site === 'left') return i === 0;
      if (site === 'right') return i === n - 1;
      return i > 0 && i < n - 1;
    };
    return maxRatio(s, (resp) => resp.firstYieldMoment, filter);
  };
  const spacing = span / Math.max(n - 1, 1);
  const overstress = (s: Snapshot) => {
    // Stations outside every plastic hinge zone, past their section's peak moment. Sections
    // within a hinge's length belong to the hinge (its moment governs them), so they are excluded.
    restore(s);
    const zones = hinges.map((h) => {
      const half = Math.max(h.length / 2, 1.01 * spacing);
      if (h.site === 'left') return [0, Math.max(h.length, 1.01 * spacing)] as const;
      if (h.site === 'right') return [span - Math.max(h.length, 1.01 * spacing), span] as const;
      return [beam.x[h.station]! - half, beam.x[h.station]! + half] as const;
    });
    return maxRatio(s, (resp) => resp.peakMoment, (i) => !zones.some(([a, b]) => beam.x[i]! >= a && beam.x[i]! <= b));
  };

  const activate = (site: HingeSite, s: Snapshot) => {
    const { station, sign } = yieldRatioFor(site)(s);
    const M = restore(s);
    const zoneIndex = site === 'right' ? beam.segmentZone[n - 2]! : stationZone(station);
    const zone = beam.zones[zoneIndex]!;
    const data = sign > 0 ? zone.hingeData.sagging : zone.hingeData.hogging;
    const response = responseOf(zone, sign);
    // Shear spans: distance from the critical section to the nearest zero moment on each side.
    const zeroFrom = (start: number, dir: 1 | -1) => {
      for (let i = start; i >= 0 && i < n - 0; i += dir) {
        const j = i + dir;
        if (j < 0 || j >= n) return Math.abs(beam.x[i]! - beam.x[start]!);
        if (Math.sign(M[j]!) !== Math.sign(M[start]!) || M[j] === 0) {
          const t = M[i]! / (M[i]! - M[j]!);
          return Math.abs(beam.x[i]! + t * (beam.x[j]! - beam.x[i]!) - beam.x[start]!);
        }
      }
      return span;
    };
    const atSupport = site !== 'span';
    const shearSpans = site === 'left' ? [zeroFrom(0, 1)] : site === 'right' ? [zeroFrom(n - 1, -1)] : [zeroFrom(station, -1), zeroFrom(station, 1)];
    const input: HingeLengthInput = {
      method: capacity.hingeLengthMethod,
      effectiveDepth: data.effectiveDepth,
      shearSpans,
      barDiameter: data.barDiameter,
      yieldStress: data.yieldStress,
      ultimateStress: data.ultimateStress,
      atSupport,
      ...(capacity.userHingeLength !== undefined ? { userLength: capacity.userHingeLength } : {}),
      ...(text ? { text } : {}),
    };
    const hl = hingeLength(input);
    const length = Math.max(hl.length, 1);
    const rotationPosition = site === 'left' ? Math.min(length / 2, span / 2) : site === 'right' ? Math.max(span - length / 2, span / 2) : beam.x[station]!;
    const ultimatePlastic = response.softening.plastic[response.softening.plastic.length - 1]!;
    hingeVersion++;
    hinges.push({
      site,
      sign,
      station,
      zone: zoneIndex,
      length,
      rotationPosition,
      lengthFormula: hl.formula,
      shearSpan: shearSpans.reduce((a, b) => a + b, 0),
      phase: 'hardening',
      rotation: 0,
      capacity: ultimatePlastic * length,
      activatedAt: s.lambda,
    });
    events.push({ kind: 'first-yield', loadFactor: s.lambda, deflection: controlDeflection(s), position: beam.x[station]!, description: `first yield at ${describePosition(beam.x[station]!, span, beam.support)}: plastic hinge active` });
    if (!firstYield) firstYield = { lambda: s.lambda, deflection: controlDeflection(s) };
  };

  // --- load control ------------------------------------------------------------------------------
  type Ev = { kind: 'cracking' | 'yield' | 'peak' | 'capacity' | 'overstress'; site?: HingeSite; hinge?: number; g: (s: Snapshot) => number };
  const candidates = (): Ev[] => {
    const list: Ev[] = [];
    if (!crackedYet) list.push({ kind: 'cracking', g: crackingRatio });
    for (const site of sites) if (!hinges.some((h) => h.site === site)) list.push({ kind: 'yield', site, g: (s) => yieldRatioFor(site)(s).ratio - 1 });
    hinges.forEach((h, i) => {
      if (h.phase === 'hardening') {
        const resp = responseOf(beam.zones[h.zone]!, h.sign);
        list.push({ kind: 'peak', hinge: i, g: (s) => (h.sign * restore(s)[h.station]!) / resp.peakMoment - (1 - 1e-9) });
      } else list.push({ kind: 'capacity', hinge: i, g: (s) => (s.rotations.get(i) ?? h.rotation) / h.capacity - (1 - 1e-9) });
    });
    list.push({ kind: 'overstress', g: (s) => overstress(s).ratio - (1 + 1e-9) });
    return list;
  };
  let mechanism = false;
  let finished = false;
  const handle = (ev: Ev) => {
    const d = controlDeflection(state);
    if (ev.kind === 'cracking') {
      crackedYet = true;
      const at = maxRatio(state, (resp) => resp.crackingMoment);
      events.push({ kind: 'cracking', loadFactor: state.lambda, deflection: d, position: beam.x[at.station]!, description: `first cracking at ${describePosition(beam.x[at.station]!, span, beam.support)}` });
    } else if (ev.kind === 'yield') {
      const wasFirst = firstYield === null;
      activate(ev.site!, state);
      if (wasFirst) distributions.push(distribution('first yield', state));
    } else if (ev.kind === 'peak') {
      soften(ev.hinge!, state, d);
      if (hinges.filter((x) => x.phase === 'softening').length > r) mechanism = true;
    } else {
      finishUltimate(ev.kind === 'capacity' ? hinges[ev.hinge!]! : undefined, state);
      finished = true;
    }
  };
  let step = lambdaRef / 20;
  let guard = 0;
  let previousState: Snapshot | undefined;
  while (!mechanism && !finished && guard++ < 4000) {
    // Events already reached at the current state (e.g. both supports of a symmetric beam yield together).
    const due = candidates().find((ev) => ev.g(state) >= 0);
    if (due) {
      handle(due);
      continue;
    }
    const target = state.lambda + step;
    // Predictor: extrapolate the redundants along the last step (one or two Newton iterations fewer).
    let guess: Snapshot = state;
    if (previousState && state.lambda > previousState.lambda) {
      const t = (target - state.lambda) / (state.lambda - previousState.lambda);
      guess = { ...state, redundants: state.redundants.map((v, i) => v + t * (v - previousState!.redundants[i]!)) };
    }
    const next = solveAt(target, guess) ?? (guess === state ? undefined : solveAt(target, state));
    if (!next) {
      // With a hinge past its peak, failure to find equilibrium at a higher load is the limit
      // point itself: go straight to rotation control rather than shrinking the step.
      const pastPeak = hinges.some((h) => h.phase === 'softening');
      if (!pastPeak && step > lambdaRef * 1e-6) {
        step /= 4;
        continue;
      }
      if (pastPeak && step > lambdaRef * 1e-3) {
        step /= 8;
        continue;
      }
      converged = false;
      status = `not converged: no equilibrium beyond λ = ${state.lambda.toFixed(4)} (the redundant moments could not be balanced)`;
      failureCause = 'analysis stopped before a limit state (not converged)';
      break;
    }
    let earliest: { ev: Ev; at: Snapshot } | undefined;
    for (const ev of candidates()) {
      const ga = ev.g(state);
      const gb = ev.g(next);
      if (ga < 0 && gb >= 0) {
        const at = locate(state, next, ev.g);
        if (!earliest || at.lambda < earliest.at.lambda) earliest = { ev, at };
      }
    }
    if (!earliest) {
      previousState = state;
      state = next;
      record(state, 'integration');
      step = Math.min(step * 1.25, lambdaRef / 12);
      continue;
    }
    previousState = undefined;
    state = earliest.at;
    record(state, 'integration');
    handle(earliest.ev);
    step = Math.max(step / 2, lambdaRef / 200);
  }
  if (!mechanism && !finished && converged) {
    converged = false;
    status = 'not converged: the load-control stage did not end within its step budget';
    failureCause = status;
  }

  // --- past the peak load: rotation control of the newest softening hinge ---------------------------
  // Entered when the beam becomes a mechanism, or when load control finds no equilibrium beyond a
  // limit point while a hinge is softening (the load must fall for the beam to deform further).
  // λ becomes an unknown; hardening hinges may still reach their peak on the way (they then soften
  // too); the stage ends when a hinge reaches its rotation capacity or a section outside the hinges
  // reaches its peak.
  const softeningCount = () => hinges.filter((h) => h.phase === 'softening').length;
  const limitPoint = !mechanism && !finished && !converged && softeningCount() > 0;
  if ((mechanism || limitPoint) && !ultimate) {
    if (limitPoint) {
      converged = true;
      status = 'complete';
      failureCause = '';
    }
    const controlled = hinges.length - 1 - [...hinges].reverse().findIndex((h) => h.phase === 'softening');
    const hc = hinges[controlled]!;
    peak = { lambda: state.lambda, deflection: controlDeflection(state) };
    events.push(
      mechanism
        ? { kind: 'mechanism', loadFactor: state.lambda, deflection: peak.deflection, position: beam.x[hc.station]!, description: `collapse mechanism: the member can take no more load; the hinge at the ${SITE_WORDS[hc.site]} rotates at constant or falling load` }
        : { kind: 'peak', loadFactor: state.lambda, deflection: peak.deflection, position: beam.x[hc.station]!, description: `peak load: the hinge at the ${SITE_WORDS[hc.site]} is past its peak moment and the load must fall for the member to deform further` },
    );
    const freeList = () => hinges.map((h, i) => (h.phase === 'softening' && i !== controlled ? i : -1)).filter((i) => i >= 0);
    const theta0 = hc.rotation;
    const steps = 16;
    const dTheta = (hc.capacity - theta0) / steps;
    let current = state;
    const solveTheta = (theta: number, from: Snapshot): Snapshot | undefined => {
      hc.rotation = theta;
      hingeVersion++;
      const free = freeList();
      let res = newton(eq, hinges, free, true, { redundants: from.redundants, lambda: from.lambda, rotations: free.map((i) => from.rotations.get(i) ?? hinges[i]!.rotation) }, controlled);
      for (let pass = 0; pass < 2 && res.converged && retrack(); pass++) {
        res = newton(eq, hinges, free, true, { redundants: res.redundants, lambda: res.lambda, rotations: res.rotations }, controlled);
      }
      hingeVersion++;
      if (!res.converged) return undefined;
      const rotations = new Map<number, number>();
      free.forEach((h, i) => rotations.set(h, res.rotations[i]!));
      rotations.set(controlled, theta);
      return { lambda: res.lambda, redundants: res.redundants, rotations };
    };
    type Stage = { kind: 'peak' | 'capacity' | 'overstress'; hinge?: number; g: (s: Snapshot) => number };
    const stageEvents = (): Stage[] => {
      const list: Stage[] = [];
      hinges.forEach((h, i) => {
        if (i === controlled) return;
        if (h.phase === 'hardening') {
          const resp = responseOf(beam.zones[h.zone]!, h.sign);
          list.push({ kind: 'peak', hinge: i, g: (s) => (h.sign * restore(s)[h.station]!) / resp.peakMoment - (1 - 1e-9) });
        } else list.push({ kind: 'capacity', hinge: i, g: (s) => (s.rotations.get(i) ?? h.rotation) / h.capacity - (1 - 1e-9) });
      });
      list.push({ kind: 'overstress', g: (s) => overstress(s).ratio - (1 + 1e-9) });
      return list;
    };
    let theta = theta0;
    for (let k = 1; k <= steps + 1 && !ultimate; k++) {
      const target = Math.min(theta + dTheta, hc.capacity);
      const next = solveTheta(target, current);
      if (!next) {
        converged = false;
        status = `not converged past the peak at θp = ${(target * 1000).toFixed(2)} mrad of the hinge at the ${SITE_WORDS[hc.site]}`;
        failureCause = 'analysis stopped past the peak load (not converged)';
        break;
      }
      // Events in this step: bisect on the controlled rotation.
      let event: { ev: Stage; at: Snapshot; theta: number } | undefined;
      for (const ev of stageEvents()) {
        if (!(ev.g(current) < 0 && ev.g(next) >= 0)) continue;
        // Regula falsi with the Illinois modification on the controlled rotation, to 1e-6 of it.
        let lo = theta;
        let hi = target;
        let loS = current;
        let hiS = next;
        let gLo = ev.g(current);
        let gHi = ev.g(next);
        let side = 0;
        for (let it = 0; it < 40 && hi - lo > 1e-6 * hi; it++) {
          let t = gLo < 0 && gHi > 0 ? -gLo / (gHi - gLo) : 0.5;
          if (!(t > 0.001 && t < 0.999)) t = 0.5;
          const mid = lo + t * (hi - lo);
          const sMid = solveTheta(mid, loS);
          if (!sMid) break;
          const gMid = ev.g(sMid);
          if (gMid >= 0) {
            hi = mid;
            hiS = sMid;
            gHi = gMid;
            if (side === 1) gLo /= 2;
            side = 1;
            if (gMid < 1e-5) break;
          } else {
            lo = mid;
            loS = sMid;
            gLo = gMid;
            if (side === -1) gHi /= 2;
            side = -1;
          }
        }
        if (!event || hi < event.theta) event = { ev, at: hiS, theta: hi };
      }
      if (event) {
        hc.rotation = event.theta;
        current = event.at;
        theta = event.theta;
        record(current, 'mechanism');
        state = current;
        if (event.ev.kind === 'peak') {
          restore(current);
          soften(event.ev.hinge!, current, controlDeflection(current));
          continue;
        }
        hc.rotation = event.theta;
        finishUltimate(event.ev.kind === 'capacity' ? hinges[event.ev.hinge!]! : undefined, current);
        break;
      }
      theta = target;
      current = next;
      hc.rotation = theta;
      record(current, 'mechanism');
      state = current;
      if (theta >= hc.capacity * (1 - 1e-12)) {
        finishUltimate(hc, current);
        break;
      }
    }
  }

  if (peak.lambda === 0 || points.length > 0) {
    const best = points.reduce((a, b) => (b.loadFactor > a.loadFactor ? b : a), points[0]!);
    if (best.loadFactor >= peak.lambda) peak = { lambda: best.loadFactor, deflection: best.deflection };
  }

  const hingeResults: PlasticHinge[] = hinges.map((h) => {
    const resp = responseOf(beam.zones[h.zone]!, h.sign);
    const phiY = resp.nominalYieldCurvature;
    return {
      position: beam.x[h.station]!,
      direction: h.sign > 0 ? 'sagging' : 'hogging',
      sectionId: beam.zones[h.zone]!.sectionId,
      length: h.length,
      lengthMethod: capacity.hingeLengthMethod,
      lengthFormula: h.lengthFormula,
      shearSpan: h.shearSpan,
      rotationCapacity: h.capacity,
      rotationAtUltimate: h.rotation,
      curvatureDuctility: phiY && phiY > 0 ? resp.ultimateCurvature / phiY : null,
    };
  });
  return {
    points,
    events,
    hinges: hingeResults,
    distributions,
    controlPosition,
    status,
    converged,
    firstYield,
    peak,
    ultimate,
    failureCause,
    secantPoint: secantPoint(),
  };

  /**
   * Deflection at 75 % of the largest load, solved at that load: every hinge active then was still
   * hardening (its rotation a function of its moment), so the state is path-independent and can be
   * re-solved with the hinges as they are now, set back to hardening.
   */
  function secantPoint(): CapacityCurve['secantPoint'] {
    if (points.length < 2 || loads.patternTotal <= 0) return null;
    const pMax = Math.max(...points.map((p) => p.totalLoad));
    const base = points[0]!.totalLoad;
    const target = base + 0.75 * (pMax - base);
    const lambda = (target - loads.constantTotal) / loads.patternTotal;
    const firstSoftening = events.find((e) => e.kind === 'hinge' || e.kind === 'mechanism' || e.kind === 'peak');
    if (!(lambda > 0) || (firstSoftening && firstSoftening.loadFactor <= lambda)) return null;
    const guess = loadControlStates.reduce<Snapshot | undefined>((best, st) => (st.lambda <= lambda && (!best || st.lambda > best.lambda) ? st : best), undefined);
    if (!guess) return null;
    const saved = hinges.map((h) => ({ phase: h.phase, rotation: h.rotation, station: h.station, zone: h.zone, position: h.rotationPosition }));
    hinges.forEach((h) => {
      h.phase = 'hardening';
    });
    hingeVersion++;
    const solved = solveAt(lambda, { lambda: guess.lambda, redundants: guess.redundants, rotations: new Map() });
    const deflection = solved ? deflectionAt(solved)[controlIndex]! : null;
    hinges.forEach((h, i) => {
      const k = saved[i]!;
      h.phase = k.phase;
      h.rotation = k.rotation;
      h.station = k.station;
      h.zone = k.zone;
      h.rotationPosition = k.position;
    });
    hingeVersion++;
    return deflection === null ? null : { loadFactor: lambda, totalLoad: target, deflection };
  }

  /** A hardening hinge reaches its section's peak moment: from now on its rotation is an unknown. */
  function soften(index: number, at: Snapshot, deflection: number): void {
    const h = hinges[index]!;
    h.phase = 'softening';
    hingeVersion++;
    at.rotations.set(index, h.rotation);
    events.push({ kind: 'hinge', loadFactor: at.lambda, deflection, position: beam.x[h.station]!, description: `hinge at the ${SITE_WORDS[h.site]} reaches the peak moment of its section (θp = ${(h.rotation * 1000).toFixed(2)} mrad)` });
  }

  /** Why a section outside the hinges reached its peak, in words. */
  function overstressWords(o: { station: number; sign: 1 | -1 }): string {
    const where = describePosition(beam.x[o.station]!, span, beam.support);
    const direction = o.sign > 0 ? 'sagging' : 'hogging';
    const zone = beam.zones[stationZone(o.station)]!;
    const response = o.sign > 0 ? zone.sagging : zone.hogging;
    if (response.firstYieldMoment === null) {
      return `the section at ${where} reaches its peak ${direction} moment without its tension steel yielding (no ${o.sign > 0 ? 'bottom' : 'top'} reinforcement there, or over-reinforced): a brittle failure with no plastic hinge`;
    }
    return `the section at ${where} reaches its peak ${direction} moment outside a plastic hinge`;
  }

  function finishUltimate(hinge: HingeState | undefined, s: Snapshot) {
    const d = controlDeflection(s);
    ultimate = { lambda: s.lambda, deflection: d };
    if (hinge) {
      failureCause = `the plastic hinge at ${describePosition(hinge.site === 'span' ? hinge.rotationPosition : beam.x[hinge.station]!, span, beam.support)} reaches its rotation capacity θp,u = ${(hinge.capacity * 1000).toFixed(2)} mrad`;
    } else {
      const o = overstress(s);
      failureCause = o.ratio >= 1 - 1e-6
        ? overstressWords(o)
        : 'the load–deflection analysis reached its last step';
    }
    events.push({ kind: 'ultimate', loadFactor: s.lambda, deflection: d, position: hinge ? beam.x[hinge.station]! : beam.x[overstress(s).station]!, description: `ultimate: ${failureCause}` });
    distributions.push(distribution('ultimate', s));
  }

  function failed(reason: string): CapacityCurve {
    return {
      points,
      events,
      hinges: [],
      distributions,
      controlPosition: 0,
      status: `not converged: ${reason}`,
      converged: false,
      firstYield: null,
      peak: { lambda: 0, deflection: 0 },
      ultimate: null,
      failureCause: reason,
      secantPoint: null,
    };
  }
}

export interface StaticState {
  readonly converged: boolean;
  readonly redundants: readonly number[];
  readonly moment: Float64Array;
  readonly curvature: Float64Array;
  readonly deflection: Float64Array;
  /** Largest |M|/M′y over the stations (> 1: the load passes first yield somewhere). */
  readonly yieldRatio: number;
  /** Largest |M|/Mpeak over the stations (> 1: the section cannot carry the load). */
  readonly peakRatio: number;
}

/**
 * Equilibrium and deflected shape under a fixed load (no plastic hinges): the service states.
 * @param fields released-structure moments of the load at every station, N·mm
 */
export function solveStatic(beam: BeamModel, fields: Float64Array): StaticState {
  const loads: LoadingFields = { constant: fields, pattern: new Float64Array(fields.length), constantTotal: 0, patternTotal: 0 };
  const eq = new Equations(beam, loads);
  const res = newton(eq, [], [], false, { redundants: new Array(beam.redundants.length).fill(0), lambda: 0, rotations: [] });
  const moment = Float64Array.from(eq.moments(res.redundants, 0));
  const curvature = new Float64Array(moment.length);
  const deflection = deflectionShape(beam, moment, [], curvature);
  let yieldRatio = 0;
  let peakRatio = 0;
  for (let i = 0; i < moment.length; i++) {
    const m = moment[i]!;
    const zone = beam.zones[beam.segmentZone[Math.min(i, moment.length - 2)]!]!;
    const resp = m >= 0 ? zone.sagging : zone.hogging;
    if (resp.firstYieldMoment) yieldRatio = Math.max(yieldRatio, Math.abs(m) / resp.firstYieldMoment);
    if (resp.peakMoment > 0) peakRatio = Math.max(peakRatio, Math.abs(m) / resp.peakMoment);
  }
  return { converged: res.converged, redundants: res.redundants, moment, curvature, deflection, yieldRatio, peakRatio };
}

/**
 * Where the deflection of a deflected shape peaks, mm: the vertex of the parabola through the
 * largest station value and its neighbours (the free end for a cantilever).
 */
export function peakDeflectionPosition(x: ArrayLike<number>, deflection: ArrayLike<number>): number {
  const n = deflection.length;
  let i = 0;
  for (let k = 1; k < n; k++) if (deflection[k]! > deflection[i]!) i = k;
  if (i === 0 || i === n - 1) return x[i]!;
  const x0 = x[i - 1]!;
  const x1 = x[i]!;
  const x2 = x[i + 1]!;
  const d01 = (deflection[i]! - deflection[i - 1]!) / (x1 - x0);
  const d12 = (deflection[i + 1]! - deflection[i]!) / (x2 - x1);
  const c = (d12 - d01) / (x2 - x0);
  if (!(c < 0) || !(x1 > x0) || !(x2 > x1)) return x1;
  const vertex = 0.5 * (x0 + x1) - d01 / (2 * c);
  return vertex > x0 && vertex < x2 ? vertex : x1;
}
