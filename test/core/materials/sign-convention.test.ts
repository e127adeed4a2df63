import { describe, expect, it } from 'vitest';
import { BugError } from '../../../core/diagnostics.ts';
import type { UniaxialMaterial } from '../../../core/materials/types.ts';
import type { ConfinementInput, ConcreteSpec } from '../../../core/materials/specs.ts';
import { buildConcrete, buildFrp, buildSteel, CODE_BASES, CONCRETE_COMPRESSION_MODELS, CONCRETE_TENSION_MODELS, STEEL_MODELS } from '../../../core/materials/factory.ts';
import { PROBE_STRAINS } from './support.ts';

// The contract of core/materials/types.ts: strain and stress POSITIVE IN COMPRESSION for every material.

const hoops: ConfinementInput = {
  hoopYieldStress: 420, hoopDiameter: 10, spacing: 100, coreWidth: 240, coreDepth: 440,
  legsX: 2, legsY: 3, clearSpacings: [190, 190, 190, 190, 190, 190], longitudinalRatio: 0.02,
};

function everyMaterial(): [string, UniaxialMaterial][] {
  const out: [string, UniaxialMaterial][] = [];
  for (const code of CODE_BASES) {
    for (const compressionModel of CONCRETE_COMPRESSION_MODELS) {
      for (const tensionModel of CONCRETE_TENSION_MODELS) {
        const spec: ConcreteSpec = { kind: 'concrete', id: 'c', name: 'C', strength: 35, compressionModel, tensionModel };
        const built = buildConcrete(spec, code, hoops);
        out.push([`${code} ${compressionModel}+${tensionModel} cover`, built.cover]);
        if (built.core && built.core !== built.cover) out.push([`${code} ${compressionModel}+${tensionModel} core`, built.core]);
      }
    }
  }
  for (const model of STEEL_MODELS) {
    out.push([`steel ${model}`, buildSteel({ kind: 'steel', id: 's', name: 'S', model, yieldStress: 500, ultimateStress: model === 'elastic-plastic' ? 500 : 600 })]);
  }
  out.push(['frp', buildFrp({ kind: 'frp', id: 'f', name: 'F', tensileModulus: 230_000, ruptureStrain: 0.017, environmentalFactor: 0.95 })]);
  return out;
}

describe('sign convention: compression positive for every material', () => {
  const materials = everyMaterial();

  it('covers every concrete model under both code bases, every steel model and FRP', () => {
    // 2 codes × 7 models × 3 tension laws covers, + confined cores for 2 models, + 4 steels + FRP
    expect(materials.length).toBe(2 * 7 * 3 + 2 * 2 * 3 + 4 + 1);
  });

  it.each(materials)('%s: the stress has the sign of the strain (or is zero)', (_, material) => {
    for (const strain of PROBE_STRAINS) {
      const stress = material.stress(strain);
      if (stress !== 0) expect(Math.sign(stress), `strain ${strain}`).toBe(Math.sign(strain));
    }
  });

  it.each(materials)('%s: zero stress at zero strain, and never −0', (_, material) => {
    expect(Object.is(material.stress(0), 0)).toBe(true);
    for (const strain of PROBE_STRAINS) expect(Object.is(material.stress(strain), -0), `strain ${strain}`).toBe(false);
  });

  it.each(materials)('%s: finite at every strain, and zero at huge strains and ±Infinity', (_, material) => {
    for (const strain of PROBE_STRAINS) expect(Number.isFinite(material.stress(strain)), `strain ${strain}`).toBe(true);
    for (const strain of [1e6, -1e6, Number.MAX_VALUE, -Number.MAX_VALUE, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY]) {
      expect(material.stress(strain), `strain ${strain}`).toBe(0);
    }
  });

  it.each(materials)('%s: stress(NaN) throws a BugError instead of returning a number', (_, material) => {
    expect(() => material.stress(Number.NaN)).toThrow(BugError);
  });

  it.each(materials)('%s: breakpoints are finite, strictly ascending, and the initial modulus is positive', (_, material) => {
    const b = material.breakpoints;
    for (let i = 1; i < b.length; i++) expect(b[i]).toBeGreaterThan(b[i - 1] as number);
    for (const s of b) expect(Number.isFinite(s)).toBe(true);
    expect(material.initialModulus).toBeGreaterThan(0);
    expect(material.references.length + material.label.length).toBeGreaterThan(0);
  });

  it('concrete is stronger in compression than in tension; steel is symmetric; FRP works in tension only', () => {
    const concrete = buildConcrete({ kind: 'concrete', id: 'c', name: 'C', strength: 30, compressionModel: 'hognestad', tensionModel: 'linear-brittle' }, 'ACI 318-19').cover;
    expect(concrete.stress(0.002)).toBeGreaterThan(20);
    expect(concrete.stress(-0.0001)).toBeLessThan(0);
    expect(concrete.stress(-0.0001)).toBeGreaterThan(-4);
    const steel = buildSteel({ kind: 'steel', id: 's', name: 'S', model: 'park-paulay', yieldStress: 420, ultimateStress: 620 });
    for (const strain of [0.001, 0.005, 0.03, 0.09]) expect(steel.stress(-strain)).toBe(-steel.stress(strain));
    const frp = buildFrp({ kind: 'frp', id: 'f', name: 'F', tensileModulus: 230_000, ruptureStrain: 0.017, environmentalFactor: 0.95 });
    expect(frp.stress(0.001)).toBe(0);
    expect(frp.stress(-0.001)).toBeCloseTo(-230, 9);
  });
});
