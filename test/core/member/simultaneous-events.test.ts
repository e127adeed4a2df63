/**
 * Twins of a symmetric member — both supports of a fixed–fixed beam, the sections under a mirrored
 * pair of loads — reach their thresholds at the same load factor; which of them the solver meets a
 * hair earlier is rounding noise (an accuracy fix of the section engine flipped the order of the
 * demo beams' support hinges). Such events are reported together: left to right, at one load factor,
 * each naming the others; hinges that formed together share their place in the order.
 */
import { describe, expect, it } from 'vitest';
import { sectionCache } from '../../../core/analysis.ts';
import { analyzeBeam } from '../../../core/member/analyze.ts';
import type { BeamResult } from '../../../core/member/results.ts';
import { sectionResponse } from '../../../core/member/section-response.ts';
import { member, smallProject } from '../../fixtures/projects.ts';

const project = smallProject('ACI 318-19');
const cache = sectionCache(project);
const ids = new Set(project.sections.map((s) => s.id));
const L = 6000;
const a = 2000;
const P = 40_000;

/** Fixed–fixed 300 × 600 beam, 6 m, two live point loads P at a and L − a, no self-weight, strain penetration or tension shift. */
function mirrored(solver?: { lineSearch: 'halving' | 'quadratic'; stepScale: number }): BeamResult {
  const m = member('SYM', 'fixed-fixed', L, 'r1', {
    loads: [{ kind: 'point', loadCase: 'live', magnitude: P, position: a }, { kind: 'point', loadCase: 'live', magnitude: P, position: L - a }],
    includeSelfWeight: false,
    // No strain penetration at the fixed faces and no tension shift (which makes the sections near a
    // support feel its moment): the uncracked beam is then the handbook's (last test).
    capacity: { pattern: 'proportional', hingeLengthMethod: 'priestley-2007', strainPenetration: 'none', tensionShift: false },
  });
  return analyzeBeam(m, { code: 'ACI 318-19', segments: 60, section: cache, sectionIds: ids, path: 'members[0]', ...(solver ? { solver } : {}) }).result;
}

/** The events and hinges as a user reads them: kind, λ to 6 figures, where, together with where. */
function sequence(r: BeamResult) {
  return {
    events: r.loadDeflection.events.map((e) => [e.kind, e.loadFactor.toPrecision(6), Math.round(e.position), (e.together ?? []).map(Math.round)]),
    hinges: r.ductility.hinges.map((h) => [h.order, Math.round(h.position), h.direction, (h.together ?? []).map(Math.round)]),
  };
}

describe('simultaneous events of a symmetric member', () => {
  const r = mirrored();

  it('the supports yield and localise together: one load factor, left to right, each naming the other', () => {
    for (const kind of ['first-yield', 'hinge'] as const) {
      const atSupports = r.loadDeflection.events.filter((e) => e.kind === kind && (e.position === 0 || e.position === L));
      expect(atSupports.map((e) => e.position)).toEqual([0, L]);
      expect(atSupports[0]!.loadFactor).toBe(atSupports[1]!.loadFactor);
      expect(atSupports[0]!.together).toEqual([L]);
      expect(atSupports[1]!.together).toEqual([0]);
      expect(atSupports[0]!.description).toMatch(/at the same load factor as at the right support/);
      expect(atSupports[1]!.description).toMatch(/at the same load factor as at the left support/);
    }
    // "first yield" names the very first yield; its twin is a yield of the same moment.
    const yields = r.loadDeflection.events.filter((e) => e.kind === 'first-yield');
    expect(yields[0]!.description).toMatch(/^first yield/);
    expect(yields.slice(1).every((e) => /^yield/.test(e.description))).toBe(true);
  });

  it('hinges that formed together share their order, left to right', () => {
    const hinges = r.ductility.hinges;
    expect(hinges.length).toBeGreaterThanOrEqual(2);
    for (let i = 1; i < hinges.length; i++) {
      const p = hinges[i - 1]!;
      const q = hinges[i]!;
      expect(q.order).toBeGreaterThanOrEqual(p.order);
      if (q.order === p.order) {
        expect(q.position).toBeGreaterThan(p.position);
        expect(Math.abs(q.yieldLoadFactor - p.yieldLoadFactor)).toBeLessThanOrEqual(1e-6 * p.yieldLoadFactor);
      }
    }
    const supports = hinges.filter((h) => h.position === 0 || h.position === L);
    expect(supports.map((h) => [h.order, h.together])).toEqual([[supports[0]!.order, [L]], [supports[0]!.order, [0]]]);
  });

  it('the order read by a user does not depend on the solver path', () => {
    // Another line search and load steps twice as long reach the twins by another path.
    expect(sequence(mirrored({ lineSearch: 'quadratic', stepScale: 2 }))).toEqual(sequence(r));
  });

  it('first cracking at the supports where the fixed-end moment P·a·b/L reaches the cracking moment', () => {
    const cracking = r.loadDeflection.events.find((e) => e.kind === 'cracking')!;
    expect(cracking.position).toBe(0);
    // Fixed-end moment of a load P at a (b = L − a): P·a·b²/L² at the left end; of the mirrored pair
    // P·a·b²/L² + P·b·a²/L² = P·a·b/L (AISC Manual Table 3-23 case 16, from memory). The uncracked
    // beam has one section throughout, so the end moment is the elastic one while no section cracked.
    const endMoment = (cracking.loadFactor * P * a * (L - a)) / L;
    const crackingMoment = sectionResponse(cache('r1')!.curves.hogging!)!.crackingMoment!;
    // 0.5 %: the hogging and sagging uncracked stiffnesses differ by 0.3 % (the bars' positions).
    expect(Math.abs(endMoment / crackingMoment - 1)).toBeLessThan(0.005);
  });
});
