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
import type { ConcretePart, SectionModel } from './model.ts';
import type { ConcreteMaterial } from '../materials/types.ts';
import { tabulatedLaw, type TabulatedLaw } from './law-table.ts';

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

/**
 * Calls `visit(force, depth)` for every Gauss point of the concrete (force in N, depth in mm), the
 * cracked concrete of a tension-stiffening band already limited by its bars (stiffeningFactors).
 */
function forEachConcretePoint(model: SectionModel, eps0: number, phi: number, visit: (force: number, y: number) => void): void {
  const yg = model.centroidDepth;
  const factors = stiffeningFactors(model, eps0, phi);
  for (const part of model.concreteParts) {
    const k = part.stiffeningGroup !== undefined ? factors[part.stiffeningGroup]! : 1;
    const material = part.material;
    const { strips, breakpoints, table, cracked } = compiledPart(part);
    for (let s = 0; s < strips.length; s += 4) {
      const top = strips[s]!;
      const bottom = strips[s + 1]!;
      const depths: number[] = [top];
      if (phi !== 0) {
        const epsTop = eps0 + phi * (yg - top);
        const epsBottom = eps0 + phi * (yg - bottom);
        const lo = Math.min(epsTop, epsBottom);
        const hi = Math.max(epsTop, epsBottom);
        for (const e of breakpoints) if (e > lo && e < hi) depths.push(yg + (eps0 - e) / phi);
      }
      depths.push(bottom);
      depths.sort((a, b) => a - b);
      for (let p = 0; p + 1 < depths.length; p++) {
        const a = depths[p]!;
        const b = depths[p + 1]!;
        const half = 0.5 * (b - a);
        if (!(half > 1e-12)) continue;
        const mid = 0.5 * (a + b);
        const branch = table.branchOf(eps0 + phi * (yg - mid));
        for (let g = 0; g < 3; g++) {
          const y = mid + half * NODES[g]!;
          const width = strips[s + 2]! + strips[s + 3]! * (y - top);
          const eps = eps0 + phi * (yg - y);
          const force = (branch >= 0 ? table.stressIn(eps, branch) : material.stress(eps)) * width * half * WEIGHTS[g]!;
          visit(eps < cracked ? k * force : force, y);
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
  return compiledElementStress(compiledElement(element), eps);
}

/**
 * What elementStress reads of an element, resolved once per element: its law, and for the concrete
 * it displaces the law's table (law-table.ts) and the strain range where that concrete carries
 * something (zeroRangeOf).
 */
interface CompiledElement {
  readonly element: SectionModel['elements'][number];
  readonly displaced: ConcreteMaterial | null;
  readonly table: TabulatedLaw | null;
  readonly tensionBelow: number;
  readonly compressionAbove: number;
}
const compiledElements = new WeakMap<object, CompiledElement>();
const compiledElementLists = new WeakMap<object, readonly CompiledElement[]>();

function compiledElement(element: SectionModel['elements'][number]): CompiledElement {
  let c = compiledElements.get(element);
  if (c) return c;
  const displaced = element.displacedConcrete;
  const zero = displaced ? zeroRangeOf(displaced) : null;
  c = {
    element,
    displaced,
    table: displaced ? tabulatedLaw(displaced, splitStrains(displaced)) : null,
    tensionBelow: zero ? zero.tensionBelow : Infinity,
    compressionAbove: zero ? zero.compressionAbove : -Infinity,
  };
  compiledElements.set(element, c);
  return c;
}

/** The compiled form of every element of a model (cached per elements list). */
function compiledElementsOf(model: SectionModel): readonly CompiledElement[] {
  let list = compiledElementLists.get(model.elements);
  if (!list) {
    list = model.elements.map(compiledElement);
    compiledElementLists.set(model.elements, list);
  }
  return list;
}

function compiledElementStress(c: CompiledElement, eps: number): number {
  const element = c.element;
  let stress = element.material.stress(eps - element.initialStrain);
  // The displaced concrete's law read through its table (law-table.ts), as the concrete parts read
  // it. Nothing to take away where the concrete carries nothing (cracked, crushed: zeroRangeOf).
  if (eps > c.tensionBelow && eps < c.compressionAbove) {
    const table = c.table!;
    const branch = table.branchOf(eps);
    const concrete = branch >= 0 ? table.stressIn(eps, branch) : c.displaced!.stress(eps);
    if (concrete > 0) stress -= concrete;
  }
  return stress;
}

/**
 * Running sums of the concrete (N, N·mm): all forces, and per tension-stiffening group the forces of
 * its cracked concrete (strain beyond the cracking strain), which the group's bars may limit.
 */
interface ConcreteSums {
  axial: number;
  moment: number;
  magnitude: number;
  readonly crackedAxial: Float64Array;
  readonly crackedMoment: Float64Array;
}

/**
 * What integratePart reads of a concrete part, resolved once per part: its strips as flat numbers
 * (top, bottom, width at the top, width slope per mm of depth), the split strains of its table
 * (law-table.ts), the strain ranges where it carries nothing and its cracking strain.
 */
interface CompiledPart {
  readonly strips: Float64Array;
  readonly breakpoints: Float64Array;
  readonly table: TabulatedLaw;
  readonly tensionBelow: number;
  readonly compressionAbove: number;
  readonly cracked: number;
  readonly group: number;
}
const compiledParts = new WeakMap<ConcretePart, CompiledPart>();

function compiledPart(part: ConcretePart): CompiledPart {
  let c = compiledParts.get(part);
  if (c) return c;
  const material = part.material;
  // The table's split strains: the law's breakpoints and zero, and the cuts of its rational branches.
  const table = tabulatedLaw(material, splitStrains(material));
  const zero = zeroRangeOf(material);
  const strips = new Float64Array(4 * part.strips.length);
  part.strips.forEach((strip, i) => {
    strips[4 * i] = strip.top;
    strips[4 * i + 1] = strip.bottom;
    strips[4 * i + 2] = strip.widthTop;
    strips[4 * i + 3] = (strip.widthBottom - strip.widthTop) / (strip.bottom - strip.top);
  });
  c = {
    strips,
    breakpoints: table.splits,
    table,
    tensionBelow: zero.tensionBelow,
    compressionAbove: zero.compressionAbove,
    cracked: crackedBelow(material),
    group: part.stiffeningGroup ?? -1,
  };
  compiledParts.set(part, c);
  return c;
}

/** Adds the stress resultants of one concrete part to `acc` (piecewise Gauss over the depth). */
function integratePart(model: SectionModel, part: ConcretePart, eps0: number, phi: number, acc: ConcreteSums): void {
  const yg = model.centroidDepth;
  const c = compiledPart(part);
  const { strips, breakpoints, table, tensionBelow, compressionAbove, cracked, group } = c;
  const material = part.material;
  const n0 = NODES[0]!;
  const w0 = WEIGHTS[0]!;
  const w1 = WEIGHTS[1]!;
  let axial = 0;
  let moment = 0;
  let magnitude = 0;
  for (let s = 0; s < strips.length; s += 4) {
    const yTop = strips[s]!;
    const yBottom = strips[s + 1]!;
    const widthTop = strips[s + 2]!;
    const slope = strips[s + 3]!;
    // Depths where the strain crosses a breakpoint, inside the strip.
    let count = 0;
    splitDepths[count++] = yTop;
    if (phi !== 0) {
      const epsTop = eps0 + phi * (yg - yTop);
      const epsBottom = eps0 + phi * (yg - yBottom);
      const lo = epsTop < epsBottom ? epsTop : epsBottom;
      const hi = epsTop < epsBottom ? epsBottom : epsTop;
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
      const epsMid = eps0 + phi * (yg - mid);
      // Skip pieces where the material carries nothing. A piece lies inside one branch of the law or
      // wholly inside a range where it carries nothing, so its mid-point decides (the strains at its
      // ends, recomputed from depths, may fall a rounding error outside the range).
      if (epsMid <= tensionBelow || epsMid >= compressionAbove) continue;
      // The piece lies inside one branch of the law: read it from the law's table (law-table.ts).
      // Rational branches that 3-point Gauss cannot integrate whole are cut by the table's split
      // strains (law-table.ts splits): 3-point Gauss over a whole such branch (Popovics from zero to
      // εcu, Mander's confined descent) was off by up to 0.4 % in moment against fine fibres
      // (test/core/section/law-table.test.ts).
      const branch = table.branchOf(epsMid);
      const offset = half * n0; // the outer Gauss points sit at mid ± offset
      const yA = mid + offset;
      const yB = mid - offset;
      const epsA = eps0 + phi * (yg - yA);
      const epsB = eps0 + phi * (yg - yB);
      const sA = branch >= 0 ? table.stressIn(epsA, branch) : material.stress(epsA);
      const sM = branch >= 0 ? table.stressIn(epsMid, branch) : material.stress(epsMid);
      const sB = branch >= 0 ? table.stressIn(epsB, branch) : material.stress(epsB);
      const fA = sA * (widthTop + slope * (yA - yTop)) * half * w0;
      const fM = sM * (widthTop + slope * (mid - yTop)) * half * w1;
      const fB = sB * (widthTop + slope * (yB - yTop)) * half * w0;
      const pieceAxial = fA + fM + fB;
      const pieceMoment = fA * (yg - yA) + fM * (yg - mid) + fB * (yg - yB);
      axial += pieceAxial;
      moment += pieceMoment;
      magnitude += (fA < 0 ? -fA : fA) + (fM < 0 ? -fM : fM) + (fB < 0 ? -fB : fB);
      // A piece lies on one side of the cracking strain (a split strain): its mid-point decides.
      if (group >= 0 && epsMid < cracked) {
        acc.crackedAxial[group] = acc.crackedAxial[group]! + pieceAxial;
        acc.crackedMoment[group] = acc.crackedMoment[group]! + pieceMoment;
      }
    }
  }
  acc.axial += axial;
  acc.moment += moment;
  acc.magnitude += magnitude;
}

/** Strain below which a concrete is cracked (ConcreteMaterial.crackedBelow). */
export function crackedBelow(material: SectionModel['concreteParts'][number]['material']): number {
  return material.crackedBelow ?? -material.crackingStrain;
}

const yieldStresses = new WeakMap<object, number>();

/** Yield stress fy of a bar's law, MPa (the stress at its yield strain; 0 for a law without one). */
function yieldStressOf(material: SectionModel['elements'][number]['material']): number {
  let fy = yieldStresses.get(material);
  if (fy === undefined) {
    fy = material.yieldStrain !== undefined ? Math.abs(material.stress(-material.yieldStrain)) : 0;
    yieldStresses.set(material, fy);
  }
  return fy;
}

/**
 * What a group's bars can still pick up at a crack, N: Σ As·(fy − σs) over its bars, σs the tensile
 * stress of each bar (a bar in compression counts with fy, a yielded bar with nothing).
 */
function barReserve(model: SectionModel, bars: readonly number[], eps0: number, phi: number): number {
  const yg = model.centroidDepth;
  let reserve = 0;
  for (const index of bars) {
    const bar = model.elements[index]!;
    const fy = yieldStressOf(bar.material);
    const tensile = Math.max(0, -bar.material.stress(eps0 + phi * (yg - bar.depth) - bar.initialStrain));
    if (fy > tensile) reserve += bar.area * (fy - tensile);
  }
  return reserve;
}

/**
 * Factor (0–1) on the cracked-concrete forces of group `g`, whose cracked concrete carries
 * `crackedAxial` (N, ≤ 0): 1 unless that tension exceeds the bars' reserve (barReserve).
 */
function groupFactor(model: SectionModel, g: number, crackedAxial: number, eps0: number, phi: number): number {
  if (!(crackedAxial < 0)) return 1;
  const reserve = barReserve(model, model.stiffeningGroups![g]!, eps0, phi);
  return -crackedAxial > reserve ? reserve / -crackedAxial : 1;
}

function newSums(groups: number): ConcreteSums {
  return { axial: 0, moment: 0, magnitude: 0, crackedAxial: new Float64Array(groups), crackedMoment: new Float64Array(groups) };
}

/** Scratch sums for up to 8 groups (a section has two: top and bottom bars, or one). */
const scratch = newSums(8);

/** Integrates every concrete part into the reset `scratch` sums. */
function integrateConcrete(model: SectionModel, eps0: number, phi: number): ConcreteSums {
  const acc = model.stiffeningGroups && model.stiffeningGroups.length > scratch.crackedAxial.length ? newSums(model.stiffeningGroups.length) : scratch;
  acc.axial = acc.moment = acc.magnitude = 0;
  const groups = model.stiffeningGroups ? model.stiffeningGroups.length : 0;
  for (let g = 0; g < groups; g++) {
    acc.crackedAxial[g] = 0;
    acc.crackedMoment[g] = 0;
  }
  const parts = model.concreteParts;
  for (let i = 0; i < parts.length; i++) integratePart(model, parts[i]!, eps0, phi, acc);
  return acc;
}

/**
 * The factor (0–1) on the cracked concrete of each tension-stiffening group at (ε0, φ)
 * (SectionModel.stiffeningGroups; empty without tension stiffening).
 */
export function stiffeningFactors(model: SectionModel, eps0: number, phi: number): number[] {
  const groups = model.stiffeningGroups;
  if (!groups || groups.length === 0) return [];
  const acc = integrateConcrete(model, eps0, phi);
  return groups.map((_, g) => groupFactor(model, g, acc.crackedAxial[g]!, eps0, phi));
}

/**
 * Axial force and moment of the section at (ε0, φ) (see the file comment for units). Between cracks
 * a tension-stiffening band's concrete carries no more tension than its bars can still pick up at a
 * crack, Σ As·(fy − σs) (the crack check of Vecchio & Collins 1986, applied to the band; from
 * memory): as the bars approach yield the concrete's share falls, and it is zero once they yield,
 * so the moment does not drop after first yield because of stiffening lost.
 */
export function sectionForces(model: SectionModel, eps0: number, phi: number, out: SectionForces = { axial: 0, moment: 0, magnitude: 0 }): SectionForces {
  const yg = model.centroidDepth;
  const acc = integrateConcrete(model, eps0, phi);
  let axial = acc.axial;
  let moment = acc.moment;
  let magnitude = acc.magnitude;
  const groups = model.stiffeningGroups;
  if (groups) {
    for (let g = 0; g < groups.length; g++) {
      const cracked = acc.crackedAxial[g]!;
      const k = groupFactor(model, g, cracked, eps0, phi);
      if (k === 1) continue;
      // Scale the cracked concrete's tension only: take (1 − k) of what was added in full.
      axial -= (1 - k) * cracked;
      moment -= (1 - k) * acc.crackedMoment[g]!;
      magnitude += (1 - k) * cracked;
    }
  }
  const elements = compiledElementsOf(model);
  for (let i = 0; i < elements.length; i++) {
    const c = elements[i]!;
    const depth = c.element.depth;
    const eps = eps0 + phi * (yg - depth);
    const force = compiledElementStress(c, eps) * c.element.area;
    axial += force;
    magnitude += force < 0 ? -force : force;
    moment += force * (yg - depth);
  }
  out.axial = axial;
  out.magnitude = magnitude;
  out.moment = moment;
  return out;
}
