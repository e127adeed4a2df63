/**
 * The discretised member the nonlinear solver works on: stations along the whole member, the section
 * response of each zone, the redundants of its released structure and their unit moment fields.
 * Units: mm, N·mm, 1/mm, rad/(N·mm) for flexibilities.
 */
import type { SupportType } from './definition.ts';
import { singleSpanLayout, type MemberLayout } from './layout.ts';
import type { PlasticLaw } from './plastic-law.ts';
import type { SectionResponse, ValueAndSlope } from './section-response.ts';
import { zoneLookup } from './zone-lookup.ts';

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
  /**
   * The plastic part of the law per direction (core/member/plastic-law.ts): absent for elastic zones
   * and the code methods' zones, whose curvature is the nonlinear-elastic one only.
   */
  readonly plastic?: { readonly sagging: PlasticLaw | null; readonly hogging: PlasticLaw | null };
}

export interface HingeSectionData {
  readonly effectiveDepth: number;
  readonly barDiameter: number;
  readonly yieldStress: number;
  readonly ultimateStress: number;
  /** Concrete compressive strength for bond-slip expressions, MPa (absent: not known). */
  readonly concreteStrength?: number;
  /** Overall height of the section, mm. */
  readonly height?: number;
}

/**
 * A redundant of the released structure. 'continuity': the moment over an interior support, whose
 * unit field rises from 0 at the neighbouring supports to 1 over it. 'restraint': the moment a fixed
 * or spring support takes, whose unit field is 1 at the support face on one side (`side`) and falls
 * to 0 at the far end of that span. Its compatibility equation is
 *   ∫ φ·m dx + Σ θ·m(x_θ) + flexibility·X = 0,
 * flexibility = 1/k for a spring (rad per N·mm), 0 otherwise.
 */
export interface Redundant {
  readonly kind: 'continuity' | 'restraint';
  readonly support: number;
  readonly from: number;
  readonly at: number;
  readonly to: number;
  readonly side: 'left' | 'right' | 'both';
  readonly flexibility: number;
}

/** The redundants of a layout: continuity at interior supports, restraint at fixed and spring supports with a span beside them. */
export function redundantsOf(layout: MemberLayout): Redundant[] {
  const out: Redundant[] = [];
  const { supports, spans } = layout;
  supports.forEach((s, j) => {
    const left = spans.find((b) => b.rightSupport === j);
    const right = spans.find((b) => b.leftSupport === j);
    if (left && right) out.push({ kind: 'continuity', support: j, from: left.from, at: s.x, to: right.to, side: 'both', flexibility: 0 });
    if (s.kind === 'pinned') return;
    const flexibility = s.kind === 'spring' ? 1 / Math.max(s.stiffness, 1e-300) : 0;
    // The restraint acts on the span to its right (its left one at the last support).
    if (right) out.push({ kind: 'restraint', support: j, from: s.x, at: s.x, to: right.to, side: 'right', flexibility });
    else if (left) out.push({ kind: 'restraint', support: j, from: left.from, at: s.x, to: s.x, side: 'left', flexibility });
  });
  return out;
}

/**
 * Value of a redundant's unit field at x. At the support of a restraint field, `side` says on which
 * side of the support the point lies ('both' where the member has only one side there).
 */
export function fieldValue(r: Redundant, x: number, side: 'left' | 'right' | 'both' = 'both'): number {
  if (x < r.from || x > r.to) return 0;
  if (x < r.at) return (x - r.from) / (r.at - r.from);
  if (x > r.at) return (r.to - x) / (r.to - r.at);
  if (r.kind === 'continuity' || side === 'both') return 1;
  return side === r.side ? 1 : 0;
}

export interface BeamModel {
  readonly layout: MemberLayout;
  /** The single-span type for the single-span statics (continuous beams: the type their end supports resemble; use `layout`). */
  readonly support: SupportType;
  /** Length of the member, mm (a single span: its span). */
  readonly span: number;
  /** Station positions, ascending; a position repeats where the zone (section) changes or a support takes a moment. */
  readonly x: Float64Array;
  /** Side of each station at a repeated position: −1 the left copy, +1 the right copy, 0 a single station. */
  readonly side: Int8Array;
  /** Zone index of each segment [x[k], x[k+1]]. */
  readonly segmentZone: Int32Array;
  /**
   * Zone whose curve gives the curvature at each station: that of its right-hand segment, or of
   * its left-hand one when the right-hand segment has zero length (a zone boundary) or at the end.
   */
  readonly stationZone: Int32Array;
  readonly zones: readonly ZoneResponse[];
  readonly redundants: readonly Redundant[];
  /** Unit moment field of each redundant at every station. */
  readonly redundantFields: readonly Float64Array[];
  /** Flexibility of each redundant's support (1/k of a spring, 0 otherwise), rad per N·mm. */
  readonly flexibility: Float64Array;
  /** Station at each support, per face: the last station left of it and the first right of it (−1 where the member has no such side). */
  readonly supportStations: readonly { readonly left: number; readonly right: number }[];
}

