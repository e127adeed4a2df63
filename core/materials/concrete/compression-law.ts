import { BugError } from '../../diagnostics.ts';
import type { CompressionLaw } from '../types.ts';
import { assertStrainIsNumber, sortedBreakpoints } from '../checks.ts';

/** What a published compression model supplies; `compressionLaw` adds the guards every law shares. */
export interface CompressionCurve extends Omit<CompressionLaw, 'stress'> {
  /** σ(ε) in MPa for 0 < ε ≤ endStrain (compressive magnitudes). */
  readonly curve: (strain: number) => number;
  /** Last strain of the curve; the stress is 0 beyond it (crushed, spalled). */
  readonly endStrain: number;
}

/**
 * Wraps a model's curve into a CompressionLaw with the shared guards: stress 0 for ε ≤ 0 and beyond
 * `endStrain` (and for ε = +Infinity), BugError for a NaN strain (core/materials/checks.ts), stress
 * never negative, and a BugError if a curve ever produced a non-finite stress (a defect in the model).
 */
export function compressionLaw(definition: CompressionCurve): CompressionLaw {
  const { curve, endStrain, model } = definition;
  return {
    model,
    label: definition.label,
    references: definition.references,
    breakpoints: sortedBreakpoints(definition.breakpoints.filter((s) => s > 0 && s <= endStrain)),
    initialModulus: definition.initialModulus,
    peakStress: definition.peakStress,
    peakStrain: definition.peakStrain,
    crushingStrain: definition.crushingStrain,
    confined: definition.confined,
    stress(strain: number): number {
      if (strain !== strain) assertStrainIsNumber(strain, model); // inline NaN test: this is the hot path
      if (strain <= 0 || strain > endStrain) return 0;
      const stress = curve(strain);
      if (!Number.isFinite(stress)) throw new BugError(`${model}: stress at strain ${strain} is not finite`);
      return Math.max(0, stress);
    },
  };
}
