/**
 * Member shear: statics of the factored and mechanism states, the critical section near supports,
 * and the flexure- or shear-governed verdict. Statics are checked against handbook beam formulas.
 */
import { describe, expect, it } from 'vitest';
import { say } from '../../../core/units/phrase.ts';
import { analyzeProject, sectionCache } from '../../../core/analysis.ts';
import { elasticSupportMoments } from '../../../core/assessment/demand.ts';
import { memberShear } from '../../../core/assessment/shear.ts';
import type { ShearZone } from '../../../core/assessment/shear-section.ts';
import { releasedShear } from '../../../core/member/statics.ts';
import { materialLibrary } from '../../../core/materials/library.ts';
import type { Project, MemberDefinition } from '../../../core/project/types.ts';
import { member, smallProject } from '../../fixtures/projects.ts';

function zonesOf(project: Project, m: MemberDefinition): ShearZone[] {
  const section = sectionCache(project);
  const materials = materialLibrary(project.materials, project.info.codeBasis);
  return m.zones.map((z) => {
    const definition = project.sections.find((s) => s.id === z.sectionId)!;
    return { from: z.from, to: z.to, definition, analysis: section(z.sectionId)!, concrete: materials.concreteSpec(definition.concreteId)!, stirrupYield: materials.steel(definition.hoops!.steelId)!.yieldStress };
  });
}

const aci = { combinations: [{ name: '1.2D + 1.6L', source: 'ACI 318-19 Eq. (5.3.1b)', factors: { dead: 1.2, superimposed: 1.2, live: 1.6 } }] };

describe('released shear (statics)', () => {
  it('simple span, point load P at a: V = P(L − a)/L left of it and −Pa/L right of it', () => {
    const loads = [{ kind: 'point' as const, p: 100_000, a: 2000 }];
    expect(releasedShear('simply-supported', 6000, loads, 2000, 'left')).toBeCloseTo(100_000 * 4000 / 6000, 9);
    expect(releasedShear('simply-supported', 6000, loads, 2000, 'right')).toBeCloseTo(-100_000 * 2000 / 6000, 9);
  });

  it('simple span, uniform w: V(x) = w(L/2 − x)', () => {
    const loads = [{ kind: 'uniform' as const, w: 20, from: 0, to: 6000 }];
    expect(releasedShear('simply-supported', 6000, loads, 1000, 'right')).toBeCloseTo(20 * 2000, 9);
  });

  it('cantilever fixed at 0: V(x) = w(L − x) + P for a tip load P', () => {
    const loads = [{ kind: 'uniform' as const, w: 10, from: 0, to: 3000 }, { kind: 'point' as const, p: 5000, a: 3000 }];
    expect(releasedShear('cantilever', 3000, loads, 1000, 'right')).toBeCloseTo(10 * 2000 + 5000, 9);
  });
});

describe('elastic support moments (handbook: fixed–fixed −wL²/12, propped cantilever −wL²/8 at the fixed end)', () => {
  const w = 25;
  const L = 7000;
  const loads = [{ kind: 'uniform' as const, w, from: 0, to: L }];
  const zones = [{ from: 0, to: L, sectionId: 's', stiffness: 3e13 }];
  it('fixed–fixed', () => {
    const m = elasticSupportMoments({ ...member('F', 'fixed-fixed', L, 's') }, zones, loads, 200);
    expect(m.left / (-w * L * L / 12)).toBeCloseTo(1, 3);
    expect(m.right / (-w * L * L / 12)).toBeCloseTo(1, 3);
  });
  it('propped cantilever', () => {
    const m = elasticSupportMoments({ ...member('P', 'propped-cantilever', L, 's') }, zones, loads, 200);
    expect(m.left / (-w * L * L / 8)).toBeCloseTo(1, 3);
    expect(m.right).toBe(0);
  });
});

