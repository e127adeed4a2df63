/**
 * Editing helpers for the forms: write one field of one item as an undoable edit (typing in one
 * field merges into one undo step), and read core's diagnostics for a field.
 */
import { computed } from 'vue';
import type { Project, ProjectInfo, AnalysisSettings } from '../../../core/project/types.ts';
import type { PathKey } from '../project/immutable.ts';
import { setIn } from '../project/immutable.ts';
import { setItemField } from '../project/edits.ts';
import { useAnalysisStore } from '../stores/analysis.ts';
import { useDocumentStore } from '../stores/document.ts';
import type { ItemList } from '../workers/protocol.ts';
import type { FieldMessage } from '../components/NumberField.vue';

/** Dotted field path as diagnostics write it: ['bars', 0, 'depth'] → `bars[0].depth`. */
export function fieldPath(path: readonly PathKey[]): string {
  return path.reduce<string>((text, key) => (typeof key === 'number' ? `${text}[${key}]` : text === '' ? key : `${text}.${key}`), '');
}

const NO_MESSAGES: readonly FieldMessage[] = Object.freeze([]);

export function useEditing() {
  const documentStore = useDocumentStore();
  const analysis = useAnalysisStore();
  const system = computed(() => documentStore.project?.info.unitSystem ?? 'si');
  const project = computed(() => documentStore.project as Project);

  function setField(list: ItemList, id: string, path: readonly PathKey[], value: unknown, label: string): void {
    documentStore.edit(label, (p) => setItemField(p, list, id, path, value), { coalesceKey: `${list}:${id}:${fieldPath(path)}` });
  }

  function setInfo<K extends keyof ProjectInfo>(key: K, value: ProjectInfo[K], label: string): void {
    documentStore.edit(label, (p) => setIn(p, ['info', key], value), { coalesceKey: `info:${key}` });
  }

  function setSetting<K extends keyof AnalysisSettings>(key: K, value: AnalysisSettings[K], label: string): void {
    documentStore.edit(label, (p) => setIn(p, ['settings', key], value), { coalesceKey: `settings:${key}` });
  }

  /**
   * Diagnostics of one field (or, with `prefix`, of the fields under it). A field without any gets
   * the same empty list every time, so that its props stay equal and it is not re-rendered.
   */
  function messages(list: ItemList | 'project', id: string, path: readonly PathKey[] | string, prefix = false): readonly FieldMessage[] {
    const field = typeof path === 'string' ? path : fieldPath(path);
    const found = analysis.diagnosticsOf(list, id, field, prefix);
    return found.length === 0 ? NO_MESSAGES : found.map((d) => ({ message: d.message, severity: d.severity }));
  }

  return { system, project, setField, setInfo, setSetting, messages, done: () => documentStore.endCoalescing(), edit: documentStore.edit };
}
