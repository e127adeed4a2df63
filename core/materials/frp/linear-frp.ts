import { BugError, throwIfErrors, type Diagnostic } from '../../diagnostics.ts';
import type { FrpMaterial } from '../types.ts';
import { assertStrainIsNumber, checkField, fieldPath } from '../checks.ts';

/** Citation for the report's reference list. */
export const ACI_440_REFERENCE =
  'ACI 440.2R-17 Guide for the Design and Construction of Externally Bonded FRP Systems for Strengthening Concrete Structures. American Concrete Institute, 2017.';

/** Inputs of linearFrp (MPa, strains dimensionless). */
export interface LinearFrpParameters {
  /** Ef, MPa, > 0. */
  readonly tensileModulus: number;
  /** Manufacturer's rupture strain ε*fu, positive. */
  readonly ruptureStrain: number;
  /** Environmental reduction factor CE, 0 < CE ≤ 1 (ACI 440.2R-17 Table 9.4). */
  readonly environmentalFactor: number;
}

/**
 * Design rupture strain εfu = CE ε*fu (dimensionless).
 * @see ACI 440.2R-17 9.4, Eq. (9.4b) (ffu = CE f*fu is Eq. 9.4a) — equation letters from memory
 */
export function frpDesignRuptureStrain(p: LinearFrpParameters): number {
  return p.environmentalFactor * p.ruptureStrain;
}

/** Checks Ef (10–700 GPa), ε*fu (0.002–0.05) and CE (0 < CE ≤ 1); paths are `path.<parameter name>`. */
export function validateLinearFrpParameters(p: LinearFrpParameters, path = ''): Diagnostic[] {
  const out: Diagnostic[] = [];
  checkField(out, fieldPath(path, 'tensileModulus'), 'FRP tensile modulus Ef', p.tensileModulus, { min: 10_000, max: 700_000, quantity: 'modulus' });
  checkField(out, fieldPath(path, 'ruptureStrain'), 'FRP rupture strain ε*fu', p.ruptureStrain, { min: 0.002, max: 0.05 });
  checkField(out, fieldPath(path, 'environmentalFactor'), 'environmental reduction factor CE', p.environmentalFactor, { min: 0, exclusiveMin: true, max: 1 });
  return out;
}

/**
 * Externally bonded FRP laminate, compression positive (MPa):
 *   −εfu ≤ ε < 0: σ = Ef ε (tension, negative);  ε < −εfu: 0 (ruptured);  ε ≥ 0: 0 (FRP carries no compression).
 * εfu = CE ε*fu. Debonding (ACI 440.2R-17 Eq. 10.1.1) is not part of the material law.
 * initialModulus is the tensile modulus Ef (the laminate is in tension when it works).
 * @see ACI 440.2R-17 9.4 (design material properties) and 10.2 (FRP linear elastic to failure)
 */
export function linearFrp(p: LinearFrpParameters): FrpMaterial {
  throwIfErrors(validateLinearFrpParameters(p));
  const ruptureStrain = frpDesignRuptureStrain(p);
  const model = 'linear-frp';
  return {
    model,
    label: 'FRP, linear elastic in tension to the design rupture strain (ACI 440.2R-17)',
    references: [ACI_440_REFERENCE],
    ruptureStrain,
    tensileModulus: p.tensileModulus,
    initialModulus: p.tensileModulus,
    breakpoints: [-ruptureStrain, 0],
    stress(strain: number): number {
      if (strain !== strain) assertStrainIsNumber(strain, model); // inline NaN test: this is the hot path
      if (strain >= 0 || strain < -ruptureStrain) return 0;
      const stress = p.tensileModulus * strain;
      if (!Number.isFinite(stress)) throw new BugError(`${model}: stress at strain ${strain} is not finite`);
      return stress;
    },
  };
}
