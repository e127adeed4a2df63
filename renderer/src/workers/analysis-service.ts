/**
 * What an analysis worker does, written without worker globals so that component tests can run it
 * in-process: requests in, replies out through `post`. Every engineering number comes from core/:
 * analyzeMembers (core/analysis.ts), memberKeyResults, the section builder and equilibrium solver
 * for states at a chosen curvature, validation, parsing and serialisation of project files.
 *
 * Long jobs run in chunks of members; between chunks the service yields to the event loop, so a
 * `cancel` message can stop a job early (the members not yet analysed are returned to the caller).
 */
import { analyzeContinuousMembers, analyzeMembers, sectionCache, type SectionCache } from '../../../core/analysis.ts';
import { sectionResult } from '../../../core/member/analyze.ts';
import type { SectionResult } from '../../../core/member/results.ts';
import type { Diagnostic } from '../../../core/diagnostics.ts';
import { InputError } from '../../../core/diagnostics.ts';
import { memberKeyResults } from '../../../core/project/key-results.ts';
import { parseProject, resultsSummaryCsv, serializeProject, validateProjectData } from '../../../core/project/index.ts';
import { mapWords, type Text } from '../../../core/units/phrase.ts';
import { materialLibrary } from '../../../core/materials/library.ts';
import type { Project } from '../../../core/project/types.ts';
import { buildSectionModel } from '../../../core/section/build.ts';
import { solveEquilibrium } from '../../../core/section/equilibrium.ts';
import { directionSign, type SectionModel } from '../../../core/section/model.ts';
import { sectionState } from '../../../core/section/state.ts';
import { placeDiagnostic, remapPaths } from './paths.ts';
import { sectionsGoAhead } from '../project/dependencies.ts';
import type { CoveredItems, IndexMap, WorkerReply, WorkerRequest } from './protocol.ts';
import type { MemberResult } from '../../../core/assessment/results.ts';

export interface AnalysisService {
  handle(request: WorkerRequest): Promise<void>;
}

/** Lets queued messages (a cancel) be handled before the next chunk. */
const yieldToEvents = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, 0));

function messageOf(error: unknown): string {
  if (error instanceof InputError) return error.diagnostics.map((d) => `${d.path}: ${d.message}`).join('\n');
  return error instanceof Error ? error.message : String(error);
}

/**
 * The member result with every item path written for the whole project. Its sentences keep their
 * quantities as data: the views say them in the units of the moment (core/units/phrase.ts).
 */
function remapResult(result: MemberResult, map: IndexMap | null): MemberResult {
  if (!map) return result;
  const words = (text: Text) => mapWords(text, (w) => remapPaths(w, map));
  return {
    ...result,
    governingMode: words(result.governingMode),
    warnings: result.warnings.map(words),
    errors: result.errors.map((e) => ({ path: remapPaths(e.path, map), message: words(e.message) })),
    sections: result.sections.map((s) => ({ ...s, warnings: s.warnings.map(words) })),
    loadDeflection: { ...result.loadDeflection, status: remapPaths(result.loadDeflection.status, map) },
  };
}

/**
 * The section results of a member, as its member result will hold them, for members whose
 * sections are the library's own (no as-found condition or scheme deriving others); null when
 * the member has none of its own or derives them.
 */
function previewSections(project: Project, memberId: string, map: IndexMap | null, analysis: SectionCache): SectionResult[] | null {
  const member = project.members.find((m) => m.id === memberId);
  if (!member || !sectionsGoAhead(member)) return null;
  // The short-term stage only (what the chart shows); the member analysis completes it.
  const sections = [...new Set(member.zones.map((z) => z.sectionId))].map((id) => analysis.shortTerm(id)).map((s) => (s ? sectionResult(s) : null));
  if (sections.length === 0 || sections.some((s) => s === null)) return null;
  return (sections as SectionResult[]).map((s) => (map ? { ...s, warnings: s.warnings.map((w) => mapWords(w, (words) => remapPaths(words, map))) } : s));
}