/** Stations of a single span, as before continuous beams: see buildLineModel. */
export function buildBeamModel(support: SupportType, span: number, zones: readonly ZoneResponse[], extraPoints: readonly number[], segments: number): BeamModel {
  return buildLineModel(singleSpanLayout(support, span), zones, extraPoints, segments);
}

/**
 * Stations: `segments` equal divisions of every span (a cantilever in proportion to the longest
 * span, at least a quarter of them), plus every zone boundary (doubled, so each side has its own
 * section), every support (doubled where the support takes a moment, so each side has its own
 * moment), every point-load position and every end of a partial uniform load.
 */
export function buildLineModel(layout: MemberLayout, zones: readonly ZoneResponse[], extraPoints: readonly number[], segments: number): BeamModel {
  const length = layout.length;
  const points = new Set<number>();
  const reference = layout.spans.length > 0 ? Math.max(...layout.spans.map((b) => b.length)) : length;
  for (const bay of layout.bays) {
    // A single span (or a lone cantilever) gets exactly `segments` divisions; in a continuous beam
    // each bay gets its share by length, at least a quarter of them.
    const n = Math.max(Math.ceil(segments / 4), Math.round((segments * bay.length) / reference));
    for (let i = 0; i <= n; i++) points.add(i === n ? bay.to : bay.from + (bay.length * i) / n);
  }
  for (const p of extraPoints) if (p > 0 && p < length) points.add(p);
  const boundaries = new Set<number>();
  for (const z of zones) if (z.from > 0 && z.from < length) boundaries.add(z.from);
  const redundants = redundantsOf(layout);
  // A support that takes a moment with the member on both sides has a jump in moment there.
  for (const r of redundants) if (r.kind === 'restraint' && r.at > 0 && r.at < length) boundaries.add(r.at);
  for (const s of layout.supports) points.add(s.x);
  for (const b of boundaries) points.add(b);
  const sorted = [...points].sort((a, b) => a - b);
  const xs: number[] = [];
  const sides: number[] = [];
  for (const p of sorted) {
    xs.push(p);
    if (boundaries.has(p)) {
      sides.push(-1);
      xs.push(p);
      sides.push(1);
    } else sides.push(0);
  }
  const x = Float64Array.from(xs);
  const side = Int8Array.from(sides);
  const segmentZone = new Int32Array(x.length - 1);
  const zoneAt = zoneLookup(zones);
  for (let k = 0; k < x.length - 1; k++) {
    const a = x[k]!;
    const b = x[k + 1]!;
    // A zero-length segment at a boundary belongs to the zone on the right.
    const mid = b === a ? a + 1e-9 : 0.5 * (a + b);
    const z = zoneAt(mid);
    segmentZone[k] = z < 0 ? zones.length - 1 : z;
  }
  const stationZone = new Int32Array(x.length);
  for (let i = 0; i < x.length; i++) {
    const right = i < x.length - 1 && x[i + 1]! > x[i]! ? i : -1;
    stationZone[i] = right >= 0 ? segmentZone[right]! : segmentZone[Math.max(i - 1, 0)]!;
  }
  const sideName = (i: number) => (side[i] === -1 ? 'left' : side[i] === 1 ? 'right' : 'both') as 'left' | 'right' | 'both';
  const redundantFields = redundants.map((r) => Float64Array.from(x, (xi, i) => fieldValue(r, xi, sideName(i))));
  const flexibility = Float64Array.from(redundants, (r) => r.flexibility);
  const supportStations = layout.supports.map((s) => {
    const first = xs.indexOf(s.x);
    const last = xs.lastIndexOf(s.x);
    return { left: s.x > 0 ? first : -1, right: s.x < length ? last : -1 };
  });
  return { layout, support: layout.singleSpan ?? 'simply-supported', span: length, x, side, segmentZone, stationZone, zones, redundants, redundantFields, flexibility, supportStations };
}

