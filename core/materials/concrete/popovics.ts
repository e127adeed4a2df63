import { throwIfErrors, type Diagnostic } from '../../diagnostics.ts';
import type { CompressionLaw } from '../types.ts';
import { checkField, fieldPath, reportInconsistent, show } from '../checks.ts';
import { compressionLaw } from './compression-law.ts';
import { positivePower } from './power.ts';

/** Citation for the report's reference list. */
export const POPOVICS_REFERENCE =
  'Popovics, S. (1973). A numerical approach to the complete stress–strain curve of concrete. Cement and Concrete Research 3(5), 583–599.';

/** Inputs of popovicsCompression (MPa, strains dimensionless). */
export interface PopovicsParameters {
  /** Peak stress f′c, MPa, > 0. */
  readonly compressiveStrength: number;
  /** Initial tangent modulus Ec, MPa; must exceed f′c/εc. */
  readonly elasticModulus: number;
  /** Strain at peak εc, > 0. */
  readonly peakStrain: number;
  /** Crushing strain εcu (end of the curve), ≥ εc (EN 1992-1-1 gives εcu1 = εc1 from about C80/95). */
  readonly crushingStrain: number;
}

/** Curve-fitting exponent n = Ec/(Ec − f′c/εc), which makes the initial tangent equal Ec. */
export function popovicsExponent(p: Pick<PopovicsParameters, 'compressiveStrength' | 'elasticModulus' | 'peakStrain'>): number {
  return p.elasticModulus / (p.elasticModulus - p.compressiveStrength / p.peakStrain);
}

/** Checks the parameters, including n > 1 (Ec above f′c/εc); paths are `path.<parameter name>`. */
export function validatePopovicsParameters(p: PopovicsParameters, path = ''): Diagnostic[] {
  const out: Diagnostic[] = [];
  const ok = [
    checkField(out, fieldPath(path, 'compressiveStrength'), 'Popovics: compressive strength', p.compressiveStrength, { min: 0, exclusiveMin: true, quantity: 'concreteStress' }),
    checkField(out, fieldPath(path, 'elasticModulus'), 'Popovics: elastic modulus Ec', p.elasticModulus, { min: 0, exclusiveMin: true, quantity: 'modulus' }),
    checkField(out, fieldPath(path, 'peakStrain'), 'Popovics: strain at peak εc', p.peakStrain, { min: 0.001, max: 0.005 }),
    checkField(out, fieldPath(path, 'crushingStrain'), 'Popovics: crushing strain εcu', p.crushingStrain, { min: 0, exclusiveMin: true, max: 0.02 }),
  ].every(Boolean);
  if (!ok) return out;
  const secant = p.compressiveStrength / p.peakStrain;
  if (p.elasticModulus <= secant) {
    reportInconsistent(out, fieldPath(path, 'elasticModulus'),
      `Popovics: the elastic modulus Ec = ${show(p.elasticModulus)} MPa must exceed the secant modulus at peak f′c/εc = ${show(secant)} MPa, otherwise n = Ec/(Ec − f′c/εc) is not above 1`);
  }
  if (p.crushingStrain < p.peakStrain) {
    reportInconsistent(out, fieldPath(path, 'crushingStrain'), `Popovics: the crushing strain εcu = ${show(p.crushingStrain)} must not be below the strain at peak εc = ${show(p.peakStrain)}`);
  }
  return out;
}

/**
 * Popovics (1973) curve, compressive magnitudes (strain ≥ 0, MPa):
 *   σ = f′c (ε/εc) n / (n − 1 + (ε/εc)^n),  n = Ec/(Ec − f′c/εc),  for ε ≤ εcu;  σ = 0 beyond εcu.
 * Peak f′c at εc; initial tangent Ec. Throws InputError for invalid parameters.
 * @see Popovics (1973), Cement and Concrete Research 3(5)
 */
export function popovicsCompression(p: PopovicsParameters): CompressionLaw {
  throwIfErrors(validatePopovicsParameters(p));
  const n = popovicsExponent(p);
  return compressionLaw({
    model: 'popovics',
    label: 'Popovics (1973)',
    references: [POPOVICS_REFERENCE],
    curve: (strain) => {
      const x = strain / p.peakStrain;
      return (p.compressiveStrength * x * n) / (n - 1 + positivePower(x, n));
    },
    endStrain: p.crushingStrain,
    breakpoints: [p.crushingStrain],
    initialModulus: p.elasticModulus,
    peakStress: p.compressiveStrength,
    peakStrain: p.peakStrain,
    crushingStrain: p.crushingStrain,
    confined: false,
  });
}
