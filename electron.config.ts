/**
 * electron-vite build of the desktop app: `npm run build:electron` → out/main, out/preload,
 * out/renderer. Entries are explicit because the sources are not in electron-vite's default
 * src/main, src/preload, src/renderer.
 */
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import vue from '@vitejs/plugin-vue';
import { defineConfig } from 'electron-vite';

const root = fileURLToPath(new URL('.', import.meta.url));

export default defineConfig({
  main: {
    build: {
      outDir: resolve(root, 'out/main'),
      // Main imports only Node built-ins and electron; bundle everything else into out/main.
      externalizeDeps: false,
      rolldownOptions: {
        input: { index: resolve(root, 'app/main/index.ts') },
        // ES module (package.json is "type": "module"), named as package.json "main" expects.
        output: { format: 'es', entryFileNames: '[name].js' },
      },
    },
  },
  preload: {
    build: {
      outDir: resolve(root, 'out/preload'),
      // A sandboxed preload cannot require node_modules: bundle all of app/shared into it.
      externalizeDeps: false,
      rolldownOptions: {
        input: { index: resolve(root, 'app/preload/index.ts') },
        // Sandboxed preloads run as classic scripts with a limited `require`: CommonJS only.
        output: { format: 'cjs', entryFileNames: '[name].cjs', codeSplitting: false },
      },
    },
  },
  renderer: {
    root: resolve(root, 'renderer'),
    plugins: [vue()],
    build: {
      outDir: resolve(root, 'out/renderer'),
      rolldownOptions: {
        input: { index: resolve(root, 'renderer/index.html') },
      },
    },
  },
});
