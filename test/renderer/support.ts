/**
 * Support for the renderer's component and store tests: a fake host, analysis workers running
 * in-process (the same service as the real Web Worker), a fresh Pinia, and waiting helpers.
 */
import { createPinia, setActivePinia, type Pinia } from 'pinia';
import { createFakeHost, setHostForTesting, type FakeHost, type FakeHostSeed } from '../../renderer/src/host/index.ts';
import { setWorkerFactory, type WorkerFactory, type WorkerLike } from '../../renderer/src/workers/engine.ts';
import { inProcessWorkerFactory } from '../../renderer/src/workers/in-process.ts';
import type { WorkerReply, WorkerRequest } from '../../renderer/src/workers/protocol.ts';

export interface TestEnvironment {
  readonly host: FakeHost;
  readonly pinia: Pinia;
  /** Every request sent to any worker, in order. */
  readonly requests: WorkerRequest[];
}

/** A factory that records requests and runs them in-process. */
export function recordingFactory(requests: WorkerRequest[], inner: WorkerFactory = inProcessWorkerFactory): WorkerFactory {
  return () => {
    const worker = inner();
    const wrapped: WorkerLike = {
      get onmessage() { return worker.onmessage; },
      set onmessage(handler) { worker.onmessage = handler; },
      get onerror() { return worker.onerror; },
      set onerror(handler) { worker.onerror = handler; },
      postMessage(message) {
        requests.push(message);
        worker.postMessage(message);
      },
      terminate() {
        worker.terminate();
      },
    };
    return wrapped;
  };
}

/**
 * In-process workers that read, write and validate project files but never analyse (requests to
 * analyse stay unanswered): for shell tests that need no results, so that they stay light on a
 * busy machine.
 */
export const noAnalysisFactory: WorkerFactory = () => {
  const worker = inProcessWorkerFactory();
  const post = worker.postMessage.bind(worker);
  worker.postMessage = (message) => {
    if (message.type !== 'analyze' && message.type !== 'analyze-continuous' && message.type !== 'sections') post(message);
  };
  return worker;
};

/** Requests whose replies are recorded once and replayed (see `replayingFactory`). */
type Replayable = Extract<WorkerRequest, { type: 'analyze' | 'analyze-continuous' }>;
const isReplayable = (message: WorkerRequest): message is Replayable => message.type === 'analyze' || message.type === 'analyze-continuous';

/**
 * Every reply of each analysis job that ran to its end, by the job's request (its id aside).
 * Module state: kept for the test files a Vitest worker runs (the renderer project shares one
 * module graph per worker), so a job runs for real once per worker at most.
 */
const recordedJobs = new Map<string, readonly WorkerReply[]>();

/**
 * In-process workers that run each analysis job once and answer the same request
 * again (same project, members, options; any id) with the replies recorded the first time — a
 * fixture computed once and shared. The analysis is deterministic, so the replies are those the
 * service would send again; they still arrive one per task, each a fresh copy with the new id, and a
 * cancel or terminate stops them as it would stop the job (`cancelled` lists the members not yet
 * answered). Store tests that open and analyse the whole demo in every test spent most of their time
 * analysing it again.
 */
export function replayingFactory(inner: WorkerFactory = inProcessWorkerFactory): WorkerFactory {
  return () => {
    const worker = inner();
    let stopped = false;
    /** Jobs run for real, whose replies are being recorded. */
    const recording = new Map<number, { key: string; replies: WorkerReply[] }>();
    /** Jobs being answered from a recording, with whether a cancel came for them. */
    const replaying = new Map<number, { cancelled: boolean }>();
    const wrapped: WorkerLike = {
      onmessage: null,
      onerror: null,
      postMessage(message) {
        if (message.type === 'cancel' && replaying.has(message.target)) {
          replaying.get(message.target)!.cancelled = true;
          return;
        }
        if (isReplayable(message)) {
          const key = JSON.stringify({ ...message, id: 0 });
          const replies = recordedJobs.get(key);
          if (replies) {
            replay(message, replies);
            return;
          }
          recording.set(message.id, { key, replies: [] });
        }
        worker.postMessage(message);
      },
      terminate() {
        stopped = true;
        worker.terminate();
      },
    };
    const deliver = (reply: WorkerReply) => wrapped.onmessage?.({ data: reply } as MessageEvent<WorkerReply>);
    worker.onmessage = (event) => {
      const reply = event.data;
      const job = recording.get(reply.id);
      if (job) {
        job.replies.push(structuredClone(reply));
        if (reply.type === 'done') recordedJobs.set(job.key, job.replies);
        if (reply.type === 'done' || reply.type === 'cancelled' || reply.type === 'error') recording.delete(reply.id);
      }
      deliver(reply);
    };
    worker.onerror = (event) => wrapped.onerror?.(event);

    function replay(request: Replayable, replies: readonly WorkerReply[]): void {
      const job = { cancelled: false };
      replaying.set(request.id, job);
      const answered = new Set<string>();
      let next = 0;
      const step = () => {
        if (stopped) return;
        if (job.cancelled) {
          replaying.delete(request.id);
          deliver({ type: 'cancelled', id: request.id, remaining: request.memberIds.filter((m) => !answered.has(m)) });
          return;
        }
        const reply = { ...structuredClone(replies[next]!), id: request.id } as WorkerReply;
        next += 1;
        if (reply.type === 'member' || reply.type === 'continuous') answered.add(reply.memberId);
        if (next === replies.length) replaying.delete(request.id);
        deliver(reply);
        if (next < replies.length) setTimeout(step, 0);
      };
      setTimeout(step, 0);
    }
    return wrapped;
  };
}

/**
 * A fresh Pinia, a fake host and in-process workers, set as the app's. `analyse: false`: no
 * analyses; `replay: true`: an analysis job already run (in this worker) is answered with its
 * recorded replies (`replayingFactory`).
 */
export function testEnvironment(seed: FakeHostSeed = {}, options: { analyse?: boolean; replay?: boolean } = {}): TestEnvironment {
  const host = createFakeHost(seed);
  setHostForTesting(host);
  const requests: WorkerRequest[] = [];
  const inner = options.analyse === false ? noAnalysisFactory : options.replay ? replayingFactory() : inProcessWorkerFactory;
  setWorkerFactory(recordingFactory(requests, inner));
  const pinia = createPinia();
  setActivePinia(pinia);
  return { host, pinia, requests };
}

/**
 * Waits (real time) until `condition` holds; fails with `what` after `timeoutMs`. The default is a
 * bound for a hang, not an expectation of speed: 20 s was hit by an in-process whole-demo analysis
 * on the shared 2-core machine under load 25 (the test's own budget, 60–120 s, is the real limit).
 */
export async function until(condition: () => boolean, what: string, timeoutMs = 100_000): Promise<void> {
  const start = Date.now();
  while (!condition()) {
    if (Date.now() - start > timeoutMs) throw new Error(`timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 10));
  }
}

/** A worker that takes requests and never answers (for component tests that must not analyse). */
export const silentFactory: WorkerFactory = () => ({ onmessage: null, onerror: null, postMessage: () => undefined, terminate: () => undefined });
