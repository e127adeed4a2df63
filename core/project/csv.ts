/**
 * CSV in and out, as pure functions on strings, read and written by papaparse (RFC 4180: comma-separated, fields with commas,
 * quotes or line breaks in double quotes, "" for a quote; CRLF or LF line ends; a UTF-8 byte-order
 * mark is accepted on input).
 *
 * Import: a member list, one row per member, with a header row that names each column and the unit
 * of every dimensioned column, e.g.
 *
 *   id,name,span [ft],supports,section,dead [kip/ft],superimposed [kip/ft],live [kip/ft],notes
 *
 * Values are converted to internal units (mm, N/mm). Every problem is reported with its row (the
 * line number in the file, the header being row 1) and column: `row 7, column span: …`.
 * A file whose header has semicolons and no commas is read with `;` as separator and a decimal comma.
 *
 * Export: a results summary per member and any curve (moment–curvature, load–deflection, values
 * along the span), with the unit of every column in its header, in the chosen display system.
 * Empty fields stand for values that do not exist (never NaN).
 */
import type { ContinuousMemberResult } from '../assessment/continuous-verdict.ts';
import { continuousSummaryRows } from './continuous-csv.ts';
import Papa from 'papaparse';
import type { Diagnostic } from '../diagnostics.ts';
import type { CodeBasis } from '../materials/specs.ts';
import type { CapacitySettings, MemberLoad, ServiceSettings, SupportType } from '../member/definition.ts';
import type { LoadDeflectionPoint, SpanDistribution } from '../member/results.ts';
import type { MomentCurvatureResult } from '../section/results.ts';
import { displaySystem, formatNumber, say, toDisplay, unitLabel, type Quantity } from '../units/index.ts';
import { memberKeyResults, type MemberKeyResults } from './key-results.ts';
import { cellNumber, csvSeparator, readCsvHeader, type CsvColumn } from './csv-columns.ts';
import type { Project, UnitSystem, MemberDefinition } from './types.ts';
import type { MemberResult } from '../assessment/results.ts';

// --- reading ----------------------------------------------------------------------------------------

export interface CsvRecord {
  /** Line number of the record's first line in the file (1-based). */
  readonly line: number;
  readonly fields: readonly string[];
}

/**
 * Splits CSV text into records (RFC 4180), with papaparse. CRLF, LF and lone CR line ends are read
 * alike (also inside quoted fields, which then hold LF). Blank lines are skipped. An unclosed quote
 * runs to the end of the text and is reported in `problems`. Each record carries the line of the file
 * it starts on, for messages.
 */
export function parseCsv(text: string, delimiter = ','): { records: CsvRecord[]; problems: Diagnostic[] } {
  const body = (text.charCodeAt(0) === 0xfeff ? text.slice(1) : text).replace(/\r\n?/g, '\n');
  // Line of each offset: the number of line breaks before it, plus one.
  const breaks: number[] = [];
  for (let i = body.indexOf('\n'); i >= 0; i = body.indexOf('\n', i + 1)) breaks.push(i);
  const lineAt = (at: number) => {
    let lo = 0;
    let hi = breaks.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (breaks[mid]! < at) lo = mid + 1;
      else hi = mid;
    }
    return lo + 1;
  };
  const records: CsvRecord[] = [];
  const problems: Diagnostic[] = [];
  let start = 0;
  Papa.parse<string[]>(body, {
    delimiter,
    quoteChar: '"',
    escapeChar: '"',
    newline: '\n',
    skipEmptyLines: false,
    step: (row) => {
      const from = body[start] === '\n' ? start + 1 : start;
      const line = lineAt(from);
      start = row.meta.cursor;
      if (row.errors.some((error) => error.type === 'Quotes')) problems.push({ code: 'parse', path: `row ${line}`, severity: 'error', message: 'a quoted field is not closed: a double quote (") is missing' });
      const fields = row.data;
      if (fields.length === 1 && fields[0]!.trim() === '') return;
      records.push({ line, fields });
    },
  });
  return { records, problems };
}

