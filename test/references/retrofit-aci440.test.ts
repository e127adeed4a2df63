/**
 * ACI 440.2R-17 externally bonded FRP for flexure, checked against the guide's expressions and a
 * strain-compatibility calculation done by hand (the guide's procedure, written out below).
 */
import { describe, expect, it } from 'vitest';
import { convertUnit } from '../../core/units/convert.ts';
import { aciDebondingStrainSI, aciDebondingStrainUS, crackedSubstrateStrain, frpDesign, frpElement, frpStrainLimit, FRP_FLEXURE_REDUCTION } from '../../core/retrofit/frp.ts';
import { materialLibrary } from '../../core/materials/library.ts';
import { buildSectionModel } from '../../core/section/build.ts';
import { elasticProperties } from '../../core/section/elastic.ts';
import { momentCurvature } from '../../core/section/moment-curvature.ts';
import { analyzeSection } from '../../core/section/analyze.ts';
import type { MaterialSpec } from '../../core/materials/specs.ts';
import type { SectionDefinition } from '../../core/section/definition.ts';
import { flexuralDesignResistance } from '../../core/assessment/resistance.ts';

const psi = (mpa: number) => convertUnit(mpa, 'MPa', 'psi');

describe('ACI 440.2R-17 Eq. (10.1.1): εfd = 0.41√(f′c/(n·Ef·tf)) ≤ 0.9εfu (SI), 0.083√(…) (in.-lb.)', () => {
  it('a 1.2 mm laminate (Ef = 165 GPa) on f′c = 30 MPa: 0.41 × √(30/(1 × 165 000 × 1.2)) = 0.41 × 0.012309 = 0.005047', () => {
    // 30 / 198 000 = 1.51515e-4; √ = 0.0123091; × 0.41 = 0.00504675 // ACI 440.2R-17 Eq. (10.1.1)
    expect(aciDebondingStrainSI(30, 1, 165_000, 1.2)).toBeCloseTo(0.0050467, 6);
  });

  it('the SI and in.-lb. forms agree within 2.5 % (0.083·√25.4 = 0.418 against 0.41)', () => {
    for (const [fc, n, ef, tf] of [[20, 1, 230_000, 0.165], [30, 2, 165_000, 1.2], [45, 3, 70_000, 0.5], [60, 1, 300_000, 1.4]] as const) {
      const si = aciDebondingStrainSI(fc, n, ef, tf);
      const us = aciDebondingStrainUS(psi(fc), n, psi(ef), tf / 25.4);
      expect(Math.abs(us / si - 1)).toBeLessThan(0.025);
      expect(us / si).toBeCloseTo((0.083 * Math.sqrt(25.4)) / 0.41, 6); // exact ratio of the two constants
    }
  });

  it('the cap 0.9εfu governs a thin sheet, the debonding strain a thick laminate', () => {
    // Sheet: 0.41√(30/(230 000 × 0.165)) = 0.01153; εfu = 0.95 × 0.021 = 0.01995, 0.9εfu = 0.01796 → debonding 0.01153
    // With ε*fu = 0.012: 0.9 × 0.95 × 0.012 = 0.01026 < 0.01153 → the cap governs (rupture)
    const capped = frpStrainLimit(aciDebondingStrainSI(30, 1, 230_000, 0.165), 0.95 * 0.012);
    expect(capped.cause).toBe('frp-rupture');
    expect(capped.limit).toBeCloseTo(0.9 * 0.95 * 0.012, 12);
    const debonds = frpStrainLimit(aciDebondingStrainSI(30, 1, 165_000, 1.2), 0.95 * 0.017);
    expect(debonds.cause).toBe('frp-debonding');
    expect(debonds.limit).toBeCloseTo(0.0050467, 6);
  });

  it('design rupture strain εfu = CE·ε*fu (ACI 440.2R-17 9.4; CE = 0.95 interior carbon, Table 9.4)', () => {
    const d = frpDesign({ plyThickness: 0.165, plies: 2, width: 250, tensileModulus: 230_000, ruptureStrain: 0.0167, environmentalFactor: 0.95 }, 25);
    expect(d.designRuptureStrain).toBeCloseTo(0.015865, 9);
    expect(d.area).toBeCloseTo(2 * 0.165 * 250, 12);
    expect(d.reductionFactor).toBe(0.85); // ACI 440.2R-17 10.2.10 ψf
  });
});

