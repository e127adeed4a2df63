/**
 * Where hinges form: of either sign anywhere along the member (issue 11 item 5), the span hinge
 * rules (issue 11 item 6), and which rule and length the results report.
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import type { MemberDefinition, Project } from '../../../core/project/types.ts';
import { member, smallProject } from '../../fixtures/projects.ts';
import { say } from '../../../core/units/phrase.ts';

/** A propped cantilever of 8 m whose top bars (4 Ø25) stop 1.2 m from the fixed end, 2 Ø16 beyond. */
function cutOffProject(): Project {
  const base = smallProject('ACI 318-19');
  const r1 = base.sections[0]!;
  const sections = [
    { ...r1, id: 'sup', name: 'support', bars: [{ steelId: 'b500', depth: 540, count: 3, diameter: 20 }, { steelId: 'b500', depth: 60, count: 4, diameter: 25 }] },
    { ...r1, id: 'mid', name: 'span', bars: [{ steelId: 'b500', depth: 540, count: 3, diameter: 20 }, { steelId: 'b500', depth: 55, count: 2, diameter: 16 }] },
  ];
  const L = 8000;
  const m: MemberDefinition = member('P', 'propped-cantilever', L, 'sup', {
    zones: [{ from: 0, to: 1200, sectionId: 'sup' }, { from: 1200, to: L, sectionId: 'mid' }],
  });
  return { ...base, sections: [...base.sections, ...sections], members: [m] };
}

describe('hinges of either sign anywhere along the member', () => {
  it('top bars cut off near the fixed end: a hogging hinge forms inside the span at the cut-off', () => {
    // The hogging moment at 1.2 m of a uniformly loaded 8 m propped cantilever is still 49 % of the
    // end moment (M(x) = w(5Lx/8 − x²/2 − L²/8), any beam table), above the first yield of 2 Ø16
    // (about 100 kN·m) while the support section (4 Ø25, about 465 kN·m) is still elastic.
    const r = analyzeProject(cutOffProject()).members[0]!;
    expect(r.status).not.toBe('not-converged');
    const inside = r.ductility.hinges.filter((h) => h.direction === 'hogging' && h.localised && h.position > 600);
    expect(inside.map((h) => h.position)).toEqual([1200]);
    expect(r.loadDeflection.events.some((e) => e.kind === 'first-yield' && /hogging/.test(e.description) && e.position > 600)).toBe(true);
    // the fixed end never reaches the top of its curve: the member fails at the cut-off
    expect(r.ductility.hinges.some((h) => h.localised && h.position < 600)).toBe(false);
    expect(r.loadDeflection.events.find((e) => e.kind === 'ultimate')!.position).toBe(1200);
  });
});

describe('hinge length of a hinge inside the span', () => {
  const L = 7000;
  const run = (rule: 'combined' | 'per-face') => analyzeProject(smallProject('ACI 318-19', [member('S', 'simply-supported', L, 'r1', { capacity: { pattern: 'proportional', hingeLengthMethod: 'mattock-1967', spanHingeRule: rule } })])).members[0]!;
  it("'combined' keeps 0.5d once; 'per-face' applies Mattock's one-sided form to each side (0.5d + 0.05z each)", () => {
    // Mattock (1967), from memory: Lp = 0.5·d + 0.05·z for one side; d = 540 mm, z = L/2 each side.
    const d = 540;
    const combined = run('combined').ductility.hinges.find((h) => h.localised)!;
    const perFace = run('per-face').ductility.hinges.find((h) => h.localised)!;
    expect(combined.length).toBeCloseTo(0.5 * d + 0.05 * combined.shearSpan, 6);
    expect(perFace.length).toBeCloseTo(2 * 0.5 * d + 0.05 * perFace.shearSpan, 6);
    expect(say(perFace.lengthFormula, 'si')).toMatch(/each side/);
  });
});
