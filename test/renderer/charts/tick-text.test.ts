/**
 * Tick texts of the app's charts: six significant figures at most, grouped thousands, exponent
 * form for very large and very small values; a text given again comes from the memo and is the
 * same as when first formatted.
 */
import { describe, expect, it } from 'vitest';
import { tickText } from '../../../renderer/src/charts/tick-text.ts';

describe('tickText', () => {
  it('rounds to six significant figures and groups thousands', () => {
    expect(tickText(24.000000000000004)).toBe('24');
    expect(tickText(0.30000000000000004)).toBe('0.3');
    expect(tickText(1234.5678)).toBe('1,234.57');
    expect(tickText(-2500)).toBe('-2,500');
    expect(tickText(0)).toBe('0');
  });

  it('writes very large and very small values with an exponent', () => {
    expect(tickText(250000)).toBe('2.50e+5');
    expect(tickText(0.00002)).toBe('2.00e-5');
    expect(tickText(-0.00002)).toBe('-2.00e-5');
  });

  it('gives the same text the second time (memo) and keeps working past the memo size', () => {
    const first = Array.from({ length: 2500 }, (_, i) => tickText(i * 0.37 - 300));
    const again = Array.from({ length: 2500 }, (_, i) => tickText(i * 0.37 - 300));
    expect(again).toEqual(first);
    expect(tickText(0.37 * 1000 - 300)).toBe('70');
    expect(tickText(-300)).toBe('-300');
  });
});
