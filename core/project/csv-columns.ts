/**
 * The header of an imported CSV list (members, spans of continuous members): which column is which
 * and the unit each dimensioned column is written in, and the numbers of its cells. Shared by the
 * importers of csv.ts and continuous-import.ts, so a header reads the same in both.
 * Units: what the header names, converted to internal units (mm, N/mm, N·mm²).
 */
import type { Diagnostic } from '../diagnostics.ts';
import { fromDisplay, UNITS, type Quantity, type UnitId } from '../units/index.ts';

/** A column of an imported list: its key, the quantity of its unit (null: no unit) and the header names it goes by. */
export interface CsvColumn<K extends string> {
  readonly key: K;
  readonly quantity: Quantity | null;
  readonly required: boolean;
  readonly aliases: readonly string[];
}

/** A column found in the header: where, and how its numbers become internal units. */
export interface FoundColumn {
  readonly index: number;
  readonly toInternal: (value: number) => number;
  /** The unit as written in the header ('' for a column without one). */
  readonly unit: string;
}

/** Unit labels accepted in headers, by quantity (ASCII spellings included). */
const HEADER_UNITS: Readonly<Partial<Record<Quantity, Readonly<Record<string, UnitId>>>>> = {
  spanLength: { mm: 'mm', m: 'm', in: 'in', ft: 'ft' },
  lineLoad: { 'n/mm': 'N/mm', 'kn/m': 'kN/m', 'kip/ft': 'kip/ft', klf: 'kip/ft' },
  flexuralRigidity: { 'kn·m²': 'kN.m2', 'kn·m2': 'kN.m2', 'kn.m2': 'kN.m2', 'knm2': 'kN.m2', 'kn*m2': 'kN.m2', 'kip·in²': 'kip.in2', 'kip·in2': 'kip.in2', 'kip.in2': 'kip.in2', 'kip*in2': 'kip.in2' },
};
/** Line loads in lb/ft (plf) are accepted too: 1 lb/ft = 0.001 kip/ft. */
const PLF = ['lb/ft', 'plf', 'lbf/ft'];

/** An example header for a column with its unit, for messages. */
function example(key: string, quantity: Quantity): string {
  if (quantity === 'spanLength') return `${key} [ft] or ${key} [m]`;
  if (quantity === 'lineLoad') return `${key} [kip/ft] or ${key} [kN/m]`;
  return `${key} [kip·in²] or ${key} [kN·m²]`;
}

/** Name and unit of a header cell: `span [ft]` → span, ft. */
export function headerParts(cell: string): { name: string; unit: string | null } {
  const m = /^(.*?)\s*[[(]\s*([^\])]*)\s*[\])]\s*$/.exec(cell.trim());
  return m ? { name: m[1]!.trim().toLowerCase(), unit: m[2]!.trim() } : { name: cell.trim().toLowerCase(), unit: null };
}

const NUMBER_PATTERN = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** A number written in a cell (decimal comma allowed when `decimalComma`), or null. */
export function cellNumber(cell: string, decimalComma: boolean): number | null {
  const text = (decimalComma ? cell.replace(',', '.') : cell).trim();
  if (!NUMBER_PATTERN.test(text)) return null;
  const value = Number(text);
  return Number.isFinite(value) ? value : null;
}

/** The separator of a list: `;` (with a decimal comma) when the first line has semicolons and no commas, else `,`. */
export function csvSeparator(text: string): { delimiter: ',' | ';'; decimalComma: boolean } {
  const firstLine = text.replace(/^\uFEFF/, '').split(/\r?\n/, 1)[0] ?? '';
  const semicolons = firstLine.includes(';') && !firstLine.includes(',');
  return { delimiter: semicolons ? ';' : ',', decimalComma: semicolons };
}

/**
 * Finds each column of `columns` in the header row and the unit of every dimensioned one. Problems
 * go into `diagnostics` with the row and column; null when the header cannot be read (a required
 * column or a unit missing, a column twice, a unit not read here).
 */
export function readCsvHeader<K extends string>(header: { readonly line: number; readonly fields: readonly string[] }, columns: readonly CsvColumn<K>[], diagnostics: Diagnostic[]): Map<K, FoundColumn> | null {
  const found = new Map<K, FoundColumn>();
  let ok = true;
  header.fields.forEach((cell, index) => {
    const { name, unit } = headerParts(cell);
    const spec = columns.find((c) => c.aliases.includes(name));
    const at = `row ${header.line}, column ${index + 1}`;
    if (!spec) {
      diagnostics.push({ code: 'unknown-field', path: at, severity: 'warning', message: `"${cell.trim()}" is not a column Hingeline reads; it is ignored (columns: ${columns.map((c) => c.key).join(', ')})` });
      return;
    }
    if (found.has(spec.key)) {
      diagnostics.push({ code: 'duplicate-id', path: at, severity: 'error', message: `the column ${spec.key} appears twice` });
      ok = false;
      return;
    }
    if (spec.quantity === null) {
      found.set(spec.key, { index, toInternal: (v) => v, unit: '' });
      return;
    }
    const accepted = HEADER_UNITS[spec.quantity] ?? {};
    const unitKey = unit?.toLowerCase().replace(/\s+/g, '') ?? '';
    if (!unit) {
      diagnostics.push({ code: 'required', path: `row ${header.line}, column ${spec.key}`, severity: 'error', message: `the header must name the unit of the column, e.g. "${example(spec.key, spec.quantity)}"` });
      ok = false;
    } else if (spec.quantity === 'lineLoad' && PLF.includes(unitKey)) {
      found.set(spec.key, { index, toInternal: (v) => fromDisplay('lineLoad', v / 1000, 'US', 'kip/ft'), unit: 'lb/ft' });
    } else if (accepted[unitKey]) {
      const id = accepted[unitKey]!;
      found.set(spec.key, { index, toInternal: (v) => fromDisplay(spec.quantity!, v, 'SI', id), unit: UNITS[id].label });
    } else {
      diagnostics.push({ code: 'unknown-option', path: `row ${header.line}, column ${spec.key}`, severity: 'error', message: `unit "${unit}" is not one Hingeline reads here; use ${Object.keys(accepted).concat(spec.quantity === 'lineLoad' ? PLF : []).join(', ')}` });
      ok = false;
    }
  });
  for (const spec of columns) {
    if (spec.required && !found.has(spec.key) && !diagnostics.some((d) => d.path.endsWith(`column ${spec.key}`))) {
      diagnostics.push({ code: 'required', path: `row ${header.line}`, severity: 'error', message: `the header has no ${spec.key} column (required columns: ${columns.filter((c) => c.required).map((c) => c.key).join(', ')})` });
      ok = false;
    }
  }
  return ok ? found : null;
}
