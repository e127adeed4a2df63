/**
 * In-place concrete strength from cores, checked against published statistical tables and the
 * formulas of the two methods (ACI 214.4R-10 tolerance-factor approach; EN 1990 Annex D).
 */
import { describe, expect, it } from 'vitest';
import { say } from '../../core/units/phrase.ts';
import { aciCoreToleranceFactor, en1990CharacteristicFactor, EN1990_TABLE_D1_UNKNOWN, inPlaceStrength, MINIMUM_CORE_COUNT } from '../../core/retrofit/in-place-strength.ts';
import { noncentralTCdf, normalCdf, normalQuantile, oneSidedToleranceFactor, studentTCdf, studentTQuantile } from '../../core/retrofit/statistics.ts';

describe('statistical functions against standard tables', () => {
  it('normal distribution: Φ(1.96) = 0.9750, Φ(−1) = 0.15866, z0.90 = 1.28155, z0.95 = 1.64485 (Abramowitz & Stegun Table 26.1)', () => {
    expect(normalCdf(1.96)).toBeCloseTo(0.975002, 6);
    expect(normalCdf(-1)).toBeCloseTo(0.158655, 6);
    expect(normalQuantile(0.9)).toBeCloseTo(1.281552, 6);
    expect(normalQuantile(0.95)).toBeCloseTo(1.644854, 6);
    expect(normalCdf(Infinity)).toBe(1);
    expect(normalCdf(-Infinity)).toBe(0);
  });

  it('Student t quantiles: t0.95 with ν = 2, 5, 10, 29 is 2.920, 2.015, 1.812, 1.699; t0.975 with ν = 5 is 2.571 (Abramowitz & Stegun Table 26.10)', () => {
    expect(studentTQuantile(0.95, 2)).toBeCloseTo(2.91999, 4);
    expect(studentTQuantile(0.95, 5)).toBeCloseTo(2.01505, 4);
    expect(studentTQuantile(0.95, 10)).toBeCloseTo(1.81246, 4);
    expect(studentTQuantile(0.95, 29)).toBeCloseTo(1.69913, 4);
    expect(studentTQuantile(0.975, 5)).toBeCloseTo(2.57058, 4);
    // ν = 1 is the Cauchy distribution: F(t) = ½ + atan(t)/π
    expect(studentTCdf(2, 1)).toBeCloseTo(0.5 + Math.atan(2) / Math.PI, 12);
  });

  it('the noncentral t with δ = 0 is the Student t', () => {
    for (const [t, nu] of [[1.2, 3], [-0.7, 8], [2.5, 20]] as const) expect(noncentralTCdf(t, nu, 0)).toBeCloseTo(studentTCdf(t, nu), 8);
  });
});

describe('ACI 214.4R-10 tolerance-factor approach (from memory): f′c,eq = f̄c − K·s, K for the 10 % fractile at 75 % confidence', () => {
  // One-sided tolerance factors, p = 0.10, γ = 0.75: M. G. Natrella (1963), NBS Handbook 91, Table A-7 (from memory)
  const published: [number, number][] = [[3, 2.501], [4, 2.134], [5, 1.961], [6, 1.860], [7, 1.791], [8, 1.740], [10, 1.671], [15, 1.577], [20, 1.528], [30, 1.475]];
  it.each(published)('n = %i cores: K = %f', (n, k) => {
    expect(Math.abs(aciCoreToleranceFactor(n) - k)).toBeLessThan(0.0015);
  });

  it('K falls with n towards z0.90 = 1.2816 (the population fractile when s is exact)', () => {
    let previous = Infinity;
    for (const n of [3, 4, 6, 10, 20, 50, 100]) {
      const k = aciCoreToleranceFactor(n);
      expect(k).toBeLessThan(previous);
      expect(k).toBeGreaterThan(1.2816);
      previous = k;
    }
    // Large-sample approximation K ≈ z_p + z_γ·√((1 + z_p²/2)/n) (Natrella 1963, §2-5, from memory):
    // n = 2000: 1.28155 + 0.67449 × √((1 + 0.82119)/2000) = 1.28155 + 0.02035 = 1.30190
    expect(oneSidedToleranceFactor(2000, 0.1, 0.75)).toBeCloseTo(1.3019, 3);
  });

  it('four cores, mean 27.0 MPa, V = 12 %: s = 3.24 MPa, f′c,eq = 27.0 − 2.134 × 3.24 = 20.09 MPa', () => {
    const r = inPlaceStrength('ACI 318-19', { meanStrength: 27, count: 4, coefficientOfVariation: 0.12 });
    expect(r.standardDeviation).toBeCloseTo(3.24, 10);
    expect(r.strength).toBeCloseTo(27 - 2.1337 * 3.24, 2);
    expect(say(r.formula, 'si')).toContain('n = 4');
  });

  it('needs at least three cores', () => {
    expect(MINIMUM_CORE_COUNT).toBe(3);
    expect(() => aciCoreToleranceFactor(2)).toThrow();
    expect(() => aciCoreToleranceFactor(3.5)).toThrow();
  });
});

describe('EN 1990:2002 Annex D, D7.2, Eq. (D.1): fck,is = f̄c·(1 − kn·V), kn from Table D1 "VX unknown" (from memory)', () => {
  it('reproduces the tabulated kn', () => {
    // Table D1, VX unknown: 3: 3.37, 4: 2.63, 5: 2.33, 6: 2.18, 8: 2.00, 10: 1.92, 20: 1.76, 30: 1.73, ∞: 1.64
    for (const [n, k] of EN1990_TABLE_D1_UNKNOWN) if (Number.isFinite(n)) expect(en1990CharacteristicFactor(n)).toBe(k);
    expect(en1990CharacteristicFactor(100_000)).toBeCloseTo(1.64, 2);
  });

  it('interpolates linearly in 1/n between tabulated n: n = 7 → 2.18 + (1/6 − 1/7)/(1/6 − 1/8) × (2.00 − 2.18) = 2.0771', () => {
    expect(en1990CharacteristicFactor(7)).toBeCloseTo(2.0771, 4);
    expect(en1990CharacteristicFactor(15)).toBeLessThan(1.92);
    expect(en1990CharacteristicFactor(15)).toBeGreaterThan(1.76);
  });

  it('the table follows the Bayesian predictive factor t0.95,n−1·√(1 + 1/n) within 0.015 (statistical basis of Table D1; common practice, no source)', () => {
    for (const [n, k] of EN1990_TABLE_D1_UNKNOWN) {
      if (!Number.isFinite(n)) continue;
      expect(Math.abs(studentTQuantile(0.95, n - 1) * Math.sqrt(1 + 1 / n) - k)).toBeLessThan(0.015);
    }
  });

  it('six cores, mean 35 MPa, V = 10 %: fck,is = 35 × (1 − 2.18 × 0.10) = 27.37 MPa', () => {
    const r = inPlaceStrength('EN 1992-1-1', { meanStrength: 35, count: 6, coefficientOfVariation: 0.1 });
    expect(r.factor).toBe(2.18);
    expect(r.strength).toBeCloseTo(27.37, 10);
  });

  it('for the same cores the EN 5 % value lies below the ACI 10 % value', () => {
    const cores = { meanStrength: 30, count: 5, coefficientOfVariation: 0.15 };
    expect(inPlaceStrength('EN 1992-1-1', cores).strength).toBeLessThan(inPlaceStrength('ACI 318-19', cores).strength);
  });
});
