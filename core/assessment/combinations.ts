/**
 * Factored load combinations for the strength checks.
 * Units: factors are dimensionless.
 */
import type { CodeBasis } from '../materials/specs.ts';
import type { BeamDefinition, LoadFactors } from '../member/definition.ts';

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
