/**
 * A fixed set of varied members whose key results are pinned (test/core/member/pinned-results.test.ts):
 * the demo projects (US and SI, their as-found and strengthened variants and continuous members),
 * every support type under both code bases, point loads, and bars cut off. `keyResults` reads the
 * numbers a speed change of the member engine must not move.
 */
import { analyzeProject, sectionCache } from '../../../../core/analysis.ts';
import { analyzeBeam } from '../../../../core/member/analyze.ts';
import type { BeamResult } from '../../../../core/member/results.ts';
import { demoProject, demoProjectSI } from '../../../../core/project/demo.ts';
import type { MemberDefinition, Project } from '../../../../core/project/types.ts';
import { member, smallProject } from '../../../fixtures/projects.ts';

/** One member's pinned numbers: mm, N, rad; null where the engine gives none. */
export interface KeyResults {
  readonly points: number;
  readonly peakLoadFactor: number | null;
  readonly peakTotalLoad: number | null;
  readonly firstYieldDeflection: number | null;
  readonly yieldDeflection: number | null;
  readonly ultimateDeflection: number | null;
  readonly displacementDuctility: number | null;
  readonly failureCause: string;
  /** Hinges in order of formation: position (mm), sense, yield load factor, localised, rotation at ultimate. */
  readonly hinges: readonly (readonly [number, string, number, boolean, number | null])[];
  /** Events: kind and load factor. */
  readonly events: readonly (readonly [string, number])[];
  /** Service deflections by integration, mm: dead, dead + live, sustained, and the long-term total (null: no service state). */
  readonly service: readonly number[] | null;
}

function beamKeys(r: BeamResult): KeyResults {
  const pts = r.loadDeflection.points;
  let peak: (typeof pts)[number] | null = null;
  for (const p of pts) if (!peak || p.totalLoad > peak.totalLoad) peak = p;
  return {
    points: pts.length,
    peakLoadFactor: peak?.loadFactor ?? null,
    peakTotalLoad: peak?.totalLoad ?? null,
    firstYieldDeflection: r.ductility.firstYieldDeflection,
    yieldDeflection: r.ductility.yieldDeflection,
    ultimateDeflection: r.ductility.ultimateDeflection,
    displacementDuctility: r.ductility.displacementDuctility,
    failureCause: r.ductility.failureCause,
    hinges: [...r.ductility.hinges].sort((a, b) => a.order - b.order).map((h) => [h.position, h.direction, h.yieldLoadFactor, h.localised, h.rotationAtUltimate] as const),
    events: r.loadDeflection.events.map((e) => [e.kind, e.loadFactor] as const),
    service: r.service ? [r.service.immediate.integration.dead, r.service.immediate.integration.deadPlusLive, r.service.immediate.integration.sustained, r.service.longTerm.integrationTotal] : null,
  };
}

/** Members of the engine fixtures: every support type, a point load, a T-section, bars cut off. */
function fixtureMembers(): MemberDefinition[] {
  return [
    member('SS', 'simply-supported', 7000, 'r1'),
    member('C', 'cantilever', 2500, 'r1'),
    member('FF', 'fixed-fixed', 8000, 't1'),
    member('PC', 'propped-cantilever', 7000, 't1', { loads: [{ kind: 'point', loadCase: 'live', magnitude: 60000, position: 2500 }, { kind: 'uniform', loadCase: 'dead', magnitude: 6, from: 1000, to: 5000 }] }),
    member('FF-CUT', 'fixed-fixed', 7200, 't1', { zones: [{ from: 0, to: 1500, sectionId: 't1' }, { from: 1500, to: 5700, sectionId: 'r1' }, { from: 5700, to: 7200, sectionId: 't1' }] }),
    member('SS-PT', 'simply-supported', 6000, 'r1', { loads: [{ kind: 'uniform', loadCase: 'superimposed', magnitude: 5 }, { kind: 'point', loadCase: 'live', magnitude: 80000, position: 2700 }] }),
  ];
}

/** Every pinned member's key results, keyed by a readable name. */
export function pinnedResults(): Record<string, KeyResults | Record<string, unknown>> {
  const out: Record<string, KeyResults | Record<string, unknown>> = {};
  for (const code of ['ACI 318-19', 'EN 1992-1-1'] as const) {
    const project: Project = smallProject(code);
    const section = sectionCache(project);
    const ids = new Set(project.sections.map((s) => s.id));
    for (const m of fixtureMembers()) {
      // The project default of 60 stations (the load–deflection model raises it to CAPACITY_MIN_SEGMENTS).
      const r = analyzeBeam(m, { code, segments: 60, section, sectionIds: ids, path: 'members[0]' }).result;
      out[`${code} ${m.id}`] = beamKeys(r);
    }
  }
  for (const [name, project] of [['demo', demoProject()], ['demo SI', demoProjectSI()]] as const) {
    const results = analyzeProject(project);
    for (const r of results.members) {
      out[`${name} ${r.memberId}`] = beamKeys(r);
      const variants = [r.retrofit?.original, r.retrofit?.asFound?.variant, ...(r.retrofit?.schemes.map((s) => s.variant) ?? [])];
      for (const v of variants) {
        if (!v) continue;
        out[`${name} ${r.memberId} variant ${v.key}`] = { ...v.capacity, points: v.loadDeflection.points.length, yieldDeflection: v.ductility.yieldDeflection, displacementDuctility: v.ductility.displacementDuctility, hinges: v.ductility.hinges.map((h) => [h.position, h.direction, h.order, h.yieldLoadFactor]) };
      }
    }
    for (const c of results.continuous ?? []) {
      const cap = c.capacity;
      out[`${name} ${c.memberId} continuous`] = {
        collapseTotal: c.strengthLevel?.collapseTotal ?? null,
        peakLoadFactor: cap?.peakLoadFactor ?? null,
        ultimate: cap?.ultimate ?? null,
        yieldDeflection: cap?.yieldDeflection ?? null,
        ultimateDeflection: cap?.ultimateDeflection ?? null,
        displacementDuctility: cap?.displacementDuctility ?? null,
        failureCause: cap?.failureCause ?? null,
        points: cap?.points.length ?? 0,
        hinges: cap?.hinges.map((h) => [h.order, h.position, h.direction, h.loadFactor, h.rotation]) ?? [],
      };
    }
  }
  return out;
}
