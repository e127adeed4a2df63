/**
 * Security settings of the main process as small pure functions, so that unit tests can check
 * each item of Electron's security checklist without starting Electron. Only type imports from
 * `electron` here.
 *
 * The renderer is served from the custom scheme `hingeline-app://app/` (registered as standard
 * and secure, answered by app/main/app-protocol.ts with a strict CSP header) rather than from
 * file://, so it has a real origin to check IPC senders against and file:// keeps no special
 * privileges (the `grantFileProtocolExtraPrivileges` fuse is off in the packaged app).
 */
import type { BrowserWindowConstructorOptions, CustomScheme, WebContents } from 'electron';

export const APP_SCHEME = 'hingeline-app';
export const APP_HOST = 'app';
/** Where the production renderer is loaded from. */
export const APP_ENTRY_URL = `${APP_SCHEME}://${APP_HOST}/index.html`;

/** Scheme registration, to pass to `protocol.registerSchemesAsPrivileged` before `ready`. */
export function privilegedSchemes(): CustomScheme[] {
  return [
    {
      scheme: APP_SCHEME,
      // standard: real origin and relative URLs; secure: counts as a secure context;
      // supportFetchAPI: module scripts and workers load through fetch. No CSP bypass, no CORS,
      // no service workers.
      privileges: { standard: true, secure: true, supportFetchAPI: true, codeCache: true },
    },
  ];
}

export interface WindowOptionsInput {
  /** Absolute path of the built preload script (CommonJS). */
  readonly preloadPath: string;
  /** Window icon (Linux in development; packaged apps take it from the desktop entry). */
  readonly iconPath?: string;
  /** Allow DevTools (development builds only). */
  readonly devTools: boolean;
}

/** Options of the main window: every webPreferences item of the checklist set explicitly. */
export function windowOptions(input: WindowOptionsInput): BrowserWindowConstructorOptions {
  return {
    width: 1360,
    height: 860,
    minWidth: 960,
    minHeight: 600,
    show: false,
    title: 'Hingeline',
    backgroundColor: '#f4f5f2',
    ...(input.iconPath ? { icon: input.iconPath } : {}),
    webPreferences: {
      preload: input.preloadPath,
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      experimentalFeatures: false,
      webviewTag: false,
      navigateOnDragDrop: false,
      safeDialogs: true,
      devTools: input.devTools,
      spellcheck: false,
    },
  };
}

/**
 * Origin of the electron-vite dev server from `ELECTRON_RENDERER_URL`, only in an unpackaged
 * app and only for a loopback http address; null otherwise.
 */
export function devServerOrigin(env: Readonly<Record<string, string | undefined>>, isPackaged: boolean): string | null {
  const raw = env.ELECTRON_RENDERER_URL;
  if (isPackaged || !raw) return null;
  try {
    const url = new URL(raw);
    const loopback = url.hostname === 'localhost' || url.hostname === '127.0.0.1' || url.hostname === '[::1]';
    return url.protocol === 'http:' && loopback ? url.origin : null;
  } catch {
    return null;
  }
}

/** The minimal view of a frame that the sender check needs (Electron's `WebFrameMain`). */
export interface SenderFrame {
  readonly url: string;
  readonly parent: unknown;
  readonly detached?: boolean;
}

/**
 * True only for the top-level frame of our own page: `hingeline-app://app/…`, or the dev server
 * origin during development. A missing or detached frame, a sub-frame, or any other URL is refused.
 */
export function isTrustedSender(frame: SenderFrame | null | undefined, devOrigin: string | null = null): boolean {
  if (!frame || frame.detached === true || frame.parent !== null) return false;
  let url: URL;
  try {
    url = new URL(frame.url);
  } catch {
    return false;
  }
  if (url.protocol === `${APP_SCHEME}:` && url.host === APP_HOST) return true;
  return devOrigin !== null && url.origin === devOrigin;
}

/** Permission requests (camera, notifications, clipboard read, …): always refused. */
export function denyPermissionRequest(_contents: unknown, _permission: string, callback: (granted: boolean) => void): void {
  callback(false);
}

/** Permission checks: always refused. */
export function denyPermissionCheck(): boolean {
  return false;
}

/**
 * Blocks every way a web contents could leave our page: navigation (also of frames and by
 * redirect), new windows, and <webview> tags. Apply to every web contents (`web-contents-created`).
 */
export function hardenWebContents(contents: WebContents): void {
  contents.on('will-navigate', (event) => event.preventDefault());
  contents.on('will-frame-navigate', (event) => event.preventDefault());
  contents.on('will-redirect', (event) => event.preventDefault());
  contents.on('will-attach-webview', (event) => event.preventDefault());
  contents.setWindowOpenHandler(() => ({ action: 'deny' }));
}

/** Window title for a document: `Beam B1 — Hingeline`, with `• ` in front when unsaved (not on macOS, which marks the close button instead). */
export function windowTitle(state: { title: string; dirty: boolean }, platform: NodeJS.Platform): string {
  const title = state.title.trim().length > 0 ? `${state.title.trim()} — Hingeline` : 'Hingeline';
  return state.dirty && platform !== 'darwin' ? `• ${title}` : title;
}
