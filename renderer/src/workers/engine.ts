/**
 * The UI thread's side of the analysis workers: request/reply bookkeeping over postMessage,
 * cancellation (cooperative `cancel`, or `terminate` for an immediate stop) and recovery from a
 * crashed worker. `WorkerLike` lets component tests run the same service in-process
 * (in-process.ts, never bundled into the app).
 */
import type { WithoutId, WorkerReply, WorkerRequest } from './protocol.ts';

export interface WorkerLike {
  postMessage(message: WorkerRequest): void;
  terminate(): void;
  onmessage: ((event: MessageEvent<WorkerReply>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
}

export type WorkerFactory = () => WorkerLike;

/** A real Web Worker running analysis-worker.ts (bundled by Vite). */
export const browserWorkerFactory: WorkerFactory = () =>
  new Worker(new URL('./analysis-worker.ts', import.meta.url), { type: 'module', name: 'hingeline-analysis' }) as unknown as WorkerLike;

/** Rejection reason of requests stopped by `terminate()` or `cancel`. */
export class CancelledError extends Error {
  constructor(message = 'Cancelled.') {
    super(message);
    this.name = 'CancelledError';
  }
}

const FINAL: ReadonlySet<WorkerReply['type']> = new Set(['done', 'cancelled', 'parsed', 'text', 'state', 'error']);

interface Pending {
  readonly onReply: ((reply: WorkerReply) => void) | undefined;
  readonly resolve: (reply: WorkerReply) => void;
  readonly reject: (error: Error) => void;
}

export interface RunningRequest {
  readonly id: number;
  /** Resolves with the final reply (`done`, `cancelled`, `parsed`, `text`, `state`); rejects on `error` or termination. */
  readonly finished: Promise<WorkerReply>;
}

/** One worker and the requests waiting on it. The worker is started on first use. */
export class WorkerChannel {
  private worker: WorkerLike | null = null;
  private readonly pending = new Map<number, Pending>();
  private nextId = 1;

  constructor(private readonly factory: WorkerFactory) {}

  /** Number of requests still waiting for their final reply. */
  get busy(): number {
    return this.pending.size;
  }

  private start(): WorkerLike {
    if (this.worker) return this.worker;
    const worker = this.factory();
    worker.onmessage = (event) => this.receive(event.data);
    worker.onerror = (event) => {
      event.preventDefault?.();
      this.fail(new Error(`The analysis worker stopped unexpectedly${event.message ? `: ${event.message}` : ''}. It has been restarted; please try again.`));
    };
    this.worker = worker;
    return worker;
  }

  private receive(reply: WorkerReply): void {
    const waiting = this.pending.get(reply.id);
    if (!waiting) return;
    if (reply.type === 'error') {
      this.pending.delete(reply.id);
      waiting.reject(new Error(reply.message));
      return;
    }
    waiting.onReply?.(reply);
    if (FINAL.has(reply.type)) {
      this.pending.delete(reply.id);
      waiting.resolve(reply);
    }
  }

  /** Sends a request; `onReply` sees every reply to it (progress and partial results included). */
  request(message: WithoutId<WorkerRequest>, onReply?: (reply: WorkerReply) => void): RunningRequest {
    const id = this.nextId++;
    const finished = new Promise<WorkerReply>((resolve, reject) => {
      this.pending.set(id, { onReply, resolve, reject });
    });
    this.start().postMessage({ ...message, id } as WorkerRequest);
    return { id, finished };
  }

  /** Asks the worker to stop a running analysis after the chunk in hand (its final reply is `cancelled`). */
  cancel(target: number): void {
    if (this.worker && this.pending.has(target)) this.worker.postMessage({ type: 'cancel', id: this.nextId++, target });
  }

  private fail(error: Error): void {
    const waiting = [...this.pending.values()];
    this.pending.clear();
    this.worker?.terminate();
    this.worker = null;
    for (const w of waiting) w.reject(error);
  }

  /** Stops the worker at once; every waiting request rejects with CancelledError. */
  terminate(): void {
    this.fail(new CancelledError());
  }
}

let factory: WorkerFactory = browserWorkerFactory;
interface Channels {
  readonly interactive: WorkerChannel;
  readonly batch: WorkerChannel;
  readonly sections: WorkerChannel;
}
let channels: Channels | null = null;

/**
 * The app's analysis workers: `interactive` (edited members, states at a curvature, file parsing
 * and writing), `batch` (whole-project analysis and exports, stopped by terminating it) and
 * `sections` (the section curves of the member on screen while `interactive` is still busy with an
 * earlier edit: a member analysis cannot be interrupted, a section's curves take a few ms). Each
 * starts on first use.
 */
export function engines(): Channels {
  channels ??= { interactive: new WorkerChannel(factory), batch: new WorkerChannel(factory), sections: new WorkerChannel(factory) };
  return channels;
}

/** Replaces how workers are made (component tests pass `inProcessWorkerFactory`); stops the current ones. */
export function setWorkerFactory(next: WorkerFactory): void {
  channels?.interactive.terminate();
  channels?.batch.terminate();
  channels?.sections.terminate();
  channels = null;
  factory = next;
}
