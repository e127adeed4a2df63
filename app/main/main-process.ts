/**
 * The Electron main process: wires windows, menu, protocol, IPC and files together. Thin on
 * purpose: each decision lives in a small module (security.ts, menu.ts, host-service.ts,
 * close-guard.ts, …) that is tested without Electron; this file only connects them.
 */
import { app, BrowserWindow, ipcMain, Menu, protocol, session, shell } from 'electron';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { contentSecurityPolicy } from '../shared/content-security-policy.ts';
import { IpcChannel } from '../shared/ipc-channels.ts';
import type { MenuCommand } from '../shared/menu-commands.ts';
import { projectPathFromArgv, wantsDemoProject } from './argv.ts';
import { createAppProtocolHandler } from './app-protocol.ts';
import { CloseGuard } from './close-guard.ts';
import { askAboutUnsavedChanges, createElectronDialogs, showAbout, showProblem } from './dialogs.ts';
import { HostService } from './host-service.ts';
import { registerHostIpc, type IpcEventLike, type IpcMainLike } from './ipc-handlers.ts';
import { menuTemplate } from './menu.ts';
import { PathGrants } from './path-grants.ts';
import { RecentFiles } from './recent-files.ts';
import { RecoveryStore } from './recovery-store.ts';
import { RendererOutbox, type OutboxMessage } from './renderer-outbox.ts';
import {
  APP_ENTRY_URL,
  APP_SCHEME,
  denyPermissionCheck,
  denyPermissionRequest,
  devServerOrigin,
  hardenWebContents,
  isTrustedSender,
  privilegedSchemes,
  windowOptions,
  windowTitle,
} from './security.ts';

export const APP_USER_MODEL_ID = 'app.hingeline.desktop';

export interface MainProcessOptions {
  readonly argv?: readonly string[];
  readonly env?: Readonly<Record<string, string | undefined>>;
  readonly platform?: NodeJS.Platform;
  /** Folder of the built main script (out/main); the preload and renderer sit beside it. */
  readonly mainFolder?: string;
}

/** What a started main process exposes (used by tests and nothing else). */
export interface MainProcessHandle {
  readonly window: () => BrowserWindow | null;
  readonly service: HostService;
  readonly closeGuard: CloseGuard;
  readonly outbox: RendererOutbox;
}

const log = (message: string): void => console.warn(`[hingeline] ${message}`);

/**
 * Starts the main process. Returns null (and quits) when another instance already runs; that
 * instance receives our command line through `second-instance`.
 */
