/**
 * The member's loads by load case and the factored combinations of the strength checks.
 * Units: N, N/mm, mm; factors dimensionless.
 */
import type { CodeBasis } from '../materials/specs.ts';
import type { BeamDefinition, LoadFactors, MemberLoad } from '../member/definition.ts';
import { toStaticLoad, type StaticLoad } from '../member/statics.ts';

/** Default strength factors of the code basis: ACI 318-19 Eq. (5.3.1b) 1.2D + 1.6L; EN 1990 Eq. (6.10) 1.35G + 1.5Q. */
export function defaultStrengthFactors(code: CodeBasis): LoadFactors {
  return code === 'ACI 318-19' ? { dead: 1.2, superimposed: 1.2, live: 1.6 } : { dead: 1.35, superimposed: 1.35, live: 1.5 };
}

/** The strength combination of a member and its description. */
export function strengthCombination(member: BeamDefinition, code: CodeBasis): { factors: LoadFactors; text: string } {
  const factors = member.strengthFactors ?? defaultStrengthFactors(code);
  const text = code === 'ACI 318-19' ? `${factors.dead}D + ${factors.live}L (ACI 318-19 5.3.1)` : `${factors.dead}G + ${factors.live}Q (EN 1990 6.10)`;
  return { factors, text };
}

export interface MemberLoadSets {
  readonly selfWeight: readonly StaticLoad[];
  readonly dead: readonly StaticLoad[];
  readonly superimposed: readonly StaticLoad[];
  readonly live: readonly StaticLoad[];
}

/**
 * The member's loads by case, as core/member/analyze.ts assembles them: self-weight per zone (N/mm,
 * unless switched off), the user's dead, superimposed and live loads.
 */
export function memberLoadSets(member: BeamDefinition, zoneSelfWeights: readonly number[]): MemberLoadSets {
  const span = member.span;
  const byCase = (c: MemberLoad['loadCase']) => member.loads.filter((l) => l.loadCase === c).map((l) => toStaticLoad(l, span));
  const selfWeight: StaticLoad[] = (member.includeSelfWeight ?? true) ? member.zones.map((z, i) => ({ kind: 'uniform', w: zoneSelfWeights[i] ?? 0, from: z.from, to: z.to })) : [];
  return { selfWeight, dead: byCase('dead'), superimposed: byCase('superimposed'), live: byCase('live') };
}

/** A load scaled by a factor. */
export function scaleLoad(load: StaticLoad, factor: number): StaticLoad {
  return load.kind === 'point' ? { ...load, p: load.p * factor } : { ...load, w: load.w * factor };
}

/** The loads of a combination: self-weight and dead × factors.dead, superimposed × factors.superimposed, live × factors.live. */
export function combinedLoads(sets: MemberLoadSets, factors: LoadFactors): StaticLoad[] {
  return [
    ...sets.selfWeight.map((l) => scaleLoad(l, factors.dead)),
    ...sets.dead.map((l) => scaleLoad(l, factors.dead)),
    ...sets.superimposed.map((l) => scaleLoad(l, factors.superimposed)),
    ...sets.live.map((l) => scaleLoad(l, factors.live)),
  ];
}
