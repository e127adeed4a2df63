/**
 * Flexural strength check under the factored combination: demand from an elastic analysis
 * (gross stiffness per zone; no redistribution) against the design resistance of the zone where
 * the largest sagging and hogging demands occur (core/assessment/resistance.ts).
 * Units: N·mm, mm.
 */
import type { CodeBasis } from '../materials/specs.ts';
import { buildBeamModel, type ZoneResponse } from '../member/beam-model.ts';
import type { BeamDefinition, MemberLoad } from '../member/definition.ts';
import { solveStatic } from '../member/static.ts';
import { releasedMoment, toStaticLoad, type StaticLoad } from '../member/statics.ts';
import { elasticZone } from '../member/zones.ts';
import type { SectionAnalysis } from '../section/analyze.ts';
import { joinTexts, phrase, uniqueTexts, type Text } from '../units/phrase.ts';
import { strengthCombination } from './combinations.ts';
import { designResistance } from './resistance.ts';
import type { StrengthCheck } from './results.ts';

export interface ZoneResistance {
  readonly from: number;
  readonly to: number;
  /** Design resistance per direction, N·mm (null: no tension steel on that side). */
  readonly sagging: number | null;
  readonly hogging: number | null;
  readonly notes: Text[];
}

export function strengthCheck(
  combination: string,
  demand: { sagging: number; saggingPosition: number; hogging: number; hoggingPosition: number },
  zones: readonly ZoneResistance[],
): StrengthCheck {
  const zoneAt = (x: number) => zones.find((z) => x >= z.from && x <= z.to) ?? zones[0]!;
  const sagZone = zoneAt(demand.saggingPosition);
  const hogZone = zoneAt(demand.hoggingPosition);
  const ratio = (d: number, r: number | null) => (d <= 1e-6 ? 0 : r && r > 0 ? d / r : Infinity);
  const uS = ratio(demand.sagging, sagZone.sagging);
  const uH = ratio(demand.hogging, hogZone.hogging);
  const utilisation = Math.max(uS, uH);
  const finite = Number.isFinite(utilisation);
  const notes = uniqueTexts([...sagZone.notes, ...hogZone.notes]);
  if (!finite) notes.push(`${uS > uH ? 'Sagging' : 'Hogging'} moment demand where the section has no tension reinforcement on that side.`);
  return {
    combination,
    saggingDemand: demand.sagging,
    saggingPosition: demand.saggingPosition,
    hoggingDemand: demand.hogging,
    hoggingPosition: demand.hoggingPosition,
    saggingResistance: sagZone.sagging,
    hoggingResistance: hogZone.hogging,
    // A missing resistance under a real demand is reported as a utilisation of 99.99 (never Infinity).
    utilisation: finite ? utilisation : 99.99,
    pass: finite && utilisation <= 1,
    notes: joinTexts(notes, ' '),
  };
}


/**
 * The member's strength check: the largest factored sagging and hogging moments of an elastic
 * analysis (gross sections, code modulus) against the design resistance of the zone where each occurs.
 * @param analyses the section analysis of each zone, in zone order
 */
export function memberStrength(member: BeamDefinition, analyses: readonly SectionAnalysis[], code: CodeBasis, segments: number): StrengthCheck {
  const span = member.span;
  const includeSelfWeight = member.includeSelfWeight ?? true;
  const selfWeight: StaticLoad[] = includeSelfWeight ? member.zones.map((z, i) => ({ kind: 'uniform', w: analyses[i]!.selfWeight, from: z.from, to: z.to })) : [];
  const byCase = (cases: MemberLoad['loadCase'][], factor = 1) => member.loads.filter((l) => cases.includes(l.loadCase)).map((l) => toStaticLoad(l, span, factor));
  const extraPoints = member.loads.flatMap((l) => (l.kind === 'point' ? [l.position] : [l.from ?? 0, l.to ?? span]));
  const { factors, text: combination } = strengthCombination(member, code);
  const factored = [
    ...selfWeight.map((l) => ({ ...l, w: l.kind === 'uniform' ? l.w * factors.dead : 0 }) as StaticLoad),
    ...byCase(['dead'], factors.dead),
    ...byCase(['superimposed'], factors.superimposed),
    ...byCase(['live'], factors.live),
  ];
  const elasticZones: ZoneResponse[] = member.zones.map((z, i) => elasticZone(z.sectionId, z.from, z.to, analyses[i]!.codeModulus * analyses[i]!.elastic!.grossInertia));
  const elasticBeam = buildBeamModel(member.supports, span, elasticZones, extraPoints, segments);
  const demandState = solveStatic(elasticBeam, Float64Array.from(elasticBeam.x, (x) => releasedMoment(elasticBeam.support, span, factored, x)));
  let sag = 0;
  let sagAt = 0;
  let hog = 0;
  let hogAt = 0;
  demandState.moment.forEach((m, i) => {
    if (m > sag) {
      sag = m;
      sagAt = elasticBeam.x[i]!;
    }
    if (-m > hog) {
      hog = -m;
      hogAt = elasticBeam.x[i]!;
    }
  });
  const resistances: ZoneResistance[] = member.zones.map((z, i) => {
    const s = analyses[i]!;
    const curves = code === 'EN 1992-1-1' && s.designCurves ? s.designCurves : s.curves;
    const r = (dir: 'sagging' | 'hogging') => designResistance(code, curves[dir], s.yieldStrain[dir]);
    const rs = r('sagging');
    const rh = r('hogging');
    return { from: z.from, to: z.to, sagging: rs.value, hogging: rh.value, notes: [phrase`${s.sectionName}: sagging ${rs.note}; hogging ${rh.note}.`] };
  });
  return strengthCheck(combination, { sagging: sag, saggingPosition: sagAt, hogging: hog, hoggingPosition: hogAt }, resistances);
}
