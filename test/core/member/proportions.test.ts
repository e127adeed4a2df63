/**
 * Deep members are refused (core/member/proportions.ts): beam theory does not apply below the span
 * the code sets for a beam. Units: mm.
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import type { SupportType } from '../../../core/member/definition.ts';
import type { CodeBasis } from '../../../core/materials/specs.ts';
import { validateProjectData } from '../../../core/project/validate.ts';
import { member, smallProject } from '../../fixtures/projects.ts';

/** Span errors of a member on the 600 mm deep r1. */
function spanErrors(code: CodeBasis, supports: SupportType, span: number): string[] {
  const p = smallProject(code, [member('B', supports, span, 'r1')]);
  return validateProjectData(JSON.parse(JSON.stringify(p))).diagnostics.filter((d) => d.severity === 'error' && d.path === 'members[0] "B".span').map((d) => d.message);
}

describe('span-to-depth range of beam theory', () => {
  it('ACI 318-19: a clear span of at most four times the depth is a deep beam', () => {
    // ACI 318-19 9.9.1.1(a): deep beams have ln ≤ 4h (from memory); h = 600 mm → 2.4 m.
    expect(spanErrors('ACI 318-19', 'simply-supported', 2400)).toEqual(['the span, 2.4 m, is 4.00 times the depth of 600 mm: a deep beam (ACI 318-19 9.9.1.1(a): a clear span of at most 4h is a deep beam), outside the beam theory of this program; the span must be more than 2.4 m']);
    expect(spanErrors('ACI 318-19', 'fixed-fixed', 2401)).toEqual([]);
  });

  it('EN 1992-1-1: a span of less than three times the depth is a deep beam', () => {
    // EN 1992-1-1 5.3.1(3): a beam has a span not less than 3 times its overall depth; h = 600 mm → 1.8 m.
    expect(spanErrors('EN 1992-1-1', 'propped-cantilever', 1799)).toHaveLength(1);
    expect(spanErrors('EN 1992-1-1', 'simply-supported', 1800)).toEqual([]);
  });

  it('a cantilever is taken as half a simple span of twice its length', () => {
    // The tip of a cantilever of length L has the slope and moment pattern of the midspan of a simple span 2L
    // (statics: symmetry of the simple span about midspan; common practice, no source).
    expect(spanErrors('ACI 318-19', 'cantilever', 1200)[0]).toMatch(/^twice the cantilever's length, 2\.4 m .* the length must be more than 1\.2 m$/);
    expect(spanErrors('ACI 318-19', 'cantilever', 1500)).toEqual([]);
  });

  it('the 1 mm span of issue 17 is an input error, not "ok" with a load factor of 10⁸', () => {
    const p = smallProject('ACI 318-19', [member('B', 'simply-supported', 1, 'r1')]);
    const result = analyzeProject(p).members[0]!;
    expect(result.status).toBe('input-error');
    expect(result.errors.map((e) => e.path)).toEqual(['members[0] "B".span']);
  });
});
