/**
 * Quantities inside sentences. Results carry sentences for people (the governing mode, notes,
 * warnings); the numbers in them are formatted here in the project's display system, so a US
 * project reads kip and ft and an SI project kN and m. The numeric result fields stay internal SI.
 */
import { formatQuantity } from './format.ts';
import { displaySystem, type UnitSystem } from './quantities.ts';

export interface QuantityText {
  readonly system: UnitSystem;
  /** Force, from N. */
  force(newtons: number): string;
  /** Moment, from N·mm. */
  moment(newtonMillimetres: number): string;
  /** Position or length along a span, from mm. */
  span(millimetres: number): string;
  /** Section dimension, from mm. */
  section(millimetres: number): string;
  /** Steel or concrete stress, from MPa. */
  stress(megapascals: number): string;
  /** Second moment of area, from mm⁴. */
  secondMoment(millimetres4: number): string;
}

/** A sentence formatter for 'SI' / 'US' (or the project file's 'si' / 'us'). */
export function quantityText(system: UnitSystem | 'si' | 'us'): QuantityText {
  const s = displaySystem(system);
  return {
    system: s,
    force: (v) => formatQuantity('force', v, s),
    moment: (v) => formatQuantity('moment', v, s),
    span: (v) => formatQuantity('spanLength', v, s),
    section: (v) => formatQuantity('sectionLength', v, s),
    stress: (v) => formatQuantity('stress', v, s),
    secondMoment: (v) => formatQuantity('secondMoment', v, s),
  };
}

/** The SI formatter, for callers without a project (tests, defaults). */
export const SI_TEXT: QuantityText = quantityText('SI');
