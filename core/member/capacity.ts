/**
 * Nonlinear load–deflection analysis of a member, event to event:
 *
 * 1. Load control on the load factor λ. At each level the redundant end moments follow from
 *    compatibility with the current nonlinear flexibility (Newton's method with the exact
 *    tangent of the tabulated curves, core/member/equations.ts), so moments redistribute as
 *    sections crack and yield. Curvature is integrated along the span (exactly for curvature
 *    linear between stations).
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
 * The state of the analysis is one explicit object (CapacityState, core/member/capacity-state.ts);
 * this file holds the stages. Internal units: mm, N·mm, 1/mm, rad.
 */
import { regulaFalsiEvent } from '../numeric/roots.ts';
import type { BeamModel } from './beam-model.ts';
import { CapacityState, type Snapshot } from './capacity-state.ts';
import type { CapacitySettings } from './definition.ts';
import { newton, responseOf, type HingeSite, type HingeState, type LoadingFields } from './equations.ts';
import { describePosition, hingeResult, hingeSites, newHinge, overstressWords, SITE_WORDS } from './hinges.ts';
import type { LoadDeflectionPoint, MemberEvent, PlasticHinge, SpanDistribution } from './results.ts';

export { describePosition };

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

/** An event the load-control stage watches for: g < 0 before it, ≥ 0 at and after it. */
interface LoadEvent {
  readonly kind: 'cracking' | 'yield' | 'peak' | 'capacity' | 'overstress';
  readonly site?: HingeSite;
  readonly hinge?: number;
  readonly g: (s: Snapshot) => number;
}

/** An event of the rotation-control stage past the peak load. */
interface RotationEvent {
  readonly kind: 'peak' | 'capacity' | 'overstress';
  readonly hinge?: number;
  readonly g: (s: Snapshot) => number;
}

/**
 * Runs the load–deflection analysis to ultimate.
 * @param loads    moment fields of the constant loads and of the pattern
 * @param capacity hinge length method etc.
 * @param controlAt station (mm) whose deflection the curve follows, when the caller chose one
 */
export function capacityCurve(beam: BeamModel, loads: LoadingFields, capacity: CapacitySettings, controlAt?: number): CapacityCurve {
  return new CapacityAnalysis(beam, loads, capacity).run(controlAt);
}

class CapacityAnalysis extends CapacityState {
  private readonly sites: HingeSite[];
  private firstYield: { lambda: number; deflection: number } | null = null;
  private crackedYet = false;
  private peak = { lambda: 0, deflection: 0 };
  private ultimate: { lambda: number; deflection: number } | null = null;
  private mechanism = false;
  private finished = false;
  private state: Snapshot;

  constructor(beam: BeamModel, loads: LoadingFields, private readonly capacity: CapacitySettings) {
    super(beam, loads);
    this.sites = hingeSites(beam.support);
    this.state = { lambda: 0, redundants: new Array(this.r).fill(0), rotations: new Map() };
  }

