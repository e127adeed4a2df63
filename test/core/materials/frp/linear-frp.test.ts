import { describe, expect, it } from 'vitest';
import { frpDesignRuptureStrain, linearFrp, validateLinearFrpParameters } from '../../../../core/materials/frp/linear-frp.ts';

// ACI 440.2R-17 9.4: εfu = CE ε*fu; CE = 0.95 for interior exposure, carbon (Table 9.4).
describe('linear FRP', () => {
  const frp = linearFrp({ tensileModulus: 230_000, ruptureStrain: 0.017, environmentalFactor: 0.95 });

  it('reduces the rupture strain by CE', () => {
    expect(frpDesignRuptureStrain({ tensileModulus: 230_000, ruptureStrain: 0.017, environmentalFactor: 0.95 })).toBeCloseTo(0.01615, 15);
    expect(frp.ruptureStrain).toBeCloseTo(0.01615, 15);
  });

  it('is linear in tension up to εfu, zero in compression and after rupture', () => {
    expect(frp.stress(-0.01)).toBeCloseTo(-2300, 9);
    expect(frp.stress(-0.01615)).toBeCloseTo(-3714.5, 9);
    expect(frp.stress(-0.0162)).toBe(0);
    expect(frp.stress(0.002)).toBe(0);
    expect(frp.breakpoints).toEqual([-0.01615, 0]);
    expect(frp.tensileModulus).toBe(230_000);
  });

  it('rejects CE outside (0, 1] and other bad numbers', () => {
    const paths = validateLinearFrpParameters({ tensileModulus: 5, ruptureStrain: 0.2, environmentalFactor: 1.2 }, 'f').map((d) => d.path);
    expect(paths).toEqual(['f.tensileModulus', 'f.ruptureStrain', 'f.environmentalFactor']);
  });
});
