/**
 * Turns the user's material specs (specs.ts) into stress–strain laws (types.ts), filling defaults from the
 * code basis, and validates specs into Diagnostics (field path, value, allowed range; every problem).
 *  - buildConcrete(spec, code, confinement?) → { cover, core?, diagnostics }
 *  - buildSteel(spec) → SteelMaterial;  buildFrp(spec) → FrpMaterial
 *  - validateConcreteSpec / validateSteelSpec / validateFrpSpec → Diagnostic[]
 * The builders throw InputError (core/diagnostics.ts) when a spec is invalid.
 */
/** The option lists of the specs (written once, in specs.ts). */
export { CODE_BASES, CONCRETE_COMPRESSION_MODELS, CONCRETE_TENSION_MODELS, STEEL_MODELS } from './specs.ts';
export {
  buildConcrete,
  validateConcreteSpec,
  CONFINEMENT_MODELS,
  CONCRETE_STRENGTH_RANGE,
  type ConcreteBuild,
  type ConcreteBuildOptions,
  type ConcreteValidationOptions,
} from './build/concrete.ts';
/** Code-basis defaults for concrete (f′c / fcm, Ec, tensile strength, crushing strain). */
export { resolveConcrete, lawUltimateStrain, ultimateStrainWords, type ResolvedConcrete } from './build/concrete-defaults.ts';
/** Steel: builder, validation and defaults (Es = 200 000 MPa, εsh = 0.008, εsu by model). */
export { buildSteel, validateSteelSpec, DEFAULT_STEEL_MODULUS, DEFAULT_HARDENING_STRAIN, defaultRuptureStrain } from './build/steel.ts';
/** FRP: builder and validation (ACI 440.2R-17). */
export { buildFrp, validateFrpSpec } from './build/frp.ts';
