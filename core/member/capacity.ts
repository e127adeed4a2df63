/**
 * Nonlinear load–deflection analysis of a member to its best-estimate ultimate, event to event:
 *
 * 1. Load control on the load factor λ. At each level the redundants follow from compatibility with
 *    the current nonlinear flexibility (Newton's method with the exact tangent of the tabulated
 *    laws, core/member/equations.ts), so moments redistribute as sections crack and yield. The whole
 *    law up to the localisation moment — cracking, yield, hardening — is integrated along the member:
 *    plasticity spreads wherever the moment exceeds first yield (a constant-moment zone yields
 *    throughout), and sections that unload keep their plastic curvature (core/member/plastic-law.ts).
 * 2. When a section reaches its localisation moment (the top of its curve), its further deformation
 *    localises in a hinge of length Lp (core/member/hinges.ts): the hinge's rotation becomes an
 *    unknown and its moment follows the rest of the section's curve. In a zone of equal moment the
 *    hinge sits at the middle of the zone (common practice, no source).
 * 3. When more hinges have localised than the member has redundants (a mechanism), or load control
 *    finds no equilibrium beyond a limit point, control switches to the rotation of the newest hinge
 *    and λ follows from equilibrium: the descending branch.
 * 4. The best-estimate ultimate is the first of: the load on the descending branch falls to
 *    `ultimateLoadFraction` (0.8) of the peak (Park 1988, from memory); a hinge reaches the end of its
 *    section's curve (crushing, rupture, the curve's moment drop); a section localises with nothing
 *    left of its curve (a brittle section). The code ultimate — where a section first reaches the
 *    code's crushing strain — is recorded on the way.
 *
 * The state of the analysis is one explicit object (CapacityState, core/member/capacity-state.ts);
 * this file holds the stages. Internal units: mm, N·mm, 1/mm, rad.
 */
import type { BeamModel } from './beam-model.ts';
import { CapacityState, SIMULTANEOUS, type Snapshot } from './capacity-state.ts';
import type { CapacitySettings } from './definition.ts';
import { DEFAULT_SOLVER, freshMemory, plasticLawOf, type EngineOptions, type LoadingFields } from './equations.ts';
import { describePosition, hingeReport, limitWords, localiseAt, stationPlastic, yieldedRuns } from './hinges.ts';
import { LOCALISATION_TOLERANCE, plasticAt } from './plastic-law.ts';
import type { LoadDeflectionPoint, MemberEvent, PlasticHinge, SpanDistribution } from './results.ts';
import { engineOptions, shearFlexibility, ULTIMATE_LOAD_FRACTION } from './spread.ts';

export interface CapacityCurve {
  readonly points: LoadDeflectionPoint[];
  readonly events: MemberEvent[];
  readonly hinges: PlasticHinge[];
  readonly distributions: SpanDistribution[];
  readonly controlPosition: number;
  readonly status: string;
  readonly converged: boolean;
  readonly cracking: { readonly lambda: number; readonly totalLoad: number; readonly deflection: number } | null;
  readonly firstYield: { readonly lambda: number; readonly totalLoad: number; readonly deflection: number } | null;
  readonly peak: { readonly lambda: number; readonly deflection: number };
  /** The best-estimate ultimate (end of the curve), null when no limit state was reached. */
  readonly ultimate: { readonly lambda: number; readonly deflection: number } | null;
  /** Where a section first reaches the code's crushing strain, null when no section does before the end. */
  readonly codeUltimate: { readonly lambda: number; readonly deflection: number; readonly position: number } | null;
  readonly failureCause: string;
  /**
   * The state at 75 % of the largest load, solved exactly (not read off the sampled curve), for the
   * nominal yield deflection; null when that load lies beyond a localisation.
   */
  readonly secantPoint: { readonly loadFactor: number; readonly totalLoad: number; readonly deflection: number } | null;
  /** Events whose search could not close its bracket (a solve failed): where (λ or controlled rotation) and the bracket's width. */
  readonly looseEvents: readonly { readonly at: number; readonly width: number }[];
}

/**
 * How close (relative) to its threshold a twin of the section that reached it must be to be taken
 * with it, in the same state: the sections of a symmetric member reach their thresholds together,
 * and which is a hair ahead is rounding noise. The leftmost is reported first.
 */
const TWIN = 1e-7;

/** The threshold of the yield events: the section's first-yield moment (none without a plastic law). */
const YIELD_THRESHOLD = (_resp: unknown, law: { readonly yieldMoment: number | null } | null): number | null => law?.yieldMoment ?? null;

/** An event the stages watch for: g < 0 before it, ≥ 0 at and after it. */
interface Watch {
  readonly kind: 'cracking' | 'yield' | 'localisation' | 'code' | 'capacity' | 'drop' | 'unloaded';
  readonly hinge?: number;
  readonly g: (s: Snapshot) => number;
}

/**
 * Runs the load–deflection analysis to ultimate.
 * @param loads     moment fields of the constant loads and of the pattern
 * @param capacity  hinge length, tension shift, strain penetration, ultimate load fraction
 * @param controlAt station (mm) whose deflection the curve follows, when the caller chose one
 */
export function capacityCurve(beam: BeamModel, loads: LoadingFields, capacity: CapacitySettings, controlAt?: number, options?: EngineOptions): CapacityCurve {
  return new CapacityAnalysis(beam, loads, capacity, options ?? engineOptions(beam, capacity)).run(controlAt);
}

class CapacityAnalysis extends CapacityState {
  private cracking: { lambda: number; totalLoad: number; deflection: number } | null = null;
  private firstYield: { lambda: number; totalLoad: number; deflection: number } | null = null;
  private codeUltimate: { lambda: number; deflection: number; position: number } | null = null;
  private peak = { lambda: 0, deflection: 0, load: -Infinity };
  private ultimate: { lambda: number; deflection: number } | null = null;
  private mechanism = false;
  private finished = false;
  private state: Snapshot;
  /** Stations next to a zone that has yielded, per sense (a yield there is the zone spreading, not a new hinge). */
  /** Stations where a yield event was reported, per sense. */
  private readonly yieldSites = { sag: new Set<number>(), hog: new Set<number>() };
  private readonly fraction: number;

