/**
 * The analysis service on the calling thread, behind the worker message interface: for component
 * tests only (the app always uses Web Workers; nothing in the app imports this file, so the
 * analysis code stays out of the page's bundle).
 */
import { createAnalysisService } from './analysis-service.ts';
import type { WorkerFactory, WorkerLike } from './engine.ts';
import type { WorkerReply } from './protocol.ts';

/** Replies are delivered asynchronously, as a worker's would be; messages are structured-cloned both ways. */
export const inProcessWorkerFactory: WorkerFactory = () => {
  let stopped = false;
  const worker: WorkerLike = {
    onmessage: null,
    onerror: null,
    postMessage(message) {
      const copy = structuredClone(message);
      setTimeout(() => {
        if (!stopped) void service.handle(copy);
      }, 0);
    },
    terminate() {
      stopped = true;
    },
  };
  const service = createAnalysisService((reply) => {
    if (stopped) return;
    const copy = structuredClone(reply);
    setTimeout(() => {
      if (!stopped) worker.onmessage?.({ data: copy } as MessageEvent<WorkerReply>);
    }, 0);
  });
  return worker;
};

