/**
 * Steel below the minimum (issue 17): one formula, minimumTensionSteel (core/assessment/brittle.ts),
 * read by the verdicts' brittle finding and by validation's warning before the analysis; the warning
 * names the member's zone, the section, the sense and the clause, and appears only in the senses the
 * member's supports give that part of the span.
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { minimumTensionSteel } from '../../../core/assessment/brittle.ts';
import { validateProject } from '../../../core/project/validate.ts';
import type { Project } from '../../../core/project/types.ts';
import type { SupportType } from '../../../core/member/definition.ts';
import type { CodeBasis } from '../../../core/materials/specs.ts';
import { say } from '../../../core/units/phrase.ts';
import { member, smallProject } from '../../fixtures/projects.ts';
import { rectangle300x600 } from './beam-fixtures.ts';

const bar = (d: number) => (Math.PI / 4) * d * d;

/** A 300 × 600 beam with 2-T16 bottom (402 mm²) and 2-T12 top (226 mm²), C30 concrete, fy = 500 MPa. */
function lightProject(code: CodeBasis, supports: SupportType, span = 6000): Project {
  const base = smallProject(code);
  return {
    ...base,
    sections: [rectangle300x600('light', '300 × 600 light', { count: 2, diameter: 16 }, { count: 2, diameter: 12 })],
    members: [member('L', supports, span, 'light', { service: { sustainedLiveFraction: 0.3, durationMonths: 60, limitCases: [] } })],
  };
}

const minimumWarnings = (p: Project) => validateProject(p).filter((d) => d.severity === 'warning' && /less than the minimum/.test(d.message));

describe('minimumTensionSteel: the code rules by hand', () => {
  it('ACI 318-19 9.6.1.2: As,min = max(0.25√f′c, 1.4)·bw·d/fy', () => {
    // f′c = 30 MPa: 0.25√30 = 1.369 < 1.4, so 1.4 × 300 × 540 / 500 = 453.6 mm²
    expect(minimumTensionSteel('ACI 318-19', { strength: 30 }, 500, 300, 540).area).toBeCloseTo(453.6, 6);
    // f′c = 40 MPa: 0.25√40 = 1.5811 × 300 × 540 / 500 = 512.29 mm²
    expect(minimumTensionSteel('ACI 318-19', { strength: 40 }, 500, 300, 540).area).toBeCloseTo(0.25 * Math.sqrt(40) * 300 * 540 / 500, 6);
  });

  it('EN 1992-1-1 9.2.1.1(1) Eq. (9.1N): As,min = max(0.26·fctm/fyk, 0.0013)·bt·d', () => {
    // EN 1992-1-1 Table 3.1: fctm = 0.30·fck^(2/3) = 2.896 MPa for C30; 0.26 × 2.896 / 500 = 0.001506 > 0.0013 → 244.0 mm²
    expect(minimumTensionSteel('EN 1992-1-1', { strength: 30 }, 500, 300, 540).area).toBeCloseTo(0.26 * 0.3 * 30 ** (2 / 3) / 500 * 300 * 540, 6);
    // C20: 0.26 × 2.210 / 500 = 0.00115 < 0.0013 → 0.0013 × 300 × 540 = 210.6 mm²
    expect(minimumTensionSteel('EN 1992-1-1', { strength: 20 }, 500, 300, 540).area).toBeCloseTo(210.6, 6);
  });

  it('reads the measured mean of an as-found concrete, not the lower fractile (a stronger concrete cracks later)', () => {
    expect(minimumTensionSteel('ACI 318-19', { strength: 30, meanStrength: 40 }, 500, 300, 540).area).toBeCloseTo(0.25 * Math.sqrt(40) * 300 * 540 / 500, 6);
    // EN: fctm of fck = fcm − 8 = 37 MPa (Table 3.1)
    expect(minimumTensionSteel('EN 1992-1-1', { strength: 25, meanStrength: 45 }, 500, 300, 540).area).toBeCloseTo(0.26 * 0.3 * 37 ** (2 / 3) / 500 * 300 * 540, 6);
  });
});

describe('validation warns of steel below the minimum with the verdicts\' own rule', () => {
  it('ACI, simply supported: the bottom face in sagging (402 < 453.6 mm²), not the top hanger bars', () => {
    const warnings = minimumWarnings(lightProject('ACI 318-19', 'simply-supported'));
    expect(warnings.map((w) => w.path)).toEqual(['members[0] "L".zones[0].sectionId']);
    expect(warnings[0]!.message).toMatch(/section "300 × 600 light", sagging: tension steel 402 mm² is less than the minimum 454 mm² \(ACI 318-19 9\.6\.1\.2; bw = 300 mm, d = 540 mm\)/);
    expect(warnings[0]!.message).toMatch(/never reported OK/);
  });

  it('a cantilever: the top face in hogging (226 mm²), not the bottom', () => {
    const warnings = minimumWarnings(lightProject('ACI 318-19', 'cantilever', 2000));
    expect(warnings).toHaveLength(1);
    expect(warnings[0]!.message).toMatch(/hogging: tension steel 226 mm² is less than the minimum/);
  });

  it('fixed–fixed: both senses', () => {
    const words = minimumWarnings(lightProject('ACI 318-19', 'fixed-fixed')).map((w) => w.message);
    expect(words.some((m) => /sagging/.test(m)) && words.some((m) => /hogging/.test(m))).toBe(true);
  });

  it('EN: 402 mm² is above the C30 minimum of 244 mm², so no warning; the 226 mm² top of a cantilever is below it', () => {
    expect(minimumWarnings(lightProject('EN 1992-1-1', 'simply-supported'))).toEqual([]);
    const cantilever = minimumWarnings(lightProject('EN 1992-1-1', 'cantilever', 2000));
    expect(cantilever).toHaveLength(1);
    expect(cantilever[0]!.message).toMatch(/EN 1992-1-1 9\.2\.1\.1\(1\), Eq\. \(9\.1N\)/);
  });

  it('the analysis finds the same shortfall with the same numbers: the member is brittle, never OK', () => {
    const p = lightProject('ACI 318-19', 'simply-supported');
    const warning = minimumWarnings(p)[0]!;
    const r = analyzeProject(p).members[0]!;
    const finding = r.brittle.find((b) => b.cause === 'below-minimum-steel');
    expect(r.status).not.toBe('ok');
    const shortfall = (t: string) => /tension steel .*? is less than the minimum .*?\)/.exec(t)?.[0];
    expect(shortfall(warning.message)).toBe('tension steel 402 mm² is less than the minimum 454 mm² (ACI 318-19 9.6.1.2; bw = 300 mm, d = 540 mm)');
    expect(finding?.cause).toBe('below-minimum-steel');
    expect(shortfall(say(finding!.text, 'SI'))).toBe(shortfall(warning.message));
  });

  it('enough steel gives no warning (the fixture beam: 3-T20 = 942 mm² bottom)', () => {
    const p = smallProject('ACI 318-19', [member('A', 'simply-supported', 6000, 'r1')]);
    expect(minimumWarnings(p)).toEqual([]);
    expect(bar(20) * 3).toBeGreaterThan(453.6);
  });
});
