let next = 0;

/** A document-unique id for label/aria wiring, e.g. `hl-field-12`. */
export function uniqueDomId(prefix = 'hl'): string {
  next += 1;
  return `${prefix}-${next}`;
}

let marks = 0;

/**
 * Records a timing mark for the speed measurements. Cheap: the marks are counted here rather
 * than listed from the browser's timeline on every call (which grew with the timeline), and
 * cleared every 500.
 */
export function perfMark(name: string): void {
  if (typeof performance === 'undefined' || typeof performance.mark !== 'function') return;
  if (++marks > 500) {
    performance.clearMarks();
    marks = 1;
  }
  performance.mark(name);
}