/** Signed curvature (sagging positive) and flexibility dφ/dM for a signed moment in a zone. */
export function zoneCurvature(zone: ZoneResponse, moment: number, out: ValueAndSlope): ValueAndSlope {
  out.piece = -1;
  if (moment >= zone.sagging.momentAtZero) {
    zone.sagging.integration(moment, out);
    if (out.piece !== undefined && out.piece >= 0) out.piece += 1; // sagging pieces ≥ 1
    return out;
  }
  zone.hogging.integration(-moment, out);
  out.value = -out.value;
  if (out.piece !== undefined && out.piece >= 0) out.piece = -(out.piece + 10); // hogging pieces ≤ −10
  return out;
}

/**
 * Segment integrals from curvatures already known at both ends: when both ends lie on the same
 * linear piece of the law (no knot between them) the exact integrals are closed forms; otherwise
 * segmentIntegrals splits the segment at the knots.
 */
export function segmentIntegralsFromEnds(
  zone: ZoneResponse,
  ma: number,
  mb: number,
  a: ValueAndSlope,
  b: ValueAndSlope,
  secant: boolean,
  out: SegmentIntegrals,
): SegmentIntegrals {
  // Known pieces are ≥ 1 (sagging) or ≤ −10 (hogging); −1 … −9 mean unknown or off the table.
  const pa0 = a.piece ?? -1;
  const pb0 = b.piece ?? -1;
  const sagging = pa0 >= 1 && pb0 >= 1;
  const hogging = pa0 <= -10 && pb0 <= -10;
  if (secant || !(sagging || hogging)) return segmentIntegrals(zone, ma, mb, secant, out);
  if (pa0 !== pb0) return segmentAcrossKnots(zone, ma, mb, a, b, sagging, out);
  const pa = a.value;
  const pb = b.value;
  out.phiA = pa;
  out.phiB = pb;
  out.i0 = (pa + pb) / 2;
  out.i1 = (pa + 2 * pb) / 6;
  const f = mb !== ma ? (pb - pa) / (mb - ma) : a.slope;
  out.j00 = f / 3;
  out.j11 = f / 3;
  out.j01 = f / 6;
  return out;
}

/**
 * Integrals of the curvature over one segment whose moment varies linearly from `ma` to `mb`
 * (t from 0 to 1 along the segment), split at every knot of the zone's curvature law so that the
 * piecewise-linear curvature is integrated exactly:
 *   i0 = ∫ φ dt, i1 = ∫ φ·t dt, and for the Jacobian j00 = ∫ f(1−t)² dt, j01 = ∫ f·t(1−t) dt,
 *   j11 = ∫ f·t² dt with f = dφ/dM (or φ/M, the secant flexibility, when `secant` is set).
 * Also returns the curvature at both ends.
 */
export interface SegmentIntegrals {
  i0: number;
  i1: number;
  j00: number;
  j01: number;
  j11: number;
  phiA: number;
  phiB: number;
}

const knotScratch: number[] = [];
const segScratch: ValueAndSlope = { value: 0, slope: 0 };

export function segmentIntegrals(zone: ZoneResponse, ma: number, mb: number, secant: boolean, out: SegmentIntegrals): SegmentIntegrals {
  // Knots in signed moment between ma and mb: the sagging/hogging switch, sagging knots and
  // negated hogging knots.
  const lo = Math.min(ma, mb);
  const hi = Math.max(ma, mb);
  const m0 = zone.sagging.momentAtZero;
  knotScratch.length = 0;
  if (hi > m0) zone.sagging.knots(Math.max(lo, m0), hi, knotScratch);
  if (lo < m0) {
    const first = knotScratch.length;
    zone.hogging.knots(Math.max(-hi, -m0), -lo, knotScratch);
    for (let i = first; i < knotScratch.length; i++) knotScratch[i] = -knotScratch[i]!;
    if (hi > m0) knotScratch.push(m0);
  }
  if (knotScratch.length > 1) knotScratch.sort((p, q) => p - q);
  if (mb < ma) knotScratch.reverse();
  out.i0 = 0;
  out.i1 = 0;
  out.j00 = 0;
  out.j01 = 0;
  out.j11 = 0;
  let t0 = 0;
  let phi0 = zoneCurvature(zone, ma, segScratch).value;
  out.phiA = phi0;
  const dm = mb - ma;
  const count = knotScratch.length;
  for (let k = 0; k <= count; k++) {
    const m1 = k < count ? knotScratch[k]! : mb;
    const t1 = k < count ? (dm !== 0 ? (m1 - ma) / dm : 1) : 1;
    const phi1 = zoneCurvature(zone, m1, segScratch).value;
    const span = t1 - t0;
    if (span > 0) {
      out.i0 += (span * (phi0 + phi1)) / 2;
      out.i1 += (span * (phi0 * (2 * t0 + t1) + phi1 * (t0 + 2 * t1))) / 6;
      const mStart = ma + dm * t0;
      const mEnd = m1;
      let f: number;
      if (secant) {
        const mMid = 0.5 * (mStart + mEnd);
        const phiMid = 0.5 * (phi0 + phi1);
        f = Math.abs(mMid) > 1 ? Math.max(phiMid / mMid, 0) : zoneCurvature(zone, mMid, segScratch).slope;
      } else {
        f = Math.abs(mEnd - mStart) > 1e-9 * (Math.abs(mEnd) + 1) ? (phi1 - phi0) / (mEnd - mStart) : zoneCurvature(zone, 0.5 * (mStart + mEnd), segScratch).slope;
      }
      const a3 = (1 - t0) ** 3 - (1 - t1) ** 3;
      out.j00 += (f * a3) / 3;
      out.j11 += (f * (t1 ** 3 - t0 ** 3)) / 3;
      out.j01 += f * ((t1 * t1 - t0 * t0) / 2 - (t1 ** 3 - t0 ** 3) / 3);
    }
    t0 = t1;
    phi0 = phi1;
  }
  out.phiB = phi0;
  return out;
}

