/**
 * Two kinds of failure (DEVELOPERS.md, "Errors"):
 *  - bad user input → `Diagnostic` objects collected into an `InputError` (never a bare string);
 *  - a broken internal assumption → `BugError` (core/errors.ts; a defect to report, not something
 *    the user can fix).
 * Physical outcomes (a section that cannot reach equilibrium, a beam that fails) are neither: they are
 * statuses in the results.
 *
 * A diagnostic carries its values and quantities as data (`detail`, a phrase of core/units/phrase.ts
 * in internal units); `message` is that phrase in words, in SI until the edge formats it in the
 * display units (`inUnits`: project validation, the app, the command line).
 */
import { BugError } from './errors.ts';
import { phrase, q, say, toPhrase, type Phrase, type Text } from './units/phrase.ts';
import type { Quantity, UnitSystem } from './units/quantities.ts';

export { BugError };

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
  /**
   * Plain words for an engineer, naming the field, the value and the allowed range — in SI units as
   * the engine writes them, in the display units once formatted at the edge (`inUnits`).
   */
  readonly message: string;
  /** `error` stops the analysis of the item; `warning` is reported alongside results. */
  readonly severity: 'error' | 'warning';
  /** The message as data — words, and quantities in internal units — when it holds a quantity. */
  readonly detail?: Phrase;
}

/** A diagnostic whose words may hold quantities (formatted in SI until the edge formats it again). */
export function diagnostic(code: DiagnosticCode, path: string, severity: Diagnostic['severity'], text: Text): Diagnostic {
  return typeof text === 'string' ? { code, path, severity, message: text } : { code, path, severity, message: say(text, 'SI'), detail: text };
}

/** The diagnostic's words as data: its phrase, or its plain message. */
export function diagnosticWords(d: Diagnostic): Text {
  return d.detail ?? d.message;
}

/** The diagnostic with words before and after its message (keeping its quantities as data). */
export function reworded(d: Diagnostic, before: string, after = ''): Diagnostic {
  return d.detail ? { ...d, message: `${before}${d.message}${after}`, detail: toPhrase(phrase`${before}${d.detail}${after}`) } : { ...d, message: `${before}${d.message}${after}` };
}

/** The diagnostic's words in a display system ('SI' / 'US', or the project file's 'si' / 'us'). */
export function diagnosticText(d: Diagnostic, units: UnitSystem | 'si' | 'us'): string {
  return d.detail ? say(d.detail, units) : d.message;
}

/** The diagnostics with their messages in a display system: what the edge shows. */
export function inUnits(diagnostics: readonly Diagnostic[], units: UnitSystem | 'si' | 'us'): Diagnostic[] {
  return diagnostics.map((d) => (d.detail ? { ...d, message: say(d.detail, units) } : d));
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

/**
 * A range in which a number is allowed. Bounds are in the internal unit of `quantity`
 * (core/units/quantities.ts: mm, MPa, N…), or in `unit` words for a count or a duration; without
 * either the number is dimensionless.
 */
export interface AllowedRange {
  readonly min?: number;
  readonly max?: number;
  /** Exclusive bounds: `min < x` instead of `min ≤ x`. */
  readonly exclusiveMin?: boolean;
  readonly exclusiveMax?: boolean;
  /** What the number is, which decides its display unit (a span in m or ft, a depth in mm or in). */
  readonly quantity?: Quantity;
  /** A unit that is the same in every system (months, %), printed after the numbers. */
  readonly unit?: string;
}

/** A number of a range or a value, with its unit as data. */
function amount(value: number, range: AllowedRange): Phrase {
  if (range.quantity) return [q(range.quantity, value, { compact: true })];
  return [`${value}${range.unit ? ` ${range.unit}` : ''}`];
}

function describeRange(range: AllowedRange): Phrase {
  const lo = range.min === undefined ? undefined : toPhrase(phrase`${range.exclusiveMin ? 'greater than' : 'at least'} ${amount(range.min, range)}`);
  const hi = range.max === undefined ? undefined : toPhrase(phrase`${range.exclusiveMax ? 'less than' : 'at most'} ${amount(range.max, range)}`);
  if (lo && hi) return toPhrase(phrase`${lo} and ${hi}`);
  return lo ?? hi ?? ['a finite number'];
}

function describeValue(value: unknown, range?: AllowedRange): Phrase {
  if (typeof value === 'number') {
    if (Number.isNaN(value)) return ['NaN'];
    if (!Number.isFinite(value)) return [value > 0 ? 'Infinity' : '-Infinity'];
    return range ? amount(value, range) : [String(value)];
  }
  if (value === undefined) return ['nothing'];
  return [JSON.stringify(value)];
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
    out.push(diagnostic('not-a-number', path, severity, phrase`must be a finite number (${describeRange(range)}), got ${describeValue(value)}`));
    return false;
  }
  const belowMin = range.min !== undefined && (range.exclusiveMin ? value <= range.min : value < range.min);
  const aboveMax = range.max !== undefined && (range.exclusiveMax ? value >= range.max : value > range.max);
  if (belowMin || aboveMax) {
    out.push(diagnostic(range.min === 0 && range.exclusiveMin ? 'must-be-positive' : 'out-of-range', path, severity, phrase`must be ${describeRange(range)}, got ${describeValue(value, range)}`));
    return false;
  }
  return true;
}

/** Throws an InputError when any diagnostic in the list is an error. */
export function throwIfErrors(diagnostics: readonly Diagnostic[]): void {
  const errors = diagnostics.filter((d) => d.severity === 'error');
  if (errors.length > 0) throw new InputError(errors);
}

/** A problem as results carry it: where, and what (words and quantities as data). */
export interface Problem {
  readonly path: string;
  readonly message: Text;
}

/** The errors among diagnostics, as results carry them. */
export function errorsOf(diagnostics: readonly Diagnostic[]): Problem[] {
  return diagnostics.filter((d) => d.severity === 'error').map((d) => ({ path: d.path, message: diagnosticWords(d) }));
}

/** The warnings among diagnostics, each as one line `path: message`. */
export function warningsOf(diagnostics: readonly Diagnostic[]): Text[] {
  return diagnostics.filter((d) => d.severity === 'warning').map((d) => phrase`${d.path}: ${diagnosticWords(d)}`);
}
