import { BugError, throwIfErrors, type Diagnostic } from '../../diagnostics.ts';
import type { TensionLaw } from '../types.ts';
import { assertStrainIsNumber, checkField, fieldPath, reportInconsistent, show } from '../checks.ts';

/** Citation for the report's reference list. */
export const VECCHIO_COLLINS_REFERENCE =
  'Vecchio, F. J. & Collins, M. P. (1986). The modified compression-field theory for reinforced concrete elements subjected to shear. ACI Journal 83(2), 219–231.';

/** Tension-stiffening coefficient c of Vecchio & Collins (1986). (Collins & Mitchell 1991 use c = 500 — from memory.) */
export const VECCHIO_COLLINS_COEFFICIENT = 200;

/**
 * Default tensile strain at which the tension-stiffening stress is dropped to zero: 0.002, about the
 * yield strain of 400–420 MPa bars. Past yield at the crack, bond can no longer carry tension into the
 * concrete between cracks, so stiffening is lost. // common practice, no source
 */
export const DEFAULT_TENSION_STIFFENING_END_STRAIN = 0.002;

function tensionLaw(
  model: string,
  label: string,
  references: readonly string[],
  tensileStrength: number,
  crackingStrain: number,
  breakpoints: readonly number[],
  branch: (strain: number) => number,
): TensionLaw {
  return {
    model,
    label,
    references,
    tensileStrength,
    crackingStrain,
    breakpoints,
    stress(strain: number): number {
      if (strain !== strain) assertStrainIsNumber(strain, model); // inline NaN test: this is the hot path
      if (strain <= 0) return 0;
      const stress = branch(strain);
      if (!Number.isFinite(stress)) throw new BugError(`${model}: tensile stress at strain ${strain} is not finite`);
      return stress;
    },
  };
}

/**
 * Concrete carries no tension: σt = 0 for every strain. tensileStrength = crackingStrain = 0.
 * // common practice, no source (the usual assumption of flexural strength design)
 */
export function noTension(): TensionLaw {
  return tensionLaw('no-tension', 'No tension', [], 0, 0, [], () => 0);
}

/** Inputs of linearBrittleTension (MPa). */
export interface LinearTensionParameters {
  /** fr (modulus of rupture) or fctm, MPa, > 0. */
  readonly tensileStrength: number;
  /** Ec, MPa, > 0. */
  readonly elasticModulus: number;
}

/** Inputs of tensionStiffening (MPa, strains dimensionless). */
export interface TensionStiffeningParameters extends LinearTensionParameters {
  /** c in fcr/(1 + √(c εt)); default 200 (Vecchio & Collins 1986). */
  readonly coefficient?: number;
  /** Tensile strain where the stiffening stress drops to zero; default 0.002. Must exceed the cracking strain. */
  readonly endStrain?: number;
}

/** Checks the tension-law parameters (0 < ft ≤ 15 MPa, Ec > 0, c, end strain beyond cracking); paths are `path.<parameter name>`. */
export function validateTensionParameters(p: TensionStiffeningParameters, path = ''): Diagnostic[] {
  const out: Diagnostic[] = [];
  let ok = checkField(out, fieldPath(path, 'tensileStrength'), 'concrete tension: tensile strength', p.tensileStrength, { min: 0, exclusiveMin: true, max: 15, quantity: 'concreteStress' });
  ok = checkField(out, fieldPath(path, 'elasticModulus'), 'concrete tension: elastic modulus Ec', p.elasticModulus, { min: 0, exclusiveMin: true, quantity: 'modulus' }) && ok;
  if (p.coefficient !== undefined) {
    ok = checkField(out, fieldPath(path, 'coefficient'), 'tension-stiffening coefficient c', p.coefficient, { min: 0, exclusiveMin: true, max: 2000 }) && ok;
  }
  if (p.endStrain !== undefined) {
    ok = checkField(out, fieldPath(path, 'endStrain'), 'tension-stiffening end strain', p.endStrain, { min: 0, exclusiveMin: true, max: 0.05 }) && ok;
  }
  if (ok) {
    const crackingStrain = p.tensileStrength / p.elasticModulus;
    const endStrain = p.endStrain ?? DEFAULT_TENSION_STIFFENING_END_STRAIN;
    if (endStrain <= crackingStrain) {
      reportInconsistent(out, fieldPath(path, 'endStrain'), `tension stiffening: the end strain ${show(endStrain)} must exceed the cracking strain fcr/Ec = ${show(crackingStrain)}`);
    }
  }
  return out;
}

/**
 * Linear to the tensile strength, then nothing (brittle cracking), tensile magnitudes (MPa):
 *   εt ≤ εcr = fr/Ec: σt = Ec εt;  εt > εcr: σt = 0.
 * // common practice, no source (the usual model behind the cracking moment)
 */
export function linearBrittleTension(p: LinearTensionParameters): TensionLaw {
  throwIfErrors(validateTensionParameters(p));
  const crackingStrain = p.tensileStrength / p.elasticModulus;
  return tensionLaw('linear-brittle', 'Linear to the tensile strength, then zero', [], p.tensileStrength, crackingStrain, [crackingStrain],
    (strain) => (strain <= crackingStrain ? p.elasticModulus * strain : 0));
}

/**
 * Tension stiffening after cracking, tensile magnitudes (MPa):
 *   εt ≤ εcr = fcr/Ec:    σt = Ec εt
 *   εcr < εt ≤ 0.8 εend:  σt = fcr / (1 + √(c εt))   (εt is the total tensile strain; there is a small drop at cracking)
 *   0.8 εend < εt ≤ εend: the same curve times a linear taper from 1 to 0, so the stress reaches
 *                         zero continuously (a jump to zero over a whole tension band would put a
 *                         discontinuity into the section's equilibrium; common practice, no source)
 *   εt > εend:            σt = 0
 * c = 200 (Vecchio & Collins 1986); c = 500 in Collins & Mitchell (1991) — from memory, hence a parameter.
 * εend defaults to 0.002 (see DEFAULT_TENSION_STIFFENING_END_STRAIN).
 * @see Vecchio & Collins (1986), ACI Journal 83(2) — average tensile stress after cracking
 */
export function tensionStiffening(p: TensionStiffeningParameters): TensionLaw {
  throwIfErrors(validateTensionParameters(p));
  const c = p.coefficient ?? VECCHIO_COLLINS_COEFFICIENT;
  const crackingStrain = p.tensileStrength / p.elasticModulus;
  const endStrain = p.endStrain ?? DEFAULT_TENSION_STIFFENING_END_STRAIN;
  return tensionLaw('tension-stiffening', `Tension stiffening fcr/(1 + √(${c} εt)) (Vecchio & Collins 1986)`, [VECCHIO_COLLINS_REFERENCE],
    p.tensileStrength, crackingStrain, [crackingStrain, Math.max(0.8 * endStrain, crackingStrain), endStrain], (strain) => {
      if (strain <= crackingStrain) return p.elasticModulus * strain;
      if (strain > endStrain) return 0;
      const curve = p.tensileStrength / (1 + Math.sqrt(c * strain));
      const taperStart = Math.max(0.8 * endStrain, crackingStrain);
      return strain <= taperStart ? curve : (curve * (endStrain - strain)) / (endStrain - taperStart);
    });
}
