/**
 * The compatibility equations of the member engine and their Newton solution. The released
 * structure (core/member/statics.ts) carries the loads; the unknowns are the redundants
 * (core/member/beam-model.ts), the rotations of localised hinges, and — past a limit point — the
 * load factor λ. Curvature is integrated exactly for the piecewise-linear moment–curvature law with
 * the moment linear between stations (core/member/beam-model.ts, core/member/plastic-law.ts):
 *
 *   ∫ φ·m_k dx + Σ_hinges θ·m_k(x_h) + Σ_faces Lsp·φ_face·m_k(x_face) + f_k·X_k = 0   for each redundant k.
 *
 * The curvature of a section is φe(m) + φp(μ) (plastic-law.ts): μ, the largest moment it has
 * carried (the state's memory), makes unloading sections keep their plastic curvature. With the
 * tension shift, the moment a section's steel feels is the largest moment within a_l of it in each
 * sense (EN 1992-1-1 9.2.1.3(2): the envelope shifted by a_l): m_e = max₍|ξ−x|≤a_l₎ M⁺ − max M⁻.
 * Internal units: mm, N·mm, 1/mm, rad.
 */
import { solveLinear } from '../numeric/linear.ts';
import type { BeamModel, ZoneResponse } from './beam-model.ts';
import { segmentIntegralsFromEnds, zoneCurvature, type SegmentIntegrals } from './beam-model.ts';
import { addPlasticSegment, plasticAt, softeningAt, type PlasticLaw, type TableIntegrals } from './plastic-law.ts';
import type { SectionResponse, ValueAndSlope } from './section-response.ts';

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

/**
 * The largest effective moment each station has carried in each sense (magnitudes, N·mm), and inside
 * each segment the largest moment carried there. The moment is linear between stations in every
 * state, so inside segment k the remembered moment is the upper envelope of the lines of the states
 * carried — convex and piecewise linear in t ∈ [0, 1]. Where that is not the straight line between
 * the two stations' values (a segment whose one end was still loading when the other had begun to
 * unload), `sagInner[k]`/`hogInner[k]` hold its interior breakpoints as [t₁, μ₁, t₂, μ₂, …]. Kept
 * exactly, so that committing a state leaves that state in equilibrium: with the straight line
 * instead, each commit added plastic curvature inside such segments, and results depended on how
 * many load steps had been committed (2–4·10⁻⁴ of an event's load factor).
 */
export interface Memory {
  readonly sag: Float64Array;
  readonly hog: Float64Array;
  readonly sagInner?: readonly (Float64Array | undefined)[];
  readonly hogInner?: readonly (Float64Array | undefined)[];
}

/**
 * The envelope of a segment's remembered moment after a state with moment `ma` → `mb` along it (in
 * the sense's magnitudes): max(μ(t), m(t)), with μ from `mua`, `inner` (breakpoints) and `mub`.
 * Returns the new interior breakpoints, or undefined when the envelope is a straight line.
 */
export function envelopeAfter(mua: number, mub: number, inner: Float64Array | undefined, ma: number, mb: number): Float64Array | undefined {
  const count = inner ? inner.length / 2 : 0;
  const tAt = (j: number) => (j === 0 ? 0 : j === count + 1 ? 1 : inner![2 * (j - 1)]!);
  const muAt = (j: number) => (j === 0 ? mua : j === count + 1 ? mub : inner![2 * (j - 1) + 1]!);
  let above = true;
  let below = true;
  for (let j = 0; j <= count + 1; j++) {
    const d = ma + (mb - ma) * tAt(j) - muAt(j);
    if (d < 0) above = false;
    if (d > 0) below = false;
  }
  if (below) return inner;
  if (above) return undefined;
  const pts: number[] = [];
  for (let j = 0; j <= count + 1; j++) {
    const t = tAt(j);
    const d = ma + (mb - ma) * t - muAt(j);
    pts.push(t, Math.max(muAt(j), ma + (mb - ma) * t));
    if (j <= count) {
      const t2 = tAt(j + 1);
      const d2 = ma + (mb - ma) * t2 - muAt(j + 1);
      if ((d < 0 && d2 > 0) || (d > 0 && d2 < 0)) {
        const tc = t + ((t2 - t) * d) / (d - d2);
        pts.push(tc, ma + (mb - ma) * tc);
      }
    }
  }
  // Interior points where the envelope does not bend (collinear with their neighbours) are dropped.
  const out: number[] = [];
  let lastT = pts[0]!;
  let lastM = pts[1]!;
  for (let j = 2; j < pts.length - 2; j += 2) {
    const t = pts[j]!;
    const m = pts[j + 1]!;
    const tn = pts[j + 2]!;
    const mn = pts[j + 3]!;
    if (!(t > lastT) || !(tn > t)) continue;
    const onChord = lastM + ((mn - lastM) * (t - lastT)) / (tn - lastT);
    if (Math.abs(m - onChord) <= 1e-12 * Math.max(Math.abs(m), Math.abs(onChord))) continue;
    out.push(t, m);
    lastT = t;
    lastM = m;
  }
  return out.length > 0 ? Float64Array.from(out) : undefined;
}

