/**
 * Existing beams and retrofit: what the user enters per member (the as-found condition and the
 * strengthening schemes to compare) and the plain, serialisable results.
 *
 * Internal units throughout: mm, N, MPa, N·mm, strains dimensionless (compression positive).
 * Results are for review by a qualified engineer and defer to local codes and licensed practice.
 */
import type { MaterialSpec } from '../materials/specs.ts';
import type { SectionDefinition } from '../section/definition.ts';
import type { BendingDirection, ElementLimitCause } from '../section/model.ts';
import type { KeyPointName, UltimateCause } from '../section/results.ts';
import type { DeflectionCheck, MemberEvent, MemberStatus, PlasticHinge } from '../member/results.ts';
import type { ShearResult } from '../member/shear.ts';
import type { InPlaceStrength } from './in-place-strength.ts';

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
  readonly source: 'coupons' | 'era-default';
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
  readonly face: 'top' | 'bottom' | 'left' | 'right';
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
  readonly face?: 'bottom' | 'top';
  readonly installation?: InstallationLoad;
  /** Substrate strain at installation: cracked elastic section (ACI 440.2R-17 10.2.3, default) or the moment–curvature curve. */
  readonly installationStrainMethod?: 'cracked-elastic' | 'moment-curvature';
}

/** A steel plate bonded (and anchored) to a face. */
export interface SteelPlateScheme extends SchemeBase {
  readonly kind: 'steel-plate';
  readonly steelId: string;
  /** Plate thickness and width, mm. */
  readonly thickness: number;
  readonly width: number;
  readonly face?: 'bottom' | 'top';
  readonly installation?: InstallationLoad;
  readonly installationStrainMethod?: 'cracked-elastic' | 'moment-curvature';
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
  readonly face: 'top' | 'bottom';
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
// Results
// =====================================================================================================

/** One moment–curvature curve, compact: points, key points and the numbers a comparison needs. */
export interface CurveSummary {
  readonly direction: BendingDirection;
  /** Curvature 1/mm and moment N·mm (magnitudes). */
  readonly points: readonly { readonly curvature: number; readonly moment: number }[];
  readonly keyPoints: readonly { readonly name: KeyPointName; readonly curvature: number; readonly moment: number; readonly description: string }[];
  readonly ultimateCause: UltimateCause | null;
  readonly status: string;
  readonly peakMoment: number | null;
  readonly firstYieldMoment: number | null;
  readonly curvatureDuctility: number | null;
  /** Design resistance (ACI φ(Mns + ψf·Mnf), EN M_Rd with ψf on the FRP), N·mm, and how it was found. */
  readonly designResistance: number | null;
  readonly designResistanceNote: string;
}

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
}

/** One section of a variant, compact: definition, added items and curves (mm, N·mm, 1/mm). */
export interface VariantSection {
  /** Id the variant analysed (derived: `<section>~<member>~<variant>`), and the library section it comes from. */
  readonly sectionId: string;
  readonly baseSectionId: string;
  readonly sectionName: string;
  /** The derived definition as analysed (outline, bars, hoops), for drawing. */
  readonly definition: SectionDefinition;
  readonly added: readonly AddedItem[];
  readonly curves: readonly CurveSummary[];
}

/** Flexural strength check of a variant (station by station against each zone's design resistance). */
export interface FlexuralCheck {
  readonly combination: string;
  readonly utilisation: number;
  readonly pass: boolean;
  /** Where the utilisation is largest, mm, and the moment and resistance there (N·mm, magnitudes). */
  readonly position: number;
  /** Section (as analysed by the variant) at that position. */
  readonly sectionId: string;
  readonly direction: BendingDirection;
  readonly demand: number;
  readonly resistance: number | null;
  readonly notes: string;
}

/** Key results of one beam variant (original design, as found, or strengthened), compact. */
export interface VariantResult {
  /** 'original', 'as-found' or the scheme id. */
  readonly key: string;
  readonly label: string;
  readonly status: MemberStatus;
  readonly governingMode: string;
  readonly sections: readonly VariantSection[];
  readonly loadDeflection: {
    readonly pattern: string;
    readonly controlPosition: number;
    /** Load factor, total load (N) and control deflection (mm). */
    readonly points: readonly { readonly loadFactor: number; readonly totalLoad: number; readonly deflection: number }[];
    readonly events: readonly MemberEvent[];
  };
  readonly capacity: {
    readonly peakLoadFactor: number | null;
    /** Largest total load of the pattern on the curve, N. */
    readonly peakTotalLoad: number | null;
    readonly ultimateDeflection: number | null;
    readonly failureCause: string;
  };
  readonly ductility: {
    /** False when shear governs: the values below are kept but not available as capacities. */
    readonly available: boolean;
    readonly note: string;
    readonly yieldDeflection: number | null;
    readonly ultimateDeflection: number | null;
    readonly displacementDuctility: number | null;
    readonly hinges: readonly PlasticHinge[];
  };
  readonly strength: FlexuralCheck | null;
  readonly deflectionChecks: readonly DeflectionCheck[];
  readonly shear: ShearResult | null;
  readonly warnings: readonly string[];
  readonly errors: readonly { readonly path: string; readonly message: string }[];
}

