import { describe, expect, it } from 'vitest';
import { parkPaulaySteel } from '../../core/materials/steel/park-paulay.ts';

// Park & Paulay (1975), Reinforced Concrete Structures, Section 2.2: the strain-hardening curve passes
// through (εsh, fy) and (εsu, fsu), with zero slope at εsu. Bars of our own invented grades.
describe('Park & Paulay (1975) strain-hardening curve', () => {
  it.each([
    [300, 450, 0.015, 0.14],
    [420, 620, 0.008, 0.1],
    [500, 575, 0.005, 0.075],
    [690, 860, 0.006, 0.06],
  ])('fy = %d, fsu = %d MPa, εsh = %d, εsu = %d: fy at εsh and fsu at εsu', (fy, fsu, esh, esu) => {
    const steel = parkPaulaySteel({ elasticModulus: 200_000, yieldStress: fy, ultimateStress: fsu, hardeningStrain: esh, ruptureStrain: esu });
    expect(steel.stress(esh)).toBeCloseTo(fy, 9);
    expect(steel.stress(esh + 1e-9)).toBeCloseTo(fy, 4);
    expect(steel.stress(esu)).toBeCloseTo(fsu, 9);
    const h = 1e-6;
    expect(Math.abs((steel.stress(esu) - steel.stress(esu - h)) / h)).toBeLessThan(1e-3 * fy / (esu - esh) + 1);
  });
});
