import { Window as HappyWindow } from 'happy-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { MenuCommand } from '../../../renderer/src/host/host-api.ts';
import type { FileHandleLike, PickedFile, WebFileAccess } from '../../../renderer/src/host/web-files.ts';
import { createWebHost, documentTitle, menuCommandForKey, RECENT_KEY, SESSION_MARKER_KEY, type WebHost } from '../../../renderer/src/host/web-host.ts';
import { createMemoryStore } from '../../../renderer/src/host/web-storage.ts';

const windows: HappyWindow[] = [];
const hosts: WebHost[] = [];
afterEach(async () => {
  hosts.splice(0).forEach((host) => host.dispose());
  await Promise.all(windows.splice(0).map((window) => window.happyDOM.close()));
});

function browserWindow(url = 'http://127.0.0.1:4173/'): HappyWindow {
  const window = new HappyWindow({ url });
  windows.push(window);
  return window;
}

function fakeHandle(name: string): FileHandleLike & { written: Array<Blob | string> } {
  const written: Array<Blob | string> = [];
  return {
    name,
    written,
    getFile: async () => new File(['{"reopened":true}'], name),
    createWritable: async () => ({ write: async (data: Blob | string) => void written.push(data), close: async () => undefined }),
  };
}

type FakeFiles = { [K in keyof WebFileAccess]: WebFileAccess[K] & ReturnType<typeof vi.fn> };

function fakeFiles(overrides: Partial<WebFileAccess> = {}): FakeFiles {
  return {
    pickProject: vi.fn(async (): Promise<PickedFile | null> => null),
    reopen: vi.fn(async (handle: FileHandleLike): Promise<PickedFile | null> => ({ name: handle.name, text: '{"reopened":true}', handle })),
    saveText: vi.fn(async (_text: string, name: string, existing: FileHandleLike | null) => ({ name: existing?.name ?? name, handle: existing ?? fakeHandle(name) })),
    saveExport: vi.fn(async (_data: Uint8Array | string, name: string) => ({ name })),
    ...overrides,
  } as never;
}

function hostIn(window: HappyWindow, options: { store?: ReturnType<typeof createMemoryStore>; files?: FakeFiles } = {}) {
  const store = options.store ?? createMemoryStore();
  const files = options.files ?? fakeFiles();
  const host = createWebHost({
    window: window as unknown as Window,
    store,
    localStorage: window.localStorage as unknown as Storage,
    files,
    now: () => new Date('2026-04-05T06:07:08.000Z'),
  });
  hosts.push(host);
  return { host, store, files };
}

describe('menuCommandForKey', () => {
  const key = (keyName: string, modifiers: Partial<{ ctrlKey: boolean; metaKey: boolean; shiftKey: boolean; altKey: boolean }> = {}) => ({
    key: keyName,
    ctrlKey: false,
    metaKey: false,
    shiftKey: false,
    altKey: false,
    ...modifiers,
  });

  it('maps Ctrl/Cmd shortcuts to commands', () => {
    expect(menuCommandForKey(key('s', { ctrlKey: true }))).toBe('save');
    expect(menuCommandForKey(key('S', { metaKey: true, shiftKey: true }))).toBe('save-as');
    expect(menuCommandForKey(key('o', { ctrlKey: true }))).toBe('open');
    expect(menuCommandForKey(key('z', { ctrlKey: true }))).toBe('undo');
    expect(menuCommandForKey(key('Z', { metaKey: true, shiftKey: true }))).toBe('redo');
    expect(menuCommandForKey(key('y', { ctrlKey: true }))).toBe('redo');
    expect(menuCommandForKey(key('Enter', { ctrlKey: true }))).toBe('analyze');
  });

  it('opens the list of keyboard shortcuts with Ctrl+/', () => {
    expect(menuCommandForKey(key('/', { ctrlKey: true }))).toBe('shortcuts');
  });

  it('ignores keys without Ctrl/Cmd, with Alt, and unrelated letters', () => {
    expect(menuCommandForKey(key('s'))).toBeNull();
    expect(menuCommandForKey(key('s', { ctrlKey: true, altKey: true }))).toBeNull();
    expect(menuCommandForKey(key('p', { ctrlKey: true }))).toBeNull();
  });
});

