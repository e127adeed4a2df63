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
import { curveEvents, KEY_EVENTS, ULTIMATE_EVENTS, NOMINAL_CONCRETE_STRAIN, NOMINAL_STEEL_STRAIN, type DropState, type EventName } from './curve-events.ts';
import { refineByChord, peakSnapshot } from './curve-refine.ts';
import { CurveSolver, parabolaAt, type Snapshot } from './curve-solver.ts';
import type { EquilibriumState } from './equilibrium.ts';
import { idealise } from './idealise.ts';
import { directionSign, tensionSteel, type BendingDirection, type ConcretePart, type SectionModel } from './model.ts';
import type { BilinearMethod, ConcreteStrainLimits, CurvePoint, CurveStatus, KeyPoint, KeyPointName, MomentCurvatureResult, UltimateCause } from './results.ts';
import { ultimateStrainWords } from '../materials/build/concrete-defaults.ts';
import { curvePointOf, sectionState } from './state.ts';
import { crackingStrength } from './cracking-strength.ts';
import { phrase, q } from '../units/phrase.ts';

/** Relative nearness (curvature, or the event's strain ratio) at which a key event counts as reached at the ultimate itself. */
const COINCIDENT = 1e-6;

export interface MomentCurvatureOptions {
  /**
   * Extreme-fibre concrete strain of the code key point: 0.003 (ACI 318-19 22.2.2.1) or
   * 0.0035 (EN 1992-1-1 Table 3.1, εcu2 for fck ≤ 50 MPa).
   */
  readonly codeCrushingStrain: number;
  /** Clause of the code crushing strain, for the key point's description (e.g. `ACI 318-19 22.2.2.1`). */
  readonly codeCrushingSource?: string;
  /** Fraction of the post-yield peak below which the curve ends (default 0.8). */
  readonly momentDropFraction?: number;
  /** Bilinear idealisation method (default 'priestley-2007'). */
  readonly bilinearMethod?: BilinearMethod;
  /** Safety cap on the number of curvature steps (default 600). */
  readonly maxSteps?: number;
  /** Post-yield step as a fraction of the current curvature (default 0.08). */
  readonly postYieldGrowth?: number;
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
  const growth = options.postYieldGrowth ?? 0.08;
  const maxSteps = options.maxSteps ?? 600;
  const warnings: string[] = [];
  const limits = concreteLimits(model, direction, options);
  const solver = new CurveSolver(model, sign);
  const drop: DropState = { yielded: false, dropReference: 0 };
  const events = curveEvents(model, direction, { codeCrushingStrain: options.codeCrushingStrain, dropFraction: options.momentDropFraction ?? 0.8 }, drop);
  const { g, enabled, evaluateAll } = events;
  const snapshots: Snapshot[] = [];
  const limitedElements = model.elements.filter((e) => e.limitStrain !== undefined && e.limitStrain > 0);
  /**
   * A located event's state with its key strain exactly where its law or code puts it (εcu, εy, …),
   * not to the force tolerance — also the last state before a snap (the fibre at εcu is still on the
   * curve's branch).
   */
  const pinnedAtFibre = (name: EventName, located: Snapshot) => {
    const pin = events.pinOf(name, located.eq);
    return pin ? solver.pinEvent(g[name], pin, located) : located;
  };
  /** Locates event `name` between two bracketing snapshots (a is on the curve already). */
  const locate = (name: EventName, a: Snapshot, b: Snapshot) => {
    const index = snapshots.lastIndexOf(a);
    const free = solver.locate(g[name], a, b, index > 0 ? snapshots[index - 1]! : undefined);
    const pinned = typeof free === 'string' ? free : pinnedAtFibre(name, free);
    // Where the free search loses the path just before an element's limit (the path snaps right
    // after it), the limit is solved with the element's strain pinned there.
    if (name !== 'elementLimit' || (typeof pinned !== 'string' && !pinned.jumped)) return pinned;
    return solver.locateElementLimit(limitedElements, a, b.kappa) ?? free;
  };

  /**
   * True when event `name` is clearly not yet reached at a located state (its function below −1e-3,
   * a thousand times the nearness at which two events count as one): the event lies beyond it. A
   * state at a snap of the path (`jumped`) decides nothing — events jump there together.
   */
  const after = (name: EventName, snap: Snapshot) => !snap.jumped && g[name](snap.eq) < -1e-3;

  // --- march --------------------------------------------------------------------------------------
  const keyAt: Partial<Record<KeyPointName, Snapshot>> = {};
  let status: CurveStatus | undefined;
  let ultimateCause: UltimateCause | undefined;

