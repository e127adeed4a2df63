/**
 * One beam through the member engine: its sections' moment–curvature curves → the load–deflection
 * curve to ultimate, plastic hinges and ductility → service deflections against their limits.
 * The strength checks and the verdict are core/assessment's. Never throws for bad input or a
 * physical outcome: problems come back in the result.
 */
import type { Diagnostic } from '../diagnostics.ts';
import { BugError } from '../diagnostics.ts';
import { phrase, uniqueTexts, type Text } from '../units/phrase.ts';
import type { CodeBasis } from '../materials/specs.ts';
import type { SectionAnalysis } from '../section/analyze.ts';
import { buildLineModel, type BeamModel, type ZoneResponse } from './beam-model.ts';
import type { BeamDefinition, MemberLoad } from './definition.ts';
import { capacityCurve, type CapacityCurve } from './capacity.ts';
import { peakDeflectionPosition } from './deflection.ts';
import type { LoadingFields, SolverSettings } from './equations.ts';
import { memberLayout } from './layout.ts';
import { solveStatic } from './static.ts';
import type { BeamResult, SectionResult } from './results.ts';
import { serviceDeflections, type ServiceZone } from './service.ts';
import { engineOptions, shiftStations, ULTIMATE_LOAD_FRACTION } from './spread.ts';
import { releasedMoment, toStaticLoad, totalLoad, type StaticLoad } from './statics.ts';
import { memberProportionProblems } from './proportions.ts';
import { serviceOutsideRange, ultimateOutsideRange } from './small-deflection.ts';
import { validateMember } from './validate.ts';
import { elasticZone, zoneResponse } from './zones.ts';

export interface MemberContext {
  readonly code: CodeBasis;
  /** Number of equal segments along the span (the project setting `stations`, default 60). */
  readonly segments: number;
  /** Section analyses by section id (shared between members of a project). */
  section(id: string): SectionAnalysis | undefined;
  readonly sectionIds: ReadonlySet<string>;
  /** Path of the member in the project file, e.g. `members[3] "B-12"`. */
  readonly path: string;
  /** How the load–deflection equations are solved (internal; tests vary it, results must not depend on it). */
  readonly solver?: SolverSettings;
}

/** What the assessment needs from the beam's analysis besides its plain result. */
export interface BeamAnalysis {
  readonly result: BeamResult;
  /** Input problems of the beam or its sections; when any, the result holds no analysis. */
  readonly inputErrors: readonly Diagnostic[];
  /** The load–deflection analysis: null when its load pattern is empty. */
  readonly capacity: {
    /** Load factor at ultimate on the pattern, null when no limit state was reached. */
    readonly ultimateLoadFactor: number | null;
    readonly failureCause: string;
    readonly status: string;
  } | null;
  /** False when the load–deflection analysis or a section's curve stopped before a limit state. */
  readonly converged: boolean;
}

/** The result of a beam that could not be analysed (input errors), keeping the sections that could. */
export function unanalysedBeam(member: BeamDefinition, errors: readonly Diagnostic[], sections: readonly SectionResult[] = []): BeamResult {
  return {
    memberId: member.id,
    memberName: member.name,
    supports: member.supports,
    span: Number.isFinite(member.span) ? member.span : 0,
    sections,
    loadDeflection: { pattern: '', controlPosition: 0, points: [], events: [], status: 'not analysed' },
    ductility: { firstYieldDeflection: null, yieldDeflection: null, ultimateDeflection: null, displacementDuctility: null, hinges: [], failureCause: '' },
    distributions: [],
    service: null,
    warnings: [],
    errors: errors.map((e) => ({ path: e.path, message: e.message })),
  };
}

function invalid(member: BeamDefinition, errors: readonly Diagnostic[], sections: readonly SectionResult[] = []): BeamAnalysis {
  return { result: unanalysedBeam(member, errors, sections), inputErrors: errors, capacity: null, converged: true };
}

/** What a member result shows of one section analysis (null for a section that could not be built). */
export function sectionResult(s: SectionAnalysis): SectionResult | null {
  if (!s.model || !s.elastic) return null;
  return {
    sectionId: s.sectionId,
    sectionName: s.sectionName,
    elastic: s.elastic,
    ...(s.curves.sagging ? { sagging: s.curves.sagging } : {}),
    ...(s.curves.hogging ? { hogging: s.curves.hogging } : {}),
    selfWeight: s.selfWeight,
    warnings: s.warnings,
  };
}

