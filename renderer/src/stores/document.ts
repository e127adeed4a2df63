/**
 * The open project document: the project itself (plain, immutable data in internal SI units),
 * undo/redo over its edits, the file it came from, unsaved changes, autosave and recovery.
 *
 * The project sits in a shallowRef and is never mutated: every edit produces a new root that
 * shares untouched objects with the old one (project/immutable.ts). Undo snapshots are therefore
 * cheap, and `dirty` is simply "not the object that was last saved".
 */
import { defineStore } from 'pinia';
import { computed, ref, shallowRef, toRaw, watch } from 'vue';
import type { Diagnostic } from '../../../core/diagnostics.ts';
import { demoProject, demoProjectSI } from '../../../core/project/demo.ts';
import { projectFileStem } from '../../../core/project/file-stem.ts';
import type { Project } from '../../../core/project/types.ts';
import { historyRevision } from '../composables/field-history.ts';
import { getHost, type OpenedFile } from '../host/index.ts';
import { PROJECT_EXTENSION } from '../host/host-api.ts';
import { isoDate, newProject } from '../project/factories.ts';
import { engines } from '../workers/engine.ts';
import type { WorkerReply } from '../workers/protocol.ts';

/** Most undo steps kept. */
export const HISTORY_LIMIT = 200;
/** Edits of one field closer together than this merge into one undo step, ms. */
export const COALESCE_MS = 1500;
/** Idle time after an edit before the autosave copy is written, ms. */
export const AUTOSAVE_IDLE_MS = 4000;
/** Longest an edit waits for its autosave while editing goes on without a pause, ms. */
export const AUTOSAVE_MAX_WAIT_MS = 30_000;

export interface HistoryEntry {
  readonly project: Project;
  /** What the edit did, e.g. `Change span` (shown as "Undo Change span"). */
  readonly label: string;
}

export interface EditOptions {
  /** Successive edits with the same key (typing in one field) merge into one undo step. */
  readonly coalesceKey?: string;
}

/** The file could not be read as a project; `diagnostics` say why. */
export class ProjectFileError extends Error {
  constructor(readonly fileName: string, readonly diagnostics: readonly Diagnostic[]) {
    super(`"${fileName}" could not be opened as a Hingeline project.`);
    this.name = 'ProjectFileError';
  }
}

async function workerText(message: { type: 'serialize'; project: Project }): Promise<string> {
  const reply = await engines().interactive.request(message).finished;
  if (reply.type !== 'text') throw new Error('The project could not be written.');
  return reply.text;
}

