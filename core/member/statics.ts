/**
 * Statics of a single span under gravity loads (downward positive), moments sagging positive.
 *
 * Indeterminate beams are solved by the flexibility method on a released structure:
 *  - simply supported, propped cantilever and fixed–fixed beams are released to a simple span
 *    whose end moments MA (x = 0) and MB (x = L) are the redundants
 *    M(x) = M0(x) + MA·(1 − x/L) + MB·x/L;
 *  - a cantilever (fixed at x = 0, free at x = L) is determinate.
 * Units: mm, N, N/mm, N·mm.
 */
import type { MemberLoad, SupportType } from './definition.ts';
import { loadIndexOf, type StaticLoad } from './load-index.ts';

/** A load reduced to what statics needs (defined beside its index). Uniform loads act over [from, to]. */
export type { StaticLoad };

export function toStaticLoad(load: MemberLoad, span: number, factor = 1): StaticLoad {
  if (load.kind === 'point') return { kind: 'point', p: load.magnitude * factor, a: load.position };
  return { kind: 'uniform', w: load.magnitude * factor, from: load.from ?? 0, to: load.to ?? span };
}

/** Total vertical load, N. */
export function totalLoad(loads: readonly StaticLoad[]): number {
  return loads.reduce((s, l) => s + (l.kind === 'point' ? l.p : l.w * (l.to - l.from)), 0);
}

/**
 * Moment at x of the released structure, N·mm (sagging positive).
 * simple: simply supported span of length L; cantilever: fixed at 0, free at L.
 */
export function releasedMoment(support: SupportType, span: number, loads: readonly StaticLoad[], x: number): number {
  const index = loadIndexOf(loads);
  if (index) return support === 'cantilever' ? -index.momentOfLoadsRight(0, span, x) : (index.momentOfLoadsLeft(0, span, span) * x) / span - index.momentOfLoadsLeft(0, span, x);
  if (support === 'cantilever') {
    // Hogging from every load to the right of x.
    let m = 0;
    for (const l of loads) {
      if (l.kind === 'point') {
        if (l.a > x) m -= l.p * (l.a - x);
      } else {
        const a = Math.max(l.from, x);
        if (l.to > a) m -= l.w * (l.to - a) * ((l.to + a) / 2 - x);
      }
    }
    return m;
  }
  // Simple span: left reaction from moments about the right support.
  let reaction = 0;
  for (const l of loads) {
    if (l.kind === 'point') reaction += (l.p * (span - l.a)) / span;
    else reaction += (l.w * (l.to - l.from) * (span - (l.from + l.to) / 2)) / span;
  }
  let m = reaction * x;
  for (const l of loads) {
    if (l.kind === 'point') {
      if (l.a < x) m -= l.p * (x - l.a);
    } else {
      const b = Math.min(l.to, x);
      if (b > l.from) m -= l.w * (b - l.from) * (x - (l.from + b) / 2);
    }
  }
  return m;
}

/**
 * Shear of the released structure at x, N (V = dM/dx, sagging-positive moments): simple span
 * V = RA − loads left of x; cantilever (fixed at 0) V = loads right of x. `side` picks the value
 * just left or right of x where a point load sits there.
 */
export function releasedShear(support: SupportType, span: number, loads: readonly StaticLoad[], x: number, side: 'left' | 'right'): number {
  const index = loadIndexOf(loads);
  if (index) return (support === 'cantilever' ? index.loadLeft(0, span, span, true) : index.momentOfLoadsLeft(0, span, span) / span) - index.loadLeft(0, span, x, side === 'right');
  if (support === 'cantilever') {
    let v = 0;
    for (const l of loads) {
      if (l.kind === 'point') {
        if (l.a > x || (side === 'left' && l.a === x)) v += l.p;
      } else {
        const a = Math.max(l.from, x);
        if (l.to > a) v += l.w * (l.to - a);
      }
    }
    return v;
  }
  let reaction = 0;
  for (const l of loads) {
    if (l.kind === 'point') reaction += (l.p * (span - l.a)) / span;
    else reaction += (l.w * (l.to - l.from) * (span - (l.from + l.to) / 2)) / span;
  }
  let v = reaction;
  for (const l of loads) {
    if (l.kind === 'point') {
      if (l.a < x || (side === 'right' && l.a === x)) v -= l.p;
    } else {
      const b = Math.min(l.to, x);
      if (b > l.from) v -= l.w * (b - l.from);
    }
  }
  return v;
}

/** Moment (N·mm) and shear (N) at x for released loads plus support moments (sagging positive). */
export function memberForcesAt(support: SupportType, span: number, loads: readonly StaticLoad[], ends: { left: number; right: number }, x: number, side: 'left' | 'right'): { moment: number; shear: number } {
  const m0 = releasedMoment(support, span, loads, x);
  const v0 = releasedShear(support, span, loads, x, side);
  if (support === 'cantilever') return { moment: m0, shear: v0 };
  return { moment: m0 + ends.left * (1 - x / span) + (ends.right * x) / span, shear: v0 + (ends.right - ends.left) / span };
}
