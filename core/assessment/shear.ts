/**
 * What fails first: shear strength of the member's sections, the shear under the factored
 * combination, and the shear when the flexural mechanism forms (with flexural overstrength), so
 * that each member is classed flexure-governed or shear-governed.
 *
 * Shear strength by the project's code basis:
 *  - ACI 318-19 22.5: Vn = Vc + Vs, Vc by Table 22.5.5.1 with the size-effect factor λs, Vs by
 *    Eq. 22.5.8.5.3, the section limit of 22.5.1.2, φ = 0.75 (Table 21.2.1(b)).
 *  - EN 1992-1-1 6.2: VRd,c (Eq. 6.2a/b), VRd,s (Eq. 6.8) and VRd,max (Eq. 6.9) with the strut angle
 *    chosen within 1 ≤ cot θ ≤ 2.5 (Eq. 6.7N) to give the largest resistance (see enShearStrength).
 *
 * Demand (member statics with the loads of core/member/analyze.ts):
 *  - factored: the strength combination, with the support moments of an elastic analysis on gross
 *    sections (as the flexural strength check);
 *  - at the flexural mechanism: every hinge the support type needs at its overstrength moment
 *    Mo = γo·Mpeak, Mpeak the largest moment of the section's moment–curvature curve (the steel law
 *    to its ultimate stress fu — the measured one when coupons are entered), γo = 1.0 by default;
 *    the load pattern of the capacity analysis is scaled until the mechanism forms (lower-bound
 *    statics: hinge moments imposed, λ the smallest factor that brings a span section to Mo).
 * Sections closer than d to a support face are not checked when no point load lies between
 * (ACI 318-19 9.4.3.2; EN 1992-1-1 6.2.1(8)); under EN the support face is checked against
 * VEd ≤ 0.5·bw·d·ν·fcd (Eq. 6.5).
 *
 * Flexure-governed or shear-governed is decided on nominal strengths (ACI Vn with φ = 1; EN with
 * γc = γs = 1): the question is which capacity is reached first, not a design check. The design
 * ratio (φVn, VRd) is reported beside it, as the capacity-design rules of ACI 318-19 18.6.5.1 and
 * EN 1998-1 5.5.2.1 would use it (from memory).
 *
 * Units: N, mm, MPa, N·mm.
 */
import { SI_TEXT, type QuantityText } from '../units/text.ts';
import type { CodeBasis, ConcreteSpec } from '../materials/specs.ts';
import type { SectionAnalysis } from '../section/analyze.ts';
import type { SectionDefinition } from '../section/definition.ts';
import { barArea } from '../section/definition.ts';
import type { BendingDirection, DiscreteElement, SectionModel } from '../section/model.ts';
import { tensionSteel } from '../section/moment-curvature.ts';
import { faces } from '../section/state.ts';
import { stripWidthAt } from '../section/width-profile.ts';
import { buildBeamModel, type ZoneResponse } from '../member/beam-model.ts';
import type { BeamDefinition, LoadFactors, MemberLoad, SupportType } from '../member/definition.ts';
import { solveStatic } from '../member/static.ts';
import { plainConcreteResponse } from '../member/section-response.ts';
import { releasedMoment, toStaticLoad, totalLoad, type StaticLoad } from '../member/statics.ts';

// =====================================================================================================
// ACI 318-19
// =====================================================================================================

/** Strength reduction factor for shear, φ = 0.75. @see ACI 318-19 Table 21.2.1(b) */
export const ACI_SHEAR_PHI = 0.75;
/** Largest √f′c used for shear, 8.3 MPa (f′c ≤ 69 MPa). @see ACI 318-19 22.5.3.1 */
export const ACI_SQRT_FC_LIMIT = 8.3;
/** Largest fyt used for stirrups in shear, 420 MPa. @see ACI 318-19 Table 20.2.2.4(a) (from memory) */
export const ACI_STIRRUP_YIELD_LIMIT = 420;

/**
 * Size-effect modification factor λs = √(2/(1 + d/254)) ≤ 1 (d in mm; the in.-lb. form is
 * √(2/(1 + d/10)) with d in inches, the SI edition writes 1 + 0.004d — within 1.6 % of this).
 * @param d effective depth, mm (> 0)
 * @see ACI 318-19 Eq. 22.5.5.1.3
 */
export function aciSizeEffectFactor(d: number): number {
  return Math.min(1, Math.sqrt(2 / (1 + d / 254)));
}

/**
 * Minimum shear reinforcement per unit length Av,min/s = max(0.062√f′c, 0.35)·bw/fyt, mm²/mm.
 * @param fc f′c, MPa; bw mm; fyt MPa (> 0)
 * @see ACI 318-19 Table 9.6.3.4
 */
export function aciMinimumShearReinforcement(fc: number, bw: number, fyt: number): number {
  return (Math.max(0.062 * Math.sqrt(fc), 0.35) * bw) / fyt;
}

/** Inputs of aciConcreteShear (N, mm, MPa). */
export interface AciConcreteShearInput {
  /** f′c, MPa (> 0). */
  readonly fc: number;
  /** Lightweight factor λ, 0.75–1. */
  readonly lambda: number;
  /** Web width bw and effective depth d, mm. */
  readonly bw: number;
  readonly d: number;
  /** Longitudinal tension reinforcement ratio ρw = As/(bw·d). */
  readonly rhoW: number;
  /** Axial force Nu, N, compression positive. */
  readonly axialForce: number;
  /** Gross area Ag, mm². */
  readonly grossArea: number;
  /** Av ≥ Av,min. */
  readonly meetsMinimum: boolean;
}

/** Vc of ACI 318-19 Table 22.5.5.1 with the row and factors used (N, MPa). */
export interface AciConcreteShear {
  /** Vc, N (≥ 0, ≤ 0.42λ√f′c·bw·d). */
  readonly value: number;
  /** Row of Table 22.5.5.1 used. */
  readonly expression: '(a)' | '(b)' | '(c)';
  readonly lambdaS: number;
  /** √f′c used (≤ 8.3 MPa). */
  readonly sqrtFc: number;
  /** Nu/(6Ag) used, MPa (≤ 0.05 f′c). */
  readonly axialStress: number;
  readonly capped: boolean;
}

