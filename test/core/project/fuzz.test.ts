/**
 * Property tests: malformed project files and field values never crash, hang, leak NaN or
 * Infinity, or show a stack trace; they give diagnostics or a valid project (fast-check).
 */
/* eslint-disable @typescript-eslint/no-explicit-any -- the tests edit project JSON freely to build malformed files */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Diagnostic } from '../../../core/diagnostics.ts';
import { analyzeProject } from '../../../core/analysis.ts';
import { parseProject, serializeProject } from '../../../core/project/file.ts';
import { analysisBlockers, hasErrors, validateProjectData } from '../../../core/project/validate.ts';
import { member, smallProject } from '../../fixtures/projects.ts';
import { BAD_KINDS, badProjects, type BadKind } from './bad-projects.ts';

const base = JSON.parse(serializeProject(smallProject('ACI 318-19', [
  member('B-1', 'simply-supported', 6000, 'r1', { loads: [{ kind: 'uniform', loadCase: 'live', magnitude: 10, from: 0, to: 3000 }, { kind: 'point', loadCase: 'dead', magnitude: 20000, position: 2000 }] }),
  member('C-1', 'cantilever', 2000, 't1'),
]))) as unknown;

type Path = (string | number)[];

/** Every path to a value inside `value` (objects and arrays included). */
function pathsOf(value: unknown, prefix: Path = [], out: Path[] = []): Path[] {
  out.push(prefix);
  if (Array.isArray(value)) value.forEach((v, i) => pathsOf(v, [...prefix, i], out));
  else if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) pathsOf(v, [...prefix, k], out);
  return out;
}
const PATHS = pathsOf(base).filter((p) => p.length > 0);

const nested = (depth: number): unknown => {
  let v: unknown = 0;
  for (let i = 0; i < depth; i++) v = i % 2 ? [v] : { x: v };
  return v;
};

/** Values that do not belong where they are put. */
const garbage: fc.Arbitrary<unknown> = fc.oneof(
  fc.constant(null),
  fc.boolean(),
  fc.string({ maxLength: 30 }),
  fc.constantFrom('NaN', 'Infinity', '-Infinity', '1e400', '', '12', ' 3 ', 'null', '#8'),
  fc.double(),
  fc.integer({ min: -1e9, max: 1e9 }),
  fc.constantFrom(1e308, -1e308, 5e-324, 0, -0, -1, -2000, 1e20, 0.5, 2.5),
  fc.jsonValue({ maxDepth: 3 }),
  fc.integer({ min: 1, max: 120 }).map(nested),
  fc.constantFrom([], {}, [null], [{}], { kind: 'circle' }, { kind: 'point' }),
);

type Mutation = { path: Path; action: 'replace' | 'delete' | 'wrap' | 'duplicate'; value: unknown };
const mutation: fc.Arbitrary<Mutation> = fc.record({
  path: fc.constantFrom(...PATHS),
  action: fc.constantFrom('replace', 'replace', 'replace', 'delete', 'wrap', 'duplicate'),
  value: garbage,
});

function mutate(root: unknown, mutations: readonly Mutation[]): unknown {
  const copy = structuredClone(root) as Record<string | number, unknown>;
  for (const m of mutations) {
    let parent: any = copy;
    for (const key of m.path.slice(0, -1)) {
      parent = parent?.[key];
      if (parent === null || typeof parent !== 'object') break;
    }
    if (parent === null || typeof parent !== 'object') continue;
    const key = m.path[m.path.length - 1]!;
    if (m.action === 'delete') {
      if (Array.isArray(parent) && typeof key === 'number') parent.splice(key, 1);
      else delete parent[key];
    } else if (m.action === 'wrap') parent[key] = [parent[key]];
    else if (m.action === 'duplicate' && Array.isArray(parent)) parent.push(structuredClone(parent[key as number]));
    else parent[key] = m.value;
  }
  return copy;
}

/** Strips quoted text (values echoed from the file), then looks for what must never show. */
function assertCleanMessages(diagnostics: readonly Diagnostic[]): void {
  for (const d of diagnostics) {
    expect(typeof d.code).toBe('string');
    expect(['error', 'warning']).toContain(d.severity);
    expect(typeof d.path).toBe('string');
    expect(d.message.length).toBeGreaterThan(0);
    const unquoted = d.message.replace(/"(?:[^"\\]|\\.)*"/g, '""');
    expect(unquoted).not.toMatch(/\bNaN\b|Infinity/);
    expect(d.message).not.toMatch(/\n\s+at |TypeError|ReferenceError|RangeError|Cannot read properties|is not a function|undefined is not/);
    expect(d.message).not.toMatch(/could not be checked/);
  }
}

function assertOutcome(result: { project: unknown; diagnostics: Diagnostic[] }): void {
  assertCleanMessages(result.diagnostics);
  if (result.project === null) expect(hasErrors(result.diagnostics)).toBe(true);
}

/** Every number anywhere in `value` is finite. */
function assertAllFinite(value: unknown, path = ''): void {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new Error(`non-finite number at ${path}: ${value}`);
  } else if (Array.isArray(value)) value.forEach((v, i) => assertAllFinite(v, `${path}[${i}]`));
  else if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) assertAllFinite(v, `${path}.${k}`);
}

