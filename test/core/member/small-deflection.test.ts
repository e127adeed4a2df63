/**
 * Service deflections beyond span/50 are outside the small-deflection range of the method
 * (core/member/small-deflection.ts): said in words, never given as a number presented as a result,
 * and the member never passes. Units: mm.
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { serviceDeflectionChart } from '../../../core/charts/service.ts';
import { OUTSIDE_SMALL_DEFLECTION, serviceOutsideRange, SMALL_DEFLECTION_RATIO } from '../../../core/member/small-deflection.ts';
import { memberKeyResults } from '../../../core/project/key-results.ts';
import { say } from '../../../core/units/phrase.ts';
import { member, smallProject } from '../../fixtures/projects.ts';

describe('deflections outside the small-deflection range', () => {
  // Issue 17: a 60 m span of the 300 × 600 section deflected 108 m under its service load.
  const p = smallProject('ACI 318-19', [member('B', 'simply-supported', 60000, 'r1')]);
  const result = analyzeProject(p).members[0]!;

  it('the 60 m span of issue 17: a warning in words, no deflection in the key results, the checks fail', () => {
    // The elastic midspan deflection of the gross section under self-weight alone, 5wL⁴/(384 EI), is
    // already beyond L/50 here (AISC Manual Table 3-23 case 1): w = 4.2 N/mm, E = 25.7 GPa, I = 5.4e9 mm⁴.
    expect((5 * 4.24 * 60000 ** 4) / (384 * 25700 * 5.4e9)).toBeGreaterThan(60000 / SMALL_DEFLECTION_RATIO);
    expect(serviceOutsideRange(result.service, result.span)).not.toBeNull();
    const warnings = result.warnings.map((w) => say(w, 'SI'));
    expect(warnings.filter((w) => w.startsWith('Service deflections:'))).toEqual([
      'Service deflections: outside the small-deflection range of the method (a computed deflection exceeds span/50 = 1200 mm): the beam does not carry its service load as a beam — check the reinforcement and the span; the deflection checks fail and no deflection is given as a result.',
    ]);
    expect(memberKeyResults(result).deflection).toBeNull();
    expect(result.status).not.toBe('ok');
    const mode = say(result.governingMode, 'SI');
    expect(mode).toContain(`deflection checks fail: ${OUTSIDE_SMALL_DEFLECTION}`);
    expect(mode).not.toMatch(/deflection check fails: \d/);
    expect(serviceDeflectionChart(result.service, 'SI', null, result.span).emptyMessage).toMatch(/outside the small-deflection range/);
  });

  it('an ordinary 6 m beam is within the range and shows its deflections', () => {
    const ordinary = analyzeProject(smallProject('ACI 318-19', [member('B', 'simply-supported', 6000, 'r1')])).members[0]!;
    expect(serviceOutsideRange(ordinary.service, ordinary.span)).toBeNull();
    expect(memberKeyResults(ordinary).deflection?.deflection).toBeGreaterThan(0);
  });
});
