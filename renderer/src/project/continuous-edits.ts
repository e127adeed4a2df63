/**
 * Edits of continuous members (project version 3, `continuousMembers`): add, duplicate, delete,
 * and the edits of the beam's geometry that must keep its zones and loads where the engineer put
 * them — a span made longer or shorter, a span added, removed or moved. Each returns a new
 * definition or project sharing untouched objects (immutable.ts); none computes an engineering
 * number. Positions of zones are along the whole beam from its left end (mm); positions of loads
 * are from the left end of their span or cantilever (core/continuous/definition.ts).
 */
import { CONTINUOUS_LIMITS, type ContinuousBeamDefinition, type ContinuousLoad, type ContinuousSupport, type SpanRef } from '../../../core/continuous/definition.ts';
import type { MemberZone } from '../../../core/member/definition.ts';
import { defaultImportService } from '../../../core/project/csv.ts';
import type { ContinuousMemberDefinition, Project } from '../../../core/project/types.ts';
import { fromDisplay } from '../../../core/units/index.ts';
import { copyName, uniqueId } from './factories.ts';

const tidy = (x: number): number => Number(x.toPrecision(9));
/** Smallest zone kept when spans shrink or go, mm (shorter pieces are merged away). */
const ZONE_TOLERANCE = 1e-6;

/** The continuous members of a project (empty for older files). */
export const continuousOf = (project: Project): readonly ContinuousMemberDefinition[] => project.continuousMembers ?? [];

/** Every member id of the project, single-span and continuous (they share one id space). */
function allIds(project: Project): string[] {
  return [...project.members.map((m) => m.id), ...continuousOf(project).map((m) => m.id)];
}
function allNames(project: Project): string[] {
  return [...project.members.map((m) => m.name), ...continuousOf(project).map((m) => m.name)];
}

/** Where each span starts along the beam, mm from its left end (after the left cantilever). */
export function spanStarts(def: Pick<ContinuousBeamDefinition, 'spans' | 'leftCantilever'>): number[] {
  const starts: number[] = [];
  let x = def.leftCantilever ?? 0;
  for (const s of def.spans) {
    starts.push(x);
    x += s;
  }
  return starts;
}

/** Length of the whole beam (cantilevers and spans), mm. */
export function beamLength(def: Pick<ContinuousBeamDefinition, 'spans' | 'leftCantilever' | 'rightCantilever'>): number {
  return (def.leftCantilever ?? 0) + def.spans.reduce((a, b) => a + b, 0) + (def.rightCantilever ?? 0);
}

/**
 * A two-span beam on pins, 6 m (20 ft) each, of one section, with typical floor loads on both
 * spans: starting inputs the engineer edits.
 */
export function newContinuousMember(project: Project, sectionId: string): ContinuousMemberDefinition {
  const system = project.info.unitSystem;
  const typed = (quantity: 'spanLength' | 'lineLoad', si: number, us: number) => tidy(system === 'us' ? fromDisplay(quantity, us, 'US') : fromDisplay(quantity, si, 'SI'));
  const span = typed('spanLength', 6, 20);
  return {
    id: uniqueId('continuous-', allIds(project)),
    name: uniqueId('CB-', allNames(project)),
    spans: [span, span],
    supports: [{ kind: 'pinned' }, { kind: 'pinned' }, { kind: 'pinned' }],
    zones: [{ from: 0, to: 2 * span, sectionId }],
    loads: [1, 2].flatMap((s) => [
      { kind: 'uniform' as const, loadCase: 'superimposed' as const, span: s, magnitude: typed('lineLoad', 5, 0.3), label: 'finishes and partitions' },
      { kind: 'uniform' as const, loadCase: 'live' as const, span: s, magnitude: typed('lineLoad', 8, 0.5), label: 'live load' },
    ]),
    includeSelfWeight: true,
    service: defaultImportService(project.info.codeBasis),
    capacity: { pattern: 'proportional', arrangement: { kind: 'all-spans' }, hingeLengthMethod: 'priestley-2007' },
  };
}

function indexOf(project: Project, id: string): number {
  const index = continuousOf(project).findIndex((m) => m.id === id);
  if (index < 0) throw new Error(`There is no continuous member with id "${id}" in the project.`);
  return index;
}

/** Adds a continuous member (after `afterId`, else at the end of the list). */
export function addContinuousMember(project: Project, member: ContinuousMemberDefinition, afterId?: string): Project {
  const list = [...continuousOf(project)];
  const at = afterId ? list.findIndex((m) => m.id === afterId) + 1 : list.length;
  list.splice(at <= 0 ? list.length : at, 0, member);
  return { ...project, continuousMembers: list };
}

