/**
 * The state of a load–deflection analysis as one explicit object: the member and its equations, the
 * localised hinges, the memory of the largest moments carried, the recorded curve, events and
 * distributions, and the mechanics every stage uses — solving at a load factor or at a hinge
 * rotation, restoring a solved state, the control deflection, how close the most stressed station is
 * to a section threshold, and the search for the state at which an event happens. The stages
 * themselves (load control, rotation control past the peak) are core/member/capacity.ts.
 * Internal units: mm, N·mm, 1/mm, rad.
 */
import { locateEvent, type SolvedPoint } from '../numeric/roots.ts';
import type { BeamModel } from './beam-model.ts';
import { deflectionShape } from './deflection.ts';
import { envelopeAfter, Equations, newton, plasticLawOf, responseOf, scratch, type EngineOptions, type LoadingFields, type Memory } from './equations.ts';
import type { HingeRecord } from './hinges.ts';
import { softeningAt, type PlasticLaw } from './plastic-law.ts';
import type { LoadDeflectionPoint, MemberEvent, SpanDistribution } from './results.ts';
import type { SectionResponse } from './section-response.ts';

/** A solved state: load factor, redundants, the rotations of the localised hinges, and the memory including this state. */
export interface Snapshot {
  readonly lambda: number;
  readonly redundants: number[];
  readonly rotations: Map<number, number>;
  readonly memory: Memory;
}

/** What a ratio search finds: the largest ratio, at which station, in which sense. */
export interface StationRatio {
  readonly ratio: number;
  readonly station: number;
  readonly sign: 1 | -1;
}

/** What is kept of a solved state besides its snapshot: its moments and, when known, its segment integrals. */
interface SolvedState {
  readonly moment: Float64Array;
  readonly effective: Float64Array;
  readonly integrals?: { readonly i0: Float64Array; readonly i1: Float64Array };
}

export class CapacityState {
  readonly eq: Equations;
  /** Number of stations, number of redundants, length of the member (mm). */
  readonly n: number;
  readonly r: number;
  readonly span: number;
  readonly events: MemberEvent[] = [];
  readonly points: LoadDeflectionPoint[] = [];
  readonly distributions: SpanDistribution[] = [];
  readonly hinges: HingeRecord[] = [];
  /** States recorded under load control before any localisation (the secant point is re-solved from one of them). */
  readonly loadControlStates: Snapshot[] = [];
  /** λ at which each station first yielded, per sense (NaN: not yet). */
  readonly yieldedAt: { readonly sag: Float64Array; readonly hog: Float64Array };
  status = 'complete';
  converged = true;
  failureCause = '';
  /** Station of the control deflection. */
  controlIndex = -1;
  /** The memory the current step solves from (that of its last committed state). */
  baseMemory: Memory;
  /** The localised rotations of that state (a hinge's rotation never falls below them). */
  baseRotations: ReadonlyMap<number, number> = new Map();
  /**
   * Bumped whenever a solve overwrites the shared moment array and hinge rotations, or the hinge set
   * changes: the caches below are valid for one version only.
   */
  hingeVersion = 0;
  /**
   * The moments and effective moments of each state solved here (copies taken when it was solved):
   * restoring a state copies them back instead of recomputing the effective moments (the
   * tension-shift windows), which the event functions do for every state they look at. Keyed by the
   * snapshot object, so a snapshot built by spreading another (a predictor's guess) has none.
   */
  private readonly solvedMoments = new WeakMap<Snapshot, SolvedState>();
  private restored: Snapshot | undefined;
  private restoredVersion = -1;
  private deflected: Snapshot | undefined;
  private deflectedVersion = -1;
  private deflectedValue = 0;

  constructor(readonly beam: BeamModel, readonly loads: LoadingFields, options: EngineOptions) {
    this.eq = new Equations(beam, loads, options);
    this.n = beam.x.length;
    this.r = beam.redundants.length;
    this.span = beam.span;
    this.baseMemory = { sag: new Float64Array(this.n), hog: new Float64Array(this.n) };
    this.yieldedAt = { sag: new Float64Array(this.n).fill(Number.NaN), hog: new Float64Array(this.n).fill(Number.NaN) };
  }

