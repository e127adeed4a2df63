/**
 * Large inputs (issue 17): the work must grow no faster than n log n with the number of loads and
 * zones. Rows, each read as a ratio measured in the same run:
 *  - the released-moment field at one station per point load, 10,000 loads: statics through the
 *    sorted-load index (core/member/load-index.ts) against the direct loop over every load at every
 *    station that statics used before (the baseline, quadratic);
 *  - a whole member (analyzeProject) with 1,900 point loads (near the 2,000 loads MEMBER_LIMITS allows) against
 *    the same member with 475: a ratio near 4 is linear growth, near 16 quadratic;
 *  - the same for 200 zones (the limit) against 50.
 */
import { bench, describe } from 'vitest';
import { analyzeProject } from '../../core/analysis.ts';
import { releasedMoment, type StaticLoad } from '../../core/member/statics.ts';
import type { MemberDefinition } from '../../core/project/types.ts';
import { member, smallProject } from '../fixtures/projects.ts';

const span = 6000;

/** `n` point loads spread along the span. */
function pointLoads(n: number): StaticLoad[] {
  return Array.from({ length: n }, (_, i) => ({ kind: 'point' as const, p: 100, a: 1 + ((span - 2) * (i + 0.5)) / n }));
}

/** The moment of a simple span by the direct loop over every load (statics before the index). */
function directMoment(loads: readonly StaticLoad[], x: number): number {
  let reaction = 0;
  for (const l of loads) if (l.kind === 'point') reaction += (l.p * (span - l.a)) / span;
  let m = reaction * x;
  for (const l of loads) if (l.kind === 'point' && l.a < x) m -= l.p * (x - l.a);
  return m;
}

const loads = pointLoads(10_000);
const stations = loads.map((l) => (l.kind === 'point' ? l.a : 0));

function withPointLoads(n: number): MemberDefinition {
  const m = member('B', 'simply-supported', span, 'r1');
  return { ...m, loads: [...m.loads, ...Array.from({ length: n }, (_, i) => ({ kind: 'point' as const, loadCase: 'live' as const, magnitude: 100, position: 1 + ((span - 2) * (i + 0.5)) / n }))] };
}
function withZones(n: number): MemberDefinition {
  return { ...member('B', 'simply-supported', span, 'r1'), zones: Array.from({ length: n }, (_, i) => ({ from: (span * i) / n, to: (span * (i + 1)) / n, sectionId: 'r1' })) };
}
const pointsFew = smallProject('ACI 318-19', [withPointLoads(475)]);
const pointsMany = smallProject('ACI 318-19', [withPointLoads(1900)]);
const zonesFew = smallProject('ACI 318-19', [withZones(50)]);
const zonesMany = smallProject('ACI 318-19', [withZones(200)]);

describe('statics of 10,000 point loads at 10,000 stations', () => {
  bench('large: indexed statics field', () => {
    let s = 0;
    for (const x of stations) s += releasedMoment('simply-supported', span, loads, x);
    if (!Number.isFinite(s)) throw new Error('unreachable');
  }, { time: 1000 });
  bench('large baseline: direct loop field', () => {
    let s = 0;
    for (const x of stations) s += directMoment(loads, x);
    if (!Number.isFinite(s)) throw new Error('unreachable');
  }, { time: 1000, iterations: 2 });
});

describe('a member with many point loads or zones (analyzeProject)', () => {
  // Each project once before timing: the first analysis compiles the engine's code paths.
  for (const p of [pointsFew, zonesFew]) analyzeProject(p);
  bench('large: 1,900 point loads', () => {
    analyzeProject(pointsMany);
  }, { time: 2000, iterations: 3 });
  bench('large: 475 point loads', () => {
    analyzeProject(pointsFew);
  }, { time: 2000, iterations: 3 });
  bench('large: 200 zones', () => {
    analyzeProject(zonesMany);
  }, { time: 2000, iterations: 3 });
  bench('large: 50 zones', () => {
    analyzeProject(zonesFew);
  }, { time: 2000, iterations: 3 });
});
