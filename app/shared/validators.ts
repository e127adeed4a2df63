/**
 * Validators for every payload that crosses IPC. Node-free, no dependencies, so the sandboxed
 * preload can bundle them. The preload checks what the renderer sends before it leaves the page;
 * app/main checks again, because main must never trust a renderer.
 *
 * Each validator returns `{ ok: true, value }` with a fresh, exact copy (unknown keys are
 * rejected, not copied), or `{ ok: false, error }` naming the field and what was wrong.
 */
import type {
  DocumentStatePayload,
  ExportFileRequest,
  OpenedFilePayload,
  RecoveryPayload,
  SavedFilePayload,
  SaveProjectRequest,
} from './bridge.ts';
import type { ListeningTopic } from './ipc-channels.ts';
import { exportTypeFor } from './file-types.ts';
import { isMenuCommand, type MenuCommand } from './menu-commands.ts';

export type Validation<T> = { readonly ok: true; readonly value: T } | { readonly ok: false; readonly error: string };

/** Size limits for IPC payloads. Project files are normally a few hundred kB. */
export const IPC_LIMITS = {
  /** Project JSON text, in UTF-16 code units. */
  projectTextChars: 32 * 1024 * 1024,
  /** Exported file (PDF report, CSV), in bytes (or UTF-16 code units for text). */
  exportBytes: 256 * 1024 * 1024,
  fileNameChars: 255,
  pathChars: 4096,
  titleChars: 300,
} as const;

const ok = <T>(value: T): Validation<T> => ({ ok: true, value });
const fail = <T>(error: string): Validation<T> => ({ ok: false, error });

function describe(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'an array';
  if (typeof value === 'string') return `a string of ${value.length} characters`;
  if (typeof value === 'number') return Number.isFinite(value) ? `the number ${value}` : String(value);
  return typeof value === 'object' ? 'an object' : `a ${typeof value}`;
}

function isPlainObject(value: unknown): value is Record<string, unknown> {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return false;
  const prototype = Object.getPrototypeOf(value) as unknown;
  return prototype === Object.prototype || prototype === null;
}

/** Checks that `value` is a plain object with exactly `keys` (no others, none missing). */
function exactObject(value: unknown, keys: readonly string[], field: string): Validation<Record<string, unknown>> {
  if (!isPlainObject(value)) return fail(`${field} must be an object, got ${describe(value)}`);
  const extra = Object.keys(value).filter((key) => !keys.includes(key));
  if (extra.length > 0) return fail(`${field} has unexpected field(s): ${extra.slice(0, 5).join(', ')}`);
  const missing = keys.filter((key) => !(key in value));
  if (missing.length > 0) return fail(`${field} is missing field(s): ${missing.join(', ')}`);
  return ok(value);
}

function boundedString(value: unknown, field: string, maxChars: number, minChars = 0): Validation<string> {
  if (typeof value !== 'string') return fail(`${field} must be a string, got ${describe(value)}`);
  if (value.length < minChars) return fail(`${field} must have at least ${minChars} character(s)`);
  if (value.length > maxChars) return fail(`${field} has ${value.length} characters; the limit is ${maxChars}`);
  return ok(value);
}

const CONTROL_CHARACTERS = /[\u0000-\u001f\u007f]/;

/** A file name without any directory part: 1–255 characters, no separators or control characters. */
export function validateFileName(value: unknown, field = 'suggestedName'): Validation<string> {
  const text = boundedString(value, field, IPC_LIMITS.fileNameChars, 1);
  if (!text.ok) return text;
  const name = text.value;
  if (name.trim().length === 0) return fail(`${field} must not be blank`);
  if (/[\\/]/.test(name)) return fail(`${field} must be a file name without folders, got "${name}"`);
  if (CONTROL_CHARACTERS.test(name)) return fail(`${field} must not contain control characters`);
  if (name === '.' || name === '..') return fail(`${field} must not be "${name}"`);
  return ok(name);
}

/** True for an absolute POSIX path (`/…`), Windows drive path (`C:\…`, `C:/…`) or UNC path (`\\server\…`). */
export function isAbsolutePath(path: string): boolean {
  return path.startsWith('/') || /^[A-Za-z]:[\\/]/.test(path) || /^\\\\[^\\]/.test(path);
}

