import { mkdir, readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { registerHostIpc } from '../../../app/main/ipc-handlers.ts';
import { isTrustedSender } from '../../../app/main/security.ts';
import { createBridge } from '../../../app/preload/bridge.ts';
import { IpcChannel } from '../../../app/shared/ipc-channels.ts';
import { createElectronHost } from '../../../renderer/src/host/electron-host.ts';
import { createFakeIpc, type FakeIpc } from '../fixtures/fake-ipc.ts';
import { createServiceSetup, type ServiceSetup } from '../fixtures/host-service-setup.ts';

describe('createBridge on its own', () => {
  let ipc: FakeIpc;
  beforeEach(() => {
    ipc = createFakeIpc();
  });

  it('exposes exactly the HostApi calls and nothing of ipcRenderer', () => {
    const bridge = createBridge(ipc.ipcRenderer);
    expect(Object.keys(bridge).sort()).toEqual(
      ['autosave', 'clearRecovery', 'exportFile', 'onMenuCommand', 'onOpenFile', 'openCsv', 'openProject', 'openRecent', 'recentFiles', 'saveProject', 'setDocumentState', 'takeRecovery'].sort(),
    );
    expect(Object.values(bridge).every((value) => typeof value === 'function')).toBe(true);
  });

  it('validates requests in the page before they are sent', async () => {
    const invoke = vi.spyOn(ipc.ipcRenderer, 'invoke');
    const bridge = createBridge(ipc.ipcRenderer);
    await expect(bridge.saveProject(42 as unknown as string, { path: null, suggestedName: 'a', saveAs: false })).rejects.toThrow(TypeError);
    await expect(bridge.openRecent('relative/path')).rejects.toThrow(/absolute path/);
    await expect(bridge.exportFile('x', { suggestedName: 'a', mime: 'application/x-sh', openAfterwards: true })).rejects.toThrow(/exportable types/);
    expect(() => bridge.setDocumentState({ title: 'a'.repeat(301), dirty: false })).toThrow(/limit is 300/);
    expect(invoke).not.toHaveBeenCalled();
  });

  it('announces each topic once, filters invalid pushes, hides the IPC event and unsubscribes', () => {
    const bridge = createBridge(ipc.ipcRenderer);
    const commands: unknown[][] = [];
    const stop = bridge.onMenuCommand((...args: unknown[]) => commands.push(args));
    bridge.onMenuCommand(() => undefined);
    expect(ipc.sent.filter((message) => message.channel === IpcChannel.listening)).toEqual([{ channel: IpcChannel.listening, args: ['menu-command'] }]);

    ipc.push(IpcChannel.menuCommand, 'save');
    ipc.push(IpcChannel.menuCommand, 'format-disk');
    expect(commands).toEqual([['save']]); // only the command: the event object never reaches the page
    stop();
    stop();
    ipc.push(IpcChannel.menuCommand, 'undo');
    expect(commands).toHaveLength(1);
    expect(ipc.rendererListenerCount(IpcChannel.menuCommand)).toBe(1);
    expect(() => bridge.onOpenFile('not a function' as never)).toThrow(TypeError);
  });

  it('rejects malformed replies from main instead of passing them to the page', async () => {
    const bridge = createBridge({ ...ipc.ipcRenderer, invoke: async () => ({ name: 'a', path: 'relative', text: '' }) });
    await expect(bridge.openProject()).rejects.toThrow(/opened file\.path must be an absolute path/);
  });
});

describe('renderer ⇄ preload ⇄ main round trip (electron-host → bridge → IPC → handlers → service)', () => {
  let setup: ServiceSetup;
  let ipc: FakeIpc;
  beforeEach(async () => {
    setup = await createServiceSetup();
    await mkdir(join(setup.folder, 'Documents'));
    ipc = createFakeIpc();
    registerHostIpc(ipc.ipcMain, setup.service, {
      isTrusted: (event) => event.sender === ipc.sender && isTrustedSender(event.senderFrame),
      onDocumentState: () => undefined,
      onListening: () => undefined,
    });
  });
  afterEach(async () => {
    await setup.dispose();
  });

  it('opens, saves, exports and recovers through the public HostApi', async () => {
    const host = createElectronHost(createBridge(ipc.ipcRenderer));
    expect(host.kind).toBe('electron');

    const path = join(setup.folder, 'Beam B1.hingeline');
    await writeFile(path, '{"v":1}');
    setup.openAnswers.push(path);
    const opened = await host.openProject();
    expect(opened).toEqual({ name: 'Beam B1.hingeline', path, text: '{"v":1}' });

    expect(await host.saveProject('{"v":2}', { path: opened!.path, suggestedName: 'Beam B1', saveAs: false })).toEqual({ name: 'Beam B1.hingeline', path });
    expect(await readFile(path, 'utf8')).toBe('{"v":2}');
    expect(await readFile(`${path}.bak`, 'utf8')).toBe('{"v":1}');

    const csv = join(setup.folder, 'results.csv');
    setup.exportAnswers.push(csv);
    expect(await host.exportFile(new TextEncoder().encode('x;y\n'), { suggestedName: 'results', mime: 'text/csv', openAfterwards: false })).toEqual({ name: 'results.csv', path: csv });
    expect(await readFile(csv, 'utf8')).toBe('x;y\n');

    expect(await host.recentFiles()).toEqual([path]);
    host.setDocumentState({ title: 'Beam B1', dirty: true });
    await host.autosave('{"v":3}');
    await setup.recovery.setAsideAutosave();
    expect(await host.takeRecovery()).toMatchObject({ text: '{"v":3}', name: 'Beam B1' });
  });

  it('turns main-side refusals into plain messages for the user', async () => {
    const host = createElectronHost(createBridge(ipc.ipcRenderer));
    await expect(host.openRecent('/not/recent.hingeline')).rejects.toThrow(/^That file is not in the list of recent projects\.$/);
  });
});
