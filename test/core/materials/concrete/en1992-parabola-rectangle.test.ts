import { describe, expect, it } from 'vitest';
import { en1992ParabolaRectangleCompression, validateEn1992ParabolaRectangleParameters } from '../../../../core/materials/concrete/en1992-parabola-rectangle.ts';
import { jumpAt } from '../support.ts';

// EN 1992-1-1 3.1.7 Eqs. (3.17)–(3.18) with Table 3.1 n, εc2, εcu2.
describe('EN 1992-1-1 parabola–rectangle', () => {
  it('C30/37 with fck: n = 2, εc2 = 2 ‰, εcu2 = 3.5 ‰', () => {
    const law = en1992ParabolaRectangleCompression({ strength: 30 });
    expect(law.stress(0.001)).toBeCloseTo(30 * (1 - 0.5 ** 2), 12); // Eq. (3.17)
    expect(law.stress(0.002)).toBeCloseTo(30, 12);
    expect(law.stress(0.003)).toBe(30); // Eq. (3.18)
    expect(law.stress(0.0035)).toBe(30);
    expect(law.stress(0.00351)).toBe(0);
    expect(law.breakpoints).toEqual([0.002, 0.0035]);
    expect(law.initialModulus).toBeCloseTo(30_000, 8);
    expect(jumpAt((e) => law.stress(e), 0.002)).toBeLessThan(1e-6);
  });

  it('design strength: fcd = αcc fck/γc = 1.0·30/1.5 = 20 MPa with the C30 shape', () => {
    // EN 1992-1-1 3.1.6(1) Eq. (3.15), αcc = 1.0 (recommended), γc = 1.5 (Table 2.1N)
    const law = en1992ParabolaRectangleCompression({ strength: 20, characteristicStrength: 30 });
    expect(law.peakStress).toBe(20);
    expect(law.stress(0.001)).toBeCloseTo(15, 12);
  });

  it('C70/85: n = 1.4 + 23.4[(90 − 70)/100]⁴, εc2 = 2.0 + 0.085·20^0.53 ‰, εcu2 = 2.6 + 35·0.2⁴ ‰', () => {
    const law = en1992ParabolaRectangleCompression({ strength: 70 });
    const n = 1.4 + 23.4 * 0.2 ** 4;
    const epsC2 = (2.0 + 0.085 * 20 ** 0.53) / 1000;
    const epsCu2 = (2.6 + 35 * 0.2 ** 4) / 1000;
    expect(law.peakStrain).toBeCloseTo(epsC2, 15);
    expect(law.crushingStrain).toBeCloseTo(epsCu2, 15);
    expect(law.stress(epsC2 / 2)).toBeCloseTo(70 * (1 - 0.5 ** n), 10);
    expect(law.stress(epsCu2)).toBe(70);
  });

  it('C90/105: the Table 3.1 expressions put εc2 (2.6005 ‰) above εcu2 (2.6000 ‰); εc2 is limited to εcu2', () => {
    expect(2.0 + 0.085 * 40 ** 0.53).toBeGreaterThan(2.6);
    const law = en1992ParabolaRectangleCompression({ strength: 90 });
    expect(law.peakStrain).toBeCloseTo(0.0026, 15);
    expect(law.crushingStrain).toBeCloseTo(0.0026, 15);
    expect(law.stress(0.0026)).toBeCloseTo(90, 10);
  });

  it('rejects fck above Table 3.1 and εcu2 below εc2', () => {
    expect(validateEn1992ParabolaRectangleParameters({ strength: 95 }).map((d) => d.path)).toEqual(['characteristicStrength']);
    expect(validateEn1992ParabolaRectangleParameters({ strength: 30, crushingStrain: 0.0015 }).map((d) => d.code)).toEqual(['inconsistent']);
  });
});
