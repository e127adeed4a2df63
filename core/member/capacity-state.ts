/**
 * The state of a load–deflection analysis as one explicit object: the beam and its equations, the
 * plastic hinges, the recorded curve, events and distributions, and the mechanics every stage of
 * the analysis uses — solving at a load factor, restoring a solved state, the control deflection,
 * how close the most stressed station is to a section threshold, and the search for the load at
 * which an event happens. The stages themselves (load control, rotation control past the peak)
 * are core/member/capacity.ts.
 * Internal units: mm, N·mm, 1/mm, rad.
 */
import { regulaFalsiEvent } from '../numeric/roots.ts';
import type { BeamModel } from './beam-model.ts';
import { deflectionShape, trackSpanHinges } from './deflection.ts';
import { Equations, newton, responseOf, scratch, type HingeSite, type HingeState, type LoadingFields } from './equations.ts';
import type { LoadDeflectionPoint, MemberEvent, SpanDistribution } from './results.ts';
import type { SectionResponse } from './section-response.ts';

/** A solved state of the member: load factor, redundants and the rotations of softening hinges. */
export interface Snapshot {
  lambda: number;
  redundants: number[];
  rotations: Map<number, number>;
}

/** What a ratio search finds: the largest ratio, at which station, in which sense. */
export interface StationRatio {
  readonly ratio: number;
  readonly station: number;
  readonly sign: 1 | -1;
}

export class CapacityState {
  readonly eq: Equations;
  /** Number of stations, number of redundants, span (mm). */
  readonly n: number;
  readonly r: number;
  readonly span: number;
  readonly events: MemberEvent[] = [];
  readonly points: LoadDeflectionPoint[] = [];
  readonly distributions: SpanDistribution[] = [];
  readonly hinges: HingeState[] = [];
  /** States recorded under load control (the secant point is re-solved from one of them). */
  readonly loadControlStates: Snapshot[] = [];
  status = 'complete';
  converged = true;
  failureCause = '';
  /** Station of the control deflection. */
  controlIndex = -1;
  /**
   * Bumped whenever a solve overwrites the shared moment array and hinge rotations, or the hinge
   * set or a hinge's phase changes: the caches below are valid for one version only.
   */
  hingeVersion = 0;
  private restored: Snapshot | undefined;
  private restoredVersion = -1;
  private deflected: Snapshot | undefined;
  private deflectedVersion = -1;
  private deflectedValue = 0;

  constructor(readonly beam: BeamModel, readonly loads: LoadingFields) {
    this.eq = new Equations(beam, loads);
    this.n = beam.x.length;
    this.r = beam.redundants.length;
    this.span = beam.span;
  }

  /** Zone of the curve that applies at station i (its right-hand segment, the last one at the end). */
  stationZone(i: number): number {
    return this.beam.segmentZone[Math.min(i, this.n - 2)]!;
  }

  /** Moves span hinges to the current moment maximum; true when any of them moved. */
  retrack(): boolean {
    const before = this.hinges.map((h) => h.rotationPosition);
    trackSpanHinges(this.beam, this.eq.moment, this.hinges);
    // A shift of a hundred-thousandth of the span does not change any result worth showing.
    return this.hinges.some((h, i) => Math.abs(h.rotationPosition - before[i]!) > 1e-5 * this.span);
  }

  /** Equilibrium at load factor λ (load control), starting from `guess`; undefined when Newton fails. */
  solveAt(lambda: number, guess: Snapshot): Snapshot | undefined {
    const hinges = this.hinges;
    const free = hinges.map((h, i) => (h.phase === 'softening' ? i : -1)).filter((i) => i >= 0);
    let start = { redundants: guess.redundants, lambda, rotations: free.map((i) => guess.rotations.get(i) ?? hinges[i]!.rotation) };
    let res = newton(this.eq, hinges, free, false, start);
    for (let pass = 0; pass < 2 && res.converged && this.retrack(); pass++) {
      start = { redundants: res.redundants, lambda, rotations: res.rotations };
      res = newton(this.eq, hinges, free, false, start);
    }
    this.hingeVersion++; // the solve overwrote the shared moment array and hinge rotations
    if (!res.converged) return undefined;
    const rotations = new Map<number, number>();
    free.forEach((h, i) => rotations.set(h, res.rotations[i]!));
    return { lambda, redundants: res.redundants, rotations };
  }

  /**
   * Puts a solved state back into the equations and hinges; returns the moments at the stations.
   * Several event functions restore the same state in a row: the last one is remembered.
   */
  restore(s: Snapshot): Float64Array {
    if (s === this.restored && this.restoredVersion === this.hingeVersion) return this.eq.moment;
    this.restored = s;
    this.restoredVersion = this.hingeVersion;
    for (const [i, v] of s.rotations) this.hinges[i]!.rotation = v;
    this.eq.moments(s.redundants, s.lambda);
    trackSpanHinges(this.beam, this.eq.moment, this.hinges);
    // hardening hinges' rotation values for reporting
    for (const h of this.hinges) {
      if (h.phase === 'hardening') {
        responseOf(this.beam.zones[h.zone]!, h.sign).plastic(h.sign * this.eq.moment[h.station]!, scratch);
        h.rotation = h.length * scratch.value;
      }
    }
    return this.eq.moment;
  }

