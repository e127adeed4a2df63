/**
 * The command line's edge to the outside world: streams, files, terminal facts and Ctrl+C. Commands
 * receive a CliIo, so tests run them against an in-memory one (see test/app/cli).
 */
import { existsSync } from 'node:fs';
import { readFile, stat } from 'node:fs/promises';
import { dirname, resolve } from 'node:path';
import { assertWritableTarget, writeFileAtomic } from '../main/atomic-write.ts';
import { EXIT } from './args.ts';

export interface CliIo {
  stdout(text: string): void;
  stderr(text: string): void;
  /** True when stderr is a terminal (progress bar and colours on stderr). */
  readonly stderrIsTTY: boolean;
  /** True when stdout is a terminal (colours in the table). */
  readonly stdoutIsTTY: boolean;
  /** Terminal width in columns (80 when unknown). */
  readonly columns: number;
  /** Colours allowed at all (NO_COLOR not set); each stream also has to be a terminal. */
  readonly colorAllowed: boolean;
  readText(path: string): Promise<string>;
  /**
   * Writes atomically; only to a regular file or a new path (app/main/atomic-write.ts). With
   * `keepBackup` the previous content is kept as `<path>.bak`.
   */
  writeText(path: string, text: string, options?: { readonly keepBackup?: boolean }): Promise<void>;
  /**
   * Why `path` cannot be written (its folder is missing, or something other than a regular file is
   * there), or null when it can. Checked before long work, so a bad --out fails at once.
   */
  outputProblem(path: string): Promise<string | null>;
  exists(path: string): boolean;
  /** Absolute path of `path` from the working directory. */
  resolvePath(path: string): string;
  /** Aborts when the user presses Ctrl+C (while this thread is free to notice it). */
  readonly signal: AbortSignal;
  /**
   * Runs work that keeps this thread busy for long stretches (an analysis on this thread, pdfmake's
   * layout). Ctrl+C cannot be noticed by JavaScript then, so meanwhile it ends the process at once,
   * as the operating system's default does (exit status 130 in the shell); nothing is being written
   * during such work, and an interrupted atomic write leaves only a temp file the next write removes.
   */
  withImmediateInterrupt<T>(work: () => T | Promise<T>): Promise<T>;
  readonly env: Readonly<Record<string, string | undefined>>;
}

/** The real thing: process streams, the file system and SIGINT. */
export function nodeIo(): CliIo {
  const controller = new AbortController();
  const onInterrupt = () => controller.abort();
  process.once('SIGINT', onInterrupt);
  // A reader that stops early (`hingeline analyze … | head`) closes the pipe: end quietly.
  for (const stream of [process.stdout, process.stderr]) {
    stream.on('error', (error: NodeJS.ErrnoException) => {
      if (error.code === 'EPIPE') process.exit(0);
      throw error;
    });
  }
  const stdoutIsTTY = process.stdout.isTTY === true;
  const stderrIsTTY = process.stderr.isTTY === true;
  return {
    stdout: (text) => void process.stdout.write(text),
    stderr: (text) => void process.stderr.write(text),
    stdoutIsTTY,
    stderrIsTTY,
    columns: process.stdout.columns ?? process.stderr.columns ?? 80,
    colorAllowed: process.env.NO_COLOR === undefined || process.env.NO_COLOR === '',
    readText: (path) => readFile(path, 'utf8'),
    writeText: async (path, text, options) => void (await writeFileAtomic(path, text, { keepBackup: options?.keepBackup === true })),
    outputProblem: (path) => outputProblem(resolve(path)),
    exists: (path) => existsSync(path),
    resolvePath: (path) => resolve(path),
    signal: controller.signal,
    withImmediateInterrupt: async (work) => {
      // A Ctrl+C that came during the synchronous stretch before (parsing and checking a large
      // project, seconds on a busy machine) is still waiting in the event loop: Node runs signal
      // listeners only when the loop polls for events. Removing the listener now would drop it (the
      // analysis then ran to its end, ignoring the interrupt: seen under load 20–50). One
      // setImmediate is not enough: called from an I/O callback (reading the project file), its
      // callback runs in the same turn of the loop, before the next poll — the interrupt was still
      // lost every time (test/app/cli/io-interrupt.test.ts). The second one runs only after a poll,
      // which delivers the signal to the listener; the window left is the two statements below.
      await new Promise<void>((resolve) => setImmediate(resolve));
      await new Promise<void>((resolve) => setImmediate(resolve));
      // Ctrl+C came before this work began: honour it now instead of running the work to its end.
      if (controller.signal.aborted) process.exit(EXIT.interrupted);
      // Without a listener Node restores the default action of SIGINT: the process ends at once.
      const listening = process.listeners('SIGINT').includes(onInterrupt);
      if (listening) process.off('SIGINT', onInterrupt);
      try {
        return await work();
      } finally {
        if (listening && !controller.signal.aborted) process.once('SIGINT', onInterrupt);
      }
    },
    env: process.env,
  };
}

/** See `CliIo.outputProblem`. */
export async function outputProblem(path: string): Promise<string | null> {
  const folder = dirname(path);
  try {
    if (!(await stat(folder)).isDirectory()) return `${folder} is not a folder`;
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    return code === 'ENOENT' ? `the folder ${folder} does not exist` : code === 'ENOTDIR' ? `a part of ${folder} is not a folder` : code === 'EACCES' ? `permission denied for ${folder}` : String(error);
  }
  try {
    await assertWritableTarget(path);
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EISDIR' ? 'it is a folder' : error instanceof Error ? error.message : String(error);
  }
  return null;
}
