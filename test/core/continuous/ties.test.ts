/**
 * Twins of a symmetric continuous beam (two supports, two end spans) reach their values together to
 * the last few bits. Which one a strict `>` picked depended on rounding, which differs between
 * JavaScript engines: the app (Chromium) and the command line (Node.js) printed different spans for
 * the governing shear and numbered twin hinges differently in the same project's report. Within
 * rounding the first in scan order — the leftmost — is taken (core/numeric/ties.ts).
 */
import { describe, expect, it } from 'vitest';
import { analyzeContinuousMembers } from '../../../core/analysis.ts';
import { differBeyondRounding, exceedsBeyondRounding, TIE_RELATIVE } from '../../../core/numeric/ties.ts';
import { demoProjectSI } from '../../../core/project/demo.ts';

describe('exceedsBeyondRounding', () => {
  it('counts values within rounding as equal and a real excess as larger', () => {
    expect(exceedsBeyondRounding(1 + 1e-13, 1)).toBe(false);
    expect(exceedsBeyondRounding(1, 1 + 1e-13)).toBe(false);
    expect(exceedsBeyondRounding(1 + 10 * TIE_RELATIVE, 1)).toBe(true);
    expect(exceedsBeyondRounding(-1, -1 - 1e-6)).toBe(true);
    expect(exceedsBeyondRounding(0, 0)).toBe(false);
    expect(exceedsBeyondRounding(1e-200, 0)).toBe(true);
    expect(differBeyondRounding(2, 2 + 1e-12)).toBe(false);
    expect(differBeyondRounding(2 + 1e-6, 2)).toBe(true);
    expect(differBeyondRounding(2, 2 + 1e-6)).toBe(true);
  });
});

describe('a symmetric three-span beam (the SI demo CB-1) names the left twin first', () => {
  const project = demoProjectSI();
  const definition = project.continuousMembers!.find((m) => m.id === 'CB-1')!;
  const result = analyzeContinuousMembers(project, ['CB-1'])[0]!;
  const total = definition.spans.reduce((sum, l) => sum + l, 0) + (definition.leftCantilever ?? 0) + (definition.rightCantilever ?? 0);

  it('is symmetric, so every hinge has a twin at the mirrored place (the premise of this test)', () => {
    const hinges = result.capacity!.hinges;
    expect(hinges.length).toBeGreaterThanOrEqual(4);
    for (const h of hinges) {
      // (A support holds two hinge sites, one each side: the twin is the one formed at the same load.)
      const twin = hinges.find((o) => Math.abs(o.position - (total - h.position)) < 1e-6 * total && Math.abs(o.loadFactor - h.loadFactor) < 1e-6 * h.loadFactor);
      expect(twin, `twin of the hinge at ${h.position} mm`).toBeDefined();
    }
  });

  it('numbers twin hinges left to right and lists their events in that order', () => {
    const hinges = [...result.capacity!.hinges].sort((a, b) => a.order - b.order);
    for (let k = 1; k < hinges.length; k++) {
      const [a, b] = [hinges[k - 1]!, hinges[k]!];
      if (Math.abs(a.loadFactor - b.loadFactor) <= 1e-7 * a.loadFactor && a.position !== total - a.position) expect(a.position, `hinges ${a.order} and ${b.order}`).toBeLessThan(b.position);
    }
    const formed = result.capacity!.events.filter((e) => e.kind === 'hinge').map((e) => Number(/hinge (\d+) forms/.exec(e.description)![1]));
    expect(formed).toEqual([...formed].sort((a, b) => a - b));
  });

  it('takes the left twin for the shear at the largest load and the governing shear', () => {
    const mechanism = result.checks!.shear!.mechanism!.governing;
    const governing = result.checks!.shear!.governing;
    // The largest shear of the symmetric beam is at both inner supports' outer sides: span 1 at
    // 4.80 m from its left end and span 3 at 1.20 m; the left one is named.
    expect([mechanism.part, mechanism.s]).toEqual(['span 1', 4800]);
    expect([governing.part, governing.s]).toEqual(['span 1', 4800]);
  });

});
