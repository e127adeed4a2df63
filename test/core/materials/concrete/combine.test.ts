import { describe, expect, it } from 'vitest';
import { combineConcrete } from '../../../../core/materials/concrete/combine.ts';
import { hognestadCompression } from '../../../../core/materials/concrete/hognestad.ts';
import { tensionStiffening } from '../../../../core/materials/concrete/tension.ts';
import { manderConfinedCompression } from '../../../../core/materials/concrete/mander.ts';

describe('combineConcrete', () => {
  const Ec = 25_000;
  const compression = hognestadCompression({ compressiveStrength: 30, elasticModulus: Ec });
  const tension = tensionStiffening({ tensileStrength: 3, elasticModulus: Ec });
  const concrete = combineConcrete(compression, tension);

  it('gives compression for positive strain and negated tension for negative strain', () => {
    expect(concrete.stress(0.001)).toBe(compression.stress(0.001));
    expect(concrete.stress(-0.0001)).toBe(-tension.stress(0.0001));
    expect(concrete.stress(-0.001)).toBeLessThan(0);
  });

  it('merges breakpoints: tension ones negated, zero, then compression ones, ascending', () => {
    expect(concrete.breakpoints).toEqual([-0.005, -0.004, -3 / Ec, 0, compression.peakStrain, 0.0038]);
  });

  it('carries crushing strain, peak and tensile strength from its parts', () => {
    expect(concrete.crushingStrain).toBe(0.0038);
    expect(concrete.peakStress).toBe(compression.peakStress);
    expect(concrete.peakStrain).toBe(compression.peakStrain);
    expect(concrete.tensileStrength).toBe(3);
    expect(concrete.crackingStrain).toBeCloseTo(3 / Ec, 15);
    expect(concrete.initialModulus).toBe(compression.initialModulus);
    expect(concrete.model).toBe('hognestad+tension-stiffening');
    expect(concrete.references).toEqual([...compression.references, ...tension.references]);
    expect(concrete.confined).toBe(false);
  });

  it('marks a confined core as confined', () => {
    const core = combineConcrete(manderConfinedCompression({ compressiveStrength: 30, confinedStrength: 40, crushingStrain: 0.02 }), tension);
    expect(core.confined).toBe(true);
    expect(core.crushingStrain).toBe(0.02);
  });
});
