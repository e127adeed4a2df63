/**
 * What the HostApi calls do on the desktop: dialogs, reading and atomically writing files,
 * recent files, autosave and recovery. Node-only; Electron comes in only through the injected
 * `HostDialogs` and `openWithSystem`, so tests drive this class with fakes and a temp folder.
 * Holds no engineering logic: project text is passed through unparsed.
 */
import { readFile, stat } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import type { ExportFileRequest, OpenedFilePayload, RecoveryPayload, SavedFilePayload, SaveProjectRequest } from '../shared/bridge.ts';
import {
  exportTypeFor,
  isProjectFileName,
  PROJECT_EXTENSION,
  sanitizeFileName,
  withExtension,
  withProjectExtension,
  type ExportType,
} from '../shared/file-types.ts';
import { IPC_LIMITS } from '../shared/validators.ts';
import { writeFileAtomic } from './atomic-write.ts';
import type { PathGrants } from './path-grants.ts';
import type { RecentFiles } from './recent-files.ts';
import type { RecoveryStore } from './recovery-store.ts';
import { sanitizeSvg, UnsafeSvgError } from './svg-sanitize.ts';
import { AutosaveThrottle } from './autosave-throttle.ts';

/** Largest project file the host reads, in bytes. */
export const MAX_PROJECT_FILE_BYTES = 64 * 1024 * 1024;

/** An error meant for the user: its message says what failed and why, without a stack. */
export class HostError extends Error {
  override readonly name = 'HostError';
}

export interface HostDialogs {
  /** Absolute path of the project the user picked, or null when cancelled. */
  chooseProjectToOpen(defaultFolder: string): Promise<string | null>;
  /** Absolute path of the CSV file (member or span list) the user picked, or null when cancelled. */
  chooseCsvToOpen(defaultFolder: string): Promise<string | null>;
  /** Absolute path to save the project to, or null when cancelled. */
  chooseProjectSavePath(defaultPath: string): Promise<string | null>;
  /** Absolute path for an exported file of `type`, or null when cancelled. */
  chooseExportPath(defaultPath: string, type: ExportType): Promise<string | null>;
}

export interface HostServiceDependencies {
  readonly dialogs: HostDialogs;
  readonly recent: RecentFiles;
  readonly recovery: RecoveryStore;
  readonly grants: PathGrants;
  /** Folder the first dialog opens in (the user's documents folder). */
  readonly defaultFolder: string;
  /** Opens a file we just wrote with the system's default application; resolves to '' or an error text. */
  readonly openWithSystem: (path: string) => Promise<string>;
  /** Shows a file we just wrote in the system's file manager (for types not opened with a program). */
  readonly revealInFolder?: (path: string) => void;
  readonly onRecentChanged?: (files: readonly string[]) => void;
  /** Least time between two autosave writes, ms (default 2000; tests pass their own). */
  readonly autosaveIntervalMs?: number;
  readonly onSaveStarted?: () => void;
  readonly onSaveFinished?: (saved: boolean) => void;
  readonly log?: (message: string) => void;
}

/** A short, user-facing reason for a file-system error. */
export function describeFileError(error: unknown): string {
  const code = (error as NodeJS.ErrnoException | null)?.code;
  switch (code) {
    case 'ENOENT':
      return 'the file or its folder does not exist';
    case 'EACCES':
    case 'EPERM':
      return 'permission denied';
    case 'ENOSPC':
      return 'the disk is full';
    case 'EROFS':
      return 'the disk is read-only';
    case 'EISDIR':
      return 'it is a folder, not a file';
    case 'ENOTDIR':
      return 'a part of the path is not a folder';
    case 'EBUSY':
      return 'the file is in use by another program';
    default:
      return error instanceof Error ? error.message : String(error);
  }
}

function decodeProjectText(bytes: Uint8Array, name: string, what = 'a Hingeline project'): string {
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw new HostError(`“${name}” is not ${what}: it is not UTF-8 text.`);
  }
  return text.startsWith('\uFEFF') ? text.slice(1) : text;
}

/**
 * Reads a project or CSV file as UTF-8 text (byte-order mark removed). Rejects with a HostError for a
 * missing, oversized (over 64 MB), non-file or non-UTF-8 path.
 */