/**
 * Nominal yield deflection of a load–deflection curve: the secant through the point at 75 % of
 * the largest load, extended to the largest load — the "reduced stiffness equivalent
 * elasto-plastic" definition of Park (1988), Ductility evaluation from laboratory and analytical
 * testing, 9th WCEE (from memory). For an elastic–perfectly plastic member it equals the yield
 * deflection; for a redundant beam it reflects the whole member rather than its first hinge.
 */
export function nominalYieldDeflection(points: readonly { totalLoad: number; deflection: number }[]): number | null {
  if (points.length < 2) return null;
  const base = points[0]!;
  let peak = 0;
  for (let i = 1; i < points.length; i++) if (points[i]!.totalLoad > points[peak]!.totalLoad) peak = i;
  const pMax = points[peak]!.totalLoad;
  const target = base.totalLoad + 0.75 * (pMax - base.totalLoad);
  for (let i = 1; i <= peak; i++) {
    const a = points[i - 1]!;
    const b = points[i]!;
    if (a.totalLoad <= target && b.totalLoad >= target && b.totalLoad > a.totalLoad) {
      const d75 = a.deflection + ((b.deflection - a.deflection) * (target - a.totalLoad)) / (b.totalLoad - a.totalLoad);
      const rise = d75 - base.deflection;
      return rise > 0 ? base.deflection + rise / 0.75 : null;
    }
  }
  return null;
}

/**
 * Fewest segments of the load–deflection analysis. The moment is taken linear between stations; on a
 * hardening branch the plastic curvature changes 100–200 times faster than the moment, so under a
 * uniform load the parabola's bulge between stations (w·h²/8) moved the plastic rotations by up to
 * 1 % at 60 segments and 0.1 % at 120 (measured; common practice, no source, to refine until the
 * result stops changing). Service states keep the project's setting.
 */
export const CAPACITY_MIN_SEGMENTS = 120;

/** A displacement ductility beyond this is outside the range the definitions are meant for (common practice, no source). */
export const DUCTILITY_RANGE_LIMIT = 10;

/**
 * The nominal yield deflection of a load–deflection curve and how it was found:
 *  - Park's secant through the state at 75 % of the largest load (Park 1988, from memory), solved
 *    exactly at that load when the analysis could;
 *  - when that load lies below the first-cracking load (a lightly reinforced member, whose curve
 *    climbs to cracking before any yield), the secant through 75 % would be the uncracked stiffness
 *    and Δy meaninglessly small: the secant through first yield of the tension steel, extended to the
 *    largest load, is used instead (the reduced-stiffness definition with the yield point itself,
 *    Park 1988, from memory);
 *  - in a statically determinate member (simply supported, cantilever), when the tension steel
 *    first yields below 75 % of the largest load (strong hardening, or a
 *    flanged section whose moment keeps rising long after yield), the state at 75 % already carries
 *    plastic deformation and its secant is no longer an elastic stiffness (Δy came out 4.5× the
 *    first-yield deflection on such a beam): the secant through first yield, extended to the
 *    largest load, is used — the nominal yield Δy = Δ′y·P/P′y of Priestley, Calvi & Kowalsky 2007
 *    (from memory), which is what Park's secant gives when first yield lies at 75 %.
 * Deflections are measured from the state under the loads held constant (the first point).
 */