/** A hinge where a section's deformation has localised (past its localisation moment). */
export interface LocalisedHinge {
  /** +1 sagging, −1 hogging. */
  readonly sign: 1 | -1;
  /** Where the localised rotation acts, mm along the member. */
  readonly position: number;
  /** Where its moment is measured: M = (1 − w)·M[a] + w·M[b] (stations), N·mm. */
  readonly a: number;
  readonly b: number;
  readonly w: number;
  /** Zone of the hinge's section, and the law of that section in the hinge's sense. */
  readonly zone: number;
  readonly law: PlasticLaw;
  /** Length over which the softening localises, Lp, mm. */
  readonly length: number;
  /** Unit field of each redundant at the hinge. */
  readonly fields: Float64Array;
  /** Localised rotation θ = κ·Lp, rad (≥ 0). */
  rotation: number;
}

/** A support face where the bars' strain penetration into the support adds a rotation Lsp·φ. */
export interface PenetrationFace {
  readonly support: number;
  readonly station: number;
  readonly position: number;
  readonly side: 'left' | 'right';
  /** Lsp for sagging and hogging moments at the face, mm. */
  readonly sagging: number;
  readonly hogging: number;
  /** Unit field of each redundant at the face. */
  readonly fields: Float64Array;
}

export interface EngineOptions {
  /** Include the plastic parts of the laws (the load–deflection analysis); false: the nonlinear-elastic law only (service states, elastic analyses). */
  readonly plastic: boolean;
  /** Tension shift a_l per zone and sense, mm (null: none). */
  readonly shift: { readonly sagging: Float64Array; readonly hogging: Float64Array } | null;
  readonly faces: readonly PenetrationFace[];
  /** How the equations are solved (absent: DEFAULT_SOLVER); results must not depend on it. */
  readonly solver?: SolverSettings;
}

/**
 * Internal choices of the nonlinear solution that must not change its results beyond 1e-4 of any
 * event's load factor (test/core/member/solver-independence.test.ts varies them). Not part of the
 * project format.
 */
export interface SolverSettings {
  /**
   * How Newton's method shortens a step that does not reduce the residual: 'halving', or
   * 'quadratic' — to the minimum of a quadratic model of the residual norm along the step (from its
   * value at both ends and its slope −f0 at the start), kept within [0.1, 0.5] of the step
   * (Dennis & Schnabel 1983, §6.3.2, from memory).
   */
  readonly lineSearch: 'halving' | 'quadratic';
  /** Multiplies the load steps under load control and the rotation steps past the peak (1: as designed). */
  readonly stepScale: number;
}

export const DEFAULT_SOLVER: SolverSettings = { lineSearch: 'halving', stepScale: 1 };

export const NO_PLASTICITY: EngineOptions = { plastic: false, shift: null, faces: [] };

/** Scratch output of table lookups (the engine is single-threaded and synchronous). */
export const scratch: ValueAndSlope = { value: 0, slope: 0 };

export function responseOf(zone: ZoneResponse, sign: 1 | -1): SectionResponse {
  return sign > 0 ? zone.sagging : zone.hogging;
}

export function plasticLawOf(zone: ZoneResponse, sign: 1 | -1): PlasticLaw | null {
  return (sign > 0 ? zone.plastic?.sagging : zone.plastic?.hogging) ?? null;
}

/**
 * Fraction of a zone's peak curvature below which curvature counts as nothing when the residual of
 * compatibility is judged (its floor): where the solution has (almost) no curvature — a fixed–fixed
 * beam under its axial force alone, whose sections carry a moment at zero curvature — a purely
 * relative test could never pass.
 */
const CURVATURE_FLOOR = 1e-3;

/**
 * A curvature typical of a zone's sections, 1/mm: the larger first-yield (or, without yield, peak)
 * curvature of its two senses; 0 for the linear zones of elastic analyses, whose "peak" is unbounded.
 */
