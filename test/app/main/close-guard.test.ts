import { describe, expect, it } from 'vitest';
import { CloseGuard } from '../../../app/main/close-guard.ts';

function guardWithClock(start = 1_000) {
  let now = start;
  const guard = new CloseGuard(() => now, 15_000);
  return { guard, advance: (ms: number) => (now += ms) };
}

describe('CloseGuard', () => {
  it('closes at once when there are no unsaved changes', () => {
    const { guard } = guardWithClock();
    expect(guard.requestClose()).toBe('close');
  });

  it('asks when the document is dirty; Cancel keeps the window', () => {
    const { guard } = guardWithClock();
    guard.setDirty(true);
    expect(guard.requestClose()).toBe('ask');
    expect(guard.resolveDialog('cancel')).toBe('stay');
    expect(guard.requestClose()).toBe('ask');
  });

  it("Don't Save closes and lets the repeated close event through", () => {
    const { guard } = guardWithClock();
    guard.setDirty(true);
    expect(guard.resolveDialog('discard')).toBe('close');
    expect(guard.requestClose()).toBe('close');
  });

  it('Save asks the renderer to save and closes when that save succeeds', () => {
    const { guard, advance } = guardWithClock();
    guard.setDirty(true);
    expect(guard.resolveDialog('save')).toBe('request-save');
    advance(200);
    guard.saveStarted();
    expect(guard.saveFinished(true)).toBe('close');
    expect(guard.requestClose()).toBe('close');
  });

  it('Save keeps the window when the user cancels the save dialog, and a later save does not close it', () => {
    const { guard } = guardWithClock();
    guard.setDirty(true);
    guard.resolveDialog('save');
    guard.saveStarted();
    expect(guard.saveFinished(false)).toBe('stay');
    expect(guard.requestClose()).toBe('ask');
    guard.saveStarted();
    expect(guard.saveFinished(true)).toBe('stay');
  });

  it('a save that starts long after the Save answer is an ordinary save, not part of closing', () => {
    const { guard, advance } = guardWithClock();
    guard.setDirty(true);
    guard.resolveDialog('save');
    advance(15_001);
    guard.saveStarted();
    expect(guard.saveFinished(true)).toBe('stay');
  });

  it('reset forgets an earlier permission to close', () => {
    const { guard } = guardWithClock();
    guard.setDirty(true);
    guard.resolveDialog('discard');
    guard.reset();
    guard.setDirty(true);
    expect(guard.requestClose()).toBe('ask');
  });
});