  constructor(beam: BeamModel, loads: LoadingFields, private readonly capacity: CapacitySettings, private readonly options: EngineOptions) {
    super(beam, loads, options);
    this.state = { lambda: 0, redundants: new Array(this.r).fill(0), rotations: new Map(), memory: freshMemory(this.n) };
    this.fraction = capacity.ultimateLoadFraction ?? ULTIMATE_LOAD_FRACTION;
  }

  run(controlAt: number | undefined): CapacityCurve {
    const { beam, n } = this;
    const s0 = this.solveAt(0, this.state);
    if (!s0) return this.failed('no equilibrium under the constant loads');
    this.state = s0;
    this.commit(s0);
    // Reference λ: the first station at its localisation moment, estimated from a small elastic step.
    const probe = this.solveAt(1e-6, this.state);
    if (!probe) return this.failed('no equilibrium at the first load step');
    const Mprobe = Float64Array.from(this.restore(probe));
    const M0 = Float64Array.from(this.restore(this.state));
    let lambdaRef = Infinity;
    for (let i = 0; i < n; i++) {
      const dm = (Mprobe[i]! - M0[i]!) / 1e-6;
      if (Math.abs(dm) < 1e-9) continue;
      const sg: 1 | -1 = dm > 0 ? 1 : -1;
      const law = this.law(i, sg);
      const limit = law ? law.localisationMoment : beam.zones[beam.stationZone[i]!]![sg > 0 ? 'sagging' : 'hogging'].peakMoment;
      const lam = (limit - sg * M0[i]!) / (sg * dm);
      if (lam > 0) lambdaRef = Math.min(lambdaRef, lam);
    }
    if (!Number.isFinite(lambdaRef)) return this.failed('the load pattern produces no moment in the member');
    if ((this.capacity.shearDeformation ?? 'en1998-3') === 'en1998-3') {
      this.eq.shearFlexibility = shearFlexibility(beam, M0, Float64Array.from(Mprobe, (m, i) => (m - M0[i]!) / 1e-6));
      this.hingeVersion++;
    }
    const probeDeflection = this.deflectionAt(probe);
    const baseDeflection = this.deflectionAt(this.state);
    this.controlIndex = 0;
    let biggest = -Infinity;
    for (let i = 0; i < n; i++) {
      const d = Math.abs(probeDeflection[i]! - baseDeflection[i]!);
      if (d > biggest + 1e-12 * Math.abs(d)) {
        biggest = d;
        this.controlIndex = i;
      }
    }
    // A control position given by the caller (a station placed where the elastic deflection peaks)
    // keeps the curve independent of the station spacing.
    if (controlAt !== undefined) {
      const at = beam.x.findIndex((xi) => Math.abs(xi - controlAt) < 1e-6);
      if (at >= 0) this.controlIndex = at;
    }
    const controlPosition = beam.x[this.controlIndex]!;
    this.record(this.state, 'integration');
    this.notePeak(this.state);

    this.loadControl(lambdaRef);
    this.rotationControl();

    const curve = this.finish(controlPosition);
    return curve;
  }

  private notePeak(s: Snapshot): void {
    const load = this.totalLoad(s);
    if (load > this.peak.load) this.peak = { lambda: s.lambda, deflection: this.controlDeflection(s), load };
  }

  /**
   * Stations in a yielded zone (at state s) that holds a reported yield site, per sense: a yield
   * there is the zone spreading, not a new hinge. A zone connects through stations past first yield.
   */
  private reportedZones(s: Snapshot): { sag: Uint8Array; hog: Uint8Array } {
    const n = this.n;
    const out = { sag: new Uint8Array(n), hog: new Uint8Array(n) };
    for (const sign of [1, -1] as const) {
      const mem = sign > 0 ? s.memory.sag : s.memory.hog;
      const mark = sign > 0 ? out.sag : out.hog;
      const sites = sign > 0 ? this.yieldSites.sag : this.yieldSites.hog;
      if (sites.size === 0) continue;
      // A reported site belongs to its zone even where its remembered moment is a hair below first
      // yield (a twin taken within TWIN of its threshold): otherwise its zone would never count as
      // reported and the same yield would be found again at the same state.
      for (const [i, j] of yieldedRuns(this.beam, mem, sign, 1e-9, sites)) {
        let reported = false;
        for (let k = i; k <= j && !reported; k++) reported = sites.has(k);
        if (reported) for (let k = Math.max(i - 1, 0); k <= Math.min(j + 1, n - 1); k++) mark[k] = 1;
      }
    }
    return out;
  }

