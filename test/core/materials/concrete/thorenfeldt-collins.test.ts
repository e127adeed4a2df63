import { describe, expect, it } from 'vitest';
import { thorenfeldtCollinsCompression, thorenfeldtCollinsConstants, validateThorenfeldtCollinsParameters } from '../../../../core/materials/concrete/thorenfeldt-collins.ts';
import { jumpAt, rightSlope, sampledMaximum } from '../support.ts';

// Thorenfeldt et al. (1987) with Collins & Mitchell (1991) constants (from memory):
// n = 0.8 + f′c/17, k = 1 (ε ≤ εc) or 0.67 + f′c/62 (ε > εc), εc = (f′c/Ec) n/(n − 1).
describe('Thorenfeldt–Collins', () => {
  const fc = 60;
  const Ec = 4700 * Math.sqrt(fc);
  const law = thorenfeldtCollinsCompression({ compressiveStrength: fc, elasticModulus: Ec, crushingStrain: 0.0035 });
  const n = 0.8 + 60 / 17;
  const k = 0.67 + 60 / 62;
  const epsC = ((fc / Ec) * n) / (n - 1);

  it('derives n, k and εc from f′c and Ec', () => {
    const c = thorenfeldtCollinsConstants(fc, Ec);
    expect(c.n).toBeCloseTo(4.32941, 5);
    expect(c.kDescending).toBeCloseTo(1.63774, 5);
    expect(c.peakStrain).toBeCloseTo(epsC, 15);
  });

  it('matches the expression with k = 1 before the peak and k = 0.67 + f′c/62 after it', () => {
    for (const strain of [0.0005, 0.001, 0.002]) {
      const x = strain / epsC;
      expect(law.stress(strain)).toBeCloseTo((fc * n * x) / (n - 1 + x ** n), 10);
    }
    for (const strain of [0.003, 0.0035]) {
      const x = strain / epsC;
      expect(law.stress(strain)).toBeCloseTo((fc * n * x) / (n - 1 + x ** (n * k)), 10);
    }
  });

  it('peaks at f′c at εc without a jump, and starts with the tangent Ec', () => {
    expect(law.stress(epsC)).toBeCloseTo(60, 10);
    expect(jumpAt((e) => law.stress(e), epsC)).toBeLessThan(1e-6);
    expect(sampledMaximum((e) => law.stress(e), 0, 0.0035).x).toBeCloseTo(epsC, 5);
    expect(rightSlope((e) => law.stress(e), 0) / Ec).toBeCloseTo(1, 4);
    expect(law.breakpoints).toEqual([epsC, 0.0035]);
  });

  it('keeps k ≥ 1 for low strengths (0.67 + 15/62 = 0.91 → 1)', () => {
    expect(thorenfeldtCollinsConstants(15, 20_000).kDescending).toBe(1);
  });

  it('rejects a crushing strain not beyond εc', () => {
    expect(validateThorenfeldtCollinsParameters({ compressiveStrength: fc, elasticModulus: Ec, crushingStrain: 0.002 }).map((d) => d.code)).toEqual(['inconsistent']);
  });
});
