/**
 * Plain, serialisable results of the member engine for one beam (internal units: mm, N, N·mm, rad,
 * 1/mm): sections, the load–deflection curve to ultimate, hinges and ductility, and the service
 * deflections. The checks and verdicts built on them are core/assessment/results.ts.
 */
import type { Problem } from '../diagnostics.ts';
import type { ElasticProperties } from '../section/elastic.ts';
import type { Text } from '../units/phrase.ts';
import type { MomentCurvatureResult } from '../section/results.ts';
import type { DeflectionLimitCase, HingeLengthMethod, ShearDeformationModel, SpanHingeRule, StrainPenetrationModel, SupportType } from './definition.ts';

/** Section results for one section used by the member, per bending direction it needs. */
export interface SectionResult {
  readonly sectionId: string;
  readonly sectionName: string;
  readonly elastic: ElasticProperties;
  readonly sagging?: MomentCurvatureResult;
  readonly hogging?: MomentCurvatureResult;
  /** Self-weight of the section, N/mm. */
  readonly selfWeight: number;
  readonly warnings: readonly Text[];
}

/**
 * Events of the load–deflection curve: first cracking; a zone starting to yield ('first-yield', for
 * every new zone); a section localising into a hinge ('hinge'); the code ultimate (a section at the
 * code's crushing strain); the peak load or the mechanism; the best-estimate ultimate.
 */
export type MemberEventKind = 'cracking' | 'first-yield' | 'hinge' | 'code-ultimate' | 'peak' | 'mechanism' | 'ultimate';

export interface MemberEvent {
  readonly kind: MemberEventKind;
  /** Load factor λ on the chosen pattern and the control deflection there (mm, downward +). */
  readonly loadFactor: number;
  readonly deflection: number;
  /** Where it happens, mm from the left support. */
  readonly position: number;
  readonly description: string;
  /**
   * Positions (mm) of the other events of the same kind at the same load factor (twins of a
   * symmetric member; within 1e-6), when there are any: such events are listed left to right.
   */
  readonly together?: readonly number[];
}

export interface LoadDeflectionPoint {
  readonly loadFactor: number;
  /** Total applied load of the pattern at this level, N (sum of all loads, for axis labels). */
  readonly totalLoad: number;
  /** Deflection at the control point, mm (downward positive). */
  readonly deflection: number;
  /** Which branch produced the point: distributed curvature integration, or hinge mechanism. */
  readonly stage: 'integration' | 'mechanism';
}

/** Moment, curvature and deflection along the span at one load level. */
export interface SpanDistribution {
  readonly label: string;
  readonly loadFactor: number;
  /** Stations, mm from the left support. */
  readonly x: readonly number[];
  /** Bending moment, N·mm (sagging positive). */
  readonly moment: readonly number[];
  /** Curvature, 1/mm (sagging positive). */
  readonly curvature: readonly number[];
  /** Deflection, mm (downward positive). */
  readonly deflection: readonly number[];
  /** Plastic hinge zones active at this level: [start, end] mm. */
  readonly hingeZones: readonly (readonly [number, number])[];
}

/**
 * A plastic hinge: a zone that yielded, with the localisation of its critical section when it went
 * past the top of its curve. Its plastic rotation has three parts: the plastic curvature spread over
 * the zone, the rotation localised over Lp, and the strain penetration at a restrained face.
 */
export interface PlasticHinge {
  /** Location of the critical section, mm from the member's left end. */
  readonly position: number;
  /** The position in words ("midspan", "support 2"). */
  readonly location: string;
  readonly direction: 'sagging' | 'hogging';
  readonly sectionId: string;
  /**
   * Order in which the hinges' zones started to yield (1 = first), and the load factor then. Hinges
   * that started at the same load factor (within 1e-6: twins of a symmetric member) share their
   * order and are listed left to right; `together` gives the positions of the others (mm).
   */
  readonly order: number;
  readonly together?: readonly number[];
  readonly yieldLoadFactor: number;
  /** Extent of the yielded zone at ultimate, mm from the member's left end. */
  readonly plasticZone: readonly [number, number];
  /** Whether the critical section went past the top of its curve (its deformation localised), and at which load factor. */
  readonly localised: boolean;
  readonly localisationLoadFactor: number | null;
  /** Length over which the deformation localises Lp, mm (0 when it did not localise), and how it was obtained. */
  readonly length: number;
  readonly lengthMethod: HingeLengthMethod;
  /** Lp's expression with its numbers, in the display units (the published SI form, or the in.-lb. form). */
  readonly lengthFormula: Text;
  /** Distance from the critical section to the points of contraflexure used in Lp, mm. */
  readonly shearSpan: number;
  /**
   * Plastic rotation capacity, rad: the spread part with the critical section brought to the top of
   * its curve under the moment diagram at ultimate, the whole rest of its curve over Lp, and the
   * strain penetration with the face at the top of its curve. Null when the member is brittle
   * (MemberResult.ductilityUnavailable says why).
   */
  readonly rotationCapacity: number | null;
  /** Plastic rotation reached when the member reaches its best-estimate ultimate (the demand), rad (null when brittle). */
  readonly rotationAtUltimate: number | null;
  /** The parts of rotationAtUltimate, rad. */
  readonly rotationParts: { readonly spread: number; readonly localised: number; readonly penetration: number };
  /** Curvature ductility of the hinge section φu/φy. */
  readonly curvatureDuctility: number | null;
}

