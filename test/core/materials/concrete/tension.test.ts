import { describe, expect, it } from 'vitest';
import { BugError } from '../../../../core/diagnostics.ts';
import { linearBrittleTension, noTension, tensionStiffening, validateTensionParameters, vecchioCollinsCrackingStress } from '../../../../core/materials/concrete/tension.ts';

const fr = 0.62 * Math.sqrt(30); // ACI 318-19 Eq. 19.2.3.1
const Ec = 4700 * Math.sqrt(30); // ACI 318-19 Eq. 19.2.2.1.b
const epsCr = fr / Ec;

describe('no tension', () => {
  it('carries nothing at any tensile strain', () => {
    const law = noTension();
    for (const strain of [0, 1e-5, 1e-3, 1]) expect(law.stress(strain)).toBe(0);
    expect(law.tensileStrength).toBe(0);
    expect(law.crackingStrain).toBe(0);
    expect(law.breakpoints).toEqual([]);
  });
});

describe('linear-brittle tension', () => {
  const law = linearBrittleTension({ tensileStrength: fr, elasticModulus: Ec });

  it('is linear at Ec up to fr, then zero', () => {
    expect(law.stress(epsCr / 2)).toBeCloseTo(fr / 2, 12);
    expect(law.stress(epsCr)).toBeCloseTo(fr, 12);
    expect(law.stress(epsCr * 1.0001)).toBe(0);
    expect(law.crackingStrain).toBeCloseTo(epsCr, 15);
    expect(law.breakpoints).toEqual([epsCr]);
  });

  it('returns 0 for compressive (negative) input and throws on NaN', () => {
    expect(law.stress(-0.001)).toBe(0);
    expect(() => law.stress(Number.NaN)).toThrow(BugError);
  });
});

describe('tension stiffening (Vecchio & Collins 1986)', () => {
  const law = tensionStiffening({ tensileStrength: fr, elasticModulus: Ec });

  it('after cracking follows fcr/(1 + √(200 εt)) with the total strain', () => {
    for (const strain of [2 * epsCr, 0.0005, 0.001, 0.0016]) {
      expect(law.stress(strain)).toBeCloseTo(fr / (1 + Math.sqrt(200 * strain)), 12);
    }
    // at εt = 0.001 the concrete keeps 1/(1 + √0.2) = 69 % of fcr
    expect(law.stress(0.001) / fr).toBeCloseTo(0.691, 3);
  });

  it('is linear to fcr before cracking, and tapers linearly to zero between 0.8 and 1.0 of the end strain 0.005', () => {
    // the taper keeps the law continuous (common practice, no source)
    expect(law.stress(epsCr)).toBeCloseTo(fr, 12);
    expect(law.stress(0.0045)).toBeCloseTo((fr / (1 + Math.sqrt(200 * 0.0045))) * 0.5, 12);
    expect(law.stress(0.005)).toBe(0);
    expect(law.stress(0.00501)).toBe(0);
    expect(law.breakpoints).toEqual([epsCr, 0.004, 0.005]);
    // the taper starts beyond the yield strain of bars up to fy = 800 MPa (Es = 200 GPa): in a section their yield ends the stiffening first
    expect(law.breakpoints[1]!).toBeGreaterThanOrEqual(800 / 200_000);
  });

  it('is fed the direct cracking stress it was calibrated on, about half the modulus of rupture', () => {
    // Vecchio & Collins (1986): fcr = 0.33 √f′c, MPa (from memory); ACI 318-19 Eq. (19.2.3.1): fr = 0.62 λ √f′c
    expect(vecchioCollinsCrackingStress(30)).toBeCloseTo(0.33 * Math.sqrt(30), 12);
    expect(vecchioCollinsCrackingStress(30, 0.75)).toBeCloseTo(0.75 * 0.33 * Math.sqrt(30), 12);
    expect(vecchioCollinsCrackingStress(30) / (0.62 * Math.sqrt(30))).toBeCloseTo(0.532, 3);
  });

  it('takes c = 500 (Collins & Mitchell 1991, from memory) and another end strain from the caller', () => {
    const other = tensionStiffening({ tensileStrength: fr, elasticModulus: Ec, coefficient: 500, endStrain: 0.003 });
    expect(other.stress(0.0023)).toBeCloseTo(fr / (1 + Math.sqrt(500 * 0.0023)), 12);
    expect(other.stress(0.0031)).toBe(0);
  });

  it('rejects an end strain before cracking and bad numbers, naming each', () => {
    const paths = validateTensionParameters({ tensileStrength: fr, elasticModulus: Ec, endStrain: epsCr / 2 }).map((d) => d.path);
    expect(paths).toEqual(['endStrain']);
    const bad = validateTensionParameters({ tensileStrength: -1, elasticModulus: Number.POSITIVE_INFINITY, coefficient: 0 }).map((d) => d.path);
    expect(bad).toEqual(['tensileStrength', 'elasticModulus', 'coefficient']);
  });
});
