/**
 * A beam as the member engine sees it: supports, span, zones of sections, loads and the settings of
 * its analyses. The project file's member (core/project/types.ts MemberDefinition) is this plus the
 * as-found condition and strengthening schemes of core/retrofit. Internal units: lengths mm, line
 * loads N/mm, point loads N. Loads act downward when positive (gravity). Positions x are measured
 * from the left support (the fixed end of a cantilever).
 */

// Every option list of a beam is written once, here, in menu order; the types, the file schema
// (core/project/schema.ts), the validators (validate.ts) and the UI's lists derive from it.

/**
 * Support conditions of a single span. A cantilever is fixed at x = 0 and free at x = L; a
 * propped cantilever is fixed at x = 0 and pinned at x = L. (Continuous beams are core/continuous.)
 */
export const SUPPORT_TYPES = ['simply-supported', 'cantilever', 'fixed-fixed', 'propped-cantilever'] as const;
export type SupportType = (typeof SUPPORT_TYPES)[number];

/** Load cases. Self-weight is added to `dead` automatically unless switched off. */
export const LOAD_CASES = ['dead', 'superimposed', 'live'] as const;
export type LoadCaseId = (typeof LOAD_CASES)[number];

/** Kinds of load. */
export const LOAD_KINDS = ['uniform', 'point'] as const;

export type MemberLoad =
  | {
      readonly kind: 'uniform';
      readonly loadCase: LoadCaseId;
      /** Line load, N/mm (= kN/m), downward positive. */
      readonly magnitude: number;
      /** Extent, mm from the left support; omitted → the whole span. */
      readonly from?: number;
      readonly to?: number;
      readonly label?: string;
    }
  | {
      readonly kind: 'point';
      readonly loadCase: LoadCaseId;
      /** Force, N, downward positive. */
      readonly magnitude: number;
      /** Position, mm from the left support. */
      readonly position: number;
      readonly label?: string;
    };

/** A zone of the span with its own section, e.g. the support regions with top bars. */
export interface MemberZone {
  /** Start and end, mm from the left support; zones must tile the span without gaps or overlaps. */
  readonly from: number;
  readonly to: number;
  readonly sectionId: string;
}

/** Load factors of one combination. */
export interface LoadFactors {
  readonly dead: number;
  readonly superimposed: number;
  readonly live: number;
}

/** Deflection limit cases, in menu order. */
export const DEFLECTION_LIMIT_CASES = [
  /** ACI 318-19 Table 24.2.2: flat roofs not supporting nonstructural elements likely to be damaged — immediate live (Lr, S, R) ℓ/180. */
  'aci-roof-immediate',
  /** ACI 318-19 Table 24.2.2: floors not supporting such elements — immediate live ℓ/360. */
  'aci-floor-immediate',
  /** ACI 318-19 Table 24.2.2: supporting elements likely to be damaged — deflection after attachment ℓ/480. */
  'aci-sensitive-after-attachment',
  /** ACI 318-19 Table 24.2.2: supporting elements not likely to be damaged — deflection after attachment ℓ/240. */
  'aci-insensitive-after-attachment',
  /** EN 1992-1-1 7.4.1(4): appearance, total deflection under quasi-permanent loads, span/250. */
  'en-appearance',
  /** EN 1992-1-1 7.4.1(5): deflection after construction that may damage adjacent parts, span/500. */
  'en-after-construction',
  /** A user-given limit span/ratio on the total long-term deflection. */
  'custom',
] as const;
export type DeflectionLimitCase = (typeof DEFLECTION_LIMIT_CASES)[number];

/** Plastic hinge length expressions (core/member/hinge-length.ts), and a length the engineer gives. */
export const HINGE_LENGTH_METHODS = ['priestley-2007', 'paulay-priestley-1992', 'mattock-1967', 'corley-1966', 'user'] as const;
export type HingeLengthMethod = (typeof HINGE_LENGTH_METHODS)[number];

/** Load patterns of the load–deflection curve: everything increased together, or the live load with the dead load held. */
export const LOAD_PATTERNS = ['proportional', 'live-only'] as const;
export type LoadPattern = (typeof LOAD_PATTERNS)[number];

