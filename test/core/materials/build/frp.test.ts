import { describe, expect, it } from 'vitest';
import { InputError } from '../../../../core/diagnostics.ts';
import type { FrpSpec } from '../../../../core/materials/specs.ts';
import { buildFrp, validateFrpSpec } from '../../../../core/materials/factory.ts';

const base: FrpSpec = { kind: 'frp', id: 'cfrp', name: 'Carbon laminate', tensileModulus: 165_000, ruptureStrain: 0.017, environmentalFactor: 0.85 };

describe('buildFrp', () => {
  it('applies εfu = CE ε*fu (ACI 440.2R-17 9.4)', () => {
    expect(buildFrp(base).ruptureStrain).toBeCloseTo(0.01445, 15);
  });

  it('validates and throws with every diagnostic', () => {
    const spec = { ...base, kind: 'steel', environmentalFactor: 0, ruptureStrain: Number.NaN } as unknown as FrpSpec;
    expect(validateFrpSpec(spec, 'f').map((d) => d.path)).toEqual(['f.kind', 'f.ruptureStrain', 'f.environmentalFactor']);
    expect(() => buildFrp(spec)).toThrow(InputError);
  });
});
