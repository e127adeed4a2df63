import { throwIfErrors, type Diagnostic } from '../../diagnostics.ts';
import type { SteelMaterial } from '../types.ts';
import { hardeningFrame, symmetricSteel, validateSteelParameters, type HardeningSteelParameters } from './symmetric-steel.ts';

/** Citation for the report's reference list. */
export const PARK_PAULAY_REFERENCE = 'Park, R. & Paulay, T. (1975). Reinforced Concrete Structures. Wiley, New York. Section 2.2.';

/** Inputs of parkPaulaySteel (MPa, strains dimensionless). */
export type ParkPaulaySteelParameters = HardeningSteelParameters;

/** r = εsu − εsh and m = ((fsu/fy)(30r + 1)² − 60r − 1)/(15r²). @see Park & Paulay (1975), Eq. (2.6) — equation number from memory */
export function parkPaulayConstants(p: ParkPaulaySteelParameters): { r: number; m: number } {
  const r = p.ruptureStrain - p.hardeningStrain;
  const m = ((p.ultimateStress / p.yieldStress) * (30 * r + 1) ** 2 - 60 * r - 1) / (15 * r * r);
  return { r, m };
}

/** Checks the parameters (Es, fy, fu ≥ fy, εy ≤ εsh < εsu); paths are `path.<parameter name>`. */
export function validateParkPaulaySteelParameters(p: ParkPaulaySteelParameters, path = ''): Diagnostic[] {
  return validateSteelParameters(p, 'Park & Paulay steel', path);
}

/**
 * Park & Paulay (1975) steel with yield plateau and strain-hardening curve, symmetric, compression
 * positive (MPa); with u = |ε| − εsh:
 *   |ε| ≤ εy: Es ε;  εy < |ε| ≤ εsh: ±fy;
 *   εsh < |ε| ≤ εsu: ±fy [ (m u + 2)/(60 u + 2) + u (60 − m)/(2 (30 r + 1)²) ];  |ε| > εsu: 0.
 * The curve passes through fy at εsh and fsu at εsu with zero slope there.
 * @see Park & Paulay (1975), Section 2.2, Eqs. (2.5)–(2.6) — equation numbers from memory
 */
export function parkPaulaySteel(p: ParkPaulaySteelParameters): SteelMaterial {
  throwIfErrors(validateParkPaulaySteelParameters(p));
  const { r, m } = parkPaulayConstants(p);
  const tail = 2 * (30 * r + 1) ** 2;
  return symmetricSteel({
    model: 'park-paulay-1975',
    label: 'Park & Paulay (1975) steel with strain hardening',
    references: [PARK_PAULAY_REFERENCE],
    ...hardeningFrame(p),
    postYield: (strain) => {
      if (strain <= p.hardeningStrain) return p.yieldStress;
      const u = strain - p.hardeningStrain;
      return p.yieldStress * ((m * u + 2) / (60 * u + 2) + (u * (60 - m)) / tail);
    },
  });
}
