/**
 * The keyboard-shortcut list says what the keys really do: every entry that sends a command is the
 * desktop menu's accelerator for it (app/main/menu.ts) and, unless it is desktop-only, the browser
 * host's key for it (host/web-host.ts).
 */
import { describe, expect, it } from 'vitest';
import { acceleratorFor } from '../../../app/main/menu.ts';
import { menuCommandForKey } from '../../../renderer/src/host/web-host.ts';
import { shortcutsFor } from '../../../renderer/src/project/shortcuts.ts';

/** `Ctrl+Shift+S` → a key press. */
function press(keys: string) {
  const parts = keys.split('+');
  const key = parts[parts.length - 1] === '' ? '+' : parts[parts.length - 1]!;
  return { key: key === 'Enter' ? 'Enter' : key.toLowerCase(), ctrlKey: parts.includes('Ctrl'), metaKey: false, shiftKey: parts.includes('Shift'), altKey: false };
}

describe('keyboard shortcuts list', () => {
  it('matches the desktop menu accelerators (Windows and Linux, and ⌘ on macOS)', () => {
    for (const platform of ['win32', 'linux', 'darwin'] as const) {
      const mac = platform === 'darwin';
      for (const shortcut of shortcutsFor('electron', mac)) {
        if (!shortcut.command) continue;
        const accelerator = acceleratorFor(shortcut.command, platform)!;
        const written = shortcut.keys.replace('⌘', 'Ctrl+');
        const expected = accelerator.replace('CmdOrCtrl', 'Ctrl').split('+').sort().join('+');
        // Redo has two spellings on Windows and Linux (Ctrl+Y in the menu, Ctrl+Shift+Z as well).
        if (shortcut.command === 'redo' && !mac && written === 'Ctrl+Shift+Z') continue;
        expect(written.split('+').sort().join('+'), `${shortcut.action} on ${platform}`).toBe(expected);
      }
    }
  });

  it('matches the keys the browser host turns into commands, and leaves out desktop-only keys', () => {
    const web = shortcutsFor('web', false);
    for (const shortcut of web) {
      if (!shortcut.command) continue;
      expect(menuCommandForKey(press(shortcut.keys)), shortcut.keys).toBe(shortcut.command);
    }
    expect(web.some((s) => s.command === 'new')).toBe(false);
    expect(shortcutsFor('electron', false).some((s) => s.command === 'new')).toBe(true);
  });

  it('writes ⌘ for Ctrl on macOS', () => {
    expect(shortcutsFor('web', true).find((s) => s.command === 'save')!.keys).toBe('⌘S');
    expect(shortcutsFor('electron', true).find((s) => s.command === 'redo')!.keys).toBe('⌘Shift+Z');
  });
});
