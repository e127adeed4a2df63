/**
 * Binary searches in ascending lists (core/numeric/search.ts), shared by the plastic-hinge law and the
 * service models' knots: checked against a plain scan on lists with repeats, ends and empty lists.
 */
import { describe, expect, it } from 'vitest';
import { firstAbove, pushBetween } from '../../../core/numeric/search.ts';

const lists: number[][] = [[], [1], [0, 1, 1, 1, 2, 5, 5, 9], [-3, -1, 0, 0.5, 0.5, 0.5, 7], Array.from({ length: 37 }, (_, i) => Math.floor(i / 3) * 0.25)];
const probes = [-10, -3, -1, 0, 0.25, 0.5, 1, 1.5, 2, 2.75, 5, 7, 9, 10];

describe('searches in ascending lists', () => {
  it('firstAbove: the first index whose value is above v, as a scan finds it', () => {
    for (const xs of lists) for (const v of probes) {
      const scan = xs.findIndex((x) => x > v);
      expect(firstAbove(xs, v), `${JSON.stringify(xs)} above ${v}`).toBe(scan < 0 ? xs.length : scan);
    }
  });

  it('pushBetween: the values strictly between lo and hi, in order, appended to what is there', () => {
    for (const xs of lists) for (const lo of probes) for (const hi of probes) {
      const out = [42];
      pushBetween(xs, lo, hi, out);
      expect(out, `${JSON.stringify(xs)} in (${lo}, ${hi})`).toEqual([42, ...xs.filter((x) => x > lo && x < hi)]);
    }
  });
});
