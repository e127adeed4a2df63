/**
 * Charts drawn on worker threads, for large reports: each worker draws one chart at a time (which
 * bounds memory) and takes the next job as soon as it is done. The drawings are the same as on the
 * main thread (same renderer, same configuration), so the report does not depend on the worker
 * count. Workers run TypeScript through tsx (chart-worker-entry.mjs registers its loader).
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { ownModule } from '../cli/bundle.ts';
import type { ChartJob, ChartJobResult } from './chart-worker.ts';

const WORKER_ENTRY = ownModule(import.meta.url, 'chart-worker.mjs', './chart-worker-entry.mjs');

/** Worker count: one per core, at most `jobs`, at least 1. */
export function chartWorkerCount(jobs: number, cores: number = availableParallelism()): number {
  return Math.max(1, Math.min(cores, jobs));
}

/**
 * Draws every job on `workers` threads; resolves with the drawings by job id. Rejects when a worker
 * fails or a chart cannot be drawn (all workers are stopped then).
 */
export function renderChartsInWorkers(jobs: readonly ChartJob[], workers: number = chartWorkerCount(jobs.length)): Promise<Record<string, string>> {
  if (jobs.length === 0) return Promise.resolve({});
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
    for (let i = 0; i < Math.max(1, Math.min(workers, jobs.length)); i++) {
      const worker = new Worker(WORKER_ENTRY, { resourceLimits: { maxYoungGenerationSizeMb: 48 } });
      pool.push(worker);
      worker.on('message', (message: ChartJobResult) => {
        if (settled) return;
        if (!message.ok) return fail(new Error(`chart "${message.id}" could not be drawn: ${message.message}`));
        results[message.id] = message.data;
        done++;
        if (done === jobs.length) {
          settled = true;
          stop();
          resolve(results);
        } else {
          feed(worker);
        }
      });
      worker.on('error', (error) => fail(error instanceof Error ? error : new Error(String(error))));
      worker.on('exit', (code) => {
        if (!settled) fail(new Error(`a chart worker stopped unexpectedly (exit code ${code})`));
      });
      feed(worker);
    }
  });
}