export const useDocumentStore = defineStore('document', () => {
  const host = getHost();
  const project = shallowRef<Project | null>(null);
  const savedProject = shallowRef<Project | null>(null);
  const fileName = ref<string | null>(null);
  const filePath = ref<string | null>(null);
  /** Problems reported when the file was opened (warnings and errors the user may still fix). */
  const openDiagnostics = shallowRef<readonly Diagnostic[]>([]);
  const past = shallowRef<readonly HistoryEntry[]>([]);
  const future = shallowRef<readonly HistoryEntry[]>([]);
  let coalescing: { key: string; at: number } | null = null;
  let autosaveTimer: ReturnType<typeof setTimeout> | null = null;

  const dirty = computed(() => project.value !== null && project.value !== savedProject.value);
  const title = computed(() => fileName.value ?? project.value?.info.name ?? 'Untitled');
  const canUndo = computed(() => past.value.length > 0);
  const canRedo = computed(() => future.value.length > 0);
  const undoLabel = computed(() => past.value[past.value.length - 1]?.label ?? null);
  const redoLabel = computed(() => future.value[future.value.length - 1]?.label ?? null);

  function load(next: Project, name: string | null, path: string | null, saved: boolean): void {
    project.value = next;
    savedProject.value = saved ? next : null;
    fileName.value = name;
    filePath.value = path;
    past.value = [];
    future.value = [];
    coalescing = null;
  }

  /**
   * Applies an edit. `change` returns the new project (or the same object when nothing changed).
   * The previous project goes on the undo stack unless the edit continues the last one.
   */
  function edit(label: string, change: (current: Project) => Project, options: EditOptions = {}): void {
    const before = project.value;
    if (!before) return;
    const after = change(before);
    if (after === before) return;
    const now = Date.now();
    const continues = options.coalesceKey !== undefined && coalescing?.key === options.coalesceKey && now - coalescing.at < COALESCE_MS && past.value.length > 0;
    if (!continues) past.value = [...past.value, { project: before, label }].slice(-HISTORY_LIMIT);
    future.value = [];
    coalescing = options.coalesceKey !== undefined ? { key: options.coalesceKey, at: now } : null;
    project.value = after;
  }

  /** Ends the merging of edits (e.g. when a field loses focus): the next edit is its own undo step. */
  function endCoalescing(): void {
    coalescing = null;
  }

  function undo(): void {
    const last = past.value[past.value.length - 1];
    if (!last || !project.value) return;
    past.value = past.value.slice(0, -1);
    future.value = [...future.value, { project: project.value, label: last.label }];
    historyRevision.value++;
    project.value = last.project;
    coalescing = null;
  }

  function redo(): void {
    const next = future.value[future.value.length - 1];
    if (!next || !project.value) return;
    future.value = future.value.slice(0, -1);
    past.value = [...past.value, { project: project.value, label: next.label }];
    historyRevision.value++;
    project.value = next.project;
    coalescing = null;
  }

  /** Parses file text in the worker; throws ProjectFileError when it holds no usable project. */
  async function parse(text: string, name: string): Promise<{ project: Project; diagnostics: readonly Diagnostic[] }> {
    const reply: WorkerReply = await engines().interactive.request({ type: 'parse', text }).finished;
    if (reply.type !== 'parsed') throw new Error('The file could not be read.');
    if (!reply.project) throw new ProjectFileError(name, reply.diagnostics);
    return { project: reply.project, diagnostics: reply.diagnostics };
  }

  /** Opens a file handed over by the host. Throws ProjectFileError for files that are not projects. */
  async function openFile(file: OpenedFile): Promise<readonly Diagnostic[]> {
    const parsed = await parse(file.text, file.name);
    load(parsed.project, file.name, file.path, true);
    openDiagnostics.value = parsed.diagnostics;
    return parsed.diagnostics;
  }

  /** Restores an autosaved document: opened as unsaved work under its old name. */
  async function restore(recovery: { text: string; name: string }): Promise<void> {
    const parsed = await parse(recovery.text, recovery.name);
    load(parsed.project, null, null, false);
    openDiagnostics.value = parsed.diagnostics;
  }

  function openDemo(kind: 'us' | 'si' = 'us'): void {
    const demo = kind === 'us' ? demoProject() : demoProjectSI();
    load(demo, null, null, true);
    openDiagnostics.value = [];
  }

  function createNew(system: 'si' | 'us', code: Project['info']['codeBasis']): void {
    load(newProject(system, code, isoDate(new Date())), null, null, false);
    openDiagnostics.value = [];
  }

  function suggestedName(): string {
    return `${projectFileStem(fileName.value ?? project.value?.info.name ?? 'project')}${PROJECT_EXTENSION}`;
  }

  /** The project as file text (written in the worker). */
  async function text(): Promise<string> {
    if (!project.value) throw new Error('There is no project to write.');
    return workerText({ type: 'serialize', project: toRaw(project.value) });
  }

  /** Saves; returns false when the user cancelled the dialog. */
  async function save(saveAs = false): Promise<boolean> {
    const current = project.value;
    if (!current) return false;
    const content = await workerText({ type: 'serialize', project: toRaw(current) });
    const result = await host.saveProject(content, { path: filePath.value, suggestedName: suggestedName(), saveAs: saveAs || filePath.value === null });
    if (!result) return false;
    fileName.value = result.name;
    filePath.value = result.path;
    savedProject.value = current;
    return true;
  }

  function close(): void {
    project.value = null;
    savedProject.value = null;
    fileName.value = null;
    filePath.value = null;
    past.value = [];
    future.value = [];
    openDiagnostics.value = [];
  }

  // Window title and the unsaved-changes flag (the host warns on close).
  watch([title, dirty], ([t, d]) => host.setDocumentState({ title: t.slice(0, 300), dirty: d }), { immediate: true });

  // Autosave after a few seconds of idle editing, and at least every AUTOSAVE_MAX_WAIT_MS while
  // editing goes on: never more often than once per AUTOSAVE_IDLE_MS (the desktop host limits
  // the rate of writes again on its side).
  let unsavedSince: number | null = null;
  let lastAutosave = Number.NEGATIVE_INFINITY;
  function writeAutosave(): void {
    autosaveTimer = null;
    unsavedSince = null;
    if (!dirty.value) return;
    lastAutosave = Date.now();
    text().then((content) => host.autosave(content)).catch(() => {
      // An autosave that fails is retried after the next edit; the document itself is intact.
    });
  }
  watch(project, () => {
    if (autosaveTimer) clearTimeout(autosaveTimer);
    autosaveTimer = null;
    if (!dirty.value) {
      unsavedSince = null;
      return;
    }
    const now = Date.now();
    unsavedSince ??= now;
    const overdue = unsavedSince + AUTOSAVE_MAX_WAIT_MS - now;
    const delay = Math.max(Math.min(AUTOSAVE_IDLE_MS, overdue), lastAutosave + AUTOSAVE_IDLE_MS - now, 0);
    autosaveTimer = setTimeout(writeAutosave, delay);
  });

  return {
    project, savedProject, fileName, filePath, openDiagnostics, past, future,
    dirty, title, canUndo, canRedo, undoLabel, redoLabel,
    edit, endCoalescing, undo, redo, openFile, restore, openDemo, createNew, save, text, close, suggestedName, load,
  };
});
