/**
 * Existing beams and retrofit: what the user enters per member (the as-found condition and the
 * strengthening schemes to compare), the material and section library variants are derived from,
 * and the plain data the derivations produce (what the as-found condition changed, the FRP design,
 * the substrate strain at installation, what a variant adds to a section). The results of running
 * the variants are core/assessment/results.ts.
 *
 * Internal units throughout: mm, N, MPa, N·mm, strains dimensionless (compression positive).
 */
import type { MaterialSpec } from '../materials/specs.ts';
import type { SectionDefinition } from '../section/definition.ts';
import type { BendingDirection, ElementLimitCause } from '../section/model.ts';
import type { Text } from '../units/phrase.ts';
import type { InPlaceStrength } from './in-place-strength.ts';

/** The library variants are derived from: the project's material specs and section definitions. */
export interface Library {
  readonly materials: readonly MaterialSpec[];
  readonly sections: readonly SectionDefinition[];
}

// =====================================================================================================
// Option lists (written once; the types, the file schema, the validators and the UI derive from them)
// =====================================================================================================

/** Where tested steel properties come from. */
export const STEEL_TEST_SOURCES = ['coupons', 'era-default'] as const;
/** Kinds of recorded defect. */
export const DEFECT_KINDS = ['section-loss', 'cover-loss'] as const;
/** Faces concrete can be lost from. */
export const COVER_LOSS_FACES = ['top', 'bottom', 'left', 'right'] as const;
/** Kinds of strengthening scheme. */
export const SCHEME_KINDS = ['frp', 'steel-plate', 'concrete-layer'] as const;
/** Faces a bonded item (FRP, plate) can be bonded to, the default first. */
export const BONDED_FACES = ['bottom', 'top'] as const;
/** Faces a new concrete layer can be cast on. */
export const LAYER_FACES = ['top', 'bottom'] as const;
/** How the substrate strain at installation is found (ACI 440.2R-17 10.2.3, or the section's own curve). */
export const INSTALLATION_STRAIN_METHODS = ['cracked-elastic', 'moment-curvature'] as const;
export type InstallationStrainMethod = (typeof INSTALLATION_STRAIN_METHODS)[number];

// =====================================================================================================
// Input: as-found condition
// =====================================================================================================

/** Compressive strength of drilled cores (in-place concrete). */
export interface CoreTestSet {
  /**
   * Concrete material (library id) the cores represent; omitted → every concrete used by the
   * member's sections.
   */
  readonly concreteId?: string;
  /**
   * Mean core strength converted to equivalent in-place cylinder strength, MPa: the length/diameter,
   * diameter, moisture and drilling-damage corrections (ACI 214.4R-10 Table 9.1, EN 13791) are
   * applied before entry. 5–150 MPa.
   */
  readonly meanStrength: number;
  /** Number of cores, a whole number ≥ 3 (the statistics need at least three). */
  readonly count: number;
  /** Coefficient of variation of the core strengths, s/mean, 0–0.5 (e.g. 0.12). */
  readonly coefficientOfVariation: number;
  readonly note?: string;
}

/** Steel strengths from tests (coupons) or from the era of construction, overriding a library steel. */
export interface SteelTestData {
  /** Steel material (library id) the data replace. */
  readonly steelId: string;
  readonly source: (typeof STEEL_TEST_SOURCES)[number];
  /** Yield stress fy, MPa (200–1000). */
  readonly yieldStress?: number;
  /** Ultimate stress fu, MPa (≥ fy). */
  readonly ultimateStress?: number;
  /** Rupture (uniform elongation) strain εsu (0.01–0.30). */
  readonly ruptureStrain?: number;
  /** Elastic modulus Es, MPa. */
  readonly elasticModulus?: number;
  readonly note?: string;
}

/** Loss of reinforcement section from corrosion. */
export interface SectionLossDefect {
  readonly kind: 'section-loss';
  /** Section (library id) the defect is in; omitted → every section of the member. */
  readonly sectionId?: string;
  /** Which reinforcement: a bar layer by its index in the section's `bars` list (0 = bars[0]), or the stirrups. */
  readonly layer: number | 'hoops';
  /** Loss of cross-section (mass) in percent, 0–100. Several defects on one layer add up. */
  readonly lossPercent: number;
  readonly note?: string;
}