/**
 * Vc of a nonprestressed member, N:
 *   Av ≥ Av,min: (a) [0.17λ√f′c + Nu/6Ag]·bw·d or (b) [0.66λ·ρw^(1/3)·√f′c + Nu/6Ag]·bw·d — the
 *   table permits either, so the larger is taken;
 *   Av < Av,min: (c) [0.66·λs·λ·ρw^(1/3)·√f′c + Nu/6Ag]·bw·d;
 * with Nu/6Ag ≤ 0.05 f′c, 0 ≤ Vc ≤ 0.42λ√f′c·bw·d and √f′c ≤ 8.3 MPa.
 * @see ACI 318-19 Table 22.5.5.1, 22.5.5.1.1, Eq. 22.5.5.1.3, 22.5.3.1
 */
export function aciConcreteShear(i: AciConcreteShearInput): AciConcreteShear {
  const sqrtFc = Math.min(Math.sqrt(i.fc), ACI_SQRT_FC_LIMIT);
  const axialStress = Math.min(i.axialForce / (6 * i.grossArea), 0.05 * i.fc);
  const lambdaS = aciSizeEffectFactor(i.d);
  const cube = Math.cbrt(Math.max(i.rhoW, 0));
  const bd = i.bw * i.d;
  let value: number;
  let expression: AciConcreteShear['expression'];
  if (i.meetsMinimum) {
    const a = (0.17 * i.lambda * sqrtFc + axialStress) * bd;
    const b = (0.66 * i.lambda * cube * sqrtFc + axialStress) * bd;
    value = Math.max(a, b);
    expression = b > a ? '(b)' : '(a)';
  } else {
    value = (0.66 * lambdaS * i.lambda * cube * sqrtFc + axialStress) * bd;
    expression = '(c)';
  }
  const cap = 0.42 * i.lambda * sqrtFc * bd;
  const capped = value > cap;
  return { value: Math.max(0, Math.min(value, cap)), expression, lambdaS, sqrtFc, axialStress, capped };
}

/**
 * Vs = Av·fyt·d/s of vertical stirrups, N.
 * @param av area of the legs crossing the section, mm²; fyt MPa (≤ 420 for shear); d, s mm
 * @see ACI 318-19 Eq. 22.5.8.5.3
 */
export function aciStirrupShear(av: number, fyt: number, d: number, s: number): number {
  return (av * fyt * d) / s;
}

/** Vertical stirrups crossing a horizontal cut (mm², mm, MPa). */
export interface StirrupInput {
  /** Area of the legs crossing a horizontal cut, mm². */
  readonly area: number;
  /** Spacing along the member, mm. */
  readonly spacing: number;
  /** Yield stress of the stirrup steel, MPa. */
  readonly yieldStress: number;
}

/** Shear strength of a section by ACI 318-19 22.5 (N). */
export interface AciShearStrength {
  readonly concrete: AciConcreteShear;
  /** Vs, N, after the section limit. */
  readonly steel: number;
  /** Vs before the section limit, N. */
  readonly steelUnlimited: number;
  /** 0.66√f′c·bw·d, the largest Vs the section may count (22.5.1.2), N. */
  readonly steelLimit: number;
  /** Vn = Vc + Vs and φVn, N. */
  readonly nominal: number;
  readonly design: number;
  readonly phi: number;
  /** Av,min/s, mm²/mm (0 without stirrups), and whether the stirrups meet it. */
  readonly minimumPerLength: number;
  readonly meetsMinimum: boolean;
  /** fyt used (≤ 420 MPa), MPa. */
  readonly stirrupYield: number;
  readonly notes: readonly string[];
}

/**
 * Shear strength of a nonprestressed section: Vn = Vc + Vs with Vs ≤ 0.66√f′c·bw·d, φ = 0.75. N.
 * @see ACI 318-19 22.5.1.1, 22.5.1.2, Table 22.5.5.1, Eq. 22.5.8.5.3, Table 21.2.1(b), 9.7.6.2.2 (spacing)
 */
export function aciShearStrength(input: Omit<AciConcreteShearInput, 'meetsMinimum'> & { readonly stirrups: StirrupInput | null }): AciShearStrength {
  const notes: string[] = [];
  const st = input.stirrups;
  const fyt = st ? Math.min(st.yieldStress, ACI_STIRRUP_YIELD_LIMIT) : 0;
  if (st && st.yieldStress > ACI_STIRRUP_YIELD_LIMIT) notes.push(`fyt limited to ${ACI_STIRRUP_YIELD_LIMIT} MPa for shear (ACI 318-19 Table 20.2.2.4(a)).`);
  const minimumPerLength = fyt > 0 ? aciMinimumShearReinforcement(input.fc, input.bw, fyt) : 0;
  const meetsMinimum = st !== null && st.area / st.spacing >= minimumPerLength;
  const concrete = aciConcreteShear({ ...input, meetsMinimum });
  const sqrtFc = concrete.sqrtFc;
  const steelLimit = 0.66 * sqrtFc * input.bw * input.d;
  const steelUnlimited = st ? aciStirrupShear(st.area, fyt, input.d, st.spacing) : 0;
  const steel = Math.min(steelUnlimited, steelLimit);
  if (steelUnlimited > steelLimit) notes.push('Vs is limited to 0.66√f′c·bw·d by the section dimensions (ACI 318-19 22.5.1.2).');
  if (st) {
    // Table 9.7.6.2.2: lesser of d/2 and 600 mm, or of d/4 and 300 mm when Vs > 0.33√f′c·bw·d.
    const high = steelUnlimited > 0.33 * sqrtFc * input.bw * input.d;
    const maxSpacing = high ? Math.min(input.d / 4, 300) : Math.min(input.d / 2, 600);
    if (st.spacing > maxSpacing) {
      notes.push(`Stirrup spacing ${st.spacing.toFixed(0)} mm exceeds the ACI 318-19 9.7.6.2.2 limit (${maxSpacing.toFixed(0)} mm): some inclined cracks may cross no stirrup.`);
    }
  } else {
    notes.push('No stirrups: Vc by Table 22.5.5.1(c) with the size effect λs.');
  }
  if (!meetsMinimum && st) notes.push(`Av/s = ${(st.area / st.spacing).toFixed(3)} mm²/mm is below Av,min/s = ${minimumPerLength.toFixed(3)} mm²/mm: Vc by Table 22.5.5.1(c) with the size effect λs.`);
  if (concrete.capped) notes.push('Vc limited to 0.42λ√f′c·bw·d (ACI 318-19 22.5.5.1.1).');
  const nominal = concrete.value + steel;
  return { concrete, steel, steelUnlimited, steelLimit, nominal, design: ACI_SHEAR_PHI * nominal, phi: ACI_SHEAR_PHI, minimumPerLength, meetsMinimum, stirrupYield: fyt, notes };
}

