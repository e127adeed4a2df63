/**
 * Global setup of the `e2e` Vitest project: checks that Chromium is there, builds the web UI, and
 * starts one browser and one static server for every e2e file (a file connects with
 * `startE2e(inject('e2e'))`; launching Chromium per file took 2–3 s each on the loaded machine).
 * Stops them when the project is done.
 */
import type { TestProject } from 'vitest/node';
import { startSharedE2e, type SharedE2e } from './support/environment.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    e2e: SharedE2e;
  }
}

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const shared = await startSharedE2e();
  project.provide('e2e', { browserEndpoint: shared.browserEndpoint, serverUrl: shared.serverUrl });
  return () => shared.close();
}
