/**
 * Material specifications as the user enters them and the project file stores them
 * (plain data, internal units: MPa, mm/mm, kg/m³). `core/materials/factory.ts` turns a
 * spec into a UniaxialMaterial.
 */

/**
 * Every option list of the material specs is written once, here, in menu order; the types, the
 * file schema (core/project/schema.ts), the validators and the UI's lists derive from it.
 */

/** Every code basis: which design code supplies defaults (moduli, tensile strength, crushing strain). */
export const CODE_BASES = ['ACI 318-19', 'EN 1992-1-1'] as const;
export type CodeBasis = (typeof CODE_BASES)[number];

/** Published concrete compression laws (core/materials/concrete/, one file each). */
export const CONCRETE_COMPRESSION_MODELS = [
  'hognestad', 'modified-kent-park', 'mander', 'popovics', 'thorenfeldt-collins', 'en1992-nonlinear', 'en1992-parabola-rectangle',
] as const;
export type ConcreteCompressionModel = (typeof CONCRETE_COMPRESSION_MODELS)[number];

/** Concrete tension laws (core/materials/concrete/tension.ts). */
export const CONCRETE_TENSION_MODELS = ['none', 'linear-brittle', 'tension-stiffening'] as const;
export type ConcreteTensionModel = (typeof CONCRETE_TENSION_MODELS)[number];

/**
 * Where tension stiffening acts in a section: the effective tension area around each face's bars
 * (EN 1992-1-1 7.3.2(3), the default) or the whole tension zone (types.ts TensionStiffeningZone).
 */
export const TENSION_STIFFENING_ZONES = ['effective-area', 'tension-zone'] as const;

/**
 * Where the ultimate (crushing) strain εcu of unconfined concrete comes from, the strain at which the
 * best-estimate section curves end when the unconfined concrete governs:
 *  - `code`: the code basis's value — ACI 318-19 22.2.2.1 εcu = 0.003; EN 1992-1-1 Table 3.1 εcu1 for
 *    the nonlinear laws (3.1.5) and εcu2 for the parabola–rectangle (3.1.7);
 *  - `law`: the value published with the chosen stress–strain law (Hognestad 0.0038, Modified Kent–Park
 *    and Mander 0.004, EN εcu1/εcu2); laws that publish none (Popovics, Thorenfeldt–Collins) use the
 *    code value and say so.
 * A value the engineer enters (`ConcreteSpec.crushingStrain`) overrides both. The code crushing point
 * that code checks read (ACI 0.003, EN εcu2) is always marked on the curves as a key point of its own.
 */
export const ULTIMATE_STRAIN_CHOICES = ['code', 'law'] as const;
export type UltimateStrainChoice = (typeof ULTIMATE_STRAIN_CHOICES)[number];

/** The project default of the choice: the code's εcu (common practice, no source; see ULTIMATE_STRAIN_CHOICES). */
export const DEFAULT_ULTIMATE_STRAIN_CHOICE: UltimateStrainChoice = 'code';

/** A concrete as the user enters it; `buildConcrete` (factory.ts) validates it and fills code-basis defaults. */
export interface ConcreteSpec {
  readonly kind: 'concrete';
  readonly id: string;
  readonly name: string;
  /**
   * Compressive strength in MPa: the specified f′c under ACI 318-19, the characteristic fck under
   * EN 1992-1-1 (the EN models then work from fcm = fck + 8 MPa, Table 3.1), or an in-place strength
   * from testing (issue: as-found condition).
   */
  readonly strength: number;
  readonly compressionModel: ConcreteCompressionModel;
  /**
   * Measured mean compressive strength, MPa (an as-found concrete from cores): the laws of behaviour —
   * the curves, Ec, the tensile strengths and both deflection methods — use it in place of f′c (ACI)
   * or fcm = fck + 8 (EN); `strength` stays the characteristic (lower-fractile) value that the code
   * checks use. Not below `strength`. Undefined → the code's relation.
   */
  readonly meanStrength?: number;
  readonly tensionModel: ConcreteTensionModel;
  /** Optional overrides; undefined → the code basis default. */
  readonly elasticModulus?: number; // MPa
  /**
   * Tensile strength of the concrete law, MPa, overriding the value the law was calibrated on: ACI
   * basis — 0.62 λ √f′c (modulus of rupture, Eq. 19.2.3.1) for the linear-brittle law, 0.33 λ √f′c
   * (the direct cracking stress of Vecchio & Collins 1986) for tension stiffening; EN basis — fctm
   * (Table 3.1). A value entered here is also the code deflection method's fr / fctm.
   */
  readonly tensileStrength?: number;
  /**
   * Ultimate strain εcu of unconfined concrete entered by the engineer (dimensionless, 0.002–0.01);
   * overrides `ultimateStrain`. Undefined → `ultimateStrain` decides.
   */
  readonly crushingStrain?: number;
  /** Where εcu of unconfined concrete comes from when no value is entered; undefined → the project's setting. */
  readonly ultimateStrain?: UltimateStrainChoice;
  /** Hognestad peak factor k in f″c = k·f′c (default 0.85). */
  readonly peakFactor?: number;
  /** Spalling strain of unconfined cover (Mander), default 0.005. */
  readonly spallingStrain?: number;
  /** Lightweight-concrete factor λ of ACI 318-19 (1.0 normal weight). */
  readonly lightweightFactor?: number;
  /** Tension-stiffening coefficient c in ft = fcr / (1 + √(c·εt)); default 200 (Vecchio & Collins 1986). */
  readonly tensionStiffeningCoefficient?: number;
  /** Where tension stiffening acts in a section; default the effective tension area (TENSION_STIFFENING_ZONES). */
  readonly tensionStiffeningZone?: (typeof TENSION_STIFFENING_ZONES)[number];
  /** Density in kg/m³ for self-weight (default 2400). */
  readonly density?: number;
  /** Creep coefficient φ(∞, t0) for long-term deflection (EN 1992-1-1 3.1.4), default 2.0. */
  readonly creepCoefficient?: number;
  /** Free shrinkage strain εcs (positive magnitude) for shrinkage curvature, default 0.0004. */
  readonly shrinkageStrain?: number;
}