/** What the as-found condition changed. */
export interface AsFoundSummary {
  readonly concrete: readonly {
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
    readonly source: 'coupons' | 'era-default';
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
    readonly effect: string;
    readonly note: string;
  }[];
  /** Derived section ids per library section of the member. */
  readonly sections: readonly { readonly baseSectionId: string; readonly sectionId: string; readonly changes: readonly string[] }[];
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
  readonly formula: string;
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
  readonly method: 'cracked-elastic' | 'moment-curvature';
  /** Cracked elastic data: neutral axis depth kd (mm, from the compression face), Icr (mm⁴), Ec (MPa). */
  readonly neutralAxisDepth: number | null;
  readonly crackedInertia: number | null;
  readonly concreteModulus: number;
  /** Substrate strain at the item, compression positive (tension negative), by the chosen method and by the other one. */
  readonly strain: number;
  readonly otherMethodStrain: number | null;
  readonly formula: string;
}

/** The ACI 440.2R-17 9.2 check: the unstrengthened member under (1.1 SD + 0.75 LL) if the strengthening is lost. */
export interface LossOfStrengtheningCheck {
  readonly combination: string;
  readonly check: FlexuralCheck;
  readonly source: string;
}

/** How a scheme compares with the beam it strengthens (as found, or the design beam). */
export interface SchemeComparison {
  readonly referenceKey: string;
  /** The section and direction that govern the reference beam's strength check. */
  readonly critical: { readonly baseSectionId: string; readonly direction: BendingDirection };
  readonly moments: readonly {
    readonly baseSectionId: string;
    readonly direction: BendingDirection;
    /** Peak moments of the curves and design resistances, N·mm; gains in percent. */
    readonly referencePeak: number | null;
    readonly schemePeak: number | null;
    readonly peakGainPercent: number | null;
    readonly referenceDesign: number | null;
    readonly schemeDesign: number | null;
    readonly designGainPercent: number | null;
    /** Gain of the first-yield moment, percent (what the scheme does at service and up to yield). */
    readonly firstYieldGainPercent: number | null;
  }[];
  readonly memberCapacity: { readonly reference: number | null; readonly scheme: number | null; readonly gainPercent: number | null };
  readonly curvatureDuctility: { readonly reference: number | null; readonly scheme: number | null; readonly changePercent: number | null };
  readonly displacementDuctility: { readonly reference: number | null; readonly scheme: number | null; readonly changePercent: number | null };
  /** Rotation capacity θp,u of the critical hinge, rad. */
  readonly hingeRotation: { readonly reference: number | null; readonly scheme: number | null; readonly changePercent: number | null };
  readonly governingMode: { readonly reference: string; readonly scheme: string };
  /** Plain words: the gain in strength and the change in ductility. */
  readonly statement: string;
}

/** Everything reported for one strengthening scheme. */
export interface SchemeResult {
  readonly schemeId: string;
  readonly name: string;
  readonly kind: StrengtheningScheme['kind'];
  /** One line: what the scheme adds. */
  readonly description: string;
  readonly variant: VariantResult | null;
  readonly frp: FrpDesign | null;
  readonly installation: readonly InstallationStrain[];
  readonly comparison: SchemeComparison | null;
  /** ACI 440.2R-17 9.2 (bonded schemes only; null for a cast concrete layer). */
  readonly lossOfStrengthening: LossOfStrengtheningCheck | null;
  readonly warnings: readonly string[];
  readonly errors: readonly { readonly path: string; readonly message: string }[];
}

/** Design, as-found and strengthened variants of a member, compact, with comparisons (MemberResult.retrofit). */
export interface RetrofitResult {
  /** Which beam the member's main result describes: the as-found beam when a condition is given. */
  readonly basis: 'as-found' | 'design';
  /** The design beam (from the library data), compact. */
  readonly original: VariantResult | null;
  /** The as-found condition and beam, when given. */
  readonly asFound: (AsFoundSummary & { readonly variant: VariantResult | null }) | null;
  /** Key of the variant the schemes are compared with ('as-found' or 'original'). */
  readonly referenceKey: string;
  readonly schemes: readonly SchemeResult[];
  /** Material specs derived for the analysis (as-found concrete and steel), for the report. */
  readonly derivedMaterials: readonly MaterialSpec[];
  readonly caution: string;
  readonly warnings: readonly string[];
  readonly errors: readonly { readonly path: string; readonly message: string }[];
}

/** The caution every retrofit result carries. */
export const RETROFIT_CAUTION =
  'As-found and strengthening results are for review by a qualified engineer and defer to local codes and licensed practice; in-place strengths, deterioration data and strengthening details must be confirmed on site.';
