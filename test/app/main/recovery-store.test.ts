import { mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { MAX_RECOVERIES, parseAutosave, RecoveryStore, serializeAutosave } from '../../../app/main/recovery-store.ts';

let folder: string;
const clock = () => new Date('2026-05-06T07:08:09.000Z');

beforeEach(async () => {
  folder = join(await mkdtemp(join(tmpdir(), 'hingeline-recovery-')), 'autosave');
});
afterEach(async () => {
  await rm(join(folder, '..'), { recursive: true, force: true });
});

describe('RecoveryStore', () => {
  it('offers nothing on a first start and marks the session open', async () => {
    const store = new RecoveryStore(folder, { now: clock });
    expect(await store.beginSession()).toEqual({ previousSessionCrashed: false, recoveryAvailable: false });
    expect(await readdir(folder)).toEqual(['session-open.json']);
    expect(await store.takeRecovery()).toBeNull();
  });

  it('after a crash, offers the last autosave with its title and time, until cleared', async () => {
    const crashed = new RecoveryStore(folder, { now: clock });
    await crashed.beginSession();
    await crashed.autosave('{"members":[1]}', 'Beam B1');
    await crashed.autosave('{"members":[1,2]}', 'Beam B1');
    // …the process dies here: endSession() never runs.

    const next = new RecoveryStore(folder, { now: () => new Date('2026-05-07T00:00:00.000Z') });
    expect(await next.beginSession()).toEqual({ previousSessionCrashed: true, recoveryAvailable: true });
    const recovery = { text: '{"members":[1,2]}', savedAt: '2026-05-06T07:08:09.000Z', name: 'Beam B1' };
    expect(await next.takeRecovery()).toEqual(recovery);
    expect(await next.takeRecovery()).toEqual(recovery); // taking does not remove it
    await next.clearRecovery();
    expect(await next.takeRecovery()).toBeNull();
  });

  it("this session's autosaves never overwrite the crashed session's document", async () => {
    const crashed = new RecoveryStore(folder, { now: clock });
    await crashed.beginSession();
    await crashed.autosave('old work', 'Frame');
    const next = new RecoveryStore(folder, { now: clock });
    await next.beginSession();
    await next.autosave('new work', 'Other');
    expect((await next.takeRecovery())?.text).toBe('old work');
  });

  it('after a clean exit, offers nothing and leaves no files', async () => {
    const first = new RecoveryStore(folder, { now: clock });
    await first.beginSession();
    await first.autosave('work', 'Beam');
    await first.endSession();
    expect(await readdir(folder)).toEqual([]);
    const second = new RecoveryStore(folder, { now: clock });
    expect(await second.beginSession()).toEqual({ previousSessionCrashed: false, recoveryAvailable: false });
  });

  it('discards a stray autosave of a session that did end cleanly', async () => {
    const store = new RecoveryStore(folder, { now: clock });
    await store.beginSession();
    await store.endSession();
    await writeFile(join(folder, 'autosave.json'), serializeAutosave({ text: 'stray', savedAt: '2026-01-01T00:00:00Z', name: 'x' }));
    await new RecoveryStore(folder, { now: clock }).beginSession();
    expect((await readdir(folder)).sort()).toEqual(['session-open.json']);
  });

  it('treats a corrupt recovery file as no recovery', async () => {
    const crashed = new RecoveryStore(folder, { now: clock });
    await crashed.beginSession();
    await writeFile(join(folder, 'autosave.json'), '{"format":"hingeline-autosave","version":1,"text":');
    const next = new RecoveryStore(folder, { now: clock });
    expect(await next.beginSession()).toEqual({ previousSessionCrashed: true, recoveryAvailable: false });
    expect(await next.takeRecovery()).toBeNull();
  });

  it('a renderer crash within the session turns the current autosave into the recovery', async () => {
    const store = new RecoveryStore(folder, { now: clock });
    await store.beginSession();
    expect(await store.setAsideAutosave()).toBe(false);
    await store.autosave('unsaved edits', 'Beam');
    expect(await store.setAsideAutosave()).toBe(true);
    expect((await store.takeRecovery())?.text).toBe('unsaved edits');
  });

  it('a second crash before the user answered keeps the first crash’s document, and offers both in turn', async () => {
    const first = new RecoveryStore(folder, { now: clock });
    await first.beginSession();
    await first.autosave('work before the first crash', 'Frame A');
    // Crash 1. The next session starts and sets that work aside; the question is on screen…
    const second = new RecoveryStore(folder, { now: () => new Date('2026-05-07T00:00:00.000Z') });
    await second.beginSession();
    await second.autosave('work before the second crash', 'Frame B');
    // …and the renderer crashes before the user answered (or the whole app does).
    expect(await second.setAsideAutosave()).toBe(true);
    const third = new RecoveryStore(folder, { now: clock });
    await third.beginSession();
    expect((await readdir(folder)).filter((n) => n.startsWith('recovered')).sort()).toEqual(['recovered-2.json', 'recovered.json']);
    expect(await third.takeRecovery()).toMatchObject({ text: 'work before the first crash', name: 'Frame A' });
    await third.clearRecovery();
    expect(await third.takeRecovery()).toMatchObject({ text: 'work before the second crash', name: 'Frame B' });
    await third.clearRecovery();
    expect(await third.takeRecovery()).toBeNull();
  });

  it('keeps at most MAX_RECOVERIES unanswered documents, dropping the oldest', async () => {
    const store = new RecoveryStore(folder, { now: clock });
    await store.beginSession();
    for (let i = 1; i <= MAX_RECOVERIES + 2; i++) {
      await store.autosave(`crash ${i}`, 'Beam');
      await store.setAsideAutosave();
    }
    expect((await readdir(folder)).filter((n) => n.startsWith('recovered'))).toHaveLength(MAX_RECOVERIES);
    expect((await store.takeRecovery())?.text).toBe('crash 3');
  });

  it('skips an unreadable recovery and offers the next one', async () => {
    const store = new RecoveryStore(folder, { now: clock });
    await store.beginSession();
    await store.autosave('first', 'A');
    await store.setAsideAutosave();
    await store.autosave('second', 'B');
    await store.setAsideAutosave();
    await writeFile(join(folder, 'recovered.json'), 'not json');
    expect((await store.takeRecovery())?.text).toBe('second');
  });

  it('writes the autosave as a versioned envelope', async () => {
    const store = new RecoveryStore(folder, { now: clock });
    await store.beginSession();
    await store.autosave('{"a":1}', 'Beam "B1"');
    const stored = JSON.parse(await readFile(join(folder, 'autosave.json'), 'utf8'));
    expect(stored).toEqual({ format: 'hingeline-autosave', version: 1, text: '{"a":1}', name: 'Beam "B1"', savedAt: '2026-05-06T07:08:09.000Z' });
  });
});

describe('parseAutosave', () => {
  it('rejects other formats, versions and malformed snapshots', () => {
    const good = { format: 'hingeline-autosave', version: 1, text: 't', savedAt: '2026-01-01T00:00:00Z', name: 'n' };
    expect(parseAutosave(JSON.stringify(good))).toEqual({ text: 't', savedAt: '2026-01-01T00:00:00Z', name: 'n' });
    expect(parseAutosave(JSON.stringify({ ...good, format: 'other' }))).toBeNull();
    expect(parseAutosave(JSON.stringify({ ...good, version: 2 }))).toBeNull();
    expect(parseAutosave(JSON.stringify({ ...good, savedAt: 'soon' }))).toBeNull();
    expect(parseAutosave(JSON.stringify({ ...good, extra: 1 }))).toBeNull();
    expect(parseAutosave('null')).toBeNull();
    expect(parseAutosave('')).toBeNull();
  });
});