/** An absolute file path of at most 4096 characters without control characters. */
export function validateAbsolutePath(value: unknown, field = 'path'): Validation<string> {
  const text = boundedString(value, field, IPC_LIMITS.pathChars, 1);
  if (!text.ok) return text;
  if (CONTROL_CHARACTERS.test(text.value)) return fail(`${field} must not contain control characters`);
  if (!isAbsolutePath(text.value)) return fail(`${field} must be an absolute path, got "${text.value}"`);
  return ok(text.value);
}

function isUint8Array(value: unknown): value is Uint8Array {
  return ArrayBuffer.isView(value) && Object.prototype.toString.call(value) === '[object Uint8Array]';
}

/** Project text for a save or an autosave: a string of at most 32 Mi UTF-16 code units. */
export function validateProjectText(value: unknown, field = 'text'): Validation<string> {
  return boundedString(value, field, IPC_LIMITS.projectTextChars);
}

/** `{ text }` sent with `autosave`. */
export function validateAutosaveRequest(value: unknown): Validation<{ text: string }> {
  const shape = exactObject(value, ['text'], 'autosave request');
  if (!shape.ok) return shape;
  const text = validateProjectText(shape.value.text, 'autosave request.text');
  return text.ok ? ok({ text: text.value }) : text;
}

/** `{ text, options: { path, suggestedName, saveAs } }` sent with `saveProject`. */
export function validateSaveProjectRequest(value: unknown): Validation<SaveProjectRequest> {
  const shape = exactObject(value, ['text', 'options'], 'save request');
  if (!shape.ok) return shape;
  const text = validateProjectText(shape.value.text, 'save request.text');
  if (!text.ok) return text;
  const options = exactObject(shape.value.options, ['path', 'suggestedName', 'saveAs'], 'save request.options');
  if (!options.ok) return options;
  const { path, suggestedName, saveAs } = options.value;
  let checkedPath: string | null = null;
  if (path !== null) {
    const pathCheck = validateAbsolutePath(path, 'save request.options.path');
    if (!pathCheck.ok) return pathCheck;
    checkedPath = pathCheck.value;
  }
  const name = validateFileName(suggestedName, 'save request.options.suggestedName');
  if (!name.ok) return name;
  if (typeof saveAs !== 'boolean') return fail(`save request.options.saveAs must be true or false, got ${describe(saveAs)}`);
  return ok({ text: text.value, options: { path: checkedPath, suggestedName: name.value, saveAs } });
}

/** `{ data, options: { suggestedName, mime, openAfterwards } }` sent with `exportFile`. */
export function validateExportFileRequest(value: unknown): Validation<ExportFileRequest> {
  const shape = exactObject(value, ['data', 'options'], 'export request');
  if (!shape.ok) return shape;
  const { data } = shape.value;
  let checkedData: Uint8Array | string;
  if (typeof data === 'string') {
    const text = boundedString(data, 'export request.data', IPC_LIMITS.exportBytes);
    if (!text.ok) return text;
    checkedData = text.value;
  } else if (isUint8Array(data)) {
    if (data.byteLength > IPC_LIMITS.exportBytes) {
      return fail(`export request.data has ${data.byteLength} bytes; the limit is ${IPC_LIMITS.exportBytes}`);
    }
    checkedData = data;
  } else {
    return fail(`export request.data must be a string or a Uint8Array, got ${describe(data)}`);
  }
  const options = exactObject(shape.value.options, ['suggestedName', 'mime', 'openAfterwards'], 'export request.options');
  if (!options.ok) return options;
  const { suggestedName, mime, openAfterwards } = options.value;
  const name = validateFileName(suggestedName, 'export request.options.suggestedName');
  if (!name.ok) return name;
  if (typeof mime !== 'string' || exportTypeFor(mime) === null) {
    return fail(`export request.options.mime must be one of the exportable types, got ${typeof mime === 'string' ? `"${mime.slice(0, 60)}"` : describe(mime)}`);
  }
  if (typeof openAfterwards !== 'boolean') {
    return fail(`export request.options.openAfterwards must be true or false, got ${describe(openAfterwards)}`);
  }
  return ok({ data: checkedData, options: { suggestedName: name.value, mime, openAfterwards } });
}

