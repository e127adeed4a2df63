/**
 * The ultimate strain state of a section in one bending direction by strain compatibility, solved
 * directly (no moment–curvature march): the plane strain distribution in axial equilibrium at which
 * the first limit is reached — a concrete part's extreme compression fibre at its crushing strain,
 * or an element at its tensile limit strain (FRP rupture or debonding; steel when it has a limit).
 * This is the textbook procedure of a design flexural strength (ACI 318-19 22.2, EN 1992-1-1 6.1);
 * the laws in the model decide which code it follows (core/materials/code/design-laws.ts).
 *
 * Parameter: the neutral-axis depth c from the compression face. For each c the curvature k is the
 * largest the limits allow (strain k·(c − u) at distance u from the compression face); the axial
 * force is continuous in c, tension-dominated for a shallow c and compression-dominated for a deep
 * one, so the root is bracketed on a geometric scan and refined by Brent's method.
 *
 * Units: mm, N, N·mm, 1/mm; strains dimensionless, compression positive.
 */
import { brentRoot } from '../numeric/roots.ts';
import { sectionForces, sectionResultants } from './forces.ts';
import { isSteel, type BendingDirection, type ConcretePart, type DiscreteElement, type SectionModel } from './model.ts';

/** What ends the section at its ultimate state. */
export type UltimateLimit =
  | { readonly kind: 'concrete'; readonly part: string; readonly strain: number }
  | { readonly kind: 'element'; readonly element: string; readonly cause: NonNullable<DiscreteElement['limitCause']> | 'limit-strain'; readonly strain: number };

export interface UltimateState {
  readonly direction: BendingDirection;
  /** Strain at the gross centroid and curvature (signed, the section convention of forces.ts). */
  readonly referenceStrain: number;
  readonly curvature: number;
  /** Moment in the direction's sense (positive), N·mm, about the gross centroid. */
  readonly moment: number;
  /** Neutral-axis depth from the compression face, mm. */
  readonly neutralAxisDepth: number;
  /** Largest compressive strain of the concrete (at the compression face). */
  readonly extremeConcreteStrain: number;
  readonly limit: UltimateLimit;
  /**
   * The tension steel element farthest from the compression face and its net tensile strain
   * (positive in tension), or null without tension steel — εt of ACI 318-19 21.2.2.
   */
  readonly extremeSteel: { readonly element: DiscreteElement; readonly strain: number } | null;
  /** Depth below the top fibre of the resultant of all compressive forces, mm. */
  readonly compressionDepth: number;
}

/** Distance of a depth y from the compression face of the direction. */
const fromFace = (model: SectionModel, direction: BendingDirection, y: number) => (direction === 'sagging' ? y : model.height - y);

/**
 * Solves the ultimate state (see the module comment).
 * @param crushingStrain the crushing strain of each concrete part (its extreme compression fibre)
 * @returns null when no equilibrium with a limit reached exists in that direction (no tension
 *          element to balance the compression), or the state
 */
export function ultimateState(model: SectionModel, direction: BendingDirection, crushingStrain: (part: ConcretePart) => number): UltimateState | null {
  const sign = direction === 'sagging' ? 1 : -1;
  const h = model.height;
  const parts = model.concreteParts.map((p) => ({ part: p, face: Math.min(fromFace(model, direction, p.top), fromFace(model, direction, p.bottom)), limit: crushingStrain(p) }));
  const limited = model.elements.filter((e) => e.limitStrain !== undefined && Number.isFinite(e.limitStrain));
  const elements = limited.map((e) => ({ element: e, u: fromFace(model, direction, e.depth) }));
  const yg = model.centroidDepth;
  const ug = fromFace(model, direction, yg);

  /** Largest curvature magnitude at neutral-axis depth c, and the limit that sets it. */
  const curvatureAt = (c: number): { k: number; limit: UltimateLimit } => {
    let k = Number.POSITIVE_INFINITY;
    let limit: UltimateLimit | null = null;
    for (const p of parts) {
      if (c <= p.face) continue;
      const kp = p.limit / (c - p.face);
      if (kp < k) {
        k = kp;
        limit = { kind: 'concrete', part: p.part.label, strain: p.limit };
      }
    }
    for (const { element, u } of elements) {
      if (u <= c) continue;
      // Own tensile strain k·(u − c) + εi must not pass the limit (εi: strain of the substrate at
      // installation, compression positive — negative for FRP bonded to a soffit in tension).
      const room = element.limitStrain! - element.initialStrain;
      if (!(room > 0)) continue;
      const ke = room / (u - c);
      if (ke < k) {
        k = ke;
        limit = { kind: 'element', element: element.label, cause: element.limitCause ?? 'limit-strain', strain: element.limitStrain! };
      }
    }
    return { k, limit: limit! };
  };
  const stateAt = (c: number) => {
    const { k, limit } = curvatureAt(c);
    // ε(u) = k·(c − u); at the centroid u = ug.
    return { eps0: k * (c - ug), phi: sign * k, limit, k };
  };
  const axialAt = (c: number) => {
    const s = stateAt(c);
    return sectionForces(model, s.eps0, s.phi).axial - model.axialForce;
  };

  // Geometric scan of c from 1e-6·h to 20·h for the first change from tension to compression.
  const steps = 80;
  const lo = 1e-6 * h;
  const hi = 20 * h;
  let a = lo;
  let fa = axialAt(a);
  let bracket: [number, number, number, number] | null = null;
  for (let i = 1; i <= steps; i++) {
    const b = lo * (hi / lo) ** (i / steps);
    const fb = axialAt(b);
    if (fa < 0 && fb >= 0) {
      bracket = [a, b, fa, fb];
      break;
    }
    a = b;
    fa = fb;
  }
  if (!bracket) return null;
  const root = brentRoot(axialAt, bracket[0], bracket[1], bracket[2], bracket[3], { xTolerance: 1e-9 * h });
  const c = root.x;
  const s = stateAt(c);
  const forces = sectionForces(model, s.eps0, s.phi);
  if (!(forces.magnitude > 0)) return null;
  const strainAt = (u: number) => s.k * (c - u);
  let extremeSteel: UltimateState['extremeSteel'] = null;
  for (const e of model.elements) {
    if (!isSteel(e)) continue;
    const u = fromFace(model, direction, e.depth);
    const tensile = -(strainAt(u) - e.initialStrain);
    if (tensile > 0 && (!extremeSteel || u > fromFace(model, direction, extremeSteel.element.depth))) extremeSteel = { element: e, strain: tensile };
  }
  return {
    direction,
    referenceStrain: s.eps0,
    curvature: s.phi,
    moment: sign * forces.moment,
    neutralAxisDepth: c,
    extremeConcreteStrain: strainAt(0),
    limit: s.limit,
    extremeSteel,
    compressionDepth: sectionResultants(model, s.eps0, s.phi).compressionDepth,
  };
}
