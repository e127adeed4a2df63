/**
 * Display formatting for the views: internal values to text in the project's unit system
 * (core/units `formatQuantity`), and pure numbers. Never shows NaN or Infinity (an em dash instead).
 */
import { formatNumber, formatQuantity, NOT_A_VALUE, type Quantity, type QuantityFormatOptions } from '../../../core/units/index.ts';
import type { UnitSystem } from '../../../core/project/types.ts';
import { displaySystem } from './units.ts';

/** `150 kN·m` / `111 kip·ft`; an em dash for a missing or non-finite value. */
export function quantityText(quantity: Quantity, value: number | null | undefined, system: UnitSystem, options: QuantityFormatOptions = {}): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return NOT_A_VALUE;
  return formatQuantity(quantity, value, displaySystem(system), options);
}

/** A pure number to engineering precision (3–4 significant figures); em dash when missing. */
export function numberText(value: number | null | undefined, sigFigs: number | 'engineering' = 'engineering'): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return NOT_A_VALUE;
  return formatNumber(value, sigFigs);
}

/** A ratio such as a utilisation: `0.62`. */
export function ratioText(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return NOT_A_VALUE;
  return value.toFixed(2);
}

/** A strain in per mille: `3.50 ‰`. */
export function strainText(value: number | null | undefined): string {
  return quantityText('strain', value, 'si', { unit: 'permille' });
}

/** A rotation in milliradians: `55.8 mrad`. */
export function rotationText(value: number | null | undefined, system: UnitSystem): string {
  return quantityText('rotation', value, system, { unit: 'mrad' });
}
