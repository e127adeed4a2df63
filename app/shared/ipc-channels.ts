/**
 * IPC channel names shared by app/main and app/preload. One name per HostApi call.
 * Node-free.
 *
 * - invoke channels: renderer → main request with a reply (`ipcRenderer.invoke` / `ipcMain.handle`);
 * - send channels: renderer → main, fire and forget (`ipcRenderer.send` / `ipcMain.on`);
 * - push channels: main → renderer (`webContents.send` / `ipcRenderer.on`).
 */
export const IpcChannel = {
  openProject: 'hingeline:open-project',
  openRecent: 'hingeline:open-recent',
  openCsv: 'hingeline:open-csv',
  recentFiles: 'hingeline:recent-files',
  saveProject: 'hingeline:save-project',
  exportFile: 'hingeline:export-file',
  autosave: 'hingeline:autosave',
  takeRecovery: 'hingeline:take-recovery',
  clearRecovery: 'hingeline:clear-recovery',
  setDocumentState: 'hingeline:set-document-state',
  listening: 'hingeline:listening',
  menuCommand: 'hingeline:menu-command',
  openFile: 'hingeline:open-file',
} as const;

export type IpcChannelName = (typeof IpcChannel)[keyof typeof IpcChannel];

export const INVOKE_CHANNELS = [
  IpcChannel.openProject,
  IpcChannel.openRecent,
  IpcChannel.openCsv,
  IpcChannel.recentFiles,
  IpcChannel.saveProject,
  IpcChannel.exportFile,
  IpcChannel.autosave,
  IpcChannel.takeRecovery,
  IpcChannel.clearRecovery,
] as const;

export const SEND_CHANNELS = [IpcChannel.setDocumentState, IpcChannel.listening] as const;

export const PUSH_CHANNELS = [IpcChannel.menuCommand, IpcChannel.openFile] as const;

/** What the renderer has started listening to; main holds pushes back until then. */
export type ListeningTopic = 'menu-command' | 'open-file';
