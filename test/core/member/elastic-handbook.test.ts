/**
 * The member engine against handbook elastic beam formulas: with sections that stay uncracked and
 * linear, curvature integration must reproduce the closed forms within 0.1 %.
 */
import { describe, expect, it } from 'vitest';
import { testConcrete, testSteel } from '../../fixtures/simple-materials.ts';
import { fixedResolver } from '../../fixtures/sections.ts';
import { beamOf, fieldOf } from '../../fixtures/beams.ts';
import { solveStatic } from '../../../core/member/static.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import type { SupportType } from '../../../core/member/definition.ts';

// Linear concrete that cracks only at a very high stress, steel that stays elastic: EI constant.
const concrete = testConcrete({ fc: 60, eps0: 0.002, epsCu: 0.01, ft: 60, shape: 'linear' });
const steel = testSteel(2000);
const resolver = fixedResolver(concrete, steel);
const section: SectionDefinition = {
  id: 's1', name: 'rect', shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c',
  bars: [{ steelId: 's', depth: 540, count: 3, diameter: 20 }, { steelId: 's', depth: 60, count: 3, diameter: 20 }],
};
const L = 6000;

function beam(support: SupportType, extra: number[] = []) {
  return beamOf(support, L, [{ from: 0, to: L, section }], resolver, 200, extra);
}
/** EI of the fixture section from the engine's own initial slope, N·mm². */
function stiffness(support: SupportType): number {
  const b = beam(support);
  const r = b.zones[0]!.sagging;
  const m = 1e7;
  return m / r.actualCurvature(m);
}
const EI = stiffness('simply-supported');

describe('uncracked, linear members reproduce handbook formulas (within 0.1 %)', () => {
  const w = 20; // N/mm = 20 kN/m
  const P = 100e3; // N
  it('simply supported, uniform load: Δ = 5wL⁴/384EI at midspan', () => {
    // Roark's Formulas for Stress and Strain, Table 8.1 case 2e (from memory); AISC Manual Table 3-23 case 1
    const b = beam('simply-supported');
    const s = solveStatic(b, fieldOf(b, [{ kind: 'uniform', w, from: 0, to: L }]));
    const mid = b.x.findIndex((x) => x === L / 2);
    expect(Math.abs(s.deflection[mid]! / ((5 * w * L ** 4) / (384 * EI)) - 1)).toBeLessThan(1e-3);
  });
  it('simply supported, central point load: Δ = PL³/48EI', () => {
    // AISC Manual Table 3-23 case 7
    const b = beam('simply-supported');
    const s = solveStatic(b, fieldOf(b, [{ kind: 'point', p: P, a: L / 2 }]));
    const mid = b.x.findIndex((x) => x === L / 2);
    expect(Math.abs(s.deflection[mid]! / ((P * L ** 3) / (48 * EI)) - 1)).toBeLessThan(1e-3);
  });
  it('cantilever, tip load: Δ = PL³/3EI; uniform load: Δ = wL⁴/8EI', () => {
    // AISC Manual Table 3-23 cases 22 and 24
    const b = beam('cantilever');
    const tip = solveStatic(b, fieldOf(b, [{ kind: 'point', p: P, a: L }]));
    expect(Math.abs(tip.deflection[b.x.length - 1]! / ((P * L ** 3) / (3 * EI)) - 1)).toBeLessThan(1e-3);
    const udl = solveStatic(b, fieldOf(b, [{ kind: 'uniform', w, from: 0, to: L }]));
    expect(Math.abs(udl.deflection[b.x.length - 1]! / ((w * L ** 4) / (8 * EI)) - 1)).toBeLessThan(1e-3);
  });
  it('fixed–fixed, uniform load: end moments wL²/12, midspan Δ = wL⁴/384EI', () => {
    // AISC Manual Table 3-23 case 15
    const b = beam('fixed-fixed');
    const s = solveStatic(b, fieldOf(b, [{ kind: 'uniform', w, from: 0, to: L }]));
    expect(s.converged).toBe(true);
    expect(Math.abs(s.moment[0]! / (-(w * L * L) / 12) - 1)).toBeLessThan(1e-3);
    expect(Math.abs(s.moment[b.x.length - 1]! / (-(w * L * L) / 12) - 1)).toBeLessThan(1e-3);
    const mid = b.x.findIndex((x) => x === L / 2);
    expect(Math.abs(s.moment[mid]! / ((w * L * L) / 24) - 1)).toBeLessThan(1e-3);
    expect(Math.abs(s.deflection[mid]! / ((w * L ** 4) / (384 * EI)) - 1)).toBeLessThan(1e-3);
  });
  it('propped cantilever, uniform load: fixed-end moment wL²/8, largest Δ = wL⁴/185EI at 0.4215L', () => {
    // AISC Manual Table 3-23 case 12: Δmax = wl⁴/185EI at x = 0.4215 l from the pinned end
    const b = beam('propped-cantilever');
    const s = solveStatic(b, fieldOf(b, [{ kind: 'uniform', w, from: 0, to: L }]));
    expect(Math.abs(s.moment[0]! / (-(w * L * L) / 8) - 1)).toBeLessThan(1e-3);
    let max = 0;
    let at = 0;
    s.deflection.forEach((d, i) => {
      if (d > max) {
        max = d;
        at = b.x[i]!;
      }
    });
    // The handbook's 185 is rounded (exact: 1/0.0054161 = 184.6): compare with the exact coefficient.
    expect(Math.abs(max / ((w * L ** 4) / (184.6 * EI)) - 1)).toBeLessThan(1e-3);
    expect(Math.abs((L - at) / L - 0.4215)).toBeLessThan(0.006); // station spacing L/200
  });
});
