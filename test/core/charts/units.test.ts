import { describe, expect, it } from 'vitest';
import { axisFor, axisScale, axisValueText, display, engineeringText, powerOfTenText, resolveUnits, scaledUnitText, tableScale, unitText } from '../../../core/charts/units.ts';

describe('chart display units', () => {
  it('accepts the project file spelling of the unit system', () => {
    expect(resolveUnits('si').system).toBe('SI');
    expect(resolveUnits('us').system).toBe('US');
    expect(resolveUnits('US').strainStyle).toBe('permille');
  });

  it('converts internal values to display units', () => {
    // 1 kN·m = 10⁶ N·mm (SI definition); 1 kip·ft = 4448.2216152605 N × 304.8 mm (NIST SP 811 B.8)
    expect(display('moment', 2.5e8, resolveUnits('SI'))).toBeCloseTo(250, 10);
    expect(display('moment', 4448.2216152605 * 304.8 * 10, resolveUnits('US'))).toBeCloseTo(10, 10);
    // strain per mille: 0.0035 → 3.5 ‰ (definition of the per mille sign)
    expect(display('strain', 0.0035, resolveUnits('SI'))).toBeCloseTo(3.5, 12);
    expect(unitText('curvature', resolveUnits('US'))).toBe('1/in');
  });

  it('moves a power of ten into the axis label only when numbers would be very small or large', () => {
    // common practice, no source: tick labels between 0.01 and 100 000 need no factor
    expect(axisScale([0.05, 0.2])).toBe(1);
    expect(axisScale([0.0002, 0.00015])).toBe(1e-6);
    expect(axisScale([2.5e6])).toBe(1e6);
    expect(axisScale([])).toBe(1);
    expect(axisScale([0, Number.NaN, Number.POSITIVE_INFINITY])).toBe(1);
    expect(powerOfTenText(-6)).toBe('10⁻⁶');
    expect(axisFor('Curvature φ', '1/in', 1e-6).label).toBe('Curvature φ (×10⁻⁶ 1/in)');
    expect(axisFor('Moment M', 'kN·m', 1).label).toBe('Moment M (kN·m)');
    expect(axisFor('Ductility', '', 1).label).toBe('Ductility');
  });

  it('puts the factor of an axis back into a value read off it (a click on the curve)', () => {
    // 1.442 plotted on a ×10⁻³ 1/in axis is 0.001442 1/in, never "1.442 1/in"
    expect(axisValueText(1.442, { unit: '1/in', scale: 1e-3 })).toBe('1.442×10⁻³ 1/in');
    expect(axisValueText(191.7, { unit: 'kip·ft', scale: 1 })).toBe('191.7 kip·ft');
    expect(axisValueText(Number.NaN, { unit: 'kip·ft', scale: 1 })).toBe('—');
  });

  it('writes small and large values in engineering notation, others plainly', () => {
    // common practice, no source: exponents in multiples of three, 3–4 significant figures
    expect(engineeringText(0.00000854, '1/in')).toBe('8.54×10⁻⁶ 1/in');
    expect(engineeringText(0.001986, '1/in')).toBe('1.986×10⁻³ 1/in');
    expect(engineeringText(0.0254, '1/m')).toBe('0.0254 1/m');
    expect(engineeringText(2.5e7, 'N')).toBe('25.0×10⁶ N');
    expect(engineeringText(0, '')).toBe('0');
  });

  it('chooses one factor for a table column so that no value needs leading zeros', () => {
    expect(tableScale([0.00000854, 0.0000804, 0.001986, 0.00254])).toBe(1e-6);
    expect(tableScale([12, 250])).toBe(1);
    expect(tableScale([0.5, 2])).toBe(1e-3);
    expect(tableScale([1e-9, 10])).toBe(1);
    expect(tableScale([])).toBe(1);
    expect(scaledUnitText('1/in', 1e-6)).toBe('×10⁻⁶ 1/in');
    expect(scaledUnitText('kN·m', 1)).toBe('kN·m');
  });
});
