import { describe, expect, it } from 'vitest';
import { en1992ConcreteProperties, en1992FlexuralTensileStrength, EN1992_STEEL_MODULUS } from '../../core/materials/code/en1992.ts';

/**
 * EN 1992-1-1:2004 Table 3.1, strength and deformation characteristics for concrete.
 * The printed values below were transcribed from memory of the table; check against the document.
 * Tolerance: the table rounds each value to its printed precision (1 MPa for fcm, 0.1 MPa, 1 GPa, 0.1 ‰;
 * a few entries to the nearest 0.05, e.g. εc1 of C50/60, 0.7·58^0.31 = 2.465 ‰, printed 2.45 ‰), so a
 * formula value must lie within half a printed unit. The fctk
 * columns appear to be 0.7 and 1.3 times the ROUNDED fctm (C60/75: 0.7·4.35 = 3.05, printed 3.1 = 0.7·4.4
 * rounded), so they get an extra 0.7·0.05 and 1.3·0.05.
 */
const classes = [12, 16, 20, 25, 30, 35, 40, 45, 50, 55, 60, 70, 80, 90] as const;
const table = {
  fcm: [20, 24, 28, 33, 38, 43, 48, 53, 58, 63, 68, 78, 88, 98],
  fctm: [1.6, 1.9, 2.2, 2.6, 2.9, 3.2, 3.5, 3.8, 4.1, 4.2, 4.4, 4.6, 4.8, 5.0],
  fctk005: [1.1, 1.3, 1.5, 1.8, 2.0, 2.2, 2.5, 2.7, 2.9, 3.0, 3.1, 3.2, 3.4, 3.5],
  fctk095: [2.0, 2.5, 2.9, 3.3, 3.8, 4.2, 4.6, 4.9, 5.3, 5.5, 5.7, 6.0, 6.3, 6.6],
  EcmGPa: [27, 29, 30, 31, 33, 34, 35, 36, 37, 38, 39, 41, 42, 44],
  epsC1: [1.8, 1.9, 2.0, 2.1, 2.2, 2.25, 2.3, 2.4, 2.45, 2.5, 2.6, 2.7, 2.8, 2.8],
  epsCu1: [3.5, 3.5, 3.5, 3.5, 3.5, 3.5, 3.5, 3.5, 3.5, 3.2, 3.0, 2.8, 2.8, 2.8],
  epsC2: [2.0, 2.0, 2.0, 2.0, 2.0, 2.0, 2.0, 2.0, 2.0, 2.2, 2.3, 2.4, 2.5, 2.6],
  epsCu2: [3.5, 3.5, 3.5, 3.5, 3.5, 3.5, 3.5, 3.5, 3.5, 3.1, 2.9, 2.7, 2.6, 2.6],
  n: [2.0, 2.0, 2.0, 2.0, 2.0, 2.0, 2.0, 2.0, 2.0, 1.75, 1.6, 1.45, 1.4, 1.4],
} as const;

/**
 * Half a printed unit: `columnHalfUnit` for entries printed to the column's usual precision (1 MPa or 1 GPa
 * → 0.5; 0.1 → 0.05), 0.025 for entries printed with two decimals (2.25, 2.45, 1.75, 1.45: nearest 0.05).
 */
function halfUnit(printed: number, columnHalfUnit: number): number {
  const decimals = (String(printed).split('.')[1] ?? '').length;
  return decimals >= 2 ? 0.025 : columnHalfUnit;
}

function expectTableValue(computed: number, printed: number, columnHalfUnit: number, label: string, extra = 0): void {
  const tolerance = halfUnit(printed, columnHalfUnit) + extra;
  expect(Math.abs(computed - printed), `${label}: computed ${computed.toFixed(4)}, table ${printed}`).toBeLessThanOrEqual(tolerance);
}

describe('EN 1992-1-1 Table 3.1', () => {
  classes.forEach((fck, i) => {
    it(`C${fck}: fcm, fctm, fctk, Ecm, εc1, εcu1, εc2, εcu2, n match the printed row`, () => {
      const p = en1992ConcreteProperties(fck);
      expectTableValue(p.fcm, table.fcm[i] as number, 0.5, 'fcm');
      expectTableValue(p.fctm, table.fctm[i] as number, 0.05, 'fctm');
      expectTableValue(p.fctk005, table.fctk005[i] as number, 0.05, 'fctk,0.05', 0.7 * 0.05);
      expectTableValue(p.fctk095, table.fctk095[i] as number, 0.05, 'fctk,0.95', 1.3 * 0.05);
      expectTableValue(p.Ecm / 1000, table.EcmGPa[i] as number, 0.5, 'Ecm');
      expectTableValue(p.epsC1 * 1000, table.epsC1[i] as number, 0.05, 'εc1');
      expectTableValue(p.epsCu1 * 1000, table.epsCu1[i] as number, 0.05, 'εcu1');
      expectTableValue(p.epsC2 * 1000, table.epsC2[i] as number, 0.05, 'εc2');
      expectTableValue(p.epsCu2 * 1000, table.epsCu2[i] as number, 0.05, 'εcu2');
      expectTableValue(p.n, table.n[i] as number, 0.05, 'n');
    });
  });

  it('C30/37 as quoted in the brief: fcm 38, fctm 2.9, Ecm 33 GPa, εc1 2.2 ‰, εcu1 3.5 ‰', () => {
    const p = en1992ConcreteProperties(30);
    expect(p.fcm).toBe(38);
    expect(p.fctm).toBeCloseTo(2.896, 3); // 0.30·30^(2/3)
    expect(p.Ecm).toBeCloseTo(32_837, 0); // 22·(3.8)^0.3 GPa
    expect(p.epsC1).toBeCloseTo(0.0021619, 7); // 0.7·38^0.31 ‰
    expect(p.epsCu1).toBe(0.0035);
  });

  it('fctm changes formula above C50/60 without a visible step (4.07 against 4.06 MPa at fck = 50)', () => {
    expect(0.3 * 50 ** (2 / 3)).toBeCloseTo(4.072, 3);
    expect(2.12 * Math.log(1 + 58 / 10)).toBeCloseTo(4.064, 3);
    expect(en1992ConcreteProperties(50.0001).fctm).toBeCloseTo(en1992ConcreteProperties(50).fctm, 1);
  });

  it('εc1 is capped at 2.8 ‰ (C90: 0.7·98^0.31 = 2.90 ‰ → 2.8 ‰)', () => {
    expect(en1992ConcreteProperties(90).epsC1).toBe(0.0028);
  });
});

describe('EN 1992-1-1 Eq. (3.23): fctm,fl = max{(1.6 − h/1000) fctm; fctm}', () => {
  it('a 200 mm slab of C30/37 gets 1.4 fctm, a member 600 mm or deeper gets fctm', () => {
    const fctm = en1992ConcreteProperties(30).fctm;
    expect(en1992FlexuralTensileStrength(30, 200)).toBeCloseTo(1.4 * fctm, 12);
    expect(en1992FlexuralTensileStrength(30, 600)).toBeCloseTo(fctm, 12);
    expect(en1992FlexuralTensileStrength(30, 900)).toBeCloseTo(fctm, 12);
  });
});

describe('EN 1992-1-1 3.2.7(4)', () => {
  it('Es = 200 GPa', () => {
    expect(EN1992_STEEL_MODULUS).toBe(200_000);
  });
});
