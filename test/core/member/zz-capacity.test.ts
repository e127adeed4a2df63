import { it } from 'vitest';
import { testConcrete, testSteel } from '../../fixtures/simple-materials.ts';
import { fixedResolver } from '../../fixtures/sections.ts';
import { beamOf, fieldOf } from '../../fixtures/beams.ts';
import { capacityCurve } from '../../../core/member/nonlinear.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import type { SupportType } from '../../../core/member/definition.ts';

const concrete = testConcrete({ fc: 30, eps0: 0.002, epsCu: 0.0035, ft: 3, shape: 'parabola' });
const steel = testSteel(420);
const resolver = fixedResolver(concrete, steel);
const section: SectionDefinition = {
  id: 's1', name: 'rect', shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c',
  bars: [{ steelId: 's', depth: 540, count: 3, diameter: 20 }, { steelId: 's', depth: 60, count: 3, diameter: 20 }],
};
const L = 6000;
for (const support of ['simply-supported', 'cantilever', 'fixed-fixed', 'propped-cantilever'] as SupportType[]) {
  it(support, () => {
    const b = beamOf(support, L, [{ from: 0, to: L, section }], resolver, 200);
    const pattern = fieldOf(b, [{ kind: 'uniform', w: 1, from: 0, to: L }]);
    const t0 = performance.now();
    const c = capacityCurve(b, { constant: new Float64Array(b.x.length), pattern, constantTotal: 0, patternTotal: L }, { pattern: 'proportional', hingeLengthMethod: 'priestley-2007' });
    console.log(support, (performance.now() - t0).toFixed(1), 'ms', c.status, c.points.length, 'ctrl', c.controlPosition);
    for (const e of c.events) console.log('  ', e.kind, e.loadFactor.toFixed(3), e.deflection.toFixed(2), e.description);
    console.log('  fy', c.firstYield, 'peak', c.peak, 'ult', c.ultimate, c.failureCause);
    for (const h of c.hinges) console.log('  hinge', h.position, h.direction, h.length.toFixed(0), (h.rotationCapacity*1000).toFixed(2), (h.rotationAtUltimate*1000).toFixed(2));
  });
}
