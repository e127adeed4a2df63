/**
 * Internal consistency of the continuous-beam equations: the work-conjugate deflection equals the
 * load-weighted mean of the marched deflections, and spans close (v = 0 at every support).
 */
import { describe, expect, it } from 'vitest';
import { elasticSolver } from '../../../core/continuous/elastic.ts';
import { layoutOf } from '../../../core/continuous/layout.ts';
import { caseLoads } from '../../../core/continuous/loads.ts';
import { releasedField } from '../../../core/continuous/model.ts';
import { evaluate } from '../../../core/continuous/structure.ts';
import { continuousBeam } from '../../fixtures/continuous.ts';

describe('work-conjugate deflection', () => {
  it('(1/P)·∫M̄φ equals Σ p·v / P from the marched deflected shape, cantilevers and springs included', () => {
    const column = { stiffness: 1.5e13, height: 3200, farEnd: 'pinned' as const };
    const def = continuousBeam([5000, 6500, 4000], [
      { kind: 'uniform', loadCase: 'dead', span: 1, magnitude: 10 },
      { kind: 'uniform', loadCase: 'dead', span: 2, magnitude: 14, from: 500, to: 5000 },
      { kind: 'point', loadCase: 'dead', span: 3, magnitude: 30000, position: 1500 },
      { kind: 'uniform', loadCase: 'dead', span: 'left-cantilever', magnitude: 8 },
      { kind: 'point', loadCase: 'dead', span: 'right-cantilever', magnitude: 5000, position: 1200 },
    ], { leftCantilever: 1500, rightCantilever: 1200, supports: [{ kind: 'pinned' }, { kind: 'column', below: column }, { kind: 'fixed' }, { kind: 'pinned' }],
      zones: [{ from: 0, to: 6000, sectionId: 'a' }, { from: 6000, to: 19200, sectionId: 'b' }] });
    const layout = layoutOf(def);
    const loads = caseLoads(def, layout, 'dead');
    const solver = elasticSolver(def, [3e13, 4.5e13], loads, 30);
    const r = solver.solve(loads);
    const field = releasedField(solver.mesh, loads);
    const { evaluation } = evaluate(solver.mesh, solver.rows, solver.law, { held: new Float64Array(field.moment.length), pattern: field.moment }, field.total, [], { redundants: r.redundants, kappa: new Float64Array(0), lambda: 1 });
    // Σ p·v: uniform loads by Simpson on the samples, point loads at their stations
    let work = 0;
    const mesh = solver.mesh;
    for (const seg of mesh.segments) {
      const partLoads = loads[seg.part]!;
      for (let k = 0; k < 3; k++) {
        const q = seg.sample + k;
        const s = mesh.sampleS[q]!;
        const w = partLoads.filter((l) => l.kind === 'uniform' && s >= l.from - 1e-9 && s <= l.to + 1e-9 && !(k === 0 && s >= l.to - 1e-9) && !(k === 2 && s <= l.from + 1e-9)).reduce((a, l) => a + (l.kind === 'uniform' ? l.w : 0), 0);
        work += mesh.sampleWeight[q]! * w * r.sampleDeflection[q]!;
      }
    }
    layout.parts.forEach((part, pi) => {
      for (const l of loads[pi]!) if (l.kind === 'point') {
        const i = solver.stations.x.findIndex((x, j) => solver.stations.part[j] === pi && Math.abs(x - (part.from + l.a)) < 1e-6);
        work += l.p * r.deflection[i]!;
      }
    });
    // Simpson's rule on the quartic deflection under a uniform load is this check's own error (~(h/L)⁴)
    expect(Math.abs(evaluation.work / (work / field.total) - 1)).toBeLessThan(1e-5);
    // the deflection is zero at every support, from both sides
    solver.stations.x.forEach((x, i) => {
      if (layout.supportX.some((xs) => Math.abs(xs - x) < 1e-6)) expect(Math.abs(r.deflection[i]!)).toBeLessThan(1e-9);
    });
    // the reactions carry the loads
    expect(Math.abs(r.reactions.reduce((a, b) => a + b, 0) / field.total - 1)).toBeLessThan(1e-12);
  });
});
