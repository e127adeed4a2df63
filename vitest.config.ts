import { defineConfig } from 'vitest/config';
import vue from '@vitejs/plugin-vue';
import { fileURLToPath } from 'node:url';

const electronStub = fileURLToPath(new URL('./test/app/electron-stub.ts', import.meta.url));

/**
 * Time budgets. No test may depend on the machine's speed (speed is measured in `npm run bench`),
 * and the machine is shared: with two other busy processes on two cores a test that takes 1 s alone
 * can take 5–10 s. So every project gets budgets far above any test's normal time; a test that
 * exceeds them hangs rather than being slow.
 */
const BUDGET = { testTimeout: 120_000, hookTimeout: 240_000 } as const;

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
          ...BUDGET,
          include: ['test/core/**/*.test.ts', 'test/references/**/*.test.ts'],
          benchmark: { include: ['test/bench/**/*.bench.ts'] },
        },
      },
      {
        resolve: { alias: { electron: electronStub } },
        test: {
          name: 'app',
          environment: 'node',
          ...BUDGET,
          include: ['test/app/**/*.test.ts'],
        },
      },
      {
        plugins: [vue()],
        test: {
          name: 'renderer',
          environment: 'happy-dom',
          ...BUDGET,
          include: ['test/renderer/**/*.test.ts'],
        },
      },
      {
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['test/e2e/**/*.test.ts'],
          globalSetup: ['test/e2e/global-setup.ts'],
          ...BUDGET,
          fileParallelism: false,
        },
      },
    ],
  },
});
