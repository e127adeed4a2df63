/**
 * Moment–curvature analysis of a section, curvature-controlled, from zero to ultimate.
 *
 * At each curvature the neutral axis follows from force equilibrium (core/section/equilibrium.ts).
 * Events — cracking, first yield, the code's crushing strain, the nominal point, and the limit
 * states that end the curve — are located exactly by a root search on curvature between the two
 * steps that bracket them, so key points do not depend on the step size.
 *
 * Ultimate is the first of (reported as the cause):
 *  - the extreme fibre of the concrete that governs crushing reaches its crushing strain
 *    (the confined core when there is one: its cover spalls and does not govern);
 *  - a steel element reaches its rupture strain, or an FRP element its rupture/debonding strain;
 *  - after first yield, the moment falls below `momentDropFraction` of the largest moment since
 *    yield (default 0.80; common practice, no source).
 *
 * Units: curvature 1/mm, moment N·mm (magnitudes in the chosen direction), strain dimensionless.
 */
import { InputError } from '../diagnostics.ts';
import { brentRoot, type RootResult } from '../numeric/roots.ts';
import { goldenSectionMaximum } from '../numeric/quadrature.ts';
import { solveEquilibrium, forceTolerance, type EquilibriumState, type SlopeHint } from './equilibrium.ts';
import { directionSign, type BendingDirection, type SectionModel, type DiscreteElement } from './model.ts';
import type { BilinearIdealisation, CurvePoint, CurveStatus, KeyPoint, KeyPointName, MomentCurvatureResult, UltimateCause } from './results.ts';
import { curvePointOf, faces, sectionState, strainAtDepth } from './state.ts';

export interface MomentCurvatureOptions {
  /**
   * Extreme-fibre concrete strain of the code key point: 0.003 (ACI 318-19 22.2.2.1) or
   * 0.0035 (EN 1992-1-1 Table 3.1, εcu2 for fck ≤ 50 MPa).
   */
  readonly codeCrushingStrain: number;
  /** Fraction of the post-yield peak below which the curve ends (default 0.8). */
  readonly momentDropFraction?: number;
  /** Bilinear idealisation method (default 'priestley-2007'). */
  readonly bilinearMethod?: 'priestley-2007' | 'equal-energy';
  /** Safety cap on the number of curvature steps (default 600). */
  readonly maxSteps?: number;
  /** Post-yield step as a fraction of the current curvature (default 0.10). */
  readonly postYieldGrowth?: number;
}

/** Strain limits of the nominal point of Priestley, Calvi & Kowalsky (2007) §4.2 (from memory): εc = 0.004 or εs = 0.015. */
export const NOMINAL_CONCRETE_STRAIN = 0.004;
export const NOMINAL_STEEL_STRAIN = 0.015;

interface Snapshot {
  readonly kappa: number;
  readonly eq: EquilibriumState;
  /** Set by `locate` when the event function jumped there (the equilibrium path snapped). */
  readonly jumped?: boolean;
}

type EventName = 'cracking' | 'firstYield' | 'codeCrushing' | 'nominal' | 'crushing' | 'elementLimit' | 'momentDrop';

const KEY_EVENTS: readonly EventName[] = ['cracking', 'firstYield', 'codeCrushing', 'nominal'];
const ULTIMATE_EVENTS: readonly EventName[] = ['crushing', 'elementLimit', 'momentDrop'];

function isSteel(e: DiscreteElement): boolean {
  return (e.kind === 'bar' || e.kind === 'plate') && e.material.yieldStrain !== undefined;
}

/** Tension-side steel for a direction: below the centroid for sagging, above it for hogging. */
export function tensionSteel(model: SectionModel, direction: BendingDirection): DiscreteElement[] {
  return model.elements.filter((e) => isSteel(e) && (direction === 'sagging' ? e.depth > model.centroidDepth : e.depth < model.centroidDepth));
}

/**
 * Moment–curvature curve of `model` bending in `direction`.
 * Throws InputError when the direction has no tension steel; every physical outcome (including
 * non-convergence) is returned as a status with the points computed so far.
 */
