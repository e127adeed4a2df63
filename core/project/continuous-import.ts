/**
 * Continuous members from CSV: one row per span (or end cantilever), the rows of a member together
 * and in order from left to right, e.g.
 *
 *   member,name,span [m],left support,right support,section,left section,left zone [m],right section,right zone [m],dead [kN/m],live [kN/m]
 *   CB-7,B-7/A–D,6.0,pinned,pinned,S-span,,,S-sup,1.5,12,10
 *   CB-7,,7.2,,,S-span,S-sup,1.5,S-sup,1.5,12,10
 *   CB-7,,6.0,,pinned,S-span,S-sup,1.5,,,12,10
 *
 * Columns (header names as in csv.ts: any order, the unit of every dimensioned column in the header):
 *  - member (id; required), name, part (span, left cantilever or right cantilever; default span);
 *  - span (its length; required);
 *  - left support, right support: pinned, fixed or column (default pinned); a support between two
 *    spans may be given on either row, and must agree where given on both;
 *  - left column EI, left column height, right column EI, right column height: the columns of a
 *    column support, columns (above, below or both; default both: the same column above and below),
 *    column far end (fixed or pinned; default fixed);
 *  - section (required), left section with left zone (its length from the left support), right
 *    section with right zone: a support zone of another section at either end;
 *  - dead, superimposed, live: uniform loads over the span; notes.
 *
 * Every problem names its row (the line of the file, the header being row 1) and column:
 * `row 7, column right support: …`; a member whose rows have errors is not imported, the others
 * are. The assembled member is then checked like any continuous member of a project file
 * (core/continuous/validate.ts) under the path `member "CB-7" (rows 2–4)`.
 * Units: converted to internal units (mm, N/mm, N·mm²).
 */
import type { Diagnostic } from '../diagnostics.ts';
import type { CodeBasis } from '../materials/specs.ts';
import type { ContinuousBeamDefinition, ContinuousLoad, ContinuousSupport, SpanRef } from '../continuous/definition.ts';
import { CONTINUOUS_LIMITS } from '../continuous/definition.ts';
import { validateContinuousBeam } from '../continuous/validate.ts';
import type { MemberZone, ServiceSettings } from '../member/definition.ts';
import { formatNumber } from '../units/index.ts';
import { defaultImportService, parseCsv } from './csv.ts';
import { cellNumber, csvSeparator, readCsvHeader, type CsvColumn, type FoundColumn } from './csv-columns.ts';

type Key =
  | 'member' | 'name' | 'part' | 'span' | 'leftSupport' | 'rightSupport'
  | 'leftColumnEI' | 'leftColumnHeight' | 'rightColumnEI' | 'rightColumnHeight' | 'columns' | 'farEnd'
  | 'section' | 'leftSection' | 'leftZone' | 'rightSection' | 'rightZone'
  | 'dead' | 'superimposed' | 'live' | 'notes';

/** The columns of a span list (docs/project-format.md "Continuous members from CSV" lists each with its unit and range). */
export const SPAN_CSV_COLUMNS: readonly CsvColumn<Key>[] = [
  { key: 'member', quantity: null, required: true, aliases: ['member', 'member id', 'id'] },
  { key: 'name', quantity: null, required: false, aliases: ['name', 'mark'] },
  { key: 'part', quantity: null, required: false, aliases: ['part'] },
  { key: 'span', quantity: 'spanLength', required: true, aliases: ['span', 'length'] },
  { key: 'leftSupport', quantity: null, required: false, aliases: ['left support'] },
  { key: 'rightSupport', quantity: null, required: false, aliases: ['right support'] },
  { key: 'leftColumnEI', quantity: 'flexuralRigidity', required: false, aliases: ['left column ei'] },
  { key: 'leftColumnHeight', quantity: 'spanLength', required: false, aliases: ['left column height'] },
  { key: 'rightColumnEI', quantity: 'flexuralRigidity', required: false, aliases: ['right column ei'] },
  { key: 'rightColumnHeight', quantity: 'spanLength', required: false, aliases: ['right column height'] },
  { key: 'columns', quantity: null, required: false, aliases: ['columns'] },
  { key: 'farEnd', quantity: null, required: false, aliases: ['column far end', 'far end'] },
  { key: 'section', quantity: null, required: true, aliases: ['section', 'section id'] },
  { key: 'leftSection', quantity: null, required: false, aliases: ['left section'] },
  { key: 'leftZone', quantity: 'spanLength', required: false, aliases: ['left zone'] },
  { key: 'rightSection', quantity: null, required: false, aliases: ['right section'] },
  { key: 'rightZone', quantity: 'spanLength', required: false, aliases: ['right zone'] },
  { key: 'dead', quantity: 'lineLoad', required: false, aliases: ['dead', 'dead load'] },
  { key: 'superimposed', quantity: 'lineLoad', required: false, aliases: ['superimposed', 'superimposed dead', 'superimposed dead load', 'sdl'] },
  { key: 'live', quantity: 'lineLoad', required: false, aliases: ['live', 'live load'] },
  { key: 'notes', quantity: null, required: false, aliases: ['notes', 'description'] },
];

