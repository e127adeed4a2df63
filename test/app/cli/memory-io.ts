/** An in-memory CliIo for command tests: files in a map, stdout and stderr collected. */
import { readFileSync } from 'node:fs';
import type { CliIo } from '../../../app/cli/io.ts';

export interface MemoryIo extends CliIo {
  readonly files: Map<string, string>;
  out(): string;
  err(): string;
}

export function memoryIo(files: Record<string, string> = {}, options: { tty?: boolean; env?: Record<string, string> } = {}): MemoryIo {
  const store = new Map(Object.entries(files));
  let stdout = '';
  let stderr = '';
  return {
    files: store,
    out: () => stdout,
    err: () => stderr,
    stdout: (t) => { stdout += t; },
    stderr: (t) => { stderr += t; },
    stdoutIsTTY: false,
    stderrIsTTY: options.tty ?? false,
    columns: 100,
    colorAllowed: false,
    readText: async (path) => {
      const text = store.get(path);
      if (text === undefined) throw Object.assign(new Error(`ENOENT: ${path}`), { code: 'ENOENT' });
      return text;
    },
    writeText: async (path, text) => {
      if (path.startsWith('/no-such-dir/')) throw Object.assign(new Error('ENOENT'), { code: 'ENOENT' });
      store.set(path, text);
    },
    outputProblem: async (path) => (path.startsWith('/no-such-dir/') ? 'the folder /no-such-dir does not exist' : path === '/virtual/a-folder' ? 'it is a folder' : null),
    exists: (path) => store.has(path) || (path.startsWith('/') && !path.startsWith('/virtual/') && existsOnDisk(path)),
    resolvePath: (path) => (path.startsWith('/') ? path : `/virtual/${path}`),
    signal: new AbortController().signal,
    withImmediateInterrupt: async (work) => work(),
    env: options.env ?? {},
  };
}

function existsOnDisk(path: string): boolean {
  try {
    readFileSync(path);
    return true;
  } catch {
    return false;
  }
}

