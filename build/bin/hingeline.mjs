#!/usr/bin/env node
// The `hingeline` command (package.json "bin"). Runs the built bundle in out/cli (built by
// `npm install` and again after any change of the sources: build/scripts/cli-bundle.mjs); where it
// cannot be built, registers tsx's loader and runs the TypeScript sources instead. See docs/cli.md.
import { ensureCliBundle } from '../scripts/cli-bundle.mjs';

const argv = process.argv.slice(2);
let reason = '';
const bundle = process.env.HINGELINE_NO_BUNDLE ? null : await ensureCliBundle((problem) => (reason = problem));
if (bundle) {
  const { run } = await import(bundle.href);
  await run(argv);
} else {
  if (reason && process.env.HINGELINE_DEBUG) process.stderr.write(`hingeline: running from the sources (the bundle could not be built: ${reason})\n`);
  const { register } = await import('tsx/esm/api');
  register();
  const { run } = await import('../../app/cli/bin.ts');
  await run(argv);
}
