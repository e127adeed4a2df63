import { describe, expect, it } from 'vitest';
import { InputError } from '../../../../core/diagnostics.ts';
import { elasticPlasticSteel } from '../../../../core/materials/steel/elastic-plastic.ts';

// ACI 318-19 20.2.2.1: below fy the stress is Es·εs; beyond εy it is fy.
describe('elastic–perfectly plastic steel', () => {
  const steel = elasticPlasticSteel({ elasticModulus: 200_000, yieldStress: 420, ruptureStrain: 0.05 });

  it('is elastic to εy = fy/Es = 0.0021 and flat at fy to rupture, in both directions', () => {
    expect(steel.yieldStrain).toBeCloseTo(0.0021, 15);
    expect(steel.stress(0.001)).toBeCloseTo(200, 10);
    expect(steel.stress(-0.001)).toBeCloseTo(-200, 10);
    expect(steel.stress(0.0021)).toBeCloseTo(420, 10);
    expect(steel.stress(0.03)).toBe(420);
    expect(steel.stress(-0.05)).toBe(-420);
  });

  it('ruptures beyond εsu', () => {
    expect(steel.stress(0.0501)).toBe(0);
    expect(steel.stress(-0.0501)).toBe(0);
  });

  it('reports fu = fy, εsh = εy and symmetric breakpoints', () => {
    expect(steel.ultimateStress).toBe(420);
    expect(steel.hardeningStrain).toBe(steel.yieldStrain);
    expect(steel.breakpoints).toEqual([-0.05, -steel.yieldStrain, steel.yieldStrain, 0.05]);
  });

  it('rejects a rupture strain below the yield strain', () => {
    expect(() => elasticPlasticSteel({ elasticModulus: 200_000, yieldStress: 420, ruptureStrain: 0.002 })).toThrow(InputError);
  });
});