describe('shear at the flexural mechanism', () => {
  const project = smallProject('ACI 318-19');
  const selfWeight = 2400 * 9.80665 * 300 * 600 * 1e-9; // 4.2365 N/mm
  const w = selfWeight + 8 + 12; // fixture loads: superimposed 8 N/mm, live 12 N/mm (proportional pattern)
  const L = 6000;
  const peak = (dir: 'sagging' | 'hogging') => sectionCache(project)('r1')!.curves[dir]!.keyPoints.peak!.moment;

  it('simply supported: λ·wL²/8 = Mo+, V at d = λ·w·(L/2 − d)', () => {
    const m = member('S', 'simply-supported', L, 'r1');
    const r = memberShear({ code: 'ACI 318-19', member: m, zones: zonesOf(project, m), ...aci });
    const lambda = peak('sagging') / (w * L * L / 8);
    expect(r.mechanism!.loadFactor / lambda).toBeCloseTo(1, 4);
    expect(Math.min(r.mechanism!.governing.position, L - r.mechanism!.governing.position)).toBeCloseTo(540, 6); // the section at d from either support (symmetric)
    expect(r.mechanism!.governing.shear / (lambda * w * (L / 2 - 540))).toBeCloseTo(1, 4);
    expect(r.governs).toBe('flexure');
    expect(r.flexuralDuctilityAvailable).toBe(true);
    expect(say(r.criticalSectionRule, 'si')).toMatch(/9\.4\.3\.2/);
  });

  it('fixed–fixed: λ·wL²/8 = Mo+ + Mo−, equal end moments leave V = λ·w·(L/2 − x)', () => {
    const m = member('F', 'fixed-fixed', L, 'r1');
    const r = memberShear({ code: 'ACI 318-19', member: m, zones: zonesOf(project, m), ...aci });
    const lambda = (peak('sagging') + peak('hogging')) / (w * L * L / 8);
    expect(r.mechanism!.loadFactor / lambda).toBeCloseTo(1, 4);
    const x = r.mechanism!.governing.position;
    expect(Math.min(x, L - x)).toBeCloseTo(540, 6); // the smaller d (bottom bars 540, top bars 600 − 55 = 545) sets the skip
    expect(r.mechanism!.governing.shear / (lambda * w * (L / 2 - 540))).toBeCloseTo(1, 4);
    expect(r.mechanism!.hinges.map((h) => h.direction).sort()).toEqual(['hogging', 'hogging', 'sagging']);
  });

  it('cantilever: λ·wL²/2 = Mo−, V at d = λ·w·(L − d)', () => {
    const Lc = 2500;
    const m = member('C', 'cantilever', Lc, 'r1');
    const r = memberShear({ code: 'ACI 318-19', member: m, zones: zonesOf(project, m), ...aci });
    const lambda = peak('hogging') / (w * Lc * Lc / 2);
    expect(r.mechanism!.loadFactor / lambda).toBeCloseTo(1, 4);
    expect(r.mechanism!.governing.shear / (lambda * w * (Lc - 540))).toBeCloseTo(1, 4);
  });

  it('the overstrength factor scales the mechanism shear of a determinate beam in proportion', () => {
    const m = member('S', 'simply-supported', L, 'r1');
    const zones = zonesOf(project, m);
    const a = memberShear({ code: 'ACI 318-19', member: m, zones, ...aci });
    const b = memberShear({ code: 'ACI 318-19', member: m, zones, ...aci, overstrengthFactor: 1.25 });
    expect(b.mechanism!.governing.shear / a.mechanism!.governing.shear).toBeCloseTo(1.25, 6);
    expect(b.mechanism!.overstrengthBasis).toMatch(/1\.25 ×/);
  });

  it('factored shear: 1.2D + 1.6L on the simple span, V at d = wu(L/2 − d) against φVn', () => {
    const m = member('S', 'simply-supported', L, 'r1');
    const r = memberShear({ code: 'ACI 318-19', member: m, zones: zonesOf(project, m), ...aci });
    const wu = 1.2 * (selfWeight + 8) + 1.6 * 12;
    expect(r.factored!.governing.shear).toBeCloseTo(wu * (L / 2 - 540), 3);
    expect(r.factored!.utilisation).toBeCloseTo(r.factored!.governing.shear / r.factored!.governing.design, 10);
    expect(r.factored!.pass).toBe(true);
  });

  it('a point load within d of a support: the support face is checked', () => {
    const m = member('S', 'simply-supported', L, 'r1', { loads: [{ kind: 'point', loadCase: 'live', magnitude: 80_000, position: 300 }, { kind: 'uniform', loadCase: 'superimposed', magnitude: 8 }] });
    const r = memberShear({ code: 'ACI 318-19', member: m, zones: zonesOf(project, m), ...aci });
    expect(say(r.criticalSectionRule, 'si')).toMatch(/point load lies within d/);
    expect(r.factored!.governing.position).toBeLessThan(540);
  });

  it('warns when the main tension steel has no strain hardening (the mechanism shear then has no overstrength margin)', () => {
    const m = member('S', 'simply-supported', L, 'r1');
    expect(memberShear({ code: 'ACI 318-19', member: m, zones: zonesOf(project, m), ...aci }).warnings.map((w) => say(w, 'si')).join(' ')).not.toMatch(/no strain hardening/);
    const flat = { ...project, materials: project.materials.map((x) => (x.id === 'b500' ? { ...x, model: 'elastic-plastic' as const, ultimateStress: 500 } : x)) };
    expect(memberShear({ code: 'ACI 318-19', member: m, zones: zonesOf(flat, m), ...aci }).warnings.map((w) => say(w, 'si')).join(' ')).toMatch(/no strain hardening/);
  });

  it('no live load under a live-only pattern: the failure mode is not determined, and says why', () => {
    const m = member('S', 'simply-supported', L, 'r1', { loads: [{ kind: 'uniform', loadCase: 'dead', magnitude: 10 }], capacity: { pattern: 'live-only', hingeLengthMethod: 'priestley-2007' } });
    const r = memberShear({ code: 'ACI 318-19', member: m, zones: zonesOf(project, m), ...aci });
    expect(r.governs).toBe('undetermined');
    expect(r.mechanism).toBeNull();
    expect(say(r.sentence, 'si')).toMatch(/no load pattern to scale/);
  });
});

