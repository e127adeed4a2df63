/**
 * Defect found 4 Dec 2026 (member G-0978 of the generated project): a propped cantilever whose
 * sagging zone reaches first yield where the tension shift makes the effective moment flat over
 * several stations. The leftmost of the stations within 1e-7 of the largest ratio was noted as the
 * reported yield site, but its own remembered moment was a hair below first yield, so its zone never
 * counted as reported: the same yield was found again at the same state until the load-control
 * step budget ran out — 3,987 "first-yield" events at one load factor and one position, each naming
 * the 3,985 others, a result of more than 512 MB and 6–10 s of CPU.
 * Every yield and hinge is now reported once per place, and `together` names other places only.
 */
import { describe, expect, it } from 'vitest';
import { sectionCache } from '../../../core/analysis.ts';
import { analyzeBeam } from '../../../core/member/analyze.ts';
import type { MemberDefinition } from '../../../core/project/types.ts';
import { generatedProject } from '../project/generated-project.ts';

// The generated project's materials and sections (E700: 300 × 700 support section, T700: tee).
const base = generatedProject(1);
const member: MemberDefinition = {
  id: 'G-0978',
  name: 'G-978',
  supports: 'propped-cantilever',
  span: 4550,
  zones: [{ from: 0, to: 1137.5, sectionId: 'E700' }, { from: 1137.5, to: 4550, sectionId: 'T700' }],
  loads: [{ kind: 'uniform', loadCase: 'superimposed', magnitude: 5 }, { kind: 'uniform', loadCase: 'live', magnitude: 5 }],
  service: { sustainedLiveFraction: 0.3, durationMonths: 60, limitCases: ['en-appearance', 'en-after-construction'] },
  capacity: { pattern: 'proportional', hingeLengthMethod: 'paulay-priestley-1992' },
};
const project = { ...base, members: [member] };

describe('a yield reached by a tension-shift twin is reported once (defect of G-0978)', () => {
  const result = analyzeBeam(member, {
    code: project.info.codeBasis, segments: project.settings.stations, section: sectionCache(project),
    sectionIds: new Set(project.sections.map((s) => s.id)), path: 'members[0]',
  }).result;
  const events = result.loadDeflection.events;

  it('one event per place and kind, and the curve reaches its ultimate', () => {
    const keys = events.map((e) => `${e.kind}@${e.position}`);
    expect(new Set(keys).size).toBe(keys.length);
    // Cracking, yield at the fixed end, yield in the span, hinge, code ultimate, ultimate.
    expect(events.length).toBeLessThanOrEqual(8);
    const yields = events.filter((e) => e.kind === 'first-yield');
    expect(yields.map((e) => e.position)).toEqual([0, 2730]);
    expect(yields[1]!.description).toMatch(/^yield \(sagging\) at 0\.60ℓ from the left support: plasticity starts to spread$/);
    expect(result.loadDeflection.status).toBe('complete');
    expect(events.at(-1)!.kind).toBe('ultimate');
  });

  it('`together` lists name distinct other places, never the event itself', () => {
    for (const e of events) {
      const together = e.together ?? [];
      expect(together).not.toContain(e.position);
      expect(new Set(together).size).toBe(together.length);
    }
  });
});
