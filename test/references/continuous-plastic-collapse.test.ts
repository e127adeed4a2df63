/**
 * The continuous-beam engine to failure against plastic collapse loads by the mechanism method,
 * for elastic–perfectly plastic laws with different sagging and hogging strengths.
 */
import { describe, expect, it } from 'vitest';
import { capacityAnalysis } from '../../core/continuous/capacity.ts';
import { bilinearLaw, type HingeBars, type ZoneLaws } from '../../core/continuous/laws.ts';
import { layoutOf } from '../../core/continuous/layout.ts';
import { caseLoads } from '../../core/continuous/loads.ts';
import { continuousBeam, fixed, pinned, uniformOnSpans } from '../fixtures/continuous.ts';
import type { ContinuousSupport } from '../../core/continuous/definition.ts';

const L = 6000;
const EI = 4e13;
const bars: HingeBars = { effectiveDepth: 500, barDiameter: 20, yieldStress: 500, ultimateStress: 600, ultimateStrain: 0.08 };

function zone(mpSag: number, mpHog: number, ductility = 40): ZoneLaws {
  const law = (mp: number) => bilinearLaw(mp / EI, mp, (ductility * mp) / EI, mp, bars);
  return { sectionId: 's', sagging: law(mpSag), hogging: law(mpHog) };
}

function collapse(spans: number[], z: ZoneLaws, segments = 40, supports?: readonly ContinuousSupport[]) {
  const def = continuousBeam(spans, uniformOnSpans(spans.length, 1), { supports });
  const layout = layoutOf(def);
  const pattern = caseLoads(def, layout, 'dead');
  return capacityAnalysis({ definition: def, zones: [z], held: layout.parts.map(() => []), pattern, hingeLengthMethod: 'user', userHingeLength: 300, segmentsPerSpan: segments });
}

/**
 * Upper-bound mechanism of an end span (pin at the end, hogging hinge Mh at the interior support,
 * sagging hinge Ms at x): w = 2(Ms·L + Mh·x)/(x·L·(L − x)) minimised over x (Neal, The Plastic
 * Methods of Structural Analysis, 1977 — the method; the minimisation is done numerically here).
 */
function endSpanCollapse(ms: number, mh: number, span: number): { w: number; x: number } {
  let best = { w: Infinity, x: 0 };
  for (let i = 1; i < 100000; i++) {
    const x = (span * i) / 100000;
    const w = (2 * (ms * span + mh * x)) / (x * span * (span - x));
    if (w < best.w) best = { w, x };
  }
  return best;
}

describe('plastic collapse of two equal spans under uniform load', () => {
  const mp = 2e8;
  it('Mp+ = Mp− = Mp: wu = 11.66 Mp/L² with the span hinge at 0.414 L', () => {
    // Neal (1977) / any plastic-design text (from memory): wu = (6 + 4√2)·Mp/L² = 11.657 Mp/L², span hinge at (√2 − 1)L = 0.414L from the end support
    const result = collapse([L, L], zone(mp, mp));
    expect(result.converged).toBe(true);
    expect(Math.abs(result.peakLoadFactor / ((11.657 * mp) / L ** 2) - 1)).toBeLessThan(0.005);
    const spanHinges = result.hinges.filter((h) => h.kind === 'span').map((h) => h.position).sort((a, b) => a - b);
    expect(spanHinges.length).toBe(2);
    expect(Math.abs(spanHinges[0]! / L - 0.4142)).toBeLessThan(0.01);
    expect(Math.abs((2 * L - spanHinges[1]!) / L - 0.4142)).toBeLessThan(0.01);
    // the support hinge forms first, at the elastic load wL²/8 = Mp
    expect(result.hinges[0]!.kind).toBe('support');
    expect(Math.abs(result.hinges[0]!.loadFactor / ((8 * mp) / L ** 2) - 1)).toBeLessThan(0.01);
  });
  it('Mp− = 1.5 Mp+: the mechanism load of the end span', () => {
    const ms = 2e8;
    const mh = 3e8;
    const expected = endSpanCollapse(ms, mh, L);
    const result = collapse([L, L], zone(ms, mh));
    expect(Math.abs(result.peakLoadFactor / expected.w - 1)).toBeLessThan(0.005);
  });
  it('does not depend on the number of stations (< 1 %)', () => {
    const coarse = collapse([L, L], zone(2e8, 2.6e8), 16).peakLoadFactor;
    const fine = collapse([L, L], zone(2e8, 2.6e8), 64).peakLoadFactor;
    expect(Math.abs(coarse / fine - 1)).toBeLessThan(0.01);
  });
});

describe('plastic collapse of three spans', () => {
  it('equal spans, Mp− = 1.2 Mp+: the end spans collapse first, at the end-span mechanism load', () => {
    const ms = 1.8e8;
    const mh = 2.16e8;
    const expected = endSpanCollapse(ms, mh, L);
    // middle span mechanism: w = 8(Ms + Mh)/L² — larger, so the end spans govern
    expect((8 * (ms + mh)) / L ** 2).toBeGreaterThan(expected.w);
    const result = collapse([L, L, L], zone(ms, mh));
    expect(Math.abs(result.peakLoadFactor / expected.w - 1)).toBeLessThan(0.005);
  });
  it('a long middle span governs: w = 8(Ms + Mh)/L2² (beam mechanism of an interior span)', () => {
    // Neal (1977), beam mechanism of a span with hinges at both supports and midspan (from memory)
    const ms = 2e8;
    const mh = 2e8;
    const l2 = 1.6 * L;
    const result = collapse([L, l2, L], zone(ms, mh));
    expect(Math.abs(result.peakLoadFactor / ((8 * (ms + mh)) / l2 ** 2) - 1)).toBeLessThan(0.005);
  });
});

describe('supports that restrain rotation', () => {
  it('a fixed-ended single span collapses at 16 Mp/L²', () => {
    // Neal (1977), fixed-ended beam under uniform load (from memory): wu = 16Mp/L²
    const mp = 2e8;
    const result = collapse([L], zone(mp, mp), 40, [fixed, fixed]);
    expect(Math.abs(result.peakLoadFactor / ((16 * mp) / L ** 2) - 1)).toBeLessThan(0.005);
    void pinned;
  });
});
