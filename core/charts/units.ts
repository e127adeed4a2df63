/**
 * Display units for charts: resolving the caller's unit choice, converting internal values
 * (N, mm, MPa, N·mm, 1/mm, strain) to display values, and building axis labels that name the unit
 * and any power-of-ten factor.
 */
import { displayUnit, toDisplay } from '../units/convert.ts';
import { formatNumber, NOT_A_VALUE } from '../units/format.ts';
import { displaySystem, type Quantity } from '../units/quantities.ts';
import type { UnitId } from '../units/units.ts';
import type { AxisSpec, DisplayUnits, UnitsInput } from './types.ts';

const STRAIN_UNIT: Record<NonNullable<DisplayUnits['strainStyle']>, UnitId> = {
  plain: 'one',
  permille: 'permille',
  percent: 'percent',
  microstrain: 'microstrain',
};

/** Normalises the units argument of a chart builder. 'si'/'us' (project file spelling) map to 'SI'/'US'. */
export function resolveUnits(input: UnitsInput): DisplayUnits {
  if (typeof input === 'string') {
    return { system: displaySystem(input), strainStyle: 'permille' };
  }
  return { strainStyle: 'permille', ...input };
}

/** The unit a quantity is shown in under `units` (strain: per mille unless chosen otherwise). */
export function unitFor(quantity: Quantity, units: DisplayUnits): UnitId | undefined {
  if (quantity === 'strain') return units.overrides?.strain ?? STRAIN_UNIT[units.strainStyle ?? 'permille'];
  return units.overrides?.[quantity];
}

/** Converts an internal value to the display unit of `quantity` (pure arithmetic). */
export function display(quantity: Quantity, valueInternal: number, units: DisplayUnits): number {
  return toDisplay(quantity, valueInternal, units.system, unitFor(quantity, units));
}

/** Label of the display unit of `quantity`, e.g. `kN·m` (empty for pure numbers). */
export function unitText(quantity: Quantity, units: DisplayUnits): string {
  return displayUnit(quantity, units.system, unitFor(quantity, units)).label;
}

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/** `10⁻⁶` for −6. */
export function powerOfTenText(exponent: number): string {
  return `10${String(exponent).split('').map((c) => SUPERSCRIPT[c] ?? c).join('')}`;
}

/**
 * Power-of-ten factor (a multiple of 3 in the exponent) that brings the largest magnitude of
 * `values` into [0.01, 100 000), so tick labels stay short; 1 when no factor is needed or there
 * is no finite non-zero value. // common practice, no source
 */
export function axisScale(values: Iterable<number>): number {
  let largest = 0;
  for (const v of values) if (Number.isFinite(v) && Math.abs(v) > largest) largest = Math.abs(v);
  if (largest === 0 || (largest >= 0.01 && largest < 1e5)) return 1;
  const exponent = 3 * Math.floor(Math.log10(largest) / 3);
  return 10 ** exponent;
}

/**
 * An axis for `quantity`: the label reads `<name> (<unit>)`, or `<name> (×10⁻³ <unit>)` when the
 * plotted numbers were divided by `scale`. A pure number shows no parentheses unless scaled.
 */
export function axisFor(name: string, unit: string, scale: number, extra: Partial<Omit<AxisSpec, 'label' | 'unit' | 'scale'>> = {}): AxisSpec {
  const factor = scale === 1 ? '' : `×${powerOfTenText(Math.round(Math.log10(scale)))}`;
  const inside = [factor, unit].filter((s) => s !== '').join(' ');
  return { label: inside === '' ? name : `${name} (${inside})`, unit, scale, ...extra };
}

/** True for a finite number. */
export function finite(value: number | null | undefined): value is number {
  return typeof value === 'number' && Number.isFinite(value);
}

/**
 * Power-of-ten factor (a multiple of 3 in the exponent) for a column of a table: the smallest
 * non-zero magnitude becomes at least 1, so no value needs leading zeros (curvatures 8.54, 80.4,
 * 1986 ×10⁻⁶ 1/in rather than 0.00000854 1/in), unless the largest would then reach 100 000;
 * then the axis factor (`axisScale`) is used. 1 when no factor is needed. // common practice, no source
 */
export function tableScale(values: Iterable<number>): number {
  let smallest = Infinity;
  let largest = 0;
  for (const v of values) {
    if (!Number.isFinite(v) || v === 0) continue;
    smallest = Math.min(smallest, Math.abs(v));
    largest = Math.max(largest, Math.abs(v));
  }
  if (largest === 0) return 1;
  if (smallest >= 1 && largest < 1e5) return 1;
  const scale = 10 ** (3 * Math.floor(Math.log10(smallest) / 3));
  return largest / scale < 1e5 ? scale : axisScale([largest]);
}

/** `×10⁻⁶ 1/in` for a factor and a unit label; the unit alone when the factor is 1. */
export function scaledUnitText(unit: string, scale: number): string {
  if (scale === 1) return unit;
  const factor = `×${powerOfTenText(Math.round(Math.log10(scale)))}`;
  return unit === '' ? factor : `${factor} ${unit}`;
}

/**
 * A display value in engineering notation when it would otherwise need leading zeros or many
 * digits: `8.54×10⁻⁶ 1/in`, `1.986×10⁻³ 1/m`; values from 0.01 to 100 000 print plainly
 * (`191.7 kip·ft`). Three or four significant figures (core/units `formatNumber`). A value that is
 * not finite prints `—`.
 */
export function engineeringText(value: number, unit: string): string {
  if (!Number.isFinite(value)) return NOT_A_VALUE;
  const magnitude = Math.abs(value);
  const withUnit = (text: string) => (unit === '' ? text : `${text} ${unit}`);
  if (magnitude === 0 || (magnitude >= 0.01 && magnitude < 1e5)) return withUnit(formatNumber(value));
  const exponent = 3 * Math.floor(Math.log10(magnitude) / 3);
  return withUnit(`${formatNumber(value / 10 ** exponent)}×${powerOfTenText(exponent)}`);
}

/**
 * A plotted value of `axis` (divided by the axis factor) as text with its unit and the factor
 * put back: 1.442 on a `×10⁻³ 1/in` axis reads `1.442×10⁻³ 1/in`.
 */
export function axisValueText(plotted: number, axis: Pick<AxisSpec, 'unit' | 'scale' | 'categories'>): string {
  if (axis.categories) {
    const name = Number.isInteger(plotted) ? axis.categories[plotted] : undefined;
    if (name !== undefined) return typeof name === 'string' ? name : name.join(' ');
  }
  return engineeringText(plotted * axis.scale, axis.unit);
}
