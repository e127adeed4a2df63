import type { Dimension, UnitId } from './units.ts';

/** The two display systems. Internal values are always SI (N, mm, MPa, N·mm, rad/mm, kg/m³). */
export type UnitSystem = 'SI' | 'US';

/** Every display system, in the order a settings menu lists them. */
export const UNIT_SYSTEMS: readonly UnitSystem[] = ['SI', 'US'];

/**
 * The display system of a unit setting as the project file spells it ('si', 'us') or as core/units
 * does ('SI', 'US'): the one place the two spellings meet.
 */
export function displaySystem(system: UnitSystem | 'si' | 'us'): UnitSystem {
  return system === 'us' || system === 'US' ? 'US' : 'SI';
}

/** A kind of engineering value shown to the user; each has its own display unit per system. */
export type Quantity =
  | 'force'
  | 'sectionLength'
  | 'spanLength'
  | 'deflection'
  | 'area'
  | 'secondMoment'
  | 'stress'
  | 'concreteStress'
  | 'modulus'
  | 'moment'
  | 'flexuralRigidity'
  | 'curvature'
  | 'lineLoad'
  | 'strain'
  | 'rotation'
  | 'density'
  | 'ratio';

/** One row of the quantity table: its dimension, internal unit and display units per system. */
export interface QuantityDefinition {
  readonly quantity: Quantity;
  /** What the quantity is, in words (for tooltips and the report's notation list). */
  readonly description: string;
  readonly dimension: Dimension;
  /** Label of the internal unit, e.g. `N·mm`. */
  readonly internalUnit: string;
  /** Default display unit per system. */
  readonly SI: UnitId;
  readonly US: UnitId;
  /** Every unit the quantity may be shown in (the defaults included), for a per-field choice. */
  readonly units: readonly UnitId[];
}

function quantity(
  name: Quantity,
  description: string,
  dimension: Dimension,
  internalUnit: string,
  si: UnitId,
  us: UnitId,
  units: readonly UnitId[],
): QuantityDefinition {
  return { quantity: name, description, dimension, internalUnit, SI: si, US: us, units };
}

/**
 * The table of quantities. Trade usage decides the defaults: spans in m / ft, section dimensions in
 * mm / in, concrete strength in MPa / psi, steel stress in MPa / ksi, moments in kN·m / kip·ft.
 * // common practice, no source
 */
export const QUANTITIES: Readonly<Record<Quantity, QuantityDefinition>> = {
  force: quantity('force', 'force', 'force', 'N', 'kN', 'kip', ['N', 'kN', 'lbf', 'kip']),
  sectionLength: quantity('sectionLength', 'section dimension, cover, bar diameter, depth', 'length', 'mm', 'mm', 'in', ['mm', 'm', 'in', 'ft']),
  spanLength: quantity('spanLength', 'span and member length', 'length', 'mm', 'm', 'ft', ['mm', 'm', 'in', 'ft']),
  deflection: quantity('deflection', 'deflection', 'length', 'mm', 'mm', 'in', ['mm', 'in']),
  area: quantity('area', 'area (section, reinforcement)', 'area', 'mm²', 'mm2', 'in2', ['mm2', 'in2']),
  secondMoment: quantity('secondMoment', 'second moment of area', 'secondMoment', 'mm⁴', 'e6mm4', 'in4', ['mm4', 'e6mm4', 'in4']),
  stress: quantity('stress', 'stress (steel, FRP, general)', 'stress', 'MPa', 'MPa', 'ksi', ['MPa', 'GPa', 'psi', 'ksi']),
  concreteStress: quantity('concreteStress', 'concrete strength and stress, modulus of rupture', 'stress', 'MPa', 'MPa', 'psi', ['MPa', 'psi', 'ksi']),
  modulus: quantity('modulus', 'elastic modulus', 'stress', 'MPa', 'MPa', 'ksi', ['MPa', 'GPa', 'psi', 'ksi']),
  moment: quantity('moment', 'bending moment', 'moment', 'N·mm', 'kN.m', 'kip.ft', ['N.mm', 'kN.m', 'kip.ft', 'kip.in']),
  flexuralRigidity: quantity('flexuralRigidity', 'flexural rigidity EI', 'flexuralRigidity', 'N·mm²', 'kN.m2', 'kip.in2', ['kN.m2', 'kip.in2']),
  curvature: quantity('curvature', 'curvature', 'curvature', '1/mm', 'per-m', 'per-in', ['per-mm', 'per-m', 'rad-per-km', 'per-in']),
  lineLoad: quantity('lineLoad', 'distributed load per unit length', 'lineLoad', 'N/mm', 'kN/m', 'kip/ft', ['N/mm', 'kN/m', 'kip/ft']),
  strain: quantity('strain', 'strain', 'dimensionless', '1', 'one', 'one', ['one', 'percent', 'permille', 'microstrain']),
  rotation: quantity('rotation', 'rotation (plastic hinge, chord)', 'angle', 'rad', 'rad', 'rad', ['rad', 'mrad']),
  density: quantity('density', 'density or unit weight', 'density', 'kg/m³', 'kg/m3', 'pcf', ['kg/m3', 'kN/m3', 'pcf']),
  ratio: quantity('ratio', 'dimensionless ratio (reinforcement ratio, ductility)', 'dimensionless', '1', 'one', 'one', ['one', 'percent']),
};

/** Every quantity name, in table order. */
export const QUANTITY_NAMES: readonly Quantity[] = Object.keys(QUANTITIES) as Quantity[];
