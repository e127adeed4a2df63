/**
 * The `npm test` runner (build/scripts/test.mjs): its parts run at the same time, every part runs
 * to its end whatever the others do, the run fails when any part fails, and a held-back part's
 * output comes out whole under its heading (a failure in full, a pass as one line).
 */
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
// @ts-expect-error a plain JavaScript build script without type declarations
import { recordRun, runSteps, testSteps } from '../../../build/scripts/test.mjs';

interface StepResult { name: string; code: number; ms: number; output: string }
type Run = (steps: unknown[], options: { cwd?: string; write: (text: string) => void }) => Promise<{ passed: boolean; results: StepResult[] }>;

const folder = mkdtempSync(join(tmpdir(), 'hingeline-test-runner-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

/** A step running a few lines of JavaScript in a fresh node. */
const node = (name: string, code: string, capture = true) => ({ name, command: process.execPath, args: ['-e', code], capture });

async function run(steps: unknown[]) {
  let printed = '';
  const outcome = await (runSteps as Run)(steps, { cwd: folder, write: (text) => { printed += text; } });
  return { ...outcome, printed };
}

describe('npm test runner', () => {
  it('records the run for the benchmark: wall time per part, load average at the start and the end, the arguments', async () => {
    const { passed, results } = await run([node('quick', 'process.exit(0)'), node('broken', 'process.exit(3)')]);
    const dir = join(folder, 'record');
    (recordRun as (run: unknown, dir: string) => void)({ passed, results, vitestArgs: ['test/core'], loadAtStart: [1.5, 1, 0.5], wallMs: 4321 }, dir);
    const note = JSON.parse(readFileSync(join(dir, 'last-npm-test.json'), 'utf8'));
    expect(note.passed).toBe(false);
    expect(note.wallSeconds).toBeCloseTo(4.321, 9);
    expect(note.loadAtStart).toEqual([1.5, 1, 0.5]);
    expect(note.loadAtEnd).toHaveLength(3);
    expect(note.vitestArgs).toEqual(['test/core']);
    expect(note.steps.map((st: { name: string; passed: boolean }) => [st.name, st.passed])).toEqual([['quick', true], ['broken', false]]);
    expect(Date.parse(note.finishedAt)).toBeGreaterThan(Date.parse('2026-01-01T00:00:00Z'));
    // A folder that cannot be made (a file is in the way) is not an error of the test run.
    expect(() => (recordRun as (run: unknown, dir: string) => void)({ passed, results, vitestArgs: [], loadAtStart: [0, 0, 0], wallMs: 1 }, join(dir, 'last-npm-test.json', 'below'))).not.toThrow();
  });

  it('passes when every part passes, and says so in one line per held-back part', async () => {
    const { passed, results, printed } = await run([node('first', 'console.log("noise of a passing step")'), node('second', 'process.exit(0)')]);
    expect(passed).toBe(true);
    expect(results.map((r) => [r.name, r.code])).toEqual([['first', 0], ['second', 0]]);
    expect(printed).toContain('✓ first passed');
    // A pass prints its verdict, not its output.
    expect(printed).not.toContain('noise of a passing step');
    expect(printed).toMatch(/npm test: passed in \d+ s wall/);
  });

  it('fails when one part fails, prints that part whole, and still runs the others to their end', async () => {
    const marker = join(folder, 'finished.txt');
    // The failing part exits at once; the other finishes its work after it (a chain of timers, so
    // that it certainly ends later without any assumption about the machine's speed).
    const slow = `let n = 0; const tick = () => (++n < 50 ? setTimeout(tick, 1) : require('node:fs').writeFileSync(${JSON.stringify(marker)}, 'done')); tick();`;
    const { passed, results, printed } = await run([
      node('types', 'console.error("src/a.ts(3,1): error TS2322: line one"); console.error("line two of the failure"); process.exit(2)'),
      node('slow', slow),
    ]);
    expect(passed).toBe(false);
    expect(results.find((r) => r.name === 'types')?.code).toBe(2);
    expect(results.find((r) => r.name === 'slow')?.code).toBe(0);
    expect(readFileSync(marker, 'utf8')).toBe('done');
    // The failure's lines together, between its heading and its end line.
    const block = printed.slice(printed.indexOf('✗ types failed (exit 2'), printed.indexOf('end of types'));
    expect(block).toContain('error TS2322: line one\nline two of the failure');
    expect(printed).toContain('npm test: failed (types)');
  });

  it('runs the parts at the same time', async () => {
    // The first part waits for a file only the second part writes: run one after the other, the
    // first would never see it. (It gives up after 100 s, the project's budget for a test, so that
    // a runner that broke this leaves no process behind.)
    const signal = join(folder, 'second-started.txt');
    const waiter = `const fs = require('node:fs'); const end = Date.now() + 100000; const poll = () => (fs.existsSync(${JSON.stringify(signal)}) ? process.exit(0) : Date.now() > end ? process.exit(3) : setTimeout(poll, 5)); poll();`;
    const { passed } = await run([node('waits', waiter), node('writes', `require('node:fs').writeFileSync(${JSON.stringify(signal)}, 'x')`)]);
    expect(passed).toBe(true);
  });

  it('fails when a part cannot be started at all', async () => {
    const { passed, results } = await run([{ name: 'missing', command: join(folder, 'no-such-program'), args: [], capture: true }]);
    expect(passed).toBe(false);
    expect(results[0]?.code).toBe(1);
    expect(results[0]?.output).toMatch(/ENOENT/);
  });

  it('runs the type-check and lint scripts of package.json, and Vitest with the arguments given', () => {
    const steps = (testSteps as (args: string[]) => { name: string; args: string[]; capture: boolean }[])(['test/core/member']);
    expect(steps.map((s) => s.name)).toEqual(['type-check', 'lint', 'vitest']);
    expect(steps[0]!.args).toEqual(['run', '--silent', 'typecheck']);
    expect(steps[1]!.args).toEqual(['run', '--silent', 'lint']);
    expect(steps[2]!.args.slice(-2)).toEqual(['run', 'test/core/member']);
    expect(existsSync(steps[2]!.args[0]!)).toBe(true);
    expect(steps.map((s) => s.capture)).toEqual([true, true, false]);
  });
});
