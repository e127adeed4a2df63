/**
 * The code design flexural resistance follows the code's assumptions whatever best-estimate laws the
 * engineer chose (issue 10 item 2): ACI 318-19 22.2 (εcu = 0.003, rectangular block, fs ≤ fy, no
 * concrete tension, φ from εt by Table 21.2.2) and EN 1992-1-1 (parabola–rectangle of each concrete
 * part's own fck at fcd, εcu2, fyd with a horizontal top branch). Checked against closed forms.
 *
 * Tolerance: the issue asks for 1 % against the rectangular-block closed form. The resistance is not
 * read from a fibre curve but solved at the code's ultimate strain state with the block (or the
 * parabola–rectangle) as the concrete law, whose kinks are integration breakpoints, so it is exact
 * up to the root-finding tolerance on the neutral axis (1e-9 of the depth): the checks below hold to
 * 1e-6, far inside 1 %.
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../core/analysis.ts';
import { flexuralDesignResistance } from '../../core/assessment/resistance.ts';
import { materialLibrary } from '../../core/materials/library.ts';
import type { CodeBasis, ConcreteSpec, MaterialSpec, SteelSpec } from '../../core/materials/specs.ts';
import { parseProject, serializeProject } from '../../core/project/file.ts';
import type { Project } from '../../core/project/types.ts';
import { analyzeSection } from '../../core/section/analyze.ts';
import type { SectionDefinition } from '../../core/section/definition.ts';
import { member, smallProject } from '../fixtures/projects.ts';

const rel = (a: number, e: number) => Math.abs(a / e - 1);
const area = (n: number, dia: number) => (n * Math.PI * dia * dia) / 4;

const steels: Record<string, SteelSpec> = {
  plastic: { kind: 'steel', id: 's', name: 'no hardening', model: 'elastic-plastic', yieldStress: 420, ultimateStress: 420, ruptureStrain: 0.1 },
  hardening: { kind: 'steel', id: 's', name: 'hardening 1.5 fy', model: 'park-paulay', yieldStress: 420, ultimateStress: 630, hardeningStrain: 0.008, ruptureStrain: 0.12 },
  bilinear: { kind: 'steel', id: 's', name: 'bilinear', model: 'bilinear', yieldStress: 420, ultimateStress: 560, ruptureStrain: 0.08 },
  short: { kind: 'steel', id: 's', name: 'low rupture strain', model: 'elastic-plastic', yieldStress: 420, ultimateStress: 420, ruptureStrain: 0.012 },
};
/** Stirrup steel (the confined core needs εsu ≥ 0.02 of its hoops). */
const HOOPS: SteelSpec = { kind: 'steel', id: 'h', name: 'stirrups', model: 'elastic-plastic', yieldStress: 420, ultimateStress: 420, ruptureStrain: 0.1 };
const concretes = (fc: number): Record<string, ConcreteSpec> => ({
  hognestad: { kind: 'concrete', id: 'c', name: 'Hognestad', strength: fc, compressionModel: 'hognestad', tensionModel: 'tension-stiffening' },
  mander: { kind: 'concrete', id: 'c', name: 'Mander', strength: fc, compressionModel: 'mander', tensionModel: 'linear-brittle' },
  popovics: { kind: 'concrete', id: 'c', name: 'Popovics', strength: fc, compressionModel: 'popovics', tensionModel: 'none' },
});

function rectangle(bars: SectionDefinition['bars'], b = 300, h = 600, hoops = false): SectionDefinition {
  return {
    id: 'r', name: 'rectangle', shape: { kind: 'rectangle', width: b, height: h }, concreteId: 'c', bars,
    ...(hoops ? { hoops: { steelId: 'h', diameter: 10, spacing: 100, verticalLegs: 2, clearCover: 30, confineCore: true } } : {}),
  };
}

function resistance(code: CodeBasis, specs: readonly MaterialSpec[], section: SectionDefinition, direction: 'sagging' | 'hogging' = 'sagging') {
  const analysis = analyzeSection(section, 'sections[0]', materialLibrary(specs, code), { code, momentDropFraction: 0.8, bilinearMethod: 'priestley-2007' });
  return flexuralDesignResistance(code, analysis, direction);
}

/** ACI 318-19 22.2 by hand for a singly reinforced rectangle (yielded steel). */
function aciHand(as: number, b: number, d: number, fc: number, fy: number) {
  // ACI 318-19 Table 22.2.2.4.3 (MPa)
  const beta1 = fc <= 28 ? 0.85 : fc >= 55 ? 0.65 : 0.85 - (0.05 * (fc - 28)) / 7;
  const a = (as * fy) / (0.85 * fc * b); // 22.2.2.4.1
  const c = a / beta1;
  const epsT = (0.003 * (d - c)) / c;
  const epsY = fy / 200_000; // 21.2.2.1, Es = 200 000 MPa (20.2.2.2)
  // Table 21.2.2, other transverse reinforcement
  const phi = epsT >= epsY + 0.003 ? 0.9 : epsT <= epsY ? 0.65 : 0.65 + (0.25 * (epsT - epsY)) / 0.003;
  return { c, epsT, phi, mn: as * fy * (d - a / 2) };
}

