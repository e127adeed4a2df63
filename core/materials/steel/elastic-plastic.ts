import { throwIfErrors } from '../../diagnostics.ts';
import type { SteelMaterial } from '../types.ts';
import { symmetricSteel, validateSteelParameters, type SteelParameters } from './symmetric-steel.ts';

/**
 * Elastic–perfectly plastic steel, symmetric, compression positive (MPa):
 *   |ε| ≤ εy = fy/Es: σ = Es ε;  εy < |ε| ≤ εsu: σ = ±fy;  |ε| > εsu: σ = 0 (ruptured).
 * ultimateStress = fy; hardeningStrain = εy (no hardening).
 * @see ACI 318-19 20.2.2.1 (stress below fy is Es·εs, above εy it is fy); EN 1992-1-1 3.2.7(2) b) horizontal top branch
 */
export function elasticPlasticSteel(p: SteelParameters): SteelMaterial {
  throwIfErrors(validateSteelParameters(p, 'elastic–plastic steel'));
  const yieldStrain = p.yieldStress / p.elasticModulus;
  return symmetricSteel({
    model: 'elastic-plastic',
    label: 'Elastic–perfectly plastic steel',
    references: ['ACI 318-19 20.2.2.1', 'EN 1992-1-1:2004 3.2.7(2) and Figure 3.8'],
    elasticModulus: p.elasticModulus,
    yieldStress: p.yieldStress,
    ultimateStress: p.yieldStress,
    hardeningStrain: yieldStrain,
    ruptureStrain: p.ruptureStrain,
    postYield: () => p.yieldStress,
  });
}
