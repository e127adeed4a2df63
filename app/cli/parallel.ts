/**
 * Members analysed in parallel on Node worker threads. Each worker receives the project once, then
 * asks for work: the parent hands out the members in chunks, one chunk at a time, to whichever
 * worker is free, and puts the results back in project order, so they are identical to a serial
 * analysis.
 *
 * Why chunks on demand rather than a fixed share per worker: members differ in cost by two orders of
 * magnitude (a simple span in a few ms, a member whose hinges soften and snap back in hundreds), and
 * with fixed shares one worker could still be busy long after the other had finished — on a busy
 * machine the parallel run was then slower than one thread. Chunks shrink towards the end
 * (`chunkSize`), so the last members are spread over the workers too. Each worker posts its results
 * chunk by chunk and keeps none of them, so memory grows only in the parent.
 * Each worker analyses the sections its members use once (one section cache for all its chunks).
 * Workers start from the bundle (out/cli/<build>/cli-worker.mjs); from the sources, worker-entry.mjs
 * registers tsx's loader in the worker, then loads worker.ts.
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import type { Project } from '../../core/project/types.ts';
import { ownModule } from './bundle.ts';
import type { ParentMessage, WorkerInput, WorkerMessage } from './worker.ts';
import { resultUnpacker } from './shared-sections.ts';
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

/** The largest chunk handed to a worker at once (a few hundred ms of work at most). */
export const MAX_CHUNK = 16;

/**
 * Members in the next chunk, `remaining` members left for `workers` workers: about a quarter of
 * an equal share, at most MAX_CHUNK and at least one, so chunks shrink as the end comes near
 * (guided scheduling).
 */
export function chunkSize(remaining: number, workers: number): number {
  return Math.max(1, Math.min(MAX_CHUNK, Math.ceil(remaining / (4 * Math.max(1, workers)))));
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
  const count = Math.max(1, Math.min(options.workers ?? defaultWorkerCount(ids.length), ids.length));

  return new Promise<MemberResult[]>((resolve, reject) => {
    const workers: Worker[] = [];
    /** Workers ended on purpose (no work left for them); any other exit before the end is a failure. */
    const ended = new Set<Worker>();
    /** Chunks handed to each worker whose results have not come back. */
    const inFlight = new Map<Worker, number>();
    const byId = new Map<string, MemberResult>();
    let next = 0;
    let done = 0;
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

    /** Hands the worker its next chunk, or ends it when none is left (and the run when all are in). */
    const feed = (worker: Worker) => {
      if (next < ids.length) {
        const size = chunkSize(ids.length - next, count);
        const message: ParentMessage = { type: 'analyze', memberIds: ids.slice(next, next + size) };
        next += size;
        inFlight.set(worker, (inFlight.get(worker) ?? 0) + 1);
        worker.postMessage(message);
        return;
      }
      // Nothing left to hand out: the worker ends once the chunks it holds are in.
      if (inFlight.get(worker)! > 0) return;
      ended.add(worker);
      void worker.terminate();
      if (byId.size < ids.length) return;
      settled = true;
      signal?.removeEventListener('abort', onAbort);
      stopAll();
      // Project order, as analyzeMembers returns them (ids are unique in a valid project).
      resolve(ids.map((id) => byId.get(id)!).filter((r): r is MemberResult => r !== undefined));
    };

    for (let k = 0; k < count; k++) {
      const input: WorkerInput = { project };
      const worker = new Worker(WORKER_ENTRY, { workerData: input });
      workers.push(worker);
      const unpack = resultUnpacker();
      worker.on('message', (message: WorkerMessage) => {
        if (settled) return;
        if (message.type === 'progress') {
          done++;
          onProgress?.(done, ids.length, message.memberId);
        } else if (message.type === 'results') {
          for (const r of unpack(message.packed)) byId.set(r.memberId, r);
          inFlight.set(worker, inFlight.get(worker)! - 1);
          feed(worker);
        } else {
          fail(new Error(`a worker failed: ${message.message}`));
        }
      });
      worker.on('error', (error) => fail(error instanceof Error ? error : new Error(String(error))));
      worker.on('exit', (code) => {
        if (!settled && !ended.has(worker)) fail(new Error(`a worker stopped unexpectedly (exit code ${code})`));
      });
    }
    // Two chunks in flight per worker (dealt in turn): the next is waiting in its queue when it
    // finishes one, so it never idles for the parent's reply (slow to come on a busy machine).
    for (let pass = 0; pass < 2; pass++) for (const worker of workers) if (!settled && !ended.has(worker)) feed(worker);
  });
}
