/**
 * Display formatting for the views: internal values to text in the project's unit system
 * (core/units `formatQuantity`), and pure numbers. Never shows NaN or Infinity (an em dash instead).
 */
import { engineeringText } from '../../../core/charts/units.ts';
import { displayUnit, formatNumber, formatQuantity, NOT_A_VALUE, say, toDisplay, type Quantity, type QuantityFormatOptions, type Text } from '../../../core/units/index.ts';
import type { UnitSystem } from '../../../core/project/types.ts';
import { displaySystem } from './units.ts';

/**
 * `150 kN·m` / `111 kip·ft`; an em dash for a missing or non-finite value. Curvatures, whose
 * values in 1/in or 1/m have many leading zeros, are written in engineering notation
 * (`8.54×10⁻⁶ 1/in`) unless the options ask for a format.
 */
export function quantityText(quantity: Quantity, value: number | null | undefined, system: UnitSystem, options: QuantityFormatOptions = {}): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return NOT_A_VALUE;
  const unitSystem = displaySystem(system);
  if (quantity === 'curvature' && options.decimals === undefined && options.sigFigs === undefined) {
    const shown = toDisplay(quantity, value, unitSystem, options.unit);
    return engineeringText(shown, options.withUnit === false ? '' : displayUnit(quantity, unitSystem, options.unit).label);
  }
  return formatQuantity(quantity, value, unitSystem, options);
}

/**
 * A sentence of the results (words, and quantities kept as data) in the project's unit system of
 * the moment: switching units changes it without analysing again.
 */
export function sayText(text: Text, system: UnitSystem): string {
  return say(text, system);
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
