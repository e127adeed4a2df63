import { throwIfErrors, type Diagnostic } from '../../diagnostics.ts';
import type { CompressionLaw } from '../types.ts';
import { checkField, fieldPath, reportInconsistent, show } from '../checks.ts';
import { compressionLaw } from './compression-law.ts';

/** Citation for the report's reference list. */
export const HOGNESTAD_REFERENCE =
  'Hognestad, E. (1951). A study of combined bending and axial load in reinforced concrete members. University of Illinois Engineering Experiment Station, Bulletin 399.';

/** Default peak factor k in f″c = k·f′c (member strength relative to cylinder strength). */
export const HOGNESTAD_DEFAULT_PEAK_FACTOR = 0.85;
/** Strain at the end of Hognestad's linear descending branch, where σ = 0.85 f″c. */
export const HOGNESTAD_ULTIMATE_STRAIN = 0.0038;

/** Inputs of hognestadCompression (MPa, strains dimensionless). */
export interface HognestadParameters {
  /** Cylinder strength f′c (or fcm), MPa, > 0. */
  readonly compressiveStrength: number;
  /** Initial tangent modulus Ec, MPa, > 0. */
  readonly elasticModulus: number;
  /** k in f″c = k f′c, 0 < k ≤ 1; default 0.85. */
  readonly peakFactor?: number;
  /**
   * εcu, where the curve ends (the fibre is crushed); default 0.0038, Hognestad's own. Must exceed ε0.
   * The descent keeps its published slope (0.15 f″c between ε0 and 0.0038) whatever εcu is: a smaller
   * εcu cuts the curve short, a larger one follows the same line further (never below zero stress).
   */
  readonly crushingStrain?: number;
}

/** Resolved constants of the curve: f″c (MPa), ε0 = 2f″c/Ec, εcu. */
export function hognestadConstants(parameters: HognestadParameters): { peakStress: number; peakStrain: number; crushingStrain: number } {
  const peakStress = (parameters.peakFactor ?? HOGNESTAD_DEFAULT_PEAK_FACTOR) * parameters.compressiveStrength;
  return {
    peakStress,
    peakStrain: (2 * peakStress) / parameters.elasticModulus,
    crushingStrain: parameters.crushingStrain ?? HOGNESTAD_ULTIMATE_STRAIN,
  };
}

/** Checks the parameters; paths are `path.<parameter name>`. */
export function validateHognestadParameters(parameters: HognestadParameters, path = ''): Diagnostic[] {
  const out: Diagnostic[] = [];
  const ok = [
    checkField(out, fieldPath(path, 'compressiveStrength'), 'Hognestad: compressive strength', parameters.compressiveStrength, { min: 0, exclusiveMin: true, quantity: 'concreteStress' }),
    checkField(out, fieldPath(path, 'elasticModulus'), 'Hognestad: elastic modulus Ec', parameters.elasticModulus, { min: 0, exclusiveMin: true, quantity: 'modulus' }),
    checkField(out, fieldPath(path, 'peakFactor'), 'Hognestad: peak factor k', parameters.peakFactor ?? HOGNESTAD_DEFAULT_PEAK_FACTOR, { min: 0, max: 1, exclusiveMin: true }),
    checkField(out, fieldPath(path, 'crushingStrain'), 'Hognestad: crushing strain εcu', parameters.crushingStrain ?? HOGNESTAD_ULTIMATE_STRAIN, { min: 0, max: 0.05, exclusiveMin: true }),
  ].every(Boolean);
  if (ok) {
    const c = hognestadConstants(parameters);
    if (c.peakStrain >= HOGNESTAD_ULTIMATE_STRAIN) {
      reportInconsistent(out, fieldPath(path, 'elasticModulus'),
        `Hognestad: the strain at peak ε0 = 2f″c/Ec = ${show(c.peakStrain)} must be less than ${HOGNESTAD_ULTIMATE_STRAIN}, the end of the published descent; raise Ec or choose a model meant for this strength`);
    } else if (c.crushingStrain <= c.peakStrain) {
      reportInconsistent(out, fieldPath(path, 'crushingStrain'),
        `Hognestad: the strain at peak ε0 = 2f″c/Ec = ${show(c.peakStrain)} must be less than the crushing strain εcu = ${show(c.crushingStrain)}; raise Ec or εcu, or choose a model meant for this strength`);
    }
  }
  return out;
}

/**
 * Hognestad (1951) curve for unconfined concrete, compressive magnitudes (strain ≥ 0, MPa):
 *   0 ≤ ε ≤ ε0:   σ = f″c [2ε/ε0 − (ε/ε0)²],          f″c = k f′c, ε0 = 2 f″c / Ec
 *   ε0 < ε ≤ εcu: σ = f″c [1 − 0.15 (ε − ε0)/(0.0038 − ε0)] ≥ 0  (linear to 0.85 f″c at 0.0038)
 *   ε > εcu:      σ = 0 (the curve ends; the fibre is crushed). εcu defaults to 0.0038.
 * Initial tangent = Ec; peak f″c at ε0. Throws InputError for invalid parameters.
 * @see Hognestad (1951), Bulletin 399, Fig. 8 (as reproduced in Park & Paulay 1975, Fig. 2.2) — figure number from memory
 */
export function hognestadCompression(parameters: HognestadParameters): CompressionLaw {
  throwIfErrors(validateHognestadParameters(parameters));
  const { peakStress, peakStrain, crushingStrain } = hognestadConstants(parameters);
  return compressionLaw({
    model: 'hognestad',
    label: 'Hognestad (1951) parabola with linear descent',
    references: [HOGNESTAD_REFERENCE],
    curve: (strain) => {
      if (strain <= peakStrain) {
        const x = strain / peakStrain;
        return peakStress * (2 * x - x * x);
      }
      return peakStress * (1 - (0.15 * (strain - peakStrain)) / (HOGNESTAD_ULTIMATE_STRAIN - peakStrain));
    },
    endStrain: crushingStrain,
    // The descent reaches zero stress at ε0 + (0.0038 − ε0)/0.15 (a kink when εcu lies beyond it).
    breakpoints: [peakStrain, crushingStrain, peakStrain + (HOGNESTAD_ULTIMATE_STRAIN - peakStrain) / 0.15],
    initialModulus: (2 * peakStress) / peakStrain,
    peakStress,
    peakStrain,
    crushingStrain,
    confined: false,
  });
}