// =====================================================================================================
// EN 1992-1-1
// =====================================================================================================

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
  readonly notes: readonly string[];
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
  const notes: string[] = [];
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
    if (st.spacing > 0.75 * input.d) notes.push(`Stirrup spacing ${st.spacing.toFixed(0)} mm exceeds sl,max = 0.75d = ${(0.75 * input.d).toFixed(0)} mm (EN 1992-1-1 Eq. 9.6N).`);
    if (steel > maximum) notes.push(`The compression struts govern: VRd,max = ${(maximum / 1000).toFixed(0)} kN at cot θ = ${cotTheta.toFixed(2)}.`);
  }
  return {
    concrete, steel, maximum, cotTheta, z, nu1, alphaCw, fcd, fywd, value,
    supportLimit: 0.5 * input.bw * input.d * enStrutReductionFactor(input.fck) * fcd,
    minimumRatio, meetsMinimum, notes,
  };
}

// =====================================================================================================
// Section geometry for shear
// =====================================================================================================

export interface ShearGeometry {
  /** Depth of the compression face below the top fibre, mm. */
  readonly compressionFace: number;
  /** d: compression face to the centroid of the tension bars, mm. */
  readonly effectiveDepth: number;
  /** bw: the smallest width between the compression face and the tension bars, mm. */
  readonly webWidth: number;
  /** Area of the longitudinal tension bars, mm² (plates and FRP excluded). */
  readonly tensionBarArea: number;
  /** Total concrete area of the model, mm². */
  readonly concreteArea: number;
  /** False when the direction has no tension bars (d falls back to 0.8 of the depth). */
  readonly hasTensionBars: boolean;
}

/** Total concrete width of a model at depth y (sum over parts), mm. */
function widthAt(model: SectionModel, y: number): number {
  let w = 0;
  for (const part of model.concreteParts) for (const s of part.strips) if (y >= s.top && y <= s.bottom) w += Math.max(0, stripWidthAt(s, y));
  return w;
}

/**
 * d, bw, As for shear in a bending direction. Bars only count as tension reinforcement (bonded
 * plates and FRP are outside the concrete); bw is the least width over the depth from the
 * compression face to the tension bars (the web of a flanged section; EN 1992-1-1 6.2.2(1)
 * "smallest width in the tensile area"; ACI 318-19 bw "web width").
 */
export function shearSectionGeometry(model: SectionModel, direction: BendingDirection): ShearGeometry {
  const face = faces(model, direction);
  const bars = model.elements.filter((e) => e.kind === 'bar' && (direction === 'sagging' ? e.depth > model.centroidDepth : e.depth < model.centroidDepth));
  const area = bars.reduce((s, e) => s + e.area, 0);
  const depth = Math.abs(face.tension - face.compression);
  const hasTensionBars = area > 0;
  const centroid = hasTensionBars ? bars.reduce((s, e) => s + e.area * e.depth, 0) / area : face.compression + (direction === 'sagging' ? 0.8 : -0.8) * depth;
  const effectiveDepth = Math.abs(centroid - face.compression);
  const lo = Math.min(face.compression, centroid);
  const hi = Math.max(face.compression, centroid);
  const candidates = new Set<number>([lo, hi]);
  for (const part of model.concreteParts) for (const s of part.strips) for (const y of [s.top, s.bottom]) if (y > lo && y < hi) candidates.add(y);
  const eps = 1e-6 * Math.max(depth, 1);
  let webWidth = Infinity;
  for (const y of candidates) {
    for (const probe of [y - eps, y + eps]) {
      if (probe < lo || probe > hi) continue;
      const w = widthAt(model, probe);
      if (w > 0) webWidth = Math.min(webWidth, w);
    }
  }
  let concreteArea = 0;
  for (const part of model.concreteParts) for (const s of part.strips) concreteArea += 0.5 * (s.widthTop + s.widthBottom) * (s.bottom - s.top);
  return { compressionFace: face.compression, effectiveDepth, webWidth: Number.isFinite(webWidth) ? webWidth : 0, tensionBarArea: area, concreteArea, hasTensionBars };
}

// =====================================================================================================
// Section shear capacity (one zone, one direction)
// =====================================================================================================

export interface ShearZone {
  readonly from: number;
  readonly to: number;
  readonly definition: SectionDefinition;
  readonly analysis: SectionAnalysis;
  readonly concrete: ConcreteSpec;
  /** Yield stress of the stirrup steel, MPa (undefined without stirrups or when it failed to build). */
  readonly stirrupYield?: number;
}

/** Shear capacity of a zone section in one bending direction, design and nominal (N, mm, MPa). */
export interface ShearCapacity {
  readonly sectionId: string;
  readonly sectionName: string;
  readonly direction: BendingDirection;
  readonly code: CodeBasis;
  readonly effectiveDepth: number;
  readonly webWidth: number;
  /** False when the direction has no tension bars (d falls back to 0.8 of the depth, ρ = 0). */
  readonly hasTensionBars: boolean;
  /** f′c or fck used, MPa. */
  readonly concreteStrength: number;
  readonly stirrups: { readonly legs: number; readonly diameter: number; readonly spacing: number; readonly area: number; readonly yieldStress: number; readonly meetsMinimum: boolean } | null;
  /** Concrete and stirrup contributions and the upper limit (ACI: Vc, Vs, Vc + 0.66√f′c·bw·d; EN: VRd,c, VRd,s, VRd,max), design level, N. */
  readonly concreteContribution: number;
  readonly stirrupContribution: number;
  readonly upperLimit: number;
  /** Nominal (ACI Vn; EN with γc = γs = 1) and design (φVn; VRd) strengths, N. */
  readonly nominal: number;
  readonly design: number;
  /** EN only: design and nominal limits at the support face (Eq. 6.5), N. */
  readonly supportLimit: { readonly design: number; readonly nominal: number } | null;
  /** The governing expression with the numbers, for the report. */
  readonly formula: string;
  readonly notes: readonly string[];
}

