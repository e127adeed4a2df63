/**
 * Plastic hinges of the member engine: where they can form (per support type), how one is set up
 * when its critical section reaches first yield — its shear spans, length Lp
 * (core/member/hinge-length.ts) and rotation capacity θp,u = (φu − φe(Mu))·Lp — and how hinges and
 * positions are reported.
 * Internal units: mm, N·mm, 1/mm, rad.
 */
import type { BeamModel } from './beam-model.ts';
import type { StationRatio } from './capacity-state.ts';
import type { CapacitySettings, HingeLengthMethod } from './definition.ts';
import { responseOf, type HingeSite, type HingeState } from './equations.ts';
import { hingeLength, type HingeLengthInput } from './hinge-length.ts';
import type { PlasticHinge } from './results.ts';

export const SITE_WORDS: Record<HingeSite, string> = { left: 'left support', right: 'right support', span: 'span' };

/**
 * A position along the span in words without units (results are shown in SI or US customary;
 * numbers with units come from the numeric fields): "midspan", "0.42ℓ from the left support".
 */
export function describePosition(x: number, span: number, support: BeamModel['support']): string {
  if (x <= 1e-6 * span) return support === 'cantilever' ? 'the fixed end' : 'the left support';
  if (x >= span * (1 - 1e-6)) return support === 'cantilever' ? 'the free end' : 'the right support';
  if (Math.abs(x - span / 2) <= 0.005 * span && support !== 'cantilever') return 'midspan';
  return `${(x / span).toFixed(2)}ℓ from the ${support === 'cantilever' ? 'fixed end' : 'left support'}`;
}

/** Hinge sites of each support type: where a plastic hinge can form. */
export function hingeSites(support: BeamModel['support']): HingeSite[] {
  switch (support) {
    case 'cantilever': return ['left'];
    case 'simply-supported': return ['span'];
    case 'propped-cantilever': return ['left', 'span'];
    case 'fixed-fixed': return ['left', 'right', 'span'];
  }
}

/** Where and how a hinge forms: its site, critical station, sense and the load factor then. */
export interface HingeOrigin {
  readonly site: HingeSite;
  readonly station: number;
  readonly sign: 1 | -1;
  readonly activatedAt: number;
}

/**
 * A hardening plastic hinge at a critical section that has just reached first yield.
 * @param moment moments at the stations when the hinge forms, N·mm (they give the shear spans)
 */
export function newHinge(beam: BeamModel, moment: Float64Array, origin: HingeOrigin, capacity: CapacitySettings): HingeState {
  const { site, station, sign } = origin;
  const n = beam.x.length;
  const span = beam.span;
  const M = moment;
  const zoneIndex = site === 'right' ? beam.segmentZone[n - 2]! : beam.segmentZone[Math.min(station, n - 2)]!;
  const zone = beam.zones[zoneIndex]!;
  const data = sign > 0 ? zone.hingeData.sagging : zone.hingeData.hogging;
  const response = responseOf(zone, sign);
  // Shear spans: distance from the critical section to the nearest zero moment on each side.
  const zeroFrom = (start: number, dir: 1 | -1) => {
    for (let i = start; i >= 0 && i < n; i += dir) {
      const j = i + dir;
      if (j < 0 || j >= n) return Math.abs(beam.x[i]! - beam.x[start]!);
      if (Math.sign(M[j]!) !== Math.sign(M[start]!) || M[j] === 0) {
        const t = M[i]! / (M[i]! - M[j]!);
        return Math.abs(beam.x[i]! + t * (beam.x[j]! - beam.x[i]!) - beam.x[start]!);
      }
    }
    return span;
  };
  const shearSpans = site === 'left' ? [zeroFrom(0, 1)] : site === 'right' ? [zeroFrom(n - 1, -1)] : [zeroFrom(station, -1), zeroFrom(station, 1)];
  const input: HingeLengthInput = {
    method: capacity.hingeLengthMethod,
    effectiveDepth: data.effectiveDepth,
    shearSpans,
    barDiameter: data.barDiameter,
    yieldStress: data.yieldStress,
    ultimateStress: data.ultimateStress,
    atSupport: site !== 'span',
    ...(capacity.userHingeLength !== undefined ? { userLength: capacity.userHingeLength } : {}),
  };
  const hl = hingeLength(input);
  const length = Math.max(hl.length, 1);
  const rotationPosition = site === 'left' ? Math.min(length / 2, span / 2) : site === 'right' ? Math.max(span - length / 2, span / 2) : beam.x[station]!;
  const ultimatePlastic = response.softening.plastic[response.softening.plastic.length - 1]!;
  return {
    site,
    sign,
    station,
    zone: zoneIndex,
    length,
    rotationPosition,
    lengthFormula: hl.formula,
    shearSpan: shearSpans.reduce((a, b) => a + b, 0),
    phase: 'hardening',
    rotation: 0,
    capacity: ultimatePlastic * length,
    activatedAt: origin.activatedAt,
  };
}

/** A hinge as the results report it. */
export function hingeResult(beam: BeamModel, h: HingeState, method: HingeLengthMethod): PlasticHinge {
  const resp = responseOf(beam.zones[h.zone]!, h.sign);
  const phiY = resp.nominalYieldCurvature;
  return {
    position: beam.x[h.station]!,
    direction: h.sign > 0 ? 'sagging' : 'hogging',
    sectionId: beam.zones[h.zone]!.sectionId,
    length: h.length,
    lengthMethod: method,
    lengthFormula: h.lengthFormula,
    shearSpan: h.shearSpan,
    rotationCapacity: h.capacity,
    rotationAtUltimate: h.rotation,
    curvatureDuctility: phiY && phiY > 0 ? resp.ultimateCurvature / phiY : null,
  };
}

/** Why a section outside the hinges reached its peak, in words. */
export function overstressWords(beam: BeamModel, zoneIndex: number, o: StationRatio): string {
  const where = describePosition(beam.x[o.station]!, beam.span, beam.support);
  const direction = o.sign > 0 ? 'sagging' : 'hogging';
  const zone = beam.zones[zoneIndex]!;
  const response = o.sign > 0 ? zone.sagging : zone.hogging;
  if (response.firstYieldMoment === null) {
    return `the section at ${where} reaches its peak ${direction} moment without its tension steel yielding (no ${o.sign > 0 ? 'bottom' : 'top'} reinforcement there, or over-reinforced): a brittle failure with no plastic hinge`;
  }
  return `the section at ${where} reaches its peak ${direction} moment outside a plastic hinge`;
}
