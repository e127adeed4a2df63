/**
 * A continuous beam as its engine sees it: 1 to 8 spans of any lengths, an optional cantilever at
 * either end, a support condition at every support, zones of sections anywhere along the length,
 * and loads per span (or cantilever) and per load case.
 *
 * Internal units: lengths mm, line loads N/mm, point loads N, flexural stiffness N·mm², rotational
 * stiffness N·mm/rad. Positions of zones are measured along the whole beam from its left end (the
 * tip of the left cantilever, or the first support where there is none); positions of loads are
 * measured from the left end of the span or cantilever they act on. Loads act downward when positive.
 */
import type { HingeLengthMethod, LoadFactors, LoadPattern, MemberLoad, MemberZone, ServiceSettings } from '../member/definition.ts';
import { supportStiffness as memberSupportStiffness, type SupportDefinition } from '../member/layout.ts';

/** Support conditions of a continuous beam, in menu order. */
export const CONTINUOUS_SUPPORT_KINDS = ['pinned', 'fixed', 'column'] as const;
export type ContinuousSupportKind = (typeof CONTINUOUS_SUPPORT_KINDS)[number];

/** Far-end conditions of a column, in menu order: they set its rotational stiffness 4EI/L or 3EI/L. */
export const COLUMN_FAR_ENDS = ['fixed', 'pinned'] as const;
export type ColumnFarEnd = (typeof COLUMN_FAR_ENDS)[number];

/** A column framing into a support from above or below. */
export interface ColumnStiffness {
  /** Flexural stiffness EI of the column, N·mm². */
  readonly stiffness: number;
  /** Storey height (length of the column between joints), mm. */
  readonly height: number;
  /** Condition at the column's far end: fixed (4EI/L) or pinned (3EI/L). */
  readonly farEnd: ColumnFarEnd;
}

/**
 * A support: pinned (knife edge, the beam runs over it), fixed (full restraint against rotation, e.g.
 * a stiff wall), or a column above and/or below acting as a rotational spring on the joint.
 */
export interface ContinuousSupport {
  readonly kind: ContinuousSupportKind;
  readonly above?: ColumnStiffness;
  readonly below?: ColumnStiffness;
}

/** Which part of the beam a load acts on: span 1…n (counted from the left) or a cantilever. */
export type SpanRef = number | 'left-cantilever' | 'right-cantilever';

/**
 * A load of a continuous beam: a member load (uniform, partial or point; core/member/definition.ts)
 * on one span or cantilever, its positions measured from the left end of that part.
 */
export type ContinuousLoad = MemberLoad & {
  /** The span (1…n) or cantilever it acts on. */
  readonly span: SpanRef;
};

/** The load pattern of the analysis to failure: every span loaded, or the pattern that governs one span. */
export type FailureArrangement =
  | { readonly kind: 'all-spans' }
  /** The arrangement that gives the largest sagging moment in span `span` (1-based). */
  | { readonly kind: 'governing-span'; readonly span: number };

export interface ContinuousCapacitySettings {
  /** Loads increased to failure: everything together, or the live load with dead loads held. */
  readonly pattern: LoadPattern;
  readonly arrangement: FailureArrangement;
  readonly hingeLengthMethod: HingeLengthMethod;
  /** Plastic hinge length for `user`, mm. */
  readonly userHingeLength?: number;
  /** Control point of the load–deflection curve, mm from the left end; default: the largest elastic deflection. */
  readonly controlPosition?: number;
}

export interface ContinuousBeamDefinition {
  readonly id: string;
  /** Mark as on the drawings, e.g. "B-3/A–D". */
  readonly name: string;
  /** Span lengths between support centrelines, mm, left to right (1 to 8 spans). */
  readonly spans: readonly number[];
  /** Length of a cantilever beyond the first or last support, mm (omitted or 0: none). */
  readonly leftCantilever?: number;
  readonly rightCantilever?: number;
  /** One support per span end, left to right (spans.length + 1). */
  readonly supports: readonly ContinuousSupport[];
  /** Zones of sections, positions along the whole beam from its left end; they tile the length. */
  readonly zones: readonly MemberZone[];
  readonly loads: readonly ContinuousLoad[];
  /** Include self-weight (concrete density × section area) in the dead case, default true. */
  readonly includeSelfWeight?: boolean;
  /** Strength combination factors (defaults from the code basis). */
  readonly strengthFactors?: LoadFactors;
  readonly service: ServiceSettings;
  readonly capacity: ContinuousCapacitySettings;
  readonly notes?: string;
}

/** Limits of the definition (validation and the UI read them). */
export const CONTINUOUS_LIMITS = { minSpans: 1, maxSpans: 8, maxLength: 60000 } as const;

/** A support in the member engine's geometry (core/member/layout.ts): a column support is a spring of its columns. */
export function supportDefinition(support: ContinuousSupport): SupportDefinition {
  if (support.kind !== 'column') return { kind: support.kind };
  return { kind: 'spring', columns: [support.above, support.below].filter((c): c is ColumnStiffness => c !== undefined) };
}

/**
 * Rotational stiffness of a support, N·mm/rad: 0 for a pin, Infinity for a fixed support, and for
 * columns the sum of 4EI/L (far end fixed) or 3EI/L (far end pinned) above and below — the
 * stiffness of a prismatic member rotated at one end (slope–deflection; common practice, no source),
 * by core/member/layout.ts supportStiffness.
 */
export function supportStiffness(support: ContinuousSupport): number {
  return support.kind === 'fixed' ? Infinity : memberSupportStiffness(supportDefinition(support));
}
