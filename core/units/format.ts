import { displayUnit, toDisplay } from './convert.ts';
import type { Quantity, UnitSystem } from './quantities.ts';
import type { UnitId } from './units.ts';

/** Printed in place of a value that is not a finite number. No NaN or Infinity ever reaches a user. */
export const NOT_A_VALUE = '—';

/**
 * Significant figures: a count (clamped to 1–15), or `engineering`: four significant figures when the
 * leading digit is 1, otherwise three, so that every printed value has a relative rounding error
 * below about 0.5 %. // common practice, no source
 */
export type SignificantFigures = number | 'engineering';

/** Options shared by formatNumber and formatFixed. */
export interface NumberFormatOptions {
  /** Inserted between groups of three digits of the integer part, e.g. `,` or a thin space `\u2009`. Default: none. */
  readonly thousandsSeparator?: string;
}

const MAX_FIXED_EXPONENT = 14;
const MIN_FIXED_EXPONENT = -7;

function clampSignificantFigures(sigFigs: number): number {
  if (!Number.isFinite(sigFigs)) return 3;
  return Math.min(15, Math.max(1, Math.round(sigFigs)));
}

function groupThousands(integerDigits: string, separator: string | undefined): string {
  if (!separator || integerDigits.length <= 3) return integerDigits;
  const groups: string[] = [];
  for (let end = integerDigits.length; end > 0; end -= 3) groups.unshift(integerDigits.slice(Math.max(0, end - 3), end));
  return groups.join(separator);
}

function resolveSignificantFigures(magnitude: number, sigFigs: SignificantFigures): number {
  if (sigFigs !== 'engineering') return clampSignificantFigures(sigFigs);
  // Decide on the value rounded to four figures, so 0.99996 (→ 1.000) counts as leading 1.
  return magnitude.toExponential(3).startsWith('1') ? 4 : 3;
}

/**
 * Formats a number to `sigFigs` significant figures in plain positional notation (trailing zeros kept,
 * they state the precision: 2 → `2.00` at three figures). Values with a decimal exponent above 14 or
 * below −7 use `1.23e-9` notation. Zero prints `0`, never `-0`; a value that rounds to zero prints
 * without a sign. NaN and ±Infinity print an em dash `—`. The minus sign is ASCII `-`.
 */
export function formatNumber(value: number, sigFigs: SignificantFigures = 'engineering', options: NumberFormatOptions = {}): string {
  if (!Number.isFinite(value)) return NOT_A_VALUE;
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  const figures = resolveSignificantFigures(magnitude, sigFigs);
  const [mantissa = '0', exponentText = '0'] = magnitude.toExponential(figures - 1).split('e');
  const exponent = Number(exponentText);
  const sign = value < 0 ? '-' : '';
  if (exponent > MAX_FIXED_EXPONENT || exponent < MIN_FIXED_EXPONENT) return `${sign}${mantissa}e${exponent}`;
  const digits = mantissa.replace('.', '');
  let integerPart: string;
  let fractionPart: string;
  if (exponent >= digits.length - 1) {
    integerPart = digits + '0'.repeat(exponent - digits.length + 1);
    fractionPart = '';
  } else if (exponent >= 0) {
    integerPart = digits.slice(0, exponent + 1);
    fractionPart = digits.slice(exponent + 1);
  } else {
    integerPart = '0';
    fractionPart = '0'.repeat(-exponent - 1) + digits;
  }
  const grouped = groupThousands(integerPart, options.thousandsSeparator);
  return `${sign}${grouped}${fractionPart ? `.${fractionPart}` : ''}`;
}

/**
 * Formats a number with a fixed count of decimals (0–15), e.g. deflections to 0.1 mm. A value that
 * rounds to zero prints without a sign (`0.0`, never `-0.0`). NaN and ±Infinity print `—`.
 */
export function formatFixed(value: number, decimals: number, options: NumberFormatOptions = {}): string {
  if (!Number.isFinite(value)) return NOT_A_VALUE;
  const places = Number.isFinite(decimals) ? Math.min(15, Math.max(0, Math.round(decimals))) : 0;
  const text = Math.abs(value).toFixed(places);
  const [integerPart = '0', fractionPart] = text.split('.');
  const roundsToZero = Number(text) === 0;
  const sign = value < 0 && !roundsToZero ? '-' : '';
  const grouped = groupThousands(integerPart, options.thousandsSeparator);
  return `${sign}${grouped}${fractionPart === undefined ? '' : `.${fractionPart}`}`;
}

/** Options of formatQuantity; every field is optional. */
export interface QuantityFormatOptions extends NumberFormatOptions {
  /** Significant figures (default `engineering`: 3, or 4 when the leading digit is 1). Ignored when `decimals` is set. */
  readonly sigFigs?: SignificantFigures;
  /** Fixed decimals instead of significant figures. */
  readonly decimals?: number;
  /** A unit other than the system default, e.g. `kip.in` for moments or `permille` for strain. */
  readonly unit?: UnitId;
  /** Append the unit label (default true). */
  readonly withUnit?: boolean;
}

/**
 * Formats an internal value for display: converts to the quantity's unit in `system` and appends the
 * label with a space, e.g. formatQuantity('moment', 1.5e8, 'SI') → `150 kN·m`. A non-finite value prints
 * `—` alone (no unit). Units: `valueInternal` in the quantity's internal unit (N, mm, MPa, N·mm, 1/mm,
 * N/mm, kg/m³, rad, strain).
 */
export function formatQuantity(quantity: Quantity, valueInternal: number, system: UnitSystem, options: QuantityFormatOptions = {}): string {
  const unit = displayUnit(quantity, system, options.unit);
  const value = toDisplay(quantity, valueInternal, system, options.unit);
  if (!Number.isFinite(value)) return NOT_A_VALUE;
  const number = options.decimals === undefined
    ? formatNumber(value, options.sigFigs ?? 'engineering', options)
    : formatFixed(value, options.decimals, options);
  if (options.withUnit === false || unit.label === '') return number;
  return `${number} ${unit.label}`;
}

/** How a strain is printed: a plain number (0.00350), per mille (3.50 ‰), percent (0.350 %) or microstrain (3500 µε). */
export type StrainStyle = 'plain' | 'permille' | 'percent' | 'microstrain';

const STRAIN_UNITS: Readonly<Record<StrainStyle, UnitId>> = {
  plain: 'one',
  permille: 'permille',
  percent: 'percent',
  microstrain: 'microstrain',
};

/**
 * Formats a strain (dimensionless, compression positive as everywhere in core) in the chosen style,
 * e.g. formatStrain(0.0035, 'permille') → `3.50 ‰`, formatStrain(0.0035, 'microstrain') → `3500 µε`.
 * The same in both unit systems.
 */
export function formatStrain(strain: number, style: StrainStyle = 'plain', options: Omit<QuantityFormatOptions, 'unit'> = {}): string {
  return formatQuantity('strain', strain, 'SI', { ...options, unit: STRAIN_UNITS[style] });
}
