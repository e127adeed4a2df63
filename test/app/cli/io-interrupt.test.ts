/**
 * Ctrl+C during the synchronous stretch just before long work (reading and checking a large project)
 * must stop the command: `withImmediateInterrupt` (app/cli/io.ts) lets the event loop deliver a
 * waiting interrupt before it hands SIGINT back to the operating system's default. With one
 * setImmediate the interrupt was lost every time when the stretch ran in an I/O callback (the
 * immediate ran before the loop polled again), and the analysis ran to its end — the flaky Ctrl+C
 * test of test/app/cli/bin.test.ts on a busy machine.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const repoRoot = fileURLToPath(new URL('../../../', import.meta.url));
const child = fileURLToPath(new URL('../fixtures/interrupt-child.ts', import.meta.url));

describe('Ctrl+C that arrives just before long work in this thread', () => {
  for (const where of ['io', 'timer'] as const) {
    it(`stops the work (status 130) when it came during ${where === 'io' ? 'an I/O callback' : 'a timer callback'}`, () => {
      for (let run = 0; run < 3; run++) {
        const result = spawnSync(process.execPath, ['--import', 'tsx', child, where], { cwd: repoRoot, encoding: 'utf8', timeout: 120_000 });
        // 130 = 128 + SIGINT (the command's own exit on an interrupt), or killed by the default action.
        expect(result.status === 130 || result.signal === 'SIGINT', `run ${run}: status ${result.status}, signal ${result.signal}, stdout ${JSON.stringify(result.stdout)}, stderr ${result.stderr}`).toBe(true);
        expect(result.stdout).toBe('');
      }
    }, 240_000);
  }
});
