/**
 * Autosave and crash recovery. Node-only, no Electron import.
 *
 * Files in the store folder (`<userData>/autosave/`):
 * - `session-open.json`: written when a session starts, removed when it ends cleanly. Finding it
 *   at the next start means the last session crashed or was killed.
 * - `autosave.json`: the latest autosave of the open document, written atomically.
 * - `recovered.json`, `recovered-2.json`, …: the autosaves of crashed sessions (or of crashed
 *   renderers), set aside so that no later autosave can overwrite them. A second crash before
 *   the user answered about the first sets its autosave aside under the next number: nothing the
 *   user has not answered about is ever replaced. `takeRecovery()` offers the oldest until
 *   `clearRecovery()`; then the next one. At most `MAX_RECOVERIES` wait; beyond that the oldest
 *   goes (ten crashes without an answer).
 */
import { access, mkdir, readdir, readFile, rename, unlink } from 'node:fs/promises';
import { join } from 'node:path';
import type { RecoveryPayload } from '../shared/bridge.ts';
import { validateRecovery } from '../shared/validators.ts';
import { writeFileAtomic } from './atomic-write.ts';

const AUTOSAVE_FORMAT = 'hingeline-autosave';
const AUTOSAVE_VERSION = 1;
/** Recovery files kept waiting for an answer at most. */
export const MAX_RECOVERIES = 10;
const RECOVERED = /^recovered(?:-(\d+))?\.json$/;

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
  /** The first recovery file (`recovered.json`); later ones are numbered. */
  readonly recoveredPath: string;
  private readonly now: () => Date;

  constructor(readonly folder: string, options: RecoveryStoreOptions = {}) {
    this.markerPath = join(folder, 'session-open.json');
    this.autosavePath = join(folder, 'autosave.json');
    this.recoveredPath = join(folder, 'recovered.json');
    this.now = options.now ?? (() => new Date());
  }

  /**
   * Starts a session: if the last one did not end cleanly, its autosave becomes a recovery
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

  /** The recovery files waiting, oldest first: [number, path]. */
  private async waiting(): Promise<[number, string][]> {
    let names: string[];
    try {
      names = await readdir(this.folder);
    } catch {
      return [];
    }
    return names
      .map((name) => [RECOVERED.exec(name), name] as const)
      .filter((entry): entry is readonly [RegExpExecArray, string] => entry[0] !== null)
      .map(([match, name]): [number, string] => [match[1] === undefined ? 1 : Number(match[1]), join(this.folder, name)])
      .sort((a, b) => a[0] - b[0]);
  }

  /**
   * Makes the current autosave a recovery candidate (after a crash of the previous session, or
   * of this session's renderer), after those already waiting: never over one of them. Returns
   * false when there was no autosave.
   */
  async setAsideAutosave(): Promise<boolean> {
    if (!(await exists(this.autosavePath))) return false;
    const waiting = await this.waiting();
    const next = waiting.length === 0 ? 1 : waiting[waiting.length - 1]![0] + 1;
    const target = next === 1 ? this.recoveredPath : join(this.folder, `recovered-${next}.json`);
    try {
      await rename(this.autosavePath, target);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return false;
      throw error;
    }
    for (const [, path] of waiting.slice(0, Math.max(0, waiting.length + 1 - MAX_RECOVERIES))) await removeIfPresent(path);
    return true;
  }

  /** Saves the open document's text (atomically) with its title and the current time. */
  async autosave(text: string, name: string): Promise<void> {
    await mkdir(this.folder, { recursive: true });
    await writeFileAtomic(this.autosavePath, serializeAutosave({ text, name, savedAt: this.now().toISOString() }));
  }

  /**
   * The oldest document autosaved by a session (or renderer) that crashed and not yet answered
   * about, or null. Does not remove it: call `clearRecovery()` once the user restored or declined
   * it. A recovery file that cannot be read is dropped.
   */
  async takeRecovery(): Promise<RecoveryPayload | null> {
    for (const [, path] of await this.waiting()) {
      let text: string | null = null;
      try {
        text = await readFile(path, 'utf8');
      } catch {
        text = null;
      }
      const payload = text === null ? null : parseAutosave(text);
      if (payload) return payload;
      await removeIfPresent(path);
    }
    return null;
  }

  /** Forgets the recovery `takeRecovery()` offered (the oldest); the next one, if any, is offered then. */
  async clearRecovery(): Promise<void> {
    const [oldest] = await this.waiting();
    if (oldest) await removeIfPresent(oldest[1]);
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
