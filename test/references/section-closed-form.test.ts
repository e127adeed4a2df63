/**
 * The section engine against closed-form results of reinforced-concrete theory. Each check names
 * its source. Materials are chosen so that the closed form applies exactly (or the tolerance is
 * justified beside the check).
 */
import { describe, expect, it } from 'vitest';
import { testConcrete, testSteel } from '../fixtures/simple-materials.ts';
import { fixedResolver } from '../fixtures/sections.ts';
import { buildSectionModel } from '../../core/section/build.ts';
import type { SectionDefinition } from '../../core/section/definition.ts';
import { elasticProperties } from '../../core/section/elastic.ts';
import { momentCurvature } from '../../core/section/moment-curvature.ts';
import { combineConcrete } from '../../core/materials/concrete/combine.ts';
import { en1992ParabolaRectangleCompression } from '../../core/materials/concrete/en1992-parabola-rectangle.ts';
import { hognestadCompression } from '../../core/materials/concrete/hognestad.ts';
import { noTension } from '../../core/materials/concrete/tension.ts';
import { aciElasticModulus, aciStressBlockDepthFactor } from '../../core/materials/code/aci318.ts';

const b = 300;
const h = 600;
const d = 540;
const as = 3 * (Math.PI * 25 ** 2) / 4; // 3 × 25 mm bars
const fy = 420;
const singly = (concrete = 'c'): SectionDefinition => ({
  id: 's', name: 'singly reinforced', shape: { kind: 'rectangle', width: b, height: h }, concreteId: concrete,
  bars: [{ steelId: 's', depth: d, count: 3, diameter: 25 }],
});
const rel = (a: number, e: number) => Math.abs(a / e - 1);

describe('compression blocks integrated over a rectangular zone', () => {
  it('parabola to the peak strain: C = (2/3)·fc·b·c acting at 3c/8 from the compression face', () => {
    // Integral of σ = fc[2x − x²] over 0 ≤ x ≤ 1: mean 2/3, centroid 3/8 from the peak-strain edge
    // (Park & Paulay 1975, §2.2, from memory; plain calculus). Steel yielded, so C = As·fy.
    const concrete = testConcrete({ fc: 30, eps0: 0.002, epsCu: 0.01, shape: 'parabola' });
    const { model } = buildSectionModel(singly(), fixedResolver(concrete, testSteel(fy)));
    const at = momentCurvature(model, 'sagging', { codeCrushingStrain: 0.002 }).keyPoints.codeCrushing!;
    const c = (as * fy) / ((2 / 3) * 30 * b);
    expect(rel(at.compressionFaceStrain, 0.002)).toBeLessThan(1e-8);
    expect(rel(at.neutralAxisDepth!, c)).toBeLessThan(1e-6);
    expect(rel(at.moment, as * fy * (d - (3 / 8) * c))).toBeLessThan(1e-6);
  });

  it('EN 1992-1-1 parabola–rectangle at εcu2 = 3.5 ‰: α = 17/21 ≈ 0.810, centroid 0.416·x', () => {
    // EN 1992-1-1 3.1.7, Eq. (3.17)–(3.18) with n = 2, εc2 = 2 ‰, εcu2 = 3.5 ‰ (fck ≤ 50 MPa);
    // the block factors 0.810 and 0.416 are the usual tabulated values (from memory), here in exact form.
    const fck = 30;
    const law = combineConcrete(en1992ParabolaRectangleCompression({ strength: fck }), noTension());
    const { model } = buildSectionModel(singly(), { concrete: () => ({ cover: law }), steel: () => testSteel(fy) });
    const at = momentCurvature(model, 'sagging', { codeCrushingStrain: 0.0035 }).keyPoints.codeCrushing!;
    const alpha = 1 - 2 / (3 * 3.5);
    const beta = (6 * 3.5 ** 2 - 4 * 3.5 * 2 + 2 ** 2) / (4 * 3.5 * (3 * 3.5 - 2));
    expect(alpha).toBeCloseTo(0.8095, 4);
    expect(beta).toBeCloseTo(0.416, 3);
    const x = (as * fy) / (alpha * fck * b);
    expect(rel(at.neutralAxisDepth!, x)).toBeLessThan(1e-6);
    expect(rel(at.moment, as * fy * (d - beta * x))).toBeLessThan(1e-6);
  });

  it('Whitney block: the fibre moment at εc = 0.003 (Hognestad concrete) is within 1 % of Mn = As·fy·(d − a/2)', () => {
    // ACI 318-19 22.2.2.4.1: a = As·fy/(0.85·f′c·b), Mn = As·fy·(d − a/2). The steel force is the same
    // in both (yielded, elastic–plastic); only the position of the concrete resultant differs
    // (a/2 against the Hognestad block's centroid), and a ≈ 0.16·d here, so the lever arms differ
    // by well under 1 % (tolerance chosen on that basis).
    const fc = 30;
    const law = combineConcrete(hognestadCompression({ compressiveStrength: fc, elasticModulus: aciElasticModulus(fc) }), noTension());
    const { model } = buildSectionModel(singly(), { concrete: () => ({ cover: law }), steel: () => testSteel(fy) });
    const fibre = momentCurvature(model, 'sagging', { codeCrushingStrain: 0.003 }).keyPoints.codeCrushing!;
    const a = (as * fy) / (0.85 * fc * b);
    const mn = as * fy * (d - a / 2);
    expect(a / d).toBeLessThan(0.2);
    expect(rel(fibre.moment, mn)).toBeLessThan(0.01);
    // and the neutral axis is near a/β1 (ACI 318-19 22.2.2.4.2): within 15 %, since the blocks differ in shape
    expect(rel(fibre.neutralAxisDepth!, a / aciStressBlockDepthFactor(fc))).toBeLessThan(0.15);
  });
});

