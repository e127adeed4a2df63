// The command line as a built bundle (issue 16: TypeScript compiled at every start cost 1.3–7 s).
//
// `ensureCliBundle()` returns the URL of out/cli/<build>/hingeline.mjs, building it first when there
// is none or when any source it was built from has changed since (checked by size and modification
// time of every input file, a few milliseconds). Nothing is committed: `npm install`/`npm ci` build it
// in "prepare", and the first run after a change of the sources builds it again (about a second,
// offline: esbuild is a local dependency). Builds go to a fresh folder and a manifest naming the
// current one is replaced atomically, so commands started at the same time never see half a build.
// Where out/ cannot be written (a read-only installation) the caller falls back to the TypeScript
// loader.
//
// Entries: hingeline (app/cli/bin.ts), cli-worker (app/cli/worker.ts), chart-worker
// (app/report/chart-worker.ts) and write-report (app/report/write-report.ts), with shared chunks
// beside them; packages stay in node_modules (external). The sources find their siblings through
// `__HINGELINE_BUNDLE__`, defined only here.
import { randomBytes } from 'node:crypto';
import { mkdirSync, readdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

export const ROOT = fileURLToPath(new URL('../../', import.meta.url));
export const OUT = join(ROOT, 'out', 'cli');

export const ENTRIES = {
  hingeline: 'app/cli/bin.ts',
  'cli-worker': 'app/cli/worker.ts',
  'chart-worker': 'app/report/chart-worker.ts',
  'write-report': 'app/report/write-report.ts',
};

/** The manifest when it names a complete build whose inputs are unchanged; null otherwise. */
export function currentBuild(root = ROOT, out = OUT) {
  let manifest;
  try {
    manifest = JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8'));
  } catch {
    return null;
  }
  if (manifest?.format !== 1 || typeof manifest.folder !== 'string' || typeof manifest.inputs !== 'object') return null;
  for (const [file, [size, mtimeMs]] of Object.entries(manifest.inputs)) {
    try {
      const info = statSync(join(root, file));
      if (info.size !== size || info.mtimeMs !== mtimeMs) return null;
    } catch {
      return null;
    }
  }
  return manifest;
}

/** Builds the bundle into a new folder under `out` and makes it current. Returns the manifest. */
export async function buildCliBundle(root = ROOT, out = OUT) {
  const { build } = await import('esbuild');
  mkdirSync(out, { recursive: true });
  const folder = `b-${Date.now().toString(36)}-${randomBytes(3).toString('hex')}`;
  const result = await build({
    absWorkingDir: root,
    entryPoints: Object.fromEntries(Object.entries(ENTRIES).map(([name, file]) => [name, join(root, file)])),
    outdir: join(out, folder),
    outExtension: { '.js': '.mjs' },
    entryNames: '[name]',
    chunkNames: '[name]-[hash]',
    bundle: true,
    splitting: true,
    format: 'esm',
    platform: 'node',
    target: 'node20.19',
    packages: 'external',
    define: { __HINGELINE_BUNDLE__: 'true' },
    sourcemap: 'linked',
    metafile: true,
    logLevel: 'silent',
    legalComments: 'none',
  });
  const inputs = {};
  for (const file of Object.keys(result.metafile.inputs)) {
    const absolute = resolve(root, file);
    const info = statSync(absolute);
    inputs[relative(root, absolute)] = [info.size, info.mtimeMs];
  }
  // This script and package.json shape the build too.
  for (const file of ['build/scripts/cli-bundle.mjs', 'package.json']) {
    const info = statSync(join(root, file));
    inputs[file] = [info.size, info.mtimeMs];
  }
  const manifest = { format: 1, folder, builtAt: new Date().toISOString(), inputs };
  const temp = join(out, `.manifest-${process.pid}-${randomBytes(3).toString('hex')}.json`);
  writeFileSync(temp, `${JSON.stringify(manifest)}\n`);
  renameSync(temp, join(out, 'manifest.json'));
  removeOldBuilds(out, folder);
  return manifest;
}

/** Removes builds other than `keep` that are more than ten minutes old (a running command may use one). */
function removeOldBuilds(out, keep) {
  for (const name of readdirSync(out)) {
    if (!name.startsWith('b-') || name === keep) continue;
    const path = join(out, name);
    try {
      if (Date.now() - statSync(path).mtimeMs > 10 * 60_000) rmSync(path, { recursive: true, force: true });
    } catch {
      // Another process removed it first.
    }
  }
}

/**
 * URL of the bundled command (built first when missing or stale), or null when it cannot be built
 * here (the reason goes to `onProblem`).
 */
export async function ensureCliBundle(onProblem = () => {}) {
  let manifest = currentBuild();
  if (!manifest) {
    try {
      manifest = await buildCliBundle();
    } catch (error) {
      onProblem(error instanceof Error ? error.message : String(error));
      return null;
    }
  }
  return pathToFileURL(join(OUT, manifest.folder, 'hingeline.mjs'));
}

// `node build/scripts/cli-bundle.mjs` (npm "prepare" and "build:cli"): build unless current.
if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const force = process.argv.includes('--force');
  const manifest = !force && currentBuild();
  if (manifest) {
    process.stdout.write(`hingeline: the command-line bundle is current (out/cli/${manifest.folder})\n`);
  } else {
    const start = performance.now();
    const built = await buildCliBundle();
    process.stdout.write(`hingeline: built the command-line bundle out/cli/${built.folder} in ${((performance.now() - start) / 1000).toFixed(1)} s\n`);
  }
}