export function momentCurvature(model: SectionModel, direction: BendingDirection, options: MomentCurvatureOptions): MomentCurvatureResult {
  const sign = directionSign(direction);
  const steelInTension = tensionSteel(model, direction);
  if (steelInTension.length === 0) {
    throw new InputError([
      {
        code: 'no-tension-steel',
        path: 'bars',
        severity: 'error',
        message: `${direction} bending needs reinforcement on the tension side (${direction === 'sagging' ? 'below' : 'above'} the centroid at ${model.centroidDepth.toFixed(0)} mm from the top); none is defined`,
      },
    ]);
  }
  const dropFraction = options.momentDropFraction ?? 0.8;
  const growth = options.postYieldGrowth ?? 0.08;
  const maxSteps = options.maxSteps ?? 600;
  const tolerance = forceTolerance(model);
  const face = faces(model, direction);
  const warnings: string[] = [];
  let solves = 0;

  // --- event functions: negative before the event, ≥ 0 at and after it --------------------------
  const tensionPart = model.concreteParts.find((p) => (direction === 'sagging' ? p.bottom === face.tension : p.top === face.tension)) ?? model.concreteParts[0]!;
  const crackingStrain = tensionPart.material.crackingStrain;
  const governing = model.concreteParts.filter((p) => p.governsCrushing);
  const limited = model.elements.filter((e) => e.limitStrain !== undefined && e.limitStrain > 0);
  let dropReference = 0; // largest moment since first yield
  let yielded = false;

  const own = (e: DiscreteElement, eq: EquilibriumState) => strainAtDepth(model, eq.referenceStrain, eq.curvature, e.depth) - e.initialStrain;
  const compressionFaceStrain = (eq: EquilibriumState) => strainAtDepth(model, eq.referenceStrain, eq.curvature, face.compression);
  const maxSteelTension = (eq: EquilibriumState) => {
    let m = 0;
    for (const e of model.elements) if (isSteel(e)) m = Math.max(m, -own(e, eq));
    return m;
  };
  const g: Record<EventName, (eq: EquilibriumState) => number> = {
    cracking: (eq) => -strainAtDepth(model, eq.referenceStrain, eq.curvature, face.tension) / crackingStrain - 1,
    firstYield: (eq) => {
      let r = -Infinity;
      for (const e of steelInTension) r = Math.max(r, -own(e, eq) / e.material.yieldStrain!);
      return r - 1;
    },
    codeCrushing: (eq) => compressionFaceStrain(eq) / options.codeCrushingStrain - 1,
    nominal: (eq) => Math.max(compressionFaceStrain(eq) / NOMINAL_CONCRETE_STRAIN, maxSteelTension(eq) / NOMINAL_STEEL_STRAIN) - 1,
    crushing: (eq) => {
      let r = -Infinity;
      for (const p of governing) {
        const y = direction === 'sagging' ? p.top : p.bottom;
        r = Math.max(r, strainAtDepth(model, eq.referenceStrain, eq.curvature, y) / p.material.crushingStrain);
      }
      return r - 1;
    },
    elementLimit: (eq) => {
      let r = -Infinity;
      for (const e of limited) r = Math.max(r, -own(e, eq) / e.limitStrain!);
      return r - 1;
    },
    momentDrop: (eq) => (yielded && dropReference > 0 ? dropFraction - (sign * eq.moment) / dropReference : -1),
  };
  const enabled: Record<EventName, boolean> = {
    cracking: crackingStrain > 0,
    firstYield: true,
    codeCrushing: true,
    nominal: true,
    crushing: governing.length > 0,
    elementLimit: limited.length > 0,
    momentDrop: true,
  };

  // --- equilibrium with warm start -------------------------------------------------------------
  let lastGuess = 0;
  const hint: SlopeHint = { slope: 0 };
  // Axial stiffness of the uncracked section as the first slope estimate: Σ E·A.
  for (const part of model.concreteParts) for (const st of part.strips) hint.slope += part.material.initialModulus * 0.5 * (st.widthTop + st.widthBottom) * (st.bottom - st.top);
  for (const e of model.elements) hint.slope += e.material.initialModulus * e.area;
  const solve = (kappa: number): EquilibriumState | string => {
    solves++;
    const out = solveEquilibrium(model, sign * kappa, lastGuess, tolerance, hint);
    if (!out.ok) return out.reason;
    lastGuess = out.state.referenceStrain;
    return out.state;
  };

  /** Locates the curvature where event `name` occurs between two bracketing snapshots. */
  const locate = (name: EventName, a: Snapshot, b: Snapshot): Snapshot | string => {
    let failure: string | undefined;
    let lastState: EquilibriumState | undefined;
    // Follow the branch the curve came along: extrapolate the centroid strain from `a` with the
    // slope of the last converged steps (the state at `b` may lie on another branch after a snap).
    const index = snapshots.lastIndexOf(a);
    const before = index > 0 ? snapshots[index - 1]! : undefined;
    const slope = before && a.kappa > before.kappa
      ? (a.eq.referenceStrain - before.eq.referenceStrain) / (a.kappa - before.kappa)
      : (b.eq.referenceStrain - a.eq.referenceStrain) / (b.kappa - a.kappa);
    // A curvature with no equilibrium on this branch lies beyond the limit of the section: it counts
    // as "event passed" (+1), so the search closes in on the last state that exists.
    let lastGood: { kappa: number; state: EquilibriumState } = { kappa: a.kappa, state: a.eq };
    const f = (kappa: number) => {
      lastGuess = a.eq.referenceStrain + slope * (kappa - a.kappa);
      const s = solve(kappa);
      if (typeof s === 'string') {
        failure = s;
        return 1;
      }
      lastState = s;
      const value = g[name](s);
      if (value < 0 && kappa > lastGood.kappa) lastGood = { kappa, state: s };
      return value;
    };
    // Key points to a relative 1e-7 in curvature: far inside the 0.2 % the checks ask for.
    const root: RootResult = brentRoot(f, a.kappa, b.kappa, g[name](a.eq), g[name](b.eq), { xTolerance: 1e-7 * b.kappa, fTolerance: 1e-9, maxIterations: 100 });
    let kappa = root.x;
    if (!lastState || lastState.curvature !== sign * kappa) {
      lastGuess = lastGood.state.referenceStrain;
      const s = solve(kappa);
      if (typeof s === 'string') {
        // The event sits where equilibrium ends: report the last state that had one.
        if (!failure) failure = s;
        return lastGood.kappa > a.kappa || g[name](a.eq) < 0 ? { kappa: lastGood.kappa, eq: lastGood.state, jumped: true } : failure;
      }
      lastState = s;
    }
    let jumped = false;
    if (Math.abs(g[name](lastState)) > 1e-6) {
      jumped = true;
      // The event function jumps here (the equilibrium path snaps, e.g. when a flange crushes):
      // take the last state before the jump, where the event has not yet happened.
      for (let shrink = 1e-9; shrink < 1e-3; shrink *= 10) {
        lastGuess = a.eq.referenceStrain; // stay on the branch the curve came along
        const left = solve(root.x * (1 - shrink));
        if (typeof left === 'string') return left;
        if (g[name](left) < 0) {
          kappa = root.x * (1 - shrink);
          lastState = left;
          break;
        }
      }
    }
    return { kappa, eq: lastState, jumped };
  };

  // --- march --------------------------------------------------------------------------------------
  const snapshots: Snapshot[] = [];
  const keyAt: Partial<Record<KeyPointName, Snapshot>> = {};
  let status: CurveStatus | undefined;
  let ultimateCause: UltimateCause | undefined;

  const start = solve(0);
  if (typeof start === 'string') {
    return emptyResult(direction, start, solves);
  }
  snapshots.push({ kappa: 0, eq: start });
  let previous = snapshots[0]!;
  let previousG = evaluateAll(previous.eq);
  if (ULTIMATE_EVENTS.some((n) => enabled[n] && previousG[n] >= 0)) {
    return emptyResult(direction, 'the section is already at a limit state under the axial force alone', solves);
  }

  const referenceStrain = Math.max(0.002, ...steelInTension.map((e) => e.material.yieldStrain!));
  const baseStep = referenceStrain / (12 * model.height);

  function evaluateAll(eq: EquilibriumState): Record<EventName, number> {
    const out = {} as Record<EventName, number>;
    for (const n of [...KEY_EVENTS, ...ULTIMATE_EVENTS]) out[n] = enabled[n] ? g[n](eq) : -1;
    return out;
  }

  for (let step = 0; step < maxSteps && !status; step++) {
    const kappa = previous.kappa + (yielded ? Math.max(baseStep, growth * previous.kappa) : baseStep);
    // Start from the strain extrapolated along the last two points.
    const before = snapshots.length > 1 ? snapshots[snapshots.length - 2]! : undefined;
    if (before && previous.kappa > before.kappa) {
      lastGuess = previous.eq.referenceStrain + ((previous.eq.referenceStrain - before.eq.referenceStrain) * (kappa - previous.kappa)) / (previous.kappa - before.kappa);
    }
    let eq = solve(kappa);
    let stepKappa = kappa;
    let forcedLimit: EventName | undefined;
    if (typeof eq === 'string') {
      // No equilibrium at the full step: halve it until one exists. Equilibrium is commonly lost
      // right at a limit state (a bar ruptures and nothing balances the compression), so before
      // calling it non-convergence, see whether the last reachable state sits on a limit.
      let lo = previous.kappa;
      let hi = kappa;
      let best: EquilibriumState | undefined;
      let reason = eq;
      for (let halving = 0; halving < 40; halving++) {
        const mid = 0.5 * (lo + hi);
        lastGuess = (best ?? previous.eq).referenceStrain;
        const s = solve(mid);
        if (typeof s === 'string') {
          hi = mid;
          reason = s;
        } else {
          lo = mid;
          best = s;
        }
        if (hi - lo <= 1e-9 * hi) break;
      }
      const atLimit = best ? ULTIMATE_EVENTS.find((n) => enabled[n] && n !== 'momentDrop' && g[n](best!) > -1e-6) : undefined;
      if (!best || !atLimit) {
        status = { kind: 'not-converged', atCurvature: hi, message: `Analysis stopped at φ = ${hi.toExponential(3)} 1/mm: ${reason}. The curve ends at the last converged point.` };
        break;
      }
      // Reaching the limit exactly: let the event logic below record it at this state.
      eq = best;
      stepKappa = lo;
      forcedLimit = atLimit;
    }
    const current: Snapshot = { kappa: stepKappa, eq };
    const currentG = evaluateAll(eq);

    // Ultimate events inside this step: take the earliest.
    let ultimate: { name: EventName; snap: Snapshot } | undefined = forcedLimit ? { name: forcedLimit, snap: current } : undefined;
    for (const n of forcedLimit ? [] : ULTIMATE_EVENTS) {
      if (!enabled[n] || !(previousG[n] < 0 && currentG[n] >= 0)) continue;
      const located = locate(n, previous, current);
      if (typeof located === 'string') {
        status = { kind: 'not-converged', atCurvature: kappa, message: `Could not locate the limit state between φ = ${previous.kappa.toExponential(3)} and ${kappa.toExponential(3)} 1/mm: ${located}` };
        break;
      }
      // Earliest wins; when a physical limit and the moment-drop rule coincide (a bar ruptures and the
      // moment falls with it), the physical limit is the cause.
      // At a snap of the equilibrium path several event functions jump together; the cause is the
      // physical limit the state before the snap is closest to (e.g. the core about to crush).
      let name: EventName = n;
      if (located.jumped) {
        let closest = -Infinity;
        for (const m of ULTIMATE_EVENTS) {
          if (!enabled[m] || m === 'momentDrop') continue;
          const value = g[m](located.eq);
          if (value > closest && value > -0.02) {
            closest = value;
            name = m;
          }
        }
      }
      const coincide = ultimate && Math.abs(located.kappa - ultimate.snap.kappa) <= 1e-6 * located.kappa;
      if (!ultimate || (coincide ? ultimate.name === 'momentDrop' && name !== 'momentDrop' : located.kappa < ultimate.snap.kappa)) ultimate = { name, snap: located };
    }
    if (status) break;
    const end = ultimate ? ultimate.snap.kappa : kappa;

    // Key events inside this step (before ultimate, if any), in order of curvature.
    const found: { name: KeyPointName; snap: Snapshot }[] = [];
    for (const n of KEY_EVENTS) {
      if (!enabled[n] || keyAt[n as KeyPointName] || !(previousG[n] < 0 && currentG[n] >= 0)) continue;
      const located = locate(n, previous, current);
      if (typeof located === 'string') {
        warnings.push(`The ${n} point could not be located exactly: ${located}`);
        continue;
      }
      if (located.kappa <= end) found.push({ name: n as KeyPointName, snap: located });
    }
    found.sort((p, q) => p.snap.kappa - q.snap.kappa);
    for (const f of found) {
      keyAt[f.name] = f.snap;
      snapshots.push(f.snap);
      if (f.name === 'firstYield') {
        yielded = true;
        dropReference = Math.max(dropReference, sign * f.snap.eq.moment);
      }
    }
    if (ultimate) {
      snapshots.push(ultimate.snap);
      keyAt.ultimate = ultimate.snap;
      ultimateCause = causeOf(ultimate.name, ultimate.snap.eq);
      status = { kind: 'complete', ultimateCause, message: ultimateMessage(ultimateCause) };
      break;
    }
    snapshots.push(current);
    if (yielded) dropReference = Math.max(dropReference, sign * eq.moment);
    previous = current;
    // Re-evaluate: the moment-drop event depends on the running peak.
    previousG = evaluateAll(eq);
    lastGuess = eq.referenceStrain;
  }
  if (!status) {
    status = { kind: 'not-converged', atCurvature: previous.kappa, message: `No limit state was reached within ${maxSteps} curvature steps (φ = ${previous.kappa.toExponential(3)} 1/mm).` };
  }

  // --- refine where the curve bends: the member engine interpolates the curve linearly between
  // points, so a point is added midway wherever the curve departs from the chord by more than
  // 0.05 % of the largest moment (common practice, no source) ---------------------------------------
  snapshots.sort((p, q) => p.kappa - q.kappa);
  {
    let largest = 0;
    for (const snap of snapshots) largest = Math.max(largest, Math.abs(snap.eq.moment));
    const tolerance = 5e-4 * largest;
    const refined: Snapshot[] = [snapshots[0]!];
    const refine = (a: Snapshot, b: Snapshot, depth: number) => {
      if (depth > 0 && b.kappa - a.kappa > 1e-9 * b.kappa) {
        lastGuess = 0.5 * (a.eq.referenceStrain + b.eq.referenceStrain);
        const mid = solve(0.5 * (a.kappa + b.kappa));
        if (typeof mid !== 'string' && Math.abs(mid.moment - 0.5 * (a.eq.moment + b.eq.moment)) > tolerance) {
          const m: Snapshot = { kappa: 0.5 * (a.kappa + b.kappa), eq: mid };
          refine(a, m, depth - 1);
          refined.push(m);
          refine(m, b, depth - 1);
          return;
        }
      }
    };
    // How far a point lies off the chord of its neighbours: a cheap estimate of how much the curve
    // bends there, used to skip probing stretches that are plainly straight.
    const bend = (i: number) => {
      if (i <= 0 || i >= snapshots.length - 1) return Infinity;
      const p = snapshots[i - 1]!;
      const q = snapshots[i]!;
      const r = snapshots[i + 1]!;
      if (!(r.kappa > p.kappa)) return Infinity;
      const chord = p.eq.moment + ((r.eq.moment - p.eq.moment) * (q.kappa - p.kappa)) / (r.kappa - p.kappa);
      return Math.abs(q.eq.moment - chord);
    };
    for (let i = 1; i < snapshots.length; i++) {
      const a = snapshots[i - 1]!;
      const b = snapshots[i]!;
      // A segment's midpoint departs from its chord by about a quarter of its ends' bend.
      const straight = Math.max(bend(i - 1), bend(i)) < tolerance;
      // Only between points of one branch: across a snap the chord is meaningless.
      if (!a.jumped && !b.jumped && !straight) refine(a, b, 5);
      refined.push(b);
    }
    snapshots.length = 0;
    snapshots.push(...refined);
  }

  // --- peak: largest moment, refined between its neighbours ------------------------------------------
  let iMax = 0;
  for (let i = 1; i < snapshots.length; i++) if (sign * snapshots[i]!.eq.moment > sign * snapshots[iMax]!.eq.moment) iMax = i;
  if (iMax > 0 && iMax < snapshots.length - 1) {
    const lo = snapshots[iMax - 1]!;
    const hi = snapshots[iMax + 1]!;
    let best: Snapshot = snapshots[iMax]!;
    goldenSectionMaximum((kappa) => {
      lastGuess = best.eq.referenceStrain;
      const s = solve(kappa);
      if (typeof s === 'string') return -Infinity;
      if (sign * s.moment > sign * best.eq.moment) best = { kappa, eq: s };
      return sign * s.moment;
      // The moment is flat at the peak: a curvature to 2e-4 (relative) gives the moment to ~1e-8.
    }, lo.kappa, hi.kappa, 2e-4 * hi.kappa, 40);
    if (best !== snapshots[iMax]) snapshots.splice(best.kappa > snapshots[iMax]!.kappa ? iMax + 1 : iMax, 0, best);
    keyAt.peak = best;
  } else {
    keyAt.peak = snapshots[iMax]!;
  }

  // --- results --------------------------------------------------------------------------------------
  const points: CurvePoint[] = snapshots.map((s) => curvePointOf(model, direction, s.eq.curvature, s.eq.referenceStrain, s.eq.moment, s.eq.residual));
  const keyPoints: Partial<Record<KeyPointName, KeyPoint>> = {};
  for (const [name, snap] of Object.entries(keyAt) as [KeyPointName, Snapshot][]) {
    const state = sectionState(model, direction, snap.eq.curvature, snap.eq.referenceStrain, snap.eq.moment, snap.eq.residual);
    keyPoints[name] = { ...state.point, name, description: describeKeyPoint(name, ultimateCause), state };
  }

  // Warnings an engineer must see.
  const fy = keyPoints.firstYield;
  const peak = keyPoints.peak;
  const cracking = keyPoints.cracking;
  if (!fy && status.kind === 'complete') {
    warnings.push('The tension steel does not yield before ultimate: the section is over-reinforced and fails by crushing of the concrete without warning.');
  }
  if (fy) {
    const comp = governing[0] ?? model.concreteParts[0]!;
    if (fy.compressionFaceStrain > comp.material.peakStrain) {
      warnings.push(`At first yield the extreme concrete strain (${(fy.compressionFaceStrain * 1000).toFixed(2)} ‰) is already past the peak of the concrete curve (${(comp.material.peakStrain * 1000).toFixed(2)} ‰): the elastic first-yield relations do not apply.`);
    }
  }
  if (cracking && peak && peak.name !== undefined && keyAt.peak === keyAt.cracking) {
    warnings.push('The cracking moment exceeds the moment the cracked section can develop: the reinforcement is below the minimum and the section fails suddenly at cracking.');
  } else if (cracking && fy && fy.moment < cracking.moment) {
    warnings.push('The moment at first yield is below the cracking moment: light reinforcement, the section yields as soon as it cracks.');
  }

  const bilinear = keyPoints.firstYield && keyPoints.ultimate ? idealise(points, keyPoints, options.bilinearMethod ?? 'priestley-2007') : undefined;
  const ultimateCurvature = keyPoints.ultimate?.curvature;
  const finite = (x: number) => (Number.isFinite(x) ? x : null);
  return {
    direction,
    status,
    points,
    keyPoints,
    ...(bilinear ? { bilinear } : {}),
    curvatureDuctility: bilinear && ultimateCurvature ? finite(ultimateCurvature / bilinear.yieldCurvature) : null,
    firstYieldCurvatureDuctility: keyPoints.firstYield && ultimateCurvature ? finite(ultimateCurvature / keyPoints.firstYield.curvature) : null,
    warnings,
    solves,
  };

  function causeOf(name: EventName, eq: EquilibriumState): UltimateCause {
    if (name === 'momentDrop') return 'moment-drop';
    if (name === 'crushing') return governing.some((p) => p.role === 'core') ? 'core-crushing' : 'concrete-crushing';
    let worst: DiscreteElement | undefined;
    let ratio = -Infinity;
    for (const e of limited) {
      const r = -own(e, eq) / e.limitStrain!;
      if (r > ratio) {
        ratio = r;
        worst = e;
      }
    }
    return worst?.limitCause ?? 'steel-rupture';
  }
}

