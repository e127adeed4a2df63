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
 * The largest moment of one sense (N·mm magnitude) within some zones of a member under a load
 * combination, and where (mm): elastic analysis on gross sections at the code modulus, each zone
 * sampled at no fewer than 8 stations and in proportion to `segments` over the span.
 * @param zones the member's zones with their section analyses (self-weight, stiffness)
 * @param zoneIndices which of the member's zones to search
 */
export function largestZoneMoment(member: BeamDefinition, zones: readonly { readonly from: number; readonly to: number; readonly analysis: SectionAnalysis }[], factors: LoadFactors, zoneIndices: readonly number[], direction: BendingDirection, segments: number): { moment: number; position: number } {
  const loads = combinedLoads(memberLoadSets(member, zones.map((z) => z.analysis.selfWeight)), factors);
  const elastic: ElasticZone[] = zones.map((z) => ({ from: z.from, to: z.to, sectionId: z.analysis.sectionId, stiffness: z.analysis.codeModulus * (z.analysis.elastic?.grossInertia ?? 0) }));
  const ends = elasticSupportMoments(member, elastic, loads, segments);
  let best = { moment: 0, position: 0 };
  const sign = direction === 'sagging' ? 1 : -1;
  for (const i of zoneIndices) {
    const z = member.zones[i]!;
    const n = Math.max(8, Math.ceil((segments * (z.to - z.from)) / member.span));
    for (let k = 0; k <= n; k++) {
      const x = z.from + ((z.to - z.from) * k) / n;
      for (const side of ['left', 'right'] as const) {
        const mx = sign * memberForcesAt(member.supports, member.span, loads, ends, x, side).moment;
        if (mx > best.moment) best = { moment: mx, position: x };
      }
    }
  }
  return best;
}
