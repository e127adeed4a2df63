/**
 * Browser build of the same renderer: `npm run build:web` → out/web (ignored by git with out/).
 * Served by `npm start` when Electron is not available, or by any static web server.
 */
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import vue from '@vitejs/plugin-vue';
import { defineConfig } from 'vite';

const root = fileURLToPath(new URL('.', import.meta.url));

export default defineConfig({
  root: resolve(root, 'renderer'),
  base: './',
  plugins: [vue()],
  build: {
    outDir: resolve(root, 'out/web'),
    emptyOutDir: true,
    target: 'es2022',
  },
  preview: { host: '127.0.0.1' },
  server: { host: '127.0.0.1' },
});
