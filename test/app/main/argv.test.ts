import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { projectPathFromArgv, userArguments, wantsDemoProject } from '../../../app/main/argv.ts';

describe('projectPathFromArgv', () => {
  it('takes the first project file after the executable in a packaged app', () => {
    expect(projectPathFromArgv(['/opt/Hingeline/hingeline', '/jobs/Beam B1.hingeline'], { cwd: '/home/e', isPackaged: true })).toBe('/jobs/Beam B1.hingeline');
  });

  it('skips the app path argument in development', () => {
    expect(projectPathFromArgv(['/x/electron', '.', 'frame.json'], { cwd: '/home/e', isPackaged: false })).toBe(resolve('/home/e', 'frame.json'));
    expect(projectPathFromArgv(['/x/electron', 'demo.hingeline'], { cwd: '/home/e', isPackaged: false })).toBeNull();
  });

  it('resolves relative paths against the (second instance) working directory', () => {
    expect(projectPathFromArgv(['hingeline', 'sub/a.hingeline'], { cwd: '/work/jobs', isPackaged: true })).toBe(resolve('/work/jobs', 'sub/a.hingeline'));
  });

  it('ignores Chromium switches, macOS process serial numbers and other file types', () => {
    const argv = ['hingeline', '--allow-file-access-from-files', '-psn_0_12345', '--inspect=9229', 'notes.txt', '/jobs/b.hingeline'];
    expect(projectPathFromArgv(argv, { cwd: '/', isPackaged: true })).toBe('/jobs/b.hingeline');
  });

  it('is null when no project file is given', () => {
    expect(projectPathFromArgv(['hingeline'], { cwd: '/', isPackaged: true })).toBeNull();
    expect(projectPathFromArgv([], { cwd: '/', isPackaged: true })).toBeNull();
    expect(projectPathFromArgv(['hingeline', ''], { cwd: '/', isPackaged: true })).toBeNull();
  });
});

describe('wantsDemoProject', () => {
  it('is true for --demo among the user arguments only', () => {
    expect(wantsDemoProject(['electron', '.', '--demo'], false)).toBe(true);
    expect(wantsDemoProject(['hingeline', '--demo'], true)).toBe(true);
    expect(wantsDemoProject(['electron', '--demo'], false)).toBe(false);
    expect(userArguments(['a', 'b', 'c'], false)).toEqual(['c']);
  });
});
