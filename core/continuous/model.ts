/**
 * The discretised continuous beam: segments of every part (with the zone whose section they
 * carry), their Simpson samples, and the released fields of the loads.
 *
 * Released structure: every span simply supported, each cantilever attached to its end span as an
 * overhang (so a cantilever's moment decays linearly across the end span to the far support). The
 * redundants are the span-end moments beyond those of the released structure: X_L and X_R of every
 * span, with fields (1 − s/L) and s/L. Units: mm, N, N·mm.
 */
import type { MemberZone } from '../member/definition.ts';
import { cantileverRootMoment, partStatics, type Layout, type LoadsByPart, type PartLoad } from './layout.ts';

export interface Segment {
  readonly part: number;
  /** Local start and end of the segment, mm. */
  readonly s0: number;
  readonly s1: number;
  readonly zone: number;
  /** Index of its first sample (a, midpoint, b follow). */
  readonly sample: number;
}

export interface BeamMesh {
  readonly layout: Layout;
  readonly zones: readonly MemberZone[];
  readonly segments: readonly Segment[];
  /** Per sample (three per segment): part, local and global position, Simpson weight (mm), zone. */
  readonly samplePart: Int32Array;
  readonly sampleS: Float64Array;
  readonly sampleX: Float64Array;
  readonly sampleWeight: Float64Array;
  readonly sampleZone: Int32Array;
  /** Fields of the redundants at each sample: (1 − s/L) and s/L on spans, 0 on cantilevers. */
  readonly fieldLeft: Float64Array;
  readonly fieldRight: Float64Array;
  /** First segment index of each part, and one past its last. */
  readonly partSegments: readonly (readonly [number, number])[];
}

const TOLERANCE = 1e-6;

/** Zone index of a global position (the zone whose interval holds it; ties go to the later zone). */
export function zoneAt(zones: readonly MemberZone[], x: number): number {
  let found = -1;
  for (let i = 0; i < zones.length; i++) if (x >= zones[i]!.from - TOLERANCE && x <= zones[i]!.to + TOLERANCE) found = i;
  return found < 0 ? zones.length - 1 : found;
}

/**
 * Segments of every part: `segmentsPerSpan` equal divisions of each span (cantilevers in proportion,
 * at least 4), split at zone boundaries and at the given extra local points of each part.
 */
export function buildMesh(layout: Layout, zones: readonly MemberZone[], extraPoints: readonly (readonly number[])[], segmentsPerSpan: number): BeamMesh {
  const spanLengths = layout.parts.filter((p) => p.kind === 'span').map((p) => p.length);
  const meanSpan = spanLengths.reduce((a, b) => a + b, 0) / Math.max(spanLengths.length, 1);
  const segments: Segment[] = [];
  const partSegments: [number, number][] = [];
  const sampleRows: { part: number; s: number; x: number; w: number; zone: number; fl: number; fr: number }[] = [];
  layout.parts.forEach((part, pi) => {
    const count = part.kind === 'span' ? segmentsPerSpan : Math.max(4, Math.round((segmentsPerSpan * part.length) / meanSpan));
    const points = new Set<number>();
    for (let i = 0; i <= count; i++) points.add((part.length * i) / count);
    for (const z of zones) for (const b of [z.from, z.to]) if (b > part.from + TOLERANCE && b < part.to - TOLERANCE) points.add(b - part.from);
    for (const p of extraPoints[pi] ?? []) if (p > TOLERANCE && p < part.length - TOLERANCE) points.add(p);
    const sorted = [...points].sort((a, b) => a - b).filter((p, i, all) => i === 0 || p - all[i - 1]! > TOLERANCE);
    const first = segments.length;
    for (let k = 0; k + 1 < sorted.length; k++) {
      const s0 = sorted[k]!;
      const s1 = sorted[k + 1]!;
      const zone = zoneAt(zones, part.from + 0.5 * (s0 + s1));
      segments.push({ part: pi, s0, s1, zone, sample: sampleRows.length });
      const h = s1 - s0;
      for (const [s, w] of [[s0, h / 6], [0.5 * (s0 + s1), (4 * h) / 6], [s1, h / 6]] as const) {
        const isSpan = part.kind === 'span';
        sampleRows.push({ part: pi, s, x: part.from + s, w, zone, fl: isSpan ? 1 - s / part.length : 0, fr: isSpan ? s / part.length : 0 });
      }
    }
    partSegments.push([first, segments.length]);
  });
  const col = <K extends keyof (typeof sampleRows)[number]>(key: K) => sampleRows.map((r) => r[key] as number);
  return {
    layout,
    zones,
    segments,
    samplePart: Int32Array.from(col('part')),
    sampleS: Float64Array.from(col('s')),
    sampleX: Float64Array.from(col('x')),
    sampleWeight: Float64Array.from(col('w')),
    sampleZone: Int32Array.from(col('zone')),
    fieldLeft: Float64Array.from(col('fl')),
    fieldRight: Float64Array.from(col('fr')),
    partSegments,
  };
}

