/**
 * `getHost()`: the HostApi this page runs under, chosen once:
 * 1. a fake host when an end-to-end test set `window.hingelineTestHost` (see fake-host.ts);
 * 2. the Electron host when the preload exposed `window.hingelineHost`;
 * 3. the browser host otherwise.
 */
import './bridge-types.ts';
import { createElectronHost } from './electron-host.ts';
import { createFakeHostFromGlobal } from './fake-host.ts';
import type { HostApi } from './host-api.ts';
import { createWebHost } from './web-host.ts';

export type { HostApi, MenuCommand, OpenedFile } from './host-api.ts';
export { MENU_COMMANDS, RESULTS_CAUTION } from './host-api.ts';
export { createFakeHost, type FakeHost, type FakeHostSeed } from './fake-host.ts';

let current: HostApi | null = null;

/** Picks the host for `target` (default: this window) without caching. */
export function selectHost(target: Window = window): HostApi {
  if (target.hingelineTestHost) return createFakeHostFromGlobal(target.hingelineTestHost);
  if (target.hingelineHost) return createElectronHost(target.hingelineHost);
  return createWebHost({ window: target });
}

/** The host of this page (created on first use). */
export function getHost(): HostApi {
  current ??= selectHost();
  return current;
}

/** Replaces the host for component tests; `null` returns to automatic selection. */
export function setHostForTesting(host: HostApi | null): void {
  current = host;
}