function ultimateMessage(cause: UltimateCause): string {
  switch (cause) {
    case 'concrete-crushing': return 'Ultimate: the extreme concrete fibre reaches its crushing strain.';
    case 'core-crushing': return 'Ultimate: the confined core reaches its ultimate strain (hoop fracture).';
    case 'steel-rupture': return 'Ultimate: the reinforcement reaches its rupture strain.';
    case 'frp-rupture': return 'Ultimate: the FRP laminate reaches its design rupture strain.';
    case 'frp-debonding': return 'Ultimate: the FRP laminate reaches its debonding strain limit.';
    case 'moment-drop': return 'Ultimate: the moment has fallen below the chosen fraction of its post-yield peak.';
  }
}

function describeKeyPoint(name: KeyPointName, cause: UltimateCause | undefined): string {
  switch (name) {
    case 'cracking': return 'extreme tension fibre reaches the tensile strength of the concrete';
    case 'firstYield': return 'outermost tension steel reaches its yield strain';
    case 'codeCrushing': return 'extreme compression fibre reaches the code crushing strain';
    case 'nominal': return `nominal point: εc = ${NOMINAL_CONCRETE_STRAIN} or εs = ${NOMINAL_STEEL_STRAIN}, whichever first`;
    case 'peak': return 'largest moment on the curve';
    case 'ultimate': return cause ? ultimateMessage(cause).replace('Ultimate: ', '') : 'end of the curve';
  }
}

