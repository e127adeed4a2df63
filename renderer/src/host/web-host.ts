/**
 * HostApi in a plain browser (the web build, and `npm start` when Electron is missing).
 *
 * - Files: File System Access dialogs where available (saving back to the same file), else an
 *   <input type=file> picker and downloads (web-files.ts).
 * - Autosave and recovery in IndexedDB. A "session open" marker in localStorage is removed when
 *   the page is left without unsaved changes; finding it at the next start means the last visit
 *   ended abnormally (tab crash, browser killed, or leaving despite the unsaved-changes warning),
 *   and its autosave is offered through `takeRecovery()`, after any copy still unanswered.
 * - Recent files: names in localStorage; file handles (when the browser gives them) in IndexedDB.
 * - No native menu: Ctrl/Cmd+S, Shift+S, O, Z, Y, Shift+Z, Enter and / become MenuCommands (undo
 *   and redo also inside text fields: the app's undo, never the browser's).
 * - Unsaved changes: the browser's `beforeunload` warning.
 * - Dropping a project file on the page opens it (`onOpenFile`).
 * - `?demo` in the address sends `open-demo` once to the first menu-command listener.
 */
import { eventChannel } from './event-channel.ts';
import {
  EXPORT_EXTENSIONS,
  PROJECT_EXTENSION,
  type HostApi,
  type MenuCommand,
  type OpenedFile,
} from './host-api.ts';
import { createBrowserFileAccess, pickCsvFile, readProjectFile, type FileHandleLike, type WebFileAccess } from './web-files.ts';
import { createIndexedDbStore, createMemoryStore, type KeyValueStore } from './web-storage.ts';

export const SESSION_MARKER_KEY = 'hingeline.session-open';
export const RECENT_KEY = 'hingeline.recent-files';
const AUTOSAVE_KEY = 'autosave';
const RECOVERED_KEY = 'recovered';
const RECENT_HANDLE_PREFIX = 'recent-handle:';
const HANDLE_TOKEN_PREFIX = 'web-handle:';
const RECENT_LIMIT = 10;
const TITLE_LIMIT = 300;

export interface KeyLike {
  readonly key: string;
  readonly ctrlKey: boolean;
  readonly metaKey: boolean;
  readonly shiftKey: boolean;
  readonly altKey: boolean;
}

/**
 * The MenuCommand for a key press, or null. Ctrl (or Cmd) with S, Shift+S, O, Z, Shift+Z, Y,
 * Enter. Undo and redo are the app's also inside a text field: the browser's own undo of a
 * field would replay keystrokes into text the app has since rewritten (after an undo, a unit
 * switch), garbling it; the app's undo restores values and the fields show them.
 */
export function menuCommandForKey(event: KeyLike): MenuCommand | null {
  if (!(event.ctrlKey || event.metaKey) || event.altKey) return null;
  const key = event.key.toLowerCase();
  if (key === 's') return event.shiftKey ? 'save-as' : 'save';
  if (key === 'o' && !event.shiftKey) return 'open';
  if (key === 'enter' && !event.shiftKey) return 'analyze';
  if (key === 'z') return event.shiftKey ? 'redo' : 'undo';
  if (key === 'y' && !event.shiftKey) return 'redo';
  if (key === '/' && !event.shiftKey) return 'shortcuts';
  return null;
}

/**
 * Turns the browser's key presses into menu commands (capture phase, before any field sees them)
 * while someone listens; returns the function that stops it. Used by the browser host, and by
 * the fake host of the end-to-end tests so that they press the same keys.
 */
export function listenForShortcuts(target: Window, emit: (command: MenuCommand) => void, listening: () => boolean): () => void {
  const onKeyDown = (event: KeyboardEvent): void => {
    if (event.defaultPrevented || event.repeat) return;
    const command = menuCommandForKey(event);
    if (!command || !listening()) return;
    event.preventDefault();
    emit(command);
  };
  target.addEventListener('keydown', onKeyDown, true);
  return () => target.removeEventListener('keydown', onKeyDown, true);
}

/** `Beam B1 — Hingeline`, with `• ` in front when there are unsaved changes. */
export function documentTitle(state: { title: string; dirty: boolean }): string {
  const title = state.title.trim().length > 0 ? `${state.title.trim()} — Hingeline` : 'Hingeline';
  return state.dirty ? `• ${title}` : title;
}

interface AutosaveRecord {
  text: string;
  savedAt: string;
  name: string;
}

function asAutosaveRecord(value: unknown): AutosaveRecord | null {
  if (typeof value !== 'object' || value === null) return null;
  const { text, savedAt, name } = value as Record<string, unknown>;
  return typeof text === 'string' && typeof savedAt === 'string' && typeof name === 'string' ? { text, savedAt, name } : null;
}

