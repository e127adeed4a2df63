/**
 * Bringing members into a project from CSV files: the one procedure behind the command line's
 * `hingeline import` and the app's "Import members from CSV…", so both read, check and report alike.
 *
 * `planImport(project, sources)` reads a member list (core/project/csv.ts, one row per single-span
 * member) and/or a span list (core/project/continuous-import.ts, one row per span of a continuous
 * member), checks every imported id against the project's members and against the other file (a
 * clash is an error naming both places; nothing is renamed), and validates the project the import
 * would make (core/project/validate.ts) — reporting only what concerns the imported members, under
 * their file and rows. Nothing is changed: the plan is a preview.
 *
 * `applyImport(project, plan, { keepGoodRows })` gives the new project: with any error, nothing is
 * imported unless `keepGoodRows` (then the members without errors are, the others left out). Pure.
 * Units: the CSV's own units in its messages (named in its header), the project's display units in
 * the validation messages and the summaries; definitions in internal units (mm, N/mm).
 */
import type { Diagnostic } from '../diagnostics.ts';
import { formatQuantity, displaySystem } from '../units/index.ts';
import { importContinuousMembersCsv } from './continuous-import.ts';
import { importMembersCsv } from './csv.ts';
import type { ContinuousMemberDefinition, MemberDefinition, Project, UnitSystem } from './types.ts';
import { itemPath, validateProject } from './validate.ts';

/** A CSV file to import: its name (for messages) and its whole text. */
export interface CsvSource {
  readonly name: string;
  readonly text: string;
}

export interface ImportSources {
  /** Single-span members, one row each (columns: docs/project-format.md "CSV member lists"). */
  readonly members?: CsvSource;
  /** Continuous members, one row per span (docs/project-format.md "Continuous members from CSV"). */
  readonly spans?: CsvSource;
}

/** A member read from a file without errors of its own rows. */
export type ImportedItem =
  | (ItemCommon & { readonly kind: 'member'; readonly definition: MemberDefinition })
  | (ItemCommon & { readonly kind: 'continuous'; readonly definition: ContinuousMemberDefinition });

interface ItemCommon {
  /** The file it came from. */
  readonly source: string;
  /** Where in the file: `row 4` or `rows 2–4` (lines of the file; the header is row 1). */
  readonly rows: string;
  /** False when its id clashes or the project's validation finds an error in it: it is left out even with `keepGoodRows`. */
  readonly ready: boolean;
}

export interface ImportPlan {
  /** Every member read, in file order (the member list first), ready or not. */
  readonly items: readonly ImportedItem[];
  /** Every problem: of the files (path `beams.csv row 7, column span`), clashes, and the validation of the imported members. */
  readonly diagnostics: readonly Diagnostic[];
  /** Number of errors among `diagnostics` (each keeps at least one row or member out). */
  readonly errors: number;
}

/** Reads the files and checks what they would add to `project` (see the module comment). Never throws. */
export function planImport(project: Project, sources: ImportSources): ImportPlan {
  const sectionIds = new Set(project.sections.map((s) => s.id));
  const options = { sectionIds, codeBasis: project.info.codeBasis };
  const diagnostics: Diagnostic[] = [];
  const inFile = (source: string, list: readonly Diagnostic[]) => list.map((d) => ({ ...d, path: `${source} ${d.path}` }));
  const items: ImportedItem[] = [];

  if (sources.members) {
    const { name, text } = sources.members;
    const read = importMembersCsv(text, options);
    diagnostics.push(...inFile(name, read.diagnostics));
    read.members.forEach((definition, i) => items.push({ kind: 'member', source: name, rows: `row ${read.rows[i]}`, ready: true, definition }));
  }
  if (sources.spans) {
    const { name, text } = sources.spans;
    const read = importContinuousMembersCsv(text, options);
    diagnostics.push(...inFile(name, read.diagnostics));
    read.members.forEach((definition, i) => {
      const { first, last } = read.rows[i]!;
      items.push({ kind: 'continuous', source: name, rows: first === last ? `row ${first}` : `rows ${first}–${last}`, ready: true, definition });
    });
  }

  // Ids: unique among the project's members (both lists) and the items before.
  const existing = new Map<string, string>();
  project.members.forEach((m, i) => existing.set(m.id, `${itemPath('members', i, m)} of the project`));
  (project.continuousMembers ?? []).forEach((m, i) => existing.set(m.id, `${itemPath('continuousMembers', i, m)} of the project`));
  const checked = items.map((item): ImportedItem => {
    const id = item.definition.id;
    const other = existing.get(id);
    if (other === undefined) {
      existing.set(id, `${item.source} ${item.rows}`);
      return item;
    }
    diagnostics.push({
      code: 'duplicate-id', severity: 'error', path: `${item.source} ${item.rows}, column ${item.kind === 'member' ? 'id' : 'member'}`,
      message: `member id "${id}" is already used by ${other}; ids must be unique, so nothing is renamed: change the id in the file (or remove that member first)`,
    });
    return { ...item, ready: false };
  });

  // The project's own validation of the members that would be added.
  const candidate = withItems(project, checked.filter((item) => item.ready));
  const added = new Map<string, ImportedItem>();
  let m = project.members.length;
  let c = project.continuousMembers?.length ?? 0;
  for (const item of checked.filter((x) => x.ready)) {
    const path = item.kind === 'member' ? itemPath('members', m++, item.definition) : itemPath('continuousMembers', c++, item.definition);
    added.set(path, item);
  }
  const invalid = new Set<ImportedItem>();
  for (const d of validateProject(candidate)) {
    const prefix = /^(?:members|continuousMembers)\[\d+\](?: "(?:[^"\\]|\\.)*")?/.exec(d.path)?.[0];
    const item = prefix ? added.get(prefix) : undefined;
    if (!item) continue; // a problem of the project as it was: not the import's business
    const rest = d.path.slice(prefix!.length).replace(/^\./, '');
    diagnostics.push({ ...d, path: `${item.source} ${item.rows} (member "${item.definition.id}")${rest ? ` ${rest}` : ''}` });
    if (d.severity === 'error') invalid.add(item);
  }
  const final = checked.map((item) => (invalid.has(item) ? { ...item, ready: false } : item));
  // By file (the member list first), then by row; the order of each row's problems is kept.
  const files = [sources.members?.name, sources.spans?.name];
  const key = (d: Diagnostic) => [files.findIndex((f) => f !== undefined && d.path.startsWith(`${f} `)), Number(/\brows? (\d+)/.exec(d.path)?.[1] ?? 0)] as const;
  const sorted = diagnostics.map((d, i) => ({ d, i, k: key(d) })).sort((a, b) => a.k[0] - b.k[0] || a.k[1] - b.k[1] || a.i - b.i).map((x) => x.d);
  return { items: final, diagnostics: sorted, errors: diagnostics.filter((d) => d.severity === 'error').length };
}