  /** The memory after the state in `eq` (its effective moments) on top of `base`, inside the segments too (Memory). */
  private committed(base: Memory): Memory {
    const me = this.eq.effective;
    const { beam, n } = this;
    let sagInner = base.sagInner;
    let hogInner = base.hogInner;
    // Segments whose envelope bends: only where the plastic law reaches (below first yield the
    // remembered moment changes nothing).
    for (let k = 0; k < n - 1; k++) {
      if (!(beam.x[k + 1]! > beam.x[k]!)) continue;
      const zone = beam.zones[beam.segmentZone[k]!]!;
      const sagLaw = zone.plastic?.sagging;
      if (sagLaw && sagLaw.knotMoments.length > 0 && Math.max(me[k]!, me[k + 1]!, base.sag[k]!, base.sag[k + 1]!) > sagLaw.knotMoments[0]!) {
        const before = base.sagInner?.[k];
        const after = envelopeAfter(base.sag[k]!, base.sag[k + 1]!, before, me[k]!, me[k + 1]!);
        if (after !== before) {
          if (sagInner === base.sagInner) sagInner = base.sagInner ? [...base.sagInner] : new Array<Float64Array | undefined>(n - 1);
          (sagInner as (Float64Array | undefined)[])[k] = after;
        }
      }
      const hogLaw = zone.plastic?.hogging;
      if (hogLaw && hogLaw.knotMoments.length > 0 && Math.max(-me[k]!, -me[k + 1]!, base.hog[k]!, base.hog[k + 1]!) > hogLaw.knotMoments[0]!) {
        const before = base.hogInner?.[k];
        const after = envelopeAfter(base.hog[k]!, base.hog[k + 1]!, before, -me[k]!, -me[k + 1]!);
        if (after !== before) {
          if (hogInner === base.hogInner) hogInner = base.hogInner ? [...base.hogInner] : new Array<Float64Array | undefined>(n - 1);
          (hogInner as (Float64Array | undefined)[])[k] = after;
        }
      }
    }
    const sag = Float64Array.from(base.sag);
    const hog = Float64Array.from(base.hog);
    for (let i = 0; i < n; i++) {
      const m = me[i]!;
      if (m > sag[i]!) sag[i] = m;
      if (-m > hog[i]!) hog[i] = -m;
    }
    return { sag, hog, ...(sagInner ? { sagInner } : {}), ...(hogInner ? { hogInner } : {}) };
  }

  /** Makes a state the base of the next step; notes where the sections first yielded. */
  commit(s: Snapshot): void {
    this.baseMemory = s.memory;
    this.baseRotations = s.rotations;
    const beam = this.beam;
    for (let i = 0; i < this.n; i++) {
      const zone = beam.zones[beam.stationZone[i]!]!;
      for (const sign of [1, -1] as const) {
        const law = plasticLawOf(zone, sign);
        const when = sign > 0 ? this.yieldedAt.sag : this.yieldedAt.hog;
        const mu = sign > 0 ? s.memory.sag[i]! : s.memory.hog[i]!;
        if (law && law.yieldMoment !== null && mu >= law.yieldMoment && Number.isNaN(when[i]!)) when[i] = s.lambda;
      }
    }
  }

  /** Equilibrium at load factor λ (load control) from the base memory, starting from `guess`; undefined when Newton fails. */
  solveAt(lambda: number, guess: Snapshot): Snapshot | undefined {
    return this.solveHinges(-1, lambda, guess);
  }

  /** Equilibrium with the rotation of hinge `controlled` prescribed and λ an unknown. */
  solveAtRotation(controlled: number, theta: number, from: Snapshot): Snapshot | undefined {
    this.hinges[controlled]!.rotation = theta;
    this.hingeVersion++;
    return this.solveHinges(controlled, from.lambda, from, theta);
  }

  /** The localised rotation of hinge i in the last committed state (0 for a hinge formed since), rad. */
  private committedRotation(i: number): number {
    return this.baseRotations.get(i) ?? 0;
  }

