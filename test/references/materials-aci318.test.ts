import { describe, expect, it } from 'vitest';
import {
  ACI_CRUSHING_STRAIN,
  ACI_STEEL_MODULUS,
  ACI_STRESS_BLOCK_INTENSITY,
  aciElasticModulus,
  aciElasticModulusFromDensity,
  aciModulusOfRupture,
  aciStressBlockDepthFactor,
} from '../../core/materials/code/aci318.ts';
import { convertUnit } from '../../core/units/convert.ts';

const psiToMPa = (psi: number): number => convertUnit(psi, 'psi', 'MPa');

describe('ACI 318-19 Eq. 19.2.2.1.b: Ec = 4700√f′c MPa = 57 000√f′c psi', () => {
  it('the SI and US forms agree within 1 % after conversion (57 000·√0.006 894 757 = 4733)', () => {
    for (const fcPsi of [2500, 4000, 5000, 8000, 12000]) {
      const us = psiToMPa(57_000 * Math.sqrt(fcPsi));
      const si = aciElasticModulus(psiToMPa(fcPsi));
      expect(Math.abs(us / si - 1)).toBeLessThan(0.01);
    }
  });

  it('f′c = 4000 psi gives 3605 ksi (US form) and 24 680 MPa (SI form)', () => {
    expect(57_000 * Math.sqrt(4000) / 1000).toBeCloseTo(3605, 0);
    expect(aciElasticModulus(psiToMPa(4000))).toBeCloseTo(24_682, 0);
  });
});

describe('ACI 318-19 Eq. 19.2.2.1.a: Ec = wc^1.5·0.043√f′c MPa', () => {
  it('reduces to about 4700√f′c for normal-weight concrete (wc ≈ 2300 kg/m³)', () => {
    // 2300^1.5·0.043 = 4743 // ACI 318-19 R19.2.2.1 explains (b) as the normal-weight simplification
    expect(aciElasticModulusFromDensity(2300, 30) / aciElasticModulus(30)).toBeCloseTo(1.009, 3);
  });
});

describe('ACI 318-19 Eq. 19.2.3.1: fr = 0.62λ√f′c MPa = 7.5λ√f′c psi', () => {
  it('the SI and US forms agree within 0.5 %', () => {
    for (const fcPsi of [3000, 4000, 6000, 10000]) {
      const us = psiToMPa(7.5 * Math.sqrt(fcPsi));
      const si = aciModulusOfRupture(psiToMPa(fcPsi));
      expect(Math.abs(us / si - 1)).toBeLessThan(0.005);
    }
  });

  it('λ scales fr (all-lightweight λ = 0.75, ACI 318-19 Table 19.2.4.1(a))', () => {
    expect(aciModulusOfRupture(30, 0.75)).toBeCloseTo(0.75 * 0.62 * Math.sqrt(30), 12);
    expect(aciModulusOfRupture(30)).toBeCloseTo(3.396, 3);
  });
});

describe('ACI 318-19 Table 22.2.2.4.3: β1', () => {
  it.each([
    [17, 0.85],
    [28, 0.85],
    [35, 0.80],
    [42, 0.75],
    [49, 0.70],
    [54.9, 0.85 - (0.05 * 26.9) / 7],
    [55, 0.65],
    [80, 0.65],
  ])('f′c = %d MPa → β1 = %d', (fc, beta1) => {
    expect(aciStressBlockDepthFactor(fc)).toBeCloseTo(beta1, 12);
  });

  it('the psi form (0.85 − 0.05(f′c − 4000)/1000) gives the same at 5000 psi (34.47 MPa): 0.80 against 0.804', () => {
    expect(aciStressBlockDepthFactor(psiToMPa(5000))).toBeCloseTo(0.804, 3);
  });
});

describe('ACI 318-19 fixed values', () => {
  it('Es = 200 000 MPa (20.2.2.2), εcu = 0.003 (22.2.2.1), stress block 0.85 f′c (22.2.2.4.1)', () => {
    expect(ACI_STEEL_MODULUS).toBe(200_000);
    expect(ACI_CRUSHING_STRAIN).toBe(0.003);
    expect(ACI_STRESS_BLOCK_INTENSITY).toBe(0.85);
  });
});
