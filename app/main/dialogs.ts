/**
 * Native dialogs. The only place besides main-process.ts that calls Electron's `dialog`.
 */
import { dialog, type BrowserWindow, type MessageBoxOptions, type OpenDialogOptions, type SaveDialogOptions } from 'electron';
import { aboutDetail, type AboutVersions } from '../shared/about.ts';
import { PROJECT_OPEN_EXTENSIONS } from '../shared/file-types.ts';
import type { CloseAnswer } from './close-guard.ts';
import type { HostDialogs } from './host-service.ts';

type WindowGetter = () => BrowserWindow | null;

async function showOpen(window: BrowserWindow | null, options: OpenDialogOptions): Promise<string | null> {
  const result = window ? await dialog.showOpenDialog(window, options) : await dialog.showOpenDialog(options);
  return result.canceled ? null : (result.filePaths[0] ?? null);
}

async function showSave(window: BrowserWindow | null, options: SaveDialogOptions): Promise<string | null> {
  const result = window ? await dialog.showSaveDialog(window, options) : await dialog.showSaveDialog(options);
  return result.canceled || !result.filePath ? null : result.filePath;
}

async function showMessage(window: BrowserWindow | null, options: MessageBoxOptions): Promise<number> {
  const result = window ? await dialog.showMessageBox(window, options) : await dialog.showMessageBox(options);
  return result.response;
}

/** HostDialogs backed by Electron's native file dialogs, attached to the main window. */
export function createElectronDialogs(getWindow: WindowGetter): HostDialogs {
  return {
    chooseProjectToOpen: (defaultFolder) =>
      showOpen(getWindow(), {
        title: 'Open project',
        defaultPath: defaultFolder,
        properties: ['openFile'],
        filters: [
          { name: 'Hingeline projects', extensions: [...PROJECT_OPEN_EXTENSIONS] },
          { name: 'All files', extensions: ['*'] },
        ],
      }),
    chooseCsvToOpen: (defaultFolder) =>
      showOpen(getWindow(), {
        title: 'Import members from CSV',
        defaultPath: defaultFolder,
        properties: ['openFile'],
        filters: [
          { name: 'CSV files', extensions: ['csv', 'txt'] },
          { name: 'All files', extensions: ['*'] },
        ],
      }),
    chooseProjectSavePath: (defaultPath) =>
      showSave(getWindow(), {
        title: 'Save project',
        defaultPath,
        filters: [{ name: 'Hingeline project', extensions: ['hingeline'] }],
        properties: ['createDirectory', 'showOverwriteConfirmation'],
      }),
    chooseExportPath: (defaultPath, type) =>
      showSave(getWindow(), {
        title: `Export ${type.label}`,
        defaultPath,
        filters: [{ name: type.label, extensions: [type.extension.slice(1)] }],
        properties: ['createDirectory', 'showOverwriteConfirmation'],
      }),
  };
}

/** Save / Don't Save / Cancel before closing a document with unsaved changes. */
export async function askAboutUnsavedChanges(window: BrowserWindow | null, title: string): Promise<CloseAnswer> {
  const response = await showMessage(window, {
    type: 'warning',
    title: 'Unsaved changes',
    message: `Save the changes to “${title || 'Untitled'}” before closing?`,
    detail: 'Changes that are not saved will be lost.',
    buttons: ['Save', 'Don’t Save', 'Cancel'],
    defaultId: 0,
    cancelId: 2,
    noLink: true,
  });
  return response === 0 ? 'save' : response === 1 ? 'discard' : 'cancel';
}

/** The About box: version and the caution that results need review by a qualified engineer. */
export async function showAbout(window: BrowserWindow | null, versions: AboutVersions): Promise<void> {
  await showMessage(window, {
    type: 'info',
    title: 'About Hingeline',
    message: `Hingeline ${versions.app}`,
    detail: aboutDetail(versions),
    buttons: ['OK'],
    noLink: true,
  });
}

/** A problem the user should know about (e.g. a file from the command line that cannot be read). */
export async function showProblem(window: BrowserWindow | null, message: string, detail: string): Promise<void> {
  await showMessage(window, { type: 'error', title: 'Hingeline', message, detail, buttons: ['OK'], noLink: true });
}
