/**
 * EN 1992-1-1:2004 concrete and steel properties from the characteristic cylinder strength fck
 * (Table 3.1). Units: MPa; strains are returned dimensionless (Table 3.1 prints them in ‰).
 * Table 3.1 covers fck from 12 to 90 MPa; outside that range these expressions are extrapolations
 * (the ≥ 50 MPa strain expressions turn back above 90 MPa) and callers must validate first.
 */

/** Design value of the modulus of elasticity of reinforcing steel Es = 200 GPa, in MPa. @see EN 1992-1-1 3.2.7(4) */
export const EN1992_STEEL_MODULUS = 200_000;

/** Mean compressive strength fcm = fck + 8 MPa. @see EN 1992-1-1 Table 3.1 */
export function en1992MeanStrength(fck: number): number {
  return fck + 8;
}

/**
 * Mean axial tensile strength fctm, MPa: 0.30 fck^(2/3) up to C50/60, 2.12 ln(1 + fcm/10) above.
 * @see EN 1992-1-1 Table 3.1
 */
export function en1992MeanTensileStrength(fck: number): number {
  return fck <= 50 ? 0.3 * fck ** (2 / 3) : 2.12 * Math.log(1 + en1992MeanStrength(fck) / 10);
}

/** Lower characteristic tensile strength fctk,0.05 = 0.7 fctm, MPa. @see EN 1992-1-1 Table 3.1 */
export function en1992LowerTensileStrength(fck: number): number {
  return 0.7 * en1992MeanTensileStrength(fck);
}

/** Upper characteristic tensile strength fctk,0.95 = 1.3 fctm, MPa. @see EN 1992-1-1 Table 3.1 */
export function en1992UpperTensileStrength(fck: number): number {
  return 1.3 * en1992MeanTensileStrength(fck);
}

/**
 * Mean flexural tensile strength fctm,fl = max{(1.6 − h/1000) fctm; fctm}, MPa.
 * @param fck MPa
 * @param depth total member depth h, mm (> 0)
 * @see EN 1992-1-1 Eq. (3.23), 3.1.8(1)
 */
export function en1992FlexuralTensileStrength(fck: number, depth: number): number {
  const fctm = en1992MeanTensileStrength(fck);
  return Math.max((1.6 - depth / 1000) * fctm, fctm);
}

/** Secant modulus of elasticity Ecm = 22 (fcm/10)^0.3 GPa, returned in MPa (quartzite aggregate). @see EN 1992-1-1 Table 3.1 */
export function en1992ElasticModulus(fck: number): number {
  return 22_000 * (en1992MeanStrength(fck) / 10) ** 0.3;
}

/** Strain at peak stress for the nonlinear analysis curve εc1 = 0.7 fcm^0.31 ‰ ≤ 2.8 ‰ (dimensionless). @see EN 1992-1-1 Table 3.1 */
export function en1992PeakStrain(fck: number): number {
  return Math.min(0.7 * en1992MeanStrength(fck) ** 0.31, 2.8) / 1000;
}

/** Nominal ultimate strain εcu1: 3.5 ‰ below 50 MPa, 2.8 + 27 [(98 − fcm)/100]^4 ‰ from 50 MPa. @see EN 1992-1-1 Table 3.1 */
export function en1992UltimateStrainNonlinear(fck: number): number {
  const permille = fck < 50 ? 3.5 : 2.8 + 27 * ((98 - en1992MeanStrength(fck)) / 100) ** 4;
  return permille / 1000;
}

/** Strain at the end of the parabola εc2: 2.0 ‰ below 50 MPa, 2.0 + 0.085 (fck − 50)^0.53 ‰ from 50 MPa. @see EN 1992-1-1 Table 3.1 */
export function en1992ParabolaPeakStrain(fck: number): number {
  const permille = fck < 50 ? 2.0 : 2.0 + 0.085 * (fck - 50) ** 0.53;
  return permille / 1000;
}

/** Ultimate strain of the parabola–rectangle εcu2: 3.5 ‰ below 50 MPa, 2.6 + 35 [(90 − fck)/100]^4 ‰ from 50 MPa. @see EN 1992-1-1 Table 3.1 */
export function en1992ParabolaUltimateStrain(fck: number): number {
  const permille = fck < 50 ? 3.5 : 2.6 + 35 * ((90 - fck) / 100) ** 4;
  return permille / 1000;
}

/** Exponent of the parabola n: 2.0 below 50 MPa, 1.4 + 23.4 [(90 − fck)/100]^4 from 50 MPa. @see EN 1992-1-1 Table 3.1 */
export function en1992ParabolaExponent(fck: number): number {
  return fck < 50 ? 2.0 : 1.4 + 23.4 * ((90 - fck) / 100) ** 4;
}

/** The Table 3.1 column for one fck. Stresses and moduli in MPa, strains dimensionless. */
export interface En1992ConcreteProperties {
  readonly fck: number;
  readonly fcm: number;
  readonly fctm: number;
  readonly fctk005: number;
  readonly fctk095: number;
  readonly Ecm: number;
  readonly epsC1: number;
  readonly epsCu1: number;
  readonly epsC2: number;
  readonly epsCu2: number;
  readonly n: number;
}

/**
 * Every Table 3.1 property for one characteristic strength.
 * @param fck MPa, 12–90 (Table 3.1 range)
 * @see EN 1992-1-1 Table 3.1
 */
export function en1992ConcreteProperties(fck: number): En1992ConcreteProperties {
  return {
    fck,
    fcm: en1992MeanStrength(fck),
    fctm: en1992MeanTensileStrength(fck),
    fctk005: en1992LowerTensileStrength(fck),
    fctk095: en1992UpperTensileStrength(fck),
    Ecm: en1992ElasticModulus(fck),
    epsC1: en1992PeakStrain(fck),
    epsCu1: en1992UltimateStrainNonlinear(fck),
    epsC2: en1992ParabolaPeakStrain(fck),
    epsCu2: en1992ParabolaUltimateStrain(fck),
    n: en1992ParabolaExponent(fck),
  };
}
