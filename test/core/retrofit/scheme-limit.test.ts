/** The documented limit on strengthening schemes per member (issue 17: 2,000 schemes took 88 s). */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { validateProjectData } from '../../../core/project/validate.ts';
import { MAX_SCHEMES } from '../../../core/retrofit/validate.ts';
import type { StrengtheningScheme } from '../../../core/retrofit/types.ts';
import { member, smallProject } from '../../fixtures/projects.ts';

const overlay = (i: number): StrengtheningScheme => ({ kind: 'concrete-layer', id: `S${i}`, name: `Overlay ${i}`, face: 'top', thickness: 50, concreteId: 'c30', bars: [{ steelId: 'b500', distanceFromFace: 25, count: 2, diameter: 12 }] });

describe('strengthening schemes per member', () => {
  it(`more than ${MAX_SCHEMES} is an error naming the list and the limit; the analysis runs none of them and says why`, () => {
    const p = smallProject('ACI 318-19', [{ ...member('B-1', 'simply-supported', 6000, 'r1'), schemes: Array.from({ length: 2000 }, (_, i) => overlay(i)) }]);
    const d = validateProjectData(JSON.parse(JSON.stringify(p))).diagnostics.filter((x) => x.severity === 'error');
    expect(d.map((x) => [x.path, x.message])).toEqual([['members[0] "B-1".schemes', `a member may have at most ${MAX_SCHEMES} strengthening schemes, got 2000; each is a full analysis of the beam`]]);
    const result = analyzeProject(p).members[0]!;
    expect(result.errors.map((e) => e.path)).toEqual(['members[0] "B-1".schemes']);
    expect(result.retrofit?.schemes ?? []).toEqual([]);
  });

  it(`${MAX_SCHEMES} schemes are accepted`, () => {
    const p = smallProject('ACI 318-19', [{ ...member('B-1', 'simply-supported', 6000, 'r1'), schemes: Array.from({ length: MAX_SCHEMES }, (_, i) => overlay(i)) }]);
    expect(validateProjectData(JSON.parse(JSON.stringify(p))).diagnostics.filter((x) => x.severity === 'error')).toEqual([]);
  });
});
