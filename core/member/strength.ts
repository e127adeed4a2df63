/**
 * Flexural strength check under the factored combination: demand from an elastic analysis
 * (gross stiffness per zone; no redistribution), resistance from the section analysis.
 *  - ACI 318-19: φMn, with Mn the moment of the fibre analysis when the extreme concrete fibre
 *    reaches 0.003 (22.2.2.1) and φ from the net tensile strain εt (Table 21.2.2, "other"
 *    transverse reinforcement).
 *  - EN 1992-1-1: M_Rd from a second section analysis with design laws: parabola–rectangle with
 *    fcd = αcc·fck/γc (3.1.7, αcc = 1.0, γc = 1.5; 2.4.2.4) and elastic–plastic steel with
 *    fyd = fyk/γs (γs = 1.15) ending at εud = 0.9·εuk (3.2.7), at εcu2 or εud.
 * Units: N·mm, mm.
 */
import type { CodeBasis } from '../materials/specs.ts';
import { SI_TEXT, type QuantityText } from '../units/text.ts';
import type { MomentCurvatureResult } from '../section/results.ts';
import type { BendingDirection } from '../section/model.ts';
import type { StrengthCheck } from './results.ts';

/** Strength reduction factor φ for flexure, ACI 318-19 Table 21.2.2 (other transverse reinforcement). */
export function aciFlexureReductionFactor(netTensileStrain: number, yieldStrain: number): number {
  if (netTensileStrain >= yieldStrain + 0.003) return 0.9;
  if (netTensileStrain <= yieldStrain) return 0.65;
  return 0.65 + (0.25 * (netTensileStrain - yieldStrain)) / 0.003;
}

export interface ZoneResistance {
  readonly from: number;
  readonly to: number;
  /** Design resistance per direction, N·mm (null: no tension steel on that side). */
  readonly sagging: number | null;
  readonly hogging: number | null;
  readonly notes: string[];
}

/** Design resistance of one direction from its curve (ACI: φMn; EN: curve of design laws → M_Rd). */
export function designResistance(code: CodeBasis, curve: MomentCurvatureResult | undefined, yieldStrain: number, text: QuantityText = SI_TEXT): { value: number | null; note: string } {
  if (!curve || curve.points.length < 2) return { value: null, note: 'no tension reinforcement' };
  const kp = curve.keyPoints;
  const at = kp.codeCrushing && (!kp.ultimate || kp.codeCrushing.curvature <= kp.ultimate.curvature) ? kp.codeCrushing : kp.peak;
  if (!at) return { value: null, note: 'the section curve has no point to take a resistance from' };
  if (code === 'ACI 318-19') {
    const phi = aciFlexureReductionFactor(at.maxSteelTensileStrain, yieldStrain);
    return { value: phi * at.moment, note: `φMn = ${phi.toFixed(3)} × ${text.moment(at.moment)} (εt = ${(at.maxSteelTensileStrain * 1000).toFixed(2)} ‰${at === kp.peak ? ', at the peak: the curve ends before εc = 0.003' : ''})` };
  }
  return { value: at.moment, note: `M_Rd = ${text.moment(at.moment)} from design laws${at === kp.peak ? ' (at the peak: the curve ends before εcu2)' : ''}` };
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
  const notes = [...new Set([...sagZone.notes, ...hogZone.notes])];
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
    notes: notes.join(' '),
  };
}

export type { BendingDirection };