function emptyResult(direction: BendingDirection, reason: string, solves: number): MomentCurvatureResult {
  return {
    direction,
    status: { kind: 'not-converged', atCurvature: 0, message: `No equilibrium at zero curvature: ${reason}.` },
    points: [],
    keyPoints: {},
    curvatureDuctility: null,
    firstYieldCurvatureDuctility: null,
    warnings: [],
    solves,
  };
}

/** Area under the curve from 0 to φu by the trapezoid rule, N·mm/mm. */
function areaUnder(points: readonly CurvePoint[], upTo: number): number {
  let area = 0;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1]!;
    const b = points[i]!;
    if (a.curvature >= upTo) break;
    const k1 = Math.min(b.curvature, upTo);
    const m1 = b.curvature > upTo ? a.moment + ((b.moment - a.moment) * (upTo - a.curvature)) / (b.curvature - a.curvature) : b.moment;
    area += 0.5 * (a.moment + m1) * (k1 - a.curvature);
  }
  return area;
}

/**
 * Bilinear idealisation of the curve.
 * - 'priestley-2007': elastic branch through first yield (φ′y, M′y) extended to the nominal moment
 *   Mn (at εc = 0.004 or εs = 0.015, or at ultimate if that comes first): φy = φ′y·Mn/M′y.
 *   @see Priestley, Calvi & Kowalsky (2007), Displacement-Based Seismic Design of Structures, §4.2 (from memory).
 * - 'equal-energy': same elastic slope, yield point chosen so that the bilinear curve encloses the
 *   same area as the computed curve up to φu (common practice, no source).
 */
