/**
 * What each menu command does (from the native menu, the browser's shortcuts, or the buttons of
 * the interface). The renderer owns these decisions; the host only carries files and dialogs.
 */
import type { Diagnostic } from '../../core/diagnostics.ts';
import { projectFileStem } from '../../core/project/file-stem.ts';

import { revertFocusedField } from './composables/field-history.ts';
import { getHost, RESULTS_CAUTION, type MenuCommand, type OpenedFile } from './host/index.ts';
import { addMemberWithOwnSection, duplicateMember, deleteMember } from './project/edits.ts';
import { newMember } from './project/factories.ts';
import { addContinuousMember, deleteContinuousMember, duplicateContinuousMember, newContinuousMember } from './project/continuous-edits.ts';
import { useContinuousStore } from './stores/continuous.ts';
import { shortcutsFor } from './project/shortcuts.ts';
import { useAnalysisStore } from './stores/analysis.ts';
import { ProjectFileError, useDocumentStore } from './stores/document.ts';
import { useWorkspaceStore } from './stores/workspace.ts';
import { exportReport } from './report/export-report.ts';
import type { ImportedItem, ImportSources } from '../../core/project/import.ts';
import type { CsvKind } from './project/import-preview.ts';

/** A diagnostic as one line, `members[3] "B-12" span: must be …` (the file-level wording of core/project). */
function describeDiagnostic(d: Diagnostic): string {
  const path = d.path.replace(/^(\w+\[\d+\] "(?:[^"\\]|\\.)*")\./, '$1 ');
  return `${d.severity === 'warning' ? 'warning: ' : ''}${path}: ${d.message}`;
}

const baseName = projectFileStem;