/** `{ path }` sent with `openRecent`. */
export function validateOpenRecentRequest(value: unknown): Validation<{ path: string }> {
  const shape = exactObject(value, ['path'], 'open-recent request');
  if (!shape.ok) return shape;
  const path = validateAbsolutePath(shape.value.path, 'open-recent request.path');
  return path.ok ? ok({ path: path.value }) : path;
}

/** `{ title, dirty }` sent with `setDocumentState`. */
export function validateDocumentState(value: unknown): Validation<DocumentStatePayload> {
  const shape = exactObject(value, ['title', 'dirty'], 'document state');
  if (!shape.ok) return shape;
  const title = boundedString(shape.value.title, 'document state.title', IPC_LIMITS.titleChars);
  if (!title.ok) return title;
  if (CONTROL_CHARACTERS.test(title.value)) return fail('document state.title must not contain control characters');
  if (typeof shape.value.dirty !== 'boolean') return fail(`document state.dirty must be true or false, got ${describe(shape.value.dirty)}`);
  return ok({ title: title.value, dirty: shape.value.dirty });
}

/** A topic the renderer announces it listens to. */
export function validateListeningTopic(value: unknown): Validation<ListeningTopic> {
  return value === 'menu-command' || value === 'open-file'
    ? ok(value)
    : fail(`listening topic must be "menu-command" or "open-file", got ${describe(value)}`);
}

/** A command pushed by main. */
export function validateMenuCommand(value: unknown): Validation<MenuCommand> {
  return isMenuCommand(value) ? ok(value) : fail(`menu command is not known: ${describe(value)}`);
}

/** A file pushed by main or returned by open calls: `{ name, path, text }`. */
export function validateOpenedFile(value: unknown): Validation<OpenedFilePayload> {
  const shape = exactObject(value, ['name', 'path', 'text'], 'opened file');
  if (!shape.ok) return shape;
  const name = validateFileName(shape.value.name, 'opened file.name');
  if (!name.ok) return name;
  const path = shape.value.path === null ? ok(null) : validateAbsolutePath(shape.value.path, 'opened file.path');
  if (!path.ok) return path;
  const text = validateProjectText(shape.value.text, 'opened file.text');
  if (!text.ok) return text;
  return ok({ name: name.value, path: path.value, text: text.value });
}

/** A save or export result: `{ name, path }`. */
export function validateSavedFile(value: unknown): Validation<SavedFilePayload> {
  const shape = exactObject(value, ['name', 'path'], 'saved file');
  if (!shape.ok) return shape;
  const name = validateFileName(shape.value.name, 'saved file.name');
  if (!name.ok) return name;
  const path = shape.value.path === null ? ok(null) : validateAbsolutePath(shape.value.path, 'saved file.path');
  if (!path.ok) return path;
  return ok({ name: name.value, path: path.value });
}

/** A recovery snapshot: `{ text, savedAt, name }`, `savedAt` an ISO 8601 timestamp. */
export function validateRecovery(value: unknown): Validation<RecoveryPayload> {
  const shape = exactObject(value, ['text', 'savedAt', 'name'], 'recovery');
  if (!shape.ok) return shape;
  const text = validateProjectText(shape.value.text, 'recovery.text');
  if (!text.ok) return text;
  const savedAt = boundedString(shape.value.savedAt, 'recovery.savedAt', 40, 1);
  if (!savedAt.ok) return savedAt;
  if (!/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(\.\d+)?(Z|[+-]\d{2}:\d{2})$/.test(savedAt.value)) {
    return fail(`recovery.savedAt must be an ISO 8601 timestamp, got "${savedAt.value}"`);
  }
  const name = boundedString(shape.value.name, 'recovery.name', IPC_LIMITS.titleChars);
  if (!name.ok) return name;
  return ok({ text: text.value, savedAt: savedAt.value, name: name.value });
}

/** A list of recent file paths (at most 50, each absolute). */
export function validateRecentList(value: unknown): Validation<string[]> {
  if (!Array.isArray(value)) return fail(`recent files must be an array, got ${describe(value)}`);
  if (value.length > 50) return fail(`recent files has ${value.length} entries; the limit is 50`);
  const paths: string[] = [];
  for (const [index, entry] of value.entries()) {
    const path = validateAbsolutePath(entry, `recent files[${index}]`);
    if (!path.ok) return path;
    paths.push(path.value);
  }
  return ok(paths);
}