  run(controlAt: number | undefined): CapacityCurve {
    const { beam, n, span } = this;
    // --- initial state and step size ---------------------------------------------------------------
    const s0 = this.solveAt(0, this.state);
    if (!s0) return this.failed('no equilibrium under the constant loads');
    this.state = s0;
    // Reference λ: first station at its peak moment, estimated from a small elastic step.
    const probe = this.solveAt(1e-6, this.state);
    if (!probe) return this.failed('no equilibrium at the first load step');
    const Mprobe = Float64Array.from(this.restore(probe));
    const M0 = Float64Array.from(this.restore(this.state));
    let lambdaRef = Infinity;
    for (let i = 0; i < n; i++) {
      const dm = (Mprobe[i]! - M0[i]!) / 1e-6;
      if (Math.abs(dm) < 1e-9) continue;
      const sg: 1 | -1 = dm > 0 ? 1 : -1;
      const resp = responseOf(beam.zones[this.stationZone(i)]!, sg);
      const lam = (resp.peakMoment - sg * M0[i]!) / (sg * dm);
      if (lam > 0) lambdaRef = Math.min(lambdaRef, lam);
    }
    if (!Number.isFinite(lambdaRef)) return this.failed('the load pattern produces no moment in the member');
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
    // Prefer exact midspan for symmetric cases (largest deflection within 0.01 % of it).
    const mid = beam.x.findIndex((xi) => Math.abs(xi - span / 2) < 1e-9);
    if (beam.support !== 'cantilever' && mid >= 0 && Math.abs(probeDeflection[mid]! - baseDeflection[mid]!) >= biggest * (1 - 1e-4)) this.controlIndex = mid;
    // A control position given by the caller (a station placed where the elastic deflection peaks)
    // keeps the curve independent of the station spacing.
    if (controlAt !== undefined) {
      const at = beam.x.findIndex((xi) => Math.abs(xi - controlAt) < 1e-6);
      if (at >= 0) this.controlIndex = at;
    }
    const controlPosition = beam.x[this.controlIndex]!;
    this.record(this.state, 'integration');
    this.peak = { lambda: 0, deflection: this.controlDeflection(this.state) };

    this.loadControl(lambdaRef);
    this.rotationControl();

    const points = this.points;
    if (this.peak.lambda === 0 || points.length > 0) {
      const best = points.reduce((a, b) => (b.loadFactor > a.loadFactor ? b : a), points[0]!);
      if (best.loadFactor >= this.peak.lambda) this.peak = { lambda: best.loadFactor, deflection: best.deflection };
    }
    return {
      points,
      events: this.events,
      hinges: this.hinges.map((h) => hingeResult(this.beam, h, this.capacity.hingeLengthMethod)),
      distributions: this.distributions,
      controlPosition,
      status: this.status,
      converged: this.converged,
      firstYield: this.firstYield,
      peak: this.peak,
      ultimate: this.ultimate,
      failureCause: this.failureCause,
      secantPoint: this.secantPoint(),
    };
  }

  // --- load control ----------------------------------------------------------------------------------

  private crackingRatio(s: Snapshot): number {
    return this.maxRatio(s, (resp) => resp.crackingMoment).ratio - 1;
  }

  private candidates(): LoadEvent[] {
    const list: LoadEvent[] = [];
    if (!this.crackedYet) list.push({ kind: 'cracking', g: (s) => this.crackingRatio(s) });
    for (const site of this.sites) if (!this.hinges.some((h) => h.site === site)) list.push({ kind: 'yield', site, g: (s) => this.yieldRatio(site, s).ratio - 1 });
    this.hinges.forEach((h, i) => {
      if (h.phase === 'hardening') list.push({ kind: 'peak', hinge: i, g: this.peakEvent(h) });
      else list.push({ kind: 'capacity', hinge: i, g: this.capacityEvent(h, i) });
    });
    list.push({ kind: 'overstress', g: (s) => this.overstress(s).ratio - (1 + 1e-9) });
    return list;
  }

  /** g of a hardening hinge reaching its section's peak moment. */
  private peakEvent(h: HingeState): (s: Snapshot) => number {
    const resp = responseOf(this.beam.zones[h.zone]!, h.sign);
    return (s) => (h.sign * this.restore(s)[h.station]!) / resp.peakMoment - (1 - 1e-9);
  }

  /** g of a softening hinge reaching its rotation capacity. */
  private capacityEvent(h: HingeState, index: number): (s: Snapshot) => number {
    return (s) => (s.rotations.get(index) ?? h.rotation) / h.capacity - (1 - 1e-9);
  }

  private handle(ev: LoadEvent): void {
    const state = this.state;
    const d = this.controlDeflection(state);
    if (ev.kind === 'cracking') {
      this.crackedYet = true;
      const at = this.maxRatio(state, (resp) => resp.crackingMoment);
      const x = this.beam.x[at.station]!;
      this.events.push({ kind: 'cracking', loadFactor: state.lambda, deflection: d, position: x, description: `first cracking at ${describePosition(x, this.span, this.beam.support)}` });
    } else if (ev.kind === 'yield') {
      const wasFirst = this.firstYield === null;
      this.activate(ev.site!, state);
      if (wasFirst) this.distributions.push(this.distribution('first yield', state));
    } else if (ev.kind === 'peak') {
      this.soften(ev.hinge!, state, d);
      if (this.hinges.filter((x) => x.phase === 'softening').length > this.r) this.mechanism = true;
    } else {
      this.finishUltimate(ev.kind === 'capacity' ? this.hinges[ev.hinge!]! : undefined, state);
      this.finished = true;
    }
  }

