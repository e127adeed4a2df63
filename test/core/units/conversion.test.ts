import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { convertUnit, fromDisplay, toDisplay, unitLabel, displayUnit, ROUND_OFF_ZERO } from '../../../core/units/convert.ts';
import { QUANTITIES, QUANTITY_NAMES, UNIT_SYSTEMS } from '../../../core/units/quantities.ts';
import { UNITS, type UnitId } from '../../../core/units/units.ts';
import { BugError } from '../../../core/diagnostics.ts';

describe('exact conversions (NIST SP 811 Appendix B.8)', () => {
  it('1 in is 25.4 mm exactly and 1 ft is 304.8 mm exactly', () => {
    // NIST SP 811 Appendix B.8: inch → meter 2.54 E−02 (exact); foot → meter 3.048 E−01 (exact)
    expect(fromDisplay('sectionLength', 1, 'US')).toBe(25.4);
    expect(fromDisplay('spanLength', 1, 'US')).toBe(304.8);
    expect(toDisplay('sectionLength', 25.4, 'US')).toBe(1);
    expect(toDisplay('spanLength', 304.8, 'US')).toBe(1);
  });

  it('1 kip is 4.448 221 615 260 5 kN', () => {
    // NIST SP 811 Appendix B.8: pound-force → newton 4.448 222 E+00 (exact: 0.453 592 37 kg × 9.806 65 m/s²)
    expect(fromDisplay('force', 1, 'US')).toBeCloseTo(4448.2216152605, 9);
    expect(toDisplay('force', 4448.2216152605, 'SI')).toBeCloseTo(4.4482216152605, 12);
  });

  it('1 ksi is 6.894 757 MPa and 1 psi is 6.894 757 kPa', () => {
    // NIST SP 811 Appendix B.8: kip per square inch → pascal 6.894 757 E+06; psi → pascal 6.894 757 E+03
    expect(fromDisplay('stress', 1, 'US')).toBeCloseTo(6.894757, 6);
    expect(fromDisplay('concreteStress', 1, 'US')).toBeCloseTo(0.006894757, 9);
    expect(convertUnit(4000, 'psi', 'MPa')).toBeCloseTo(27.579, 3);
  });

  it('1 kip·ft is 1.355 818 kN·m and 1 kip·in is 0.112 985 kN·m', () => {
    // NIST SP 811 Appendix B.8: pound-force foot → newton meter 1.355 818 E+00; pound-force inch → 1.129 848 E−01
    expect(convertUnit(1, 'kip.ft', 'kN.m')).toBeCloseTo(1.3558179, 7);
    expect(convertUnit(1, 'kip.in', 'kN.m')).toBeCloseTo(0.1129848, 7);
    expect(fromDisplay('moment', 1, 'US')).toBeCloseTo(1.3558179483314004e6, 3);
  });

  it('1 kip/ft is 14.593 90 kN/m', () => {
    // NIST SP 811 Appendix B.8: pound-force per foot → newton per meter 1.459 390 E+01
    expect(convertUnit(1, 'kip/ft', 'kN/m')).toBeCloseTo(14.59390, 5);
  });

  it('1 pcf is 16.018 46 kg/m³ and 2400 kg/m³ weighs 23.54 kN/m³', () => {
    // NIST SP 811 Appendix B.8: pound per cubic foot → kilogram per cubic meter 1.601 846 E+01
    expect(fromDisplay('density', 1, 'US')).toBeCloseTo(16.01846, 5);
    // γ = ρ·gn with gn = 9.806 65 m/s² (NIST SP 811 Appendix B.8, standard acceleration of gravity)
    expect(convertUnit(2400, 'kg/m3', 'kN/m3')).toBeCloseTo(23.536, 3);
    // 150 pcf normal-weight concrete ≈ 2403 kg/m³ // common practice, no source
    expect(fromDisplay('density', 150, 'US')).toBeCloseTo(2402.77, 2);
  });

  it('areas and second moments follow the length factor squared and to the fourth', () => {
    // NIST SP 811 Appendix B.8: square inch → square meter 6.4516 E−04 (exact); inch⁴ → meter⁴ 4.162 314 E−07
    expect(fromDisplay('area', 1, 'US')).toBeCloseTo(645.16, 10);
    expect(fromDisplay('secondMoment', 1, 'US')).toBeCloseTo(416231.4256, 4);
    expect(toDisplay('secondMoment', 5.4e9, 'SI')).toBeCloseTo(5400, 9);
  });

  it('curvature: 1/in is 1/25.4 per mm; 1/m is 0.001 per mm; rad/km is 1e−6 per mm', () => {
    expect(toDisplay('curvature', 1e-5, 'SI')).toBeCloseTo(0.01, 12);
    expect(toDisplay('curvature', 1e-5, 'SI', 'rad-per-km')).toBeCloseTo(10, 9);
    expect(toDisplay('curvature', 1e-5, 'US')).toBeCloseTo(2.54e-4, 15);
  });

  it('line loads: 1 N/mm is exactly 1 kN/m', () => {
    expect(toDisplay('lineLoad', 12.5, 'SI')).toBe(12.5);
  });

  it('strain and ratio: per mille, percent and microstrain', () => {
    expect(toDisplay('strain', 0.0035, 'SI', 'permille')).toBeCloseTo(3.5, 12);
    expect(toDisplay('strain', 0.0035, 'US', 'microstrain')).toBeCloseTo(3500, 9);
    expect(toDisplay('ratio', 0.015, 'SI', 'percent')).toBeCloseTo(1.5, 12);
  });
});

