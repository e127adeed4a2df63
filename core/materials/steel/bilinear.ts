import { diagnostic, throwIfErrors, type Diagnostic } from '../../diagnostics.ts';
import { phrase, q } from '../../units/phrase.ts';
import type { SteelMaterial } from '../types.ts';
import { checkField, fieldPath } from '../checks.ts';
import { symmetricSteel, validateSteelParameters, type SteelParameters } from './symmetric-steel.ts';

/** Inputs of bilinearSteel (MPa, strains dimensionless). */
export interface BilinearSteelParameters extends SteelParameters {
  /** fu, MPa, ≥ fy: the stress is capped there. */
  readonly ultimateStress: number;
  /** Onset of hardening εsh, default εy (no plateau: a true bilinear law). */
  readonly hardeningStrain?: number;
  /** Esh, MPa, ≥ 0; default (fu − fy)/(εsu − εsh), which reaches fu exactly at εsu. */
  readonly hardeningModulus?: number;
}

function resolve(p: BilinearSteelParameters): { hardeningStrain: number; hardeningModulus: number; ultimateStress: number; capStrain: number } {
  const yieldStrain = p.yieldStress / p.elasticModulus;
  const hardeningStrain = p.hardeningStrain ?? yieldStrain;
  const hardeningModulus = p.hardeningModulus ?? (p.ultimateStress - p.yieldStress) / (p.ruptureStrain - hardeningStrain);
  const reached = p.yieldStress + hardeningModulus * (p.ruptureStrain - hardeningStrain);
  const ultimateStress = Math.min(p.ultimateStress, reached);
  const capStrain = hardeningModulus > 0 ? hardeningStrain + (ultimateStress - p.yieldStress) / hardeningModulus : p.ruptureStrain;
  return { hardeningStrain, hardeningModulus, ultimateStress, capStrain };
}

/** Law-level checks, plus a warning when a given Esh does not reach fu by εsu (the curve then tops out below fu). */
export function validateBilinearSteelParameters(p: BilinearSteelParameters, path = ''): Diagnostic[] {
  const out = validateSteelParameters(p, 'bilinear steel', path);
  if (p.hardeningModulus !== undefined) {
    if (!checkField(out, fieldPath(path, 'hardeningModulus'), 'bilinear steel: hardening modulus Esh', p.hardeningModulus, { min: 0, max: p.elasticModulus, quantity: 'modulus' })) return out;
  }
  if (out.length > 0) return out;
  const r = resolve(p);
  if (r.ultimateStress < p.ultimateStress - 1e-9) {
    const stress = (v: number) => q('stress', v, { compact: true });
    out.push(diagnostic('inconsistent', fieldPath(path, 'hardeningModulus'), 'warning',
      phrase`bilinear steel: with Esh = ${q('modulus', r.hardeningModulus, { compact: true })} the stress at rupture is ${stress(r.ultimateStress)}, below fu = ${stress(p.ultimateStress)}; the curve ends there`));
  }
  return out;
}

/**
 * Bilinear (optionally with a yield plateau) steel, symmetric, compression positive (MPa):
 *   |ε| ≤ εy: Es ε;  εy < |ε| ≤ εsh: ±fy;  εsh < |ε| ≤ εsu: ±min(fy + Esh (|ε| − εsh), fu);  beyond εsu: 0.
 * Default Esh = (fu − fy)/(εsu − εsh). ultimateStress is the largest stress actually reached.
 * @see EN 1992-1-1 3.2.7(2) a) inclined top branch (Figure 3.8), generalised with a plateau — common practice
 */
export function bilinearSteel(p: BilinearSteelParameters): SteelMaterial {
  throwIfErrors(validateBilinearSteelParameters(p));
  const r = resolve(p);
  return symmetricSteel({
    model: 'bilinear',
    label: 'Bilinear steel with strain hardening',
    references: ['EN 1992-1-1:2004 3.2.7(2) and Figure 3.8'],
    elasticModulus: p.elasticModulus,
    yieldStress: p.yieldStress,
    ultimateStress: r.ultimateStress,
    hardeningStrain: r.hardeningStrain,
    ruptureStrain: p.ruptureStrain,
    extraBreakpoints: r.capStrain < p.ruptureStrain ? [r.capStrain] : [],
    postYield: (strain) => (strain <= r.hardeningStrain ? p.yieldStress : Math.min(p.yieldStress + r.hardeningModulus * (strain - r.hardeningStrain), r.ultimateStress)),
  });
}
