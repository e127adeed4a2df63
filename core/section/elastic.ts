/**
 * Elastic section properties: gross, uncracked transformed and cracked transformed, and the
 * cracking moment. Units: mm, mm², mm⁴, N·mm.
 */
import { brentRoot } from '../numeric/roots.ts';
import type { BendingDirection, SectionModel } from './model.ts';
import { profileMoments, type Strip } from './width-profile.ts';

export interface CrackedProperties {
  /** Depth of the elastic neutral axis below the compression face, mm. */
  readonly neutralAxisDepth: number;
  /** Cracked transformed second moment of area about that axis, in concrete units, mm⁴. */
  readonly inertia: number;
}

export interface ElasticProperties {
  /** Gross concrete area, mm², and centroid depth below the top, mm. */
  readonly grossArea: number;
  readonly centroidDepth: number;
  /** Gross second moment of area about the centroid, mm⁴ (reinforcement ignored), Ig. */
  readonly grossInertia: number;
  /** Elastic modulus of the concrete the properties are transformed to, MPa. */
  readonly concreteModulus: number;
  /** Uncracked transformed section (bars as (n − 1)·As). */
  readonly uncrackedArea: number;
  readonly uncrackedCentroidDepth: number;
  readonly uncrackedInertia: number;
  /** Cracked transformed section per direction (null without tension steel on that side). */
  readonly cracked: { readonly sagging: CrackedProperties | null; readonly hogging: CrackedProperties | null };
  /** Tensile strength used for cracking, MPa. */
  readonly tensileStrength: number;
  /**
   * Cracking moments, N·mm (magnitudes): `gross` = (fr + N/Ag)·Ig/yt on the gross section
   * (ACI 318-19 Eq. 24.2.3.5b form), `transformed` = same on the uncracked transformed section.
   */
  readonly crackingMoment: {
    readonly sagging: { readonly gross: number; readonly transformed: number };
    readonly hogging: { readonly gross: number; readonly transformed: number };
  };
}

/** Part of a profile between depths y0 and y1 (widths interpolated at the cuts). */
export function clipProfile(profile: readonly Strip[], y0: number, y1: number): Strip[] {
  const out: Strip[] = [];
  for (const s of profile) {
    const top = Math.max(s.top, y0);
    const bottom = Math.min(s.bottom, y1);
    if (bottom <= top) continue;
    const at = (y: number) => s.widthTop + ((s.widthBottom - s.widthTop) * (y - s.top)) / (s.bottom - s.top);
    out.push({ top, bottom, widthTop: at(top), widthBottom: at(bottom) });
  }
  return out;
}

/** Concrete strips of every part, mirrored so that the compression face is at depth 0. */
function facing(model: SectionModel, direction: BendingDirection): { strips: Strip[]; depthOf: (y: number) => number } {
  const h = model.height;
  const strips: Strip[] = [];
  for (const part of model.concreteParts) {
    for (const s of part.strips) {
      strips.push(direction === 'sagging' ? s : { top: h - s.bottom, bottom: h - s.top, widthTop: s.widthBottom, widthBottom: s.widthTop });
    }
  }
  return { strips, depthOf: (y) => (direction === 'sagging' ? y : h - y) };
}

/**
 * Elastic properties transformed to the cover concrete's initial modulus (or the given one, e.g.
 * a code modulus or an effective modulus for creep), with the cover's tensile strength (or the given one).
 * Bars use n = Es/Ec; inside concrete they count as (n − 1)·As in the uncracked section and in the
 * compression zone of the cracked section (the concrete they displace).
 */
export function elasticProperties(model: SectionModel, options: { concreteModulus?: number; tensileStrength?: number } = {}): ElasticProperties {
  const cover = model.concreteParts[0]!;
  const ec = options.concreteModulus ?? cover.material.initialModulus;
  const all = model.concreteParts.flatMap((p) => p.strips);
  const gross = profileMoments(all, 0);
  const yg = gross.firstMoment / gross.area;
  const ig = profileMoments(all, yg).secondMoment;

  let area = gross.area;
  let first = gross.firstMoment;
  for (const e of model.elements) {
    const n = e.material.initialModulus / ec;
    const added = (e.displacedConcrete ? n - 1 : n) * e.area;
    area += added;
    first += added * e.depth;
  }
  const yu = first / area;
  let iu = profileMoments(all, yu).secondMoment;
  for (const e of model.elements) {
    const n = e.material.initialModulus / ec;
    iu += (e.displacedConcrete ? n - 1 : n) * e.area * (e.depth - yu) ** 2;
  }

  const cracked = (direction: BendingDirection): CrackedProperties | null => {
    const { strips, depthOf } = facing(model, direction);
    const tensionSteel = model.elements.some((e) => e.kind !== 'frp' && depthOf(e.depth) > depthOf(model.centroidDepth));
    if (!tensionSteel) return null;
    const transformed = model.elements.map((e) => ({ d: depthOf(e.depth), n: e.material.initialModulus / ec, area: e.area, displaced: e.displacedConcrete !== null }));
    const firstMomentAbout = (c: number) => {
      let s = 0;
      const zone = clipProfile(strips, 0, c);
      s += profileMoments(zone, c).firstMoment * -1; // ∫ w (c − y) dy
      for (const t of transformed) {
        const n = t.d < c && t.displaced ? t.n - 1 : t.n;
        s += n * t.area * (c - t.d);
      }
      return s;
    };
    const h = model.height;
    const root = brentRoot(firstMomentAbout, 1e-9, h, firstMomentAbout(1e-9), firstMomentAbout(h), { xTolerance: 1e-9 });
    if (!root.converged) return null;
    const c = root.x;
    let inertia = profileMoments(clipProfile(strips, 0, c), c).secondMoment;
    for (const t of transformed) {
      const n = t.d < c && t.displaced ? t.n - 1 : t.n;
      inertia += n * t.area * (t.d - c) ** 2;
    }
    return { neutralAxisDepth: c, inertia };
  };

  const fr = options.tensileStrength ?? cover.material.tensileStrength;
  const axialStress = model.axialForce / gross.area;
  const h = model.height;
  const mcr = (inertia: number, yt: number) => (fr > 0 ? Math.max(0, (fr + axialStress) * inertia) / yt : 0);
  return {
    grossArea: gross.area,
    centroidDepth: yg,
    grossInertia: ig,
    concreteModulus: ec,
    uncrackedArea: area,
    uncrackedCentroidDepth: yu,
    uncrackedInertia: iu,
    cracked: { sagging: cracked('sagging'), hogging: cracked('hogging') },
    tensileStrength: fr,
    crackingMoment: {
      sagging: { gross: mcr(ig, h - yg), transformed: mcr(iu, h - yu) },
      hogging: { gross: mcr(ig, yg), transformed: mcr(iu, yu) },
    },
  };
}
