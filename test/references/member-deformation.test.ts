/**
 * The member engine's deformations against published relations fitted to large test databases, and
 * against closed forms of spread plasticity. (The laboratory set of test/references/flexure-tests is
 * empty: no stored source with complete tables was found, see its SOURCES.md.)
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../core/analysis.ts';
import { capacityCurve } from '../../core/member/capacity.ts';
import type { SteelMaterial } from '../../core/materials/types.ts';
import type { SectionDefinition } from '../../core/section/definition.ts';
import { shearChordRotation } from '../../core/member/spread.ts';
import { beamOf, fieldOf } from '../fixtures/beams.ts';
import { member, smallProject } from '../fixtures/projects.ts';
import { fixedResolver } from '../fixtures/sections.ts';
import { testConcrete } from '../fixtures/simple-materials.ts';

/** A cantilever 300 × 600 (fixture concrete 30 MPa, Grade 500 bars) with top bars n × db and a tip load. */
function cantilever(lv: number, count: number, db: number) {
  const project = smallProject('ACI 318-19', [member('C', 'cantilever', lv, 'r1', { includeSelfWeight: false, loads: [{ kind: 'point', loadCase: 'live', magnitude: 10000, position: lv }] })]);
  const [section, ...others] = project.sections;
  const changed = { ...section!, bars: [{ steelId: 'b500', depth: 55, count, diameter: db }, { steelId: 'b500', depth: 545, count: 2, diameter: 16 }] };
  const r = analyzeProject({ ...project, sections: [changed, ...others] }).members[0]!;
  const phiY = r.sections[0]!.hogging!.keyPoints.firstYield!.curvature;
  const rho = (count * Math.PI * db * db) / 4 / (300 * 545);
  return { r, phiY, rho };
}

/**
 * Mean chord rotation at yield of a member with shear span Lv, EN 1998-3:2005 Annex A Eq. (A.10a)
 * (Panagiotakos & Fardis 2001; equation number from memory), for beams:
 * θy = φy(Lv + aV·z)/3 + 0.0013(1 + 1.5h/Lv) + 0.13·φy·db·fy/√fc (mm, MPa), with aV = 1 (diagonal
 * cracking before yield) and the bond-slip term for bars anchored beyond the end section.
 */
function en1998YieldRotation(phiY: number, lv: number, h: number, z: number, db: number, fy: number, fc: number): number {
  return (phiY * (lv + z)) / 3 + shearChordRotation(h, lv) + (0.13 * phiY * db * fy) / Math.sqrt(fc);
}

describe('yield chord rotation against EN 1998-3 Annex A (A.10a), fitted to tests', () => {
  // Cantilevers (the member A.10a describes: a shear span Lv from the section of largest moment to the
  // point of zero moment), Lv/h 3, 5 and 7.5, tension steel ρ 0.58 %, 1.2 % and 1.9 %.
  const cases = [1800, 3000, 4500].flatMap((lv) => ([[3, 20], [4, 25], [5, 28]] as const).map(([n, db]) => ({ lv, n, db })));
  const ratios = cases.map(({ lv, n, db }) => {
    const { r, phiY } = cantilever(lv, n, db);
    return (r.ductility.firstYieldDeflection! / lv) / en1998YieldRotation(phiY, lv, 600, 0.9 * 545, db, 500, 30);
  });
  it('each within 0.8–1.1 of the mean relation, median 0.85–1.05', () => {
    // A.10a is a mean fit with a coefficient of variation near 0.3 (Biskinis & Fardis, from memory), so
    // a model that differed from it by more than a few tens of percent on ordinary beams would be
    // suspect. Two deliberate differences make the engine a little stiffer: it integrates tension
    // stiffening where A.10a takes the cracked φy·Lv/3, and it shifts the moment by a_l = z/2
    // (EN 1992-1-1 9.2.1.3 with θ = 45°) where A.10a adds aV·z = z. Measured here: 0.90–0.95.
    for (const q of ratios) {
      expect(q).toBeGreaterThan(0.8);
      expect(q).toBeLessThan(1.1);
    }
    const median = [...ratios].sort((a, b) => a - b)[Math.floor(ratios.length / 2)]!;
    expect(median).toBeGreaterThan(0.85);
    expect(median).toBeLessThan(1.05);
  });
  it('below the minimum steel (ρ 0.25 %) the member is stiffer than A.10a: partly uncracked at first yield', () => {
    // ACI 318-19 9.6.1.2: As,min = 200·bw·d/fy (psi) → ρ 0.4 % for fy = 500 MPa; A.10a's database holds
    // members with cracked shear spans, so it is not meant for this case (the validation page says so).
    // Measured 0.78–0.85 (against 0.90–0.95 above the minimum).
    const light = cantilever(3000, 2, 16);
    const q = (light.r.ductility.firstYieldDeflection! / 3000) / en1998YieldRotation(light.phiY, 3000, 600, 0.9 * 545, 16, 500, 30);
    const ordinary = cantilever(3000, 3, 20);
    const q1 = (ordinary.r.ductility.firstYieldDeflection! / 3000) / en1998YieldRotation(ordinary.phiY, 3000, 600, 0.9 * 545, 20, 500, 30);
    expect(q).toBeLessThan(0.9);
    expect(q).toBeLessThan(q1);
  });
});

