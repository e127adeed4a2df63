/**
 * The one entry point used by the worker, the CLI and the tests:
 * project → section analyses (once per section) → every member → plain results and a summary.
 * Pure and deterministic. Members are independent: one member's failure never stops the others.
 */
import { assessMember, type AssessmentContext } from './assessment/member.ts';
import type { MemberResult } from './assessment/results.ts';
import { notAnalysed } from './assessment/variant.ts';
import { materialLibrary } from './materials/library.ts';
import type { Project, MemberDefinition } from './project/types.ts';
import { analyzeSection, type SectionAnalysis } from './section/analyze.ts';
import type { Text } from './units/phrase.ts';

export interface ProjectSummary {
  readonly memberCount: number;
  readonly ok: number;
  readonly checkFails: number;
  readonly notConverged: number;
  readonly inputErrors: number;
  /** One line per member: id, name, status and governing mode (say(governingMode, units) for words). */
  readonly lines: readonly { readonly memberId: string; readonly memberName: string; readonly status: MemberResult['status']; readonly governingMode: Text }[];
}

export interface ProjectResults {
  readonly projectName: string;
  readonly codeBasis: Project['info']['codeBasis'];
  readonly members: readonly MemberResult[];
  readonly summary: ProjectSummary;
}

export type ProgressListener = (done: number, total: number, memberId: string) => void;

/** Section analyses on demand, computed once per section of the project. */
export function sectionCache(project: Project): (id: string) => SectionAnalysis | undefined {
  const materials = materialLibrary(project.materials, project.info.codeBasis);
  const cache = new Map<string, SectionAnalysis>();
  return (id) => {
    const cached = cache.get(id);
    if (cached) return cached;
    const index = project.sections.findIndex((s) => s.id === id);
    if (index < 0) return undefined;
    const def = project.sections[index]!;
    const analysis = analyzeSection(def, `sections[${index}] "${def.name}"`, materials, {
      code: project.info.codeBasis,
      momentDropFraction: project.settings.momentDropFraction,
      bilinearMethod: project.settings.bilinearMethod,
    });
    cache.set(id, analysis);
    return analysis;
  };
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
      library: project, sectionSettings: project.settings,
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
    notConverged: count('not-converged'),
    inputErrors: count('input-error'),
    lines: members.map((m) => ({ memberId: m.memberId, memberName: m.memberName, status: m.status, governingMode: m.governingMode })),
  };
}

/** Analyses the whole project. */
export function analyzeProject(project: Project, onProgress?: ProgressListener): ProjectResults {
  const members = analyzeMembers(project, undefined, onProgress);
  return { projectName: project.info.name, codeBasis: project.info.codeBasis, members, summary: summarize(members) };
}