/** Reinforcing-steel laws (core/materials/steel/, one file each). */
export const STEEL_MODELS = ['elastic-plastic', 'bilinear', 'park-paulay', 'mander-power'] as const;
export type SteelModel = (typeof STEEL_MODELS)[number];

/** A reinforcing steel as the user enters it; `buildSteel` (factory.ts) validates it. */
export interface SteelSpec {
  readonly kind: 'steel';
  readonly id: string;
  readonly name: string;
  readonly model: SteelModel;
  /** Yield stress fy, MPa. */
  readonly yieldStress: number;
  /** Ultimate stress fu, MPa (≥ fy; equal to fy for elastic–perfectly plastic). */
  readonly ultimateStress: number;
  /** Elastic modulus Es, MPa (default 200 000). */
  readonly elasticModulus?: number;
  /** Strain at the onset of hardening εsh (default 0.008 for park-paulay / mander-power; εy for bilinear). */
  readonly hardeningStrain?: number;
  /** Rupture strain εsu (default 0.10 for park-paulay/mander-power/bilinear, 0.05 for elastic-plastic). */
  readonly ruptureStrain?: number;
  /** Hardening modulus Esh, MPa, for `bilinear` (default from fy, fu, εy, εsu). */
  readonly hardeningModulus?: number;
}

/** An externally bonded FRP laminate as the user enters it; `buildFrp` (factory.ts) validates it. */
export interface FrpSpec {
  readonly kind: 'frp';
  readonly id: string;
  readonly name: string;
  /** Tensile modulus Ef, MPa. */
  readonly tensileModulus: number;
  /** Manufacturer's rupture strain ε*fu (positive). */
  readonly ruptureStrain: number;
  /** Environmental reduction factor CE (ACI 440.2R-17 Table 9.4), 0 < CE ≤ 1. */
  readonly environmentalFactor: number;
}

/** Any material spec, told apart by `kind`. */
export type MaterialSpec = ConcreteSpec | SteelSpec | FrpSpec;

/** Transverse reinforcement data that confines the core (hoops or stirrups). */
export interface ConfinementInput {
  /** Yield stress of the hoops fyh, MPa. */
  readonly hoopYieldStress: number;
  /** Hoop bar diameter, mm. */
  readonly hoopDiameter: number;
  /** Centre-to-centre spacing of hoops along the member, s, mm. */
  readonly spacing: number;
  /** Core dimensions to the hoop centrelines, mm: bc (width, x) and dc (depth, y). */
  readonly coreWidth: number;
  readonly coreDepth: number;
  /**
   * Number of hoop legs crossing a section cut parallel to x (resisting lateral pressure in y) and in y.
   * In Mander et al. (1988) terms: legsX legs run in y, so Asy = legsX·Ab and ρy = Asy/(s·bc);
   * legsY legs run in x, so Asx = legsY·Ab and ρx = Asx/(s·dc) (concrete/mander-confinement.ts).
   */
  readonly legsX: number;
  readonly legsY: number;
  /** Clear distances between adjacent laterally restrained longitudinal bars around the core perimeter, mm (Mander's w′i). */
  readonly clearSpacings: readonly number[];
  /** Ratio of longitudinal steel area to core area, ρcc. */
  readonly longitudinalRatio: number;
  /** Rupture strain of the hoop steel εsu (default 0.10), used by the ultimate-strain expression. */
  readonly hoopRuptureStrain?: number;
}