function curvatureScale(zone: ZoneResponse): number {
  const of = (r: SectionResponse) => r.firstYieldCurvature ?? (r.peakMoment < 1e100 ? r.peakCurvature : 0);
  return Math.max(of(zone.sagging), of(zone.hogging));
}

/** The memory of a member that has carried nothing yet. */
export function freshMemory(n: number): Memory {
  return { sag: new Float64Array(n), hog: new Float64Array(n) };
}

/** Candidate points of a station's tension-shift window: stations and two interpolated edges. */
interface Window {
  readonly lo: number;
  readonly hi: number;
  /** Edge points: segment start station and weight of its end (−1: none). */
  readonly leftK: number;
  readonly leftW: number;
  readonly rightK: number;
  readonly rightW: number;
}

/**
 * The station of the largest (sense 1) or smallest (sense −1) moment in stations [lo, hi], the first
 * of equals: the window's ends and the listed interior extremes between them (ascending), in order.
 */
function windowExtreme(M: Float64Array, lo: number, hi: number, extremes: Int32Array, count: number, sense: 1 | -1): number {
  let at = lo;
  let best = sense * M[lo]!;
  // First listed extreme after lo (binary search; the list is short).
  let a = 0;
  let b = count;
  while (a < b) {
    const mid = (a + b) >> 1;
    if (extremes[mid]! <= lo) a = mid + 1;
    else b = mid;
  }
  for (let k = a; k < count; k++) {
    const j = extremes[k]!;
    if (j >= hi) break;
    const v = sense * M[j]!;
    if (v > best) {
      best = v;
      at = j;
    }
  }
  if (hi > lo && sense * M[hi]! > best) at = hi;
  return at;
}

const ZERO_INTEGRALS = (): TableIntegrals => ({ i0: 0, i1: 0, j00: 0, j01: 0, j11: 0 });

/**
 * Residual and Jacobian evaluator over the member for a given set of hinges. Unknown vector:
 * [redundants…, rotations of the free hinges…, λ if λ is unknown].
 */
export class Equations {
  readonly n: number;
  readonly r: number;
  /** Moment at the stations, N·mm, and the effective moment the sections feel (tension shift), N·mm. */
  readonly moment: Float64Array;
  readonly effective: Float64Array;
  /** dm_e/du at the stations for each redundant (index < r) and for λ (index r). */
  private readonly sens: Float64Array[];
  private readonly seg: SegmentIntegrals = { i0: 0, i1: 0, j00: 0, j01: 0, j11: 0, phiA: 0, phiB: 0 };
  private readonly sagInt = ZERO_INTEGRALS();
  private readonly hogInt = ZERO_INTEGRALS();
  private readonly ends: ValueAndSlope[];
  private readonly windows: { sagging: Window[]; hogging: Window[] } | null;
  /** Source of each station's effective moment per sense: station pair and weight (−1: none). */
  private readonly srcA: Int32Array;
  private readonly srcB: Int32Array;
  private readonly srcW: Float64Array;
  private readonly srcHa: Int32Array;
  private readonly srcHb: Int32Array;
  private readonly srcHw: Float64Array;

  /** The curvature scale of each zone (curvatureScale), 1/mm, computed once. */
  private readonly zoneScale: Float64Array;
  /**
   * Interior stations whose moment is at least (peaks) or at most (troughs) that of both neighbours,
   * ascending, and their counts; rebuilt by `moments`. The largest moment of a window is at one of
   * its ends or at a peak inside it — the first of equals too — so a window is searched through
   * these instead of station by station.
   */
  private readonly peaks: Int32Array;
  private readonly troughs: Int32Array;
  private peakCount = 0;
  private troughCount = 0;

  /**
   * i0 and i1 of every segment (SegmentIntegrals) from the last `evaluate` that integrated the
   * segments (r > 0, not secant), for its moments and memory: the deflected shape of a converged
   * state reuses them (`newton` says whether its last evaluation was at the state it returns).
   * Segments of zero length keep 0.
   */
  readonly segmentI0: Float64Array;
  readonly segmentI1: Float64Array;

  /**
   * Shear flexibility s, mm per N·mm: the deflection from shear strain is s·(M(x) − M(0)) (γ = s·V),
   * added to the deflected shape only (core/member/spread.ts shearFlexibility); 0: flexure only.
   */
  shearFlexibility = 0;

