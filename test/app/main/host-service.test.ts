import { lstat, mkdir, open, readdir, readFile, rename, symlink, unlink, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { describeFileError, HostError, MAX_PROJECT_FILE_BYTES } from '../../../app/main/host-service.ts';
import { createServiceSetup, type ServiceSetup } from '../fixtures/host-service-setup.ts';

let setup: ServiceSetup;
beforeEach(async () => {
  setup = await createServiceSetup();
  await mkdir(join(setup.folder, 'Documents'));
});
afterEach(async () => {
  await setup.dispose();
});

const project = '{"format":"hingeline-project","version":2}';

describe('opening a CSV file to import', () => {
  it('reads the picked file as text without a byte-order mark, and neither grants it for writing nor lists it as recent', async () => {
    const path = join(setup.folder, 'beams.csv');
    await writeFile(path, '\uFEFFid,span [m]\r\nB-1,6\r\n');
    setup.csvAnswers.push(path);
    expect(await setup.service.openCsv()).toEqual({ name: 'beams.csv', path, text: 'id,span [m]\r\nB-1,6\r\n' });
    expect(setup.dialogs.chooseCsvToOpen).toHaveBeenCalledWith(join(setup.folder, 'Documents'));
    expect(setup.grants.isGranted(path)).toBe(false);
    expect(setup.service.recentFiles()).toEqual([]);
  });

  it('returns null when cancelled and refuses text that is not UTF-8, naming the file', async () => {
    expect(await setup.service.openCsv()).toBeNull();
    const path = join(setup.folder, 'latin1.csv');
    await writeFile(path, Buffer.from([0x69, 0x64, 0x0a, 0xe9, 0x81]));
    setup.csvAnswers.push(path);
    await expect(setup.service.openCsv()).rejects.toThrow('“latin1.csv” is not a CSV file Hingeline reads: it is not UTF-8 text.');
  });
});

describe('opening projects', () => {
  it('reads the picked file, drops a byte-order mark, and remembers it', async () => {
    const path = join(setup.folder, 'Beam B1.hingeline');
    await writeFile(path, `\uFEFF${project}`);
    setup.openAnswers.push(path);
    expect(await setup.service.openProject()).toEqual({ name: 'Beam B1.hingeline', path, text: project });
    expect(setup.dialogs.chooseProjectToOpen).toHaveBeenCalledWith(join(setup.folder, 'Documents'));
    expect(setup.service.recentFiles()).toEqual([path]);
    expect(setup.grants.isGranted(path)).toBe(true);
    expect(setup.onRecentChanged).toHaveBeenLastCalledWith([path]);
  });

  it('returns null when the dialog is cancelled', async () => {
    expect(await setup.service.openProject()).toBeNull();
  });

  it('opens the next dialog in the folder of the last file', async () => {
    const path = join(setup.folder, 'a.hingeline');
    await writeFile(path, project);
    setup.openAnswers.push(path);
    await setup.service.openProject();
    await setup.service.openProject();
    expect(setup.dialogs.chooseProjectToOpen).toHaveBeenLastCalledWith(setup.folder);
  });

  it('refuses files that are not UTF-8, folders, missing files and oversized files with a clear message', async () => {
    const binary = join(setup.folder, 'image.json');
    await writeFile(binary, Buffer.from([0xff, 0xfe, 0x00, 0x81]));
    await expect(setup.service.openPath(binary)).rejects.toThrow('“image.json” is not a Hingeline project: it is not UTF-8 text.');
    await expect(setup.service.openPath(setup.folder)).rejects.toThrow(/cannot be opened: it is not a file/);
    await expect(setup.service.openPath(join(setup.folder, 'gone.hingeline'))).rejects.toThrow('“gone.hingeline” cannot be opened: the file or its folder does not exist.');
    const huge = join(setup.folder, 'huge.hingeline');
    const handle = await open(huge, 'w');
    await handle.truncate(MAX_PROJECT_FILE_BYTES + 1); // sparse: costs no disk space
    await handle.close();
    await expect(setup.service.openPath(huge)).rejects.toThrow(/project files larger than 64 MB are refused/);
    expect(setup.service.recentFiles()).toEqual([]);
  });

  it('opens only entries of the recent list, and drops entries whose file vanished', async () => {
    const path = join(setup.folder, 'kept.hingeline');
    await writeFile(path, project);
    await expect(setup.service.openRecent(path)).rejects.toThrow('That file is not in the list of recent projects.');
    await setup.recent.add(path);
    expect((await setup.service.openRecent(path))?.text).toBe(project);

    const vanished = join(setup.folder, 'vanished.hingeline');
    await setup.recent.add(vanished);
    await expect(setup.service.openRecent(vanished)).rejects.toThrow(/no longer exists .* removed from the recent list/);
    expect(setup.service.recentFiles()).toEqual([path]);
  });
});

describe('saving to a granted path whose links changed', () => {
  it('writes where the granted path led when it was opened (a link resolved once)', async () => {
    const real = join(setup.folder, 'data', 'Beam B1.hingeline');
    await mkdir(join(setup.folder, 'data'));
    await writeFile(real, project);
    const link = join(setup.folder, 'Documents', 'Beam B1.hingeline');
    await symlink(real, link);
    setup.openAnswers.push(link);
    await setup.service.openProject();
    const saved = await setup.service.saveProject({ text: 'v2', options: { path: link, suggestedName: 'Beam B1', saveAs: false } });
    expect(saved?.path).toBe(link);
    expect(await readFile(real, 'utf8')).toBe('v2');
    // The link is still a link (not replaced by a copy of the file).
    expect((await lstat(link)).isSymbolicLink()).toBe(true);
  });

  it('refuses to write through a link put in place of the granted file, and writes nothing', async () => {
    const path = join(setup.folder, 'Documents', 'Beam B2.hingeline');
    await writeFile(path, project);
    setup.openAnswers.push(path);
    await setup.service.openProject();
    const victim = join(setup.folder, 'victim.txt');
    await writeFile(victim, 'precious');
    await unlink(path);
    await symlink(victim, path);
    await expect(setup.service.saveProject({ text: 'overwrite', options: { path, suggestedName: 'Beam B2', saveAs: false } })).rejects.toThrow(
      new RegExp(`“Beam B2\\.hingeline” was not saved: since it was opened, its path now leads to ${victim.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')} .*use Save As`),
    );
    expect(await readFile(victim, 'utf8')).toBe('precious');
    expect(setup.dialogs.chooseProjectSavePath).not.toHaveBeenCalled();
    expect(setup.log).toHaveBeenCalledWith(expect.stringContaining('refused to write'));
    expect(setup.onSaveFinished).toHaveBeenCalledWith(false);
  });

  it('refuses when a folder on the way became a link to another place', async () => {
    await mkdir(join(setup.folder, 'job'));
    const path = join(setup.folder, 'job', 'Beam B3.hingeline');
    await writeFile(path, project);
    setup.openAnswers.push(path);
    await setup.service.openProject();
    await mkdir(join(setup.folder, 'elsewhere'));
    await rename(join(setup.folder, 'job'), join(setup.folder, 'job-old'));
    await symlink(join(setup.folder, 'elsewhere'), join(setup.folder, 'job'));
    await expect(setup.service.saveProject({ text: 'x', options: { path, suggestedName: 'Beam B3', saveAs: false } })).rejects.toThrow(/was not saved: since it was opened, its path now leads to/);
    expect(await readdir(join(setup.folder, 'elsewhere'))).toEqual([]);
  });

  it('refuses a path that became a loop of links', async () => {
    const path = join(setup.folder, 'Documents', 'loop.hingeline');
    await writeFile(path, project);
    await setup.grants.grant(path);
    await unlink(path);
    await symlink(path, path);
    await expect(setup.service.saveProject({ text: 'x', options: { path, suggestedName: 'loop', saveAs: false } })).rejects.toThrow(/its path has become a loop of links/);
  });

  it('still saves with Save As to a place the user chooses', async () => {
    const path = join(setup.folder, 'Documents', 'Beam B4.hingeline');
    await writeFile(path, project);
    setup.openAnswers.push(path);
    await setup.service.openProject();
    await unlink(path);
    await symlink(join(setup.folder, 'victim.txt'), path);
    const chosen = join(setup.folder, 'Documents', 'Beam B4 saved.hingeline');
    setup.saveAnswers.push(chosen);
    const saved = await setup.service.saveProject({ text: 'kept', options: { path, suggestedName: 'Beam B4', saveAs: true } });
    expect(saved?.path).toBe(chosen);
    expect(await readFile(chosen, 'utf8')).toBe('kept');
  });
});

describe('saving projects', () => {
  it('asks where to save a new document, proposing the suggested name with the project extension', async () => {
    const target = join(setup.folder, 'Documents', 'Beam B1.hingeline');
    setup.saveAnswers.push(target);
    const saved = await setup.service.saveProject({ text: project, options: { path: null, suggestedName: 'Beam B1', saveAs: false } });
    expect(saved).toEqual({ name: 'Beam B1.hingeline', path: target });
    expect(setup.dialogs.chooseProjectSavePath).toHaveBeenCalledWith(target);
    expect(await readFile(target, 'utf8')).toBe(project);
    expect(setup.service.recentFiles()).toEqual([target]);
    expect(setup.onSaveStarted).toHaveBeenCalledOnce();
    expect(setup.onSaveFinished).toHaveBeenCalledWith(true);
  });

  it('saves again to a granted path without a dialog and keeps the previous version as .bak', async () => {
    const target = join(setup.folder, 'Documents', 'frame.hingeline');
    setup.saveAnswers.push(target);
    await setup.service.saveProject({ text: 'v1', options: { path: null, suggestedName: 'frame', saveAs: false } });
    await setup.service.saveProject({ text: 'v2', options: { path: target, suggestedName: 'frame', saveAs: false } });
    expect(setup.dialogs.chooseProjectSavePath).toHaveBeenCalledTimes(1);
    expect(await readFile(target, 'utf8')).toBe('v2');
    expect(await readFile(`${target}.bak`, 'utf8')).toBe('v1');
  });

  it('asks instead of writing to a path the renderer made up', async () => {
    const planted = join(setup.folder, 'planted.hingeline');
    const result = await setup.service.saveProject({ text: 'x', options: { path: planted, suggestedName: 'x', saveAs: false } });
    expect(result).toBeNull(); // the dialog was cancelled
    expect(setup.dialogs.chooseProjectSavePath).toHaveBeenCalledWith(join(setup.folder, 'x.hingeline'));
    expect(await readdir(setup.folder)).not.toContain('planted.hingeline');
    expect(setup.log).toHaveBeenCalledWith(expect.stringContaining('was not granted'));
    expect(setup.onSaveFinished).toHaveBeenCalledWith(false);
  });

  it('Save As always asks, even for a granted path', async () => {
    const first = join(setup.folder, 'Documents', 'a.hingeline');
    const copy = join(setup.folder, 'Documents', 'b.hingeline');
    setup.saveAnswers.push(first, copy);
    await setup.service.saveProject({ text: 'a', options: { path: null, suggestedName: 'a', saveAs: false } });
    const saved = await setup.service.saveProject({ text: 'b', options: { path: first, suggestedName: 'a', saveAs: true } });
    expect(saved?.path).toBe(copy);
    expect(await readFile(first, 'utf8')).toBe('a');
  });

  it('adds the project extension when the chosen name has none', async () => {
    setup.saveAnswers.push(join(setup.folder, 'Documents', 'no-extension'));
    const saved = await setup.service.saveProject({ text: 'x', options: { path: null, suggestedName: 'x', saveAs: false } });
    expect(saved?.name).toBe('no-extension.hingeline');
  });

  it('reports a failed write with the reason and that the previous version is unchanged', async () => {
    const notAFolder = join(setup.folder, 'plain-file');
    await writeFile(notAFolder, 'I am a file');
    const target = join(notAFolder, 'a.hingeline');
    await setup.grants.grant(target);
    await expect(setup.service.saveProject({ text: 'new', options: { path: target, suggestedName: 'a', saveAs: false } })).rejects.toThrow(
      '“a.hingeline” could not be saved: a part of the path is not a folder. The previous version on disk is unchanged.',
    );
    expect(await readFile(notAFolder, 'utf8')).toBe('I am a file');
    expect(setup.onSaveFinished).toHaveBeenCalledWith(false);
  });

  it('discards the autosave once the document is saved', async () => {
    await setup.service.autosave('draft');
    setup.saveAnswers.push(join(setup.folder, 'Documents', 's.hingeline'));
    await setup.service.saveProject({ text: 'draft', options: { path: null, suggestedName: 's', saveAs: false } });
    expect(await readdir(setup.recovery.folder)).toEqual(['session-open.json']);
  });
});

describe('exporting', () => {
  it('asks with the right extension, writes the bytes and opens only the file just written', async () => {
    const target = join(setup.folder, 'Documents', 'Beam B1 report.pdf');
    setup.exportAnswers.push(target);
    const pdf = new Uint8Array([0x25, 0x50, 0x44, 0x46, 0x2d]);
    const saved = await setup.service.exportFile({ data: pdf, options: { suggestedName: 'Beam B1 report', mime: 'application/pdf', openAfterwards: true } });
    expect(saved).toEqual({ name: 'Beam B1 report.pdf', path: target });
    expect(setup.dialogs.chooseExportPath).toHaveBeenCalledWith(target, expect.objectContaining({ extension: '.pdf' }));
    expect([...(await readFile(target))]).toEqual([...pdf]);
    expect(setup.openWithSystem).toHaveBeenCalledExactlyOnceWith(target);
  });

  it('writes an SVG without anything active in it and shows it in its folder instead of opening it', async () => {
    const target = join(setup.folder, 'Documents', 'section.svg');
    setup.exportAnswers.push(target);
    const svg = '<svg xmlns="http://www.w3.org/2000/svg" onload="fetch(`https://x`)"><script>alert(1)</script><rect width="10" height="5"/></svg>';
    await setup.service.exportFile({ data: new TextEncoder().encode(svg), options: { suggestedName: 'section', mime: 'image/svg+xml', openAfterwards: true } });
    expect(await readFile(target, 'utf8')).toBe('<svg xmlns="http://www.w3.org/2000/svg"><rect width="10" height="5"/></svg>');
    expect(setup.openWithSystem).not.toHaveBeenCalled();
    expect(setup.revealInFolder).toHaveBeenCalledExactlyOnceWith(target);
  });

  it('refuses an SVG it cannot make safe, writing nothing', async () => {
    const target = join(setup.folder, 'Documents', 'bad.svg');
    setup.exportAnswers.push(target);
    await expect(setup.service.exportFile({ data: '<!DOCTYPE svg [<!ENTITY a "b">]><svg/>', options: { suggestedName: 'bad', mime: 'image/svg+xml', openAfterwards: false } })).rejects.toThrow(/The SVG was not exported: the SVG declares a document type/);
    await expect(readFile(target)).rejects.toThrow();
    expect(setup.dialogs.chooseExportPath).not.toHaveBeenCalled();
  });

  it('does not open a CSV unless asked, and does not double the extension', async () => {
    setup.exportAnswers.push(join(setup.folder, 'results.csv'));
    const saved = await setup.service.exportFile({ data: 'a;b\n', options: { suggestedName: 'results.csv', mime: 'text/csv', openAfterwards: false } });
    expect(setup.dialogs.chooseExportPath).toHaveBeenCalledWith(join(setup.folder, 'Documents', 'results.csv'), expect.anything());
    expect(saved?.name).toBe('results.csv');
    expect(setup.openWithSystem).not.toHaveBeenCalled();
  });

  it('returns null when cancelled and refuses unknown types', async () => {
    expect(await setup.service.exportFile({ data: 'x', options: { suggestedName: 'x', mime: 'text/csv', openAfterwards: true } })).toBeNull();
    await expect(setup.service.exportFile({ data: 'x', options: { suggestedName: 'x', mime: 'text/html', openAfterwards: false } })).rejects.toBeInstanceOf(HostError);
    expect(setup.openWithSystem).not.toHaveBeenCalled();
  });
});

describe('autosave and recovery through the service', () => {
  it('merges a burst of autosaves from the renderer into few writes of the latest text', async () => {
    const writes: string[] = [];
    const original = setup.recovery.autosave.bind(setup.recovery);
    setup.recovery.autosave = async (text, name) => {
      writes.push(text);
      await original(text, name);
    };
    await Promise.all(Array.from({ length: 200 }, (_, i) => setup.service.autosave(`draft ${i}`)));
    // The first call writes at once; the 199 that follow within the interval become one write.
    expect(writes).toEqual(['draft 0', 'draft 199']);
    expect(JSON.parse(await readFile(setup.recovery.autosavePath, 'utf8')).text).toBe('draft 199');
  });

  it('stores the autosave under the title the renderer reported', async () => {
    setup.service.setDocumentTitle('Beam B1');
    await setup.service.autosave('{"draft":true}');
    expect(await setup.recovery.setAsideAutosave()).toBe(true);
    expect(await setup.service.takeRecovery()).toEqual({ text: '{"draft":true}', name: 'Beam B1', savedAt: '2026-02-03T04:05:06.000Z' });
    await setup.service.clearRecovery();
    expect(await setup.service.takeRecovery()).toBeNull();
  });
});

describe('describeFileError', () => {
  it('turns common error codes into short reasons', () => {
    const error = (code: string) => Object.assign(new Error('raw'), { code });
    expect(describeFileError(error('ENOSPC'))).toBe('the disk is full');
    expect(describeFileError(error('EROFS'))).toBe('the disk is read-only');
    expect(describeFileError(error('EACCES'))).toBe('permission denied');
    expect(describeFileError(error('EXDEV'))).toBe('raw');
    expect(describeFileError('text')).toBe('text');
  });
});
