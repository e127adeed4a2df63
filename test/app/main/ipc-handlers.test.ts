import { mkdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { registerHostIpc, UNTRUSTED_SENDER, type IpcEventLike } from '../../../app/main/ipc-handlers.ts';
import { isTrustedSender } from '../../../app/main/security.ts';
import { INVOKE_CHANNELS, IpcChannel, SEND_CHANNELS } from '../../../app/shared/ipc-channels.ts';
import { createFakeIpc, type FakeIpc } from '../fixtures/fake-ipc.ts';
import { createServiceSetup, type ServiceSetup } from '../fixtures/host-service-setup.ts';

let setup: ServiceSetup;
let ipc: FakeIpc;
const onDocumentState = vi.fn();
const onListening = vi.fn();
const log = vi.fn();

beforeEach(async () => {
  setup = await createServiceSetup();
  await mkdir(join(setup.folder, 'Documents'));
  ipc = createFakeIpc();
  onDocumentState.mockClear();
  onListening.mockClear();
  log.mockClear();
  registerHostIpc(ipc.ipcMain, setup.service, {
    // As in main-process.ts: our window's web contents, and our page's top frame.
    isTrusted: (event: IpcEventLike) => event.sender === ipc.sender && isTrustedSender(event.senderFrame),
    onDocumentState,
    onListening,
    log,
  });
});
afterEach(async () => {
  await setup.dispose();
});

const invoke = (channel: string, ...args: unknown[]) => ipc.ipcRenderer.invoke(channel, ...args);

describe('registerHostIpc', () => {
  it('handles every invoke channel and listens on every send channel', () => {
    expect(ipc.handledChannels()).toEqual([...INVOKE_CHANNELS].sort());
    expect(ipc.listenedChannels()).toEqual([...SEND_CHANNELS].sort());
  });

  it('refuses every call from a frame that is not our page, before doing anything', async () => {
    for (const url of ['https://example.com/', 'file:///tmp/x.html', 'hingeline-app://other/']) {
      ipc.frame = { url, parent: null };
      for (const channel of INVOKE_CHANNELS) {
        await expect(invoke(channel), `${channel} from ${url}`).rejects.toThrow(UNTRUSTED_SENDER);
      }
    }
    ipc.frame = { url: 'hingeline-app://app/index.html', parent: { url: 'hingeline-app://app/' } };
    await expect(invoke(IpcChannel.recentFiles)).rejects.toThrow(UNTRUSTED_SENDER);
    ipc.frame = null;
    await expect(invoke(IpcChannel.recentFiles)).rejects.toThrow(UNTRUSTED_SENDER);
    expect(setup.dialogs.chooseProjectToOpen).not.toHaveBeenCalled();
    expect(log).toHaveBeenCalledWith(expect.stringContaining('refused'));
  });

  it('rejects malformed payloads with the validator message and never reaches the service', async () => {
    await expect(invoke(IpcChannel.saveProject, { text: 1, options: {} })).rejects.toThrow('Invalid request: save request.text must be a string, got the number 1');
    await expect(invoke(IpcChannel.exportFile, { data: 'x', options: { suggestedName: 'a', mime: 'text/html', openAfterwards: false } })).rejects.toThrow(/mime must be one of the exportable types/);
    await expect(invoke(IpcChannel.openRecent, { path: '../../etc/passwd' })).rejects.toThrow(/absolute path/);
    await expect(invoke(IpcChannel.autosave, 'text')).rejects.toThrow(/autosave request must be an object/);
    await expect(invoke(IpcChannel.openProject, 'unexpected')).rejects.toThrow(/takes no arguments/);
    expect(setup.dialogs.chooseProjectSavePath).not.toHaveBeenCalled();
    expect(setup.dialogs.chooseExportPath).not.toHaveBeenCalled();
  });

  it('passes user-facing HostError messages through and hides unexpected errors', async () => {
    await expect(invoke(IpcChannel.openRecent, { path: '/never/opened.hingeline' })).rejects.toThrow('That file is not in the list of recent projects.');
    setup.dialogs.chooseProjectToOpen.mockRejectedValueOnce(new Error('internal detail /secret/path'));
    const failure = invoke(IpcChannel.openProject);
    await expect(failure).rejects.toThrow('The desktop host failed unexpectedly; see the log for details.');
    await expect(failure).rejects.not.toThrow(/secret/);
    expect(log).toHaveBeenCalledWith(expect.stringContaining('internal detail'));
  });

  it('serves the CSV open dialog, which takes no arguments', async () => {
    await expect(invoke(IpcChannel.openCsv, 'unexpected')).rejects.toThrow(/takes no arguments/);
    const path = join(setup.folder, 'spans.csv');
    await writeFile(path, 'member,span [m],section\nCB-1,6,S');
    setup.csvAnswers.push(path);
    expect(await invoke(IpcChannel.openCsv)).toEqual({ name: 'spans.csv', path, text: 'member,span [m],section\nCB-1,6,S' });
  });

  it('serves a valid open and save end to end', async () => {
    const path = join(setup.folder, 'a.hingeline');
    await writeFile(path, '{"a":1}');
    setup.openAnswers.push(path);
    expect(await invoke(IpcChannel.openProject)).toEqual({ name: 'a.hingeline', path, text: '{"a":1}' });
    expect(await invoke(IpcChannel.saveProject, { text: '{"a":2}', options: { path, suggestedName: 'a', saveAs: false } })).toEqual({ name: 'a.hingeline', path });
    expect(await invoke(IpcChannel.recentFiles)).toEqual([path]);
  });

  it('applies valid document states from our page and ignores others', () => {
    ipc.ipcRenderer.send(IpcChannel.setDocumentState, { title: 'Beam B1', dirty: true });
    expect(onDocumentState).toHaveBeenCalledExactlyOnceWith({ title: 'Beam B1', dirty: true });
    ipc.ipcRenderer.send(IpcChannel.setDocumentState, { title: 'x', dirty: 'yes' });
    ipc.frame = { url: 'https://example.com/', parent: null };
    ipc.ipcRenderer.send(IpcChannel.setDocumentState, { title: 'Evil', dirty: false });
    expect(onDocumentState).toHaveBeenCalledTimes(1);
    expect(log).toHaveBeenCalledWith(expect.stringContaining('invalid document state'));
  });

  it('passes listening topics on, ignoring unknown ones', () => {
    ipc.ipcRenderer.send(IpcChannel.listening, 'open-file');
    ipc.ipcRenderer.send(IpcChannel.listening, 'everything');
    expect(onListening).toHaveBeenCalledExactlyOnceWith('open-file');
  });

  it('stores autosaves with the title from the last document state', async () => {
    ipc.ipcRenderer.send(IpcChannel.setDocumentState, { title: 'Girder G2', dirty: true });
    await invoke(IpcChannel.autosave, { text: 'draft' });
    await setup.recovery.setAsideAutosave();
    expect(await invoke(IpcChannel.takeRecovery)).toMatchObject({ text: 'draft', name: 'Girder G2' });
    await invoke(IpcChannel.clearRecovery);
    expect(await invoke(IpcChannel.takeRecovery)).toBeNull();
  });
});
