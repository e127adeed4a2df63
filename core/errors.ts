/**
 * A broken internal assumption: never caused by user input, always a defect to fix (DEVELOPERS.md,
 * "Errors"). The lowest layer of core/: everything may throw it.
 */
export class BugError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'BugError';
  }
}
