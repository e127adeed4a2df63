/**
 * Bar rupture ends a moment–curvature curve as its ultimate (issue 10 item 5): a lightly reinforced
 * section whose bars reach their rupture strain must not go on to a spurious "equilibrium" in which
 * the section carries nothing, nor lose the located ultimate to a failed moment-drop search.
 * Property test over random lightly reinforced rectangles (ρ from below the minimum to 0.5 %,
 * rupture strains 0.01–0.15).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { materialLibrary } from '../../../core/materials/library.ts';
import type { ConcreteSpec, MaterialSpec, SteelSpec } from '../../../core/materials/specs.ts';
import { analyzeSection } from '../../../core/section/analyze.ts';
import { sectionForces } from '../../../core/section/forces.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import { CONCRETE_COMPRESSION_MODELS, CONCRETE_TENSION_MODELS } from '../../../core/materials/specs.ts';

interface Case {
  width: number;
  height: number;
  fc: number;
  rho: number;
  diameter: number;
  ruptureStrain: number;
  hardening: boolean;
  compression: ConcreteSpec['compressionModel'];
  tension: ConcreteSpec['tensionModel'];
}

function analyse(c: Case) {
  const d = c.height - 40 - c.diameter / 2;
  const barArea = (Math.PI * c.diameter ** 2) / 4;
  const count = Math.max(1, Math.round((c.rho * c.width * d) / barArea));
  const steel: SteelSpec = c.hardening
    ? { kind: 'steel', id: 's', name: 's', model: 'park-paulay', yieldStress: 500, ultimateStress: 560, hardeningStrain: Math.min(0.008, c.ruptureStrain / 2), ruptureStrain: c.ruptureStrain }
    : { kind: 'steel', id: 's', name: 's', model: 'elastic-plastic', yieldStress: 500, ultimateStress: 500, ruptureStrain: c.ruptureStrain };
  const concrete: ConcreteSpec = { kind: 'concrete', id: 'c', name: 'c', strength: c.fc, compressionModel: c.compression, tensionModel: c.tension };
  const specs: MaterialSpec[] = [concrete, steel];
  const section: SectionDefinition = { id: 'r', name: 'strip', shape: { kind: 'rectangle', width: c.width, height: c.height }, concreteId: 'c', bars: [{ steelId: 's', depth: d, count, diameter: c.diameter }] };
  const analysis = analyzeSection(section, 'sections[0]', materialLibrary(specs, 'EN 1992-1-1'), { code: 'EN 1992-1-1', momentDropFraction: 0.8, bilinearMethod: 'priestley-2007' });
  return { analysis, rho: (count * barArea) / (c.width * d) };
}

const cases = fc.record<Case>({
  width: fc.integer({ min: 300, max: 1000 }),
  height: fc.integer({ min: 150, max: 600 }),
  fc: fc.integer({ min: 20, max: 50 }),
  // EN 1992-1-1 9.2.1.1: ρmin = 0.26 fctm/fyk ≈ 0.12–0.21 % for C20–C50 and B500; from a third of it
  rho: fc.double({ min: 0.0004, max: 0.005, noNaN: true }),
  diameter: fc.constantFrom(8, 10, 12, 16),
  ruptureStrain: fc.double({ min: 0.01, max: 0.15, noNaN: true }),
  hardening: fc.boolean(),
  compression: fc.constantFrom(...CONCRETE_COMPRESSION_MODELS),
  tension: fc.constantFrom(...CONCRETE_TENSION_MODELS),
});

describe('bar rupture ends the curve (property)', () => {
  it('every curve of a lightly reinforced section completes, and every point carries load', () => {
    fc.assert(
      fc.property(cases, (c) => {
        const { analysis } = analyse(c);
        const model = analysis.model!;
        expect(analysis.errors).toEqual([]);
        const curve = analysis.curves.sagging!;
        expect(curve.status.kind).toBe('complete');
        const u = curve.keyPoints.ultimate!;
        expect(u.moment).toBeGreaterThan(0);
        expect(Number.isFinite(u.curvature)).toBe(true);
        for (const p of curve.points) {
          if (p.curvature === 0) continue;
          // the section carries something at every accepted equilibrium: a compression and a tension resultant
          expect(p.moment).toBeGreaterThan(0);
          expect(sectionForces(model, p.referenceStrain, p.curvature).magnitude).toBeGreaterThan(0);
        }
        if (curve.status.kind === 'complete' && curve.status.ultimateCause === 'steel-rupture') {
          // located at the rupture strain of the bars, the last point of the curve
          expect(u.maxSteelTensileStrain).toBeCloseTo(c.ruptureStrain, 6);
          expect(curve.points.at(-1)!.curvature).toBeCloseTo(u.curvature, 12);
        }
      }),
      { numRuns: 60, seed: 20261203 },
    );
  }, 240_000);

  it('the issue\'s strip: 1000 × 200, C25, Ø10 at ρ = 0.15 %, εsu = 0.012 and 0.08: Mu, φu and μφ exist, cause rupture', () => {
    for (const ruptureStrain of [0.012, 0.08]) {
      const { analysis, rho } = analyse({ width: 1000, height: 200, fc: 25, rho: 0.0015, diameter: 10, ruptureStrain, hardening: true, compression: 'en1992-nonlinear', tension: 'tension-stiffening' });
      expect(rho).toBeCloseTo(0.0015, 3);
      const curve = analysis.curves.sagging!;
      expect(curve.status.kind === 'complete' && curve.status.ultimateCause).toBe('steel-rupture');
      expect(curve.keyPoints.ultimate!.moment).toBeGreaterThan(0);
      expect(curve.curvatureDuctility).not.toBeNull();
      expect(curve.keyPoints.ultimate!.maxSteelTensileStrain).toBeCloseTo(ruptureStrain, 6);
    }
  });
});
