import { readFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import type { Configuration } from 'electron-builder';
import { APP_USER_MODEL_ID } from '../../../app/main/main-process.ts';
import { PROJECT_EXTENSION, PROJECT_MIME_TYPE } from '../../../app/shared/file-types.ts';

const root = fileURLToPath(new URL('../../../', import.meta.url));
const CONFIG = 'build/electron-builder.config.ts';

/** Loads the config the way `electron-builder --config build/electron-builder.config.ts` does, and validates it against electron-builder's schema. */
async function loadAsElectronBuilderDoes(): Promise<Configuration> {
  const { getConfig, validateConfiguration } = await import('app-builder-lib/out/util/config/config.js');
  const { DebugLogger } = await import('builder-util');
  const config = await getConfig(root, CONFIG, null);
  await validateConfiguration(config, new DebugLogger(false));
  return config;
}

function pngSize(bytes: Buffer): { width: number; height: number } {
  expect(bytes.subarray(0, 8).toString('hex')).toBe('89504e470d0a1a0a');
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

describe('electron-builder configuration', () => {
  it('passes electron-builder’s own loader and schema validation', async () => {
    const config = await loadAsElectronBuilderDoes();
    expect(config.appId).toBe('app.hingeline.desktop');
    expect(config.appId).toBe(APP_USER_MODEL_ID); // Windows groups taskbar items by this id
    expect(config.productName).toBe('Hingeline');
  }, 240_000);

  it('targets AppImage and deb, NSIS, and dmg', async () => {
    const config = (await import('../../../build/electron-builder.config.ts')).default;
    expect(config.linux?.target).toEqual(['AppImage', 'deb']);
    expect(config.win?.target).toEqual(['nsis']);
    expect(config.mac?.target).toEqual(['dmg']);
  });

  it('associates .hingeline project files (JSON inside) with the app', async () => {
    const config = (await import('../../../build/electron-builder.config.ts')).default;
    const associations = [config.fileAssociations].flat();
    expect(associations).toEqual([expect.objectContaining({ ext: PROJECT_EXTENSION.slice(1), mimeType: PROJECT_MIME_TYPE, role: 'Editor' })]);
    expect(config.linux?.mimeTypes).toContain(PROJECT_MIME_TYPE);
  });

  it('sets the security fuses: no run-as-node, no NODE_OPTIONS, no inspector, asar only and validated, no file:// extras', async () => {
    const config = (await import('../../../build/electron-builder.config.ts')).default;
    expect(config.electronFuses).toEqual({
      runAsNode: false,
      enableCookieEncryption: true,
      enableNodeOptionsEnvironmentVariable: false,
      enableNodeCliInspectArguments: false,
      enableEmbeddedAsarIntegrityValidation: true,
      onlyLoadAppFromAsar: true,
      loadBrowserProcessSpecificV8Snapshot: false,
      grantFileProtocolExtraPrivileges: false,
    });
    expect(config.asar).toBe(true);
  });

  it('packs only the bundled build output, no sources and no node_modules', async () => {
    const config = (await import('../../../build/electron-builder.config.ts')).default;
    expect(config.files).toEqual(expect.arrayContaining(['out/main/**/*', 'out/preload/**/*', 'out/renderer/**/*', 'package.json', '!node_modules/**/*']));
    expect(JSON.stringify(config.files)).not.toMatch(/app\/|renderer\/src|core\//);
    const pkg = JSON.parse(await readFile(`${root}package.json`, 'utf8')) as { main: string };
    expect(pkg.main).toBe('out/main/index.js'); // what electron-vite emits (electron.config.ts)
  });

  it('points at icons that exist in the sizes each platform needs', async () => {
    const config = (await import('../../../build/electron-builder.config.ts')).default;
    expect(config.win?.icon).toBe('build/icons/icon.ico');
    expect(config.mac?.icon).toBe('build/icons/icon.icns');
    expect(config.linux?.icon).toBe('build/icons/png');
    for (const size of [16, 32, 48, 64, 128, 256, 512]) {
      expect(pngSize(await readFile(`${root}build/icons/png/${size}x${size}.png`))).toEqual({ width: size, height: size });
    }
    const ico = await readFile(`${root}build/icons/icon.ico`);
    expect([ico.readUInt16LE(0), ico.readUInt16LE(2)]).toEqual([0, 1]);
    expect(ico.readUInt16LE(4)).toBeGreaterThanOrEqual(5);
    expect(ico.readUInt8(6 + 16 * (ico.readUInt16LE(4) - 1))).toBe(0); // the largest entry is 256 px (stored as 0)
    const icns = await readFile(`${root}build/icons/icon.icns`);
    expect(icns.subarray(0, 4).toString('ascii')).toBe('icns');
    expect(icns.readUInt32BE(4)).toBe(icns.length);
    expect(icns.includes(Buffer.from('ic10'))).toBe(true); // 1024 px for Retina
  });
});