/**
 * EN 1992-1-1 by hand for a singly reinforced rectangle, fck ≤ 50 MPa: parabola–rectangle (3.1.7,
 * Table 3.1: n = 2, εc2 = 2 ‰, εcu2 = 3.5 ‰) at fcd = fck/1.5, steel at fyd = fyk/1.15 (yielded).
 * Block factors by plain calculus: α = 1 − εc2/(3εcu2) (resultant / (b·x·fcd)); the resultant lies
 * β·x below the face with 1 − β = [5εc2²/12 + (εcu2² − εc2²)/2] / (εcu2²·α).
 */
function enHand(as: number, b: number, d: number, fck: number, fyk: number, topFck = fck) {
  const e2 = 0.002;
  const eu = 0.0035;
  const alpha = 1 - e2 / (3 * eu);
  const beta = 1 - ((5 * e2 * e2) / 12 + (eu * eu - e2 * e2) / 2) / (eu * eu * alpha);
  const fcd = topFck / 1.5;
  const fyd = fyk / 1.15;
  const x = (as * fyd) / (alpha * b * fcd);
  return { x, alpha, beta, epsS: (eu * (d - x)) / x, mrd: as * fyd * (d - beta * x) };
}

describe('ACI 318-19 22.2: φMn against the rectangular block by hand', () => {
  it('3 × 20 mm in 300 × 600, f′c = 30 MPa, fy = 420 MPa: tension-controlled, within 1e-6', () => {
    const as = area(3, 20);
    const hand = aciHand(as, 300, 540, 30, 420);
    const r = resistance('ACI 318-19', [concretes(30).hognestad!, steels.plastic!], rectangle([{ steelId: 's', depth: 540, count: 3, diameter: 20 }]));
    expect(hand.phi).toBe(0.9);
    expect(rel(r.nominal!, hand.mn)).toBeLessThan(1e-6);
    expect(rel(r.value!, 0.9 * hand.mn)).toBeLessThan(1e-6);
    expect(rel(r.neutralAxisDepth!, hand.c)).toBeLessThan(1e-6);
    expect(rel(r.netTensileStrain!, hand.epsT)).toBeLessThan(1e-6);
  });

  it('β1 = 0.65 above 55 MPa: 4 × 25 mm, f′c = 60 MPa', () => {
    const as = area(4, 25);
    const hand = aciHand(as, 300, 540, 60, 420);
    const r = resistance('ACI 318-19', [concretes(60).hognestad!, steels.plastic!], rectangle([{ steelId: 's', depth: 540, count: 4, diameter: 25 }]));
    expect(rel(r.value!, hand.phi * hand.mn)).toBeLessThan(1e-6);
  });

  it('transition zone: 6 × 32 mm in 300 × 600 (εt between εty and εty + 0.003), φ by Table 21.2.2', () => {
    const as = area(6, 32);
    const hand = aciHand(as, 300, 540, 30, 420);
    expect(hand.epsT).toBeGreaterThan(0.0021);
    expect(hand.epsT).toBeLessThan(0.0051);
    const r = resistance('ACI 318-19', [concretes(30).hognestad!, steels.plastic!], rectangle([{ steelId: 's', depth: 540, count: 6, diameter: 32 }]));
    expect(r.phi!).toBeCloseTo(hand.phi, 6);
    expect(rel(r.value!, hand.phi * hand.mn)).toBeLessThan(1e-6);
  });

  it('the steel and concrete laws the engineer picked never change φMn (hardening, rupture strain, tension, confinement)', () => {
    const bars = [{ steelId: 's', depth: 540, count: 3, diameter: 20 }, { steelId: 's', depth: 60, count: 2, diameter: 16 }];
    const found: Record<string, number[]> = { sagging: [], hogging: [] };
    const cases: string[] = [];
    for (const [sn, steel] of Object.entries(steels)) {
      for (const [cn, concrete] of Object.entries(concretes(30))) {
        for (const hoops of [false, true]) {
          cases.push(`${sn} ${cn} ${hoops}`);
          for (const direction of ['sagging', 'hogging'] as const) found[direction]!.push(resistance('ACI 318-19', [concrete, steel, HOOPS], rectangle(bars, 300, 600, hoops), direction).value!);
        }
      }
    }
    for (const values of Object.values(found)) {
      const spread = values.map((v, i) => [cases[i], v / values[0]! - 1] as const).filter(([, x]) => Math.abs(x) > 1e-12);
      expect(spread).toEqual([]);
    }
  });

  it('before: the fibre curve at εc = 0.003 with a hardening steel read 28 % more than the block (300 × 600, 2 × 20 mm)', () => {
    const as = area(2, 20);
    const hand = aciHand(as, 300, 540, 30, 420);
    const specs = [concretes(30).hognestad!, steels.hardening!];
    const section = rectangle([{ steelId: 's', depth: 540, count: 2, diameter: 20 }]);
    const analysis = analyzeSection(section, 's', materialLibrary(specs, 'ACI 318-19'), { code: 'ACI 318-19', momentDropFraction: 0.8, bilinearMethod: 'priestley-2007' });
    const fibre = analysis.curves.sagging!.keyPoints.codeCrushing!.moment;
    // the best-estimate curve carries the strain-hardened steel (εt ≫ εsh) …
    expect(fibre / hand.mn).toBeGreaterThan(1.2);
    // … the code resistance does not.
    expect(rel(flexuralDesignResistance('ACI 318-19', analysis, 'sagging').value!, 0.9 * hand.mn)).toBeLessThan(1e-6);
  });
});

