/**
 * The list of recently opened or saved projects, persisted as JSON in the user-data folder.
 * Node-only, no Electron import.
 */
import { mkdir, readFile } from 'node:fs/promises';
import { dirname, resolve } from 'node:path';
import { isAbsolutePath } from '../shared/validators.ts';
import { writeFileAtomic } from './atomic-write.ts';

const RECENT_VERSION = 1;
export const DEFAULT_RECENT_LIMIT = 10;

function sameFile(a: string, b: string, platform: NodeJS.Platform): boolean {
  // Windows and (by default) macOS file systems ignore case.
  return platform === 'win32' || platform === 'darwin' ? a.toLowerCase() === b.toLowerCase() : a === b;
}

/**
 * The paths in a recent-files JSON text: absolute strings only, duplicates dropped, at most
 * `limit`. Anything malformed yields an empty list rather than an error (the list is a
 * convenience, never worth refusing to start over).
 */
export function parseRecentFiles(text: string, limit = DEFAULT_RECENT_LIMIT, platform: NodeJS.Platform = process.platform): string[] {
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch {
    return [];
  }
  if (typeof parsed !== 'object' || parsed === null) return [];
  const { version, files } = parsed as { version?: unknown; files?: unknown };
  if (version !== RECENT_VERSION || !Array.isArray(files)) return [];
  const result: string[] = [];
  for (const entry of files) {
    if (typeof entry !== 'string' || entry.length === 0 || entry.length > 4096 || !isAbsolutePath(entry)) continue;
    if (/[\u0000-\u001f]/.test(entry)) continue;
    if (result.some((known) => sameFile(known, entry, platform))) continue;
    result.push(entry);
    if (result.length >= limit) break;
  }
  return result;
}

export interface RecentFilesOptions {
  readonly limit?: number;
  readonly platform?: NodeJS.Platform;
}

export class RecentFiles {
  private files: string[] = [];
  private readonly limit: number;
  private readonly platform: NodeJS.Platform;

  constructor(readonly storePath: string, options: RecentFilesOptions = {}) {
    this.limit = options.limit ?? DEFAULT_RECENT_LIMIT;
    this.platform = options.platform ?? process.platform;
  }

  /** Reads the stored list (an absent or broken file gives an empty list). */
  async load(): Promise<readonly string[]> {
    try {
      this.files = parseRecentFiles(await readFile(this.storePath, 'utf8'), this.limit, this.platform);
    } catch {
      this.files = [];
    }
    return this.list();
  }

  list(): readonly string[] {
    return [...this.files];
  }

  has(path: string): boolean {
    return this.files.some((known) => sameFile(known, path, this.platform));
  }

  /** Moves `path` (made absolute) to the top of the list and saves it. */
  async add(path: string): Promise<readonly string[]> {
    // Windows paths are absolute on every platform's terms here (tests run on Linux).
    const absolute = isAbsolutePath(path) ? path : resolve(path);
    this.files = [absolute, ...this.files.filter((known) => !sameFile(known, absolute, this.platform))].slice(0, this.limit);
    await this.save();
    return this.list();
  }

  async remove(path: string): Promise<readonly string[]> {
    this.files = this.files.filter((known) => !sameFile(known, path, this.platform));
    await this.save();
    return this.list();
  }

  async clear(): Promise<void> {
    this.files = [];
    await this.save();
  }

  private async save(): Promise<void> {
    await mkdir(dirname(this.storePath), { recursive: true });
    await writeFileAtomic(this.storePath, `${JSON.stringify({ version: RECENT_VERSION, files: this.files }, null, 2)}\n`);
  }
}
