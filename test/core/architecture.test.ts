/**
 * core/ is a layered graph without cycles (DEVELOPERS.md, "Layers inside core/"): no file imports a
 * file that imports it back, directly or through others, and no folder does either. ESLint keeps
 * each folder to the layers below it; this test catches any cycle whatever the lint rules say.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, normalize, relative, sep } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const CORE = fileURLToPath(new URL('../../core', import.meta.url));

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return name.endsWith('.ts') && !name.endsWith('.d.ts') ? [path] : [];
  });
}

/** Relative module specifiers a file imports or re-exports, `import type` and `import()` included. */
export function importedSpecifiers(text: string): string[] {
  const found: string[] = [];
  const pattern = /(?:\bfrom|\bimport)\s*\(?\s*['"](\.{1,2}\/[^'"]+)['"]/g;
  for (let m = pattern.exec(text); m; m = pattern.exec(text)) found.push(m[1]!);
  return found;
}

/** Strongly connected components with more than one node, or a node that imports itself (Tarjan). */
export function cycles(graph: ReadonlyMap<string, ReadonlySet<string>>): string[][] {
  let counter = 0;
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const out: string[][] = [];
  const visit = (v: string) => {
    index.set(v, counter);
    low.set(v, counter);
    counter++;
    stack.push(v);
    onStack.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!index.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) {
        low.set(v, Math.min(low.get(v)!, index.get(w)!));
      }
    }
    if (low.get(v) === index.get(v)) {
      const component: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        onStack.delete(w);
        component.push(w);
      } while (w !== v);
      if (component.length > 1 || graph.get(v)?.has(v)) out.push(component.sort());
    }
  };
  for (const v of graph.keys()) if (!index.has(v)) visit(v);
  return out;
}

/** The folder (or root file) a core file belongs to: `member`, `analysis.ts`. */
const layerOf = (file: string) => relative(CORE, file).split(sep)[0]!;

function coreGraphs(): { files: Map<string, Set<string>>; folders: Map<string, Set<string>> } {
  const all = sourceFiles(CORE);
  const known = new Set(all);
  const files = new Map<string, Set<string>>();
  const folders = new Map<string, Set<string>>();
  for (const file of all) {
    const targets = new Set<string>();
    for (const spec of importedSpecifiers(readFileSync(file, 'utf8'))) {
      const target = normalize(join(dirname(file), spec));
      const resolved = [target, `${target}.ts`, join(target, 'index.ts')].find((c) => known.has(c));
      if (!resolved) throw new Error(`${relative(CORE, file)} imports ${spec}, which is not a core file`);
      targets.add(resolved);
      const [a, b] = [layerOf(file), layerOf(resolved)];
      if (a !== b) {
        if (!folders.has(a)) folders.set(a, new Set());
        folders.get(a)!.add(b);
      }
    }
    files.set(file, targets);
  }
  return { files, folders };
}

describe('the import graph of core/', () => {
  it('finds a cycle when there is one (the checker itself)', () => {
    const graph = new Map([['a', new Set(['b'])], ['b', new Set(['c'])], ['c', new Set(['a'])], ['d', new Set(['a'])]]);
    expect(cycles(graph)).toEqual([['a', 'b', 'c']]);
    expect(cycles(new Map([['a', new Set(['a'])]]))).toEqual([['a']]);
    expect(cycles(new Map([['a', new Set(['b'])], ['b', new Set<string>()]]))).toEqual([]);
    expect(importedSpecifiers("import type { A } from '../x/a.ts';\nexport { b } from './b.ts';\nconst c = import('../c.ts');")).toEqual(['../x/a.ts', './b.ts', '../c.ts']);
  });

  it('has no cycle between files', () => {
    const { files } = coreGraphs();
    expect(files.size).toBeGreaterThan(100);
    expect(cycles(files).map((c) => c.map((f) => relative(CORE, f)))).toEqual([]);
  });

  it('has no cycle between folders', () => {
    const { folders } = coreGraphs();
    expect(folders.get('assessment')?.has('member')).toBe(true);
    expect(cycles(folders)).toEqual([]);
  });
});