type ColumnKey = 'id' | 'name' | 'span' | 'supports' | 'section' | 'dead' | 'superimposed' | 'live' | 'notes';
type ColumnSpec = CsvColumn<ColumnKey>;

/** The columns of a member list (docs/project-format.md "CSV member lists" lists each with its unit and range). */
export const MEMBER_CSV_COLUMNS: readonly ColumnSpec[] = [
  { key: 'id', quantity: null, required: true, aliases: ['id', 'member id', 'member'] },
  { key: 'name', quantity: null, required: false, aliases: ['name', 'mark'] },
  { key: 'span', quantity: 'spanLength', required: true, aliases: ['span', 'length'] },
  { key: 'supports', quantity: null, required: true, aliases: ['supports', 'support'] },
  { key: 'section', quantity: null, required: true, aliases: ['section', 'section id'] },
  { key: 'dead', quantity: 'lineLoad', required: false, aliases: ['dead', 'dead load'] },
  { key: 'superimposed', quantity: 'lineLoad', required: false, aliases: ['superimposed', 'superimposed dead', 'superimposed dead load', 'sdl'] },
  { key: 'live', quantity: 'lineLoad', required: false, aliases: ['live', 'live load'] },
  { key: 'notes', quantity: null, required: false, aliases: ['notes', 'description'] },
];

const SUPPORT_WORDS: Readonly<Record<string, SupportType>> = {
  'simply-supported': 'simply-supported', 'simply supported': 'simply-supported', simple: 'simply-supported', ss: 'simply-supported',
  cantilever: 'cantilever',
  'fixed-fixed': 'fixed-fixed', 'fixed fixed': 'fixed-fixed', fixed: 'fixed-fixed', 'fixed-ended': 'fixed-fixed',
  'propped-cantilever': 'propped-cantilever', 'propped cantilever': 'propped-cantilever', propped: 'propped-cantilever',
};

export interface MemberCsvOptions {
  /** Ids of the sections the members may use (when given, unknown section ids are row errors). */
  readonly sectionIds?: ReadonlySet<string>;
  /** Ids already used by members of the project (a row reusing one is an error). */
  readonly existingMemberIds?: ReadonlySet<string>;
  /** Code basis, for the default deflection limit cases. */
  readonly codeBasis?: CodeBasis;
  /** Service and capacity settings given to every imported member (defaults below). */
  readonly service?: ServiceSettings;
  readonly capacity?: CapacitySettings;
}

/** Service settings of imported members unless given: ψ = 0.25, 60 months, the code's floor limits. */
export function defaultImportService(code: CodeBasis = 'ACI 318-19'): ServiceSettings {
  return {
    sustainedLiveFraction: 0.25,
    durationMonths: 60,
    limitCases: code === 'ACI 318-19' ? ['aci-floor-immediate', 'aci-insensitive-after-attachment'] : ['en-appearance', 'en-after-construction'],
  };
}

const DEFAULT_CAPACITY: CapacitySettings = { pattern: 'proportional', hingeLengthMethod: 'priestley-2007' };

/** Largest span a member list may give: 60 m, in mm. */
export const MAX_IMPORT_SPAN = 60000;
/** Largest uniform load a member list may give per case: 10 000 kN/m, in N/mm (a guard against unit mix-ups, not a design limit). */
export const MAX_IMPORT_LINE_LOAD = 1e4;

/**
 * Reads a member list from CSV text (see the file comment for the columns). Returns the members of the
 * rows without errors, in file order, in internal units (span mm, line loads N/mm), each with one zone
 * over the whole span; `rows[i]`, the line of the file `members[i]` came from; and every problem, row
 * by row. Never throws.
 */