describe('web host keyboard and page events', () => {
  it('takes Ctrl+Z inside a text field for the app (never the undo of the browser)', () => {
    const window = browserWindow();
    const { host } = hostIn(window);
    const received: MenuCommand[] = [];
    host.onMenuCommand((command) => received.push(command));
    const input = window.document.createElement('input');
    window.document.body.appendChild(input);
    const event = new window.KeyboardEvent('keydown', { key: 'z', ctrlKey: true, bubbles: true, cancelable: true });
    input.dispatchEvent(event);
    expect(received).toEqual(['undo']);
    expect(event.defaultPrevented).toBe(true);
  });

  it('turns Ctrl+S into the save command and stops the browser from saving the page', () => {
    const window = browserWindow();
    const { host } = hostIn(window);
    const received: MenuCommand[] = [];
    host.onMenuCommand((command) => received.push(command));
    const event = new window.KeyboardEvent('keydown', { key: 's', ctrlKey: true, bubbles: true, cancelable: true });
    window.document.body.dispatchEvent(event);
    expect(received).toEqual(['save']);
    expect(event.defaultPrevented).toBe(true);
  });

  it('does not swallow shortcuts while nobody listens, nor after dispose', () => {
    const window = browserWindow();
    const { host } = hostIn(window);
    const first = new window.KeyboardEvent('keydown', { key: 's', ctrlKey: true, bubbles: true, cancelable: true });
    window.document.body.dispatchEvent(first);
    expect(first.defaultPrevented).toBe(false);
    const listener = vi.fn();
    host.onMenuCommand(listener);
    host.dispose();
    window.document.body.dispatchEvent(new window.KeyboardEvent('keydown', { key: 's', ctrlKey: true, bubbles: true, cancelable: true }));
    expect(listener).not.toHaveBeenCalled();
  });

  it('warns before leaving only while there are unsaved changes, and shows them in the title', () => {
    const window = browserWindow();
    const { host } = hostIn(window);
    const leave = () => {
      const event = new window.Event('beforeunload', { cancelable: true });
      window.dispatchEvent(event);
      return event.defaultPrevented;
    };
    expect(leave()).toBe(false);
    host.setDocumentState({ title: 'Beam B1', dirty: true });
    expect(window.document.title).toBe('• Beam B1 — Hingeline');
    expect(leave()).toBe(true);
    host.setDocumentState({ title: 'Beam B1', dirty: false });
    expect(leave()).toBe(false);
    expect(documentTitle({ title: '', dirty: false })).toBe('Hingeline');
  });

  it('sends open-demo once for ?demo, to the first listener, even if it subscribes later', async () => {
    const window = browserWindow('http://127.0.0.1:4173/?demo');
    const { host } = hostIn(window);
    const first = vi.fn();
    host.onMenuCommand(first);
    const second = vi.fn();
    host.onMenuCommand(second);
    await Promise.resolve();
    expect(first).toHaveBeenCalledExactlyOnceWith('open-demo');
    expect(second).not.toHaveBeenCalled();
  });

  it('opens a project dropped on the page and keeps the browser from navigating to it', async () => {
    const window = browserWindow();
    const { host } = hostIn(window);
    const opened = vi.fn();
    host.onOpenFile(opened);
    const file = new File(['\uFEFF{"dropped":true}'], 'Beam B1.hingeline');
    const drop = new window.Event('drop', { cancelable: true });
    Object.defineProperty(drop, 'dataTransfer', { value: { types: ['Files'], files: [file] } });
    window.dispatchEvent(drop);
    expect(drop.defaultPrevented).toBe(true);
    await vi.waitFor(() => expect(opened).toHaveBeenCalledWith({ name: 'Beam B1.hingeline', path: null, text: '{"dropped":true}' }));

    const other = new window.Event('drop', { cancelable: true });
    Object.defineProperty(other, 'dataTransfer', { value: { types: ['Files'], files: [new File(['x'], 'photo.jpg')] } });
    window.dispatchEvent(other);
    expect(other.defaultPrevented).toBe(true);
    await new Promise((resolve) => setTimeout(resolve, 10));
    expect(opened).toHaveBeenCalledTimes(1);
  });
});

