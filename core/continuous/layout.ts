/**
 * The geometry of a continuous beam and the discretisation its engine integrates on.
 *
 * Parts: the left cantilever (if any), spans 1…n, the right cantilever (if any), left to right.
 * Each part is divided into segments (equal divisions plus every zone boundary, point load and end
 * of a partial load); every segment is integrated by Simpson's rule on its ends and midpoint, which
 * is exact for the elastic statics (moment at most quadratic in a segment, stiffness constant) and
 * second-order accurate for the non-linear laws.
 * Global positions x run from the left end of the beam; local positions s from the left end of a part.
 * Units: mm.
 */
import { layoutOf as lineLayoutOf } from '../member/layout.ts';
import { loadIndexOf, type StaticLoad } from '../member/load-index.ts';
import type { ContinuousBeamDefinition, SpanRef } from './definition.ts';

export type PartKind = 'left-cantilever' | 'span' | 'right-cantilever';

export interface Part {
  readonly kind: PartKind;
  /** 0-based span index for spans, −1 for cantilevers. */
  readonly span: number;
  /** Global start and end, mm. */
  readonly from: number;
  readonly to: number;
  readonly length: number;
}

export interface Layout {
  readonly parts: readonly Part[];
  /** Global position of each support, mm. */
  readonly supportX: readonly number[];
  /** Total length of the beam, mm. */
  readonly length: number;
  /** Index in `parts` of each span (0-based spans). */
  readonly spanPart: readonly number[];
}

/** The parts and supports of a beam: the member engine's geometry (core/member/layout.ts layoutOf), in this module's form. */
export function layoutOf(def: Pick<ContinuousBeamDefinition, 'spans' | 'leftCantilever' | 'rightCantilever'>): Layout {
  // Support kinds do not change the geometry: placeholders, one per span end.
  const line = lineLayoutOf({ spans: def.spans, supports: [...def.spans.map(() => PIN), PIN], leftCantilever: def.leftCantilever, rightCantilever: def.rightCantilever });
  const parts: Part[] = line.bays.map((b) => ({
    kind: b.kind === 'span' ? 'span' : b === line.leftCantilever ? 'left-cantilever' : 'right-cantilever',
    span: b.spanIndex,
    from: b.from,
    to: b.to,
    length: b.length,
  }));
  return { parts, supportX: line.supports.map((s) => s.x), length: line.length, spanPart: line.spans.map((b) => b.index) };
}

const PIN = { kind: 'pinned' } as const;

/** Index in `layout.parts` of the part a load refers to, or −1 when there is no such part. */
export function partIndex(layout: Layout, ref: SpanRef): number {
  if (ref === 'left-cantilever') return layout.parts[0]?.kind === 'left-cantilever' ? 0 : -1;
  if (ref === 'right-cantilever') return layout.parts[layout.parts.length - 1]?.kind === 'right-cantilever' ? layout.parts.length - 1 : -1;
  return Number.isInteger(ref) && ref >= 1 && ref <= layout.spanPart.length ? layout.spanPart[ref - 1]! : -1;
}

/** Name of a part in results and messages: "span 2", "left cantilever". */
export function partName(part: Part): string {
  return part.kind === 'span' ? `span ${part.span + 1}` : part.kind === 'left-cantilever' ? 'left cantilever' : 'right cantilever';
}

/** A load on one part in local coordinates (N/mm over [from, to], or N at a), downward positive: a load as the member's statics sees it. */
export type PartLoad = StaticLoad;

/** Loads on each part (index as `layout.parts`). */
export type LoadsByPart = readonly (readonly PartLoad[])[];

/** Σ loads left of s × lever arm to s (N·mm), and Σ loads left of s (N); `side` decides a point load at s. */
function leftOf(loads: readonly PartLoad[], s: number, side: 'left' | 'right'): { moment: number; force: number } {
  // Many loads (≥ INDEXED_LOADS_FROM): sorted prefix sums, O(log n) (core/member/load-index.ts); local positions are ≥ 0.
  const index = loadIndexOf(loads);
  if (index) return { moment: index.momentOfLoadsLeft(0, Infinity, s), force: index.loadLeft(0, Infinity, s, side === 'right') };
  let moment = 0;
  let force = 0;
  for (const l of loads) {
    if (l.kind === 'point') {
      if (l.a < s || (side === 'right' && l.a === s)) {
        moment += l.p * (s - l.a);
        force += l.p;
      }
    } else {
      const b = Math.min(l.to, s);
      if (b > l.from) {
        moment += l.w * (b - l.from) * (s - (l.from + b) / 2);
        force += l.w * (b - l.from);
      }
    }
  }
  return { moment, force };
}

/** Total load on a part, N, and its moment about the part's left end, N·mm. */
function resultant(loads: readonly PartLoad[], length: number): { force: number; moment: number } {
  const index = loadIndexOf(loads);
  if (index) {
    // Σ load about the far end x = L: L·ΣP − Σ P·a, so Σ P·a = L·ΣP − that moment.
    const force = index.loadLeft(0, Infinity, length, true);
    return { force, moment: length * force - index.momentOfLoadsLeft(0, Infinity, length) };
  }
  let force = 0;
  let moment = 0;
  for (const l of loads) {
    if (l.kind === 'point') {
      force += l.p;
      moment += l.p * l.a;
    } else {
      const f = l.w * (l.to - l.from);
      force += f;
      moment += (f * (l.from + l.to)) / 2;
    }
  }
  return { force, moment };
}

/**
 * Moment (N·mm, sagging positive) and shear (N, V = dM/dx) at local s of a part carrying only its
 * own loads, as a simple span (spans) or as a cantilever fixed at the support (cantilevers).
 */
export function partStatics(part: Part, loads: readonly PartLoad[], s: number, side: 'left' | 'right'): { moment: number; shear: number } {
  const left = leftOf(loads, s, side);
  if (part.kind === 'left-cantilever') return { moment: -left.moment, shear: -left.force };
  const total = resultant(loads, part.length);
  if (part.kind === 'right-cantilever') {
    // Loads to the right of s and their moment about s: Σ right p·(a − s) = Σ all p·a − Σ left p·a − s·Σ right p,
    // with Σ left p·a = s·Σ left p − Σ left p·(s − a).
    const rightForce = total.force - left.force;
    const sumLeftPA = left.force * s - left.moment;
    return { moment: -(total.moment - sumLeftPA - s * rightForce), shear: rightForce };
  }
  const reactionLeft = total.force - total.moment / part.length;
  return { moment: reactionLeft * s - left.moment, shear: reactionLeft - left.force };
}

/** Moment at the support end of a cantilever under its own loads (hogging negative), N·mm. */
export function cantileverRootMoment(part: Part, loads: readonly PartLoad[]): number {
  return partStatics(part, loads, part.kind === 'left-cantilever' ? part.length : 0, 'left').moment;
}
