/**
 * Corroded reinforcement: the rupture-strain relation of Biondini & Vergani (2015), fitted to the
 * tests of Apostolopoulos & Papadakis (2008) (from memory):
 *   εsu(δs)/εsu0 = 1 for δs ≤ 0.016, 0.1521·δs^(−0.4583) for 0.016 < δs ≤ 1.
 */
import { describe, expect, it } from 'vitest';
import { say } from '../../core/units/phrase.ts';
import { CORROSION_THRESHOLD, corrodedRuptureStrainFactor, residualAreaFactor } from '../../core/retrofit/corrosion.ts';
import { corrodedSteelSpec } from '../../core/retrofit/as-found.ts';
import { validateSteelSpec } from '../../core/materials/build/steel.ts';
import type { SteelSpec } from '../../core/materials/specs.ts';

describe('Biondini & Vergani (2015) rupture strain of corroded bars (from memory)', () => {
  it.each([
    // δs, factor — worked: 0.1521 × δs^(−0.4583)
    [0.02, 0.91370], //  ln 0.02 = −3.91202; × −0.4583 = 1.79288; e^ = 6.00698; × 0.1521 = 0.91366
    [0.10, 0.43690], //  10^0.4583 = 2.87244; × 0.1521 = 0.43690
    [0.25, 0.28721], //  4^0.4583 = 1.88833; × 0.1521 = 0.28721
    [0.50, 0.20890], //  2^0.4583 = 1.37388; × 0.1521 = 0.20897
    [1.00, 0.15210],
  ])('δs = %f → εsu/εsu0 = %f', (delta, factor) => {
    expect(corrodedRuptureStrainFactor(delta)).toBeCloseTo(factor, 3);
    expect(corrodedRuptureStrainFactor(delta)).toBeCloseTo(0.1521 * delta ** -0.4583, 12);
  });

  it('is 1 up to the threshold δs = 0.016, where the fitted branch is within 1.2 % of 1, and never above 1', () => {
    expect(CORROSION_THRESHOLD).toBe(0.016);
    expect(corrodedRuptureStrainFactor(0)).toBe(1);
    expect(corrodedRuptureStrainFactor(0.016)).toBe(1);
    expect(0.1521 * 0.016 ** -0.4583).toBeCloseTo(1.0119, 3);
    expect(corrodedRuptureStrainFactor(0.0161)).toBe(1);
  });

  it('never increases with the section loss', () => {
    let previous = 1;
    for (let d = 0; d <= 1; d += 0.01) {
      const f = corrodedRuptureStrainFactor(d);
      expect(f).toBeLessThanOrEqual(previous + 1e-12);
      previous = f;
    }
  });

  it('refuses a loss outside 0–1 (a fraction, not a percentage), NaN included', () => {
    expect(() => corrodedRuptureStrainFactor(1.2)).toThrow();
    expect(() => corrodedRuptureStrainFactor(-0.1)).toThrow();
    expect(() => corrodedRuptureStrainFactor(Number.NaN)).toThrow();
    expect(residualAreaFactor(0.15)).toBeCloseTo(0.85, 12);
  });
});

describe('a corroded steel spec', () => {
  const parkPaulay: SteelSpec = { kind: 'steel', id: 'b500', name: 'B500', model: 'park-paulay', yieldStress: 500, ultimateStress: 600, hardeningStrain: 0.01, ruptureStrain: 0.1 };

  it('keeps fy and fu and reduces εsu: 15 % loss on εsu0 = 0.10 → 0.1521 × 0.15^−0.4583 × 0.10 = 0.0362', () => {
    const r = corrodedSteelSpec(parkPaulay, 0.15, 'b500~c');
    expect(r.ruptureStrain).toBeCloseTo(0.1521 * 0.15 ** -0.4583 * 0.1, 10);
    expect(r.spec.yieldStress).toBe(500);
    expect(r.spec.ultimateStress).toBe(600);
    expect(r.spec.model).toBe('park-paulay');
    expect(validateSteelSpec(r.spec).filter((d) => d.severity === 'error')).toEqual([]);
  });

  it('becomes bilinear (fy at εy to fu at εsu) when εsu falls within the yield plateau', () => {
    const longPlateau: SteelSpec = { ...parkPaulay, hardeningStrain: 0.04 };
    const r = corrodedSteelSpec(longPlateau, 0.3, 'x');
    // 0.1521 × 0.3^−0.4583 × 0.10 = 0.0264 < εsh = 0.04
    expect(r.ruptureStrain).toBeLessThan(0.04);
    expect(r.spec.model).toBe('bilinear');
    expect(r.spec.hardeningStrain).toBeUndefined();
    expect(r.warnings.map((w) => say(w, 'si')).join(' ')).toMatch(/bilinear/);
    expect(validateSteelSpec(r.spec).filter((d) => d.severity === 'error')).toEqual([]);
  });

  it('holds the strain at 0.01, the least the steel laws accept, with a warning', () => {
    const brittle: SteelSpec = { kind: 'steel', id: 'old', name: 'old', model: 'elastic-plastic', yieldStress: 240, ultimateStress: 240, ruptureStrain: 0.05 };
    const r = corrodedSteelSpec(brittle, 0.7, 'x');
    expect(r.computed).toBeCloseTo(0.05 * 0.1521 * 0.7 ** -0.4583, 10);
    expect(r.computed).toBeLessThan(0.01);
    expect(r.ruptureStrain).toBe(0.01);
    expect(r.warnings[0]).toMatch(/overstates the ductility/);
  });
});
