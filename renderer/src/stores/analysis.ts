/**
 * Results of the open project, and the scheduling of the analyses that produce them. Nothing is
 * computed here: members are analysed in Web Workers (workers/), and this store keeps what they
 * send back, tagged with the inputs (by identity, project/dependencies.ts) it was computed from.
 *
 * - After an edit, the members whose inputs changed are re-analysed automatically after a short
 *   delay (the member on screen first, with its full results); a newer edit cancels the running
 *   job after the member in hand and the rest is rescheduled with the new inputs.
 * - The whole project is analysed on demand (and when a project is opened) in a second worker,
 *   with progress; cancelling terminates that worker at once.
 * - Changed items are validated in the worker; diagnostics are kept per item and field.
 * - Results of earlier inputs are kept a little while, so that undo shows them again at once.
 */
import { defineStore } from 'pinia';
import { computed, reactive, ref, shallowRef, toRaw, watch } from 'vue';
import type { MemberKeyResults } from '../../../core/project/key-results.ts';
import type { Project } from '../../../core/project/types.ts';
import type { BendingDirection } from '../../../core/section/model.ts';
import type { SectionState } from '../../../core/section/results.ts';
import { memberInputs, memberOwnMaterialIds, sameInputs, sectionMaterialIds, sectionsGoAhead, subproject } from '../project/dependencies.ts';
import { CancelledError, engines, type RunningRequest } from '../workers/engine.ts';
import { indexMapOf } from '../workers/paths.ts';
import type { CoveredItems, ItemDiagnostic, ItemList, WorkerReply } from '../workers/protocol.ts';
import { useDocumentStore } from './document.ts';
import { useContinuousStore } from './continuous.ts';
import { perfMark } from '../components/ids.ts';
import type { MemberResult } from '../../../core/assessment/results.ts';
import type { SectionResult } from '../../../core/member/results.ts';

/** Delay between an edit and the re-analysis it causes while edits follow each other closely, ms (merges a burst of typing into one job). */
export const AUTO_ANALYSIS_DELAY_MS = 12;
/** Full member results kept on this thread (the member on screen and a few recent ones). */
export const DETAIL_CACHE_SIZE = 6;
/** Earlier results kept per member for undo. */
export const KEY_HISTORY = 3;
/** Members per chunk between cancellation checks: interactive and whole-project jobs. */
export const INTERACTIVE_CHUNK = 4;
export const BATCH_CHUNK = 8;

interface KeyEntry {
  readonly key: MemberKeyResults;
  readonly inputs: readonly unknown[];
}

interface DetailEntry {
  readonly result: MemberResult;
  readonly inputs: readonly unknown[];
}

interface SectionsEntry {
  readonly sections: readonly SectionResult[];
  readonly inputs: readonly unknown[];
}

export interface MemberKeyView {
  readonly key: MemberKeyResults;
  /** False when the member changed since these results were computed (shown as outdated). */
  readonly current: boolean;
}

export interface MemberDetailView {
  readonly result: MemberResult;
  readonly current: boolean;
}

const itemKey = (list: ItemList | 'project', id: string) => `${list}:${id}`;

/** The same section results (ids, and the same curves end to end): the engine is deterministic, so equal inputs give equal curves. */
function sameSections(a: readonly SectionResult[], b: readonly SectionResult[]): boolean {
  const curveEnd = (c: SectionResult['sagging']) => (c ? `${c.points.length}:${c.points[c.points.length - 1]?.moment}:${c.points[c.points.length - 1]?.curvature}` : '');
  return a.length === b.length && a.every((s, i) => s.sectionId === b[i]!.sectionId && curveEnd(s.sagging) === curveEnd(b[i]!.sagging) && curveEnd(s.hogging) === curveEnd(b[i]!.hogging) && JSON.stringify(s.warnings) === JSON.stringify(b[i]!.warnings));
}

