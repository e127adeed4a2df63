/**
 * One continuous beam through its engine: the sections' curves → zone laws; the elastic analysis
 * with the code arrangements of live load (envelopes); the analysis to failure under the chosen
 * arrangement (hinge sequence, rotation demand and capacity, ductility); redistribution used
 * against permitted. Never throws for bad input: problems come back in the result.
 * Units: mm, N, N·mm, rad.
 */
import { errorsOf, type Diagnostic, type Problem } from '../diagnostics.ts';
import type { LoadFactors } from '../member/definition.ts';
import type { CodeBasis } from '../materials/specs.ts';
import type { SectionAnalysis } from '../section/analyze.ts';
import { phrase, uniqueTexts, type Text } from '../units/phrase.ts';
import { capacityAnalysis, type CapacityResult } from './capacity.ts';
import type { ContinuousBeamDefinition } from './definition.ts';
import { analyzeElastic, elasticSolver, type ElasticResult } from './elastic.ts';
import { brittleLaw, directionLaw, hingeBars, type ZoneLaws } from './laws.ts';
import { layoutOf, partName, type LoadsByPart } from './layout.ts';
import { caseLoads, combineLoads, onParts, selfWeightLoads, type Arrangement } from './loads.ts';
import { permittedRedistribution, redistributionCheck, type RedistributionCheck } from './redistribution.ts';
import { continuousService, type ContinuousService } from './service.ts';
import { validateContinuousBeam } from './validate.ts';

export interface ContinuousContext {
  readonly code: CodeBasis;
  /** Equal divisions of each span (the project setting `stations`; default 48). */
  readonly segments?: number;
  section(id: string): SectionAnalysis | undefined;
  readonly sectionIds: ReadonlySet<string>;
  /** Path of the member in the project file, e.g. `members[3] "B-3"`. */
  readonly path: string;
  /** Strength factors when the beam gives none (the code basis's defaults) and ACI's dead-only factor. */
  readonly strengthFactors: LoadFactors;
  readonly deadOnlyFactor?: number;
}

export interface ContinuousBeamResult {
  readonly memberId: string;
  readonly memberName: string;
  /** Supports' positions and the parts of the beam, mm from its left end. */
  readonly supportX: readonly number[];
  readonly parts: readonly { readonly name: string; readonly kind: string; readonly from: number; readonly to: number }[];
  readonly elastic: ElasticResult | null;
  /** The load arrangement of the analysis to failure, and whether loads are all increased or live only. */
  readonly failureArrangement: string;
  readonly failurePattern: string;
  readonly capacity: CapacityResult | null;
  /**
   * The largest load of the analysis to failure against the strength combination of the same
   * arrangement (total loads, N): a check of the mechanism against the factored loads, not the
   * code's check of each section.
   */
  readonly strengthLevel: { readonly factoredTotal: number; readonly collapseTotal: number; readonly ratio: number } | null;
  readonly redistribution: readonly RedistributionCheck[];
  /** Service deflections per span and cantilever (integration and code method) against the limits. */
  readonly service: ContinuousService | null;
  /** The loads of the analysis to failure: held constant, and the pattern its load factor scales (N/mm, N per part); null when not analysed. */
  readonly failureLoads: { readonly held: LoadsByPart; readonly pattern: LoadsByPart } | null;
  readonly warnings: readonly Text[];
  readonly errors: readonly Problem[];
}

/** Zone laws of a section from its short-term (or sustained-load) curves (a direction without tension steel is brittle). */
export function zoneLaws(sectionId: string, analysis: SectionAnalysis, longTerm = false): ZoneLaws | null {
  const { model, elastic } = analysis;
  if (!model || !elastic) return null;
  const law = (dir: 'sagging' | 'hogging') => {
    const bars = hingeBars(model, dir);
    const curve = (longTerm ? analysis.longTermCurves : analysis.curves)[dir];
    return (curve && directionLaw(curve, bars)) ?? brittleLaw(elastic.concreteModulus * elastic.uncrackedInertia, elastic.crackingMoment[dir].transformed, bars);
  };
  const cover = model.concreteParts.find((p) => p.role === 'cover') ?? model.concreteParts[0];
  return { sectionId, sagging: law('sagging'), hogging: law('hogging'), concreteStrength: cover?.material.peakStress ?? 30 };
}

function empty(def: ContinuousBeamDefinition, errors: readonly Problem[], warnings: readonly Text[] = []): ContinuousBeamResult {
  return { memberId: def.id, memberName: def.name, supportX: [], parts: [], elastic: null, failureArrangement: '', failurePattern: '', capacity: null, strengthLevel: null, redistribution: [], service: null, failureLoads: null, warnings, errors };
}

