/**
 * Stress resultants of a section for a plane strain distribution
 *   ε(y) = ε0 + φ·(yg − y)      (compression positive, y downward, yg = centroid depth)
 * Concrete is integrated over depth piece by piece: each strip is split where the strain crosses
 * a breakpoint of its material (cracking, peak, spalling…), so every piece is smooth and 3-point
 * Gauss–Legendre integrates it accurately (exactly for laws up to a quartic in strain: parabolas,
 * linear branches; to better than 1e-6 for the rational and power laws, checked against a fine
 * fibre integration in test/bench and test/core/section). This replaces a fibre discretisation
 * (common practice, no source) with fewer, exact-to-round-off evaluations.
 *
 * Units: ε0 dimensionless, φ in 1/mm, N in newtons (compression positive), M in N·mm about the
 * centroid (sagging positive).
 */
import { GAUSS_3_NODES, GAUSS_3_WEIGHTS } from '../numeric/quadrature.ts';
import type { SectionModel } from './model.ts';

export interface SectionForces {
  /** Axial force, N, compression positive. */
  axial: number;
  /**
   * Sum of the magnitudes of all forces, N. Zero means the section carries nothing at this strain
   * state (everything cracked, crushed or ruptured) — a spurious "equilibrium" to be rejected.
   */
  magnitude: number;
  /** Moment about the gross centroid, N·mm, sagging positive. */
  moment: number;
}

const splitDepths = new Float64Array(64);
// Local copies: reading imported bindings inside the hot loop is slower under some module loaders.
const NODES = Float64Array.from(GAUSS_3_NODES);
const WEIGHTS = Float64Array.from(GAUSS_3_WEIGHTS);

const splitCache = new WeakMap<object, readonly number[]>();

/**
 * The material's breakpoints with zero strain added: every concrete law has a kink at zero (the
 * tension branch meets the compression branch), whether or not the law lists it.
 */
function splitStrains(material: { breakpoints: readonly number[] }): readonly number[] {
  let list = splitCache.get(material);
  if (!list) {
    list = [...new Set([...material.breakpoints, 0])].sort((a, b) => a - b);
    splitCache.set(material, list);
  }
  return list;
}

interface ZeroRange {
  /** Strain at or below which the stress is zero (cracked concrete), or −Infinity. */
  readonly tensionBelow: number;
  /** Strain at or above which the stress is zero (crushed/spalled concrete), or +Infinity. */
  readonly compressionAbove: number;
}
const zeroRanges = new WeakMap<object, ZeroRange>();

/**
 * Strain ranges where a law carries nothing, found once per material from its breakpoints:
 * pieces of the section lying entirely inside them are skipped (half the depth of a cracked beam).
 */
function zeroRangeOf(material: { stress(e: number): number; breakpoints: readonly number[] }): ZeroRange {
  let r = zeroRanges.get(material);
  if (r) return r;
  const bp = material.breakpoints;
  const lowest = bp.length > 0 ? bp[0]! : 0;
  const highest = bp.length > 0 ? bp[bp.length - 1]! : 0;
  const zeroBeyond = (from: number, direction: -1 | 1) => {
    for (const k of [1e-9, 1e-6, 1e-4, 1e-3, 1e-2, 0.1, 1]) if (material.stress(from + direction * k) !== 0) return false;
    return true;
  };
  r = {
    tensionBelow: lowest < 0 && zeroBeyond(lowest, -1) ? lowest : -Infinity,
    compressionAbove: highest > 0 && zeroBeyond(highest, 1) ? highest : Infinity,
  };
  zeroRanges.set(material, r);
  return r;
}

/**
 * Integrates stresses of the whole section. `out` is reused to avoid allocation in the hot loop.
 * Includes discrete elements and subtracts the concrete they displace.
 */
export interface SectionResultants {
  /** Sum of compressive forces, N (≥ 0), and of tensile forces, N (magnitude ≥ 0). */
  compression: number;
  tension: number;
  /** Depths of the two resultants below the top fibre, mm (NaN-free: 0 when the force is 0). */
  compressionDepth: number;
  tensionDepth: number;
}

/**
 * Compressive and tensile resultants of the whole section (concrete and elements) and where they
 * act, with the same piecewise Gauss integration as sectionForces.
 */
