/**
 * A section model with its materials swapped (sustained-load concrete, design laws), geometry
 * unchanged.
 */
import type { ConcreteMaterial, UniaxialMaterial } from '../materials/types.ts';
import type { SectionModel } from './model.ts';

export function withMaterials(
  model: SectionModel,
  concrete: (material: ConcreteMaterial) => ConcreteMaterial,
  steel: (material: UniaxialMaterial) => UniaxialMaterial = (m) => m,
): SectionModel {
  const cache = new Map<ConcreteMaterial, ConcreteMaterial>();
  const mapConcrete = (m: ConcreteMaterial) => {
    let out = cache.get(m);
    if (!out) {
      out = concrete(m);
      cache.set(m, out);
    }
    return out;
  };
  return {
    ...model,
    concreteParts: model.concreteParts.map((p) => ({ ...p, material: mapConcrete(p.material) })),
    elements: model.elements.map((e) => {
      const material = e.kind === 'frp' ? e.material : steel(e.material);
      return {
        ...e,
        material,
        ...(e.kind !== 'frp' && material.ruptureStrain !== undefined ? { limitStrain: material.ruptureStrain } : {}),
        displacedConcrete: e.displacedConcrete ? mapConcrete(e.displacedConcrete) : null,
      };
    }),
  };
}