describe('unit labels', () => {
  it.each([
    ['force', 'kN', 'kip'],
    ['sectionLength', 'mm', 'in'],
    ['spanLength', 'm', 'ft'],
    ['deflection', 'mm', 'in'],
    ['stress', 'MPa', 'ksi'],
    ['concreteStress', 'MPa', 'psi'],
    ['moment', 'kN·m', 'kip·ft'],
    ['curvature', '1/m', '1/in'],
    ['lineLoad', 'kN/m', 'kip/ft'],
    ['density', 'kg/m³', 'pcf'],
    ['area', 'mm²', 'in²'],
    ['secondMoment', '×10⁶ mm⁴', 'in⁴'],
    ['rotation', 'rad', 'rad'],
    ['strain', '', ''],
  ] as const)('%s shows in %s (SI) and %s (US)', (quantity, si, us) => {
    expect(unitLabel(quantity, 'SI')).toBe(si);
    expect(unitLabel(quantity, 'US')).toBe(us);
  });

  it('an explicit alternative unit is honoured (kip·in for moments)', () => {
    expect(unitLabel('moment', 'US', 'kip.in')).toBe('kip·in');
  });

  it('refuses a unit of another dimension, an unknown quantity or an unknown system', () => {
    expect(() => unitLabel('moment', 'SI', 'kN')).toThrow(BugError);
    expect(() => unitLabel('notAQuantity' as never, 'SI')).toThrow(BugError);
    expect(() => unitLabel('force', 'imperial' as never)).toThrow(BugError);
    expect(() => convertUnit(1, 'kN', 'mm')).toThrow(BugError);
  });
});

describe('the quantity table is consistent', () => {
  it('every allowed unit of a quantity has the quantity’s dimension and the defaults are allowed', () => {
    for (const name of QUANTITY_NAMES) {
      const definition = QUANTITIES[name];
      expect(definition.units).toContain(definition.SI);
      expect(definition.units).toContain(definition.US);
      for (const id of definition.units) expect(UNITS[id].dimension, `${name} / ${id}`).toBe(definition.dimension);
    }
  });

  it('every unit is keyed by its own id and has a positive finite size', () => {
    for (const [id, definition] of Object.entries(UNITS)) {
      expect(definition.id).toBe(id);
      expect(Number.isFinite(definition.internalPerUnit) && definition.internalPerUnit > 0).toBe(true);
    }
  });
});

describe('round trips (property tests)', () => {
  const value = fc.double({ min: -1e12, max: 1e12, noNaN: true, noDefaultInfinity: true });

  it('fromDisplay(toDisplay(x)) ≈ x for every quantity, system and allowed unit', () => {
    for (const name of QUANTITY_NAMES) {
      for (const system of UNIT_SYSTEMS) {
        const units: (UnitId | undefined)[] = [undefined, ...QUANTITIES[name].units];
        for (const unit of units) {
          fc.assert(
            fc.property(value, (x) => {
              const back = fromDisplay(name, toDisplay(name, x, system, unit), system, unit);
              // a value within round-off of zero is shown, and so comes back, as zero
              if (Math.abs(x) < ROUND_OFF_ZERO[QUANTITIES[name].dimension]) return back === 0;
              return Math.abs(back - x) <= 1e-12 * Math.max(1, Math.abs(x));
            }),
            { numRuns: 60 },
          );
        }
      }
    }
  });

  it('toDisplay is linear: converting a sum equals summing the conversions', () => {
    fc.assert(
      fc.property(fc.constantFrom(...QUANTITY_NAMES), fc.constantFrom(...UNIT_SYSTEMS), value, value, (name, system, a, b) => {
        const lhs = toDisplay(name, a + b, system);
        const rhs = toDisplay(name, a, system) + toDisplay(name, b, system);
        return Math.abs(lhs - rhs) <= 1e-9 * Math.max(1, Math.abs(lhs), Math.abs(toDisplay(name, a, system)));
      }),
    );
  });

  it('displayUnit returns the default unit when no unit is given', () => {
    expect(displayUnit('spanLength', 'US').id).toBe('ft');
  });
});
