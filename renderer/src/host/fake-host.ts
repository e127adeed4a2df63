/**
 * An in-memory HostApi for component tests and end-to-end tests. It records every call, keeps
 * saved and exported files in maps, and lets the test play the user at the dialogs (queues of
 * answers) and at the menu (`emitMenuCommand`).
 *
 * Component tests:
 *   const host = createFakeHost({ openQueue: [{ name: 'a.hingeline', path: '/p/a.hingeline', text }] });
 *   setHostForTesting(host);            // from './index.ts'
 *   host.emitMenuCommand('open');  …  expect(host.calls.map((c) => c.method)).toContain('openProject');
 *
 * End-to-end tests (playwright, against the built web app): define the seed before any page
 * script runs; `getHost()` then builds a fake host from it and attaches controls to the object.
 * The browser host's keyboard shortcuts work there too (`listenForShortcuts`).
 *   await page.addInitScript((seed) => { window.hingelineTestHost = seed; }, { openQueue: [...] });
 *   await page.goto(url);
 *   await page.evaluate(() => window.hingelineTestHost!.emitMenuCommand!('analyze'));
 *   const calls = await page.evaluate(() => window.hingelineTestHost!.calls);
 *   const saved = await page.evaluate(() => window.hingelineTestHost!.savedFiles);
 * (Everything in the seed must be serialisable; Uint8Array exports are recorded as byte counts.)
 */
import { eventChannel } from './event-channel.ts';
import type { HostApi, MenuCommand, OpenedFile } from './host-api.ts';
import { EXPORT_EXTENSIONS, PROJECT_EXTENSION } from './host-api.ts';
import { pickCsvFile } from './web-files.ts';
import { listenForShortcuts } from './web-host.ts';

export interface FakeHostSeed {
  /** Host kind to report (default 'web'). */
  kind?: 'electron' | 'web';
  /** Answers to successive `openProject()` dialogs; null means cancel. Empty queue: cancel. */
  openQueue?: Array<OpenedFile | null>;
  /**
   * Answers to successive `openCsv()` dialogs: a file, null to cancel, or 'input' to show the
   * browser's real <input type=file> (end-to-end tests answer it with the page's file chooser).
   * Empty queue: cancel.
   */
  csvQueue?: Array<OpenedFile | null | 'input'>;
  /** Answers to successive save dialogs: a path to save to, or null to cancel. Empty: save under the suggested name. */
  saveAsQueue?: Array<string | null>;
  /** Files that exist, by path (used by `openRecent` and filled by saves). */
  files?: Record<string, string>;
  recent?: string[];
  recovery?: { text: string; savedAt: string; name: string } | null;
  /** Fail calls of these methods with an error (e.g. `{ saveProject: 'disk full' }`). */
  failures?: Partial<Record<keyof HostApi, string>>;
}

export interface FakeHostCall {
  method: string;
  args: unknown[];
}

export interface FakeExport {
  name: string;
  mime: string;
  openAfterwards: boolean;
  /** Text exports verbatim; binary ones as a byte count. */
  text: string | null;
  byteLength: number;
}

export interface FakeHost extends HostApi {
  readonly calls: FakeHostCall[];
  readonly files: Map<string, string>;
  readonly exports: FakeExport[];
  readonly documentState: { title: string; dirty: boolean };
  readonly autosaves: string[];
  recovery: { text: string; savedAt: string; name: string } | null;
  /** Someone subscribed to menu commands. */
  readonly listening: boolean;
  emitMenuCommand(command: MenuCommand): void;
  emitOpenFile(file: OpenedFile): void;
}

/** The global an end-to-end test sets (a seed), which `getHost()` extends with live views. */
export interface FakeHostGlobal extends FakeHostSeed {
  calls?: FakeHostCall[];
  savedFiles?: Record<string, string>;
  exports?: FakeExport[];
  documentState?: { title: string; dirty: boolean };
  autosaves?: string[];
  emitMenuCommand?: (command: MenuCommand) => void;
  emitOpenFile?: (file: OpenedFile) => void;
}

function clone<T>(value: T): T {
  return value === undefined ? value : (JSON.parse(JSON.stringify(value)) as T);
}

