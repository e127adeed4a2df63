/**
 * Demands of an elastic analysis of the member (gross section of each zone at the code modulus,
 * no redistribution), as the strength checks take them: the support moments, from which the
 * moment and shear follow at any x by statics (core/member/statics.ts memberForcesAt).
 * Units: N, mm, N·mm.
 */
import { buildBeamModel, type ZoneResponse } from '../member/beam-model.ts';
import type { BeamDefinition } from '../member/definition.ts';
import { solveStatic } from '../member/static.ts';
import { releasedMoment, type StaticLoad } from '../member/statics.ts';
import { elasticZone } from '../member/zones.ts';

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
