import { throwIfErrors, type Diagnostic } from '../../diagnostics.ts';
import type { SteelMaterial } from '../types.ts';
import { checkField, fieldPath, reportInconsistent, show } from '../checks.ts';
import { hardeningFrame, symmetricSteel, validateSteelParameters, type HardeningSteelParameters } from './symmetric-steel.ts';

/** Citation for the report's reference list (from memory). */
export const MANDER_STEEL_REFERENCE =
  'Mander, J. B. (1983). Seismic design of bridge piers. PhD thesis, University of Canterbury, Christchurch; Research Report 84-2 (1984).';

/** Inputs of manderPowerSteel (MPa, strains dimensionless). */
export interface ManderPowerSteelParameters extends HardeningSteelParameters {
  /** Esh, tangent at the onset of hardening, MPa; default 2(fsu − fy)/(εsu − εsh), i.e. P = 2. */
  readonly hardeningModulus?: number;
}

/**
 * Default Esh = 2 (fsu − fy)/(εsu − εsh), which makes the power P = 2: a parabola with zero slope at εsu.
 * For fy = 420, fsu = 620 MPa, εsh = 0.008, εsu = 0.10 it gives Esh ≈ 4.3 GPa, within the range of
 * tangents measured on hot-rolled bars. // common practice, no source
 */
export function manderDefaultHardeningModulus(p: Pick<ManderPowerSteelParameters, 'yieldStress' | 'ultimateStress' | 'hardeningStrain' | 'ruptureStrain'>): number {
  return (2 * (p.ultimateStress - p.yieldStress)) / (p.ruptureStrain - p.hardeningStrain);
}

/** P = Esh (εsu − εsh)/(fsu − fy). Infinity when fsu = fy (no hardening). */
export function manderPowerExponent(p: ManderPowerSteelParameters): number {
  const Esh = p.hardeningModulus ?? manderDefaultHardeningModulus(p);
  return (Esh * (p.ruptureStrain - p.hardeningStrain)) / (p.ultimateStress - p.yieldStress);
}

/** Checks the parameters, including P ≥ 1; paths are `path.<parameter name>`. */
export function validateManderPowerSteelParameters(p: ManderPowerSteelParameters, path = ''): Diagnostic[] {
  const out = validateSteelParameters(p, 'Mander power-law steel', path);
  if (p.hardeningModulus !== undefined) {
    checkField(out, fieldPath(path, 'hardeningModulus'), 'Mander power-law steel: hardening modulus Esh', p.hardeningModulus, { min: 0, exclusiveMin: true, max: p.elasticModulus, quantity: 'modulus' });
  }
  if (out.length > 0 || p.ultimateStress === p.yieldStress) return out;
  const P = manderPowerExponent(p);
  if (P < 1) {
    const chord = (p.ultimateStress - p.yieldStress) / (p.ruptureStrain - p.hardeningStrain);
    reportInconsistent(out, fieldPath(path, 'hardeningModulus'),
      `Mander power-law steel: P = Esh(εsu − εsh)/(fsu − fy) = ${show(P)} must be at least 1 (Esh at least the chord slope ${show(chord)} MPa), otherwise the curve has an infinite slope at rupture`);
  }
  return out;
}

/**
 * Mander (1983) power-law strain hardening, symmetric, compression positive (MPa):
 *   |ε| ≤ εy: Es ε;  εy < |ε| ≤ εsh: ±fy;
 *   εsh < |ε| ≤ εsu: ±[fsu + (fy − fsu) ((εsu − |ε|)/(εsu − εsh))^P],  P = Esh (εsu − εsh)/(fsu − fy);
 *   |ε| > εsu: 0.  With fsu = fy the hardening branch is the plateau.
 * @see Mander (1983), PhD thesis, University of Canterbury, Research Report 84-2 — from memory
 */
export function manderPowerSteel(p: ManderPowerSteelParameters): SteelMaterial {
  throwIfErrors(validateManderPowerSteelParameters(p));
  const hardening = p.ultimateStress > p.yieldStress;
  const P = hardening ? manderPowerExponent(p) : 1;
  const span = p.ruptureStrain - p.hardeningStrain;
  return symmetricSteel({
    model: 'mander-power',
    label: 'Mander (1983) steel with power-law strain hardening',
    references: [MANDER_STEEL_REFERENCE],
    ...hardeningFrame(p),
    postYield: (strain) => {
      if (!hardening || strain <= p.hardeningStrain) return p.yieldStress;
      return p.ultimateStress + (p.yieldStress - p.ultimateStress) * ((p.ruptureStrain - strain) / span) ** P;
    },
  });
}