/** Spalled or delaminated cover, removed from the section. */
export interface CoverLossDefect {
  readonly kind: 'cover-loss';
  readonly sectionId?: string;
  /** The face the concrete is lost from. */
  readonly face: (typeof COVER_LOSS_FACES)[number];
  /** Thickness of concrete lost, measured in from that face, mm. */
  readonly depth: number;
  /**
   * Side faces only: depth range (mm below the original top fibre) over which the side is lost;
   * omitted → the whole height (e.g. from: 450, to: 600 for the bottom corner region).
   */
  readonly from?: number;
  readonly to?: number;
  readonly note?: string;
}

/** A recorded defect of the as-found beam. */
export type Defect = SectionLossDefect | CoverLossDefect;

// The kind lists name the same kinds as the unions: a kind added to one and not the other fails to compile.
const _kindsComplete: [[Defect['kind'], StrengtheningScheme['kind']], [(typeof DEFECT_KINDS)[number], (typeof SCHEME_KINDS)[number]]] extends [[(typeof DEFECT_KINDS)[number], (typeof SCHEME_KINDS)[number]], [Defect['kind'], StrengtheningScheme['kind']]] ? true : never = true;
void _kindsComplete;

/** The member as found: material strengths from testing and deterioration. */
export interface AsFoundCondition {
  readonly cores?: readonly CoreTestSet[];
  readonly steel?: readonly SteelTestData[];
  readonly defects?: readonly Defect[];
  readonly notes?: string;
}

// =====================================================================================================
// Input: strengthening schemes
// =====================================================================================================

/** Which loads act when the strengthening is bonded (factors on the service load cases). */
export interface InstallationLoad {
  /** Factor on dead load and self-weight (default 1). */
  readonly dead?: number;
  /** Factor on superimposed dead load (default 1). */
  readonly superimposed?: number;
  /** Factor on live load (default 0). */
  readonly live?: number;
}

interface SchemeBase {
  /** Short id, unique within the member (used in derived ids), e.g. "frp-a". */
  readonly id: string;
  readonly name: string;
  /** Sections (library ids of the member's zones) the scheme applies to; omitted → all of them. */
  readonly sectionIds?: readonly string[];
  /** Restore spalled cover (patch repair, same concrete as the as-found beam) before strengthening (default false). */
  readonly repairSpalls?: boolean;
  readonly note?: string;
}

/** Externally bonded FRP on a tension face (ACI 440.2R-17). */
export interface FrpScheme extends SchemeBase {
  readonly kind: 'frp';
  /** FRP material in the library (Ef, ε*fu, CE). */
  readonly frpId: string;
  /** Thickness of one ply tf, mm (0.05–10). */
  readonly plyThickness: number;
  /** Number of plies n (whole number, 1–10). */
  readonly plies: number;
  /** Width of the laminate bf, mm. */
  readonly width: number;
  /** Face the FRP is bonded to (default 'bottom', for sagging). */
  readonly face?: (typeof BONDED_FACES)[number];
  readonly installation?: InstallationLoad;
  /** Substrate strain at installation: cracked elastic section (ACI 440.2R-17 10.2.3, default) or the moment–curvature curve. */
  readonly installationStrainMethod?: InstallationStrainMethod;
}

/** A steel plate bonded (and anchored) to a face. */
export interface SteelPlateScheme extends SchemeBase {
  readonly kind: 'steel-plate';
  readonly steelId: string;
  /** Plate thickness and width, mm. */
  readonly thickness: number;
  readonly width: number;
  readonly face?: (typeof BONDED_FACES)[number];
  readonly installation?: InstallationLoad;
  readonly installationStrainMethod?: InstallationStrainMethod;
}

/** Bars of a new concrete layer. */
export interface LayerBars {
  readonly steelId: string;
  /** Distance from the layer's outer face to the bar centres, mm. */
  readonly distanceFromFace: number;
  readonly count?: number;
  readonly diameter?: number;
  /** Total area, mm², instead of count × diameter. */
  readonly area?: number;
  readonly label?: string;
}

/** A new concrete layer with its own concrete and bars: an overlay on top or a jacket under the soffit. */
export interface ConcreteLayerScheme extends SchemeBase {
  readonly kind: 'concrete-layer';
  readonly face: (typeof LAYER_FACES)[number];
  /** Layer thickness, mm. */
  readonly thickness: number;
  /** Layer width, mm; omitted → the width of the section at that face. Centred on that face. */
  readonly width?: number;
  readonly concreteId: string;
  readonly bars: readonly LayerBars[];
}

/** A strengthening scheme to compare. */
export type StrengtheningScheme = FrpScheme | SteelPlateScheme | ConcreteLayerScheme;

// =====================================================================================================
// What derivations produce
// =====================================================================================================