/** The loads of the analysis to failure: held and factored sets. */
export function failureLoads(def: ContinuousBeamDefinition, elastic: ElasticResult, dead: LoadsByPart, live: LoadsByPart): { held: LoadsByPart; pattern: LoadsByPart; arrangement: Arrangement | null; words: string } {
  const layout = elastic.layout;
  const a = def.capacity.arrangement;
  let arrangement: Arrangement | null = elastic.arrangements.find((x) => x.id === 'all') ?? null;
  if (a.kind === 'governing-span') {
    const part = layout.spanPart[a.span - 1]!;
    const index = elastic.parts[part]!.maxSagging.arrangement;
    arrangement = elastic.arrangements[index] ?? arrangement;
  }
  const liveOn = arrangement ? onParts(live, arrangement.loadedParts) : live;
  const proportional = def.capacity.pattern === 'proportional';
  const n = layout.parts.length;
  const held = proportional ? layout.parts.map(() => []) : dead;
  const pattern = proportional ? combineLoads([{ loads: dead, factor: 1 }, { loads: liveOn, factor: 1 }], n) : liveOn;
  const words = `${arrangement ? arrangement.description : 'all spans loaded'}${a.kind === 'governing-span' ? ` (the arrangement that governs the sagging moment of span ${a.span})` : ''}`;
  return { held, pattern, arrangement, words };
}

