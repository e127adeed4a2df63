/**
 * The shape of `window.hingelineHost` as the renderer sees it. The renderer may not import
 * from app/, so this mirrors app/shared/bridge.ts; test/app/bridge-contract.test.ts checks that
 * the two stay assignable to each other.
 */
import type { FakeHostGlobal } from './fake-host.ts';
import type { HostApi } from './host-api.ts';

export type HostBridge = Omit<HostApi, 'kind'>;

declare global {
  interface Window {
    /** Set by the Electron preload. */
    hingelineHost?: HostBridge;
    /** Set by end-to-end tests before the app starts (see fake-host.ts). */
    hingelineTestHost?: FakeHostGlobal;
  }
}