  /**
   * Newton's method with the localised hinges as an active set. A localised rotation does not go
   * back: a hinge whose moment falls below its curve unloads elastically and keeps its rotation
   * (θ = θc, M ≤ M(θc/Lp)); one on its curve rotates on (θ ≥ θc, M = M(θ/Lp)). A first solve has
   * every hinge on its curve; hinges that would rotate back are then held, held hinges whose moment
   * would exceed their curve are released, until the set is consistent. Where the solve fails
   * because a hinge sits at the top of its curve and cannot carry more, every hinge but the
   * controlled one is held and released as needed. Without this, a hinge at the top of a flat
   * curve had to jump along its curve when the load fell, and Newton's method stalled (issue 18).
   * @param controlled hinge whose rotation is prescribed (λ unknown), or −1 for load control at `lambda`
   */
  private solveHinges(controlled: number, lambda: number, guess: Snapshot, theta = 0): Snapshot | undefined {
    const hinges = this.hinges;
    const lambdaFree = controlled >= 0;
    const others = hinges.map((_, i) => i).filter((i) => i !== controlled);
    let held = new Set<number>();
    const seen = new Set<string>();
    let allHeldTried = false;
    for (let pass = 0; pass < 2 * hinges.length + 4; pass++) {
      const signature = [...held].sort((a, b) => a - b).join(',');
      if (seen.has(signature)) break;
      seen.add(signature);
      const free = others.filter((i) => !held.has(i));
      for (const i of held) hinges[i]!.rotation = this.committedRotation(i);
      const start = {
        redundants: guess.redundants,
        lambda: lambdaFree ? guess.lambda : lambda,
        rotations: free.map((i) => Math.max(guess.rotations.get(i) ?? hinges[i]!.rotation, this.committedRotation(i))),
      };
      const res = newton(this.eq, hinges, free, lambdaFree, start, this.baseMemory, controlled);
      this.hingeVersion++; // the solve overwrote the shared moment array and hinge rotations
      if (!res.converged) {
        if (allHeldTried || others.length === 0) break;
        allHeldTried = true;
        held = new Set(others);
        continue;
      }
      const back = free.filter((i, k) => res.rotations[k]! < this.committedRotation(i) * (1 - 1e-12) - 1e-15);
      this.eq.moments(res.redundants, res.lambda);
      const over = [...held].filter((i) => this.hingeExcess(i) > 0);
      if (back.length === 0 && over.length === 0) {
        const rotations = new Map<number, number>();
        free.forEach((h, k) => rotations.set(h, res.rotations[k]!));
        for (const i of held) rotations.set(i, this.committedRotation(i));
        if (lambdaFree) rotations.set(controlled, theta);
        const solved: Snapshot = { lambda: res.lambda, redundants: res.redundants, rotations, memory: this.committed(this.baseMemory) };
        // The solve's last evaluation integrated the segments at this state, from the memory before
        // it: the same integrals as from the state's own memory (committing the state changes no
        // section it carries, Memory), so its deflected shape reuses them.
        const integrals = res.integralsAtSolution && this.r > 0 ? { i0: Float64Array.from(this.eq.segmentI0), i1: Float64Array.from(this.eq.segmentI1) } : undefined;
        this.solvedMoments.set(solved, { moment: Float64Array.from(this.eq.moment), effective: Float64Array.from(this.eq.effective), ...(integrals ? { integrals } : {}) });
        return solved;
      }
      held = new Set([...held, ...back].filter((i) => !over.includes(i)));
    }
    return undefined;
  }

  /** How far hinge i's moment (the effective one, after `eq.moments`) lies above its curve at its current rotation, relative to its peak moment. */
  private hingeExcess(i: number): number {
    const h = this.hinges[i]!;
    const me = this.eq.effective;
    const m = h.sign * ((1 - h.w) * me[h.a]! + h.w * me[h.b]!);
    const curve = softeningAt(h.law, h.rotation / h.length, scratch).value;
    return (m - curve) / Math.max(Math.abs(h.law.peakMoment), 1) - 1e-9;
  }

