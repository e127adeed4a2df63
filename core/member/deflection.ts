/**
 * The deflected shape of the member from the curvature along it and its concentrated rotations
 * (localised hinges, strain penetration at support faces), and where the deflection peaks.
 * Internal units: mm, N·mm, 1/mm, rad; deflection downward positive.
 */
import type { BeamModel } from './beam-model.ts';
import type { SegmentIntegrals } from './beam-model.ts';
import type { Equations, LocalisedHinge, Memory } from './equations.ts';

/** A concentrated rotation (sagging positive: a kink that makes the member sag), rad, at a position, mm. */
export interface ConcentratedRotation {
  readonly position: number;
  readonly theta: number;
  /** The face of a support it belongs to ('both': a hinge in the member). */
  readonly side: 'left' | 'right' | 'both';
}

/** The concentrated rotations of a state: localised hinges and strain penetration at the faces (after eq.moments). */
export function concentratedRotations(eq: Equations, memory: Memory | null, hinges: readonly LocalisedHinge[]): ConcentratedRotation[] {
  const out: ConcentratedRotation[] = [];
  for (const h of hinges) if (h.rotation !== 0) out.push({ position: h.position, theta: h.sign * h.rotation, side: 'both' });
  const c = { value: 0, slope: 0 };
  for (const face of eq.options.faces) {
    const length = eq.effective[face.station]! >= 0 ? face.sagging : face.hogging;
    if (length === 0) continue;
    eq.stationCurvature(face.station, memory, c);
    if (c.value !== 0) out.push({ position: face.position, theta: length * c.value, side: face.side });
  }
  return out.sort((a, b) => a.position - b.position);
}

const seg: SegmentIntegrals = { i0: 0, i1: 0, j00: 0, j01: 0, j11: 0, phiA: 0, phiB: 0 };

/**
 * Deflections (downward positive) at every station for the moments already in `eq` (eq.moments):
 * v'' = −φ integrated exactly segment by segment, kinks at the concentrated rotations, then v = 0
 * at every support (a straight line removed per span; a cantilever follows its support's span, or
 * the support's own rotation when there is no span). `curvatureOut` receives the distributed
 * curvature at the stations. `integrals`: the segments' i0 and i1 for these moments and this
 * memory when already known (the last evaluation of a converged solve, `Equations.segmentI0`/`I1`).
 */
export function deflectionShape(eq: Equations, memory: Memory | null, hinges: readonly LocalisedHinge[], curvatureOut?: Float64Array, integrals?: { readonly i0: Float64Array; readonly i1: Float64Array }): Float64Array {
  const beam = eq.beam;
  const x = beam.x;
  const n = x.length;
  const raw = new Float64Array(n);
  const slopes = new Float64Array(n);
  const kinks = concentratedRotations(eq, memory, hinges);
  if (!integrals) eq.prepareEnds();
  let slope = 0;
  let next = 0;
  for (let k = 0; k < n - 1; k++) {
    slopes[k] = slope;
    const h = x[k + 1]! - x[k]!;
    let dv = slope * h;
    let dSlope = 0;
    if (h > 0) {
      let i0: number;
      let i1: number;
      if (integrals) {
        i0 = integrals.i0[k]!;
        i1 = integrals.i1[k]!;
      } else {
        eq.segment(k, memory, false, seg);
        i0 = seg.i0;
        i1 = seg.i1;
      }
      dv -= h * h * (i0 - i1);
      dSlope = -h * i0;
    }
    // Kinks at [x_k, x_k+1) act in this segment (the last one also takes its end); a zero-length
    // segment at a doubled station leaves them to the next.
    if (h > 0) {
      while (next < kinks.length && (kinks[next]!.position < x[k + 1]! || k === n - 2)) {
        const j = kinks[next]!;
        dv -= j.theta * (x[k + 1]! - j.position);
        dSlope -= j.theta;
        next++;
      }
    }
    raw[k + 1] = raw[k]! + dv;
    slope += dSlope;
  }
  slopes[n - 1] = slope;
  // Shear deformation: dv/dx = γ = s·V = s·dM/dx, so v = s·(M(x) − M(0)) before the supports are
  // put back in place (it changes no slope at a restrained face: that restrains the section, not γ).
  const s = eq.shearFlexibility;
  if (s > 0) for (let k = 0; k < n; k++) raw[k] = raw[k]! + s * (eq.moment[k]! - eq.moment[0]!);
  if (curvatureOut) {
    const c = { value: 0, slope: 0 };
    for (let i = 0; i < n; i++) curvatureOut[i] = eq.stationCurvature(i, memory, c).value;
  }
  return supportCorrection(beam, raw, slopes, eq.moment, kinks);
}

