import { describe, expect, it } from 'vitest';
import {
  IPC_LIMITS,
  isAbsolutePath,
  validateAbsolutePath,
  validateAutosaveRequest,
  validateDocumentState,
  validateExportFileRequest,
  validateFileName,
  validateListeningTopic,
  validateMenuCommand,
  validateOpenedFile,
  validateOpenRecentRequest,
  validateRecentList,
  validateRecovery,
  validateSavedFile,
  validateSaveProjectRequest,
  type Validation,
} from '../../../app/shared/validators.ts';
import { MENU_COMMANDS } from '../../../app/shared/menu-commands.ts';

function errorOf<T>(validation: Validation<T>): string {
  if (validation.ok) throw new Error(`expected a rejection, got ${JSON.stringify(validation.value)}`);
  return validation.error;
}

const saveOptions = { path: '/home/engineer/Beam B1.hingeline', suggestedName: 'Beam B1', saveAs: false };

describe('validateSaveProjectRequest', () => {
  it('accepts text with a path, a suggested name and the save-as flag, returning a fresh copy', () => {
    const request = { text: '{"format":"hingeline-project"}', options: { ...saveOptions } };
    const result = validateSaveProjectRequest(request);
    expect(result).toEqual({ ok: true, value: request });
    if (result.ok) expect(result.value.options).not.toBe(request.options);
  });

  it('accepts a null path (new document) and Windows and UNC paths', () => {
    for (const path of [null, 'C:\\Users\\eng\\b.hingeline', 'D:/jobs/b.hingeline', '\\\\server\\share\\b.hingeline']) {
      expect(validateSaveProjectRequest({ text: '', options: { ...saveOptions, path } }).ok).toBe(true);
    }
  });

  it('names the field for a relative path, a folder in the suggested name and a non-boolean flag', () => {
    expect(errorOf(validateSaveProjectRequest({ text: '', options: { ...saveOptions, path: 'relative/b.hingeline' } }))).toMatch(/options\.path must be an absolute path/);
    expect(errorOf(validateSaveProjectRequest({ text: '', options: { ...saveOptions, suggestedName: '../../etc/passwd' } }))).toMatch(/suggestedName must be a file name without folders/);
    expect(errorOf(validateSaveProjectRequest({ text: '', options: { ...saveOptions, saveAs: 'yes' } }))).toMatch(/saveAs must be true or false, got a string/);
  });

  it('rejects unknown and missing fields instead of passing them on', () => {
    expect(errorOf(validateSaveProjectRequest({ text: '', options: saveOptions, extra: 1 }))).toMatch(/unexpected field\(s\): extra/);
    expect(errorOf(validateSaveProjectRequest({ text: '', options: { path: null, suggestedName: 'a' } }))).toMatch(/missing field\(s\): saveAs/);
    expect(errorOf(validateSaveProjectRequest({ options: saveOptions }))).toMatch(/missing field\(s\): text/);
  });

  it('rejects non-objects, arrays and class instances', () => {
    expect(errorOf(validateSaveProjectRequest(null))).toMatch(/must be an object, got null/);
    expect(errorOf(validateSaveProjectRequest([]))).toMatch(/got an array/);
    expect(errorOf(validateSaveProjectRequest(new Date()))).toMatch(/must be an object/);
    expect(errorOf(validateSaveProjectRequest('text'))).toMatch(/got a string/);
  });

  it('rejects text over the size limit and text that is not a string', () => {
    const huge = 'x'.repeat(IPC_LIMITS.projectTextChars + 1);
    expect(errorOf(validateSaveProjectRequest({ text: huge, options: saveOptions }))).toMatch(/33554433 characters; the limit is 33554432/);
    expect(errorOf(validateSaveProjectRequest({ text: 42, options: saveOptions }))).toMatch(/text must be a string, got the number 42/);
    expect(errorOf(validateSaveProjectRequest({ text: Number.NaN, options: saveOptions }))).toMatch(/got NaN/);
  });
});

describe('validateFileName', () => {
  it('accepts ordinary names with spaces, dots and non-ASCII letters', () => {
    for (const name of ['Beam B1', 'Träger Ü-3.hingeline', 'report (rev. A).pdf']) expect(validateFileName(name)).toEqual({ ok: true, value: name });
  });

  it('rejects empty, blank, dot names, separators, control characters and overlong names', () => {
    expect(errorOf(validateFileName(''))).toMatch(/at least 1 character/);
    expect(errorOf(validateFileName('   '))).toMatch(/must not be blank/);
    expect(errorOf(validateFileName('..'))).toMatch(/must not be "\.\."/);
    expect(errorOf(validateFileName('a\\b'))).toMatch(/without folders/);
    expect(errorOf(validateFileName('a\u0000b'))).toMatch(/control characters/);
    expect(errorOf(validateFileName('n'.repeat(256)))).toMatch(/256 characters; the limit is 255/);
  });
});

