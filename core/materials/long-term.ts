/**
 * Concrete under sustained load: creep by the effective-modulus idea applied to the whole
 * stress–strain law, and free shrinkage as an imposed strain.
 *
 * Total strain (compression positive) ε = (1 + φ)·εσ + εcs, so the stress is σ(ε) = σ₀((ε − εcs)/(1 + φ)),
 * where σ₀ is the short-term law, φ the creep coefficient φ(∞, t0) and εcs the free shrinkage
 * strain (a shortening, hence positive). For a linear law this is exactly the effective modulus
 * Ec,eff = Ec/(1 + φ) of EN 1992-1-1 Eq. (7.20); applying it to the nonlinear curve is common
 * practice, no source.
 */
import type { ConcreteMaterial } from './types.ts';

/**
 * Share of the tension-stiffening stress kept under sustained load: β = 0.5, the factor of EN 1992-1-1
 * Eq. (7.19) for sustained loads or many cycles of repeated loading (β = 1.0 for a single short-term
 * load), applied to the average stress between cracks.
 */
export const SUSTAINED_STIFFENING_FACTOR = 0.5;

/**
 * @param base short-term concrete law
 * @param creepCoefficient φ(∞, t0) ≥ 0 (EN 1992-1-1 3.1.4, Figure 3.1)
 * @param shrinkageStrain free shrinkage εcs ≥ 0 (shortening)
 * A tension-stiffening law keeps SUSTAINED_STIFFENING_FACTOR of its stress once cracked (EN 1992-1-1
 * 7.4.3(3), β = 0.5); a brittle law carries nothing once cracked anyway.
 */
export function sustainedConcrete(base: ConcreteMaterial, creepCoefficient: number, shrinkageStrain: number): ConcreteMaterial {
  const k = 1 + creepCoefficient;
  const shift = shrinkageStrain;
  const map = (e: number) => e * k + shift;
  // Strain of the short-term law below which the concrete is cracked, and the share it keeps there.
  const cracked = -base.crackingStrain;
  const kept = base.tension.model === 'tension-stiffening' ? SUSTAINED_STIFFENING_FACTOR : 1;
  return {
    ...base,
    model: `${base.model}+sustained`,
    label: `${base.label}, sustained (φ = ${creepCoefficient}, εcs = ${(shrinkageStrain * 1000).toFixed(2)} ‰${kept < 1 ? `, β = ${kept}` : ''})`,
    references: [...base.references, 'EN 1992-1-1:2004 Eq. (7.20) (effective modulus)', ...(kept < 1 ? ['EN 1992-1-1:2004 Eq. (7.19) (β for sustained load)'] : [])],
    stress: (e: number) => {
      const s = (e - shift) / k;
      return s < cracked ? kept * base.stress(s) : base.stress(s);
    },
    breakpoints: base.breakpoints.map(map),
    initialModulus: base.initialModulus / k,
    crushingStrain: map(base.crushingStrain),
    ...(base.ultimateStrain ? { ultimateStrain: { ...base.ultimateStrain, value: map(base.ultimateStrain.value) } } : {}),
    peakStrain: map(base.peakStrain),
    crackingStrain: base.crackingStrain * k - shift > 0 ? base.crackingStrain * k - shift : base.crackingStrain * k,
    crackedBelow: map(cracked),
  };
}
