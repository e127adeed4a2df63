/**
 * The one entry point used by the worker, the CLI and the tests:
 * project → section analyses (once per section) → every member → plain results and a summary.
 * Pure and deterministic. Members are independent: one member's failure never stops the others.
 */
import { assessMember, type AssessmentContext } from './assessment/member.ts';
import { defaultStrengthFactors, strengthCombinations } from './assessment/combinations.ts';
import { assessContinuousMember, withVerdict, type ContinuousAssessmentContext, type ContinuousMemberResult } from './assessment/continuous-verdict.ts';
import type { MemberResult } from './assessment/results.ts';
import { notAnalysed } from './assessment/variant.ts';
import { materialLibrary, type MaterialLibrary } from './materials/library.ts';
import type { Project, MemberDefinition } from './project/types.ts';
import { analyzeSectionShortTerm, completeSectionAnalysis, type SectionAnalysis, type ShortTermSection } from './section/analyze.ts';
import type { SectionDefinition } from './section/definition.ts';
import type { Text } from './units/phrase.ts';

export interface ProjectSummary {
  readonly memberCount: number;
  readonly ok: number;
  readonly checkFails: number;
  /** Members whose checks pass but which are brittle (never counted as ok). */
  readonly brittle: number;
  readonly notConverged: number;
  readonly inputErrors: number;
  /** One line per member: id, name, status and governing mode (say(governingMode, units) for words). */
  readonly lines: readonly { readonly memberId: string; readonly memberName: string; readonly status: MemberResult['status']; readonly governingMode: Text }[];
}

export interface ProjectResults {
  readonly projectName: string;
  readonly codeBasis: Project['info']['codeBasis'];
  readonly members: readonly MemberResult[];
  /** Continuous members (project version 3), in file order; absent when the project has none. */
  readonly continuous?: readonly ContinuousMemberResult[];
  readonly summary: ProjectSummary;
}

export type ProgressListener = (done: number, total: number, memberId: string) => void;

/** Section analyses of a project on demand, each computed once. */
export interface SectionCache {
  (id: string): SectionAnalysis | undefined;
  /**
   * The short-term stage alone (model, elastic properties, short-term curves: what a
   * moment–curvature chart shows), for showing before the rest; a later full analysis of the
   * section completes this stage instead of starting again.
   */
  shortTerm(id: string): SectionAnalysis | undefined;
}

/** Section analyses on demand, computed once per section of the project. */
export function sectionCache(project: Project): SectionCache {
  const materials = materialLibrary(project.materials, project.info.codeBasis, project.settings);
  const options = {
    code: project.info.codeBasis,
    momentDropFraction: project.settings.momentDropFraction,
    bilinearMethod: project.settings.bilinearMethod,
  };
  const stages = new Map<string, { definition: SectionDefinition; shortTerm: ShortTermSection }>();
  const full = new Map<string, SectionAnalysis>();
  const stageOf = (id: string) => {
    const known = stages.get(id);
    if (known) return known;
    const index = project.sections.findIndex((s) => s.id === id);
    if (index < 0) return undefined;
    const definition = project.sections[index]!;
    const stage = { definition, shortTerm: analyzeSectionShortTerm(definition, `sections[${index}] "${definition.name}"`, materials, options) };
    stages.set(id, stage);
    return stage;
  };
  const cache = ((id: string) => {
    const cached = full.get(id);
    if (cached) return cached;
    const stage = stageOf(id);
    if (!stage) return undefined;
    const analysis = completeSectionAnalysis(stage.shortTerm, stage.definition, materials, options);
    full.set(id, analysis);
    return analysis;
  }) as SectionCache;
  cache.shortTerm = (id) => full.get(id) ?? stageOf(id)?.shortTerm.analysis;
  return cache;
}

/**
 * Analyses the members whose ids are given (all when omitted), in project order.
 * A defect inside one member's analysis is caught and reported on that member.
 * `section` may be a `sectionCache` of the same project already used (e.g. to send the section
 * curves ahead), so that no section is analysed twice.
 */
