/**
 * The fast paths of the segment integration (ends on one piece, or on one branch across knots)
 * agree with the general splitting routine, and both agree with a fine numerical integration.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { sectionCache } from '../../../core/analysis.ts';
import { segmentIntegrals, segmentIntegralsFromEnds, zoneCurvature, type SegmentIntegrals } from '../../../core/member/beam-model.ts';
import { zoneResponse } from '../../../core/member/zones.ts';
import { smallProject } from '../../fixtures/projects.ts';

const fresh = (): SegmentIntegrals => ({ i0: 0, i1: 0, j00: 0, j01: 0, j11: 0, phiA: 0, phiB: 0 });

describe('segment integrals of the piecewise-linear curvature law', () => {
  const s = sectionCache(smallProject())('t1')!;
  const zone = zoneResponse('t1', 0, 1000, s.model!, s.elastic!, s.curves);
  const peak = Math.min(zone.sagging.peakMoment, zone.hogging.peakMoment);
  const ratio = fc.integer({ min: -990, max: 990 }).map((k) => k / 1000 + 1e-4);
  const moments = fc.tuple(ratio, ratio);

  it('fast paths equal the general routine', () => {
    fc.assert(fc.property(moments, ([ra, rb]) => {
      const ma = ra * peak;
      const mb = rb * peak;
      const a = zoneCurvature(zone, ma, { value: 0, slope: 0 });
      const b = zoneCurvature(zone, mb, { value: 0, slope: 0 });
      const fast = segmentIntegralsFromEnds(zone, ma, mb, { ...a }, { ...b }, false, fresh());
      const slow = segmentIntegrals(zone, ma, mb, false, fresh());
      const close = (x: number, y: number) => Math.abs(x - y) <= 1e-9 * (Math.abs(x) + Math.abs(y)) + 1e-30;
      return close(fast.i0, slow.i0) && close(fast.i1, slow.i1) && close(fast.j00, slow.j00) && close(fast.j01, slow.j01) && close(fast.j11, slow.j11);
    }), { numRuns: 300 });
  });

  it('∫φ dt and ∫φ·t dt match a fine midpoint integration of the law', () => {
    // midpoint rule with 20 000 points (common practice, no source)
    for (const [ra, rb] of [[0.05, 0.9], [-0.8, 0.6], [0.95, 0.2], [-0.3, -0.97]] as const) {
      const ma = ra * peak;
      const mb = rb * peak;
      const exact = segmentIntegrals(zone, ma, mb, false, fresh());
      let i0 = 0;
      let i1 = 0;
      const n = 20000;
      const out = { value: 0, slope: 0 };
      for (let k = 0; k < n; k++) {
        const t = (k + 0.5) / n;
        const phi = zoneCurvature(zone, ma + (mb - ma) * t, out).value;
        i0 += phi / n;
        i1 += (phi * t) / n;
      }
      expect(Math.abs(exact.i0 - i0)).toBeLessThan(1e-4 * Math.abs(exact.i0));
      expect(Math.abs(exact.i1 - i1)).toBeLessThan(1e-4 * Math.abs(exact.i1));
    }
  });
});
