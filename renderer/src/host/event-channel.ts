/**
 * A host event stream (menu commands, files opened from outside) that keeps what arrives before
 * anyone listens — e.g. `?demo` or a file passed at start-up — and hands it to the first listener.
 */
export interface EventChannel<T> {
  subscribe(listener: (value: T) => void): () => void;
  emit(value: T): void;
  readonly listening: boolean;
}

export function eventChannel<T>(initial: readonly T[] = []): EventChannel<T> {
  const listeners = new Set<(value: T) => void>();
  const pending: T[] = [...initial];
  return {
    subscribe(listener) {
      listeners.add(listener);
      const waiting = pending.splice(0);
      if (waiting.length > 0) queueMicrotask(() => waiting.forEach((value) => listener(value)));
      return () => void listeners.delete(listener);
    },
    emit(value) {
      if (listeners.size === 0) pending.push(value);
      for (const listener of [...listeners]) listener(value);
    },
    get listening() {
      return listeners.size > 0;
    },
  };
}
