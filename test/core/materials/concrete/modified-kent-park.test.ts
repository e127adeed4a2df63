import { describe, expect, it } from 'vitest';
import { InputError } from '../../../../core/diagnostics.ts';
import {
  modifiedKentParkCompression,
  modifiedKentParkConstants,
  modifiedKentParkEps50u,
  modifiedKentParkUltimateStrain,
  validateModifiedKentParkParameters,
} from '../../../../core/materials/concrete/modified-kent-park.ts';
import { jumpAt } from '../support.ts';

// Scott, Park & Priestley (1982), ACI Journal 79(1): K = 1 + ρs fyh/f′c, ε0 = 0.002K,
// Zm = 0.5/(ε50u + ε50h − 0.002K), ε50u = (3 + 0.29f′c)/(145f′c − 1000), ε50h = 0.75ρs√(h″/sh),
// residual 0.2Kf′c, εcu = 0.004 + 0.9ρs(fyh/300). Hand calculations below.

describe('Modified Kent–Park, unconfined (ρs = 0)', () => {
  const law = modifiedKentParkCompression({ compressiveStrength: 30 });
  // ε50u = (3 + 8.7)/(4350 − 1000) = 0.0034925; Zm = 0.5/(0.0034925 − 0.002) = 335.0
  const eps50u = 11.7 / 3350;
  const Zm = 0.5 / (eps50u - 0.002);

  it('computes ε50u and Zm as published', () => {
    expect(modifiedKentParkEps50u(30)).toBeCloseTo(0.0034925, 7);
    expect(modifiedKentParkConstants({ compressiveStrength: 30 }).Zm).toBeCloseTo(335.0, 1);
  });

  it('rises as the parabola to f′c at 0.002, then falls with slope Zm', () => {
    expect(law.stress(0.001)).toBeCloseTo(30 * (2 * 0.5 - 0.25), 10);
    expect(law.stress(0.002)).toBeCloseTo(30, 10);
    expect(law.stress(0.003)).toBeCloseTo(30 * (1 - Zm * 0.001), 10);
    expect(law.peakStrain).toBe(0.002);
    expect(law.confined).toBe(false);
  });

  it('ends at εcu = 0.004 (cover spalls), before reaching the residual 0.2 f′c', () => {
    expect(law.crushingStrain).toBeCloseTo(0.004, 15);
    expect(law.stress(0.004)).toBeCloseTo(30 * (1 - Zm * 0.002), 9);
    expect(law.stress(0.0041)).toBe(0);
    expect(law.breakpoints).toEqual([0.002, 0.004]);
  });

  it('has the initial tangent 2K f′c/ε0 = 1000 f′c', () => {
    expect(law.initialModulus).toBeCloseTo(30_000, 6);
  });
});

describe('Modified Kent–Park, confined core', () => {
  // ρs = 0.01, fyh = 300 MPa, h″ = 150 mm, sh = 300 mm:
  // K = 1.1, ε0 = 0.0022, ε50h = 0.75·0.01·√0.5 = 0.0053033, Zm = 0.5/(0.0034925 + 0.0053033 − 0.0022) = 75.81,
  // residual from 0.0022 + 0.8/75.81 = 0.012753, εcu = 0.004 + 0.9·0.01·1 = 0.013.
  const parameters = { compressiveStrength: 30, volumetricRatio: 0.01, hoopYieldStress: 300, coreWidth: 150, hoopSpacing: 300 };
  const law = modifiedKentParkCompression(parameters);
  const c = modifiedKentParkConstants(parameters);

  it('raises strength and strain at peak by K = 1 + ρs fyh/f′c', () => {
    expect(c.K).toBeCloseTo(1.1, 12);
    expect(law.peakStress).toBeCloseTo(33, 10);
    expect(law.peakStrain).toBeCloseTo(0.0022, 12);
    expect(law.stress(0.0022)).toBeCloseTo(33, 10);
    expect(law.confined).toBe(true);
  });

  it('uses ε50h = 0.75 ρs √(h″/sh) in the slope Zm', () => {
    expect(c.eps50h).toBeCloseTo(0.0053033, 7);
    expect(c.Zm).toBeCloseTo(75.81, 2);
    expect(law.stress(0.006)).toBeCloseTo(33 * (1 - c.Zm * (0.006 - 0.0022)), 9);
  });

  it('holds the residual 0.2 K f′c from ε20 to εcu = 0.004 + 0.9ρs(fyh/300)', () => {
    expect(c.residualStrain).toBeCloseTo(0.012753, 5);
    expect(law.crushingStrain).toBeCloseTo(0.013, 12);
    expect(law.stress(0.0128)).toBeCloseTo(6.6, 10);
    expect(law.stress(0.013)).toBeCloseTo(6.6, 10);
    expect(law.stress(0.0131)).toBe(0);
    expect(jumpAt((e) => law.stress(e), c.residualStrain)).toBeLessThan(1e-6);
    expect(law.breakpoints).toHaveLength(3);
    [0.0022, c.residualStrain, 0.013].forEach((b, i) => expect(law.breakpoints[i]).toBeCloseTo(b, 15));
  });

  it('gives the published ultimate-strain expression', () => {
    expect(modifiedKentParkUltimateStrain(0.02, 400)).toBeCloseTo(0.004 + 0.9 * 0.02 * (400 / 300), 15);
  });
});

describe('Modified Kent–Park validity', () => {
  it('needs 145 f′c > 1000 for ε50u', () => {
    const diagnostics = validateModifiedKentParkParameters({ compressiveStrength: 6.5 }, 'm');
    expect(diagnostics).toHaveLength(1);
    expect(diagnostics[0]?.path).toBe('m.compressiveStrength');
    expect(diagnostics[0]?.message).toMatch(/145 f′c > 1000/);
    expect(diagnostics[0]?.message).toMatch(/got 6\.5 MPa/);
    expect(() => modifiedKentParkCompression({ compressiveStrength: 6.5 })).toThrow(InputError);
  });

  it('asks for the hoop data when ρs > 0', () => {
    const paths = validateModifiedKentParkParameters({ compressiveStrength: 30, volumetricRatio: 0.01 }).map((d) => d.path);
    expect(paths.sort()).toEqual(['coreWidth', 'hoopSpacing', 'hoopYieldStress']);
  });

  it('rejects a crushing strain below the strain at peak', () => {
    const diagnostics = validateModifiedKentParkParameters({ compressiveStrength: 30, crushingStrain: 0.0015 });
    expect(diagnostics.map((d) => d.code)).toEqual(['inconsistent']);
  });
});
