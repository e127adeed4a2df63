/**
 * The deformation model's options for one member, from its capacity settings: the tension shift of
 * each zone (EN 1992-1-1 9.2.1.3(2)) and the strain penetration at each restrained support face.
 * Units: mm, MPa.
 */
import { fieldValue, type BeamModel, type ZoneResponse } from './beam-model.ts';
import type { CapacitySettings, StrainPenetrationModel } from './definition.ts';
import { shearSpans } from './hinges.ts';
import { responseOf, type EngineOptions, type PenetrationFace } from './equations.ts';

/** Default best-estimate ultimate on the descending branch: the load fallen to 80 % of the peak (Park 1988, from memory). */
export const ULTIMATE_LOAD_FRACTION = 0.8;

/**
 * Tension shift a_l = z(cot θ − cot α)/2 (EN 1992-1-1 9.2.1.3(2), Eq. (9.2)) with z = 0.9d
 * (EN 1992-1-1 6.2.3(1)), θ = 45° (cot θ = 1, the truss angle of diagonal cracking) and vertical
 * stirrups (cot α = 0): a_l = 0.45·d, mm.
 */
export function tensionShift(effectiveDepth: number): number {
  return (0.9 * effectiveDepth * (1 - 0)) / 2;
}

/**
 * Strain-penetration length Lsp, mm: the rotation at a restrained face is Lsp·φ (a length of the
 * member with the face's curvature added inside the support).
 *  - 'en1998-3': Lsp = 0.13·db·fy/√fc — the bond-slip term 0.13·φy·db·fy/√fc of the yield chord
 *    rotation, EN 1998-3:2005 Eq. (A.10a) (fy, fc in MPa; equation number from memory);
 *  - 'priestley-2007': Lsp = 0.022·fy·db, Priestley, Calvi & Kowalsky (2007) Eq. (4.30) (equation
 *    number from memory).
 */
export function penetrationLength(model: StrainPenetrationModel, barDiameter: number, yieldStress: number, concreteStrength: number | undefined): number {
  if (barDiameter <= 0 || yieldStress <= 1) return 0;
  switch (model) {
    case 'en1998-3': return concreteStrength && concreteStrength > 0 ? (0.13 * barDiameter * yieldStress) / Math.sqrt(concreteStrength) : 0;
    case 'priestley-2007': return 0.022 * yieldStress * barDiameter;
    case 'none': return 0;
  }
}

/**
 * Positions where the tension-shifted moment has a kink, to be made stations: a_l either side of
 * every point load and every support (the tips of the moment diagram), for each zone's a_l, mm.
 * Between them the shifted moment is linear wherever the moment is, so the integration stays exact.
 */
export function shiftStations(capacity: CapacitySettings, zones: readonly ZoneResponse[], tips: readonly number[], length: number): number[] {
  if (!(capacity.tensionShift ?? true)) return [];
  const shifts = new Set<number>();
  for (const z of zones) {
    shifts.add(tensionShift(z.hingeData.sagging.effectiveDepth));
    shifts.add(tensionShift(z.hingeData.hogging.effectiveDepth));
  }
  const out: number[] = [];
  for (const t of tips) for (const a of shifts) for (const p of [t - a, t + a]) if (p > 0 && p < length) out.push(p);
  return out;
}

/** The engine options of the load–deflection analysis for a member. */
export function engineOptions(beam: BeamModel, capacity: CapacitySettings): EngineOptions {
  const shiftOn = capacity.tensionShift ?? true;
  const shift = shiftOn
    ? {
        sagging: Float64Array.from(beam.zones, (z) => tensionShift(z.hingeData.sagging.effectiveDepth)),
        hogging: Float64Array.from(beam.zones, (z) => tensionShift(z.hingeData.hogging.effectiveDepth)),
      }
    : null;
  const model = capacity.strainPenetration ?? 'en1998-3';
  const faces: PenetrationFace[] = [];
  if (model !== 'none') {
    const { layout } = beam;
    for (const s of layout.supports) {
      if (s.kind === 'pinned') continue;
      const stations = beam.supportStations[s.index]!;
      for (const side of ['left', 'right'] as const) {
        const station = side === 'left' ? stations.left : stations.right;
        if (station < 0) continue;
        const zone = beam.zones[beam.stationZone[station]!]!;
        const length = (d: typeof zone.hingeData.sagging) => penetrationLength(model, d.barDiameter, d.yieldStress, d.concreteStrength);
        faces.push({
          support: s.index,
          station,
          position: s.x,
          side,
          sagging: length(zone.hingeData.sagging),
          hogging: length(zone.hingeData.hogging),
          fields: Float64Array.from(beam.redundants, (r) => fieldValue(r, s.x, side)),
        });
      }
    }
  }
  return { plastic: true, shift, faces };
}

/**
 * Shear term of the mean yield chord rotation, rad: 0.0013(1 + 1.5·h/Lv), EN 1998-3:2005 Eq. (A.10a)
 * second term for beams and columns (Panagiotakos & Fardis 2001, fitted to tests; equation number
 * from memory). h and Lv in mm.
 */
export function shearChordRotation(height: number, shearSpan: number): number {
  return 0.0013 * (1 + (1.5 * height) / shearSpan);
}

/**
 * The member's shear flexibility s (mm per N·mm) for the 'en1998-3' shear-deformation option: the
 * section that first reaches first yield under the load pattern (moments base + λ·increment) is the
 * critical one; with its shear span Lv (to the zero moment on each side, their mean inside a span) and
 * height h, s = θs·Lv/M′y makes the shear deflection over Lv equal θs(h, Lv)·Lv when it yields. The
 * shear strain then stays proportional to the shear force. 0 when no section would yield.
 */
export function shearFlexibility(beam: BeamModel, base: Float64Array, increment: Float64Array): number {
  const n = beam.x.length;
  let lambda = Infinity;
  let at = -1;
  let sense: 1 | -1 = 1;
  for (let i = 0; i < n; i++) {
    const dm = increment[i]!;
    if (!(Math.abs(dm) > 0)) continue;
    const sign: 1 | -1 = dm > 0 ? 1 : -1;
    const my = responseOf(beam.zones[beam.stationZone[i]!]!, sign).firstYieldMoment;
    if (my === null || !(my > 0)) continue;
    const l = (my - sign * base[i]!) / (sign * dm);
    if (l > 0 && l < lambda) {
      lambda = l;
      at = i;
      sense = sign;
    }
  }
  if (at < 0) return 0;
  const zone = beam.zones[beam.stationZone[at]!]!;
  const data = sense > 0 ? zone.hingeData.sagging : zone.hingeData.hogging;
  const my = responseOf(zone, sense).firstYieldMoment!;
  const moment = Float64Array.from(base, (m, i) => m + lambda * increment[i]!);
  const sides = at === 0 ? 'right' : at === n - 1 ? 'left' : 'both';
  const spans = shearSpans(beam, moment, beam.x[at]!, sides);
  const lv = spans.reduce((a, b) => a + b, 0) / spans.length;
  const h = data.height ?? data.effectiveDepth / 0.9;
  if (!(lv > 0) || !(h > 0)) return 0;
  return (shearChordRotation(h, lv) * lv) / my;
}
