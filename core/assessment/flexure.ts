/**
 * The flexural strength check — the only one: the design beam, the beam as found, every
 * strengthened beam and the ACI 440.2R loss-of-strengthening check all come here.
 *
 * Demand: for each factored combination, the moment of an elastic analysis (gross section of each
 * zone at the code modulus, no redistribution; demand.ts) at every station: the equal segments of
 * the span, both sides of every zone boundary, every point load and load edge, and every point of
 * zero shear (where the moment between stations peaks), so the check does not depend on the station
 * count. Resistance: the design resistance of the section at that station in the sense of the
 * moment (resistance.ts: φMn or M_Rd by the code's own assumptions, ψf on FRP). The check passes
 * when demand ≤ resistance everywhere, for every combination; the governing point is the largest
 * utilisation. A demand where the section has no tension reinforcement on that side is reported as
 * utilisation 99.99 (never Infinity).
 *
 * A continuous beam changes the demand (support moments of more spans, live-load arrangements) and
 * nothing else here: core/assessment/continuous.ts passes its samples to checkMoments, the same rule.
 * Units: N, mm, N·mm.
 */
import type { CodeBasis } from '../materials/specs.ts';
import type { BeamDefinition } from '../member/definition.ts';
import { memberForcesAt } from '../member/statics.ts';
import { zoneIndexAt } from '../member/zones.ts';
import type { SectionAnalysis } from '../section/analyze.ts';
import type { BendingDirection } from '../section/model.ts';
import { joinTexts, phrase, uniqueTexts, type Text } from '../units/phrase.ts';
import { combinationText, combinedLoads, memberLoadSets, type LoadCombination } from './combinations.ts';
import { elasticSupportMoments, momentStations, type ElasticZone } from './demand.ts';
import { flexuralDesignResistance, type FlexuralResistance } from './resistance.ts';
import type { StrengthCheck, StrengthPoint, StrengthZone } from './results.ts';
import { exceedsBeyondRounding } from '../numeric/ties.ts';

/** A zone of the member with its section's analysis. */
export interface FlexureZone {
  readonly from: number;
  readonly to: number;
  readonly analysis: SectionAnalysis;
}

export interface FlexureInput {
  readonly code: CodeBasis;
  readonly member: BeamDefinition;
  readonly zones: readonly FlexureZone[];
  readonly combinations: readonly LoadCombination[];
  /** Equal segments along the span (the project setting `stations`). */
  readonly segments: number;
}

/** Utilisation reported for a demand where there is no resistance. */
export const NO_RESISTANCE_UTILISATION = 99.99;

/** Demands below this fraction of the largest |M| on the member are round-off: zero. */
const ROUND_OFF = 1e-9;

/** One moment of the check: where (mm, with the side of a discontinuity), and the combination it comes from. */
export interface MomentSample {
  readonly x: number;
  readonly side: 'left' | 'right';
  /** N·mm, sagging positive. */
  readonly moment: number;
  /** The combination (name and source). */
  readonly combination: string;
}

/** A sample as the check judged it: the zone, sense, |M|, design resistance and utilisation. */
export interface JudgedSample<T extends MomentSample> {
  readonly sample: T;
  readonly zone: number;
  readonly direction: BendingDirection;
  readonly demand: number;
  readonly resistance: number | null;
  readonly utilisation: number;
}

/** What checkMoments returns: the check and, for callers that need them, the governing sample and the worst per group and sense. */
export interface MomentCheck<T extends MomentSample> {
  readonly check: StrengthCheck;
  readonly governing: JudgedSample<T>;
  /** Worst judged sample per `${group}|${direction}` (groups from `groupOf`). */
  readonly worstByGroup: ReadonlyMap<string, JudgedSample<T>>;
}

/**
 * The flexural check of given moment samples (the one rule of this module): each sample against
 * the design resistance of the section at its position in the sense of its moment. Positions are
 * those of `zones` (a member's from its left support; a continuous beam's from its left end).
 * @param combinations every combination checked, by name and source, in order
 * @param groupOf optional grouping (e.g. the span) for the worst point per group and sense
 */