  /**
   * Puts a solved state back into the equations and hinges; returns the moments at the stations.
   * Several event functions restore the same state in a row: the last one is remembered.
   */
  restore(s: Snapshot): Float64Array {
    if (s === this.restored && this.restoredVersion === this.hingeVersion) return this.eq.moment;
    this.restored = s;
    this.restoredVersion = this.hingeVersion;
    this.hinges.forEach((h, i) => {
      h.rotation = s.rotations.get(i) ?? 0;
    });
    const known = this.solvedMoments.get(s);
    if (known) this.eq.loadMoments(known.moment, known.effective);
    else this.eq.moments(s.redundants, s.lambda);
    return this.eq.moment;
  }

  deflectionAt(s: Snapshot, curvatureOut?: Float64Array): Float64Array {
    this.restore(s);
    return deflectionShape(this.eq, s.memory, this.hinges, curvatureOut, this.solvedMoments.get(s)?.integrals);
  }

  /** Deflection at the control station (the last answer is remembered). */
  controlDeflection(s: Snapshot): number {
    if (s !== this.deflected || this.deflectedVersion !== this.hingeVersion) {
      this.deflectedValue = this.deflectionAt(s)[this.controlIndex]!;
      this.deflected = s;
      this.deflectedVersion = this.hingeVersion;
    }
    return this.deflectedValue;
  }

  totalLoad(s: Snapshot): number {
    return this.loads.constantTotal + s.lambda * this.loads.patternTotal;
  }

  /** Adds a point of the load–deflection curve. */
  record(s: Snapshot, stage: 'integration' | 'mechanism'): void {
    if (stage === 'integration' && this.hinges.length === 0) this.loadControlStates.push(s);
    this.points.push({ loadFactor: s.lambda, totalLoad: this.totalLoad(s), deflection: this.controlDeflection(s), stage });
  }

  /** Moment, curvature (with the localised rotations spread over their lengths) and deflection along the member. */
  distribution(label: string, s: Snapshot): SpanDistribution {
    const { beam, n } = this;
    const curvature = new Float64Array(n);
    const deflection = this.deflectionAt(s, curvature);
    const moment = Float64Array.from(this.eq.moment);
    const hingeZones: [number, number][] = [];
    for (const h of this.hinges) {
      const a = Math.max(0, h.position - h.length / 2);
      const b = Math.min(this.span, h.position + h.length / 2);
      hingeZones.push([a, b]);
      if (h.rotation <= 0) continue;
      for (let i = 0; i < n; i++) if (beam.x[i]! >= a && beam.x[i]! <= b) curvature[i] = curvature[i]! + (h.sign * h.rotation) / h.length;
    }
    // Yielded zones as well: where the plastic curvature spread.
    for (const sign of [1, -1] as const) {
      const mem = sign > 0 ? s.memory.sag : s.memory.hog;
      let start = -1;
      for (let i = 0; i <= n; i++) {
        const law = i < n ? plasticLawOf(beam.zones[beam.stationZone[i]!]!, sign) : null;
        const yielded = i < n && !!law && law.yieldMoment !== null && mem[i]! >= law.yieldMoment;
        if (yielded && start < 0) start = i;
        if (!yielded && start >= 0) {
          hingeZones.push([beam.x[start]!, beam.x[i - 1]!]);
          start = -1;
        }
      }
    }
    return { label, loadFactor: s.lambda, x: [...beam.x], moment: [...moment], curvature: [...curvature], deflection: [...deflection], hingeZones };
  }

  /** The law of station i in a sense (null: no plastic law, e.g. an elastic zone). */
  law(i: number, sign: 1 | -1): PlasticLaw | null {
    return plasticLawOf(this.beam.zones[this.beam.stationZone[i]!]!, sign);
  }

