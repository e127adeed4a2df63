/**
 * Units at the input fields. The project holds internal SI values (mm, N, MPa, N/mm); a field shows
 * and accepts values in the display unit of its quantity in the project's unit system
 * (core/units). A value may also be typed with any unit the quantity allows, e.g. `600 mm` in a
 * field showing inches, or `24'` for feet: it is converted, never misread.
 * Conversion factors all come from core/units; nothing here knows a factor of its own.
 */
import { QUANTITIES, UNITS, displaySystem, displayUnit, fromDisplay, toDisplay, type Quantity, type UnitId } from '../../../core/units/index.ts';
import type { UnitSystem } from '../../../core/project/types.ts';

/** core/units' name of the project's unit system. */
export { displaySystem };

/** Label of the unit a field of `quantity` shows in `system`, e.g. `ft`, `kip·ft`, `MPa`. */
export function fieldUnit(quantity: Quantity, system: UnitSystem): string {
  return displayUnit(quantity, displaySystem(system)).label;
}

/**
 * Text of a stored (internal) value in a field: the display value to eight significant figures
 * without trailing zeros, so that 7315.2 mm shows as `24` ft and 0.1 stays `0.1`.
 */
export function formatForInput(value: number | undefined, quantity: Quantity | null, system: UnitSystem): string {
  if (value === undefined || !Number.isFinite(value)) return '';
  const shown = quantity ? toDisplay(quantity, value, displaySystem(system)) : value;
  const rounded = Number(shown.toPrecision(8));
  return Object.is(rounded, -0) ? '0' : String(rounded);
}

/** Extra spellings people type for units (all map to core/units ids). */
const ALIASES: Readonly<Record<string, UnitId>> = {
  "'": 'ft', ft: 'ft', feet: 'ft', foot: 'ft',
  '"': 'in', in: 'in', inch: 'in', inches: 'in', "''": 'in',
  mm: 'mm', m: 'm',
  'mm²': 'mm2', mm2: 'mm2', 'mm^2': 'mm2', 'in²': 'in2', in2: 'in2', 'in^2': 'in2', 'sq in': 'in2',
  n: 'N', kn: 'kN', lb: 'lbf', lbs: 'lbf', lbf: 'lbf', kip: 'kip', kips: 'kip', k: 'kip',
  mpa: 'MPa', gpa: 'GPa', psi: 'psi', ksi: 'ksi',
  'n·mm': 'N.mm', 'n.mm': 'N.mm', nmm: 'N.mm', 'n-mm': 'N.mm',
  'kn·m': 'kN.m', 'kn.m': 'kN.m', knm: 'kN.m', 'kn-m': 'kN.m', 'kn m': 'kN.m',
  'kip·ft': 'kip.ft', 'kip.ft': 'kip.ft', 'kip-ft': 'kip.ft', kipft: 'kip.ft', 'k-ft': 'kip.ft', 'kip ft': 'kip.ft',
  'kip·in': 'kip.in', 'kip.in': 'kip.in', 'kip-in': 'kip.in', kipin: 'kip.in', 'k-in': 'kip.in', 'kip in': 'kip.in',
  'n/mm': 'N/mm', 'kn/m': 'kN/m', 'kip/ft': 'kip/ft', klf: 'kip/ft', 'k/ft': 'kip/ft',
  'kg/m³': 'kg/m3', 'kg/m3': 'kg/m3', 'kn/m³': 'kN/m3', 'kn/m3': 'kN/m3', pcf: 'pcf', 'lb/ft³': 'pcf', 'lb/ft3': 'pcf',
  rad: 'rad', mrad: 'mrad', '%': 'percent', '‰': 'permille', 'µε': 'microstrain', 'με': 'microstrain', ue: 'microstrain',
};

function unitFromText(text: string, quantity: Quantity): UnitId | null {
  const allowed = QUANTITIES[quantity].units;
  const exact = allowed.find((id) => id === text || UNITS[id].label === text);
  if (exact) return exact;
  const alias = ALIASES[text.toLowerCase()];
  return alias && allowed.includes(alias) ? alias : null;
}

export type ParsedInput =
  | { readonly ok: true; readonly value: number }
  | { readonly ok: false; readonly message: string };

/** Twelve significant figures: conversions without binary noise (24 ft → 7315.2 mm, not 7315.200000000001). */
const tidy = (x: number): number => Number(x.toPrecision(12));

const NUMBER = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*(.*)$/;

/**
 * Reads what was typed into a field of `quantity` (null: a plain number) in `system` and returns
 * the internal (SI) value. Accepts a decimal point or a single decimal comma, thousands separators
 * (`1,200.5`, spaces) and an optional unit the quantity allows. Refuses, with a sentence saying
 * why: empty text, text that is not a number, `1,200` (comma ambiguous), unknown units.
 */
export function parseInput(text: string, quantity: Quantity | null, system: UnitSystem): ParsedInput {
  let body = text.trim().replace(/[\u2009\u202f\u00a0]/g, ' ').replace(/[\u2212\u2013]/g, '-');
  if (body === '') return { ok: false, message: 'enter a value' };
  // "(unit: in)" rather than "in in" when the unit is the inch.
  const unitHint = quantity ? ` (unit: ${fieldUnit(quantity, system)})` : '';
  // Thousands separators: commas before a decimal point, or spaces between digit groups.
  if (/^[+-]?\d{1,3}(,\d{3})+(\.\d*)?(\D.*)?$/.test(body) && body.includes('.')) body = body.replace(/,(?=\d{3})/g, '');
  else if (/^[+-]?\d{1,3},\d{3}(\D.*)?$/.test(body)) {
    return { ok: false, message: `"${text.trim()}" is ambiguous: write ${body.replace(',', '')} for a thousands value or use a decimal point` };
  } else if (/^[+-]?\d*,\d+/.test(body)) body = body.replace(',', '.');
  body = body.replace(/^([+-]?\d{1,3}(?: \d{3})+)(?=$|[.\sA-Za-z'"%‰µ])/, (group) => group.replace(/ /g, ''));
  const match = NUMBER.exec(body);
  if (!match) return { ok: false, message: `"${text.trim()}" is not a number; type a number${unitHint}` };
  const number = Number(match[1]);
  if (!Number.isFinite(number)) return { ok: false, message: `"${text.trim()}" is too large a number` };
  const unitText = match[2]!.trim();
  if (unitText === '') return { ok: true, value: quantity ? tidy(fromDisplay(quantity, number, displaySystem(system))) : number };
  if (!quantity) return { ok: false, message: `"${unitText}" cannot follow this value: it has no unit` };
  const unit = unitFromText(unitText, quantity);
  if (!unit) {
    const allowed = QUANTITIES[quantity].units.map((id) => UNITS[id].label).filter((label) => label !== '').join(', ');
    return { ok: false, message: `unknown unit "${unitText}" here; use ${allowed}` };
  }
  return { ok: true, value: tidy(fromDisplay(quantity, number, displaySystem(system), unit)) };
}