/** Recovery copies kept waiting for an answer at most (the oldest goes beyond that). */
export const MAX_RECOVERIES = 10;

/** The recovery copies waiting, oldest first (an earlier version stored one record, not a list). */
function asRecoveryList(value: unknown): AutosaveRecord[] {
  const items = Array.isArray(value) ? value : value === undefined || value === null ? [] : [value];
  return items.map(asAutosaveRecord).filter((r): r is AutosaveRecord => r !== null);
}

function readRecent(storage: Storage | null): string[] {
  try {
    const parsed: unknown = JSON.parse(storage?.getItem(RECENT_KEY) ?? '[]');
    return Array.isArray(parsed) ? parsed.filter((name): name is string => typeof name === 'string' && name.length > 0 && name.length <= 255).slice(0, RECENT_LIMIT) : [];
  } catch {
    return [];
  }
}

function safeLocalStorage(window: Window): Storage | null {
  try {
    return window.localStorage;
  } catch {
    return null; // storage disabled (privacy settings, sandboxed frame)
  }
}

export interface WebHostDependencies {
  readonly window: Window;
  readonly store: KeyValueStore;
  readonly localStorage: Storage | null;
  readonly files: WebFileAccess;
  readonly now: () => Date;
}

export interface WebHost extends HostApi {
  /** Resolves once the previous visit's autosave has been set aside (or discarded). */
  readonly ready: Promise<void>;
  /** Removes the window listeners (tests). */
  dispose(): void;
}

function defaultStore(window: Window): KeyValueStore {
  return window.indexedDB ? createIndexedDbStore(window.indexedDB) : createMemoryStore();
}