  /**
   * Where an event found by the effective moment happens: among the stations within the tension
   * shift of `station`, the middle of those with the largest moment itself (for the words).
   */
  private eventPosition(s: Snapshot, station: number, sign: 1 | -1): number {
    const M = this.restore(s);
    const x = this.beam.x;
    const shift = this.options.shift ? (sign > 0 ? this.options.shift.sagging : this.options.shift.hogging)[this.beam.stationZone[station]!]! : 0;
    let best = -Infinity;
    for (let i = 0; i < this.n; i++) if (Math.abs(x[i]! - x[station]!) <= shift + 1e-9) best = Math.max(best, sign * M[i]!);
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = 0; i < this.n; i++) {
      if (Math.abs(x[i]! - x[station]!) > shift + 1e-9 || sign * M[i]! < best - 1e-9 * Math.abs(best)) continue;
      lo = Math.min(lo, x[i]!);
      hi = Math.max(hi, x[i]!);
    }
    return Number.isFinite(lo) ? 0.5 * (lo + hi) : x[station]!;
  }

  /** The most stressed station, against first yield, outside the zones already reported. */
  private newYield(s: Snapshot, tie = 0) {
    return this.maxRatio(s, YIELD_THRESHOLD, this.unreported(s), tie);
  }

  /** Filter of the stations outside the zones already reported (at state s). */
  private unreported(s: Snapshot): (i: number, sign: 1 | -1) => boolean {
    const zones = this.reportedZones(s);
    return (i, sg) => (sg > 0 ? zones.sag : zones.hog)[i] === 0;
  }

  private commitState(s: Snapshot): void {
    this.state = s;
    this.commit(s);
    this.notePeak(s);
  }

  // --- event functions ------------------------------------------------------------------------------

  /**
   * Stations that belong to a hinge of the same sense and cannot localise again (at state s): those
   * within Lp/2 of it (and the tension shift), and those joined to it through stations at the top of
   * their curves — a zone of equal moment, or the flat top of a smooth maximum, localises once.
   */
  private hingeShadow(s: Snapshot): { sag: Uint8Array; hog: Uint8Array } {
    const n = this.n;
    const out = { sag: new Uint8Array(n), hog: new Uint8Array(n) };
    if (this.hinges.length === 0) return out;
    const me = this.restore(s) && this.eq.effective;
    const x = this.beam.x;
    const spacing = this.beam.span / Math.max(n - 1, 1);
    const top = 1 - 2 * LOCALISATION_TOLERANCE;
    for (const h of this.hinges) {
      const mark = h.sign > 0 ? out.sag : out.hog;
      const shift = this.options.shift ? (h.sign > 0 ? this.options.shift.sagging : this.options.shift.hogging)[h.zone]! : 0;
      const reach = h.length / 2 + shift + 1.01 * spacing;
      let nearest = 0;
      for (let i = 0; i < n; i++) {
        if (Math.abs(x[i]! - h.critical) <= reach) mark[i] = 1;
        if (Math.abs(x[i]! - h.critical) < Math.abs(x[nearest]! - h.critical)) nearest = i;
      }
      const atTop = (i: number) => {
        const law = this.law(i, h.sign);
        return !!law && (h.sign * me[i]!) / law.localisationMoment >= top;
      };
      for (let i = nearest; i >= 0 && (mark[i] === 1 || atTop(i)); i--) mark[i] = 1;
      for (let i = nearest; i < n && (mark[i] === 1 || atTop(i)); i++) mark[i] = 1;
    }
    return out;
  }

  private localisationRatio(s: Snapshot, tie = 0) {
    const shadow = this.hingeShadow(s);
    return this.maxRatio(s, (resp, law) => law?.localisationMoment ?? resp.peakMoment, (i, sg) => (sg > 0 ? shadow.sag : shadow.hog)[i] === 0, tie);
  }

  /**
   * Values of the station-scanning event functions already found for a state, with the count of
   * events handled when they were found. Such a function depends only on the state and on what has
   * been reported (the yield sites, the hinges, the ultimates: all changed by `handle` alone), so
   * within one count its value for a state is known once found — and each step asks for it again:
   * the step's end state is the next step's start, and the event search starts from both ends.
   */
  private readonly eventValues = new WeakMap<Snapshot, { handled: number; values: Map<Watch['kind'], number> }>();
  /** Events handled so far (bumped by `handle`): the version of what the event functions read besides the state. */
  private handledCount = 0;

  private remembered(kind: Watch['kind'], g: (s: Snapshot) => number): (s: Snapshot) => number {
    return (s) => {
      let known = this.eventValues.get(s);
      if (!known || known.handled !== this.handledCount) {
        known = { handled: this.handledCount, values: new Map() };
        this.eventValues.set(s, known);
      }
      let v = known.values.get(kind);
      if (v === undefined) {
        v = g(s);
        known.values.set(kind, v);
      }
      return v;
    };
  }

  private watches(stage: 'load' | 'rotation', controlled = -1): Watch[] {
    const list: Watch[] = [];
    // The scans of every station are remembered per state; the hinge-capacity, drop and unloading
    // functions are cheap and read what changes between events (the hinges' rotations, the peak).
    if (!this.cracking) list.push({ kind: 'cracking', g: this.remembered('cracking', (s) => this.maxRatio(s, (resp) => resp.crackingMoment).ratio - 1) });
    list.push({ kind: 'yield', g: this.remembered('yield', (s) => this.newYield(s).ratio - 1) });
    list.push({ kind: 'localisation', g: this.remembered('localisation', (s) => this.localisationRatio(s).ratio - 1) });
    if (!this.codeUltimate) list.push({ kind: 'code', g: this.remembered('code', (s) => this.codeRatio(s) - 1) });
    this.hinges.forEach((h, i) => {
      if (h.law.ultimateLocalised > 0 && (stage === 'load' || i !== controlled)) list.push({ kind: 'capacity', hinge: i, g: (s) => (s.rotations.get(i) ?? h.rotation) / (h.law.ultimateLocalised * h.length) - (1 - 1e-9) });
    });
    if (stage === 'rotation') {
      list.push({ kind: 'drop', g: (s) => (this.fraction * this.peak.load - this.totalLoad(s)) / Math.max(Math.abs(this.peak.load), 1e-9) });
      if (this.loads.constantTotal > 0) list.push({ kind: 'unloaded', g: (s) => -s.lambda });
    }
    return list;
  }

  /** The largest ratio of a section's state to the code's crushing strain (moment on the spread branch, localised curvature in a hinge). */
  private codeRatio(s: Snapshot): number {
    this.restore(s);
    const me = this.eq.effective;
    let best = -Infinity;
    for (let i = 0; i < this.n; i++) {
      const sign: 1 | -1 = me[i]! >= 0 ? 1 : -1;
      const cc = this.law(i, sign)?.codeCrushing;
      if (!cc || cc.localised !== null || !(cc.moment > 0)) continue;
      const mem = sign > 0 ? s.memory.sag[i]! : s.memory.hog[i]!;
      best = Math.max(best, Math.max(sign * me[i]!, mem) / cc.moment);
    }
    this.hinges.forEach((h, k) => {
      const cc = h.law.codeCrushing;
      if (!cc) return;
      if (cc.localised === null) best = Math.max(best, 1);
      else if (cc.localised > 0) best = Math.max(best, (s.rotations.get(k) ?? h.rotation) / h.length / cc.localised);
      else best = Math.max(best, 1);
    });
    return best;
  }

  /** The critical section of a localisation: the largest moment ratio, the middle of a zone of equal moment, or the vertex of a smooth maximum. */
  private criticalSection(s: Snapshot, station: number, sign: 1 | -1): number {
    const M = this.restore(s);
    const { beam, n } = this;
    const x = beam.x;
    const ratio = (i: number) => {
      const law = this.law(i, sign);
      const limit = law?.localisationMoment ?? beam.zones[beam.stationZone[i]!]![sign > 0 ? 'sagging' : 'hogging'].peakMoment;
      return (sign * M[i]!) / limit;
    };
    // The largest raw moment ratio near the station that reached the event (the tension shift lets a
    // station feel a larger moment within a_l of it).
    const shift = this.options.shift ? (sign > 0 ? this.options.shift.sagging : this.options.shift.hogging)[beam.stationZone[station]!]! : 0;
    const shadow = this.hingeShadow(s);
    this.restore(s);
    let best = station;
    for (let i = 0; i < n; i++) {
      if (Math.abs(x[i]! - x[station]!) > shift + 1e-9 || (sign > 0 ? shadow.sag : shadow.hog)[i] === 1) continue;
      if (ratio(i) > ratio(best)) best = i;
    }
    const top = ratio(best);
    const tol = 1e-7 * Math.abs(top);
    let lo = best;
    let hi = best;
    while (lo > 0 && ratio(lo - 1) >= top - tol) lo--;
    while (hi < n - 1 && ratio(hi + 1) >= top - tol) hi++;
    if (x[hi]! > x[lo]!) return 0.5 * (x[lo]! + x[hi]!);
    if (best === 0 || best === n - 1) return x[best]!;
    const x0 = x[best - 1]!;
    const x1 = x[best]!;
    const x2 = x[best + 1]!;
    if (!(x1 > x0 && x2 > x1)) return x1;
    const d01 = (ratio(best) - ratio(best - 1)) / (x1 - x0);
    const d12 = (ratio(best + 1) - ratio(best)) / (x2 - x1);
    const c = (d12 - d01) / (x2 - x0);
    if (!(c < 0)) return x1;
    // A kink (a point load there) is the maximum itself: the parabola through it would move the
    // critical section off the load by an amount that depends on the station spacing. A smooth
    // maximum has the same second difference at its neighbours; a kink's is far larger.
    const second = (i: number) => {
      if (i <= 0 || i >= n - 1 || !(x[i]! > x[i - 1]! && x[i + 1]! > x[i]!)) return Number.NaN;
      return ((ratio(i + 1) - ratio(i)) / (x[i + 1]! - x[i]!) - (ratio(i) - ratio(i - 1)) / (x[i]! - x[i - 1]!)) / (x[i + 1]! - x[i - 1]!);
    };
    const around = Math.max(Math.abs(second(best - 1)) || 0, Math.abs(second(best + 1)) || 0);
    if (Math.abs(c) > 2 * around) return x1;
    const vertex = 0.5 * (x0 + x1) - d01 / (2 * c);
    return vertex > x0 && vertex < x2 ? vertex : x1;
  }

  private handle(ev: Watch, s: Snapshot): void {
    this.handledCount++;
    const d = this.controlDeflection(s);
    const { beam } = this;
    if (ev.kind === 'cracking') {
      const at = this.maxRatio(s, (resp) => resp.crackingMoment, undefined, TWIN);
      const x = this.eventPosition(s, at.station, at.sign);
      this.cracking = { lambda: s.lambda, totalLoad: this.totalLoad(s), deflection: d };
      this.events.push({ kind: 'cracking', loadFactor: s.lambda, deflection: d, position: x, description: `first cracking at ${describePosition(x, beam.layout)}` });
    } else if (ev.kind === 'yield') {
      // A section that yields as it cracks (its steel yields in the drop after cracking): the
      // cracking comes first.
      if (!this.cracking && this.maxRatio(s, (resp) => resp.crackingMoment).ratio >= 1 - SIMULTANEOUS) {
        this.handle({ kind: 'cracking', g: () => 0 }, s);
      }
      const unreported = this.unreported(s);
      const at = this.maxRatio(s, YIELD_THRESHOLD, unreported, TWIN);
      const x = this.eventPosition(s, at.station, at.sign);
      const first = this.firstYield === null;
      if (first) this.firstYield = { lambda: s.lambda, totalLoad: this.totalLoad(s), deflection: d };
      this.events.push({ kind: 'first-yield', loadFactor: s.lambda, deflection: d, position: x, description: `${first ? 'first yield' : 'yield'} (${at.sign > 0 ? 'sagging' : 'hogging'}) at ${describePosition(x, beam.layout)}: plasticity starts to spread` });
      if (first) this.distributions.push(this.distribution('first yield', s));
      // The zone is reported: its spreading is no new event. The zone is the stations joined to the
      // one taken that are within TWIN of the largest ratio, in this state (where the tension shift
      // makes the effective moment flat, the leftmost twin and the station that actually yielded
      // are neighbours; before 4 Dec 2026 only the leftmost was noted, and when its own moment was
      // a hair below first yield the yield was found again at the same state, ~4,000 times).
      const sites = at.sign > 0 ? this.yieldSites.sag : this.yieldSites.hog;
      const [lo, hi] = this.tiedRun(s, YIELD_THRESHOLD, unreported, at, TWIN);
      for (let k = lo; k <= hi; k++) sites.add(k);
    } else if (ev.kind === 'localisation') {
      // A section that peaks at cracking cracks as it localises: the cracking comes first.
      if (!this.cracking && this.maxRatio(s, (resp) => resp.crackingMoment).ratio >= 1 - 1e-6) {
        this.handle({ kind: 'cracking', g: () => 0 }, s);
      }
      const at = this.localisationRatio(s, TWIN);
      const critical = this.criticalSection(s, at.station, at.sign);
      const hinge = localiseAt(beam, this.restore(s), critical, at.station, at.sign, s.lambda, this.capacity);
      this.hinges.push(hinge);
      this.hingeVersion++;
      s.rotations.set(this.hinges.length - 1, 0);
      const words = `${hinge.sign > 0 ? 'sagging' : 'hogging'} hinge at ${describePosition(critical, beam.layout)}`;
      if (!(hinge.law.ultimateLocalised > 0)) {
        this.finishUltimate(this.hinges.length - 1, s, limitWords(beam, hinge));
        return;
      }
      this.events.push({ kind: 'hinge', loadFactor: s.lambda, deflection: d, position: critical, description: `${words}: the section reaches the top of its curve and its further deformation localises over its hinge length` });
      if (this.hinges.length > this.r) this.mechanism = true;
    } else if (ev.kind === 'code') {
      const position = this.codePosition(s);
      this.codeUltimate = { lambda: s.lambda, deflection: d, position };
      this.events.push({ kind: 'code-ultimate', loadFactor: s.lambda, deflection: d, position, description: `code ultimate: the section at ${describePosition(position, beam.layout)} reaches the code's crushing strain` });
    } else if (ev.kind === 'capacity') {
      const first = this.leftmostTwin(ev.hinge!, s);
      this.finishUltimate(first, s, limitWords(beam, this.hinges[first]!));
    } else if (ev.kind === 'drop') {
      this.finishUltimate(-1, s, `the load has fallen to ${(this.fraction * 100).toFixed(0)} % of the peak on the descending branch`);
    } else {
      this.finishUltimate(-1, s, 'the member can no longer carry the loads held constant');
    }
  }

  /** Where the most stressed section is, against the top of its curve, in words (for a solver that stops). */
  private stressedWords(s: Snapshot): string {
    const at = this.maxRatio(s, (resp, law) => law?.localisationMoment ?? resp.peakMoment);
    if (at.station < 0) return 'no section carries moment';
    const x = this.eventPosition(s, at.station, at.sign);
    return `the most stressed section, ${at.sign > 0 ? 'sagging' : 'hogging'} at ${describePosition(x, this.beam.layout)}, is at ${(100 * at.ratio).toFixed(1)} % of the top of its curve`;
  }

  private codePosition(s: Snapshot): number {
    this.restore(s);
    const me = this.eq.effective;
    let best = -Infinity;
    let at = 0;
    for (let i = 0; i < this.n; i++) {
      const sign: 1 | -1 = me[i]! >= 0 ? 1 : -1;
      const cc = this.law(i, sign)?.codeCrushing;
      if (!cc || cc.localised !== null) continue;
      const r = (sign * me[i]!) / cc.moment;
      // The leftmost of twins (within TWIN): which is a hair ahead is rounding noise.
      if (r > best * (1 + TWIN) || !Number.isFinite(best)) {
        best = r;
        at = this.beam.x[i]!;
      }
    }
    let hinged = -Infinity;
    this.hinges.forEach((h, k) => {
      const cc = h.law.codeCrushing;
      if (!cc || cc.localised === null || !(cc.localised > 0)) return;
      const r = (s.rotations.get(k) ?? h.rotation) / h.length / cc.localised;
      if (r >= best && (r > hinged * (1 + TWIN) || (r >= hinged * (1 - TWIN) && h.critical < at))) {
        hinged = Math.max(hinged, r);
        at = h.critical;
      }
    });
    return at;
  }

  // --- load control ----------------------------------------------------------------------------------

  private loadControl(lambdaRef: number): void {
    const scale = (this.options.solver ?? DEFAULT_SOLVER).stepScale;
    let step = (scale * lambdaRef) / 20;
    let guard = 0;
    let previousState: Snapshot | undefined;
    // The committed state before the current one: a point before the event for the event searches.
    let lastCommitted: Snapshot | undefined;
    const solveLambda = (lambda: number, from: Snapshot) => this.solveAt(lambda, from);
    while (!this.finished && guard++ < 4000) {
      // Events already reached at the current state (e.g. both supports of a symmetric beam together),
      // also once a mechanism has formed: rotation control needs every section at its top localised.
      // A twin within round-off of its top (a symmetric beam) localises with the first.
      const due = this.watches('load').find((ev) => ev.g(this.state) >= (ev.kind === 'localisation' || ev.kind === 'yield' ? -TWIN : 0));
      if (due) {
        this.handle(due, this.state);
        continue;
      }
      if (this.mechanism) break;
      const state = this.state;
      const target = state.lambda + step;
      // Predictor: extrapolate the redundants and rotations along the last step.
      let guess: Snapshot = state;
      if (previousState && state.lambda > previousState.lambda) {
        const t = (target - state.lambda) / (state.lambda - previousState.lambda);
        const before = previousState;
        guess = { ...state, redundants: state.redundants.map((v, i) => v + t * (v - before.redundants[i]!)) };
      }
      const solved = this.solveAt(target, guess) ?? (guess === state ? undefined : this.solveAt(target, state));
      // A localised hinge whose curve is nearly flat has, just past its load, equilibria with small
      // and with large rotations: a load step may land on the far one, skipping the path between (and
      // with it the limit point where the load must fall). A step that rotates a hinge by more than
      // a rotation-control step would is taken as no equilibrium, so the path is followed closely
      // and, at a limit point, by the hinge's rotation.
      const next = solved && this.rotatesTooFar(state, solved) ? undefined : solved;
      if (!next) {
        // With a localised hinge, failure to find equilibrium at a higher load is the limit point
        // itself: go straight to rotation control rather than shrinking the step far.
        const pastPeak = this.hinges.length > 0;
        if (!pastPeak && step > lambdaRef * 1e-6) {
          step /= 4;
          continue;
        }
        if (pastPeak && step > lambdaRef * 1e-3) {
          step /= 8;
          continue;
        }
        this.converged = false;
        const where = this.stressedWords(state);
        this.status = `not converged: no equilibrium beyond λ = ${state.lambda.toFixed(4)} (the redundant moments could not be balanced; ${where})`;
        this.failureCause = `analysis stopped before a limit state (not converged: no equilibrium at a higher load; ${where})`;
        break;
      }
      let earliest: { ev: Watch; at: Snapshot } | undefined;
      const before = lastCommitted && lastCommitted.lambda < state.lambda ? { x: lastCommitted.lambda, state: lastCommitted } : undefined;
      // Only the earliest event of the step is needed: the watches that cross are searched in the
      // order their linear estimates suggest, each only up to the earliest state found so far (one
      // that has not happened there happens later); others that happened there too follow as due.
      const watches = this.watches('load');
      for (const ev of this.crossings(watches, state, next)) {
        const upper = earliest ? earliest.at : next;
        if (earliest && ev.g(upper) < 0) continue;
        const at = this.locate({ x: state.lambda, state }, { x: upper.lambda, state: upper }, ev.g, solveLambda, before).state;
        earliest = { ev, at };
      }
      lastCommitted = state;
      if (!earliest) {
        previousState = state;
        this.commitState(next);
        this.record(next, 'integration');
        step = Math.min(step * 1.25, (scale * lambdaRef) / 12);
        continue;
      }
      previousState = undefined;
      this.commitState(earliest.at);
      this.record(this.state, 'integration');
      this.handle(earliest.ev, this.state);
      step = Math.max(step / 2, (scale * lambdaRef) / 200);
    }
    if (!this.mechanism && !this.finished && this.converged) {
      this.converged = false;
      this.status = `not converged: the load-control stage did not end within its step budget (${this.stressedWords(this.state)})`;
      this.failureCause = this.status;
    }
  }

  /** The watches whose event lies between two states (g < 0 at `a`, ≥ 0 at `b`), in the order of their linear estimates. */
  private crossings(watches: readonly Watch[], a: Snapshot, b: Snapshot): Watch[] {
    const found: { ev: Watch; t: number }[] = [];
    for (const ev of watches) {
      const ga = ev.g(a);
      const gb = ev.g(b);
      if (ga < 0 && gb >= 0) found.push({ ev, t: ga / (ga - gb) });
    }
    return found.sort((p, q) => p.t - q.t).map((c) => c.ev);
  }

  /** Whether a load step from `from` to `to` rotates a localised hinge by more than 1/8 of its capacity (the longest rotation-control step). */
  private rotatesTooFar(from: Snapshot, to: Snapshot): boolean {
    return this.hinges.some((h, i) => {
      const capacity = h.law.ultimateLocalised * h.length;
      return capacity > 0 && (to.rotations.get(i) ?? 0) - (from.rotations.get(i) ?? 0) > capacity / 8;
    });
  }

  // --- past the peak load: rotation control of the newest hinge ------------------------------------
  // Entered when the member becomes a mechanism, or when load control finds no equilibrium beyond a
  // limit point while a hinge has localised (the load must fall for the member to deform further).
  // λ becomes an unknown; other sections may still localise on the way; the stage ends at the
  // best-estimate ultimate.
  private rotationControl(switchTo?: { readonly hinge: number; readonly tried: ReadonlySet<number> }): void {
    const hinges = this.hinges;
    const limitPoint = !this.mechanism && !this.finished && !this.converged && hinges.length > 0;
    if (!(this.mechanism || limitPoint) || this.ultimate) return;
    // Sections at their top together with the hinge just formed (a symmetric twin) localise now: the
    // rotation of the newest hinge cannot be controlled while another section sits on its top.
    for (let k = 0; k < this.n && !this.ultimate; k++) {
      const due = this.watches('rotation', hinges.length - 1).find((ev) => ev.kind === 'localisation' && ev.g(this.state) >= -TWIN);
      if (!due) break;
      this.handle(due, this.state);
    }
    if (this.ultimate) return;
    if (limitPoint) {
      this.converged = true;
      this.status = 'complete';
      this.failureCause = '';
    }
    const controlled = switchTo?.hinge ?? hinges.length - 1;
    const hc = hinges[controlled]!;
    const at = hc.critical;
    const peakWords = `the ${hc.sign > 0 ? 'sagging' : 'hogging'} hinge at ${describePosition(at, this.beam.layout)}`;
    // A mechanism is the peak; past a limit point the load may still rise while the other sections
    // take over (the peak event is then placed at the largest load, when the curve is finished).
    if (this.mechanism && !switchTo) {
      this.events.push({ kind: 'mechanism', loadFactor: this.state.lambda, deflection: this.controlDeflection(this.state), position: at, description: `mechanism: the member can take no more load; ${peakWords} rotates at falling load` });
      if (this.distributions.length < 2) this.distributions.push(this.distribution('peak', this.state));
    }
    let theta = this.state.rotations.get(controlled) ?? hc.rotation;
    const startTheta = theta;
    const limit = hc.law.ultimateLocalised * hc.length;
    const scale = (this.options.solver ?? DEFAULT_SOLVER).stepScale;
    let dTheta = scale * Math.max((limit - theta) / 24, limit * 1e-4);
    let current = this.state;
    // The committed point before `current` on this hinge's rotation (for the event searches).
    let previousPoint: { x: number; state: Snapshot } | undefined;
    const solveTheta = (t: number, from: Snapshot): Snapshot | undefined => this.solveAtRotation(controlled, t, from);
    let progressed = false;
    for (let k = 0; k < 600 && !this.ultimate; k++) {
      const target = Math.min(theta + dTheta, limit);
      const next = solveTheta(target, current);
      if (!next) {
        if (dTheta > limit * 1e-4) {
          dTheta /= 4;
          continue;
        }
        // The controlled hinge cannot rotate further while another localised hinge sits at the top
        // of its curve (its moment can rise no more): that one must rotate at falling load, so control
        // passes to it — the newest hinge that has not been tried from this state.
        const tried = new Set(progressed ? [] : switchTo?.tried ?? []);
        tried.add(controlled);
        let other = -1;
        for (let i = hinges.length - 1; i >= 0 && other < 0; i--) if (!tried.has(i) && hinges[i]!.law.ultimateLocalised > 0) other = i;
        if (other >= 0) {
          this.state = current;
          this.rotationControl({ hinge: other, tried });
          return;
        }
        if (hinges.length > this.r) {
          // A mechanism whose hinges soften together (flat-topped curves past their tops): no hinge
          // can be driven on alone. The member carries no more load; the curve ends at the largest
          // deflection reached, which understates the deformation capacity (the safe side for μΔ).
          this.finishUltimate(controlled, current, `the member is a mechanism (${hinges.length} hinges, ${this.r} redundant moment${this.r === 1 ? '' : 's'}) whose hinges soften together past the peak; the descending branch is followed to θ = ${(theta * 1000).toFixed(2)} mrad of ${peakWords} and the ultimate is taken there, on the safe side for the deflection`);
          break;
        }
        this.converged = false;
        this.status = `not converged past the peak at θ = ${(target * 1000).toFixed(2)} mrad of ${peakWords}`;
        this.failureCause = `analysis stopped past the peak load (not converged: no equilibrium of the hinges' moments with their curves at θ = ${(target * 1000).toFixed(2)} mrad of ${peakWords})`;
        break;
      }
      // Events in this step: searched on the controlled rotation, to EVENT_TOLERANCE of it.
      let event: { ev: Watch; at: Snapshot; theta: number } | undefined;
      // As under load control: each crossing searched only up to the earliest found so far.
      const watches = this.watches('rotation', controlled);
      for (const ev of this.crossings(watches, current, next)) {
        const upper = event ? { x: event.theta, state: event.at } : { x: target, state: next };
        if (event && ev.g(upper.state) < 0) continue;
        const found = this.locate({ x: theta, state: current }, upper, ev.g, solveTheta, previousPoint && previousPoint.x < theta ? previousPoint : undefined);
        event = { ev, at: found.state, theta: found.x };
      }
      if (event) {
        theta = event.theta;
        this.commitState(event.at);
        current = event.at;
        this.record(current, 'mechanism');
        this.handle(event.ev, current);
        if (this.ultimate) break;
        if (event.ev.kind === 'localisation') {
          // Another section localised: control passes to it (the newest hinge).
          this.rotationControlFrom(current);
          return;
        }
        continue;
      }
      previousPoint = { x: theta, state: current };
      theta = target;
      current = next;
      progressed = true;
      this.commitState(current);
      this.record(current, 'mechanism');
      // Steps grow to an eighth of the rotation left when the stage began: an eighth of the rotation
      // left now made the steps shrink geometrically towards the limit (some 70 steps where 10 do).
      dTheta = Math.min(dTheta * 1.5, scale * Math.max((limit - startTheta) / 8, limit * 1e-4));
      if (theta >= limit * (1 - 1e-12)) {
        const first = this.leftmostTwin(controlled, current);
        this.finishUltimate(first, current, limitWords(this.beam, hinges[first]!));
        break;
      }
    }
    if (!this.ultimate && this.converged) {
      this.converged = false;
      this.status = `not converged: the descending branch of ${peakWords} did not end within its step budget`;
      this.failureCause = this.status;
    }
  }

  /** Rotation control continued on the newest hinge after a localisation on the descending branch. */
  private rotationControlFrom(s: Snapshot): void {
    this.state = s;
    this.mechanism = true;
    this.rotationControl();
  }

  /**
   * Of the hinges that reach the end of their curves together with hinge i (the same share of their
   * rotation capacity within TWIN: twins of a symmetric member), the leftmost.
   */
  private leftmostTwin(i: number, s: Snapshot): number {
    const share = (k: number) => {
      const h = this.hinges[k]!;
      return (s.rotations.get(k) ?? h.rotation) / (h.law.ultimateLocalised * h.length);
    };
    const level = share(i);
    let best = i;
    this.hinges.forEach((h, k) => {
      if (h.law.ultimateLocalised > 0 && share(k) >= level * (1 - TWIN) && h.critical < this.hinges[best]!.critical) best = k;
    });
    return best;
  }

  private finishUltimate(hinge: number, s: Snapshot, cause: string): void {
    if (this.ultimate) return;
    // The code ultimate at the same state (a hinge whose curve ends where the code's crushing strain
    // is reached) is recorded first, whichever of the two the event search met a hair earlier.
    if (!this.codeUltimate && this.codeRatio(s) >= 1 - SIMULTANEOUS) this.handle({ kind: 'code', g: () => 0 }, s);
    let d = this.controlDeflection(s);
    // A descending branch that snaps back (the rest of the member unloads faster than the hinge
    // rotates, as after a brittle peak) cannot be followed under an imposed deflection: the load falls
    // at once at the largest deflection reached, which is then the ultimate deflection.
    const reached = this.points.reduce((m, p) => Math.max(m, p.deflection), d);
    if (reached > d * (1 + 1e-9) + 1e-9) {
      d = reached;
      cause = `${cause} (the descending branch snaps back: the load falls at once at the largest deflection reached)`;
    }
    this.ultimate = { lambda: s.lambda, deflection: d };
    this.finished = true;
    this.failureCause = cause;
    const position = hinge >= 0 ? this.hinges[hinge]!.critical : this.hinges.length > 0 ? this.hinges[this.hinges.length - 1]!.critical : this.beam.x[this.controlIndex]!;
    this.events.push({ kind: 'ultimate', loadFactor: s.lambda, deflection: d, position, description: `ultimate: ${cause}` });
    this.distributions.push(this.distribution('ultimate', s));
  }

  private finish(controlPosition: number): CapacityCurve {
    const points = this.points;
    this.placePeakEvent();
    this.groupSimultaneous();
    const last = this.state;
    this.restore(last);
    const penetration = this.penetrationReport(last);
    const hinges = hingeReport({ beam: this.beam, memory: last.memory, hinges: this.hinges, yieldedAt: this.yieldedAt, penetration, method: this.capacity.hingeLengthMethod, capacity: this.capacity });
    const best = points.reduce((a, b) => (b.totalLoad > a.totalLoad ? b : a), points[0]!);
    return {
      points,
      events: this.events,
      hinges,
      distributions: this.distributions,
      controlPosition,
      status: this.status,
      converged: this.converged,
      cracking: this.cracking,
      firstYield: this.firstYield,
      peak: { lambda: best.loadFactor, deflection: best.deflection },
      ultimate: this.ultimate,
      codeUltimate: this.codeUltimate,
      failureCause: this.failureCause,
      secantPoint: this.secantPoint(),
      looseEvents: this.looseEvents,
    };
  }

  /**
   * Events of one kind at the same load factor (within SIMULTANEOUS) are one moment of the analysis:
   * put left to right, each naming the others (`together`, and in its words). Which of two twins the
   * solver met first is rounding noise and must not decide what the engineer reads.
   */
  private groupSimultaneous(): void {
    const events = this.events;
    const layout = this.beam.layout;
    for (let i = 0; i < events.length; ) {
      let j = i + 1;
      const e = events[i]!;
      while (j < events.length && events[j]!.kind === e.kind && Math.abs(events[j]!.loadFactor - e.loadFactor) <= SIMULTANEOUS * Math.abs(e.loadFactor)) j++;
      if (j - i > 1 && (e.kind === 'first-yield' || e.kind === 'hinge')) {
        const group = events.slice(i, j).sort((a, b) => a.position - b.position);
        // "first yield" names the first of all yields: it stays with the first of the group.
        const firstWords = group.map((g) => g.description.startsWith('first yield'));
        group.forEach((g, k) => {
          const others = group.filter((o) => o !== g).map((o) => o.position);
          let words = g.description;
          if (firstWords.some(Boolean)) words = k === 0 ? words.replace(/^yield /, 'first yield ') : words.replace(/^first yield /, 'yield ');
          const names = others.map((x) => describePosition(x, layout)).join(' and ');
          events[i + k] = { ...g, loadFactor: e.loadFactor, description: `${words}; at the same load factor as at ${names}`, together: others };
        });
      }
      i = j;
    }
  }

  /**
   * Without a mechanism the peak load is where the curve is highest: its event goes in before the
   * first event at a larger deflection (the events are in the order they happened).
   */
  private placePeakEvent(): void {
    if (this.hinges.length === 0 || this.events.some((e) => e.kind === 'mechanism') || this.points.length < 2) return;
    const best = this.points.reduce((a, b) => (b.totalLoad > a.totalLoad ? b : a));
    const last = this.points[this.points.length - 1]!;
    if (best === last && !this.ultimate) return;
    // The ultimate at the largest load is its own peak.
    if (this.ultimate && best.deflection >= this.ultimate.deflection * (1 - 1e-9)) return;
    const newest = this.hinges.reduce((a, h) => (h.formedAt <= best.loadFactor + 1e-12 ? h : a), this.hinges[0]!);
    const at = this.events.findIndex((e) => e.deflection > best.deflection && e.kind !== 'hinge');
    const event = { kind: 'peak' as const, loadFactor: best.loadFactor, deflection: best.deflection, position: newest.critical, description: `peak load of the member, with the ${newest.sign > 0 ? 'sagging' : 'hogging'} hinge at ${describePosition(newest.critical, this.beam.layout)} past the top of its curve` };
    if (at < 0) this.events.push(event);
    else this.events.splice(at, 0, event);
  }

  /** The plastic part of the strain-penetration rotation at each face, and what it would be with the face's section at its localisation moment. */
  private penetrationReport(s: Snapshot): { position: number; sign: 1 | -1; plastic: number; capacity: number }[] {
    this.restore(s);
    const me = this.eq.effective;
    return this.options.faces.map((face) => {
      const sign: 1 | -1 = me[face.station]! >= 0 ? 1 : -1;
      const length = sign > 0 ? face.sagging : face.hogging;
      const mu = sign > 0 ? s.memory.sag[face.station]! : s.memory.hog[face.station]!;
      const law = plasticLawOf(this.beam.zones[this.beam.stationZone[face.station]!]!, sign);
      return {
        position: face.position,
        sign,
        plastic: length * stationPlastic(this.beam, face.station, sign, mu),
        capacity: law ? length * plasticAt(law, law.localisationMoment, { value: 0, slope: 0 }).value : 0,
      };
    });
  }

  /**
   * Deflection at 75 % of the largest load, solved at that load from the recorded state just below
   * it: nothing had localised yet, so the state follows from the memory of that state.
   */
  private secantPoint(): CapacityCurve['secantPoint'] {
    const { points, loads } = this;
    if (points.length < 2 || loads.patternTotal <= 0) return null;
    const pMax = Math.max(...points.map((p) => p.totalLoad));
    const base = points[0]!.totalLoad;
    const target = base + 0.75 * (pMax - base);
    const lambda = (target - loads.constantTotal) / loads.patternTotal;
    if (!(lambda > 0)) return null;
    if (this.hinges.some((h) => h.formedAt <= lambda)) return null;
    const guess = this.loadControlStates.reduce<Snapshot | undefined>((b, st) => (st.lambda <= lambda && (!b || st.lambda > b.lambda) ? st : b), undefined);
    if (!guess) return null;
    const saved = this.hinges.splice(0, this.hinges.length);
    const savedMemory = this.baseMemory;
    this.baseMemory = guess.memory;
    this.hingeVersion++;
    const solved = this.solveAt(lambda, { ...guess, rotations: new Map() });
    const deflection = solved ? this.deflectionAt(solved)[this.controlIndex]! : null;
    this.hinges.push(...saved);
    this.baseMemory = savedMemory;
    this.hingeVersion++;
    return deflection === null ? null : { loadFactor: lambda, totalLoad: target, deflection };
  }

  private failed(reason: string): CapacityCurve {
    return {
      points: this.points,
      events: this.events,
      hinges: [],
      distributions: this.distributions,
      controlPosition: 0,
      status: `not converged: ${reason}`,
      converged: false,
      cracking: null,
      firstYield: null,
      peak: { lambda: 0, deflection: 0 },
      ultimate: null,
      codeUltimate: null,
      failureCause: reason,
      secantPoint: null,
      looseEvents: this.looseEvents,
    };
  }
}

