/**
 * Commands the host (native menu in Electron, keyboard shortcuts in the browser) sends to the
 * renderer. The renderer decides what each one does; the host never edits the project itself.
 *
 * Node-free: used by app/main and by the sandboxed preload.
 */
export const MENU_COMMANDS = [
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
] as const;

export type MenuCommand = (typeof MENU_COMMANDS)[number];

/** True when `value` is one of {@link MENU_COMMANDS}. */
export function isMenuCommand(value: unknown): value is MenuCommand {
  return typeof value === 'string' && (MENU_COMMANDS as readonly string[]).includes(value);
}
