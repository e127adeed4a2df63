/**
 * Statics of many loads (core/member/load-index.ts) and the zone lookup (zone-lookup.ts): the
 * indexed sums agree with the direct sums over every load, and with handbook formulas.
 * Units: mm, N, N/mm, N·mm.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildLoadIndex, INDEXED_LOADS_FROM } from '../../../core/member/load-index.ts';
import { releasedMoment, releasedShear, type StaticLoad } from '../../../core/member/statics.ts';
import { zoneLookup } from '../../../core/member/zone-lookup.ts';
import { validateMember, MEMBER_LIMITS } from '../../../core/member/validate.ts';
import { member } from '../../fixtures/projects.ts';

const L = 7000;

/** Moment and shear of the loads by the definitions, load by load (independent of the code under test). */
function direct(loads: readonly StaticLoad[], x: number, side: 'left' | 'right') {
  let leftMoment = 0; // Σ load × (x − position) over the loads left of x
  let rightMoment = 0; // Σ load × (position − x) over the loads right of x
  let leftLoad = 0;
  let total = 0;
  for (const l of loads) {
    if (l.kind === 'point') {
      total += l.p;
      if (l.a < x) leftMoment += l.p * (x - l.a);
      if (l.a > x) rightMoment += l.p * (l.a - x);
      if (l.a < x || (side === 'right' && l.a === x)) leftLoad += l.p;
    } else {
      total += l.w * (l.to - l.from);
      const b = Math.min(l.to, x);
      if (b > l.from) { leftMoment += l.w * (b - l.from) * (x - (l.from + b) / 2); leftLoad += l.w * (b - l.from); }
      const a = Math.max(l.from, x);
      if (l.to > a) rightMoment += l.w * (l.to - a) * ((a + l.to) / 2 - x);
    }
  }
  let reactionMoment = 0; // Σ load × (L − position): the left reaction times L
  for (const l of loads) reactionMoment += l.kind === 'point' ? l.p * (L - l.a) : l.w * (l.to - l.from) * (L - (l.from + l.to) / 2);
  return {
    simpleMoment: (reactionMoment * x) / L - leftMoment,
    simpleShear: reactionMoment / L - leftLoad,
    cantileverMoment: -rightMoment,
    cantileverShear: total - leftLoad,
  };
}

const position = fc.integer({ min: 0, max: L });
const load: fc.Arbitrary<StaticLoad> = fc.oneof(
  fc.record({ kind: fc.constant('point' as const), p: fc.double({ min: -5e4, max: 2e5, noNaN: true }), a: position }),
  fc.tuple(position, position, fc.double({ min: -20, max: 60, noNaN: true })).map(([u, v, w]) => ({ kind: 'uniform' as const, w, from: Math.min(u, v), to: Math.max(u, v) })),
);

