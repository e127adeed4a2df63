import { Window as HappyWindow } from 'happy-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createBrowserFileAccess, MAX_PROJECT_BYTES, pickCsvFile, readProjectFile, type FileHandleLike } from '../../../renderer/src/host/web-files.ts';

const windows: HappyWindow[] = [];
afterEach(async () => {
  vi.restoreAllMocks();
  await Promise.all(windows.splice(0).map((window) => window.happyDOM.close()));
});

function browserWindow(): HappyWindow {
  const window = new HappyWindow({ url: 'http://127.0.0.1:4173/' });
  windows.push(window);
  return window;
}

function handle(name: string, permission: PermissionState = 'granted') {
  const written: Array<Blob | string> = [];
  const file: FileHandleLike & { written: typeof written } = {
    name,
    written,
    getFile: async () => new File(['{"on":"disk"}'], name),
    createWritable: async () => ({ write: async (data) => void written.push(data), close: async () => undefined }),
    queryPermission: async () => permission,
    requestPermission: async () => permission,
  };
  return file;
}

const abort = () => Promise.reject(new DOMException('The user aborted a request.', 'AbortError'));

describe('createBrowserFileAccess with the File System Access API', () => {
  it('opens the picked project and keeps its handle for saving back', async () => {
    const window = browserWindow();
    const picked = handle('Beam B1.hingeline');
    const showOpenFilePicker = vi.fn(async () => [picked]);
    Object.assign(window, { showOpenFilePicker });
    const access = createBrowserFileAccess(window as unknown as Window);
    expect(await access.pickProject()).toEqual({ name: 'Beam B1.hingeline', text: '{"on":"disk"}', handle: picked });
    expect(showOpenFilePicker).toHaveBeenCalledWith(expect.objectContaining({ multiple: false, types: [expect.objectContaining({ accept: { 'application/json': ['.hingeline', '.json'] } })] }));
  });

  it('treats a cancelled picker as null but passes other failures on', async () => {
    const window = browserWindow();
    Object.assign(window, { showOpenFilePicker: abort, showSaveFilePicker: abort });
    const access = createBrowserFileAccess(window as unknown as Window);
    expect(await access.pickProject()).toBeNull();
    expect(await access.saveText('x', 'a.hingeline', null)).toBeNull();
    expect(await access.saveExport('x', 'a.csv', 'text/csv')).toBeNull();
    Object.assign(window, { showOpenFilePicker: () => Promise.reject(new DOMException('blocked', 'SecurityError')) });
    await expect(access.pickProject()).rejects.toThrow('blocked');
  });

  it('writes back to a granted handle, and asks for a new file when permission is refused', async () => {
    const window = browserWindow();
    const fresh = handle('chosen.hingeline');
    const showSaveFilePicker = vi.fn(async () => fresh);
    Object.assign(window, { showSaveFilePicker });
    const access = createBrowserFileAccess(window as unknown as Window);

    const granted = handle('Beam B1.hingeline');
    expect(await access.saveText('{"v":2}', 'ignored', granted)).toEqual({ name: 'Beam B1.hingeline', handle: granted });
    expect(granted.written).toEqual(['{"v":2}']);
    expect(showSaveFilePicker).not.toHaveBeenCalled();

    const refused = handle('old.hingeline', 'denied');
    expect(await access.saveText('{"v":3}', 'Beam B1.hingeline', refused)).toEqual({ name: 'chosen.hingeline', handle: fresh });
    expect(showSaveFilePicker).toHaveBeenCalledWith(expect.objectContaining({ suggestedName: 'Beam B1.hingeline' }));
    expect(refused.written).toEqual([]);
  });

  it('reopens a remembered handle only with permission', async () => {
    const access = createBrowserFileAccess(browserWindow() as unknown as Window);
    expect(await access.reopen(handle('a.hingeline'))).toMatchObject({ text: '{"on":"disk"}' });
    expect(await access.reopen(handle('a.hingeline', 'denied'))).toBeNull();
  });

  it('exports binary data as a typed Blob to the chosen file', async () => {
    const window = browserWindow();
    const target = handle('report.pdf');
    const showSaveFilePicker = vi.fn(async () => target);
    Object.assign(window, { showSaveFilePicker });
    const access = createBrowserFileAccess(window as unknown as Window);
    expect(await access.saveExport(new Uint8Array([37, 80, 68, 70]), 'report.pdf', 'application/pdf')).toEqual({ name: 'report.pdf' });
    expect(showSaveFilePicker).toHaveBeenCalledWith(expect.objectContaining({ types: [{ description: 'PDF', accept: { 'application/pdf': ['.pdf'] } }] }));
    const blob = target.written[0] as Blob;
    expect(blob.type).toBe('application/pdf');
    expect([...new Uint8Array(await blob.arrayBuffer())]).toEqual([37, 80, 68, 70]);
  });
});

