/**
 * Plain, serialisable results of a section analysis. Everything here is data: the worker posts it,
 * the UI plots it, the report prints it. Units (internal SI): curvature 1/mm, moment N·mm,
 * depth mm, strain dimensionless (compression positive), stress MPa, force N.
 * Curvatures and moments are MAGNITUDES in the stated bending direction.
 */
import type { Text } from '../units/phrase.ts';
import type { UltimateStrainSource } from '../materials/types.ts';
import type { BendingDirection, ElementKind } from './model.ts';

/** Bilinear idealisations of a moment–curvature curve (core/section/idealise.ts), in menu order. */
export const BILINEAR_METHODS = ['priestley-2007', 'equal-energy'] as const;
export type BilinearMethod = (typeof BILINEAR_METHODS)[number];

export interface CurvePoint {
  /** Curvature magnitude, 1/mm. */
  readonly curvature: number;
  /** Moment magnitude in the bending direction, N·mm. */
  readonly moment: number;
  /** Depth of the neutral axis below the compression face, mm; null at zero curvature. */
  readonly neutralAxisDepth: number | null;
  /** Strain at the extreme compression face of the concrete (compression positive). */
  readonly compressionFaceStrain: number;
  /** Strain at the extreme tension face of the concrete (negative in tension). */
  readonly tensionFaceStrain: number;
  /** Largest tensile strain magnitude in any steel element (0 when none is in tension). */
  readonly maxSteelTensileStrain: number;
  /** Strain at the centroid, ε0. */
  readonly referenceStrain: number;
  /** Equilibrium residual (internal minus applied axial force), N. */
  readonly residual: number;
}

export interface ElementState {
  readonly kind: ElementKind;
  readonly label: string;
  readonly depth: number;
  readonly area: number;
  /** The element's own strain (after any installation strain), compression positive. */
  readonly strain: number;
  /** Stress, MPa, compression positive. */
  readonly stress: number;
  /** Force, N, compression positive. */
  readonly force: number;
}

export interface ConcreteProfileSample {
  /** Depth below the top fibre, mm. */
  readonly depth: number;
  readonly strain: number;
  /** Stress per concrete part at this depth, MPa (null where the part has no width). */
  readonly stress: readonly (number | null)[];
}

/** The full strain and stress state of the section at one curvature. */
export interface SectionState {
  readonly direction: BendingDirection;
  readonly point: CurvePoint;
  /** Strain at the top and bottom fibres (compression positive). */
  readonly topStrain: number;
  readonly bottomStrain: number;
  /** Depth of zero strain below the TOP fibre, mm (null at zero curvature). */
  readonly neutralAxisDepthFromTop: number | null;
  readonly concreteParts: readonly { readonly role: string; readonly label: string }[];
  readonly concrete: readonly ConcreteProfileSample[];
  readonly elements: readonly ElementState[];
  /** Resultant compressive and tensile forces (magnitudes, N) and their lever arm (mm). */
  readonly compressionResultant: number;
  readonly tensionResultant: number;
  readonly leverArm: number | null;
}

export type KeyPointName = 'cracking' | 'firstYield' | 'codeCrushing' | 'nominal' | 'peak' | 'ultimate';

export interface KeyPoint extends CurvePoint {
  readonly name: KeyPointName;
  /** One line of plain words, e.g. "tension steel (layer 1) reaches fy". */
  readonly description: string;
  readonly state: SectionState;
}

export type UltimateCause =
  | 'concrete-crushing'
  | 'core-crushing'
  | 'steel-rupture'
  | 'frp-rupture'
  | 'frp-debonding'
  | 'moment-drop';

export type CurveStatus =
  | { readonly kind: 'complete'; readonly ultimateCause: UltimateCause; readonly message: string }
  | { readonly kind: 'not-converged'; readonly atCurvature: number; readonly message: Text };

export interface BilinearIdealisation {
  readonly method: BilinearMethod;
  /** Idealised (nominal) yield curvature φy, 1/mm, and moment My (= Mn for the Priestley method), N·mm. */
  readonly yieldCurvature: number;
  readonly yieldMoment: number;
  readonly ultimateCurvature: number;
  readonly ultimateMoment: number;
  /** Effective cracked flexural stiffness EI = M′y/φ′y, N·mm². */
  readonly effectiveStiffness: number;
  readonly description: string;
}

/** The concrete strain limits a curve was computed with (strains dimensionless, compression positive). */
export interface ConcreteStrainLimits {
  /** Strain of the code crushing key point that code checks read (ACI 318-19 0.003, EN 1992-1-1 εcu2), and its clause. */
  readonly codeCrushingStrain: number;
  readonly codeCrushingSource: string;
  /**
   * Ultimate strain of the concrete whose crushing ends the curve (the confined core when there is
   * one) and how it was chosen; null when no concrete part governs crushing or its law says nothing.
   */
  readonly ultimateStrain: UltimateStrainSource | null;
}

export interface MomentCurvatureResult {
  readonly direction: BendingDirection;
  readonly status: CurveStatus;
  /** The concrete strain limits of this curve: the code crushing point and the best-estimate ultimate. */
  readonly concreteLimits: ConcreteStrainLimits;
  readonly points: readonly CurvePoint[];
  readonly keyPoints: Partial<Record<KeyPointName, KeyPoint>>;
  readonly bilinear?: BilinearIdealisation;
  /** φu / φy with φy the idealised yield curvature (null when either is missing). */
  readonly curvatureDuctility: number | null;
  /** φu / φ′y with φ′y the curvature at first yield (null when either is missing). */
  readonly firstYieldCurvatureDuctility: number | null;
  readonly warnings: readonly string[];
  /** Number of equilibrium solutions performed (for benchmarks and diagnostics). */
  readonly solves: number;
}
