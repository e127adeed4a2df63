import type { CompressionLaw, ConcreteMaterial, TensionLaw } from '../types.ts';
import { assertStrainIsNumber, sortedBreakpoints } from '../checks.ts';

/**
 * Joins a compression law and a tension law into one concrete material in the sign convention of
 * types.ts (strain and stress positive in compression):
 *   ε ≥ 0: σ = compression.stress(ε);  ε < 0: σ = −tension.stress(−ε).
 * Breakpoints: the compression breakpoints, the tension breakpoints negated, and 0 (where the two
 * branches meet with different tangents). crushingStrain, peak and confinement come from the
 * compression law; initialModulus is the compression law's initial tangent. A NaN strain throws
 * BugError (checks.ts); ±Infinity gives 0.
 */
export function combineConcrete(compression: CompressionLaw, tension: TensionLaw): ConcreteMaterial {
  const model = `${compression.model}+${tension.model}`;
  const references = [...new Set([...compression.references, ...tension.references])];
  return {
    model,
    label: `${compression.label}; tension: ${tension.label.charAt(0).toLowerCase()}${tension.label.slice(1)}`,
    references,
    compression,
    tension,
    breakpoints: sortedBreakpoints([...tension.breakpoints.map((s) => -s), 0, ...compression.breakpoints]),
    initialModulus: compression.initialModulus,
    crushingStrain: compression.crushingStrain,
    peakStress: compression.peakStress,
    peakStrain: compression.peakStrain,
    tensileStrength: tension.tensileStrength,
    crackingStrain: tension.crackingStrain,
    confined: compression.confined,
    stress(strain: number): number {
      if (strain !== strain) assertStrainIsNumber(strain, model); // inline NaN test: this is the hot path
      if (strain >= 0) return compression.stress(strain);
      const tensile = tension.stress(-strain);
      return tensile === 0 ? 0 : -tensile;
    },
  };
}
