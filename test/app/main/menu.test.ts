import type { MenuItemConstructorOptions } from 'electron';
import { describe, expect, it, vi } from 'vitest';
import { acceleratorFor, menuTemplate, type MenuActions, type MenuContext } from '../../../app/main/menu.ts';
import { MENU_COMMANDS, type MenuCommand } from '../../../app/shared/menu-commands.ts';

function actions(): MenuActions & { command: ReturnType<typeof vi.fn> } {
  return { command: vi.fn(), openRecent: vi.fn(), clearRecent: vi.fn(), about: vi.fn() } as never;
}

function context(overrides: Partial<MenuContext> = {}): MenuContext {
  return { platform: 'linux', appName: 'Hingeline', isDevelopment: false, recentFiles: [], ...overrides };
}

/** All items of a template, depth first. */
function items(template: MenuItemConstructorOptions[]): MenuItemConstructorOptions[] {
  return template.flatMap((item) => [item, ...(Array.isArray(item.submenu) ? items(item.submenu) : [])]);
}

function click(item: MenuItemConstructorOptions | undefined): void {
  (item?.click as (() => void) | undefined)?.();
}

const labels = (template: MenuItemConstructorOptions[]) => template.map((item) => item.label ?? item.role);

describe('menu template', () => {
  it('has File, Edit, View and Help on Windows and Linux, plus the app and Window menus on macOS', () => {
    expect(labels(menuTemplate(context(), actions()))).toEqual(['&File', '&Edit', '&View', '&Help']);
    expect(labels(menuTemplate(context({ platform: 'darwin' }), actions()))).toEqual(['Hingeline', '&File', '&Edit', '&View', 'windowMenu', '&Help']);
  });

  it('sends every MenuCommand except about from exactly one item', () => {
    const all = actions();
    const template = items(menuTemplate(context(), all));
    for (const command of MENU_COMMANDS.filter((name) => name !== 'about')) {
      const matching = template.filter((item) => item.id === `command:${command}`);
      expect(matching, command).toHaveLength(1);
      all.command.mockClear();
      click(matching[0]);
      expect(all.command).toHaveBeenCalledExactlyOnceWith(command);
    }
  });

  it('File has New, Open, demo, Open Recent, Save, Save As, both exports, the CSV import and Quit in that order', () => {
    const file = menuTemplate(context(), actions())[0]!;
    const names = (file.submenu as MenuItemConstructorOptions[]).filter((item) => item.type !== 'separator').map((item) => item.label);
    expect(names).toEqual(['&New', '&Open…', 'Open &demo project', 'Open &Recent', '&Save', 'Save &As…', 'Export &report (PDF)…', 'Export results (&CSV)…', '&Import members from CSV…', '&Quit']);
  });

  it('Edit keeps the native cut, copy, paste and select-all roles for text fields', () => {
    const roles = items(menuTemplate(context(), actions())).map((item) => item.role).filter(Boolean);
    expect(roles).toEqual(expect.arrayContaining(['cut', 'copy', 'paste', 'selectAll', 'zoomIn', 'zoomOut', 'resetZoom', 'togglefullscreen']));
  });

  it('shows Reload and DevTools only in development', () => {
    const roles = (dev: boolean) => items(menuTemplate(context({ isDevelopment: dev }), actions())).map((item) => item.role);
    expect(roles(true)).toEqual(expect.arrayContaining(['reload', 'forceReload', 'toggleDevTools']));
    expect(roles(false)).not.toContain('reload');
    expect(roles(false)).not.toContain('toggleDevTools');
  });

  it('About opens the About box through its own action on every platform', () => {
    for (const platform of ['linux', 'win32', 'darwin'] as const) {
      const all = actions();
      const about = items(menuTemplate(context({ platform }), all)).filter((item) => item.id === 'about');
      expect(about.length).toBeGreaterThanOrEqual(1);
      click(about[0]);
      expect(all.about).toHaveBeenCalledOnce();
      expect(all.command).not.toHaveBeenCalled();
    }
  });

  it('lists recent projects by file name, opens them by full path, and can clear the list', () => {
    const all = actions();
    const template = items(menuTemplate(context({ recentFiles: ['/jobs/Beam B1.hingeline', 'C:\\jobs\\R&D.hingeline'] }), all));
    const first = template.find((item) => item.id === 'recent:0');
    const second = template.find((item) => item.id === 'recent:1');
    expect(first?.label).toBe('1  Beam B1.hingeline');
    expect(second?.label).toBe('2  R&&D.hingeline');
    click(second);
    expect(all.openRecent).toHaveBeenCalledWith('C:\\jobs\\R&D.hingeline');
    click(template.find((item) => item.id === 'recent:clear'));
    expect(all.clearRecent).toHaveBeenCalledOnce();
  });

  it('shows a disabled placeholder when there are no recent projects', () => {
    const none = items(menuTemplate(context(), actions())).find((item) => item.id === 'recent:none');
    expect(none).toMatchObject({ enabled: false, label: 'No recent projects' });
  });

  it('quits with Ctrl+Q on Linux, Alt+F4 "Exit" on Windows, and from the app menu on macOS', () => {
    const quit = (platform: NodeJS.Platform) => items(menuTemplate(context({ platform }), actions())).filter((item) => item.role === 'quit');
    expect(quit('linux')).toEqual([expect.objectContaining({ label: '&Quit', accelerator: 'Ctrl+Q' })]);
    expect(quit('win32')).toEqual([expect.objectContaining({ label: 'E&xit', accelerator: 'Alt+F4' })]);
    const mac = menuTemplate(context({ platform: 'darwin' }), actions());
    expect((mac[0]!.submenu as MenuItemConstructorOptions[]).some((item) => item.role === 'quit')).toBe(true);
  });
});

describe('accelerators', () => {
  const expected: Record<string, Partial<Record<MenuCommand, string>>> = {
    darwin: { save: 'CmdOrCtrl+S', 'save-as': 'Shift+CmdOrCtrl+S', open: 'CmdOrCtrl+O', undo: 'CmdOrCtrl+Z', redo: 'Shift+CmdOrCtrl+Z', new: 'CmdOrCtrl+N' },
    win32: { save: 'CmdOrCtrl+S', 'save-as': 'Shift+CmdOrCtrl+S', open: 'CmdOrCtrl+O', undo: 'CmdOrCtrl+Z', redo: 'Ctrl+Y', new: 'CmdOrCtrl+N' },
    linux: { save: 'CmdOrCtrl+S', 'save-as': 'Shift+CmdOrCtrl+S', open: 'CmdOrCtrl+O', undo: 'CmdOrCtrl+Z', redo: 'Ctrl+Y', new: 'CmdOrCtrl+N' },
  };

  for (const [platform, table] of Object.entries(expected)) {
    it(`follow ${platform} conventions, in the table and on the menu items`, () => {
      const template = items(menuTemplate(context({ platform: platform as NodeJS.Platform }), actions()));
      for (const [command, accelerator] of Object.entries(table)) {
        expect(acceleratorFor(command as MenuCommand, platform as NodeJS.Platform), command).toBe(accelerator);
        expect(template.find((item) => item.id === `command:${command}`)?.accelerator, command).toBe(accelerator);
      }
    });
  }

  it('are unique within a platform', () => {
    for (const platform of ['darwin', 'win32', 'linux'] as const) {
      const used = items(menuTemplate(context({ platform }), actions())).map((item) => item.accelerator).filter(Boolean);
      expect(new Set(used).size, platform).toBe(used.length);
    }
  });
});