/**
 * The member result's sections are those sent ahead: the same ids, the same curve objects (one
 * cache for the job) and the same warnings (the rest of the analysis may add design-law warnings).
 */
const sameAsSentAhead = (ahead: readonly SectionResult[], result: readonly SectionResult[]) => ahead.length === result.length
  && ahead.every((s, i) => s.sectionId === result[i]!.sectionId && s.sagging === result[i]!.sagging && s.hogging === result[i]!.hogging && JSON.stringify(s.warnings) === JSON.stringify(result[i]!.warnings));

function coveredItems(project: Project, whole: boolean): CoveredItems {
  return {
    materials: project.materials.map((m) => m.id),
    sections: project.sections.map((s) => s.id),
    members: project.members.map((m) => m.id),
    continuousMembers: (project.continuousMembers ?? []).map((m) => m.id),
    project: whole,
  };
}

export function createAnalysisService(post: (reply: WorkerReply) => void): AnalysisService {
  const cancelled = new Set<number>();
  /** Section models for states at a chosen curvature, by the section's inputs as JSON. */
  const models = new Map<string, SectionModel>();

  function validate(id: number, project: Project, map: IndexMap | null): void {
    const { diagnostics } = validateProjectData(project);
    post({ type: 'diagnostics', id, diagnostics: diagnostics.map((d) => placeDiagnostic(d, project, map)), covered: coveredItems(project, map === null) });
  }

  async function analyze(request: Extract<WorkerRequest, { type: 'analyze' }>): Promise<void> {
    const started = performance.now();
    const { project, indexMap, detailIds } = request;
    if (request.validate) validate(request.id, project, indexMap);
    const known = new Set(project.members.map((m) => m.id));
    const ids = request.memberIds.filter((memberId) => known.has(memberId));
    const details = new Set(detailIds);
    const chunk = Math.max(1, Math.floor(request.chunkSize));
    // One analysis per section for the whole job: the curves sent ahead are not computed twice.
    const sections = sectionCache(project);
    let done = 0;
    let start = 0;
    while (start < ids.length) {
      if (cancelled.delete(request.id)) {
        post({ type: 'cancelled', id: request.id, remaining: ids.slice(start) });
        return;
      }
      // The first member (the one on screen) goes alone when its full results are wanted, so they
      // come back soonest; its section curves go first of all (a few ms, against tens for the member).
      const size = start === 0 && details.has(ids[0]!) ? 1 : chunk;
      let sentAhead: readonly SectionResult[] | null = null;
      if (start === 0 && size === 1) {
        sentAhead = previewSections(project, ids[0]!, indexMap, sections);
        if (sentAhead) post({ type: 'sections', id: request.id, memberId: ids[0]!, sections: sentAhead });
      }
      const part = ids.slice(start, start + size);
      const results = analyzeMembers(project, part, undefined, sections);
      for (const raw of results) {
        const result = remapResult(raw, indexMap);
        const definition = project.members.find((m) => m.id === result.memberId);
        const key = memberKeyResults(result, definition);
        if (!details.has(result.memberId)) post({ type: 'member', id: request.id, memberId: result.memberId, key, detail: null });
        // The sections sent ahead are the same analyses (one cache for the job): not sent twice.
        else if (sentAhead && sameAsSentAhead(sentAhead, result.sections)) post({ type: 'member', id: request.id, memberId: result.memberId, key, detail: { ...result, sections: [] }, sectionsSent: true });
        else post({ type: 'member', id: request.id, memberId: result.memberId, key, detail: result });
        done += 1;
        post({ type: 'progress', id: request.id, done, total: ids.length, memberId: result.memberId });
      }
      start += size;
      if (start < ids.length) await yieldToEvents();
    }
    cancelled.delete(request.id);
    post({ type: 'done', id: request.id, elapsedMs: performance.now() - started });
  }

  function stateAt(request: Extract<WorkerRequest, { type: 'state' }>): void {
    const { project, sectionId, direction } = request;
    const index = project.sections.findIndex((s) => s.id === sectionId);
    const definition = project.sections[index];
    if (!definition) throw new Error(`There is no section "${sectionId}" in the project.`);
    const key = JSON.stringify([definition, project.materials, project.info.codeBasis]);
    let model = models.get(key);
    if (!model) {
      model = buildSectionModel(definition, materialLibrary(project.materials, project.info.codeBasis, project.settings), `sections[${index}] "${definition.name}"`).model;
      if (models.size > 50) models.clear();
      models.set(key, model);
    }
    const curvature = directionSign(direction) * Math.abs(request.curvature);
    const outcome = solveEquilibrium(model, curvature, request.guess);
    if (!outcome.ok) throw new Error(`The section state at this curvature could not be found: ${outcome.reason}.`);
    const { state } = outcome;
    post({ type: 'state', id: request.id, state: sectionState(model, direction, state.curvature, state.referenceStrain, state.moment, state.residual) });
  }

  return {
    async handle(request) {
      try {
        switch (request.type) {
          case 'cancel':
            cancelled.add(request.target);
            return;
          case 'analyze':
            await analyze(request);
            return;
          case 'sections': {
            // The short-term stage only, as sent ahead of a member result (the same function).
            const sections = previewSections(request.project, request.memberId, request.indexMap, sectionCache(request.project));
            if (sections) post({ type: 'sections', id: request.id, memberId: request.memberId, sections });
            post({ type: 'done', id: request.id, elapsedMs: 0 });
            return;
          }
          case 'validate':
            validate(request.id, request.project, request.indexMap);
            post({ type: 'done', id: request.id, elapsedMs: 0 });
            return;
          case 'parse': {
            const parsed = parseProject(request.text);
            post({ type: 'parsed', id: request.id, project: parsed.project, diagnostics: parsed.diagnostics as Diagnostic[] });
            return;
          }
          case 'serialize':
            post({ type: 'text', id: request.id, text: serializeProject(request.project) });
            return;
          case 'state':
            stateAt(request);
            return;
          case 'analyze-continuous': {
            // Few per project and each a few tens of ms: one job, one cache of section analyses.
            const started = performance.now();
            const sections = sectionCache(request.project);
            for (const memberId of request.memberIds) {
              if (cancelled.delete(request.id)) {
                post({ type: 'cancelled', id: request.id, remaining: request.memberIds.slice(request.memberIds.indexOf(memberId)) });
                return;
              }
              for (const result of analyzeContinuousMembers(request.project, [memberId], sections)) post({ type: 'continuous', id: request.id, memberId, result });
              await yieldToEvents();
            }
            post({ type: 'done', id: request.id, elapsedMs: performance.now() - started });
            return;
          }
          case 'csv': {
            // Chunk by chunk, so that a large project never holds every full result at once;
            // the header (one line, no line breaks inside) is kept from the first chunk only.
            const { project } = request;
            const ids = project.members.map((m) => m.id);
            let text = '';
            for (let start = 0; start < ids.length || start === 0; start += 20) {
              const results = analyzeMembers(project, ids.slice(start, start + 20));
              // Continuous members (one row each, with the governing span) after the last chunk's members.
              const continuous = start + 20 >= ids.length ? analyzeContinuousMembers(project) : [];
              const part = resultsSummaryCsv(results, project.info.unitSystem, project, continuous);
              text += start === 0 ? part : part.slice(part.indexOf('\r\n') + 2);
              post({ type: 'progress', id: request.id, done: Math.min(start + 20, ids.length), total: ids.length, memberId: ids[Math.min(start + 19, ids.length - 1)] ?? '' });
              if (start + 20 < ids.length) await yieldToEvents();
              if (ids.length === 0) break;
            }
            post({ type: 'text', id: request.id, text });
            return;
          }
        }
      } catch (error) {
        post({ type: 'error', id: request.id, message: messageOf(error) });
      }
    },
  };
}