/**
 * Exact segment integrals when both ends lie on the same branch of the law but on different
 * pieces: the knots between them and their curvatures are read straight from the response's
 * tables (no searching), then each linear piece is integrated in closed form, walking the knots in
 * the order t meets them (no scratch arrays: this runs for most segments of every evaluation).
 */
function segmentAcrossKnots(zone: ZoneResponse, ma: number, mb: number, a: ValueAndSlope, b: ValueAndSlope, sagging: boolean, out: SegmentIntegrals): SegmentIntegrals {
  const response = sagging ? zone.sagging : zone.hogging;
  const sign = sagging ? 1 : -1;
  const knots = response.knotMoments;
  const curvatures = response.knotCurvatures;
  const count = knots.length;
  // Table index of each end: piece − 1 (sagging) or −piece − 10 (hogging); the extension is past
  // the end. (No closure here: this runs for most segments of every Newton iteration.)
  let ia = sagging ? a.piece! - 1 : -a.piece! - 10;
  let ib = sagging ? b.piece! - 1 : -b.piece! - 10;
  if (ia >= 1_000_000) ia = count;
  if (ib >= 1_000_000) ib = count;
  const dm = mb - ma;
  out.i0 = 0;
  out.i1 = 0;
  out.j00 = 0;
  out.j01 = 0;
  out.j11 = 0;
  let t0 = 0;
  let phi0 = a.value;
  if (ib > ia) {
    const last = Math.min(ib, count - 1);
    for (let k = ia + 1; k <= last; k++) {
      const t1 = (sign * knots[k]! - ma) / dm;
      const phi1 = sign * curvatures[k]!;
      addPiece(t0, t1, phi0, phi1, dm, out);
      t0 = t1;
      phi0 = phi1;
    }
  } else {
    for (let k = ia; k > ib && k >= 0; k--) {
      if (k >= count) continue;
      const t1 = (sign * knots[k]! - ma) / dm;
      const phi1 = sign * curvatures[k]!;
      addPiece(t0, t1, phi0, phi1, dm, out);
      t0 = t1;
      phi0 = phi1;
    }
  }
  addPiece(t0, 1, phi0, b.value, dm, out);
  out.phiA = a.value;
  out.phiB = b.value;
  return out;
}

/** Adds one linear piece of the curvature, φ0 at t0 to φ1 at t1 (moment slope dm over the segment), to the integrals. */
function addPiece(t0: number, t1: number, phi0: number, phi1: number, dm: number, out: SegmentIntegrals): void {
  const span = t1 - t0;
  if (!(span > 0)) return;
  out.i0 += (span * (phi0 + phi1)) / 2;
  out.i1 += (span * (phi0 * (2 * t0 + t1) + phi1 * (t0 + 2 * t1))) / 6;
  const f = (phi1 - phi0) / (span * dm);
  out.j00 += (f * ((1 - t0) ** 3 - (1 - t1) ** 3)) / 3;
  out.j11 += (f * (t1 ** 3 - t0 ** 3)) / 3;
  out.j01 += f * ((t1 * t1 - t0 * t0) / 2 - (t1 ** 3 - t0 ** 3) / 3);
}