const kN = (n: number) => `${(n / 1000).toFixed(1)} kN`;

/**
 * Shear capacity of a zone's section in one bending direction (the side in tension sets d and ρ).
 * @see ACI 318-19 22.5; EN 1992-1-1 6.2 (via aciShearStrength / enShearStrength)
 */
export function sectionShearCapacity(code: CodeBasis, zone: ShearZone, direction: BendingDirection): ShearCapacity | null {
  const model = zone.analysis.model;
  if (!model) return null;
  const geometry = shearSectionGeometry(model, direction);
  const { effectiveDepth: d, webWidth: bw } = geometry;
  if (!(d > 0 && bw > 0)) return null;
  const hoops = zone.definition.hoops;
  const stirrups: StirrupInput | null = hoops && zone.stirrupYield !== undefined && zone.stirrupYield > 0
    ? { area: hoops.verticalLegs * barArea(hoops.diameter), spacing: hoops.spacing, yieldStress: zone.stirrupYield }
    : null;
  const fc = zone.concrete.strength;
  const rho = geometry.tensionBarArea / (bw * d);
  const notes: string[] = [];
  if (!geometry.hasTensionBars) notes.push(`No ${direction === 'sagging' ? 'bottom' : 'top'} tension bars: d taken as 0.8 of the depth and ρ = 0.`);
  if (hoops && !stirrups) notes.push('The stirrup steel could not be resolved: stirrups ignored.');
  const common = { bw, d, axialForce: model.axialForce };
  const identity = { sectionId: zone.definition.id, sectionName: zone.definition.name, direction, code, effectiveDepth: d, webWidth: bw, hasTensionBars: geometry.hasTensionBars, concreteStrength: fc };
  if (code === 'ACI 318-19') {
    const lambda = zone.concrete.lightweightFactor ?? 1;
    const r = aciShearStrength({ ...common, fc, lambda, rhoW: rho, grossArea: geometry.concreteArea, stirrups });
    const c = r.concrete;
    const vcText = c.expression === '(a)'
      ? `Vc = (0.17λ√f′c + Nu/6Ag)·bw·d = (0.17 × ${lambda} × ${c.sqrtFc.toFixed(2)} + ${c.axialStress.toFixed(2)}) × ${bw.toFixed(0)} × ${d.toFixed(0)} = ${kN(c.value)}`
      : `Vc = (0.66${c.expression === '(c)' ? `·λs` : ''}·λ·ρw^(1/3)·√f′c + Nu/6Ag)·bw·d${c.expression === '(c)' ? ` with λs = ${c.lambdaS.toFixed(3)}` : ''}, ρw = ${rho.toFixed(4)}: ${kN(c.value)}`;
    return {
      ...identity,
      stirrups: hoops && stirrups ? { legs: hoops.verticalLegs, diameter: hoops.diameter, spacing: hoops.spacing, area: stirrups.area, yieldStress: r.stirrupYield, meetsMinimum: r.meetsMinimum } : null,
      concreteContribution: c.value,
      stirrupContribution: r.steel,
      upperLimit: c.value + r.steelLimit,
      nominal: r.nominal,
      design: r.design,
      supportLimit: null,
      formula: `(SI form of the code equations: mm, MPa, kN) ${vcText} (ACI 318-19 Table 22.5.5.1${c.expression}); Vs = Av·fyt·d/s = ${kN(r.steel)} (Eq. 22.5.8.5.3); φVn = 0.75 × ${kN(r.nominal)} = ${kN(r.design)}`,
      notes: [...notes, ...r.notes],
    };
  }
  const enInput = { ...common, fck: fc, rhoL: rho, area: geometry.concreteArea, stirrups };
  const design = enShearStrength(enInput, { gammaC: 1.5, gammaS: 1.15 });
  const nominal = enShearStrength(enInput, { gammaC: 1, gammaS: 1 });
  const c = design.concrete;
  return {
    ...identity,
    stirrups: hoops && stirrups ? { legs: hoops.verticalLegs, diameter: hoops.diameter, spacing: hoops.spacing, area: stirrups.area, yieldStress: stirrups.yieldStress, meetsMinimum: design.meetsMinimum } : null,
    concreteContribution: c.value,
    stirrupContribution: design.steel,
    upperLimit: design.maximum,
    nominal: nominal.value,
    design: design.value,
    supportLimit: { design: design.supportLimit, nominal: nominal.supportLimit },
    formula: `(SI form of the code equations: mm, MPa, kN) VRd,c = [${c.cRdc.toFixed(3)} × ${c.k.toFixed(3)} × (100 × ${c.rhoL.toFixed(4)} × ${fc})^(1/3) + 0.15 × ${c.sigmaCp.toFixed(2)}]·bw·d ≥ (vmin + 0.15σcp)·bw·d = ${kN(c.value)} (Eq. ${c.governedBy}); VRd,s = (Asw/s)·z·fywd·cot θ = ${kN(design.steel)} (Eq. 6.8), VRd,max = ${kN(design.maximum)} (Eq. 6.9) at cot θ = ${design.cotTheta.toFixed(2)}; VRd = ${kN(design.value)}`,
    notes: [...notes, ...design.notes],
  };
}

// =====================================================================================================
// Member statics for shear
// =====================================================================================================

export interface MemberLoadSets {
  readonly selfWeight: readonly StaticLoad[];
  readonly dead: readonly StaticLoad[];
  readonly superimposed: readonly StaticLoad[];
  readonly live: readonly StaticLoad[];
}

