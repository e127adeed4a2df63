/**
 * Zone responses for the member engine: for each section used along the span, its sagging and
 * hogging moment–curvature responses and the data the hinge-length expressions need.
 */
import type { SectionModel, BendingDirection } from '../section/model.ts';
import type { ElasticProperties } from '../section/elastic.ts';
import type { MomentCurvatureResult } from '../section/results.ts';
import { tensionSteel } from '../section/model.ts';
import type { HingeSectionData, ZoneResponse } from './beam-model.ts';
import { plasticLaw } from './plastic-law.ts';
import { plainConcreteResponse, sectionResponse, type SectionResponse } from './section-response.ts';

/** Hinge data of a zone that never forms a hinge (elastic analyses). */
const NO_HINGE: HingeSectionData = { effectiveDepth: 1, barDiameter: 0, yieldStress: 1, ultimateStress: 1 };

/**
 * A linear-elastic zone of flexural stiffness EI (N·mm²) in both directions, which never cracks or
 * yields: the elastic analyses of the strength checks and of the control point.
 */
export function elasticZone(sectionId: string, from: number, to: number, stiffness: number): ZoneResponse {
  const lin = plainConcreteResponse(stiffness, Number.MAX_VALUE);
  return { sectionId, from, to, sagging: lin, hogging: lin, hingeData: { sagging: NO_HINGE, hogging: NO_HINGE } };
}

/** Effective depth, main bar diameter, fy and fu of the tension steel for a direction. */
export function hingeSectionData(model: SectionModel, direction: BendingDirection): HingeSectionData {
  // Hinge lengths depend on the main bars (strain penetration, hardening): bonded plates added by a
  // retrofit scheme count only when the section has no bars on that side.
  const all = tensionSteel(model, direction);
  const bars = all.filter((e) => e.kind === 'bar');
  const steel = bars.length > 0 ? bars : all;
  // The concrete the bars are anchored in: the part that holds them (the main concrete otherwise).
  const concrete = model.concreteParts.find((p) => p.role === 'cover') ?? model.concreteParts[0];
  const concreteStrength = concrete?.material.peakStress;
  const common = { height: model.height, ...(concreteStrength !== undefined ? { concreteStrength } : {}) };
  if (steel.length === 0) return { effectiveDepth: model.height * 0.9, barDiameter: 0, yieldStress: 1, ultimateStress: 1, ...common };
  const area = steel.reduce((s, e) => s + e.area, 0);
  const centroid = steel.reduce((s, e) => s + e.area * e.depth, 0) / area;
  const main = steel.reduce((a, b) => (b.area > a.area ? b : a));
  const material = main.material as { yieldStress?: number; ultimateStress?: number };
  return {
    effectiveDepth: direction === 'sagging' ? centroid : model.height - centroid,
    barDiameter: Math.max(...steel.map((e) => e.diameter ?? Math.sqrt((4 * e.area) / Math.PI))),
    yieldStress: material.yieldStress ?? 1,
    ultimateStress: material.ultimateStress ?? material.yieldStress ?? 1,
    ...common,
  };
}

/**
 * Response for one direction: from the computed curve, or, when the section has no tension steel
 * on that side, the plain-concrete response (linear to the cracking moment, which is then its
 * capacity).
 */
export function directionResponse(curve: MomentCurvatureResult | undefined, elastic: ElasticProperties, direction: BendingDirection): SectionResponse {
  const fromCurve = curve ? sectionResponse(curve) : undefined;
  if (fromCurve) return fromCurve;
  const stiffness = elastic.concreteModulus * elastic.uncrackedInertia;
  return plainConcreteResponse(stiffness, elastic.crackingMoment[direction].transformed);
}

export function zoneResponse(
  sectionId: string,
  from: number,
  to: number,
  model: SectionModel,
  elastic: ElasticProperties,
  curves: { sagging?: MomentCurvatureResult; hogging?: MomentCurvatureResult },
): ZoneResponse {
  const sagging = directionResponse(curves.sagging, elastic, 'sagging');
  const hogging = directionResponse(curves.hogging, elastic, 'hogging');
  return {
    sectionId,
    from,
    to,
    sagging,
    hogging,
    hingeData: { sagging: hingeSectionData(model, 'sagging'), hogging: hingeSectionData(model, 'hogging') },
    plastic: { sagging: plasticLaw(curves.sagging, sagging), hogging: plasticLaw(curves.hogging, hogging) },
  };
}

/**
 * Index of the zone at x, on the given side of a zone boundary (the zone ending there for 'left',
 * the zone starting there for 'right'); the first or last zone outside the zones' extent.
 */
export function zoneIndexAt(zones: readonly { readonly from: number; readonly to: number }[], x: number, side: 'left' | 'right'): number {
  for (let i = 0; i < zones.length; i++) {
    const z = zones[i]!;
    if (side === 'right' ? x >= z.from && x < z.to : x > z.from && x <= z.to) return i;
  }
  return x <= (zones[0]?.from ?? 0) ? 0 : zones.length - 1;
}
