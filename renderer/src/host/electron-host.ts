/** HostApi on the Electron desktop: a thin wrapper over the preload bridge. */
import type { HostBridge } from './bridge-types.ts';
import type { HostApi } from './host-api.ts';

/**
 * Electron reports a failed `ipcRenderer.invoke` as
 * "Error invoking remote method 'channel': Error: message"; keep only the message, which the
 * host wrote for the user.
 */
export function userMessage(error: unknown): string {
  const text = error instanceof Error ? error.message : String(error);
  return text.replace(/^Error invoking remote method '[^']*': (?:[A-Za-z]*Error: )?/, '');
}

async function unwrap<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    throw new Error(userMessage(error), { cause: error });
  }
}

export function createElectronHost(bridge: HostBridge): HostApi {
  return {
    kind: 'electron',
    openProject: () => unwrap(() => bridge.openProject()),
    openRecent: (path) => unwrap(() => bridge.openRecent(path)),
    openCsv: () => unwrap(() => bridge.openCsv()),
    recentFiles: () => unwrap(() => bridge.recentFiles()),
    saveProject: (text, options) => unwrap(() => bridge.saveProject(text, options)),
    exportFile: (data, options) => unwrap(() => bridge.exportFile(data, options)),
    autosave: (text) => unwrap(() => bridge.autosave(text)),
    takeRecovery: () => unwrap(() => bridge.takeRecovery()),
    clearRecovery: () => unwrap(() => bridge.clearRecovery()),
    setDocumentState: (state) => bridge.setDocumentState(state),
    onMenuCommand: (listener) => bridge.onMenuCommand(listener),
    onOpenFile: (listener) => bridge.onOpenFile(listener),
  };
}