export function idealise(points: readonly CurvePoint[], keyPoints: Partial<Record<KeyPointName, KeyPoint>>, method: 'priestley-2007' | 'equal-energy'): BilinearIdealisation | undefined {
  const fy = keyPoints.firstYield;
  const u = keyPoints.ultimate;
  if (!fy || !u || !(fy.curvature > 0) || !(fy.moment > 0)) return undefined;
  const stiffness = fy.moment / fy.curvature;
  if (method === 'priestley-2007') {
    const nominal = keyPoints.nominal && keyPoints.nominal.curvature <= u.curvature ? keyPoints.nominal : u;
    const mn = nominal.moment;
    const phiY = fy.curvature * (mn / fy.moment);
    return {
      method,
      yieldCurvature: phiY,
      yieldMoment: mn,
      ultimateCurvature: u.curvature,
      ultimateMoment: u.moment,
      effectiveStiffness: stiffness,
      description: `Elastic branch through first yield extended to the nominal moment Mn${nominal === u ? ' (taken at ultimate, reached before εc = 0.004 or εs = 0.015)' : ''} (Priestley, Calvi & Kowalsky 2007).`,
    };
  }
  const area = areaUnder(points, u.curvature);
  const denominator = 0.5 * (stiffness * u.curvature - u.moment);
  if (!(denominator > 0)) return undefined;
  const phiY = Math.min((area - 0.5 * u.moment * u.curvature) / denominator, u.curvature);
  if (!(phiY > 0)) return undefined;
  return {
    method,
    yieldCurvature: phiY,
    yieldMoment: stiffness * phiY,
    ultimateCurvature: u.curvature,
    ultimateMoment: u.moment,
    effectiveStiffness: stiffness,
    description: 'Elastic branch through first yield; yield point chosen so that the bilinear curve encloses the same area as the computed curve up to ultimate.',
  };
}