function withItems(project: Project, items: readonly ImportedItem[]): Project {
  const members = items.flatMap((i) => (i.kind === 'member' ? [i.definition] : []));
  const continuous = items.flatMap((i) => (i.kind === 'continuous' ? [i.definition] : []));
  return {
    ...project,
    members: [...project.members, ...members],
    ...(continuous.length > 0 || project.continuousMembers ? { continuousMembers: [...(project.continuousMembers ?? []), ...continuous] } : {}),
  };
}

/**
 * The project with the plan's members added after the existing ones — or, when the plan has errors
 * and `keepGoodRows` is not set, or nothing is ready, null (nothing to write). `added` lists what went in.
 */
export function applyImport(project: Project, plan: ImportPlan, options: { keepGoodRows?: boolean } = {}): { project: Project; added: readonly ImportedItem[] } | null {
  if (plan.errors > 0 && !options.keepGoodRows) return null;
  const added = plan.items.filter((item) => item.ready);
  if (added.length === 0) return null;
  return { project: withItems(project, added), added };
}

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** How many of each kind: `3 members`, `1 continuous member`, `2 members and 1 continuous member`. */
export function importCountText(items: readonly ImportedItem[]): string {
  const single = items.filter((i) => i.kind === 'member').length;
  const continuous = items.length - single;
  return [single > 0 || continuous === 0 ? plural(single, 'member') : '', continuous > 0 ? plural(continuous, 'continuous member') : ''].filter((t) => t !== '').join(' and ');
}

const SUPPORTS: Readonly<Record<MemberDefinition['supports'], string>> = {
  'simply-supported': 'simply supported',
  cantilever: 'cantilever',
  'fixed-fixed': 'fixed–fixed',
  'propped-cantilever': 'propped cantilever',
};

/**
 * One line on what an item brings, in the display units of `system`, e.g.
 * `simply supported, span 6 m, section S-1; dead 12 kN/m, live 8 kN/m (self-weight added)`.
 */
export function describeImportedItem(item: ImportedItem, system: UnitSystem): string {
  const units = displaySystem(system);
  const length = (mm: number) => formatQuantity('spanLength', mm, units);
  const d = item.definition;
  const byCase = new Map<string, number[]>();
  for (const load of d.loads) if (load.kind === 'uniform') byCase.set(load.loadCase, [...(byCase.get(load.loadCase) ?? []), load.magnitude]);
  const loads = [...byCase].map(([loadCase, values]) => {
    const distinct = [...new Set(values)];
    return `${loadCase} ${distinct.map((w) => formatQuantity('lineLoad', w, units, { sigFigs: 3 })).join(' / ')}`;
  });
  const selfWeight = d.includeSelfWeight === false ? '' : ' (self-weight added)';
  const loadText = loads.length > 0 ? `${loads.join(', ')}${selfWeight}` : `no loads given${selfWeight}`;
  const sections = [...new Set(d.zones.map((z) => z.sectionId))];
  const sectionText = `section${sections.length === 1 ? '' : 's'} ${sections.join(', ')}`;
  if (item.kind === 'member') return `${SUPPORTS[item.definition.supports]}, span ${length(item.definition.span)}, ${sectionText}; ${loadText}`;
  const c = item.definition;
  const parts = [
    ...(c.leftCantilever ? [`cantilever ${length(c.leftCantilever)}`] : []),
    ...c.spans.map(length),
    ...(c.rightCantilever ? [`cantilever ${length(c.rightCantilever)}`] : []),
  ];
  const supports = c.supports.map((s) => s.kind).join('–');
  return `${c.spans.length} span${c.spans.length === 1 ? '' : 's'} ${parts.join(' + ')}, supports ${supports}, ${sectionText}; ${loadText}`;
}
