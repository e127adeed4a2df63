/**
 * One answer to "does the section fail as it cracks?" for the section's warnings and the member's
 * brittle findings (core/section/cracking-strength.ts). The moment the load must fall from is the
 * largest moment before the tension steel yields — with a tension-stiffening law the section keeps
 * gaining moment after its extreme fibre cracks — not only the moment at the first crack.
 */
import { describe, expect, it } from 'vitest';
import { materialLibrary } from '../../../core/materials/library.ts';
import type { ConcreteSpec, MaterialSpec, SteelSpec } from '../../../core/materials/specs.ts';
import { analyzeSection } from '../../../core/section/analyze.ts';
import { crackingStrength } from '../../../core/section/cracking-strength.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import type { CurvePoint, KeyPoint, KeyPointName } from '../../../core/section/results.ts';

/** A curve from (curvature 1/mm, moment kN·m) pairs and the indices of its key points. */
function curve(pairs: [number, number][], keys: Partial<Record<KeyPointName, number>>) {
  const points = pairs.map(([curvature, m]) => ({ curvature, moment: m * 1e6 }) as CurvePoint);
  const keyPoints: Partial<Record<KeyPointName, KeyPoint>> = {};
  for (const [name, i] of Object.entries(keys) as [KeyPointName, number][]) keyPoints[name] = { ...points[i]!, name } as KeyPoint;
  return { points, keyPoints };
}

describe('fails as it cracks (shared by section warnings and brittle findings)', () => {
  it('a hump after the first crack above everything after yield fails, although the crack moment alone is below it', () => {
    // cracking 50, hump 70, first yield 45, largest after yield 60 kN·m
    const c = curve([[0, 0], [1e-6, 50], [2e-6, 70], [4e-6, 55], [6e-6, 45], [2e-5, 60], [4e-5, 58]], { cracking: 1, peak: 2, firstYield: 4, ultimate: 6 });
    const s = crackingStrength(c)!;
    expect(s.beforeYield / 1e6).toBeCloseTo(70, 9);
    expect(s.afterYield / 1e6).toBeCloseTo(60, 9);
    expect(s.yields).toBe(true);
    expect(s.failsAsItCracks).toBe(true);
  });

  it('a section that gains moment after yield beyond its crack does not', () => {
    const c = curve([[0, 0], [1e-6, 20], [5e-6, 100], [3e-5, 120], [5e-5, 110]], { cracking: 1, firstYield: 2, peak: 3, ultimate: 4 });
    expect(crackingStrength(c)!.failsAsItCracks).toBe(false);
  });

  it('an over-reinforced section (no yield) whose peak comes from crushing is not a cracking failure', () => {
    // the peak before the end is a crushing peak; only the crack moment is compared with the end
    const c = curve([[0, 0], [1e-6, 20], [1e-5, 150], [2e-5, 130]], { cracking: 1, peak: 2, ultimate: 3 });
    const s = crackingStrength(c)!;
    expect(s.yields).toBe(false);
    expect(s.beforeYield / 1e6).toBeCloseTo(20, 9);
    expect(s.failsAsItCracks).toBe(false);
  });

  it('no cracking point, no answer', () => {
    expect(crackingStrength(curve([[0, 0], [1e-5, 100]], { ultimate: 1 }))).toBeNull();
  });

  describe('real sections: 300 × 600 mm, C30/37, B500 bars Ø12 at d = 550 mm', () => {
    const analyse = (count: number, tension: ConcreteSpec['tensionModel']) => {
      const steel: SteelSpec = { kind: 'steel', id: 's', name: 's', model: 'elastic-plastic', yieldStress: 500, ultimateStress: 500, ruptureStrain: 0.05 };
      const concrete: ConcreteSpec = { kind: 'concrete', id: 'c', name: 'c', strength: 30, compressionModel: 'en1992-parabola-rectangle', tensionModel: tension };
      const specs: MaterialSpec[] = [concrete, steel];
      const section: SectionDefinition = { id: 'r', name: 'r', shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c', bars: [{ steelId: 's', depth: 550, count, diameter: 12 }] };
      const a = analyzeSection(section, 'sections[0]', materialLibrary(specs, 'EN 1992-1-1'), { code: 'EN 1992-1-1', momentDropFraction: 0.8, bilinearMethod: 'priestley-2007' });
      return a.curves.sagging!;
    };
    const failsWarning = (w: readonly string[]) => w.some((t) => t.includes('fails suddenly at cracking'));

    // EN 1992-1-1 9.2.1.1(1): As,min = 0.26 fctm/fyk bt d = 0.26 × 2.9/500 × 300 × 550 = 249 mm²
    // (fctm = 2.9 MPa for C30/37, EN 1992-1-1 Table 3.1). 2Ø12 = 226 mm² is below it, 3Ø12 = 339 mm² above.
    it('2Ø12 (below As,min) with tension stiffening fails as it cracks; the section warning says so', () => {
      const c = analyse(2, 'tension-stiffening');
      const s = crackingStrength(c)!;
      // the crack moment alone is below what the bars carry after yield — the old test missed this section
      expect(c.keyPoints.cracking!.moment).toBeLessThan(s.afterYield);
      expect(s.beforeYield).toBeGreaterThan(s.afterYield);
      expect(s.failsAsItCracks).toBe(true);
      expect(failsWarning(c.warnings)).toBe(true);
    });

    it('3Ø12 (above As,min) does not, under either tension law', () => {
      for (const law of ['linear-brittle', 'tension-stiffening'] as const) {
        const c = analyse(3, law);
        expect(crackingStrength(c)!.failsAsItCracks).toBe(false);
        expect(failsWarning(c.warnings)).toBe(false);
      }
    });

    it('1Ø12 fails as it cracks under the linear-brittle law too (the crack moment is the peak)', () => {
      // common practice, no source: Mcr = fctm·b·h²/6 ≈ 52 kN·m against As·fy·z ≈ 113 × 500 × 0.95 × 550 ≈ 30 kN·m
      const c = analyse(1, 'linear-brittle');
      expect(crackingStrength(c)!.failsAsItCracks).toBe(true);
      expect(failsWarning(c.warnings)).toBe(true);
    });
  });
});
