/**
 * Number formatting for the report: every number is printed with its unit, in the project's unit
 * system, through core/units. A value that is missing or not finite prints `—` (never NaN or
 * Infinity). Inputs are internal units (N, mm, MPa, N·mm, 1/mm, N/mm, mm⁴, rad, strain).
 */
import { toDisplay } from '../units/convert.ts';
import { formatFixed, formatNumber, formatQuantity, formatStrain, NOT_A_VALUE } from '../units/format.ts';
import { displaySystem, type Quantity, type UnitSystem } from '../units/quantities.ts';
import { say, type Text } from '../units/phrase.ts';

export { displaySystem };

type Maybe = number | null | undefined;

/** Display magnitudes below this print as 0 (far below any rounding of a printed value). */
const ZERO_BELOW = 1e-10;

const ok = (v: Maybe): v is number => typeof v === 'number' && Number.isFinite(v);

export interface ReportFormatter {
  readonly system: UnitSystem;
  /** A sentence of the results (words and quantities as data) in the report's units. */
  say(text: Text): string;
  /** Any quantity, engineering significant figures (3, or 4 with a leading 1). */
  quantity(quantity: Quantity, value: Maybe): string;
  /** Section dimensions, covers, depths, bar sizes: mm (whole millimetres without decimals) / in. */
  length(value: Maybe): string;
  /** Spans and positions along the span: m / ft, two decimals. */
  span(value: Maybe): string;
  /** Deflections: mm with one decimal / in with two decimals. */
  deflection(value: Maybe): string;
  force(value: Maybe): string;
  moment(value: Maybe): string;
  /** Steel and general stress: MPa / ksi. */
  stress(value: Maybe): string;
  /** Concrete stress: MPa / psi. */
  concreteStress(value: Maybe): string;
  modulus(value: Maybe): string;
  curvature(value: Maybe): string;
  area(value: Maybe): string;
  secondMoment(value: Maybe): string;
  rigidity(value: Maybe): string;
  lineLoad(value: Maybe): string;
  density(value: Maybe): string;
  /** Rotations in mrad. */
  rotation(value: Maybe): string;
  /** Strains per mille, compression positive. */
  strain(value: Maybe): string;
  /** A pure number to engineering significant figures (ductility, ratios). */
  number(value: Maybe): string;
  /** A pure number with fixed decimals (utilisation: 2). */
  fixed(value: Maybe, decimals: number): string;
  /** Load factor λ, two decimals. */
  loadFactor(value: Maybe): string;
}

/** A formatter for the project's unit system. */
export function reportFormatter(system: UnitSystem | 'si' | 'us'): ReportFormatter {
  const s = displaySystem(system);
  // Numerical noise (e.g. 6e-8 N·mm where the moment is zero) prints as 0.
  const q = (quantity: Quantity, value: Maybe, options: Parameters<typeof formatQuantity>[3] = {}) => {
    if (!ok(value)) return NOT_A_VALUE;
    const shown = toDisplay(quantity, value, s, options.unit);
    return formatQuantity(quantity, Math.abs(shown) < ZERO_BELOW ? 0 : value, s, options);
  };
  // Section dimensions in mm are whole numbers as a rule: print them without decimals.
  const length = (v: Maybe) => (ok(v) && s === 'SI' && Math.abs(v - Math.round(v)) < 1e-6 ? q('sectionLength', v, { decimals: 0 }) : q('sectionLength', v));
  return {
    system: s,
    say: (text) => say(text, s),
    quantity: (quantity, value) => q(quantity, value),
    length,
    span: (v) => q('spanLength', v, { decimals: 2 }),
    deflection: (v) => q('deflection', v, { decimals: s === 'SI' ? 1 : 2 }),
    force: (v) => q('force', v),
    moment: (v) => q('moment', v),
    stress: (v) => q('stress', v),
    concreteStress: (v) => q('concreteStress', v),
    modulus: (v) => q('modulus', v, { thousandsSeparator: ',' }),
    curvature: (v) => q('curvature', v),
    area: (v) => q('area', v),
    secondMoment: (v) => q('secondMoment', v, { thousandsSeparator: ',' }),
    rigidity: (v) => q('flexuralRigidity', v, { thousandsSeparator: ',' }),
    lineLoad: (v) => q('lineLoad', v),
    density: (v) => q('density', v),
    rotation: (v) => q('rotation', v, { unit: 'mrad' }),
    strain: (v) => (ok(v) ? formatStrain(v, 'permille') : NOT_A_VALUE),
    number: (v) => (ok(v) ? formatNumber(v) : NOT_A_VALUE),
    fixed: (v, decimals) => (ok(v) ? formatFixed(v, decimals) : NOT_A_VALUE),
    loadFactor: (v) => (ok(v) ? formatFixed(v, 2) : NOT_A_VALUE),
  };
}
