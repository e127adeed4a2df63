import { BugError, checkNumber, reworded, type AllowedRange, type Diagnostic } from '../diagnostics.ts';

/**
 * Checks one number with `checkNumber` and prefixes the message with the field's name in words, so the
 * message names the field, the value and the allowed range (RULES: bad input). Returns true when valid.
 */
export function checkField(
  out: Diagnostic[],
  path: string,
  label: string,
  value: unknown,
  range: AllowedRange,
  severity: 'error' | 'warning' = 'error',
): value is number {
  const local: Diagnostic[] = [];
  const ok = checkNumber(local, path, value, range, severity);
  for (const diagnostic of local) out.push(reworded(diagnostic, `${label} `));
  return ok;
}

/** Appends an `inconsistent` diagnostic (a relation between fields fails). */
export function reportInconsistent(out: Diagnostic[], path: string, message: string, severity: 'error' | 'warning' = 'error'): void {
  out.push({ code: 'inconsistent', path, message, severity });
}

/** Joins a parent path and a field name: `materials[0]` + `strength` → `materials[0].strength`. */
export function fieldPath(path: string, field: string): string {
  return path ? `${path}.${field}` : field;
}

/**
 * NaN policy of every stress–strain law: a NaN strain is a defect upstream (the section solver must
 * never produce one; specs are validated before a law exists), so `stress(NaN)` throws a BugError rather
 * than returning a number that would hide the defect. ±Infinity is a (very large) strain beyond the end
 * of every curve and gives 0.
 */
export function assertStrainIsNumber(strain: number, model: string): void {
  if (Number.isNaN(strain)) throw new BugError(`${model}: stress requested at a strain that is NaN`);
}

/** Compact number for messages: 4 significant figures, no trailing noise. */
export function show(value: number): string {
  return Number.isFinite(value) ? String(Number(value.toPrecision(4))) : String(value);
}

/** Sorted, de-duplicated copy of a list of finite strains. */
export function sortedBreakpoints(strains: readonly number[]): number[] {
  const finite = strains.filter((s) => Number.isFinite(s)).sort((a, b) => a - b);
  return finite.filter((s, i) => i === 0 || s !== finite[i - 1]);
}