/** Header names of the columns (for messages and the documentation). */
const HEADER_NAME: Readonly<Record<Key, string>> = Object.fromEntries(SPAN_CSV_COLUMNS.map((c) => [c.key, c.aliases[0]!])) as Record<Key, string>;

export interface ContinuousCsvOptions {
  /** Ids of the project's sections (when given, unknown section ids are row errors). */
  readonly sectionIds?: ReadonlySet<string>;
  /** Ids already used by members and continuous members of the project. */
  readonly existingMemberIds?: ReadonlySet<string>;
  readonly codeBasis?: CodeBasis;
  readonly service?: ServiceSettings;
  readonly capacity?: ContinuousBeamDefinition['capacity'];
}

const DEFAULT_CAPACITY: ContinuousBeamDefinition['capacity'] = { pattern: 'proportional', arrangement: { kind: 'all-spans' }, hingeLengthMethod: 'priestley-2007' };

/** One row read: what it says about its span, with the row's line for messages. */
interface SpanRow {
  readonly line: number;
  readonly member: string;
  readonly name: string;
  readonly part: 'span' | 'left-cantilever' | 'right-cantilever';
  readonly length: number;
  /** Support kind and column data at each end as written (undefined: not given). */
  readonly ends: { readonly left: SupportCells; readonly right: SupportCells };
  readonly zones: readonly { readonly from: number; readonly to: number; readonly sectionId: string }[];
  readonly loads: readonly { readonly loadCase: ContinuousLoad['loadCase']; readonly magnitude: number }[];
  readonly notes: string;
}

interface SupportCells {
  readonly kind?: ContinuousSupport['kind'];
  readonly column?: { readonly stiffness: number; readonly height: number };
}

const PARTS: Readonly<Record<string, SpanRow['part']>> = {
  '': 'span', span: 'span', 'left cantilever': 'left-cantilever', 'left-cantilever': 'left-cantilever', 'right cantilever': 'right-cantilever', 'right-cantilever': 'right-cantilever',
};
const KINDS = ['pinned', 'fixed', 'column'] as const;

/**
 * Reads continuous members from CSV text (see the module comment). Returns the members whose rows
 * have no errors, in file order, in internal units; `rows[i]`, the first and last line of `members[i]`
 * in the file; and every problem, by row and column. Never throws.
 */