  constructor(readonly beam: BeamModel, readonly loads: LoadingFields, readonly options: EngineOptions = NO_PLASTICITY) {
    this.n = beam.x.length;
    this.r = beam.redundants.length;
    this.moment = new Float64Array(this.n);
    this.effective = new Float64Array(this.n);
    this.ends = Array.from({ length: this.n }, () => ({ value: 0, slope: 0, piece: -1 }));
    this.windows = options.shift ? { sagging: this.buildWindows(options.shift.sagging), hogging: this.buildWindows(options.shift.hogging) } : null;
    // Without the tension shift the effective moment is the moment: its sensitivities are the unit
    // fields themselves (read only), and the sources of the shifted moments are not needed.
    this.sens = this.windows ? Array.from({ length: this.r + 1 }, () => new Float64Array(this.n)) : [...beam.redundantFields, loads.pattern];
    const m = this.windows ? this.n : 0;
    this.peaks = new Int32Array(m);
    this.troughs = new Int32Array(m);
    this.srcA = new Int32Array(m);
    this.srcB = new Int32Array(m);
    this.srcW = new Float64Array(m);
    this.srcHa = new Int32Array(m);
    this.srcHb = new Int32Array(m);
    this.srcHw = new Float64Array(m);
    this.zoneScale = Float64Array.from(beam.zones, curvatureScale);
    this.segmentI0 = new Float64Array(Math.max(this.n - 1, 0));
    this.segmentI1 = new Float64Array(Math.max(this.n - 1, 0));
  }

  /** Windows of every station for the shift a_l of its zone (in one sense), not crossing a support that takes a moment. */
  private buildWindows(shift: Float64Array): Window[] {
    const { x, side, stationZone } = this.beam;
    const n = this.n;
    // Pieces between supports with a jump in moment: a window stays within its station's piece.
    const piece = new Int32Array(n);
    const barriers = new Set(this.beam.redundants.filter((r) => r.kind === 'restraint' && r.at > 0 && r.at < this.beam.span).map((r) => r.at));
    for (let i = 1; i < n; i++) piece[i] = piece[i - 1]! + (side[i] === 1 && barriers.has(x[i]!) ? 1 : 0);
    const out: Window[] = [];
    for (let i = 0; i < n; i++) {
      const a = shift[stationZone[i]!]!;
      let lo = i;
      while (lo > 0 && piece[lo - 1] === piece[i] && x[i]! - x[lo - 1]! <= a) lo--;
      let hi = i;
      while (hi < n - 1 && piece[hi + 1] === piece[i] && x[hi + 1]! - x[i]! <= a) hi++;
      let leftK = -1;
      let leftW = 0;
      if (lo > 0 && piece[lo - 1] === piece[i] && x[lo]! > x[lo - 1]!) {
        leftK = lo - 1;
        leftW = (x[i]! - a - x[lo - 1]!) / (x[lo]! - x[lo - 1]!);
      }
      let rightK = -1;
      let rightW = 0;
      if (hi < n - 1 && piece[hi + 1] === piece[i] && x[hi + 1]! > x[hi]!) {
        rightK = hi;
        rightW = (x[i]! + a - x[hi]!) / (x[hi + 1]! - x[hi]!);
      }
      out.push({ lo, hi, leftK, leftW, rightK, rightW });
    }
    return out;
  }

