/**
 * Load–deflection speed (issue 3): a fixed–fixed beam with two sections (support zones with a
 * different section), full curve to ultimate (50+ load levels). Sections are analysed once outside
 * the timed loop; stations as the project default (AnalysisSettings.stations). A fixed arithmetic workload is measured in the same run as a yardstick, so the
 * figure can be read as a ratio on a shared, noisy machine.
 */
import { bench, describe } from 'vitest';
import { benchProject } from '../fixtures/bench-sections.ts';
import { sectionCache } from '../../core/analysis.ts';
import { buildBeamModel } from '../../core/member/beam-model.ts';
import { zoneResponse } from '../../core/member/zones.ts';
import { capacityCurve } from '../../core/member/capacity.ts';
import { releasedMoment } from '../../core/member/statics.ts';

const project = benchProject();
const section = sectionCache(project);
const span = 8000;
const zones = [
  { from: 0, to: 1600, id: 't1' },
  { from: 1600, to: 6400, id: 'bench-tee' },
  { from: 6400, to: 8000, id: 't1' },
].map((z) => {
  const s = section(z.id)!;
  return zoneResponse(z.id, z.from, z.to, s.model!, s.elastic!, s.curves);
});
const beam = buildBeamModel('fixed-fixed', span, zones, [], project.settings.stations);
const pattern = Float64Array.from(beam.x, (x) => releasedMoment('fixed-fixed', span, [{ kind: 'uniform', w: 30, from: 0, to: span }], x));
const loading = { constant: new Float64Array(beam.x.length), pattern, constantTotal: 0, patternTotal: 30 * span };
const settings = { pattern: 'proportional' as const, hingeLengthMethod: 'priestley-2007' as const };
const levels = capacityCurve(beam, loading, settings).points.length;

describe(`fixed–fixed beam, two sections, load–deflection to ultimate (${levels} load levels)`, () => {
  bench('capacity curve', () => {
    capacityCurve(beam, loading, settings);
  }, { time: 3000 });
  bench('yardstick: 2·10⁶ square roots (fixed arithmetic workload)', () => {
    let s = 0;
    for (let i = 0; i < 2_000_000; i++) s += Math.sqrt(i);
    if (s < 0) throw new Error('unreachable');
  }, { time: 1000 });
});
