#!/usr/bin/env node
/**
 * `npm test`: type-check, lint and every Vitest project, run at the same time; fails if any fails.
 *
 * Why at the same time: run one after the other, the type-check (one thread, about 65 s of CPU on a
 * clean clone) and the lint (about 28 s) left a core idle and, on a machine busy with other work,
 * each got one thread's share of the CPU. Run beside Vitest they fill its idle moments (Chromium
 * starting, the last files on one worker) and the suite ends when its longest part does. Nothing is
 * skipped: each part runs to its end whatever the others do.
 *
 * Output: Vitest's report streams as usual. The type-check's and the lint's output is held back and
 * printed whole, under a heading, when each ends (one line when it passed, everything it printed
 * when it failed), so the lines of the parts never interleave. A summary closes the run.
 *
 * Arguments after `npm test --` go to Vitest (`npm test -- test/core/member`); the type-check and
 * the lint still run in full. `npm run typecheck` and `npm run lint` stay the single definitions
 * of those commands.
 */
import { spawn } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { availableParallelism, loadavg } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

export const ROOT = fileURLToPath(new URL('../../', import.meta.url));

/**
 * @typedef {{ name: string, command: string, args: string[], capture: boolean }} Step
 *   `capture`: hold the output back and print it whole when the step ends; else it streams.
 * @typedef {{ name: string, code: number, ms: number, output: string }} StepResult
 */

/**
 * Runs every step at once and waits for all of them. `write` receives what the runner prints.
 * @param {readonly Step[]} steps
 * @param {{ cwd?: string, write?: (text: string) => void, colour?: boolean }} [options]
 * @returns {Promise<{ passed: boolean, results: StepResult[] }>}
 */
export async function runSteps(steps, options = {}) {
  const { cwd = ROOT, write = (text) => process.stdout.write(text), colour = false } = options;
  const paint = (code, text) => (colour ? `\u001b[${code}m${text}\u001b[0m` : text);
  const seconds = (ms) => `${(ms / 1000).toFixed(0)} s`;
  const started = performance.now();

  /** A captured step's verdict, and when it failed everything it printed, under one heading. */
  const report = (result) => {
    if (result.code === 0) {
      write(`\n${paint('32', `✓ ${result.name} passed`)} (${seconds(result.ms)})\n`);
      return;
    }
    const rule = '─'.repeat(20);
    write(`\n${paint('31', `${rule} ✗ ${result.name} failed (exit ${result.code}, ${seconds(result.ms)}) ${rule}`)}\n${result.output.trimEnd()}\n${paint('31', `${rule} end of ${result.name} ${rule}`)}\n`);
  };

  const run = (step) => new Promise((resolve) => {
    const t0 = performance.now();
    const child = spawn(step.command, step.args, {
      cwd,
      stdio: step.capture ? ['ignore', 'pipe', 'pipe'] : 'inherit',
      env: step.capture && colour ? { ...process.env, FORCE_COLOR: '1' } : process.env,
    });
    running.add(child);
    let output = '';
    if (step.capture) {
      child.stdout.on('data', (chunk) => { output += chunk; });
      child.stderr.on('data', (chunk) => { output += chunk; });
    }
    let settled = false;
    const finish = (code, error) => {
      if (settled) return;
      settled = true;
      running.delete(child);
      const result = { name: step.name, code: error ? 1 : code, ms: performance.now() - t0, output: error ? `${output}${error.message}\n` : output };
      if (step.capture) report(result);
      resolve(result);
    };
    child.on('error', (error) => finish(1, error));
    // A step stopped by a signal failed (exit code null).
    child.on('close', (code) => finish(code ?? 1));
  });

  const results = await Promise.all(steps.map(run));
  const failed = results.filter((r) => r.code !== 0);
  write(`\n${results.map((r) => `${r.code === 0 ? paint('32', '✓') : paint('31', '✗')} ${r.name.padEnd(10)} ${seconds(r.ms).padStart(6)}`).join('\n')}\n`);
  write(`npm test: ${failed.length === 0 ? paint('32', 'passed') : paint('31', `failed (${failed.map((r) => r.name).join(', ')})`)} in ${seconds(performance.now() - started)} wall\n`);
  return { passed: failed.length === 0, results };
}

/**
 * Notes the run in out/last-npm-test.json for `npm run bench`'s test-suite row (wall time per part,
 * the load average at the start and the end). A note that cannot be written is not a test failure.
 * @param {{ passed: boolean, results: StepResult[], vitestArgs: string[], loadAtStart: number[], wallMs: number }} run
 */
export function recordRun(run, dir = join(ROOT, 'out')) {
  try {
    mkdirSync(dir, { recursive: true });
    writeFileSync(join(dir, 'last-npm-test.json'), `${JSON.stringify({
      finishedAt: new Date().toISOString(),
      passed: run.passed,
      wallSeconds: run.wallMs / 1000,
      cores: availableParallelism(),
      loadAtStart: run.loadAtStart,
      loadAtEnd: loadavg(),
      vitestArgs: run.vitestArgs,
      steps: run.results.map((r) => ({ name: r.name, seconds: r.ms / 1000, passed: r.code === 0 })),
    }, null, 2)}\n`);
  } catch {
    // The record is a convenience for the benchmark only.
  }
}

/** Children still running (stopped with the runner on Ctrl+C). */
const running = new Set();

/** The three parts of `npm test`; `vitestArgs` go to Vitest. */
export function testSteps(vitestArgs = []) {
  const npm = process.platform === 'win32' ? 'npm.cmd' : 'npm';
  return [
    { name: 'type-check', command: npm, args: ['run', '--silent', 'typecheck'], capture: true },
    { name: 'lint', command: npm, args: ['run', '--silent', 'lint'], capture: true },
    { name: 'vitest', command: process.execPath, args: [fileURLToPath(new URL('../../node_modules/vitest/vitest.mjs', import.meta.url)), 'run', ...vitestArgs], capture: false },
  ];
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  for (const signal of ['SIGINT', 'SIGTERM']) {
    process.on(signal, () => {
      for (const child of running) child.kill(signal);
      process.exit(130);
    });
  }
  const loadAtStart = loadavg();
  const t0 = performance.now();
  const vitestArgs = process.argv.slice(2);
  const { passed, results } = await runSteps(testSteps(vitestArgs), { colour: Boolean(process.stdout.isTTY) && !process.env.NO_COLOR });
  recordRun({ passed, results, vitestArgs, loadAtStart, wallMs: performance.now() - t0 });
  process.exit(passed ? 0 : 1);
}
