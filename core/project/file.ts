/**
 * Reading and writing project files (JSON text, format "hingeline-project", version 2; see
 * docs/project-format.md): text → JSON → migrate older versions → validate, and back.
 * Pure functions on strings; the callers (app, CLI, renderer) do the file I/O.
 */
import type { Diagnostic } from '../diagnostics.ts';
import { migrateProject } from './migrate.ts';
import { canonicalOrder, MAX_NESTING } from './schema.ts';
import type { Project } from './types.ts';
import { nestingDepth, sortDiagnostics, validateProjectData } from './validate.ts';

/** Largest project file read, in characters (a 1,000-member project is about 0.9 MB). */
export const MAX_PROJECT_TEXT_LENGTH = 64 * 1024 * 1024;

export interface ParsedProject {
  /**
   * The project when the file's structure is sound (even with semantic errors, so that it can be
   * opened and repaired), else null. `analysisBlockers(diagnostics)` (validate.ts) lists the errors
   * that keep it from being analysed; members with other errors are reported as input errors.
   */
  readonly project: Project | null;
  /** Every problem found, in file order (errors and warnings). */
  readonly diagnostics: Diagnostic[];
}

/** Line and column (1-based) of a character offset in `text`. */
export function lineAndColumn(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let start = 0;
  for (let i = 0; i < offset && i < text.length; i++) {
    if (text.charCodeAt(i) === 10) {
      line++;
      start = i + 1;
    }
  }
  return { line, column: offset - start + 1 };
}

const describeChar = (c: string | undefined): string => (c === undefined ? 'the end of the file' : c === '\n' ? 'a line break' : `'${c}'`);

/**
 * Finds where JSON text first breaks the JSON grammar (RFC 8259), with a reason in plain words.
 * Iterative (no recursion), so any nesting depth is safe. Returns null when the text is valid JSON.
 */
export function locateJsonError(text: string): { offset: number; reason: string } | null {
  type Expect = 'value' | 'value-or-close' | 'key' | 'key-or-close' | 'colon' | 'comma-or-close' | 'end';
  const n = text.length;
  const stack: ('array' | 'object')[] = [];
  let i = 0;
  let expect: Expect = 'value';
  const fail = (reason: string, offset = i) => ({ offset, reason });
  const afterValue = (): Expect => (stack.length === 0 ? 'end' : 'comma-or-close');
  const scanString = (): { offset: number; reason: string } | null => {
    const start = i;
    i++;
    for (;;) {
      const c = text[i];
      if (c === undefined) return fail('a text value is not closed: a double quote (") is missing', start);
      if (c === '"') {
        i++;
        return null;
      }
      if (c === '\\') {
        const e = text[i + 1];
        if (e === 'u') {
          if (!/^[0-9a-fA-F]{4}$/.test(text.slice(i + 2, i + 6))) return fail('\\u must be followed by four hexadecimal digits');
          i += 6;
        } else if (e !== undefined && '"\\/bfnrt'.includes(e)) {
          i += 2;
        } else {
          return fail(`${describeChar(e)} cannot follow a backslash in a text value`);
        }
        continue;
      }
      if (c < ' ') return fail('a line break or control character inside a text value (write \\n for a line break)');
      i++;
    }
  };
  for (;;) {
    while (i < n && (text[i] === ' ' || text[i] === '\t' || text[i] === '\n' || text[i] === '\r')) i++;
    const c = text[i];
    if (expect === 'end') return i < n ? fail(`unexpected ${describeChar(c)} after the end of the data`) : null;
    if (c === undefined) return fail('the file ends too early: a bracket, brace or quote is not closed');
    const top = stack[stack.length - 1];
    switch (expect) {
      case 'value':
      case 'value-or-close': {
        if (c === ']' && top === 'array') {
          if (expect === 'value') return fail('a comma before ] is not allowed');
          stack.pop();
          i++;
          expect = afterValue();
          continue;
        }
        if (c === '{') {
          stack.push('object');
          i++;
          expect = 'key-or-close';
          continue;
        }
        if (c === '[') {
          stack.push('array');
          i++;
          expect = 'value-or-close';
          continue;
        }
        if (c === '"') {
          const e = scanString();
          if (e) return e;
          expect = afterValue();
          continue;
        }
        if (c === '-' || (c >= '0' && c <= '9')) {
          const m = /-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?/y;
          m.lastIndex = i;
          const found = m.exec(text);
          if (!found || found[0] === '-') return fail('a number is written wrongly (e.g. 12, -0.5, 2.1e5)');
          i += found[0].length;
          expect = afterValue();
          continue;
        }
        const literal = ['true', 'false', 'null'].find((w) => text.startsWith(w, i));
        if (literal) {
          i += literal.length;
          expect = afterValue();
          continue;
        }
        if (text.startsWith('NaN', i) || text.startsWith('Infinity', i)) return fail(`"${text.startsWith('NaN', i) ? 'NaN' : 'Infinity'}" is not a JSON value: write a number`);
        if (c === "'") return fail('text must be in double quotes ("), not single quotes');
        return fail(`unexpected ${describeChar(c)} where a value should be`);
      }
      case 'key-or-close':
      case 'key':
        if (c === '}') {
          if (expect === 'key') return fail('a comma before } is not allowed');
          stack.pop();
          i++;
          expect = afterValue();
          continue;
        }
        if (c === "'") return fail('a field name must be in double quotes ("), not single quotes');
        if (c !== '"') return fail(`a field name must be in double quotes, found ${describeChar(c)}`);
        {
          const e = scanString();
          if (e) return e;
        }
        expect = 'colon';
        continue;
      case 'colon':
        if (c !== ':') return fail(`expected ':' after the field name, found ${describeChar(c)}`);
        i++;
        expect = 'value';
        continue;
      case 'comma-or-close': {
        const close = top === 'array' ? ']' : '}';
        if (c === ',') {
          i++;
          expect = top === 'array' ? 'value' : 'key';
          continue;
        }
        if (c === close) {
          stack.pop();
          i++;
          expect = afterValue();
          continue;
        }
        return fail(`expected ',' or '${close}', found ${describeChar(c)}`);
      }
    }
  }
}

