import { beforeEach, describe, expect, it, vi } from 'vitest';

const exposed = vi.hoisted(() => ({ calls: [] as Array<[string, unknown]> }));

vi.mock('electron', () => ({
  contextBridge: { exposeInMainWorld: (key: string, api: unknown) => exposed.calls.push([key, api]) },
  ipcRenderer: { invoke: vi.fn(), send: vi.fn(), on: vi.fn(), removeListener: vi.fn() },
}));

describe('app/preload/index.ts', () => {
  beforeEach(() => {
    exposed.calls.length = 0;
    vi.resetModules();
  });

  it('exposes one object, window.hingelineHost, made only of functions', async () => {
    await import('../../../app/preload/index.ts');
    expect(exposed.calls).toHaveLength(1);
    const [key, api] = exposed.calls[0]!;
    expect(key).toBe('hingelineHost');
    const values = Object.values(api as Record<string, unknown>);
    expect(values.length).toBe(12);
    expect(values.every((value) => typeof value === 'function')).toBe(true);
    expect(Object.keys(api as object)).not.toContain('ipcRenderer');
  });
});
