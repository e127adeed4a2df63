// The renderer may not import app/, so the bridge shape, the command list and a few constants
// exist twice. These checks fail (at run time, or in `tsc -p tsconfig.test.json`) when the copies drift.
import { describe, expect, expectTypeOf, it } from 'vitest';
import { RESULTS_CAUTION as SHARED_CAUTION } from '../../app/shared/about.ts';
import type { HingelineBridge } from '../../app/shared/bridge.ts';
import { EXPORT_TYPES, PROJECT_EXTENSION as SHARED_EXTENSION } from '../../app/shared/file-types.ts';
import { MENU_COMMANDS as SHARED_COMMANDS, type MenuCommand as SharedMenuCommand } from '../../app/shared/menu-commands.ts';
import type { HostBridge } from '../../renderer/src/host/bridge-types.ts';
import {
  EXPORT_EXTENSIONS,
  MENU_COMMANDS as RENDERER_COMMANDS,
  PROJECT_EXTENSION as RENDERER_EXTENSION,
  RESULTS_CAUTION as RENDERER_CAUTION,
  type MenuCommand as RendererMenuCommand,
} from '../../renderer/src/host/host-api.ts';

// Type-level: each side must accept the other's bridge (checked by `npm run typecheck`).
const preloadSatisfiesRenderer = (bridge: HingelineBridge): HostBridge => bridge;
const rendererSatisfiesPreload = (bridge: HostBridge): HingelineBridge => bridge;

describe('bridge contract between app/shared and renderer/src/host', () => {
  it('has the same bridge shape and the same menu command type on both sides', () => {
    expectTypeOf<SharedMenuCommand>().toEqualTypeOf<RendererMenuCommand>();
    expectTypeOf<HingelineBridge>().toExtend<HostBridge>();
    expectTypeOf<HostBridge>().toExtend<HingelineBridge>();
    expect([preloadSatisfiesRenderer, rendererSatisfiesPreload].every((check) => typeof check === 'function')).toBe(true);
  });

  it('lists the same menu commands in the same order', () => {
    expect([...RENDERER_COMMANDS]).toEqual([...SHARED_COMMANDS]);
  });

  it('agrees on export types, the project extension and the caution text', () => {
    expect(EXPORT_EXTENSIONS).toEqual(Object.fromEntries(EXPORT_TYPES.map((type) => [type.mime, type.extension])));
    expect(RENDERER_EXTENSION).toBe(SHARED_EXTENSION);
    expect(RENDERER_CAUTION).toBe(SHARED_CAUTION);
  });
});