export function yieldDeflectionOf(capacity: CapacityCurve, determinate = true): { deflection: number | null; definition: string | null; note: string | null } {
  const points = capacity.points;
  if (points.length < 2 || !capacity.firstYield) return { deflection: null, definition: null, note: null };
  const base = points[0]!;
  const pMax = Math.max(...points.map((p) => p.totalLoad));
  const target = base.totalLoad + 0.75 * (pMax - base.totalLoad);
  const cracking = capacity.cracking;
  const fy = capacity.firstYield;
  const belowCracking = !!cracking && target < cracking.totalLoad;
  // In a redundant member first yield is the first hinge's (at a support, often just after
  // cracking), not the member's: Park's secant there reflects the redistribution that follows.
  const yieldsEarly = determinate && fy.totalLoad < target;
  if (belowCracking || yieldsEarly) {
    const rise = fy.deflection - base.deflection;
    const load = fy.totalLoad - base.totalLoad;
    if (rise > 0 && load > 0) {
      return belowCracking
        ? {
            deflection: base.deflection + (rise * (pMax - base.totalLoad)) / load,
            definition: 'secant through first yield of the tension steel, extended to the largest load (75 % of the largest load lies below the cracking load)',
            note: 'The load at 75 % of the peak lies below the cracking load (a lightly reinforced member): Park\u2019s 75 % secant would be the uncracked stiffness, so the nominal yield deflection is taken on the secant through first yield instead.',
          }
        : {
            deflection: base.deflection + (rise * (pMax - base.totalLoad)) / load,
            definition: 'secant through first yield of the tension steel, extended to the largest load (the steel yields below 75 % of the largest load)',
            note: null,
          };
    }
    return { deflection: null, definition: null, note: null };
  }
  const sp = capacity.secantPoint;
  const deflection = sp && sp.deflection > base.deflection ? base.deflection + (sp.deflection - base.deflection) / 0.75 : nominalYieldDeflection(points);
  return { deflection, definition: deflection === null ? null : 'secant through the state at 75 % of the largest load, extended to the largest load (Park 1988)', note: null };
}

/**
 * Extra stations either side of each change of section (a bar cut-off): within 1.5 segments of the
 * boundary at a quarter of the segment length. A hinge at a cut-off has a short plastic zone in the
 * weaker section, whose plastic curvature rises steeply with the moment; integrated over whole
 * segments its length converged only linearly with the station count (1.2 % between 60 and 400
 * stations on a fixed–fixed beam with top bars cut off), mm.
 */
export function cutOffStations(zones: readonly { from: number; to: number }[], span: number, segments: number): number[] {
  const h = span / segments;
  const out: number[] = [];
  for (let i = 1; i < zones.length; i++) {
    const b = zones[i]!.from;
    for (let k = 1; k <= 6; k++) for (const p of [b - (k * h) / 4, b + (k * h) / 4]) if (p > 0 && p < span) out.push(p);
  }
  return out;
}