  /**
   * How far the most stressed station is from a section threshold (ratio of effective moment to
   * threshold). With `tie` > 0 the station returned is the leftmost of those within `tie` (relative)
   * of the largest ratio: twins of a symmetric member reach a threshold together, and which of them
   * is a hair ahead is rounding noise.
   */
  maxRatio(s: Snapshot, pick: (resp: SectionResponse, law: PlasticLaw | null) => number | null, filter?: (i: number, sign: 1 | -1) => boolean, tie = 0): StationRatio {
    this.restore(s);
    const me = this.eq.effective;
    const ratioAt = (i: number): number => this.stationRatio(i, pick, filter);
    let best = -Infinity;
    let at = -1;
    for (let i = 0; i < this.n; i++) {
      const ratio = ratioAt(i);
      if (ratio > best) {
        best = ratio;
        at = i;
      }
    }
    if (tie > 0) {
      for (let i = 0; i < at; i++) {
        if (ratioAt(i) >= best - tie * Math.abs(best)) {
          at = i;
          break;
        }
      }
    }
    return { ratio: best, station: at, sign: at >= 0 && me[at]! < 0 ? -1 : 1 };
  }

  /**
   * Station i's ratio of effective moment to threshold in the sense of its moment, for the state last
   * restored (NaN where the filter or the threshold rules it out).
   */
  private stationRatio(i: number, pick: (resp: SectionResponse, law: PlasticLaw | null) => number | null, filter?: (i: number, sign: 1 | -1) => boolean): number {
    const me = this.eq.effective;
    const beam = this.beam;
    const sg: 1 | -1 = me[i]! >= 0 ? 1 : -1;
    if (filter && !filter(i, sg)) return Number.NaN;
    const zone = beam.zones[beam.stationZone[i]!]!;
    const threshold = pick(responseOf(zone, sg), plasticLawOf(zone, sg));
    return threshold === null || !(threshold > 0) ? Number.NaN : (sg * me[i]!) / threshold;
  }

  /**
   * The run of consecutive stations around `at.station` (as found by `maxRatio` at state s with the
   * same pick and filter) whose ratio, in the same sense, is within `tie` (relative) of `at.ratio`:
   * the stations that reach the threshold together with it as one place, [first, last].
   */
  tiedRun(s: Snapshot, pick: (resp: SectionResponse, law: PlasticLaw | null) => number | null, filter: ((i: number, sign: 1 | -1) => boolean) | undefined, at: StationRatio, tie: number): [number, number] {
    if (at.station < 0) return [at.station, at.station];
    this.restore(s);
    const me = this.eq.effective;
    const level = at.ratio - tie * Math.abs(at.ratio);
    const tied = (i: number) => (me[i]! < 0 ? -1 : 1) === at.sign && this.stationRatio(i, pick, filter) >= level;
    let lo = at.station;
    let hi = at.station;
    while (lo > 0 && tied(lo - 1)) lo--;
    while (hi < this.n - 1 && tied(hi + 1)) hi++;
    return [lo, hi];
  }

  /**
   * Events whose search could not close its bracket (a solve failed on the way): the load factor or
   * rotation of each, and the width of the bracket left. Reported with the result.
   */
  readonly looseEvents: { readonly at: number; readonly width: number }[] = [];

  /**
   * The state on the event side of [a, b] where the event function g crosses zero (g(a) < 0 ≤ g(b)),
   * searched on the parameter x of `solve` — the load factor, or the rotation of the controlled hinge —
   * to 1e-7 of it (numeric/roots.ts locateEvent); `before` a solved point before a, when known.
   */
  locate(a: SolvedPoint<Snapshot>, b: SolvedPoint<Snapshot>, g: (s: Snapshot) => number, solve: (x: number, from: Snapshot) => Snapshot | undefined, before?: SolvedPoint<Snapshot>): SolvedPoint<Snapshot> {
    const found = locateEvent(a, b, solve, g, { maxIterations: 60, xTolerance: (hi) => EVENT_TOLERANCE * Math.max(Math.abs(hi), 1e-12), ...(before ? { before } : {}) });
    if (!found.converged) this.looseEvents.push({ at: found.point.x, width: found.point.x - found.before.x });
    return found.point;
  }
}

/**
 * Relative width in the load factor (or controlled rotation) to which an event is located: well
 * below the 1e-4 to which every event's load factor must not depend on the solver's path (tested in
 * test/core/member/solver-independence.test.ts).
 */
export const EVENT_TOLERANCE = 1e-7;

/**
 * Relative difference of load factors within which events of one kind count as simultaneous (the
 * twins of a symmetric member): they are reported together, left to right, each naming the others.
 */
export const SIMULTANEOUS = 1e-6;
