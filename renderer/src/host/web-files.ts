/**
 * Reading and writing files in a browser. Uses the File System Access API where the browser has
 * it (Chromium: real open/save dialogs, saving back to the same file), and falls back to an
 * <input type=file> picker and a download link elsewhere.
 */
import { EXPORT_EXTENSIONS, PROJECT_EXTENSION } from './host-api.ts';

/** Largest project the browser host reads, in bytes (same limit as the desktop). */
export const MAX_PROJECT_BYTES = 64 * 1024 * 1024;

/** The parts of a FileSystemFileHandle we use (not all of it is in TypeScript's DOM types). */
export interface FileHandleLike {
  readonly kind?: string;
  readonly name: string;
  getFile(): Promise<File>;
  createWritable(): Promise<{ write(data: Blob | string): Promise<void>; close(): Promise<void> }>;
  queryPermission?(descriptor: { mode: 'read' | 'readwrite' }): Promise<PermissionState>;
  requestPermission?(descriptor: { mode: 'read' | 'readwrite' }): Promise<PermissionState>;
}

export interface PickedFile {
  readonly name: string;
  readonly text: string;
  /** Present when the browser lets us save back to this file. */
  readonly handle: FileHandleLike | null;
}

export interface WebFileAccess {
  /** Lets the user pick a project; null when cancelled. */
  pickProject(): Promise<PickedFile | null>;
  /** Reads a file we were given a handle for earlier (asks for permission again if needed); null if refused. */
  reopen(handle: FileHandleLike): Promise<PickedFile | null>;
  /** Writes to `existing` when given, else asks where (or downloads); null when cancelled. */
  saveText(text: string, suggestedName: string, existing: FileHandleLike | null): Promise<{ name: string; handle: FileHandleLike | null } | null>;
  /** Saves an exported file (dialog or download); null when cancelled. */
  saveExport(data: Uint8Array | string, suggestedName: string, mime: string): Promise<{ name: string } | null>;
}

interface PickerType {
  description: string;
  accept: Record<string, string[]>;
}

interface FileSystemAccessWindow {
  showOpenFilePicker?(options: { types: PickerType[]; multiple: boolean; excludeAcceptAllOption: boolean }): Promise<FileHandleLike[]>;
  showSaveFilePicker?(options: { suggestedName: string; types: PickerType[]; excludeAcceptAllOption: boolean }): Promise<FileHandleLike>;
}

const PROJECT_PICKER_TYPE: PickerType = { description: 'Hingeline project', accept: { 'application/json': [PROJECT_EXTENSION, '.json'] } };

function isAbort(error: unknown): boolean {
  return error instanceof DOMException && error.name === 'AbortError';
}

/** Reads a picked File as project text; rejects files over the size limit. */
export async function readProjectFile(file: File): Promise<string> {
  if (file.size > MAX_PROJECT_BYTES) {
    throw new Error(`“${file.name}” is ${Math.round(file.size / 1024 / 1024)} MB; project files larger than 64 MB are refused.`);
  }
  const text = await file.text();
  return text.startsWith('\uFEFF') ? text.slice(1) : text;
}

function toBlob(data: Uint8Array | string, mime: string): Blob {
  // Copy into a fresh ArrayBuffer-backed array: the Blob constructor rejects shared buffers.
  return new Blob([typeof data === 'string' ? data : new Uint8Array(data)], { type: mime });
}

/** Offers `data` as a download named `name` through a temporary object URL. */
export function downloadFile(window: Window, data: Uint8Array | string, name: string, mime: string): void {
  const url = URL.createObjectURL(toBlob(data, mime));
  const link = window.document.createElement('a');
  link.href = url;
  link.download = name;
  link.rel = 'noopener';
  link.style.display = 'none';
  window.document.body.appendChild(link);
  link.click();
  link.remove();
  // Give the browser time to start the download before the URL goes away.
  window.setTimeout(() => URL.revokeObjectURL(url), 60_000);
}

