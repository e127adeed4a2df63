/**
 * The geometry of a member in one form for every kind of beam: supports at positions along the
 * member, the spans between them and cantilevers beyond the end supports. A single span
 * (BeamDefinition.supports) is a one-span layout (a cantilever: one fixed support and a cantilever),
 * a continuous beam gives its layout (BeamDefinition.layout); everything downstream works on this
 * form only, so a one-span continuous beam and the single span it describes give the same numbers.
 *
 * Positions x run along the member from its left end (the tip of a left cantilever, otherwise the
 * first support), mm. Rotational stiffness N·mm/rad.
 */
import type { BeamDefinition, SupportType } from './definition.ts';

/** Support kinds of the engine's geometry. */
export type SupportKind = 'pinned' | 'fixed' | 'spring';

/** A column framing into a support; with its far end fixed it adds 4EI/L, pinned 3EI/L to the support's rotational stiffness. */
export interface SupportColumn {
  /** Flexural stiffness EI of the column, N·mm². */
  readonly stiffness: number;
  /** Height (length) of the column, mm. */
  readonly height: number;
  readonly farEnd: 'fixed' | 'pinned';
}

export interface SupportDefinition {
  readonly kind: SupportKind;
  /** 'spring': rotational stiffness, N·mm/rad (added to that of the columns, if both are given). */
  readonly rotationalStiffness?: number;
  /** 'spring': the columns above and below. */
  readonly columns?: readonly SupportColumn[];
}

/**
 * Geometry of a continuous beam. Positions along the member (zones, loads) run from its left end:
 * the tip of the left cantilever when there is one, otherwise the first support.
 */
export interface SpanLayout {
  /** Lengths of the spans between consecutive supports, left to right, mm (0 to 8 spans). */
  readonly spans: readonly number[];
  /** The supports, left to right: one more than the spans (one when there is no span: a cantilever). */
  readonly supports: readonly SupportDefinition[];
  /** Lengths of cantilevers beyond the first and the last support, mm (0 or omitted: none). */
  readonly leftCantilever?: number;
  readonly rightCantilever?: number;
}


export interface LineSupport {
  readonly index: number;
  /** Position, mm from the member's left end. */
  readonly x: number;
  readonly kind: SupportKind;
  /** Rotational stiffness of a 'spring' support, N·mm/rad (0 for the other kinds). */
  readonly stiffness: number;
}

/** A span between two supports, or a cantilever beyond an end support. */
export interface LineBay {
  readonly kind: 'span' | 'cantilever';
  /** Index among the bays, left to right (cantilevers included). */
  readonly index: number;
  /** Index among the spans (−1 for a cantilever). */
  readonly spanIndex: number;
  readonly from: number;
  readonly to: number;
  readonly length: number;
  /** Supports at its ends (a cantilever has one; the other end is −1). */
  readonly leftSupport: number;
  readonly rightSupport: number;
  /** "span 2", "left cantilever". */
  readonly label: string;
}

export interface MemberLayout {
  /** Total length of the member, mm. */
  readonly length: number;
  readonly supports: readonly LineSupport[];
  /** Spans only, left to right. */
  readonly spans: readonly LineBay[];
  /** Spans and cantilevers, left to right. */
  readonly bays: readonly LineBay[];
  readonly leftCantilever: LineBay | null;
  readonly rightCantilever: LineBay | null;
  /** The single-span type this layout came from, when it came from one. */
  readonly singleSpan: SupportType | null;
}

/** Rotational stiffness of a support, N·mm/rad: its own value plus 4EI/L (far end fixed) or 3EI/L (pinned) per column. */
export function supportStiffness(support: SupportDefinition): number {
  if (support.kind !== 'spring') return 0;
  const columns = (support.columns ?? []).reduce((k, c) => k + ((c.farEnd === 'fixed' ? 4 : 3) * c.stiffness) / c.height, 0);
  return (support.rotationalStiffness ?? 0) + columns;
}

