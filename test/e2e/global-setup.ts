/**
 * Global setup of the `e2e` Vitest project: checks that Chromium is there and builds the web UI
 * once before the test files run (the files also call `ensureWebBuild`, which then finds the
 * build fresh and does nothing).
 */
import { ensureWebBuild, requireChromium } from './support/environment.ts';

export default function setup(): void {
  requireChromium();
  ensureWebBuild();
}
