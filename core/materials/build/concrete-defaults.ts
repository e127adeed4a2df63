import { DEFAULT_ULTIMATE_STRAIN_CHOICE, type CodeBasis, type ConcreteCompressionModel, type ConcreteSpec, type UltimateStrainChoice } from '../specs.ts';
import type { UltimateStrainSource } from '../types.ts';
import { ACI_CRUSHING_STRAIN, aciElasticModulus, aciModulusOfRupture } from '../code/aci318.ts';
import { en1992ElasticModulus, en1992MeanStrength, en1992MeanTensileStrength, en1992ParabolaUltimateStrain, en1992PeakStrain, en1992UltimateStrainNonlinear } from '../code/en1992.ts';
import { HOGNESTAD_ULTIMATE_STRAIN } from '../concrete/hognestad.ts';
import { UNCONFINED_ULTIMATE_STRAIN } from '../concrete/mander-confinement.ts';
import { vecchioCollinsCrackingStress } from '../concrete/tension.ts';

/**
 * The numbers a concrete law is built from once the code basis has filled in what the spec leaves
 * undefined (MPa, strains dimensionless):
 *  - ACI 318-19: peak strength f′c; Ec = 4700 √f′c (Eq. 19.2.2.1.b); tensile strength fr = 0.62 λ √f′c
 *    (Eq. 19.2.3.1) for the brittle law and the code deflection method, fcr = 0.33 λ √f′c for tension
 *    stiffening (the strength it was calibrated on, Vecchio & Collins 1986); crushing strain 0.003 (22.2.2.1).
 *  - EN 1992-1-1: the nonlinear models use fcm = fck + 8 and Ecm (Table 3.1); tensile strength fctm
 *    (Table 3.1; the flexural fctm,fl of Eq. 3.23 depends on the member depth and is for the caller to
 *    pass as an override); crushing strain εcu1 (Table 3.1).
 * `strainsFck` is the fck that Table 3.1 strain constants are read at (the spec's strength under both bases).
 * A measured mean strength (`meanStrength`, as-found cores) replaces f′c (ACI) or fcm (EN) in every
 * number of behaviour here — the laws' peak, Ec, the tensile strengths, the EN strain constants (read
 * at fcm − 8) — so the code checks alone see the characteristic `strength` (issue 11 item 3).
 */
export interface ResolvedConcrete {
  readonly code: CodeBasis;
  /** Strength the nonlinear laws peak at: f′c (ACI) or fcm (EN), MPa. */
  readonly modelStrength: number;
  readonly elasticModulus: number;
  /** Tensile strength of the spec's tension law: the value it was calibrated on, or the override (MPa). */
  readonly tensileStrength: number;
  /** Tensile strength of the code deflection method (ACI fr, EN fctm), or the override (MPa). */
  readonly codeTensileStrength: number;
  /** The code's crushing strain for models without one of their own (ACI 0.003, EN εcu1). */
  readonly codeCrushingStrain: number;
  readonly strainsFck: number;
  /** Strain at peak of the code basis for models that need one: EN εc1; undefined under ACI (model default). */
  readonly codePeakStrain: number | undefined;
  /** The ultimate strain of the unconfined law and where it comes from (see ULTIMATE_STRAIN_CHOICES). */
  readonly ultimateStrain: UltimateStrainSource;
  /** True when `law` was asked for and the law publishes no ultimate strain (the code value is used). */
  readonly lawHasNoUltimateStrain: boolean;
}

/** The code basis's εcu for a compression model (dimensionless) and its clause. */
function codeUltimateStrain(model: ConcreteCompressionModel, code: CodeBasis, fck: number): UltimateStrainSource {
  if (code === 'ACI 318-19') return { value: ACI_CRUSHING_STRAIN, basis: 'code', source: 'ACI 318-19 22.2.2.1' };
  if (model === 'en1992-parabola-rectangle') return { value: en1992ParabolaUltimateStrain(fck), basis: 'code', source: 'EN 1992-1-1 Table 3.1 εcu2' };
  return { value: en1992UltimateStrainNonlinear(fck), basis: 'code', source: 'EN 1992-1-1 Table 3.1 εcu1' };
}

/**
 * The ultimate strain published with a law for unconfined concrete, or undefined when the law has none.
 *  - Hognestad (1951): 0.0038, the end of the linear descent.
 *  - Modified Kent–Park (Scott, Park & Priestley 1982): εcu = 0.004 + 0.9 ρs fyh/300, 0.004 without hoops.
 *  - Mander et al. (1988): the unconfined curve is measured to 2εco and assumed straight beyond; the
 *    ultimate strain of Priestley, Seible & Calvi (1996) εcu = 0.004 + 1.4 ρs fyh εsu/f′cc gives 0.004
 *    without hoops (from memory).
 *  - EN 1992-1-1 Eq. (3.14): εcu1; parabola–rectangle: εcu2 (Table 3.1).
 *  - Popovics (1973) and Thorenfeldt et al. (1987): curves without an end strain.
 */
