import { throwIfErrors, type Diagnostic } from '../../diagnostics.ts';
import type { CompressionLaw } from '../types.ts';
import { checkField, fieldPath, reportInconsistent, show } from '../checks.ts';
import { en1992ParabolaExponent, en1992ParabolaPeakStrain, en1992ParabolaUltimateStrain } from '../code/en1992.ts';
import { compressionLaw } from './compression-law.ts';
import { positivePower } from './power.ts';
import { EN1992_REFERENCE } from './en1992-nonlinear.ts';

/** Inputs of en1992ParabolaRectangleCompression (MPa, strains dimensionless). */
export interface En1992ParabolaRectangleParameters {
  /**
   * Plateau stress, MPa: the design strength fcd = αcc fck/γc, or fck itself. The section analysis of
   * this program passes fck (or f′c): characteristic strength, no γc and no αcc, unless the caller
   * divides before calling.
   */
  readonly strength: number;
  /** fck for the Table 3.1 shape constants n, εc2, εcu2, MPa, up to 90 (the table starts at 12; below, the fck < 50 constants apply); default `strength`. */
  readonly characteristicStrength?: number;
  /** Override of εcu2 (end of the plateau). */
  readonly crushingStrain?: number;
}

/** Table 3.1 shape constants: exponent n, εc2, εcu2 (dimensionless). */
export interface En1992ParabolaRectangleConstants {
  readonly n: number;
  readonly epsC2: number;
  readonly epsCu2: number;
}

/**
 * n, εc2, εcu2 from Table 3.1 (εcu2 overridable). Near fck = 90 MPa the Table 3.1 expressions give
 * εc2 slightly above εcu2 (at C90/105: 2.6005 ‰ against 2.6000 ‰; the table prints 2.6 for both), so
 * the table's εc2 is limited to its εcu2.
 */
export function en1992ParabolaRectangleConstants(p: En1992ParabolaRectangleParameters): En1992ParabolaRectangleConstants {
  const fck = p.characteristicStrength ?? p.strength;
  const tableUltimate = en1992ParabolaUltimateStrain(fck);
  return {
    n: en1992ParabolaExponent(fck),
    epsC2: Math.min(en1992ParabolaPeakStrain(fck), tableUltimate),
    epsCu2: p.crushingStrain ?? tableUltimate,
  };
}

/** Checks the parameters (fck up to 90 MPa, εcu2 ≥ εc2); paths are `path.<parameter name>`. */
export function validateEn1992ParabolaRectangleParameters(p: En1992ParabolaRectangleParameters, path = ''): Diagnostic[] {
  const out: Diagnostic[] = [];
  let ok = checkField(out, fieldPath(path, 'strength'), 'EN 1992-1-1 parabola–rectangle: plateau stress', p.strength, { min: 0, exclusiveMin: true, quantity: 'concreteStress' });
  ok = checkField(out, fieldPath(path, 'characteristicStrength'), 'EN 1992-1-1 parabola–rectangle: fck for Table 3.1', p.characteristicStrength ?? p.strength, { min: 0, exclusiveMin: true, max: 90, quantity: 'concreteStress' }) && ok;
  if (p.crushingStrain !== undefined) {
    ok = checkField(out, fieldPath(path, 'crushingStrain'), 'EN 1992-1-1 parabola–rectangle: ultimate strain εcu2', p.crushingStrain, { min: 0, exclusiveMin: true, max: 0.01 }) && ok;
  }
  if (!ok) return out;
  const c = en1992ParabolaRectangleConstants(p);
  if (c.epsCu2 < c.epsC2) {
    reportInconsistent(out, fieldPath(path, 'crushingStrain'), `EN 1992-1-1 parabola–rectangle: εcu2 = ${show(c.epsCu2)} must not be below εc2 = ${show(c.epsC2)}`);
  }
  return out;
}

/**
 * EN 1992-1-1 3.1.7 parabola–rectangle diagram, compressive magnitudes (MPa):
 *   0 ≤ εc ≤ εc2:   σc = f [1 − (1 − εc/εc2)^n]   (Eq. 3.17)
 *   εc2 < εc ≤ εcu2: σc = f                        (Eq. 3.18)
 *   εc > εcu2:      σ = 0 (end of the diagram)
 * with n, εc2, εcu2 from Table 3.1 and f = the `strength` passed (fcd, or fck when no partial factor is
 * wanted). Initial tangent n·f/εc2.
 * @see EN 1992-1-1 3.1.7(1), Eqs. (3.17)–(3.18), Figure 3.3, Table 3.1
 */
export function en1992ParabolaRectangleCompression(p: En1992ParabolaRectangleParameters): CompressionLaw {
  throwIfErrors(validateEn1992ParabolaRectangleParameters(p));
  const { n, epsC2, epsCu2 } = en1992ParabolaRectangleConstants(p);
  return compressionLaw({
    model: 'en1992-parabola-rectangle',
    label: 'EN 1992-1-1 Eqs. (3.17)–(3.18), parabola–rectangle',
    references: [EN1992_REFERENCE],
    curve: (strain) => (strain <= epsC2 ? p.strength * (1 - positivePower(1 - strain / epsC2, n)) : p.strength),
    endStrain: epsCu2,
    breakpoints: [epsC2, epsCu2],
    initialModulus: (n * p.strength) / epsC2,
    peakStress: p.strength,
    peakStrain: epsC2,
    crushingStrain: epsCu2,
    confined: false,
  });
}
