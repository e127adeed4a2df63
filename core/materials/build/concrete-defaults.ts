import type { CodeBasis, ConcreteSpec } from '../specs.ts';
import { ACI_CRUSHING_STRAIN, aciElasticModulus, aciModulusOfRupture } from '../code/aci318.ts';
import { en1992ElasticModulus, en1992MeanStrength, en1992MeanTensileStrength, en1992PeakStrain, en1992UltimateStrainNonlinear } from '../code/en1992.ts';

/**
 * The numbers a concrete law is built from once the code basis has filled in what the spec leaves
 * undefined (MPa, strains dimensionless):
 *  - ACI 318-19: peak strength f′c; Ec = 4700 √f′c (Eq. 19.2.2.1.b); tensile strength fr = 0.62 λ √f′c
 *    (Eq. 19.2.3.1); crushing strain 0.003 (22.2.2.1).
 *  - EN 1992-1-1: the nonlinear models use fcm = fck + 8 and Ecm (Table 3.1); tensile strength fctm
 *    (Table 3.1; the flexural fctm,fl of Eq. 3.23 depends on the member depth and is for the caller to
 *    pass as an override); crushing strain εcu1 (Table 3.1).
 * `strainsFck` is the fck that Table 3.1 strain constants are read at (the spec's strength under both bases).
 */
export interface ResolvedConcrete {
  readonly code: CodeBasis;
  /** Strength the nonlinear laws peak at: f′c (ACI) or fcm (EN), MPa. */
  readonly modelStrength: number;
  readonly elasticModulus: number;
  readonly tensileStrength: number;
  /** The code's crushing strain for models without one of their own (ACI 0.003, EN εcu1). */
  readonly codeCrushingStrain: number;
  readonly strainsFck: number;
  /** Strain at peak of the code basis for models that need one: EN εc1; undefined under ACI (model default). */
  readonly codePeakStrain: number | undefined;
}

/**
 * Fills the code-basis defaults into a concrete spec. Assumes the spec's numbers were validated.
 * @see ACI 318-19 19.2.2.1, 19.2.3.1, 22.2.2.1; EN 1992-1-1 Table 3.1
 */
export function resolveConcrete(spec: ConcreteSpec, code: CodeBasis): ResolvedConcrete {
  const fc = spec.strength;
  if (code === 'EN 1992-1-1') {
    return {
      code,
      modelStrength: en1992MeanStrength(fc),
      elasticModulus: spec.elasticModulus ?? en1992ElasticModulus(fc),
      tensileStrength: spec.tensileStrength ?? en1992MeanTensileStrength(fc),
      codeCrushingStrain: en1992UltimateStrainNonlinear(fc),
      strainsFck: fc,
      codePeakStrain: en1992PeakStrain(fc),
    };
  }
  return {
    code,
    modelStrength: fc,
    elasticModulus: spec.elasticModulus ?? aciElasticModulus(fc),
    tensileStrength: spec.tensileStrength ?? aciModulusOfRupture(fc, spec.lightweightFactor ?? 1),
    codeCrushingStrain: ACI_CRUSHING_STRAIN,
    strainsFck: fc,
    codePeakStrain: undefined,
  };
}
