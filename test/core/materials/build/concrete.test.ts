import { describe, expect, it } from 'vitest';
import { InputError } from '../../../../core/diagnostics.ts';
import type { ConcreteSpec, ConfinementInput } from '../../../../core/materials/specs.ts';
import { buildConcrete, resolveConcrete, validateConcreteSpec } from '../../../../core/materials/factory.ts';

const base: ConcreteSpec = { kind: 'concrete', id: 'c30', name: 'Deck concrete', strength: 30, compressionModel: 'hognestad', tensionModel: 'linear-brittle' };
const hoops: ConfinementInput = {
  hoopYieldStress: 420, hoopDiameter: 10, spacing: 100, coreWidth: 300, coreDepth: 500,
  legsX: 2, legsY: 2, clearSpacings: [280, 280, 480, 480], longitudinalRatio: 0.015,
};

describe('code-basis defaults', () => {
  it('ACI 318-19: f′c, Ec = 4700√f′c, fr = 0.62λ√f′c, εcu = 0.003', () => {
    const r = resolveConcrete({ ...base, lightweightFactor: 0.85 }, 'ACI 318-19');
    expect(r.modelStrength).toBe(30);
    expect(r.elasticModulus).toBeCloseTo(4700 * Math.sqrt(30), 9); // ACI 318-19 Eq. 19.2.2.1.b
    expect(r.tensileStrength).toBeCloseTo(0.62 * 0.85 * Math.sqrt(30), 12); // ACI 318-19 Eq. 19.2.3.1
    expect(r.codeCrushingStrain).toBe(0.003); // ACI 318-19 22.2.2.1
  });

  it('EN 1992-1-1: fcm = fck + 8, Ecm, fctm, εcu1 from Table 3.1', () => {
    const r = resolveConcrete(base, 'EN 1992-1-1');
    expect(r.modelStrength).toBe(38);
    expect(r.elasticModulus).toBeCloseTo(22_000 * 3.8 ** 0.3, 9);
    expect(r.tensileStrength).toBeCloseTo(0.3 * 30 ** (2 / 3), 12);
    expect(r.codeCrushingStrain).toBeCloseTo(0.0035, 15);
  });

  it('overrides win over the code basis', () => {
    const r = resolveConcrete({ ...base, elasticModulus: 28_000, tensileStrength: 2.5 }, 'EN 1992-1-1');
    expect(r.elasticModulus).toBe(28_000);
    expect(r.tensileStrength).toBe(2.5);
  });

  it('the built laws use those defaults: Hognestad peaks at 0.85 f′c (ACI) or 0.85 fcm (EN), cracks at fr/Ec', () => {
    const aci = buildConcrete(base, 'ACI 318-19').cover;
    expect(aci.peakStress).toBeCloseTo(25.5, 12);
    expect(aci.crackingStrain).toBeCloseTo((0.62 * Math.sqrt(30)) / (4700 * Math.sqrt(30)), 15);
    const en = buildConcrete(base, 'EN 1992-1-1').cover;
    expect(en.peakStress).toBeCloseTo(0.85 * 38, 12);
  });

  // ACI 318-19 22.2.2.1 (εcu = 0.003); EN 1992-1-1 Table 3.1 (εcu1 = εcu2 = 3.5 ‰ for fck < 50 MPa)
  it.each([
    ['hognestad', 'ACI 318-19', 0.003],
    ['modified-kent-park', 'ACI 318-19', 0.003],
    ['mander', 'ACI 318-19', 0.003],
    ['popovics', 'ACI 318-19', 0.003],
    ['thorenfeldt-collins', 'ACI 318-19', 0.003],
    ['en1992-nonlinear', 'ACI 318-19', 0.003],
    ['en1992-parabola-rectangle', 'ACI 318-19', 0.003],
    ['hognestad', 'EN 1992-1-1', 0.0035],
    ['mander', 'EN 1992-1-1', 0.0035],
    ['popovics', 'EN 1992-1-1', 0.0035],
    ['en1992-parabola-rectangle', 'EN 1992-1-1', 0.0035],
  ] as const)('%s under %s: the code’s εcu = %d by default, a value entered wins', (compressionModel, code, crushing) => {
    const built = buildConcrete({ ...base, compressionModel }, code).cover;
    expect(built.crushingStrain).toBeCloseTo(crushing, 15);
    expect(built.ultimateStrain?.basis).toBe('code');
    const entered = buildConcrete({ ...base, compressionModel, crushingStrain: 0.0036, ultimateStrain: 'law' }, code).cover;
    expect(entered.crushingStrain).toBeCloseTo(0.0036, 15);
    expect(entered.ultimateStrain?.basis).toBe('user');
  });

  it.each([
    // Hognestad (1951): the linear descent ends at 0.0038
    ['hognestad', 0.0038],
    // Scott, Park & Priestley (1982): εcu = 0.004 + 0.9ρs·fyh/300, 0.004 without hoops
    ['modified-kent-park', 0.004],
    // Priestley, Seible & Calvi (1996) εcu = 0.004 + 1.4ρs·fyh·εsu/f′cc, 0.004 without hoops (from memory)
    ['mander', 0.004],
    // EN 1992-1-1 Table 3.1: εcu1 = 3.5 ‰ (nonlinear law), εcu2 = 3.5 ‰ (parabola–rectangle) below 50 MPa
    ['en1992-nonlinear', 0.0035],
    ['en1992-parabola-rectangle', 0.0035],
  ] as const)('%s: the law’s own εcu = %d when asked for, in the spec or as the project default', (compressionModel, crushing) => {
    const bySpec = buildConcrete({ ...base, compressionModel, ultimateStrain: 'law' }, 'ACI 318-19').cover;
    expect(bySpec.crushingStrain).toBeCloseTo(crushing, 15);
    expect(bySpec.ultimateStrain?.basis).toBe('law');
    const byProject = buildConcrete({ ...base, compressionModel }, 'ACI 318-19', undefined, { ultimateStrain: 'law' }).cover;
    expect(byProject.crushingStrain).toBeCloseTo(crushing, 15);
    // The spec's own choice beats the project default.
    expect(buildConcrete({ ...base, compressionModel, ultimateStrain: 'code' }, 'ACI 318-19', undefined, { ultimateStrain: 'law' }).cover.crushingStrain).toBe(0.003);
  });

  it('a law without an ultimate strain of its own falls back to the code value and says so', () => {
    const built = buildConcrete({ ...base, compressionModel: 'popovics', ultimateStrain: 'law' }, 'EN 1992-1-1');
    expect(built.cover.crushingStrain).toBeCloseTo(0.0035, 15);
    expect(built.cover.ultimateStrain?.basis).toBe('code');
    expect(built.diagnostics.map((d) => [d.path, d.severity])).toEqual([['material.ultimateStrain', 'warning']]);
    expect(built.diagnostics[0]?.message).toMatch(/publishes no ultimate strain.*EN 1992-1-1 Table 3\.1 εcu1/);
  });

  it('the EN parabola–rectangle peaks at fck (no γc), the EN nonlinear curve at fcm', () => {
    expect(buildConcrete({ ...base, compressionModel: 'en1992-parabola-rectangle' }, 'EN 1992-1-1').cover.peakStress).toBe(30);
    expect(buildConcrete({ ...base, compressionModel: 'en1992-nonlinear' }, 'EN 1992-1-1').cover.peakStress).toBe(38);
  });

  it('selects the tension law', () => {
    expect(buildConcrete({ ...base, tensionModel: 'none' }, 'ACI 318-19').cover.stress(-1e-5)).toBe(0);
    const stiff = buildConcrete({ ...base, tensionModel: 'tension-stiffening', tensionStiffeningCoefficient: 500 }, 'ACI 318-19').cover;
    // Vecchio & Collins (1986): the law is calibrated on the direct cracking stress fcr = 0.33 √f′c (from memory)
    const fcr = 0.33 * Math.sqrt(30);
    expect(stiff.stress(-0.001)).toBeCloseTo(-fcr / (1 + Math.sqrt(0.5)), 12);
    expect(stiff.tensileStrength).toBeCloseTo(fcr, 12);
    // the brittle law keeps the modulus of rupture, ACI 318-19 Eq. (19.2.3.1): fr = 0.62 λ √f′c
    expect(buildConcrete({ ...base, tensionModel: 'linear-brittle' }, 'ACI 318-19').cover.tensileStrength).toBeCloseTo(0.62 * Math.sqrt(30), 12);
    // EN 1992-1-1 Table 3.1: fctm = 0.30 fck^(2/3) for both laws (C30/37: 2.9 MPa)
    expect(buildConcrete({ ...base, tensionModel: 'tension-stiffening' }, 'EN 1992-1-1').cover.tensileStrength).toBeCloseTo(0.3 * 30 ** (2 / 3), 9);
    // where it acts in a section is the engineer's choice: the effective tension area unless the whole tension zone is asked for
    expect(stiff.tension.stiffeningZone).toBe('effective-area');
    expect(buildConcrete({ ...base, tensionModel: 'tension-stiffening', tensionStiffeningZone: 'tension-zone' }, 'ACI 318-19').cover.tension.stiffeningZone).toBe('tension-zone');
  });
});

