/**
 * What the assessment reports for a member: the member engine's beam result (core/member) with the
 * strength checks, the shear check, the status and the one-sentence governing mode — and, for an
 * existing beam, its design, as-found and strengthened variants compactly with their comparison.
 * Plain, serialisable data; every number the UI, CLI and report show comes from here and none of
 * them recomputes. Internal units: mm, N, N·mm, rad, 1/mm.
 */
import type { Problem } from '../diagnostics.ts';
import type { MaterialSpec } from '../materials/specs.ts';
import type { Text } from '../units/phrase.ts';
import type { BeamResult, DeflectionCheck, MemberEvent, PlasticHinge } from '../member/results.ts';
import type { AddedItem, AsFoundSummary, FrpDesign, InstallationStrain, StrengtheningScheme } from '../retrofit/types.ts';
import type { SectionDefinition } from '../section/definition.ts';
import type { BendingDirection } from '../section/model.ts';
import type { KeyPointName, UltimateCause } from '../section/results.ts';
import type { ShearResult } from './shear.ts';

/** The caution every surface that shows results carries: the app, the command line and the report. */
export const RESULTS_CAUTION = 'Results are for review by a qualified engineer and defer to local codes and licensed practice.';

export type MemberStatus = 'ok' | 'check-fails' | 'not-converged' | 'input-error';

export interface StrengthCheck {
  readonly combination: string;
  /** Factored moment demands, N·mm (magnitudes) and where. */
  readonly saggingDemand: number;
  readonly saggingPosition: number;
  readonly hoggingDemand: number;
  readonly hoggingPosition: number;
  /** Design flexural resistance (φMn or M_Rd), N·mm, at those positions. */
  readonly saggingResistance: number | null;
  readonly hoggingResistance: number | null;
  readonly utilisation: number;
  readonly pass: boolean;
  readonly notes: Text;
}

/** Everything reported for one member. */
export interface MemberResult extends BeamResult {
  readonly status: MemberStatus;
  /** One sentence: what governs the member (quantities as data: say(governingMode, units)). */
  readonly governingMode: Text;
  readonly strength: StrengthCheck | null;
  /** Shear capacity and demand, flexure- or shear-governed (core/assessment/shear.ts). */
  readonly shear?: ShearResult;
  /** Design, as-found and strengthened variants (core/assessment/member.ts). */
  readonly retrofit?: RetrofitResult;
}

// =====================================================================================================
// Existing beams: variants and their comparison
// =====================================================================================================

/** One moment–curvature curve, compact: points, key points and the numbers a comparison needs. */
export interface CurveSummary {
  readonly direction: BendingDirection;
  /** Curvature 1/mm and moment N·mm (magnitudes). */
  readonly points: readonly { readonly curvature: number; readonly moment: number }[];
  readonly keyPoints: readonly { readonly name: KeyPointName; readonly curvature: number; readonly moment: number; readonly description: string }[];
  readonly ultimateCause: UltimateCause | null;
  readonly status: Text;
  readonly peakMoment: number | null;
  readonly firstYieldMoment: number | null;
  readonly curvatureDuctility: number | null;
  /** Design resistance (ACI φ(Mns + ψf·Mnf), EN M_Rd with ψf on the FRP), N·mm, and how it was found. */
  readonly designResistance: number | null;
  readonly designResistanceNote: Text;
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
  readonly notes: Text;
}

/** Key results of one beam variant (original design, as found, or strengthened), compact. */
export interface VariantResult {
  /** 'original', 'as-found' or the scheme id. */
  readonly key: string;
  readonly label: string;
  readonly status: MemberStatus;
  readonly governingMode: Text;
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
  readonly warnings: readonly Text[];
  readonly errors: readonly Problem[];
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
  readonly governingMode: { readonly reference: Text; readonly scheme: Text };
  /** Plain words: the gain in strength and the change in ductility. */
  readonly statement: Text;
}

/** One code check of a strengthening method (assessment/strengthening-checks.ts). */
export interface StrengtheningCheck {
  readonly id: 'strengthening-limit' | 'frp-debonding' | 'steel-service-stress' | 'plate-service-stress' | 'concrete-service-stress' | 'frp-creep-rupture';
  /** What is checked, in words, and the clause. */
  readonly name: string;
  readonly clause: string;
  /** What `value` and `limit` are: a utilisation (dimensionless), a stress (MPa) or a strain (tension positive). */
  readonly quantity: 'ratio' | 'stress' | 'strain';
  readonly value: number;
  readonly limit: number;
  /** value / limit (99.99 when the demand cannot be carried at all). */
  readonly ratio: number;
  readonly pass: boolean;
  /** Where, under which loads, and the numbers. */
  readonly note: Text;
}

/** Everything reported for one strengthening scheme. */
export interface SchemeResult {
  readonly schemeId: string;
  readonly name: string;
  readonly kind: StrengtheningScheme['kind'];
  /** One line: what the scheme adds. */
  readonly description: Text;
  readonly variant: VariantResult | null;
  readonly frp: FrpDesign | null;
  readonly installation: readonly InstallationStrain[];
  readonly comparison: SchemeComparison | null;
  /** ACI 440.2R-17 9.2 (bonded schemes only; null for a cast concrete layer). */
  readonly lossOfStrengthening: LossOfStrengtheningCheck | null;
  /** The strengthening method's code checks (strengthening limit, debonding strain, service stresses, creep rupture). */
  readonly checks: readonly StrengtheningCheck[];
  readonly warnings: readonly Text[];
  readonly errors: readonly Problem[];
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
  readonly warnings: readonly Text[];
  readonly errors: readonly Problem[];
}

/**
 * Whether a member as it stands (the as-found beam when a condition is given, else the design
 * beam) needs strengthening: a strength, shear or deflection check fails, or it fails without
 * warning (any status but OK, not converged or input error).
 */
export function needsStrengthening(result: Pick<MemberResult, 'status'>): boolean {
  return result.status !== 'ok' && result.status !== 'not-converged' && result.status !== 'input-error';
}

/** The caution every retrofit result carries. */
export const RETROFIT_CAUTION =
  'As-found and strengthening results are for review by a qualified engineer and defer to local codes and licensed practice; in-place strengths, deterioration data and strengthening details must be confirmed on site.';
