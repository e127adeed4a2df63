/**
 * Stress resultants of a section for a plane strain distribution
 *   ε(y) = ε0 + φ·(yg − y)      (compression positive, y downward, yg = centroid depth)
 * Concrete is integrated over depth piece by piece: each strip is split where the strain crosses
 * a breakpoint of its material (cracking, peak, spalling…), so every piece is smooth and 4-point
 * Gauss–Legendre integrates it to near machine precision. This replaces a fibre discretisation
 * (common practice, no source) with fewer, exact-to-round-off evaluations.
 *
 * Units: ε0 dimensionless, φ in 1/mm, N in newtons (compression positive), M in N·mm about the
 * centroid (sagging positive).
 */
import { GAUSS_4_NODES, GAUSS_4_WEIGHTS } from '../numeric/quadrature.ts';
import type { SectionModel } from './model.ts';

export interface SectionForces {
  /** Axial force, N, compression positive. */
  axial: number;
  /** Moment about the gross centroid, N·mm, sagging positive. */
  moment: number;
}

const splitDepths = new Float64Array(64);

/**
 * Integrates stresses of the whole section. `out` is reused to avoid allocation in the hot loop.
 * Includes discrete elements and subtracts the concrete they displace.
 */
export function sectionForces(model: SectionModel, eps0: number, phi: number, out: SectionForces = { axial: 0, moment: 0 }): SectionForces {
  const yg = model.centroidDepth;
  let axial = 0;
  let moment = 0;
  for (const part of model.concreteParts) {
    const material = part.material;
    const breakpoints = material.breakpoints;
    for (const strip of part.strips) {
      const yTop = strip.top;
      const yBottom = strip.bottom;
      const thickness = yBottom - yTop;
      const slope = (strip.widthBottom - strip.widthTop) / thickness;
      // Depths where the strain crosses a breakpoint, inside the strip.
      let count = 0;
      splitDepths[count++] = yTop;
      if (phi !== 0) {
        const epsTop = eps0 + phi * (yg - yTop);
        const epsBottom = eps0 + phi * (yg - yBottom);
        const lo = Math.min(epsTop, epsBottom);
        const hi = Math.max(epsTop, epsBottom);
        if (phi > 0) {
          // Strain decreases with depth: visit breakpoints from high to low.
          for (let k = breakpoints.length - 1; k >= 0; k--) {
            const e = breakpoints[k]!;
            if (e > lo && e < hi && count < 63) splitDepths[count++] = yg + (eps0 - e) / phi;
          }
        } else {
          for (let k = 0; k < breakpoints.length; k++) {
            const e = breakpoints[k]!;
            if (e > lo && e < hi && count < 63) splitDepths[count++] = yg + (eps0 - e) / phi;
          }
        }
      }
      splitDepths[count++] = yBottom;
      for (let p = 0; p + 1 < count; p++) {
        const a = splitDepths[p]!;
        const b = splitDepths[p + 1]!;
        const half = 0.5 * (b - a);
        if (!(half > 1e-12)) continue;
        const mid = 0.5 * (a + b);
        for (let g = 0; g < 4; g++) {
          const y = mid + half * GAUSS_4_NODES[g]!;
          const width = strip.widthTop + slope * (y - yTop);
          const force = material.stress(eps0 + phi * (yg - y)) * width * half * GAUSS_4_WEIGHTS[g]!;
          axial += force;
          moment += force * (yg - y);
        }
      }
    }
  }
  for (const element of model.elements) {
    const eps = eps0 + phi * (yg - element.depth);
    let stress = element.material.stress(eps - element.initialStrain);
    // Displaced concrete is removed in compression only: in tension it is cracked (or negligible),
    // and removing a brittle tensile stress would put a jump into the equilibrium equation.
    if (element.displacedConcrete && eps > 0) stress -= element.displacedConcrete.stress(eps);
    const force = stress * element.area;
    axial += force;
    moment += force * (yg - element.depth);
  }
  out.axial = axial;
  out.moment = moment;
  return out;
}
