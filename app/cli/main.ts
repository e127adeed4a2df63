/**
 * The `hingeline` command line (bin: build/bin/hingeline.mjs). `main` parses the arguments, runs
 * the command and returns the exit code; it never throws and never prints a stack trace unless
 * HINGELINE_DEBUG is set. See docs/cli.md.
 */
import packageJson from '../../package.json' with { type: 'json' };
import { EXIT, helpText, parseArguments } from './args.ts';
import type { CliIo } from './io.ts';

/** The package version (package.json). */
export function packageVersion(): string {
  return packageJson.version;
}

/** Runs the command line with `argv` (the arguments after `hingeline`) and returns the exit code. */
export async function main(argv: readonly string[], io: CliIo, options: { reportModule?: URL } = {}): Promise<number> {
  const parsed = parseArguments(argv);
  if (!parsed.ok) {
    io.stderr(`hingeline: ${parsed.message}\nRun "hingeline ${parsed.topic ? `${parsed.topic} ` : ''}--help" for usage.\n`);
    return EXIT.usage;
  }
  const command = parsed.command;
  if (command.kind === 'help') {
    io.stdout(`${helpText(command.topic)}\n`);
    return EXIT.ok;
  }
  if (command.kind === 'version') {
    io.stdout(`hingeline ${packageVersion()}\n`);
    return EXIT.ok;
  }
  // Loaded only for a command: help and --version start without the engine.
  const { CliFailure, runCommand } = await import('./commands.ts');
  try {
    return await runCommand(io, command, options);
  } catch (error) {
    if (error instanceof CliFailure) {
      io.stderr(`hingeline: ${error.message}\n`);
      return error.exitCode;
    }
    const message = error instanceof Error ? error.message : String(error);
    io.stderr(`hingeline: internal error (please report it with the file that caused it): ${message.split('\n')[0]}\n`);
    if (io.env.HINGELINE_DEBUG && error instanceof Error && error.stack) io.stderr(`${error.stack}\n`);
    return EXIT.internal;
  }
}
