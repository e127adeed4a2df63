import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildVerbose, checkElectronRuntime, webBuildOptions, type RuntimeProbe } from '../../../build/scripts/start-app.ts';

function probe(files: Record<string, string>, overrides: Partial<RuntimeProbe> = {}): RuntimeProbe {
  return {
    root: '/repo',
    env: { DISPLAY: ':0' },
    platform: 'linux',
    exists: (path) => path in files,
    readText: (path) => files[path] ?? null,
    electronPackageFolder: '/repo/node_modules/electron',
    ...overrides,
  };
}

describe('checkElectronRuntime (decided from files only, never by requiring electron)', () => {
  it('finds the downloaded binary named in path.txt', () => {
    const files = { '/repo/node_modules/electron/path.txt': 'electron', '/repo/node_modules/electron/dist/electron': 'ELF' };
    expect(checkElectronRuntime(probe(files))).toEqual({ available: true, binary: join('/repo/node_modules/electron/dist', 'electron') });
  });

  it('explains a missing path.txt: the runtime was never downloaded', () => {
    const result = checkElectronRuntime(probe({}));
    expect(result).toEqual({
      available: false,
      reason: 'node_modules/electron/path.txt is missing: the Electron binary was never downloaded and cannot be downloaded on this machine',
    });
  });

  it('explains a path.txt whose binary is gone', () => {
    const result = checkElectronRuntime(probe({ '/repo/node_modules/electron/path.txt': 'electron' }));
    expect(result).toEqual({ available: false, reason: 'the Electron binary node_modules/electron/dist/electron is missing' });
  });

  it('explains a missing electron package', () => {
    expect(checkElectronRuntime(probe({}, { electronPackageFolder: null }))).toEqual({ available: false, reason: 'the electron package is not installed (run npm install)' });
  });

  it('honours ELECTRON_OVERRIDE_DIST_PATH', () => {
    const files = { '/opt/electron/electron': 'ELF' };
    expect(checkElectronRuntime(probe(files, { env: { DISPLAY: ':0', ELECTRON_OVERRIDE_DIST_PATH: '/opt/electron' } }))).toEqual({ available: true, binary: '/opt/electron/electron' });
  });

  it('falls back to the browser on Linux without a display, but not on Windows or macOS', () => {
    const files = { '/repo/node_modules/electron/path.txt': 'electron', '/repo/node_modules/electron/dist/electron': 'ELF' };
    expect(checkElectronRuntime(probe(files, { env: {} }))).toEqual({ available: false, reason: 'there is no graphical display (DISPLAY and WAYLAND_DISPLAY are unset)' });
    expect(checkElectronRuntime(probe(files, { env: { WAYLAND_DISPLAY: 'wayland-0' } })).available).toBe(true);
    expect(checkElectronRuntime(probe(files, { env: {}, platform: 'win32' })).available).toBe(true);
  });
});

describe('the bundlers’ own reports during npm start (issue 15 item 10)', () => {
  it('are hidden unless asked for with --verbose or HINGELINE_VERBOSE=1', () => {
    expect(buildVerbose([], {})).toBe(false);
    expect(buildVerbose(['--web'], { HINGELINE_VERBOSE: '0' })).toBe(false);
    expect(buildVerbose(['--verbose'], {})).toBe(true);
    expect(buildVerbose([], { HINGELINE_VERBOSE: '1' })).toBe(true);
    const quiet = webBuildOptions(false);
    expect(quiet.logLevel).toBe('error');
    expect(quiet.build).toEqual({ chunkSizeWarningLimit: 100_000, rolldownOptions: { checks: { pluginTimings: false } } });
    const verbose = webBuildOptions(true);
    expect(verbose.logLevel).toBe('info');
    expect('build' in verbose).toBe(false);
  });
});
