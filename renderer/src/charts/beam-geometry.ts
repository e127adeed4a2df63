/**
 * The beam elevation of the editor as plain primitives in SVG pixels: the span with its zones
 * (each with its section), the support symbols, every load as arrows (one row per load, so that
 * none hide each other), a span dimension and the zone boundaries. Horizontal scale only: the
 * beam depth is drawn at a fixed height, like a structural sketch. Positions are mm (internal).
 */
import type { MemberLoad, SupportType } from '../../../core/member/definition.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import { formatQuantity } from '../../../core/units/index.ts';
import type { UnitSystem, MemberDefinition } from '../../../core/project/types.ts';
import { displaySystem } from '../project/units.ts';

export type SupportSymbol = 'pin' | 'roller' | 'fixed' | 'free';

/** Support symbols at the left and right end for each support type. */
export const SUPPORT_SYMBOLS: Readonly<Record<SupportType, readonly [SupportSymbol, SupportSymbol]>> = {
  'simply-supported': ['pin', 'roller'],
  cantilever: ['fixed', 'free'],
  'fixed-fixed': ['fixed', 'fixed'],
  'propped-cantilever': ['fixed', 'roller'],
};

export const LOAD_CASE_NAMES: Readonly<Record<MemberLoad['loadCase'], string>> = {
  dead: 'dead',
  superimposed: 'superimposed dead',
  live: 'live',
};

export interface ZoneBox { readonly x: number; readonly w: number; readonly label: string; readonly index: number }
export interface LoadRow {
  readonly index: number;
  readonly kind: MemberLoad['kind'];
  readonly loadCase: MemberLoad['loadCase'];
  readonly y: number;
  /** Uniform: start and end x; point: x0 = x1 = position. */
  readonly x0: number;
  readonly x1: number;
  /** Arrow x positions. */
  readonly arrows: readonly number[];
  readonly text: string;
  readonly upward: boolean;
  /** The load lies (partly) off the span. */
  readonly offSpan: boolean;
}

export interface BeamGeometry {
  readonly width: number;
  readonly height: number;
  readonly beam: { readonly x0: number; readonly x1: number; readonly top: number; readonly bottom: number };
  readonly zones: readonly ZoneBox[];
  readonly supports: readonly [SupportSymbol, SupportSymbol];
  readonly loads: readonly LoadRow[];
  readonly spanText: string;
  readonly ticks: readonly { readonly x: number; readonly text: string }[];
  readonly hinges: readonly { readonly x0: number; readonly x1: number }[];
  /** Pixels per mm along the span. */
  readonly scale: number;
}

const finite = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

export function beamGeometry(member: MemberDefinition, sections: readonly SectionDefinition[], system: UnitSystem, width = 640, hingeZones: readonly (readonly [number, number])[] = []): BeamGeometry {
  const display = displaySystem(system);
  const length = (mm: number) => formatQuantity('spanLength', mm, display);
  const spanValid = finite(member.span) && member.span > 0;
  const span = spanValid ? member.span : 1;
  const x0 = 56;
  const x1 = width - 56;
  const k = (x1 - x0) / span;
  const X = (x: number) => Math.round((x0 + Math.min(Math.max(x, 0), span) * k) * 10) / 10;
  const rowHeight = 32;
  const loadsTop = 16;
  const loads: LoadRow[] = member.loads.map((load, index) => {
    const y = loadsTop + index * rowHeight;
    const upward = load.magnitude < 0;
    if (load.kind === 'point') {
      const text = `${formatQuantity('force', Math.abs(load.magnitude), display)} ${LOAD_CASE_NAMES[load.loadCase]}${load.label ? ` — ${load.label}` : ''}`;
      const offSpan = !finite(load.position) || load.position < 0 || load.position > span;
      return { index, kind: 'point', loadCase: load.loadCase, y, x0: X(load.position), x1: X(load.position), arrows: [X(load.position)], text, upward, offSpan };
    }
    const from = load.from ?? 0;
    const to = load.to ?? span;
    const a = X(from);
    const b = X(to);
    const count = Math.max(2, Math.round((b - a) / 26) + 1);
    const arrows = Array.from({ length: count }, (_, i) => Math.round((a + ((b - a) * i) / (count - 1)) * 10) / 10);
    const text = `${formatQuantity('lineLoad', Math.abs(load.magnitude), display)} ${LOAD_CASE_NAMES[load.loadCase]}${load.label ? ` — ${load.label}` : ''}`;
    const offSpan = !finite(from) || !finite(to) || from < 0 || to > span + 1e-6 || !(to > from);
    return { index, kind: 'uniform', loadCase: load.loadCase, y, x0: a, x1: b, arrows, text, upward, offSpan };
  });
  const top = loadsTop + Math.max(1, loads.length) * rowHeight - 4;
  const beam = { x0, x1, top, bottom: top + 22 };
  const zones: ZoneBox[] = member.zones.map((zone, index) => {
    const section = sections.find((s) => s.id === zone.sectionId);
    const a = X(zone.from);
    const b = X(zone.to);
    return { x: a, w: Math.max(b - a, 0), label: section ? section.name : `missing section "${zone.sectionId}"`, index };
  });
  const boundaries = [...new Set([0, ...member.zones.flatMap((z) => [z.from, z.to]), span].filter(finite))].sort((a, b) => a - b);
  const ticks = spanValid ? boundaries.filter((x) => x >= 0 && x <= span).map((x) => ({ x: X(x), text: length(x) })) : [];
  return {
    width,
    height: beam.bottom + 66,
    beam,
    zones,
    supports: SUPPORT_SYMBOLS[member.supports] ?? ['pin', 'roller'],
    loads,
    spanText: spanValid ? `span ${length(span)}` : 'span not valid: see the span field',
    ticks,
    hinges: hingeZones.filter(([a, b]) => finite(a) && finite(b)).map(([a, b]) => ({ x0: X(a), x1: X(b) })),
    scale: k,
  };
}
