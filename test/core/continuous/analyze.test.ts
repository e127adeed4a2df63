/**
 * A continuous beam of real sections through the whole engine: zone laws from the section curves,
 * elastic envelopes, the analysis to failure with its hinge sequence, and redistribution.
 */
import { describe, expect, it } from 'vitest';
import { analyzeContinuousBeam, type ContinuousContext } from '../../../core/continuous/analyze.ts';
import type { ContinuousBeamDefinition } from '../../../core/continuous/definition.ts';
import { materialLibrary } from '../../../core/materials/library.ts';
import type { MaterialSpec } from '../../../core/materials/specs.ts';
import { analyzeSection, type SectionAnalysis } from '../../../core/section/analyze.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';

const specs: MaterialSpec[] = [
  { kind: 'concrete', id: 'c30', name: 'C30', strength: 30, compressionModel: 'hognestad', tensionModel: 'tension-stiffening' },
  { kind: 'steel', id: 'b500', name: 'B500', model: 'park-paulay', yieldStress: 500, ultimateStress: 600, hardeningStrain: 0.01, ruptureStrain: 0.1 },
];
const span: SectionDefinition = {
  id: 'span', name: 'span 300×600', shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c30',
  bars: [{ steelId: 'b500', depth: 540, count: 4, diameter: 20 }, { steelId: 'b500', depth: 55, count: 2, diameter: 16 }],
};
const support: SectionDefinition = {
  id: 'support', name: 'support 300×600', shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c30',
  bars: [{ steelId: 'b500', depth: 540, count: 2, diameter: 20 }, { steelId: 'b500', depth: 55, count: 5, diameter: 20 }],
};

function context(code: 'ACI 318-19' | 'EN 1992-1-1' = 'ACI 318-19'): ContinuousContext {
  const library = materialLibrary(specs, code);
  const cache = new Map<string, SectionAnalysis>();
  for (const s of [span, support]) cache.set(s.id, analyzeSection(s, `sections[${s.id}]`, library, { code, momentDropFraction: 0.8, bilinearMethod: 'priestley-2007' }));
  return {
    code,
    segments: 40,
    section: (id) => cache.get(id),
    sectionIds: new Set(cache.keys()),
    path: 'members[0] "CB"',
    strengthFactors: code === 'ACI 318-19' ? { dead: 1.2, superimposed: 1.2, live: 1.6 } : { dead: 1.35, superimposed: 1.35, live: 1.5 },
    deadOnlyFactor: code === 'ACI 318-19' ? 1.4 : undefined,
  };
}

/** Three spans 6.0, 7.2, 6.0 m with support zones of 1.5 m each side of the interior supports. */
const beam: ContinuousBeamDefinition = {
  id: 'cb',
  name: 'CB-1',
  spans: [6000, 7200, 6000],
  supports: [{ kind: 'pinned' }, { kind: 'pinned' }, { kind: 'pinned' }, { kind: 'pinned' }],
  zones: [
    { from: 0, to: 4500, sectionId: 'span' },
    { from: 4500, to: 7500, sectionId: 'support' },
    { from: 7500, to: 11700, sectionId: 'span' },
    { from: 11700, to: 14700, sectionId: 'support' },
    { from: 14700, to: 19200, sectionId: 'span' },
  ],
  loads: [1, 2, 3].flatMap((s) => [
    { kind: 'uniform' as const, loadCase: 'superimposed' as const, span: s, magnitude: 6 },
    { kind: 'uniform' as const, loadCase: 'live' as const, span: s, magnitude: 10 },
  ]),
  service: { sustainedLiveFraction: 0.3, durationMonths: 60, limitCases: ['aci-floor-immediate'] },
  capacity: { pattern: 'proportional', arrangement: { kind: 'all-spans' }, hingeLengthMethod: 'priestley-2007' },
};

describe('a three-span beam of real sections', () => {
  const result = analyzeContinuousBeam(beam, context());
  it('analyses without errors, the curve reaching a limit state', () => {
    expect(result.errors).toEqual([]);
    expect(result.capacity!.converged).toBe(true);
    expect(result.capacity!.ultimate).not.toBeNull();
    expect(result.capacity!.points.length).toBeGreaterThan(10);
  });
  it('forms hinges at the interior supports before the spans, load factors rising', () => {
    const hinges = result.capacity!.hinges;
    expect(hinges.length).toBeGreaterThanOrEqual(2);
    expect(hinges[0]!.direction).toBe('hogging');
    for (let i = 1; i < hinges.length; i++) expect(hinges[i]!.loadFactor).toBeGreaterThanOrEqual(hinges[i - 1]!.loadFactor - 1e-9);
    for (const h of hinges) {
      expect(h.rotationCapacity).toBeGreaterThan(0);
      expect(h.length).toBeGreaterThan(0);
    }
  });
  it('the peak load lies between first yield and the elastic–plastic upper bound', () => {
    // upper bound: every span's beam mechanism with the sections' peak moments (mechanism method)
    const c = result.capacity!;
    expect(c.peakLoadFactor).toBeGreaterThan(c.hinges[0]!.loadFactor);
    expect(c.displacementDuctility!).toBeGreaterThan(1);
  });
  it('redistribution used at the interior supports is compared with ACI 318-19 6.6.5', () => {
    expect(result.redistribution.map((r) => r.support)).toEqual([2, 3]);
    for (const r of result.redistribution) {
      expect(r.permitted.clause).toMatch(/ACI 318-19 6\.6\.5/);
      expect(r.usedPercent).toBeGreaterThan(0);
      expect(Number.isFinite(r.elasticMoment)).toBe(true);
    }
  });
  it('has no NaN or Infinity anywhere in the result', () => {
    const walk = (v: unknown, path: string): void => {
      if (typeof v === 'number') expect(Number.isFinite(v), path).toBe(true);
      else if (Array.isArray(v)) v.forEach((x, i) => walk(x, `${path}[${i}]`));
      else if (v && typeof v === 'object') for (const [k, x] of Object.entries(v)) walk(x, `${path}.${k}`);
    };
    walk(JSON.parse(JSON.stringify(result)), 'result');
    // JSON turns NaN and Infinity into null: none may be there either
    expect(JSON.stringify(result)).not.toMatch(/null/);
  });
  it('bad input comes back as errors with field paths and ranges', () => {
    const bad = analyzeContinuousBeam({ ...beam, spans: [6000, -5, 6000], loads: [{ kind: 'point', loadCase: 'live', span: 4, magnitude: 1000, position: 10 }] }, context());
    expect(bad.errors.map((e) => e.path)).toEqual(expect.arrayContaining(['members[0] "CB".spans[1]', 'members[0] "CB".loads[0].span']));
  });
});
