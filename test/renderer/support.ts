/**
 * Support for the renderer's component and store tests: a fake host, analysis workers running
 * in-process (the same service as the real Web Worker), a fresh Pinia, and waiting helpers.
 */
import { createPinia, setActivePinia, type Pinia } from 'pinia';
import { createFakeHost, setHostForTesting, type FakeHost, type FakeHostSeed } from '../../renderer/src/host/index.ts';
import { setWorkerFactory, type WorkerFactory, type WorkerLike } from '../../renderer/src/workers/engine.ts';
import { inProcessWorkerFactory } from '../../renderer/src/workers/in-process.ts';
import type { WorkerRequest } from '../../renderer/src/workers/protocol.ts';

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

/** A fresh Pinia, a fake host and in-process workers (`analyse: false`: no analyses), set as the app's. */
export function testEnvironment(seed: FakeHostSeed = {}, options: { analyse?: boolean } = {}): TestEnvironment {
  const host = createFakeHost(seed);
  setHostForTesting(host);
  const requests: WorkerRequest[] = [];
  setWorkerFactory(recordingFactory(requests, options.analyse === false ? noAnalysisFactory : inProcessWorkerFactory));
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