describe('EN 1992-1-1: M_Rd against the parabola–rectangle by hand', () => {
  const fyk: SteelSpec = { kind: 'steel', id: 's', name: 'B500B', model: 'park-paulay', yieldStress: 500, ultimateStress: 540, hardeningStrain: 0.01, ruptureStrain: 0.05 };

  it('block factors of Table 3.1 for fck ≤ 50: α = 0.810, β = 0.416 (common practice, from memory)', () => {
    const h = enHand(1, 1, 1, 30, 500);
    expect(h.alpha).toBeCloseTo(0.8095, 4);
    expect(h.beta).toBeCloseTo(0.416, 3);
  });

  it('3 × 20 mm in 300 × 600, C30, B500: within 1e-6, whatever the laws', () => {
    const as = area(3, 20);
    const hand = enHand(as, 300, 540, 30, 500);
    expect(hand.epsS).toBeGreaterThan(500 / 1.15 / 200_000);
    for (const concrete of Object.values(concretes(30))) {
      for (const steel of [fyk, { ...fyk, model: 'elastic-plastic' as const, ultimateStress: 500 }]) {
        const r = resistance('EN 1992-1-1', [concrete, steel], rectangle([{ steelId: 's', depth: 540, count: 3, diameter: 20 }]));
        expect(rel(r.value!, hand.mrd)).toBeLessThan(1e-6);
        expect(rel(r.neutralAxisDepth!, hand.x)).toBeLessThan(1e-6);
      }
    }
  });

  it('a topping is designed with its own concrete: C30 and C45 toppings give their own M_Rd (EN 1992-1-1 3.1.7 per part)', () => {
    // A C20 beam 300 × 600 (3 × 20 mm at 540) with a 100 mm topping, so d = 640 and the compression
    // zone stays in the topping (x < 100 mm): M_Rd = As·fyd·(640 − β·x), x = As·fyd/(α·b·fcd,topping).
    const project = (): Project => {
      const base = smallProject('EN 1992-1-1');
      const m = member('T', 'simply-supported', 6000, 'r', {
        schemes: [
          { kind: 'concrete-layer', id: 'top30', name: 'C30 topping', face: 'top', thickness: 100, concreteId: 'c30t', bars: [] },
          { kind: 'concrete-layer', id: 'top45', name: 'C45 topping', face: 'top', thickness: 100, concreteId: 'c45t', bars: [] },
        ],
      });
      return {
        ...base,
        materials: [
          { kind: 'concrete', id: 'c20', name: 'C20 substrate', strength: 20, compressionModel: 'en1992-nonlinear', tensionModel: 'tension-stiffening' },
          { kind: 'concrete', id: 'c30t', name: 'C30 topping', strength: 30, compressionModel: 'hognestad', tensionModel: 'linear-brittle' },
          { kind: 'concrete', id: 'c45t', name: 'C45 topping', strength: 45, compressionModel: 'mander', tensionModel: 'linear-brittle' },
          fyk,
        ],
        sections: [{ id: 'r', name: 'C20 beam', shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c20', bars: [{ steelId: 's', depth: 540, count: 3, diameter: 20 }] }],
        members: [m],
      };
    };
    const parsed = parseProject(serializeProject(project()));
    expect(parsed.diagnostics.filter((x) => x.severity === 'error')).toEqual([]);
    const result = analyzeProject(parsed.project!).members[0]!;
    const schemes = result.retrofit!.schemes;
    const design = (i: number) => schemes[i]!.variant!.sections[0]!.curves.find((c) => c.direction === 'sagging')!.designResistance!;
    const as = area(3, 20);
    const h30 = enHand(as, 300, 640, 20, 500, 30);
    const h45 = enHand(as, 300, 640, 20, 500, 45);
    expect(h30.x).toBeLessThan(100);
    expect(h45.x).toBeLessThan(100);
    expect(rel(design(0), h30.mrd)).toBeLessThan(1e-6);
    expect(rel(design(1), h45.mrd)).toBeLessThan(1e-6);
    expect(design(1) - design(0)).toBeGreaterThan(4e6); // about 4.7 kN·m apart
  });
});