/** Adds a copy of a continuous member right after it (`CB-2 (copy)`); returns the project and the copy's id. */
export function duplicateContinuousMember(project: Project, id: string): { project: Project; memberId: string } {
  const original = continuousOf(project)[indexOf(project, id)]!;
  const copy: ContinuousMemberDefinition = { ...structuredClone(original), id: uniqueId('continuous-', allIds(project)), name: copyName(original.name, allNames(project)) };
  return { project: addContinuousMember(project, copy, id), memberId: copy.id };
}

export function deleteContinuousMember(project: Project, id: string): Project {
  return { ...project, continuousMembers: continuousOf(project).filter((m) => m.id !== id) };
}

/** Replaces a continuous member's definition (same id). */
export function replaceContinuousMember(project: Project, member: ContinuousMemberDefinition): Project {
  const list = [...continuousOf(project)];
  list[indexOf(project, member.id)] = member;
  return { ...project, continuousMembers: list };
}

/**
 * Zones after the boundaries moved by `move` (old position → new position): zones keep their
 * sections; a zone squeezed to nothing goes, and neighbours of the same section join.
 */
function movedZones(zones: readonly MemberZone[], move: (x: number) => number): MemberZone[] {
  const out: MemberZone[] = [];
  for (const z of zones) {
    const from = tidy(move(z.from));
    const to = tidy(move(z.to));
    if (!(to - from > ZONE_TOLERANCE)) continue;
    const last = out[out.length - 1];
    if (last && last.sectionId === z.sectionId && Math.abs(last.to - from) <= ZONE_TOLERANCE) out[out.length - 1] = { ...last, to };
    else out.push({ ...z, from, to });
  }
  return out;
}

/**
 * A span of a new length. Zone boundaries beyond the span move with its right support; those
 * inside it keep their distance from the nearer support (support zones keep their length), and
 * are pulled in where the span became too short for them. Loads keep their positions on their span.
 */
export function withSpanLength(def: ContinuousBeamDefinition, index: number, length: number): ContinuousBeamDefinition {
  const old = def.spans[index];
  if (old === undefined || !(length > 0) || length === old) return def;
  const start = spanStarts(def)[index]!;
  const end = start + old;
  const delta = length - old;
  const move = (x: number) => {
    if (x <= start + ZONE_TOLERANCE) return x;
    if (x >= end - ZONE_TOLERANCE) return x + delta;
    const fromLeft = x - start;
    const fromRight = end - x;
    return fromLeft <= fromRight ? Math.min(x, start + length / 2) : Math.max(x + delta, start + length / 2);
  };
  const spans = def.spans.map((s, i) => (i === index ? length : s));
  return { ...def, spans, zones: movedZones(def.zones, move) };
}

/** A cantilever of a new length (0: none); zones beyond it move with the supports. */
export function withCantilever(def: ContinuousBeamDefinition, side: 'left' | 'right', length: number): ContinuousBeamDefinition {
  const key = side === 'left' ? 'leftCantilever' : 'rightCantilever';
  const old = def[key] ?? 0;
  if (!(length >= 0) || length === old) return def;
  const delta = length - old;
  let zones: MemberZone[];
  if (side === 'left') {
    zones = movedZones(def.zones, (x) => (x <= ZONE_TOLERANCE ? 0 : Math.max(x + delta, 0)));
    if (zones[0] && zones[0].from > 0) zones[0] = { ...zones[0], from: 0 };
  } else {
    const total = beamLength(def);
    const newTotal = total + delta;
    zones = movedZones(def.zones, (x) => (x >= total - ZONE_TOLERANCE ? newTotal : Math.min(x, newTotal)));
    const last = zones[zones.length - 1];
    if (last && last.to < newTotal) zones[zones.length - 1] = { ...last, to: tidy(newTotal) };
  }
  const loads = length > 0 ? def.loads : def.loads.filter((l) => l.span !== `${side}-cantilever`);
  const next: ContinuousBeamDefinition = { ...def, zones, loads };
  if (length > 0) return { ...next, [key]: length };
  const { [key]: _gone, ...rest } = next;
  return rest;
}

const shiftRef = (ref: SpanRef, map: (span: number) => number | null): SpanRef | null => (typeof ref === 'number' ? map(ref) : ref);

function remapLoads(loads: readonly ContinuousLoad[], map: (span: number) => number | null): ContinuousLoad[] {
  return loads.flatMap((load) => {
    const span = shiftRef(load.span, map);
    return span === null ? [] : [span === load.span ? load : { ...load, span }];
  });
}

/**
 * A new span after span `after` (0-based), as long as that span, with a copy of its loads and of
 * its right support; the zone at the new span's place runs on over it.
 */
