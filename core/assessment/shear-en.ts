/**
 * Shear resistance of a reinforced-concrete section by EN 1992-1-1 6.2: VRd,c (Eq. 6.2a/b), VRd,s
 * (Eq. 6.8) and VRd,max (Eq. 6.9) with the strut angle chosen within 1 ≤ cot θ ≤ 2.5 (Eq. 6.7N) to
 * give the largest resistance. One published expression per function.
 * Units: N, mm, MPa.
 */
import { phrase, q, type Text } from '../units/phrase.ts';
import type { StirrupInput } from './shear-aci.ts';

/** k = 1 + √(200/d) ≤ 2.0 (d in mm). @see EN 1992-1-1 6.2.2(1) */
export function enShearSizeFactor(d: number): number {
  return Math.min(1 + Math.sqrt(200 / d), 2);
}

/** vmin = 0.035·k^(3/2)·fck^(1/2), MPa. @see EN 1992-1-1 Eq. (6.3N) */
export function enMinimumShearStress(k: number, fck: number): number {
  return 0.035 * k ** 1.5 * Math.sqrt(fck);
}

/** Strength reduction factor for concrete cracked in shear ν = 0.6(1 − fck/250). @see EN 1992-1-1 Eq. (6.6N) */
export function enStrutReductionFactor(fck: number): number {
  return 0.6 * (1 - fck / 250);
}

/**
 * Coefficient for the state of stress in the compression chord αcw: 1 for σcp = 0;
 * 1 + σcp/fcd up to 0.25 fcd; 1.25 up to 0.5 fcd; 2.5(1 − σcp/fcd) up to fcd (σcp compression +).
 * @see EN 1992-1-1 Eqs. (6.11aN)–(6.11cN) (from memory)
 */
export function enCompressionChordFactor(sigmaCp: number, fcd: number): number {
  if (sigmaCp <= 0) return 1;
  if (sigmaCp <= 0.25 * fcd) return 1 + sigmaCp / fcd;
  if (sigmaCp <= 0.5 * fcd) return 1.25;
  return Math.max(0, 2.5 * (1 - sigmaCp / fcd));
}

/** Inputs of enConcreteShear (N, mm, MPa). */
export interface EnConcreteShearInput {
  /** fck, MPa. */
  readonly fck: number;
  /** bw (smallest width in the tensile area) and d, mm. */
  readonly bw: number;
  readonly d: number;
  /** ρl = Asl/(bw·d) (capped at 0.02 here). */
  readonly rhoL: number;
  /** NEd, N, compression positive, and the concrete area Ac, mm². */
  readonly axialForce: number;
  readonly area: number;
  /** Partial factor γc (1.5 for design, 1.0 for the nominal strength). */
  readonly gammaC: number;
}

/** VRd,c of EN 1992-1-1 Eq. (6.2a/b) with its factors (N, MPa). */
export interface EnConcreteShear {
  readonly value: number;
  readonly k: number;
  readonly rhoL: number;
  readonly vmin: number;
  /** σcp used, MPa (< 0.2 fcd). */
  readonly sigmaCp: number;
  readonly cRdc: number;
  readonly governedBy: '6.2a' | '6.2b';
}

/**
 * VRd,c = [CRd,c·k·(100ρl·fck)^(1/3) + k1·σcp]·bw·d ≥ (vmin + k1·σcp)·bw·d, N, with CRd,c = 0.18/γc,
 * k1 = 0.15, ρl ≤ 0.02, σcp = NEd/Ac < 0.2 fcd.
 * @see EN 1992-1-1 Eqs. (6.2a), (6.2b), (6.3N), 6.2.2(1) (recommended values)
 */
export function enConcreteShear(i: EnConcreteShearInput): EnConcreteShear {
  const k = enShearSizeFactor(i.d);
  const rhoL = Math.min(Math.max(i.rhoL, 0), 0.02);
  const fcd = i.fck / i.gammaC;
  const sigmaCp = Math.min(i.axialForce / i.area, 0.2 * fcd);
  const cRdc = 0.18 / i.gammaC;
  const vmin = enMinimumShearStress(k, i.fck);
  const a = (cRdc * k * Math.cbrt(100 * rhoL * i.fck) + 0.15 * sigmaCp) * i.bw * i.d;
  const b = (vmin + 0.15 * sigmaCp) * i.bw * i.d;
  return { value: Math.max(a, b, 0), k, rhoL, vmin, sigmaCp, cRdc, governedBy: a >= b ? '6.2a' : '6.2b' };
}

/** VRd,s = (Asw/s)·z·fywd·cot θ, N. @see EN 1992-1-1 Eq. (6.8) */
export function enStirrupShear(areaPerLength: number, z: number, fywd: number, cotTheta: number): number {
  return areaPerLength * z * fywd * cotTheta;
}

/** VRd,max = αcw·bw·z·ν1·fcd/(cot θ + tan θ), N. @see EN 1992-1-1 Eq. (6.9) */
export function enMaximumShear(alphaCw: number, bw: number, z: number, nu1: number, fcd: number, cotTheta: number): number {
  return (alphaCw * bw * z * nu1 * fcd) / (cotTheta + 1 / cotTheta);
}

