/**
 * "Import members from CSV…": which kind of list a file is, and the preview dialog of what an import
 * would add (core/project/import.ts plans it; nothing here computes or changes the project).
 * Quantities in the preview are in the project's display units; the file's own messages keep the
 * units its header names.
 */
import { describeImportedItem, importCountText, type ImportPlan } from '../../../core/project/import.ts';
import { csvSeparator, headerParts } from '../../../core/project/csv-columns.ts';
import type { UnitSystem } from '../../../core/project/types.ts';
import { formatDiagnostic } from '../../../core/project/validate.ts';
import type { DialogRequest } from '../stores/workspace.ts';

/** A member list (one row per single-span member) or a span list (one row per span of a continuous member). */
export type CsvKind = 'members' | 'spans';

/** Columns only a span list has (docs/project-format.md "Continuous members from CSV"). */
const SPAN_ONLY = new Set(['part', 'left support', 'right support', 'left column ei', 'right column ei', 'left column height', 'right column height', 'columns', 'column far end', 'far end', 'left section', 'left zone', 'right section', 'right zone']);

/**
 * The kind of list from its header: a span list when it has a column only span lists have, or has
 * no `supports` column but a `member` one; otherwise a member list. The preview lets the user switch.
 */
export function csvKindOf(text: string): CsvKind {
  const { delimiter } = csvSeparator(text);
  const first = text.replace(/^\uFEFF/, '').split(/\r?\n/, 1)[0] ?? '';
  const names = first.split(delimiter).map((cell) => headerParts(cell.replace(/^"|"$/g, '')).name);
  if (names.some((n) => SPAN_ONLY.has(n))) return 'spans';
  if (!names.includes('supports') && !names.includes('support') && names.includes('member')) return 'spans';
  return 'members';
}

const MAX_PROBLEMS_SHOWN = 60;

/**
 * The preview: every member read (its rows, id, name, what it brings or why it is left out), every
 * problem with its row and column, and the choices. Button ids: `import` (no errors), `import-good`
 * (errors: import the members without them), `switch` (read the file as the other kind), `cancel`.
 */
export function importDialog(plan: ImportPlan, system: UnitSystem, fileName: string, kind: CsvKind, existingMembers: number): DialogRequest {
  const good = plan.items.filter((item) => item.ready);
  const list = kind === 'members' ? 'a member list (one row per member)' : 'a span list (one row per span of a continuous member)';
  const errors = plan.errors;
  const s = (n: number) => (n === 1 ? '' : 's');
  let message: string;
  if (plan.items.length === 0 && errors === 0) message = `${fileName}, read as ${list}, lists no members (only a header?).`;
  else if (errors === 0) message = `${fileName}, read as ${list}: ${importCountText(good)} will be added after the project’s ${existingMembers} member${s(existingMembers)}. The import is one step: Undo (Ctrl+Z) takes it all back.`;
  else if (good.length > 0) message = `${fileName}, read as ${list}, has ${errors} error${s(errors)}: nothing is imported unless you choose to import the ${importCountText(good)} without errors (the rows with errors are left out). Undo (Ctrl+Z) takes an import back.`;
  else message = `${fileName}, read as ${list}, has ${errors} error${s(errors)} and no member without errors: nothing can be imported. Correct the file and import it again.`;

  const problems = plan.diagnostics.map(formatDiagnostic).map((line) => (line.startsWith('warning: ') ? line : `error: ${line}`));
  const details = problems.length > MAX_PROBLEMS_SHOWN ? [...problems.slice(0, MAX_PROBLEMS_SHOWN), `… and ${problems.length - MAX_PROBLEMS_SHOWN} more`] : problems;
  return {
    title: `Import members from ${fileName}`,
    message,
    ...(plan.items.length > 0
      ? { grid: { head: ['Rows', 'Id', 'Name', 'What is imported'], rows: plan.items.map((item) => [item.rows, item.definition.id, item.definition.name, item.ready ? describeImportedItem(item, system) : 'left out: see the problems below']) } }
      : {}),
    ...(details.length > 0 ? { details } : {}),
    buttons: [
      ...(errors === 0 && good.length > 0 ? [{ id: 'import', label: `Import ${importCountText(good)}`, kind: 'primary' as const }] : []),
      ...(errors > 0 && good.length > 0 ? [{ id: 'import-good', label: `Import the ${importCountText(good)} without errors`, kind: 'primary' as const }] : []),
      { id: 'switch', label: kind === 'members' ? 'Read as a span list' : 'Read as a member list' },
      { id: 'cancel', label: 'Cancel' },
    ],
    cancelId: 'cancel',
  };
}