/** Released moment and shear of a load set at every sample (sagging positive; shear from the sample's side of its segment). */
export interface ReleasedField {
  readonly moment: Float64Array;
  readonly shear: Float64Array;
  /** Cantilever root moments carried into the end spans, N·mm: at the first and last support. */
  readonly rootLeft: number;
  readonly rootRight: number;
  /** Total load of the set, N. */
  readonly total: number;
}

/** The released structure's moment and shear under a load set. */
export function releasedField(mesh: BeamMesh, loads: LoadsByPart): ReleasedField {
  const { layout } = mesh;
  const parts = layout.parts;
  const first = parts[0]!;
  const last = parts[parts.length - 1]!;
  const rootLeft = first.kind === 'left-cantilever' ? cantileverRootMoment(first, loads[0] ?? []) : 0;
  const rootRight = last.kind === 'right-cantilever' ? cantileverRootMoment(last, loads[parts.length - 1] ?? []) : 0;
  const firstSpan = layout.spanPart[0]!;
  const lastSpan = layout.spanPart[layout.spanPart.length - 1]!;
  const n = mesh.sampleS.length;
  const moment = new Float64Array(n);
  const shear = new Float64Array(n);
  for (const seg of mesh.segments) {
    const part = parts[seg.part]!;
    const partLoads = loads[seg.part] ?? [];
    const cl = seg.part === firstSpan ? rootLeft : 0;
    const cr = seg.part === lastSpan ? rootRight : 0;
    for (let k = 0; k < 3; k++) {
      const q = seg.sample + k;
      const s = mesh.sampleS[q]!;
      // The segment's own side at its ends, so a point load at a node shows its jump in shear.
      const side = k === 0 ? 'right' : 'left';
      const st = partStatics(part, partLoads, s, side);
      if (part.kind === 'span') {
        moment[q] = st.moment + cl * (1 - s / part.length) + (cr * s) / part.length;
        shear[q] = st.shear + (cr - cl) / part.length;
      } else {
        moment[q] = st.moment;
        shear[q] = st.shear;
      }
    }
  }
  let total = 0;
  for (const partLoads of loads) for (const l of partLoads ?? []) total += l.kind === 'point' ? l.p : l.w * (l.to - l.from);
  return { moment, shear, rootLeft, rootRight, total };
}

/** Released moment of a load set at one position of a part (for hinge sites between samples). */
export function releasedMomentAt(mesh: BeamMesh, loads: LoadsByPart, field: ReleasedField, partIndex: number, s: number): number {
  const part = mesh.layout.parts[partIndex]!;
  const m = partStatics(part, loads[partIndex] ?? [], s, 'left').moment;
  if (part.kind !== 'span') return m;
  const cl = partIndex === mesh.layout.spanPart[0] ? field.rootLeft : 0;
  const cr = partIndex === mesh.layout.spanPart[mesh.layout.spanPart.length - 1] ? field.rootRight : 0;
  return m + cl * (1 - s / part.length) + (cr * s) / part.length;
}

/** Local positions each part's mesh must contain: point loads and ends of partial loads. */
export function loadPoints(loads: LoadsByPart): number[][] {
  return loads.map((partLoads) => partLoads.flatMap((l: PartLoad) => (l.kind === 'point' ? [l.a] : [l.from, l.to])));
}
