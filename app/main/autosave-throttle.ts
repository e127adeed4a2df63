/**
 * Rate limit of the renderer's autosave calls. Node-only, no Electron import.
 *
 * The renderer autosaves after a pause in editing (and at least every half minute while editing
 * goes on); main does not rely on that: a renderer that calls in a loop (a defect, or a
 * compromised page) must not turn into a stream of 64 MB disk writes. At most one write starts
 * per `minIntervalMs`; calls in between are merged, only the latest text is written when the
 * interval has passed, and text equal to what was last written is not written again. Every call
 * resolves once its text, or a newer one, is on disk (or rejects with the write's error).
 */

export interface AutosaveThrottleOptions {
  /** Least time between the starts of two writes, ms (default 2000). */
  readonly minIntervalMs?: number;
  readonly now?: () => number;
  readonly schedule?: (run: () => void, delayMs: number) => void;
}

interface Waiter {
  resolve(): void;
  reject(error: unknown): void;
}

export class AutosaveThrottle {
  private readonly minIntervalMs: number;
  private readonly now: () => number;
  private readonly schedule: (run: () => void, delayMs: number) => void;
  private lastStart = Number.NEGATIVE_INFINITY;
  private lastWritten: string | null = null;
  private pending: { text: string; waiters: Waiter[] } | null = null;
  private writing = false;
  private timerSet = false;

  constructor(private readonly write: (text: string) => Promise<void>, options: AutosaveThrottleOptions = {}) {
    this.minIntervalMs = options.minIntervalMs ?? 2000;
    this.now = options.now ?? (() => Date.now());
    this.schedule = options.schedule ?? ((run, delayMs) => void setTimeout(run, delayMs));
  }

  /** Asks for `text` to be autosaved; resolves when it (or newer text) is written. */
  submit(text: string): Promise<void> {
    return new Promise<void>((resolve, reject) => {
      const waiter = { resolve, reject };
      if (this.pending) {
        this.pending.text = text;
        this.pending.waiters.push(waiter);
      } else {
        this.pending = { text, waiters: [waiter] };
      }
      this.pump();
    });
  }

  /** Forgets what was written last (the autosave file was removed): the next text is written even if unchanged. */
  reset(): void {
    this.lastWritten = null;
  }

  private pump(): void {
    if (this.writing || !this.pending || this.timerSet) return;
    const wait = this.lastStart + this.minIntervalMs - this.now();
    if (wait > 0) {
      this.timerSet = true;
      this.schedule(() => {
        this.timerSet = false;
        this.pump();
      }, wait);
      return;
    }
    const { text, waiters } = this.pending;
    this.pending = null;
    if (text === this.lastWritten) {
      for (const w of waiters) w.resolve();
      return;
    }
    this.writing = true;
    this.lastStart = this.now();
    this.write(text).then(
      () => {
        this.lastWritten = text;
        for (const w of waiters) w.resolve();
      },
      (error: unknown) => {
        for (const w of waiters) w.reject(error);
      },
    ).finally(() => {
      this.writing = false;
      this.pump();
    });
  }
}
