/**
 * The member engine against classical results for beams whose sections are elastic–perfectly
 * plastic (two equal steel layers and a negligible concrete: an exactly bilinear moment–curvature).
 */
import { describe, expect, it } from 'vitest';
import { testConcrete, testSteel } from '../fixtures/simple-materials.ts';
import { fixedResolver } from '../fixtures/sections.ts';
import { beamOf, fieldOf } from '../fixtures/beams.ts';
import { capacityCurve } from '../../core/member/capacity.ts';
import type { SupportType } from '../../core/member/definition.ts';
import type { SectionDefinition } from '../../core/section/definition.ts';
import { nominalYieldDeflection } from '../../core/member/analyze.ts';

// "Steel-only" section: a concrete of negligible strength and stiffness (linear, 0.01 MPa at 2 %),
// two equal bar layers 500 mm apart: M–φ is linear to My = As·fy·z, then flat (common practice, no
// source: the textbook idealisation of a doubly reinforced section).
const concrete = testConcrete({ fc: 0.01, eps0: 0.02, epsCu: 1, shape: 'linear' });
const steel = testSteel(400, 200000, 0.25);
const resolver = fixedResolver(concrete, steel);
const section: SectionDefinition = {
  id: 'epp', name: 'epp', shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c',
  bars: [{ steelId: 's', depth: 50, count: 4, diameter: 20 }, { steelId: 's', depth: 550, count: 4, diameter: 20 }],
};
const L = 6000;
// The closed forms know neither the tension shift, strain penetration nor shear deformation: all off here.
const settings = (lp: number) => ({ pattern: 'proportional' as const, hingeLengthMethod: 'user' as const, userHingeLength: lp, tensionShift: false, strainPenetration: 'none' as const, shearDeformation: 'none' as const });

function run(support: SupportType, load: 'udl' | 'tip', lp = 500) {
  const beam = beamOf(support, L, [{ from: 0, to: L, section }], resolver, 200);
  const w = 1; // N/mm pattern
  const pattern = fieldOf(beam, load === 'udl' ? [{ kind: 'uniform', w, from: 0, to: L }] : [{ kind: 'point', p: 1000, a: L }]);
  const curve = capacityCurve(beam, { constant: new Float64Array(beam.x.length), pattern, constantTotal: 0, patternTotal: load === 'udl' ? w * L : 1000 }, settings(lp));
  const mp = beam.zones[0]!.sagging.peakMoment;
  return { curve, mp, beam };
}

describe('plastic collapse loads of uniformly loaded beams (upper-bound mechanisms)', () => {
  // Neal, The Plastic Methods of Structural Analysis (1977), and any plastic-design handbook
  // (from memory): wu = 8Mp/L² simply supported, 2Mp/L² cantilever, 16Mp/L² fixed–fixed,
  // 11.66Mp/L² propped cantilever (hinge at 0.414L from the pin).
  const cases: [SupportType, number][] = [
    ['simply-supported', 8],
    ['cantilever', 2],
    ['fixed-fixed', 16],
    ['propped-cantilever', 6 + 4 * Math.SQRT2],
  ];
  for (const [support, factor] of cases) {
    it(`${support}: peak load factor = ${factor.toFixed(2)}·Mp/L² within 0.5 %`, () => {
      const { curve, mp } = run(support, 'udl');
      expect(curve.converged).toBe(true);
      const peak = Math.max(...curve.points.map((p) => p.loadFactor));
      // The plastic collapse load needs every hinge to develop Mp; the discretisation places the span
      // hinge at a station (L/200 apart), which costs far less than 0.5 %.
      expect(Math.abs(peak / ((factor * mp) / L ** 2) - 1)).toBeLessThan(0.005);
    });
  }
});

describe('cantilever ductility', () => {
  it('μΔ = 1 + 3(μφ − 1)(Lp/L)(1 − 0.5·Lp/L) for an elastic–perfectly plastic cantilever with a tip load', () => {
    // Park & Paulay (1975), Reinforced Concrete Structures, §6.5 (from memory); also Priestley & Park (1987)
    // in the form with the plastic rotation acting at Lp/2 from the support.
    const lp = 500;
    const { curve, beam } = run('cantilever', 'tip', lp);
    const resp = beam.zones[0]!.hogging;
    const mu = resp.ultimateCurvature / resp.firstYieldCurvature!;
    const yieldDeflection = nominalYieldDeflection(curve.points.map((p) => ({ totalLoad: p.totalLoad, deflection: p.deflection })))!;
    const muDelta = curve.ultimate!.deflection / yieldDeflection;
    const expected = 1 + 3 * (mu - 1) * (lp / L) * (1 - (0.5 * lp) / L);
    expect(Math.abs(muDelta / expected - 1)).toBeLessThan(0.005);
    // and the yield deflection itself is φy·L²/3 (AISC Manual Table 3-23 case 22 with M = PL, EI = My/φy)
    expect(Math.abs(yieldDeflection / ((resp.firstYieldCurvature! * L * L) / 3) - 1)).toBeLessThan(0.002);
  });

  it('hinge rotation capacity is θp = (φu − φy)·Lp', () => {
    // Park & Paulay (1975) §6.5 (from memory)
    const lp = 400;
    const { curve, beam } = run('cantilever', 'tip', lp);
    const resp = beam.zones[0]!.hogging;
    expect(Math.abs(curve.hinges[0]!.rotationCapacity! / ((resp.ultimateCurvature - resp.firstYieldCurvature!) * lp) - 1)).toBeLessThan(1e-6);
    expect(curve.failureCause).toMatch(/rotation capacity/);
  });
});

describe('a symmetric beam responds symmetrically', () => {
  it('fixed–fixed under uniform load: equal end moments, symmetric deflected shape at every level', () => {
    const { curve } = run('fixed-fixed', 'udl');
    const ultimate = curve.distributions.find((d) => d.label === 'ultimate')!;
    const n = ultimate.x.length;
    for (let i = 0; i < n; i++) {
      expect(Math.abs(ultimate.deflection[i]! - ultimate.deflection[n - 1 - i]!)).toBeLessThan(1e-6 * Math.max(...ultimate.deflection) + 1e-9);
      expect(Math.abs(ultimate.moment[i]! - ultimate.moment[n - 1 - i]!)).toBeLessThan(1e-6 * Math.abs(ultimate.moment[0]!));
    }
  });
});
