/**
 * The keyboard shortcuts of the workspace, as the Help → Keyboard shortcuts list shows them.
 * The desktop shell's menu accelerators (app/main/menu.ts) and the browser host's keys
 * (host/web-host.ts) are the sources; a test checks this list against both.
 */
import type { MenuCommand } from '../host/host-api.ts';

export interface Shortcut {
  /** Keys as pressed, `Ctrl` written `⌘` on macOS, e.g. `Ctrl+Shift+S`. */
  readonly keys: string;
  readonly action: string;
  /** The menu command the keys send, when they send one. */
  readonly command?: MenuCommand;
}

interface Entry {
  readonly keys: string;
  /** Keys on the desktop when they differ (e.g. redo on macOS). */
  readonly macKeys?: string;
  readonly action: string;
  readonly command?: MenuCommand;
  /** Only in the desktop application (the browser keeps these keys for itself). */
  readonly desktopOnly?: boolean;
}

const ENTRIES: readonly Entry[] = [
  { keys: 'Ctrl+N', action: 'New project', command: 'new', desktopOnly: true },
  { keys: 'Ctrl+O', action: 'Open a project', command: 'open' },
  { keys: 'Ctrl+S', action: 'Save', command: 'save' },
  { keys: 'Ctrl+Shift+S', action: 'Save as', command: 'save-as' },
  { keys: 'Ctrl+E', action: 'Export the PDF report', command: 'export-report', desktopOnly: true },
  { keys: 'Ctrl+Shift+E', action: 'Export the results summary (CSV)', command: 'export-csv', desktopOnly: true },
  { keys: 'Ctrl+Z', action: 'Undo (in a field holding text not yet taken, that text goes first)', command: 'undo' },
  { keys: 'Ctrl+Y', macKeys: 'Ctrl+Shift+Z', action: 'Redo', command: 'redo' },
  { keys: 'Ctrl+Shift+Z', action: 'Redo', command: 'redo' },
  { keys: 'Ctrl+Enter', action: 'Analyse the whole project', command: 'analyze' },
  { keys: 'Ctrl+Shift+M', action: 'Add a member', command: 'add-member', desktopOnly: true },
  { keys: 'Ctrl+/', action: 'This list of shortcuts', command: 'shortcuts' },
  { keys: 'Escape', action: 'In a field: give up what was typed; in a dialog: cancel' },
  { keys: 'Enter', action: 'In a field: take the value; in the overview: open the member' },
  { keys: '← →, Home, End', action: 'Move between tabs' },
  { keys: '↑ ↓', action: 'Move between rows of the overview' },
];

/** The shortcuts of the host in use (`electron` or `web`), with ⌘ for Ctrl on macOS. */
export function shortcutsFor(host: 'electron' | 'web', mac: boolean): Shortcut[] {
  const desktop = host === 'electron';
  const seen = new Set<string>();
  const list: Shortcut[] = [];
  for (const entry of ENTRIES) {
    if (entry.desktopOnly && !desktop) continue;
    const raw = desktop && mac && entry.macKeys ? entry.macKeys : entry.keys;
    const keys = mac ? raw.replace(/Ctrl\+/g, '⌘') : raw;
    if (seen.has(`${keys}|${entry.action}`)) continue;
    seen.add(`${keys}|${entry.action}`);
    list.push({ keys, action: entry.action, ...(entry.command ? { command: entry.command } : {}) });
  }
  return list;
}