describe('first yield of an elastic cracked section', () => {
  // Linear concrete without tension and elastic–perfectly plastic steel: the cracked elastic section of
  // working-stress theory holds exactly up to yield (Park & Paulay 1975, §10.3 (from memory); common practice).
  const fc = 30;
  const ec = 20000; // linear law: Ec = fc/ε0
  const concrete = testConcrete({ fc, eps0: fc / ec, epsCu: 0.01, shape: 'linear' });
  const steel = testSteel(fy);
  const { model } = buildSectionModel(singly(), fixedResolver(concrete, steel));
  const curve = momentCurvature(model, 'sagging', { codeCrushingStrain: 0.003 });
  const n = 200000 / ec;
  const rho = as / (b * d);
  const k = Math.sqrt(2 * rho * n + (rho * n) ** 2) - rho * n;
  const epsY = fy / 200000;

  it('neutral axis kd with k = √(2ρn + (ρn)²) − ρn', () => {
    expect(rel(curve.keyPoints.firstYield!.neutralAxisDepth!, k * d)).toBeLessThan(1e-7);
  });
  it('similar triangles: εc = εy·kd/(d − kd) and φy = εc/kd = εy/(d − kd)', () => {
    const fy1 = curve.keyPoints.firstYield!;
    expect(rel(fy1.compressionFaceStrain, (epsY * k) / (1 - k))).toBeLessThan(1e-7);
    expect(rel(fy1.curvature, epsY / (d * (1 - k)))).toBeLessThan(1e-7);
    expect(rel(fy1.curvature, fy1.compressionFaceStrain / (k * d))).toBeLessThan(1e-7);
  });
  it('My = As·fy·(d − kd/3)', () => {
    expect(rel(curve.keyPoints.firstYield!.moment, as * fy * d * (1 - k / 3))).toBeLessThan(1e-7);
  });
  it('the elastic cracked section of elasticProperties gives the same kd and Icr = b(kd)³/3 + n·As(d − kd)²', () => {
    // ACI 318-19 Table 24.2.3.5 (cracked transformed rectangular section, from memory):
    // B = b/(n·As), kd = (√(2dB + 1) − 1)/B, Icr = b(kd)³/3 + n·As(d − kd)²
    const e = elasticProperties(model);
    const B = b / (n * as);
    const kd = (Math.sqrt(2 * d * B + 1) - 1) / B;
    expect(rel(e.cracked.sagging!.neutralAxisDepth, kd)).toBeLessThan(1e-7);
    expect(rel(e.cracked.sagging!.inertia, (b * kd ** 3) / 3 + n * as * (d - kd) ** 2)).toBeLessThan(1e-7);
    expect(kd / d).toBeCloseTo(k, 9);
  });
});

describe('cracking', () => {
  it('gross-section cracking moment Mcr = fr·Ig/yt = fr·b·h²/6 (rectangle)', () => {
    // ACI 318-19 Eq. (24.2.3.5b)
    const concrete = testConcrete({ fc: 30, eps0: 0.002, epsCu: 0.0035, ft: 3.4, shape: 'parabola' });
    const { model } = buildSectionModel(singly(), fixedResolver(concrete, testSteel(fy)));
    expect(rel(elasticProperties(model).crackingMoment.sagging.gross, (3.4 * b * h * h) / 6)).toBeLessThan(1e-9);
  });
  it('the curve cracks where the extreme fibre reaches ft, on the uncracked transformed section with n·As', () => {
    // Elastic uncracked transformed section (common practice, no source). The fibre model does not remove
    // concrete displaced by bars in tension, so the bars count n·As (not (n − 1)·As) here.
    const ec = 20000;
    const ft = 3;
    const concrete = testConcrete({ fc: 40, eps0: 40 / ec, epsCu: 0.01, ft, shape: 'linear' });
    const { model } = buildSectionModel(singly(), fixedResolver(concrete, testSteel(fy)));
    const n = 200000 / ec;
    const area = b * h + n * as;
    const y = (b * h * (h / 2) + n * as * d) / area;
    const inertia = (b * h ** 3) / 12 + b * h * (h / 2 - y) ** 2 + n * as * (d - y) ** 2;
    const cracking = momentCurvature(model, 'sagging', { codeCrushingStrain: 0.003 }).keyPoints.cracking!;
    expect(rel(cracking.moment, (ft * inertia) / (h - y))).toBeLessThan(1e-7);
    expect(rel(cracking.curvature, ft / ec / (h - y))).toBeLessThan(1e-7);
  });
});
