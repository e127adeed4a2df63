/**
 * Reading the command line of this or of a second instance. Node-only, no Electron import.
 *
 * Electron's argv is `[executable, ...arguments]` in a packaged app and
 * `[electron, appPath, ...arguments]` in development. Chromium may add its own `--switches`
 * (also in the argv a second instance forwards), and older macOS adds `-psn_…`; every argument
 * starting with `-` is therefore ignored.
 */
import { isAbsolute, resolve } from 'node:path';
import { isProjectFileName } from '../shared/file-types.ts';

export interface ArgvContext {
  /** Folder relative paths are resolved against (the second instance's working directory). */
  readonly cwd: string;
  /** True in a packaged app (argv has no app-path argument). */
  readonly isPackaged: boolean;
}

/** The user's arguments: argv without the executable (and the app path in development). */
export function userArguments(argv: readonly string[], isPackaged: boolean): string[] {
  return argv.slice(isPackaged ? 1 : 2);
}

/**
 * The first project file named on the command line (`.hingeline` or `.json`), made absolute,
 * or null. Flags and other files are ignored.
 */
export function projectPathFromArgv(argv: readonly string[], context: ArgvContext): string | null {
  for (const argument of userArguments(argv, context.isPackaged)) {
    if (argument.length === 0 || argument.startsWith('-')) continue;
    if (!isProjectFileName(argument)) continue;
    return isAbsolute(argument) ? argument : resolve(context.cwd, argument);
  }
  return null;
}

/** True when the command line asks to open the demo project (`--demo`, used by `npm start`). */
export function wantsDemoProject(argv: readonly string[], isPackaged: boolean): boolean {
  return userArguments(argv, isPackaged).includes('--demo');
}
