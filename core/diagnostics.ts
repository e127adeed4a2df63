/**
 * Two kinds of failure (DEVELOPERS.md, "Errors"):
 *  - bad user input → `Diagnostic` objects collected into an `InputError` (never a bare string);
 *  - a broken internal assumption → `BugError` (a defect to report, not something the user can fix).
 * Physical outcomes (a section that cannot reach equilibrium, a beam that fails) are neither: they are
 * statuses in the results.
 */

/** Machine-readable diagnostic codes. The message is for people; the code is for tests and the UI. */
export type DiagnosticCode =
  | 'not-a-number'
  | 'out-of-range'
  | 'must-be-positive'
  | 'must-be-integer'
  | 'required'
  | 'unknown-option'
  | 'unknown-reference'
  | 'duplicate-id'
  | 'geometry'
  | 'outside-section'
  | 'no-tension-steel'
  | 'inconsistent'
  | 'schema'
  | 'unknown-field'
  | 'unsupported-version'
  | 'parse';

export interface Diagnostic {
  readonly code: DiagnosticCode;
  /** Path to the offending field, e.g. `sections[2].bars[0].depth` or `members[3] "B-12".span`. */
  readonly path: string;
  /** Plain words for an engineer, naming the field, the value and the allowed range. */
  readonly message: string;
  /** `error` stops the analysis of the item; `warning` is reported alongside results. */
  readonly severity: 'error' | 'warning';
}

/** Thrown when an input cannot be analysed. Carries every problem found, not only the first. */
export class InputError extends Error {
  readonly diagnostics: readonly Diagnostic[];
  constructor(diagnostics: readonly Diagnostic[]) {
    super(diagnostics.map((d) => `${d.path}: ${d.message}`).join('\n'));
    this.name = 'InputError';
    this.diagnostics = diagnostics;
  }
}

/** A broken internal assumption. Never caused by user input; always a defect to fix. */
export class BugError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'BugError';
  }
}

/** A range in which a number is allowed; bounds are in the unit named by `unit` (internal SI). */
export interface AllowedRange {
  readonly min?: number;
  readonly max?: number;
  /** Exclusive bounds: `min < x` instead of `min ≤ x`. */
  readonly exclusiveMin?: boolean;
  readonly exclusiveMax?: boolean;
  readonly unit?: string;
}

function describeRange(range: AllowedRange): string {
  const u = range.unit ? ` ${range.unit}` : '';
  const lo = range.min === undefined ? undefined : `${range.exclusiveMin ? 'greater than' : 'at least'} ${range.min}${u}`;
  const hi = range.max === undefined ? undefined : `${range.exclusiveMax ? 'less than' : 'at most'} ${range.max}${u}`;
  if (lo && hi) return `${lo} and ${hi}`;
  return lo ?? hi ?? 'a finite number';
}

function describeValue(value: unknown, unit?: string): string {
  if (typeof value === 'number') {
    if (Number.isNaN(value)) return 'NaN';
    if (!Number.isFinite(value)) return value > 0 ? 'Infinity' : '-Infinity';
    return `${value}${unit ? ` ${unit}` : ''}`;
  }
  if (value === undefined) return 'nothing';
  return JSON.stringify(value);
}

/**
 * Checks one number against its allowed range and appends a diagnostic when it fails.
 * Returns true when the value is a finite number inside the range.
 */
export function checkNumber(
  out: Diagnostic[],
  path: string,
  value: unknown,
  range: AllowedRange,
  severity: 'error' | 'warning' = 'error',
): value is number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    out.push({
      code: 'not-a-number',
      path,
      severity,
      message: `must be a finite number (${describeRange(range)}), got ${describeValue(value)}`,
    });
    return false;
  }
  const belowMin = range.min !== undefined && (range.exclusiveMin ? value <= range.min : value < range.min);
  const aboveMax = range.max !== undefined && (range.exclusiveMax ? value >= range.max : value > range.max);
  if (belowMin || aboveMax) {
    out.push({
      code: range.min === 0 && range.exclusiveMin ? 'must-be-positive' : 'out-of-range',
      path,
      severity,
      message: `must be ${describeRange(range)}, got ${describeValue(value, range.unit)}`,
    });
    return false;
  }
  return true;
}

/** Throws an InputError when any diagnostic in the list is an error. */
export function throwIfErrors(diagnostics: readonly Diagnostic[]): void {
  const errors = diagnostics.filter((d) => d.severity === 'error');
  if (errors.length > 0) throw new InputError(errors);
}

/** A problem as results carry it: where, and what. */
export interface Problem {
  readonly path: string;
  readonly message: string;
}

/** The errors among diagnostics, as results carry them. */
export function errorsOf(diagnostics: readonly Diagnostic[]): Problem[] {
  return diagnostics.filter((d) => d.severity === 'error').map((d) => ({ path: d.path, message: d.message }));
}

/** The warnings among diagnostics, each as one line `path: message`. */
export function warningsOf(diagnostics: readonly Diagnostic[]): string[] {
  return diagnostics.filter((d) => d.severity === 'warning').map((d) => `${d.path}: ${d.message}`);
}
