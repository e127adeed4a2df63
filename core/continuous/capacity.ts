/**
 * A continuous beam to failure: curvature from each zone's own sagging and hogging laws integrated
 * along the whole beam, redundants found by compatibility (Newton with the exact tangent), plastic
 * hinges forming one after another at the supports, in the spans and at changes of section, under
 * a load factor λ on a chosen load pattern — until the hinges' rotation capacity is used up or the
 * load falls past a mechanism.
 *
 * Control: the load factor cannot pass a mechanism, so the march prescribes the pattern's
 * work-conjugate deflection D = (1/P)·∫ M̄·φ dx + Σ θp·M̄(xh) (M̄ the released moment of the pattern,
 * P its total load) — the load-weighted mean deflection, which grows through any mechanism of the
 * loaded beam — and λ is an unknown. Units: mm, N, N·mm, rad, 1/mm.
 */
import type { HingeLengthMethod } from '../member/definition.ts';
export type { HingeSiteKind } from './hinge-sites.ts';
import type { Text } from '../units/phrase.ts';
import type { ContinuousBeamDefinition } from './definition.ts';
import { layoutOf, partName, type LoadsByPart } from './layout.ts';
import { distributedLaw, hingeLaw, type ZoneLaws } from './laws.ts';
import { asActive, hingeSites, mechanismParts, sagMaximum, siteHingeLength, siteMoment, siteMoments, siteWords, type HingeSiteKind, type Site } from './hinge-sites.ts';
import { buildMesh, loadPoints, releasedField, type BeamMesh } from './model.ts';
import { deflections, evaluate, supportRows, type ActiveHinge, type DistributedLaw, type Evaluation, type StructureState, type SupportRow } from './structure.ts';
import { linearLaw } from './elastic.ts';
import { newton, type Scales } from './newton.ts';
import { differBeyondRounding } from '../numeric/ties.ts';

/** Hinges whose first yield falls within this fraction of one load step of each other formed together. */
const SAME_CROSSING = 1e-7;

export interface CapacityInput {
  readonly definition: ContinuousBeamDefinition;
  readonly zones: readonly ZoneLaws[];
  /** Loads held constant (dead loads for a live-only pattern) and the loads multiplied by λ. */
  readonly held: LoadsByPart;
  readonly pattern: LoadsByPart;
  readonly hingeLengthMethod: HingeLengthMethod;
  readonly userHingeLength?: number;
  /** Control point, mm from the left end; default: the largest elastic deflection under the pattern. */
  readonly controlPosition?: number;
  /** Equal divisions of each span (default 40). */
  readonly segmentsPerSpan?: number;
}

export interface CapacityPoint {
  readonly loadFactor: number;
  /** Total load of the pattern at this level, N. */
  readonly totalLoad: number;
  /** Deflection at the control point, mm, downward positive. */
  readonly deflection: number;
  /** Work-conjugate (load-weighted mean) deflection of the pattern, mm. */
  readonly meanDeflection: number;
}

export interface CapacityHinge {
  /** Order of formation, 1 for the first. */
  readonly order: number;
  readonly kind: HingeSiteKind;
  /** Global position, mm from the left end, and the part it lies in. */
  readonly position: number;
  readonly part: string;
  readonly direction: 'sagging' | 'hogging';
  readonly sectionId: string;
  /** Load factor and control deflection (mm) when the hinge section reached first yield. */
  readonly loadFactor: number;
  readonly deflection: number;
  readonly length: number;
  readonly lengthMethod: HingeLengthMethod;
  readonly lengthFormula: Text;
  readonly shearSpans: readonly number[];
  /** Plastic rotation capacity θpu = Lp·(φu − φ′y·Mu/M′y), rad (Park & Paulay 1975 §6.4 form θp = (φu − φy)·Lp, from memory). */
  readonly rotationCapacity: number;
  /** Plastic rotation at the end of the analysis (demand), rad, and demand/capacity. */
  readonly rotation: number;
  readonly demandRatio: number | null;
  /** Hinge moment at the end and the section's peak moment, N·mm (magnitudes). */
  readonly moment: number;
  readonly peakMoment: number;
}

export type CapacityEventKind = 'hinge' | 'peak' | 'mechanism' | 'ultimate' | 'not-converged';

