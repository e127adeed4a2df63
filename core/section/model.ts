/**
 * The resolved section: geometry as depth strips, materials as stress–strain laws, and discrete
 * elements (bars, plates, FRP) — everything the moment–curvature solver needs and nothing else.
 * Built from user data by `buildSectionModel` (core/section/build.ts).
 *
 * Units: mm, mm², MPa, N. Depth y downward from the top fibre. Sign convention of
 * core/materials/types.ts (compression positive); sagging moment and curvature positive.
 */
import type { ConcreteMaterial, UniaxialMaterial } from '../materials/types.ts';
import type { ShapeOutline } from './shapes.ts';
import type { Strip } from './width-profile.ts';

export type ConcreteRole = 'cover' | 'core' | 'overlay';

export interface ConcretePart {
  readonly role: ConcreteRole;
  readonly label: string;
  readonly strips: readonly Strip[];
  readonly material: ConcreteMaterial;
  /**
   * Compressive strength of the part's concrete as specified, MPa: f′c (ACI 318-19), fck
   * (EN 1992-1-1) or the in-place strength of an as-found condition — never a confined or mean
   * strength. The code design resistance gives every part the design law of its own strength
   * (core/assessment/resistance.ts).
   */
  readonly strength: number;
  /**
   * True when crushing of this part's extreme fibre ends the curve. The unconfined cover of a
   * section with a confined core does not count: it spalls and the core carries on.
   */
  readonly governsCrushing: boolean;
  /**
   * Tension-stiffening bands only: the group of bars that anchors the band (index into
   * SectionModel.stiffeningGroups). The group's cracked concrete carries no more tension than its
   * bars can still pick up at a crack, Σ As·(fy − σs) ≥ 0, so it adds nothing once they yield
   * (core/section/forces.ts).
   */
  readonly stiffeningGroup?: number;
  /** Depth of the part's top and bottom fibres, mm. */
  readonly top: number;
  readonly bottom: number;
}

export type ElementKind = 'bar' | 'plate' | 'frp';

/** What ends the curve when an element reaches its tensile limit strain. */
export type ElementLimitCause = 'steel-rupture' | 'frp-rupture' | 'frp-debonding';

export interface DiscreteElement {
  readonly kind: ElementKind;
  /** E.g. `layer 1: 3 × 25 mm`, `FRP laminate`. */
  readonly label: string;
  /** Index of the user's reinforcement layer (or strengthening item) this element came from. */
  readonly sourceIndex: number;
  /** Cross-sectional area, mm². */
  readonly area: number;
  /** Bar diameter, mm, when the element is a layer of round bars. */
  readonly diameter?: number;
  /** Depth of the element's centroid below the top fibre, mm. */
  readonly depth: number;
  readonly material: UniaxialMaterial;
  /**
   * Strain of the substrate when the element became active (compression positive). The element's
   * own strain is ε(depth) − initialStrain: zero for cast-in bars, the installation strain for FRP
   * bonded to a loaded beam (ACI 440.2R-17 §10.2.3).
   */
  readonly initialStrain: number;
  /** Tensile strain magnitude of the element (own strain) that ends the curve; undefined: none. */
  readonly limitStrain?: number;
  readonly limitCause?: ElementLimitCause;
  /** Concrete whose stress the element's area displaces (subtracted), or null outside concrete. */
  readonly displacedConcrete: ConcreteMaterial | null;
}

export interface SectionModel {
  /** Overall height h, mm. */
  readonly height: number;
  /** Depth of the gross concrete centroid, mm: the axis about which moments are taken and the axial force acts. */
  readonly centroidDepth: number;
  readonly concreteParts: readonly ConcretePart[];
  readonly elements: readonly DiscreteElement[];
  /**
   * Bars (indices into `elements`) anchoring each group of tension-stiffening concrete
   * (ConcretePart.stiffeningGroup); absent when no concrete stiffens in tension.
   */
  readonly stiffeningGroups?: readonly (readonly number[])[];
  /** Axial force, N, compression positive, acting at the gross centroid. */
  readonly axialForce: number;
  /** Outline for drawings and containment checks. */
  readonly outline: ShapeOutline;
  /** Confined core rectangle (to hoop centrelines), mm, if any. */
  readonly core?: { readonly x0: number; readonly x1: number; readonly y0: number; readonly y1: number };
  /** Gross concrete area, mm², and second moment about the centroid, mm⁴. */
  readonly grossArea: number;
  readonly grossInertia: number;
}

/** Sagging: compression at the top face. Hogging: compression at the bottom face. */
export type BendingDirection = 'sagging' | 'hogging';

/** +1 for sagging, −1 for hogging: the sign of curvature and moment in the section's convention. */
export function directionSign(direction: BendingDirection): 1 | -1 {
  return direction === 'sagging' ? 1 : -1;
}

/** Steel elements (bars and plates, not FRP) with a yield point. */
export function isSteel(e: DiscreteElement): boolean {
  return (e.kind === 'bar' || e.kind === 'plate') && e.material.yieldStrain !== undefined;
}

/** Yield stress fy of a steel element, MPa (undefined for FRP). */
export function steelYieldStress(e: DiscreteElement): number | undefined {
  return (e.material as { readonly yieldStress?: number }).yieldStress;
}

/** Tension-side steel for a direction: below the centroid for sagging, above it for hogging. */
export function tensionSteel(model: SectionModel, direction: BendingDirection): DiscreteElement[] {
  return model.elements.filter((e) => isSteel(e) && (direction === 'sagging' ? e.depth > model.centroidDepth : e.depth < model.centroidDepth));
}
