/**
 * The member's loads by load case and the factored combinations of the strength checks.
 * Units: N, N/mm, mm; factors dimensionless.
 */
import type { CodeBasis } from '../materials/specs.ts';
import type { BeamDefinition, LoadFactors, MemberLoad } from '../member/definition.ts';
import { toStaticLoad, type StaticLoad } from '../member/statics.ts';

/** How EN 1990 combines actions for the strength checks (the project setting `enCombination`). */
export const EN_COMBINATION_RULES = ['6.10', '6.10a-6.10b'] as const;
export type EnCombinationRule = (typeof EN_COMBINATION_RULES)[number];

/** What the project says about combinations (core/project settings). */
export interface CombinationSettings {
  /** EN 1990: Eq. (6.10), or the less favourable of Eqs. (6.10a) and (6.10b). Default '6.10'. */
  readonly enCombination?: EnCombinationRule;
  /** ψ0 of the imposed load in Eq. (6.10a), default 0.7 (EN 1990 Table A1.1, categories A–D). */
  readonly liveCombinationFactor?: number;
}

/** Recommended values of EN 1990 Table A1.2(B): γG = 1.35, γQ = 1.5, ξ = 0.85; ψ0 = 0.7 of Table A1.1. */
export const EN_PERMANENT_FACTOR = 1.35;
export const EN_VARIABLE_FACTOR = 1.5;
export const EN_REDUCTION_FACTOR = 0.85;
export const EN_DEFAULT_PSI0 = 0.7;

/** One factored combination of the strength checks. */
export interface LoadCombination {
  /** Short name, e.g. `1.2D + 1.6L`. */
  readonly name: string;
  /** Where it comes from, e.g. `ACI 318-19 Eq. (5.3.1b)`. */
  readonly source: string;
  readonly factors: LoadFactors;
}

/** Name and source of a combination in one phrase, e.g. `1.2D + 1.6L (ACI 318-19 Eq. (5.3.1b))`. */
export const combinationText = (c: LoadCombination): string => `${c.name} (${c.source})`;

const round = (x: number) => Math.round(x * 1e6) / 1e6;

/**
 * The code's strength combinations for gravity loads, in the order of the code:
 *  - ACI 318-19 5.3.1: (a) 1.4D and (b) 1.2D + 1.6L (the other rows add roof, wind, earthquake or
 *    snow loads, which a member here does not carry);
 *  - EN 1990 6.4.3.2: Eq. (6.10) 1.35G + 1.5Q, or Eqs. (6.10a) 1.35G + 1.5ψ0Q and (6.10b)
 *    ξ·1.35G + 1.5Q (Table A1.2(B) recommended values).
 * Superimposed dead load takes the dead-load factor.
 */
export function codeCombinations(code: CodeBasis, settings: CombinationSettings = {}): LoadCombination[] {
  if (code === 'ACI 318-19') {
    return [
      { name: '1.4D', source: 'ACI 318-19 Eq. (5.3.1a)', factors: { dead: 1.4, superimposed: 1.4, live: 0 } },
      { name: '1.2D + 1.6L', source: 'ACI 318-19 Eq. (5.3.1b)', factors: { dead: 1.2, superimposed: 1.2, live: 1.6 } },
    ];
  }
  const g = EN_PERMANENT_FACTOR;
  const qf = EN_VARIABLE_FACTOR;
  if ((settings.enCombination ?? '6.10') === '6.10') return [{ name: `${g}G + ${qf}Q`, source: 'EN 1990 Eq. (6.10)', factors: { dead: g, superimposed: g, live: qf } }];
  const psi0 = settings.liveCombinationFactor ?? EN_DEFAULT_PSI0;
  const xi = round(EN_REDUCTION_FACTOR * g);
  return [
    { name: `${g}G + ${round(qf * psi0)}Q`, source: `EN 1990 Eq. (6.10a), ψ0 = ${psi0}`, factors: { dead: g, superimposed: g, live: round(qf * psi0) } },
    { name: `${xi}G + ${qf}Q`, source: `EN 1990 Eq. (6.10b), ξ = ${EN_REDUCTION_FACTOR}`, factors: { dead: xi, superimposed: xi, live: qf } },
  ];
}

/** The factors a member's own combination starts from: the code's principal one (ACI (5.3.1b), EN (6.10)). */
export function defaultStrengthFactors(code: CodeBasis): LoadFactors {
  return codeCombinations(code).at(-1)!.factors;
}

/**
 * The combinations a member is checked for: its own factors when the engineer set them, otherwise
 * the code's (codeCombinations). Every check takes the envelope of all of them.
 */
export function strengthCombinations(member: Pick<BeamDefinition, 'strengthFactors'>, code: CodeBasis, settings: CombinationSettings = {}): LoadCombination[] {
  if (member.strengthFactors) {
    const f = member.strengthFactors;
    const name = code === 'ACI 318-19' ? `${f.dead}D + ${f.superimposed}SD + ${f.live}L` : `${f.dead}G + ${f.superimposed}G_sup + ${f.live}Q`;
    return [{ name, source: 'load factors set for the member', factors: f }];
  }
  return codeCombinations(code, settings);
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
