/**
 * A section as the user defines it and the project file stores it (plain data, mm, N).
 * Materials are referenced by id from the project's material library.
 */
import type { SectionShape } from './shapes.ts';

/** Where the bars of a layer are spread across (BarLayer.spread), in menu order. */
export const BAR_SPREADS = ['web', 'chord'] as const;
export type BarSpread = (typeof BAR_SPREADS)[number];

export interface BarLayer {
  /** Id of a steel material in the library. */
  readonly steelId: string;
  /** Depth of the layer's centroid below the top fibre, mm. */
  readonly depth: number;
  /** Number of bars (integer ≥ 1) and bar diameter (mm) — or, instead of both, a total `area`. */
  readonly count?: number;
  readonly diameter?: number;
  /** Total steel area of the layer, mm² (used when count/diameter are not given). */
  readonly area?: number;
  /**
   * Where the bars are spread across for drawing and containment: inside the web's hoops ('web',
   * default) or across the full width of the concrete at that depth ('chord', e.g. slab bars).
   */
  readonly spread?: BarSpread;
  /** Free label, e.g. "bottom bars". */
  readonly label?: string;
}

export interface HoopSet {
  readonly steelId: string;
  /** Hoop (stirrup) bar diameter, mm. */
  readonly diameter: number;
  /** Spacing along the member, mm. */
  readonly spacing: number;
  /** Number of vertical legs crossing a horizontal section cut (shear, and confinement across the width). */
  readonly verticalLegs: number;
  /** Number of horizontal legs crossing a vertical cut (confinement over the depth); 2 for a closed hoop. */
  readonly horizontalLegs?: number;
  /** Clear cover to the outside of the hoop, mm. */
  readonly clearCover: number;
  /**
   * Model the concrete inside the hoops as confined (Mander or Modified Kent–Park only). It takes
   * effect only with `closedAndAnchored`: open stirrups or hoops with 90° hooks, common in older
   * buildings, do not confine a core (hoopsConfine).
   */
  readonly confineCore: boolean;
  /**
   * The engineer confirms that the hoops are closed and their ends anchored in the core (135° hooks or
   * welded laps), so that they can confine it. Absent: not confirmed (files before this field).
   */
  readonly closedAndAnchored?: boolean;
}

export interface SectionDefinition {
  readonly id: string;
  readonly name: string;
  readonly shape: SectionShape;
  /** Id of the concrete material in the library (the unconfined law; the core law derives from it). */
  readonly concreteId: string;
  readonly bars: readonly BarLayer[];
  readonly hoops?: HoopSet;
  /** Axial force, N, compression positive, acting at the gross centroid (default 0). */
  readonly axialForce?: number;
  readonly notes?: string;
}

/**
 * Whether the hoops confine the core in the analysis: the engineer asked for a confined core and
 * confirmed the hoops closed and anchored. Without both the core is unconfined (a conservative
 * default for members of older buildings).
 */
export function hoopsConfine(hoops: HoopSet | undefined): boolean {
  return hoops !== undefined && hoops.confineCore && hoops.closedAndAnchored === true;
}

/** Area of one bar of diameter d (mm), mm². */
export function barArea(diameter: number): number {
  return (Math.PI * diameter * diameter) / 4;
}

/** Total steel area of a layer, mm². */
export function layerArea(layer: Pick<BarLayer, 'count' | 'diameter' | 'area'>): number {
  if (layer.count !== undefined && layer.diameter !== undefined) return layer.count * barArea(layer.diameter);
  return layer.area ?? 0;
}

/**
 * Bar diameter of a layer, mm; for a layer given by its total area only, the diameter of one bar of
 * that area (used for drawings, containment checks and hinge lengths).
 */
export function layerDiameter(layer: Pick<BarLayer, 'count' | 'diameter' | 'area'>): number {
  return layer.diameter ?? Math.sqrt((4 * layerArea(layer)) / Math.PI);
}
