/**
 * Everything the command line prints, as small pure functions from data to text: the results
 * table, the JSON and CSV outputs, diagnostics and the progress bar. No I/O here (see commands.ts).
 * The numbers come from the results (core/project/key-results.ts picks them); this file only
 * converts units and rounds for display.
 */
import type { Diagnostic } from '../../core/diagnostics.ts';
import type { ProjectResults } from '../../core/analysis.ts';
import { memberKeyResults, type MemberKeyResults } from '../../core/project/key-results.ts';
import { MOMENT_NAMES } from '../../core/charts/moment-names.ts';
import { formatDiagnostic } from '../../core/project/validate.ts';
import type { Project, UnitSystem } from '../../core/project/types.ts';
import { displaySystem, formatFixed, formatNumber, NOT_A_VALUE, say, toDisplay, unitLabel, type Quantity, type Text, type UnitId } from '../../core/units/index.ts';
import { RESULTS_CAUTION } from '../shared/about.ts';
import type { MemberResult } from '../../core/assessment/results.ts';
import { serviceOutsideRange } from '../../core/member/small-deflection.ts';

export { RESULTS_CAUTION };

const display = displaySystem;

/** Words for a member status. */
export const STATUS_WORDS: Readonly<Record<MemberResult['status'], string>> = {
  ok: 'ok',
  'check-fails': 'check fails',
  brittle: 'brittle',
  'not-converged': 'not converged',
  'input-error': 'input error',
};

/** Words for support conditions. */
export const SUPPORT_WORDS: Readonly<Record<MemberResult['supports'], string>> = {
  'simply-supported': 'simply supported',
  cantilever: 'cantilever',
  'fixed-fixed': 'fixed–fixed',
  'propped-cantilever': 'propped cantilever',
};

/** Text styling: ANSI colours when `enabled` (a terminal without NO_COLOR), plain text otherwise. */
export interface Style {
  readonly enabled: boolean;
}

const paint = (style: Style, code: string, text: string) => (style.enabled ? `\u001b[${code}m${text}\u001b[0m` : text);
export const bold = (style: Style, text: string) => paint(style, '1', text);
export const dim = (style: Style, text: string) => paint(style, '2', text);
const red = (style: Style, text: string) => paint(style, '31', text);
const green = (style: Style, text: string) => paint(style, '32', text);
const yellow = (style: Style, text: string) => paint(style, '33', text);

