/**
 * Counts how many generated bad project files (bad-projects.ts) a project validation catches: an
 * error whose path starts where the defect was planted. `npx tsx test/core/project/count-caught.ts
 * [checkout root] [files per kind]` — the root defaults to this checkout; give another one (e.g. a
 * worktree of an earlier commit) to count before and after in the same run.
 */
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { BAD_KINDS, badProjectSamples } from './bad-projects.ts';
import type * as Validate from '../../../core/project/validate.ts';

const root = resolve(process.argv[2] ?? resolve(import.meta.dirname, '../../..'));
const perKind = Number(process.argv[3] ?? 40);
const { validateProjectData } = (await import(pathToFileURL(`${root}/core/project/validate.ts`).href)) as typeof Validate;
const samples = badProjectSamples(perKind);
const caught = new Map<string, number>(BAD_KINDS.map((k) => [k, 0]));
for (const s of samples) {
  const { diagnostics } = validateProjectData(JSON.parse(JSON.stringify(s.project)));
  if (diagnostics.some((d) => d.severity === 'error' && d.path.startsWith(s.path))) caught.set(s.kind, caught.get(s.kind)! + 1);
}
console.log(`${root}: caught by validation, of ${perKind} generated files per kind`);
for (const [kind, n] of caught) console.log(`  ${kind.padEnd(18)} ${n} / ${perKind}`);
console.log(`  ${'all'.padEnd(18)} ${[...caught.values()].reduce((a, b) => a + b, 0)} / ${samples.length}`);
