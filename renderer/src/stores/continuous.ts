/**
 * Results of the open project's continuous members (project version 3) and the scheduling of the
 * analyses that produce them. Nothing is computed here: the members are analysed in the
 * interactive worker (`analyze-continuous`), and this store keeps what comes back, tagged with the
 * inputs (by identity, project/dependencies.ts `continuousInputs`) it was computed from — so a
 * result is shown as current exactly when nothing it depends on changed, and undo shows the
 * earlier result again at once.
 *
 * A project holds few continuous members and each takes tens of milliseconds, so after every edit
 * the members whose inputs changed are analysed again (the one on screen first), one job at a time.
 * Their diagnostics come from the analysis store's validation (list `continuousMembers`). "Analyse
 * all" (the analysis store's `analyseAll`) sends every continuous member again (`analyseAll` here).
 */
import { defineStore } from 'pinia';
import { ref, toRaw, watch } from 'vue';
import type { ContinuousMemberResult } from '../../../core/assessment/continuous-verdict.ts';
import type { Project } from '../../../core/project/types.ts';
import { continuousInputs, continuousSubproject, sameInputs } from '../project/dependencies.ts';
import { CancelledError, engines } from '../workers/engine.ts';
import type { WorkerReply } from '../workers/protocol.ts';
import { useDocumentStore } from './document.ts';

/** Earlier results kept per member (undo shows them again without analysing). */
export const CONTINUOUS_HISTORY = 3;
/** Delay between an edit and the analysis it causes, ms (a burst of typing becomes one job). */
export const CONTINUOUS_DELAY_MS = 30;

interface Entry {
  readonly result: ContinuousMemberResult;
  readonly inputs: readonly unknown[];
}

export interface ContinuousView {
  readonly result: ContinuousMemberResult;
  /** False when the member changed since these results were computed (shown as outdated). */
  readonly current: boolean;
}

export const useContinuousStore = defineStore('continuous', () => {
  const documentStore = useDocumentStore();
  /** Bumped whenever results arrive (the map itself is not reactive). */
  const revision = ref(0);
  const running = ref(false);
  const lastError = ref<string | null>(null);
  /** The continuous member on screen: analysed first. */
  const focusedId = ref<string | null>(null);
  const results = new Map<string, Entry[]>();
  /** Inputs of each member when it was last sent (so that an unchanged member is not sent again). */
  const considered = new Map<string, readonly unknown[]>();
  let timer: ReturnType<typeof setTimeout> | null = null;
  let job: { readonly id: number; readonly finished: Promise<unknown> } | null = null;

  function resultOf(memberId: string): ContinuousView | null {
    void revision.value;
    const project = documentStore.project;
    const entries = results.get(memberId);
    if (!project || !entries || entries.length === 0) return null;
    const inputs = continuousInputs(project, memberId);
    const current = entries.find((e) => sameInputs(e.inputs, inputs));
    return current ? { result: current.result, current: true } : { result: entries[0]!.result, current: false };
  }

  /** Continuous members whose inputs changed since they were last sent, the one on screen first. */
  function toAnalyse(project: Project): string[] {
    const ids = (project.continuousMembers ?? []).map((m) => m.id).filter((id) => !sameInputs(considered.get(id), continuousInputs(project, id)));
    const focus = focusedId.value;
    return focus && ids.includes(focus) ? [focus, ...ids.filter((id) => id !== focus)] : ids;
  }

  function remember(memberId: string, result: ContinuousMemberResult, inputs: readonly unknown[]): void {
    const entries = (results.get(memberId) ?? []).filter((e) => !sameInputs(e.inputs, inputs));
    results.set(memberId, [{ result, inputs }, ...entries].slice(0, CONTINUOUS_HISTORY));
    revision.value++;
  }

  async function run(): Promise<void> {
    timer = null;
    const project = documentStore.project;
    if (!project) return;
    const channel = engines().interactive;
    if (job) {
      // The running job stops after the member in hand; this runs again when it has.
      channel.cancel(job.id);
      return;
    }
    const raw = toRaw(project);
    const ids = toAnalyse(raw);
    if (ids.length === 0) return;
    const inputsAtSend = new Map(ids.map((id) => [id, continuousInputs(raw, id)!] as const));
    for (const [id, inputs] of inputsAtSend) considered.set(id, inputs);
    running.value = true;
    const request = channel.request({ type: 'analyze-continuous', project: continuousSubproject(raw, ids), memberIds: ids }, (reply: WorkerReply) => {
      if (reply.type !== 'continuous') return;
      const inputs = inputsAtSend.get(reply.memberId);
      if (inputs) remember(reply.memberId, reply.result, inputs);
    });
    job = request;
    try {
      const final = await request.finished;
      if (final.type === 'cancelled') for (const id of final.remaining) considered.delete(id);
      lastError.value = null;
    } catch (error) {
      for (const id of ids) if (!resultOf(id)?.current) considered.delete(id);
      if (!(error instanceof CancelledError)) lastError.value = error instanceof Error ? error.message : String(error);
    } finally {
      job = null;
      running.value = false;
    }
    const now = documentStore.project;
    if (now && toAnalyse(toRaw(now)).length > 0) schedule(0);
  }

  function schedule(delay = CONTINUOUS_DELAY_MS): void {
    if (timer) clearTimeout(timer);
    timer = setTimeout(() => void run(), delay);
  }

  /**
   * Analyses every continuous member again, whether or not its inputs changed ("Analyse all"): a job
   * in progress is stopped after its member in hand, then all are sent. Resolves when they are done
   * (or the run was replaced).
   */
  async function analyseAll(): Promise<void> {
    const project = documentStore.project;
    if (!project || (project.continuousMembers?.length ?? 0) === 0) return;
    while (job) {
      const current = job;
      engines().interactive.cancel(current.id);
      await current.finished.catch(() => undefined);
    }
    if (timer) clearTimeout(timer);
    timer = null;
    considered.clear();
    await run();
  }

  /** Forgets everything (another project was opened). */
  function reset(): void {
    if (timer) clearTimeout(timer);
    timer = null;
    if (job) engines().interactive.cancel(job.id);
    results.clear();
    considered.clear();
    lastError.value = null;
    revision.value++;
  }

  /** Members without current results (for the status bar). */
  function outdatedCount(): number {
    void revision.value;
    const project = documentStore.project;
    return (project?.continuousMembers ?? []).filter((m) => !resultOf(m.id)?.current).length;
  }

  watch(() => documentStore.project, (next) => {
    if (!next) {
      reset();
      return;
    }
    if ((next.continuousMembers?.length ?? 0) > 0) schedule();
  }, { immediate: true });
  watch(focusedId, () => schedule(0));

  return { revision, running, lastError, focusedId, resultOf, outdatedCount, reset, schedule, analyseAll };
});