export function analyzeContinuousBeam(def: ContinuousBeamDefinition, context: ContinuousContext): ContinuousBeamResult {
  const problems: Diagnostic[] = validateContinuousBeam(def, context.path, context.sectionIds);
  if (problems.some((p) => p.severity === 'error')) return empty(def, errorsOf(problems));
  const analyses = def.zones.map((z) => context.section(z.sectionId));
  const missing: Problem[] = [];
  const laws: ZoneLaws[] = [];
  analyses.forEach((a, i) => {
    const l = a ? zoneLaws(def.zones[i]!.sectionId, a) : null;
    if (!a || !l || a.errors.length > 0) missing.push(...(a?.errors.length ? errorsOf(a.errors) : [{ path: `${context.path}.zones[${i}].sectionId`, message: 'the section could not be analysed' }]));
    else laws.push(l);
  });
  if (missing.length > 0) return empty(def, missing);
  const sections = analyses as SectionAnalysis[];
  const warnings: Text[] = uniqueTexts(sections.flatMap((s) => s.warnings.map((w) => phrase`Section "${s.sectionName}": ${w}`)));
  const layout = layoutOf(def);
  const stiffness = sections.map((s) => s.codeModulus * s.elastic!.grossInertia);
  const selfWeight = sections.map((s) => s.selfWeight);
  const elastic = analyzeElastic({
    definition: def,
    zones: stiffness.map((ei, i) => ({ stiffness: ei, selfWeight: selfWeight[i]! })),
    strengthFactors: def.strengthFactors ?? context.strengthFactors,
    deadOnlyFactor: context.deadOnlyFactor,
    segmentsPerSpan: context.segments,
    code: context.code,
  });
  const n = layout.parts.length;
  const dead = combineLoads(
    [
      { loads: caseLoads(def, layout, 'dead'), factor: 1 },
      { loads: selfWeightLoads(def, layout, selfWeight), factor: 1 },
      { loads: caseLoads(def, layout, 'superimposed'), factor: 1 },
    ],
    n,
  );
  const live = caseLoads(def, layout, 'live');
  const loads = failureLoads(def, elastic, dead, live);
  const patternTotal = loads.pattern.reduce((s, p) => s + p.reduce((t, l) => t + (l.kind === 'point' ? l.p : l.w * (l.to - l.from)), 0), 0);
  let capacity: CapacityResult | null = null;
  if (patternTotal > 0) {
    capacity = capacityAnalysis({
      definition: def,
      zones: laws,
      held: loads.held,
      pattern: loads.pattern,
      hingeLengthMethod: def.capacity.hingeLengthMethod,
      userHingeLength: def.capacity.userHingeLength,
      controlPosition: def.capacity.controlPosition,
      segmentsPerSpan: Math.min(context.segments ?? 40, 40),
    });
    warnings.push(...capacity.warnings);
    if (!capacity.converged) warnings.push(phrase`The analysis to failure stopped early: ${capacity.failureCause}.`);
  } else warnings.push('The load pattern of the analysis to failure is empty (no live load for a live-only pattern): no load–deflection curve.');

  // Redistribution at the supports: non-linear against elastic (gross stiffness) at the largest load.
  const redistribution: RedistributionCheck[] = [];
  if (capacity && capacity.peakLoadFactor > 0) {
    const all = combineLoads([{ loads: loads.held, factor: 1 }, { loads: loads.pattern, factor: capacity.peakLoadFactor }], n);
    const solver = elasticSolver(def, stiffness, all, context.segments ?? 48);
    const el = solver.solve(all);
    const peak = capacity.peakState;
    const momentAt = (x: readonly number[], m: readonly number[], parts: readonly number[], at: number, part: number) => {
      let best = -1;
      x.forEach((xi, i) => {
        if (parts[i] === part && (best < 0 || Math.abs(xi - at) < Math.abs(x[best]! - at))) best = i;
      });
      return best >= 0 ? m[best]! : 0;
    };
    const scale = Math.max(...el.moment.map(Math.abs), 1);
    layout.supportX.forEach((xs, j) => {
      const sides = layout.parts.map((p, pi) => ({ p, pi })).filter(({ p }) => p.kind === 'span' && (Math.abs(p.from - xs) < 1e-6 || Math.abs(p.to - xs) < 1e-6));
      // The side with the larger elastic hogging moment (they differ only at a column).
      let best: { elastic: number; nonlinear: number } | null = null;
      for (const { pi } of sides) {
        const e = momentAt(solver.stations.x, el.moment, solver.stations.part, xs, pi);
        const nl = momentAt(peak.x, peak.moment, peak.part, xs, pi);
        if (!best || e < best.elastic) best = { elastic: e, nonlinear: nl };
      }
      if (!best || best.elastic > -0.05 * scale) return;
      const zone = def.zones.findIndex((z) => xs >= z.from - 1e-6 && xs <= z.to + 1e-6);
      const law = laws[Math.max(zone, 0)]!;
      redistribution.push(redistributionCheck(j + 1, xs, capacity!.peakLoadFactor, best.elastic, best.nonlinear, permittedRedistribution(context.code, law.hogging, law.concreteStrength ?? 30)));
    });
  }
  const totalOf = (set: LoadsByPart) => set.reduce((s, p) => s + p.reduce((t, l) => t + (l.kind === 'point' ? l.p : l.w * (l.to - l.from)), 0), 0);
  const factors = def.strengthFactors ?? context.strengthFactors;
  const liveOn = loads.arrangement ? onParts(live, loads.arrangement.loadedParts) : live;
  const deadOnly = combineLoads([{ loads: caseLoads(def, layout, 'dead'), factor: 1 }, { loads: selfWeightLoads(def, layout, selfWeight), factor: 1 }], n);
  const factoredTotal = factors.dead * totalOf(deadOnly) + factors.superimposed * totalOf(caseLoads(def, layout, 'superimposed')) + factors.live * totalOf(liveOn);
  const collapseTotal = capacity && capacity.peakLoadFactor > 0 ? totalOf(loads.held) + capacity.peakLoadFactor * capacity.patternTotal : 0;
  const strengthLevel = capacity && factoredTotal > 0 ? { factoredTotal, collapseTotal, ratio: collapseTotal / factoredTotal } : null;
  let service: ContinuousService | null = null;
  try {
    service = continuousService({
      definition: def,
      code: context.code,
      elastic,
      dead,
      live,
      segmentsPerSpan: Math.min(context.segments ?? 40, 40),
      zones: sections.map((s, i) => ({
        model: s.model!,
        shortTerm: laws[i]!,
        longTerm: zoneLaws(def.zones[i]!.sectionId, s, true) ?? laws[i]!,
        codeModulus: s.codeModulus,
        codeTensileStrength: s.codeTensileStrength,
        creepCoefficient: s.creepCoefficient,
        shrinkageStrain: s.shrinkageStrain,
      })),
    });
    warnings.push(...service.warnings);
  } catch (error) {
    warnings.push(`Service deflections could not be computed: ${error instanceof Error ? error.message : String(error)}`);
  }
  return {
    memberId: def.id,
    memberName: def.name,
    supportX: layout.supportX,
    parts: layout.parts.map((p) => ({ name: partName(p), kind: p.kind, from: p.from, to: p.to })),
    elastic,
    failureArrangement: loads.words,
    failurePattern: def.capacity.pattern === 'proportional' ? 'all service loads (dead + live) increased together' : 'live load increased with the dead load held',
    capacity,
    strengthLevel,
    redistribution,
    service,
    failureLoads: { held: loads.held, pattern: loads.pattern },
    warnings: uniqueTexts(warnings),
    errors: [],
  };
}