/**
 * Strut inclination for the largest VRd = min(VRd,s, VRd,max) within 1 ≤ cot θ ≤ 2.5 (Eq. 6.7N):
 * VRd,s grows with cot θ and VRd,max falls (for cot θ ≥ 1), so the best angle is where they are
 * equal, cot θ = √(αcw·bw·ν1·fcd/((Asw/s)·fywd) − 1), clamped to [1, 2.5]. The code leaves θ to
 * the designer within these limits (6.2.3(2)); the member's resistance is the best of them.
 * @see EN 1992-1-1 6.2.3(2), Eqs. (6.7N), (6.8), (6.9)
 */
export function enOptimalStrutAngle(areaPerLength: number, fywd: number, alphaCw: number, bw: number, nu1: number, fcd: number): number {
  if (!(areaPerLength > 0 && fywd > 0)) return 2.5;
  const ratio = (alphaCw * bw * nu1 * fcd) / (areaPerLength * fywd) - 1;
  if (!(ratio > 1)) return 1;
  return Math.min(2.5, Math.max(1, Math.sqrt(ratio)));
}

/** Shear resistance of a section by EN 1992-1-1 6.2 (N, mm, MPa). */
export interface EnShearStrength {
  readonly concrete: EnConcreteShear;
  /** VRd,s, VRd,max at the chosen cot θ, N. */
  readonly steel: number;
  readonly maximum: number;
  readonly cotTheta: number;
  /** z = 0.9d, mm; ν1; αcw; fcd and fywd, MPa. */
  readonly z: number;
  readonly nu1: number;
  readonly alphaCw: number;
  readonly fcd: number;
  readonly fywd: number;
  /** max(VRd,c, min(VRd,s, VRd,max)), N. */
  readonly value: number;
  /** 0.5·bw·d·ν·fcd, the limit at the support face (Eq. 6.5), N. */
  readonly supportLimit: number;
  readonly minimumRatio: number;
  readonly meetsMinimum: boolean;
  readonly notes: readonly Text[];
}

/**
 * Shear resistance by EN 1992-1-1 6.2 with partial factors γc, γs (1.5 and 1.15 for design; 1.0 for
 * the nominal strength): the member resists the larger of VRd,c (as a member without calculated
 * shear reinforcement, 6.2.2) and min(VRd,s, VRd,max) (6.2.3) at the strut angle of
 * `enOptimalStrutAngle`; z = 0.9d, ν1 = ν (6.6N), fcd = fck/γc (αcc = 1.0), fywd = fywk/γs. N.
 * @see EN 1992-1-1 6.2.1(3)–(5), 6.2.2, 6.2.3, Eq. (6.5), Eq. (9.5N) (minimum ratio)
 */
export function enShearStrength(
  input: Omit<EnConcreteShearInput, 'gammaC'> & { readonly stirrups: StirrupInput | null },
  factors: { readonly gammaC: number; readonly gammaS: number },
): EnShearStrength {
  const notes: Text[] = [];
  const concrete = enConcreteShear({ ...input, gammaC: factors.gammaC });
  const fcd = input.fck / factors.gammaC;
  const nu1 = enStrutReductionFactor(input.fck);
  const alphaCw = enCompressionChordFactor(input.axialForce / input.area, fcd);
  const z = 0.9 * input.d;
  const st = input.stirrups;
  const areaPerLength = st ? st.area / st.spacing : 0;
  const fywd = st ? st.yieldStress / factors.gammaS : 0;
  const cotTheta = enOptimalStrutAngle(areaPerLength, fywd, alphaCw, input.bw, nu1, fcd);
  const steel = st ? enStirrupShear(areaPerLength, z, fywd, cotTheta) : 0;
  const maximum = enMaximumShear(alphaCw, input.bw, z, nu1, fcd, cotTheta);
  const reinforced = Math.min(steel, maximum);
  const value = Math.max(concrete.value, reinforced);
  const minimumRatio = st ? (0.08 * Math.sqrt(input.fck)) / st.yieldStress : 0;
  const meetsMinimum = st !== null && areaPerLength / input.bw >= minimumRatio;
  if (!st) notes.push('No stirrups: VRd,c of a member without shear reinforcement (6.2.2).');
  else {
    if (!meetsMinimum) notes.push(`ρw = ${(areaPerLength / input.bw).toExponential(2)} is below ρw,min = 0.08√fck/fyk = ${minimumRatio.toExponential(2)} (EN 1992-1-1 Eq. 9.5N).`);
    if (st.spacing > 0.75 * input.d) notes.push(phrase`Stirrup spacing ${q('sectionLength', st.spacing, { compact: true })} exceeds sl,max = 0.75d = ${q('sectionLength', 0.75 * input.d, { compact: true })} (EN 1992-1-1 Eq. 9.6N).`);
    if (steel > maximum) notes.push(phrase`The compression struts govern: VRd,max = ${q('force', maximum)} at cot θ = ${cotTheta.toFixed(2)}.`);
  }
  return {
    concrete, steel, maximum, cotTheta, z, nu1, alphaCw, fcd, fywd, value,
    supportLimit: 0.5 * input.bw * input.d * enStrutReductionFactor(input.fck) * fcd,
    minimumRatio, meetsMinimum, notes,
  };
}
