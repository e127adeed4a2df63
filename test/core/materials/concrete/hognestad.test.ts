import { describe, expect, it } from 'vitest';
import { InputError } from '../../../../core/diagnostics.ts';
import { hognestadCompression, validateHognestadParameters } from '../../../../core/materials/concrete/hognestad.ts';
import { jumpAt, rightSlope, sampledMaximum } from '../support.ts';

// Hognestad (1951), Bulletin 399: f″c = k f′c, ε0 = 2 f″c/Ec, parabola to ε0, straight line to 0.85 f″c at εcu = 0.0038.
const fc = 30;
const Ec = 4700 * Math.sqrt(fc); // ACI 318-19 Eq. 19.2.2.1.b
const fcc = 0.85 * fc;
const eps0 = (2 * fcc) / Ec;
const law = hognestadCompression({ compressiveStrength: fc, elasticModulus: Ec });

describe('Hognestad (1951) parabola with linear descent', () => {
  it('follows the parabola σ = f″c [2ε/ε0 − (ε/ε0)²] on the ascending branch', () => {
    for (const x of [0.1, 0.25, 0.5, 0.75, 0.9]) {
      expect(law.stress(x * eps0)).toBeCloseTo(fcc * (2 * x - x * x), 10);
    }
  });

  it('peaks at f″c = 0.85 f′c at ε0 = 2f″c/Ec, and the sampled maximum is there', () => {
    expect(law.peakStress).toBeCloseTo(25.5, 12);
    expect(law.peakStrain).toBeCloseTo(eps0, 15);
    expect(law.stress(eps0)).toBeCloseTo(25.5, 12);
    const max = sampledMaximum((e) => law.stress(e), 0, 0.0038);
    expect(max.value).toBeCloseTo(25.5, 5);
    expect(max.x).toBeCloseTo(eps0, 5);
  });

  it('falls linearly to 0.85 f″c at εcu = 0.0038, then carries nothing', () => {
    expect(law.stress(0.0038)).toBeCloseTo(0.85 * fcc, 10);
    const mid = (eps0 + 0.0038) / 2;
    expect(law.stress(mid)).toBeCloseTo(fcc * (1 - 0.075), 10);
    expect(law.stress(0.0038 + 1e-9)).toBe(0);
    expect(law.crushingStrain).toBe(0.0038);
  });

  it('starts with the tangent Ec and is continuous at ε0', () => {
    expect(rightSlope((e) => law.stress(e), 0) / Ec).toBeCloseTo(1, 4);
    expect(jumpAt((e) => law.stress(e), eps0)).toBeLessThan(1e-6);
    expect(law.initialModulus).toBeCloseTo(Ec, 8);
  });

  it('lists ε0 and εcu as breakpoints', () => {
    expect(law.breakpoints).toEqual([eps0, 0.0038]);
  });

  it('takes the peak factor and crushing strain from the caller; the descent keeps its published slope', () => {
    const custom = hognestadCompression({ compressiveStrength: fc, elasticModulus: Ec, peakFactor: 1, crushingStrain: 0.004 });
    const e0 = (2 * 30) / Ec;
    expect(custom.peakStress).toBe(30);
    // Hognestad (1951): σ = 0.85 f″c at ε = 0.0038, the line continued beyond it
    expect(custom.stress(0.0038)).toBeCloseTo(0.85 * 30, 10);
    expect(custom.stress(0.004)).toBeCloseTo(30 * (1 - (0.15 * (0.004 - e0)) / (0.0038 - e0)), 10);
    expect(custom.stress(0.00401)).toBe(0);
    // A shorter εcu cuts the same curve short.
    const short = hognestadCompression({ compressiveStrength: fc, elasticModulus: Ec, peakFactor: 1, crushingStrain: 0.003 });
    expect(short.stress(0.0029)).toBeCloseTo(custom.stress(0.0029), 12);
    expect(short.stress(0.0031)).toBe(0);
  });

  it('rejects a peak strain beyond the crushing strain, naming the fields', () => {
    // f′c = 120 MPa: ε0 = 2·102/51 486 = 0.00396 > 0.0038
    const diagnostics = validateHognestadParameters({ compressiveStrength: 120, elasticModulus: 4700 * Math.sqrt(120) }, 'm');
    expect(diagnostics.map((d) => d.path)).toEqual(['m.elasticModulus']);
    expect(diagnostics[0]?.message).toMatch(/ε0 = 2f″c\/Ec = 0\.00396.*0\.0038, the end of the published descent/);
    expect(() => hognestadCompression({ compressiveStrength: 120, elasticModulus: 4700 * Math.sqrt(120) })).toThrow(InputError);
  });

  it('reports every bad parameter at once', () => {
    const diagnostics = validateHognestadParameters({ compressiveStrength: Number.NaN, elasticModulus: -1, peakFactor: 1.2 });
    expect(diagnostics.map((d) => d.path).sort()).toEqual(['compressiveStrength', 'elasticModulus', 'peakFactor']);
    expect(diagnostics.find((d) => d.path === 'compressiveStrength')?.code).toBe('not-a-number');
  });
});