describe('ultimate chord rotation: EN 1998-3 Annex A (A.1) as a plausibility band', () => {
  it('the best-estimate ultimate chord rotation lies between a third of the cyclic mean and twice it', () => {
    // EN 1998-3:2005 Eq. (A.1) (γel = 1, from memory): θum = 0.016·0.3^ν·[max(0.01, ω′)/max(0.01, ω)·fc]^0.225
    // ·(Lv/h)^0.35·25^(α·ρsx·fyw/fc)·1.25^(100ρd), the mean of cyclic tests. Monotonic loading goes
    // further, and the curve here ends where its unconfined concrete reaches the code's crushing
    // strain, so only a wide band is meaningful; the monotonic-to-cyclic ratio could not be sourced.
    for (const [lv, n, db] of [[1800, 4, 25], [3000, 3, 20], [4500, 5, 28]] as const) {
      const { r, rho } = cantilever(lv, n, db);
      const rhoC = (2 * Math.PI * 16 * 16) / 4 / (300 * 545);
      const omega = (rho * 500) / 30;
      const omegaC = (rhoC * 500) / 30;
      // hoops Ø10 at 150 with two legs, α taken as 0 (no confinement counted: the fixture's hoops are not confirmed closed)
      const thetaUm = 0.016 * ((Math.max(0.01, omegaC) / Math.max(0.01, omega)) * 30) ** 0.225 * (lv / 600) ** 0.35;
      const q = r.ductility.ultimateDeflection! / lv / thetaUm;
      expect(q).toBeGreaterThan(1 / 3);
      expect(q).toBeLessThan(2);
    }
  });
});

// A steel-only section with linear strain hardening: a concrete of negligible strength and stiffness
// and two equal bar layers 500 mm apart give an exactly bilinear moment–curvature law (common
// practice, no source).
const hardeningSteel = (fy: number, es: number, esh: number, epsU: number): SteelMaterial => {
  const ey = fy / es;
  return {
    model: 'test-hardening', label: 'bilinear hardening steel', references: [],
    stress: (e) => (Math.abs(e) > epsU ? 0 : Math.abs(e) <= ey ? es * e : Math.sign(e) * (fy + esh * (Math.abs(e) - ey))),
    breakpoints: [-epsU, -ey, ey, epsU], initialModulus: es,
    yieldStress: fy, yieldStrain: ey, ultimateStress: fy + esh * (epsU - ey), ruptureStrain: epsU, hardeningStrain: ey,
  };
};
const bilinear: SectionDefinition = {
  id: 'bl', name: 'bilinear', shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c',
  bars: [{ steelId: 's', depth: 50, count: 4, diameter: 20 }, { steelId: 's', depth: 550, count: 4, diameter: 20 }],
};
const resolver = fixedResolver(testConcrete({ fc: 0.01, eps0: 0.02, epsCu: 1, shape: 'linear' }), hardeningSteel(400, 200000, 2000, 0.05));

