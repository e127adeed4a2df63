import { defineConfig } from 'vitest/config';
import vue from '@vitejs/plugin-vue';
import { fileURLToPath } from 'node:url';

const electronStub = fileURLToPath(new URL('./test/app/electron-stub.ts', import.meta.url));

/**
 * One Vitest run, four projects that mirror where code runs:
 * core (pure, Node), app (Node with a stubbed `electron`), renderer (happy-dom + Vue),
 * e2e (built web UI in Debian's Chromium through playwright-core).
 */
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'core',
          environment: 'node',
          include: ['test/core/**/*.test.ts', 'test/references/**/*.test.ts'],
          benchmark: { include: ['test/bench/**/*.bench.ts'] },
        },
      },
      {
        resolve: { alias: { electron: electronStub } },
        test: {
          name: 'app',
          environment: 'node',
          include: ['test/app/**/*.test.ts'],
        },
      },
      {
        plugins: [vue()],
        test: {
          name: 'renderer',
          environment: 'happy-dom',
          include: ['test/renderer/**/*.test.ts'],
        },
      },
      {
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['test/e2e/**/*.test.ts'],
          globalSetup: ['test/e2e/global-setup.ts'],
          testTimeout: 120_000,
          hookTimeout: 240_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
