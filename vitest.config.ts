import { defineConfig } from 'vitest/config';
import vue from '@vitejs/plugin-vue';
import { readFileSync, readdirSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { BaseSequencer, type TestSpecification } from 'vitest/node';

const electronStub = fileURLToPath(new URL('./test/app/electron-stub.ts', import.meta.url));

/**
 * Time budgets. No test may depend on the machine's speed (speed is measured in `npm run bench`),
 * and the machine is shared: with two other busy processes on two cores a test that takes 1 s alone
 * can take 5–10 s, and with several test suites of other work running at once (load 25–42 on 3 Dec
 * 2026) a test of 12 s alone took 77 s. So every project gets budgets far above any test's normal
 * time; a test that exceeds them hangs rather than being slow. A heavy test that sets its own
 * budget sets 240 s or more.
 */
const BUDGET = { testTimeout: 300_000, hookTimeout: 600_000 } as const;

/**
 * Worker processes: one per core, at least two. Vitest's own default is one fewer than the cores,
 * which on the 2-core machine ran every file on a single worker while the second core idled.
 */
const WORKERS = Math.max(2, availableParallelism());

const CORE_TESTS = ['test/core', 'test/references'];
const APP_TESTS = ['test/app'];
const RENDERER_TESTS = ['test/renderer'];

/**
 * Test files under `folders` that replace or spy on a module or a global (`vi.mock`, `vi.doMock`,
 * `vi.spyOn`, `vi.stubGlobal`, `vi.stubEnv`), fake the clock or pick their own environment. The
 * other files of the core, app and renderer projects share one module graph per worker (see those
 * projects), where a replaced module would reach every file after this one through the modules that
 * import it; these run isolated instead (`core-isolated`, `app-isolated`, `renderer-isolated`).
 */
function replacingTests(folders: readonly string[]): string[] {
  return folders.flatMap((folder) => readdirSync(fileURLToPath(new URL(folder, import.meta.url)), { recursive: true, encoding: 'utf8' })
    .filter((file) => file.endsWith('.test.ts'))
    .map((file) => `${folder}/${file.replaceAll('\\', '/')}`)
    .filter((file) => /\bvi\.(?:(?:do)?[mM]ock|spyOn|stubGlobal|stubEnv|useFakeTimers)\(|@vitest-environment/.test(readFileSync(fileURLToPath(new URL(file, import.meta.url)), 'utf8'))));
}

const MOCKING_CORE_TESTS = replacingTests(CORE_TESTS);
const MOCKING_APP_TESTS = replacingTests(APP_TESTS);
const MOCKING_RENDERER_TESTS = replacingTests(RENDERER_TESTS);

/**
 * The heaviest files, heaviest first (wall seconds of each under load 18–23 on the 2-core machine,
 * `--reporter=json`, 3 Dec 2026: 100, 86, 55, 52, 47, 40, 36, 33, 30, 30, 25, 24, 23). They start
 * before every other file, whatever their project: on a clean clone Vitest knows no durations and
 * starts each project's larger files first, project after project, so the renderer's store tests
 * and the end-to-end files ran last and a single file could keep one worker busy for a minute after
 * the other had run out of files.
 */
const HEAVY_FIRST = [
  'test/app/report/write-report.test.ts',
  'test/renderer/stores/analysis.test.ts',
  'test/app/cli/parallel.test.ts',
  'test/renderer/stores/continuous.test.ts',
  'test/e2e/report-export.test.ts',
  'test/renderer/views/ProjectOverview.test.ts',
  'test/app/cli/bin.test.ts',
  'test/app/cli/main.test.ts',
  'test/e2e/existing-beam.test.ts',
  'test/core/project/fuzz.test.ts',
  'test/e2e/workspace.test.ts',
  'test/e2e/engineer.test.ts',
  'test/core/assessment/metamorphic.property.test.ts',
];

/** Vitest's order (its cached durations when it has them), with the files of HEAVY_FIRST moved to the front. */
class HeavyFirstSequencer extends BaseSequencer {
  override async sort(files: TestSpecification[]): Promise<TestSpecification[]> {
    const sorted = await super.sort(files);
    const rank = (file: TestSpecification) => {
      const index = HEAVY_FIRST.indexOf(relative(this.ctx.config.root, file.moduleId).replaceAll('\\', '/'));
      return index < 0 ? HEAVY_FIRST.length : index;
    };
    return sorted.map((file, order) => ({ file, order })).sort((a, b) => rank(a.file) - rank(b.file) || a.order - b.order).map(({ file }) => file);
  }
}

/**
 * One Vitest run, projects that mirror where code runs: core (pure, Node; `core-isolated` for its
 * files that replace a module), app (Node with a stubbed `electron`), renderer (happy-dom + Vue),
 * e2e (built web UI in Debian's Chromium through playwright-core).
 */
export default defineConfig({
  test: {
    maxWorkers: WORKERS,
    sequence: { sequencer: HeavyFirstSequencer },
    projects: [
      {
        test: {
          name: 'core',
          environment: 'node',
          ...BUDGET,
          // Pure code: the files of a worker share one module graph instead of each importing the
          // engine afresh (importing, not testing, took most of a small file's time).
          isolate: false,
          include: CORE_TESTS.map((folder) => `${folder}/**/*.test.ts`),
          exclude: MOCKING_CORE_TESTS,
          benchmark: { include: ['test/bench/**/*.bench.ts'] },
        },
      },
      {
        test: {
          name: 'core-isolated',
          environment: 'node',
          ...BUDGET,
          include: MOCKING_CORE_TESTS.length > 0 ? MOCKING_CORE_TESTS : ['test/core/no-mocking-tests'],
        },
      },
      {
        resolve: { alias: { electron: electronStub } },
        test: {
          name: 'app',
          environment: 'node',
          ...BUDGET,
          // As core: the files of a worker share one module graph (importing core and app afresh
          // for each file was about a third of the project's CPU time).
          isolate: false,
          include: APP_TESTS.map((folder) => `${folder}/**/*.test.ts`),
          exclude: MOCKING_APP_TESTS,
        },
      },
      {
        resolve: { alias: { electron: electronStub } },
        test: {
          name: 'app-isolated',
          environment: 'node',
          ...BUDGET,
          include: MOCKING_APP_TESTS.length > 0 ? MOCKING_APP_TESTS : ['test/app/no-mocking-tests'],
        },
      },
      {
        plugins: [vue()],
        test: {
          name: 'renderer',
          environment: 'happy-dom',
          ...BUDGET,
          // As core: one module graph per worker (Vue, Pinia, the views and core imported once);
          // each test starts from a fresh Pinia, host and workers (test/renderer/support.ts).
          isolate: false,
          include: RENDERER_TESTS.map((folder) => `${folder}/**/*.test.ts`),
          exclude: MOCKING_RENDERER_TESTS,
        },
      },
      {
        plugins: [vue()],
        test: {
          name: 'renderer-isolated',
          environment: 'happy-dom',
          ...BUDGET,
          include: MOCKING_RENDERER_TESTS.length > 0 ? MOCKING_RENDERER_TESTS : ['test/renderer/no-mocking-tests'],
        },
      },
      {
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['test/e2e/**/*.test.ts'],
          globalSetup: ['test/e2e/global-setup.ts'],
          ...BUDGET,
          // Files run beside the other projects' files (each has its own pages in the one shared
          // browser): one file at a time made the e2e files a tail of about three minutes under
          // load on one core, after every other file had ended.
        },
      },
    ],
  },
});
