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
import { buildBeamModel, type BeamModel, type ZoneResponse } from './beam-model.ts';
import type { BeamDefinition, MemberLoad } from './definition.ts';
import { capacityCurve } from './capacity.ts';
import { peakDeflectionPosition } from './deflection.ts';
import type { LoadingFields } from './equations.ts';
import { solveStatic } from './static.ts';
import type { BeamResult, SectionResult } from './results.ts';
import { serviceDeflections, type ServiceZone } from './service.ts';
import { releasedMoment, toStaticLoad, totalLoad, type StaticLoad } from './statics.ts';
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

export function analyzeBeam(member: BeamDefinition, context: MemberContext): BeamAnalysis {
  const problems = validateMember(member, context.path, context.sectionIds);
  if (problems.length > 0) return invalid(member, problems);
  const span = member.span;
  const zoneSections = member.zones.map((z) => context.section(z.sectionId));
  const sectionErrors = zoneSections.flatMap((s, i) => (s ? s.errors : [{ code: 'unknown-reference' as const, path: `${context.path}.zones[${i}].sectionId`, severity: 'error' as const, message: 'section not found' }]));
  const uniqueSections = [...new Map(zoneSections.filter((s): s is SectionAnalysis => !!s).map((s) => [s.sectionId, s])).values()];
  const sections = uniqueSections.map(sectionResult).filter((s): s is SectionResult => s !== null);
  if (sectionErrors.length > 0) return invalid(member, sectionErrors, sections);
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
  const fieldOf = (b: BeamModel, loads: readonly StaticLoad[]) => Float64Array.from(b.x, (x) => releasedMoment(b.support, span, loads, x));
  const proportional = member.capacity.pattern === 'proportional';
  const patternLoads = proportional ? [...deadLoads, ...liveLoads] : liveLoads;
  const constantLoads = proportional ? [] : deadLoads;
  // Control point of the load–deflection curve: where the elastic deflection under the pattern
  // peaks, found on a fine elastic model and made a station of the analysis model.
  const elasticResponses: ZoneResponse[] = member.zones.map((z, i) => elasticZone(z.sectionId, z.from, z.to, analyses[i]!.codeModulus * analyses[i]!.elastic!.grossInertia));
  const probeBeam = buildBeamModel(member.supports, span, elasticResponses, extraPoints, 240);
  const probe = solveStatic(probeBeam, fieldOf(probeBeam, patternLoads.length > 0 ? patternLoads : deadLoads));
  const controlAt = Math.round(peakDeflectionPosition(probeBeam.x, probe.deflection) * 10) / 10;
  const beam = buildBeamModel(member.supports, span, responses, [...extraPoints, controlAt], context.segments);
  const loading: LoadingFields = {
    constant: fieldOf(beam, constantLoads),
    pattern: fieldOf(beam, patternLoads),
    constantTotal: totalLoad(constantLoads),
    patternTotal: totalLoad(patternLoads),
  };
  const capacity = totalLoad(patternLoads) > 0
    ? capacityCurve(beam, loading, member.capacity, controlAt)
    : null;
  if (!capacity) warnings.push('The load pattern for the load–deflection curve is empty (no live load for a live-only pattern): no capacity curve.');
  if (capacity && capacity.hinges.some((h) => h.length < 5)) {
    warnings.push('A plastic hinge length is practically zero by the chosen expression (e.g. Priestley et al. inside the span with fu = fy): its rotation capacity is nil. Consider another hinge-length method.');
  }

  // --- ductility ----------------------------------------------------------------------------------
  let firstYieldDeflection: number | null = null;
  let yieldDeflection: number | null = null;
  let ultimateDeflection: number | null = null;
  let displacementDuctility: number | null = null;
  if (capacity?.firstYield && capacity.ultimate) {
    firstYieldDeflection = capacity.firstYield.deflection;
    // Park's secant through 75 % of the largest load: from the exactly solved state when there is one.
    const sp = capacity.secantPoint;
    const base = capacity.points[0]!;
    yieldDeflection = sp && sp.deflection > base.deflection ? base.deflection + (sp.deflection - base.deflection) / 0.75 : nominalYieldDeflection(capacity.points);
    ultimateDeflection = capacity.ultimate.deflection;
    displacementDuctility = yieldDeflection && yieldDeflection > 0 ? ultimateDeflection / yieldDeflection : null;
  }

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

