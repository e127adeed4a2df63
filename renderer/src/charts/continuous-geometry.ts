/**
 * The elevation of a continuous beam as plain primitives in SVG pixels: every span and cantilever
 * to one horizontal scale, the supports (pin, fixed, column above/below), the zones shaded by
 * section, the loads in one row per load case, a dimension line per part, and after analysis the
 * plastic hinges numbered in order of formation. The beam depth is drawn at a fixed height like a
 * structural sketch. Positions are mm (internal); nothing here is an engineering result.
 */
import type { ContinuousBeamDefinition, ContinuousSupportKind } from '../../../core/continuous/definition.ts';
import type { LoadCaseId } from '../../../core/member/definition.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import { formatQuantity } from '../../../core/units/index.ts';
import type { UnitSystem } from '../../../core/project/types.ts';
import { displaySystem } from '../project/units.ts';

export interface ElevationPart {
  readonly name: string;
  /** 0-based span index, or −1 for a cantilever. */
  readonly span: number;
  readonly x0: number;
  readonly x1: number;
  readonly text: string;
  /** Start along the beam and length, mm (as drawn). */
  readonly start: number;
  readonly length: number;
}
export interface ElevationSupport {
  readonly x: number;
  readonly kind: ContinuousSupportKind;
  readonly above: boolean;
  readonly below: boolean;
  readonly index: number;
}
export interface ElevationZone { readonly x: number; readonly w: number; readonly label: string; readonly shade: number; readonly index: number }
export interface ElevationLoad {
  readonly index: number;
  readonly kind: 'uniform' | 'point';
  readonly loadCase: LoadCaseId;
  readonly y: number;
  readonly x0: number;
  readonly x1: number;
  readonly arrows: readonly number[];
  /** Magnitude (and description) of the load; drawn where there is room, always its tooltip. */
  readonly text: string;
  readonly showText: boolean;
  readonly upward: boolean;
  /** The load does not lie on its span (or names a part the beam lacks). */
  readonly off: boolean;
}
export interface ElevationHinge { readonly x: number; readonly order: number; readonly direction: 'sagging' | 'hogging'; readonly title: string }

export interface HingeInput {
  readonly order: number;
  readonly position: number;
  readonly direction: 'sagging' | 'hogging';
  readonly part: string;
  readonly loadFactor: number;
}

export interface ContinuousGeometry {
  readonly width: number;
  readonly height: number;
  readonly beam: { readonly x0: number; readonly x1: number; readonly top: number; readonly bottom: number };
  readonly parts: readonly ElevationPart[];
  readonly supports: readonly ElevationSupport[];
  readonly zones: readonly ElevationZone[];
  readonly loads: readonly ElevationLoad[];
  /** Load-case rows that hold loads, top to bottom, with the y of each. */
  readonly caseRows: readonly { readonly loadCase: LoadCaseId; readonly y: number; readonly label: string }[];
  readonly hinges: readonly ElevationHinge[];
  /** y of the dimension line. */
  readonly dimensionY: number;
  /** Pixels per mm along the beam. */
  readonly scale: number;
  /** Set when the geometry cannot be drawn to scale (a span not valid): the reason. */
  readonly problem: string | null;
}

const finite = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);
const CASE_ORDER: readonly LoadCaseId[] = ['dead', 'superimposed', 'live'];
const ROW = 30;
const MARGIN = 44;
/** Left gutter holding the names of the load rows. */
const GUTTER = 70;
const ROW_NAMES: Readonly<Record<LoadCaseId, string>> = { dead: 'dead', superimposed: 'superimp.', live: 'live' };
const round = (x: number) => Math.round(x * 10) / 10;

