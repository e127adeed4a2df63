/**
 * Moment redistribution at the supports: how much the non-linear analysis actually moves away from
 * the elastic support moment at the largest load, against what the code permits for a linear
 * analysis with redistribution.
 *   ACI 318-19 6.6.5.1 and 6.6.5.3 (from memory): the moment may be reduced only where the net
 *   tensile strain εt ≥ 0.0075 at the section, by at most the lesser of 1000·εt percent and 20 %.
 *   EN 1992-1-1 5.5(4) (from memory, recommended values): δ ≥ k1 + k2·xu/d (fck ≤ 50 MPa) or
 *   δ ≥ k3 + k4·xu/d (fck > 50 MPa), and δ ≥ k5 = 0.7 for Class B and C reinforcement, k6 = 0.8
 *   for Class A; k1 = 0.44, k3 = 0.54, k2 = k4 = 1.25·(0.6 + 0.0014/εcu2).
 * εt and xu are read at the section's code crushing point (ACI 0.003, EN εcu2) of its hogging curve.
 * Units: N·mm, mm; percentages as numbers (12.5 for 12.5 %).
 */
import { en1992ParabolaUltimateStrain } from '../materials/code/en1992.ts';
import type { CodeBasis } from '../materials/specs.ts';
import type { DirectionLaw } from './laws.ts';

export interface PermittedRedistribution {
  /** Largest permitted reduction of the elastic moment, percent (0 when none is permitted). */
  readonly percent: number;
  readonly clause: string;
  /** How it follows, in words with the numbers. */
  readonly basis: string;
}

/** EN 1992-1-1 ductility class of reinforcement from its strain at maximum force εuk (Annex C Table C.1, from memory). */
export function en1992DuctilityClass(ultimateStrain: number): 'A' | 'B' | 'C' {
  if (ultimateStrain >= 0.075) return 'C';
  if (ultimateStrain >= 0.05) return 'B';
  return 'A';
}

/** Permitted redistribution at a section by the code basis. */
export function permittedRedistribution(code: CodeBasis, law: DirectionLaw, concreteStrength: number): PermittedRedistribution {
  if (law.brittle || !law.codePoint) {
    return { percent: 0, clause: code === 'ACI 318-19' ? 'ACI 318-19 6.6.5' : 'EN 1992-1-1 5.5(4)', basis: 'the section does not reach the code crushing strain with yielded tension steel: no redistribution' };
  }
  if (code === 'ACI 318-19') {
    const et = law.codePoint.steelStrain;
    if (et < 0.0075) return { percent: 0, clause: 'ACI 318-19 6.6.5.1', basis: `εt = ${et.toFixed(4)} < 0.0075: no redistribution permitted` };
    const percent = Math.min(1000 * et, 20);
    return { percent, clause: 'ACI 318-19 6.6.5.3', basis: `εt = ${et.toFixed(4)}: the lesser of 1000εt = ${(1000 * et).toFixed(1)} % and 20 %` };
  }
  const fck = concreteStrength;
  const ecu2 = en1992ParabolaUltimateStrain(fck);
  const k2 = 1.25 * (0.6 + 0.0014 / ecu2);
  const ratio = law.codePoint.neutralAxisDepth / law.bars.effectiveDepth;
  const k1 = fck <= 50 ? 0.44 : 0.54;
  const cls = en1992DuctilityClass(law.bars.ultimateStrain);
  const floor = cls === 'A' ? 0.8 : 0.7;
  const delta = Math.min(Math.max(k1 + k2 * ratio, floor), 1);
  return {
    percent: Math.max((1 - delta) * 100, 0),
    clause: 'EN 1992-1-1 5.5(4)',
    basis: `xu/d = ${ratio.toFixed(3)}: δ ≥ ${k1} + ${k2.toFixed(3)}·xu/d = ${(k1 + k2 * ratio).toFixed(3)} and δ ≥ ${floor} (Class ${cls} reinforcement), so δ = ${delta.toFixed(3)}`,
  };
}

export interface RedistributionCheck {
  /** Support number (1 for the leftmost) and position, mm from the left end. */
  readonly support: number;
  readonly position: number;
  /** Load factor at which the moments are compared (the largest load of the analysis). */
  readonly loadFactor: number;
  /** Elastic and non-linear support moments there, N·mm (hogging negative). */
  readonly elasticMoment: number;
  readonly nonlinearMoment: number;
  /** Reduction actually used, percent of the elastic moment (negative: the support took more). */
  readonly usedPercent: number;
  readonly permitted: PermittedRedistribution;
  /** Used ≤ permitted. */
  readonly withinPermitted: boolean;
}

/** Compares used and permitted redistribution at one support. */
export function redistributionCheck(
  support: number,
  position: number,
  loadFactor: number,
  elasticMoment: number,
  nonlinearMoment: number,
  permitted: PermittedRedistribution,
): RedistributionCheck {
  const used = elasticMoment !== 0 ? (1 - nonlinearMoment / elasticMoment) * 100 : 0;
  return { support, position, loadFactor, elasticMoment, nonlinearMoment, usedPercent: used, permitted, withinPermitted: used <= permitted.percent + 1e-9 };
}
