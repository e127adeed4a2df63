/**
 * Charts drawn on worker threads, for large reports: each worker draws one chart at a time (which
 * bounds memory) and takes the next job as soon as it is done; the calling thread, which would only
 * wait, draws from the same queue between the workers' replies, so one core needs no worker (a
 * worker's start costs a few hundred ms of CPU: it loads chart.js and compiles it afresh). The
 * drawings are the same as on the main thread (same renderer, same configuration), so the report
 * does not depend on the worker count. From source, workers run TypeScript through tsx
 * (chart-worker-entry.mjs registers its loader); the built command starts them from its bundle.
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { ownModule } from '../cli/bundle.ts';
import type { ChartJob, ChartJobResult } from './chart-worker.ts';

const WORKER_ENTRY = ownModule(import.meta.url, 'chart-worker.mjs', './chart-worker-entry.mjs');

/** Worker count beside the calling thread: one per other core, fewer than `jobs`, at least 0. */
export function chartWorkerCount(jobs: number, cores: number = availableParallelism()): number {
  return Math.max(0, Math.min(cores - 1, jobs - 1));
}

/** Draws one job on the calling thread (the same renderer the workers use). */
export type DrawHere = (job: ChartJob) => string | Promise<string>;

/**
 * Draws every job on `workers` threads and, when `drawHere` is given, on the calling thread too;
 * resolves with the drawings by job id. Rejects when a worker fails or a chart cannot be drawn (all
 * workers are stopped then). With no worker every job is drawn by `drawHere`.
 */
export function renderChartsInWorkers(jobs: readonly ChartJob[], workers: number = chartWorkerCount(jobs.length), drawHere?: DrawHere): Promise<Record<string, string>> {
  if (jobs.length === 0) return Promise.resolve({});
  if (workers <= 0 && !drawHere) return Promise.reject(new Error('renderChartsInWorkers: no worker and no drawHere to draw the charts'));
  return new Promise((resolve, reject) => {
    const results: Record<string, string> = {};
    const pool: Worker[] = [];
    let next = 0;
    let done = 0;
    let settled = false;
    const stop = () => {
      for (const w of pool) void w.terminate();
    };
    const fail = (error: Error) => {
      if (settled) return;
      settled = true;
      stop();
      reject(error);
    };
    const feed = (worker: Worker) => {
      if (next < jobs.length) worker.postMessage(jobs[next++]!);
    };
    const finished = (id: string, data: string) => {
      results[id] = data;
      done++;
      if (done === jobs.length) {
        settled = true;
        stop();
        resolve(results);
      }
    };
    for (let i = 0; i < Math.min(workers, jobs.length); i++) {
      const worker = new Worker(WORKER_ENTRY, { resourceLimits: { maxYoungGenerationSizeMb: 48 } });
      pool.push(worker);
      worker.on('message', (message: ChartJobResult) => {
        if (settled) return;
        if (!message.ok) return fail(new Error(`chart "${message.id}" could not be drawn: ${message.message}`));
        finished(message.id, message.data);
        if (!settled) feed(worker);
      });
      worker.on('error', (error) => fail(error instanceof Error ? error : new Error(String(error))));
      worker.on('exit', (code) => {
        if (!settled) fail(new Error(`a chart worker stopped unexpectedly (exit code ${code})`));
      });
      feed(worker);
    }
    if (drawHere) {
      // One chart at a time, then back to the event loop so that the workers' replies are read
      // and they are fed without waiting for this thread.
      const here = async () => {
        while (!settled && next < jobs.length) {
          const job = jobs[next++]!;
          finished(job.id, await drawHere(job));
          await new Promise((r) => setImmediate(r));
        }
      };
      here().catch((error: unknown) => fail(error instanceof Error ? error : new Error(String(error))));
    }
  });
}