describe('ACI 440.2R-17 10.2.3: substrate strain at installation by cracked elastic analysis', () => {
  it('matches εbi = M(df − kd)/(Icr·Ec) with kd and Icr of the cracked transformed rectangle worked by hand', () => {
    // 300 × 600 rectangle, 4 × 28 mm at d = 530 mm (As = 2463.0 mm²), Ec = 4700√30 = 25 742.96 MPa, n = Es/Ec = 7.7691.
    // kd from b·kd²/2 = n·As·(d − kd): 150 kd² + 19 135.6 kd − 10 141 856 = 0 → kd = 203.94 mm
    // Icr = b·kd³/3 + n·As·(d − kd)² = 100 × 203.94³ + 19 135.6 × 326.06² = 848.2e6 + 2034.4e6 = 2882.6e6 mm⁴
    // M = 150 kN·m, df = 600 mm: εbi = 150e6 × (600 − 203.94)/(2882.6e6 × 25 743) = 8.006e-4
    const ec = 4700 * Math.sqrt(30);
    const n = 200_000 / ec;
    const as = 4 * Math.PI * 14 * 14;
    const b = 300;
    const d = 530;
    const kd = (-n * as + Math.sqrt((n * as) ** 2 + 2 * b * n * as * d)) / b;
    const icr = (b * kd ** 3) / 3 + n * as * (d - kd) ** 2;
    expect(kd).toBeCloseTo(203.94, 1);
    const hand = (150e6 * (600 - kd)) / (icr * ec);
    expect(hand).toBeCloseTo(8.006e-4, 6);
    const materials = materialLibrary([
      { kind: 'concrete', id: 'c30', name: 'C30', strength: 30, compressionModel: 'hognestad', tensionModel: 'none' },
      { kind: 'steel', id: 'g420', name: 'Grade 420', model: 'elastic-plastic', yieldStress: 420, ultimateStress: 420 },
    ], 'ACI 318-19');
    const { model } = buildSectionModel({ id: 's', name: 's', shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c30', bars: [{ steelId: 'g420', depth: 530, count: 4, diameter: 28 }] }, materials);
    const cracked = elasticProperties(model, { concreteModulus: ec }).cracked.sagging!;
    expect(cracked.neutralAxisDepth).toBeCloseTo(kd, 6);
    expect(crackedSubstrateStrain(150e6, 600, cracked.neutralAxisDepth, cracked.inertia, ec)).toBeCloseTo(hand, 10);
  });
});

// --- strain compatibility by hand -------------------------------------------------------------------------
//
// ACI 440.2R-17 10.2.10 procedure for a rectangle with tension steel and FRP at depth df:
//   for a trial neutral-axis depth c:
//     εfe = εcu(df − c)/c − εbi ≤ εfd (εcu = 0.003)
//     εc  = (εfe + εbi)·c/(df − c);   εs = (εfe + εbi)·(d − c)/(df − c)
//     concrete crushing governs (εfe < εfd): Whitney block, α1 = 0.85, β1 of ACI 318-19 Table 22.2.2.4.3
//     FRP governs: parabolic block (ACI 440.2R-17, from memory) with ε′c = 1.7f′c/Ec,
//       β1 = (4ε′c − εc)/(6ε′c − 2εc),  α1 = (3ε′c·εc − εc²)/(3β1·ε′c²)
//     C = α1·f′c·β1·c·b;  T = As·min(Es·εs, fy) + Af·Ef·εfe;  iterate c until C = T (bisection here)
//   Mn = As·fs·(d − β1c/2) + Af·ffe·(df − β1c/2);  Mnf = Af·ffe·(df − β1c/2)
interface HandInput { b: number; d: number; as: number; fy: number; fc: number; ec: number; af: number; ef: number; df: number; epsBi: number; epsFd: number }
function aci440StrainCompatibility(p: HandInput) {
  const beta1Whitney = 0.85 - (0.05 * (p.fc - 28)) / 7; // f′c = 30 MPa → 0.8357 (Table 22.2.2.4.3)
  const ecp = (1.7 * p.fc) / p.ec;
  const state = (c: number) => {
    let efe = (0.003 * (p.df - c)) / c - p.epsBi;
    const crushing = efe <= p.epsFd;
    if (!crushing) efe = p.epsFd;
    const epsC = ((efe + p.epsBi) * c) / (p.df - c);
    const epsS = ((efe + p.epsBi) * (p.d - c)) / (p.df - c);
    const beta1 = crushing ? beta1Whitney : (4 * ecp - epsC) / (6 * ecp - 2 * epsC);
    const alpha1 = crushing ? 0.85 : (3 * ecp * epsC - epsC * epsC) / (3 * beta1 * ecp * ecp);
    const fs = Math.min(200_000 * epsS, p.fy);
    const ffe = p.ef * efe;
    return {
      c, crushing, efe, epsS, net: alpha1 * p.fc * beta1 * c * p.b - (p.as * fs + p.af * ffe),
      mn: p.as * fs * (p.d - (beta1 * c) / 2) + p.af * ffe * (p.df - (beta1 * c) / 2),
      mnf: p.af * ffe * (p.df - (beta1 * c) / 2),
    };
  };
  let lo = 1;
  let hi = p.df - 1;
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (state(mid).net > 0) hi = mid;
    else lo = mid;
  }
  return state((lo + hi) / 2);
}

const library: MaterialSpec[] = [
  // Hognestad with f″c = f′c (k = 1) so that the fibre curve peaks at f′c, as the blocks assume.
  { kind: 'concrete', id: 'c30', name: 'C30', strength: 30, compressionModel: 'hognestad', tensionModel: 'none', peakFactor: 1 },
  { kind: 'steel', id: 'g420', name: 'Grade 420', model: 'elastic-plastic', yieldStress: 420, ultimateStress: 420, ruptureStrain: 0.1 },
  { kind: 'frp', id: 'sheet', name: 'carbon sheet', tensileModulus: 230_000, ruptureStrain: 0.017, environmentalFactor: 0.95 },
  { kind: 'frp', id: 'laminate', name: 'carbon laminate', tensileModulus: 165_000, ruptureStrain: 0.017, environmentalFactor: 0.95 },
];
const materials = materialLibrary(library, 'ACI 318-19');
const ec = 4700 * Math.sqrt(30); // ACI 318-19 Eq. 19.2.2.1.b

function strengthened(bars: { count: number; diameter: number; depth: number }, frpId: string, tf: number, bf: number, epsBi: number) {
  const spec = materials.frpSpec(frpId)!;
  const design = frpDesign({ plyThickness: tf, plies: 1, width: bf, tensileModulus: spec.tensileModulus, ruptureStrain: spec.ruptureStrain, environmentalFactor: spec.environmentalFactor }, 30);
  const element = frpElement('FRP', materials.frp(frpId)!, design, 600, -epsBi);
  const definition: SectionDefinition = { id: 's', name: 'test beam', shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c30', bars: [{ steelId: 'g420', ...bars }] };
  const hand = aci440StrainCompatibility({ b: 300, d: bars.depth, as: bars.count * Math.PI * (bars.diameter / 2) ** 2, fy: 420, fc: 30, ec, af: design.area, ef: spec.tensileModulus, df: 600, epsBi, epsFd: design.limitStrain });
  return { design, element, definition, hand };
}

describe('FRP-strengthened section: nominal moment by ACI 440.2R-17 strain compatibility (by hand) against the fibre analysis', () => {
  // Tolerance 3 %: the fibre analysis integrates Hognestad's parabola-and-line law (peak f′c at
  // 2f′c/Ec) where the hand calculation uses the Whitney rectangle or the guide's parabolic block
  // factors; the steel (elastic–plastic) and FRP laws are the same in both.
  it('concrete crushing governs (4 × 28 mm, one 0.165 mm sheet 250 mm wide, εbi = 0.0008): Whitney block', () => {
    const { definition, element, hand } = strengthened({ count: 4, diameter: 28, depth: 530 }, 'sheet', 0.165, 250, 0.0008);
    // By hand: c = 171.7 mm, εfe = 0.00668 < εfd = 0.01153 (crushing governs), Mn = 507.5 kN·m
    expect(hand.crushing).toBe(true);
    expect(hand.c).toBeCloseTo(171.7, 0);
    expect(hand.mn / 1e6).toBeCloseTo(507.5, 0);
    const { model } = buildSectionModel(definition, materials, 's', { elements: [element] });
    const curve = momentCurvature(model, 'sagging', { codeCrushingStrain: 0.003 });
    const fibre = curve.keyPoints.codeCrushing!.moment;
    expect(Math.abs(fibre / hand.mn - 1)).toBeLessThan(0.03);
    // The FRP is still below its limit when the concrete reaches 0.003.
    const frpState = curve.keyPoints.codeCrushing!.state.elements.find((e) => e.kind === 'frp')!;
    expect(-frpState.strain).toBeLessThan(element.limitStrain!);
    expect(-frpState.strain).toBeCloseTo(hand.efe, 3);
  });

  it('FRP debonding governs (3 × 20 mm, one 1.2 mm laminate 100 mm wide): parabolic block, the curve ends at εfd', () => {
    const { definition, element, hand } = strengthened({ count: 3, diameter: 20, depth: 540 }, 'laminate', 1.2, 100, 0.0008);
    // By hand: εfe = εfd = 0.005047, c = 108.2 mm, Mn = 254.6 kN·m
    expect(hand.crushing).toBe(false);
    expect(hand.mn / 1e6).toBeCloseTo(254.6, 0);
    const { model } = buildSectionModel(definition, materials, 's', { elements: [element] });
    const curve = momentCurvature(model, 'sagging', { codeCrushingStrain: 0.003 });
    expect(curve.status.kind === 'complete' && curve.status.ultimateCause).toBe('frp-debonding');
    expect(curve.keyPoints.codeCrushing).toBeUndefined();
    const fibre = curve.keyPoints.ultimate!.moment;
    expect(Math.abs(fibre / hand.mn - 1)).toBeLessThan(0.03);
    // At the end of the curve the FRP's own strain is εfd: the substrate strain minus εbi.
    const frpState = curve.keyPoints.ultimate!.state.elements.find((e) => e.kind === 'frp')!;
    expect(-frpState.strain).toBeCloseTo(element.limitStrain!, 8);
  });

  // The design resistance is solved with the code's own assumptions (the Whitney block, or the
  // guide's parabola when the FRP governs; steel elastic–perfectly plastic; no concrete tension), so
  // it reproduces the hand procedure up to the root-finding tolerance — whatever laws the section has.
  it('design resistance φ(Mns + ψf·Mnf), concrete crushing: the hand value within 1e-6 (φ = 0.9, εt > 0.005)', () => {
    const { definition, element, hand } = strengthened({ count: 4, diameter: 28, depth: 530 }, 'sheet', 0.165, 250, 0.0008);
    const analysis = analyzeSection(definition, 's', materials, { code: 'ACI 318-19', momentDropFraction: 0.8, bilinearMethod: 'priestley-2007', additions: { elements: [element] } });
    const r = flexuralDesignResistance('ACI 318-19', analysis, 'sagging');
    // ACI 440.2R-17 10.2.10: φ(Mns + ψf·Mnf), ψf = 0.85
    const handDesign = 0.9 * (hand.mn - hand.mnf + FRP_FLEXURE_REDUCTION * hand.mnf);
    expect(hand.epsS).toBeGreaterThan(0.005);
    expect(r.limit).toBe('concrete');
    expect(Math.abs(r.value! / handDesign - 1)).toBeLessThan(1e-6);
    expect(Math.abs(r.frpMoment / hand.mnf - 1)).toBeLessThan(1e-6);
    expect(r.neutralAxisDepth!).toBeCloseTo(hand.c, 3);
  });

  it('design resistance, FRP debonding first: the guide\'s parabolic block by hand within 1e-6', () => {
    const { definition, element, hand } = strengthened({ count: 3, diameter: 20, depth: 540 }, 'laminate', 1.2, 100, 0.0008);
    const analysis = analyzeSection(definition, 's', materials, { code: 'ACI 318-19', momentDropFraction: 0.8, bilinearMethod: 'priestley-2007', additions: { elements: [element] } });
    const r = flexuralDesignResistance('ACI 318-19', analysis, 'sagging');
    expect(hand.crushing).toBe(false);
    expect(r.limit).toBe('frp-debonding');
    // ACI 318-19 Table 21.2.2: φ from εt; here εt > εty + 0.003
    expect(hand.epsS).toBeGreaterThan(420 / 200_000 + 0.003);
    // ACI 440.2R-17 10.2.10: φ(Mns + ψf·Mnf)
    expect(Math.abs(r.value! / (0.9 * (hand.mn - 0.15 * hand.mnf)) - 1)).toBeLessThan(1e-6);
  });
});
