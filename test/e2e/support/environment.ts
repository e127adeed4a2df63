/**
 * End-to-end support: the web build (rebuilt when a source is newer than it), a static server on
 * 127.0.0.1 (build/scripts/web-server.ts), Debian's Chromium through playwright-core, and the fake
 * host seed injected before the app starts (renderer/src/host/fake-host.ts).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readdirSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type Page } from 'playwright-core';
import { startWebServer } from '../../../build/scripts/web-server.ts';
import type { FakeHostSeed } from '../../../renderer/src/host/fake-host.ts';

export const ROOT = resolve(fileURLToPath(new URL('../../..', import.meta.url)));
export const WEB_ROOT = join(ROOT, 'out', 'web');
export const ARTIFACTS = join(ROOT, 'test-artifacts', 'e2e');
export const CHROMIUM = process.env.HINGELINE_CHROMIUM ?? '/usr/bin/chromium';
export const CHROMIUM_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-dev-shm-usage', '--disable-background-networking'];

/** Fails with a clear message when Debian's Chromium is not installed (never skips silently). */
export function requireChromium(): void {
  if (!existsSync(CHROMIUM)) {
    throw new Error(`End-to-end tests need Chromium at ${CHROMIUM}. Install it with "apt-get install -y chromium" (.ci/run does this), or set HINGELINE_CHROMIUM to its path.`);
  }
}

function newestMtime(folder: string): number {
  let newest = 0;
  for (const entry of readdirSync(folder, { withFileTypes: true })) {
    const path = join(folder, entry.name);
    if (entry.isDirectory()) newest = Math.max(newest, newestMtime(path));
    else newest = Math.max(newest, statSync(path).mtimeMs);
  }
  return newest;
}

/** Builds the web UI (`npm run build:web`) unless out/web is newer than every source it is made from. */
export function ensureWebBuild(): void {
  const index = join(WEB_ROOT, 'index.html');
  const sources = Math.max(newestMtime(join(ROOT, 'renderer')), newestMtime(join(ROOT, 'core')), statSync(join(ROOT, 'vite.web.config.ts')).mtimeMs);
  if (existsSync(index) && statSync(index).mtimeMs > sources) return;
  // The production build users get: under Vitest NODE_ENV is 'test', which would make Vite build Vue's
  // development variant (about 60 kB more, with dev-only warnings) and test something no user runs.
  const run = spawnSync('npm', ['run', 'build:web'], { cwd: ROOT, encoding: 'utf8', timeout: 600_000, env: { ...process.env, NODE_ENV: 'production' } });
  if (run.status !== 0) throw new Error(`npm run build:web failed:\n${run.stdout}\n${run.stderr}`);
}

export interface E2eContext {
  /** The web build's server (its address). */
  readonly server: { readonly url: string };
  readonly browser: Browser;
  close(): Promise<void>;
}

/** A browser and a server started once for every e2e file (test/e2e/global-setup.ts). */
export interface SharedE2e {
  /** Where test files connect to the browser (playwright's WebSocket endpoint). */
  readonly browserEndpoint: string;
  /** `http://127.0.0.1:<port>/` */
  readonly serverUrl: string;
}

const LAUNCH = { executablePath: CHROMIUM, headless: true, args: CHROMIUM_ARGS };

/**
 * Starts Chromium and the web build's server once, for all e2e files: each file connects to them
 * (`startE2e(inject('e2e'))`) instead of launching its own browser. `close` stops both.
 */
export async function startSharedE2e(): Promise<SharedE2e & { close(): Promise<void> }> {
  requireChromium();
  ensureWebBuild();
  mkdirSync(ARTIFACTS, { recursive: true });
  const server = await startWebServer(WEB_ROOT, 0);
  const browser = await chromium.launchServer(LAUNCH);
  return {
    browserEndpoint: browser.wsEndpoint(),
    serverUrl: server.url,
    async close() {
      await browser.close();
      await server.close();
    },
  };
}

/**
 * Build, serve and launch (call in beforeAll). With `shared` (from the e2e global setup), connects
 * to its browser and server instead; `close` then closes this file's pages and disconnects.
 */
export async function startE2e(shared?: SharedE2e): Promise<E2eContext> {
  if (shared) {
    const browser = await chromium.connect(shared.browserEndpoint);
    return { server: { url: shared.serverUrl }, browser, close: () => browser.close() };
  }
  requireChromium();
  ensureWebBuild();
  mkdirSync(ARTIFACTS, { recursive: true });
  const server = await startWebServer(WEB_ROOT, 0);
  const browser = await chromium.launch(LAUNCH);
  return {
    server,
    browser,
    async close() {
      await browser.close();
      await server.close();
    },
  };
}

/**
 * A page of the app with the fake host seeded. Console errors and page errors are collected in
 * `problems` (a test asserts there are none). The report worker's PDF bytes are kept on
 * `window.__hingelinePdf` (a test-only hook on Worker messages, outside the app).
 */
export async function openApp(context: E2eContext, seed: FakeHostSeed = {}, viewport = { width: 1440, height: 900 }): Promise<{ page: Page; problems: string[] }> {
  const page = await context.browser.newPage({ viewport });
  const problems: string[] = [];
  page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
  page.on('console', (message) => {
    if (message.type() === 'error' && !/favicon/.test(message.text())) problems.push(`console error: ${message.text()}`);
  });
  await page.addInitScript((s) => {
    (window as unknown as { hingelineTestHost: unknown }).hingelineTestHost = s;
    const Original = window.Worker;
    window.Worker = class extends Original {
      constructor(url: string | URL, options?: WorkerOptions) {
        super(url, options);
        this.addEventListener('message', (event: MessageEvent) => {
          const data = event.data as { type?: string; bytes?: Uint8Array };
          if (data?.type === 'pdf' && data.bytes) (window as unknown as { __hingelinePdf: number[] }).__hingelinePdf = Array.from(data.bytes);
        });
      }
    } as typeof Worker;
  }, seed);
  await page.goto(context.server.url);
  return { page, problems };
}

/** Saves a screenshot under test-artifacts/e2e/. */
export async function snap(page: Page, name: string): Promise<string> {
  const path = join(ARTIFACTS, `${name}.png`);
  await page.screenshot({ path });
  return path;
}
