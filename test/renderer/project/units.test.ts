/**
 * Reading and showing values in input fields: what is typed in either unit system is stored in
 * internal units (mm, N, MPa, N/mm), and shown back in the project's units.
 */
import { describe, expect, it } from 'vitest';
import { fieldUnit, formatForInput, parseInput } from '../../../renderer/src/project/units.ts';

const value = (text: string, quantity: Parameters<typeof parseInput>[1], system: 'si' | 'us') => {
  const parsed = parseInput(text, quantity, system);
  if (!parsed.ok) throw new Error(parsed.message);
  return parsed.value;
};

describe('a value typed in US customary units', () => {
  it('is stored in millimetres: a 24 ft span is 7315.2 mm', () => {
    // NIST SP 811 Appendix B.8: foot → meter 3.048 E−01 (exact)
    expect(value('24', 'spanLength', 'us')).toBe(7315.2);
  });

  it('reads a bar diameter of 0.875 in as 22.225 mm', () => {
    // NIST SP 811 Appendix B.8: inch → meter 2.54 E−02 (exact)
    expect(value('0.875', 'sectionLength', 'us')).toBe(22.225);
  });

  it('reads f′c = 4000 psi as 27.579 MPa', () => {
    // NIST SP 811 Appendix B.8: psi → pascal 6.894 757 E+03
    expect(value('4000', 'concreteStress', 'us')).toBeCloseTo(27.579028, 5);
  });

  it('reads 60 ksi as 413.69 MPa and a line load of 0.5 kip/ft as 7.2962 N/mm', () => {
    // NIST SP 811 Appendix B.8: ksi → pascal 6.894 757 E+06; kip/ft = 4448.2216 N / 304.8 mm
    expect(value('60', 'stress', 'us')).toBeCloseTo(413.6854, 3);
    expect(value('0.5', 'lineLoad', 'us')).toBeCloseTo(7.296951, 5);
  });
});

describe('a value typed with its own unit', () => {
  it('converts 600 mm typed into a field shown in inches', () => {
    expect(value('600 mm', 'sectionLength', 'us')).toBe(600);
  });

  it('converts 2 ft typed into a field shown in metres', () => {
    expect(value("2'", 'spanLength', 'si')).toBe(609.6);
    expect(value('2 ft', 'spanLength', 'si')).toBe(609.6);
  });

  it('converts 18 in typed into a section field shown in millimetres', () => {
    expect(value('18"', 'sectionLength', 'si')).toBe(457.2);
  });

  it('refuses a unit of another kind, naming the units allowed', () => {
    const parsed = parseInput('20 kN', 'sectionLength', 'si');
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.message).toMatch(/unknown unit "kN".*mm, m, in, ft/);
  });
});

describe('typed numbers', () => {
  it('accepts a decimal comma and thousands separators before a decimal point', () => {
    expect(value('2,5', null, 'si')).toBe(2.5);
    expect(value('1,200.5', null, 'si')).toBe(1200.5);
    expect(value('12 000', null, 'si')).toBe(12000);
  });

  it('refuses "1,200" as ambiguous', () => {
    const parsed = parseInput('1,200', null, 'si');
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.message).toMatch(/ambiguous/);
  });

  it('refuses text that is not a number, an empty field and numbers too large to hold', () => {
    expect(parseInput('abc', 'spanLength', 'si').ok).toBe(false);
    expect(parseInput('', 'spanLength', 'si').ok).toBe(false);
    expect(parseInput('1e400', null, 'si').ok).toBe(false);
    const text = parseInput('12x', 'spanLength', 'us');
    if (!text.ok) expect(text.message).toMatch(/unknown unit "x"/);
  });

  it('names the unit of an inch field without writing "in in"', () => {
    const parsed = parseInput('abc', 'sectionLength', 'us');
    expect(parsed).toEqual({ ok: false, message: '"abc" is not a number; type a number (unit: in)' });
    const plain = parseInput('abc', null, 'us');
    expect(plain.ok ? '' : plain.message).toBe('"abc" is not a number; type a number');
  });

  it('accepts a typographic minus sign', () => {
    expect(value('\u22125', 'force', 'si')).toBe(-5000);
  });
});

describe('values shown in a field', () => {
  it('show 7315.2 mm as 24 in feet and 7.3152 in metres', () => {
    expect(formatForInput(7315.2, 'spanLength', 'us')).toBe('24');
    expect(formatForInput(7315.2, 'spanLength', 'si')).toBe('7.3152');
  });

  it('show nothing for a missing or non-finite value (never NaN)', () => {
    expect(formatForInput(undefined, 'spanLength', 'si')).toBe('');
    expect(formatForInput(Number.NaN, 'spanLength', 'si')).toBe('');
    expect(formatForInput(Number.POSITIVE_INFINITY, null, 'si')).toBe('');
  });

  it('round-trip: what is shown reads back to the stored value within the eight figures shown', () => {
    for (const stored of [22.225, 7315.2, 304.8, 0.1, 123.456, 1e-3]) {
      const back = value(formatForInput(stored, 'sectionLength', 'us'), 'sectionLength', 'us');
      expect(Math.abs(back - stored) / stored).toBeLessThan(5e-8);
    }
    // Values that are whole in the display unit come back exactly: 0.875 in = 22.225 mm.
    expect(value(formatForInput(22.225, 'sectionLength', 'us'), 'sectionLength', 'us')).toBe(22.225);
  });

  it('name the unit of each field in the project system', () => {
    expect(fieldUnit('moment', 'us')).toBe('kip·ft');
    expect(fieldUnit('moment', 'si')).toBe('kN·m');
    expect(fieldUnit('concreteStress', 'us')).toBe('psi');
    expect(fieldUnit('lineLoad', 'si')).toBe('kN/m');
  });
});