  /** Fills the moments and effective moments for redundants X and λ. */
  moments(redundants: readonly number[], lambda: number): Float64Array {
    const { constant, pattern } = this.loads;
    const fields = this.beam.redundantFields;
    const M = this.moment;
    for (let i = 0; i < this.n; i++) {
      let m = constant[i]! + lambda * pattern[i]!;
      for (let j = 0; j < fields.length; j++) m += redundants[j]! * fields[j]![i]!;
      M[i] = m;
    }
    if (!this.windows) {
      this.effective.set(M);
      return M;
    }
    const sagW = this.windows.sagging;
    const hogW = this.windows.hogging;
    this.findExtremes(M);
    for (let i = 0; i < this.n; i++) {
      // Sagging part: the largest positive moment in the window (the first of equals); hogging part
      // likewise. The search through the peaks finds the same station a scan of the window would.
      let best = 0;
      let ja = -1;
      let jb = -1;
      let w = 0;
      const ws = sagW[i]!;
      const top = windowExtreme(M, ws.lo, ws.hi, this.peaks, this.peakCount, 1);
      if (M[top]! > best) { best = M[top]!; ja = top; jb = top; }
      if (ws.leftK >= 0) {
        const v = (1 - ws.leftW) * M[ws.leftK]! + ws.leftW * M[ws.leftK + 1]!;
        if (v > best) { best = v; ja = ws.leftK; jb = ws.leftK + 1; w = ws.leftW; }
      }
      if (ws.rightK >= 0) {
        const v = (1 - ws.rightW) * M[ws.rightK]! + ws.rightW * M[ws.rightK + 1]!;
        if (v > best) { best = v; ja = ws.rightK; jb = ws.rightK + 1; w = ws.rightW; }
      }
      let worst = 0;
      let ha = -1;
      let hb = -1;
      let hw = 0;
      const wh = hogW[i]!;
      const bottom = windowExtreme(M, wh.lo, wh.hi, this.troughs, this.troughCount, -1);
      if (-M[bottom]! > worst) { worst = -M[bottom]!; ha = bottom; hb = bottom; }
      if (wh.leftK >= 0) {
        const v = -((1 - wh.leftW) * M[wh.leftK]! + wh.leftW * M[wh.leftK + 1]!);
        if (v > worst) { worst = v; ha = wh.leftK; hb = wh.leftK + 1; hw = wh.leftW; }
      }
      if (wh.rightK >= 0) {
        const v = -((1 - wh.rightW) * M[wh.rightK]! + wh.rightW * M[wh.rightK + 1]!);
        if (v > worst) { worst = v; ha = wh.rightK; hb = wh.rightK + 1; hw = wh.rightW; }
      }
      if (ja < 0 && ha < 0) {
        // No moment of either sense in the window (a member under its axial force alone, at the first
        // step): the section's own moment is the effective one, so that it still has a derivative —
        // with none, Newton's method could never leave this state (issue 17).
        ja = i;
        jb = i;
        w = 0;
        best = M[i]!;
      }
      this.srcA[i] = ja;
      this.srcB[i] = jb;
      this.srcW[i] = w;
      this.srcHa[i] = ha;
      this.srcHb[i] = hb;
      this.srcHw[i] = hw;
      this.effective[i] = best - worst;
    }
    return M;
  }

  /**
   * Puts back the moments and effective moments that `moments` gave for a state (copies of `moment`
   * and `effective` taken then): the same numbers without searching the tension-shift windows again.
   * The Jacobian's sources are not restored — `evaluate` always calls `moments` first.
   */
  loadMoments(moment: Float64Array, effective: Float64Array): void {
    this.moment.set(moment);
    this.effective.set(effective);
  }

  /** Lists the interior peaks and troughs of the moments M (see `peaks`). */
  private findExtremes(M: Float64Array): void {
    let peaks = 0;
    let troughs = 0;
    for (let j = 1; j < this.n - 1; j++) {
      const m = M[j]!;
      const before = M[j - 1]!;
      const after = M[j + 1]!;
      if (m >= before && m >= after) this.peaks[peaks++] = j;
      if (m <= before && m <= after) this.troughs[troughs++] = j;
    }
    this.peakCount = peaks;
    this.troughCount = troughs;
  }

  /** dm_e/du at every station for the redundants and λ (after `moments`). */
  private sensitivities(): void {
    if (!this.windows) return; // the unit fields themselves (constructor)
    const fields = this.beam.redundantFields;
    const pattern = this.loads.pattern;
    for (let l = 0; l <= this.r; l++) {
      const f = l < this.r ? fields[l]! : pattern;
      const s = this.sens[l]!;
      for (let i = 0; i < this.n; i++) {
        let v = 0;
        const a = this.srcA[i]!;
        if (a >= 0) v += (1 - this.srcW[i]!) * f[a]! + this.srcW[i]! * f[this.srcB[i]!]!;
        // m_e = A − B with B = max(−M): dm_e = dM(source of A) + dM(source of B).
        const h = this.srcHa[i]!;
        if (h >= 0) v += (1 - this.srcHw[i]!) * f[h]! + this.srcHw[i]! * f[this.srcHb[i]!]!;
        s[i] = v;
      }
    }
  }

  /**
   * Total curvature of station i (1/mm) and its derivative with respect to the effective moment, for
   * the current moments and the memory given (the plastic parts only with options.plastic).
   */
  stationCurvature(i: number, memory: Memory | null, out: ValueAndSlope): ValueAndSlope {
    const zone = this.beam.zones[this.beam.stationZone[i]!]!;
    const me = this.effective[i]!;
    zoneCurvature(zone, me, out);
    if (!this.options.plastic || !zone.plastic) return out;
    const sag = zone.plastic.sagging;
    const hog = zone.plastic.hogging;
    const muS = memory ? memory.sag[i]! : 0;
    const muH = memory ? memory.hog[i]! : 0;
    if (sag) {
      plasticAt(sag, Math.max(me, muS), scratch);
      out.value += scratch.value;
      if (me > muS) out.slope += scratch.slope;
    }
    if (hog) {
      plasticAt(hog, Math.max(-me, muH), scratch);
      out.value -= scratch.value;
      if (-me > muH) out.slope += scratch.slope;
    }
    return out;
  }