/** Geometry of the elevation of `def` at `width` CSS pixels. */
export function continuousGeometry(def: ContinuousBeamDefinition, sections: readonly SectionDefinition[], system: UnitSystem, width = 900, hinges: readonly HingeInput[] = []): ContinuousGeometry {
  const display = displaySystem(system);
  const length = (mm: number) => formatQuantity('spanLength', mm, display);
  const valid = def.spans.length > 0 && def.spans.every((s) => finite(s) && s > 0)
    && [def.leftCantilever ?? 0, def.rightCantilever ?? 0].every((c) => finite(c) && c >= 0);
  // A beam that cannot be drawn to scale is drawn with equal spans, and says why.
  const spans = valid ? def.spans : def.spans.map(() => 1);
  const left = valid ? def.leftCantilever ?? 0 : 0;
  const right = valid ? def.rightCantilever ?? 0 : 0;
  const total = left + spans.reduce((a, b) => a + b, 0) + right || 1;
  const x0 = def.loads.length > 0 ? GUTTER : MARGIN;
  const x1 = width - MARGIN;
  const k = (x1 - x0) / total;
  const X = (x: number) => round(x0 + Math.min(Math.max(x, 0), total) * k);

  const parts: ElevationPart[] = [];
  const supportX: number[] = [];
  let x = 0;
  if (left > 0) {
    parts.push({ name: 'left cantilever', span: -1, x0: X(0), x1: X(left), text: length(left), start: 0, length: left });
    x = left;
  }
  supportX.push(x);
  spans.forEach((s, i) => {
    parts.push({ name: `span ${i + 1}`, span: i, x0: X(x), x1: X(x + s), text: valid ? length(s) : 'not valid', start: x, length: s });
    x += s;
    supportX.push(x);
  });
  if (right > 0) parts.push({ name: 'right cantilever', span: -1, x0: X(x), x1: X(x + right), text: length(right), start: x, length: right });
  const partOf = (ref: number | string) => (typeof ref === 'number' ? parts.find((p) => p.span === ref - 1) : parts.find((p) => p.name === ref.replace('-', ' ')));

  // Loads: one row per load case that has any.
  const cases = CASE_ORDER.filter((c) => def.loads.some((l) => l.loadCase === c));
  const top0 = 14;
  const caseRows = cases.map((loadCase, i) => ({ loadCase, y: top0 + i * ROW, label: ROW_NAMES[loadCase] }));
  const loads: ElevationLoad[] = def.loads.map((load, index) => {
    const row = caseRows.find((r) => r.loadCase === load.loadCase);
    const y = row?.y ?? top0;
    const part = partOf(load.span);
    const upward = load.magnitude < 0;
    const partLength = part?.length ?? 0;
    const at = (pos: number) => (part ? X(part.start + Math.min(Math.max(pos, 0), partLength)) : X(0));
    const label = load.label ? ` — ${load.label}` : '';
    if (load.kind === 'point') {
      const off = !part || !finite(load.position) || load.position < 0 || load.position > partLength + 1e-6;
      const px = at(load.position);
      return { index, kind: 'point', loadCase: load.loadCase, y, x0: px, x1: px, arrows: [px], text: `${formatQuantity('force', Math.abs(load.magnitude), display)}${label}`, showText: false, upward, off };
    }
    const from = load.from ?? 0;
    const to = load.to ?? partLength;
    const a = at(from);
    const b = at(to);
    const count = Math.max(2, Math.round((b - a) / 22) + 1);
    const arrows = Array.from({ length: count }, (_, i) => round(a + ((b - a) * i) / (count - 1)));
    const off = !part || !finite(from) || !finite(to) || from < 0 || to > partLength + 1e-6 || !(to > from);
    return { index, kind: 'uniform', loadCase: load.loadCase, y, x0: a, x1: b, arrows, text: `${formatQuantity('lineLoad', Math.abs(load.magnitude), display)}${label}`, showText: false, upward, off };
  });
  // Text of a load where it fits: the first load drawn in that row over that stretch, if wide enough.
  const shown = loads.map((l) => {
    const room = l.kind === 'uniform' ? l.x1 - l.x0 : 0;
    const magnitude = l.text.split(' — ')[0]!;
    const first = loads.findIndex((o) => o.loadCase === l.loadCase && o.x0 === l.x0 && o.kind === l.kind) === l.index;
    return { ...l, showText: first && room > magnitude.length * 5.6 + 8 };
  });

  const top = top0 + Math.max(cases.length, 1) * ROW;
  const beam = { x0: X(0), x1: X(total), top, bottom: top + 22 };

  const shadeOf = new Map<string, number>();
  const zones: ElevationZone[] = def.zones.map((zone, index) => {
    if (!shadeOf.has(zone.sectionId)) shadeOf.set(zone.sectionId, shadeOf.size);
    const section = sections.find((s) => s.id === zone.sectionId);
    const a = X(valid ? zone.from : 0);
    const b = X(valid ? zone.to : 0);
    return { x: a, w: Math.max(b - a, 0), label: section ? section.name : `missing section "${zone.sectionId}"`, shade: shadeOf.get(zone.sectionId)! % 4, index };
  });

  const supports: ElevationSupport[] = supportX.map((sx, index) => {
    const s = def.supports[index];
    return { x: X(sx), kind: s?.kind ?? 'pinned', above: s?.kind === 'column' && !!s.above, below: s?.kind === 'column' && !!s.below, index };
  });

  const hingeMarks: ElevationHinge[] = hinges.filter((h) => finite(h.position)).map((h) => ({
    x: X(h.position),
    order: h.order,
    direction: h.direction,
    title: `Hinge ${h.order}: ${h.direction} at ${length(h.position)} (${h.part}), forms at λ = ${h.loadFactor.toFixed(2)}`,
  }));

  const dimensionY = beam.bottom + 40;
  return {
    width,
    height: dimensionY + 30,
    beam,
    parts,
    supports,
    zones,
    loads: shown,
    caseRows,
    hinges: hingeMarks,
    dimensionY,
    scale: k,
    problem: valid ? null : 'a span or cantilever length is not valid (see its field): spans drawn equal',
  };
}
