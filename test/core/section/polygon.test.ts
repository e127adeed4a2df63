/**
 * Geometry predicates (core/section/polygon.ts) against hand-worked cases, with the tolerance
 * scaled to the section.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { circlePlacement, distanceToSegment, edgesFoldBack, geometryTolerance, orientation, pointInPolygon, segmentsMeet } from '../../../core/section/polygon.ts';

const P = (x: number, y: number) => ({ x, y });
const tol = 1e-6;

describe('orientation and segment tests', () => {
  it('tells left, right and on the line, with a tolerance in length', () => {
    // Sign of the cross product (b − a) × (c − a): Cormen et al., Introduction to Algorithms, §33.1 (from memory).
    expect(orientation(P(0, 0), P(10, 0), P(5, 1), tol)).toBe(1);
    expect(orientation(P(0, 0), P(10, 0), P(5, -1), tol)).toBe(-1);
    expect(orientation(P(0, 0), P(10, 0), P(5, 0), tol)).toBe(0);
    // 10⁻⁷ mm off a 20 m line is "on" it with a 10⁻⁶ mm tolerance, whatever the length of the line.
    expect(orientation(P(0, 0), P(20000, 0), P(3, 1e-7), tol)).toBe(0);
    expect(orientation(P(0, 0), P(20000, 0), P(3, 1e-5), tol)).toBe(1);
  });

  it('finds crossings, touches and collinear overlaps, and nothing else', () => {
    // Segment intersection by orientation signs plus the collinear cases: Cormen et al. §33.1 (from memory).
    expect(segmentsMeet(P(0, 0), P(10, 10), P(0, 10), P(10, 0), tol)).toBe(true); // an X
    expect(segmentsMeet(P(0, 0), P(10, 0), P(5, 0), P(5, 8), tol)).toBe(true); // a T
    expect(segmentsMeet(P(0, 0), P(10, 0), P(6, 0), P(14, 0), tol)).toBe(true); // overlapping on one line
    expect(segmentsMeet(P(0, 0), P(10, 0), P(11, 0), P(14, 0), tol)).toBe(false); // on one line, apart
    expect(segmentsMeet(P(0, 0), P(10, 0), P(0, 1), P(10, 1), tol)).toBe(false); // parallel
    expect(segmentsMeet(P(0, 0), P(10, 0), P(5, 0.01), P(5, 8), tol)).toBe(false); // a near miss of 0.01 mm
  });

  it('agrees with exact rational arithmetic on random integer segments', () => {
    // With integer coordinates the cross products are exact in doubles: the test is decided by signs alone.
    const coord = fc.integer({ min: -50, max: 50 });
    const pt = fc.record({ x: coord, y: coord });
    fc.assert(fc.property(pt, pt, pt, pt, (a, b, c, d) => {
      const cross = (p: typeof a, q: typeof a, r: typeof a) => Math.sign((q.x - p.x) * (r.y - p.y) - (q.y - p.y) * (r.x - p.x));
      const onSegment = (p: typeof a, q: typeof a, r: typeof a) => cross(p, q, r) === 0 && Math.min(p.x, q.x) <= r.x && r.x <= Math.max(p.x, q.x) && Math.min(p.y, q.y) <= r.y && r.y <= Math.max(p.y, q.y);
      const d1 = cross(c, d, a);
      const d2 = cross(c, d, b);
      const d3 = cross(a, b, c);
      const d4 = cross(a, b, d);
      const expected = (d1 * d2 < 0 && d3 * d4 < 0) || onSegment(c, d, a) || onSegment(c, d, b) || onSegment(a, b, c) || onSegment(a, b, d);
      expect(segmentsMeet(a, b, c, d, 1e-9)).toBe(expected);
    }), { numRuns: 2000 });
  });

  it('knows a spike that folds back from a corner', () => {
    expect(edgesFoldBack(P(0, 0), P(0, 10), P(0, 4), tol)).toBe(true);
    expect(edgesFoldBack(P(0, 0), P(0, 10), P(0, 14), tol)).toBe(false); // straight on
    expect(edgesFoldBack(P(0, 0), P(0, 10), P(4, 10), tol)).toBe(false); // a corner
  });

  it('scales the tolerance to the section', () => {
    expect(geometryTolerance([P(0, 0), P(300, 0), P(300, 400)])).toBeCloseTo(5e-7, 12);
    expect(geometryTolerance([P(0, 0), P(0.1, 0)])).toBe(1e-9);
  });
});

describe('points and bars in a region', () => {
  const outline = [P(0, 0), P(400, 0), P(400, 600), P(0, 600)];
  const hole = [P(100, 200), P(300, 200), P(300, 400), P(100, 400)];

  it('points in a polygon by the even–odd rule, edges included', () => {
    expect(pointInPolygon(P(200, 300), outline, tol)).toBe(true);
    expect(pointInPolygon(P(500, 300), outline, tol)).toBe(false);
    expect(pointInPolygon(P(400, 300), outline, tol)).toBe(true);
    expect(distanceToSegment(P(5, 5), P(0, 0), P(10, 0))).toBe(5);
    expect(distanceToSegment(P(13, 4), P(0, 0), P(10, 0))).toBe(5); // past the end: distance to the end point (3-4-5 triangle)
  });

  it('a bar inside, in a void, across an edge or outside', () => {
    expect(circlePlacement(P(50, 550), 10, outline, [hole], tol)).toBe('inside');
    expect(circlePlacement(P(200, 300), 10, outline, [hole], tol)).toBe('outside');
    expect(circlePlacement(P(95, 300), 10, outline, [hole], tol)).toBe('edge');
    expect(circlePlacement(P(5, 300), 10, outline, [hole], tol)).toBe('edge');
    expect(circlePlacement(P(-20, 300), 10, outline, [hole], tol)).toBe('outside');
    // A void's corner poking into the circle between its top, centre and bottom depths.
    expect(circlePlacement(P(50, 520), 10, outline, [[P(57, 525), P(150, 522), P(150, 528)]], tol)).toBe('edge');
  });
});
