/**
 * The code limits of moment redistribution at a support, against the clauses' formulas evaluated by
 * hand here.
 */
import { describe, expect, it } from 'vitest';
import { bilinearLaw, type DirectionLaw } from '../../core/continuous/laws.ts';
import { en1992DuctilityClass, permittedRedistribution, redistributionCheck } from '../../core/continuous/redistribution.ts';

const bars = { effectiveDepth: 540, barDiameter: 20, yieldStress: 500, ultimateStress: 575, ultimateStrain: 0.075 };
function withCodePoint(steelStrain: number, neutralAxisDepth: number, ultimateStrain = 0.075): DirectionLaw {
  return { ...bilinearLaw(1e-5, 2e8, 1e-4, 2e8, { ...bars, ultimateStrain }), codePoint: { steelStrain, neutralAxisDepth } };
}

describe('ACI 318-19 6.6.5', () => {
  it('1000εt percent, at most 20 %, only where εt ≥ 0.0075', () => {
    // ACI 318-19 6.6.5.1 and 6.6.5.3 (from memory): reduction ≤ lesser of 1000εt % and 20 %, εt ≥ 0.0075
    expect(permittedRedistribution('ACI 318-19', withCodePoint(0.0123, 100), 30).percent).toBeCloseTo(12.3, 9);
    expect(permittedRedistribution('ACI 318-19', withCodePoint(0.031, 50), 30).percent).toBe(20);
    expect(permittedRedistribution('ACI 318-19', withCodePoint(0.0074, 150), 30).percent).toBe(0);
  });
});

describe('EN 1992-1-1 5.5(4)', () => {
  it('δ ≥ k1 + k2·xu/d with the recommended k1 = 0.44, k2 = 1.25(0.6 + 0.0014/εcu2), and δ ≥ 0.7 for Class B/C', () => {
    // EN 1992-1-1 5.5(4) recommended values (from memory); εcu2 = 0.0035 for fck ≤ 50 MPa (Table 3.1)
    const k2 = 1.25 * (0.6 + 0.0014 / 0.0035); // = 1.25
    const xu = 0.2 * 540;
    const delta = 0.44 + k2 * 0.2; // 0.69 < 0.7 → 0.7 governs
    expect(delta).toBeCloseTo(0.69, 9);
    expect(permittedRedistribution('EN 1992-1-1', withCodePoint(0.01, xu), 30).percent).toBeCloseTo(30, 9);
    const deeper = permittedRedistribution('EN 1992-1-1', withCodePoint(0.01, 0.3 * 540), 30);
    expect(deeper.percent).toBeCloseTo((1 - (0.44 + 1.25 * 0.3)) * 100, 9);
    // Class A reinforcement: δ ≥ k6 = 0.8
    expect(permittedRedistribution('EN 1992-1-1', withCodePoint(0.01, xu, 0.03), 30).percent).toBeCloseTo(20, 9);
  });
  it('high-strength concrete uses k3 = 0.54 and εcu2 from Table 3.1', () => {
    // EN 1992-1-1 Table 3.1: εcu2 = 2.6 + 35((90 − fck)/100)⁴ ‰ for fck ≥ 50 MPa; 5.5(4) k3 = 0.54
    const fck = 70;
    const ecu2 = (2.6 + 35 * ((90 - fck) / 100) ** 4) / 1000;
    const k4 = 1.25 * (0.6 + 0.0014 / ecu2);
    const p = permittedRedistribution('EN 1992-1-1', withCodePoint(0.01, 0.25 * 540), fck);
    expect(p.percent).toBeCloseTo((1 - Math.max(0.54 + k4 * 0.25, 0.7)) * 100, 9);
  });
  it('ductility classes by εuk (EN 1992-1-1 Annex C Table C.1, from memory: A ≥ 2.5 %, B ≥ 5 %, C ≥ 7.5 %)', () => {
    expect(en1992DuctilityClass(0.03)).toBe('A');
    expect(en1992DuctilityClass(0.05)).toBe('B');
    expect(en1992DuctilityClass(0.08)).toBe('C');
  });
});

describe('used against permitted', () => {
  it('used = 1 − M/Mel in percent, within the permitted amount or not', () => {
    // common practice, no source: redistribution is the reduction of the elastic support moment
    const permitted = { percent: 15, clause: 'x', basis: 'y' };
    const ok = redistributionCheck(2, 6000, 1, -100, -90, permitted);
    expect(ok.usedPercent).toBeCloseTo(10, 9);
    expect(ok.withinPermitted).toBe(true);
    expect(redistributionCheck(2, 6000, 1, -100, -80, permitted).withinPermitted).toBe(false);
  });
});