export const useAnalysisStore = defineStore('analysis', () => {
  const documentStore = useDocumentStore();
  /**
   * Bumped whenever results change, and whenever diagnostics change (the maps below are not
   * reactive themselves). Two counters, so that results arriving do not re-render the input forms.
   */
  const revision = ref(0);
  const diagnosticsRevision = ref(0);
  /** Bumped when section curves arrive ahead of a member result: only the section views re-render. */
  const sectionsRevision = ref(0);
  const keys = new Map<string, KeyEntry[]>();
  const details = new Map<string, DetailEntry>();
  /** Section results sent ahead of the member result, for the member on screen. */
  const previews = new Map<string, SectionsEntry>();
  const diagnostics = new Map<string, ItemDiagnostic[]>();
  /** Inputs of each member when it was last sent for analysis (or found analysed). */
  const considered = new Map<string, readonly unknown[]>();
  /** Identity of each item when it was last validated. */
  const validated = new Map<string, unknown>();
  let validatedInfo: unknown = null;

  const focusedMemberId = ref<string | null>(null);
  const batch = reactive({ running: false, done: 0, total: 0, startedAt: 0, elapsedMs: 0, outcome: '' as '' | 'done' | 'cancelled' | 'failed' });
  const interactive = reactive({ running: false, done: 0, total: 0 });
  const lastError = ref<string | null>(null);
  /** Time of the last full result that arrived for the member on screen (for the speed measurements). */
  const detailArrivals = shallowRef<{ memberId: string; at: number } | null>(null);

  let timer: ReturnType<typeof setTimeout> | null = null;
  let runningInteractive: RunningRequest | null = null;
  let runningBatch: RunningRequest | null = null;
  let batchInputs = new Map<string, readonly unknown[]>();

  const bump = () => void revision.value++;
  let bumpQueued = false;
  /** A bump at the next frame at the latest: many replies of a whole-project run cause one re-render per frame. */
  function bumpSoon(): void {
    if (bumpQueued) return;
    bumpQueued = true;
    const run = () => {
      bumpQueued = false;
      bump();
    };
    if (typeof requestAnimationFrame === 'function') requestAnimationFrame(run);
    else setTimeout(run, 16);
  }

  // --- reading --------------------------------------------------------------------------------

  function keyOf(memberId: string): MemberKeyView | null {
    void revision.value;
    const project = documentStore.project;
    const entries = keys.get(memberId);
    if (!project || !entries || entries.length === 0) return null;
    const inputs = memberInputs(project, memberId);
    const current = entries.find((e) => sameInputs(e.inputs, inputs));
    return current ? { key: current.key, current: true } : { key: entries[0]!.key, current: false };
  }

  function detailOf(memberId: string): MemberDetailView | null {
    void revision.value;
    const project = documentStore.project;
    const entry = details.get(memberId);
    if (!project || !entry) return null;
    return { result: entry.result, current: sameInputs(entry.inputs, memberInputs(project, memberId)) };
  }

  /**
   * The section results (moment–curvature curves) of a member for its current inputs: those sent
   * ahead of the member result while it is being analysed, else those of its current result;
   * null while neither is there.
   */
  function sectionsOf(memberId: string): readonly SectionResult[] | null {
    void revision.value;
    void sectionsRevision.value;
    const project = documentStore.project;
    if (!project) return null;
    const inputs = memberInputs(project, memberId);
    const detail = details.get(memberId);
    if (detail && sameInputs(detail.inputs, inputs)) return detail.result.sections;
    const preview = previews.get(memberId);
    return preview && sameInputs(preview.inputs, inputs) ? preview.sections : null;
  }

  /** Diagnostics of an item; with `field`, only those of that field (exactly) or, with `prefix`, of fields under it. */
  function diagnosticsOf(list: ItemList | 'project', id: string, field?: string, prefix = false): ItemDiagnostic[] {
    void diagnosticsRevision.value;
    const all = diagnostics.get(itemKey(list, id)) ?? [];
    if (field === undefined) return all;
    return all.filter((d) => d.field === field || (prefix && (d.field.startsWith(`${field}.`) || d.field.startsWith(`${field}[`))));
  }

  /** Every diagnostic of the project, in list order (for the problems list). */
  const allDiagnostics = computed<ItemDiagnostic[]>(() => {
    void diagnosticsRevision.value;
    return [...diagnostics.values()].flat();
  });

  /** Members without current results. */
  const outdatedCount = computed(() => {
    void revision.value;
    const project = documentStore.project;
    if (!project) return 0;
    return project.members.filter((m) => {
      const view = keyOf(m.id);
      return !view || !view.current;
    }).length;
  });

  // --- storing replies ----------------------------------------------------------------------------

  function remember(memberId: string, key: MemberKeyResults, detail: MemberResult | null, inputs: readonly unknown[] | undefined, urgent: boolean): void {
    if (!inputs) return;
    const entries = (keys.get(memberId) ?? []).filter((e) => !sameInputs(e.inputs, inputs));
    keys.set(memberId, [{ key, inputs }, ...entries].slice(0, KEY_HISTORY));
    if (detail) {
      // The sections sent ahead were computed from the same inputs by the same engine: keep
      // those objects, so that the charts drawn from them are not drawn a second time.
      const preview = previews.get(memberId);
      previews.delete(memberId);
      const result = preview && sameInputs(preview.inputs, inputs) && sameSections(preview.sections, detail.sections) ? { ...detail, sections: preview.sections } : detail;
      details.delete(memberId);
      details.set(memberId, { result, inputs });
      while (details.size > DETAIL_CACHE_SIZE) {
        const oldest = [...details.keys()].find((id) => id !== focusedMemberId.value);
        if (oldest === undefined) break;
        details.delete(oldest);
      }
      if (memberId === focusedMemberId.value) {
        detailArrivals.value = { memberId, at: performance.now() };
        perfMark('hl:analysis:detail');
      }
    }
    if (urgent || detail) bump();
    else bumpSoon();
  }

  function applyDiagnostics(list: readonly ItemDiagnostic[], covered: CoveredItems): void {
    for (const name of ['materials', 'sections', 'members', 'continuousMembers'] as const) {
      for (const id of covered[name] ?? []) diagnostics.delete(itemKey(name, id));
    }
    if (covered.project) diagnostics.delete(itemKey('project', ''));
    for (const d of list) {
      const k = itemKey(d.list, d.itemId);
      diagnostics.set(k, [...(diagnostics.get(k) ?? []), d]);
    }
    diagnosticsRevision.value++;
  }

  /** Replies of a job; `urgent`: shown at once (the member being edited), else at the next frame. */
  function onReply(inputsAtSend: ReadonlyMap<string, readonly unknown[]>, progress: { done: number; total: number }, urgent = true) {
    return (reply: WorkerReply) => {
      if (reply.type === 'member') {
        const inputs = inputsAtSend.get(reply.memberId);
        // Sections sent ahead in this job and left out of the result: put back (same analyses).
        const ahead = reply.sectionsSent ? previews.get(reply.memberId) : undefined;
        const usable = ahead && inputs && sameInputs(ahead.inputs, inputs);
        // (Were they gone — the project was reset meanwhile — only the key results are kept.)
        const detail = !reply.detail || !reply.sectionsSent ? reply.detail : usable ? { ...reply.detail, sections: ahead.sections } : null;
        remember(reply.memberId, reply.key, detail, inputs, urgent);
      }
      else if (reply.type === 'sections') {
        const inputs = inputsAtSend.get(reply.memberId);
        if (!inputs) return;
        // The same curves may come twice (the sections worker and the member's own job): the first
        // to arrive is kept, so that the chart is drawn once and the member result holds those objects.
        // Curves of the current inputs are never replaced by those of an earlier edit's job.
        const shown = previews.get(reply.memberId) ?? details.get(reply.memberId);
        const project = documentStore.project;
        const current = project ? memberInputs(toRaw(project), reply.memberId) : null;
        if (shown && (sameInputs(shown.inputs, inputs) || (current !== null && sameInputs(shown.inputs, current)))) return;
        previews.set(reply.memberId, { sections: reply.sections, inputs });
        if (reply.memberId === focusedMemberId.value) perfMark('hl:analysis:sections');
        sectionsRevision.value++;
      }
      else if (reply.type === 'progress') {
        progress.done = reply.done;
        progress.total = reply.total;
      } else if (reply.type === 'diagnostics') applyDiagnostics(reply.diagnostics, reply.covered);
    };
  }

  function reportFailure(error: unknown): void {
    if (error instanceof CancelledError) return;
    lastError.value = error instanceof Error ? error.message : String(error);
  }

  // --- validation of changed items -------------------------------------------------------------------

  /** The items changed since they were last validated, as a small project to validate. */
  function validationJob(project: Project): Project | null {
    if (validatedInfo !== project.info) {
      validated.clear();
      validatedInfo = project.info;
    }
    const changed = (list: ItemList, item: { id: string }) => validated.get(itemKey(list, item.id)) !== item;
    const members = project.members.filter((m) => changed('members', m));
    const continuousMembers = (project.continuousMembers ?? []).filter((m) => changed('continuousMembers', m));
    const sectionIds = new Set([...project.sections.filter((s) => changed('sections', s)).map((s) => s.id), ...[...members, ...continuousMembers].flatMap((m) => m.zones.map((z) => z.sectionId))]);
    const sections = project.sections.filter((s) => sectionIds.has(s.id));
    const materialIds = new Set([...project.materials.filter((m) => changed('materials', m)).map((m) => m.id), ...sections.flatMap(sectionMaterialIds), ...members.flatMap(memberOwnMaterialIds)]);
    const materials = project.materials.filter((m) => materialIds.has(m.id));
    // Forget diagnostics of items that are gone.
    const present = new Set([...project.members.map((m) => itemKey('members', m.id)), ...(project.continuousMembers ?? []).map((m) => itemKey('continuousMembers', m.id)), ...project.sections.map((s) => itemKey('sections', s.id)), ...project.materials.map((m) => itemKey('materials', m.id)), itemKey('project', '')]);
    let removed = false;
    for (const k of [...diagnostics.keys()]) {
      if (!present.has(k)) {
        diagnostics.delete(k);
        removed = true;
      }
    }
    if (removed) diagnosticsRevision.value++;
    if (members.length === 0 && continuousMembers.length === 0 && sections.length === 0 && materials.length === 0) return null;
    for (const m of members) validated.set(itemKey('members', m.id), m);
    for (const m of continuousMembers) validated.set(itemKey('continuousMembers', m.id), m);
    for (const s of sections) validated.set(itemKey('sections', s.id), s);
    for (const m of materials) validated.set(itemKey('materials', m.id), m);
    return { ...project, members, sections, materials, continuousMembers };
  }

  function markAllValidated(project: Project): void {
    validated.clear();
    validatedInfo = project.info;
    for (const m of project.members) validated.set(itemKey('members', m.id), m);
    for (const m of project.continuousMembers ?? []) validated.set(itemKey('continuousMembers', m.id), m);
    for (const s of project.sections) validated.set(itemKey('sections', s.id), s);
    for (const m of project.materials) validated.set(itemKey('materials', m.id), m);
  }

  // --- automatic re-analysis ----------------------------------------------------------------------

  /** Members to analyse now: changed since last considered, and the member on screen when its results are missing. */
  function membersToAnalyse(project: Project): { ids: string[]; detailIds: string[] } {
    const ids: string[] = [];
    const focus = focusedMemberId.value;
    let detailIds: string[] = [];
    for (const member of project.members) {
      const inputs = memberInputs(project, member.id)!;
      const key = keyOf(member.id);
      const isFocus = member.id === focus;
      const detail = isFocus ? detailOf(member.id) : null;
      const needsDetail = isFocus && !(detail && detail.current);
      if (needsDetail) detailIds = [member.id];
      if (key?.current && !needsDetail) {
        considered.set(member.id, inputs);
        continue;
      }
      const batchWillDo = runningBatch !== null && sameInputs(batchInputs.get(member.id), inputs);
      if (needsDetail || (!sameInputs(considered.get(member.id), inputs) && !batchWillDo)) ids.push(member.id);
    }
    if (focus && ids.includes(focus)) ids.sort((a, b) => (a === focus ? -1 : b === focus ? 1 : 0));
    return { ids, detailIds };
  }

  let lastRun = 0;

  /**
   * Re-analysis after an edit: at once when nothing ran for a moment (the job goes to the worker
   * before the page re-renders, so both work in parallel), else after the short delay, so that a
   * burst of typing becomes one job with the latest values.
   */
  function schedule(delay?: number): void {
    if (timer) clearTimeout(timer);
    timer = null;
    // The interactive worker is still busy with an earlier member analysis, which it cannot leave
    // before it ends: the section curves of the member on screen come from their own worker now.
    if (runningInteractive !== null) requestSections();
    const quiet = runningInteractive === null && performance.now() - lastRun > AUTO_ANALYSIS_DELAY_MS;
    if (delay === undefined && quiet) {
      lastRun = performance.now();
      void runInteractive();
      return;
    }
    timer = setTimeout(() => {
      timer = null;
      lastRun = performance.now();
      void runInteractive();
    }, delay ?? AUTO_ANALYSIS_DELAY_MS);
  }

  let sectionsJob: RunningRequest | null = null;
  let sectionsAgain = false;

  /**
   * The section curves of the member on screen for its current inputs, from the sections worker;
   * one job at a time, the latest inputs when it ends (a burst of typing costs at most one stale
   * job). Nothing is sent when they are there already or the member derives its sections (as-found
   * condition, schemes: those come with the member result). A failure is left to the member's own
   * analysis, which analyses the same sections and reports it.
   */
  function requestSections(): void {
    const memberId = focusedMemberId.value;
    const project = documentStore.project;
    if (!memberId || !project) return;
    if (sectionsJob) {
      sectionsAgain = true;
      return;
    }
    const raw = toRaw(project);
    const member = raw.members.find((m) => m.id === memberId);
    const inputs = memberInputs(raw, memberId);
    if (!member || !inputs || !sectionsGoAhead(member)) return;
    const shown = previews.get(memberId) ?? details.get(memberId);
    if (shown && sameInputs(shown.inputs, inputs)) return;
    const part = subproject(raw, [memberId]);
    perfMark('hl:analysis:sent');
    const job = engines().sections.request({ type: 'sections', project: part, indexMap: indexMapOf(raw, part), memberId }, onReply(new Map([[memberId, inputs]]), { done: 0, total: 0 }));
    sectionsJob = job;
    const next = () => {
      sectionsJob = null;
      if (!sectionsAgain) return;
      sectionsAgain = false;
      requestSections();
    };
    job.finished.then(next, next);
  }

  async function runInteractive(): Promise<void> {
    const project = documentStore.project;
    if (!project) return;
    if (runningInteractive) {
      // The running job stops after the member in hand; this runs again when it has.
      engines().interactive.cancel(runningInteractive.id);
      return;
    }
    const channel = engines().interactive;
    const raw = toRaw(project);
    const { ids, detailIds } = membersToAnalyse(raw);
    let request: RunningRequest | null = null;
    if (ids.length > 0) {
      const inputsAtSend = new Map(ids.map((id) => [id, memberInputs(raw, id)!] as const));
      for (const [id, inputs] of inputsAtSend) considered.set(id, inputs);
      const part = subproject(raw, ids);
      interactive.running = true;
      interactive.done = 0;
      interactive.total = ids.length;
      perfMark('hl:analysis:sent');
      request = channel.request(
        { type: 'analyze', project: part, indexMap: indexMapOf(raw, part), memberIds: ids, detailIds, validate: false, chunkSize: INTERACTIVE_CHUNK },
        onReply(inputsAtSend, interactive),
      );
    }
    // Validation after the analysis request: the worker answers the member on screen first, then
    // checks the changed items while it yields between chunks.
    const toValidate = validationJob(raw);
    if (toValidate) {
      channel.request({ type: 'validate', project: toValidate, indexMap: indexMapOf(raw, toValidate) }, onReply(new Map(), { done: 0, total: 0 })).finished.catch(reportFailure);
    }
    if (!request) return;
    runningInteractive = request;
    try {
      const final = await request.finished;
      if (final.type === 'cancelled') for (const id of final.remaining) considered.delete(id);
      else lastError.value = null;
    } catch (error) {
      for (const id of ids) if (!keyOf(id)?.current) considered.delete(id);
      reportFailure(error);
    } finally {
      runningInteractive = null;
      interactive.running = false;
    }
    if (documentStore.project !== project || membersToAnalyse(toRaw(documentStore.project!)).ids.length > 0) schedule(0);
  }

  // --- whole project ------------------------------------------------------------------------------------

  /**
   * Analyses every member in the batch worker, with progress, and every continuous member again (the
   * continuous store, in the interactive worker; the status bar says so while they run). Replaces a
   * run in progress; resolves when both are done.
   */
  async function analyseAll(): Promise<void> {
    const project = documentStore.project;
    if (!project) return;
    cancelAll();
    const raw = toRaw(project);
    const ids = raw.members.map((m) => m.id);
    const inputsAtSend = new Map(ids.map((id) => [id, memberInputs(raw, id)!] as const));
    batchInputs = inputsAtSend;
    for (const [id, inputs] of inputsAtSend) considered.set(id, inputs);
    markAllValidated(raw);
    Object.assign(batch, { running: true, done: 0, total: ids.length, startedAt: performance.now(), elapsedMs: 0, outcome: '' });
    lastError.value = null;
    const request = engines().batch.request(
      { type: 'analyze', project: raw, indexMap: null, memberIds: ids, detailIds: [], validate: true, chunkSize: BATCH_CHUNK },
      onReply(inputsAtSend, batch, false),
    );
    runningBatch = request;
    schedule(0); // the member on screen still gets its full results from the other worker
    const continuousRun = useContinuousStore().analyseAll().catch(reportFailure);
    try {
      await request.finished;
      if (runningBatch === request) batch.outcome = 'done';
    } catch (error) {
      if (runningBatch === request) batch.outcome = error instanceof CancelledError ? 'cancelled' : 'failed';
      reportFailure(error);
    } finally {
      if (runningBatch === request) {
        runningBatch = null;
        batchInputs = new Map();
        batch.running = false;
        batch.elapsedMs = performance.now() - batch.startedAt;
      }
    }
    await continuousRun;
  }

  /** Stops the whole-project analysis at once (terminates its worker). Results already in are kept. */
  function cancelAll(): void {
    if (!runningBatch) return;
    engines().batch.terminate();
  }

  /** The strain and stress state of a section at a curvature (computed in the worker). */
  async function stateAt(sectionId: string, direction: BendingDirection, curvature: number, guess: number): Promise<SectionState> {
    const project = documentStore.project;
    if (!project) throw new Error('No project is open.');
    const raw = toRaw(project);
    const section = raw.sections.find((s) => s.id === sectionId);
    if (!section) throw new Error(`There is no section "${sectionId}".`);
    const ids = new Set(sectionMaterialIds(section));
    const part: Project = { ...raw, members: [], sections: [section], materials: raw.materials.filter((m) => ids.has(m.id)) };
    const reply = await engines().interactive.request({ type: 'state', project: part, sectionId, direction, curvature, guess }).finished;
    if (reply.type !== 'state') throw new Error('The section state could not be computed.');
    return reply.state;
  }

  /** The results summary as CSV text (analysed in the batch worker), with progress in `batch`. */
  async function resultsCsv(onProgress?: (done: number, total: number) => void): Promise<string> {
    const project = documentStore.project;
    if (!project) throw new Error('No project is open.');
    const reply = await engines().batch.request({ type: 'csv', project: toRaw(project) }, (r) => {
      if (r.type === 'progress') onProgress?.(r.done, r.total);
    }).finished;
    if (reply.type !== 'text') throw new Error('The CSV file could not be written.');
    return reply.text;
  }

  /** Forgets everything (a different project was opened). */
  function reset(): void {
    if (timer) clearTimeout(timer);
    timer = null;
    cancelAll();
    if (runningInteractive) engines().interactive.cancel(runningInteractive.id);
    keys.clear();
    details.clear();
    previews.clear();
    diagnostics.clear();
    considered.clear();
    validated.clear();
    validatedInfo = null;
    Object.assign(batch, { running: false, done: 0, total: 0, startedAt: 0, elapsedMs: 0, outcome: '' });
    lastError.value = null;
    bump();
    diagnosticsRevision.value++;
  }

  watch(() => documentStore.project, (next, previous) => {
    if (!next) {
      reset();
      return;
    }
    if (previous && next !== previous) schedule();
  });
  watch(focusedMemberId, () => schedule(0));

  return {
    revision, diagnosticsRevision, focusedMemberId, batch, interactive, lastError, detailArrivals, outdatedCount, allDiagnostics,
    keyOf, detailOf, sectionsOf, diagnosticsOf, analyseAll, cancelAll, stateAt, resultsCsv, reset, schedule,
  };
});