export function importMembersCsv(text: string, options: MemberCsvOptions = {}): { members: MemberDefinition[]; rows: number[]; diagnostics: Diagnostic[] } {
  const diagnostics: Diagnostic[] = [];
  const { delimiter, decimalComma: semicolons } = csvSeparator(text);
  const { records, problems } = parseCsv(text, delimiter);
  diagnostics.push(...problems);
  const header = records[0];
  if (!header) return { members: [], rows: [], diagnostics: [...diagnostics, { code: 'required', path: 'row 1', severity: 'error', message: 'the file is empty: a header row naming the columns is required' }] };

  // Header: find each column and its unit.
  const columnAt = readCsvHeader(header, MEMBER_CSV_COLUMNS, diagnostics);
  if (!columnAt) return { members: [], rows: [], diagnostics };

  const members: MemberDefinition[] = [];
  const rows: number[] = [];
  const seen = new Map<string, number>();
  const service = options.service ?? defaultImportService(options.codeBasis);
  const capacity = options.capacity ?? DEFAULT_CAPACITY;
  for (const record of records.slice(1)) {
    const rowErrors: Diagnostic[] = [];
    const error = (column: string, code: Diagnostic['code'], message: string) => rowErrors.push({ code, path: `row ${record.line}, column ${column}`, severity: 'error', message });
    if (record.fields.length !== header.fields.length) {
      rowErrors.push({ code: 'schema', path: `row ${record.line}`, severity: 'error', message: `has ${record.fields.length} field${record.fields.length === 1 ? '' : 's'}, the header has ${header.fields.length} (a missing or extra separator, or an unquoted comma in a name?)` });
      diagnostics.push(...rowErrors);
      continue;
    }
    const cell = (key: ColumnSpec['key']) => {
      const c = columnAt.get(key);
      return c ? record.fields[c.index]!.trim() : '';
    };
    const id = cell('id');
    if (id === '') error('id', 'required', 'every member needs an id');
    else if (seen.has(id)) error('id', 'duplicate-id', `"${id}" is already used on row ${seen.get(id)}`);
    else if (options.existingMemberIds?.has(id)) error('id', 'duplicate-id', `"${id}" is already the id of a member of the project`);
    if (id !== '' && !seen.has(id)) seen.set(id, record.line);

    const spanColumn = columnAt.get('span')!;
    const spanText = cell('span');
    const spanValue = cellNumber(spanText, semicolons);
    let span = NaN;
    // Allowed: 0 < span ≤ 60 m (MAX_IMPORT_SPAN), in the column's unit.
    const spanRange = `greater than 0 and at most ${formatNumber(MAX_IMPORT_SPAN / spanColumn.toInternal(1), 4)} ${spanColumn.unit}`;
    if (spanValue === null) error('span', spanText === '' ? 'required' : 'not-a-number', spanText === '' ? `is required (a number in ${spanColumn.unit}, ${spanRange})` : `must be a number in ${spanColumn.unit} (${spanRange}), got ${JSON.stringify(spanText)}`);
    else if (!(spanValue > 0)) error('span', 'must-be-positive', `must be ${spanRange}, got ${spanText} ${spanColumn.unit}`);
    else {
      span = spanColumn.toInternal(spanValue);
      if (span > MAX_IMPORT_SPAN) error('span', 'out-of-range', `must be ${spanRange}, got ${spanText} ${spanColumn.unit}`);
    }

    const supportsText = cell('supports');
    const supports = SUPPORT_WORDS[supportsText.toLowerCase()];
    if (!supports) error('supports', supportsText === '' ? 'required' : 'unknown-option', `must be one of simply-supported, cantilever, fixed-fixed, propped-cantilever (or simple, fixed, propped), got ${JSON.stringify(supportsText)}`);

    const section = cell('section');
    if (section === '') error('section', 'required', 'every member needs a section id');
    else if (options.sectionIds && !options.sectionIds.has(section)) error('section', 'unknown-reference', `no section with id "${section}" in the project (sections: ${[...options.sectionIds].slice(0, 12).join(', ')}${options.sectionIds.size > 12 ? ', …' : ''})`);

    const loads: MemberLoad[] = [];
    for (const key of ['dead', 'superimposed', 'live'] as const) {
      const column = columnAt.get(key);
      if (!column) continue;
      const raw = cell(key);
      if (raw === '') continue;
      const value = cellNumber(raw, semicolons);
      // Allowed: 0 ≤ w ≤ MAX_IMPORT_LINE_LOAD (downward), in the column's unit.
      const range = `from 0 to ${formatNumber(MAX_IMPORT_LINE_LOAD / column.toInternal(1), 4)} ${column.unit}`;
      if (value === null) error(key, 'not-a-number', `must be a number in ${column.unit} (${range}; empty for none), got ${JSON.stringify(raw)}`);
      else if (value < 0) error(key, 'out-of-range', `must be ${range} (loads act downward), got ${raw} ${column.unit}`);
      else if (column.toInternal(value) > MAX_IMPORT_LINE_LOAD) error(key, 'out-of-range', `must be ${range}, got ${raw} ${column.unit}`);
      else if (value > 0) loads.push({ kind: 'uniform', loadCase: key, magnitude: column.toInternal(value), label: `${key} load (imported)` });
    }

    if (rowErrors.length > 0) {
      diagnostics.push(...rowErrors);
      continue;
    }
    const name = cell('name') || id;
    const notes = cell('notes');
    members.push({
      id,
      name,
      supports: supports!,
      span,
      zones: [{ from: 0, to: span, sectionId: section }],
      loads,
      service,
      capacity,
      ...(notes ? { notes } : {}),
    });
    rows.push(record.line);
  }
  return { members, rows, diagnostics };
}