/**
 * The member's loads by case, as core/member/analyze.ts assembles them: self-weight per zone (N/mm,
 * unless switched off), the user's dead, superimposed and live loads.
 */
export function memberLoadSets(member: BeamDefinition, zoneSelfWeights: readonly number[]): MemberLoadSets {
  const span = member.span;
  const byCase = (c: MemberLoad['loadCase']) => member.loads.filter((l) => l.loadCase === c).map((l) => toStaticLoad(l, span));
  const selfWeight: StaticLoad[] = (member.includeSelfWeight ?? true) ? member.zones.map((z, i) => ({ kind: 'uniform', w: zoneSelfWeights[i] ?? 0, from: z.from, to: z.to })) : [];
  return { selfWeight, dead: byCase('dead'), superimposed: byCase('superimposed'), live: byCase('live') };
}

/** A load scaled by a factor. */
export function scaleLoad(load: StaticLoad, factor: number): StaticLoad {
  return load.kind === 'point' ? { ...load, p: load.p * factor } : { ...load, w: load.w * factor };
}

/** The loads of a combination: self-weight and dead × factors.dead, superimposed × factors.superimposed, live × factors.live. */
export function combinedLoads(sets: MemberLoadSets, factors: LoadFactors): StaticLoad[] {
  return [
    ...sets.selfWeight.map((l) => scaleLoad(l, factors.dead)),
    ...sets.dead.map((l) => scaleLoad(l, factors.dead)),
    ...sets.superimposed.map((l) => scaleLoad(l, factors.superimposed)),
    ...sets.live.map((l) => scaleLoad(l, factors.live)),
  ];
}

/**
 * Shear of the released structure at x, N (V = dM/dx, sagging-positive moments): simple span
 * V = RA − loads left of x; cantilever (fixed at 0) V = loads right of x. `side` picks the value
 * just left or right of x where a point load sits there.
 */
export function releasedShear(support: SupportType, span: number, loads: readonly StaticLoad[], x: number, side: 'left' | 'right'): number {
  if (support === 'cantilever') {
    let v = 0;
    for (const l of loads) {
      if (l.kind === 'point') {
        if (l.a > x || (side === 'left' && l.a === x)) v += l.p;
      } else {
        const a = Math.max(l.from, x);
        if (l.to > a) v += l.w * (l.to - a);
      }
    }
    return v;
  }
  let reaction = 0;
  for (const l of loads) {
    if (l.kind === 'point') reaction += (l.p * (span - l.a)) / span;
    else reaction += (l.w * (l.to - l.from) * (span - (l.from + l.to) / 2)) / span;
  }
  let v = reaction;
  for (const l of loads) {
    if (l.kind === 'point') {
      if (l.a < x || (side === 'right' && l.a === x)) v -= l.p;
    } else {
      const b = Math.min(l.to, x);
      if (b > l.from) v -= l.w * (b - l.from);
    }
  }
  return v;
}

/** A zone of the member with its elastic flexural stiffness, for support moments (mm, N·mm²). */
export interface ElasticZone {
  readonly from: number;
  readonly to: number;
  readonly sectionId: string;
  /** Flexural stiffness EI, N·mm². */
  readonly stiffness: number;
}

/**
 * Support moments (N·mm, sagging positive) of the member under `loads` by an elastic analysis
 * with the zones' stiffness — the engine's compatibility solution (core/member/nonlinear.ts
 * solveStatic) on linear responses, as the flexural strength check uses. 0 at a pin or free end.
 */
export function elasticSupportMoments(member: BeamDefinition, zones: readonly ElasticZone[], loads: readonly StaticLoad[], segments: number): { left: number; right: number } {
  if (member.supports === 'simply-supported' || member.supports === 'cantilever') return { left: 0, right: 0 };
  const dummy = { effectiveDepth: 1, barDiameter: 0, yieldStress: 1, ultimateStress: 1 };
  const responses: ZoneResponse[] = zones.map((z) => {
    const lin = plainConcreteResponse(z.stiffness, Number.MAX_VALUE);
    return { sectionId: z.sectionId, from: z.from, to: z.to, sagging: lin, hogging: lin, hingeData: { sagging: dummy, hogging: dummy } };
  });
  const extra = loads.flatMap((l) => (l.kind === 'point' ? [l.a] : [l.from, l.to]));
  const beam = buildBeamModel(member.supports, member.span, responses, extra, segments);
  const field = Float64Array.from(beam.x, (x) => releasedMoment(beam.support, member.span, loads, x));
  const state = solveStatic(beam, field);
  return { left: state.moment[0]!, right: state.moment[state.moment.length - 1]! };
}

/** Moment (N·mm) and shear (N) at x for released loads plus support moments (sagging positive). */
export function memberForcesAt(support: SupportType, span: number, loads: readonly StaticLoad[], ends: { left: number; right: number }, x: number, side: 'left' | 'right'): { moment: number; shear: number } {
  const m0 = releasedMoment(support, span, loads, x);
  const v0 = releasedShear(support, span, loads, x, side);
  if (support === 'cantilever') return { moment: m0, shear: v0 };
  return { moment: m0 + ends.left * (1 - x / span) + (ends.right * x) / span, shear: v0 + (ends.right - ends.left) / span };
}

// =====================================================================================================
// Member assessment
// =====================================================================================================

export interface ShearDemandPoint {
  /** mm from the left support, and which side of a discontinuity. */
  readonly position: number;
  /** |V|, N. */
  readonly shear: number;
  readonly sectionId: string;
  readonly direction: BendingDirection;
  /** Capacities there (nominal and design), N. */
  readonly nominal: number;
  readonly design: number;
  /** True when the point is the support face checked against EN 1992-1-1 Eq. (6.5). */
  readonly supportFace: boolean;
}