export function lawUltimateStrain(model: ConcreteCompressionModel, fck: number): UltimateStrainSource | undefined {
  switch (model) {
    case 'hognestad': return { value: HOGNESTAD_ULTIMATE_STRAIN, basis: 'law', source: 'Hognestad (1951)' };
    case 'modified-kent-park': return { value: UNCONFINED_ULTIMATE_STRAIN, basis: 'law', source: 'Scott, Park & Priestley (1982), without hoops' };
    case 'mander': return { value: UNCONFINED_ULTIMATE_STRAIN, basis: 'law', source: 'Mander et al. (1988) with Priestley, Seible & Calvi (1996), without hoops' };
    case 'en1992-nonlinear': return { value: en1992UltimateStrainNonlinear(fck), basis: 'law', source: 'EN 1992-1-1 Table 3.1 εcu1' };
    case 'en1992-parabola-rectangle': return { value: en1992ParabolaUltimateStrain(fck), basis: 'law', source: 'EN 1992-1-1 Table 3.1 εcu2' };
    case 'popovics':
    case 'thorenfeldt-collins':
      return undefined;
  }
}

/** How an ultimate strain was chosen, in words: `code value, ACI 318-19 22.2.2.1`. */
export function ultimateStrainWords(u: UltimateStrainSource): string {
  switch (u.basis) {
    case 'code': return `code value, ${u.source}`;
    case 'law': return `value of the law, ${u.source}`;
    case 'user': return 'entered by the engineer';
    case 'confinement': return u.source;
  }
}

/**
 * Fills the code-basis defaults into a concrete spec. Assumes the spec's numbers were validated.
 * @param defaultChoice where εcu comes from when the spec says nothing (the project's setting)
 * @see ACI 318-19 19.2.2.1, 19.2.3.1, 22.2.2.1; EN 1992-1-1 Table 3.1
 */
export function resolveConcrete(spec: ConcreteSpec, code: CodeBasis, defaultChoice: UltimateStrainChoice = DEFAULT_ULTIMATE_STRAIN_CHOICE): ResolvedConcrete {
  const fc = spec.strength;
  const choice = spec.ultimateStrain ?? defaultChoice;
  const codeValue = codeUltimateStrain(spec.compressionModel, code, fc);
  const lawValue = lawUltimateStrain(spec.compressionModel, fc);
  const ultimateStrain: UltimateStrainSource = spec.crushingStrain !== undefined
    ? { value: spec.crushingStrain, basis: 'user', source: 'entered by the engineer' }
    : choice === 'law' && lawValue ? lawValue : codeValue;
  const lawHasNoUltimateStrain = spec.crushingStrain === undefined && choice === 'law' && lawValue === undefined;
  if (code === 'EN 1992-1-1') {
    // With a measured mean fcm the Table 3.1 relations are read at fck = fcm − 8 (never fcm below the mean).
    const fcm = spec.meanStrength ?? en1992MeanStrength(fc);
    const fk = spec.meanStrength !== undefined ? fcm - 8 : fc;
    return {
      code,
      modelStrength: fcm,
      elasticModulus: spec.elasticModulus ?? en1992ElasticModulus(fk),
      tensileStrength: spec.tensileStrength ?? en1992MeanTensileStrength(fk),
      codeTensileStrength: spec.tensileStrength ?? en1992MeanTensileStrength(fk),
      codeCrushingStrain: en1992UltimateStrainNonlinear(fk),
      strainsFck: fk,
      codePeakStrain: en1992PeakStrain(fk),
      ultimateStrain,
      lawHasNoUltimateStrain,
    };
  }
  const fm = spec.meanStrength ?? fc;
  return {
    code,
    modelStrength: fm,
    elasticModulus: spec.elasticModulus ?? aciElasticModulus(fm),
    // Each law is fed the strength it was calibrated on: the brittle law reproduces the code's cracking
    // moment with fr; tension stiffening expects the direct cracking stress (tension.ts).
    tensileStrength: spec.tensileStrength ?? (spec.tensionModel === 'tension-stiffening'
      ? vecchioCollinsCrackingStress(fm, spec.lightweightFactor ?? 1)
      : aciModulusOfRupture(fm, spec.lightweightFactor ?? 1)),
    codeTensileStrength: spec.tensileStrength ?? aciModulusOfRupture(fm, spec.lightweightFactor ?? 1),
    codeCrushingStrain: ACI_CRUSHING_STRAIN,
    strainsFck: fc,
    codePeakStrain: undefined,
    ultimateStrain,
    lawHasNoUltimateStrain,
  };
}
