import { describe, expect, it } from 'vitest';
import { reportFormatter } from '../../../core/report/format.ts';
import { printableDate } from '../../../core/report/document.ts';

describe('report number formatting', () => {
  const si = reportFormatter('si');
  const us = reportFormatter('us');

  it('prints every quantity with its unit in the project unit system', () => {
    expect(si.moment(2.345e8)).toBe('235 kN·m');
    expect(si.span(6000)).toBe('6.00 m');
    expect(si.deflection(12.345)).toBe('12.3 mm');
    expect(si.strain(-0.0025)).toBe('-2.50 ‰');
    expect(si.rotation(0.01016)).toBe('10.16 mrad');
    expect(si.lineLoad(8)).toBe('8.00 kN/m');
    // 1 kip·ft = 1.355818 kN·m (NIST SP 811 B.8); 235 kN·m = 173.3 kip·ft (four figures: leading 1)
    expect(us.moment(2.35e8)).toBe('173.3 kip·ft');
    // 1 in = 25.4 mm (NIST SP 811 B.8): 12.7 mm = 0.50 in (deflections to 0.01 in)
    expect(us.deflection(12.7)).toBe('0.50 in');
    expect(us.span(6096)).toBe('20.00 ft');
  });

  it('prints whole millimetres without decimals and other lengths to three figures', () => {
    expect(si.length(300)).toBe('300 mm');
    expect(si.length(16)).toBe('16 mm');
    expect(si.length(222.29)).toBe('222 mm');
    expect(si.length(55.5)).toBe('55.5 mm');
  });

  it('groups the thousands of large stiffnesses and second moments so they can be read at a glance', () => {
    // 1 kN·m² = 1e9 N·mm² (SI definition): 1e13 N·mm² = 10,000 kN·m²
    expect(si.rigidity(1e13)).toBe('10,000 kN·m²');
    // 1 kip = 4.448222 kN and 1 in = 25.4 mm (NIST SP 811 B.8): 1 kip·in² = 2,869.8 N·mm²; 4.7008e13 N·mm² = 16,380,000 kip·in²
    expect(us.rigidity(4.7008e13)).toBe('16,380,000 kip·in²');
    // 1 in⁴ = 25.4⁴ mm⁴ = 416,231 mm⁴ (NIST SP 811 B.8): 5.4e9 mm⁴ = 12,970 in⁴
    expect(us.secondMoment(5.4e9)).toBe('12,970 in⁴');
    expect(si.secondMoment(5.4e9)).toBe('5,400 ×10⁶ mm⁴');
  });

  it('never prints NaN or Infinity, and prints numerical noise as zero', () => {
    expect(si.moment(Number.NaN)).toBe('—');
    expect(si.deflection(Number.POSITIVE_INFINITY)).toBe('—');
    expect(si.number(null)).toBe('—');
    expect(si.fixed(undefined, 2)).toBe('—');
    expect(si.moment(5.9e-8)).toBe('0 kN·m');
  });

  it('prints the report date from an ISO date without a clock', () => {
    expect(printableDate('2026-03-14T09:30:00Z')).toBe('2026-03-14 09:30 UTC');
    expect(printableDate('2026-03-14T09:30:00.123+02:00')).toBe('2026-03-14 09:30 UTC+02:00');
    expect(printableDate('2026-03-14')).toBe('2026-03-14');
    expect(printableDate('sometime')).toBe('sometime');
  });
});