export function importContinuousMembersCsv(text: string, options: ContinuousCsvOptions = {}): { members: ContinuousBeamDefinition[]; rows: { first: number; last: number }[]; diagnostics: Diagnostic[] } {
  const diagnostics: Diagnostic[] = [];
  const { delimiter, decimalComma } = csvSeparator(text);
  const { records, problems } = parseCsv(text, delimiter);
  diagnostics.push(...problems);
  const header = records[0];
  if (!header) return { members: [], rows: [], diagnostics: [...diagnostics, { code: 'required', path: 'row 1', severity: 'error', message: 'the file is empty: a header row naming the columns is required' }] };
  const columns = readCsvHeader(header, SPAN_CSV_COLUMNS, diagnostics);
  if (!columns) return { members: [], rows: [], diagnostics };

  // --- rows ------------------------------------------------------------------------------------------
  const rows: SpanRow[] = [];
  const badMembers = new Set<string>();
  for (const record of records.slice(1)) {
    const rowErrors: Diagnostic[] = [];
    const error = (key: Key, code: Diagnostic['code'], message: string) => rowErrors.push({ code, path: `row ${record.line}, column ${HEADER_NAME[key]}`, severity: 'error', message });
    if (record.fields.length !== header.fields.length) {
      diagnostics.push({ code: 'schema', path: `row ${record.line}`, severity: 'error', message: `has ${record.fields.length} field${record.fields.length === 1 ? '' : 's'}, the header has ${header.fields.length} (a missing or extra separator, or an unquoted comma in a name?)` });
      const c = columns.get('member');
      if (c) badMembers.add(record.fields[c.index]?.trim() ?? '');
      continue;
    }
    const cell = (key: Key) => {
      const c = columns.get(key);
      return c ? record.fields[c.index]!.trim() : '';
    };
    /** A number in a column with a unit: null when empty; NaN (with an error) when not a number or out of range. */
    const number = (key: Key, range: { min: number; exclusiveMin?: boolean; max: number }): number | null => {
      const column = columns.get(key) as FoundColumn | undefined;
      const raw = cell(key);
      if (!column || raw === '') return null;
      const value = cellNumber(raw, decimalComma);
      if (value === null) {
        error(key, 'not-a-number', `must be a number in ${column.unit}, got ${JSON.stringify(raw)}`);
        return NaN;
      }
      const internal = column.toInternal(value);
      const low = range.exclusiveMin ? !(internal > range.min) : internal < range.min;
      if (low || internal > range.max) {
        const shown = (x: number) => formatNumber(x / column.toInternal(1), 4);
        error(key, 'out-of-range', `must be ${range.exclusiveMin ? 'greater than' : 'at least'} ${shown(range.min)} and at most ${shown(range.max)} ${column.unit}, got ${raw} ${column.unit}`);
        return NaN;
      }
      return internal;
    };
    const member = cell('member');
    if (member === '') error('member', 'required', 'every row needs the id of its member');
    else if (options.existingMemberIds?.has(member)) error('member', 'duplicate-id', `"${member}" is already the id of a member of the project`);
    const partText = cell('part').toLowerCase();
    const part = PARTS[partText];
    if (!part) error('part', 'unknown-option', `must be span, left cantilever or right cantilever, got ${JSON.stringify(cell('part'))}`);
    const length = number('span', { min: 0, exclusiveMin: true, max: CONTINUOUS_LIMITS.maxLength });
    if (length === null) error('span', 'required', `is required (a number in ${columns.get('span')!.unit})`);

    const end = (side: 'left' | 'right'): SupportCells => {
      const kindKey = side === 'left' ? 'leftSupport' : 'rightSupport';
      const raw = cell(kindKey).toLowerCase();
      let kind: ContinuousSupport['kind'] | undefined;
      if (raw !== '') {
        if ((KINDS as readonly string[]).includes(raw)) kind = raw as ContinuousSupport['kind'];
        else error(kindKey, 'unknown-option', `must be ${KINDS.join(', ')} (or empty: pinned), got ${JSON.stringify(cell(kindKey))}`);
      }
      const eiKey = side === 'left' ? 'leftColumnEI' : 'rightColumnEI';
      const heightKey = side === 'left' ? 'leftColumnHeight' : 'rightColumnHeight';
      const stiffness = number(eiKey, { min: 0, exclusiveMin: true, max: 1e18 });
      const height = number(heightKey, { min: 500, max: 20000 });
      if (kind === 'column') {
        if (stiffness === null) error(eiKey, 'required', `a column support needs the columns' EI (${HEADER_NAME[eiKey]})`);
        if (height === null) error(heightKey, 'required', `a column support needs the storey height (${HEADER_NAME[heightKey]})`);
      } else if (stiffness !== null || height !== null) {
        error(stiffness !== null ? eiKey : heightKey, 'geometry', `is given but the ${side} support is ${kind ?? 'not given'}: columns belong to a support of kind column`);
      }
      return { ...(kind ? { kind } : {}), ...(stiffness !== null && height !== null && Number.isFinite(stiffness) && Number.isFinite(height) ? { column: { stiffness, height } } : {}) };
    };
    const ends = { left: end('left'), right: end('right') };
    if (part && part !== 'span') {
      for (const key of ['leftSupport', 'rightSupport'] as const) if (cell(key) !== '') error(key, 'geometry', 'a cantilever has no support of its own: give the support on the row of the span next to it');
    }

    const section = cell('section');
    const checkSection = (key: Key, id: string) => {
      if (options.sectionIds && !options.sectionIds.has(id)) error(key, 'unknown-reference', `no section with id "${id}" in the project (sections: ${[...options.sectionIds].slice(0, 12).join(', ')}${options.sectionIds.size > 12 ? ', …' : ''})`);
    };
    if (section === '') error('section', 'required', 'every span needs a section id');
    else checkSection('section', section);
    const zoneAt = (sectionKey: Key, lengthKey: Key) => {
      const id = cell(sectionKey);
      const zone = number(lengthKey, { min: 0, exclusiveMin: true, max: CONTINUOUS_LIMITS.maxLength });
      if (id !== '' && zone === null) error(lengthKey, 'required', `${HEADER_NAME[sectionKey]} "${id}" needs the length of its zone (${HEADER_NAME[lengthKey]})`);
      if (id === '' && zone !== null) error(sectionKey, 'required', `${HEADER_NAME[lengthKey]} is given: name the section of that zone`);
      if (id !== '') checkSection(sectionKey, id);
      return id !== '' && zone !== null && Number.isFinite(zone) ? { id, length: zone } : null;
    };
    const leftZone = zoneAt('leftSection', 'leftZone');
    const rightZone = zoneAt('rightSection', 'rightZone');
    const spanLength = length ?? NaN;
    if (Number.isFinite(spanLength) && (leftZone?.length ?? 0) + (rightZone?.length ?? 0) >= spanLength) {
      error(rightZone ? 'rightZone' : 'leftZone', 'geometry', `the support zones (${Number((((leftZone?.length ?? 0) + (rightZone?.length ?? 0)) / columns.get('span')!.toInternal(1)).toPrecision(6))} ${columns.get('span')!.unit} together) must be shorter than the span`);
    }

    const loads: SpanRow['loads'][number][] = [];
    for (const key of ['dead', 'superimposed', 'live'] as const) {
      const w = number(key, { min: 0, max: 1e4 });
      if (w !== null && Number.isFinite(w) && w > 0) loads.push({ loadCase: key, magnitude: w });
    }

    if (rowErrors.length > 0 || !part) {
      diagnostics.push(...rowErrors);
      badMembers.add(member);
      continue;
    }
    const zones: SpanRow['zones'][number][] = [];
    let from = 0;
    if (leftZone) {
      zones.push({ from: 0, to: leftZone.length, sectionId: leftZone.id });
      from = leftZone.length;
    }
    const to = rightZone ? spanLength - rightZone.length : spanLength;
    zones.push({ from, to, sectionId: section });
    if (rightZone) zones.push({ from: to, to: spanLength, sectionId: rightZone.id });
    rows.push({ line: record.line, member, name: cell('name'), part, length: spanLength, ends, zones, loads, notes: cell('notes') });
  }

  // --- members ------------------------------------------------------------------------------------------
  const members: ContinuousBeamDefinition[] = [];
  const memberRows: { first: number; last: number }[] = [];
  const finished = new Map<string, number>();
  const service = options.service ?? defaultImportService(options.codeBasis);
  const capacity = options.capacity ?? DEFAULT_CAPACITY;
  const columnsCell = columns.get('columns');
  const farEndCell = columns.get('farEnd');
  const groups: SpanRow[][] = [];
  for (const row of rows) {
    const last = groups[groups.length - 1];
    if (last && last[0]!.member === row.member) last.push(row);
    else groups.push([row]);
  }
  const recordOf = new Map(records.map((r) => [r.line, r]));
  for (const group of groups) {
    const id = group[0]!.member;
    const first = group[0]!.line;
    const lastLine = group[group.length - 1]!.line;
    const errors: Diagnostic[] = [];
    const error = (line: number, key: Key | null, code: Diagnostic['code'], message: string) => errors.push({ code, path: key ? `row ${line}, column ${HEADER_NAME[key]}` : `row ${line}`, severity: 'error', message });
    if (finished.has(id)) error(first, 'member', 'duplicate-id', `the rows of member "${id}" must be together: it already ended on row ${finished.get(id)}`);
    finished.set(id, lastLine);
    if (badMembers.has(id)) {
      diagnostics.push({ code: 'schema', path: `rows ${first}–${lastLine}`, severity: 'error', message: `member "${id}" is not imported: some of its rows have errors` });
      continue;
    }
    // Cantilevers only at the ends; spans between.
    group.forEach((row, k) => {
      if (row.part === 'left-cantilever' && k !== 0) error(row.line, 'part', 'schema', 'a left cantilever must be the first row of its member');
      if (row.part === 'right-cantilever' && k !== group.length - 1) error(row.line, 'part', 'schema', 'a right cantilever must be the last row of its member');
    });
    const spanRows = group.filter((r) => r.part === 'span');
    if (spanRows.length < 1 || spanRows.length > CONTINUOUS_LIMITS.maxSpans) error(first, null, 'out-of-range', `member "${id}" must have 1 to ${CONTINUOUS_LIMITS.maxSpans} span rows, got ${spanRows.length}`);
    // Supports: the joint between two spans from either row; they must agree where both give it.
    const joint = (left: SpanRow | undefined, right: SpanRow | undefined): ContinuousSupport => {
      const a = left?.ends.right ?? {};
      const b = right?.ends.left ?? {};
      if (a.kind && b.kind && a.kind !== b.kind) error(right!.line, 'leftSupport', 'geometry', `"${b.kind}" disagrees with the right support "${a.kind}" of the span on row ${left!.line}: a support between two spans is one support`);
      if (a.column && b.column && (a.column.stiffness !== b.column.stiffness || a.column.height !== b.column.height)) error(right!.line, 'leftColumnEI', 'geometry', `the columns disagree with those given on row ${left!.line} for the same support`);
      const kind = b.kind ?? a.kind ?? 'pinned';
      if (kind !== 'column') return { kind };
      const column = b.column ?? a.column!;
      // The row that gave the columns also says where they are and how their far ends are held.
      const line = (b.column ? right : left)!.line;
      const record = recordOf.get(line)!;
      const where = (columnsCell ? record.fields[columnsCell.index]!.trim().toLowerCase() : '') || 'both';
      const farEnd = (farEndCell ? record.fields[farEndCell.index]!.trim().toLowerCase() : '') || 'fixed';
      if (!['above', 'below', 'both'].includes(where)) error(line, 'columns', 'unknown-option', `must be above, below or both (or empty: both), got ${JSON.stringify(where)}`);
      if (farEnd !== 'fixed' && farEnd !== 'pinned') error(line, 'farEnd', 'unknown-option', `must be fixed or pinned (or empty: fixed), got ${JSON.stringify(farEnd)}`);
      const c = { stiffness: column.stiffness, height: column.height, farEnd: farEnd === 'pinned' ? ('pinned' as const) : ('fixed' as const) };
      return { kind: 'column', ...(where !== 'below' ? { above: c } : {}), ...(where !== 'above' ? { below: c } : {}) };
    };
    const supports: ContinuousSupport[] = spanRows.map((row, k) => joint(spanRows[k - 1], row));
    supports.push(joint(spanRows[spanRows.length - 1], undefined));

    // Zones along the whole beam, neighbours of one section merged; loads per part.
    const zones: MemberZone[] = [];
    const loads: ContinuousLoad[] = [];
    let x = 0;
    let spanNumber = 0;
    for (const row of group) {
      for (const z of row.zones) {
        const previous = zones[zones.length - 1];
        if (previous && previous.sectionId === z.sectionId && Math.abs(previous.to - (x + z.from)) < 1e-6) zones[zones.length - 1] = { ...previous, to: x + z.to };
        else zones.push({ from: x + z.from, to: x + z.to, sectionId: z.sectionId });
      }
      const ref: SpanRef = row.part === 'span' ? ++spanNumber : row.part;
      for (const l of row.loads) loads.push({ kind: 'uniform', loadCase: l.loadCase, span: ref, magnitude: l.magnitude, label: `${l.loadCase} load (imported)` });
      x += row.length;
    }
    const left = group[0]!.part === 'left-cantilever' ? group[0]!.length : 0;
    const right = group[group.length - 1]!.part === 'right-cantilever' && group.length > 1 ? group[group.length - 1]!.length : 0;
    const notes = group.map((r) => r.notes).filter((n) => n !== '').join('; ');
    const definition: ContinuousBeamDefinition = {
      id,
      name: group.find((r) => r.name !== '')?.name ?? id,
      spans: spanRows.map((r) => r.length),
      ...(left > 0 ? { leftCantilever: left } : {}),
      ...(right > 0 ? { rightCantilever: right } : {}),
      supports,
      zones,
      loads,
      service,
      capacity,
      ...(notes ? { notes } : {}),
    };
    if (errors.length === 0) {
      const sectionIds = options.sectionIds ?? new Set(zones.map((z) => z.sectionId));
      errors.push(...validateContinuousBeam(definition, `member "${id}" (rows ${first}–${lastLine})`, sectionIds).filter((d) => d.severity === 'error'));
    }
    if (errors.length > 0) {
      diagnostics.push(...errors);
      continue;
    }
    members.push(definition);
    memberRows.push({ first, last: lastLine });
  }
  return { members, rows: memberRows, diagnostics };
}
