/**
 * Members analysed in parallel on Node worker threads. Each worker receives the project and a list
 * of member ids, calls `analyzeMembers` (core/analysis.ts) and posts the results back as plain data;
 * the results are put back in project order, so they are identical to a serial analysis.
 *
 * Members are dealt round-robin to the workers (member i to worker i mod n), which balances long and
 * short members well in practice. Each worker analyses the sections its members use once.
 * Workers start from the bundle (out/cli/<build>/cli-worker.mjs); from the sources, worker-entry.mjs
 * registers tsx's loader in the worker, then loads worker.ts.
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import type { Project } from '../../core/project/types.ts';
import { ownModule } from './bundle.ts';
import type { WorkerInput, WorkerMessage } from './worker.ts';
import type { MemberResult } from '../../core/assessment/results.ts';

export interface ParallelOptions {
  /** Number of worker threads (default: `defaultWorkerCount`); at least 1. */
  readonly workers?: number;
  /** Aborting terminates every worker and rejects with an AbortError. */
  readonly signal?: AbortSignal;
  /** Called after each member, from the main thread, with the count over all workers. */
  readonly onProgress?: (done: number, total: number, memberId: string) => void;
}

const WORKER_ENTRY = ownModule(import.meta.url, 'cli-worker.mjs', './worker-entry.mjs');

/** Members per worker below which another worker costs more (its start-up, about 0.3 s) than it saves. */
export const MEMBERS_PER_WORKER = 8;

/**
 * Default worker count: one per core, no more than one per MEMBERS_PER_WORKER members, at least 1
 * (1 means: analyse in this thread, no worker at all). The machine's load is not taken into account:
 * measured with two busy processes on the two cores (npm run bench), `--jobs 2` finished 300 members
 * in 0.81× and 0.94× the time of `--jobs 1`, because the scheduler shares the cores per thread; the
 * workers' own cost (start-up from the bundle, warming up, copying results) is about a third more CPU.
 */
export function defaultWorkerCount(members: number, cores: number = availableParallelism()): number {
  return Math.max(1, Math.min(cores, Math.floor(members / MEMBERS_PER_WORKER)));
}

/** Member ids dealt round-robin into `count` non-empty groups (order kept within each group). */
export function partition<T>(items: readonly T[], count: number): T[][] {
  const n = Math.max(1, Math.min(count, items.length));
  const groups: T[][] = Array.from({ length: n }, () => []);
  items.forEach((item, i) => groups[i % n]!.push(item));
  return groups.filter((g) => g.length > 0);
}

function abortError(signal: AbortSignal): Error {
  const reason: unknown = signal.reason;
  if (reason instanceof Error && reason.name === 'AbortError') return reason;
  const error = new Error('the analysis was cancelled');
  error.name = 'AbortError';
  return error;
}

/**
 * Analyses the members with the given ids (all when omitted), in parallel, and returns their results
 * in project order. Member ids must be unique (validate the project first). Rejects with an AbortError
 * when `signal` aborts, and with an Error when a worker fails (a member's own analysis problems are in
 * its result, they do not reject).
 */
export function analyzeMembersParallel(project: Project, memberIds?: readonly string[], options: ParallelOptions = {}): Promise<MemberResult[]> {
  const wanted = memberIds ? new Set(memberIds) : undefined;
  const ids = project.members.filter((m) => !wanted || wanted.has(m.id)).map((m) => m.id);
  const { signal, onProgress } = options;
  if (signal?.aborted) return Promise.reject(abortError(signal));
  if (ids.length === 0) return Promise.resolve([]);
  if (new Set(ids).size !== ids.length) return Promise.reject(new Error('member ids must be unique to analyse a project in parallel (validate the project first)'));
  const groups = partition(ids, options.workers ?? defaultWorkerCount(ids.length));

  return new Promise<MemberResult[]>((resolve, reject) => {
    const workers: Worker[] = [];
    const completed = new Set<Worker>();
    const byId = new Map<string, MemberResult>();
    let done = 0;
    let finished = 0;
    let settled = false;
    const stopAll = () => {
      for (const w of workers) void w.terminate();
    };
    const fail = (error: Error) => {
      if (settled) return;
      settled = true;
      signal?.removeEventListener('abort', onAbort);
      stopAll();
      reject(error);
    };
    const onAbort = () => fail(abortError(signal!));
    signal?.addEventListener('abort', onAbort, { once: true });

    for (const group of groups) {
      const input: WorkerInput = { project, memberIds: group };
      const worker = new Worker(WORKER_ENTRY, { workerData: input });
      workers.push(worker);
      worker.on('message', (message: WorkerMessage) => {
        if (settled) return;
        if (message.type === 'progress') {
          done++;
          onProgress?.(done, ids.length, message.memberId);
        } else if (message.type === 'done') {
          for (const r of message.results) byId.set(r.memberId, r);
          completed.add(worker);
          void worker.terminate();
          finished++;
          if (finished === groups.length) {
            settled = true;
            signal?.removeEventListener('abort', onAbort);
            // Project order, as analyzeMembers returns them (ids are unique in a valid project).
            resolve(ids.map((id) => byId.get(id)!).filter((r): r is MemberResult => r !== undefined));
          }
        } else {
          fail(new Error(`a worker failed: ${message.message}`));
        }
      });
      worker.on('error', (error) => fail(error instanceof Error ? error : new Error(String(error))));
      worker.on('exit', (code) => {
        if (!settled && !completed.has(worker)) fail(new Error(`a worker stopped unexpectedly (exit code ${code})`));
      });
    }
  });
}
