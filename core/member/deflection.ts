/**
 * The deflected shape of the member from the curvature along it and the rotations of its plastic
 * hinges, and where the deflection peaks.
 * Internal units: mm, N·mm, 1/mm, rad; deflection downward positive.
 */
import type { BeamModel } from './beam-model.ts';
import { segmentIntegralsFromEnds, zoneCurvature, type SegmentIntegrals } from './beam-model.ts';
import { responseOf, scratch, type HingeState } from './equations.ts';
import type { ValueAndSlope } from './section-response.ts';

/**
 * Moves each span hinge to the interior station where its moment (relative to the section's peak)
 * is largest, so that the hinge stays at the critical section while moments redistribute.
 */
export function trackSpanHinges(beam: BeamModel, moment: Float64Array, hinges: readonly HingeState[]): void {
  const n = moment.length;
  for (const h of hinges) {
    if (h.site !== 'span') continue;
    let best = -Infinity;
    for (let i = 1; i < n - 1; i++) {
      const z = beam.segmentZone[Math.min(i, n - 2)]!;
      const resp = h.sign > 0 ? beam.zones[z]!.sagging : beam.zones[z]!.hogging;
      const ratio = (h.sign * moment[i]!) / resp.peakMoment;
      if (ratio > best) {
        best = ratio;
        h.station = i;
        h.zone = z;
      }
    }
    // The lumped rotation acts at the true maximum of the moment, not at the nearest station: the
    // vertex of the parabola through the critical station and its neighbours (exact for uniform
    // load), so the deflections do not depend on where the stations happen to fall.
    const i = h.station;
    h.rotationPosition = beam.x[i]!;
    if (i > 0 && i < n - 1) {
      const x0 = beam.x[i - 1]!;
      const x1 = beam.x[i]!;
      const x2 = beam.x[i + 1]!;
      const m0 = h.sign * moment[i - 1]!;
      const m1 = h.sign * moment[i]!;
      const m2 = h.sign * moment[i + 1]!;
      const d01 = (m1 - m0) / (x1 - x0);
      const d12 = (m2 - m1) / (x2 - x1);
      const curvature = (d12 - d01) / (x2 - x0);
      if (x1 > x0 && x2 > x1 && curvature < 0) {
        const vertex = 0.5 * (x0 + x1) - d01 / (2 * curvature);
        if (vertex > x0 && vertex < x2) h.rotationPosition = vertex;
      }
    }
  }
}

/** Deflections (downward positive) at every station from curvature and hinge rotations. */
export function deflectionShape(beam: BeamModel, moment: Float64Array, hinges: readonly HingeState[], curvatureOut?: Float64Array): Float64Array {
  const x = beam.x;
  const n = x.length;
  const v = new Float64Array(n);
  trackSpanHinges(beam, moment, hinges);
  const jumps = hinges
    .filter((h) => h.rotation > 0 || h.phase === 'hardening')
    .map((h) => {
      let theta = h.rotation;
      if (h.phase === 'hardening') {
        responseOf(beam.zones[h.zone]!, h.sign).plastic(h.sign * moment[h.station]!, scratch);
        theta = h.length * scratch.value;
      }
      return { at: h.rotationPosition, theta: h.sign * theta };
    })
    .filter((j) => j.theta !== 0)
    .sort((a, b) => a.at - b.at);
  // v'' = −φ (downward positive deflection under sagging curvature); v(0) = 0, v'(0) = 0 first.
  let slope = 0;
  let jump = 0;
  const seg: SegmentIntegrals = { i0: 0, i1: 0, j00: 0, j01: 0, j11: 0, phiA: 0, phiB: 0 };
  let endA: ValueAndSlope = { value: 0, slope: 0, piece: -1 };
  let endB: ValueAndSlope = { value: 0, slope: 0, piece: -1 };
  zoneCurvature(beam.zones[beam.stationZone[0]!]!, moment[0]!, endB);
  for (let k = 0; k < n - 1; k++) {
    const h = x[k + 1]! - x[k]!;
    let dv = slope * h;
    let dSlope = 0;
    [endA, endB] = [endB, endA];
    zoneCurvature(beam.zones[beam.stationZone[k + 1]!]!, moment[k + 1]!, endB);
    if (h > 0) {
      segmentIntegralsFromEnds(beam.zones[beam.segmentZone[k]!]!, moment[k]!, moment[k + 1]!, endA, endB, false, seg);
      if (curvatureOut) {
        curvatureOut[k] = seg.phiA;
        curvatureOut[k + 1] = seg.phiB;
      }
      dv -= h * h * (seg.i0 - seg.i1);
      dSlope = -h * seg.i0;
    }
    while (jump < jumps.length && jumps[jump]!.at < x[k + 1]! + (k === n - 2 ? 1e-9 : 0) && jumps[jump]!.at >= x[k]!) {
      const j = jumps[jump]!;
      dv -= j.theta * (x[k + 1]! - j.at);
      dSlope -= j.theta;
      jump++;
    }
    v[k + 1] = v[k]! + dv;
    slope += dSlope;
  }
  if (beam.support !== 'cantilever') {
    // Enforce v(L) = 0 with a rigid rotation about x = 0.
    const span = x[n - 1]! - x[0]!;
    const end = v[n - 1]!;
    for (let i = 0; i < n; i++) v[i] = v[i]! - (end * (x[i]! - x[0]!)) / span;
  }
  return v;
}

/**
 * Where the deflection of a deflected shape peaks, mm: the vertex of the parabola through the
 * largest station value and its neighbours (the free end for a cantilever).
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