describe('confinement', () => {
  it('without confinement there is no core', () => {
    expect(buildConcrete({ ...base, compressionModel: 'mander' }, 'ACI 318-19').core).toBeUndefined();
  });

  it('Mander and Modified Kent–Park build a confined core that is stronger and more ductile than the cover', () => {
    for (const compressionModel of ['mander', 'modified-kent-park'] as const) {
      const built = buildConcrete({ ...base, compressionModel }, 'ACI 318-19', hoops);
      expect(built.core?.confined).toBe(true);
      expect(built.core?.peakStress).toBeGreaterThan(built.cover.peakStress);
      expect(built.core?.crushingStrain).toBeGreaterThan(built.cover.crushingStrain);
      expect(built.core?.tensileStrength).toBe(built.cover.tensileStrength);
      expect(built.diagnostics).toEqual([]);
    }
  });

  it('Modified Kent–Park core: ρs and h″ measured to the outside of the hoops', () => {
    const core = buildConcrete({ ...base, compressionModel: 'modified-kent-park' }, 'ACI 318-19', hoops).core;
    const legArea = (Math.PI * 100) / 4;
    const rhoS = (legArea * (2 * 300 + 2 * 500)) / (100 * 310 * 510);
    expect(core?.peakStress).toBeCloseTo(30 + rhoS * 420, 10); // K f′c = f′c + ρs fyh
    expect(core?.crushingStrain).toBeCloseTo(0.004 + 0.9 * rhoS * (420 / 300), 12);
  });

  it('other models keep the cover law for the core and warn', () => {
    const built = buildConcrete({ ...base, compressionModel: 'popovics' }, 'ACI 318-19', hoops, { path: 'materials[0]' });
    expect(built.core).toBe(built.cover);
    expect(built.diagnostics).toHaveLength(1);
    expect(built.diagnostics[0]).toMatchObject({ severity: 'warning', path: 'materials[0].compressionModel' });
    expect(built.diagnostics[0]?.message).toMatch(/no confinement term/);
  });

  it('reports bad hoop data under the confinement path', () => {
    expect(() => buildConcrete({ ...base, compressionModel: 'mander' }, 'ACI 318-19', { ...hoops, hoopYieldStress: 50 }, { confinementPath: 'sections[1].hoops' })).toThrow(InputError);
    const diagnostics = validateConcreteSpec({ ...base, compressionModel: 'mander' }, 'm', { code: 'ACI 318-19', confinement: { ...hoops, hoopYieldStress: 50 }, confinementPath: 'sections[1].hoops' });
    expect(diagnostics.map((d) => d.path)).toEqual(['sections[1].hoops.hoopYieldStress']);
  });
});