  /** The nonlinear-elastic curvature at every station, once (each ends one segment and starts the next); after `moments`. */
  prepareEnds(): void {
    const beam = this.beam;
    for (let i = 0; i < this.n; i++) zoneCurvature(beam.zones[beam.stationZone[i]!]!, this.effective[i]!, this.ends[i]!);
  }

  /**
   * The nonlinear-elastic curvature at every station as `prepareEnds` last found it (1/mm) — for a
   * state without plasticity, its curvature (stationCurvature) without looking the laws up again.
   */
  endCurvatures(out: Float64Array): Float64Array {
    for (let i = 0; i < this.n; i++) out[i] = this.ends[i]!.value;
    return out;
  }

  /**
   * Integrals of the curvature over segment k (after `moments` and `prepareEnds`): i0 = ∫φ dt, i1 = ∫φ·t dt, and the
   * Jacobian weights with respect to the effective moments at its ends.
   */
  segment(k: number, memory: Memory | null, secant: boolean, out: SegmentIntegrals): SegmentIntegrals {
    const beam = this.beam;
    const zone = beam.zones[beam.segmentZone[k]!]!;
    const me = this.effective;
    const ends = this.ends;
    segmentIntegralsFromEnds(zone, me[k]!, me[k + 1]!, ends[k]!, ends[k + 1]!, secant, out);
    if (!this.options.plastic || !zone.plastic) return out;
    const s = this.sagInt;
    const h = this.hogInt;
    s.i0 = s.i1 = s.j00 = s.j01 = s.j11 = 0;
    h.i0 = h.i1 = h.j00 = h.j01 = h.j11 = 0;
    const mem = memory;
    if (zone.plastic.sagging) addPlasticSegment(zone.plastic.sagging, me[k]!, me[k + 1]!, mem ? mem.sag[k]! : 0, mem ? mem.sag[k + 1]! : 0, s, mem?.sagInner?.[k]);
    if (zone.plastic.hogging) addPlasticSegment(zone.plastic.hogging, -me[k]!, -me[k + 1]!, mem ? mem.hog[k]! : 0, mem ? mem.hog[k + 1]! : 0, h, mem?.hogInner?.[k]);
    out.i0 += s.i0 - h.i0;
    out.i1 += s.i1 - h.i1;
    // φ = −φp(−m) on the hogging side: dφ/dm = +φp′, so both parts add to the flexibility.
    out.j00 += s.j00 + h.j00;
    out.j01 += s.j01 + h.j01;
    out.j11 += s.j11 + h.j11;
    return out;
  }