async function readTextFile(path: string, kind: 'project' | 'CSV'): Promise<{ name: string; text: string }> {
  const name = basename(path);
  let bytes: Uint8Array;
  try {
    const info = await stat(path);
    if (!info.isFile()) throw new HostError(`“${name}” cannot be opened: it is not a file.`);
    if (info.size > MAX_PROJECT_FILE_BYTES) {
      throw new HostError(`“${name}” is ${Math.round(info.size / 1024 / 1024)} MB; ${kind} files larger than ${MAX_PROJECT_FILE_BYTES / 1024 / 1024} MB are refused.`);
    }
    bytes = await readFile(path);
  } catch (error) {
    if (error instanceof HostError) throw error;
    throw new HostError(`“${name}” cannot be opened: ${describeFileError(error)}.`);
  }
  const text = decodeProjectText(bytes, name, kind === 'project' ? 'a Hingeline project' : 'a CSV file Hingeline reads');
  if (text.length > IPC_LIMITS.projectTextChars) throw new HostError(`“${name}” is too large to open.`);
  return { name, text };
}

export class HostService {
  private lastFolder: string;
  private documentTitle = 'Untitled';
  /** The renderer's autosaves, at most one write per interval (autosave-throttle.ts). */
  private readonly autosaves: AutosaveThrottle;

  constructor(private readonly deps: HostServiceDependencies) {
    this.lastFolder = deps.defaultFolder;
    this.autosaves = new AutosaveThrottle((text) => this.deps.recovery.autosave(text, this.documentTitle), { minIntervalMs: deps.autosaveIntervalMs ?? 2000 });
  }

  /** The title the renderer reported last; stored with autosaves. */
  setDocumentTitle(title: string): void {
    this.documentTitle = title;
  }

  /**
   * Reads a project file and remembers it (recent list, save permission). Rejects with a
   * HostError for a missing, oversized, non-file or non-UTF-8 path.
   */
  async openPath(path: string): Promise<OpenedFilePayload> {
    const { name, text } = await readTextFile(path, 'project');
    await this.deps.grants.grant(path);
    this.lastFolder = dirname(path);
    await this.remember(path);
    return { name, path, text };
  }

  /** Shows the open dialog; null when cancelled. */
  async openProject(): Promise<OpenedFilePayload | null> {
    const path = await this.deps.dialogs.chooseProjectToOpen(this.lastFolder);
    return path === null ? null : this.openPath(path);
  }

  /**
   * Shows the open dialog for a CSV file and reads it; null when cancelled. Read only: the path is
   * not granted for writing and does not join the recent projects.
   */
  async openCsv(): Promise<OpenedFilePayload | null> {
    const path = await this.deps.dialogs.chooseCsvToOpen(this.lastFolder);
    if (path === null) return null;
    const { name, text } = await readTextFile(path, 'CSV');
    this.lastFolder = dirname(path);
    return { name, path, text };
  }

  /** Opens an entry of the recent list (and only those); a vanished file leaves the list. */
  async openRecent(path: string): Promise<OpenedFilePayload | null> {
    if (!this.deps.recent.has(path)) throw new HostError('That file is not in the list of recent projects.');
    try {
      return await this.openPath(path);
    } catch (error) {
      const missing = await stat(path).then(() => false, () => true);
      if (missing) {
        await this.forget(path);
        throw new HostError(`“${basename(path)}” no longer exists at ${path}; it was removed from the recent list.`);
      }
      throw error;
    }
  }

  recentFiles(): string[] {
    return [...this.deps.recent.list()];
  }

  async clearRecentFiles(): Promise<void> {
    await this.deps.recent.clear();
    this.deps.onRecentChanged?.([]);
  }

