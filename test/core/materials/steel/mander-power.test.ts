import { describe, expect, it } from 'vitest';
import { manderDefaultHardeningModulus, manderPowerExponent, manderPowerSteel, validateManderPowerSteelParameters } from '../../../../core/materials/steel/mander-power.ts';
import { linspace, rightSlope } from '../support.ts';

// Mander (1983), from memory: fs = fsu + (fy − fsu)((εsu − ε)/(εsu − εsh))^P, P = Esh(εsu − εsh)/(fsu − fy).
describe('Mander power-law steel', () => {
  const p = { elasticModulus: 200_000, yieldStress: 420, ultimateStress: 620, hardeningStrain: 0.008, ruptureStrain: 0.1 };
  const steel = manderPowerSteel(p);

  it('defaults Esh to 2(fsu − fy)/(εsu − εsh), i.e. P = 2', () => {
    expect(manderDefaultHardeningModulus(p)).toBeCloseTo(4347.83, 2);
    expect(manderPowerExponent(p)).toBeCloseTo(2, 12);
  });

  it('matches the expression: halfway along the hardening range fs = fsu − (fsu − fy)/4 = 570 MPa', () => {
    expect(steel.stress(0.054)).toBeCloseTo(570, 9);
    expect(steel.stress(-0.054)).toBeCloseTo(-570, 9);
  });

  it('starts hardening with the tangent Esh and reaches fsu at εsu', () => {
    const Esh = 3 * (200 / 0.092);
    const given = manderPowerSteel({ ...p, hardeningModulus: Esh });
    expect(rightSlope((e) => given.stress(e), 0.008, 1e-9) / Esh).toBeCloseTo(1, 3);
    expect(given.stress(0.1)).toBeCloseTo(620, 10);
    expect(given.stress(0.1001)).toBe(0);
  });

  it('rises monotonically from fy to fsu', () => {
    const strains = linspace(0.008, 0.1, 100);
    for (let i = 1; i < strains.length; i++) expect(steel.stress(strains[i] as number)).toBeGreaterThan(steel.stress(strains[i - 1] as number));
  });

  it('rejects P < 1 and keeps the plateau when fsu = fy', () => {
    expect(validateManderPowerSteelParameters({ ...p, hardeningModulus: 1000 }).map((d) => d.path)).toEqual(['hardeningModulus']);
    expect(manderPowerSteel({ ...p, ultimateStress: 420 }).stress(0.05)).toBe(420);
  });
});