  /**
   * Residuals R and Jacobian J at the given unknowns.
   * layout: r redundants, then the free hinges' rotations (list `free`), then λ if `lambdaFree`.
   * In the mechanism stage the `controlled` hinge's rotation is given and its equation fixes λ.
   */
  evaluate(
    redundants: readonly number[],
    lambda: number,
    hinges: readonly LocalisedHinge[],
    free: readonly number[],
    lambdaFree: boolean,
    memory: Memory | null,
    secant = false,
    controlled = -1,
  ): { residual: number[]; jacobian: number[][]; scale: number[] } {
    const beam = this.beam;
    const r = this.r;
    const size = r + free.length + (lambdaFree ? 1 : 0);
    const residual = new Array<number>(size).fill(0);
    const jacobian = Array.from({ length: size }, () => new Array<number>(size).fill(0));
    const scale = new Array<number>(size).fill(0);
    this.moments(redundants, lambda);
    this.sensitivities();
    const x = beam.x;
    const fields = beam.redundantFields;
    const sens = this.sens;
    const sensL = sens[r]!;
    const lambdaCol = r + free.length;
    if (r > 0) {
      this.prepareEnds();
      const seg = this.seg;
      for (let k = 0; k < this.n - 1; k++) {
        const h = x[k + 1]! - x[k]!;
        if (h <= 0) continue;
        this.segment(k, memory, secant, seg);
        this.segmentI0[k] = seg.i0;
        this.segmentI1[k] = seg.i1;
        const w0 = seg.i0 - seg.i1;
        const w1 = seg.i1;
        const magnitude = h * (0.5 * (Math.abs(seg.phiA) + Math.abs(seg.phiB)) + CURVATURE_FLOOR * this.zoneScale[beam.segmentZone[k]!]!);
        for (let i = 0; i < r; i++) {
          const ma = fields[i]![k]!;
          const mb = fields[i]![k + 1]!;
          if (ma === 0 && mb === 0) continue;
          residual[i]! += h * (ma * w0 + mb * w1);
          scale[i]! += magnitude * Math.max(Math.abs(ma), Math.abs(mb));
          const ra = ma * seg.j00 + mb * seg.j01;
          const rb = ma * seg.j01 + mb * seg.j11;
          const row = jacobian[i]!;
          for (let j = 0; j < r; j++) row[j]! += h * (ra * sens[j]![k]! + rb * sens[j]![k + 1]!);
          if (lambdaFree) row[lambdaCol]! += h * (ra * sensL[k]! + rb * sensL[k + 1]!);
        }
      }
      // Springs: the support rotates by the moment it takes times its flexibility.
      for (let i = 0; i < r; i++) {
        const f = beam.flexibility[i]!;
        if (f === 0) continue;
        residual[i]! += f * redundants[i]!;
        jacobian[i]![i]! += f;
        scale[i]! += Math.abs(f * redundants[i]!);
      }
      // Strain penetration at the support faces: a rotation Lsp·φ there.
      for (const face of this.options.faces) {
        const c = this.stationCurvature(face.station, memory, { value: 0, slope: 0 });
        const length = this.effective[face.station]! >= 0 ? face.sagging : face.hogging;
        if (length === 0) continue;
        for (let i = 0; i < r; i++) {
          const m = face.fields[i]!;
          if (m === 0) continue;
          residual[i]! += length * c.value * m;
          scale[i]! += Math.abs(length * c.value * m);
          for (let j = 0; j < r; j++) jacobian[i]![j]! += length * c.slope * m * sens[j]![face.station]!;
          if (lambdaFree) jacobian[i]![lambdaCol]! += length * c.slope * m * sensL[face.station]!;
        }
      }
    }
    // Localised hinges.
    hinges.forEach((hinge, index) => {
      const freeIndex = free.indexOf(index);
      const theta = hinge.rotation;
      for (let i = 0; i < r; i++) {
        const mi = hinge.fields[i]!;
        residual[i]! += hinge.sign * theta * mi;
        scale[i]! += Math.abs(theta * mi);
        if (freeIndex >= 0) jacobian[i]![r + freeIndex]! += hinge.sign * mi;
      }
      const isControlled = lambdaFree && index === controlled;
      if (freeIndex < 0 && !isControlled) return;
      // The hinge's moment follows the rest of its section's curve: s·M(x_h) − M(θ/Lp) = 0. The
      // controlled hinge's equation is the row that determines λ in the mechanism stage.
      // The moment is the effective one (with the tension shift, the largest within a_l): the
      // measure by which the section reached its localisation moment, so a hinge starts on its own
      // curve — at a bar cut-off the raw moment there is well below what the weak section's steel
      // feels (issue 18).
      const row = isControlled ? lambdaCol : r + freeIndex;
      const { a, b, w } = hinge;
      const me = this.effective;
      const mh = hinge.sign * ((1 - w) * me[a]! + w * me[b]!);
      softeningAt(hinge.law, theta / hinge.length, scratch);
      residual[row] = mh - scratch.value;
      scale[row] = Math.max(Math.abs(hinge.law.peakMoment), 1);
      for (let j = 0; j < r; j++) jacobian[row]![j] = hinge.sign * ((1 - w) * sens[j]![a]! + w * sens[j]![b]!);
      if (!isControlled) jacobian[row]![row] = -scratch.slope / hinge.length;
      if (lambdaFree) jacobian[row]![lambdaCol] = hinge.sign * ((1 - w) * sensL[a]! + w * sensL[b]!);
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
  /**
   * Whether the last evaluation of the equations (without the secant) was at the state returned:
   * then `eq.segmentI0`/`segmentI1` hold its segment integrals (when the member has redundants).
   */
  readonly integralsAtSolution: boolean;
}

/** Newton iteration with backtracking on the scaled residual norm. */
export function newton(
  eq: Equations,
  hinges: readonly LocalisedHinge[],
  free: readonly number[],
  lambdaFree: boolean,
  start: { redundants: readonly number[]; lambda: number; rotations: readonly number[] },
  memory: Memory | null = null,
  controlled = -1,
): NewtonResult {
  const r = eq.r;
  const quadratic = (eq.options.solver ?? DEFAULT_SOLVER).lineSearch === 'quadratic';
  let X = [...start.redundants];
  let lambda = start.lambda;
  let rot = [...start.rotations];
  const apply = (index: number, value: number) => {
    hinges[index]!.rotation = value;
  };
  free.forEach((h, i) => apply(h, rot[i]!));
  const norm = (res: number[], scale: number[]) => {
    let worst = 0;
    for (let i = 0; i < res.length; i++) worst = Math.max(worst, Math.abs(res[i]!) / Math.max(scale[i]!, 1e-300));
    return worst;
  };
  let current = eq.evaluate(X, lambda, hinges, free, lambdaFree, memory, false, controlled);
  let atSolution = true;
  let currentNorm = norm(current.residual, current.scale);
  const size = current.residual.length;
  if (size === 0) return { converged: true, redundants: X, lambda, rotations: rot, iterations: 0, residualNorm: 0, integralsAtSolution: true };
  for (let iteration = 1; iteration <= 60; iteration++) {
    // Converged when the worst compatibility error is below 1e-9 of the rotations involved (far
    // below anything a deflection or redundant moment shows).
    if (currentNorm < 1e-9) return { converged: true, redundants: X, lambda, rotations: rot, iterations: iteration - 1, residualNorm: currentNorm, integralsAtSolution: atSolution };
    const step = solveLinear(current.jacobian.map((row) => [...row]), current.residual.map((v) => -v));
    if (!step) break;
    let factor = 1;
    let accepted = false;
    for (let tries = 0; tries < 30; tries++) {
      const X2 = X.map((v, i) => v + factor * step[i]!);
      const rot2 = rot.map((v, i) => Math.max(0, v + factor * step[r + i]!));
      const lambda2 = lambdaFree ? lambda + factor * step[size - 1]! : lambda;
      free.forEach((h, i) => apply(h, rot2[i]!));
      const trial = eq.evaluate(X2, lambda2, hinges, free, lambdaFree, memory, false, controlled);
      const trialNorm = norm(trial.residual, trial.scale);
      atSolution = false;
      if (trialNorm < currentNorm || trialNorm < 1e-10) {
        atSolution = true;
        X = X2;
        rot = rot2;
        lambda = lambda2;
        current = trial;
        currentNorm = trialNorm;
        accepted = true;
        break;
      }
      factor *= quadratic ? Math.min(0.5, Math.max(0.1, currentNorm / (2 * trialNorm))) : 0.5;
    }
    if (!accepted) {
      free.forEach((h, i) => apply(h, rot[i]!));
      break;
    }
  }
  if (currentNorm >= 1e-8 && free.length === 0 && !lambdaFree) {
    // Fallback: secant-flexibility iterations. Robust where Newton stalls on the steep, kinked
    // stretches of the curves (load-controlled jumps in curvature at cracking).
    // The iteration is a fixed map of X (the evaluations are pure functions of the state), so once an
    // iterate repeats one of the last few exactly, the rest of the loop only goes round that cycle
    // (a state with no solution, where the iterates alternate between two points for all 400
    // iterations: 800 evaluations): the iterate the loop would end on is taken at once, the same
    // bit for bit.
    const LIMIT = 400;
    const recent: { X: number[]; current: typeof current; norm: number }[] = [{ X, current, norm: currentNorm }];
    for (let iteration = 0; iteration < LIMIT && currentNorm >= 1e-10; iteration++) {
      const sec = eq.evaluate(X, lambda, hinges, free, lambdaFree, memory, true);
      atSolution = false; // the secant evaluation takes another path through the segments
      const step = solveLinear(sec.jacobian.map((row) => [...row]), sec.residual.map((v) => -v));
      if (!step) break;
      const X2 = X.map((v, i) => v + step[i]!);
      const trial = eq.evaluate(X2, lambda, hinges, free, lambdaFree, memory);
      atSolution = true;
      X = X2;
      current = trial;
      currentNorm = norm(trial.residual, trial.scale);
      // recent[j] is the iterate after iteration (iteration − (recent.length − 1 − j)); X is the one
      // after iteration + 1 iterations. A repeat of recent[j] means a cycle of period p.
      const repeat = recent.findIndex((r) => r.X.every((v, i) => v === X[i]));
      if (repeat >= 0 && currentNorm >= 1e-10) {
        const p = recent.length - repeat;
        const done = iteration + 1;
        const left = (LIMIT - done) % p;
        if (left > 0) {
          const at = recent[repeat + left]!;
          X = at.X;
          current = at.current;
          currentNorm = at.norm;
          atSolution = false; // not the state the equations last evaluated
        }
        break;
      }
      recent.push({ X, current, norm: currentNorm });
      if (recent.length > 4) recent.shift();
    }
  }
  return { converged: currentNorm < 1e-8, redundants: X, lambda, rotations: rot, iterations: 60, residualNorm: currentNorm, integralsAtSolution: atSolution };
}
