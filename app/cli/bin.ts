/**
 * What the `hingeline` command runs, bundled (out/cli, see build/scripts/cli-bundle.mjs) or through
 * the TypeScript loader: the real process streams, then the exit code. Kept apart from main.ts so
 * that tests can call `main` with an in-memory CliIo.
 */
import { nodeIo } from './io.ts';
import { main } from './main.ts';

/** Runs the command line on this process and sets its exit code. */
export async function run(argv: readonly string[]): Promise<void> {
  const io = nodeIo();
  process.exitCode = await main(argv, io);
  // Workers and timers are done; leave without waiting for anything left behind (e.g. after Ctrl+C).
  if (io.signal.aborted) process.exit(process.exitCode);
}