export function createFakeHost(seed: FakeHostSeed = {}): FakeHost {
  const openQueue = [...(seed.openQueue ?? [])];
  const saveAsQueue = [...(seed.saveAsQueue ?? [])];
  const csvQueue = [...(seed.csvQueue ?? [])];
  const files = new Map(Object.entries(seed.files ?? {}));
  let recent = [...(seed.recent ?? [])];
  const commands = eventChannel<MenuCommand>();
  const openedFiles = eventChannel<OpenedFile>();
  const calls: FakeHostCall[] = [];
  const exports: FakeExport[] = [];
  const autosaves: string[] = [];
  const documentState = { title: 'Untitled', dirty: false };

  const record = (method: keyof HostApi, ...args: unknown[]): void => {
    calls.push({ method, args: args.map((arg) => (arg instanceof Uint8Array ? `<${arg.byteLength} bytes>` : clone(arg))) });
    const failure = seed.failures?.[method];
    if (failure) throw new Error(failure);
  };
  const remember = (path: string): void => {
    recent = [path, ...recent.filter((known) => known !== path)].slice(0, 10);
  };
  const nameOf = (path: string): string => path.split(/[\\/]/).pop() ?? path;

  const host: FakeHost = {
    kind: seed.kind ?? 'web',
    get listening() {
      return commands.listening;
    },
    calls,
    files,
    exports,
    documentState,
    autosaves,
    recovery: seed.recovery ?? null,

    async openProject() {
      record('openProject');
      const next = openQueue.shift() ?? null;
      if (next?.path) remember(next.path);
      return next ? { ...next } : null;
    },
    async openCsv() {
      record('openCsv');
      const next = csvQueue.shift() ?? null;
      if (next === 'input') {
        const picked = await pickCsvFile(window);
        return picked ? { name: picked.name, path: null, text: picked.text } : null;
      }
      return next ? { ...next } : null;
    },
    async openRecent(path) {
      record('openRecent', path);
      const text = files.get(path);
      if (text === undefined) return null;
      remember(path);
      return { name: nameOf(path), path, text };
    },
    async recentFiles() {
      record('recentFiles');
      return [...recent];
    },
    async saveProject(text, options) {
      record('saveProject', text, options);
      let path = !options.saveAs && options.path ? options.path : undefined;
      if (path === undefined) {
        const answer = saveAsQueue.length > 0 ? saveAsQueue.shift() : `/fake/${options.suggestedName.replace(/(\.hingeline)?(\.json)?$/i, '')}${PROJECT_EXTENSION}`;
        if (answer === null || answer === undefined) return null;
        path = answer;
      }
      files.set(path, text);
      remember(path);
      return { name: nameOf(path), path };
    },
    async exportFile(data, options) {
      record('exportFile', data, options);
      const extension = EXPORT_EXTENSIONS[options.mime];
      if (!extension) throw new Error(`Files of type ${options.mime} cannot be exported.`);
      const name = options.suggestedName.endsWith(extension) ? options.suggestedName : `${options.suggestedName}${extension}`;
      exports.push({
        name,
        mime: options.mime,
        openAfterwards: options.openAfterwards,
        text: typeof data === 'string' ? data : null,
        byteLength: typeof data === 'string' ? new TextEncoder().encode(data).byteLength : data.byteLength,
      });
      return { name, path: `/fake/exports/${name}` };
    },
    async autosave(text) {
      record('autosave', text);
      autosaves.push(text);
    },
    async takeRecovery() {
      record('takeRecovery');
      return host.recovery ? { ...host.recovery } : null;
    },
    async clearRecovery() {
      record('clearRecovery');
      host.recovery = null;
    },
    setDocumentState(state) {
      record('setDocumentState', state);
      documentState.title = state.title;
      documentState.dirty = state.dirty;
    },
    onMenuCommand: (listener) => commands.subscribe(listener),
    onOpenFile: (listener) => openedFiles.subscribe(listener),
    emitMenuCommand: (command) => commands.emit(command),
    emitOpenFile: (file) => openedFiles.emit(file),
  };
  return host;
}

/**
 * Builds a fake host from the seed an end-to-end test put on `window.hingelineTestHost`, and
 * attaches live views and controls to that same object so the test can read and drive it
 * through `page.evaluate`.
 */
export function createFakeHostFromGlobal(global: FakeHostGlobal): FakeHost {
  const host = createFakeHost(global);
  global.calls = host.calls;
  global.exports = host.exports;
  global.documentState = host.documentState;
  global.autosaves = host.autosaves;
  Object.defineProperty(global, 'savedFiles', { configurable: true, enumerable: true, get: () => Object.fromEntries(host.files) });
  global.emitMenuCommand = (command) => host.emitMenuCommand(command);
  global.emitOpenFile = (file) => host.emitOpenFile(file);
  // In a browser page (end-to-end tests) the keys do what they do under the browser host.
  if (typeof window !== 'undefined' && typeof window.addEventListener === 'function') listenForShortcuts(window, (command) => host.emitMenuCommand(command), () => host.listening);
  return host;
}
