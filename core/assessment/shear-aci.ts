/**
 * Shear strength of a reinforced-concrete section by ACI 318-19 22.5: Vn = Vc + Vs, Vc by
 * Table 22.5.5.1 with the size-effect factor λs, Vs by Eq. 22.5.8.5.3, the section limit of
 * 22.5.1.2, φ = 0.75 (Table 21.2.1(b)). One published expression per function.
 * Units: N, mm, MPa.
 */
import { convertUnit } from '../units/convert.ts';
import { bySystem, phrase, q, type SystemPart, type Text } from '../units/phrase.ts';

/** Strength reduction factor for shear, φ = 0.75. @see ACI 318-19 Table 21.2.1(b) */
export const ACI_SHEAR_PHI = 0.75;
/** Largest √f′c used for shear, 8.3 MPa (f′c ≤ 69 MPa). @see ACI 318-19 22.5.3.1 */
export const ACI_SQRT_FC_LIMIT = 8.3;
/** Largest fyt used for stirrups in shear, 420 MPa. @see ACI 318-19 Table 20.2.2.4(a) (from memory) */
export const ACI_STIRRUP_YIELD_LIMIT = 420;

/**
 * Which form of ACI 318-19's unit-dependent expressions a project uses: the inch-pound edition's or
 * the SI edition's (the project's unit system, `info.unitSystem`).
 */
export type AciEdition = 'us' | 'si';

/**
 * Size-effect modification factor λs ≤ 1, d in mm:
 *  - inch-pound form √(2/(1 + d/10)) with d in inches, i.e. √(2/(1 + d/254)) with d in mm;
 *  - SI form √(2/(1 + 0.004d)) = √(2/(1 + d/250)) with d in mm (up to 1.6 % apart in 1 + d/…).
 * @param d effective depth, mm (> 0)
 * @param edition the form the project uses (default the inch-pound one)
 * @see ACI 318-19 Eq. 22.5.5.1.3 (in.-lb. and SI editions)
 */
export function aciSizeEffectFactor(d: number, edition: AciEdition = 'us'): number {
  return Math.min(1, Math.sqrt(2 / (1 + d / (edition === 'si' ? 250 : 254))));
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
  /** Form of λs (Eq. 22.5.5.1.3): the project's unit system; default the inch-pound form. */
  readonly edition?: AciEdition;
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
  const lambdaS = aciSizeEffectFactor(i.d, i.edition);
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
  readonly notes: readonly Text[];
}

/** An area per length of member (stirrups, mm²/mm) as printed: mm²/mm, or in²/in. */
function areaPerLength(mm2PerMm: number): SystemPart {
  return bySystem(`${mm2PerMm.toFixed(3)} mm²/mm`, `${convertUnit(mm2PerMm, 'mm', 'in').toFixed(4)} in²/in`);
}

/**
 * Shear strength of a nonprestressed section: Vn = Vc + Vs with Vs ≤ 0.66√f′c·bw·d, φ = 0.75. N.
 * @see ACI 318-19 22.5.1.1, 22.5.1.2, Table 22.5.5.1, Eq. 22.5.8.5.3, Table 21.2.1(b), 9.7.6.2.2 (spacing)
 */
export function aciShearStrength(input: Omit<AciConcreteShearInput, 'meetsMinimum'> & { readonly stirrups: StirrupInput | null }): AciShearStrength {
  const notes: Text[] = [];
  const st = input.stirrups;
  const fyt = st ? Math.min(st.yieldStress, ACI_STIRRUP_YIELD_LIMIT) : 0;
  if (st && st.yieldStress > ACI_STIRRUP_YIELD_LIMIT) notes.push(phrase`fyt limited to ${q('stress', ACI_STIRRUP_YIELD_LIMIT, { compact: true })} for shear (ACI 318-19 Table 20.2.2.4(a)).`);
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
      notes.push(phrase`Stirrup spacing ${q('sectionLength', st.spacing, { compact: true })} exceeds the ACI 318-19 9.7.6.2.2 limit (${q('sectionLength', maxSpacing, { compact: true })}): some inclined cracks may cross no stirrup.`);
    }
  } else {
    notes.push('No stirrups: Vc by Table 22.5.5.1(c) with the size effect λs.');
  }
  if (!meetsMinimum && st) notes.push(phrase`Av/s = ${areaPerLength(st.area / st.spacing)} is below Av,min/s = ${areaPerLength(minimumPerLength)}: Vc by Table 22.5.5.1(c) with the size effect λs.`);
  if (concrete.capped) notes.push('Vc limited to 0.42λ√f′c·bw·d (ACI 318-19 22.5.5.1.1).');
  const nominal = concrete.value + steel;
  return { concrete, steel, steelUnlimited, steelLimit, nominal, design: ACI_SHEAR_PHI * nominal, phi: ACI_SHEAR_PHI, minimumPerLength, meetsMinimum, stirrupYield: fyt, notes };
}
