/**
 * Plain, serialisable results of the member engine for one beam (internal units: mm, N, N·mm, rad,
 * 1/mm): sections, the load–deflection curve to ultimate, hinges and ductility, and the service
 * deflections. The checks and verdicts built on them are core/assessment/results.ts.
 */
import type { Problem } from '../diagnostics.ts';
import type { ElasticProperties } from '../section/elastic.ts';
import type { Text } from '../units/phrase.ts';
import type { MomentCurvatureResult } from '../section/results.ts';
import type { DeflectionLimitCase, HingeLengthMethod, SupportType } from './definition.ts';

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

export type MemberEventKind = 'cracking' | 'first-yield' | 'hinge' | 'peak' | 'mechanism' | 'ultimate';

export interface MemberEvent {
  readonly kind: MemberEventKind;
  /** Load factor λ on the chosen pattern and the control deflection there (mm, downward +). */
  readonly loadFactor: number;
  readonly deflection: number;
  /** Where it happens, mm from the left support. */
  readonly position: number;
  readonly description: string;
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

export interface PlasticHinge {
  /** Location of the critical section, mm from the left support. */
  readonly position: number;
  readonly direction: 'sagging' | 'hogging';
  readonly sectionId: string;
  /** Plastic hinge length Lp, mm, and how it was obtained. */
  readonly length: number;
  readonly lengthMethod: HingeLengthMethod;
  /** Lp's expression with its numbers, in the display units (the published SI form, or the in.-lb. form). */
  readonly lengthFormula: Text;
  /** Distance from the critical section to the point of contraflexure used in Lp, mm. */
  readonly shearSpan: number;
  /** Plastic rotation capacity θp = (φu − φy)·Lp, rad. */
  readonly rotationCapacity: number;
  /** Plastic rotation reached when the member reaches ultimate, rad. */
  readonly rotationAtUltimate: number;
  /** Curvature ductility of the hinge section φu/φy. */
  readonly curvatureDuctility: number | null;
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
    readonly ultimateDeflection: number | null;
    /** μΔ = Δu / Δy (nominal yield). */
    readonly displacementDuctility: number | null;
    readonly hinges: readonly PlasticHinge[];
    /** The limit state that ends the load–deflection curve, in words. */
    readonly failureCause: string;
  };
  readonly distributions: readonly SpanDistribution[];
  readonly service: ServiceDeflections | null;
  readonly warnings: readonly Text[];
  readonly errors: readonly Problem[];
}
