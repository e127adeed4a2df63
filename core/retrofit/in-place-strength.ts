/**
 * In-place concrete strength from drilled cores: mean, number of cores n and coefficient of
 * variation V → the strength the section analysis uses in place of the specified strength.
 *
 *  - ACI 318-19 basis — ACI 214.4R-10, tolerance-factor approach (from memory): the equivalent
 *    specified strength is the lower tolerance limit of the in-place strength for its 10 % fractile
 *    at 75 % confidence, f′c,eq = f̄c − K·s = f̄c·(1 − K·V), K the one-sided tolerance factor for n
 *    cores. ACI 318-19 defines f′c so that about one test in ten may fall below it, hence the 10 %
 *    fractile. K is computed exactly from the noncentral t distribution (statistics.ts) and
 *    reproduces the published table of one-sided tolerance factors.
 *  - EN 1992-1-1 basis — EN 1990:2002 Annex D, D7.2, Eq. (D.1) with Table D1, "VX unknown" row
 *    (from memory): fck,is = f̄c·(1 − kn·V), the 5 % fractile that fck denotes
 *    (EN 1992-1-1 3.1.2(1)). Between tabulated n, kn is interpolated linearly in 1/n.
 *    EN 13791:2019 builds its in-situ assessment on the same statistics; its specimen conversions
 *    are for the engineer to apply to the core results before entry (see below).
 *
 * The mean must be of core strengths already converted to equivalent in-place cylinder strengths
 * (length/diameter, diameter, moisture and drilling-damage corrections, ACI 214.4R-10 Table 9.1 or
 * EN 13791). Both methods need at least 3 cores: the sample standard deviation needs 2, and neither
 * table starts below 3.
 *
 * Units: MPa; V and the factors are dimensionless.
 */
import { BugError } from '../diagnostics.ts';
import type { CodeBasis } from '../materials/specs.ts';
import { oneSidedToleranceFactor } from './statistics.ts';
import { convertUnit } from '../units/convert.ts';
import { bySystem, type Text } from '../units/phrase.ts';

/**
 * What each strength of an as-found concrete is used for (issue 11 item 3), one sentence for the
 * report, the app and the CLI: the cores' mean for the behaviour, the lower fractile for the code checks.
 */
export function asFoundStrengthUse(code: CodeBasis): string {
  const fractile = code === 'ACI 318-19' ? 'f′c,eq' : 'fck,is';
  return `The mean f̄c is used for the behaviour (stress–strain laws and curves, Ec, tensile strength, both deflection methods, the shear at the flexural mechanism); ${fractile} for the code checks (${code === 'ACI 318-19' ? 'φMn' : 'M_Rd'}, shear capacity, FRP debonding strain, service-stress limits).`;
}

/** Fewest cores either method accepts. @see ACI 318-19 26.12.6.1 (three cores per low-strength test, from memory); EN 1990 Table D1 (no "VX unknown" value below n = 3) */
export const MINIMUM_CORE_COUNT = 3;

/** Fractile of the ACI 214.4R-10 tolerance-factor approach, 10 % (from memory). */
export const ACI_CORE_FRACTILE = 0.1;
/** Confidence level of the ACI 214.4R-10 tolerance-factor approach, 75 % (from memory). */
export const ACI_CORE_CONFIDENCE = 0.75;

/**
 * One-sided tolerance factor K for n cores (10 % fractile, 75 % confidence), dimensionless.
 * n = 3 → 2.501, 5 → 1.961, 10 → 1.671, 30 → 1.475.
 * @param count number of cores n, integer ≥ 3
 * @see ACI 214.4R-10, tolerance-factor approach (from memory); M. G. Natrella (1963) NBS Handbook 91, Table A-7
 */
export function aciCoreToleranceFactor(count: number): number {
  if (!(Number.isInteger(count) && count >= MINIMUM_CORE_COUNT)) throw new BugError(`aciCoreToleranceFactor needs an integer n ≥ ${MINIMUM_CORE_COUNT}, got ${count}`);
  return oneSidedToleranceFactor(count, ACI_CORE_FRACTILE, ACI_CORE_CONFIDENCE);
}

/** EN 1990 Table D1, kn for the 5 % characteristic value, "VX unknown" row (from memory): [n, kn]. */
export const EN1990_TABLE_D1_UNKNOWN: readonly (readonly [number, number])[] = [
  [3, 3.37], [4, 2.63], [5, 2.33], [6, 2.18], [8, 2.0], [10, 1.92], [20, 1.76], [30, 1.73], [Infinity, 1.64],
];

