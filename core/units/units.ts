import {
  KILOGRAMS_PER_CUBIC_METRE_PER_PCF,
  MEGAPASCALS_PER_KSI,
  MEGAPASCALS_PER_PSI,
  MILLIMETRES_PER_FOOT,
  MILLIMETRES_PER_INCH,
  NEWTONS_PER_KIP,
  NEWTONS_PER_POUND_FORCE,
  STANDARD_GRAVITY,
} from './factors.ts';

/**
 * Physical dimension of a unit. Two units convert into each other only when their dimensions agree.
 * The internal unit of each dimension is named beside it.
 */
export type Dimension =
  | 'force' // N
  | 'length' // mm
  | 'area' // mm²
  | 'secondMoment' // mm⁴
  | 'stress' // MPa = N/mm²
  | 'moment' // N·mm
  | 'flexuralRigidity' // N·mm²
  | 'curvature' // 1/mm (rad/mm)
  | 'lineLoad' // N/mm
  | 'density' // kg/m³
  | 'angle' // rad
  | 'dimensionless'; // 1 (strain, ratios)

/** Identifier of a display unit (ASCII, stable: it may be stored in user preferences). */
export type UnitId =
  | 'N' | 'kN' | 'lbf' | 'kip'
  | 'mm' | 'm' | 'in' | 'ft'
  | 'mm2' | 'in2'
  | 'mm4' | 'e6mm4' | 'in4'
  | 'MPa' | 'GPa' | 'psi' | 'ksi'
  | 'N.mm' | 'kN.m' | 'kip.ft' | 'kip.in'
  | 'kN.m2' | 'kip.in2'
  | 'per-mm' | 'per-m' | 'rad-per-km' | 'per-in'
  | 'N/mm' | 'kN/m' | 'kip/ft'
  | 'kg/m3' | 'kN/m3' | 'pcf'
  | 'rad' | 'mrad'
  | 'one' | 'percent' | 'permille' | 'microstrain';

/** One display unit: its printed label and its size in internal units. */
export interface UnitDefinition {
  readonly id: UnitId;
  /** Printed label, e.g. `kN·m` (empty for a pure number). */
  readonly label: string;
  readonly dimension: Dimension;
  /**
   * Size of one display unit expressed in internal units, e.g. 25.4 for `in` (1 in = 25.4 mm).
   * display value = internal value / internalPerUnit; internal value = display value × internalPerUnit.
   */
  readonly internalPerUnit: number;
}

function unit(id: UnitId, label: string, dimension: Dimension, internalPerUnit: number): UnitDefinition {
  return { id, label, dimension, internalPerUnit };
}

const inch = MILLIMETRES_PER_INCH;
const foot = MILLIMETRES_PER_FOOT;

/**
 * Every display unit the program knows. Factors are exact or built from exact definitions
 * (core/units/factors.ts, NIST SP 811 Appendix B).
 */
export const UNITS: Readonly<Record<UnitId, UnitDefinition>> = {
  N: unit('N', 'N', 'force', 1),
  kN: unit('kN', 'kN', 'force', 1e3),
  lbf: unit('lbf', 'lbf', 'force', NEWTONS_PER_POUND_FORCE),
  kip: unit('kip', 'kip', 'force', NEWTONS_PER_KIP),

  mm: unit('mm', 'mm', 'length', 1),
  m: unit('m', 'm', 'length', 1e3),
  in: unit('in', 'in', 'length', inch),
  ft: unit('ft', 'ft', 'length', foot),

  mm2: unit('mm2', 'mm²', 'area', 1),
  in2: unit('in2', 'in²', 'area', inch * inch),

  mm4: unit('mm4', 'mm⁴', 'secondMoment', 1),
  e6mm4: unit('e6mm4', '×10⁶ mm⁴', 'secondMoment', 1e6),
  in4: unit('in4', 'in⁴', 'secondMoment', inch ** 4),

  MPa: unit('MPa', 'MPa', 'stress', 1),
  GPa: unit('GPa', 'GPa', 'stress', 1e3),
  psi: unit('psi', 'psi', 'stress', MEGAPASCALS_PER_PSI),
  ksi: unit('ksi', 'ksi', 'stress', MEGAPASCALS_PER_KSI),

  'N.mm': unit('N.mm', 'N·mm', 'moment', 1),
  'kN.m': unit('kN.m', 'kN·m', 'moment', 1e6),
  'kip.ft': unit('kip.ft', 'kip·ft', 'moment', NEWTONS_PER_KIP * foot),
  'kip.in': unit('kip.in', 'kip·in', 'moment', NEWTONS_PER_KIP * inch),

  'kN.m2': unit('kN.m2', 'kN·m²', 'flexuralRigidity', 1e3 * 1e6),
  'kip.in2': unit('kip.in2', 'kip·in²', 'flexuralRigidity', NEWTONS_PER_KIP * inch * inch),

  'per-mm': unit('per-mm', '1/mm', 'curvature', 1),
  'per-m': unit('per-m', '1/m', 'curvature', 1e-3),
  'rad-per-km': unit('rad-per-km', 'rad/km', 'curvature', 1e-6),
  'per-in': unit('per-in', '1/in', 'curvature', 1 / inch),

  'N/mm': unit('N/mm', 'N/mm', 'lineLoad', 1),
  'kN/m': unit('kN/m', 'kN/m', 'lineLoad', 1),
  'kip/ft': unit('kip/ft', 'kip/ft', 'lineLoad', NEWTONS_PER_KIP / foot),

  'kg/m3': unit('kg/m3', 'kg/m³', 'density', 1),
  // Unit weight γ = ρ·gn: 1 kN/m³ is the weight of 1000/gn kg/m³ under standard gravity.
  'kN/m3': unit('kN/m3', 'kN/m³', 'density', 1000 / STANDARD_GRAVITY),
  // 1 lbf/ft³ (unit weight) is the weight of 1 lb/ft³ (mass density) under standard gravity.
  pcf: unit('pcf', 'pcf', 'density', KILOGRAMS_PER_CUBIC_METRE_PER_PCF),

  rad: unit('rad', 'rad', 'angle', 1),
  mrad: unit('mrad', 'mrad', 'angle', 1e-3),

  one: unit('one', '', 'dimensionless', 1),
  percent: unit('percent', '%', 'dimensionless', 1e-2),
  permille: unit('permille', '‰', 'dimensionless', 1e-3),
  microstrain: unit('microstrain', 'µε', 'dimensionless', 1e-6),
};
