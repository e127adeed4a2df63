/**
 * The native application menu as a pure template builder (type imports from `electron` only).
 * Menu items send MenuCommands to the renderer through `actions.command`; the renderer decides
 * what they do (e.g. asks about unsaved changes before `open`).
 */
import type { MenuItemConstructorOptions } from 'electron';
import { baseName } from '../shared/file-types.ts';
import type { MenuCommand } from '../shared/menu-commands.ts';

export interface MenuContext {
  readonly platform: NodeJS.Platform;
  readonly appName: string;
  /** Development build: adds Reload and DevTools to the View menu. */
  readonly isDevelopment: boolean;
  readonly recentFiles: readonly string[];
}

export interface MenuActions {
  command(command: MenuCommand): void;
  openRecent(path: string): void;
  clearRecent(): void;
  about(): void;
}

/**
 * Platform-conventional accelerator of a command, or undefined when it has none.
 * Redo is Shift+Cmd+Z on macOS and Ctrl+Y on Windows and Linux.
 */
export function acceleratorFor(command: MenuCommand, platform: NodeJS.Platform): string | undefined {
  switch (command) {
    case 'new':
      return 'CmdOrCtrl+N';
    case 'open':
      return 'CmdOrCtrl+O';
    case 'save':
      return 'CmdOrCtrl+S';
    case 'save-as':
      return 'Shift+CmdOrCtrl+S';
    case 'export-report':
      return 'CmdOrCtrl+E';
    case 'export-csv':
      return 'Shift+CmdOrCtrl+E';
    case 'undo':
      return 'CmdOrCtrl+Z';
    case 'redo':
      return platform === 'darwin' ? 'Shift+CmdOrCtrl+Z' : 'Ctrl+Y';
    case 'analyze':
      return 'CmdOrCtrl+Enter';
    case 'add-member':
      return 'Shift+CmdOrCtrl+M';
    case 'shortcuts':
      return 'CmdOrCtrl+/';
    default:
      return undefined;
  }
}

const separator: MenuItemConstructorOptions = { type: 'separator' };

function commandItem(label: string, command: MenuCommand, context: MenuContext, actions: MenuActions): MenuItemConstructorOptions {
  const accelerator = acceleratorFor(command, context.platform);
  return { id: `command:${command}`, label, ...(accelerator ? { accelerator } : {}), click: () => actions.command(command) };
}

function recentSubmenu(context: MenuContext, actions: MenuActions): MenuItemConstructorOptions[] {
  if (context.recentFiles.length === 0) {
    return [{ id: 'recent:none', label: 'No recent projects', enabled: false }];
  }
  return [
    ...context.recentFiles.map((path, index): MenuItemConstructorOptions => ({
      id: `recent:${index}`,
      // `&` would start a mnemonic on Windows and Linux; double it to show it literally.
      label: `${index + 1}  ${baseName(path).replace(/&/g, '&&')}`,
      toolTip: path,
      click: () => actions.openRecent(path),
    })),
    separator,
    { id: 'recent:clear', label: 'Clear Recent', click: () => actions.clearRecent() },
  ];
}

/** The whole menu bar for `context`. Rebuild it when the recent list changes. */
export function menuTemplate(context: MenuContext, actions: MenuActions): MenuItemConstructorOptions[] {
  const isMac = context.platform === 'darwin';
  const item = (label: string, command: MenuCommand): MenuItemConstructorOptions => commandItem(label, command, context, actions);
  const about: MenuItemConstructorOptions = { id: 'about', label: `About ${context.appName}`, click: () => actions.about() };

  const appMenu: MenuItemConstructorOptions[] = isMac
    ? [
        {
          label: context.appName,
          submenu: [about, separator, { role: 'services' }, separator, { role: 'hide' }, { role: 'hideOthers' }, { role: 'unhide' }, separator, { role: 'quit' }],
        },
      ]
    : [];

  const quit: MenuItemConstructorOptions[] = isMac
    ? [separator, { role: 'close' }]
    : [separator, { id: 'quit', role: 'quit', label: context.platform === 'win32' ? 'E&xit' : '&Quit', accelerator: context.platform === 'win32' ? 'Alt+F4' : 'Ctrl+Q' }];

  const file: MenuItemConstructorOptions = {
    label: '&File',
    submenu: [
      item('&New', 'new'),
      item('&Open…', 'open'),
      item('Open &demo project', 'open-demo'),
      { id: 'recent', label: 'Open &Recent', submenu: recentSubmenu(context, actions) },
      separator,
      item('&Save', 'save'),
      item('Save &As…', 'save-as'),
      separator,
      item('Export &report (PDF)…', 'export-report'),
      item('Export results (&CSV)…', 'export-csv'),
      separator,
      item('&Import members from CSV…', 'import-csv'),
      ...quit,
    ],
  };

  const edit: MenuItemConstructorOptions = {
    label: '&Edit',
    submenu: [
      item('&Undo', 'undo'),
      item('&Redo', 'redo'),
      separator,
      { role: 'cut' },
      { role: 'copy' },
      { role: 'paste' },
      { role: 'selectAll' },
      separator,
      item('Add &member', 'add-member'),
      item('Run a&nalysis', 'analyze'),
    ],
  };

  const view: MenuItemConstructorOptions = {
    label: '&View',
    submenu: [
      ...(context.isDevelopment
        ? ([{ role: 'reload' }, { role: 'forceReload' }, { role: 'toggleDevTools' }, separator] as MenuItemConstructorOptions[])
        : []),
      { role: 'zoomIn' },
      { role: 'zoomOut' },
      { role: 'resetZoom' },
      separator,
      { role: 'togglefullscreen' },
    ],
  };

  const windowMenu: MenuItemConstructorOptions[] = isMac ? [{ role: 'windowMenu' }] : [];
  const help: MenuItemConstructorOptions = { label: '&Help', role: 'help', submenu: [item('&Keyboard shortcuts', 'shortcuts'), separator, about] };

  return [...appMenu, file, edit, view, ...windowMenu, help];
}
