/**
 * Autosave and crash recovery. Node-only, no Electron import.
 *
 * Files in the store folder (`<userData>/autosave/`):
 * - `session-open.json`: written when a session starts, removed when it ends cleanly. Finding it
 *   at the next start means the last session crashed or was killed.
 * - `autosave.json`: the latest autosave of the open document, written atomically.
 * - `recovered.json`: the autosave of a crashed session, set aside at start so this session's
 *   autosaves cannot overwrite it; offered by `takeRecovery()` until `clearRecovery()`.
 */
import { access, mkdir, readFile, rename, unlink } from 'node:fs/promises';
import { join } from 'node:path';
import type { RecoveryPayload } from '../shared/bridge.ts';
import { validateRecovery } from '../shared/validators.ts';
import { writeFileAtomic } from './atomic-write.ts';

const AUTOSAVE_FORMAT = 'hingeline-autosave';
const AUTOSAVE_VERSION = 1;

export interface RecoveryStoreOptions {
  /** Clock for `savedAt` (tests pass a fixed one). */
  readonly now?: () => Date;
}

export interface SessionStart {
  /** The previous session did not end cleanly. */
  readonly previousSessionCrashed: boolean;
  /** A document from a crashed session is waiting in `recovered.json`. */
  readonly recoveryAvailable: boolean;
}

/** Parses an autosave file; null when it is not a valid autosave envelope. */
export function parseAutosave(text: string): RecoveryPayload | null {
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch {
    return null;
  }
  if (typeof parsed !== 'object' || parsed === null) return null;
  const { format, version, ...snapshot } = parsed as Record<string, unknown>;
  if (format !== AUTOSAVE_FORMAT || version !== AUTOSAVE_VERSION) return null;
  const checked = validateRecovery(snapshot);
  return checked.ok ? checked.value : null;
}

/** Serialises an autosave envelope. */
export function serializeAutosave(snapshot: RecoveryPayload): string {
  return JSON.stringify({ format: AUTOSAVE_FORMAT, version: AUTOSAVE_VERSION, ...snapshot });
}

async function exists(path: string): Promise<boolean> {
  try {
    await access(path);
    return true;
  } catch {
    return false;
  }
}

async function removeIfPresent(path: string): Promise<void> {
  await unlink(path).catch((error: NodeJS.ErrnoException) => {
    if (error.code !== 'ENOENT') throw error;
  });
}

export class RecoveryStore {
  readonly markerPath: string;
  readonly autosavePath: string;
  readonly recoveredPath: string;
  private readonly now: () => Date;

  constructor(readonly folder: string, options: RecoveryStoreOptions = {}) {
    this.markerPath = join(folder, 'session-open.json');
    this.autosavePath = join(folder, 'autosave.json');
    this.recoveredPath = join(folder, 'recovered.json');
    this.now = options.now ?? (() => new Date());
  }

  /**
   * Starts a session: if the last one did not end cleanly, its autosave becomes the recovery
   * candidate; a leftover autosave of a clean session is discarded. Then marks this session open.
   */
  async beginSession(): Promise<SessionStart> {
    await mkdir(this.folder, { recursive: true });
    const previousSessionCrashed = await exists(this.markerPath);
    const hasAutosave = await exists(this.autosavePath);
    if (previousSessionCrashed && hasAutosave) {
      await this.setAsideAutosave();
    } else if (hasAutosave) {
      await removeIfPresent(this.autosavePath);
    }
    await writeFileAtomic(this.markerPath, JSON.stringify({ pid: process.pid, startedAt: this.now().toISOString() }));
    return { previousSessionCrashed, recoveryAvailable: (await this.takeRecovery()) !== null };
  }

  /**
   * Makes the current autosave the recovery candidate (after a crash of the previous session,
   * or of this session's renderer). Returns false when there was no autosave.
   */
  async setAsideAutosave(): Promise<boolean> {
    try {
      await rename(this.autosavePath, this.recoveredPath);
      return true;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return false;
      throw error;
    }
  }

  /** Saves the open document's text (atomically) with its title and the current time. */
  async autosave(text: string, name: string): Promise<void> {
    await mkdir(this.folder, { recursive: true });
    await writeFileAtomic(this.autosavePath, serializeAutosave({ text, name, savedAt: this.now().toISOString() }));
  }

  /**
   * The document autosaved by a session that crashed, or null. Does not remove it: call
   * `clearRecovery()` once the user restored or declined it.
   */
  async takeRecovery(): Promise<RecoveryPayload | null> {
    let text: string;
    try {
      text = await readFile(this.recoveredPath, 'utf8');
    } catch {
      return null;
    }
    return parseAutosave(text);
  }

  async clearRecovery(): Promise<void> {
    await removeIfPresent(this.recoveredPath);
  }

  /** Drops the current autosave, e.g. after the document was saved or closed without changes. */
  async discardAutosave(): Promise<void> {
    await removeIfPresent(this.autosavePath);
  }

  /** Ends the session cleanly: no autosave and no open-session marker remain. */
  async endSession(): Promise<void> {
    await this.discardAutosave();
    await removeIfPresent(this.markerPath);
  }
}
