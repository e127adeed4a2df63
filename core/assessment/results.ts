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

/**
 * Member statuses, from the most to the least urgent:
 *  - input-error: not analysed, the input must be fixed;
 *  - not-converged: the analysis stopped before a limit state;
 *  - check-fails: a strength (flexure or shear) or deflection check fails;
 *  - brittle: every check passes but the member fails without warning — shear before the flexural
 *    mechanism, strength before the tension steel yields, or a cracking moment at or above the
 *    strength / less than the minimum tension steel (brittle.ts); never shown as OK;
 *  - ok: every check passes and the member is ductile.
 */
export const MEMBER_STATUSES = ['input-error', 'not-converged', 'check-fails', 'brittle', 'ok'] as const;
export type MemberStatus = (typeof MEMBER_STATUSES)[number];

/** The largest demand/resistance of one bending sense in one zone, over the stations and combinations. */
export interface StrengthPoint {
  /** mm from the left support. */
  readonly position: number;
  /** |M|, N·mm, and the design resistance there (φMn or M_Rd), N·mm (null: no tension reinforcement on that side). */
  readonly demand: number;
  readonly resistance: number | null;
  /** demand/resistance; 99.99 for a demand where there is no resistance. */
  readonly utilisation: number;
  /** The combination it comes from (name and source). */
  readonly combination: string;
}

/** One zone of the member in the strength check: its section and the worst point of each sense. */
export interface StrengthZone {
  readonly from: number;
  readonly to: number;
  /** Section id as analysed (a derived id for an as-found or strengthened beam). */
  readonly sectionId: string;
  readonly sagging: StrengthPoint | null;
  readonly hogging: StrengthPoint | null;
}

/**
 * The flexural strength check (assessment/flexure.ts): factored moment demand from an elastic
 * analysis against the design resistance of the section there, at every station of the span, in
 * both senses, in every zone, for every combination (the envelope).
 */
export interface StrengthCheck {
  /** The governing combination (name and source), and every combination checked with its largest utilisation. */
  readonly combination: string;
  readonly combinations: readonly { readonly combination: string; readonly utilisation: number }[];
  readonly utilisation: number;
  readonly pass: boolean;
  /** The governing point: position (mm), section as analysed, sense, |M| and resistance (N·mm). */
  readonly position: number;
  readonly sectionId: string;
  readonly direction: BendingDirection;
  readonly demand: number;
  readonly resistance: number | null;
  /** The worst point of each sense over the member (demand, where, resistance there; N·mm, mm). */
  readonly saggingDemand: number;
  readonly saggingPosition: number;
  readonly saggingResistance: number | null;
  readonly hoggingDemand: number;
  readonly hoggingPosition: number;
  readonly hoggingResistance: number | null;
  /** Every zone with its worst point per sense. */
  readonly zones: readonly StrengthZone[];
  /** How the resistances of the governing points were found. */
  readonly notes: Text;
}

/** Why a member is brittle (brittle.ts). */
export const BRITTLE_CAUSES = ['shear-before-flexure', 'no-yield-before-strength', 'below-strain-limit', 'cracking-above-strength', 'below-minimum-steel'] as const;
export type BrittleCause = (typeof BRITTLE_CAUSES)[number];

export interface BrittleFinding {
  readonly cause: BrittleCause;
  /** Section (as analysed) and sense concerned; null for the member as a whole (shear). */
  readonly sectionId: string | null;
  readonly direction: BendingDirection | null;
  /** What was found, with its numbers and the clause. */
  readonly text: Text;
}

/** Everything reported for one member. */
export interface MemberResult extends BeamResult {
  readonly status: MemberStatus;
  /** One sentence: what governs the member (quantities as data: say(governingMode, units)). */
  readonly governingMode: Text;
  readonly strength: StrengthCheck | null;
  /** Shear capacity and demand, flexure- or shear-governed (core/assessment/shear.ts). */
  readonly shear?: ShearResult;
  /** Why the member is brittle; empty when it is not (or was not analysed). */
  readonly brittle: readonly BrittleFinding[];
  /**
   * Why the displacement ductility and hinge rotations are not available (they are then null in
   * `ductility`), or null when they are.
   */
  readonly ductilityUnavailable: Text | null;
  /**
   * Why the ultimate deflection Δu and μΔ are not given although the member is not brittle: its
   * load–deflection curve passes span/50, outside the small-deflection range of the method, before
   * its ultimate (core/member/small-deflection.ts); null or absent when it stays within.
   */
  readonly ultimateOutsideRange?: Text | null;
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
    /** False when the beam is brittle (MemberResult.ductilityUnavailable): the ductility and hinge rotations are then null. */
    readonly available: boolean;
    readonly note: Text;
    readonly yieldDeflection: number | null;
    readonly ultimateDeflection: number | null;
    readonly displacementDuctility: number | null;
    readonly hinges: readonly PlasticHinge[];
  };
  readonly strength: StrengthCheck | null;
  readonly deflectionChecks: readonly DeflectionCheck[];
  /** Why the service deflections are no result (beyond span/50, core/member/small-deflection.ts), or null. */
  readonly serviceOutsideRange?: Text | null;
  readonly shear: ShearResult | null;
  readonly warnings: readonly Text[];
  readonly errors: readonly Problem[];
}

/** The ACI 440.2R-17 9.2 check: the unstrengthened member under (1.1 SD + 0.75 LL) if the strengthening is lost. */
export interface LossOfStrengtheningCheck {
  readonly combination: string;
  readonly check: StrengthCheck;
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
