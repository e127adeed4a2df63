/**
 * What the user is looking at: the view, the selected member, the overview's sorting and
 * filters, the open input tab, the dialogs waiting for an answer and passing notices.
 * No project data lives here.
 */
import { defineStore } from 'pinia';
import { ref, shallowRef } from 'vue';

export type View = 'start' | 'overview' | 'member' | 'project';

export type OverviewColumn =
  | 'name' | 'supports' | 'span' | 'yieldMoment' | 'ultimateMoment' | 'curvatureDuctility' | 'displacementDuctility'
  | 'rotation' | 'deflection' | 'utilisation' | 'strength' | 'governing' | 'status';

export type StatusFilter = 'all' | 'ok' | 'check-fails' | 'brittle' | 'review' | 'not-converged' | 'input-error' | 'pending';

/** Input tabs of the member workspace: the beam, its section, materials, and for existing beams the condition and schemes. */
export type InputTab = 'beam' | 'section' | 'materials' | 'as-found' | 'strengthening';
/** Result tabs of the member workspace. */
export type ResultTab = 'moment-curvature' | 'load-deflection' | 'span' | 'service' | 'ductility' | 'shear' | 'comparison';

export interface DialogButton {
  readonly id: string;
  readonly label: string;
  readonly kind?: 'primary' | 'danger' | 'plain';
}

export interface DialogRequest {
  readonly title: string;
  readonly message: string;
  /** Optional list under the message (e.g. problems found in a file). */
  readonly details?: readonly string[];
  /** Optional two-column table under the message (e.g. keys and what they do). */
  readonly table?: readonly (readonly [string, string])[];
  /** Optional table with column heads under the message (e.g. the rows a CSV import would add); widens the dialog. */
  readonly grid?: { readonly head: readonly string[]; readonly rows: readonly (readonly string[])[] };
  readonly buttons: readonly DialogButton[];
  /** Button id chosen by Escape (default: the last button). */
  readonly cancelId?: string;
}

interface OpenDialog extends DialogRequest {
  readonly resolve: (id: string) => void;
}

export interface Notice {
  readonly id: number;
  readonly kind: 'info' | 'success' | 'error';
  readonly text: string;
}

export const useWorkspaceStore = defineStore('workspace', () => {
  const view = ref<View>('start');
  const selectedMemberId = ref<string | null>(null);
  const sortColumn = ref<OverviewColumn>('name');
  const sortDescending = ref(false);
  const filterText = ref('');
  const statusFilter = ref<StatusFilter>('all');
  /** Text of the side bar's member search. */
  const memberFilter = ref('');
  /** Input tab of the member workspace. */
  const inputTab = ref<InputTab>('beam');
  /** Result tab of the member workspace. */
  const resultTab = ref<ResultTab>('moment-curvature');
  /** The zone whose section the section tab edits (index into the member's zones). */
  const zoneIndex = ref(0);
  const dialog = shallowRef<OpenDialog | null>(null);
  const notices = ref<Notice[]>([]);
  /** A long task in progress (report, export), shown in the status bar. */
  const task = ref<{ label: string; done: number; total: number } | null>(null);
  let nextNotice = 1;

  function openMember(id: string): void {
    if (selectedMemberId.value !== id) zoneIndex.value = 0;
    selectedMemberId.value = id;
    view.value = 'member';
  }

  function showOverview(): void {
    view.value = 'overview';
  }

  /** Another document was opened (or made): filters of the last one would hide its members. */
  function resetForDocument(): void {
    filterText.value = '';
    statusFilter.value = 'all';
    memberFilter.value = '';
    zoneIndex.value = 0;
  }

  function sortBy(column: OverviewColumn): void {
    if (sortColumn.value === column) sortDescending.value = !sortDescending.value;
    else {
      sortColumn.value = column;
      sortDescending.value = false;
    }
  }

  /** Shows a dialog and resolves with the id of the button chosen. One dialog at a time: a new one answers the old with its cancel id. */
  function ask(request: DialogRequest): Promise<string> {
    const previous = dialog.value;
    if (previous) previous.resolve(previous.cancelId ?? previous.buttons[previous.buttons.length - 1]?.id ?? 'cancel');
    return new Promise((resolve) => {
      dialog.value = {
        ...request,
        resolve: (id) => {
          dialog.value = null;
          resolve(id);
        },
      };
    });
  }

  function answer(id: string): void {
    dialog.value?.resolve(id);
  }

  function notify(kind: Notice['kind'], text: string, durationMs = kind === 'error' ? 9000 : 4000): void {
    const notice = { id: nextNotice++, kind, text };
    notices.value = [...notices.value.slice(-3), notice];
    if (durationMs > 0) setTimeout(() => dismiss(notice.id), durationMs);
  }

  function dismiss(id: number): void {
    notices.value = notices.value.filter((n) => n.id !== id);
  }

  return {
    view, selectedMemberId, sortColumn, sortDescending, filterText, statusFilter, memberFilter, inputTab, resultTab, zoneIndex, dialog, notices, task,
    openMember, showOverview, resetForDocument, sortBy, ask, answer, notify, dismiss,
  };
});
