import { it } from 'vitest';
import { testConcrete, testSteel } from '../../fixtures/simple-materials.ts';
import { fixedResolver } from '../../fixtures/sections.ts';
import { beamOf, fieldOf } from '../../fixtures/beams.ts';
import { solveStatic } from '../../../core/member/nonlinear.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
const concrete = testConcrete({ fc: 30, eps0: 0.002, epsCu: 0.0035, ft: 3, shape: 'parabola' });
const steel = testSteel(420);
const resolver = fixedResolver(concrete, steel);
const section: SectionDefinition = {
  id: 's1', name: 'rect', shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c',
  bars: [{ steelId: 's', depth: 540, count: 3, diameter: 20 }, { steelId: 's', depth: 60, count: 3, diameter: 20 }],
};
const L = 6000;
it('dbg', () => {
  const b = beamOf('fixed-fixed', L, [{ from: 0, to: L, section }], resolver, 200);
  const h = b.zones[0]!.hogging;
  console.log('hog Mcr', h.crackingMoment, 'peak', h.peakMoment, 'My', h.firstYieldMoment);
  (globalThis as any).DEBUG_NEWTON = true;
  for (const lam of [21.3]) {
    const s = solveStatic(b, fieldOf(b, [{ kind: 'uniform', w: lam, from: 0, to: L }]));
    console.log(lam, s.converged, (s.moment[0]!/1e6).toFixed(3), (s.moment[100]!/1e6).toFixed(3), s.deflection[100]!.toFixed(3));
  }
});
