/**
 * The ultimate strain of unconfined concrete as a setting (issue 11 item 2): the code's εcu by default,
 * the law's own value on request, a value the engineer enters; the code crushing point stays where the
 * code puts it whichever ultimate is chosen. Checked against a closed-form integration of Hognestad's
 * curve over a rectangular compression zone.
 */
import { describe, expect, it } from 'vitest';
import { materialLibrary } from '../../core/materials/library.ts';
import type { ConcreteSpec, MaterialSpec, SteelSpec, UltimateStrainChoice } from '../../core/materials/specs.ts';
import { aciElasticModulus } from '../../core/materials/code/aci318.ts';
import { flexuralDesignResistance } from '../../core/assessment/resistance.ts';
import { analyzeSection } from '../../core/section/analyze.ts';
import type { SectionDefinition } from '../../core/section/definition.ts';

const b = 300;
const h = 600;
const d = 540;
const as = 3 * (Math.PI * 25 ** 2) / 4;
const fy = 420;
const fc = 30;
const concrete: ConcreteSpec = { kind: 'concrete', id: 'c', name: 'C', strength: fc, compressionModel: 'hognestad', tensionModel: 'none' };
const steel: SteelSpec = { kind: 'steel', id: 's', name: 'S', model: 'elastic-plastic', yieldStress: fy, ultimateStress: fy, ruptureStrain: 0.1 };
const section: SectionDefinition = {
  id: 'r', name: 'R', shape: { kind: 'rectangle', width: b, height: h }, concreteId: 'c', bars: [{ steelId: 's', depth: d, count: 3, diameter: 25 }],
};

function curveWith(specs: readonly MaterialSpec[], choice?: UltimateStrainChoice) {
  const library = materialLibrary(specs, 'ACI 318-19', choice ? { concreteUltimateStrain: choice } : {});
  const analysis = analyzeSection(section, 'sections[0]', library, { code: 'ACI 318-19', momentDropFraction: 0.8, bilinearMethod: 'priestley-2007' });
  return { analysis, curve: analysis.curves.sagging! };
}

/**
 * Moment of the singly reinforced rectangle when the extreme fibre reaches εm, with Hognestad's curve
 * integrated in closed form (f″c = 0.85 f′c, ε0 = 2f″c/Ec, descent of 0.15 f″c to 0.0038) and yielded
 * steel: C = b·c·A/εm = As·fy, centroid of C at c·(1 − B/(εm·A)) below the top, A = ∫σ dε, B = ∫ε·σ dε.
 */
function hognestadMoment(epsM: number): { c: number; moment: number } {
  const f = 0.85 * fc;
  const e0 = (2 * f) / aciElasticModulus(fc);
  const slope = (0.15 * f) / (0.0038 - e0);
  // Hognestad (1951) parabola: ∫0^ε0 f(2x/ε0 − x²/ε0²) dx = 2fε0/3, ∫0^ε0 x·σ dx = 5fε0²/12 (plain calculus)
  let A = (2 * f * e0) / 3;
  let B = (5 * f * e0 * e0) / 12;
  // linear descent σ = f − slope·(x − ε0) from ε0 to εm
  const u = epsM - e0;
  A += f * u - (slope * u * u) / 2;
  B += f * (epsM ** 2 - e0 ** 2) / 2 - slope * ((epsM ** 3 - e0 ** 3) / 3 - (e0 * (epsM ** 2 - e0 ** 2)) / 2);
  const c = (as * fy * epsM) / (b * A);
  return { c, moment: as * fy * (d - c * (1 - B / (epsM * A))) };
}

const rel = (a: number, e: number) => Math.abs(a / e - 1);

describe('ultimate strain of unconfined concrete: a stated setting', () => {
  it('by default the curve ends at the code’s εcu = 0.003, where the code crushing point also sits', () => {
    const { curve } = curveWith([concrete, steel]);
    const u = curve.keyPoints.ultimate!;
    // ACI 318-19 22.2.2.1: εcu = 0.003
    expect(u.compressionFaceStrain).toBeCloseTo(0.003, 9);
    expect(curve.concreteLimits.ultimateStrain).toEqual({ value: 0.003, basis: 'code', source: 'ACI 318-19 22.2.2.1' });
    expect(u.description).toBe('the extreme concrete fibre reaches its ultimate strain εcu = 3.00 ‰ (code value, ACI 318-19 22.2.2.1)');
    const hand = hognestadMoment(0.003);
    expect(rel(u.moment, hand.moment)).toBeLessThan(1e-6);
    expect(rel(u.neutralAxisDepth!, hand.c)).toBeLessThan(1e-6);
  });

  it('the law’s own value (Hognestad 0.0038) carries the curve past the code point, which does not move', () => {
    const codeRun = curveWith([concrete, steel]);
    const lawRun = curveWith([concrete, steel], 'law');
    const code = codeRun.curve;
    const law = lawRun.curve;
    const u = law.keyPoints.ultimate!;
    // Hognestad (1951): the descent ends at 0.0038
    expect(u.compressionFaceStrain).toBeCloseTo(0.0038, 9);
    expect(u.description).toContain('εcu = 3.80 ‰ (value of the law, Hognestad (1951))');
    expect(rel(u.moment, hognestadMoment(0.0038).moment)).toBeLessThan(1e-6);
    expect(u.curvature).toBeGreaterThan(code.keyPoints.ultimate!.curvature * 1.2);
    // ACI 318-19 22.2.2.1: the code crushing point is at 0.003 in both, with the same moment
    const cc = law.keyPoints.codeCrushing!;
    expect(cc.compressionFaceStrain).toBeCloseTo(0.003, 9);
    expect(rel(cc.moment, code.keyPoints.codeCrushing!.moment)).toBeLessThan(1e-8);
    expect(cc.description).toBe('extreme compression fibre reaches the code crushing strain (3.00 ‰, ACI 318-19 22.2.2.1)');
    // … and the code resistance φMn (ACI 318-19 22.2: its own εcu and stress block) does not depend on the setting.
    expect(flexuralDesignResistance('ACI 318-19', lawRun.analysis, 'sagging').value).toBe(flexuralDesignResistance('ACI 318-19', codeRun.analysis, 'sagging').value);
  });

  it('a value on the material wins over the project setting and is reported as entered', () => {
    const { curve } = curveWith([{ ...concrete, crushingStrain: 0.0034 }, steel], 'law');
    expect(curve.keyPoints.ultimate!.compressionFaceStrain).toBeCloseTo(0.0034, 9);
    expect(curve.concreteLimits.ultimateStrain?.basis).toBe('user');
    expect(rel(curve.keyPoints.ultimate!.moment, hognestadMoment(0.0034).moment)).toBeLessThan(1e-6);
  });

  it('an ultimate that is not crushing names the concrete strain it did not reach', () => {
    const brittleSteel: SteelSpec = { ...steel, ruptureStrain: 0.01 };
    const { curve } = curveWith([concrete, brittleSteel]);
    expect(curve.status.kind === 'complete' && curve.status.ultimateCause).toBe('steel-rupture');
    expect(curve.keyPoints.ultimate!.description).toBe('the reinforcement reaches its rupture strain before the concrete reaches εcu = 3.00 ‰ (code value, ACI 318-19 22.2.2.1)');
  });
});