describe('createBrowserFileAccess without the File System Access API', () => {
  it('saves by offering a download with the suggested name', async () => {
    const window = browserWindow();
    const createObjectURL = vi.spyOn(URL, 'createObjectURL').mockReturnValue('blob:http://127.0.0.1:4173/1');
    const clicked: Array<{ download: string; href: string }> = [];
    const originalCreate = window.document.createElement.bind(window.document);
    vi.spyOn(window.document, 'createElement').mockImplementation(((tag: string) => {
      const element = originalCreate(tag);
      if (tag === 'a') element.click = () => void clicked.push({ download: (element as unknown as HTMLAnchorElement).download, href: (element as unknown as HTMLAnchorElement).href });
      return element;
    }) as never);
    const access = createBrowserFileAccess(window as unknown as Window);
    expect(await access.saveText('{"v":1}', 'Beam B1.hingeline', null)).toEqual({ name: 'Beam B1.hingeline', handle: null });
    expect(clicked).toEqual([{ download: 'Beam B1.hingeline', href: 'blob:http://127.0.0.1:4173/1' }]);
    const blob = createObjectURL.mock.calls[0]![0] as Blob;
    expect(await blob.text()).toBe('{"v":1}');
    expect(window.document.querySelectorAll('a')).toHaveLength(0); // the temporary link is gone
  });

  it('picks a project with a file input and resolves null when the picker is cancelled', async () => {
    const window = browserWindow();
    const access = createBrowserFileAccess(window as unknown as Window);
    const picking = access.pickProject();
    const input = window.document.querySelector('input[type=file]') as unknown as HTMLInputElement;
    expect(input.accept).toBe('.hingeline,.json,application/json');
    input.dispatchEvent(new window.Event('cancel') as unknown as Event);
    expect(await picking).toBeNull();
    expect(window.document.querySelector('input[type=file]')).toBeNull();
  });
});

describe('pickCsvFile', () => {
  it('picks a CSV with a file input (never the file-handle picker) and reads it without a byte-order mark', async () => {
    const window = browserWindow();
    const fsaPicker = vi.fn();
    (window as unknown as { showOpenFilePicker: unknown }).showOpenFilePicker = fsaPicker;
    const picking = pickCsvFile(window as unknown as Window);
    const input = window.document.querySelector('input[type=file]') as unknown as HTMLInputElement;
    expect(input.accept).toBe('.csv,.txt,text/csv,text/plain');
    Object.defineProperty(input, 'files', { value: [new File(['\uFEFFid,span [m]\r\nB-1,6\r\n'], 'beams.csv')] });
    input.dispatchEvent(new window.Event('change') as unknown as Event);
    expect(await picking).toEqual({ name: 'beams.csv', text: 'id,span [m]\r\nB-1,6\r\n' });
    expect(fsaPicker).not.toHaveBeenCalled();
    expect(window.document.querySelector('input[type=file]')).toBeNull();
  });
});

describe('readProjectFile', () => {
  it('drops a byte-order mark and refuses files over 64 MB', async () => {
    expect(await readProjectFile(new File(['\uFEFF{"a":1}'], 'a.hingeline'))).toBe('{"a":1}');
    const huge = { name: 'huge.hingeline', size: MAX_PROJECT_BYTES + 1, text: async () => '' } as File;
    await expect(readProjectFile(huge)).rejects.toThrow('“huge.hingeline” is 64 MB; project files larger than 64 MB are refused.');
  });
});