/** Something a variant adds to or changes in the section, for drawings and the report. */
export interface AddedItem {
  readonly kind: 'overlay' | 'bar' | 'plate' | 'frp';
  readonly label: string;
  /** Centroid depth (mm below the top fibre of the derived section); for overlays its top and bottom and width. */
  readonly depth: number;
  readonly top?: number;
  readonly bottom?: number;
  readonly width?: number;
  /** Area, mm² (overlays: concrete area). */
  readonly area: number;
  /** Strain of the substrate when the item became active (compression positive). */
  readonly initialStrain: number;
  readonly limitStrain?: number;
  readonly limitCause?: ElementLimitCause;
  /** Library or derived material id. */
  readonly materialId: string;
  /** True for bars left outside the concrete by spalling (no bond along the spall, no displaced concrete). */
  readonly exposed?: boolean;
  /** Bars: their diameter (mm) and number, for drawings; exposed bars also their horizontal positions (mm, as in the section). */
  readonly diameter?: number;
  readonly count?: number;
  readonly positions?: readonly number[];
}

/** What the as-found condition changed. */
export interface AsFoundSummary {
  readonly concrete: readonly {
    /** Index of the core set (AsFoundCondition.cores) the strength comes from. */
    readonly coreSet: number;
    readonly concreteId: string;
    readonly derivedId: string;
    /** Strength of the library material (specified), MPa. */
    readonly specifiedStrength: number;
    readonly inPlace: InPlaceStrength;
    readonly cores: { readonly meanStrength: number; readonly count: number; readonly coefficientOfVariation: number };
    readonly note: string;
  }[];
  readonly steel: readonly {
    readonly steelId: string;
    readonly derivedId: string;
    readonly source: (typeof STEEL_TEST_SOURCES)[number];
    readonly yieldStress: number;
    readonly ultimateStress: number;
    readonly ruptureStrain: number | null;
    readonly note: string;
  }[];
  readonly defects: readonly {
    readonly index: number;
    readonly kind: Defect['kind'];
    readonly sectionIds: readonly string[];
    /** What the defect did, in words with the numbers. */
    readonly effect: Text;
    readonly note: string;
  }[];
  /**
   * Derived section ids per library section of the member; `shift` (mm) is how far the top fibre
   * moved down (top cover lost): a depth in the derived section is the original depth − shift.
   */
  readonly sections: readonly { readonly baseSectionId: string; readonly sectionId: string; readonly shift: number; readonly changes: readonly Text[] }[];
  readonly notes: string;
}

/** FRP design data (ACI 440.2R-17). */
export interface FrpDesign {
  readonly plyThickness: number;
  readonly plies: number;
  readonly width: number;
  /** Af = n·tf·bf, mm². */
  readonly area: number;
  /** Ef, MPa; ε*fu; CE; εfu = CE·ε*fu. */
  readonly tensileModulus: number;
  readonly manufacturerRuptureStrain: number;
  readonly environmentalFactor: number;
  readonly designRuptureStrain: number;
  /** f′c used in εfd, MPa. */
  readonly concreteStrength: number;
  /** 0.41√(f′c/(n·Ef·tf)) before the cap, the cap 0.9εfu, and the limit used. */
  readonly debondingStrain: number;
  readonly ruptureCap: number;
  readonly limitStrain: number;
  readonly limitCause: 'frp-debonding' | 'frp-rupture';
  /** ψf = 0.85 on the FRP's contribution to flexure. */
  readonly reductionFactor: number;
  /** The substituted expressions: SI form (f′c in MPa) in SI, in.-lb. form (psi, in) in US customary units. */
  readonly formula: Text;
}

/** Substrate strain when a bonded item (FRP, plate) is installed, per section. */
export interface InstallationStrain {
  readonly baseSectionId: string;
  readonly sectionId: string;
  /** Largest installation moment in the item's tension sense within the section's zones, N·mm (magnitude), and where. */
  readonly moment: number;
  readonly position: number;
  readonly direction: BendingDirection;
  /** Unstrengthened capacity (peak moment) and first-yield moment in that direction, N·mm. */
  readonly capacity: number | null;
  readonly firstYieldMoment: number | null;
  readonly method: InstallationStrainMethod;
  /** Cracked elastic data: neutral axis depth kd (mm, from the compression face), Icr (mm⁴), Ec (MPa). */
  readonly neutralAxisDepth: number | null;
  readonly crackedInertia: number | null;
  readonly concreteModulus: number;
  /** Substrate strain at the item, compression positive (tension negative), by the chosen method and by the other one. */
  readonly strain: number;
  readonly otherMethodStrain: number | null;
  readonly formula: Text;
}