function jsonError(text: string, error: unknown): Diagnostic {
  const located = locateJsonError(text);
  const where = located ? lineAndColumn(text, located.offset) : null;
  // The parser's own words, without its echo of the file, when the locator finds nothing to say.
  const raw = error instanceof Error ? error.message : String(error);
  const reason = located?.reason ?? raw.replace(/,? ?(?:\.\.\.)?"[\s\S]*$/, '').replace(/ in JSON at position \d+.*$/, '');
  return {
    code: 'parse',
    path: '(file)',
    severity: 'error',
    message: `is not valid JSON${where ? ` at line ${where.line}, column ${where.column}` : ''}: ${reason}`,
  };
}

/**
 * Parses the text of a project file: JSON, then format and version (older versions are migrated,
 * core/project/migrate.ts), then validation (core/project/validate.ts). Never throws: every problem,
 * including text that is not JSON, comes back as a diagnostic.
 */
export function parseProject(text: string): ParsedProject {
  const fail = (d: Diagnostic): ParsedProject => ({ project: null, diagnostics: [d] });
  if (typeof text !== 'string') return fail({ code: 'parse', path: '(file)', severity: 'error', message: 'must be the text of a project file' });
  if (text.length > MAX_PROJECT_TEXT_LENGTH) {
    return fail({ code: 'parse', path: '(file)', severity: 'error', message: `is ${(text.length / 1048576).toFixed(0)} MB long; project files of more than ${MAX_PROJECT_TEXT_LENGTH / 1048576} MB are not read` });
  }
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (body.trim() === '') return fail({ code: 'parse', path: '(file)', severity: 'error', message: 'is empty' });
  let raw: unknown;
  try {
    raw = JSON.parse(body);
  } catch (error) {
    return fail(jsonError(body, error));
  }
  if (nestingDepth(raw) > MAX_NESTING) {
    return fail({ code: 'schema', path: '(file)', severity: 'error', message: `nests lists and objects more than ${MAX_NESTING} levels deep; a project file needs fewer than 10` });
  }
  const migrated = migrateProject(raw);
  if (!migrated.data) return { project: null, diagnostics: [...migrated.diagnostics] };
  const validated = validateProjectData(migrated.data);
  return { project: validated.project, diagnostics: sortDiagnostics([...migrated.diagnostics, ...validated.diagnostics]) };
}

/**
 * The text of a project file: JSON with 2-space indentation and a final newline, every object's
 * keys in a stable order (known fields in the documented order, then unknown fields sorted), so that
 * saving twice gives the same bytes and version control shows only real changes. Unknown fields
 * are written back unchanged. Numbers are written as they are held (internal units).
 */
export function serializeProject(project: Project): string {
  return `${JSON.stringify(canonicalOrder(project), null, 2)}\n`;
}

export { projectFileStem } from './file-stem.ts';