/** The deformation model the load–deflection curve used (for the report's method chapter). */
export interface DeformationModel {
  readonly tensionShift: boolean;
  readonly strainPenetration: StrainPenetrationModel;
  readonly shearDeformation: ShearDeformationModel;
  readonly ultimateLoadFraction: number;
  readonly spanHingeRule: SpanHingeRule;
}

export interface DeflectionCheck {
  readonly limitCase: DeflectionLimitCase;
  /** E.g. "ACI 318-19 Table 24.2.2: floor, immediate live load". */
  readonly description: string;
  /** What is compared, e.g. "immediate deflection under live load". */
  readonly quantity: string;
  /** Denominator of ℓ/ratio. */
  readonly ratio: number;
  /** Allowed deflection, mm. */
  readonly limit: number;
  /** Computed deflection by the two methods, mm (the check uses `governing`). */
  readonly byIntegration: number;
  readonly byCode: number;
  readonly governing: number;
  /** governing / limit. */
  readonly utilisation: number;
  readonly pass: boolean;
}

export interface ServiceDeflections {
  /** Immediate deflections at the control point, mm: dead (incl. superimposed), dead + live, live increment, sustained (D + ψL). */
  readonly immediate: {
    readonly integration: { readonly dead: number; readonly deadPlusLive: number; readonly live: number; readonly sustained: number };
    readonly code: { readonly dead: number; readonly deadPlusLive: number; readonly live: number; readonly sustained: number };
  };
  /** Long-term (time-dependent) additional deflection under sustained load, mm, and the total. */
  readonly longTerm: {
    readonly method: string;
    readonly multiplier: number | null;
    readonly integrationAdditional: number;
    readonly codeAdditional: number;
    readonly integrationTotal: number;
    readonly codeTotal: number;
  };
  /** Effective moment of inertia details of the code method. */
  readonly codeMethod: {
    readonly name: string;
    /** ACI only: effective moments of inertia used, mm⁴. */
    readonly effectiveInertia: { readonly dead: number; readonly deadPlusLive: number; readonly sustained: number } | null;
    readonly notes: string;
    /** ACI only: immediate deflections with Branson's Ie (ACI 318-14 and earlier), for comparison, mm. */
    readonly legacyBranson?: { readonly dead: number; readonly deadPlusLive: number; readonly live: number };
  };
  /**
   * Where the two methods differ by more than METHODS_APART (25 %) — immediately under dead + live
   * load, or in the long-term addition — one sentence each on which assumptions differ; else empty.
   */
  readonly methodDifferences?: readonly Text[];
  readonly checks: readonly DeflectionCheck[];
}

/** What the member engine finds for one beam. */
export interface BeamResult {
  readonly memberId: string;
  readonly memberName: string;
  readonly supports: SupportType;
  readonly span: number;
  readonly sections: readonly SectionResult[];
  readonly loadDeflection: {
    readonly pattern: string;
    /** Control point for the curve (midspan, cantilever tip, or the position of largest deflection), mm. */
    readonly controlPosition: number;
    readonly points: readonly LoadDeflectionPoint[];
    readonly events: readonly MemberEvent[];
    readonly status: string;
  };
  readonly ductility: {
    /** Deflection at first yield of the critical section and at nominal (idealised) yield, mm. */
    readonly firstYieldDeflection: number | null;
    readonly yieldDeflection: number | null;
    /** Deflection at the best-estimate ultimate (the end of the load–deflection curve), mm. */
    readonly ultimateDeflection: number | null;
    /** μΔ = Δu / Δy (nominal yield). */
    readonly displacementDuctility: number | null;
    readonly hinges: readonly PlasticHinge[];
    /** The limit state that ends the load–deflection curve, in words. */
    readonly failureCause: string;
    /** How the nominal yield deflection was found, in words (null without one). */
    readonly yieldDefinition?: string | null;
    /** The peak of the load–deflection curve: load factor, total load (N), deflection (mm). */
    readonly peak?: { readonly loadFactor: number; readonly totalLoad: number; readonly deflection: number } | null;
    /** The code ultimate: where a section first reaches the code's crushing strain (load factor, total load N, deflection mm, position mm); null when none does before the end of the curve. */
    readonly codeUltimate?: { readonly loadFactor: number; readonly totalLoad: number; readonly deflection: number; readonly position: number } | null;
    /** The deformation model used. */
    readonly model?: DeformationModel;
  };
  readonly distributions: readonly SpanDistribution[];
  readonly service: ServiceDeflections | null;
  readonly warnings: readonly Text[];
  readonly errors: readonly Problem[];
}