describe('spread plasticity against the closed form for a bilinear law (simply supported, central point load)', () => {
  const L = 6000;
  const beam = beamOf('simply-supported', L, [{ from: 0, to: L, section: bilinear }], resolver, 120);
  const settings = { pattern: 'proportional' as const, hingeLengthMethod: 'user' as const, userHingeLength: 300, tensionShift: false, strainPenetration: 'none' as const, shearDeformation: 'none' as const };
  const pattern = fieldOf(beam, [{ kind: 'point', p: 1000, a: L / 2 }]);
  const curve = capacityCurve(beam, { constant: new Float64Array(beam.x.length), pattern, constantTotal: 0, patternTotal: 1000 }, settings, L / 2);
  const resp = beam.zones[0]!.sagging;
  const my = resp.firstYieldMoment!;
  const phiY = resp.firstYieldCurvature!;
  const mTop = resp.peakMoment;
  const phiTop = resp.peakCurvature;
  const k1 = my / phiY;
  const k2 = (mTop - my) / (phiTop - phiY);

  it('the moment–curvature law is bilinear (the closed forms below need it)', () => {
    expect(mTop / my).toBeGreaterThan(1.05);
    expect(Math.abs(resp.actualCurvature((my + mTop) / 2) / (phiY + (mTop - my) / 2 / k2) - 1)).toBeLessThan(1e-3);
  });

  it('the yielded zone spreads L/2·(1 − My/Mu) to each side of midspan', () => {
    // Elastic–hardening member under a central load: M = Mu·2x/L ≥ My for x ≥ (L/2)·My/Mu (statics;
    // e.g. Park & Paulay 1975 §6.5, from memory). The zone edge is where the moment, linear between stations, crosses My.
    const hinge = curve.hinges.find((h) => h.direction === 'sagging')!;
    const a = (L / 2) * (1 - my / mTop);
    expect(Math.abs(hinge.plasticZone[0] - (L / 2 - a))).toBeLessThan(1);
    expect(Math.abs(hinge.plasticZone[1] - (L / 2 + a))).toBeLessThan(1);
  });

  it('the spread plastic rotation and the midspan deflection at the peak load match the integrals', () => {
    // Plastic curvature φp = (M − My)(1/K2 − 1/K1) grows linearly over the zone to its top value:
    // θ_spread = 2·a·φp,top/2. Deflection at midspan at the peak (moment-area about a support):
    // Δ = ∫0^{L/2} φ(x)·x dx = (c/K1)·X³/3 + (1/K2 − 1/K1)·[c(X³ − xy³)/3 − My(X² − xy²)/2], c = 2Mu/L,
    // X = L/2, xy = My/c. The top is where the deformation localises: 0.1 % below the peak moment.
    const top = mTop * (1 - 1e-3);
    const a = (L / 2) * (1 - my / top);
    const phiPTop = (top - my) * (1 / k2 - 1 / k1);
    const hinge = curve.hinges.find((h) => h.direction === 'sagging')!;
    // At the end of the curve the midspan moment has been to the peak Mu (the last 0.1 % of the curve
    // lies in the hinge) and the zone then unloads keeping its plastic curvature, capped at the top:
    // φp = 0 at xy = My·X/Mu, rising linearly to φp,top at x_top = top·X/Mu, constant to X.
    const X0 = L / 2;
    const xy0 = (my * X0) / mTop;
    const xTop = (top * X0) / mTop;
    const spreadEnd = 2 * ((xTop - xy0) * phiPTop / 2 + (X0 - xTop) * phiPTop);
    expect(Math.abs(hinge.rotationParts.spread / spreadEnd - 1)).toBeLessThan(2e-3);
    // which is the spread at the top, a·φp,top, to within the last 0.1 % of the moment
    expect(Math.abs(hinge.rotationParts.spread / (a * phiPTop) - 1)).toBeLessThan(0.02);
    const c = (2 * top) / L;
    const X = L / 2;
    const xy = my / c;
    const delta = ((c / k1) * X ** 3) / 3 + (1 / k2 - 1 / k1) * ((c * (X ** 3 - xy ** 3)) / 3 - (my * (X ** 2 - xy ** 2)) / 2);
    const atTop = curve.events.find((e) => e.kind === 'hinge')!;
    expect(Math.abs(atTop.deflection / delta - 1)).toBeLessThan(2e-3);
  });
});