  private loadControl(lambdaRef: number): void {
    let step = lambdaRef / 20;
    let guard = 0;
    let previousState: Snapshot | undefined;
    while (!this.mechanism && !this.finished && guard++ < 4000) {
      // Events already reached at the current state (e.g. both supports of a symmetric beam yield together).
      const due = this.candidates().find((ev) => ev.g(this.state) >= 0);
      if (due) {
        this.handle(due);
        continue;
      }
      const state = this.state;
      const target = state.lambda + step;
      // Predictor: extrapolate the redundants along the last step (one or two Newton iterations fewer).
      let guess: Snapshot = state;
      if (previousState && state.lambda > previousState.lambda) {
        const t = (target - state.lambda) / (state.lambda - previousState.lambda);
        const before = previousState;
        guess = { ...state, redundants: state.redundants.map((v, i) => v + t * (v - before.redundants[i]!)) };
      }
      const next = this.solveAt(target, guess) ?? (guess === state ? undefined : this.solveAt(target, state));
      if (!next) {
        // With a hinge past its peak, failure to find equilibrium at a higher load is the limit
        // point itself: go straight to rotation control rather than shrinking the step.
        const pastPeak = this.hinges.some((h) => h.phase === 'softening');
        if (!pastPeak && step > lambdaRef * 1e-6) {
          step /= 4;
          continue;
        }
        if (pastPeak && step > lambdaRef * 1e-3) {
          step /= 8;
          continue;
        }
        this.converged = false;
        this.status = `not converged: no equilibrium beyond λ = ${state.lambda.toFixed(4)} (the redundant moments could not be balanced)`;
        this.failureCause = 'analysis stopped before a limit state (not converged)';
        break;
      }
      let earliest: { ev: LoadEvent; at: Snapshot } | undefined;
      for (const ev of this.candidates()) {
        const ga = ev.g(state);
        const gb = ev.g(next);
        if (ga < 0 && gb >= 0) {
          const at = this.locate(state, next, ev.g);
          if (!earliest || at.lambda < earliest.at.lambda) earliest = { ev, at };
        }
      }
      if (!earliest) {
        previousState = state;
        this.state = next;
        this.record(next, 'integration');
        step = Math.min(step * 1.25, lambdaRef / 12);
        continue;
      }
      previousState = undefined;
      this.state = earliest.at;
      this.record(this.state, 'integration');
      this.handle(earliest.ev);
      step = Math.max(step / 2, lambdaRef / 200);
    }
    if (!this.mechanism && !this.finished && this.converged) {
      this.converged = false;
      this.status = 'not converged: the load-control stage did not end within its step budget';
      this.failureCause = this.status;
    }
  }

