/**
 * The discretised member the nonlinear solver works on: stations along the span, the section
 * response of each zone, and the moment fields of the loads and of the redundants.
 * Units: mm, N·mm, 1/mm.
 */
import type { SupportType } from './definition.ts';
import type { SectionResponse, ValueAndSlope } from './section-response.ts';
import { redundantEnds, redundantField } from './statics.ts';

export interface ZoneResponse {
  readonly sectionId: string;
  readonly from: number;
  readonly to: number;
  readonly sagging: SectionResponse;
  readonly hogging: SectionResponse;
  /** Data for hinge lengths, per direction: effective depth (mm), main bar diameter (mm), fy and fu (MPa). */
  readonly hingeData: {
    readonly sagging: HingeSectionData;
    readonly hogging: HingeSectionData;
  };
}

export interface HingeSectionData {
  readonly effectiveDepth: number;
  readonly barDiameter: number;
  readonly yieldStress: number;
  readonly ultimateStress: number;
}

export interface BeamModel {
  readonly support: SupportType;
  readonly span: number;
  /** Station positions, ascending; a position repeats where the zone (section) changes. */
  readonly x: Float64Array;
  /** Zone index of each segment [x[k], x[k+1]]. */
  readonly segmentZone: Int32Array;
  /**
   * Zone whose curve gives the curvature at each station: that of its right-hand segment, or of
   * its left-hand one when the right-hand segment has zero length (a zone boundary) or at the end.
   */
  readonly stationZone: Int32Array;
  readonly zones: readonly ZoneResponse[];
  readonly redundants: readonly ('left' | 'right')[];
  /** Unit moment field of each redundant at every station. */
  readonly redundantFields: readonly Float64Array[];
}

/**
 * Stations: `segments` equal divisions plus every zone boundary (doubled, so each side has its own
 * section), every point-load position and every end of a partial uniform load.
 */
export function buildBeamModel(support: SupportType, span: number, zones: readonly ZoneResponse[], extraPoints: readonly number[], segments: number): BeamModel {
  const points = new Set<number>();
  for (let i = 0; i <= segments; i++) points.add((span * i) / segments);
  for (const p of extraPoints) if (p > 0 && p < span) points.add(p);
  const boundaries = new Set<number>();
  for (const z of zones) {
    if (z.from > 0 && z.from < span) boundaries.add(z.from);
  }
  for (const b of boundaries) points.add(b);
  const sorted = [...points].sort((a, b) => a - b);
  const xs: number[] = [];
  for (const p of sorted) {
    xs.push(p);
    if (boundaries.has(p)) xs.push(p);
  }
  const x = Float64Array.from(xs);
  const segmentZone = new Int32Array(x.length - 1);
  let doubledSeen = false;
  for (let k = 0; k < x.length - 1; k++) {
    const a = x[k]!;
    const b = x[k + 1]!;
    let mid = 0.5 * (a + b);
    if (b === a) {
      // Zero-length segment at a boundary: it belongs to the zone on the right.
      mid = a + 1e-9;
      doubledSeen = true;
    }
    const z = zones.findIndex((zone) => mid >= zone.from && mid <= zone.to);
    segmentZone[k] = z < 0 ? zones.length - 1 : z;
  }
  void doubledSeen;
  const stationZone = new Int32Array(x.length);
  for (let i = 0; i < x.length; i++) {
    const right = i < x.length - 1 && x[i + 1]! > x[i]! ? i : -1;
    stationZone[i] = right >= 0 ? segmentZone[right]! : segmentZone[Math.max(i - 1, 0)]!;
  }
  const redundants = redundantEnds(support);
  const redundantFields = redundants.map((end) => Float64Array.from(x, (xi) => redundantField(end, span, xi)));
  return { support, span, x, segmentZone, stationZone, zones, redundants, redundantFields };
}

/** Signed curvature (sagging positive) and flexibility dφ/dM for a signed moment in a zone. */
export function zoneCurvature(zone: ZoneResponse, moment: number, out: ValueAndSlope): ValueAndSlope {
  if (moment >= zone.sagging.momentAtZero) return zone.sagging.integration(moment, out);
  zone.hogging.integration(-moment, out);
  out.value = -out.value;
  return out;
}