/** The layout of a span layout definition (positions computed from the lengths). */
export function layoutOf(def: SpanLayout, singleSpan: SupportType | null = null): MemberLayout {
  const left = def.leftCantilever && def.leftCantilever > 0 ? def.leftCantilever : 0;
  const right = def.rightCantilever && def.rightCantilever > 0 ? def.rightCantilever : 0;
  const supports: LineSupport[] = [];
  let x = left;
  def.supports.forEach((s, i) => {
    supports.push({ index: i, x, kind: s.kind, stiffness: supportStiffness(s) });
    if (i < def.spans.length) x += def.spans[i]!;
  });
  const length = x + right;
  const bays: LineBay[] = [];
  const leftCantilever: LineBay | null = left > 0 ? { kind: 'cantilever', index: 0, spanIndex: -1, from: 0, to: left, length: left, leftSupport: -1, rightSupport: 0, label: 'left cantilever' } : null;
  if (leftCantilever) bays.push(leftCantilever);
  const spans: LineBay[] = def.spans.map((len, i) => {
    const from = supports[i]!.x;
    const bay: LineBay = { kind: 'span', index: bays.length, spanIndex: i, from, to: from + len, length: len, leftSupport: i, rightSupport: i + 1, label: def.spans.length > 1 ? `span ${i + 1}` : 'span' };
    bays.push(bay);
    return bay;
  });
  const last = supports.length - 1;
  const rightCantilever: LineBay | null = right > 0 ? { kind: 'cantilever', index: bays.length, spanIndex: -1, from: length - right, to: length, length: right, leftSupport: last, rightSupport: -1, label: 'right cantilever' } : null;
  if (rightCantilever) bays.push(rightCantilever);
  return { length, supports, spans, bays, leftCantilever, rightCantilever, singleSpan };
}

/** The span layout definition of a single-span member type. */
export function singleSpanDefinition(support: SupportType, span: number): SpanLayout {
  switch (support) {
    case 'simply-supported': return { spans: [span], supports: [{ kind: 'pinned' }, { kind: 'pinned' }] };
    case 'fixed-fixed': return { spans: [span], supports: [{ kind: 'fixed' }, { kind: 'fixed' }] };
    case 'propped-cantilever': return { spans: [span], supports: [{ kind: 'fixed' }, { kind: 'pinned' }] };
    case 'cantilever': return { spans: [], supports: [{ kind: 'fixed' }], rightCantilever: span };
  }
}

const singleCache = new Map<string, MemberLayout>();

/** The layout of a single span (cached: the statics of a single span ask for it at every station). */
export function singleSpanLayout(support: SupportType, span: number): MemberLayout {
  const key = `${support}:${span}`;
  let layout = singleCache.get(key);
  if (!layout) {
    if (singleCache.size > 256) singleCache.clear();
    layout = layoutOf(singleSpanDefinition(support, span), support);
    singleCache.set(key, layout);
  }
  return layout;
}

/** The layout of a member (a single span). */
export function memberLayout(member: Pick<BeamDefinition, 'supports' | 'span'>): MemberLayout {
  return singleSpanLayout(member.supports, member.span);
}

/** The bay (span or cantilever) that contains x; at a support, the bay on the given side. */
export function bayAt(layout: MemberLayout, x: number, side: 'left' | 'right' = 'right'): LineBay {
  const bays = layout.bays;
  for (const b of bays) {
    if (x > b.from && x < b.to) return b;
    if (side === 'right' && x === b.from) return b;
    if (side === 'left' && x === b.to) return b;
  }
  return x <= bays[0]!.from ? bays[0]! : bays[bays.length - 1]!;
}

/**
 * A position in words without units: "midspan", "0.42ℓ from the left support", "support 2",
 * "the free end". Single spans keep the words of a single span; continuous beams name the span.
 */
export function describeLinePosition(layout: MemberLayout, x: number): string {
  const tol = 1e-6 * layout.length;
  const support = layout.supports.find((s) => Math.abs(s.x - x) <= tol);
  const single = layout.singleSpan;
  if (single) {
    const span = layout.length;
    if (x <= tol) return single === 'cantilever' ? 'the fixed end' : 'the left support';
    if (x >= span - tol) return single === 'cantilever' ? 'the free end' : 'the right support';
    if (Math.abs(x - span / 2) <= 0.005 * span && single !== 'cantilever') return 'midspan';
    return `${(x / span).toFixed(2)}ℓ from the ${single === 'cantilever' ? 'fixed end' : 'left support'}`;
  }
  if (support) return `support ${support.index + 1}`;
  if (x <= tol || x >= layout.length - tol) return x <= tol ? 'the tip of the left cantilever' : 'the tip of the right cantilever';
  const bay = bayAt(layout, x);
  if (bay.kind === 'cantilever') {
    const root = bay === layout.leftCantilever ? bay.to : bay.from;
    return `${(Math.abs(x - root) / bay.length).toFixed(2)}ℓ from the root of the ${bay.label}`;
  }
  if (Math.abs(x - (bay.from + bay.to) / 2) <= 0.005 * bay.length) return `the middle of ${bay.label}`;
  return `${((x - bay.from) / bay.length).toFixed(2)}ℓ into ${bay.label}`;
}