  // --- past the peak load: rotation control of the newest softening hinge ---------------------------
  // Entered when the beam becomes a mechanism, or when load control finds no equilibrium beyond a
  // limit point while a hinge is softening (the load must fall for the beam to deform further).
  // λ becomes an unknown; hardening hinges may still reach their peak on the way (they then soften
  // too); the stage ends when a hinge reaches its rotation capacity or a section outside the hinges
  // reaches its peak.
  private rotationControl(): void {
    const hinges = this.hinges;
    const softeningCount = hinges.filter((h) => h.phase === 'softening').length;
    const limitPoint = !this.mechanism && !this.finished && !this.converged && softeningCount > 0;
    if (!(this.mechanism || limitPoint) || this.ultimate) return;
    if (limitPoint) {
      this.converged = true;
      this.status = 'complete';
      this.failureCause = '';
    }
    const controlled = hinges.length - 1 - [...hinges].reverse().findIndex((h) => h.phase === 'softening');
    const hc = hinges[controlled]!;
    this.peak = { lambda: this.state.lambda, deflection: this.controlDeflection(this.state) };
    const at = this.beam.x[hc.station]!;
    this.events.push(
      this.mechanism
        ? { kind: 'mechanism', loadFactor: this.state.lambda, deflection: this.peak.deflection, position: at, description: `collapse mechanism: the member can take no more load; the hinge at the ${SITE_WORDS[hc.site]} rotates at constant or falling load` }
        : { kind: 'peak', loadFactor: this.state.lambda, deflection: this.peak.deflection, position: at, description: `peak load: the hinge at the ${SITE_WORDS[hc.site]} is past its peak moment and the load must fall for the member to deform further` },
    );
    const theta0 = hc.rotation;
    const steps = 16;
    const dTheta = (hc.capacity - theta0) / steps;
    let current = this.state;
    const solveTheta = (theta: number, from: Snapshot): Snapshot | undefined => this.solveAtRotation(controlled, theta, from);
    let theta = theta0;
    for (let k = 1; k <= steps + 1 && !this.ultimate; k++) {
      const target = Math.min(theta + dTheta, hc.capacity);
      const next = solveTheta(target, current);
      if (!next) {
        this.converged = false;
        this.status = `not converged past the peak at θp = ${(target * 1000).toFixed(2)} mrad of the hinge at the ${SITE_WORDS[hc.site]}`;
        this.failureCause = 'analysis stopped past the peak load (not converged)';
        break;
      }
      // Events in this step: searched on the controlled rotation, to 1e-6 of it.
      let event: { ev: RotationEvent; at: Snapshot; theta: number } | undefined;
      for (const ev of this.rotationEvents(controlled)) {
        if (!(ev.g(current) < 0 && ev.g(next) >= 0)) continue;
        const found = regulaFalsiEvent({ x: theta, state: current }, { x: target, state: next }, solveTheta, ev.g, { maxIterations: 40, xTolerance: (hi) => 1e-6 * hi });
        if (!event || found.x < event.theta) event = { ev, at: found.state, theta: found.x };
      }
      if (event) {
        hc.rotation = event.theta;
        current = event.at;
        theta = event.theta;
        this.record(current, 'mechanism');
        this.state = current;
        if (event.ev.kind === 'peak') {
          this.restore(current);
          this.soften(event.ev.hinge!, current, this.controlDeflection(current));
          continue;
        }
        hc.rotation = event.theta;
        this.finishUltimate(event.ev.kind === 'capacity' ? hinges[event.ev.hinge!]! : undefined, current);
        break;
      }
      theta = target;
      current = next;
      hc.rotation = theta;
      this.record(current, 'mechanism');
      this.state = current;
      if (theta >= hc.capacity * (1 - 1e-12)) {
        this.finishUltimate(hc, current);
        break;
      }
    }
  }

  /** Equilibrium with the rotation of hinge `controlled` prescribed and λ an unknown. */
  private solveAtRotation(controlled: number, theta: number, from: Snapshot): Snapshot | undefined {
    const hinges = this.hinges;
    hinges[controlled]!.rotation = theta;
    this.hingeVersion++;
    const free = hinges.map((h, i) => (h.phase === 'softening' && i !== controlled ? i : -1)).filter((i) => i >= 0);
    let res = newton(this.eq, hinges, free, true, { redundants: from.redundants, lambda: from.lambda, rotations: free.map((i) => from.rotations.get(i) ?? hinges[i]!.rotation) }, controlled);
    for (let pass = 0; pass < 2 && res.converged && this.retrack(); pass++) {
      res = newton(this.eq, hinges, free, true, { redundants: res.redundants, lambda: res.lambda, rotations: res.rotations }, controlled);
    }
    this.hingeVersion++;
    if (!res.converged) return undefined;
    const rotations = new Map<number, number>();
    free.forEach((h, i) => rotations.set(h, res.rotations[i]!));
    rotations.set(controlled, theta);
    return { lambda: res.lambda, redundants: res.redundants, rotations };
  }

  private rotationEvents(controlled: number): RotationEvent[] {
    const list: RotationEvent[] = [];
    this.hinges.forEach((h, i) => {
      if (i === controlled) return;
      if (h.phase === 'hardening') list.push({ kind: 'peak', hinge: i, g: this.peakEvent(h) });
      else list.push({ kind: 'capacity', hinge: i, g: this.capacityEvent(h, i) });
    });
    list.push({ kind: 'overstress', g: (s) => this.overstress(s).ratio - (1 + 1e-9) });
    return list;
  }

  // --- hinges and the end of the curve ---------------------------------------------------------------

