/**
 * Builds `window.hingelineHost` from an `ipcRenderer`-like object. Pure (no Electron import), so
 * tests exercise the exact object the preload exposes.
 *
 * Exposes only the HostApi calls, never `ipcRenderer` itself. Requests are validated before
 * they leave the page (main validates again); pushes from main are validated before they reach
 * page listeners, and the IPC event object is never handed to the page.
 */
import type { HingelineBridge, OpenedFilePayload } from '../shared/bridge.ts';
import { IpcChannel, type ListeningTopic } from '../shared/ipc-channels.ts';
import type { MenuCommand } from '../shared/menu-commands.ts';
import {
  validateAbsolutePath,
  validateAutosaveRequest,
  validateDocumentState,
  validateExportFileRequest,
  validateMenuCommand,
  validateOpenedFile,
  validateRecentList,
  validateRecovery,
  validateSavedFile,
  validateSaveProjectRequest,
  type Validation,
} from '../shared/validators.ts';

export interface IpcRendererLike {
  invoke(channel: string, ...args: unknown[]): Promise<unknown>;
  send(channel: string, ...args: unknown[]): void;
  on(channel: string, listener: (event: unknown, ...args: unknown[]) => void): unknown;
  removeListener(channel: string, listener: (event: unknown, ...args: unknown[]) => void): unknown;
}

function required<T>(validation: Validation<T>): T {
  if (!validation.ok) throw new TypeError(validation.error);
  return validation.value;
}

function nullable<T>(value: unknown, validate: (value: unknown) => Validation<T>): T | null {
  return value === null ? null : required(validate(value));
}

export function createBridge(ipc: IpcRendererLike): HingelineBridge {
  const announced = new Set<ListeningTopic>();

  function subscribe<T>(
    channel: string,
    topic: ListeningTopic,
    validate: (value: unknown) => Validation<T>,
    listener: (value: T) => void,
  ): () => void {
    if (typeof listener !== 'function') throw new TypeError('listener must be a function');
    const wrapped = (_event: unknown, payload: unknown): void => {
      const checked = validate(payload);
      if (checked.ok) listener(checked.value);
    };
    ipc.on(channel, wrapped);
    if (!announced.has(topic)) {
      announced.add(topic);
      ipc.send(IpcChannel.listening, topic);
    }
    let subscribed = true;
    return () => {
      if (!subscribed) return;
      subscribed = false;
      ipc.removeListener(channel, wrapped);
    };
  }

  return {
    async openProject() {
      return nullable(await ipc.invoke(IpcChannel.openProject), validateOpenedFile);
    },
    async openRecent(path) {
      const checkedPath = required(validateAbsolutePath(path, 'path'));
      return nullable(await ipc.invoke(IpcChannel.openRecent, { path: checkedPath }), validateOpenedFile);
    },
    async openCsv() {
      return nullable(await ipc.invoke(IpcChannel.openCsv), validateOpenedFile);
    },
    async recentFiles() {
      return required(validateRecentList(await ipc.invoke(IpcChannel.recentFiles)));
    },
    async saveProject(text, options) {
      const request = required(validateSaveProjectRequest({ text, options: { ...options } }));
      return nullable(await ipc.invoke(IpcChannel.saveProject, request), validateSavedFile);
    },
    async exportFile(data, options) {
      const request = required(validateExportFileRequest({ data, options: { ...options } }));
      return nullable(await ipc.invoke(IpcChannel.exportFile, request), validateSavedFile);
    },
    async autosave(text) {
      await ipc.invoke(IpcChannel.autosave, required(validateAutosaveRequest({ text })));
    },
    async takeRecovery() {
      return nullable(await ipc.invoke(IpcChannel.takeRecovery), validateRecovery);
    },
    async clearRecovery() {
      await ipc.invoke(IpcChannel.clearRecovery);
    },
    setDocumentState(state) {
      ipc.send(IpcChannel.setDocumentState, required(validateDocumentState({ ...state })));
    },
    onMenuCommand(listener: (command: MenuCommand) => void) {
      return subscribe(IpcChannel.menuCommand, 'menu-command', validateMenuCommand, listener);
    },
    onOpenFile(listener: (file: OpenedFilePayload) => void) {
      return subscribe(IpcChannel.openFile, 'open-file', validateOpenedFile, listener);
    },
  };
}