export function withSpanAdded(def: ContinuousBeamDefinition, after: number): ContinuousBeamDefinition {
  if (def.spans.length >= CONTINUOUS_LIMITS.maxSpans) return def;
  const template = def.spans[after];
  if (template === undefined) return def;
  const x = spanStarts(def)[after]! + template;
  const move = (p: number) => (p > x + ZONE_TOLERANCE ? p + template : p);
  // The zone ending at (or running past) the new span's start runs on over the new span.
  const zones = def.zones.map((z) => (z.from < x - ZONE_TOLERANCE && z.to >= x - ZONE_TOLERANCE ? { ...z, to: tidy(z.to + template) } : { ...z, from: tidy(move(z.from)), to: tidy(move(z.to)) }));
  const shifted = remapLoads(def.loads, (s) => (s > after + 1 ? s + 1 : s));
  const copies = def.loads.filter((l) => l.span === after + 1).map((l) => ({ ...structuredClone(l), span: after + 2 }));
  const supports = [...def.supports];
  supports.splice(after + 2, 0, structuredClone(def.supports[after + 1] ?? { kind: 'pinned' }));
  return { ...def, spans: [...def.spans.slice(0, after + 1), template, ...def.spans.slice(after + 1)], supports, zones, loads: [...shifted, ...copies] };
}

/** Span `index` (0-based) removed with its loads; the beam closes up (at least two spans stay). */
export function withSpanRemoved(def: ContinuousBeamDefinition, index: number): ContinuousBeamDefinition {
  if (def.spans.length <= 2) return def;
  const length = def.spans[index];
  if (length === undefined) return def;
  const start = spanStarts(def)[index]!;
  const end = start + length;
  const move = (p: number) => (p <= start ? p : p >= end ? p - length : start);
  const zones = movedZones(def.zones, move);
  const supports = [...def.supports];
  // The support at the span's right end goes (at the last span, its left one): the rest keep their kinds.
  supports.splice(index === def.spans.length - 1 ? index : index + 1, 1);
  const loads = remapLoads(def.loads, (s) => (s === index + 1 ? null : s > index + 1 ? s - 1 : s));
  return { ...def, spans: def.spans.filter((_, i) => i !== index), supports, zones, loads };
}

/**
 * Span `index` swapped with its neighbour (`direction` −1: left, +1: right) with its zones and
 * loads; the supports stay where they are.
 */
export function withSpanMoved(def: ContinuousBeamDefinition, index: number, direction: -1 | 1): ContinuousBeamDefinition {
  const other = index + direction;
  if (other < 0 || other >= def.spans.length) return def;
  const a = Math.min(index, other);
  const b = a + 1;
  const starts = spanStarts(def);
  const aStart = starts[a]!;
  const la = def.spans[a]!;
  const lb = def.spans[b]!;
  const bEnd = aStart + la + lb;
  // Cut the zones at the two spans' ends, move the pieces, and put them back in order.
  const pieces: MemberZone[] = [];
  for (const z of def.zones) {
    const cuts = [z.from, ...[aStart, aStart + la, bEnd].filter((c) => c > z.from + ZONE_TOLERANCE && c < z.to - ZONE_TOLERANCE), z.to];
    for (let i = 0; i + 1 < cuts.length; i++) pieces.push({ ...z, from: cuts[i]!, to: cuts[i + 1]! });
  }
  const move = (p: MemberZone): MemberZone => {
    const mid = (p.from + p.to) / 2;
    if (mid > aStart && mid < aStart + la) return { ...p, from: p.from + lb, to: p.to + lb };
    if (mid > aStart + la && mid < bEnd) return { ...p, from: p.from - la, to: p.to - la };
    return p;
  };
  const zones = movedZones(pieces.map(move).sort((p, q) => p.from - q.from), (x) => x);
  const loads = remapLoads(def.loads, (s) => (s === a + 1 ? b + 1 : s === b + 1 ? a + 1 : s));
  const spans = [...def.spans];
  spans[a] = lb;
  spans[b] = la;
  return { ...def, spans, zones, loads };
}

/** A support of another kind; a column support starts with a column below of the given stiffness. */
export function withSupportKind(def: ContinuousBeamDefinition, index: number, kind: ContinuousSupport['kind'], column: ContinuousSupport['below']): ContinuousBeamDefinition {
  const current = def.supports[index];
  if (!current || current.kind === kind) return def;
  const support: ContinuousSupport = kind === 'column' ? { kind, below: current.below ?? current.above ?? column } : { kind };
  return { ...def, supports: def.supports.map((s, i) => (i === index ? support : s)) };
}