export interface CapacityEvent {
  readonly kind: CapacityEventKind;
  readonly loadFactor: number;
  readonly deflection: number;
  readonly position: number;
  readonly description: string;
}

/** Moment, curvature and deflection along the beam at one load level. */
export interface BeamDistribution {
  readonly label: string;
  readonly loadFactor: number;
  readonly x: readonly number[];
  readonly moment: readonly number[];
  readonly curvature: readonly number[];
  readonly deflection: readonly number[];
}

export interface CapacityResult {
  readonly converged: boolean;
  readonly controlPosition: number;
  readonly controlPart: string;
  readonly patternTotal: number;
  readonly points: readonly CapacityPoint[];
  readonly events: readonly CapacityEvent[];
  readonly hinges: readonly CapacityHinge[];
  readonly peakLoadFactor: number;
  /** Where the curve ends: by rotation capacity, a fall of load past a mechanism, or the analysis limit. */
  readonly ultimate: { readonly loadFactor: number; readonly deflection: number } | null;
  readonly failureCause: string;
  /** Support moments (N·mm) of the non-linear analysis at the peak load, with the load factor. */
  readonly peakState: { readonly loadFactor: number; readonly moment: readonly number[]; readonly x: readonly number[]; readonly part: readonly number[] };
  readonly yieldDeflection: number | null;
  readonly ultimateDeflection: number | null;
  readonly displacementDuctility: number | null;
  readonly distributions: readonly BeamDistribution[];
  readonly warnings: readonly string[];
}

const STEP_LIMIT = 400;

/** Statically admissible and compatible state under the held loads alone (λ = 0) or a fixed λ. */
function solveFixed(mesh: BeamMesh, rows: readonly SupportRow[], law: DistributedLaw, fields: { held: Float64Array; pattern: Float64Array }, total: number, hinges: readonly ActiveHinge[], state: StructureState, scales: Scales): boolean {
  return newton(mesh, rows, law, fields, total, hinges, state, undefined, scales).converged;
}

/** Nominal yield deflection by the secant through 75 % of the largest load (Park 1988, from memory). */
export function secantYieldDeflection(points: readonly { readonly loadFactor: number; readonly deflection: number }[]): number | null {
  if (points.length < 2) return null;
  const peak = Math.max(...points.map((p) => p.loadFactor));
  const target = 0.75 * peak;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1]!;
    const b = points[i]!;
    if (a.loadFactor <= target && b.loadFactor >= target && b.loadFactor > a.loadFactor) {
      const d = a.deflection + ((target - a.loadFactor) / (b.loadFactor - a.loadFactor)) * (b.deflection - a.deflection);
      return d / 0.75;
    }
  }
  return null;
}

