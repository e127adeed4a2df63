/**
 * Generators of project files with one planted defect of the kinds issue 17 found accepted in
 * silence: bars on top of each other, polygon voids reaching outside the outline or into each other,
 * self-intersecting outlines, huge counts and non-integer counts. Each sample says where the defect
 * is (`path`, the start of the path a diagnostic must name). Used by the fuzz tests and by
 * `npx tsx test/core/project/bad-projects.ts [core root]`, which counts how many of the generated
 * files a validation (this checkout's, or another checkout's core/ given as the argument) catches.
 * SI internal units (mm, N).
 */
import fc from 'fast-check';
import type { Project } from '../../../core/project/types.ts';
import { member, smallProject } from '../../fixtures/projects.ts';

export interface BadProject {
  readonly kind: BadKind;
  readonly what: string;
  /** Start of the path a diagnostic must name. */
  readonly path: string;
  readonly project: Project;
}

export const BAD_KINDS = ['overlap', 'void', 'self-intersection', 'huge-count', 'non-integer'] as const;
export type BadKind = (typeof BAD_KINDS)[number];

type Mutable = { -readonly [K in keyof Project]: Project[K] } & Record<string, unknown>;

/** The base project: a 300 × 600 rectangle (r1) under a 6 m simply supported beam, and a tee. */
function base(): Mutable {
  return structuredClone(smallProject('ACI 318-19', [member('B-1', 'simply-supported', 6000, 'r1')])) as Mutable;
}
const R1 = 'sections[0] "300 × 600"';
const M1 = 'members[0] "B-1"';

/** A 300 × 600 polygon section in place of r1 (no hoops: a polygon has no single web). */
function polygonR1(p: Mutable, outline: { x: number; y: number }[], voids: { x: number; y: number }[][] = []): void {
  const s = p.sections[0] as unknown as Record<string, unknown>;
  s.shape = { kind: 'polygon', outline, ...(voids.length > 0 ? { voids } : {}) };
  delete s.hoops;
  // Bars away from any void drawn below (voids stay within 100 ≤ y ≤ 450).
  s.bars = [{ steelId: 'b500', depth: 540, count: 2, diameter: 20 }, { steelId: 'b500', depth: 55, count: 2, diameter: 16 }];
}
const rectangle = (x0: number, y0: number, x1: number, y1: number) => [{ x: x0, y: y0 }, { x: x1, y: y0 }, { x: x1, y: y1 }, { x: x0, y: y1 }];

const overlap: fc.Arbitrary<BadProject> = fc.oneof(
  // The bottom layer repeated 2 to 1,000 times.
  fc.integer({ min: 2, max: 1000 }).map((copies) => {
    const p = base();
    const bottom = p.sections[0]!.bars[0]!;
    (p.sections[0] as unknown as { bars: unknown[] }).bars = [...Array.from({ length: copies }, () => ({ ...bottom })), p.sections[0]!.bars[1]!];
    return { kind: 'overlap' as const, what: `${copies} identical bottom layers`, path: `${R1}.bars`, project: p as Project };
  }),
  // A second layer at (nearly) the same depth whose bars sit on those of the first: an odd count
  // puts a bar at the centre and at both edges, as the 3 bars of the bottom layer.
  fc.record({ count: fc.constantFrom(2, 3, 5), diameter: fc.constantFrom(12, 16, 20, 25), shift: fc.double({ min: -8, max: 8, noNaN: true }) }).map(({ count, diameter, shift }) => {
    const p = base();
    (p.sections[0] as unknown as { bars: unknown[] }).bars.push({ steelId: 'b500', depth: 540 + shift, count, diameter });
    return { kind: 'overlap' as const, what: `${count} × ${diameter} mm at depth ${(540 + shift).toFixed(1)} mm over 3 × 20 mm at 540 mm`, path: `${R1}.bars`, project: p as Project };
  }),
);

const voids: fc.Arbitrary<BadProject> = fc.oneof(
  // A void reaching outside the outline on the right.
  fc.record({ y0: fc.integer({ min: 100, max: 300 }), h: fc.integer({ min: 20, max: 150 }), x0: fc.integer({ min: 50, max: 250 }), out: fc.integer({ min: 1, max: 200 }) }).map(({ y0, h, x0, out }) => {
    const p = base();
    polygonR1(p, rectangle(0, 0, 300, 600), [rectangle(x0, y0, 300 + out, y0 + h)]);
    return { kind: 'void' as const, what: `void from x ${x0} to ${300 + out} mm (outline 0–300 mm)`, path: `${R1}.shape.voids[0]`, project: p as Project };
  }),
  // Two voids that overlap.
  fc.record({ x: fc.integer({ min: 40, max: 120 }), y: fc.integer({ min: 120, max: 250 }), dx: fc.integer({ min: -40, max: 40 }), dy: fc.integer({ min: -40, max: 40 }) }).map(({ x, y, dx, dy }) => {
    const p = base();
    polygonR1(p, rectangle(0, 0, 300, 600), [rectangle(x, y, x + 80, y + 80), rectangle(x + 40 + dx, y + 40 + dy, x + 120 + dx, y + 120 + dy)]);
    return { kind: 'void' as const, what: `two 80 mm square voids offset by (${40 + dx}, ${40 + dy}) mm`, path: `${R1}.shape.voids`, project: p as Project };
  }),
  // A void wholly outside the outline.
  fc.integer({ min: 310, max: 2000 }).map((x) => {
    const p = base();
    polygonR1(p, rectangle(0, 0, 300, 600), [rectangle(x, 200, x + 50, 300)]);
    return { kind: 'void' as const, what: `void at x ${x} mm, outside the 300 mm wide outline`, path: `${R1}.shape.voids[0]`, project: p as Project };
  }),
);

