/**
 * Registers one IPC handler per HostApi call. Every handler first checks the sender (top frame
 * of our own page, in our window) and then validates the payload with the shared validators;
 * anything else is refused before the service sees it. No Electron runtime import: the
 * `ipcMain`-like object is injected, so tests drive the handlers directly.
 */
import type { DocumentStatePayload } from '../shared/bridge.ts';
import { IpcChannel, type ListeningTopic } from '../shared/ipc-channels.ts';
import {
  validateAutosaveRequest,
  validateDocumentState,
  validateExportFileRequest,
  validateListeningTopic,
  validateOpenRecentRequest,
  validateSaveProjectRequest,
  type Validation,
} from '../shared/validators.ts';
import { HostError, type HostService } from './host-service.ts';

/** The parts of an IPC event the checks read (Electron's IpcMainEvent / IpcMainInvokeEvent). */
export interface IpcEventLike {
  readonly sender: unknown;
  readonly senderFrame: { readonly url: string; readonly parent: unknown; readonly detached?: boolean } | null;
}

export interface IpcMainLike {
  handle(channel: string, listener: (event: IpcEventLike, ...args: unknown[]) => unknown): void;
  on(channel: string, listener: (event: IpcEventLike, ...args: unknown[]) => void): void;
}

export interface HostIpcOptions {
  /** True when the event comes from our page's top frame in our window. */
  readonly isTrusted: (event: IpcEventLike) => boolean;
  readonly onDocumentState: (state: DocumentStatePayload) => void;
  readonly onListening: (topic: ListeningTopic) => void;
  readonly log?: (message: string) => void;
}

/** Error text sent to an untrusted sender. */
export const UNTRUSTED_SENDER = 'Refused: the request did not come from the Hingeline window.';

function checked<T>(validation: Validation<T>): T {
  if (!validation.ok) throw new HostError(`Invalid request: ${validation.error}`);
  return validation.value;
}

/**
 * Errors thrown by a handler reach the renderer as
 * "Error invoking remote method '<channel>': Error: <message>". HostErrors keep their message;
 * anything unexpected is logged and replaced by a generic text (no paths or stacks leak).
 */
function guard<T>(channel: string, options: HostIpcOptions, work: (args: unknown[]) => Promise<T> | T) {
  return async (event: IpcEventLike, ...args: unknown[]): Promise<T> => {
    if (!options.isTrusted(event)) {
      options.log?.(`ipc: refused ${channel} from ${event.senderFrame?.url ?? 'an unknown frame'}`);
      throw new Error(UNTRUSTED_SENDER);
    }
    try {
      return await work(args);
    } catch (error) {
      if (error instanceof HostError) throw new Error(error.message);
      options.log?.(`ipc: ${channel} failed: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
      throw new Error('The desktop host failed unexpectedly; see the log for details.');
    }
  };
}

function noArguments(args: unknown[], channel: string): void {
  if (args.length > 0) throw new HostError(`Invalid request: ${channel} takes no arguments`);
}

export function registerHostIpc(ipcMain: IpcMainLike, service: HostService, options: HostIpcOptions): void {
  ipcMain.handle(IpcChannel.openProject, guard(IpcChannel.openProject, options, (args) => {
    noArguments(args, IpcChannel.openProject);
    return service.openProject();
  }));
  ipcMain.handle(IpcChannel.openRecent, guard(IpcChannel.openRecent, options, (args) => {
    const { path } = checked(validateOpenRecentRequest(args[0]));
    return service.openRecent(path);
  }));
  ipcMain.handle(IpcChannel.openCsv, guard(IpcChannel.openCsv, options, (args) => {
    noArguments(args, IpcChannel.openCsv);
    return service.openCsv();
  }));
  ipcMain.handle(IpcChannel.recentFiles, guard(IpcChannel.recentFiles, options, (args) => {
    noArguments(args, IpcChannel.recentFiles);
    return service.recentFiles();
  }));
  ipcMain.handle(IpcChannel.saveProject, guard(IpcChannel.saveProject, options, (args) => {
    return service.saveProject(checked(validateSaveProjectRequest(args[0])));
  }));
  ipcMain.handle(IpcChannel.exportFile, guard(IpcChannel.exportFile, options, (args) => {
    return service.exportFile(checked(validateExportFileRequest(args[0])));
  }));
  ipcMain.handle(IpcChannel.autosave, guard(IpcChannel.autosave, options, async (args) => {
    const { text } = checked(validateAutosaveRequest(args[0]));
    await service.autosave(text);
  }));
  ipcMain.handle(IpcChannel.takeRecovery, guard(IpcChannel.takeRecovery, options, (args) => {
    noArguments(args, IpcChannel.takeRecovery);
    return service.takeRecovery();
  }));
  ipcMain.handle(IpcChannel.clearRecovery, guard(IpcChannel.clearRecovery, options, async (args) => {
    noArguments(args, IpcChannel.clearRecovery);
    await service.clearRecovery();
  }));

  ipcMain.on(IpcChannel.setDocumentState, (event, payload) => {
    if (!options.isTrusted(event)) return options.log?.(`ipc: ignored ${IpcChannel.setDocumentState} from an untrusted frame`);
    const state = validateDocumentState(payload);
    if (!state.ok) return options.log?.(`ipc: ignored invalid document state: ${state.error}`);
    service.setDocumentTitle(state.value.title);
    options.onDocumentState(state.value);
  });
  ipcMain.on(IpcChannel.listening, (event, payload) => {
    if (!options.isTrusted(event)) return options.log?.(`ipc: ignored ${IpcChannel.listening} from an untrusted frame`);
    const topic = validateListeningTopic(payload);
    if (!topic.ok) return options.log?.(`ipc: ignored invalid listening topic: ${topic.error}`);
    options.onListening(topic.value);
  });
}
