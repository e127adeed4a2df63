import { describe, expect, it } from 'vitest';
import { InputError } from '../../../../core/diagnostics.ts';
import {
  manderConfinedCompression,
  manderConfinedFromHoops,
  manderElasticModulus,
  manderUnconfinedCompression,
  validateManderUnconfinedParameters,
  validateManderConfinedParameters,
} from '../../../../core/materials/concrete/mander.ts';
import { jumpAt, rightSlope, sampledMaximum } from '../support.ts';

// Mander, Priestley & Park (1988), J. Struct. Eng. 114(8): σ = f′c x r/(r − 1 + x^r), x = ε/εc, r = Ec/(Ec − Esec).
function manderFormula(peak: number, peakStrain: number, Ec: number, strain: number): number {
  const r = Ec / (Ec - peak / peakStrain);
  const x = strain / peakStrain;
  return (peak * x * r) / (r - 1 + x ** r);
}

describe('Mander (1988) unconfined cover', () => {
  const fco = 30;
  const Ec = 5000 * Math.sqrt(fco); // Mander et al. (1988) default Ec = 5000 √f′co
  const law = manderUnconfinedCompression({ compressiveStrength: fco, crushingStrain: 0.004 });

  it('uses Ec = 5000 √f′co by default', () => {
    expect(manderElasticModulus(30)).toBeCloseTo(27386.1, 1);
    expect(law.initialModulus).toBeCloseTo(Ec, 8);
    expect(rightSlope((e) => law.stress(e), 0) / Ec).toBeCloseTo(1, 4);
  });

  it('follows the published curve up to 2εco and peaks at f′co at εco = 0.002', () => {
    for (const strain of [0.0005, 0.001, 0.002, 0.003, 0.004]) {
      expect(law.stress(strain)).toBeCloseTo(manderFormula(fco, 0.002, Ec, strain), 10);
    }
    expect(law.stress(0.002)).toBeCloseTo(30, 10);
    const max = sampledMaximum((e) => law.stress(e), 0, 0.005);
    expect(max.x).toBeCloseTo(0.002, 5);
  });

  it('falls on a straight line from 2εco to zero at the spalling strain εsp = 0.005', () => {
    const at4 = manderFormula(fco, 0.002, Ec, 0.004);
    expect(law.stress(0.0045)).toBeCloseTo(at4 / 2, 10);
    expect(law.stress(0.005)).toBeCloseTo(0, 10);
    expect(law.stress(0.0051)).toBe(0);
    expect(jumpAt((e) => law.stress(e), 0.004)).toBeLessThan(1e-6);
    expect(law.breakpoints).toEqual([0.002, 0.004, 0.005]);
  });

  it('keeps the section crushing strain separate from the spalling strain', () => {
    expect(law.crushingStrain).toBe(0.004);
    const later = manderUnconfinedCompression({ compressiveStrength: fco, spallingStrain: 0.006, crushingStrain: 0.003 });
    expect(later.stress(0.0055)).toBeGreaterThan(0);
  });

  it('rejects Ec not above the secant modulus f′co/εco (r would not be positive)', () => {
    // f′co = 100 MPa: 5000·√100 = 50 000 MPa = 100/0.002
    const diagnostics = validateManderUnconfinedParameters({ compressiveStrength: 100, crushingStrain: 0.003 }, 'c');
    expect(diagnostics.map((d) => d.path)).toEqual(['c.elasticModulus']);
    expect(diagnostics[0]?.message).toMatch(/secant modulus/);
    expect(() => manderUnconfinedCompression({ compressiveStrength: 100, crushingStrain: 0.003 })).toThrow(InputError);
  });

  it('cuts the curve at εsp when the cover spalls before 2εco', () => {
    const early = manderUnconfinedCompression({ compressiveStrength: 60, elasticModulus: 36_000, peakStrain: 0.0027, crushingStrain: 0.0035 });
    expect(early.stress(0.005)).toBeCloseTo(manderFormula(60, 0.0027, 36_000, 0.005), 10);
    expect(early.stress(0.00501)).toBe(0);
    expect(early.breakpoints).toEqual([0.0027, 0.005]);
  });

  it('rejects εsp not beyond εco and a crushing strain beyond εsp', () => {
    const paths = validateManderUnconfinedParameters({ compressiveStrength: 30, spallingStrain: 0.003, crushingStrain: 0.0031 }).map((d) => d.path);
    expect(paths).toEqual(['crushingStrain']);
    const low = validateManderUnconfinedParameters({ compressiveStrength: 30, peakStrain: 0.003, spallingStrain: 0.003, crushingStrain: 0.003 }).map((d) => d.path);
    expect(low).toEqual(['spallingStrain']);
  });
});

describe('Mander (1988) confined core', () => {
  const fco = 30;
  const Ec = 5000 * Math.sqrt(fco);
  const fcc = 45;
  const epsCc = 0.002 * (1 + 5 * (45 / 30 - 1)); // εcc = εco[1 + 5(f′cc/f′co − 1)] = 0.007
  const law = manderConfinedCompression({ compressiveStrength: fco, confinedStrength: fcc, crushingStrain: 0.025 });

  it('peaks at f′cc at εcc = εco[1 + 5(f′cc/f′co − 1)]', () => {
    expect(law.peakStrain).toBeCloseTo(0.007, 15);
    expect(law.stress(epsCc)).toBeCloseTo(45, 10);
    const max = sampledMaximum((e) => law.stress(e), 0, 0.025, 5000);
    expect(max.x).toBeCloseTo(epsCc, 4);
    expect(law.confined).toBe(true);
  });

  it('follows the published curve with r = Ec/(Ec − f′cc/εcc) up to εcu, zero beyond', () => {
    for (const strain of [0.001, 0.004, 0.007, 0.012, 0.02, 0.025]) {
      expect(law.stress(strain)).toBeCloseTo(manderFormula(fcc, epsCc, Ec, strain), 10);
    }
    expect(law.stress(0.02501)).toBe(0);
    expect(law.breakpoints).toEqual([epsCc, 0.025]);
  });

  it('rejects f′cc below f′co and εcu not beyond εcc', () => {
    expect(validateManderConfinedParameters({ compressiveStrength: 30, confinedStrength: 25, crushingStrain: 0.02 }).map((d) => d.path)).toEqual(['confinedStrength']);
    expect(validateManderConfinedParameters({ compressiveStrength: 30, confinedStrength: 45, crushingStrain: 0.006 }).map((d) => d.path)).toEqual(['crushingStrain']);
  });

  it('builds straight from a hoop layout, with a stronger and more ductile core than the cover', () => {
    const { law: core, confinement } = manderConfinedFromHoops(
      { compressiveStrength: 30 },
      { hoopYieldStress: 420, hoopDiameter: 12, spacing: 100, coreWidth: 300, coreDepth: 500, legsX: 2, legsY: 2, clearSpacings: [120, 120, 220, 220, 120, 120, 220, 220], longitudinalRatio: 0.02 },
    );
    expect(core.peakStress).toBeCloseTo(confinement.confinedStrength, 12);
    expect(core.peakStress).toBeGreaterThan(30);
    expect(core.crushingStrain).toBeCloseTo(confinement.crushingStrain, 15);
    expect(core.crushingStrain).toBeGreaterThan(0.01);
  });
});