describe('validateConcreteSpec', () => {
  it('accepts a sound spec', () => {
    expect(validateConcreteSpec(base, 'm', { code: 'ACI 318-19' })).toEqual([]);
  });

  it('names the field, the value and the allowed range', () => {
    const [d] = validateConcreteSpec({ ...base, strength: 5 }, 'materials[2]');
    expect(d).toMatchObject({ code: 'out-of-range', path: 'materials[2].strength', severity: 'error' });
    expect(d?.message).toBe('concrete compressive strength must be at least 10 MPa and at most 120 MPa, got 5 MPa');
  });

  it('reports every problem, not only the first', () => {
    const spec = { ...base, id: '', strength: Number.NaN, compressionModel: 'parabola', tensionModel: 'elastic', density: 9000, peakFactor: 2 } as unknown as ConcreteSpec;
    const diagnostics = validateConcreteSpec(spec, 'm', { code: 'ACI 318-19' });
    expect(diagnostics.map((d) => d.path).sort()).toEqual(['m.compressionModel', 'm.density', 'm.id', 'm.peakFactor', 'm.strength', 'm.tensionModel']);
    expect(diagnostics.find((d) => d.path === 'm.strength')?.code).toBe('not-a-number');
    expect(diagnostics.find((d) => d.path === 'm.compressionModel')?.code).toBe('unknown-option');
  });

  it('checks the model’s own validity once defaults are known', () => {
    // Hognestad at f′c = 120 MPa (ACI Ec): ε0 = 2·0.85·120/51 486 = 0.00396, beyond the published end of the descent 0.0038
    expect(validateConcreteSpec({ ...base, strength: 120 }, 'm', { code: 'ACI 318-19' }).map((d) => d.path)).toEqual(['m.elasticModulus']);
    // At f′c = 80 MPa ε0 = 1.7·80/42 038 = 0.00324 lies beyond the code's εcu = 0.003: the law's own 0.0038 is valid
    expect(validateConcreteSpec({ ...base, strength: 80 }, 'm', { code: 'ACI 318-19' }).map((d) => d.path)).toEqual(['m.crushingStrain']);
    expect(validateConcreteSpec({ ...base, strength: 80 }, 'm', { code: 'ACI 318-19', ultimateStrain: 'law' })).toEqual([]);
    // Mander at f′c = 100 MPa (ACI Ec = 47 000 MPa) is below the secant 100/0.002 = 50 000 MPa
    const mander = validateConcreteSpec({ ...base, strength: 100, compressionModel: 'mander' }, 'm', { code: 'ACI 318-19' });
    expect(mander.map((d) => d.path)).toEqual(['m.elasticModulus']);
    expect(mander[0]?.message).toMatch(/secant modulus/);
    // The zone of tension stiffening is one of the listed choices
    expect(validateConcreteSpec({ ...base, tensionModel: 'tension-stiffening', tensionStiffeningZone: 'everywhere' as never }, 'm', { code: 'ACI 318-19' }).map((d) => d.path)).toEqual(['m.tensionStiffeningZone']);
  });

  it('keeps EN 1992-1-1 within Table 3.1: error above 90 MPa, warning below 12 MPa', () => {
    expect(validateConcreteSpec({ ...base, strength: 100 }, 'm', { code: 'EN 1992-1-1' }).map((d) => d.severity)).toEqual(['error']);
    expect(validateConcreteSpec({ ...base, strength: 100, compressionModel: 'en1992-nonlinear' }, 'm', { code: 'ACI 318-19' }).map((d) => d.severity)).toEqual(['error']);
    const low = validateConcreteSpec({ ...base, strength: 10 }, 'm', { code: 'EN 1992-1-1' });
    expect(low.map((d) => d.severity)).toEqual(['warning']);
    expect(buildConcrete({ ...base, strength: 10 }, 'EN 1992-1-1').diagnostics).toHaveLength(1);
  });

  it('warns that λ is ignored under EN 1992-1-1', () => {
    expect(validateConcreteSpec({ ...base, lightweightFactor: 0.8 }, 'm', { code: 'EN 1992-1-1' }).map((d) => d.path)).toEqual(['m.lightweightFactor']);
  });

  it('rejects an unknown code basis', () => {
    expect(validateConcreteSpec(base, 'm', { code: 'BS 8110' as never }).map((d) => d.code)).toEqual(['unknown-option']);
  });

  it('buildConcrete throws an InputError carrying every diagnostic', () => {
    try {
      buildConcrete({ ...base, strength: 200, density: 100 }, 'ACI 318-19');
      expect.unreachable('buildConcrete should have thrown');
    } catch (error) {
      expect(error).toBeInstanceOf(InputError);
      expect((error as InputError).diagnostics.map((d) => d.path).sort()).toEqual(['material.density', 'material.strength']);
    }
  });
});
