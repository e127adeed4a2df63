import { describe, expect, it } from 'vitest';
import { buildSectionModel } from '../../../core/section/build.ts';
import { momentCurvature } from '../../../core/section/moment-curvature.ts';
import { sectionStateAtCurvature } from '../../../core/section/state-at.ts';
import { testConcrete, testSteel } from '../../fixtures/simple-materials.ts';
import { fixedResolver } from '../../fixtures/sections.ts';

describe('state at any curvature', () => {
  const { model } = buildSectionModel(
    { id: 's', name: 's', shape: { kind: 'rectangle', width: 300, height: 500 }, concreteId: 'c', bars: [{ steelId: 's', depth: 450, count: 3, diameter: 20 }] },
    fixedResolver(testConcrete({ fc: 30, eps0: 0.002, epsCu: 0.0035, shape: 'parabola' }), testSteel(420)),
  );
  const curve = momentCurvature(model, 'sagging', { codeCrushingStrain: 0.003 });
  it('reproduces the curve at one of its points: same moment, same neutral axis, forces in balance', () => {
    const p = curve.points[Math.floor(curve.points.length / 2)]!;
    const r = sectionStateAtCurvature(model, 'sagging', p.curvature, p.referenceStrain);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.state.point.moment).toBeCloseTo(p.moment, 0);
    expect(r.state.neutralAxisDepthFromTop!).toBeCloseTo(p.neutralAxisDepth!, 6);
    expect(Math.abs(r.state.compressionResultant - r.state.tensionResultant)).toBeLessThan(1e-3 * r.state.compressionResultant);
    // strain is linear over the depth (plane sections): check three samples
    const [a, b, c] = [r.state.concrete[0]!, r.state.concrete[10]!, r.state.concrete[20]!];
    expect((b.strain - a.strain) / (b.depth - a.depth)).toBeCloseTo((c.strain - b.strain) / (c.depth - b.depth), 12);
  });
  it('rejects a negative or non-finite curvature with a message', () => {
    expect(sectionStateAtCurvature(model, 'sagging', Number.NaN)).toMatchObject({ ok: false });
    expect(sectionStateAtCurvature(model, 'sagging', -1e-6)).toMatchObject({ ok: false });
  });
});