/** The load–deflection curve of a continuous beam to failure. */
export function capacityAnalysis(input: CapacityInput): CapacityResult {
  const { definition: def, zones } = input;
  const layout = layoutOf(def);
  const points = loadPoints(input.pattern).map((p, i) => [...p, ...loadPoints(input.held)[i]!]);
  // Control point: largest elastic (initial-stiffness) deflection under the pattern unless given.
  const initialStiffness = zones.map((z) => 0.5 * (z.sagging.moment[1]! / z.sagging.curvature[1]! + z.hogging.moment[1]! / z.hogging.curvature[1]!));
  const segments = input.segmentsPerSpan ?? 40;
  const probeMesh = buildMesh(layout, def.zones, points, segments);
  const rows = supportRows(layout.spanPart.length, def.supports);
  const probeField = releasedField(probeMesh, input.pattern);
  const probeState: StructureState = { redundants: new Float64Array(2 * layout.spanPart.length), kappa: new Float64Array(0), lambda: 1 };
  const elasticScales: Scales = { moment: 1e6, rotation: 1e-3, deflection: 1, lambda: 1, curvature: [] };
  solveFixed(probeMesh, rows, linearLaw(initialStiffness), { held: new Float64Array(probeField.moment.length), pattern: probeField.moment }, probeField.total, [], probeState, elasticScales);
  const probeEval = evaluate(probeMesh, rows, linearLaw(initialStiffness), { held: new Float64Array(probeField.moment.length), pattern: probeField.moment }, probeField.total, [], probeState).evaluation;
  const probeDefl = deflections(probeMesh, probeEval, []);
  let controlX = input.controlPosition ?? 0;
  if (input.controlPosition === undefined) {
    let best = -Infinity;
    probeDefl.forEach((v, q) => {
      if (v > best) {
        best = v;
        controlX = probeMesh.sampleX[q]!;
      }
    });
    controlX = Math.round(controlX);
  }
  const controlPartIndex = Math.max(layout.parts.findIndex((p) => controlX >= p.from - 1e-6 && controlX <= p.to + 1e-6), 0);
  const controlPart = layout.parts[controlPartIndex]!;
  const withControl = points.map((p, i) => (i === controlPartIndex ? [...p, controlX - controlPart.from] : p));
  const mesh = buildMesh(layout, def.zones, withControl, segments);
  const heldField = releasedField(mesh, input.held);
  const patternField = releasedField(mesh, input.pattern);
  const fields = { held: heldField.moment, pattern: patternField.moment };
  const total = patternField.total;
  const law = distributedLaw(zones);
  const controlSample = (() => {
    let best = 0;
    for (let q = 0; q < mesh.sampleX.length; q++) if (mesh.samplePart[q] === controlPartIndex && Math.abs(mesh.sampleX[q]! - controlX) < Math.abs(mesh.sampleX[best]! - controlX)) best = q;
    return best;
  })();

  const warnings: string[] = [];
  const sites = hingeSites(def, layout, zones);
  for (const site of sites) siteMoments(mesh, site, input.held, input.pattern, { held: heldField, pattern: patternField });

  // Scales from the first-yield estimate of a secant-stiffness elastic analysis.
  const secant = zones.map((z) => 0.5 * (z.sagging.firstYieldMoment / z.sagging.firstYieldCurvature + z.hogging.firstYieldMoment / z.hogging.firstYieldCurvature));
  const secState: StructureState = { redundants: new Float64Array(2 * layout.spanPart.length), kappa: new Float64Array(0), lambda: 1 };
  solveFixed(mesh, rows, linearLaw(secant), { held: new Float64Array(fields.held.length), pattern: fields.pattern }, total, [], secState, elasticScales);
  const secEval = evaluate(mesh, rows, linearLaw(secant), { held: new Float64Array(fields.held.length), pattern: fields.pattern }, total, [], secState).evaluation;
  let yieldLambda = Infinity;
  secEval.moment.forEach((m, q) => {
    const zl = zones[mesh.sampleZone[q]!]!;
    const my = m >= 0 ? zl.sagging.firstYieldMoment : zl.hogging.firstYieldMoment;
    if (Math.abs(m) > 0) yieldLambda = Math.min(yieldLambda, my / Math.abs(m));
  });
  if (!Number.isFinite(yieldLambda)) yieldLambda = 1;
  const yieldWork = Math.max(yieldLambda * secEval.work, 1e-6);
  const momentScale = Math.max(...zones.flatMap((z) => [z.sagging.peakMoment, z.hogging.peakMoment]));
  const meanSpan = layout.supportX[layout.supportX.length - 1]! / Math.max(layout.spanPart.length, 1);
  const scales = (active: readonly Site[]): Scales => ({
    moment: momentScale,
    rotation: (momentScale * meanSpan) / Math.max(...secant),
    deflection: yieldWork,
    lambda: yieldLambda,
    curvature: active.map((s) => (s.sign > 0 ? s.laws.sagging : s.laws.hogging).firstYieldCurvature),
  });

  // State under the held loads (λ = 0).
  const state: StructureState = { redundants: new Float64Array(2 * layout.spanPart.length), kappa: new Float64Array(0), lambda: 0 };
  const active: Site[] = [];
  let hinges: ActiveHinge[] = [];
  let kappa: number[] = [];
  const current = (): StructureState => ({ redundants: Float64Array.from(state.redundants), kappa: Float64Array.from(kappa), lambda: state.lambda });
  if (sites.length > 0 && fields.held.some((v) => v !== 0)) {
    const s0 = current();
    if (!solveFixed(mesh, rows, law, fields, total, [], s0, scales([]))) warnings.push('The held (dead) loads alone found no equilibrium; the analysis starts from zero.');
    state.lambda = 0;
  }
  const evalState = (s: StructureState): Evaluation => evaluate(mesh, rows, law, fields, total, hinges, s).evaluation;
  const out: CapacityPoint[] = [];
  const events: CapacityEvent[] = [];
  const distributions: BeamDistribution[] = [];
  const first = evalState(current());
  const record = (s: StructureState, ev: Evaluation) => {
    const defl = deflections(mesh, ev, active.map((a) => ({ part: a.part, s: a.s })));
    return { defl, point: { loadFactor: s.lambda, totalLoad: s.lambda * total, deflection: defl[controlSample]!, meanDeflection: ev.work } };
  };
  let last = record(current(), first);
  out.push(last.point);
  const snapshot = (label: string, s: StructureState, ev: Evaluation, defl: Float64Array) => {
    const q = stationSamples(mesh);
    distributions.push({ label, loadFactor: s.lambda, x: q.map((i) => mesh.sampleX[i]!), moment: q.map((i) => ev.moment[i]!), curvature: q.map((i) => ev.curvature[i]!), deflection: q.map((i) => defl[i]!) });
  };

  let step = yieldWork / 10;
  let target = first.work;
  let previous = { x: Float64Array.from(state.redundants), k: [...kappa], l: state.lambda, d: first.work };
  let previousRotations = Float64Array.from(first.hingeRotations);
  let finalRotations: Float64Array | null = null;
  let older = previous;
  let peakLambda = state.lambda;
  let peak = { state: { x: Float64Array.from(state.redundants), l: state.lambda }, moment: first.moment };
  let initialSlope = 0;
  let mechanismSeen = false;
  let failureCause = '';
  let ultimate: { loadFactor: number; deflection: number } | null = null;
  let converged = true;
  let order = 0;

  for (let iteration = 0; iteration < STEP_LIMIT; iteration++) {
    target = previous.d + step;
    // Predictor: extrapolate the last step.
    const ratio = previous.d !== older.d ? step / (previous.d - older.d) : 0;
    state.redundants.set(previous.x.map((v, i) => v + (v - older.x[i]!) * ratio));
    kappa = previous.k.map((v, i) => v + (v - (older.k[i] ?? v)) * ratio);
    state.lambda = previous.l + (previous.l - older.l) * ratio;
    if (iteration === 0) state.lambda = (yieldLambda * step) / yieldWork;
    const trial = current();
    const result = newton(mesh, rows, law, fields, total, hinges, trial, { target }, scales(active));
    if (!result.converged) {
      state.redundants.set(previous.x);
      kappa = [...previous.k];
      state.lambda = previous.l;
      if (step > yieldWork * 1e-4) {
        step /= 2;
        continue;
      }
      // Past the peak load of a mechanism the load cannot rise and two mechanisms of equal strength
      // (a symmetric beam) leave the tangent singular: the collapse load has been found.
      // Hinges at 90 % of their strength or more: the load could rise a little further as they
      // harden to their peak, so taking the largest load reached is on the safe side.
      const collapsed = mechanismParts(def, layout, mesh, active, { redundants: previous.x, kappa: Float64Array.from(previous.k), lambda: previous.l }, 0.9);
      if (collapsed.length > 0 && peakLambda > 0) {
        failureCause = `collapse mechanism of ${collapsed.map((p) => partName(layout.parts[p]!)).join(' and ')} (hinges at 90 % of their strength or more; no equilibrium beyond load factor ${peakLambda.toFixed(3)}, taken as the collapse load)`;
        ultimate = { loadFactor: previous.l, deflection: last.point.deflection };
        events.push({ kind: 'ultimate', loadFactor: previous.l, deflection: last.point.deflection, position: controlX, description: failureCause });
        break;
      }
      converged = false;
      const where = active.length > 0 ? ` after ${active.length} hinge${active.length > 1 ? 's' : ''} (the last at ${Math.round(mesh.layout.parts[active[active.length - 1]!.part]!.from + active[active.length - 1]!.s)} mm)` : '';
      failureCause = `the analysis found no equilibrium beyond load factor ${previous.l.toFixed(3)}${where}: the tangent of the beam became singular (residual ${result.worst.toExponential(1)})`;
      events.push({ kind: 'not-converged', loadFactor: previous.l, deflection: last.point.deflection, position: controlX, description: failureCause });
      break;
    }
    kappa = Array.from(trial.kappa);
    state.lambda = trial.lambda;
    // Hinges that formed in this step: activate and solve the step again.
    const fresh: Site[] = [];
    for (const site of sites) {
      if (site.active) continue;
      const m = siteMoment(mesh, site, trial);
      const dirLaw = m >= 0 ? site.laws.sagging : site.laws.hogging;
      if (Math.abs(m) >= dirLaw.firstYieldMoment) fresh.push(site);
    }
    if (fresh.length > 0) {
      const ev = evalState(trial);
      // Where in the step each hinge reached first yield (0 … 1), so they are numbered in order.
      const crossing = (site: Site) => {
        const m = Math.abs(siteMoment(mesh, site, trial));
        const mPrev = Math.abs(siteMoment(mesh, site, { redundants: previous.x, kappa: new Float64Array(0), lambda: previous.l }));
        const my = (siteMoment(mesh, site, trial) >= 0 ? site.laws.sagging : site.laws.hogging).firstYieldMoment;
        return m !== mPrev ? Math.min(Math.max((my - mPrev) / (m - mPrev), 0), 1) : 1;
      };
      // Twins of a symmetric beam cross at the same point of the step to the last few bits, and
      // which comes first then depends on rounding (it differs between JavaScript engines): within
      // rounding the leftmost is numbered first (as core/numeric/ties.ts does for the largest value).
      const at = new Map(fresh.map((site) => [site, { t: crossing(site), x: mesh.layout.parts[site.part]!.from + site.s }]));
      fresh.sort((a, b) => {
        const ta = at.get(a)!;
        const tb = at.get(b)!;
        return Math.abs(ta.t - tb.t) > SAME_CROSSING ? ta.t - tb.t : ta.x - tb.x;
      });
      for (const site of fresh) {
        const m = siteMoment(mesh, site, trial);
        site.sign = m >= 0 ? 1 : -1;
        const dirLaw = site.sign > 0 ? site.laws.sagging : site.laws.hogging;
        const t = crossing(site);
        const lambdaAt = previous.l + t * (trial.lambda - previous.l);
        const deflAt = last.point.deflection + t * (record(trial, ev).point.deflection - last.point.deflection);
        const lp = siteHingeLength(mesh, site, ev.moment, dirLaw, input);
        site.length = lp.length;
        site.formula = lp.formula;
        site.shearSpans = lp.shearSpans;
        site.law = hingeLaw(dirLaw, lp.length);
        site.active = true;
        site.order = ++order;
        site.formedAt = { loadFactor: lambdaAt, deflection: deflAt };
        const x = mesh.layout.parts[site.part]!.from + site.s;
        events.push({ kind: 'hinge', loadFactor: lambdaAt, deflection: deflAt, position: x, description: `hinge ${site.order} forms (${site.sign > 0 ? 'sagging' : 'hogging'}, ${siteWords(site, mesh.layout)})` });
        active.push(site);
        kappa.push(site.law.curvatureFor(Math.abs(m)));
        if (dirLaw.brittle) {
          failureCause = `brittle failure: the section at ${Math.round(x)} mm (${siteWords(site, mesh.layout)}) has no tension steel in ${site.sign > 0 ? 'sagging' : 'hogging'} and cracks at load factor ${lambdaAt.toFixed(3)}`;
          ultimate = { loadFactor: lambdaAt, deflection: deflAt };
        }
      }
      hinges = active.map((s) => asActive(mesh, s));
      if (ultimate) {
        events.push({ kind: 'ultimate', loadFactor: ultimate.loadFactor, deflection: ultimate.deflection, position: controlX, description: failureCause });
        break;
      }
      // Solve the same step again with the new hinges (their κ start on the curve at the moment reached).
      state.redundants.set(trial.redundants);
      const again = current();
      const r2 = newton(mesh, rows, law, fields, total, hinges, again, { target }, scales(active));
      if (!r2.converged) {
        step /= 2;
        state.redundants.set(previous.x);
        // keep the hinges: the next, smaller step starts from the previous state with them active
        kappa = active.map((s, i) => (i < previous.k.length ? previous.k[i]! : s.law!.curvatureFor(Math.abs(siteMoment(mesh, s, { redundants: previous.x, kappa: new Float64Array(0), lambda: previous.l })))));
        previous = { ...previous, k: [...kappa] };
        older = { ...older, k: [...kappa] };
        continue;
      }
      kappa = Array.from(again.kappa);
      state.lambda = again.lambda;
      state.redundants.set(again.redundants);
    } else {
      state.redundants.set(trial.redundants);
    }
    const s = current();
    const ev = evalState(s);
    const rec = record(s, ev);
    // Rotation capacity: interpolate back to the hinge whose κ passes its ultimate curvature first.
    let limit: { t: number; site: Site } | null = null;
    active.forEach((site, i) => {
      const dirLaw = site.sign > 0 ? site.laws.sagging : site.laws.hogging;
      const k1 = kappa[i]!;
      if (k1 < dirLaw.ultimateCurvature) return;
      const k0 = previous.k[i] ?? dirLaw.firstYieldCurvature;
      const t = k1 > k0 ? Math.min(Math.max((dirLaw.ultimateCurvature - k0) / (k1 - k0), 0), 1) : 1;
      if (!limit || t < limit.t) limit = { t, site };
    });
    if (limit) {
      const { t, site } = limit as { t: number; site: Site };
      const loadFactor = previous.l + t * (state.lambda - previous.l);
      const deflection = last.point.deflection + t * (rec.point.deflection - last.point.deflection);
      ultimate = { loadFactor, deflection };
      if (loadFactor > peakLambda) {
        peakLambda = loadFactor;
        peak = { state: { x: Float64Array.from(state.redundants), l: loadFactor }, moment: ev.moment };
      }
      finalRotations = Float64Array.from(ev.hingeRotations, (r, i) => (previousRotations[i] ?? 0) + t * (r - (previousRotations[i] ?? 0)));
      out.push({ loadFactor, totalLoad: loadFactor * total, deflection, meanDeflection: previous.d + t * (ev.work - previous.d) });
      failureCause = `rotation capacity of hinge ${site.order} reached (${siteWords(site, mesh.layout)}, θpu = ${site.law!.capacity.toFixed(4)} rad)`;
      events.push({ kind: 'ultimate', loadFactor, deflection, position: mesh.layout.parts[site.part]!.from + site.s, description: failureCause });
      snapshot('ultimate', s, ev, rec.defl);
      break;
    }
    out.push(rec.point);
    const slope = (rec.point.loadFactor - last.point.loadFactor) / Math.max(rec.point.meanDeflection - last.point.meanDeflection, 1e-12);
    if (iteration === 0 || initialSlope === 0) initialSlope = slope;
    const collapsed = mechanismSeen ? [] : mechanismParts(def, layout, mesh, active, s);
    if (!mechanismSeen && (collapsed.length > 0 || (active.length > 0 && slope < 0.01 * initialSlope))) {
      mechanismSeen = true;
      const plastic = active.filter((a) => Math.abs(siteMoment(mesh, a, s)) >= 0.95 * (a.sign > 0 ? a.laws.sagging : a.laws.hogging).peakMoment);
      const which = collapsed.length > 0 ? ` of ${collapsed.map((p) => partName(layout.parts[p]!)).join(' and ')}` : '';
      events.push({ kind: 'mechanism', loadFactor: rec.point.loadFactor, deflection: rec.point.deflection, position: controlX, description: `the beam becomes a mechanism${which} (hinges ${(plastic.length > 0 ? plastic : active).map((p) => p.order).join(', ')} at their strength)` });
    }
    if (state.lambda > peakLambda) {
      peakLambda = state.lambda;
      peak = { state: { x: Float64Array.from(state.redundants), l: state.lambda }, moment: ev.moment };
    }
    older = previous;
    previous = { x: Float64Array.from(state.redundants), k: [...kappa], l: state.lambda, d: ev.work };
    previousRotations = Float64Array.from(ev.hingeRotations);
    last = rec;
    if (distributions.length === 0 && active.length > 0) snapshot('first hinge', s, ev, rec.defl);
    if (state.lambda < 0.8 * peakLambda) {
      ultimate = { loadFactor: state.lambda, deflection: rec.point.deflection };
      failureCause = 'the load fell to 80 % of its peak after the mechanism formed';
      events.push({ kind: 'ultimate', loadFactor: state.lambda, deflection: rec.point.deflection, position: controlX, description: failureCause });
      snapshot('ultimate', s, ev, rec.defl);
      break;
    }
    if (ev.work > 200 * yieldWork) {
      ultimate = { loadFactor: state.lambda, deflection: rec.point.deflection };
      failureCause = 'the analysis stopped at 200 times the yield deflection without reaching a rotation limit';
      events.push({ kind: 'ultimate', loadFactor: state.lambda, deflection: rec.point.deflection, position: controlX, description: failureCause });
      break;
    }
    // Span hinges not yet formed follow the moment maximum.
    for (const site of sites) {
      if (site.active || !site.movable) continue;
      const sMax = sagMaximum(mesh, ev.moment, site.part);
      if (sMax !== null) {
        site.s = sMax;
        siteMoments(mesh, site, input.held, input.pattern, { held: heldField, pattern: patternField });
      }
    }
    // Step size: grow while Newton is easy, after the first hinge in steps of up to the yield deflection.
    // Up to the first hinge in about ten steps; after a hinge forms, start again small.
    const most = active.length > 0 ? yieldWork / 2 : yieldWork / 12;
    step = fresh.length > 0 ? yieldWork / 20 : Math.min(result.iterations <= 4 ? step * 1.4 : result.iterations > 12 ? step * 0.5 : step, most);
    if (iteration === STEP_LIMIT - 1) {
      converged = false;
      failureCause = `the analysis stopped after ${STEP_LIMIT} steps at load factor ${state.lambda.toFixed(3)} without reaching a limit`;
    }
  }
  if (peakLambda > 0) {
    const i = out.findIndex((p) => p.loadFactor === peakLambda);
    if (i >= 0) events.push({ kind: 'peak', loadFactor: peakLambda, deflection: out[i]!.deflection, position: controlX, description: 'largest load' });
  }
  const finalState = current();
  const finalEval = evalState(finalState);
  const hingesOut: CapacityHinge[] = active.map((site, i) => {
    const dirLaw = site.sign > 0 ? site.laws.sagging : site.laws.hogging;
    const rotation = Math.abs((finalRotations ?? finalEval.hingeRotations)[i] ?? 0);
    const cap = site.law!.capacity;
    return {
      order: site.order,
      kind: site.kind,
      position: mesh.layout.parts[site.part]!.from + site.s,
      part: partName(mesh.layout.parts[site.part]!),
      direction: site.sign > 0 ? 'sagging' : 'hogging',
      sectionId: site.sign > 0 ? site.laws.sectionId.sagging : site.laws.sectionId.hogging,
      loadFactor: site.formedAt!.loadFactor,
      deflection: site.formedAt!.deflection,
      length: site.length,
      lengthMethod: input.hingeLengthMethod,
      lengthFormula: site.formula,
      shearSpans: site.shearSpans,
      rotationCapacity: cap,
      rotation,
      demandRatio: cap > 0 ? Math.min(rotation / cap, 1e6) : null,
      moment: Math.abs(siteMoment(mesh, site, finalState)),
      peakMoment: dirLaw.peakMoment,
    };
  });
  const yieldDeflection = secantYieldDeflection(out);
  const ultimateDeflection = ultimate ? (ultimate as { deflection: number }).deflection : null;
  const stations = stationSamples(mesh);
  return {
    converged,
    controlPosition: controlX,
    controlPart: partName(controlPart),
    patternTotal: total,
    points: out,
    // In the order of deflection, then load factor; values equal within rounding (twins of a
    // symmetric beam) keep the order they were found in (the sort is stable), hinges by number.
    events: events.sort((a, b) => (differBeyondRounding(a.deflection, b.deflection) ? a.deflection - b.deflection : differBeyondRounding(a.loadFactor, b.loadFactor) ? a.loadFactor - b.loadFactor : 0)),
    hinges: hingesOut,
    peakLoadFactor: peakLambda,
    ultimate,
    failureCause: failureCause || 'no limit reached',
    peakState: { loadFactor: peak.state.l, moment: stations.map((q) => peak.moment[q]!), x: stations.map((q) => mesh.sampleX[q]!), part: stations.map((q) => mesh.samplePart[q]!) },
    yieldDeflection,
    ultimateDeflection,
    displacementDuctility: yieldDeflection && ultimateDeflection && yieldDeflection > 0 ? ultimateDeflection / yieldDeflection : null,
    distributions,
    warnings,
  };
}

/** Segment starts and part ends: the samples shown as stations. */
function stationSamples(mesh: BeamMesh): number[] {
  const out: number[] = [];
  mesh.partSegments.forEach(([first, end]) => {
    for (let k = first; k < end; k++) out.push(mesh.segments[k]!.sample);
    out.push(mesh.segments[end - 1]!.sample + 2);
  });
  return out;
}


