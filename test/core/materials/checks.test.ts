import { describe, expect, it } from 'vitest';
import { BugError, type Diagnostic } from '../../../core/diagnostics.ts';
import { assertStrainIsNumber, checkField, fieldPath, show, sortedBreakpoints } from '../../../core/materials/checks.ts';
import { compressionLaw } from '../../../core/materials/concrete/compression-law.ts';

describe('checkField', () => {
  it('names the field in words, then the allowed range and the value', () => {
    const out: Diagnostic[] = [];
    expect(checkField(out, 'm.strength', 'concrete strength', 7, { min: 10, max: 120, unit: 'MPa' })).toBe(false);
    expect(out).toEqual([{ code: 'out-of-range', path: 'm.strength', severity: 'error', message: 'concrete strength must be at least 10 MPa and at most 120 MPa, got 7 MPa' }]);
    expect(checkField(out, 'm.strength', 'concrete strength', 30, { min: 10, max: 120 })).toBe(true);
    expect(out).toHaveLength(1);
  });

  it('keeps the severity asked for', () => {
    const out: Diagnostic[] = [];
    checkField(out, 'x', 'x', Number.NaN, {}, 'warning');
    expect(out[0]?.severity).toBe('warning');
    expect(out[0]?.code).toBe('not-a-number');
  });
});

describe('helpers', () => {
  it('fieldPath joins with a dot unless the parent is empty', () => {
    expect(fieldPath('materials[1]', 'strength')).toBe('materials[1].strength');
    expect(fieldPath('', 'strength')).toBe('strength');
  });

  it('sortedBreakpoints sorts, removes duplicates and non-finite values', () => {
    expect(sortedBreakpoints([0.002, -0.001, 0.002, Number.NaN, Number.POSITIVE_INFINITY, 0])).toEqual([-0.001, 0, 0.002]);
  });

  it('show prints four significant figures', () => {
    expect(show(0.0039611)).toBe('0.003961');
    expect(show(51486.2)).toBe('51490');
  });

  it('assertStrainIsNumber throws a BugError on NaN only', () => {
    expect(() => assertStrainIsNumber(Number.NaN, 'm')).toThrow(BugError);
    expect(() => assertStrainIsNumber(Number.POSITIVE_INFINITY, 'm')).not.toThrow();
  });
});

describe('compressionLaw guards', () => {
  const base = {
    model: 'test', label: 'test', references: [], endStrain: 0.003, breakpoints: [0.001, 0.003, 0.004, -1], initialModulus: 1,
    peakStress: 1, peakStrain: 0.001, crushingStrain: 0.003, confined: false,
  };

  it('returns 0 for ε ≤ 0 and beyond the end, and never a negative stress', () => {
    const law = compressionLaw({ ...base, curve: () => -5 });
    expect(law.stress(-0.001)).toBe(0);
    expect(law.stress(0.002)).toBe(0);
    expect(law.stress(0.0031)).toBe(0);
  });

  it('keeps only breakpoints inside (0, end]', () => {
    expect(compressionLaw({ ...base, curve: () => 1 }).breakpoints).toEqual([0.001, 0.003]);
  });

  it('turns a non-finite stress from a defective curve into a BugError', () => {
    const law = compressionLaw({ ...base, curve: () => Number.NaN });
    expect(() => law.stress(0.001)).toThrow(BugError);
  });
});