export interface ServiceSettings {
  /** Fraction ψ of the live load that is sustained (EN 1990 ψ2; ACI "sustained portion"), 0–1. */
  readonly sustainedLiveFraction: number;
  /** Duration of sustained load, months, for ACI 318-19 Table 24.2.4.1.3 ξ (3 → 1.0, 6 → 1.2, 12 → 1.4, ≥ 60 → 2.0). */
  readonly durationMonths: number;
  /** Deflection limit cases to check (one or more). */
  readonly limitCases: readonly DeflectionLimitCase[];
  /** Span/ratio for the 'custom' case (e.g. 300 for ℓ/300). */
  readonly customLimitRatio?: number;
  /** Include shrinkage curvature in the EN 1992-1-1 long-term deflection (7.4.3(6)), default true. */
  readonly includeShrinkage?: boolean;
}

/**
 * Hinge length of a hinge inside the span (two shear spans z1, z2): 'combined' keeps the
 * depth-dependent part once and adds the span-dependent part of both sides (common practice, no
 * source); 'per-face' applies the published one-sided expression to each side of the critical
 * section and adds the two lengths.
 */
export const SPAN_HINGE_RULES = ['combined', 'per-face'] as const;
export type SpanHingeRule = (typeof SPAN_HINGE_RULES)[number];

/**
 * Strain penetration (bond slip of the bars anchored beyond a restrained support face): a rotation
 * Lsp·φ at the face. 'en1998-3': Lsp = 0.13·db·fy/√fc (EN 1998-3:2005 Eq. (A.10a), third term);
 * 'priestley-2007': Lsp = 0.022·fy·db (Priestley, Calvi & Kowalsky 2007); 'none'.
 */
export const STRAIN_PENETRATION_MODELS = ['en1998-3', 'priestley-2007', 'none'] as const;
export type StrainPenetrationModel = (typeof STRAIN_PENETRATION_MODELS)[number];

/**
 * Shear deformation in the load–deflection curve. 'en1998-3': a cracked shear flexibility fitted so
 * that, when the critical section yields, its shear span Lv rotates by 0.0013(1 + 1.5h/Lv) — the
 * shear term of the mean yield chord rotation of EN 1998-3:2005 Eq. (A.10a) (Panagiotakos & Fardis
 * 2001; equation number from memory); 'none': flexure only.
 */
export const SHEAR_DEFORMATION_MODELS = ['en1998-3', 'none'] as const;
export type ShearDeformationModel = (typeof SHEAR_DEFORMATION_MODELS)[number];

export interface CapacitySettings {
  /** Load pattern increased to failure: all loads proportionally, or live only with dead held. */
  readonly pattern: LoadPattern;
  readonly hingeLengthMethod: HingeLengthMethod;
  /** Plastic hinge length for `user`, mm. */
  readonly userHingeLength?: number;
  /** Hinge length inside the span (default 'combined'). */
  readonly spanHingeRule?: SpanHingeRule;
  /**
   * Tension shift of the moment envelope for the steel strain, a_l = z(cot θ − cot α)/2 with θ = 45°
   * and vertical stirrups (EN 1992-1-1 9.2.1.3(2)); default true.
   */
  readonly tensionShift?: boolean;
  /** Shear deformation added to the load–deflection curve (default 'en1998-3'). */
  readonly shearDeformation?: ShearDeformationModel;
  /** Strain penetration at restrained supports (default 'en1998-3'). */
  readonly strainPenetration?: StrainPenetrationModel;
  /**
   * The member's best-estimate ultimate on the descending branch: where the load has fallen to this
   * fraction of the peak (default 0.8; Park 1988, from memory), unless a section limit comes first.
   */
  readonly ultimateLoadFraction?: number;
}

export interface BeamDefinition {
  readonly id: string;
  /** Mark as on the drawings, e.g. "B-12". */
  readonly name: string;
  readonly supports: SupportType;
  /** Clear span used for statics and deflection limits, mm (cantilever: its length). */
  readonly span: number;
  readonly zones: readonly MemberZone[];
  readonly loads: readonly MemberLoad[];
  /** Include self-weight from the concrete density and section area in the dead case (default true). */
  readonly includeSelfWeight?: boolean;
  /** Strength combination factors (defaults from the code basis: 1.2D + 1.6L or 1.35G + 1.5Q). */
  readonly strengthFactors?: LoadFactors;
  readonly service: ServiceSettings;
  readonly capacity: CapacitySettings;
  readonly notes?: string;
}