function pickWithInput(window: Window, accept: string): Promise<File | null> {
  return new Promise((resolve) => {
    const input = window.document.createElement('input');
    input.type = 'file';
    input.accept = accept;
    input.style.display = 'none';
    const finish = (file: File | null): void => {
      input.remove();
      resolve(file);
    };
    input.addEventListener('change', () => finish(input.files?.[0] ?? null), { once: true });
    input.addEventListener('cancel', () => finish(null), { once: true });
    window.document.body.appendChild(input);
    input.click();
  });
}

/**
 * Lets the user pick a CSV file through an <input type=file> (no write access is needed, so no file
 * handle is asked for); its text without byte-order mark, or null when cancelled. Rejects a file over
 * the project size limit.
 */
export async function pickCsvFile(window: Window): Promise<{ name: string; text: string } | null> {
  const file = await pickWithInput(window, '.csv,.txt,text/csv,text/plain');
  return file ? { name: file.name, text: await readProjectFile(file) } : null;
}

async function hasPermission(handle: FileHandleLike, mode: 'read' | 'readwrite'): Promise<boolean> {
  if (!handle.queryPermission || !handle.requestPermission) return true;
  if ((await handle.queryPermission({ mode })) === 'granted') return true;
  return (await handle.requestPermission({ mode })) === 'granted';
}

async function writeHandle(handle: FileHandleLike, data: Blob | string): Promise<void> {
  // Chromium writes to a swap file and swaps it in on close(): the old file survives a crash.
  const writable = await handle.createWritable();
  await writable.write(data);
  await writable.close();
}

/** WebFileAccess for a real browser window. */
export function createBrowserFileAccess(window: Window): WebFileAccess {
  const fsa = window as unknown as FileSystemAccessWindow;
  return {
    async pickProject() {
      if (fsa.showOpenFilePicker) {
        let handles: FileHandleLike[];
        try {
          handles = await fsa.showOpenFilePicker({ types: [PROJECT_PICKER_TYPE], multiple: false, excludeAcceptAllOption: false });
        } catch (error) {
          if (isAbort(error)) return null;
          throw error;
        }
        const handle = handles[0];
        if (!handle) return null;
        const file = await handle.getFile();
        return { name: file.name, text: await readProjectFile(file), handle };
      }
      const file = await pickWithInput(window, `${PROJECT_EXTENSION},.json,application/json`);
      return file ? { name: file.name, text: await readProjectFile(file), handle: null } : null;
    },
    async reopen(handle) {
      if (!(await hasPermission(handle, 'read'))) return null;
      const file = await handle.getFile();
      return { name: file.name, text: await readProjectFile(file), handle };
    },
    async saveText(text, suggestedName, existing) {
      if (existing && (await hasPermission(existing, 'readwrite'))) {
        await writeHandle(existing, text);
        return { name: existing.name, handle: existing };
      }
      if (fsa.showSaveFilePicker) {
        let handle: FileHandleLike;
        try {
          handle = await fsa.showSaveFilePicker({ suggestedName, types: [PROJECT_PICKER_TYPE], excludeAcceptAllOption: false });
        } catch (error) {
          if (isAbort(error)) return null;
          throw error;
        }
        await writeHandle(handle, text);
        return { name: handle.name, handle };
      }
      downloadFile(window, text, suggestedName, 'application/json');
      return { name: suggestedName, handle: null };
    },
    async saveExport(data, suggestedName, mime) {
      const extension = EXPORT_EXTENSIONS[mime] ?? '';
      if (fsa.showSaveFilePicker) {
        let handle: FileHandleLike;
        try {
          handle = await fsa.showSaveFilePicker({
            suggestedName,
            types: [{ description: extension.slice(1).toUpperCase() || 'File', accept: { [mime]: [extension] } }],
            excludeAcceptAllOption: false,
          });
        } catch (error) {
          if (isAbort(error)) return null;
          throw error;
        }
        await writeHandle(handle, toBlob(data, mime));
        return { name: handle.name };
      }
      downloadFile(window, data, suggestedName, mime);
      return { name: suggestedName };
    },
  };
}
