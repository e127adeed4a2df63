/**
 * The stress–strain laws the codes prescribe for a section's design flexural resistance, whatever
 * laws the engineer chose for the section's behaviour. Every concrete law carries no tension.
 * Units: MPa, strains dimensionless (compression positive, core/materials/types.ts).
 *
 *  - ACI 318-19 22.2: εcu = 0.003 at the extreme compression fibre (22.2.2.1), the equivalent
 *    rectangular stress block 0.85 f′c over a = β1·c (22.2.2.4.1, Table 22.2.2.4.3), no concrete
 *    tension (22.2.2.2), steel stress Es·εs but not above fy (20.2.2.1, no strain hardening).
 *  - ACI 440.2R-17 10.2.10: when the FRP limit is reached before εcu, the block of the parabola
 *    with ε′c = 1.7 f′c/Ec (Eqs. 10.2.5a,b) — integrated here as that parabola itself.
 *  - EN 1992-1-1 3.1.7: the parabola–rectangle of Table 3.1 for the part's own fck with
 *    fcd = αcc·fck/γc (3.1.6(1): αcc = 1.0, γc = 1.5 of Table 2.1N); steel per 3.2.7(2)b: horizontal
 *    top branch at fyd = fyk/γs (γs = 1.15) with no strain limit, Es = 200 GPa (3.2.7(4)).
 */
import { noTension } from '../concrete/tension.ts';
import { combineConcrete } from '../concrete/combine.ts';
import { compressionLaw } from '../concrete/compression-law.ts';
import { en1992ParabolaRectangleCompression } from '../concrete/en1992-parabola-rectangle.ts';
import { symmetricSteel } from '../steel/symmetric-steel.ts';
import type { ConcreteMaterial, SteelMaterial } from '../types.ts';
import { ACI_CRUSHING_STRAIN, ACI_STEEL_MODULUS, ACI_STRESS_BLOCK_INTENSITY, aciElasticModulus, aciStressBlockDepthFactor } from './aci318.ts';

/** Partial factors and αcc of the EN 1992-1-1 design laws (Table 2.1N, 3.1.6(1) recommended value). */
export const EN1992_CONCRETE_FACTOR = 1.5;
export const EN1992_STEEL_FACTOR = 1.15;
export const EN1992_ALPHA_CC = 1.0;

/**
 * The ACI 318-19 rectangular stress block as a stress–strain law: 0.85 f′c where the strain is at
 * least εcu·(1 − β1), zero below. With the extreme fibre at εcu = 0.003 this is exactly the block of
 * depth a = β1·c (22.2.2.4.1); at any other extreme strain it is not a code law.
 * @param fc f′c of the part's concrete, MPa
 */
export function aciStressBlock(fc: number): ConcreteMaterial {
  const beta1 = aciStressBlockDepthFactor(fc);
  const edge = ACI_CRUSHING_STRAIN * (1 - beta1);
  const stress = ACI_STRESS_BLOCK_INTENSITY * fc;
  return combineConcrete(
    compressionLaw({
      model: 'aci-stress-block',
      label: `ACI 318-19 22.2.2.4 rectangular stress block (0.85 f′c over β1·c, β1 = ${beta1.toFixed(3)})`,
      references: ['ACI 318-19 22.2.2.4.1, Table 22.2.2.4.3'],
      curve: (strain) => (strain >= edge ? stress : 0),
      // Beyond εcu the block is not defined; the design solver never strains concrete further.
      endStrain: 1,
      breakpoints: [edge],
      initialModulus: aciElasticModulus(fc),
      peakStress: stress,
      peakStrain: edge,
      crushingStrain: ACI_CRUSHING_STRAIN,
      confined: false,
    }),
    noTension(),
  );
}

/**
 * The concrete parabola behind ACI 440.2R-17 Eqs. 10.2.5a,b (the stress block of a section whose FRP
 * governs before εcu): σ = f′c·[2ε/ε′c − (ε/ε′c)²], ε′c = 1.7 f′c/Ec with Ec = 4700√f′c (ACI 318-19
 * 19.2.2.1b), for ε up to εcu = 0.003. Its α1 and β1 over 0…εc are exactly Eqs. 10.2.5a,b.
 * @param fc f′c, MPa
 */
export function aciFrpParabola(fc: number): ConcreteMaterial {
  const peakStrain = (1.7 * fc) / aciElasticModulus(fc);
  return combineConcrete(
    compressionLaw({
      model: 'aci-440-parabola',
      label: 'ACI 440.2R-17 10.2.10 parabola (ε′c = 1.7 f′c/Ec)',
      references: ['ACI 440.2R-17 Eqs. 10.2.5a,b'],
      curve: (strain) => fc * (2 * (strain / peakStrain) - (strain / peakStrain) ** 2),
      endStrain: 1,
      breakpoints: [peakStrain],
      initialModulus: (2 * fc) / peakStrain,
      peakStress: fc,
      peakStrain,
      crushingStrain: ACI_CRUSHING_STRAIN,
      confined: false,
    }),
    noTension(),
  );
}

/**
 * EN 1992-1-1 design concrete: the parabola–rectangle (3.1.7, Table 3.1 constants of the part's own
 * fck) at fcd = αcc·fck/γc, no tension. Its end strain εcu2 is the part's crushing limit.
 * @param fck the part's characteristic (or in-place) strength, MPa
 */
export function enDesignConcrete(fck: number): ConcreteMaterial {
  return combineConcrete(en1992ParabolaRectangleCompression({ strength: (EN1992_ALPHA_CC * fck) / EN1992_CONCRETE_FACTOR, characteristicStrength: Math.min(fck, 90) }), noTension());
}

/**
 * Design steel: elastic (Es = 200 GPa, ACI 318-19 20.2.2.2 / EN 1992-1-1 3.2.7(4)) and perfectly
 * plastic at `yieldStress` (fy, or fyd = fyk/γs), symmetric, with no strain limit (ACI 318-19
 * sets none; EN 1992-1-1 3.2.7(2)b "without the need to check the strain limit").
 */
export function designSteel(yieldStress: number): SteelMaterial {
  // Both codes: 200 GPa.
  const modulus = ACI_STEEL_MODULUS;
  return symmetricSteel({
    model: 'design-elastic-plastic',
    label: 'Design steel: elastic–perfectly plastic at fy, no strain limit',
    references: ['ACI 318-19 20.2.2.1', 'EN 1992-1-1 3.2.7(2)b'],
    elasticModulus: modulus,
    yieldStress,
    ultimateStress: yieldStress,
    hardeningStrain: yieldStress / modulus,
    ruptureStrain: Number.POSITIVE_INFINITY,
    postYield: () => yieldStress,
  });
}