// --- writing ----------------------------------------------------------------------------------------

/** The text of one cell: numbers to nine significant figures, empty when missing or not finite; text that a spreadsheet would run as a formula is prefixed with '. */
function cellText(value: string | number | null | undefined, options: { text?: boolean } = {}): string {
  if (value === null || value === undefined) return '';
  // Nine significant figures, shortest form (1234.5, 0.0035, 1e-9), -0 as 0.
  if (typeof value === 'number') return Number.isFinite(value) ? String(Number(value.toPrecision(9)) + 0) : '';
  // A text cell starting with = + - @ would be run as a formula by spreadsheets (CSV injection).
  return options.text !== false && /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

/** Quote a cell when it holds the separator, a quote or a line break, or starts or ends with a space. */
const needsQuotes = (cell: unknown): boolean => typeof cell === 'string' && /[",\r\n]|^\s|\s$/.test(cell);

/** One CSV field (see `cellText`), quoted when needed (RFC 4180, through papaparse). */
export function csvField(value: string | number | null | undefined, options: { text?: boolean } = {}): string {
  return Papa.unparse([[cellText(value, options)]], { quotes: needsQuotes, newline: '\r\n', escapeFormulae: false });
}

/** Rows to CSV text: CRLF line ends (RFC 4180), a final line end. */
export function csvText(rows: readonly (readonly (string | number | null | undefined)[])[]): string {
  return `${Papa.unparse(rows.map((row) => row.map((v) => cellText(v))), { quotes: needsQuotes, newline: '\r\n', escapeFormulae: false })}\r\n`;
}

/** A header cell with its unit: `span [ft]`; dimensionless columns get `[-]`. */
function head(label: string, quantity: Quantity | null, system: UnitSystem): string {
  if (quantity === null) return label;
  const unit = unitLabel(quantity, displaySystem(system));
  return `${label} [${unit === '' ? '-' : unit}]`;
}

const shown = (quantity: Quantity, value: number | null | undefined, system: UnitSystem): number | null =>
  typeof value === 'number' && Number.isFinite(value) ? toDisplay(quantity, value, displaySystem(system)) : null;

/** Why μΔ and θp (or μΔ alone) are not given: the brittle reason and/or the small-deflection range, in words; null when they are. */
function unavailable(k: MemberKeyResults, system: UnitSystem): string | null {
  const reasons = [k.ductilityUnavailable, k.ultimateOutsideRange].filter((t): t is NonNullable<typeof t> => t !== null).map((t) => say(t, system));
  return reasons.length > 0 ? reasons.join(' ') : null;
}

/**
 * Results summary, one row per member, in the display units of `system` (named in the header):
 * id, name, supports, span, status, My, Mu, φu/φy, μΔ, θp, ultimate load factor, governing
 * deflection and its limit, limit case, deflection and strength utilisations, warnings, governing mode,
 * then where the strength check governs (position, sense, combination) and, for a brittle member, why
 * its ductility and rotation are not given (those cells are then empty) — or, for a member whose
 * load–deflection curve leaves the small-deflection range, why μΔ is not given.
 */
export function resultsSummaryCsv(members: readonly MemberResult[], system: UnitSystem, project?: Project, continuous: readonly ContinuousMemberResult[] = []): string {
  const rows: (string | number | null)[][] = [[
    'member id', 'name', 'supports', head('span', 'spanLength', system), 'status',
    head('My', 'moment', system), head('Mu', 'moment', system), 'φu/φy [-]', 'μΔ [-]', head('θp', 'rotation', system),
    'ultimate load factor [-]', head('deflection', 'deflection', system), head('deflection limit', 'deflection', system), 'limit case',
    'deflection utilisation [-]', 'strength utilisation [-]', 'warnings', 'governing mode',
    head('strength position', 'spanLength', system), 'strength sense', 'strength combination', 'ductility not available',
  ]];
  for (const result of members) {
    const k = memberKeyResults(result, project?.members.find((m) => m.id === result.memberId));
    rows.push([
      k.memberId, k.memberName, k.supports, shown('spanLength', k.span, system), k.status,
      shown('moment', k.yieldMoment, system), shown('moment', k.ultimateMoment, system), k.curvatureDuctility, k.displacementDuctility,
      shown('rotation', k.plasticRotationCapacity, system), k.ultimateLoadFactor,
      shown('deflection', k.deflection?.deflection, system), shown('deflection', k.deflection?.limit, system), k.deflection?.limitCase ?? null,
      k.deflection?.utilisation ?? null, k.strengthUtilisation, k.warnings, say(k.governingMode, system),
      shown('spanLength', k.strengthPosition, system), k.strengthDirection, k.strengthCombination, unavailable(k, system),
    ]);
  }
  rows.push(...continuousSummaryRows(continuous, system));
  return csvText(rows);
}

/** Moment–curvature points of one curve (magnitudes in the curve's bending direction). */
export function momentCurvatureCsv(curve: MomentCurvatureResult, system: UnitSystem): string {
  const rows: (string | number | null)[][] = [[
    head('curvature', 'curvature', system), head('moment', 'moment', system), head('neutral axis depth', 'sectionLength', system),
    'compression face strain [-]', 'tension face strain [-]', 'largest steel tensile strain [-]',
  ]];
  for (const p of curve.points) {
    rows.push([shown('curvature', p.curvature, system), shown('moment', p.moment, system), shown('sectionLength', p.neutralAxisDepth, system), p.compressionFaceStrain, p.tensionFaceStrain, p.maxSteelTensileStrain]);
  }
  return csvText(rows);
}

/** Load–deflection points at the control point (deflection downward positive). */
export function loadDeflectionCsv(points: readonly LoadDeflectionPoint[], system: UnitSystem): string {
  const rows: (string | number | null)[][] = [['load factor [-]', head('total load', 'force', system), head('deflection', 'deflection', system), 'stage']];
  for (const p of points) rows.push([p.loadFactor, shown('force', p.totalLoad, system), shown('deflection', p.deflection, system), p.stage]);
  return csvText(rows);
}

/** Moment, curvature and deflection along the span at one load level. */
export function spanDistributionCsv(distribution: SpanDistribution, system: UnitSystem): string {
  const rows: (string | number | null)[][] = [[head('x', 'spanLength', system), head('moment', 'moment', system), head('curvature', 'curvature', system), head('deflection', 'deflection', system)]];
  distribution.x.forEach((x, i) => {
    rows.push([shown('spanLength', x, system), shown('moment', distribution.moment[i], system), shown('curvature', distribution.curvature[i], system), shown('deflection', distribution.deflection[i], system)]);
  });
  return csvText(rows);
}