describe('flexure-governed or shear-governed, in the member result', () => {
  function heavyProject(code: 'ACI 318-19' | 'EN 1992-1-1'): Project {
    const base = smallProject(code);
    return {
      ...base,
      sections: [...base.sections, {
        id: 'deep', name: '300 × 600, heavy bars, no stirrups', shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c30',
        bars: [{ steelId: 'b500', depth: 540, count: 4, diameter: 28 }, { steelId: 'b500', depth: 480, count: 3, diameter: 25 }, { steelId: 'b500', depth: 55, count: 2, diameter: 16 }],
      }],
      members: [member('SG', 'simply-supported', 3600, 'deep'), member('FG', 'simply-supported', 6000, 'r1')],
    };
  }

  it.each(['ACI 318-19', 'EN 1992-1-1'] as const)('%s: a short, heavily reinforced beam without stirrups is shear-governed: brittle, its ductility and hinge rotations withdrawn with the reason', (code) => {
    const results = analyzeProject(heavyProject(code));
    const sg = results.members[0]!;
    expect(sg.shear!.governs).toBe('shear');
    expect(sg.shear!.flexuralDuctilityAvailable).toBe(false);
    expect(sg.shear!.mechanism!.nominalRatio).toBeGreaterThan(1);
    expect(sg.shear!.shearFailureLoadFactor!).toBeLessThan(sg.shear!.mechanism!.loadFactor);
    expect(say(sg.governingMode, 'si')).toMatch(/^Shear governs \(brittle\)/);
    expect(say(sg.governingMode, 'si')).toMatch(/not available/);
    expect(sg.status).toBe('brittle');
    expect(sg.brittle.map((b) => b.cause)).toContain('shear-before-flexure');
    expect(say(sg.ductilityUnavailable!, 'si')).toMatch(/^not available: shear would be reached before the flexural mechanism/);
    expect(sg.ductility.displacementDuctility).toBeNull();
    expect(sg.ductility.hinges.length).toBeGreaterThan(0);
    expect(sg.ductility.hinges.every((h) => h.rotationCapacity === null && h.rotationAtUltimate === null)).toBe(true);
    const fg = results.members[1]!;
    expect(fg.shear!.governs).toBe('flexure');
    expect(say(fg.governingMode, 'si')).toMatch(/shear: flexure governs/);
  });

  it('every number of the shear result is finite (no NaN or Infinity reaches a user)', () => {
    const results = analyzeProject(heavyProject('EN 1992-1-1'));
    const walk = (v: unknown): void => {
      if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);
      else if (Array.isArray(v)) v.forEach(walk);
      else if (v && typeof v === 'object') Object.values(v).forEach(walk);
    };
    for (const m of results.members) walk(m.shear);
  });

  it('EN 1992-1-1 checks the support face against 0.5·bw·d·ν·fcd (Eq. 6.5)', () => {
    const results = analyzeProject(heavyProject('EN 1992-1-1'));
    const cap = results.members[1]!.shear!.capacities[0]!;
    expect(cap.supportLimit!.design).toBeCloseTo(0.5 * cap.webWidth * cap.effectiveDepth * 0.6 * (1 - 30 / 250) * 20, 6);
    expect(say(results.members[1]!.shear!.criticalSectionRule, 'si')).toMatch(/Eq\. 6\.5/);
  });
});