  const start = solver.solve(0);
  if (typeof start === 'string') {
    return emptyResult(direction, start, solver.solves, limits);
  }
  snapshots.push({ kappa: 0, eq: start });
  let previous = snapshots[0]!;
  let previousG = evaluateAll(previous.eq);
  if (ULTIMATE_EVENTS.some((n) => enabled[n] && previousG[n] >= 0)) {
    return emptyResult(direction, 'the section is already at a limit state under the axial force alone', solver.solves, limits);
  }

  const referenceStrain = Math.max(0.002, ...steelInTension.map((e) => e.material.yieldStrain!));
  const baseStep = referenceStrain / (12 * model.height);

  for (let step = 0; step < maxSteps && !status; step++) {
    const kappa = previous.kappa + (drop.yielded ? Math.max(baseStep, growth * previous.kappa) : baseStep);
    // Start from the strain extrapolated along the last two points.
    const before = snapshots.length > 1 ? snapshots[snapshots.length - 2]! : undefined;
    if (before && previous.kappa > before.kappa) {
      const linear = previous.eq.referenceStrain + ((previous.eq.referenceStrain - before.eq.referenceStrain) * (kappa - previous.kappa)) / (previous.kappa - before.kappa);
      const earlier = snapshots.length > 2 ? snapshots[snapshots.length - 3]! : undefined;
      const quadratic = earlier && before.kappa > earlier.kappa ? parabolaAt(earlier, before, previous, kappa) : NaN;
      solver.lastGuess = Number.isFinite(quadratic) && Math.abs(quadratic - linear) <= Math.abs(linear - previous.eq.referenceStrain) ? quadratic : linear;
    }
    let eq = solver.solve(kappa);
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
        solver.lastGuess = (best ?? previous.eq).referenceStrain;
        const s = solver.solve(mid);
        if (typeof s === 'string') {
          hi = mid;
          reason = s;
        } else {
          lo = mid;
          best = s;
        }
        if (hi - lo <= 1e-9 * hi) break;
      }
      let atLimit = best ? ULTIMATE_EVENTS.find((n) => enabled[n] && n !== 'momentDrop' && g[n](best!) > -1e-6) : undefined;
      if (!atLimit) {
        // The free search may lose the path just short of an element's limit (nothing carries the
        // tension after it): solve the limit with its strain pinned.
        const pinned = solver.locateElementLimit(limitedElements, previous, kappa);
        if (pinned) {
          best = pinned.eq;
          lo = pinned.kappa;
          atLimit = 'elementLimit';
        }
      }
      if (!best || !atLimit) {
        status = { kind: 'not-converged', atCurvature: hi, message: phrase`Analysis stopped at φ = ${q('curvature', hi)}: ${reason}. The curve ends at the last converged point.` };
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
    let unlocated: string | undefined;
    for (const n of forcedLimit ? [] : ULTIMATE_EVENTS) {
      if (!enabled[n] || !(previousG[n] < 0 && currentG[n] >= 0)) continue;
      // Clearly not yet reached at a limit already located in this step (found on the curve's own
      // branch, not at a snap): it comes later and cannot be the earliest — no search needed.
      if (ultimate && after(n, ultimate.snap)) continue;
      const located = locate(n, previous, current);
      if (typeof located === 'string') {
        // Another limit in the same step may still be located (e.g. the moment drop that follows a
        // bar's rupture cannot be, because nothing is carried after it); only when none is does
        // the curve stop unconverged.
        unlocated ??= located;
        continue;
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
      // A jumped location is only the last state the free search held before the path snapped; an
      // element limit solved exactly on the curve's own branch (locateElementLimit) is where it snaps.
      const exactLimit = (s: Snapshot, m: EventName) => m === 'elementLimit' && !s.jumped;
      const better = !ultimate
        || (exactLimit(located, n) && ultimate.snap.jumped)
        || (!(exactLimit(ultimate.snap, ultimate.name) && located.jumped) && (coincide ? ultimate.name === 'momentDrop' && name !== 'momentDrop' : located.kappa < ultimate.snap.kappa));
      if (better) ultimate = { name, snap: located };
    }
    if (!ultimate && unlocated) {
      status = { kind: 'not-converged', atCurvature: kappa, message: phrase`Could not locate the limit state between φ = ${q('curvature', previous.kappa)} and ${q('curvature', kappa)}: ${unlocated}` };
      break;
    }
    const end = ultimate ? ultimate.snap.kappa : kappa;

    // Key events inside this step (before ultimate, if any), in order of curvature.
    const found: { name: KeyPointName; snap: Snapshot }[] = [];
    for (const n of KEY_EVENTS) {
      if (!enabled[n] || keyAt[n as KeyPointName] || !(previousG[n] < 0 && currentG[n] >= 0)) continue;
      // A key event clearly not yet reached at the ultimate is beyond the curve's end.
      if (ultimate && after(n, ultimate.snap)) continue;
      const located = locate(n, previous, current);
      if (typeof located === 'string') {
        warnings.push(`The ${n} point could not be located exactly: ${located}`);
        continue;
      }
      if (located.kappa <= end) found.push({ name: n as KeyPointName, snap: located });
      // A key event reached at the ultimate itself (the code's crushing strain is the concrete's
      // ultimate strain): its root lands a rounding error either side of the ultimate's, so it is
      // the ultimate's state, whichever side (before, which side decided whether the curve had a
      // code crushing point at all).
      else if (ultimate && located.kappa <= end * (1 + COINCIDENT)) found.push({ name: n as KeyPointName, snap: ultimate.snap });
    }
    // The same where the event function has not quite crossed at the ultimate's state.
    if (ultimate) {
      for (const n of KEY_EVENTS) {
        if (enabled[n] && !keyAt[n as KeyPointName] && !found.some((f) => f.name === n) && previousG[n] < 0 && g[n](ultimate.snap.eq) >= -COINCIDENT) {
          found.push({ name: n as KeyPointName, snap: ultimate.snap });
        }
      }
    }
    found.sort((p, q) => p.snap.kappa - q.snap.kappa);
    for (const f of found) {
      keyAt[f.name] = f.snap;
      if (f.snap !== ultimate?.snap) snapshots.push(f.snap);
      if (f.name === 'firstYield') {
        drop.yielded = true;
        drop.dropReference = Math.max(drop.dropReference, sign * f.snap.eq.moment);
      }
    }
    if (ultimate) {
      snapshots.push(ultimate.snap);
      keyAt.ultimate = ultimate.snap;
      ultimateCause = events.causeOf(ultimate.name, ultimate.snap.eq);
      status = { kind: 'complete', ultimateCause, message: ultimateMessage(ultimateCause) };
      break;
    }
    snapshots.push(current);
    if (drop.yielded) drop.dropReference = Math.max(drop.dropReference, sign * eq.moment);
    previous = current;
    // Re-evaluate: the moment-drop event depends on the running peak.
    previousG = evaluateAll(eq);
    solver.lastGuess = eq.referenceStrain;
  }
  if (!status) {
    status = { kind: 'not-converged', atCurvature: previous.kappa, message: phrase`No limit state was reached within ${maxSteps} curvature steps (φ = ${q('curvature', previous.kappa)}).` };
  }

  snapshots.sort((p, q) => p.kappa - q.kappa);
  const sampled = refineByChord(snapshots, solver);
  keyAt.peak = peakSnapshot(sampled, sign, solver);
  return curveResult(model, direction, { status, ultimateCause, limits, points: sampled, keyAt, governing: events.governing, warnings, bilinearMethod: options.bilinearMethod ?? 'priestley-2007', solves: solver.solves });
}

/** The curve's result from its sampled states and key points, with the warnings an engineer must see. */
function curveResult(
  model: SectionModel,
  direction: BendingDirection,
  c: {
    status: CurveStatus;
    ultimateCause: UltimateCause | undefined;
    limits: ConcreteStrainLimits;
    points: readonly Snapshot[];
    keyAt: Partial<Record<KeyPointName, Snapshot>>;
    governing: readonly ConcretePart[];
    warnings: string[];
    bilinearMethod: BilinearMethod;
    solves: number;
  },
): MomentCurvatureResult {
  const { status, ultimateCause, keyAt, warnings, limits } = c;
  const points: CurvePoint[] = c.points.map((s) => curvePointOf(model, direction, s.eq.curvature, s.eq.referenceStrain, s.eq.moment, s.eq.residual));
  const keyPoints: Partial<Record<KeyPointName, KeyPoint>> = {};
  for (const [name, snap] of Object.entries(keyAt) as [KeyPointName, Snapshot][]) {
    const state = sectionState(model, direction, snap.eq.curvature, snap.eq.referenceStrain, snap.eq.moment, snap.eq.residual);
    keyPoints[name] = { ...state.point, name, description: describeKeyPoint(name, ultimateCause, limits), state };
  }

  const fy = keyPoints.firstYield;
  const cracking = keyPoints.cracking;
  if (!fy && status.kind === 'complete') {
    warnings.push('The tension steel does not yield before ultimate: the section is over-reinforced and fails by crushing of the concrete without warning.');
  }
  if (fy) {
    const comp = c.governing[0] ?? model.concreteParts[0]!;
    if (fy.compressionFaceStrain > comp.material.peakStrain) {
      warnings.push(`At first yield the extreme concrete strain (${(fy.compressionFaceStrain * 1000).toFixed(2)} ‰) is already past the peak of the concrete curve (${(comp.material.peakStrain * 1000).toFixed(2)} ‰): the elastic first-yield relations do not apply.`);
    }
  }
  const strength = status.kind === 'complete' ? crackingStrength({ points, keyPoints }) : null;
  if (strength?.failsAsItCracks) {
    warnings.push(`The section carries no more once ${strength.yields ? 'its tension steel yields' : 'it is cracked'} than the largest moment before: the reinforcement is below the minimum and the section fails suddenly at cracking.`);
  } else if (cracking && fy && fy.moment < cracking.moment) {
    warnings.push('The moment at first yield is below the cracking moment: light reinforcement, the section yields as soon as it cracks.');
  }

  const bilinear = keyPoints.firstYield && keyPoints.ultimate ? idealise(points, keyPoints, c.bilinearMethod) : undefined;
  const ultimateCurvature = keyPoints.ultimate?.curvature;
  const finite = (x: number) => (Number.isFinite(x) ? x : null);
  return {
    direction,
    status,
    concreteLimits: limits,
    points,
    keyPoints,
    ...(bilinear ? { bilinear } : {}),
    curvatureDuctility: bilinear && ultimateCurvature ? finite(ultimateCurvature / bilinear.yieldCurvature) : null,
    firstYieldCurvatureDuctility: keyPoints.firstYield && ultimateCurvature ? finite(ultimateCurvature / keyPoints.firstYield.curvature) : null,
    warnings,
    solves: c.solves,
  };
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

/** A strain in per mille for descriptions: 0.003 → "3.00 ‰". */
function permille(strain: number): string {
  return `${(strain * 1000).toFixed(2)} ‰`;
}

function describeKeyPoint(name: KeyPointName, cause: UltimateCause | undefined, limits: ConcreteStrainLimits): string {
  const code = `${permille(limits.codeCrushingStrain)}${limits.codeCrushingSource ? `, ${limits.codeCrushingSource}` : ''}`;
  const u = limits.ultimateStrain;
  const ultimate = u ? `εcu = ${permille(u.value)} (${ultimateStrainWords(u)})` : undefined;
  switch (name) {
    case 'cracking': return 'extreme tension fibre reaches the tensile strength of the concrete';
    case 'firstYield': return 'outermost tension steel reaches its yield strain';
    case 'codeCrushing': return `extreme compression fibre reaches the code crushing strain (${code})`;
    case 'nominal': return `nominal point: εc = ${NOMINAL_CONCRETE_STRAIN} or εs = ${NOMINAL_STEEL_STRAIN}, whichever first`;
    case 'peak': return 'largest moment on the curve';
    case 'ultimate': {
      if (!cause) return 'end of the curve';
      if ((cause === 'concrete-crushing' || cause === 'core-crushing') && ultimate) {
        return cause === 'core-crushing' ? `the confined core reaches its ultimate strain ${ultimate}` : `the extreme concrete fibre reaches its ultimate strain ${ultimate}`;
      }
      const words = ultimateMessage(cause).replace('Ultimate: ', '').replace(/\.$/, '');
      return ultimate ? `${words} before the concrete reaches ${ultimate}` : words;
    }
  }
}

/** The strain limits of a curve: the code crushing point, and the ultimate strain of the concrete that governs crushing. */
function concreteLimits(model: SectionModel, direction: BendingDirection, options: MomentCurvatureOptions): ConcreteStrainLimits {
  const governing = model.concreteParts.filter((p) => p.governsCrushing);
  // The governing part nearest the compression face decides (a topping or jacket over the substrate).
  const nearest = governing.reduce<ConcretePart | undefined>((best, p) => (!best || (direction === 'sagging' ? p.top < best.top : p.bottom > best.bottom) ? p : best), undefined);
  const material = nearest?.material;
  const ultimateStrain = material ? (material.ultimateStrain ?? { value: material.crushingStrain, basis: 'law' as const, source: material.label }) : null;
  return { codeCrushingStrain: options.codeCrushingStrain, codeCrushingSource: options.codeCrushingSource ?? '', ultimateStrain };
}

function emptyResult(direction: BendingDirection, reason: string, solves: number, concreteLimits: ConcreteStrainLimits): MomentCurvatureResult {
  return {
    direction,
    concreteLimits,
    status: { kind: 'not-converged', atCurvature: 0, message: `No equilibrium at zero curvature: ${reason}.` },
    points: [],
    keyPoints: {},
    curvatureDuctility: null,
    firstYieldCurvatureDuctility: null,
    warnings: [],
    solves,
  };
}
