import { describe, expect, it } from 'vitest';
import type { ConfinementInput } from '../../../../core/materials/specs.ts';
import {
  manderConfinement,
  manderEffectivenessRectangular,
  manderStrengthRatio,
  priestleyUltimateStrain,
  validateConfinementInput,
} from '../../../../core/materials/concrete/mander-confinement.ts';

// Mander, Priestley & Park (1988): ke, ρx = Asx/(s dc), ρy = Asy/(s bc), f′l = ke ρ fyh, f′cc/f′co.
describe('confinement effectiveness ke (rectangular hoops)', () => {
  it('matches a hand calculation', () => {
    // bc = dc = 400, four w′ = 340, s′ = 90, ρcc = 0.02:
    // (1 − 4·340²/(6·400·400)) (1 − 90/800)² / 0.98 = 0.5183333·0.78765625/0.98 = 0.4166005
    expect(manderEffectivenessRectangular(400, 400, [340, 340, 340, 340], 90, 0.02)).toBeCloseTo(0.4166005, 7);
  });

  it('is 1/(1 − ρcc) for zero clear spacings and touching hoops', () => {
    expect(manderEffectivenessRectangular(300, 500, [0, 0, 0, 0], 0, 0.02)).toBeCloseTo(1 / 0.98, 12);
  });
});

describe('lateral pressures and the confined strength', () => {
  const input: ConfinementInput = {
    hoopYieldStress: 400, hoopDiameter: 10, spacing: 100, coreWidth: 300, coreDepth: 500,
    legsX: 2, legsY: 3, clearSpacings: [130, 130, 230, 230, 130, 130, 230, 230], longitudinalRatio: 0.015,
  };
  const result = manderConfinement(input, 30, 0.002);
  const legArea = (Math.PI * 100) / 4;

  it('reads ρx from the legs running in x (legsY, crossing a cut parallel to y) over s·dc, and ρy from legsX over s·bc', () => {
    expect(result.rhoX).toBeCloseTo((3 * legArea) / (100 * 500), 12);
    expect(result.rhoY).toBeCloseTo((2 * legArea) / (100 * 300), 12);
    expect(result.volumetricRatio).toBeCloseTo(result.rhoX + result.rhoY, 15);
  });

  it('takes f′l = ke ρ fyh in each direction and uses the smaller one (conservative)', () => {
    expect(result.lateralPressureX).toBeCloseTo(result.effectiveness * result.rhoX * 400, 12);
    expect(result.lateralPressureY).toBeCloseTo(result.effectiveness * result.rhoY * 400, 12);
    expect(result.lateralPressure).toBe(Math.min(result.lateralPressureX, result.lateralPressureY));
    expect(result.confinedStrength).toBeCloseTo(30 * manderStrengthRatio(result.lateralPressure / 30), 12);
    expect(result.confinedStrength).toBeLessThan(30 * manderStrengthRatio(Math.max(result.lateralPressureX, result.lateralPressureY) / 30));
  });

  it('gives εcc = εco[1 + 5(f′cc/f′co − 1)] and εcu = 0.004 + 1.4 ρs fyh εsu/f′cc with εsu = 0.10 by default', () => {
    expect(result.confinedPeakStrain).toBeCloseTo(0.002 * (1 + 5 * (result.confinedStrength / 30 - 1)), 15);
    expect(result.crushingStrain).toBeCloseTo(0.004 + (1.4 * result.volumetricRatio * 400 * 0.1) / result.confinedStrength, 15);
    const tougher = manderConfinement({ ...input, hoopRuptureStrain: 0.15 }, 30, 0.002);
    expect(tougher.crushingStrain).toBeGreaterThan(result.crushingStrain);
  });

  it('evaluates the Priestley, Seible & Calvi (1996) ultimate strain', () => {
    // 0.004 + 1.4·0.01·420·0.12/40 = 0.004 + 0.01764
    expect(priestleyUltimateStrain(0.01, 420, 0.12, 40)).toBeCloseTo(0.02164, 12);
  });
});

describe('validateConfinementInput', () => {
  const good: ConfinementInput = {
    hoopYieldStress: 420, hoopDiameter: 10, spacing: 100, coreWidth: 300, coreDepth: 500,
    legsX: 2, legsY: 2, clearSpacings: [250, 250, 450, 450], longitudinalRatio: 0.02,
  };

  it('accepts a sound layout', () => {
    expect(validateConfinementInput(good, 'conf')).toEqual([]);
  });

  it('names every bad field with its value and range', () => {
    const diagnostics = validateConfinementInput({ ...good, hoopYieldStress: 150, legsX: 2.5, spacing: Number.NaN, clearSpacings: [100, -5, 100, 100] }, 'conf');
    const paths = diagnostics.map((d) => d.path);
    expect(paths).toEqual(expect.arrayContaining(['conf.hoopYieldStress', 'conf.legsX', 'conf.spacing', 'conf.clearSpacings[1]']));
    expect(diagnostics.find((d) => d.path === 'conf.hoopYieldStress')?.message).toMatch(/at least 200 MPa and at most 1000 MPa, got 150 MPa/);
    expect(diagnostics.find((d) => d.path === 'conf.legsX')?.code).toBe('must-be-integer');
  });

  it('needs four clear spacings for Mander, none for Modified Kent–Park', () => {
    expect(validateConfinementInput({ ...good, clearSpacings: [] }, 'conf').map((d) => d.code)).toEqual(['required']);
    expect(validateConfinementInput({ ...good, clearSpacings: [] }, 'conf', false)).toEqual([]);
  });

  it('rejects hoops so far apart that ke is not positive, and spacing not above the bar diameter', () => {
    expect(validateConfinementInput({ ...good, spacing: 700, coreWidth: 300 }, 'conf').map((d) => d.code)).toEqual(['inconsistent']);
    expect(validateConfinementInput({ ...good, spacing: 8 }, 'conf').map((d) => d.path)).toEqual(['conf.spacing']);
  });

  it('rejects clear spacings longer than the core perimeter', () => {
    expect(validateConfinementInput({ ...good, clearSpacings: [900, 900, 100, 100] }, 'conf').map((d) => d.path)).toContain('conf.clearSpacings');
  });
});
