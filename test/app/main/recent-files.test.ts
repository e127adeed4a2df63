import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { parseRecentFiles, RecentFiles } from '../../../app/main/recent-files.ts';
import { PathGrants } from '../../../app/main/path-grants.ts';

let folder: string;
beforeEach(async () => {
  folder = await mkdtemp(join(tmpdir(), 'hingeline-recent-'));
});
afterEach(async () => {
  await rm(folder, { recursive: true, force: true });
});

describe('RecentFiles', () => {
  it('keeps the newest first, without duplicates, at most the limit, and persists them', async () => {
    const store = join(folder, 'recent-files.json');
    const recent = new RecentFiles(store, { limit: 3, platform: 'linux' });
    await recent.load();
    for (const path of ['/a.hingeline', '/b.hingeline', '/a.hingeline', '/c.hingeline', '/d.hingeline']) await recent.add(path);
    expect(recent.list()).toEqual(['/d.hingeline', '/c.hingeline', '/a.hingeline']);

    const reloaded = new RecentFiles(store, { limit: 3, platform: 'linux' });
    expect(await reloaded.load()).toEqual(['/d.hingeline', '/c.hingeline', '/a.hingeline']);
    expect(JSON.parse(await readFile(store, 'utf8'))).toEqual({ version: 1, files: ['/d.hingeline', '/c.hingeline', '/a.hingeline'] });
  });

  it('treats paths differing only in case as one file on Windows and macOS, not on Linux', async () => {
    const windows = new RecentFiles(join(folder, 'w.json'), { platform: 'win32' });
    await windows.add('C:\\Jobs\\A.hingeline');
    await windows.add('c:\\jobs\\a.hingeline');
    expect(windows.list()).toEqual(['c:\\jobs\\a.hingeline']);
    const linux = new RecentFiles(join(folder, 'l.json'), { platform: 'linux' });
    await linux.add('/Jobs/A.hingeline');
    await linux.add('/jobs/a.hingeline');
    expect(linux.list()).toHaveLength(2);
  });

  it('removes and clears entries', async () => {
    const recent = new RecentFiles(join(folder, 'r.json'), { platform: 'linux' });
    await recent.add('/a.hingeline');
    await recent.add('/b.hingeline');
    await recent.remove('/a.hingeline');
    expect(recent.list()).toEqual(['/b.hingeline']);
    expect(recent.has('/b.hingeline')).toBe(true);
    await recent.clear();
    expect(recent.list()).toEqual([]);
  });

  it('starts empty when the file is missing or damaged', async () => {
    expect(await new RecentFiles(join(folder, 'missing.json')).load()).toEqual([]);
    const damaged = join(folder, 'damaged.json');
    await writeFile(damaged, '{"version":1,"files":["/a",');
    expect(await new RecentFiles(damaged).load()).toEqual([]);
  });
});

describe('parseRecentFiles', () => {
  it('keeps only absolute, control-free strings of the known version', () => {
    const text = JSON.stringify({ version: 1, files: ['/ok.hingeline', 'relative.hingeline', 42, null, '/bad\nname', 'C:\\ok.hingeline', '/ok.hingeline'] });
    expect(parseRecentFiles(text, 10, 'linux')).toEqual(['/ok.hingeline', 'C:\\ok.hingeline']);
    expect(parseRecentFiles(JSON.stringify({ version: 2, files: ['/a'] }))).toEqual([]);
    expect(parseRecentFiles(JSON.stringify(['/a']))).toEqual([]);
    expect(parseRecentFiles('null')).toEqual([]);
  });
});

describe('PathGrants', () => {
  it('grants exactly the paths main handed out, normalised', async () => {
    const grants = new PathGrants();
    await grants.grant('/jobs/sub/../a.hingeline');
    expect(grants.isGranted('/jobs/a.hingeline')).toBe(true);
    expect(grants.isGranted('/jobs/b.hingeline')).toBe(false);
    expect(grants.isGranted('/etc/passwd')).toBe(false);
  });
});
