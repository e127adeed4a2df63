/**
 * Crash-safe file writes. Node-only, no Electron import, so tests run it directly (and kill it).
 *
 * `writeFileAtomic(target, data)`:
 *  1. removes temp files that an earlier, interrupted write to the same target left behind;
 *  2. writes the data to a new temp file in the target's folder (same file system, so the final
 *     rename is atomic), in chunks, then fsyncs it;
 *  3. optionally keeps the previous version as `<target>.bak` (itself replaced atomically);
 *  4. renames the temp file over the target and fsyncs the folder.
 *
 * Whatever moment the process dies, the target holds either the complete old content or the
 * complete new content, never a mixture; at worst a temp file named
 * `.<name>.hingeline-tmp-<pid>-<token>` is left, which the next write to that target removes.
 *
 * Only regular files are replaced: a target that is a folder, a device (`/dev/null`), a FIFO or a
 * socket is refused with a `NotRegularFileError` before anything is written, and checked again just
 * before the final rename (a rename would otherwise replace the device node itself when run as root).
 */
import { randomBytes } from 'node:crypto';
import type { Stats } from 'node:fs';
import { copyFile, link, lstat, open, readdir, realpath, rename, stat, unlink } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';

/** Marker in temp file names; a temp file is `.<target name><marker><pid>-<token>`. */
export const TEMP_MARKER = '.hingeline-tmp-';

const DEFAULT_CHUNK_BYTES = 1024 * 1024;

export type AtomicWriteStage = 'chunk-written' | 'synced' | 'backed-up' | 'committed';

export interface AtomicWriteProgress {
  readonly stage: AtomicWriteStage;
  readonly bytesWritten: number;
  readonly totalBytes: number;
  readonly tempPath: string;
}

export interface AtomicWriteOptions {
  /** Keep the previous content of the target as `<target>.bak`. Default false. */
  readonly keepBackup?: boolean;
  /** Size of each write call in bytes (default 1 MiB). */
  readonly chunkBytes?: number;
  /**
   * Called after each stage; the write waits for a returned promise. Used by tests to stop a
   * writer at a chosen moment; production code has no reason to pass it.
   */
  readonly onProgress?: (progress: AtomicWriteProgress) => void | Promise<void>;
}

export interface AtomicWriteResult {
  /** The file actually written (symbolic links are followed). */
  readonly path: string;
  readonly bytesWritten: number;
  /** `<target>.bak` when a previous version was kept, else null. */
  readonly backupPath: string | null;
  /** Leftover temp files from interrupted writes that were removed first. */
  readonly removedStaleTemps: readonly string[];
}

/** What sits at a path, in words, for messages. */
export type FileKind = 'folder' | 'character device' | 'block device' | 'named pipe (FIFO)' | 'socket' | 'special file';

/**
 * The target of a write exists and is not a regular file (or a link to one). `code` is `EISDIR` for
 * a folder (as Node's own errors) and `ENOTREGULAR` otherwise; the message says what is there.
 */
export class NotRegularFileError extends Error {
  readonly code: 'EISDIR' | 'ENOTREGULAR';
  readonly path: string;
  readonly kind: FileKind;
  constructor(path: string, kind: FileKind) {
    super(`${path} is a ${kind}, not a regular file; only regular files (or new paths) are written`);
    this.name = 'NotRegularFileError';
    this.code = kind === 'folder' ? 'EISDIR' : 'ENOTREGULAR';
    this.path = path;
    this.kind = kind;
  }
}

function kindOf(info: Stats): FileKind | null {
  if (info.isFile()) return null;
  if (info.isDirectory()) return 'folder';
  if (info.isCharacterDevice()) return 'character device';
  if (info.isBlockDevice()) return 'block device';
  if (info.isFIFO()) return 'named pipe (FIFO)';
  if (info.isSocket()) return 'socket';
  return 'special file';
}

/**
 * Resolves once `path` is either absent or a regular file (symbolic links followed); rejects with
 * `NotRegularFileError` otherwise. Other errors of `stat` (permission denied…) reject as they are.
 */
export async function assertWritableTarget(path: string): Promise<void> {
  let info: Stats;
  try {
    info = await stat(path);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'ENOENT') return;
    throw error;
  }
  const kind = kindOf(info);
  if (kind !== null) throw new NotRegularFileError(path, kind);
}

/** `<target>.bak`. */
export function backupPathFor(target: string): string {
  return `${target}.bak`;
}

/** Temp files of this process that are being written right now (never treated as stale). */
const activeTemps = new Set<string>();
/** Writes queued per target so two saves of one file never interleave. */
const queues = new Map<string, Promise<unknown>>();

function tempPathFor(target: string): string {
  const token = randomBytes(6).toString('hex');
  return join(dirname(target), `.${basename(target)}${TEMP_MARKER}${process.pid}-${token}`);
}

function isProcessAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/**
 * Removes temp files left by interrupted writes to `target`: those of processes no longer
 * running, and those of this process that no write is using. Returns the removed paths.
 */
export async function removeStaleTemps(target: string): Promise<string[]> {
  const folder = dirname(target);
  const prefix = `.${basename(target)}${TEMP_MARKER}`;
  let names: string[];
  try {
    names = await readdir(folder);
  } catch {
    return [];
  }
  const removed: string[] = [];
  for (const name of names) {
    if (!name.startsWith(prefix)) continue;
    const path = join(folder, name);
    if (activeTemps.has(path)) continue;
    const pid = Number.parseInt(name.slice(prefix.length), 10);
    if (Number.isInteger(pid) && pid !== process.pid && isProcessAlive(pid)) continue;
    try {
      await unlink(path);
      removed.push(path);
    } catch {
      // Already gone or not ours to remove; either way nothing to clean.
    }
  }
  return removed;
}

