/**
 * Continuous-beam speed (issue 13): a three-span beam with five zones (span and support sections of
 * the member benchmark) to its failure under uniform load on all spans. Sections are analysed once
 * outside the timed loop. test/bench/run.ts sets it against the single-span fixed–fixed member of
 * member.bench.ts measured in the same run (target: within 3× of it).
 */
import { bench, describe } from 'vitest';
import { benchProject } from '../fixtures/bench-sections.ts';
import { sectionCache } from '../../core/analysis.ts';
import { capacityAnalysis } from '../../core/continuous/capacity.ts';
import type { ContinuousBeamDefinition } from '../../core/continuous/definition.ts';
import { zoneLaws } from '../../core/continuous/analyze.ts';
import { layoutOf } from '../../core/continuous/layout.ts';
import { caseLoads } from '../../core/continuous/loads.ts';

const project = benchProject();
const section = sectionCache(project);
const ids = ['bench-tee', 't1', 'bench-tee', 't1', 'bench-tee'];
const def: ContinuousBeamDefinition = {
  id: 'bench-cb', name: 'bench CB', spans: [8000, 8000, 8000],
  supports: [{ kind: 'pinned' }, { kind: 'pinned' }, { kind: 'pinned' }, { kind: 'pinned' }],
  zones: [
    { from: 0, to: 6400, sectionId: ids[0]! },
    { from: 6400, to: 9600, sectionId: ids[1]! },
    { from: 9600, to: 14400, sectionId: ids[2]! },
    { from: 14400, to: 17600, sectionId: ids[3]! },
    { from: 17600, to: 24000, sectionId: ids[4]! },
  ],
  loads: [1, 2, 3].map((span) => ({ kind: 'uniform' as const, loadCase: 'dead' as const, span, magnitude: 30 })),
  includeSelfWeight: false,
  service: { sustainedLiveFraction: 0.3, durationMonths: 60, limitCases: [] },
  capacity: { pattern: 'proportional', arrangement: { kind: 'all-spans' }, hingeLengthMethod: 'priestley-2007' },
};
const zones = ids.map((id) => zoneLaws(id, section(id)!)!);
const layout = layoutOf(def);
const input = { definition: def, zones, held: layout.parts.map(() => []), pattern: caseLoads(def, layout, 'dead'), hingeLengthMethod: 'priestley-2007' as const, segmentsPerSpan: 40 };
const first = capacityAnalysis(input);

describe(`continuous beam, three spans, five zones, to failure (${first.points.length} load levels, ${first.hinges.length} hinges)`, () => {
  bench('continuous to failure', () => {
    capacityAnalysis(input);
  }, { time: 3000 });
});