  deflectionAt(s: Snapshot): Float64Array {
    return deflectionShape(this.beam, this.restore(s), this.hinges);
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

  /** Adds a point of the load–deflection curve. */
  record(s: Snapshot, stage: 'integration' | 'mechanism'): void {
    if (stage === 'integration') this.loadControlStates.push(s);
    this.points.push({ loadFactor: s.lambda, totalLoad: this.loads.constantTotal + s.lambda * this.loads.patternTotal, deflection: this.controlDeflection(s), stage });
  }

  /** Moment, curvature (with the hinges' rotations spread over their lengths) and deflection along the span. */
  distribution(label: string, s: Snapshot): SpanDistribution {
    const { beam, n, span } = this;
    const curvature = new Float64Array(n);
    const moment = Float64Array.from(this.restore(s));
    const deflection = deflectionShape(beam, moment, this.hinges, curvature);
    const hingeZones: [number, number][] = [];
    for (const h of this.hinges) {
      if (h.rotation <= 0) continue;
      const a = Math.max(0, h.rotationPosition - h.length / 2);
      const b = Math.min(span, h.rotationPosition + h.length / 2);
      hingeZones.push([a, b]);
      for (let i = 0; i < n; i++) if (beam.x[i]! >= a && beam.x[i]! <= b) curvature[i] = curvature[i]! + (h.sign * h.rotation) / h.length;
    }
    return { label, loadFactor: s.lambda, x: [...beam.x], moment: [...moment], curvature: [...curvature], deflection: [...deflection], hingeZones };
  }

  /** How far the most stressed station is from a section threshold (ratio of moment to threshold). */
  maxRatio(s: Snapshot, pick: (resp: SectionResponse) => number | null, filter?: (i: number, sign: 1 | -1) => boolean): StationRatio {
    const M = this.restore(s);
    const beam = this.beam;
    let best = -Infinity;
    let at = -1;
    let sign: 1 | -1 = 1;
    for (let i = 0; i < this.n; i++) {
      const m = M[i]!;
      const sg: 1 | -1 = m >= 0 ? 1 : -1;
      if (filter && !filter(i, sg)) continue;
      // A station at a zone boundary belongs to both zones: check the weaker.
      const left = beam.segmentZone[Math.max(i - 1, 0)]!;
      const right = this.stationZone(i);
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
  }

  /** The most stressed interior or end station of a hinge site in its sense, against first yield. */
  yieldRatio(site: HingeSite, s: Snapshot): StationRatio {
    const n = this.n;
    const filter = (i: number, sg: 1 | -1) => {
      if (sg !== (site === 'span' ? 1 : -1)) return false;
      if (site === 'left') return i === 0;
      if (site === 'right') return i === n - 1;
      return i > 0 && i < n - 1;
    };
    return this.maxRatio(s, (resp) => resp.firstYieldMoment, filter);
  }

  /**
   * Stations outside every plastic hinge zone, against their section's peak moment. Sections
   * within a hinge's length belong to the hinge (its moment governs them), so they are excluded.
   */
  overstress(s: Snapshot): StationRatio {
    this.restore(s);
    const { beam, span } = this;
    const spacing = span / Math.max(this.n - 1, 1);
    const zones = this.hinges.map((h) => {
      const half = Math.max(h.length / 2, 1.01 * spacing);
      if (h.site === 'left') return [0, Math.max(h.length, 1.01 * spacing)] as const;
      if (h.site === 'right') return [span - Math.max(h.length, 1.01 * spacing), span] as const;
      return [beam.x[h.station]! - half, beam.x[h.station]! + half] as const;
    });
    return this.maxRatio(s, (resp) => resp.peakMoment, (i) => !zones.some(([a, b]) => beam.x[i]! >= a && beam.x[i]! <= b));
  }

  /**
   * The state on the event side of [a, b] where the event function g crosses zero (g(a) < 0 ≤ g(b)),
   * searched on the load factor (numeric/roots.ts regulaFalsiEvent).
   */
  locate(a: Snapshot, b: Snapshot, g: (s: Snapshot) => number): Snapshot {
    return regulaFalsiEvent(
      { x: a.lambda, state: a },
      { x: b.lambda, state: b },
      (lambda, from) => this.solveAt(lambda, from),
      g,
      { maxIterations: 60, xTolerance: (hi) => 1e-6 * Math.max(hi, 1e-12) },
    ).state;
  }
}
