import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { formatFixed, formatNumber, formatQuantity, formatStrain, NOT_A_VALUE } from '../../../core/units/format.ts';
import { QUANTITY_NAMES, UNIT_SYSTEMS } from '../../../core/units/quantities.ts';

describe('formatNumber', () => {
  it.each([
    [123.456, 3, '123'],
    [12345.6, 3, '12300'],
    [0.00123456, 3, '0.00123'],
    [2, 3, '2.00'],
    [9.996, 3, '10.0'],
    [-45.678, 4, '-45.68'],
    [1234.5, 4, '1235'],
    [0.5, 1, '0.5'],
  ])('%d to %i significant figures is %s', (value, figures, expected) => {
    expect(formatNumber(value, figures)).toBe(expected);
  });

  it('engineering figures: four when the leading digit is 1, otherwise three', () => {
    // common practice, no source
    expect(formatNumber(1.23456)).toBe('1.235');
    expect(formatNumber(2.34567)).toBe('2.35');
    expect(formatNumber(987.65)).toBe('988');
    expect(formatNumber(0.99996)).toBe('1.000');
    expect(formatNumber(151.26)).toBe('151.3');
  });

  it('prints zero as 0 and never as -0', () => {
    expect(formatNumber(0, 3)).toBe('0');
    expect(formatNumber(-0, 3)).toBe('0');
    expect(formatFixed(-0.001, 1)).toBe('0.0');
    expect(formatFixed(-0, 2)).toBe('0.00');
    expect(formatFixed(-0.06, 1)).toBe('-0.1');
  });

  it('prints an em dash for NaN and ±Infinity', () => {
    for (const bad of [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY]) {
      expect(formatNumber(bad, 3)).toBe(NOT_A_VALUE);
      expect(formatFixed(bad, 2)).toBe(NOT_A_VALUE);
    }
    expect(NOT_A_VALUE).toBe('—');
  });

  it('uses exponent notation only for extreme magnitudes', () => {
    expect(formatNumber(1.234e-9, 3)).toBe('1.23e-9');
    expect(formatNumber(-5.6e20, 2)).toBe('-5.6e20');
    expect(formatNumber(1e-7, 3)).toBe('0.000000100');
  });

  it('groups thousands on request', () => {
    expect(formatNumber(1234567.8, 7, { thousandsSeparator: ',' })).toBe('1,234,568');
    expect(formatNumber(-25400, 3, { thousandsSeparator: '\u2009' })).toBe('-25\u2009400');
    expect(formatNumber(999, 3, { thousandsSeparator: ',' })).toBe('999');
    expect(formatFixed(12345.678, 2, { thousandsSeparator: ',' })).toBe('12,345.68');
  });

  it('clamps the count of figures to 1–15', () => {
    expect(formatNumber(3.14159, 0)).toBe('3');
    expect(formatNumber(3.14159, 40)).toBe('3.14159000000000');
    expect(formatNumber(3.14159, Number.NaN)).toBe('3.14');
  });

  it('never prints NaN, Infinity or -0, and reads back within the rounding (property)', () => {
    fc.assert(
      fc.property(fc.oneof(fc.double({ min: -1e300, max: 1e300 }), fc.constantFrom(Number.NaN, Infinity, -Infinity, -0)), fc.integer({ min: 1, max: 15 }), (value, figures) => {
        const text = formatNumber(value, figures);
        if (/NaN|Infinity/.test(text) || /^-0(\.0*)?$/.test(text)) return false;
        if (!Number.isFinite(value)) return text === NOT_A_VALUE;
        const back = Number(text);
        return Math.abs(back - value) <= 0.5 * 10 ** (1 - figures) * Math.abs(value) * 1.0000001 + Number.MIN_VALUE;
      }),
      { numRuns: 2000 },
    );
  });
});

describe('formatQuantity', () => {
  it('converts and labels: 150.0 kN·m, 110.6 kip·ft, 1328 kip·in', () => {
    expect(formatQuantity('moment', 1.5e8, 'SI')).toBe('150.0 kN·m');
    expect(formatQuantity('moment', 1.5e8, 'US')).toBe('110.6 kip·ft');
    expect(formatQuantity('moment', 1.5e8, 'US', { unit: 'kip.in' })).toBe('1328 kip·in');
  });

  it('shows concrete strength in psi and steel stress in ksi under US units', () => {
    expect(formatQuantity('concreteStress', 27.579, 'US')).toBe('4000 psi');
    expect(formatQuantity('stress', 420, 'US')).toBe('60.9 ksi');
  });

  it('fixed decimals for deflections, with or without the unit', () => {
    expect(formatQuantity('deflection', 12.345, 'SI', { decimals: 1 })).toBe('12.3 mm');
    expect(formatQuantity('deflection', 12.7, 'US', { decimals: 2, withUnit: false })).toBe('0.50');
  });

  it('shows a value that is zero within round-off as zero (issue 10 item 5): never 4.40e-14 kip·ft', () => {
    // 4.40e-14 kip·ft = 5.97e-8 N·mm: what cancellation leaves of a support moment of order 1e9 N·mm
    expect(formatQuantity('moment', 4.4e-14 * 1_355_817.948, 'US')).toBe('0 kip·ft');
    expect(formatQuantity('moment', -3e-9, 'SI')).toBe('0 kN·m');
    expect(formatQuantity('deflection', 1e-12, 'SI', { decimals: 1 })).toBe('0.0 mm');
    expect(formatQuantity('force', -2e-9, 'US')).toBe('0 kip');
    // … while the smallest values a beam assessment meets are kept: 1 N·mm, a cracking curvature of 1e-7 1/mm
    expect(formatQuantity('moment', 1, 'SI', { unit: 'N.mm' })).toBe('1.000 N·mm');
    expect(formatQuantity('curvature', 1e-7, 'SI', { unit: 'per-mm' })).toBe('0.0000001000 1/mm');
  });

  it('prints the em dash alone for a non-finite value', () => {
    expect(formatQuantity('force', Number.NaN, 'SI')).toBe('—');
    expect(formatQuantity('force', Number.POSITIVE_INFINITY, 'US')).toBe('—');
  });

  it('never prints NaN or Infinity for any quantity and system (property)', () => {
    fc.assert(
      fc.property(fc.constantFrom(...QUANTITY_NAMES), fc.constantFrom(...UNIT_SYSTEMS), fc.double(), (name, system, value) => {
        const text = formatQuantity(name, value, system);
        return !/NaN|Infinity|undefined/.test(text) && !text.startsWith('-0 ');
      }),
      { numRuns: 1000 },
    );
  });
});

describe('formatStrain', () => {
  it('prints a strain plain, in per mille, percent or microstrain', () => {
    expect(formatStrain(0.0035)).toBe('0.00350');
    expect(formatStrain(0.0035, 'permille')).toBe('3.50 ‰');
    expect(formatStrain(-0.1, 'percent')).toBe('-10.00 %');
    expect(formatStrain(0.0035, 'microstrain')).toBe('3500 µε');
    expect(formatStrain(Number.NaN, 'permille')).toBe('—');
  });
});