describe('malformed project files', () => {
  it('arbitrary JSON documents give diagnostics, never a throw', () => {
    fc.assert(fc.property(fc.jsonValue({ maxDepth: 6 }), (value) => {
      const result = parseProject(JSON.stringify(value) ?? 'null');
      assertOutcome(result);
      expect(result.project).toBeNull();
    }), { numRuns: 300 });
  });

  it('arbitrary text gives diagnostics, never a throw', () => {
    fc.assert(fc.property(fc.string({ maxLength: 200 }), (text) => {
      assertOutcome(parseProject(text));
    }), { numRuns: 300 });
  });

  it('a valid project with one to four fields replaced, deleted, wrapped or duplicated gives diagnostics or a valid project', () => {
    fc.assert(fc.property(fc.array(mutation, { minLength: 1, maxLength: 4 }), (mutations) => {
      const text = JSON.stringify(mutate(base, mutations));
      const result = parseProject(text);
      assertOutcome(result);
      if (result.project && !hasErrors(result.diagnostics)) {
        // A valid result saves and reads back to the same project.
        expect(parseProject(serializeProject(result.project)).project).toEqual(result.project);
      }
    }), { numRuns: 600 });
  }, 120_000);

  it('numbers written as NaN, Infinity, 1e999 or quoted in the file text give diagnostics', () => {
    const text = serializeProject(base as never);
    const numbers = [...text.matchAll(/(?<=: )-?\d+(?:\.\d+)?(?:e[+-]?\d+)?/g)].map((m) => m.index!);
    fc.assert(fc.property(fc.constantFrom(...numbers), fc.constantFrom('NaN', 'Infinity', '-Infinity', '1e999', '-1e999', '"12"', '"NaN"', '1e-400', '[]', '{}', 'null', '--1', '0x10'), (at, token) => {
      const end = at + /^-?\d+(?:\.\d+)?(?:e[+-]?\d+)?/.exec(text.slice(at))![0].length;
      const result = parseProject(text.slice(0, at) + token + text.slice(end));
      assertOutcome(result);
      if (token !== '1e-400') expect(result.diagnostics.length).toBeGreaterThan(0);
    }), { numRuns: 300 });
  });

  it('values that JSON cannot hold (NaN, Infinity, undefined, functions) given directly to validation give diagnostics', () => {
    const strange = fc.oneof(fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, undefined, -0), fc.anything());
    fc.assert(fc.property(fc.constantFrom(...PATHS), strange, (path, value) => {
      const data = mutate(base, [{ path, action: 'replace', value }]);
      const result = validateProjectData(data);
      assertOutcome(result);
    }), { numRuns: 400 });
  });
});

describe('analysis of mutated projects that parse', () => {
  it('never throws and never returns NaN or Infinity, whatever the members hold (when nothing blocks the analysis)', () => {
    let analysed = 0;
    const numeric = fc.oneof(fc.constantFrom(0, -1, 1e-9, 1e9, 1e308, 0.5, 3, 60000, 59999), fc.double({ min: -1e6, max: 1e6, noNaN: true }));
    const numericPaths = PATHS.filter((p) => typeof (p.reduce<any>((v, k) => v?.[k], base)) === 'number' && p[0] !== 'settings');
    const memberPaths = numericPaths.filter((p) => p[0] === 'members');
    const somePath = fc.oneof({ arbitrary: fc.constantFrom(...memberPaths), weight: 4 }, { arbitrary: fc.constantFrom(...numericPaths), weight: 1 });
    fc.assert(fc.property(fc.array(fc.record({ path: somePath, action: fc.constant('replace' as const), value: numeric }), { minLength: 1, maxLength: 2 }), (mutations) => {
      const { project, diagnostics } = parseProject(JSON.stringify(mutate(base, mutations)));
      assertCleanMessages(diagnostics);
      if (!project || analysisBlockers(diagnostics).length > 0) return;
      analysed++;
      const results = analyzeProject(project);
      expect(results.members).toHaveLength(project.members.length);
      assertAllFinite(results);
      for (const m of results.members) for (const e of m.errors) expect(e.message).not.toMatch(/\n\s+at |TypeError|Cannot read properties/);
    }), { numRuns: 100 });
    expect(analysed).toBeGreaterThan(50);
  }, 120_000);
});

describe('files with a planted defect of issue 17 (bad-projects.ts): caught by validation, never analysed as something else', () => {
  // Runs per kind: enough to cover each generator's branches; huge counts are big files, so fewer.
  const runs: Record<BadKind, number> = { 'overlap': 40, 'void': 40, 'self-intersection': 40, 'huge-count': 12, 'non-integer': 40 };
  for (const kind of BAD_KINDS) {
    it(`${kind}: an error names the planted field; the member gets no result of its own`, () => {
      fc.assert(fc.property(badProjects(kind), (bad) => {
        const { project, diagnostics } = validateProjectData(JSON.parse(JSON.stringify(bad.project)));
        assertCleanMessages(diagnostics);
        const errors = diagnostics.filter((d) => d.severity === 'error' && d.path.startsWith(bad.path));
        expect(errors.length, `${bad.what}: ${JSON.stringify(diagnostics.slice(0, 3))}`).toBeGreaterThan(0);
        // Section errors keep the project from being analysed; member errors make the member an input error.
        if (analysisBlockers(diagnostics).length > 0 || !project) return;
        const result = analyzeProject(project).members[0]!;
        expect(result.errors.length, bad.what).toBeGreaterThan(0);
        if (kind !== 'huge-count' || !bad.path.endsWith('.schemes')) expect(result.status).toBe('input-error');
        else expect(result.retrofit?.schemes ?? []).toEqual([]);
      }), { numRuns: runs[kind] });
    }, 300_000);
  }
});