describe('web host autosave and recovery', () => {
  it('offers nothing on a first visit and marks the visit open', async () => {
    const window = browserWindow();
    const { host } = hostIn(window);
    await host.ready;
    expect(await host.takeRecovery()).toBeNull();
    expect(window.localStorage.getItem(SESSION_MARKER_KEY)).toBe('2026-04-05T06:07:08.000Z');
  });

  it('after a visit that ended abnormally, offers its last autosave until cleared', async () => {
    const store = createMemoryStore();
    const crashedWindow = browserWindow();
    const crashed = hostIn(crashedWindow, { store }).host;
    crashed.setDocumentState({ title: 'Beam B1', dirty: true });
    await crashed.autosave('{"draft":1}');
    await crashed.autosave('{"draft":2}');
    // The tab dies: no pagehide. The next visit shares storage (same origin).
    const nextWindow = browserWindow();
    nextWindow.localStorage.setItem(SESSION_MARKER_KEY, crashedWindow.localStorage.getItem(SESSION_MARKER_KEY)!);
    const next = hostIn(nextWindow, { store }).host;
    expect(await next.takeRecovery()).toEqual({ text: '{"draft":2}', savedAt: '2026-04-05T06:07:08.000Z', name: 'Beam B1' });
    expect(store.entries.has('autosave')).toBe(false);
    await next.clearRecovery();
    expect(await next.takeRecovery()).toBeNull();
  });

  it('a second crash before the first was answered keeps both copies, offered oldest first', async () => {
    const store = createMemoryStore();
    const firstWindow = browserWindow();
    const first = hostIn(firstWindow, { store }).host;
    first.setDocumentState({ title: 'Frame A', dirty: true });
    await first.autosave('work A');
    // Tab 1 dies. Visit 2 sets its work aside and shows the question; the user has not answered…
    const secondWindow = browserWindow();
    secondWindow.localStorage.setItem(SESSION_MARKER_KEY, firstWindow.localStorage.getItem(SESSION_MARKER_KEY)!);
    const second = hostIn(secondWindow, { store }).host;
    expect((await second.takeRecovery())?.text).toBe('work A');
    second.setDocumentState({ title: 'Frame B', dirty: true });
    await second.autosave('work B');
    // …and tab 2 dies too.
    const thirdWindow = browserWindow();
    thirdWindow.localStorage.setItem(SESSION_MARKER_KEY, secondWindow.localStorage.getItem(SESSION_MARKER_KEY)!);
    const third = hostIn(thirdWindow, { store }).host;
    expect(await third.takeRecovery()).toMatchObject({ text: 'work A', name: 'Frame A' });
    await third.clearRecovery();
    expect(await third.takeRecovery()).toMatchObject({ text: 'work B', name: 'Frame B' });
    await third.clearRecovery();
    expect(await third.takeRecovery()).toBeNull();
  });

  it('reads a recovery copy stored by an earlier version (one record, not a list)', async () => {
    const store = createMemoryStore();
    await store.set('recovered', { text: 'old', savedAt: '2026-01-01T00:00:00.000Z', name: 'Old' });
    const { host } = hostIn(browserWindow(), { store });
    expect((await host.takeRecovery())?.text).toBe('old');
    await host.clearRecovery();
    expect(await host.takeRecovery()).toBeNull();
  });

  it('leaving with everything saved ends the visit cleanly; leaving with unsaved changes does not', async () => {
    const window = browserWindow();
    const store = createMemoryStore();
    const { host } = hostIn(window, { store });
    await host.ready;
    await host.autosave('draft');
    window.dispatchEvent(new window.Event('pagehide'));
    expect(window.localStorage.getItem(SESSION_MARKER_KEY)).toBeNull();
    host.dispose(); // the page is gone; the next visit gets a new host

    const second = hostIn(window, { store }).host;
    expect(await second.takeRecovery()).toBeNull();
    second.setDocumentState({ title: 'x', dirty: true });
    await second.autosave('unsaved');
    window.dispatchEvent(new window.Event('pagehide'));
    expect(window.localStorage.getItem(SESSION_MARKER_KEY)).not.toBeNull();
    second.dispose();
    const third = hostIn(window, { store }).host;
    expect((await third.takeRecovery())?.text).toBe('unsaved');
  });
});

