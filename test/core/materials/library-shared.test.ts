/**
 * Built materials are shared between material libraries (core/materials/library.ts): the app's
 * worker makes a new library for every edit, and rebuilding the same laws (and refitting their
 * integration tables) was about a third of re-analysing a section. Sharing must never hand out a
 * material built from other inputs: everything the build reads is part of the key.
 */
import { describe, expect, it } from 'vitest';
import { materialLibrary } from '../../../core/materials/library.ts';
import type { ConcreteSpec, ConfinementInput, SteelSpec } from '../../../core/materials/specs.ts';

const concrete: ConcreteSpec = { kind: 'concrete', id: 'c', name: 'C30', strength: 30, compressionModel: 'hognestad', tensionModel: 'none' };
const steel: SteelSpec = { kind: 'steel', id: 's', name: 'B500', model: 'elastic-plastic', yieldStress: 500, ultimateStress: 500, ruptureStrain: 0.05 };
const hoops: ConfinementInput = { hoopYieldStress: 500, hoopDiameter: 10, spacing: 100, coreWidth: 250, coreDepth: 450, legsX: 2, legsY: 2, clearSpacings: [180, 180, 380, 380], longitudinalRatio: 0.015 };

describe('built materials shared between libraries', () => {
  it('the same spec, code, settings and place in the list give the same built law, in a new library', () => {
    const a = materialLibrary([concrete, steel], 'EN 1992-1-1');
    const b = materialLibrary(structuredClone([concrete, steel]), 'EN 1992-1-1');
    expect(b.concrete('c')!.cover).toBe(a.concrete('c')!.cover);
    expect(b.steel('s')).toBe(a.steel('s'));
  });

  it('anything the build reads gives another law: the spec, the code, the ultimate-strain setting, the place in the list', () => {
    const base = materialLibrary([concrete, steel], 'ACI 318-19').concrete('c')!.cover;
    const stronger = materialLibrary([{ ...concrete, strength: 35 }, steel], 'ACI 318-19').concrete('c')!.cover;
    expect(stronger).not.toBe(base);
    expect(stronger.peakStress).toBeGreaterThan(base.peakStress);
    expect(materialLibrary([concrete, steel], 'EN 1992-1-1').concrete('c')!.cover).not.toBe(base);
    const law = materialLibrary([concrete, steel], 'ACI 318-19', { concreteUltimateStrain: 'law' }).concrete('c')!.cover;
    expect(law).not.toBe(base);
    // Hognestad (1951): the law's own ultimate strain 0.0038; ACI 318-19 22.2.2.1: 0.003
    expect(law.crushingStrain).toBeCloseTo(0.0038, 12);
    expect(base.crushingStrain).toBeCloseTo(0.003, 12);
    // Messages name the material's place in the project file, so the place is part of the key.
    expect(materialLibrary([steel, concrete], 'ACI 318-19').concrete('c')!.cover).not.toBe(base);
    expect(materialLibrary([{ ...steel, yieldStress: 420, ultimateStress: 420 }, concrete], 'ACI 318-19').steel('s')).not.toBe(materialLibrary([steel, concrete], 'ACI 318-19').steel('s'));
  });

  it('a confined core is built per confinement', () => {
    const lib = materialLibrary([{ ...concrete, compressionModel: 'mander' }, steel], 'EN 1992-1-1');
    const one = lib.concrete('c', hoops);
    const other = materialLibrary([{ ...concrete, compressionModel: 'mander' }, steel], 'EN 1992-1-1').concrete('c', { ...hoops, spacing: 150 });
    // Mander, Priestley & Park (1988): confinement raises the core's strength above the cover's, less so for wider hoop spacing.
    expect(one!.core!.peakStress).toBeGreaterThan(one!.cover.peakStress);
    expect(other!.core!.peakStress).toBeGreaterThan(other!.cover.peakStress);
    expect(other!.core).not.toBe(one!.core);
    expect(other!.core!.peakStress).toBeLessThan(one!.core!.peakStress);
  });

  it('keeps a bounded number: after 64 other concretes the first is built again', () => {
    const first = materialLibrary([concrete], 'EN 1992-1-1').concrete('c')!.cover;
    for (let i = 0; i < 70; i++) materialLibrary([{ ...concrete, strength: 20 + i / 8 }], 'EN 1992-1-1').concrete('c');
    const again = materialLibrary([concrete], 'EN 1992-1-1').concrete('c')!.cover;
    expect(again).not.toBe(first);
    expect(again.peakStress).toBe(first.peakStress);
  });

  it('a spec that fails to build is reported by every library that asks, never remembered as built', () => {
    const broken: ConcreteSpec = { ...concrete, strength: -5 };
    for (let i = 0; i < 2; i++) {
      const lib = materialLibrary([broken], 'EN 1992-1-1');
      expect(lib.concrete('c')).toBeUndefined();
      expect(lib.problems.some((p) => p.severity === 'error' && p.path.startsWith('materials[0]'))).toBe(true);
    }
  });
});
