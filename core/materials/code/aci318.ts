/**
 * ACI 318-19 material defaults. Units: MPa, strain dimensionless, density kg/m³.
 * Each function cites its clause; the US-customary (psi) forms are checked against these in
 * test/references/materials-aci318.test.ts.
 */

/** Modulus of elasticity of reinforcement Es = 200 000 MPa. @see ACI 318-19 20.2.2.2 */
export const ACI_STEEL_MODULUS = 200_000;

/** Maximum usable strain at the extreme concrete compression fibre εcu = 0.003. @see ACI 318-19 22.2.2.1 */
export const ACI_CRUSHING_STRAIN = 0.003;

/** Intensity of the equivalent rectangular stress block, 0.85 f′c. @see ACI 318-19 22.2.2.4.1 */
export const ACI_STRESS_BLOCK_INTENSITY = 0.85;

/**
 * Ec = 4700 √f′c, MPa, for normal-weight concrete (the psi form is 57 000 √f′c).
 * @param fc specified compressive strength f′c, MPa (> 0; ACI 318-19 19.2.1.1 requires ≥ 17 MPa for structural concrete)
 * @returns MPa (a negative or non-finite f′c gives NaN: validate first)
 * @see ACI 318-19 Eq. 19.2.2.1.b
 */
export function aciElasticModulus(fc: number): number {
  return 4700 * Math.sqrt(fc);
}

/**
 * Ec = wc^1.5 · 0.043 √f′c, MPa, for concrete of density wc between 1440 and 2560 kg/m³.
 * @param density wc, kg/m³
 * @param fc f′c, MPa
 * @see ACI 318-19 Eq. 19.2.2.1.a
 */
export function aciElasticModulusFromDensity(density: number, fc: number): number {
  return density ** 1.5 * 0.043 * Math.sqrt(fc);
}

/**
 * Modulus of rupture fr = 0.62 λ √f′c, MPa (psi form 7.5 λ √f′c).
 * @param fc f′c, MPa (> 0)
 * @param lightweightFactor λ, 0.75–1.0 (ACI 318-19 19.2.4; 1.0 for normal-weight concrete)
 * @see ACI 318-19 Eq. 19.2.3.1
 */
export function aciModulusOfRupture(fc: number, lightweightFactor = 1): number {
  return 0.62 * lightweightFactor * Math.sqrt(fc);
}

/**
 * Factor β1 relating the depth of the equivalent rectangular stress block to the neutral-axis depth:
 * 0.85 for 17 ≤ f′c ≤ 28 MPa; 0.85 − 0.05 (f′c − 28)/7 for 28 < f′c < 55 MPa; 0.65 for f′c ≥ 55 MPa.
 * Below 17 MPa (outside the table, e.g. an as-found strength) the 0.85 of row (a) is returned.
 * @param fc f′c, MPa
 * @see ACI 318-19 Table 22.2.2.4.3
 */
export function aciStressBlockDepthFactor(fc: number): number {
  if (fc <= 28) return 0.85;
  if (fc < 55) return 0.85 - (0.05 * (fc - 28)) / 7;
  return 0.65;
}
