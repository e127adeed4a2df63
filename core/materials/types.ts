/**
 * The contract every stress–strain law in core/materials fulfils.
 *
 * SIGN CONVENTION (the one place it is defined; test/core/materials/sign-convention.test.ts checks it):
 *   strain and stress are POSITIVE IN COMPRESSION, for concrete, steel and FRP alike.
 *   A tensile strain is negative and gives a tensile (negative) stress.
 * Units: strain is dimensionless (mm/mm); stress and moduli are MPa (N/mm²).
 */
export interface UniaxialMaterial {
  /** Stable model identifier, e.g. `hognestad`, `mander-confined`, `park-paulay-1975`. */
  readonly model: string;
  /** Short human name with its source, e.g. `Hognestad (1951) parabola with linear descent`. */
  readonly label: string;
  /**
   * Stress in MPa (compression positive) at the given strain (compression positive).
   * Defined for every finite strain; returns 0 where the material carries nothing
   * (cracked concrete, spalled cover, ruptured steel). Never NaN or Infinity.
   */
  stress(strain: number): number;
  /**
   * Strains (ascending) where the law has a kink or a jump (peak, end of a branch, cracking,
   * yield, rupture). The section integrator splits its depth intervals there, so that each
   * piece is smooth and a few Gauss points integrate it accurately.
   */
  readonly breakpoints: readonly number[];
  /** Initial tangent modulus in MPa, used for elastic (transformed) section properties. */
  readonly initialModulus: number;
  /**
   * Compressive strain (positive) at which the material is deemed crushed; reaching it in a
   * fibre that counts for ultimate ends the moment–curvature curve. Undefined: no limit.
   */
  readonly crushingStrain?: number;
  /** Tensile strain magnitude (positive) at rupture; reaching it ends the curve. Undefined: no limit. */
  readonly ruptureStrain?: number;
  /** Strain magnitude at first yield (steel), positive. Undefined for materials without a yield point. */
  readonly yieldStrain?: number;
  /** Citation(s) for the report's reference list, e.g. `Mander, Priestley & Park (1988), J. Struct. Eng. 114(8)`. */
  readonly references: readonly string[];
}

/**
 * Concrete compression branch on its own: strain and stress are compressive magnitudes (≥ 0).
 * Each published model (Hognestad, Mander, …) produces one of these.
 */
export interface CompressionLaw {
  readonly model: string;
  readonly label: string;
  readonly references: readonly string[];
  /** σ in MPa (≥ 0) for a compressive strain ε ≥ 0. Returns 0 beyond the end of the curve. */
  stress(strain: number): number;
  /** Kinks/jumps of the branch, positive strains, ascending. */
  readonly breakpoints: readonly number[];
  /** Initial tangent modulus, MPa. */
  readonly initialModulus: number;
  /** Peak (maximum) stress of this curve, MPa — f′c, f″c, fcm or f′cc depending on the model. */
  readonly peakStress: number;
  /** Strain at peak stress. */
  readonly peakStrain: number;
  /** Strain at which this concrete is considered crushed (εcu; confined: the core's ultimate strain). */
  readonly crushingStrain: number;
  /** True for a confined-core law. */
  readonly confined: boolean;
}

/**
 * Where a tension-stiffening law acts in a section (core/section/build.ts): the effective tension area
 * around each face's bars, hc,ef = min(2.5 (h − d), h/2) (EN 1992-1-1 7.3.2(3)), or the whole tension
 * zone (each face's bars stiffen the concrete up to mid-depth). Elsewhere the concrete cracks brittly.
 */
export type TensionStiffeningZone = 'effective-area' | 'tension-zone';

/** Concrete tension branch: strain and stress are tensile magnitudes (≥ 0). */
export interface TensionLaw {
  readonly model: string;
  readonly label: string;
  readonly references: readonly string[];
  /** σt in MPa (≥ 0) for a tensile strain magnitude εt ≥ 0. */
  stress(strain: number): number;
  /** Kinks/jumps, positive tensile strain magnitudes, ascending. */
  readonly breakpoints: readonly number[];
  /** Tensile strength used for cracking (modulus of rupture or fctm), MPa. 0 when tension is ignored. */
  readonly tensileStrength: number;
  /** Tensile strain magnitude at cracking (0 when tension is ignored). */
  readonly crackingStrain: number;
  /** Tension stiffening only: where it acts in a section. */
  readonly stiffeningZone?: TensionStiffeningZone;
}

/**
 * The ultimate (crushing) strain of a concrete and where it comes from (core/materials/build/
 * concrete-defaults.ts): the code basis's value, the value published with the law, a value the engineer
 * entered, or the confined core's hoop-fracture strain.
 */
export interface UltimateStrainSource {
  /** Compressive strain, dimensionless (positive). */
  readonly value: number;
  readonly basis: 'code' | 'law' | 'user' | 'confinement';
  /** The source in words, e.g. `ACI 318-19 22.2.2.1`, `Hognestad (1951)`, `entered by the engineer`. */
  readonly source: string;
}

/** A complete concrete law (compression and tension) in the sign convention above. */
export interface ConcreteMaterial extends UniaxialMaterial {
  readonly compression: CompressionLaw;
  readonly tension: TensionLaw;
  readonly crushingStrain: number;
  /** Peak compressive stress, MPa (positive). */
  readonly peakStress: number;
  readonly peakStrain: number;
  readonly tensileStrength: number;
  readonly crackingStrain: number;
  readonly confined: boolean;
  /** Where `crushingStrain` comes from (set by the builder; absent for laws assembled by hand). */
  readonly ultimateStrain?: UltimateStrainSource;
  /**
   * Strain (signed, compression positive) below which the concrete is cracked; absent → −crackingStrain.
   * A law under sustained load sets it: shrinkage moves cracking even to a compressive total strain.
   */
  readonly crackedBelow?: number;
}

/** A reinforcing or plate steel law, symmetric in tension and compression. */
export interface SteelMaterial extends UniaxialMaterial {
  /** Yield stress fy, MPa. */
  readonly yieldStress: number;
  /** εy = fy / Es. */
  readonly yieldStrain: number;
  /** Ultimate (maximum) stress fu, MPa. */
  readonly ultimateStress: number;
  /** Strain at which the curve ends (rupture, εsu), positive magnitude. */
  readonly ruptureStrain: number;
  /** Strain at the onset of strain hardening εsh (equals εy when there is no plateau). */
  readonly hardeningStrain: number;
}

/** An externally bonded FRP laminate: linear elastic in tension, nothing in compression. */
export interface FrpMaterial extends UniaxialMaterial {
  /** Design rupture strain magnitude (after environmental reduction), positive. */
  readonly ruptureStrain: number;
  /** Tensile modulus Ef, MPa. */
  readonly tensileModulus: number;
}