async function fileMode(path: string): Promise<number | null> {
  try {
    const info = await stat(path);
    return info.isFile() ? info.mode & 0o777 : null;
  } catch {
    return null;
  }
}

async function existsAsFile(path: string): Promise<boolean> {
  try {
    return (await lstat(path)).isFile();
  } catch {
    return false;
  }
}

async function syncFolder(folder: string): Promise<void> {
  // Makes the rename itself durable. Windows cannot open a folder for sync: skip quietly there.
  let handle;
  try {
    handle = await open(folder, 'r');
    await handle.sync();
  } catch {
    // best effort
  } finally {
    await handle?.close().catch(() => undefined);
  }
}

async function renameWithRetry(from: string, to: string): Promise<void> {
  // On Windows a virus scanner or indexer may hold the target for a moment (EPERM/EBUSY/EACCES).
  for (let attempt = 0; ; attempt += 1) {
    try {
      await rename(from, to);
      return;
    } catch (error) {
      const code = (error as NodeJS.ErrnoException).code;
      const transient = code === 'EPERM' || code === 'EBUSY' || code === 'EACCES';
      if (!transient || process.platform !== 'win32' || attempt >= 5) throw error;
      await new Promise((resolve) => setTimeout(resolve, 40 * (attempt + 1)));
    }
  }
}

async function writeTemp(
  tempPath: string,
  bytes: Uint8Array,
  mode: number,
  chunkBytes: number,
  report: (stage: AtomicWriteStage, written: number) => Promise<void>,
): Promise<void> {
  const handle = await open(tempPath, 'wx', mode);
  try {
    let written = 0;
    while (written < bytes.byteLength) {
      const end = Math.min(written + chunkBytes, bytes.byteLength);
      const { bytesWritten } = await handle.write(bytes, written, end - written, written);
      written += bytesWritten;
      await report('chunk-written', written);
    }
    // The umask may have narrowed the mode given to open(); restore the old file's permissions.
    await handle.chmod(mode);
    await handle.sync();
  } finally {
    await handle.close();
  }
  await report('synced', bytes.byteLength);
}

/** Replaces `backupPath` atomically with the current content of `source`. */
async function keepPreviousVersion(source: string, backupPath: string): Promise<void> {
  const tempBackup = tempPathFor(backupPath);
  activeTemps.add(tempBackup);
  try {
    try {
      // A hard link costs nothing and shares the old inode, which the final rename leaves alone.
      await link(source, tempBackup);
    } catch {
      // File systems without hard links (FAT, some network shares): copy instead.
      await copyFile(source, tempBackup);
      const handle = await open(tempBackup, 'r+');
      try {
        await handle.sync();
      } finally {
        await handle.close();
      }
    }
    await renameWithRetry(tempBackup, backupPath);
  } catch (error) {
    await unlink(tempBackup).catch(() => undefined);
    throw error;
  } finally {
    activeTemps.delete(tempBackup);
  }
}

async function writeNow(target: string, data: Uint8Array | string, options: AtomicWriteOptions): Promise<AtomicWriteResult> {
  const path = await realpath(target).catch(() => target);
  // Refuse before anything is written (or any temp file is made next to a device).
  await assertWritableTarget(path);
  const backupPath = options.keepBackup ? backupPathFor(path) : null;
  if (backupPath) await assertWritableTarget(backupPath);
  const removedStaleTemps = [
    ...(await removeStaleTemps(path)),
    ...(backupPath ? await removeStaleTemps(backupPath) : []),
  ];
  const bytes = typeof data === 'string' ? new TextEncoder().encode(data) : data;
  const chunkBytes = Math.max(1, Math.floor(options.chunkBytes ?? DEFAULT_CHUNK_BYTES));
  const mode = (await fileMode(path)) ?? 0o644;
  const tempPath = tempPathFor(path);
  const report = async (stage: AtomicWriteStage, bytesWritten: number): Promise<void> => {
    await options.onProgress?.({ stage, bytesWritten, totalBytes: bytes.byteLength, tempPath });
  };

  activeTemps.add(tempPath);
  try {
    await writeTemp(tempPath, bytes, mode, chunkBytes, report);
    let keptBackup: string | null = null;
    if (backupPath && (await existsAsFile(path))) {
      await keepPreviousVersion(path, backupPath);
      keptBackup = backupPath;
      await report('backed-up', bytes.byteLength);
    }
    // Something else may have been put at the path meanwhile: never rename over it.
    await assertWritableTarget(path);
    await renameWithRetry(tempPath, path);
    await syncFolder(dirname(path));
    await report('committed', bytes.byteLength);
    return { path, bytesWritten: bytes.byteLength, backupPath: keptBackup, removedStaleTemps };
  } catch (error) {
    await unlink(tempPath).catch(() => undefined);
    throw error;
  } finally {
    activeTemps.delete(tempPath);
  }
}

/**
 * Writes `data` (a string is encoded as UTF-8) to `target` so that the target is never left
 * half-written. Writes to the same target are queued, never interleaved. The parent folder must
 * exist. Rejects with `NotRegularFileError` when the target is a folder, device, FIFO or socket,
 * and with the file-system error (removing its temp file) when the write fails.
 */
export function writeFileAtomic(target: string, data: Uint8Array | string, options: AtomicWriteOptions = {}): Promise<AtomicWriteResult> {
  const previous = queues.get(target) ?? Promise.resolve();
  const next = previous.catch(() => undefined).then(() => writeNow(target, data, options));
  queues.set(target, next);
  const cleanUp = (): void => {
    if (queues.get(target) === next) queues.delete(target);
  };
  next.then(cleanUp, cleanUp);
  return next;
}
