let next = 0;

/** A document-unique id for label/aria wiring, e.g. `hl-field-12`. */
export function uniqueDomId(prefix = 'hl'): string {
  next += 1;
  return `${prefix}-${next}`;
}

/** Records a timing mark for the speed measurements (cheap; old marks are dropped). */
export function perfMark(name: string): void {
  if (typeof performance === 'undefined' || typeof performance.mark !== 'function') return;
  performance.mark(name);
  if (performance.getEntriesByType('mark').length > 2000) performance.clearMarks();
}
