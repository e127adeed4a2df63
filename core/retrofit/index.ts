/**
 * Existing beams and retrofit: the as-found condition (tested strengths, corrosion, spalled cover)
 * and strengthening schemes (bonded FRP, bonded steel plate, new concrete layer) as derived
 * material specs and section definitions. Running and comparing the variants is core/assessment's
 * (core/assessment/member.ts). See docs/retrofit.md.
 * Units: mm, N, MPa, N·mm; strains dimensionless, compression positive.
 */
export { deriveAsFound, derivedId, corrodedSteelSpec, type AsFoundDerivation, type DerivedSection, type ExposedBars } from './as-found.ts';
export { corrodedRuptureStrainFactor, residualAreaFactor, CORROSION_THRESHOLD } from './corrosion.ts';
export { aciDebondingStrainSI, aciDebondingStrainUS, crackedSubstrateStrain, frpDesign, frpStrainLimit, FRP_FLEXURE_REDUCTION } from './frp.ts';
export { aciCoreToleranceFactor, en1990CharacteristicFactor, inPlaceStrength, MINIMUM_CORE_COUNT, type InPlaceStrength } from './in-place-strength.ts';
export { validateAsFound, validateSchemes } from './validate.ts';
export * from './types.ts';