const selfIntersection: fc.Arbitrary<BadProject> = fc.oneof(
  // A rectangle with two neighbouring points swapped (a bow-tie): the points typed in the wrong order.
  fc.record({ k: fc.integer({ min: 0, max: 3 }), w: fc.integer({ min: 200, max: 500 }) }).map(({ k, w }) => {
    const p = base();
    const points = rectangle(0, 0, w, 600);
    const j = (k + 1) % 4;
    [points[k], points[j]] = [points[j]!, points[k]!];
    polygonR1(p, points);
    return { kind: 'self-intersection' as const, what: `${w} × 600 rectangle with points ${k} and ${j} swapped`, path: `${R1}.shape.outline`, project: p as Project };
  }),
  // A haunched outline whose bottom edge loops back across the side.
  fc.integer({ min: 1, max: 150 }).map((over) => {
    const p = base();
    polygonR1(p, [{ x: 0, y: 0 }, { x: 300, y: 0 }, { x: 300, y: 600 }, { x: 150, y: 600 }, { x: 300 + over, y: 300 }, { x: 0, y: 600 }]);
    return { kind: 'self-intersection' as const, what: `outline looping ${over} mm past its right side`, path: `${R1}.shape.outline`, project: p as Project };
  }),
);

const hugeCount: fc.Arbitrary<BadProject> = fc.oneof(
  fc.integer({ min: 201, max: 10000 }).map((n) => {
    const p = base();
    const m = p.members[0] as unknown as Record<string, unknown>;
    m.zones = Array.from({ length: n }, (_, i) => ({ from: (6000 * i) / n, to: (6000 * (i + 1)) / n, sectionId: 'r1' }));
    return { kind: 'huge-count' as const, what: `${n} zones`, path: `${M1}.zones`, project: p as Project };
  }),
  fc.integer({ min: 2001, max: 100000 }).map((n) => {
    const p = base();
    const m = p.members[0] as unknown as { loads: unknown[] };
    m.loads = [...m.loads, ...Array.from({ length: n }, (_, i) => ({ kind: 'point', loadCase: 'live', magnitude: 10, position: 1 + (5998 * i) / n }))];
    return { kind: 'huge-count' as const, what: `${n} point loads`, path: `${M1}.loads`, project: p as Project };
  }),
  fc.integer({ min: 21, max: 2000 }).map((n) => {
    const p = base();
    const m = p.members[0] as unknown as Record<string, unknown>;
    m.schemes = Array.from({ length: n }, (_, i) => ({ id: `S${i}`, name: `Overlay ${i}`, kind: 'concrete-layer', face: 'top', thickness: 50, concreteId: 'c30', bars: [{ steelId: 'b500', distanceFromFace: 25, count: 2, diameter: 12 }] }));
    return { kind: 'huge-count' as const, what: `${n} strengthening schemes`, path: `${M1}.schemes`, project: p as Project };
  }),
  fc.integer({ min: 101, max: 1000 }).map((n) => {
    const p = base();
    (p.sections[0] as unknown as { bars: unknown[] }).bars = Array.from({ length: n }, (_, i) => ({ steelId: 'b500', depth: 50 + (500 * i) / n, area: 10 }));
    return { kind: 'huge-count' as const, what: `${n} bar layers`, path: `${R1}.bars`, project: p as Project };
  }),
);

const nonInteger: fc.Arbitrary<BadProject> = fc.oneof(
  fc.record({ legs: fc.double({ min: 2.01, max: 11.99, noNaN: true }).filter((x) => !Number.isInteger(x)), field: fc.constantFrom('verticalLegs', 'horizontalLegs') }).map(({ legs, field }) => {
    const p = base();
    (p.sections[0]!.hoops as unknown as Record<string, unknown>)[field] = legs;
    return { kind: 'non-integer' as const, what: `${legs} hoop ${field}`, path: `${R1}.hoops.${field}`, project: p as Project };
  }),
  fc.double({ min: 1.01, max: 5.99, noNaN: true }).filter((x) => !Number.isInteger(x)).map((count) => {
    const p = base();
    (p.sections[0]!.bars[0] as unknown as Record<string, unknown>).count = count;
    return { kind: 'non-integer' as const, what: `${count} bars`, path: `${R1}.bars[0].count`, project: p as Project };
  }),
);

/** Bad projects of one kind. */
export function badProjects(kind: BadKind): fc.Arbitrary<BadProject> {
  switch (kind) {
    case 'overlap': return overlap;
    case 'void': return voids;
    case 'self-intersection': return selfIntersection;
    case 'huge-count': return hugeCount;
    case 'non-integer': return nonInteger;
  }
}

/** The samples the counting script and the fuzz tests use: `perKind` of each kind, fixed seed. */
export function badProjectSamples(perKind: number, seed = 17): BadProject[] {
  return BAD_KINDS.flatMap((kind, k) => fc.sample(badProjects(kind), { numRuns: perKind, seed: seed + k }));
}
