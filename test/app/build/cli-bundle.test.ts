/**
 * The command-line bundle (build/scripts/cli-bundle.mjs): built into a temporary folder from the real
 * sources, it runs without the TypeScript loader, starts its worker threads from the bundle, and is
 * found stale as soon as one of its inputs changes.
 */
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
// @ts-expect-error a plain JavaScript build script without type declarations
import { buildCliBundle, currentBuild, ROOT } from '../../../build/scripts/cli-bundle.mjs';

mkdirSync(join(ROOT as string, 'out'), { recursive: true });
import { serializeProject } from '../../../core/project/file.ts';
import { demoProject } from '../../../core/project/demo.ts';

interface Manifest {
  readonly format: number;
  readonly folder: string;
  readonly inputs: Record<string, [number, number]>;
}

// Inside the repository, so that the bundle finds node_modules as the real one does.
const out = mkdtempSync(join(ROOT as string, 'out', 'test-cli-bundle-'));
let manifest: Manifest;
beforeAll(async () => {
  manifest = (await buildCliBundle(ROOT, out)) as Manifest;
}, 120_000);
afterAll(() => rmSync(out, { recursive: true, force: true }));

/** Runs the bundled command in a child process, as build/bin/hingeline.mjs does. */
function runBundled(cwd: string, ...args: string[]) {
  const entry = pathToFileURL(join(out, manifest.folder, 'hingeline.mjs')).href;
  const runner = join(out, 'run.mjs');
  writeFileSync(runner, `const { run } = await import(${JSON.stringify(entry)});\nawait run(process.argv.slice(2));\n`);
  const r = spawnSync(process.execPath, [runner, ...args], { cwd, encoding: 'utf8', env: { ...process.env, NO_COLOR: '1' }, timeout: 120_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

describe('the command-line bundle', () => {
  it('records every source it was built from, and is current until one changes', () => {
    expect(manifest.format).toBe(1);
    for (const file of ['app/cli/main.ts', 'app/cli/worker.ts', 'app/report/write-report.ts', 'core/analysis.ts', 'package.json']) expect(Object.keys(manifest.inputs)).toContain(file);
    expect(currentBuild(ROOT, out)).toMatchObject({ folder: manifest.folder });
    // Pretend that core/analysis.ts had another size when the bundle was built.
    const changed = { ...manifest, inputs: { ...manifest.inputs, 'core/analysis.ts': [manifest.inputs['core/analysis.ts']![0] + 1, manifest.inputs['core/analysis.ts']![1]] } };
    writeFileSync(join(out, 'manifest.json'), JSON.stringify(changed));
    expect(currentBuild(ROOT, out)).toBeNull();
    writeFileSync(join(out, 'manifest.json'), JSON.stringify(manifest));
    expect(currentBuild(ROOT, out)).toMatchObject({ folder: manifest.folder });
  });

  it('holds plain JavaScript: each entry beside its chunks, no TypeScript loader', () => {
    const files = readdirSync(join(out, manifest.folder));
    for (const entry of ['hingeline.mjs', 'cli-worker.mjs', 'chart-worker.mjs', 'write-report.mjs']) expect(files).toContain(entry);
    for (const file of files.filter((f) => f.endsWith('.mjs'))) expect(readFileSync(join(out, manifest.folder, file), 'utf8')).not.toMatch(/["']tsx(\/[^"']*)?["']/);
  });

  it('prints its version and analyses on two worker threads started from the bundle', () => {
    const work = mkdtempSync(join(tmpdir(), 'hingeline-cli-bundle-run-'));
    try {
      const version = runBundled(work, '--version');
      expect(version).toEqual({ code: 0, stdout: `hingeline ${JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')).version}\n`, stderr: '' });
      writeFileSync(join(work, 'demo.hingeline'), serializeProject(demoProject()));
      const r = runBundled(work, 'analyze', 'demo.hingeline', '--member', 'C-101', '--member', 'F-205', '--jobs', '2', '--format', 'json');
      // the file's one warning (L-102 below the minimum steel, on purpose) on stderr, nothing else
      expect(r.stderr.trim().split('\n')).toEqual([expect.stringMatching(/^warning: members\[7\] "L-102" .*less than the minimum/)]);
      expect(r.code).toBe(0);
      expect(JSON.parse(r.stdout).members.map((m: { id: string }) => m.id)).toEqual(['C-101', 'F-205']);
    } finally {
      rmSync(work, { recursive: true, force: true });
    }
  }, 120_000);
});
