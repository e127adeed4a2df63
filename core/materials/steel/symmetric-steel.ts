import { BugError, type Diagnostic } from '../../diagnostics.ts';
import type { SteelMaterial } from '../types.ts';
import { assertStrainIsNumber, checkField, fieldPath, reportInconsistent, show, sortedBreakpoints } from '../checks.ts';

/** Common inputs of the steel laws (MPa, strains dimensionless, magnitudes). */
export interface SteelParameters {
  /** Es, MPa, > 0. */
  readonly elasticModulus: number;
  /** fy, MPa, > 0. */
  readonly yieldStress: number;
  /** εsu, rupture strain magnitude (end of the curve), > εy. */
  readonly ruptureStrain: number;
}

/** Inputs of a steel law with strain hardening (MPa, strains dimensionless, magnitudes). */
export interface HardeningSteelParameters extends SteelParameters {
  /** fsu, MPa, ≥ fy. */
  readonly ultimateStress: number;
  /** εsh, onset of hardening, εy ≤ εsh < εsu. */
  readonly hardeningStrain: number;
}

/** The frame of a hardening law's curve: Es, fy, fsu, εsh, εsu. */
export function hardeningFrame(p: HardeningSteelParameters): Pick<SteelCurve, 'elasticModulus' | 'yieldStress' | 'ultimateStress' | 'hardeningStrain' | 'ruptureStrain'> {
  return { elasticModulus: p.elasticModulus, yieldStress: p.yieldStress, ultimateStress: p.ultimateStress, hardeningStrain: p.hardeningStrain, ruptureStrain: p.ruptureStrain };
}

/** What each model adds to the symmetric frame. */
export interface SteelCurve {
  readonly model: string;
  readonly label: string;
  readonly references: readonly string[];
  readonly elasticModulus: number;
  readonly yieldStress: number;
  readonly ultimateStress: number;
  readonly hardeningStrain: number;
  readonly ruptureStrain: number;
  /** σ(ε) for εy < ε ≤ εsu (magnitudes), MPa. */
  readonly postYield: (strain: number) => number;
  /** Extra kinks between εy and εsu (positive). */
  readonly extraBreakpoints?: readonly number[];
}

/**
 * Builds a steel law symmetric in tension and compression (compression positive):
 *   |ε| ≤ εy: σ = Es ε;  εy < |ε| ≤ εsu: σ = sign(ε)·postYield(|ε|);  |ε| > εsu: σ = 0 (ruptured; also ±Infinity).
 * A NaN strain throws BugError (checks.ts). Breakpoints ±εy, ±εsh, ±εsu and the model's extra kinks.
 */
export function symmetricSteel(curve: SteelCurve): SteelMaterial {
  const yieldStrain = curve.yieldStress / curve.elasticModulus;
  const positive = [yieldStrain, curve.hardeningStrain, curve.ruptureStrain, ...(curve.extraBreakpoints ?? [])].filter((s) => s > 0 && s <= curve.ruptureStrain);
  const { model } = curve;
  return {
    model,
    label: curve.label,
    references: curve.references,
    yieldStress: curve.yieldStress,
    yieldStrain,
    ultimateStress: curve.ultimateStress,
    ruptureStrain: curve.ruptureStrain,
    hardeningStrain: curve.hardeningStrain,
    initialModulus: curve.elasticModulus,
    breakpoints: sortedBreakpoints([...positive.map((s) => -s), ...positive]),
    stress(strain: number): number {
      if (strain !== strain) assertStrainIsNumber(strain, model); // inline NaN test: this is the hot path
      const magnitude = Math.abs(strain);
      if (magnitude > curve.ruptureStrain) return 0;
      if (magnitude <= yieldStrain) return strain === 0 ? 0 : curve.elasticModulus * strain;
      const stress = curve.postYield(magnitude);
      if (!Number.isFinite(stress)) throw new BugError(`${model}: stress at strain ${strain} is not finite`);
      return strain > 0 ? stress : -stress;
    },
  };
}

/**
 * Checks Es, fy, fu ≥ fy, εsh in [εy, εsu) and εsu > εy (law level: generous physical ranges; the
 * spec validation in factory.ts applies the trade ranges).
 */
export function validateSteelParameters(
  p: SteelParameters & { ultimateStress?: number; hardeningStrain?: number },
  model: string,
  path = '',
): Diagnostic[] {
  const out: Diagnostic[] = [];
  let ok = checkField(out, fieldPath(path, 'elasticModulus'), `${model}: elastic modulus Es`, p.elasticModulus, { min: 0, exclusiveMin: true, quantity: 'modulus' });
  ok = checkField(out, fieldPath(path, 'yieldStress'), `${model}: yield stress fy`, p.yieldStress, { min: 0, exclusiveMin: true, quantity: 'stress' }) && ok;
  ok = checkField(out, fieldPath(path, 'ruptureStrain'), `${model}: rupture strain εsu`, p.ruptureStrain, { min: 0, exclusiveMin: true, max: 1 }) && ok;
  if (p.ultimateStress !== undefined) {
    ok = checkField(out, fieldPath(path, 'ultimateStress'), `${model}: ultimate stress fu`, p.ultimateStress, { min: 0, exclusiveMin: true, quantity: 'stress' }) && ok;
  }
  if (p.hardeningStrain !== undefined) {
    ok = checkField(out, fieldPath(path, 'hardeningStrain'), `${model}: strain at the onset of hardening εsh`, p.hardeningStrain, { min: 0, max: 1 }) && ok;
  }
  if (!ok) return out;
  const yieldStrain = p.yieldStress / p.elasticModulus;
  if (p.ultimateStress !== undefined && p.ultimateStress < p.yieldStress) {
    reportInconsistent(out, fieldPath(path, 'ultimateStress'), `${model}: the ultimate stress fu = ${show(p.ultimateStress)} MPa must not be below the yield stress fy = ${show(p.yieldStress)} MPa`);
  }
  if (p.ruptureStrain <= yieldStrain) {
    reportInconsistent(out, fieldPath(path, 'ruptureStrain'), `${model}: the rupture strain εsu = ${show(p.ruptureStrain)} must exceed the yield strain εy = fy/Es = ${show(yieldStrain)}`);
  } else if (p.hardeningStrain !== undefined && (p.hardeningStrain < yieldStrain || p.hardeningStrain >= p.ruptureStrain)) {
    reportInconsistent(out, fieldPath(path, 'hardeningStrain'),
      `${model}: the strain at the onset of hardening εsh = ${show(p.hardeningStrain)} must lie between the yield strain εy = ${show(yieldStrain)} and the rupture strain εsu = ${show(p.ruptureStrain)}`);
  }
  return out;
}