  /** A plastic hinge becomes active at a site that reached first yield. */
  private activate(site: HingeSite, s: Snapshot): void {
    const { station, sign } = this.yieldRatio(site, s);
    const hinge = newHinge(this.beam, this.restore(s), { site, station, sign, activatedAt: s.lambda }, this.capacity);
    this.hingeVersion++;
    this.hinges.push(hinge);
    const x = this.beam.x[station]!;
    this.events.push({ kind: 'first-yield', loadFactor: s.lambda, deflection: this.controlDeflection(s), position: x, description: `first yield at ${describePosition(x, this.span, this.beam.support)}: plastic hinge active` });
    if (!this.firstYield) this.firstYield = { lambda: s.lambda, deflection: this.controlDeflection(s) };
  }

  /** A hardening hinge reaches its section's peak moment: from now on its rotation is an unknown. */
  private soften(index: number, at: Snapshot, deflection: number): void {
    const h = this.hinges[index]!;
    h.phase = 'softening';
    this.hingeVersion++;
    at.rotations.set(index, h.rotation);
    this.events.push({ kind: 'hinge', loadFactor: at.lambda, deflection, position: this.beam.x[h.station]!, description: `hinge at the ${SITE_WORDS[h.site]} reaches the peak moment of its section (θp = ${(h.rotation * 1000).toFixed(2)} mrad)` });
  }

  private finishUltimate(hinge: HingeState | undefined, s: Snapshot): void {
    const { beam, span } = this;
    const d = this.controlDeflection(s);
    this.ultimate = { lambda: s.lambda, deflection: d };
    if (hinge) {
      this.failureCause = `the plastic hinge at ${describePosition(hinge.site === 'span' ? hinge.rotationPosition : beam.x[hinge.station]!, span, beam.support)} reaches its rotation capacity θp,u = ${(hinge.capacity * 1000).toFixed(2)} mrad`;
    } else {
      const o = this.overstress(s);
      this.failureCause = o.ratio >= 1 - 1e-6 ? overstressWords(beam, this.stationZone(o.station), o) : 'the load–deflection analysis reached its last step';
    }
    this.events.push({ kind: 'ultimate', loadFactor: s.lambda, deflection: d, position: hinge ? beam.x[hinge.station]! : beam.x[this.overstress(s).station]!, description: `ultimate: ${this.failureCause}` });
    this.distributions.push(this.distribution('ultimate', s));
  }

  /**
   * Deflection at 75 % of the largest load, solved at that load: every hinge active then was still
   * hardening (its rotation a function of its moment), so the state is path-independent and can be
   * re-solved with the hinges as they are now, set back to hardening.
   */
  private secantPoint(): CapacityCurve['secantPoint'] {
    const { points, loads, hinges } = this;
    if (points.length < 2 || loads.patternTotal <= 0) return null;
    const pMax = Math.max(...points.map((p) => p.totalLoad));
    const base = points[0]!.totalLoad;
    const target = base + 0.75 * (pMax - base);
    const lambda = (target - loads.constantTotal) / loads.patternTotal;
    const firstSoftening = this.events.find((e) => e.kind === 'hinge' || e.kind === 'mechanism' || e.kind === 'peak');
    if (!(lambda > 0) || (firstSoftening && firstSoftening.loadFactor <= lambda)) return null;
    const guess = this.loadControlStates.reduce<Snapshot | undefined>((best, st) => (st.lambda <= lambda && (!best || st.lambda > best.lambda) ? st : best), undefined);
    if (!guess) return null;
    const saved = hinges.map((h) => ({ phase: h.phase, rotation: h.rotation, station: h.station, zone: h.zone, position: h.rotationPosition }));
    for (const h of hinges) h.phase = 'hardening';
    this.hingeVersion++;
    const solved = this.solveAt(lambda, { lambda: guess.lambda, redundants: guess.redundants, rotations: new Map() });
    const deflection = solved ? this.deflectionAt(solved)[this.controlIndex]! : null;
    hinges.forEach((h, i) => {
      const k = saved[i]!;
      h.phase = k.phase;
      h.rotation = k.rotation;
      h.station = k.station;
      h.zone = k.zone;
      h.rotationPosition = k.position;
    });
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
      firstYield: null,
      peak: { lambda: 0, deflection: 0 },
      ultimate: null,
      failureCause: reason,
      secantPoint: null,
    };
  }
}
