/**
 * HostApi — the one typed interface between the renderer and whatever hosts it: the Electron
 * shell (electron-host.ts, through the preload bridge) or a plain browser (web-host.ts).
 * fake-host.ts is an in-memory implementation for component and end-to-end tests.
 * Obtain the right one with `getHost()` from './index.ts'.
 *
 * Contract shared by all implementations:
 * - Every promise rejects with an Error whose message is fit to show the user (what failed and
 *   why); `null` always means the user cancelled a dialog.
 * - Project text is passed through as-is; the host never parses or changes it.
 * - `path` is an absolute file path in Electron. In the browser it is null, or an opaque token
 *   `web-handle:<id>` when the File System Access API lets us write back to the same file.
 *   Show `name` to the user, never `path` tokens.
 * - Listeners registered with `onMenuCommand` / `onOpenFile` receive events queued before they
 *   subscribed (e.g. a file given on the command line); subscribe once at start-up.
 * - The renderer owns the decisions: on `open` or `onOpenFile` it asks about unsaved changes
 *   itself before replacing the document.
 */

export interface OpenedFile {
  /** File name for display, e.g. `Beam B1.hingeline`. */
  name: string;
  /** See the contract above: a file path (desktop), a `web-handle:` token or null (browser). */
  path: string | null;
  /** The whole file, UTF-8 decoded, without byte-order mark. */
  text: string;
}

/**
 * Commands from the native menu (Electron) or keyboard shortcuts (browser).
 * `undo`/`redo` arrive also while a text field has focus (Electron menu accelerators fire first;
 * the browser host takes Ctrl+Z/Y in fields too): the app's undo owns them everywhere, never the
 * browser's own undo of a field (commands.ts, composables/field-history.ts).
 * `shortcuts` shows the list of keyboard shortcuts.
 * `about` is never sent by the desktop menu, which shows the native About box (version and the
 * results caution) itself; the browser has no menu, so the renderer offers its own About.
 */
export type MenuCommand =
  | 'new'
  | 'open'
  | 'open-demo'
  | 'save'
  | 'save-as'
  | 'export-report'
  | 'export-csv'
  | 'import-csv'
  | 'undo'
  | 'redo'
  | 'about'
  | 'add-member'
  | 'analyze'
  | 'shortcuts';

export interface HostApi {
  readonly kind: 'electron' | 'web';
  /** Shows a file dialog for a project (`.hingeline` or `.json`); null when cancelled. */
  openProject(): Promise<OpenedFile | null>;
  /**
   * Shows a file dialog for a CSV file to import (a member or span list); null when cancelled.
   * Read only: the file is not remembered and never written to.
   */
  openCsv(): Promise<OpenedFile | null>;
  /** Opens an entry returned by `recentFiles()`; null when it cannot be reached without asking. */
  openRecent(path: string): Promise<OpenedFile | null>;
  /** Recently opened or saved projects, newest first (paths in Electron, names in the browser). */
  recentFiles(): Promise<string[]>;
  /**
   * Saves project text. With `saveAs` false and a `path` the host handed out, writes there
   * without asking (atomically, keeping the previous version as `.bak` on the desktop);
   * otherwise asks where, proposing `suggestedName`. Null when the user cancelled.
   */
  saveProject(
    text: string,
    options: { path: string | null; suggestedName: string; saveAs: boolean },
  ): Promise<{ name: string; path: string | null } | null>;
  /**
   * Writes an exported file (PDF report, CSV). `mime` is one of application/pdf, text/csv,
   * application/json, text/plain, image/png, image/svg+xml. `openAfterwards` opens it with the
   * system viewer (desktop only). Null when the user cancelled.
   */
  exportFile(
    data: Uint8Array | string,
    options: { suggestedName: string; mime: string; openAfterwards: boolean },
  ): Promise<{ name: string; path: string | null } | null>;
  /** Keeps a crash-recovery copy (call after a few seconds of idle editing). */
  autosave(text: string): Promise<void>;
  /** The document autosaved by a session that ended abnormally, or null. Not removed until `clearRecovery()`. */
  takeRecovery(): Promise<{ text: string; savedAt: string; name: string } | null>;
  /** Forgets the recovery copy (after the user restored or declined it). */
  clearRecovery(): Promise<void>;
  /** Window title and unsaved-changes flag (drives the close warning). Title ≤ 300 characters. */
  setDocumentState(state: { title: string; dirty: boolean }): void;
  /** Subscribes to menu commands; returns the unsubscribe function. */
  onMenuCommand(listener: (command: MenuCommand) => void): () => void;
  /** Subscribes to files opened from outside (command line, double-click, second instance, drop). */
  onOpenFile(listener: (file: OpenedFile) => void): () => void;
}

/** Every MenuCommand, for validation and tests. */
export const MENU_COMMANDS: readonly MenuCommand[] = [
  'new',
  'open',
  'open-demo',
  'save',
  'save-as',
  'export-report',
  'export-csv',
  'import-csv',
  'undo',
  'redo',
  'about',
  'add-member',
  'analyze',
  'shortcuts',
];

/** Export MIME types every host accepts, with their file extensions. */
export const EXPORT_EXTENSIONS: Readonly<Record<string, string>> = {
  'application/pdf': '.pdf',
  'text/csv': '.csv',
  'application/json': '.json',
  'text/plain': '.txt',
  'image/png': '.png',
  'image/svg+xml': '.svg',
};

/** Extension of saved projects (JSON inside). */
export const PROJECT_EXTENSION = '.hingeline';

/** The caution every result-bearing surface carries (written once, in core). */
export { RESULTS_CAUTION } from '../../../core/assessment/results.ts';