/** Shear of a member: capacities, factored and mechanism demands, and the verdict (N, mm, N·mm). */
export interface ShearResult {
  readonly code: CodeBasis;
  readonly capacities: readonly ShearCapacity[];
  /** Shear under the factored strength combination against the design shear strength. */
  readonly factored: {
    readonly combination: string;
    readonly governing: ShearDemandPoint;
    readonly utilisation: number;
    readonly pass: boolean;
  } | null;
  /** Shear when the flexural mechanism forms (hinges at overstrength). */
  readonly mechanism: {
    readonly overstrengthFactor: number;
    readonly overstrengthBasis: string;
    readonly hinges: readonly { readonly position: number; readonly direction: BendingDirection; readonly moment: number }[];
    /** Load factor on the capacity pattern at the mechanism, and the total load then, N. */
    readonly loadFactor: number;
    readonly totalLoad: number;
    readonly governing: ShearDemandPoint;
    /** V / Vn (nominal) and V / φVn or V / VRd (design) at the governing point. */
    readonly nominalRatio: number;
    readonly designRatio: number;
  } | null;
  readonly governs: 'flexure' | 'shear' | 'undetermined';
  /** Load factor on the capacity pattern at which the nominal shear strength is reached first (determinate members only). */
  readonly shearFailureLoadFactor: number | null;
  /** False when shear governs: the flexural ductility and hinge rotations are then not available. */
  readonly flexuralDuctilityAvailable: boolean;
  /** The shear part of the governing-mode sentence. */
  readonly sentence: string;
  /** Which sections near the supports were skipped, and why. */
  readonly criticalSectionRule: string;
  readonly warnings: readonly string[];
}

/** Inputs of memberShear. */
export interface MemberShearInput {
  readonly code: CodeBasis;
  readonly member: BeamDefinition;
  /** One per member zone, in the member's zone order. */
  readonly zones: readonly ShearZone[];
  /** Strength combination factors and their description. */
  readonly factors: LoadFactors;
  readonly combination: string;
  /** Stations along the span (default 200). */
  readonly segments?: number;
  /** γo on the section peak moment for the mechanism (default 1.0). */
  readonly overstrengthFactor?: number;
  /** Formats forces and positions in the sentences (the project's display units; default SI). */
  readonly text?: QuantityText;
}


/** Sagging and hogging hinge moments of a zone (magnitudes, N·mm): γo × the curve's peak, or the cracking moment without tension steel. */
function hingeMoments(zone: ShearZone, gamma: number): { sagging: number; hogging: number } {
  const a = zone.analysis;
  const pick = (dir: BendingDirection) => {
    const peak = a.curves[dir]?.keyPoints.peak?.moment;
    if (peak !== undefined && peak > 0) return gamma * peak;
    return a.elastic ? a.elastic.crackingMoment[dir].transformed : 0;
  };
  return { sagging: pick('sagging'), hogging: pick('hogging') };
}

/**
 * Shear assessment of a member: capacities, factored demand, demand at the flexural mechanism,
 * flexure- or shear-governed, and the sentence for the governing mode.
 * Never throws for physical outcomes; returns `governs: 'undetermined'` with the reason when no
 * mechanism can be formed (empty load pattern, a zone without a model).
 * @see module comment for the clauses
 */