export function checkMoments<T extends MomentSample>(code: CodeBasis, zones: readonly FlexureZone[], samples: readonly T[], combinations: readonly string[], groupOf?: (sample: T) => string): MomentCheck<T> | null {
  if (zones.length === 0 || samples.length === 0 || zones.some((z) => !z.analysis.model || !z.analysis.elastic)) return null;
  const resistance = zones.map((z) => ({ sagging: flexuralDesignResistance(code, z.analysis, 'sagging'), hogging: flexuralDesignResistance(code, z.analysis, 'hogging') }));
  const scale = samples.reduce((m, s) => Math.max(m, Math.abs(s.moment)), 0);
  const zero = ROUND_OFF * scale;

  type Worst = JudgedSample<T> & { r: FlexuralResistance };
  const worstOf = new Map<string, Worst>();
  const worstByGroup = new Map<string, JudgedSample<T>>();
  const byCombination = new Map<string, number>(combinations.map((n) => [n, 0]));
  let governing: Worst | null = null;
  const consider = <W extends JudgedSample<T>>(map: Map<string, W>, key: string, w: W) => {
    const known = map.get(key);
    if (!known || exceedsBeyondRounding(w.utilisation, known.utilisation)) map.set(key, w);
  };
  for (const s of samples) {
    const zone = zoneIndexAt(zones, s.x, s.side);
    const direction: BendingDirection = s.moment >= 0 ? 'sagging' : 'hogging';
    const demand = Math.abs(s.moment) <= zero ? 0 : Math.abs(s.moment);
    const r = resistance[zone]![direction];
    const utilisation = demand === 0 ? 0 : r.value !== null && r.value > 0 ? Math.min(demand / r.value, NO_RESISTANCE_UTILISATION) : NO_RESISTANCE_UTILISATION;
    const point: Worst = { sample: s, zone, direction, demand, resistance: r.value, utilisation, r };
    consider(worstOf, `${zone}|${direction}`, point);
    consider(worstOf, `member|${direction}`, point);
    if (groupOf) consider(worstByGroup, `${groupOf(s)}|${direction}`, point);
    byCombination.set(s.combination, Math.max(byCombination.get(s.combination) ?? 0, utilisation));
    if (!governing || exceedsBeyondRounding(utilisation, governing.utilisation)) governing = point;
  }
  const g = governing!;
  const strip = (w: Worst | undefined): StrengthPoint | null => (w && w.demand > 0 ? { position: w.sample.x, demand: w.demand, resistance: w.resistance, utilisation: w.utilisation, combination: w.sample.combination } : null);
  const zoneResults: StrengthZone[] = zones.map((z, i) => ({ from: z.from, to: z.to, sectionId: z.analysis.sectionId, sagging: strip(worstOf.get(`${i}|sagging`)), hogging: strip(worstOf.get(`${i}|hogging`)) }));
  const sense = (d: BendingDirection) => worstOf.get(`member|${d}`);
  const sag = sense('sagging');
  const hog = sense('hogging');
  const noteOf = (w: Worst | undefined): Text[] => {
    if (!w || w.demand === 0) return [];
    const text: Text[] = [phrase`${zones[w.zone]!.analysis.sectionName}, ${w.direction}: ${w.r.note}`];
    if (w.resistance === null) text.push(`${w.direction === 'sagging' ? 'Sagging' : 'Hogging'} moment demand where the section has no tension reinforcement on that side`);
    return text;
  };
  const notes = uniqueTexts([...noteOf(g), ...noteOf(sag), ...noteOf(hog)]);
  const check: StrengthCheck = {
    combination: g.sample.combination,
    combinations: [...byCombination].map(([combination, utilisation]) => ({ combination, utilisation })),
    utilisation: g.utilisation,
    pass: g.utilisation <= 1,
    position: g.sample.x,
    sectionId: zones[g.zone]!.analysis.sectionId,
    direction: g.direction,
    demand: g.demand,
    resistance: g.resistance,
    saggingDemand: sag?.demand ?? 0,
    saggingPosition: sag?.sample.x ?? 0,
    saggingResistance: sag?.resistance ?? resistance[0]!.sagging.value,
    hoggingDemand: hog?.demand ?? 0,
    hoggingPosition: hog?.sample.x ?? 0,
    hoggingResistance: hog?.resistance ?? resistance[0]!.hogging.value,
    zones: zoneResults,
    notes: notes.length > 0 ? phrase`${joinTexts(notes, '; ')}.` : '',
  };
  return { check, governing: g, worstByGroup };
}

/**
 * The flexural strength check of a beam (see the module comment). Null when a zone has no section
 * model (input errors are reported elsewhere).
 */
export function flexuralCheck(input: FlexureInput): StrengthCheck | null {
  const { code, member, zones, combinations, segments } = input;
  if (zones.length === 0 || combinations.length === 0 || zones.some((z) => !z.analysis.model || !z.analysis.elastic)) return null;
  const span = member.span;
  const sets = memberLoadSets(member, zones.map((z) => z.analysis.selfWeight));
  const elasticZones: ElasticZone[] = zones.map((z) => ({ from: z.from, to: z.to, sectionId: z.analysis.sectionId, stiffness: z.analysis.codeModulus * z.analysis.elastic!.grossInertia }));

  // Moments of every combination at its stations.
  const samples: MomentSample[] = [];
  const names = combinations.map((c) => {
    const loads = combinedLoads(sets, c.factors);
    const ends = elasticSupportMoments(member, elasticZones, loads, segments);
    const forces = (x: number, side: 'left' | 'right') => memberForcesAt(member.supports, span, loads, ends, x, side);
    const name = combinationText(c);
    for (const x of momentStations(member, zones, forces, segments)) {
      for (const side of ['left', 'right'] as const) samples.push({ combination: name, x, side, moment: forces(x, side).moment });
    }
    return name;
  });
  return checkMoments(code, zones, samples, names)?.check ?? null;
}
