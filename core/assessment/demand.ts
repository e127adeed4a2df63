/**
 * Demands of an elastic analysis of the member (gross section of each zone at the code modulus,
 * no redistribution), as the strength checks take them: the support moments, from which the
 * moment and shear follow at any x by statics (core/member/statics.ts memberForcesAt).
 * Units: N, mm, N·mm.
 */
import { buildBeamModel, type ZoneResponse } from '../member/beam-model.ts';
import type { BeamDefinition, LoadFactors } from '../member/definition.ts';
import { solveStatic } from '../member/static.ts';
import { memberForcesAt, releasedMoment, type StaticLoad } from '../member/statics.ts';
import { elasticZone } from '../member/zones.ts';
import type { SectionAnalysis } from '../section/analyze.ts';
import type { BendingDirection } from '../section/model.ts';
import { brentRoot } from '../numeric/roots.ts';
import { combinedLoads, memberLoadSets } from './combinations.ts';

/** A zone of the member with its elastic flexural stiffness, for support moments (mm, N·mm²). */
export interface ElasticZone {
  readonly from: number;
  readonly to: number;
  readonly sectionId: string;
  /** Flexural stiffness EI, N·mm². */
  readonly stiffness: number;
}

/**
 * Support moments (N·mm, sagging positive) of the member under `loads` by an elastic analysis
 * with the zones' stiffness — the engine's compatibility solution (core/member/static.ts
 * solveStatic) on linear responses, as the flexural strength check uses. 0 at a pin or free end.
 */
export function elasticSupportMoments(member: BeamDefinition, zones: readonly ElasticZone[], loads: readonly StaticLoad[], segments: number): { left: number; right: number } {
  if (member.supports === 'simply-supported' || member.supports === 'cantilever') return { left: 0, right: 0 };
  const responses: ZoneResponse[] = zones.map((z) => elasticZone(z.sectionId, z.from, z.to, z.stiffness));
  const extra = loads.flatMap((l) => (l.kind === 'point' ? [l.a] : [l.from, l.to]));
  const beam = buildBeamModel(member.supports, member.span, responses, extra, segments);
  const field = Float64Array.from(beam.x, (x) => releasedMoment(beam.support, member.span, loads, x));
  const state = solveStatic(beam, field);
  return { left: state.moment[0]!, right: state.moment[state.moment.length - 1]! };
}

/**
 * The stations where the moment of a load state can peak or jump: the equal segments of the span,
 * the zone boundaries, the load positions and edges, and the points of zero shear between them (so
 * a check over them does not depend on the station count). Sorted, mm from the left support.
 * @param forces moment and shear of the load state at x, on either side of a jump
 */
export function momentStations(member: BeamDefinition, zones: readonly { readonly from: number; readonly to: number }[], forces: (x: number, side: 'left' | 'right') => { moment: number; shear: number }, segments: number): number[] {
  const span = member.span;
  const set = new Set<number>();
  for (let i = 0; i <= segments; i++) set.add((span * i) / segments);
  for (const z of zones) {
    set.add(z.from);
    set.add(z.to);
  }
  for (const l of member.loads) {
    if (l.kind === 'point') set.add(l.position);
    else {
      set.add(l.from ?? 0);
      set.add(l.to ?? span);
    }
  }
  const base = [...set].filter((x) => x >= 0 && x <= span).sort((a, b) => a - b);
  const out = [...base];
  for (let i = 0; i + 1 < base.length; i++) {
    const a = base[i]!;
    const b = base[i + 1]!;
    // Within (a, b) no load starts, ends or acts as a point: the shear is continuous there.
    const va = forces(a, 'right').shear;
    const vb = forces(b, 'left').shear;
    if (va * vb < 0) {
      const root = brentRoot((x) => forces(x, 'right').shear, a, b, va, vb, { xTolerance: 1e-9 * span });
      out.push(root.x);
    }
  }
  return out.sort((a, b) => a - b);
}

/**
 * The largest moment of one sense (N·mm magnitude) within some zones of a member under a load
 * combination, and where (mm): elastic analysis on gross sections at the code modulus, each zone
 * sampled at no fewer than 8 stations and in proportion to `segments` over the span, and at every
 * point where the moment can peak inside it (momentStations).
 * @param zones the member's zones with their section analyses (self-weight, stiffness)
 * @param zoneIndices which of the member's zones to search
 */
export function largestZoneMoment(member: BeamDefinition, zones: readonly { readonly from: number; readonly to: number; readonly analysis: SectionAnalysis }[], factors: LoadFactors, zoneIndices: readonly number[], direction: BendingDirection, segments: number): { moment: number; position: number } {
  const loads = combinedLoads(memberLoadSets(member, zones.map((z) => z.analysis.selfWeight)), factors);
  const elastic: ElasticZone[] = zones.map((z) => ({ from: z.from, to: z.to, sectionId: z.analysis.sectionId, stiffness: z.analysis.codeModulus * (z.analysis.elastic?.grossInertia ?? 0) }));
  const ends = elasticSupportMoments(member, elastic, loads, segments);
  let best = { moment: 0, position: 0 };
  const sign = direction === 'sagging' ? 1 : -1;
  const forces = (x: number, side: 'left' | 'right') => memberForcesAt(member.supports, member.span, loads, ends, x, side);
  // Where the moment can peak (point loads, load edges, zero shear), so a peak between equal stations is not missed.
  const peaks = momentStations(member, member.zones, forces, segments);
  for (const i of zoneIndices) {
    const z = member.zones[i]!;
    const n = Math.max(8, Math.ceil((segments * (z.to - z.from)) / member.span));
    const xs = [...Array.from({ length: n + 1 }, (_, k) => z.from + ((z.to - z.from) * k) / n), ...peaks.filter((x) => x > z.from && x < z.to)];
    for (const x of xs) {
      for (const side of ['left', 'right'] as const) {
        const mx = sign * forces(x, side).moment;
        if (mx > best.moment) best = { moment: mx, position: x };
      }
    }
  }
  return best;
}
