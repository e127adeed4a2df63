import { mkdtemp, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { INVOKE_CHANNELS, IpcChannel } from '../../../app/shared/ipc-channels.ts';
import { createElectronFake, type ElectronFake, type FakeWebContents } from '../fixtures/electron-fake.ts';

const holder = vi.hoisted(() => ({ current: null as unknown as ElectronFake }));

vi.mock('electron', () => ({
  get app() {
    return holder.current.electron.app;
  },
  get BrowserWindow() {
    return holder.current.electron.BrowserWindow;
  },
  get ipcMain() {
    return holder.current.electron.ipcMain;
  },
  get Menu() {
    return holder.current.electron.Menu;
  },
  get protocol() {
    return holder.current.electron.protocol;
  },
  get session() {
    return holder.current.electron.session;
  },
  get shell() {
    return holder.current.electron.shell;
  },
  get dialog() {
    return holder.current.electron.dialog;
  },
}));

const { startMainProcess } = await import('../../../app/main/main-process.ts');

let userData: string;
let fake: ElectronFake;
vi.spyOn(console, 'warn').mockImplementation(() => undefined);

beforeEach(async () => {
  userData = await mkdtemp(join(tmpdir(), 'hingeline-main-'));
  fake = createElectronFake(userData);
  holder.current = fake;
});
afterEach(async () => {
  await rm(userData, { recursive: true, force: true });
});

const APP_FRAME = { url: 'hingeline-app://app/index.html', parent: null };

function start(argv: string[] = ['/x/electron', '.'], env: Record<string, string> = {}, platform: NodeJS.Platform = 'linux') {
  const started = startMainProcess({ argv, env, platform, mainFolder: '/app/out/main' });
  if (!started) throw new Error('expected the main process to start');
  return started;
}

function window() {
  const current = fake.windows.at(-1);
  if (!current) throw new Error('no window');
  return current;
}

/** A message from our page in our window, as Electron would deliver it. */
function fromPage(contents: FakeWebContents = window().webContents) {
  return { sender: contents, senderFrame: APP_FRAME };
}

function invoke(channel: string, event: unknown, ...args: unknown[]) {
  const handler = fake.handlers.get(channel);
  if (!handler) throw new Error(`no handler for ${channel}`);
  return handler(event, ...args) as Promise<unknown>;
}

function send(channel: string, ...args: unknown[]) {
  fake.sendListeners.get(channel)?.(fromPage(), ...args);
}

describe('main process start-up', () => {
  it('registers the privileged scheme and sandbox before ready, and takes the single-instance lock', async () => {
    const started = start();
    // Checked before `ready` resolves: these calls must happen synchronously at start-up.
    expect(fake.electron.protocol.registerSchemesAsPrivileged).toHaveBeenCalledWith([
      expect.objectContaining({ scheme: 'hingeline-app', privileges: expect.objectContaining({ standard: true, secure: true }) }),
    ]);
    expect(fake.electron.app.enableSandbox).toHaveBeenCalledOnce();
    expect(fake.electron.app.requestSingleInstanceLock).toHaveBeenCalledOnce();
    expect(fake.electron.protocol.handle).not.toHaveBeenCalled();
    await started;
  });

  it('quits at once when another instance holds the lock', () => {
    fake.electron.app.requestSingleInstanceLock.mockReturnValueOnce(false);
    expect(startMainProcess({ argv: [], env: {}, platform: 'linux' })).toBeNull();
    expect(fake.electron.app.quit).toHaveBeenCalledOnce();
  });

  it('denies all permissions, serves the app scheme, and opens a hardened window on our page', async () => {
    await start();
    const session = fake.electron.session.defaultSession;
    const callback = vi.fn();
    session.setPermissionRequestHandler.mock.calls[0]![0]({}, 'media', callback);
    expect(callback).toHaveBeenCalledWith(false);
    expect(session.setPermissionCheckHandler.mock.calls[0]![0]()).toBe(false);
    expect(fake.electron.protocol.handle).toHaveBeenCalledWith('hingeline-app', expect.any(Function));

    expect(fake.windows).toHaveLength(1);
    expect(window().options.webPreferences).toMatchObject({
      preload: '/app/out/preload/index.cjs',
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      webSecurity: true,
    });
    expect(window().loadURL).toHaveBeenCalledWith('hingeline-app://app/index.html');
    expect(fake.electron.Menu.setApplicationMenu).toHaveBeenCalled();
  });

  it('hardens every web contents that gets created', async () => {
    await start();
    const contents = new (await import('../fixtures/electron-fake.ts')).FakeWebContents();
    fake.electron.app.emit('web-contents-created', contents);
    expect(contents.emit('will-navigate', 'https://example.com/')).toBe(true);
    expect(contents.windowOpenHandler?.()).toEqual({ action: 'deny' });
  });

  it('registers a handler for every HostApi call, answering only our window', async () => {
    await start();
    expect([...fake.handlers.keys()].sort()).toEqual([...INVOKE_CHANNELS].sort());
    expect(await invoke(IpcChannel.recentFiles, fromPage())).toEqual([]);
    const otherContents = new (await import('../fixtures/electron-fake.ts')).FakeWebContents();
    await expect(invoke(IpcChannel.recentFiles, fromPage(otherContents))).rejects.toThrow(/Refused/);
    await expect(invoke(IpcChannel.recentFiles, { sender: window().webContents, senderFrame: { url: 'https://evil.example/', parent: null } })).rejects.toThrow(/Refused/);
  });

  it('loads the dev server only when unpackaged with a loopback ELECTRON_RENDERER_URL', async () => {
    await start(['/x/electron', '.'], { ELECTRON_RENDERER_URL: 'http://localhost:5173/' });
    expect(window().loadURL).toHaveBeenCalledWith('http://localhost:5173/');
    // …and adds our CSP (plus the dev server) to the dev server's responses.
    const onHeaders = fake.electron.session.defaultSession.webRequest.onHeadersReceived;
    const callback = vi.fn();
    onHeaders.mock.calls[0]![0]({ responseHeaders: { 'content-type': ['text/html'] } }, callback);
    const headers = callback.mock.calls[0]![0].responseHeaders as Record<string, string[]>;
    expect(headers['content-type']).toEqual(['text/html']);
    expect(headers['Content-Security-Policy']![0]).toContain("script-src 'self' http://localhost:5173");
  });

  it('adds no header rewriting in production (the app scheme sends the CSP itself)', async () => {
    await start();
    expect(fake.electron.session.defaultSession.webRequest.onHeadersReceived).not.toHaveBeenCalled();
  });
});

describe('files from outside and start-up commands', () => {
  it('opens a project given on the command line once the page listens for files', async () => {
    const project = join(userData, 'Beam B1.hingeline');
    await writeFile(project, '{"from":"argv"}');
    await start(['/x/electron', '.', project]);
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(window().webContents.send).not.toHaveBeenCalled();
    send(IpcChannel.listening, 'open-file');
    await vi.waitFor(() =>
      expect(window().webContents.send).toHaveBeenCalledWith(IpcChannel.openFile, { name: 'Beam B1.hingeline', path: project, text: '{"from":"argv"}' }),
    );
  });

  it('sends open-demo for --demo (npm start)', async () => {
    await start(['/x/electron', '.', '--demo']);
    send(IpcChannel.listening, 'menu-command');
    expect(window().webContents.send).toHaveBeenCalledWith(IpcChannel.menuCommand, 'open-demo');
  });

  it('opens the file a second instance was started with, and focuses the window', async () => {
    await start();
    send(IpcChannel.listening, 'open-file');
    const project = join(userData, 'second.hingeline');
    await writeFile(project, '{}');
    fake.electron.app.emit('second-instance', ['/opt/hingeline', '--some-switch', 'second.hingeline'], userData);
    expect(window().focus).toHaveBeenCalled();
    await vi.waitFor(() => expect(window().webContents.send).toHaveBeenCalledWith(IpcChannel.openFile, expect.objectContaining({ path: project })));
  });

  it('queues macOS open-file events that arrive before ready', async () => {
    const project = join(userData, 'finder.hingeline');
    await writeFile(project, '{}');
    const started = start([], {}, 'darwin');
    expect(fake.electron.app.emit('open-file', project)).toBe(true); // default prevented
    await started;
    send(IpcChannel.listening, 'open-file');
    await vi.waitFor(() => expect(window().webContents.send).toHaveBeenCalledWith(IpcChannel.openFile, expect.objectContaining({ path: project })));
  });

  it('shows an error box (not a crash) when a file from outside cannot be read', async () => {
    await start(['/x/electron', '.', join(userData, 'missing.hingeline')]);
    await vi.waitFor(() =>
      expect(fake.electron.dialog.showMessageBox).toHaveBeenCalledWith(window(), expect.objectContaining({ type: 'error', detail: expect.stringContaining('missing.hingeline') })),
    );
  });
});

describe('closing with unsaved changes', () => {
  it('closes without asking when the document is clean, and updates the title from the page', async () => {
    await start();
    send(IpcChannel.setDocumentState, { title: 'Beam B1', dirty: false });
    expect(window().setTitle).toHaveBeenCalledWith('Beam B1 — Hingeline');
    window().close();
    expect(fake.electron.dialog.showMessageBox).not.toHaveBeenCalled();
    expect(window().destroyed).toBe(true);
  });

  it("asks Save / Don't Save / Cancel; Don't Save closes", async () => {
    await start();
    send(IpcChannel.setDocumentState, { title: 'Beam B1', dirty: true });
    expect(window().setTitle).toHaveBeenLastCalledWith('• Beam B1 — Hingeline');
    fake.electron.dialog.showMessageBox.mockResolvedValueOnce({ response: 1 });
    window().close();
    expect(window().destroyed).toBe(false);
    expect(fake.electron.dialog.showMessageBox).toHaveBeenCalledWith(window(), expect.objectContaining({ buttons: ['Save', 'Don’t Save', 'Cancel'], cancelId: 2 }));
    await vi.waitFor(() => expect(window().destroyed).toBe(true));
  });

  it('Cancel keeps the window open', async () => {
    await start();
    send(IpcChannel.setDocumentState, { title: 'Beam B1', dirty: true });
    fake.electron.dialog.showMessageBox.mockResolvedValueOnce({ response: 2 });
    window().close();
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(window().destroyed).toBe(false);
  });

  it('Save makes the page save; the window closes once that save has been written', async () => {
    await start();
    send(IpcChannel.listening, 'menu-command');
    send(IpcChannel.setDocumentState, { title: 'Beam B1', dirty: true });
    fake.electron.dialog.showMessageBox.mockResolvedValueOnce({ response: 0 });
    window().close();
    await vi.waitFor(() => expect(window().webContents.send).toHaveBeenCalledWith(IpcChannel.menuCommand, 'save'));
    expect(window().destroyed).toBe(false);

    // The page reacts to "save" as usual: saveProject → save dialog → atomic write.
    const target = join(userData, 'Beam B1.hingeline');
    fake.electron.dialog.showSaveDialog.mockResolvedValueOnce({ canceled: false, filePath: target });
    await invoke(IpcChannel.saveProject, fromPage(), { text: '{}', options: { path: null, suggestedName: 'Beam B1', saveAs: false } });
    await vi.waitFor(() => expect(window().destroyed).toBe(true));
  });
});

describe('session bookkeeping', () => {
  it('marks the session open at start and removes the marker and autosave on a clean quit', async () => {
    await start();
    const autosaveFolder = join(userData, 'userData', 'autosave');
    expect(await readdir(autosaveFolder)).toEqual(['session-open.json']);
    await invoke(IpcChannel.autosave, fromPage(), { text: 'draft' });
    expect((await readdir(autosaveFolder)).sort()).toEqual(['autosave.json', 'session-open.json']);

    expect(fake.electron.app.emit('will-quit')).toBe(true); // held back until the files are gone
    await vi.waitFor(() => expect(fake.electron.app.quit).toHaveBeenCalled());
    expect(await readdir(autosaveFolder)).toEqual([]);
  });

  it('offers the autosave again after the renderer process crashed, and reloads the page', async () => {
    await start();
    await invoke(IpcChannel.autosave, fromPage(), { text: 'unsaved edits' });
    window().webContents.emit('render-process-gone', { reason: 'crashed' });
    await vi.waitFor(() => expect(window().webContents.reload).toHaveBeenCalled());
    expect(await invoke(IpcChannel.takeRecovery, fromPage())).toMatchObject({ text: 'unsaved edits' });
  });
});
