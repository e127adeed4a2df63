import { BugError } from '../errors.ts';
import { QUANTITIES, type Quantity, type QuantityDefinition, type UnitSystem } from './quantities.ts';
import { UNITS, type Dimension, type UnitDefinition, type UnitId } from './units.ts';

/**
 * Magnitudes (internal units) below which a value is round-off of zero: far below any value a beam
 * assessment meets (a moment of 0.001 N·mm, a length of a nanometre…) and far above the noise of
 * double precision arithmetic on the values it does meet (about 1e-16 of them: a moment of 1e9 N·mm
 * that cancels at a support leaves 1e-7 N·mm). Such a value is shown as zero: never "4.40e-14 kip·ft".
 * // common practice, no source
 */
export const ROUND_OFF_ZERO: Readonly<Record<Dimension, number>> = {
  force: 1e-6,
  length: 1e-9,
  area: 1e-9,
  secondMoment: 1e-6,
  stress: 1e-9,
  moment: 1e-3,
  flexuralRigidity: 1,
  curvature: 1e-15,
  lineLoad: 1e-9,
  density: 1e-9,
  angle: 1e-12,
  dimensionless: 1e-12,
};

function definitionOf(quantity: Quantity): QuantityDefinition {
  const definition = QUANTITIES[quantity];
  if (!definition) throw new BugError(`unknown quantity "${String(quantity)}"`);
  return definition;
}

/**
 * The display unit of a quantity: the system's default, or `unit` when given.
 * Throws BugError when `unit` is not one of the quantity's allowed units (a programming error:
 * the UI offers only allowed units).
 */
export function displayUnit(quantity: Quantity, system: UnitSystem, unit?: UnitId): UnitDefinition {
  const definition = definitionOf(quantity);
  if (system !== 'SI' && system !== 'US') throw new BugError(`unknown unit system "${String(system)}"`);
  const id = unit ?? definition[system];
  if (!definition.units.includes(id)) {
    throw new BugError(`unit "${String(id)}" is not allowed for ${quantity} (allowed: ${definition.units.join(', ')})`);
  }
  return UNITS[id];
}

/** Label of the display unit, e.g. unitLabel('moment', 'US') → `kip·ft`. Empty for pure numbers. */
export function unitLabel(quantity: Quantity, system: UnitSystem, unit?: UnitId): string {
  return displayUnit(quantity, system, unit).label;
}

/**
 * Converts an internal value (N, mm, MPa, N·mm, 1/mm, N/mm, kg/m³, rad, strain) to the display unit of
 * `quantity` in `system` (or to `unit`). A value within round-off of zero (ROUND_OFF_ZERO) becomes 0.
 * NaN and ±Infinity pass through unchanged; formatting (formatQuantity) is where they are caught.
 */
export function toDisplay(quantity: Quantity, valueInternal: number, system: UnitSystem, unit?: UnitId): number {
  if (Math.abs(valueInternal) < ROUND_OFF_ZERO[definitionOf(quantity).dimension]) return 0;
  return valueInternal / displayUnit(quantity, system, unit).internalPerUnit;
}

/**
 * Converts a value typed in the display unit of `quantity` in `system` (or in `unit`) to internal
 * units. Inverse of toDisplay (to rounding in the last bit).
 */
export function fromDisplay(quantity: Quantity, valueDisplay: number, system: UnitSystem, unit?: UnitId): number {
  return valueDisplay * displayUnit(quantity, system, unit).internalPerUnit;
}

/**
 * Converts a value between two units of the same dimension, e.g. convertUnit(1, 'ksi', 'MPa') → 6.894 757….
 * Throws BugError when the dimensions differ.
 */
export function convertUnit(value: number, from: UnitId, to: UnitId): number {
  const a = UNITS[from];
  const b = UNITS[to];
  if (!a || !b) throw new BugError(`unknown unit "${String(a ? to : from)}"`);
  if (a.dimension !== b.dimension) {
    throw new BugError(`cannot convert ${a.label || from} (${a.dimension}) to ${b.label || to} (${b.dimension})`);
  }
  return (value * a.internalPerUnit) / b.internalPerUnit;
}