export function sectionResultants(model: SectionModel, eps0: number, phi: number): SectionResultants {
  let c = 0;
  let t = 0;
  let cy = 0;
  let ty = 0;
  const add = (force: number, y: number) => {
    if (force > 0) {
      c += force;
      cy += force * y;
    } else {
      t -= force;
      ty -= force * y;
    }
  };
  forEachConcretePoint(model, eps0, phi, add);
  const yg = model.centroidDepth;
  for (const element of model.elements) {
    const eps = eps0 + phi * (yg - element.depth);
    add(elementStress(element, eps) * element.area, element.depth);
  }
  return { compression: c, tension: t, compressionDepth: c > 0 ? cy / c : 0, tensionDepth: t > 0 ? ty / t : 0 };
}

/** Calls `visit(force, depth)` for every Gauss point of the concrete (force in N, depth in mm). */
function forEachConcretePoint(model: SectionModel, eps0: number, phi: number, visit: (force: number, y: number) => void): void {
  const yg = model.centroidDepth;
  for (const part of model.concreteParts) {
    const material = part.material;
    const breakpoints = splitStrains(material);
    for (const strip of part.strips) {
      const depths: number[] = [strip.top];
      if (phi !== 0) {
        const epsTop = eps0 + phi * (yg - strip.top);
        const epsBottom = eps0 + phi * (yg - strip.bottom);
        const lo = Math.min(epsTop, epsBottom);
        const hi = Math.max(epsTop, epsBottom);
        for (const e of breakpoints) if (e > lo && e < hi) depths.push(yg + (eps0 - e) / phi);
      }
      depths.push(strip.bottom);
      depths.sort((a, b) => a - b);
      const slope = (strip.widthBottom - strip.widthTop) / (strip.bottom - strip.top);
      for (let p = 0; p + 1 < depths.length; p++) {
        const a = depths[p]!;
        const b = depths[p + 1]!;
        const half = 0.5 * (b - a);
        if (!(half > 1e-12)) continue;
        const mid = 0.5 * (a + b);
        for (let g = 0; g < 3; g++) {
          const y = mid + half * NODES[g]!;
          const width = strip.widthTop + slope * (y - strip.top);
          visit(material.stress(eps0 + phi * (yg - y)) * width * half * WEIGHTS[g]!, y);
        }
      }
    }
  }
}

/**
 * Stress carried by a discrete element at the substrate strain `eps` (MPa, compression positive),
 * net of the concrete its area displaces. Displaced concrete is removed where it would be in
 * compression only: in tension it is cracked (or negligible), and removing a brittle tensile stress
 * would put a jump into the equilibrium equation. Testing the concrete stress rather than the strain
 * keeps this continuous when shrinkage shifts the law (sustained load).
 */
export function elementStress(element: SectionModel['elements'][number], eps: number): number {
  let stress = element.material.stress(eps - element.initialStrain);
  if (element.displacedConcrete) {
    const concrete = element.displacedConcrete.stress(eps);
    if (concrete > 0) stress -= concrete;
  }
  return stress;
}

export function sectionForces(model: SectionModel, eps0: number, phi: number, out: SectionForces = { axial: 0, moment: 0, magnitude: 0 }): SectionForces {
  const yg = model.centroidDepth;
  let axial = 0;
  let moment = 0;
  let magnitude = 0;
  for (const part of model.concreteParts) {
    const material = part.material;
    const breakpoints = splitStrains(material);
    const zero = zeroRangeOf(material);
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
        if (phi !== 0) {
          // Skip pieces where the material carries nothing (strain is linear over the piece).
          const ea = eps0 + phi * (yg - a);
          const eb = eps0 + phi * (yg - b);
          if (Math.max(ea, eb) <= zero.tensionBelow || Math.min(ea, eb) >= zero.compressionAbove) continue;
        }
        for (let g = 0; g < 3; g++) {
          const y = mid + half * NODES[g]!;
          const width = strip.widthTop + slope * (y - yTop);
          const force = material.stress(eps0 + phi * (yg - y)) * width * half * WEIGHTS[g]!;
          axial += force;
          magnitude += force < 0 ? -force : force;
          moment += force * (yg - y);
        }
      }
    }
  }
  for (const element of model.elements) {
    const eps = eps0 + phi * (yg - element.depth);
    const stress = elementStress(element, eps);
    const force = stress * element.area;
    axial += force;
    magnitude += force < 0 ? -force : force;
    moment += force * (yg - element.depth);
  }
  out.axial = axial;
  out.magnitude = magnitude;
  out.moment = moment;
  return out;
}
