import { BugError, throwIfErrors, type Diagnostic } from '../../diagnostics.ts';
import type { TensionLaw, TensionStiffeningZone } from '../types.ts';
import { assertStrainIsNumber, checkField, fieldPath, reportInconsistent, show } from '../checks.ts';

/** Citation for the report's reference list. */
export const VECCHIO_COLLINS_REFERENCE =
  'Vecchio, F. J. & Collins, M. P. (1986). The modified compression-field theory for reinforced concrete elements subjected to shear. ACI Journal 83(2), 219–231.';

/** Tension-stiffening coefficient c of Vecchio & Collins (1986). (Collins & Mitchell 1991 use c = 500 — from memory.) */
export const VECCHIO_COLLINS_COEFFICIENT = 200;

/**
 * Default tensile strain at which the tension-stiffening stress reaches zero: 0.005, tapered from
 * 0.004, which is the yield strain of 800 MPa bars (Es = 200 GPa). Inside a section the bars end the
 * stiffening when they yield (the crack check: their reserve below yield limits what the concrete
 * carries, core/section/forces.ts), so for bars up to that grade this end is never reached there; it
 * ends the law where it stands alone (material charts) and, for stronger bars, before their yield.
 * // common practice, no source
 */
export const DEFAULT_TENSION_STIFFENING_END_STRAIN = 0.005;

/**
 * Cracking (direct tensile) stress the tension-stiffening law of Vecchio & Collins (1986) was
 * calibrated on, fcr = 0.33 √f′c in MPa (from memory), times ACI's λ for lightweight concrete. It is
 * about half the modulus of rupture 0.62 λ √f′c, a flexural property that the law does not expect.
 * @param fc f′c, MPa (> 0)
 */
export function vecchioCollinsCrackingStress(fc: number, lightweightFactor = 1): number {
  return 0.33 * lightweightFactor * Math.sqrt(fc);
}

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
  /**
   * Tensile strain where the stiffening stress is tapered to zero; default 0.005
   * (DEFAULT_TENSION_STIFFENING_END_STRAIN). Inside a section the reinforcement ends the stiffening
   * first: the band's concrete carries no more than the bars' reserve below yield
   * (core/section/forces.ts), so it vanishes when the bars yield. Must exceed the cracking strain.
   */
  readonly endStrain?: number;
  /** Where the law acts in a section (core/section/build.ts); default the effective tension area. */
  readonly zone?: TensionStiffeningZone;
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
 *   0.8 εend < εt ≤ εend: the same curve times a linear taper from 1 to 0 (a jump to zero over a whole
 *                         tension band would put a discontinuity into the section's equilibrium;
 *                         common practice, no source)
 *   εt > εend:            σt = 0;  εend = 0.005 by default (DEFAULT_TENSION_STIFFENING_END_STRAIN).
 * fcr is the cracking (direct tensile) stress the law was calibrated on — 0.33 √f′c (Vecchio & Collins
 * 1986, from memory) or EN 1992-1-1 fctm — not the modulus of rupture. c = 200 (Vecchio & Collins
 * 1986); c = 500 in Collins & Mitchell (1991) — from memory, hence a parameter. In a section the law
 * acts only in the effective tension area around the bars (or the whole tension zone, `zone`), and
 * the bars' reserve below yield limits what it carries (core/section/build.ts, forces.ts): the
 * crack check of Vecchio & Collins (1986), so the stiffening ends when the reinforcement yields.
 * @see Vecchio & Collins (1986), ACI Journal 83(2) — average tensile stress after cracking
 */
export function tensionStiffening(p: TensionStiffeningParameters): TensionLaw {
  throwIfErrors(validateTensionParameters(p));
  const c = p.coefficient ?? VECCHIO_COLLINS_COEFFICIENT;
  const crackingStrain = p.tensileStrength / p.elasticModulus;
  const endStrain = p.endStrain ?? DEFAULT_TENSION_STIFFENING_END_STRAIN;
  const taperStart = Math.max(0.8 * endStrain, crackingStrain);
  const law = tensionLaw('tension-stiffening', `Tension stiffening fcr/(1 + √(${c} εt)) (Vecchio & Collins 1986)`, [VECCHIO_COLLINS_REFERENCE],
    p.tensileStrength, crackingStrain, [crackingStrain, taperStart, endStrain], (strain) => {
      if (strain <= crackingStrain) return p.elasticModulus * strain;
      if (strain > endStrain) return 0;
      const curve = p.tensileStrength / (1 + Math.sqrt(c * strain));
      return strain <= taperStart ? curve : (curve * (endStrain - strain)) / (endStrain - taperStart);
    });
  return { ...law, stiffeningZone: p.zone ?? 'effective-area' };
}