export function createWebHost(overrides: Partial<WebHostDependencies> = {}): WebHost {
  const window = overrides.window ?? globalThis.window;
  const deps: WebHostDependencies = {
    window,
    store: overrides.store ?? defaultStore(window),
    localStorage: overrides.localStorage !== undefined ? overrides.localStorage : safeLocalStorage(window),
    files: overrides.files ?? createBrowserFileAccess(window),
    now: overrides.now ?? (() => new Date()),
  };
  const { store, localStorage: storage, files, now } = deps;

  let dirty = false;
  let title = 'Untitled';
  let tokenCounter = 0;
  const handles = new Map<string, FileHandleLike>();
  const commands = eventChannel<MenuCommand>();
  const openedFiles = eventChannel<OpenedFile>();

  if (new URL(window.location.href).searchParams.has('demo')) commands.emit('open-demo');

  // Set aside the autosave of a visit that ended abnormally (after any still waiting for an
  // answer: a second crash never replaces the first one's copy), then mark this visit open.
  const ready = (async () => {
    const previousVisitOpen = (storage?.getItem(SESSION_MARKER_KEY) ?? null) !== null;
    const autosaved = asAutosaveRecord(await store.get(AUTOSAVE_KEY).catch(() => null));
    if (autosaved && previousVisitOpen) {
      const waiting = asRecoveryList(await store.get(RECOVERED_KEY).catch(() => null));
      await store.set(RECOVERED_KEY, [...waiting, autosaved].slice(-MAX_RECOVERIES));
    }
    if (autosaved) await store.delete(AUTOSAVE_KEY);
    storage?.setItem(SESSION_MARKER_KEY, now().toISOString());
  })().catch((error: unknown) => console.warn('[hingeline] recovery storage unavailable:', error));

  const emitCommand = (command: MenuCommand): void => commands.emit(command);
  const emitFile = (file: OpenedFile): void => openedFiles.emit(file);

  function tokenFor(handle: FileHandleLike | null): string | null {
    if (!handle) return null;
    for (const [token, known] of handles) if (known === handle) return token;
    tokenCounter += 1;
    const token = `${HANDLE_TOKEN_PREFIX}${tokenCounter}-${Math.abs(now().getTime()).toString(36)}`;
    handles.set(token, handle);
    return token;
  }

  async function remember(name: string, handle: FileHandleLike | null): Promise<void> {
    const names = [name, ...readRecent(storage).filter((known) => known !== name)].slice(0, RECENT_LIMIT);
    try {
      storage?.setItem(RECENT_KEY, JSON.stringify(names));
    } catch {
      // quota or disabled storage: the recent list is a convenience
    }
    if (handle) await store.set(`${RECENT_HANDLE_PREFIX}${name}`, handle).catch(() => undefined);
  }

  const onBeforeUnload = (event: BeforeUnloadEvent): void => {
    if (!dirty) return;
    event.preventDefault();
    event.returnValue = '';
  };
  const onPageHide = (): void => {
    // Leaving with nothing unsaved is a clean end: nothing to recover next time.
    if (!dirty) storage?.removeItem(SESSION_MARKER_KEY);
  };
  const hasFiles = (event: DragEvent): boolean => Array.from(event.dataTransfer?.types ?? []).includes('Files');
  const onDragOver = (event: DragEvent): void => {
    if (!hasFiles(event)) return;
    event.preventDefault();
    if (event.dataTransfer) event.dataTransfer.dropEffect = 'copy';
  };
  const onDrop = (event: DragEvent): void => {
    if (!hasFiles(event)) return;
    event.preventDefault(); // never let the browser navigate to a dropped file
    const file = event.dataTransfer?.files[0];
    if (!file || !/\.(hingeline|json)$/i.test(file.name)) return;
    void readProjectFile(file).then(
      (text) => emitFile({ name: file.name, path: null, text }),
      (error: unknown) => console.warn('[hingeline] dropped file not opened:', error),
    );
  };
  const stopShortcuts = listenForShortcuts(window, emitCommand, () => commands.listening);
  window.addEventListener('beforeunload', onBeforeUnload);
  window.addEventListener('pagehide', onPageHide);
  window.addEventListener('dragover', onDragOver);
  window.addEventListener('drop', onDrop);

  return {
    kind: 'web',
    ready,

    async openProject() {
      const picked = await files.pickProject();
      if (!picked) return null;
      await remember(picked.name, picked.handle);
      return { name: picked.name, path: tokenFor(picked.handle), text: picked.text };
    },

    async openCsv() {
      const picked = await pickCsvFile(window);
      return picked ? { name: picked.name, path: null, text: picked.text } : null;
    },

    async openRecent(path) {
      const handle = handles.get(path) ?? ((await store.get(`${RECENT_HANDLE_PREFIX}${path}`).catch(() => undefined)) as FileHandleLike | undefined);
      if (!handle || typeof handle.getFile !== 'function') return null;
      const picked = await files.reopen(handle);
      if (!picked) return null;
      await remember(picked.name, handle);
      return { name: picked.name, path: tokenFor(handle), text: picked.text };
    },

    async recentFiles() {
      return readRecent(storage);
    },

    async saveProject(text, options) {
      const existing = !options.saveAs && options.path ? (handles.get(options.path) ?? null) : null;
      const name = /\.(hingeline|json)$/i.test(options.suggestedName) ? options.suggestedName : `${options.suggestedName}${PROJECT_EXTENSION}`;
      const saved = await files.saveText(text, name, existing);
      if (!saved) return null;
      await remember(saved.name, saved.handle);
      // The saved file now holds what was autosaved.
      await ready;
      await store.delete(AUTOSAVE_KEY).catch(() => undefined);
      return { name: saved.name, path: tokenFor(saved.handle) };
    },

    async exportFile(data, options) {
      const extension = EXPORT_EXTENSIONS[options.mime];
      if (!extension) throw new Error(`Files of type ${options.mime} cannot be exported.`);
      const name = options.suggestedName.toLowerCase().endsWith(extension) ? options.suggestedName : `${options.suggestedName}${extension}`;
      const saved = await files.saveExport(data, name, options.mime);
      return saved ? { name: saved.name, path: null } : null;
    },

    async autosave(text) {
      await ready;
      await store.set(AUTOSAVE_KEY, { text, savedAt: now().toISOString(), name: title } satisfies AutosaveRecord);
    },

    async takeRecovery() {
      await ready;
      return asRecoveryList(await store.get(RECOVERED_KEY))[0] ?? null;
    },

    async clearRecovery() {
      await ready;
      const rest = asRecoveryList(await store.get(RECOVERED_KEY)).slice(1);
      if (rest.length > 0) await store.set(RECOVERED_KEY, rest);
      else await store.delete(RECOVERED_KEY);
    },

    setDocumentState(state) {
      dirty = state.dirty;
      title = state.title.slice(0, TITLE_LIMIT);
      window.document.title = documentTitle({ title, dirty });
    },

    onMenuCommand: (listener) => commands.subscribe(listener),

    onOpenFile: (listener) => openedFiles.subscribe(listener),

    dispose() {
      stopShortcuts();
      window.removeEventListener('beforeunload', onBeforeUnload);
      window.removeEventListener('pagehide', onPageHide);
      window.removeEventListener('dragover', onDragOver);
      window.removeEventListener('drop', onDrop);
    },
  };
}