export function useCommands() {
  const host = getHost();
  const documentStore = useDocumentStore();
  const analysis = useAnalysisStore();
  const continuous = useContinuousStore();
  const workspace = useWorkspaceStore();

  function fail(what: string, error: unknown): void {
    workspace.notify('error', `${what}: ${error instanceof Error ? error.message : String(error)}`);
  }

  /** Asks before the open project is replaced; false when the user keeps it. */
  async function confirmDiscard(): Promise<boolean> {
    if (!documentStore.dirty) return true;
    const choice = await workspace.ask({
      title: 'Unsaved changes',
      message: `Save the changes to “${documentStore.title}” before closing it?`,
      buttons: [
        { id: 'save', label: 'Save', kind: 'primary' },
        { id: 'discard', label: 'Don’t save', kind: 'danger' },
        { id: 'cancel', label: 'Cancel' },
      ],
      cancelId: 'cancel',
    });
    if (choice === 'cancel') return false;
    if (choice === 'save') {
      try {
        return await documentStore.save(false);
      } catch (error) {
        fail('Saving failed', error);
        return false;
      }
    }
    return true;
  }

  function afterOpen(): void {
    analysis.reset();
    continuous.reset();
    workspace.resetForDocument();
    const first = documentStore.project?.members[0];
    workspace.selectedMemberId = first?.id ?? null;
    workspace.showOverview();
    void analysis.analyseAll();
  }

  async function showFileProblems(name: string, diagnostics: readonly Diagnostic[], opened: boolean): Promise<void> {
    const errors = diagnostics.filter((d) => d.severity === 'error');
    if (diagnostics.length === 0) return;
    if (opened && errors.length === 0) {
      workspace.notify('info', `${name} opened with ${diagnostics.length} note${diagnostics.length === 1 ? '' : 's'}; see Project → Problems.`);
      return;
    }
    await workspace.ask({
      title: opened ? `${name}: problems to fix` : `${name} could not be opened`,
      message: opened
        ? `The project opened, but ${errors.length} input problem${errors.length === 1 ? '' : 's'} must be fixed before the members concerned can be analysed.`
        : 'The file is not a Hingeline project this version can read. What was found:',
      details: diagnostics.slice(0, 40).map(describeDiagnostic),
      buttons: [{ id: 'ok', label: 'OK', kind: 'primary' }],
    });
  }

  async function openFile(file: OpenedFile): Promise<void> {
    try {
      const diagnostics = await documentStore.openFile(file);
      afterOpen();
      await showFileProblems(file.name, diagnostics, true);
    } catch (error) {
      if (error instanceof ProjectFileError) await showFileProblems(error.fileName, error.diagnostics, false);
      else fail(`Opening ${file.name} failed`, error);
    }
  }

  async function open(): Promise<void> {
    if (!(await confirmDiscard())) return;
    try {
      const file = await host.openProject();
      if (file) await openFile(file);
    } catch (error) {
      fail('Opening failed', error);
    }
  }

  async function openRecent(path: string): Promise<void> {
    if (!(await confirmDiscard())) return;
    try {
      const file = await host.openRecent(path);
      if (file) await openFile(file);
      else workspace.notify('error', `${path} could not be opened (moved, deleted, or access was not granted).`);
    } catch (error) {
      fail('Opening failed', error);
    }
  }

  async function openDemo(kind: 'us' | 'si' = 'us'): Promise<void> {
    if (!(await confirmDiscard())) return;
    documentStore.openDemo(kind);
    afterOpen();
  }

  async function createNew(): Promise<void> {
    if (!(await confirmDiscard())) return;
    const choice = await workspace.ask({
      title: 'New project',
      message: 'Units and design code of the new project (both can be changed later in Project settings):',
      buttons: [
        { id: 'si-en', label: 'SI, EN 1992-1-1', kind: 'primary' },
        { id: 'si-aci', label: 'SI, ACI 318-19' },
        { id: 'us-aci', label: 'US customary, ACI 318-19' },
        { id: 'cancel', label: 'Cancel' },
      ],
      cancelId: 'cancel',
    });
    if (choice === 'cancel') return;
    documentStore.createNew(choice.startsWith('us') ? 'us' : 'si', choice.endsWith('en') ? 'EN 1992-1-1' : 'ACI 318-19');
    analysis.reset();
    continuous.reset();
    workspace.resetForDocument();
    const first = documentStore.project?.members[0];
    if (first) workspace.openMember(first.id);
  }

  async function save(saveAs: boolean): Promise<void> {
    if (!documentStore.project) return;
    try {
      if (await documentStore.save(saveAs)) workspace.notify('success', `Saved as ${documentStore.fileName}.`);
    } catch (error) {
      fail('Saving failed', error);
    }
  }

  async function exportCsv(): Promise<void> {
    if (!documentStore.project) return;
    try {
      workspace.task = { label: 'Results summary: analysing', done: 0, total: documentStore.project.members.length };
      const text = await analysis.resultsCsv((done, total) => {
        workspace.task = { label: 'Results summary: analysing', done, total };
      }).finally(() => {
        workspace.task = null;
      });
      const written = await host.exportFile(text, { suggestedName: `${baseName(documentStore.title)} results.csv`, mime: 'text/csv', openAfterwards: false });
      if (written) workspace.notify('success', `Results written to ${written.name}.`);
    } catch (error) {
      fail('The CSV export failed', error);
    }
  }

  /**
   * Imports members from a CSV file into the open project: the preview (importDialog) shows every
   * row and problem first; the import is one undoable edit. Nothing changes on Cancel, and with
   * errors nothing is imported unless the user chooses to import the members without errors.
   */
  async function importCsv(): Promise<void> {
    if (!documentStore.project) {
      workspace.notify('error', 'Open or create a project first: imported members join the project that is open.');
      return;
    }
    let file: OpenedFile | null;
    try {
      file = await host.openCsv();
    } catch (error) {
      fail('The CSV file could not be read', error);
      return;
    }
    if (!file) return;
    // Loaded on first use: the import validates like a project file (zod), which stays out of the page's bundle.
    const [{ applyImport, importCountText, planImport }, { csvKindOf, importDialog }] = await Promise.all([import('../../core/project/import.ts'), import('./project/import-preview.ts')]);
    let kind: CsvKind = csvKindOf(file.text);
    for (;;) {
      const current = documentStore.project;
      if (!current) return;
      const sources: ImportSources = { [kind]: { name: file.name, text: file.text } };
      const plan = planImport(current, sources);
      const choice = await workspace.ask(importDialog(plan, current.info.unitSystem, file.name, kind, current.members.length + (current.continuousMembers?.length ?? 0)));
      if (choice === 'switch') {
        kind = kind === 'members' ? 'spans' : 'members';
        continue;
      }
      if (choice !== 'import' && choice !== 'import-good') return;
      let added: readonly ImportedItem[] = [];
      documentStore.edit(`Import from ${file.name}`, (p) => {
        // The project may have changed while the dialog was open (an autosave does not, an edit would).
        const applied = applyImport(p, p === current ? plan : planImport(p, sources), { keepGoodRows: choice === 'import-good' });
        added = applied?.added ?? [];
        return applied?.project ?? p;
      });
      if (added.length === 0) return;
      workspace.resetForDocument();
      workspace.showOverview();
      workspace.notify('success', `${importCountText(added)} imported from ${file.name}. Undo (Ctrl+Z) takes the import back.`, 7000);
      return;
    }
  }

  async function exportPdf(scope?: 'member' | 'project'): Promise<void> {
    if (!documentStore.project) return;
    // A continuous beam has no member report yet (the report's chapter for it is to come): the project's.
    const continuousOpen = workspace.view === 'member' && (documentStore.project.continuousMembers ?? []).some((m) => m.id === workspace.selectedMemberId);
    scope ??= workspace.view === 'member' && !continuousOpen ? 'member' : 'project';
    if (continuousOpen) scope = 'project';
    try {
      const written = await exportReport(scope);
      if (written) workspace.notify('success', `Report written to ${written.name}.`);
    } catch (error) {
      fail('The report could not be made', error);
    }
  }

  /**
   * The app's undo, also inside a field (never the browser's own, which would replay keystrokes
   * into text the app has rewritten): a field's unstored text goes first, then the last edit.
   */
  function undo(): void {
    if (revertFocusedField()) return;
    documentStore.undo();
  }

  function redo(): void {
    if (revertFocusedField()) return;
    documentStore.redo();
  }

  /**
   * Adds a member after the one open (or at the end). It gets its own copy of the open member's
   * section (else of the last member's, else of the first section), never a silent share: its
   * Section tab says where the copy came from, and another section can be chosen there.
   */
  function addNewMember(): void {
    const project = documentStore.project;
    if (!project) return;
    const current = project.members.find((m) => m.id === workspace.selectedMemberId && workspace.view === 'member');
    const from = current ?? project.members[project.members.length - 1];
    const template = project.sections.find((s) => s.id === from?.zones[0]?.sectionId) ?? project.sections[0];
    if (!template) {
      workspace.notify('error', 'Add a section to the project before adding members.');
      return;
    }
    const member = newMember(project, template.id);
    const added = addMemberWithOwnSection(project, member, template, current?.id);
    documentStore.edit(`Add member ${member.name}`, (p) => (p === project ? added.project : addMemberWithOwnSection(p, member, template, current?.id).project));
    workspace.openMember(member.id);
    workspace.notify('info', `${member.name} has its own section “${added.section.name}”, copied from ${from ? `${from.name}’s` : 'the first'} section. Choose another in its Section tab.`, 7000);
  }

  function duplicate(memberId: string): void {
    let copyId: string | null = null;
    documentStore.edit('Duplicate member', (p) => {
      const result = duplicateMember(p, memberId);
      copyId = result.memberId;
      return result.project;
    });
    if (copyId) workspace.openMember(copyId);
  }

  function remove(memberId: string): void {
    const project = documentStore.project;
    const member = project?.members.find((m) => m.id === memberId);
    if (!project || !member) return;
    const index = project.members.indexOf(member);
    documentStore.edit(`Delete member ${member.name}`, (p) => deleteMember(p, memberId));
    const next = documentStore.project?.members[Math.min(index, (documentStore.project?.members.length ?? 1) - 1)];
    if (workspace.selectedMemberId === memberId) {
      if (next) workspace.openMember(next.id);
      else workspace.showOverview();
    }
    workspace.notify('info', `Deleted ${member.name}. Undo (Ctrl+Z) brings it back.`);
  }

  /**
   * Adds a continuous beam (two spans on pins) after the continuous member open, else at the end.
   * Its zones use the section of the member open (else the first section): a continuous beam
   * shares sections like the demo's, and its Section tab is the member's section library.
   */
  function addContinuous(): void {
    const project = documentStore.project;
    if (!project) return;
    const open = workspace.view === 'member' ? workspace.selectedMemberId : null;
    const single = project.members.find((m) => m.id === open);
    const multi = project.continuousMembers?.find((m) => m.id === open);
    const sectionId = multi?.zones[0]?.sectionId ?? single?.zones[0]?.sectionId ?? project.sections[0]?.id;
    if (!sectionId) {
      workspace.notify('error', 'Add a section to the project before adding members.');
      return;
    }
    const member = newContinuousMember(project, sectionId);
    documentStore.edit(`Add continuous beam ${member.name}`, (p) => addContinuousMember(p, member, multi?.id));
    workspace.openMember(member.id);
  }

  function duplicateContinuous(memberId: string): void {
    let copyId: string | null = null;
    documentStore.edit('Duplicate continuous beam', (p) => {
      const result = duplicateContinuousMember(p, memberId);
      copyId = result.memberId;
      return result.project;
    });
    if (copyId) workspace.openMember(copyId);
  }

  function removeContinuous(memberId: string): void {
    const project = documentStore.project;
    const list = project?.continuousMembers ?? [];
    const member = list.find((m) => m.id === memberId);
    if (!project || !member) return;
    const index = list.indexOf(member);
    documentStore.edit(`Delete continuous beam ${member.name}`, (p) => deleteContinuousMember(p, memberId));
    const rest = documentStore.project?.continuousMembers ?? [];
    const next = rest[Math.min(index, rest.length - 1)] ?? documentStore.project?.members[0];
    if (workspace.selectedMemberId === memberId) {
      if (next) workspace.openMember(next.id);
      else workspace.showOverview();
    }
    workspace.notify('info', `Deleted ${member.name}. Undo (Ctrl+Z) brings it back.`);
  }

  async function about(): Promise<void> {
    await workspace.ask({
      title: 'About Hingeline',
      message: 'Moment–curvature, load–deflection, plastic hinge rotation, ductility and service deflections of reinforced-concrete beams.',
      details: [RESULTS_CAUTION],
      buttons: [{ id: 'ok', label: 'Close', kind: 'primary' }],
    });
  }

  async function shortcuts(): Promise<void> {
    const mac = typeof navigator !== 'undefined' && /Mac|iPhone|iPad/.test(navigator.platform || navigator.userAgent);
    await workspace.ask({
      title: 'Keyboard shortcuts',
      message: host.kind === 'electron' ? 'The same commands are in the menus.' : 'In the browser some keys (new window, print) stay with the browser.',
      table: shortcutsFor(host.kind, mac).map((s) => [s.keys, s.action] as const),
      buttons: [{ id: 'ok', label: 'Close', kind: 'primary' }],
    });
  }

  async function run(command: MenuCommand): Promise<void> {
    switch (command) {
      case 'new': return createNew();
      case 'open': return open();
      case 'open-demo': return openDemo('us');
      case 'save': return save(false);
      case 'save-as': return save(true);
      case 'export-report': return exportPdf();
      case 'export-csv': return exportCsv();
      case 'import-csv': return importCsv();
      case 'undo': return undo();
      case 'redo': return redo();
      case 'about': return about();
      case 'add-member': return addNewMember();
      case 'analyze': return analysis.analyseAll();
      case 'shortcuts': return shortcuts();
    }
  }

  return { run, shortcuts, open, openFile, openRecent, openDemo, createNew, save, exportCsv, importCsv, exportPdf, undo, redo, addNewMember, duplicate, remove, addContinuous, duplicateContinuous, removeContinuous, about, confirmDiscard };
}