export function memberShear(input: MemberShearInput): ShearResult {
  const text = input.text ?? SI_TEXT;
  const { code, member, zones } = input;
  const span = member.span;
  const segments = input.segments ?? 200;
  const gamma = input.overstrengthFactor ?? 1;
  const warnings: string[] = [];

  // --- capacities per zone and direction ----------------------------------------------------------
  const caps = zones.map((z) => ({ sagging: sectionShearCapacity(code, z, 'sagging'), hogging: sectionShearCapacity(code, z, 'hogging') }));
  const capacities: ShearCapacity[] = [];
  const seen = new Set<string>();
  caps.forEach((c) => {
    for (const cap of [c.sagging, c.hogging]) {
      if (!cap) continue;
      const key = `${cap.sectionId}|${cap.direction}`;
      if (!seen.has(key)) {
        seen.add(key);
        capacities.push(cap);
      }
    }
  });
  const empty = (sentence: string): ShearResult => ({
    code, capacities, factored: null, mechanism: null, governs: 'undetermined', shearFailureLoadFactor: null,
    flexuralDuctilityAvailable: true, sentence, criticalSectionRule: '', warnings,
  });
  if (caps.some((c) => !c.sagging && !c.hogging)) return empty('shear not assessed: a section of the member has no valid model');

  const zoneIndexAt = (x: number, side: 'left' | 'right') => {
    for (let i = 0; i < zones.length; i++) {
      const z = zones[i]!;
      if (side === 'right' ? x >= z.from && x < z.to : x > z.from && x <= z.to) return i;
    }
    return x <= 0 ? 0 : zones.length - 1;
  };
  const capacityAt = (x: number, side: 'left' | 'right', moment: number) => {
    const i = zoneIndexAt(x, side);
    const c = caps[i]!;
    const dir: BendingDirection = moment >= 0 ? 'sagging' : 'hogging';
    const cap = c[dir] ?? c[dir === 'sagging' ? 'hogging' : 'sagging']!;
    return { zone: i, cap };
  };

  // --- loads ----------------------------------------------------------------------------------------
  const sets = memberLoadSets(member, zones.map((z) => z.analysis.selfWeight));
  const dead = [...sets.selfWeight, ...sets.dead, ...sets.superimposed];
  const live = sets.live;
  const proportional = member.capacity.pattern === 'proportional';
  const constant = proportional ? [] : dead;
  const pattern = proportional ? [...dead, ...live] : live;

  // --- stations and the critical sections near supports ----------------------------------------------
  const pointPositions = member.loads.filter((l) => l.kind === 'point').map((l) => (l as { position: number }).position);
  const supportsAt = member.supports === 'cantilever' ? [0] : [0, span];
  const skip: { readonly side: 'left' | 'right'; readonly limit: number }[] = [];
  const ruleParts: string[] = [];
  for (const xs of supportsAt) {
    const zi = zoneIndexAt(xs, xs === 0 ? 'right' : 'left');
    const c = caps[zi]!;
    // The smaller d of the directions with tension bars: the check starts no further from the support than either allows.
    const depths = [c.sagging, c.hogging].filter((k): k is ShearCapacity => k !== null && k.hasTensionBars).map((k) => k.effectiveDepth);
    const d = Math.min(depths.length > 0 ? Math.min(...depths) : Math.max(c.sagging?.effectiveDepth ?? 0, c.hogging?.effectiveDepth ?? 0), span);
    const left = xs === 0;
    const loaded = pointPositions.some((p) => (left ? p > 0 && p <= d : p >= span - d && p < span));
    if (loaded) ruleParts.push(`a point load lies within d = ${text.section(d)} of the support at ${text.span(xs)}: checked up to the support face`);
    else {
      skip.push({ side: left ? 'left' : 'right', limit: left ? d : span - d });
      ruleParts.push(`sections within d = ${text.section(d)} of the support at ${text.span(xs)} take the shear at d`);
    }
  }
  const criticalSectionRule = `${ruleParts.join('; ')} (${code === 'ACI 318-19' ? 'ACI 318-19 9.4.3.2' : 'EN 1992-1-1 6.2.1(8); the support face is checked against Eq. 6.5'}).`;
  const stationSet = new Set<number>();
  for (let i = 0; i <= segments; i++) stationSet.add((span * i) / segments);
  for (const z of zones) {
    stationSet.add(z.from);
    stationSet.add(z.to);
  }
  for (const p of pointPositions) if (p >= 0 && p <= span) stationSet.add(p);
  for (const s of skip) stationSet.add(s.limit);
  const stations = [...stationSet].filter((x) => x >= 0 && x <= span).sort((a, b) => a - b);
  const skipped = (x: number) => skip.some((s) => (s.side === 'left' ? x < s.limit - 1e-9 : x > s.limit + 1e-9));
  // A span shorter than 2d would skip everything: then every station is checked.
  const checked = stations.some((x) => !skipped(x)) ? (x: number) => !skipped(x) : () => true;

  type Best = ShearDemandPoint & { ratio: number };
  /** Largest demand/capacity over the stations for a force state, on nominal and on design strengths (one pass). */
  const scan = (forces: (x: number, side: 'left' | 'right') => { moment: number; shear: number }): { nominal: Best; design: Best } => {
    let nominal: Best | undefined;
    let design: Best | undefined;
    const ratioOf = (v: number, capacity: number) => (capacity > 0 ? v / capacity : v > 0 ? 99.99 : 0);
    const consider = (point: ShearDemandPoint) => {
      const rn = ratioOf(point.shear, point.nominal);
      const rd = ratioOf(point.shear, point.design);
      if (!nominal || rn > nominal.ratio) nominal = { ...point, ratio: rn };
      if (!design || rd > design.ratio) design = { ...point, ratio: rd };
    };
    for (const x of stations) {
      for (const side of ['left', 'right'] as const) {
        if ((x === 0 && side === 'left') || (x === span && side === 'right')) continue;
        const f = forces(x, side);
        const { cap } = capacityAt(x, side, f.moment);
        const shear = Math.abs(f.shear);
        if (checked(x)) consider({ position: x, shear, sectionId: cap.sectionId, direction: cap.direction, nominal: cap.nominal, design: cap.design, supportFace: false });
        if (cap.supportLimit && supportsAt.includes(x)) consider({ position: x, shear, sectionId: cap.sectionId, direction: cap.direction, nominal: cap.supportLimit.nominal, design: cap.supportLimit.design, supportFace: true });
      }
    }
    return { nominal: nominal!, design: design! };
  };

  // --- factored combination ----------------------------------------------------------------------------
  const factoredLoads = combinedLoads(sets, input.factors);
  const elasticZones: ElasticZone[] = zones.map((z) => ({ from: z.from, to: z.to, sectionId: z.definition.id, stiffness: z.analysis.codeModulus * (z.analysis.elastic?.grossInertia ?? 0) }));
  const factoredEnds = elasticSupportMoments(member, elasticZones, factoredLoads, segments);
  const f = scan((x, side) => memberForcesAt(member.supports, span, factoredLoads, factoredEnds, x, side)).design;
  const factored = { combination: input.combination, governing: stripRatio(f), utilisation: Math.min(f.ratio, 99.99), pass: f.ratio <= 1 };

  // --- mechanism ------------------------------------------------------------------------------------------
  const hinge = zones.map((z) => hingeMoments(z, gamma));
  const overstrengthBasis = `hinge moments = ${gamma.toFixed(2)} × the peak moment of each section's moment–curvature curve (steel law to its ultimate stress fu)`;
  const noHardening = zones.some((z) => {
    const model = z.analysis.model;
    if (!model) return false;
    return (['sagging', 'hogging'] as const).some((dir) => {
      const main = tensionSteel(model, dir).reduce<DiscreteElement | undefined>((a, b) => (!a || b.area > a.area ? b : a), undefined);
      const law = main?.material as { yieldStress?: number; ultimateStress?: number } | undefined;
      return law?.yieldStress !== undefined && law.ultimateStress !== undefined && law.ultimateStress <= law.yieldStress * 1.0001;
    });
  });
  if (noHardening) {
    warnings.push('The main tension steel has no strain hardening (fu = fy): the flexural overstrength at the mechanism is only what the curve holds (ACI 318-19 18.6.5.1 would use 1.25 fy); consider a hardening law or measured fu.');
  }
  const patternTotal = totalLoad(pattern);
  let mechanism: ShearResult['mechanism'] = null;
  let governs: ShearResult['governs'] = 'undetermined';
  let shearFailureLoadFactor: number | null = null;
  let mechanismNote = '';
  if (!(Math.abs(patternTotal) > 0)) {
    mechanismNote = 'no load pattern to scale (no live load for a live-only pattern)';
  } else {
    const hingeAt = (x: number, side: 'left' | 'right') => hinge[zoneIndexAt(x, side)]!;
    const ends = {
      left: member.supports === 'fixed-fixed' || member.supports === 'propped-cantilever' ? -hingeAt(0, 'right').hogging : 0,
      right: member.supports === 'fixed-fixed' ? -hingeAt(span, 'left').hogging : 0,
    };
    // λ: smallest factor bringing a section to its hinge moment (span sections; for determinate
    // members every section in either sense).
    let lambda = Infinity;
    let hingeX = 0;
    let hingeDir: BendingDirection = 'sagging';
    const indeterminate = member.supports === 'fixed-fixed' || member.supports === 'propped-cantilever';
    for (const x of stations) {
      for (const side of ['left', 'right'] as const) {
        if ((x === 0 && side === 'left') || (x === span && side === 'right')) continue;
        if (indeterminate && (x === 0 || (member.supports === 'fixed-fixed' && x === span))) continue;
        const a = releasedMoment(member.supports, span, constant, x) + (member.supports === 'cantilever' ? 0 : ends.left * (1 - x / span) + (ends.right * x) / span);
        const b = releasedMoment(member.supports, span, pattern, x);
        const h = hingeAt(x, side);
        if (b > 1e-9) {
          const l = (h.sagging - a) / b;
          if (l < lambda) {
            lambda = l;
            hingeX = x;
            hingeDir = 'sagging';
          }
        } else if (b < -1e-9 && !indeterminate) {
          const l = (-h.hogging - a) / b;
          if (l < lambda) {
            lambda = l;
            hingeX = x;
            hingeDir = 'hogging';
          }
        }
      }
    }
    if (!Number.isFinite(lambda)) {
      mechanismNote = 'the load pattern brings no section to its flexural capacity';
    } else if (!(lambda > 0)) {
      mechanismNote = 'the constant (dead) load alone exceeds the flexural capacity';
      warnings.push('The dead load alone exceeds the flexural capacity at the mechanism: no shear demand at the mechanism can be formed.');
    } else {
      const loads = [...constant, ...pattern.map((l) => scaleLoad(l, lambda))];
      const forces = (x: number, side: 'left' | 'right') => memberForcesAt(member.supports, span, loads, ends, x, side);
      const { nominal, design } = scan(forces);
      // Hogging moments beyond the hinge capacity elsewhere mean another mechanism would form first.
      for (const x of stations) {
        const mx = forces(x, 'right').moment;
        if (mx < 0 && -mx > hingeAt(x, 'right').hogging * 1.001 && x > 0 && x < span) {
          warnings.push(`At the assumed mechanism the hogging moment at ${text.span(x)} exceeds that section's capacity: the true mechanism differs and its shear may be higher.`);
          break;
        }
      }
      const hinges: { position: number; direction: BendingDirection; moment: number }[] = [];
      if (ends.left !== 0) hinges.push({ position: 0, direction: 'hogging', moment: -ends.left });
      if (ends.right !== 0) hinges.push({ position: span, direction: 'hogging', moment: -ends.right });
      hinges.push({ position: hingeX, direction: hingeDir, moment: Math.abs(forces(hingeX, 'right').moment) });
      mechanism = {
        overstrengthFactor: gamma,
        overstrengthBasis,
        hinges,
        loadFactor: lambda,
        totalLoad: totalLoad(loads),
        governing: stripRatio(nominal),
        nominalRatio: Math.min(nominal.ratio, 99.99),
        designRatio: Math.min(design.ratio, 99.99),
      };
      governs = nominal.ratio > 1 ? 'shear' : 'flexure';
      if (governs === 'shear' && !indeterminate) {
        // V = Va + λ·Vb at every checked station: the first λ at which |V| reaches Vn.
        let first = Infinity;
        for (const x of stations) {
          if (!checked(x)) continue;
          for (const side of ['left', 'right'] as const) {
            if ((x === 0 && side === 'left') || (x === span && side === 'right')) continue;
            const va = memberForcesAt(member.supports, span, constant, { left: 0, right: 0 }, x, side);
            const vb = memberForcesAt(member.supports, span, pattern, { left: 0, right: 0 }, x, side);
            const { cap } = capacityAt(x, side, va.moment + lambda * vb.moment);
            for (const target of [cap.nominal, -cap.nominal]) {
              if (Math.abs(vb.shear) < 1e-12) continue;
              const l = (target - va.shear) / vb.shear;
              if (l > 0 && l < first) first = l;
            }
          }
        }
        shearFailureLoadFactor = Number.isFinite(first) ? first : null;
      }
    }
  }

  // --- sentence ---------------------------------------------------------------------------------------------
  const factoredText = `factored shear check ${factored.pass ? 'passes' : 'fails'} (utilisation ${factored.utilisation.toFixed(2)} at ${text.span(factored.governing.position)} under ${input.combination})`;
  const capName = code === 'ACI 318-19' ? 'Vn' : 'VRk (γ = 1)';
  const designName = code === 'ACI 318-19' ? 'φVn' : 'VRd';
  let sentence: string;
  if (mechanism && governs === 'shear') {
    const g = mechanism.governing;
    const at = shearFailureLoadFactor !== null ? `, reached at about ${(shearFailureLoadFactor / mechanism.loadFactor).toFixed(2)} × the flexural collapse load` : '';
    sentence = `shear governs (brittle): at the flexural mechanism the shear would reach ${text.force(g.shear)} at ${text.span(g.position)}, above ${capName} = ${text.force(g.nominal)} (ratio ${mechanism.nominalRatio.toFixed(2)})${at}, so the ductility and plastic hinge rotations are not available; ${factoredText}`;
  } else if (mechanism) {
    const g = mechanism.governing;
    const margin = mechanism.designRatio > 1 ? `, though above ${designName} = ${text.force(g.design)} (capacity-design ratio ${mechanism.designRatio.toFixed(2)})` : '';
    sentence = `shear: flexure governs — at the flexural mechanism the shear reaches ${text.force(g.shear)} at ${text.span(g.position)} against ${capName} = ${text.force(g.nominal)} (ratio ${mechanism.nominalRatio.toFixed(2)})${margin}; ${factoredText}`;
  } else {
    sentence = `shear: ${factoredText}; failure mode not determined (${mechanismNote})`;
  }
  return {
    code,
    capacities,
    factored,
    mechanism,
    governs,
    shearFailureLoadFactor,
    flexuralDuctilityAvailable: governs !== 'shear',
    sentence,
    criticalSectionRule,
    warnings,
  };
}

function stripRatio(p: ShearDemandPoint & { ratio: number }): ShearDemandPoint {
  return { position: p.position, shear: p.shear, sectionId: p.sectionId, direction: p.direction, nominal: p.nominal, design: p.design, supportFace: p.supportFace };
}
