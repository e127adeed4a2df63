import { describe, expect, it } from 'vitest';
import { parkPaulayConstants, parkPaulaySteel } from '../../../../core/materials/steel/park-paulay.ts';
import { jumpAt, linspace, slope } from '../support.ts';

// Park & Paulay (1975), Section 2.2 (equation numbers from memory):
// fs = fy [ (m u + 2)/(60 u + 2) + u (60 − m)/(2 (30 r + 1)²) ], u = ε − εsh, r = εsu − εsh,
// m = ((fsu/fy)(30r + 1)² − 60r − 1)/(15 r²).
describe('Park & Paulay (1975) steel', () => {
  const p = { elasticModulus: 200_000, yieldStress: 420, ultimateStress: 620, hardeningStrain: 0.008, ruptureStrain: 0.1 };
  const steel = parkPaulaySteel(p);
  const { r, m } = parkPaulayConstants(p);

  it('computes r and m (hand calculation: r = 0.092, m = 113.03)', () => {
    // (30·0.092 + 1)² = 14.1376; 1.476190·14.1376 − 5.52 − 1 = 14.34978; 15·0.092² = 0.12696
    expect(r).toBeCloseTo(0.092, 15);
    expect(m).toBeCloseTo(113.03, 2);
  });

  it('matches the published expression on the hardening branch', () => {
    for (const strain of [0.01, 0.02, 0.05, 0.08]) {
      const u = strain - 0.008;
      const expected = 420 * ((m * u + 2) / (60 * u + 2) + (u * (60 - m)) / (2 * (30 * r + 1) ** 2));
      expect(steel.stress(strain)).toBeCloseTo(expected, 10);
      expect(steel.stress(-strain)).toBeCloseTo(-expected, 10);
    }
  });

  it('has a yield plateau from εy to εsh and joins the hardening curve without a jump', () => {
    expect(steel.stress(0.005)).toBe(420);
    expect(jumpAt((e) => steel.stress(e), 0.008)).toBeLessThan(1e-6);
    expect(steel.breakpoints).toEqual([-0.1, -0.008, -0.0021, 0.0021, 0.008, 0.1]);
  });

  it('rises monotonically to fsu, reaching it with zero slope at εsu, then ruptures', () => {
    const strains = linspace(0.008, 0.1, 200);
    for (let i = 1; i < strains.length; i++) {
      expect(steel.stress(strains[i] as number)).toBeGreaterThanOrEqual(steel.stress(strains[i - 1] as number) - 1e-9);
    }
    expect(Math.abs(slope((e) => steel.stress(e), 0.1 - 1e-6, 1e-7))).toBeLessThan(1);
    expect(steel.stress(0.10001)).toBe(0);
  });

  it('reduces to the plateau when fsu = fy (m = 60)', () => {
    const flat = parkPaulaySteel({ ...p, ultimateStress: 420 });
    expect(parkPaulayConstants({ ...p, ultimateStress: 420 }).m).toBeCloseTo(60, 9);
    expect(flat.stress(0.05)).toBeCloseTo(420, 9);
  });
});
