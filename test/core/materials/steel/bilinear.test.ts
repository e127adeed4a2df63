import { describe, expect, it } from 'vitest';
import { bilinearSteel, validateBilinearSteelParameters } from '../../../../core/materials/steel/bilinear.ts';
import { jumpAt } from '../support.ts';

// EN 1992-1-1 3.2.7(2) a), Figure 3.8: inclined top branch from fy at εy to fu at the limit strain.
describe('bilinear steel', () => {
  const p = { elasticModulus: 200_000, yieldStress: 500, ultimateStress: 540, ruptureStrain: 0.05 };
  const steel = bilinearSteel(p);
  const Esh = (540 - 500) / (0.05 - 0.0025);

  it('hardens linearly from fy at εy to fu at εsu by default', () => {
    expect(steel.stress(0.0025)).toBeCloseTo(500, 10);
    expect(steel.stress(0.02)).toBeCloseTo(500 + Esh * (0.02 - 0.0025), 10);
    expect(steel.stress(0.05)).toBeCloseTo(540, 10);
    expect(steel.stress(-0.02)).toBeCloseTo(-(500 + Esh * 0.0175), 10);
    expect(jumpAt((e) => steel.stress(e), 0.0025)).toBeLessThan(1e-6);
  });

  it('can have a yield plateau before hardening starts', () => {
    const plateau = bilinearSteel({ ...p, hardeningStrain: 0.01 });
    expect(plateau.stress(0.008)).toBe(500);
    expect(plateau.stress(0.05)).toBeCloseTo(540, 10);
    expect(plateau.breakpoints).toEqual([-0.05, -0.01, -0.0025, 0.0025, 0.01, 0.05]);
  });

  it('caps a steep given Esh at fu and adds a breakpoint where the cap starts', () => {
    const steep = bilinearSteel({ ...p, hardeningModulus: 4000 });
    const cap = 0.0025 + 40 / 4000;
    expect(steep.stress(0.03)).toBe(540);
    expect(steep.breakpoints).toContain(cap);
  });

  it('warns when a given Esh cannot reach fu by εsu, and reports the stress actually reached', () => {
    const diagnostics = validateBilinearSteelParameters({ ...p, hardeningModulus: 100 });
    expect(diagnostics.map((d) => d.severity)).toEqual(['warning']);
    const flat = bilinearSteel({ ...p, hardeningModulus: 100 });
    expect(flat.ultimateStress).toBeCloseTo(500 + 100 * 0.0475, 10);
  });
});