describe('validateExportFileRequest', () => {
  const options = { suggestedName: 'Beam B1 report', mime: 'application/pdf', openAfterwards: true };

  it('accepts bytes for a PDF and text for a CSV', () => {
    const bytes = new Uint8Array([0x25, 0x50, 0x44, 0x46]);
    const pdf = validateExportFileRequest({ data: bytes, options });
    expect(pdf.ok && pdf.value.data).toBe(bytes);
    expect(validateExportFileRequest({ data: 'a,b\n1,2\n', options: { ...options, mime: 'text/csv' } }).ok).toBe(true);
  });

  it('rejects MIME types the host does not export', () => {
    expect(errorOf(validateExportFileRequest({ data: 'x', options: { ...options, mime: 'text/html' } }))).toMatch(/mime must be one of the exportable types, got "text\/html"/);
    expect(errorOf(validateExportFileRequest({ data: 'x', options: { ...options, mime: 'application/x-msdownload' } }))).toMatch(/exportable types/);
  });

  it('rejects other binary views and plain arrays as data', () => {
    expect(errorOf(validateExportFileRequest({ data: new Uint16Array(2), options }))).toMatch(/data must be a string or a Uint8Array, got an object/);
    expect(errorOf(validateExportFileRequest({ data: [1, 2, 3], options }))).toMatch(/got an array/);
  });

  it('rejects data over 256 MiB without copying it', () => {
    const tooLarge = new Uint8Array(new ArrayBuffer(IPC_LIMITS.exportBytes + 1));
    expect(errorOf(validateExportFileRequest({ data: tooLarge, options }))).toMatch(/268435457 bytes; the limit is 268435456/);
  });

  it('requires openAfterwards to be a boolean', () => {
    expect(errorOf(validateExportFileRequest({ data: 'x', options: { ...options, openAfterwards: 1 } }))).toMatch(/openAfterwards must be true or false, got the number 1/);
  });
});

describe('small payloads', () => {
  it('autosave takes exactly { text }', () => {
    expect(validateAutosaveRequest({ text: '{}' })).toEqual({ ok: true, value: { text: '{}' } });
    expect(errorOf(validateAutosaveRequest({ text: '{}', path: '/x' }))).toMatch(/unexpected field\(s\): path/);
  });

  it('open-recent takes an absolute path', () => {
    expect(validateOpenRecentRequest({ path: '/jobs/a.hingeline' }).ok).toBe(true);
    expect(errorOf(validateOpenRecentRequest({ path: 'a.hingeline' }))).toMatch(/absolute path/);
    expect(errorOf(validateOpenRecentRequest({ path: '/a\nb' }))).toMatch(/control characters/);
  });

  it('document state takes a title of at most 300 characters and a boolean', () => {
    expect(validateDocumentState({ title: 'Beam B1', dirty: true })).toEqual({ ok: true, value: { title: 'Beam B1', dirty: true } });
    expect(errorOf(validateDocumentState({ title: 't'.repeat(301), dirty: false }))).toMatch(/301 characters; the limit is 300/);
    expect(errorOf(validateDocumentState({ title: 'a\u0007', dirty: false }))).toMatch(/control characters/);
    expect(errorOf(validateDocumentState({ title: 'a', dirty: 'no' }))).toMatch(/dirty must be true or false/);
  });

  it('listening topics and menu commands are closed lists', () => {
    expect(validateListeningTopic('open-file').ok).toBe(true);
    expect(errorOf(validateListeningTopic('everything'))).toMatch(/listening topic/);
    for (const command of MENU_COMMANDS) expect(validateMenuCommand(command)).toEqual({ ok: true, value: command });
    expect(errorOf(validateMenuCommand('rm -rf'))).toMatch(/not known/);
    expect(errorOf(validateMenuCommand(undefined))).toMatch(/a undefined/);
  });

  it('opened files, saved files and recovery snapshots are checked field by field', () => {
    expect(validateOpenedFile({ name: 'a.hingeline', path: null, text: '{}' }).ok).toBe(true);
    expect(errorOf(validateOpenedFile({ name: 'a.hingeline', path: 'rel', text: '{}' }))).toMatch(/opened file\.path must be an absolute path/);
    expect(validateSavedFile({ name: 'a.hingeline', path: '/a.hingeline' }).ok).toBe(true);
    expect(errorOf(validateSavedFile({ name: '', path: null }))).toMatch(/saved file\.name/);
    expect(validateRecovery({ text: '{}', savedAt: '2026-03-04T05:06:07.890Z', name: 'Beam' }).ok).toBe(true);
    expect(validateRecovery({ text: '{}', savedAt: '2026-03-04T05:06:07+01:00', name: 'Beam' }).ok).toBe(true);
    expect(errorOf(validateRecovery({ text: '{}', savedAt: 'yesterday', name: 'Beam' }))).toMatch(/ISO 8601/);
  });

  it('recent lists hold at most 50 absolute paths', () => {
    expect(validateRecentList(['/a.hingeline', 'C:\\b.hingeline'])).toEqual({ ok: true, value: ['/a.hingeline', 'C:\\b.hingeline'] });
    expect(errorOf(validateRecentList(['/a', 'b']))).toMatch(/recent files\[1\] must be an absolute path/);
    expect(errorOf(validateRecentList(Array.from({ length: 51 }, (_, index) => `/f${index}`)))).toMatch(/51 entries/);
  });

  it('absolute paths: POSIX, drive letters and UNC only', () => {
    expect(['/', '/a', 'C:\\', 'c:/x', '\\\\host\\share'].every(isAbsolutePath)).toBe(true);
    expect(['', 'a', './a', 'C:a', '\\\\', 'file:///a'].some(isAbsolutePath)).toBe(false);
    expect(errorOf(validateAbsolutePath('/' + 'a'.repeat(4096)))).toMatch(/4097 characters; the limit is 4096/);
  });
});
