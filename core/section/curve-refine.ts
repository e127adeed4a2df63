/**
 * Sampling of a computed moment–curvature curve: the member engine interpolates the curve linearly
 * between points, so a point is added midway wherever the curve departs from the chord of its
 * neighbours by more than 0.05 % of the largest moment (common practice, no source), and the peak
 * moment is found between its neighbouring points.
 * Units: curvature 1/mm, moment N·mm.
 */
import { goldenSectionMaximum } from '../numeric/quadrature.ts';
import { parabolaAt, type CurveSolver, type Snapshot } from './curve-solver.ts';

/** The snapshots (ascending in curvature) with points added where the curve bends between them. */
export function refineByChord(snapshots: readonly Snapshot[], solver: CurveSolver): Snapshot[] {
  let largest = 0;
  for (const snap of snapshots) largest = Math.max(largest, Math.abs(snap.eq.moment));
  const tolerance = 5e-4 * largest;
  const refined: Snapshot[] = [snapshots[0]!];
  const refine = (a: Snapshot, b: Snapshot, depth: number) => {
    if (depth > 0 && b.kappa - a.kappa > 1e-9 * b.kappa) {
      // Started from the chord's mean strain, not a parabola through a third state: on the long-term
      // curves of some members the parabola's start settled on another equilibrium (service
      // long-term deflection moved by up to 1.6 %), so the probe keeps the chord's start.
      solver.lastGuess = 0.5 * (a.eq.referenceStrain + b.eq.referenceStrain);
      const mid = solver.solve(0.5 * (a.kappa + b.kappa));
      if (typeof mid !== 'string' && Math.abs(mid.moment - 0.5 * (a.eq.moment + b.eq.moment)) > tolerance) {
        const m: Snapshot = { kappa: 0.5 * (a.kappa + b.kappa), eq: mid };
        refine(a, m, depth - 1);
        refined.push(m);
        refine(m, b, depth - 1);
        return;
      }
    }
  };
  // How far a point lies off the chord of its neighbours: a cheap estimate of how much the curve
  // bends there, used to skip probing stretches that are plainly straight.
  const bend = (i: number) => {
    if (i <= 0 || i >= snapshots.length - 1) return Infinity;
    const p = snapshots[i - 1]!;
    const q = snapshots[i]!;
    const r = snapshots[i + 1]!;
    if (!(r.kappa > p.kappa)) return Infinity;
    const chord = p.eq.moment + ((r.eq.moment - p.eq.moment) * (q.kappa - p.kappa)) / (r.kappa - p.kappa);
    return Math.abs(q.eq.moment - chord);
  };
  for (let i = 1; i < snapshots.length; i++) {
    const a = snapshots[i - 1]!;
    const b = snapshots[i]!;
    // A segment's midpoint departs from its chord by about a quarter of its ends' bend.
    const straight = Math.max(bend(i - 1), bend(i)) < tolerance;
    // Only between points of one branch: across a snap the chord is meaningless.
    if (!a.jumped && !b.jumped && !straight) refine(a, b, 5);
    refined.push(b);
  }
  return refined;
}

/**
 * Centroid strain at curvature `kappa` between a and b from the parabola through a, b and c (the
 * chord's value when there is no c, or when the parabola strays by more than the strain change
 * from a to b: then the three states do not describe one smooth stretch).
 */
function midpointStrain(a: Snapshot, b: Snapshot, c: Snapshot | undefined, kappa: number): number {
  const ea = a.eq.referenceStrain;
  const eb = b.eq.referenceStrain;
  const chord = ea + ((eb - ea) * (kappa - a.kappa)) / (b.kappa - a.kappa);
  if (!c || c.kappa === a.kappa || c.kappa === b.kappa) return chord;
  const parabola = parabolaAt(a, b, c, kappa);
  return Number.isFinite(parabola) && Math.abs(parabola - chord) <= Math.abs(eb - ea) ? parabola : chord;
}

/**
 * The snapshot of the largest moment, refined between its neighbours by a golden-section search
 * (inserted into `snapshots` when it is new). `sign` is +1 sagging, −1 hogging.
 */
export function peakSnapshot(snapshots: Snapshot[], sign: 1 | -1, solver: CurveSolver): Snapshot {
  let iMax = 0;
  for (let i = 1; i < snapshots.length; i++) if (sign * snapshots[i]!.eq.moment > sign * snapshots[iMax]!.eq.moment) iMax = i;
  if (!(iMax > 0 && iMax < snapshots.length - 1)) return snapshots[iMax]!;
  const lo = snapshots[iMax - 1]!;
  const hi = snapshots[iMax + 1]!;
  const top = snapshots[iMax]!;
  let best: Snapshot = top;
  goldenSectionMaximum((kappa) => {
    // Started from the parabola through the three points around the peak (one branch: the chord
    // refinement does not cross a snap, and neither does this bracket when its ends are not jumped).
    solver.lastGuess = lo.jumped || top.jumped ? best.eq.referenceStrain : midpointStrain(kappa < top.kappa ? lo : top, kappa < top.kappa ? top : hi, kappa < top.kappa ? hi : lo, kappa);
    const s = solver.solve(kappa);
    if (typeof s === 'string') return -Infinity;
    if (sign * s.moment > sign * best.eq.moment) best = { kappa, eq: s };
    return sign * s.moment;
    // The moment is flat at the peak: a curvature to 2e-4 (relative) gives the moment to ~1e-8.
  }, lo.kappa, hi.kappa, 2e-4 * hi.kappa, 40);
  if (best !== snapshots[iMax]) snapshots.splice(best.kappa > snapshots[iMax]!.kappa ? iMax + 1 : iMax, 0, best);
  return best;
}
