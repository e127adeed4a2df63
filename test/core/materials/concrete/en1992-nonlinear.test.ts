import { describe, expect, it } from 'vitest';
import { en1992NonlinearCompression, en1992NonlinearK, validateEn1992NonlinearParameters } from '../../../../core/materials/concrete/en1992-nonlinear.ts';
import { en1992ConcreteProperties } from '../../../../core/materials/code/en1992.ts';
import { rightSlope, sampledMaximum } from '../support.ts';

// EN 1992-1-1 3.1.5 Eq. (3.14): σc/fcm = (kη − η²)/(1 + (k − 2)η), η = εc/εc1, k = 1.05 Ecm εc1/fcm.
describe('EN 1992-1-1 Eq. (3.14) for C30/37', () => {
  const t = en1992ConcreteProperties(30);
  const p = { meanStrength: t.fcm, elasticModulus: t.Ecm, peakStrain: t.epsC1, crushingStrain: t.epsCu1 };
  const law = en1992NonlinearCompression(p);
  const k = (1.05 * t.Ecm * t.epsC1) / t.fcm;

  it('computes k = 1.05 Ecm εc1/fcm', () => {
    expect(en1992NonlinearK(p)).toBeCloseTo(k, 14);
    expect(k).toBeGreaterThan(1.9);
    expect(k).toBeLessThan(2.0);
  });

  it('matches Eq. (3.14) at several strains', () => {
    for (const strain of [0.0005, 0.001, 0.002, 0.003, 0.0035]) {
      const eta = strain / t.epsC1;
      expect(law.stress(strain)).toBeCloseTo((t.fcm * (k * eta - eta * eta)) / (1 + (k - 2) * eta), 10);
    }
  });

  it('peaks at fcm = 38 MPa at εc1, with the initial tangent 1.05 Ecm', () => {
    expect(law.stress(t.epsC1)).toBeCloseTo(38, 10);
    expect(sampledMaximum((e) => law.stress(e), 0, t.epsCu1).x).toBeCloseTo(t.epsC1, 5);
    expect(law.initialModulus).toBeCloseTo(1.05 * t.Ecm, 6);
    expect(rightSlope((e) => law.stress(e), 0) / (1.05 * t.Ecm)).toBeCloseTo(1, 4);
  });

  it('is defined up to εcu1 = 3.5 ‰ only', () => {
    expect(law.stress(0.0035)).toBeGreaterThan(0);
    expect(law.stress(0.00351)).toBe(0);
    expect(law.breakpoints).toEqual([0.0035]);
  });

  it('C90/105: εcu1 = εc1 = 2.8 ‰ (Table 3.1), so the curve ends at its peak without a descending branch', () => {
    const t90 = en1992ConcreteProperties(90);
    expect(t90.epsCu1).toBeCloseTo(t90.epsC1, 15);
    const brittle = en1992NonlinearCompression({ meanStrength: t90.fcm, elasticModulus: t90.Ecm, peakStrain: t90.epsC1, crushingStrain: t90.epsCu1 });
    expect(brittle.stress(0.0028)).toBeCloseTo(98, 9);
    expect(brittle.stress(0.00281)).toBe(0);
    expect(validateEn1992NonlinearParameters({ ...p, crushingStrain: 0.002 }).map((d) => d.path)).toEqual(['crushingStrain']);
  });

  it('rejects an Ecm so low that the curve would turn negative before εcu1', () => {
    const diagnostics = validateEn1992NonlinearParameters({ ...p, elasticModulus: 15_000 }, 'c');
    expect(diagnostics.map((d) => d.path)).toEqual(['c.elasticModulus']);
    expect(diagnostics[0]?.message).toMatch(/k = 1\.05 Ecm εc1\/fcm/);
  });
});
