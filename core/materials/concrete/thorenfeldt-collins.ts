import { throwIfErrors, type Diagnostic } from '../../diagnostics.ts';
import type { CompressionLaw } from '../types.ts';
import { checkField, fieldPath, reportInconsistent, show } from '../checks.ts';
import { compressionLaw } from './compression-law.ts';
import { positivePower } from './power.ts';

/** Citation for the report's reference list. */
export const THORENFELDT_REFERENCE =
  'Thorenfeldt, E., Tomaszewicz, A. & Jensen, J. J. (1987). Mechanical properties of high-strength concrete and application in design. Proc. Symposium on Utilization of High Strength Concrete, Stavanger, 149–159.';
/** Citation for the report's reference list. */
export const COLLINS_MITCHELL_REFERENCE = 'Collins, M. P. & Mitchell, D. (1991). Prestressed Concrete Structures. Prentice Hall, Englewood Cliffs.';

/** Inputs of thorenfeldtCollinsCompression (MPa, strains dimensionless). */
export interface ThorenfeldtCollinsParameters {
  /** Peak stress f′c, MPa, 10–120 in the fits this model comes from. */
  readonly compressiveStrength: number;
  /** Initial tangent modulus Ec, MPa. */
  readonly elasticModulus: number;
  /** Crushing strain εcu (end of the curve), ≥ εc. */
  readonly crushingStrain: number;
}

/** Shape constants: n = 0.8 + f′c/17, k beyond the peak = max(1, 0.67 + f′c/62), εc = (f′c/Ec)·n/(n − 1). */
export interface ThorenfeldtCollinsConstants {
  readonly n: number;
  readonly kDescending: number;
  readonly peakStrain: number;
}

/**
 * n = 0.8 + f′c/17 and k = 0.67 + f′c/62 (MPa) as given by Collins & Mitchell (1991) — from memory.
 * k is kept ≥ 1 (from memory: the fit is stated for k ≥ 1, so low strengths fall no slower than the
 * k = 1 curve). εc = (f′c/Ec)·n/(n − 1) makes the initial tangent equal Ec — from memory.
 */
export function thorenfeldtCollinsConstants(fc: number, elasticModulus: number): ThorenfeldtCollinsConstants {
  const n = 0.8 + fc / 17;
  return { n, kDescending: Math.max(1, 0.67 + fc / 62), peakStrain: ((fc / elasticModulus) * n) / (n - 1) };
}

/** Checks the parameters (f′c > 3.4 MPa so that n > 1, εcu ≥ εc); paths are `path.<parameter name>`. */
export function validateThorenfeldtCollinsParameters(p: ThorenfeldtCollinsParameters, path = ''): Diagnostic[] {
  const out: Diagnostic[] = [];
  const ok = [
    checkField(out, fieldPath(path, 'compressiveStrength'), 'Thorenfeldt–Collins: compressive strength (n = 0.8 + f′c/17 must exceed 1)', p.compressiveStrength, { min: 3.4, exclusiveMin: true, quantity: 'concreteStress' }),
    checkField(out, fieldPath(path, 'elasticModulus'), 'Thorenfeldt–Collins: elastic modulus Ec', p.elasticModulus, { min: 0, exclusiveMin: true, quantity: 'modulus' }),
    checkField(out, fieldPath(path, 'crushingStrain'), 'Thorenfeldt–Collins: crushing strain εcu', p.crushingStrain, { min: 0, exclusiveMin: true, max: 0.02 }),
  ].every(Boolean);
  if (!ok) return out;
  const { peakStrain } = thorenfeldtCollinsConstants(p.compressiveStrength, p.elasticModulus);
  if (p.crushingStrain < peakStrain) {
    reportInconsistent(out, fieldPath(path, 'crushingStrain'),
      `Thorenfeldt–Collins: the crushing strain εcu = ${show(p.crushingStrain)} must not be below the strain at peak εc = (f′c/Ec)·n/(n − 1) = ${show(peakStrain)}`);
  }
  return out;
}

/**
 * Thorenfeldt et al. (1987) curve as used by Collins & Mitchell (1991), compressive magnitudes (MPa):
 *   σ = f′c · n (ε/εc) / (n − 1 + (ε/εc)^(n k)),  k = 1 for ε ≤ εc, k = 0.67 + f′c/62 (≥ 1) beyond,
 *   n = 0.8 + f′c/17, εc = (f′c/Ec)·n/(n − 1);  σ = 0 beyond εcu.
 * Peak f′c at εc (continuous there: both branches give f′c); initial tangent Ec.
 * @see Collins & Mitchell (1991), Ch. 3 (chapter from memory); Thorenfeldt et al. (1987)
 */
export function thorenfeldtCollinsCompression(p: ThorenfeldtCollinsParameters): CompressionLaw {
  throwIfErrors(validateThorenfeldtCollinsParameters(p));
  const { n, kDescending, peakStrain } = thorenfeldtCollinsConstants(p.compressiveStrength, p.elasticModulus);
  return compressionLaw({
    model: 'thorenfeldt-collins',
    label: 'Thorenfeldt et al. (1987) with Collins & Mitchell (1991) constants',
    references: [THORENFELDT_REFERENCE, COLLINS_MITCHELL_REFERENCE],
    curve: (strain) => {
      const x = strain / peakStrain;
      const k = x <= 1 ? 1 : kDescending;
      return (p.compressiveStrength * n * x) / (n - 1 + positivePower(x, n * k));
    },
    endStrain: p.crushingStrain,
    breakpoints: [peakStrain, p.crushingStrain],
    initialModulus: (p.compressiveStrength * n) / (peakStrain * (n - 1)),
    peakStress: p.compressiveStrength,
    peakStrain,
    crushingStrain: p.crushingStrain,
    confined: false,
  });
}
