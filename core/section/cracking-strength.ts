/**
 * Does a section fail as it cracks? One answer for the section's own warnings and for the member's
 * brittle findings (core/assessment/brittle.ts), so the two never disagree.
 *
 * A section fails as it cracks when nothing it carries once its tension steel yields (or, when the
 * steel never yields, anything after cracking) exceeds the largest moment it carried before: the
 * concrete's tensile force is then lost at a moment the reinforcement cannot replace, and a
 * determinate beam drops its load at once. The moment before is the largest moment up to first
 * yield, not only the moment at the first crack: with a tension-stiffening law the section keeps
 * gaining moment after the extreme fibre cracks, and the hump is what the load must fall from.
 * ACI 318-19 9.6.1 and EN 1992-1-1 9.2.1.1 set minimum reinforcement for this reason (the bars
 * must carry at least the cracking moment).
 */
import type { CurvePoint, KeyPoint, KeyPointName } from './results.ts';

export interface CrackingStrength {
  /** Largest moment before the tension steel yields (at least the cracking moment; when it never yields: the cracking moment), N·mm, magnitude. */
  readonly beforeYield: number;
  /** Largest moment once the tension steel has yielded (when it never yields: from the end of the curve), N·mm. */
  readonly afterYield: number;
  /** Whether the tension steel yields before the curve ends. */
  readonly yields: boolean;
  /** The section fails as it cracks: afterYield is not above beforeYield. */
  readonly failsAsItCracks: boolean;
}

type CurveLike = { readonly points: readonly CurvePoint[]; readonly keyPoints: Partial<Record<KeyPointName, KeyPoint>> };

/** Whether the tension steel yields before the curve ends (at its ultimate, or its last point). */
export function yieldsBeforeEnd(curve: CurveLike): boolean {
  const kp = curve.keyPoints;
  const end = kp.ultimate ?? curve.points[curve.points.length - 1];
  return kp.firstYield !== undefined && end !== undefined && kp.firstYield.curvature <= end.curvature * (1 + 1e-9);
}

/** Compares the section's moment before and after its tension steel yields; null when the curve has no cracking point or no end. */
export function crackingStrength(curve: CurveLike): CrackingStrength | null {
  const kp = curve.keyPoints;
  const cracking = kp.cracking;
  const end = kp.ultimate ?? curve.points[curve.points.length - 1];
  if (!cracking || !end) return null;
  const yields = yieldsBeforeEnd(curve);
  // Without yield (over-reinforced or a curve ended early) only the cracking moment itself is compared
  // with the end: a peak reached by crushing before the end is not a cracking failure.
  const from = yields ? kp.firstYield!.curvature : end.curvature;
  let beforeYield = cracking.moment;
  let afterYield = yields ? kp.firstYield!.moment : end.moment;
  for (const p of curve.points) {
    if (p.curvature > end.curvature * (1 + 1e-9)) continue;
    if (p.curvature >= from * (1 - 1e-9)) afterYield = Math.max(afterYield, p.moment);
    else if (yields) beforeYield = Math.max(beforeYield, p.moment);
  }
  if (yields && kp.peak && kp.peak.curvature < from * (1 - 1e-9)) beforeYield = Math.max(beforeYield, kp.peak.moment);
  return { beforeYield, afterYield, yields, failsAsItCracks: !(afterYield > beforeYield) };
}