/** Visible length of a string (ANSI colour codes do not count). */
export function visibleLength(text: string): number {
  return [...text.replace(/\u001b\[[0-9;]*m/g, '')].length;
}

function pad(text: string, width: number, align: 'left' | 'right'): string {
  const gap = ' '.repeat(Math.max(0, width - visibleLength(text)));
  return align === 'left' ? text + gap : gap + text;
}

export interface TableColumn {
  readonly header: string;
  /** Unit shown under the header ('' for none). */
  readonly unit: string;
  readonly align: 'left' | 'right';
}

/**
 * A plain-text table: header row, unit row, a rule, then the rows; columns two spaces apart and as
 * wide as their widest cell. Trailing spaces are trimmed.
 */
export function renderTable(columns: readonly TableColumn[], rows: readonly (readonly string[])[], style: Style = { enabled: false }): string {
  const widths = columns.map((c, i) => Math.max(visibleLength(c.header), visibleLength(c.unit), ...rows.map((r) => visibleLength(r[i] ?? ''))));
  const line = (cells: readonly string[]) => cells.map((cell, i) => pad(cell, widths[i]!, columns[i]!.align)).join('  ').replace(/\s+$/, '');
  const out = [
    bold(style, line(columns.map((c) => c.header))),
    dim(style, line(columns.map((c) => c.unit))),
    widths.map((w) => '─'.repeat(w)).join('  '),
    ...rows.map(line),
  ];
  return out.join('\n');
}

/** A dimensionless ratio to `decimals`, or — when missing. */
export function ratioText(value: number | null | undefined, decimals = 1): string {
  return typeof value === 'number' && Number.isFinite(value) ? formatFixed(value, decimals) : NOT_A_VALUE;
}

/** Splits text into lines of at most `width` columns at spaces (a longer word gets a line of its own). */
export function wrapLines(text: string, width: number): string[] {
  const lines: string[] = [];
  let current = '';
  for (const word of text.split(/\s+/).filter((w) => w !== '')) {
    if (current !== '' && visibleLength(current) + 1 + visibleLength(word) > width) {
      lines.push(current);
      current = word;
    } else {
      current = current === '' ? word : `${current} ${word}`;
    }
  }
  if (current !== '') lines.push(current);
  return lines;
}

/**
 * Wraps text into a block that starts at column `indent` of a `width`-column line: the first line is
 * returned without the indent (the caller has printed something there), the others are indented.
 */
export function wrap(text: string, width: number, indent = 0): string {
  return wrapLines(text, Math.max(20, width - indent)).join(`\n${' '.repeat(indent)}`);
}

/** Decimals shown per quantity in the table (display units): spans 0.1 ft or 0.01 m, moments 0.1, deflections 0.01 in or 0.1 mm. */
const DECIMALS: Readonly<Partial<Record<Quantity, Readonly<Record<UnitSystem, number>>>>> = {
  spanLength: { us: 1, si: 2 },
  moment: { us: 1, si: 1 },
  deflection: { us: 2, si: 1 },
  rotation: { us: 1, si: 1 },
};

/** A value in the table's display unit and decimals (DECIMALS), or — when missing. */
export function fixedQuantityText(quantity: Quantity, value: number | null | undefined, system: UnitSystem, unit?: UnitId): string {
  if (typeof value !== 'number' || !Number.isFinite(value)) return NOT_A_VALUE;
  const decimals = DECIMALS[quantity]?.[system];
  const shown = toDisplay(quantity, value, display(system), unit);
  return decimals === undefined ? formatNumber(shown, 'engineering') : formatFixed(shown, decimals);
}

function statusText(style: Style, status: MemberResult['status']): string {
  const words = STATUS_WORDS[status];
  if (status === 'ok') return green(style, words);
  if (status === 'check-fails' || status === 'brittle') return red(style, words);
  return yellow(style, words);
}

/** Key results of the members, in order (internal units). */
export function keyResultsOf(project: Project, results: readonly MemberResult[]): MemberKeyResults[] {
  return results.map((r) => memberKeyResults(r, project.members.find((m) => m.id === r.memberId)));
}

/** The columns of the results table in `system`. */
export function resultColumns(system: UnitSystem): TableColumn[] {
  const s = display(system);
  return [
    { header: 'Member', unit: '', align: 'left' },
    { header: 'Supports', unit: '', align: 'left' },
    { header: 'Span', unit: unitLabel('spanLength', s), align: 'right' },
    { header: 'My', unit: unitLabel('moment', s), align: 'right' },
    { header: 'Mu', unit: unitLabel('moment', s), align: 'right' },
    { header: 'φu/φy', unit: '', align: 'right' },
    { header: 'μΔ', unit: '', align: 'right' },
    { header: 'θp', unit: 'mrad', align: 'right' },
    { header: 'Δ', unit: unitLabel('deflection', s), align: 'right' },
    { header: 'Δ limit', unit: unitLabel('deflection', s), align: 'right' },
    { header: 'Δ/limit', unit: '', align: 'right' },
    { header: 'Strength', unit: 'util.', align: 'right' },
    { header: 'Status', unit: '', align: 'left' },
  ];
}

/** One table row per member (see resultColumns). */
export function resultRow(k: MemberKeyResults, system: UnitSystem, style: Style = { enabled: false }): string[] {
  const d = k.deflection;
  const utilisation = d ? ratioText(d.utilisation, 2) : NOT_A_VALUE;
  return [
    k.memberName === k.memberId || k.memberName === '' ? k.memberId : `${k.memberName} (${k.memberId})`,
    SUPPORT_WORDS[k.supports] ?? String(k.supports),
    fixedQuantityText('spanLength', k.span, system),
    fixedQuantityText('moment', k.yieldMoment, system),
    fixedQuantityText('moment', k.ultimateMoment, system),
    ratioText(k.curvatureDuctility),
    ratioText(k.displacementDuctility),
    fixedQuantityText('rotation', k.plasticRotationCapacity, system, 'mrad'),
    d ? fixedQuantityText('deflection', d.deflection, system) : NOT_A_VALUE,
    d ? `${fixedQuantityText('deflection', d.limit, system)} (ℓ/${d.ratio})` : NOT_A_VALUE,
    d && !d.pass ? red(style, utilisation) : utilisation,
    k.strengthPass === false ? red(style, ratioText(k.strengthUtilisation, 2)) : ratioText(k.strengthUtilisation, 2),
    statusText(style, k.status),
  ];
}

const UNIT_SYSTEM_WORDS: Readonly<Record<UnitSystem, string>> = { si: 'SI units', us: 'US customary units' };

export interface TableReportOptions {
  readonly system: UnitSystem;
  /** Terminal width for wrapping the governing-mode sentences (default 100). */
  readonly width?: number;
  readonly style?: Style;
}

/** The `analyze --format table` output: title, table, governing mode per member, summary, caution. */
export function tableReport(project: Project, results: ProjectResults, options: TableReportOptions): string {
  const style = options.style ?? { enabled: false };
  const width = Math.max(60, options.width ?? 100);
  const keys = keyResultsOf(project, results.members);
  const title = `${project.info.name}${project.info.number ? ` (${project.info.number})` : ''} — ${project.info.codeBasis}, ${UNIT_SYSTEM_WORDS[options.system]}`;
  const table = renderTable(resultColumns(options.system), keys.map((k) => resultRow(k, options.system, style)), style);
  const label = Math.max(...keys.map((k) => visibleLength(k.memberId)), 6);
  const indent = ' '.repeat(label + 2);
  const modes = keys.map((k, i) => {
    const head = pad(k.memberId, label, 'left');
    const words = (text: Text) => say(text, options.system);
    const problems = k.errors.map((e) => `\n${indent}${red(style, 'error:')} ${wrap(`${e.path}: ${words(e.message)}`, width, label + 9)}`).join('');
    const warnings = results.members[i]!.warnings.map((w) => `\n${indent}${yellow(style, 'warning:')} ${wrap(words(w), width, label + 11)}`).join('');
    return `${bold(style, head)}  ${wrap(words(k.governingMode), width, label + 2)}${problems}${warnings}`;
  });
  const s = results.summary;
  const summary = `${s.memberCount} member${s.memberCount === 1 ? '' : 's'}: ${s.ok} ok, ${s.checkFails} with a failing check, ${s.brittle} brittle, ${s.notConverged} not converged, ${s.inputErrors} with input errors.`;
  const notes: [string, string][] = [
    ['My, Mu', `critical section: My ${MOMENT_NAMES.idealisedYield.meaning}; Mu ${MOMENT_NAMES.ultimate.meaning}`],
    ['φu/φy', 'curvature ductility of the critical section'],
    ['μΔ', 'displacement ductility of the member'],
    ['θp', 'plastic rotation capacity of the hinge that governs the ultimate state'],
    ['Δ, Δ limit', 'the service deflection check with the highest utilisation, and its limit'],
    ['Strength', 'largest factored moment demand / design flexural resistance over the span (the governing combination is named in the governing mode)'],
    ['brittle', 'every check passes but the member fails without warning (shear before flexure, strength before the steel yields, or a cracking moment above the strength): its ductility and rotation are not given'],
  ];
  return [
    bold(style, title),
    '',
    table,
    '',
    bold(style, 'Governing mode'),
    ...modes,
    '',
    summary,
    ...notes.map(([term, text]) => dim(style, `${pad(term, 12, 'left')}${wrap(text, width, 12)}`)),
    '',
    `Caution: ${RESULTS_CAUTION}`,
    '',
  ].join('\n');
}

// --- JSON -------------------------------------------------------------------------------------------

/** A number with its unit, as the JSON output writes every dimensioned value. */
export interface Measured {
  readonly value: number;
  readonly unit: string;
}

/** Six significant figures: enough for any check, without binary noise. */
const sig6 = (v: number) => Number(v.toPrecision(6));

export function measured(quantity: Quantity, value: number | null | undefined, system: UnitSystem, unit?: UnitId): Measured | null {
  if (typeof value !== 'number' || !Number.isFinite(value)) return null;
  return { value: sig6(toDisplay(quantity, value, display(system), unit)), unit: unitLabel(quantity, display(system), unit) };
}

/** A dimensionless value; unit "1" (as in SI for quantities of dimension one). */
export function pure(value: number | null | undefined): Measured | null {
  return typeof value === 'number' && Number.isFinite(value) ? { value: sig6(value), unit: '1' } : null;
}

/** Version of the JSON output's layout (docs/cli.md). */
export const ANALYSIS_JSON_VERSION = 2;

/**
 * The `analyze --format json` document (see docs/cli.md for every key); with `detail` (the full
 * detail, detail.ts) each member also carries `detail`.
 */
export function analysisJson(project: Project, results: ProjectResults, system: UnitSystem, source?: string, detail?: (member: MemberResult, system: UnitSystem) => unknown): unknown {
  const keys = keyResultsOf(project, results.members);
  return {
    format: 'hingeline-analysis-summary',
    version: ANALYSIS_JSON_VERSION,
    caution: RESULTS_CAUTION,
    project: { name: project.info.name, number: project.info.number, codeBasis: project.info.codeBasis, revision: project.info.revision, date: project.info.date, ...(source ? { file: source } : {}) },
    unitSystem: system,
    summary: {
      members: results.summary.memberCount,
      ok: results.summary.ok,
      checkFails: results.summary.checkFails,
      brittle: results.summary.brittle,
      notConverged: results.summary.notConverged,
      inputErrors: results.summary.inputErrors,
    },
    members: keys.map((k, i) => {
      const r = results.members[i]!;
      return {
        id: k.memberId,
        name: k.memberName,
        supports: k.supports,
        status: k.status,
        span: measured('spanLength', k.span, system),
        criticalSection: k.critical
          ? { id: k.critical.sectionId, name: k.critical.sectionName, direction: k.critical.direction, position: measured('spanLength', k.critical.position, system) }
          : null,
        yieldMoment: measured('moment', k.yieldMoment, system),
        ultimateMoment: measured('moment', k.ultimateMoment, system),
        curvatureDuctility: pure(k.curvatureDuctility),
        displacementDuctility: pure(k.displacementDuctility),
        plasticRotationCapacity: measured('rotation', k.plasticRotationCapacity, system),
        ductilityUnavailable: k.ductilityUnavailable ? say(k.ductilityUnavailable, system) : null,
        ultimateOutsideRange: k.ultimateOutsideRange ? say(k.ultimateOutsideRange, system) : null,
        brittle: r.brittle.map((b) => ({ cause: b.cause, sectionId: b.sectionId, direction: b.direction, text: say(b.text, system) })),
        ultimateLoadFactor: pure(k.ultimateLoadFactor),
        deflection: k.deflection
          ? {
              limitCase: k.deflection.limitCase,
              description: k.deflection.description,
              computed: measured('deflection', k.deflection.deflection, system),
              limit: measured('deflection', k.deflection.limit, system),
              spanRatio: k.deflection.ratio,
              utilisation: pure(k.deflection.utilisation),
              pass: k.deflection.pass,
            }
          : null,
        deflectionChecks: (serviceOutsideRange(r.service, r.span) ? [] : r.service?.checks ?? []).map((c) => ({
          limitCase: c.limitCase,
          computed: measured('deflection', c.governing, system),
          limit: measured('deflection', c.limit, system),
          spanRatio: c.ratio,
          utilisation: pure(c.utilisation),
          pass: c.pass,
        })),
        strength: k.strengthUtilisation !== null
          ? {
              utilisation: pure(k.strengthUtilisation),
              pass: k.strengthPass,
              position: measured('spanLength', k.strengthPosition, system),
              direction: k.strengthDirection,
              combination: k.strengthCombination,
              combinations: (r.strength?.combinations ?? []).map((c) => ({ combination: c.combination, utilisation: pure(c.utilisation) })),
            }
          : null,
        governingMode: say(k.governingMode, system),
        warnings: r.warnings.map((w) => say(w, system)),
        errors: k.errors.map((e) => ({ path: e.path, message: say(e.message, system) })),
        ...(detail && r.status !== 'input-error' ? { detail: detail(r, system) } : {}),
      };
    }),
  };
}

// --- diagnostics and progress ------------------------------------------------------------------------

/** Diagnostics as lines, errors and warnings marked (see formatDiagnostic). */
export function diagnosticLines(diagnostics: readonly Diagnostic[], style: Style = { enabled: false }): string[] {
  return diagnostics.map((d) => {
    const line = formatDiagnostic(d);
    return d.severity === 'error' ? `${red(style, 'error:')} ${line}` : yellow(style, line);
  });
}

/** `2 errors, 1 warning` (or `no problems`). */
export function problemCount(diagnostics: readonly Diagnostic[]): string {
  const errors = diagnostics.filter((d) => d.severity === 'error').length;
  const warnings = diagnostics.length - errors;
  if (errors === 0 && warnings === 0) return 'no problems';
  const parts = [];
  if (errors > 0) parts.push(`${errors} error${errors === 1 ? '' : 's'}`);
  if (warnings > 0) parts.push(`${warnings} warning${warnings === 1 ? '' : 's'}`);
  return parts.join(', ');
}

/**
 * One line of a progress bar, e.g. `[███████░░░░░░░░░░░░░]  35% 7/20 members  B-204`, no longer than
 * `width` columns (the member id is cut to fit).
 */
export function progressLine(done: number, total: number, label: string, width = 80): string {
  const fraction = total > 0 ? Math.min(1, Math.max(0, done / total)) : 0;
  const barWidth = Math.max(10, Math.min(30, width - 40));
  const filled = Math.round(fraction * barWidth);
  const head = `[${'█'.repeat(filled)}${'░'.repeat(barWidth - filled)}] ${String(Math.floor(fraction * 100)).padStart(3)}% ${done}/${total} members`;
  const room = width - visibleLength(head) - 2;
  const tail = room > 3 ? (label.length > room ? `${label.slice(0, room - 1)}…` : label) : '';
  return tail ? `${head}  ${tail}` : head;
}
