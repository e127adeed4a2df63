/**
 * Loads of a continuous beam by case and by part, and the live-load arrangements of the codes.
 * Units: N/mm, N, mm.
 */
import type { LoadCaseId } from '../member/definition.ts';
import type { ContinuousBeamDefinition } from './definition.ts';
import { partIndex, partName, type Layout, type LoadsByPart, type PartLoad } from './layout.ts';

/** The user's loads of one case on each part (local coordinates). */
export function caseLoads(def: ContinuousBeamDefinition, layout: Layout, loadCase: LoadCaseId): PartLoad[][] {
  const out: PartLoad[][] = layout.parts.map(() => []);
  for (const load of def.loads) {
    if (load.loadCase !== loadCase) continue;
    const p = partIndex(layout, load.span);
    if (p < 0) continue;
    const part = layout.parts[p]!;
    if (load.kind === 'point') out[p]!.push({ kind: 'point', p: load.magnitude, a: load.position });
    else out[p]!.push({ kind: 'uniform', w: load.magnitude, from: load.from ?? 0, to: load.to ?? part.length });
  }
  return out;
}

/** Self-weight of every zone (N/mm) as uniform loads on the parts it overlaps. */
export function selfWeightLoads(def: ContinuousBeamDefinition, layout: Layout, zoneSelfWeight: readonly number[]): PartLoad[][] {
  const out: PartLoad[][] = layout.parts.map(() => []);
  if (def.includeSelfWeight === false) return out;
  def.zones.forEach((zone, z) => {
    const w = zoneSelfWeight[z] ?? 0;
    if (!(w > 0)) return;
    layout.parts.forEach((part, p) => {
      const from = Math.max(zone.from, part.from);
      const to = Math.min(zone.to, part.to);
      if (to > from) out[p]!.push({ kind: 'uniform', w, from: from - part.from, to: to - part.from });
    });
  });
  return out;
}

/** Sum of load sets part by part, each scaled. */
export function combineLoads(sets: readonly { readonly loads: LoadsByPart; readonly factor: number }[], partCount: number): PartLoad[][] {
  const out: PartLoad[][] = Array.from({ length: partCount }, () => []);
  for (const { loads, factor } of sets) {
    if (factor === 0) continue;
    loads.forEach((partLoads, p) => {
      for (const l of partLoads) out[p]!.push(l.kind === 'point' ? { ...l, p: l.p * factor } : { ...l, w: l.w * factor });
    });
  }
  return out;
}

/** Only the loads on the given parts. */
export function onParts(loads: LoadsByPart, parts: readonly number[]): PartLoad[][] {
  return loads.map((l, p) => (parts.includes(p) ? [...l] : []));
}

/** A live-load arrangement: the parts (spans and cantilevers, indices of `layout.parts`) that carry live load. */
export interface Arrangement {
  readonly id: string;
  readonly loadedParts: readonly number[];
  /** E.g. "spans 1 and 3 loaded (alternate spans; ACI 318-19 6.4.2(a), EN 1992-1-1 5.1.3(a))". */
  readonly description: string;
}

function listParts(layout: Layout, parts: readonly number[]): string {
  const spans = parts.filter((p) => layout.parts[p]!.kind === 'span').map((p) => layout.parts[p]!.span + 1);
  const cantilevers = parts.filter((p) => layout.parts[p]!.kind !== 'span').map((p) => partName(layout.parts[p]!));
  const words: string[] = [];
  if (spans.length === 1) words.push(`span ${spans[0]}`);
  else if (spans.length > 1) words.push(`spans ${spans.slice(0, -1).join(', ')} and ${spans[spans.length - 1]}`);
  words.push(...cantilevers);
  return words.join(' and ');
}

/**
 * The live-load arrangements both codes name for continuous beams, cantilevers counting as parts in
 * the sequence: all parts loaded; alternate parts (the two checkerboards) — ACI 318-19 6.4.2(a) for
 * the largest positive moment, EN 1992-1-1 5.1.3(1)P (a); any two adjacent parts — ACI 318-19
 * 6.4.2(b) for the largest negative moment at a support, EN 1992-1-1 5.1.3(1)P (b). Duplicate sets
 * (e.g. on two spans) are listed once.
 */
export function liveArrangements(layout: Layout): Arrangement[] {
  const count = layout.parts.length;
  const all = layout.parts.map((_, i) => i);
  const out: Arrangement[] = [];
  const seen = new Set<string>();
  const add = (id: string, parts: number[], kind: string) => {
    const key = parts.join(',');
    if (parts.length === 0 || seen.has(key)) return;
    seen.add(key);
    out.push({ id, loadedParts: parts, description: `${listParts(layout, parts)} loaded${kind ? ` (${kind})` : ''}` });
  };
  add('all', all, count > 1 ? 'all spans' : '');
  if (count > 1) {
    const alternate = 'alternate spans; ACI 318-19 6.4.2(a), EN 1992-1-1 5.1.3(a)';
    add('alternate-1', all.filter((i) => i % 2 === 0), alternate);
    add('alternate-2', all.filter((i) => i % 2 === 1), alternate);
  }
  for (let i = 0; i + 1 < count; i++) add(`adjacent-${i + 1}`, [i, i + 1], 'adjacent spans; ACI 318-19 6.4.2(b), EN 1992-1-1 5.1.3(b)');
  return out;
}
