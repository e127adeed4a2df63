import { describe, expect, it } from 'vitest';
import { popovicsCompression, popovicsExponent, validatePopovicsParameters } from '../../../../core/materials/concrete/popovics.ts';
import { rightSlope, sampledMaximum } from '../support.ts';

// Popovics (1973): σ = f′c (ε/εc) n/(n − 1 + (ε/εc)^n), n = Ec/(Ec − f′c/εc).
describe('Popovics (1973)', () => {
  const p = { compressiveStrength: 40, elasticModulus: 30_000, peakStrain: 0.0022, crushingStrain: 0.0035 };
  const law = popovicsCompression(p);
  const n = 30_000 / (30_000 - 40 / 0.0022); // = 2.5385

  it('uses n = Ec/(Ec − f′c/εc)', () => {
    expect(popovicsExponent(p)).toBeCloseTo(2.53846, 5);
  });

  it('matches the published expression at several strains', () => {
    for (const strain of [0.0005, 0.001, 0.0022, 0.003, 0.0035]) {
      const x = strain / 0.0022;
      expect(law.stress(strain)).toBeCloseTo((40 * x * n) / (n - 1 + x ** n), 10);
    }
  });

  it('peaks at f′c at εc, starts with the tangent Ec, ends at εcu', () => {
    expect(law.stress(0.0022)).toBeCloseTo(40, 10);
    expect(sampledMaximum((e) => law.stress(e), 0, 0.0035).x).toBeCloseTo(0.0022, 5);
    expect(rightSlope((e) => law.stress(e), 0) / 30_000).toBeCloseTo(1, 4);
    expect(law.stress(0.00351)).toBe(0);
    expect(law.breakpoints).toEqual([0.0035]);
  });

  it('rejects Ec not above f′c/εc (n ≤ 1) and εcu not above εc', () => {
    const diagnostics = validatePopovicsParameters({ ...p, elasticModulus: 18_000, crushingStrain: 0.002 }, 'c');
    expect(diagnostics.map((d) => d.path)).toEqual(['c.elasticModulus', 'c.crushingStrain']);
    expect(diagnostics[0]?.message).toMatch(/n = Ec\/\(Ec − f′c\/εc\)/);
  });
});
