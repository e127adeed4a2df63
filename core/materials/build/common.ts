import { InputError, type Diagnostic } from '../../diagnostics.ts';
import { fieldPath } from '../checks.ts';

/**
 * Runs a law constructor and returns the diagnostics of its InputError (empty when it succeeds), with each
 * law-parameter path mapped to the spec field the user should change.
 */
export function collectLawDiagnostics(build: () => unknown, mapPath: (lawField: string) => string): Diagnostic[] {
  try {
    build();
    return [];
  } catch (error) {
    if (error instanceof InputError) return error.diagnostics.map((d) => ({ ...d, path: mapPath(d.path) }));
    throw error;
  }
}

/**
 * Maps a law parameter path (`elasticModulus`, `clearSpacings[2]`) onto a full spec path through a
 * table of full paths keyed by the parameter's first name; unknown names map to `fallback`.
 */
export function pathMapper(table: Readonly<Record<string, string>>, fallback: string): (lawField: string) => string {
  return (lawField) => {
    const head = lawField.split(/[.[]/)[0] ?? lawField;
    const mapped = table[head];
    return mapped === undefined ? fallback : mapped + lawField.slice(head.length);
  };
}

/** Checks the `kind`, `id` and `name` fields shared by every material spec. */
export function checkIdentity(out: Diagnostic[], spec: { kind?: unknown; id?: unknown; name?: unknown }, kind: string, path: string): void {
  if (spec.kind !== kind) {
    out.push({ code: 'schema', path: fieldPath(path, 'kind'), severity: 'error', message: `material kind must be "${kind}", got ${JSON.stringify(spec.kind)}` });
  }
  if (typeof spec.id !== 'string' || spec.id.trim() === '') {
    out.push({ code: 'required', path: fieldPath(path, 'id'), severity: 'error', message: `material id must be a non-empty text, got ${JSON.stringify(spec.id)}` });
  }
  if (typeof spec.name !== 'string') {
    out.push({ code: 'required', path: fieldPath(path, 'name'), severity: 'error', message: `material name must be a text, got ${JSON.stringify(spec.name)}` });
  }
}

/** Checks that `value` is one of `allowed`; appends an `unknown-option` diagnostic otherwise. */
export function checkOption<T extends string>(out: Diagnostic[], path: string, label: string, value: unknown, allowed: readonly T[]): value is T {
  if (typeof value === 'string' && (allowed as readonly string[]).includes(value)) return true;
  out.push({ code: 'unknown-option', path, severity: 'error', message: `${label} must be one of ${allowed.map((a) => `"${a}"`).join(', ')}, got ${JSON.stringify(value)}` });
  return false;
}