/** Index of the first station at position p. */
function stationAt(beam: BeamModel, p: number): number {
  const x = beam.x;
  let lo = 0;
  let hi = x.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (x[mid]! < p) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Removes the rigid-body motion: v = 0 at the supports, slope from the span (or the support's rotation). */
function supportCorrection(beam: BeamModel, raw: Float64Array, slopes: Float64Array, moment: Float64Array, kinks: readonly ConcentratedRotation[]): Float64Array {
  const { layout, x } = beam;
  const n = x.length;
  const v = new Float64Array(n);
  const line = (i0: number, i1: number) => {
    const a = raw[i0]!;
    const b = raw[i1]!;
    const x0 = x[i0]!;
    const dx = x[i1]! - x0;
    return { at: (p: number) => a + ((b - a) * (p - x0)) / dx };
  };
  const spans = layout.spans;
  if (spans.length === 0) {
    // A lone support with cantilevers: it stands still and rotates by the moment it takes / k; the
    // kink of its left face turns the left cantilever, which the integration (from the left tip)
    // put on the right-hand side.
    const s = layout.supports[0]!;
    const i = stationAt(beam, s.x);
    const last = i + (i + 1 < n && x[i + 1] === s.x ? 1 : 0);
    const left = s.x > 0 ? moment[i]! : 0;
    const right = s.x < layout.length ? moment[last]! : 0;
    const rotation = s.kind === 'spring' && s.stiffness > 0 ? (left - right) / s.stiffness : 0;
    const a = raw[i]!;
    const leftKink = kinks.filter((j) => j.side === 'left' && j.position === s.x).reduce((t, j) => t + j.theta, 0);
    const b = slopes[i]! - rotation - leftKink;
    for (let k = 0; k < n; k++) v[k] = raw[k]! - a - b * (x[k]! - s.x);
    return v;
  }
  const corrections = spans.map((b) => line(stationAt(beam, b.from), stationAt(beam, b.to)));
  let span = 0;
  for (let k = 0; k < n; k++) {
    const p = x[k]!;
    while (span < spans.length - 1 && p > spans[span]!.to) span++;
    // Before the first span's start the left cantilever follows it; beyond the last, the right one.
    v[k] = raw[k]! - corrections[span]!.at(p);
  }
  return v;
}

/**
 * Where the deflection of a deflected shape peaks, mm: the vertex of the parabola through the
 * largest station value and its neighbours (an end station as it is).
 */
export function peakDeflectionPosition(x: ArrayLike<number>, deflection: ArrayLike<number>): number {
  const n = deflection.length;
  let i = 0;
  for (let k = 1; k < n; k++) if (deflection[k]! > deflection[i]!) i = k;
  if (i === 0 || i === n - 1) return x[i]!;
  const x0 = x[i - 1]!;
  const x1 = x[i]!;
  const x2 = x[i + 1]!;
  const d01 = (deflection[i]! - deflection[i - 1]!) / (x1 - x0);
  const d12 = (deflection[i + 1]! - deflection[i]!) / (x2 - x1);
  const c = (d12 - d01) / (x2 - x0);
  if (!(c < 0) || !(x1 > x0) || !(x2 > x1)) return x1;
  const vertex = 0.5 * (x0 + x1) - d01 / (2 * c);
  return vertex > x0 && vertex < x2 ? vertex : x1;
}