export function analyzeMembers(project: Project, memberIds?: readonly string[], onProgress?: ProgressListener, section: (id: string) => SectionAnalysis | undefined = sectionCache(project)): MemberResult[] {
  const sectionIds = new Set(project.sections.map((s) => s.id));
  const wanted = memberIds ? new Set(memberIds) : undefined;
  const members = project.members.map((m, index) => ({ m, index })).filter(({ m }) => !wanted || wanted.has(m.id));
  const results: MemberResult[] = [];
  // Members that differ only in id, name and notes (typical bays repeat many times) give the same
  // numbers: analyse each distinct definition once.
  const byContent = new Map<string, MemberResult>();
  members.forEach(({ m, index }, k) => {
    const context: AssessmentContext = {
      code: project.info.codeBasis, segments: project.settings.stations, section, sectionIds, path: `members[${index}] "${m.name}"`,
      library: project, sectionSettings: project.settings, unitSystem: project.info.unitSystem, combinations: project.settings,
    };
    let result: MemberResult;
    // Members with an as-found condition or schemes carry derived ids of their own: never shared.
    const key = m.asFound || (m.schemes?.length ?? 0) > 0 ? `${m.id}\u0000unique` : contentKey(m);
    const twin = byContent.get(key);
    try {
      if (twin && twin.status !== 'input-error') {
        result = { ...twin, memberId: m.id, memberName: m.name };
        results.push(result);
        onProgress?.(k + 1, members.length, m.id);
        return;
      }
      result = assessMember(m, context);
      byContent.set(key, result);
    } catch (error) {
      // Keep going with the other members; this member reports what went wrong.
      result = notAnalysed(m, error, context.path);
    }
    results.push(result);
    onProgress?.(k + 1, members.length, m.id);
  });
  return results;
}

/** The parts of a member definition that determine its results (all but id, name and notes). */
function contentKey(member: MemberDefinition): string {
  const { id: _id, name: _name, notes: _notes, ...rest } = member;
  return JSON.stringify(rest);
}

export function summarize(members: readonly MemberResult[]): ProjectSummary {
  const count = (s: MemberResult['status']) => members.filter((m) => m.status === s).length;
  return {
    memberCount: members.length,
    ok: count('ok'),
    checkFails: count('check-fails'),
    brittle: count('brittle'),
    notConverged: count('not-converged'),
    inputErrors: count('input-error'),
    lines: members.map((m) => ({ memberId: m.memberId, memberName: m.memberName, status: m.status, governingMode: m.governingMode })),
  };
}

/** A section's definition, concrete and stirrup steel for the code checks of a continuous member, by id. */
function sectionCheckData(project: Project, materials: MaterialLibrary): NonNullable<ContinuousAssessmentContext['checks']>['zone'] {
  return (id) => {
    const definition = project.sections.find((s) => s.id === id);
    const concrete = definition ? materials.concreteSpec(definition.concreteId) : undefined;
    if (!definition || !concrete) return undefined;
    const stirrupYield = definition.hoops ? materials.steel(definition.hoops.steelId)?.yieldStress : undefined;
    return { definition, concrete, ...(stirrupYield !== undefined ? { stirrupYield } : {}) };
  };
}

/**
 * Analyses the continuous members of a project (all when `ids` is omitted), in file order. A defect
 * inside one member's analysis is caught and reported on that member.
 */
export function analyzeContinuousMembers(project: Project, ids?: readonly string[], section: (id: string) => SectionAnalysis | undefined = sectionCache(project)): ContinuousMemberResult[] {
  const sectionIds = new Set(project.sections.map((s) => s.id));
  const code = project.info.codeBasis;
  const materials = materialLibrary(project.materials, code, project.settings);
  return (project.continuousMembers ?? []).flatMap((m, index) => {
    if (ids && !ids.includes(m.id)) return [];
    const path = `continuousMembers[${index}] "${m.name}"`;
    const context: ContinuousAssessmentContext = {
      code, segments: Math.min(project.settings.stations, 48), section, sectionIds, path, strengthFactors: defaultStrengthFactors(code), deadOnlyFactor: code === 'ACI 318-19' ? 1.4 : undefined,
      checks: { combinations: strengthCombinations(m, code, project.settings), zone: sectionCheckData(project, materials), ...(project.info.unitSystem ? { edition: project.info.unitSystem } : {}) },
    };
    try {
      return [assessContinuousMember(m, context)];
    } catch (error) {
      const message = `the analysis stopped on an internal error: ${error instanceof Error ? error.message : String(error)}`;
      return [withVerdict({ memberId: m.id, memberName: m.name, supportX: [], parts: [], elastic: null, failureArrangement: '', failurePattern: '', capacity: null, strengthLevel: null, redistribution: [], service: null, failureLoads: null, warnings: [], errors: [{ path, message }] })];
    }
  });
}

/** Analyses the whole project. */
export function analyzeProject(project: Project, onProgress?: ProgressListener): ProjectResults {
  const section = sectionCache(project);
  const members = analyzeMembers(project, undefined, onProgress, section);
  const continuous = (project.continuousMembers?.length ?? 0) > 0 ? { continuous: analyzeContinuousMembers(project, undefined, section) } : {};
  return { projectName: project.info.name, codeBasis: project.info.codeBasis, members, ...continuous, summary: summarize(members) };
}
