import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import { once } from 'node:events';
import { chmod, lstat, mkdir, mkdtemp, readdir, readFile, rm, stat, symlink, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { assertWritableTarget, backupPathFor, NotRegularFileError, removeStaleTemps, TEMP_MARKER, writeFileAtomic } from '../../../app/main/atomic-write.ts';

const repoRoot = fileURLToPath(new URL('../../../', import.meta.url));
const childScript = fileURLToPath(new URL('../fixtures/atomic-write-child.ts', import.meta.url));
const MiB = 1024 * 1024;

let folder: string;
const children: ChildProcess[] = [];
beforeEach(async () => {
  folder = await mkdtemp(join(tmpdir(), 'hingeline-atomic-'));
});
afterEach(async () => {
  // A failed assertion must not leave a paused writer behind.
  for (const child of children.splice(0)) if (child.exitCode === null && child.signalCode === null) child.kill('SIGKILL');
  await rm(folder, { recursive: true, force: true });
});

/** A recognisable "old version" of a project: 1 MiB of JSON-like text. */
function originalProject(): Buffer {
  const line = '{"format":"hingeline-project","version":2,"note":"original content, must survive"}\n';
  return Buffer.from(line.repeat(Math.ceil(MiB / line.length)).slice(0, MiB));
}

interface Paused {
  paused: string;
  bytesWritten: number;
  tempPath: string;
}

/** Starts the child writer and resolves when it reports that it stopped at `stage`. */
async function startWriterAndPause(target: string, stage: string, bytes: number): Promise<{ child: ChildProcess; paused: Paused }> {
  const child = spawn(process.execPath, ['--import', 'tsx', childScript, target, stage, String(bytes)], {
    cwd: repoRoot,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  children.push(child);
  let stderr = '';
  child.stderr?.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
  const paused = await new Promise<Paused>((resolve, reject) => {
    let buffered = '';
    const timer = setTimeout(() => reject(new Error(`writer did not pause at ${stage}; stderr: ${stderr}`)), 60_000);
    child.stdout?.on('data', (chunk: Buffer) => {
      buffered += chunk.toString();
      const line = buffered.split('\n').find((candidate) => candidate.startsWith('{'));
      if (line) {
        clearTimeout(timer);
        resolve(JSON.parse(line) as Paused);
      }
    });
    child.on('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`writer exited (${code}) before pausing; stderr: ${stderr}`));
    });
  });
  return { child, paused };
}

async function kill(child: ChildProcess): Promise<void> {
  const exited = once(child, 'exit');
  child.kill('SIGKILL');
  const [code, signal] = (await exited) as [number | null, NodeJS.Signals | null];
  expect(code).toBeNull();
  expect(signal).toBe('SIGKILL');
}

describe('writeFileAtomic, killed midway (SIGKILL in a child process)', () => {
  const payloadBytes = 16 * MiB;

  it('leaves the old project byte-identical and no partial target when killed in the middle of writing the data', async () => {
    const target = join(folder, 'Beam B1.hingeline');
    const original = originalProject();
    await writeFile(target, original);

    const { child, paused } = await startWriterAndPause(target, 'chunk-written', payloadBytes);
    const tempSize = (await stat(paused.tempPath)).size;
    expect(tempSize).toBeGreaterThanOrEqual(3 * MiB);
    expect(tempSize).toBeLessThan(payloadBytes); // really midway
    await kill(child);

    expect((await readFile(target)).equals(original)).toBe(true);
    const names = (await readdir(folder)).sort();
    // Only the intact target and the abandoned temp file: no half-written target, no backup yet.
    expect(names).toEqual([`.Beam B1.hingeline${TEMP_MARKER}${paused.tempPath.split(TEMP_MARKER)[1]}`, 'Beam B1.hingeline'].sort());
  });

  it('leaves the old project intact when killed after the new data was synced but before the rename', async () => {
    const target = join(folder, 'frame.hingeline');
    const original = originalProject();
    await writeFile(target, original);

    const { child, paused } = await startWriterAndPause(target, 'synced', payloadBytes);
    expect((await stat(paused.tempPath)).size).toBe(payloadBytes);
    await kill(child);

    expect((await readFile(target)).equals(original)).toBe(true);
    expect(await readdir(folder)).toHaveLength(2);
  });

  it('has the old version both as target and as .bak when killed between backup and rename', async () => {
    const target = join(folder, 'girder.hingeline');
    const original = originalProject();
    await writeFile(target, original);

    const { child } = await startWriterAndPause(target, 'backed-up', payloadBytes);
    await kill(child);

    expect((await readFile(target)).equals(original)).toBe(true);
    expect((await readFile(backupPathFor(target))).equals(original)).toBe(true);
  });

  it('the next save removes the temp file a killed writer left behind and completes normally', async () => {
    const target = join(folder, 'Beam B1.hingeline');
    const original = originalProject();
    await writeFile(target, original);
    const { child, paused } = await startWriterAndPause(target, 'chunk-written', payloadBytes);
    await kill(child);

    const result = await writeFileAtomic(target, '{"version":3}', { keepBackup: true });

    expect(result.removedStaleTemps).toEqual([paused.tempPath]);
    expect(await readFile(target, 'utf8')).toBe('{"version":3}');
    expect((await readFile(backupPathFor(target))).equals(original)).toBe(true);
    expect((await readdir(folder)).sort()).toEqual(['Beam B1.hingeline', 'Beam B1.hingeline.bak']);
  });
});

describe('writeFileAtomic in process', () => {
  it('creates a new file and reports no backup when there was no previous version', async () => {
    const target = join(folder, 'new.hingeline');
    const result = await writeFileAtomic(target, 'π ≈ 3.14159 — UTF-8 text', { keepBackup: true });
    expect(await readFile(target, 'utf8')).toBe('π ≈ 3.14159 — UTF-8 text');
    expect(result.backupPath).toBeNull();
    expect(result.bytesWritten).toBe(Buffer.byteLength('π ≈ 3.14159 — UTF-8 text'));
    expect(await readdir(folder)).toEqual(['new.hingeline']);
  });

  it('keeps exactly the previous version as .bak, replacing an older .bak', async () => {
    const target = join(folder, 'p.hingeline');
    await writeFileAtomic(target, 'v1', { keepBackup: true });
    await writeFileAtomic(target, 'v2', { keepBackup: true });
    await writeFileAtomic(target, 'v3', { keepBackup: true });
    expect(await readFile(target, 'utf8')).toBe('v3');
    expect(await readFile(backupPathFor(target), 'utf8')).toBe('v2');
    expect((await readdir(folder)).sort()).toEqual(['p.hingeline', 'p.hingeline.bak']);
  });

  it('writes no .bak unless asked', async () => {
    const target = join(folder, 'report.pdf');
    await writeFileAtomic(target, new Uint8Array([1, 2, 3]));
    await writeFileAtomic(target, new Uint8Array([4, 5]));
    expect([...(await readFile(target))]).toEqual([4, 5]);
    expect(await readdir(folder)).toEqual(['report.pdf']);
  });

  it('writes binary data in several chunks exactly', async () => {
    const target = join(folder, 'data.bin');
    const data = new Uint8Array(300_001).map((_, index) => (index * 7) % 251);
    const stages: string[] = [];
    await writeFileAtomic(target, data, { chunkBytes: 65_536, onProgress: (progress) => void stages.push(progress.stage) });
    expect((await readFile(target)).equals(Buffer.from(data))).toBe(true);
    expect(stages.filter((stage) => stage === 'chunk-written')).toHaveLength(5);
    expect(stages.slice(-2)).toEqual(['synced', 'committed']);
  });

  it('keeps the permissions of the file it replaces', async () => {
    const target = join(folder, 'private.hingeline');
    await writeFile(target, 'old');
    await chmod(target, 0o600);
    await writeFileAtomic(target, 'new', { keepBackup: true });
    expect((await stat(target)).mode & 0o777).toBe(0o600);
  });

  it('writes through a symbolic link to the real file and keeps the link', async () => {
    const real = join(folder, 'real.hingeline');
    const link = join(folder, 'link.hingeline');
    await writeFile(real, 'old');
    await symlink(real, link);
    const result = await writeFileAtomic(link, 'new');
    expect(result.path).toBe(real);
    expect(await readFile(real, 'utf8')).toBe('new');
    expect((await readFile(link, 'utf8'))).toBe('new');
  });

  it('queues concurrent writes to one file so the last call wins and none interleave', async () => {
    const target = join(folder, 'busy.hingeline');
    const writes = Array.from({ length: 8 }, (_, index) => writeFileAtomic(target, `version ${index} `.repeat(20_000), { keepBackup: true, chunkBytes: 4096 }));
    await Promise.all(writes);
    expect(await readFile(target, 'utf8')).toBe('version 7 '.repeat(20_000));
    expect(await readFile(backupPathFor(target), 'utf8')).toBe('version 6 '.repeat(20_000));
  });

  it('rejects when the folder does not exist and leaves nothing behind', async () => {
    const target = join(folder, 'missing', 'x.hingeline');
    await expect(writeFileAtomic(target, 'x')).rejects.toMatchObject({ code: 'ENOENT' });
    expect(await readdir(folder)).toEqual([]);
  });

  it('refuses a folder at the target path, writing nothing', async () => {
    const target = join(folder, 'occupied');
    await mkdir(target);
    const refusal = writeFileAtomic(target, 'data');
    await expect(refusal).rejects.toBeInstanceOf(NotRegularFileError);
    await expect(refusal).rejects.toMatchObject({ code: 'EISDIR', kind: 'folder', message: `${target} is a folder, not a regular file; only regular files (or new paths) are written` });
    expect(await readdir(folder)).toEqual(['occupied']);
    expect(await readdir(target)).toEqual([]);
  });

  it('refuses a character device and leaves it in place (/dev/null is still a device afterwards)', async () => {
    const before = await stat('/dev/null');
    expect(before.isCharacterDevice()).toBe(true);
    await expect(writeFileAtomic('/dev/null', '%PDF-1.7 not a device')).rejects.toMatchObject({ code: 'ENOTREGULAR', kind: 'character device' });
    const after = await stat('/dev/null');
    expect(after.isCharacterDevice()).toBe(true);
    expect(after.ino).toBe(before.ino);
    expect(after.rdev).toBe(before.rdev);
  });

  it('refuses a symbolic link that leads to a device, and a named pipe', async () => {
    const link = join(folder, 'report.pdf');
    await symlink('/dev/null', link);
    await expect(writeFileAtomic(link, 'x')).rejects.toMatchObject({ code: 'ENOTREGULAR', path: '/dev/null' });
    const fifo = join(folder, 'pipe');
    execFileSync('mkfifo', [fifo]);
    await expect(writeFileAtomic(fifo, 'x')).rejects.toMatchObject({ code: 'ENOTREGULAR', kind: 'named pipe (FIFO)' });
    expect((await lstat(fifo)).isFIFO()).toBe(true);
    expect((await readdir(folder)).sort()).toEqual(['pipe', 'report.pdf']);
  });

  it('refuses to keep a backup over something that is not a regular file', async () => {
    const target = join(folder, 'b.hingeline');
    await writeFile(target, 'old');
    await mkdir(backupPathFor(target));
    await expect(writeFileAtomic(target, 'new', { keepBackup: true })).rejects.toMatchObject({ code: 'EISDIR' });
    expect(await readFile(target, 'utf8')).toBe('old');
  });

  it('checks the target again just before the final rename', async () => {
    const target = join(folder, 'swapped');
    const write = writeFileAtomic(target, 'data', {
      onProgress: async (progress) => {
        // A folder appears at the path while the data is being written.
        if (progress.stage === 'synced') await mkdir(target);
      },
    });
    await expect(write).rejects.toMatchObject({ code: 'EISDIR' });
    expect(await readdir(folder)).toEqual(['swapped']);
  });

  it('accepts a new path and a regular file', async () => {
    await expect(assertWritableTarget(join(folder, 'new.pdf'))).resolves.toBeUndefined();
    await writeFile(join(folder, 'old.pdf'), 'x');
    await expect(assertWritableTarget(join(folder, 'old.pdf'))).resolves.toBeUndefined();
  });
});

describe('removeStaleTemps', () => {
  it('removes temps of dead processes but not those of running ones', async () => {
    const target = join(folder, 'a.hingeline');
    let deadPid = 4_000_000;
    // Find a pid that is certainly not running.
    while (((): boolean => {
      try {
        process.kill(deadPid, 0);
        return true;
      } catch (error) {
        return (error as NodeJS.ErrnoException).code === 'EPERM';
      }
    })()) deadPid += 1;
    const dead = join(folder, `.a.hingeline${TEMP_MARKER}${deadPid}-aaaa`);
    const alive = join(folder, `.a.hingeline${TEMP_MARKER}${process.ppid}-bbbb`);
    const unrelated = join(folder, '.b.hingeline.hingeline-tmp-1-cccc');
    await Promise.all([writeFile(dead, 'x'), writeFile(alive, 'y'), writeFile(unrelated, 'z')]);

    expect(await removeStaleTemps(target)).toEqual([dead]);
    expect((await readdir(folder)).sort()).toEqual([alive, unrelated].map((path) => path.slice(folder.length + 1)).sort());
  });
});
