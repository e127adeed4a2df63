import { Window as HappyWindow } from 'happy-dom';
import { describe, expect, it, vi } from 'vitest';
import type { HostBridge } from '../../../renderer/src/host/bridge-types.ts';
import { createElectronHost, userMessage } from '../../../renderer/src/host/electron-host.ts';
import { createFakeHost, createFakeHostFromGlobal, type FakeHostGlobal } from '../../../renderer/src/host/fake-host.ts';
import { getHost, selectHost, setHostForTesting } from '../../../renderer/src/host/index.ts';

describe('fake host', () => {
  it('answers dialogs from its queues and keeps saved files and exports', async () => {
    const host = createFakeHost({
      openQueue: [{ name: 'a.hingeline', path: '/p/a.hingeline', text: '{"a":1}' }, null],
      saveAsQueue: [null, '/p/copy.hingeline'],
    });
    expect(await host.openProject()).toEqual({ name: 'a.hingeline', path: '/p/a.hingeline', text: '{"a":1}' });
    expect(await host.openProject()).toBeNull();
    expect(await host.saveProject('{"a":2}', { path: '/p/a.hingeline', suggestedName: 'a', saveAs: false })).toEqual({ name: 'a.hingeline', path: '/p/a.hingeline' });
    expect(await host.saveProject('{"a":3}', { path: '/p/a.hingeline', suggestedName: 'a', saveAs: true })).toBeNull();
    expect(await host.saveProject('{"a":4}', { path: null, suggestedName: 'a', saveAs: false })).toEqual({ name: 'copy.hingeline', path: '/p/copy.hingeline' });
    expect(Object.fromEntries(host.files)).toEqual({ '/p/a.hingeline': '{"a":2}', '/p/copy.hingeline': '{"a":4}' });
    expect(await host.recentFiles()).toEqual(['/p/copy.hingeline', '/p/a.hingeline']);
    await host.exportFile(new Uint8Array(10), { suggestedName: 'r', mime: 'application/pdf', openAfterwards: true });
    expect(host.exports).toEqual([{ name: 'r.pdf', mime: 'application/pdf', openAfterwards: true, text: null, byteLength: 10 }]);
    expect(host.calls.map((call) => call.method)).toEqual(['openProject', 'openProject', 'saveProject', 'saveProject', 'saveProject', 'recentFiles', 'exportFile']);
    expect(host.calls.at(-1)?.args[0]).toBe('<10 bytes>');
  });

  it('delivers events sent before anyone listened, and can be told to fail', async () => {
    const host = createFakeHost({ failures: { saveProject: 'The disk is full.' } });
    host.emitMenuCommand('analyze');
    const listener = vi.fn();
    host.onMenuCommand(listener);
    await Promise.resolve();
    expect(listener).toHaveBeenCalledExactlyOnceWith('analyze');
    await expect(host.saveProject('x', { path: null, suggestedName: 'x', saveAs: false })).rejects.toThrow('The disk is full.');
  });

  it('exposes live views and controls on the end-to-end global', async () => {
    const global: FakeHostGlobal = { kind: 'electron', recovery: { text: '{}', savedAt: '2026-01-01T00:00:00Z', name: 'Beam' } };
    const host = createFakeHostFromGlobal(global);
    expect(host.kind).toBe('electron');
    const commands: string[] = [];
    host.onMenuCommand((command) => commands.push(command));
    global.emitMenuCommand?.('save');
    expect(commands).toEqual(['save']);
    await host.saveProject('{"x":1}', { path: null, suggestedName: 'Beam', saveAs: false });
    expect(global.savedFiles).toEqual({ '/fake/Beam.hingeline': '{"x":1}' });
    host.setDocumentState({ title: 'Beam', dirty: true });
    expect(global.documentState).toEqual({ title: 'Beam', dirty: true });
    expect(global.calls?.map((call) => call.method)).toEqual(['saveProject', 'setDocumentState']);
    expect(await host.takeRecovery()).toMatchObject({ name: 'Beam' });
  });
});

describe('electron host', () => {
  it('strips the IPC wrapper from error messages', () => {
    expect(userMessage(new Error("Error invoking remote method 'hingeline:open-recent': Error: That file is not in the list of recent projects."))).toBe('That file is not in the list of recent projects.');
    expect(userMessage(new Error("Error invoking remote method 'x': TypeError: bad"))).toBe('bad');
    expect(userMessage(new Error('plain'))).toBe('plain');
    expect(userMessage('text')).toBe('text');
  });

  it('forwards every call to the bridge and keeps the original error as cause', async () => {
    const original = new Error("Error invoking remote method 'hingeline:save-project': Error: The disk is full.");
    const bridge = {
      saveProject: vi.fn(async () => {
        throw original;
      }),
      setDocumentState: vi.fn(),
    } as unknown as HostBridge;
    const host = createElectronHost(bridge);
    const failure = await host.saveProject('x', { path: null, suggestedName: 'x', saveAs: false }).catch((error: Error) => error);
    expect(failure).toBeInstanceOf(Error);
    expect((failure as Error).message).toBe('The disk is full.');
    expect((failure as Error).cause).toBe(original);
    host.setDocumentState({ title: 't', dirty: false });
    expect(bridge.setDocumentState).toHaveBeenCalledWith({ title: 't', dirty: false });
  });
});

describe('getHost / selectHost', () => {
  it('prefers a test seed, then the preload bridge, then the browser', async () => {
    expect(selectHost({ hingelineTestHost: { kind: 'electron' }, hingelineHost: {} } as unknown as Window).kind).toBe('electron');
    const fromBridge = selectHost({ hingelineHost: { recentFiles: async () => ['/a.hingeline'] } } as unknown as Window);
    expect(fromBridge.kind).toBe('electron');
    expect(await fromBridge.recentFiles()).toEqual(['/a.hingeline']);
    const window = new HappyWindow({ url: 'http://127.0.0.1:4173/' });
    try {
      const web = selectHost(window as unknown as Window);
      expect(web.kind).toBe('web');
      (web as { dispose?: () => void }).dispose?.();
    } finally {
      await window.happyDOM.close();
    }
  });

  it('returns the host set for testing', () => {
    const fake = createFakeHost();
    setHostForTesting(fake);
    expect(getHost()).toBe(fake);
    setHostForTesting(null);
  });
});
