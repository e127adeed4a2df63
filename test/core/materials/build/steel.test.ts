import { describe, expect, it } from 'vitest';
import { InputError } from '../../../../core/diagnostics.ts';
import type { SteelSpec } from '../../../../core/materials/specs.ts';
import { buildSteel, validateSteelSpec } from '../../../../core/materials/factory.ts';

const base: SteelSpec = { kind: 'steel', id: 'b500', name: 'Grade 500', model: 'park-paulay', yieldStress: 500, ultimateStress: 600 };

describe('buildSteel', () => {
  it('defaults Es = 200 000 MPa (ACI 318-19 20.2.2.2, EN 1992-1-1 3.2.7(4)), εsh = 0.008, εsu = 0.10', () => {
    const steel = buildSteel(base);
    expect(steel.initialModulus).toBe(200_000);
    expect(steel.hardeningStrain).toBe(0.008);
    expect(steel.ruptureStrain).toBe(0.1);
    expect(steel.model).toBe('park-paulay-1975');
  });

  it('elastic–plastic defaults εsu = 0.05; bilinear defaults εsh = εy', () => {
    expect(buildSteel({ ...base, model: 'elastic-plastic', ultimateStress: 500 }).ruptureStrain).toBe(0.05);
    expect(buildSteel({ ...base, model: 'bilinear' }).hardeningStrain).toBeCloseTo(0.0025, 15);
  });

  it('passes overrides through', () => {
    const steel = buildSteel({ ...base, model: 'mander-power', elasticModulus: 195_000, hardeningStrain: 0.012, ruptureStrain: 0.12, hardeningModulus: 5000 });
    expect(steel.initialModulus).toBe(195_000);
    expect(steel.hardeningStrain).toBe(0.012);
    expect(steel.ruptureStrain).toBe(0.12);
  });
});

describe('validateSteelSpec', () => {
  it('accepts a sound spec', () => {
    expect(validateSteelSpec(base, 's')).toEqual([]);
  });

  it('names field, value and range: fy 200–1000 MPa, fu ≥ fy', () => {
    const diagnostics = validateSteelSpec({ ...base, yieldStress: 150, ultimateStress: 120 }, 'steels[0]');
    expect(diagnostics.map((d) => d.path)).toEqual(['steels[0].yieldStress', 'steels[0].ultimateStress']);
    expect(diagnostics[0]?.message).toBe('steel yield stress fy must be at least 200 MPa and at most 1000 MPa, got 150 MPa');
    expect(diagnostics[1]?.message).toMatch(/fu \(at least fy\) must be at least 150 MPa/);
  });

  it('requires εsh between εy and εsu', () => {
    const diagnostics = validateSteelSpec({ ...base, hardeningStrain: 0.001 }, 's');
    expect(diagnostics.map((d) => d.path)).toEqual(['s.hardeningStrain']);
    expect(diagnostics[0]?.message).toMatch(/between the yield strain εy = 0\.0025 and the rupture strain εsu = 0\.1/);
    expect(validateSteelSpec({ ...base, hardeningStrain: 0.09, ruptureStrain: 0.05 }, 's').map((d) => d.path)).toEqual(['s.hardeningStrain']);
  });

  it('reports NaN, unknown models and identity problems together', () => {
    const spec = { ...base, id: 7, model: 'ramberg', yieldStress: Number.NaN } as unknown as SteelSpec;
    const diagnostics = validateSteelSpec(spec, 's');
    expect(diagnostics.map((d) => d.code).sort()).toEqual(['not-a-number', 'required', 'unknown-option']);
  });

  it('warns when elastic–plastic is given an fu above fy', () => {
    expect(validateSteelSpec({ ...base, model: 'elastic-plastic' }, 's').map((d) => d.severity)).toEqual(['warning']);
  });

  it('buildSteel throws InputError with the diagnostics', () => {
    expect(() => buildSteel({ ...base, ruptureStrain: 0.5 })).toThrow(InputError);
  });
});