describe('statics through the sorted-load index', () => {
  it('agrees with the direct sums for random loads, at load positions and between them, both sides', () => {
    fc.assert(fc.property(fc.array(load, { minLength: INDEXED_LOADS_FROM, maxLength: 200 }), fc.array(position, { minLength: 1, maxLength: 10 }), (loads, xs) => {
      const scale = loads.reduce((s, l) => s + (l.kind === 'point' ? Math.abs(l.p) : Math.abs(l.w) * (l.to - l.from)), 1);
      const stations = [...xs, ...loads.slice(0, 10).map((l) => (l.kind === 'point' ? l.a : l.from))];
      for (const x of stations) {
        for (const side of ['left', 'right'] as const) {
          const d = direct(loads, x, side);
          // Round-off of sums of up to 200 loads: 1e-9 of the total load (times the span for moments).
          expect(Math.abs(releasedMoment('simply-supported', L, loads, x) - d.simpleMoment)).toBeLessThan(1e-9 * scale * L);
          expect(Math.abs(releasedMoment('cantilever', L, loads, x) - d.cantileverMoment)).toBeLessThan(1e-9 * scale * L);
          expect(Math.abs(releasedShear('simply-supported', L, loads, x, side) - d.simpleShear)).toBeLessThan(1e-9 * scale);
          expect(Math.abs(releasedShear('cantilever', L, loads, x, side) - d.cantileverShear)).toBeLessThan(1e-9 * scale);
        }
      }
    }), { numRuns: 150 });
  });

  it('100 equal point loads spread evenly give the midspan moment of the same total load spread uniformly', () => {
    // n loads P at (i − ½)L/n: M(L/2) = nP·L/8, the simple-beam uniform-load moment W·L/8
    // (AISC Manual Table 3-23 case 1, M = wL²/8 with W = wL).
    const n = 100;
    const P = 5000;
    const loads: StaticLoad[] = Array.from({ length: n }, (_, i) => ({ kind: 'point', p: P, a: ((i + 0.5) * L) / n }));
    expect(releasedMoment('simply-supported', L, loads, L / 2)).toBeCloseTo((n * P * L) / 8, 3);
    // Cantilever under a uniform load over its length: M(0) = −wL²/2 (AISC Manual Table 3-23 case 22).
    const strips: StaticLoad[] = Array.from({ length: n }, (_, i) => ({ kind: 'uniform', w: 12, from: (i * L) / n, to: ((i + 1) * L) / n }));
    expect(releasedMoment('cantilever', L, strips, 0)).toBeCloseTo((-12 * L * L) / 2, 1);
  });

  it('a uniform load that ends before it starts carries nothing, as in the direct sums', () => {
    const index = buildLoadIndex([{ kind: 'uniform', w: 10, from: 3000, to: 1000 }, { kind: 'point', p: 100, a: 2000 }]);
    expect(index.loadLeft(0, L, L, true)).toBe(100);
  });
});

describe('zone lookup', () => {
  it('gives the same zone as a scan of every zone, for tilings and for overlapping zones', () => {
    const zone = fc.tuple(fc.integer({ min: 0, max: 100 }), fc.integer({ min: 0, max: 100 })).map(([a, b]) => ({ from: Math.min(a, b), to: Math.max(a, b) }));
    fc.assert(fc.property(fc.array(zone, { minLength: 1, maxLength: 30 }), fc.array(fc.double({ min: -5, max: 105, noNaN: true }), { maxLength: 40 }), (zones, xs) => {
      const find = zoneLookup(zones);
      for (const x of [...xs, ...zones.flatMap((z) => [z.from, z.to])]) expect(find(x)).toBe(zones.findIndex((z) => x >= z.from && x <= z.to));
    }), { numRuns: 400 });
  });
});

describe('documented limits of a member', () => {
  it(`refuses more than ${MEMBER_LIMITS.zones} zones and ${MEMBER_LIMITS.loads} loads, naming the field and the limit`, () => {
    const zones = Array.from({ length: 10000 }, (_, i) => ({ from: (6000 * i) / 10000, to: (6000 * (i + 1)) / 10000, sectionId: 'r1' }));
    const manyZones = validateMember({ ...member('B', 'simply-supported', 6000, 'r1'), zones }, 'members[0] "B"', new Set(['r1']));
    expect(manyZones.map((d) => [d.path, d.message])).toEqual([['members[0] "B".zones', 'a member may have at most 200 zones, got 10000']]);
    const loads = Array.from({ length: 100000 }, (_, i) => ({ kind: 'point' as const, loadCase: 'live' as const, magnitude: 10, position: 1 + i * 0.05 }));
    const manyLoads = validateMember({ ...member('B', 'simply-supported', 6000, 'r1'), loads }, 'members[0] "B"', new Set(['r1']));
    expect(manyLoads.map((d) => [d.path, d.message])).toEqual([['members[0] "B".loads', 'a member may have at most 2000 loads, got 100000']]);
    const atLimit = Array.from({ length: MEMBER_LIMITS.loads }, (_, i) => ({ kind: 'point' as const, loadCase: 'live' as const, magnitude: 10, position: 1 + i }));
    expect(validateMember({ ...member('B', 'simply-supported', 6000, 'r1'), loads: atLimit }, 'm', new Set(['r1']))).toEqual([]);
  });
});
