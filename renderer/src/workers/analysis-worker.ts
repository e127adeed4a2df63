/**
 * Entry of the analysis Web Worker: every engineering computation of the app runs here, never
 * on the UI thread (analysis-service.ts does the work; this file only connects it to messages).
 */
import { createAnalysisService } from './analysis-service.ts';
import type { WorkerReply, WorkerRequest } from './protocol.ts';

/** The parts of the dedicated worker scope used here (the DOM library types `self` as a Window). */
interface WorkerScope {
  postMessage(message: WorkerReply): void;
  addEventListener(type: 'message', listener: (event: MessageEvent<WorkerRequest>) => void): void;
}

const scope = self as unknown as WorkerScope;
const service = createAnalysisService((reply) => scope.postMessage(reply));
scope.addEventListener('message', (event) => {
  void service.handle(event.data);
});
