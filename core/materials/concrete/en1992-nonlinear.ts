import { throwIfErrors, type Diagnostic } from '../../diagnostics.ts';
import type { CompressionLaw } from '../types.ts';
import { checkField, fieldPath, reportInconsistent, show } from '../checks.ts';
import { compressionLaw } from './compression-law.ts';

/** Citation of EN 1992-1-1 for the report's reference list. */
export const EN1992_REFERENCE = 'EN 1992-1-1:2004 Eurocode 2: Design of concrete structures — Part 1-1: General rules and rules for buildings. CEN, Brussels.';

/** Inputs of en1992NonlinearCompression (MPa, strains dimensionless). */
export interface En1992NonlinearParameters {
  /** Mean strength fcm, MPa (the peak of the curve). */
  readonly meanStrength: number;
  /** Ecm, MPa (secant modulus of Table 3.1 or a measured value). */
  readonly elasticModulus: number;
  /** Strain at peak εc1 (dimensionless). */
  readonly peakStrain: number;
  /** Nominal ultimate strain εcu1 (end of the curve), ≥ εc1 (equal from about C80/95 in Table 3.1). */
  readonly crushingStrain: number;
}

/** k = 1.05 Ecm |εc1| / fcm. @see EN 1992-1-1 3.1.5(1), Eq. (3.14) */
export function en1992NonlinearK(p: Pick<En1992NonlinearParameters, 'meanStrength' | 'elasticModulus' | 'peakStrain'>): number {
  return (1.05 * p.elasticModulus * p.peakStrain) / p.meanStrength;
}

/** Checks the parameters, including that σ stays positive and finite up to εcu1; paths are `path.<parameter name>`. */
export function validateEn1992NonlinearParameters(p: En1992NonlinearParameters, path = ''): Diagnostic[] {
  const out: Diagnostic[] = [];
  const ok = [
    checkField(out, fieldPath(path, 'meanStrength'), 'EN 1992-1-1 Eq. (3.14): mean strength fcm', p.meanStrength, { min: 0, exclusiveMin: true, quantity: 'concreteStress' }),
    checkField(out, fieldPath(path, 'elasticModulus'), 'EN 1992-1-1 Eq. (3.14): elastic modulus Ecm', p.elasticModulus, { min: 0, exclusiveMin: true, quantity: 'modulus' }),
    checkField(out, fieldPath(path, 'peakStrain'), 'EN 1992-1-1 Eq. (3.14): strain at peak εc1', p.peakStrain, { min: 0.001, max: 0.005 }),
    checkField(out, fieldPath(path, 'crushingStrain'), 'EN 1992-1-1 Eq. (3.14): ultimate strain εcu1', p.crushingStrain, { min: 0, exclusiveMin: true, max: 0.01 }),
  ].every(Boolean);
  if (!ok) return out;
  const k = en1992NonlinearK(p);
  const etaU = p.crushingStrain / p.peakStrain;
  if (etaU < 1) {
    // Equality is legitimate: from about C80/95 Table 3.1 gives εcu1 = εc1 = 2.8 ‰ (no descending branch).
    reportInconsistent(out, fieldPath(path, 'crushingStrain'), `EN 1992-1-1 Eq. (3.14): εcu1 = ${show(p.crushingStrain)} must not be below εc1 = ${show(p.peakStrain)}`);
  } else if (k <= 1 || k < etaU || (k < 2 && 1 + (k - 2) * etaU <= 0)) {
    // σ stays positive and finite up to εcu1 only when kη − η² ≥ 0 and 1 + (k − 2)η > 0 for η ≤ εcu1/εc1.
    reportInconsistent(out, fieldPath(path, 'elasticModulus'),
      `EN 1992-1-1 Eq. (3.14): k = 1.05 Ecm εc1/fcm = ${show(k)} must exceed both 1 and εcu1/εc1 = ${show(etaU)} for the curve to stay positive up to εcu1; the elastic modulus is too low for this strength`);
  }
  return out;
}

/**
 * EN 1992-1-1 3.1.5 curve for nonlinear structural analysis, compressive magnitudes (MPa):
 *   σc/fcm = (kη − η²)/(1 + (k − 2)η),  η = εc/εc1,  k = 1.05 Ecm εc1/fcm,  for 0 ≤ εc ≤ εcu1;
 *   σ = 0 beyond εcu1 (the expression is defined only up to εcu1).
 * Peak fcm at εc1; initial tangent 1.05 Ecm. Table 3.1 values via code/en1992.ts.
 * @see EN 1992-1-1 3.1.5, Eq. (3.14) and Figure 3.2
 */
export function en1992NonlinearCompression(p: En1992NonlinearParameters): CompressionLaw {
  throwIfErrors(validateEn1992NonlinearParameters(p));
  const k = en1992NonlinearK(p);
  return compressionLaw({
    model: 'en1992-nonlinear',
    label: 'EN 1992-1-1 Eq. (3.14), nonlinear analysis curve',
    references: [EN1992_REFERENCE],
    curve: (strain) => {
      const eta = strain / p.peakStrain;
      return (p.meanStrength * (k * eta - eta * eta)) / (1 + (k - 2) * eta);
    },
    endStrain: p.crushingStrain,
    breakpoints: [p.crushingStrain],
    initialModulus: (k * p.meanStrength) / p.peakStrain,
    peakStress: p.meanStrength,
    peakStrain: p.peakStrain,
    crushingStrain: p.crushingStrain,
    confined: false,
  });
}