describe('web host files', () => {
  it('saves a new project under the suggested name with the project extension, then back to the same file', async () => {
    const window = browserWindow();
    const { host, files } = hostIn(window);
    const first = await host.saveProject('{"v":1}', { path: null, suggestedName: 'Beam B1', saveAs: false });
    expect(first?.name).toBe('Beam B1.hingeline');
    expect(first?.path).toMatch(/^web-handle:/);
    expect(files.saveText).toHaveBeenLastCalledWith('{"v":1}', 'Beam B1.hingeline', null);

    await host.saveProject('{"v":2}', { path: first!.path, suggestedName: 'Beam B1', saveAs: false });
    const handle = files.saveText.mock.calls[1]![2] as FileHandleLike;
    expect(handle?.name).toBe('Beam B1.hingeline');
    await host.saveProject('{"v":3}', { path: first!.path, suggestedName: 'Copy', saveAs: true });
    expect(files.saveText).toHaveBeenLastCalledWith('{"v":3}', 'Copy.hingeline', null);
  });

  it('returns null when a dialog is cancelled', async () => {
    const { host } = hostIn(browserWindow(), { files: fakeFiles({ saveText: vi.fn(async () => null) }) });
    expect(await host.saveProject('x', { path: null, suggestedName: 'x', saveAs: false })).toBeNull();
    expect(await host.openProject()).toBeNull();
  });

  it('remembers opened and saved names (newest first) and reopens them through their stored handle', async () => {
    const window = browserWindow();
    const handle = fakeHandle('Frame.hingeline');
    const files = fakeFiles({ pickProject: vi.fn(async () => ({ name: 'Frame.hingeline', text: '{"f":1}', handle })) });
    const store = createMemoryStore();
    const { host } = hostIn(window, { files, store });
    const opened = await host.openProject();
    expect(opened).toEqual({ name: 'Frame.hingeline', path: expect.stringMatching(/^web-handle:/), text: '{"f":1}' });
    await host.saveProject('x', { path: null, suggestedName: 'Other', saveAs: false });
    expect(await host.recentFiles()).toEqual(['Other.hingeline', 'Frame.hingeline']);
    expect(JSON.parse(window.localStorage.getItem(RECENT_KEY)!)).toEqual(['Other.hingeline', 'Frame.hingeline']);

    const later = hostIn(browserWindow(), { files, store }).host; // a later visit: handle from IndexedDB
    expect(await later.openRecent('Frame.hingeline')).toMatchObject({ name: 'Frame.hingeline', text: '{"reopened":true}' });
    expect(files.reopen).toHaveBeenCalledWith(handle);
    expect(await later.openRecent('Unknown.hingeline')).toBeNull();
  });

  it('exports with the extension of the MIME type and refuses unknown types', async () => {
    const { host, files } = hostIn(browserWindow());
    expect(await host.exportFile('a;b\n', { suggestedName: 'results', mime: 'text/csv', openAfterwards: false })).toEqual({ name: 'results.csv', path: null });
    expect(files.saveExport).toHaveBeenCalledWith('a;b\n', 'results.csv', 'text/csv');
    await expect(host.exportFile('x', { suggestedName: 'page', mime: 'text/html', openAfterwards: false })).rejects.toThrow('Files of type text/html cannot be exported.');
  });

  it('drops the autosave once the project is saved', async () => {
    const store = createMemoryStore();
    const { host } = hostIn(browserWindow(), { store });
    await host.autosave('draft');
    expect(store.entries.has('autosave')).toBe(true);
    await host.saveProject('draft', { path: null, suggestedName: 'a', saveAs: false });
    expect(store.entries.has('autosave')).toBe(false);
  });
});