/**
 * kn of EN 1990 Table D1 ("VX unknown", 5 % fractile), dimensionless; between tabulated n,
 * linear in 1/n (common practice, no source); n → ∞ gives 1.64.
 * @param count n, integer ≥ 3
 * @see EN 1990:2002 Annex D, Table D1 (from memory)
 */
export function en1990CharacteristicFactor(count: number): number {
  if (!(Number.isInteger(count) && count >= MINIMUM_CORE_COUNT)) throw new BugError(`en1990CharacteristicFactor needs an integer n ≥ ${MINIMUM_CORE_COUNT}, got ${count}`);
  const table = EN1990_TABLE_D1_UNKNOWN;
  for (let i = 0; i < table.length; i++) {
    const [n, k] = table[i]!;
    if (count === n) return k;
    const next = table[i + 1];
    if (next && count > n && count < next[0]) {
      const t = (1 / n - 1 / count) / (1 / n - 1 / next[0]);
      return k + t * (next[1] - k);
    }
  }
  return table[table.length - 1]![1];
}

/** The statistics of a set of cores (MPa, dimensionless V). */
export interface CoreStatistics {
  /** Mean in-place (equivalent cylinder) strength of the cores, MPa, > 0. */
  readonly meanStrength: number;
  /** Number of cores, integer ≥ 3. */
  readonly count: number;
  /** Coefficient of variation V = s / mean, 0 ≤ V < 1. */
  readonly coefficientOfVariation: number;
}

/** An in-place strength with the method, the factor used and the substituted formula (MPa). */
export interface InPlaceStrength {
  readonly code: CodeBasis;
  /** The strength the analysis uses: ACI f′c,eq or EN fck,is, MPa (may be ≤ 0 for absurd scatter: the caller checks). */
  readonly strength: number;
  /** K (ACI) or kn (EN). */
  readonly factor: number;
  /** Standard deviation of the cores s = V·mean, MPa. */
  readonly standardDeviation: number;
  readonly method: string;
  /** The expression with the numbers, for the report. */
  /** The substituted formula: in MPa in SI, in psi in US customary units. */
  readonly formula: Text;
}

/**
 * In-place strength by the code basis's method (see the module comment).
 * ACI: f′c,eq = f̄c(1 − K·V); EN: fck,is = f̄c(1 − kn·V). MPa.
 * @see ACI 214.4R-10 (tolerance-factor approach, from memory); EN 1990:2002 Eq. (D.1) and Table D1 (from memory)
 */
export function inPlaceStrength(code: CodeBasis, cores: CoreStatistics): InPlaceStrength {
  const { meanStrength: mean, count, coefficientOfVariation: v } = cores;
  if (!(mean > 0) || !(v >= 0 && v < 1) || !Number.isFinite(mean)) throw new BugError(`inPlaceStrength needs mean > 0 and 0 ≤ V < 1, got ${mean}, ${v}`);
  const s = v * mean;
  const aci = code === 'ACI 318-19';
  const k = aci ? aciCoreToleranceFactor(count) : en1990CharacteristicFactor(count);
  const value = mean * (1 - k * v);
  /** The formula with stresses in one unit: `per` of that unit per MPa, printed to `decimals`. */
  const formula = (per: number, decimals: number, unit: string) => {
    const f = (mpa: number) => (mpa * per).toFixed(decimals);
    return aci
      ? `f′c,eq = f̄c − K·s = ${f(mean)} − ${k.toFixed(3)} × ${(s * per).toFixed(decimals + 1)} = ${f(value)} ${unit} (n = ${count}, V = ${(v * 100).toFixed(1)} %)`
      : `fck,is = f̄c·(1 − kn·V) = ${f(mean)} × (1 − ${k.toFixed(2)} × ${v.toFixed(3)}) = ${f(value)} ${unit} (n = ${count})`;
  };
  return {
    code,
    strength: value,
    factor: k,
    standardDeviation: s,
    method: aci
      ? 'ACI 214.4R-10 tolerance-factor approach: lower tolerance limit of the 10 % fractile at 75 % confidence (equivalent specified strength f′c,eq)'
      : 'EN 1990 Annex D, D7.2: 5 % characteristic value from n tests with VX unknown (Eq. D.1, Table D1)',
    formula: [bySystem(formula(1, 1, 'MPa'), formula(convertUnit(1, 'MPa', 'psi'), 0, 'psi'))],
  };
}
