/**
 * Packaging with electron-builder 26 (Linux AppImage + deb, Windows NSIS, macOS dmg).
 *
 *   npm run build:electron && npx electron-builder --config build/electron-builder.config.ts --linux
 *
 * Packaging downloads the Electron runtime for the target platform, so it cannot run offline.
 * dmg builds only on macOS; Windows installers from Linux need Wine.
 * test/app/electron-builder-config.test.ts loads this file through electron-builder's own
 * loader and schema validation.
 */
import type { Configuration } from 'electron-builder';

const projectFile = {
  ext: 'hingeline',
  name: 'Hingeline project',
  description: 'Hingeline project (JSON)',
  mimeType: 'application/x-hingeline-project+json',
  role: 'Editor',
  rank: 'Owner',
} as const;

const config: Configuration = {
  appId: 'app.hingeline.desktop',
  productName: 'Hingeline',
  copyright: 'Copyright © Hingeline developers',
  directories: {
    output: 'dist/packages/${version}',
    buildResources: 'build',
  },
  // Main, preload and renderer are bundled by electron-vite; the app needs nothing from
  // node_modules at run time (main imports only Node built-ins and electron).
  files: ['out/main/**/*', 'out/preload/**/*', 'out/renderer/**/*', 'package.json', '!node_modules/**/*', '!**/*.map'],
  asar: true,
  // Nothing native is shipped (see `files`), so there is nothing to rebuild for Electron.
  npmRebuild: false,
  fileAssociations: [projectFile],
  artifactName: '${productName}-${version}-${os}-${arch}.${ext}',
  electronFuses: {
    runAsNode: false,
    enableCookieEncryption: true,
    enableNodeOptionsEnvironmentVariable: false,
    enableNodeCliInspectArguments: false,
    enableEmbeddedAsarIntegrityValidation: true,
    onlyLoadAppFromAsar: true,
    loadBrowserProcessSpecificV8Snapshot: false,
    grantFileProtocolExtraPrivileges: false,
  },
  linux: {
    target: ['AppImage', 'deb'],
    icon: 'build/icons/png',
    category: 'Science',
    executableName: 'hingeline',
    // deb needs a maintainer with an e-mail address (package.json "author" has none) and a
    // project homepage (package.json "homepage"), which the project does not have yet.
    maintainer: 'Hingeline developers <developers@hingeline.invalid>',
    synopsis: 'Reinforced-concrete beam assessment',
    description: 'Moment–curvature, load–deflection, plastic hinge and service-deflection assessment of reinforced-concrete beams.',
    mimeTypes: [projectFile.mimeType],
    desktop: { entry: { StartupWMClass: 'Hingeline' } },
  },
  deb: {
    packageCategory: 'science',
    priority: 'optional',
  },
  win: {
    target: ['nsis'],
    icon: 'build/icons/icon.ico',
  },
  nsis: {
    oneClick: false,
    perMachine: false,
    allowToChangeInstallationDirectory: true,
    createDesktopShortcut: true,
    createStartMenuShortcut: true,
    shortcutName: 'Hingeline',
    deleteAppDataOnUninstall: false,
  },
  mac: {
    target: ['dmg'],
    icon: 'build/icons/icon.icns',
    category: 'public.app-category.productivity',
    hardenedRuntime: true,
  },
  dmg: {
    title: 'Hingeline ${version}',
  },
};

export default config;
