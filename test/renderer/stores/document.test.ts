/**
 * The document store: undo and redo over project edits, merging of typing into one step, the
 * history cap, unsaved changes reported to the host, autosave after idle, saving and opening.
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { demoProjectSI } from '../../../core/project/demo.ts';
import { serializeProject } from '../../../core/project/file.ts';
import { setMemberField } from '../../../renderer/src/project/edits.ts';
import { AUTOSAVE_IDLE_MS, AUTOSAVE_MAX_WAIT_MS, HISTORY_LIMIT, ProjectFileError, useDocumentStore } from '../../../renderer/src/stores/document.ts';
import { testEnvironment } from '../support.ts';

afterEach(() => {
  vi.useRealTimers();
});

function openSI() {
  const env = testEnvironment();
  const store = useDocumentStore();
  store.openDemo('si');
  return { env, store };
}

const span = (store: ReturnType<typeof useDocumentStore>, id = 'MB-1') => store.project!.members.find((m) => m.id === id)!.span;

describe('undo and redo', () => {
  it('undo restores the project before the edit, redo the one after', () => {
    const { store } = openSI();
    const before = store.project;
    store.edit('Change span', (p) => setMemberField(p, 'MB-1', ['span'], 8000));
    expect(span(store)).toBe(8000);
    expect(store.undoLabel).toBe('Change span');
    store.undo();
    expect(store.project).toBe(before);
    expect(store.redoLabel).toBe('Change span');
    store.redo();
    expect(span(store)).toBe(8000);
    expect(store.canRedo).toBe(false);
  });

  it('a new edit after undo drops the redo steps', () => {
    const { store } = openSI();
    store.edit('a', (p) => setMemberField(p, 'MB-1', ['span'], 8000));
    store.undo();
    store.edit('b', (p) => setMemberField(p, 'MB-1', ['span'], 9000));
    expect(store.canRedo).toBe(false);
    store.undo();
    expect(span(store)).toBe(7200);
  });

  it('an edit that changes nothing is not an undo step', () => {
    const { store } = openSI();
    store.edit('nothing', (p) => setMemberField(p, 'MB-1', ['span'], 7200));
    expect(store.canUndo).toBe(false);
  });

  it('typing in one field is one undo step; leaving the field ends it', () => {
    const { store } = openSI();
    for (const value of [7, 72, 720, 7200.5]) store.edit('Change span', (p) => setMemberField(p, 'MB-1', ['span'], value), { coalesceKey: 'members:MB-1:span' });
    expect(store.past).toHaveLength(1);
    store.endCoalescing();
    store.edit('Change span', (p) => setMemberField(p, 'MB-1', ['span'], 7300), { coalesceKey: 'members:MB-1:span' });
    expect(store.past).toHaveLength(2);
    store.undo();
    store.undo();
    expect(span(store)).toBe(7200);
  });

  it(`keeps at most ${HISTORY_LIMIT} steps`, () => {
    const { store } = openSI();
    for (let i = 1; i <= HISTORY_LIMIT + 30; i++) store.edit(`step ${i}`, (p) => setMemberField(p, 'MB-1', ['span'], 7200 + i));
    expect(store.past).toHaveLength(HISTORY_LIMIT);
    expect(store.past[0]!.label).toBe('step 31');
  });
});

describe('unsaved changes', () => {
  it('are reported to the host, and clear when undo returns to the saved project', async () => {
    const { env, store } = openSI();
    store.edit('Change span', (p) => setMemberField(p, 'MB-1', ['span'], 8000));
    expect(store.dirty).toBe(true);
    await vi.waitFor(() => expect(env.host.documentState.dirty).toBe(true));
    store.undo();
    expect(store.dirty).toBe(false);
    await vi.waitFor(() => expect(env.host.documentState.dirty).toBe(false));
  });

  it(`are autosaved after ${AUTOSAVE_IDLE_MS} ms without edits, as project file text`, async () => {
    vi.useFakeTimers();
    const { env, store } = openSI();
    store.edit('Change span', (p) => setMemberField(p, 'MB-1', ['span'], 8000));
    await vi.advanceTimersByTimeAsync(AUTOSAVE_IDLE_MS - 500);
    store.edit('Change span again', (p) => setMemberField(p, 'MB-1', ['span'], 8100));
    await vi.advanceTimersByTimeAsync(AUTOSAVE_IDLE_MS - 500);
    expect(env.host.autosaves).toHaveLength(0);
    await vi.advanceTimersByTimeAsync(1000);
    await vi.waitFor(() => expect(env.host.autosaves).toHaveLength(1));
    expect(JSON.parse(env.host.autosaves[0]!).members[0].span).toBe(8100);
  });

  it(`are autosaved at least every ${AUTOSAVE_MAX_WAIT_MS / 1000} s while editing never pauses, and never more often than every ${AUTOSAVE_IDLE_MS / 1000} s`, async () => {
    vi.useFakeTimers();
    const { env, store } = openSI();
    const at: number[] = [];
    const start = Date.now();
    // An edit every second for 75 s: the idle autosave never comes.
    for (let i = 1; i <= 75; i++) {
      store.edit(`step ${i}`, (p) => setMemberField(p, 'MB-1', ['span'], 7200 + i));
      await vi.advanceTimersByTimeAsync(1000);
      while (at.length < env.host.autosaves.length) at.push(Date.now() - start);
    }
    expect(env.host.autosaves.length).toBeGreaterThanOrEqual(2);
    expect(at[0]).toBeLessThanOrEqual(AUTOSAVE_MAX_WAIT_MS + 1000);
    for (let i = 1; i < at.length; i++) expect(at[i]! - at[i - 1]!).toBeGreaterThanOrEqual(AUTOSAVE_IDLE_MS);
    for (let i = 1; i < at.length; i++) expect(at[i]! - at[i - 1]!).toBeLessThanOrEqual(AUTOSAVE_MAX_WAIT_MS + 1000);
  });

  it('are not autosaved when there are none', async () => {
    vi.useFakeTimers();
    const { env } = openSI();
    await vi.advanceTimersByTimeAsync(AUTOSAVE_IDLE_MS * 2);
    expect(env.host.autosaves).toHaveLength(0);
  });
});

describe('saving and opening', () => {
  it('saves through the host as project file text and is then not dirty', async () => {
    const { env, store } = openSI();
    store.edit('Change span', (p) => setMemberField(p, 'MB-1', ['span'], 8000));
    expect(await store.save()).toBe(true);
    const [path, text] = [...env.host.files.entries()][0]!;
    expect(path).toMatch(/\.hingeline$/);
    expect(text).toBe(serializeProject(store.project!));
    expect(store.dirty).toBe(false);
    expect(store.fileName).toMatch(/\.hingeline$/);
  });

  it('stays dirty when the save dialog is cancelled', async () => {
    const env = testEnvironment({ saveAsQueue: [null] });
    const store = useDocumentStore();
    store.openDemo('si');
    store.edit('Change span', (p) => setMemberField(p, 'MB-1', ['span'], 8000));
    expect(await store.save(true)).toBe(false);
    expect(store.dirty).toBe(true);
    expect(env.host.files.size).toBe(0);
  });

  it('opens a project file and starts a fresh history', async () => {
    const { store } = openSI();
    store.edit('Change span', (p) => setMemberField(p, 'MB-1', ['span'], 8000));
    const text = serializeProject(demoProjectSI());
    await store.openFile({ name: 'yard.hingeline', path: '/p/yard.hingeline', text });
    expect(store.title).toBe('yard.hingeline');
    expect(store.canUndo).toBe(false);
    expect(store.dirty).toBe(false);
    expect(span(store)).toBe(7200);
  });

  it('refuses a file that is not a project, saying why, and keeps the open project', async () => {
    const { store } = openSI();
    const before = store.project;
    const error = await store.openFile({ name: 'notes.json', path: null, text: '{"hello": 1' }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ProjectFileError);
    expect((error as ProjectFileError).diagnostics[0]!.message).toMatch(/not valid JSON/);
    expect(store.project).toBe(before);
  });

  it('restores an autosaved document as unsaved work', async () => {
    testEnvironment();
    const store = useDocumentStore();
    await store.restore({ text: serializeProject(demoProjectSI()), name: 'yard.hingeline' });
    expect(store.project?.members).toHaveLength(4);
    expect(store.dirty).toBe(true);
    expect(store.filePath).toBeNull();
  });
});