export function startMainProcess(options: MainProcessOptions = {}): Promise<MainProcessHandle> | null {
  const argv = options.argv ?? process.argv;
  const env = options.env ?? process.env;
  const platform = options.platform ?? process.platform;
  const mainFolder = options.mainFolder ?? dirname(fileURLToPath(import.meta.url));

  // Must happen before `ready`.
  protocol.registerSchemesAsPrivileged(privilegedSchemes());
  app.enableSandbox();
  if (!app.requestSingleInstanceLock()) {
    app.quit();
    return null;
  }
  if (platform === 'win32') app.setAppUserModelId(APP_USER_MODEL_ID);

  const isPackaged = app.isPackaged;
  const devOrigin = devServerOrigin(env, isPackaged);
  const closeGuard = new CloseGuard();
  const grants = new PathGrants();
  let mainWindow: BrowserWindow | null = null;
  let ready = false;
  let quitting = false;
  let sessionEnded = false;
  let closeDialogOpen = false;
  let documentTitle = 'Untitled';
  const waitingOsFiles: string[] = [];

  const outbox = new RendererOutbox((message: OutboxMessage) => {
    const channel = message.topic === 'menu-command' ? IpcChannel.menuCommand : IpcChannel.openFile;
    mainWindow?.webContents.send(channel, message.payload);
  });
  const sendCommand = (command: MenuCommand): void => outbox.post({ topic: 'menu-command', payload: command });

  app.on('web-contents-created', (_event, contents) => hardenWebContents(contents));

  app.on('open-file', (event, path) => {
    // macOS: a project was double-clicked or dropped on the dock icon.
    event.preventDefault();
    if (ready) openFromOutside(path);
    else waitingOsFiles.push(path);
  });

  app.on('second-instance', (_event, secondArgv, workingDirectory) => {
    if (mainWindow) {
      if (mainWindow.isMinimized()) mainWindow.restore();
      mainWindow.focus();
    } else if (ready) {
      createWindow();
    }
    const path = projectPathFromArgv(secondArgv, { cwd: workingDirectory, isPackaged });
    if (path) openFromOutside(path);
  });

  app.on('window-all-closed', () => {
    if (platform !== 'darwin') app.quit();
  });
  app.on('before-quit', () => {
    quitting = true;
  });
  app.on('will-quit', (event) => {
    if (sessionEnded || !ready) return;
    // Finish the clean-exit bookkeeping (no marker, no autosave) before the process ends.
    event.preventDefault();
    sessionEnded = true;
    void recovery.endSession().catch((error: unknown) => log(`ending session: ${String(error)}`)).finally(() => app.quit());
  });

  const userData = app.getPath('userData');
  const recovery = new RecoveryStore(join(userData, 'autosave'));
  const recent = new RecentFiles(join(userData, 'recent-files.json'), { platform });
  let topRecent: string | null = null;

  const service = new HostService({
    dialogs: createElectronDialogs(() => mainWindow),
    recent,
    recovery,
    grants,
    defaultFolder: app.getPath('documents'),
    openWithSystem: (path) => shell.openPath(path),
    revealInFolder: (path) => shell.showItemInFolder(path),
    onRecentChanged: (files) => {
      const top = files[0] ?? null;
      if (top !== null && top !== topRecent && platform !== 'linux') app.addRecentDocument(top);
      topRecent = top;
      buildMenu();
    },
    onSaveStarted: () => closeGuard.saveStarted(),
    onSaveFinished: (saved) => {
      if (closeGuard.saveFinished(saved) === 'close') setImmediate(() => mainWindow?.close());
    },
    log,
  });

  function isTrusted(event: IpcEventLike): boolean {
    return mainWindow !== null && event.sender === mainWindow.webContents && isTrustedSender(event.senderFrame, devOrigin);
  }

  registerHostIpc(ipcMain as unknown as IpcMainLike, service, {
    isTrusted,
    onDocumentState: (state) => {
      documentTitle = state.title;
      closeGuard.setDirty(state.dirty);
      mainWindow?.setTitle(windowTitle(state, platform));
      if (platform === 'darwin') mainWindow?.setDocumentEdited(state.dirty);
    },
    onListening: (topic) => outbox.markListening(topic),
    log,
  });

  function about(): void {
    void showAbout(mainWindow, {
      app: app.getVersion(),
      electron: process.versions.electron,
      chrome: process.versions.chrome,
      node: process.versions.node,
    });
  }

  function buildMenu(): void {
    const template = menuTemplate(
      { platform, appName: 'Hingeline', isDevelopment: !isPackaged, recentFiles: recent.list() },
      {
        command: sendCommand,
        openRecent: (path) => {
          service.openRecent(path).then(
            (file) => file && outbox.post({ topic: 'open-file', payload: file }),
            (error: unknown) => void showProblem(mainWindow, 'The project could not be opened.', error instanceof Error ? error.message : String(error)),
          );
        },
        clearRecent: () => {
          void service.clearRecentFiles().then(() => app.clearRecentDocuments());
        },
        about,
      },
    );
    Menu.setApplicationMenu(Menu.buildFromTemplate(template));
  }

  function openFromOutside(path: string): void {
    if (!mainWindow && ready) createWindow();
    service.openPath(path).then(
      (file) => outbox.post({ topic: 'open-file', payload: file }),
      (error: unknown) => void showProblem(mainWindow, 'The project could not be opened.', error instanceof Error ? error.message : String(error)),
    );
  }

  function createWindow(): BrowserWindow {
    const window = new BrowserWindow(
      windowOptions({
        preloadPath: join(mainFolder, '../preload/index.cjs'),
        iconPath: isPackaged ? undefined : join(app.getAppPath(), 'build/icons/png/512x512.png'),
        devTools: !isPackaged,
      }),
    );
    mainWindow = window;
    closeGuard.reset();
    outbox.reset();

    window.once('ready-to-show', () => window.show());
    // The document title comes from setDocumentState, not from the page's <title>.
    window.on('page-title-updated', (event) => event.preventDefault());
    window.webContents.on('did-start-loading', () => {
      outbox.reset();
      closeGuard.reset();
    });
    window.webContents.on('render-process-gone', (_event, details) => {
      log(`renderer gone: ${details.reason}`);
      if (details.reason === 'clean-exit') return;
      // Offer the last autosave after the reload, as after a crash of the whole app.
      void recovery.setAsideAutosave().finally(() => {
        if (!window.isDestroyed()) window.webContents.reload();
      });
    });
    window.on('close', (event) => {
      if (closeGuard.requestClose() === 'close') return;
      event.preventDefault();
      if (closeDialogOpen) return;
      closeDialogOpen = true;
      void askAboutUnsavedChanges(window, documentTitle).then((answer) => {
        closeDialogOpen = false;
        const step = closeGuard.resolveDialog(answer);
        if (step === 'close') window.close();
        else if (step === 'request-save') sendCommand('save');
        else quitting = false;
      });
    });
    window.on('closed', () => {
      if (mainWindow === window) mainWindow = null;
      void recovery.discardAutosave().catch(() => undefined);
      if (quitting && platform === 'darwin') app.quit();
    });

    void window.loadURL(devOrigin ? (env.ELECTRON_RENDERER_URL as string) : APP_ENTRY_URL);
    return window;
  }

  return app.whenReady().then(async () => {
    session.defaultSession.setPermissionRequestHandler(denyPermissionRequest);
    session.defaultSession.setPermissionCheckHandler(denyPermissionCheck);
    const csp = contentSecurityPolicy({ devServerOrigin: devOrigin });
    protocol.handle(APP_SCHEME, createAppProtocolHandler(join(mainFolder, '../renderer'), csp));
    if (devOrigin) {
      // The Vite dev server sends no CSP; add ours so development sees the same restrictions.
      session.defaultSession.webRequest.onHeadersReceived((details, callback) => {
        callback({ responseHeaders: { ...details.responseHeaders, 'Content-Security-Policy': [csp] } });
      });
    }

    const start = await recovery.beginSession();
    if (start.previousSessionCrashed) log('the previous session did not end cleanly');
    topRecent = (await recent.load())[0] ?? null;

    buildMenu();
    createWindow();
    ready = true;

    const fromArgv = projectPathFromArgv(argv, { cwd: process.cwd(), isPackaged });
    if (fromArgv) openFromOutside(fromArgv);
    else if (wantsDemoProject(argv, isPackaged)) sendCommand('open-demo');
    for (const path of waitingOsFiles.splice(0)) openFromOutside(path);

    app.on('activate', () => {
      // macOS: clicking the dock icon with no window open.
      if (BrowserWindow.getAllWindows().length === 0) createWindow();
    });

    return { window: () => mainWindow, service, closeGuard, outbox };
  });
}