export function analyzeBeam(member: BeamDefinition, context: MemberContext): BeamAnalysis {
  const problems = validateMember(member, context.path, context.sectionIds);
  if (problems.length > 0) return invalid(member, problems);
  const span = member.span;
  const layout = memberLayout(member);
  const zoneSections = member.zones.map((z) => context.section(z.sectionId));
  const sectionErrors = zoneSections.flatMap((s, i) => (s ? s.errors : [{ code: 'unknown-reference' as const, path: `${context.path}.zones[${i}].sectionId`, severity: 'error' as const, message: 'section not found' }]));
  const uniqueSections = [...new Map(zoneSections.filter((s): s is SectionAnalysis => !!s).map((s) => [s.sectionId, s])).values()];
  const sections = uniqueSections.map(sectionResult).filter((s): s is SectionResult => s !== null);
  if (sectionErrors.length > 0) return invalid(member, sectionErrors, sections);
  // A deep beam is outside beam theory (proportions.ts).
  const deep = memberProportionProblems(member, context.path, context.code, (id) => context.section(id)?.model?.height);
  if (deep.length > 0) return invalid(member, deep, sections);
  const analyses = zoneSections as SectionAnalysis[];
  const warnings: Text[] = uniqueTexts(uniqueSections.flatMap((s) => s.warnings.map((w) => phrase`Section "${s.sectionName}": ${w}`)));

  // --- loads ------------------------------------------------------------------------------------
  const includeSelfWeight = member.includeSelfWeight ?? true;
  const selfWeight: StaticLoad[] = includeSelfWeight ? member.zones.map((z, i) => ({ kind: 'uniform', w: analyses[i]!.selfWeight, from: z.from, to: z.to })) : [];
  const byCase = (cases: MemberLoad['loadCase'][], factor = 1) => member.loads.filter((l) => cases.includes(l.loadCase)).map((l) => toStaticLoad(l, span, factor));
  const deadLoads = [...selfWeight, ...byCase(['dead', 'superimposed'])];
  const liveLoads = byCase(['live']);
  const extraPoints = member.loads.flatMap((l) => (l.kind === 'point' ? [l.position] : [l.from ?? 0, l.to ?? span]));

  // --- capacity ---------------------------------------------------------------------------------
  const responses: ZoneResponse[] = member.zones.map((z, i) => {
    const s = analyses[i]!;
    return zoneResponse(z.sectionId, z.from, z.to, s.model!, s.elastic!, s.curves);
  });
  const fieldOf = (b: BeamModel, loads: readonly StaticLoad[]) => Float64Array.from(b.x, (x) => releasedMoment(member.supports, span, loads, x));
  const proportional = member.capacity.pattern === 'proportional';
  const patternLoads = proportional ? [...deadLoads, ...liveLoads] : liveLoads;
  const constantLoads = proportional ? [] : deadLoads;
  // Control point of the load–deflection curve: where the elastic deflection under the pattern
  // peaks, found on a fine elastic model and made a station of the analysis model.
  const elasticResponses: ZoneResponse[] = member.zones.map((z, i) => elasticZone(z.sectionId, z.from, z.to, analyses[i]!.codeModulus * analyses[i]!.elastic!.grossInertia));
  const probeBeam = buildLineModel(layout, elasticResponses, extraPoints, 240);
  const probe = solveStatic(probeBeam, fieldOf(probeBeam, patternLoads.length > 0 ? patternLoads : deadLoads));
  const controlAt = Math.round(peakDeflectionPosition(probeBeam.x, probe.deflection) * 10) / 10;
  const tips = [...member.loads.filter((l) => l.kind === 'point').map((l) => (l as { position: number }).position), ...layout.supports.map((s) => s.x)];
  const segments = Math.max(context.segments, CAPACITY_MIN_SEGMENTS);
  const beam = buildLineModel(layout, responses, [...extraPoints, controlAt, ...shiftStations(member.capacity, responses, tips, span), ...cutOffStations(member.zones, span, segments)], segments);
  const loading: LoadingFields = {
    constant: fieldOf(beam, constantLoads),
    pattern: fieldOf(beam, patternLoads),
    constantTotal: totalLoad(constantLoads),
    patternTotal: totalLoad(patternLoads),
  };
  const capacity = totalLoad(patternLoads) > 0
    ? capacityCurve(beam, loading, member.capacity, controlAt, context.solver ? { ...engineOptions(beam, member.capacity), solver: context.solver } : undefined)
    : null;
  if (!capacity) warnings.push('The load pattern for the load–deflection curve is empty (no live load for a live-only pattern): no capacity curve.');
  for (const loose of capacity?.looseEvents ?? []) {
    warnings.push(`An event of the load–deflection curve could not be located closely (the equilibrium could not be solved between the last steps): it is placed at ${loose.at.toPrecision(6)} (load factor, or hinge rotation past the peak) and lies up to ${loose.width.toPrecision(2)} before it.`);
  }
  if (capacity && capacity.hinges.some((h) => h.localised && h.length < 5)) {
    warnings.push('A plastic hinge length is practically zero by the chosen expression (e.g. Priestley et al. inside the span with fu = fy): the descending branch of its section drops at once. Consider another hinge-length method.');
  }

  // --- ductility ----------------------------------------------------------------------------------
  let firstYieldDeflection: number | null = null;
  let yieldDeflection: number | null = null;
  let ultimateDeflection: number | null = null;
  let displacementDuctility: number | null = null;
  let yieldDefinition: string | null = null;
  if (capacity?.firstYield && capacity.ultimate) {
    firstYieldDeflection = capacity.firstYield.deflection;
    const y = yieldDeflectionOf(capacity, member.supports === 'simply-supported' || member.supports === 'cantilever');
    yieldDeflection = y.deflection;
    yieldDefinition = y.definition;
    if (y.note) warnings.push(y.note);
    ultimateDeflection = capacity.ultimate.deflection;
    displacementDuctility = yieldDeflection && yieldDeflection > 0 ? ultimateDeflection / yieldDeflection : null;
    // Beyond span/50 μΔ is withheld altogether (small-deflection.ts; the verdict says why): no number here either.
    if (displacementDuctility !== null && displacementDuctility > DUCTILITY_RANGE_LIMIT && !ultimateOutsideRange({ span, loadDeflection: { points: capacity.points, events: capacity.events } })) {
      warnings.push(`The displacement ductility μΔ = ${displacementDuctility.toFixed(1)} is beyond ${DUCTILITY_RANGE_LIMIT}, outside the range the yield and ultimate definitions are meant for: read it as "very ductile", not as a precise figure.`);
    }
  }
  const peakPoint = capacity && capacity.points.length > 0 ? capacity.points.reduce((a, b) => (b.totalLoad > a.totalLoad ? b : a)) : null;
  const codeUltimate = capacity?.codeUltimate
    ? { loadFactor: capacity.codeUltimate.lambda, totalLoad: loading.constantTotal + capacity.codeUltimate.lambda * loading.patternTotal, deflection: capacity.codeUltimate.deflection, position: capacity.codeUltimate.position }
    : null;

  // --- service ------------------------------------------------------------------------------------
  const serviceZones: ServiceZone[] = member.zones.map((z, i) => {
    const s = analyses[i]!;
    return {
      from: z.from,
      to: z.to,
      sectionId: z.sectionId,
      model: s.model!,
      shortTerm: responses[i]!,
      longTerm: zoneResponse(z.sectionId, z.from, z.to, s.model!, s.elastic!, s.longTermCurves),
      codeModulus: s.codeModulus,
      codeTensileStrength: s.codeTensileStrength,
      creepCoefficient: s.creepCoefficient,
      shrinkageStrain: s.shrinkageStrain,
    };
  });
  const service = serviceDeflections({
    code: context.code,
    support: member.supports,
    span,
    segments: context.segments,
    extraPoints,
    zones: serviceZones,
    dead: deadLoads,
    live: liveLoads,
    settings: member.service,
  });
  warnings.push(...service.warnings);
  const outsideRange = serviceOutsideRange(service.service, span);
  if (outsideRange) warnings.push(outsideRange);

  const notConverged = (capacity && !capacity.converged) || uniqueSections.some((s) => Object.values(s.curves).some((c) => c && c.status.kind !== 'complete'));
  const distributions = [...(service.distribution ? [service.distribution] : []), ...(capacity?.distributions ?? [])];
  if (!Number.isFinite(span)) throw new BugError('span must be finite after validation');
  const result: BeamResult = {
    memberId: member.id,
    memberName: member.name,
    supports: member.supports,
    span,
    sections,
    loadDeflection: {
      pattern: proportional ? 'all service loads (dead + live) increased together' : 'live load increased with the dead load held',
      controlPosition: capacity?.controlPosition ?? 0,
      points: capacity?.points ?? [],
      events: capacity?.events ?? [],
      status: capacity?.status ?? 'no capacity curve',
    },
    ductility: {
      firstYieldDeflection,
      yieldDeflection,
      ultimateDeflection,
      displacementDuctility,
      hinges: capacity?.hinges ?? [],
      failureCause: capacity?.failureCause ?? '',
      yieldDefinition,
      peak: peakPoint ? { loadFactor: peakPoint.loadFactor, totalLoad: peakPoint.totalLoad, deflection: peakPoint.deflection } : null,
      codeUltimate,
      model: {
        tensionShift: member.capacity.tensionShift ?? true,
        strainPenetration: member.capacity.strainPenetration ?? 'en1998-3',
        shearDeformation: member.capacity.shearDeformation ?? 'en1998-3',
        ultimateLoadFraction: member.capacity.ultimateLoadFraction ?? ULTIMATE_LOAD_FRACTION,
        spanHingeRule: member.capacity.spanHingeRule ?? 'combined',
      },
    },
    distributions,
    service: service.service,
    warnings,
    errors: [],
  };
  return {
    result,
    inputErrors: [],
    capacity: capacity ? { ultimateLoadFactor: capacity.ultimate?.lambda ?? null, failureCause: capacity.failureCause, status: capacity.status } : null,
    converged: !notConverged,
  };
}

