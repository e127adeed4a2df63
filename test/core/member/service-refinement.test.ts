/**
 * The service integration refines the station spacing (60 → 120 → … → 960 segments) until two
 * successive answers agree to 0.05 % (core/member/service.ts). Defect found 4 Dec 2026: where they
 * still differed at 960 segments the refinement stopped without a word — a silent non-convergence.
 * Generated member G-0893 (propped cantilever, brittle E-section at the fixed end) is one: its
 * sustained long-term deflection moves by about 0.06 % from 480 to 960 segments. Each value that has
 * not settled is now a warning naming the state, the last two values and the spacings tried.
 */
import { describe, expect, it } from 'vitest';
import { sectionCache } from '../../../core/analysis.ts';
import { analyzeBeam } from '../../../core/member/analyze.ts';
import type { MemberDefinition } from '../../../core/project/types.ts';
import { say } from '../../../core/units/phrase.ts';
import { generatedProject } from '../project/generated-project.ts';

// The generated project's materials and sections (E400: 250 × 400 support section, R400: rectangle).
const base = generatedProject(1);
const g0893: MemberDefinition = {
  id: 'G-0893',
  name: 'G-893',
  supports: 'propped-cantilever',
  span: 3550,
  zones: [{ from: 0, to: 887.5, sectionId: 'E400' }, { from: 887.5, to: 3550, sectionId: 'R400' }],
  loads: [{ kind: 'uniform', loadCase: 'superimposed', magnitude: 3 }, { kind: 'uniform', loadCase: 'live', magnitude: 15 }],
  service: { sustainedLiveFraction: 0.3, durationMonths: 60, limitCases: ['en-appearance', 'en-after-construction'] },
  capacity: { pattern: 'proportional', hingeLengthMethod: 'mattock-1967' },
};

function analyse(member: MemberDefinition) {
  const project = { ...base, members: [member] };
  return analyzeBeam(member, {
    code: project.info.codeBasis, segments: project.settings.stations, section: sectionCache(project),
    sectionIds: new Set(project.sections.map((s) => s.id)), path: 'members[0]',
  }).result;
}

const unsettled = (warnings: readonly Parameters<typeof say>[0][]) => warnings.map((w) => say(w, 'SI')).filter((w) => /did not settle/.test(w));

describe('service refinement that does not settle says so (silent before 4 Dec 2026)', () => {
  it('names the state, the last two values and the spacings tried', () => {
    const result = analyse(g0893);
    expect(result.service).not.toBeNull();
    const words = unsettled(result.warnings);
    expect(words).toHaveLength(1);
    const [w] = words;
    expect(w).toMatch(/\(sustained load, long term\)/);
    expect(w).toMatch(/60, 120, 240, 480, 960 segments/);
    // The value shown is the finer of the two named.
    const longTerm = result.service!.longTerm.integrationTotal;
    const values = [...w!.matchAll(/([0-9.]+) mm with (\d+) segments?/g)].map((m) => ({ mm: Number(m[1]), segments: Number(m[2]) }));
    expect(values.map((v) => v.segments)).toEqual([480]);
    expect(w).toMatch(/mm with 960,/);
    expect(Math.abs(values[0]!.mm - longTerm) / longTerm).toBeGreaterThan(5e-4 / 2);
    expect(Math.abs(values[0]!.mm - longTerm) / longTerm).toBeLessThan(1e-2);
  });

  it('a member whose values settle has no such warning', () => {
    const simple: MemberDefinition = { ...g0893, id: 'S-1', name: 'S-1', supports: 'simply-supported', zones: [{ from: 0, to: 3550, sectionId: 'R400' }] };
    const result = analyse(simple);
    expect(result.service).not.toBeNull();
    expect(unsettled(result.warnings)).toEqual([]);
  });
});
