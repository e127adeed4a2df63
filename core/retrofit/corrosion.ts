/**
 * Reinforcement section loss from corrosion: what a corroded bar layer keeps.
 *
 *  - Area: As,res = (1 − δs)·As, δs the section (mass) loss as a fraction.
 *  - Rupture (ultimate) strain: Biondini & Vergani (2015), fitted to the tests of Apostolopoulos &
 *    Papadakis (2008) (from memory):
 *        εsu(δs) = εsu0                          for 0 ≤ δs ≤ 0.016
 *        εsu(δs) = 0.1521·δs^(−0.4583)·εsu0      for 0.016 < δs ≤ 1
 *    The two branches meet to within 1.2 % at δs = 0.016 (0.1521 × 0.016^−0.4583 = 1.012); the
 *    factor is capped at 1 so it never rises above the sound bar's.
 *  - Yield and ultimate stress on the residual area are kept (coupons, when taken, override them).
 *
 * Bond of corroded bars is not modelled: the section analysis keeps plane sections (perfect bond),
 * which the engineer must judge where cracking along the bars or spalling has loosened them.
 *
 * @see F. Biondini & M. Vergani (2015), Deteriorating beam finite element for nonlinear analysis of
 *      concrete structures under corrosion, Structure and Infrastructure Engineering 11(4), 519–532
 *      (from memory); C. A. Apostolopoulos & V. G. Papadakis (2008), Consequences of steel corrosion
 *      on the ductility properties of reinforcement bar, Construction and Building Materials 22(12).
 */
import { BugError } from '../diagnostics.ts';

/** Section loss below which the rupture strain is unaffected, as a fraction. (Biondini & Vergani 2015, from memory) */
export const CORROSION_THRESHOLD = 0.016;

/**
 * Ratio εsu(δs)/εsu0 of the rupture strain of a corroded bar to that of the sound bar.
 * @param lossFraction δs, 0 ≤ δs ≤ 1 (a fraction, not a percentage)
 * @returns a factor in (0, 1]; 0.1521 at δs = 1
 * @see Biondini & Vergani (2015), from memory
 */
export function corrodedRuptureStrainFactor(lossFraction: number): number {
  if (!(lossFraction >= 0 && lossFraction <= 1)) throw new BugError(`corrodedRuptureStrainFactor needs 0 ≤ δs ≤ 1, got ${lossFraction}`);
  if (lossFraction <= CORROSION_THRESHOLD) return 1;
  return Math.min(1, 0.1521 * lossFraction ** -0.4583);
}

/** Residual area factor 1 − δs. @param lossFraction δs, 0 ≤ δs ≤ 1 */
export function residualAreaFactor(lossFraction: number): number {
  if (!(lossFraction >= 0 && lossFraction <= 1)) throw new BugError(`residualAreaFactor needs 0 ≤ δs ≤ 1, got ${lossFraction}`);
  return 1 - lossFraction;
}