  /**
   * Saves project text atomically, keeping the previous version as `.bak`. Writes straight to
   * `options.path` only when main granted that path before; otherwise (or with `saveAs`) asks.
   */
  async saveProject(request: SaveProjectRequest): Promise<SavedFilePayload | null> {
    this.deps.onSaveStarted?.();
    let saved = false;
    try {
      const { path, suggestedName, saveAs } = request.options;
      let target = !saveAs && path !== null && this.deps.grants.isGranted(path) ? path : null;
      if (path !== null && !saveAs && target === null) this.deps.log?.(`save: ${path} was not granted; asking where to save`);
      // A granted path is written where it led when granted; a path that now leads elsewhere is refused.
      let writeTo = target;
      if (target !== null) {
        const checked = await this.deps.grants.writeTarget(target);
        if (!checked.ok) {
          this.deps.log?.(`save: refused to write ${target}: ${checked.reason}`);
          throw new HostError(`“${basename(target)}” was not saved: since it was opened, ${checked.reason}. Nothing was written; use Save As to choose where to save.`);
        }
        writeTo = checked.path;
      }
      if (target === null) {
        const proposed = join(path !== null ? dirname(path) : this.lastFolder, withProjectExtension(sanitizeFileName(suggestedName)));
        const chosen = await this.deps.dialogs.chooseProjectSavePath(proposed);
        if (chosen === null) return null;
        target = isProjectFileName(chosen) ? chosen : `${chosen}${PROJECT_EXTENSION}`;
        writeTo = target;
      }
      try {
        await writeFileAtomic(writeTo ?? target, request.text, { keepBackup: true });
      } catch (error) {
        throw new HostError(`“${basename(target)}” could not be saved: ${describeFileError(error)}. The previous version on disk is unchanged.`);
      }
      await this.deps.grants.grant(target);
      this.lastFolder = dirname(target);
      await this.remember(target);
      // The document on disk now matches what was autosaved; nothing is left to recover.
      await this.deps.recovery.discardAutosave().catch(() => undefined);
      this.autosaves.reset();
      saved = true;
      return { name: basename(target), path: target };
    } finally {
      this.deps.onSaveFinished?.(saved);
    }
  }

  /**
   * Asks where to export, writes atomically, and opens the file afterwards if asked. An SVG is
   * written without anything active in it (scripts, event handlers, links out; svg-sanitize.ts)
   * and is never opened with the default program (usually a web browser, which would run what
   * a script-bearing SVG holds): its folder is shown instead.
   */
  async exportFile(request: ExportFileRequest): Promise<SavedFilePayload | null> {
    const type = exportTypeFor(request.options.mime);
    if (!type) throw new HostError(`Files of type ${request.options.mime} cannot be exported.`);
    const svg = type.mime === 'image/svg+xml';
    let data = request.data;
    if (svg) {
      try {
        const text = typeof data === 'string' ? data : new TextDecoder('utf-8', { fatal: true }).decode(data);
        data = sanitizeSvg(text);
      } catch (error) {
        throw new HostError(`The SVG was not exported: ${error instanceof UnsafeSvgError ? error.message : 'it is not UTF-8 text'}.`);
      }
    }
    const stem = sanitizeFileName(request.options.suggestedName.replace(new RegExp(`\\${type.extension}$`, 'i'), ''), 'Export');
    const chosen = await this.deps.dialogs.chooseExportPath(join(this.lastFolder, `${stem}${type.extension}`), type);
    if (chosen === null) return null;
    const target = withExtension(chosen, type.extension);
    try {
      await writeFileAtomic(target, data);
    } catch (error) {
      throw new HostError(`“${basename(target)}” could not be written: ${describeFileError(error)}.`);
    }
    this.lastFolder = dirname(target);
    if (request.options.openAfterwards && svg) {
      this.deps.revealInFolder?.(target);
    } else if (request.options.openAfterwards) {
      // Only ever the path we have just written, never a path from the renderer.
      const problem = await this.deps.openWithSystem(target);
      if (problem) this.deps.log?.(`export: could not open ${target}: ${problem}`);
    }
    return { name: basename(target), path: target };
  }

  /** Keeps a recovery copy of the renderer's document (rate-limited: calls in quick succession are merged). */
  async autosave(text: string): Promise<void> {
    await this.autosaves.submit(text);
  }

  takeRecovery(): Promise<RecoveryPayload | null> {
    return this.deps.recovery.takeRecovery();
  }

  clearRecovery(): Promise<void> {
    return this.deps.recovery.clearRecovery();
  }

  private async remember(path: string): Promise<void> {
    try {
      this.deps.onRecentChanged?.(await this.deps.recent.add(path));
    } catch (error) {
      this.deps.log?.(`recent files: ${describeFileError(error)}`);
    }
  }

  private async forget(path: string): Promise<void> {
    try {
      this.deps.onRecentChanged?.(await this.deps.recent.remove(path));
    } catch (error) {
      this.deps.log?.(`recent files: ${describeFileError(error)}`);
    }
  }
}