describe('the shear diagram along the span', () => {
  const project = smallProject('ACI 318-19');
  const selfWeight = 2400 * 9.80665 * 300 * 600 * 1e-9;
  const L = 6000;
  const m = member('D', 'simply-supported', L, 'r1');
  const r = memberShear({ code: 'ACI 318-19', member: m, zones: zonesOf(project, m), ...aci });
  const d = r.diagram;

  it('holds the factored shear of statics at every station: |V| = wu·|L/2 − x|', () => {
    const wu = 1.2 * (selfWeight + 8) + 1.6 * 12;
    expect(d.x.length).toBeGreaterThan(100);
    d.x.forEach((x, i) => {
      // Handbook, simple span under uniform load: V(x) = w(L/2 − x)
      expect(d.factored[i]).toBeCloseTo(wu * Math.abs(L / 2 - x), 3);
    });
  });

  it('draws the capacity of the section and leaves the stretch within d of the supports unchecked', () => {
    const cap = r.capacities.find((c) => c.direction === 'sagging')!;
    d.x.forEach((x, i) => {
      // At the supports the moment is zero within round-off and may read as either sense.
      if (x > 0 && x < L) {
        expect(d.design[i]).toBe(cap.design);
        expect(d.nominal[i]).toBe(cap.nominal);
      }
      // ACI 318-19 9.4.3.2: sections closer than d to the support take the shear at d
      expect(d.checked[i]).toBe(x >= 540 - 1e-9 && x <= L - 540 + 1e-9);
    });
  });

  it('passes through the governing points of the check and of the mechanism', () => {
    const at = (x: number) => d.x.findIndex((xi) => Math.abs(xi - x) < 1e-9);
    const f = r.factored!.governing;
    expect(d.factored[at(f.position)]).toBeCloseTo(f.shear, 6);
    const g = r.mechanism!.governing;
    expect(d.mechanism![at(g.position)]).toBeCloseTo(g.shear, 6);
    expect(Math.max(...d.mechanism!.filter((_, i) => d.checked[i]))).toBeCloseTo(g.shear, 6);
  });
});
