/**
 * The critical sections of a continuous beam where plastic hinges may form — the supports, each
 * span's sagging maximum (which follows the maximum until the hinge forms) and every change of
 * section — their moments, hinge lengths, and the test for a beam mechanism.
 * Units: mm, N·mm, rad.
 */
import { hingeLength } from '../member/hinge-length.ts';
import type { HingeLengthMethod } from '../member/definition.ts';
import type { Text } from '../units/phrase.ts';
import { supportStiffness, type ContinuousBeamDefinition } from './definition.ts';
import { partName, type Layout, type LoadsByPart } from './layout.ts';
import type { DirectionLaw, HingeLaw, ZoneLaws } from './laws.ts';
import { releasedMomentAt, zoneAt, type BeamMesh, type releasedField } from './model.ts';
import type { ActiveHinge, StructureState } from './structure.ts';

export type HingeSiteKind = 'support' | 'span' | 'section-change' | 'cantilever-root';

/** A critical section where a plastic hinge may form, and its state once it has. */
export interface Site {
  readonly kind: HingeSiteKind;
  readonly part: number;
  readonly span: number;
  s: number;
  readonly movable: boolean;
  readonly support: number;
  readonly laws: { readonly sagging: DirectionLaw; readonly hogging: DirectionLaw; readonly sectionId: { sagging: string; hogging: string } };
  /** Shear-span sides: 'both' inside a part or at a pinned interior support, 'inward' at a support face. */
  readonly sides: 'both' | 'inward' | 'both-parts';
  active: boolean;
  sign: number;
  law: HingeLaw | null;
  heldMoment: number;
  patternMoment: number;
  formedAt: { loadFactor: number; deflection: number } | null;
  order: number;
  length: number;
  formula: Text;
  shearSpans: number[];
}


/** The weaker (lower first-yield moment) law per direction of two zones. */
function weaker(zones: readonly ZoneLaws[], a: number, b: number): Site['laws'] {
  const pick = (dir: 'sagging' | 'hogging') => (zones[a]![dir].firstYieldMoment <= zones[b]![dir].firstYieldMoment ? zones[a]! : zones[b]!);
  const s = pick('sagging');
  const h = pick('hogging');
  return { sagging: s.sagging, hogging: h.hogging, sectionId: { sagging: s.sectionId, hogging: h.sectionId } };
}

export function hingeSites(def: ContinuousBeamDefinition, layout: Layout, zones: readonly ZoneLaws[]): Site[] {
  const sites: Site[] = [];
  const zoneIdx = (x: number) => zoneAt(def.zones, x);
  const site = (kind: HingeSiteKind, part: number, s: number, support: number, sides: Site['sides'], movable = false) => {
    const p = layout.parts[part]!;
    const x = p.from + s;
    const laws = weaker(zones, zoneIdx(Math.max(x - 1e-3, 0)), zoneIdx(Math.min(x + 1e-3, layout.length)));
    sites.push({ kind, part, span: p.kind === 'span' ? p.span : -1, s, movable, support, laws, sides, active: false, sign: 0, law: null, heldMoment: 0, patternMoment: 0, formedAt: null, order: 0, length: 0, formula: '', shearSpans: [] });
  };
  const spans = layout.spanPart.length;
  const hasLeft = layout.parts[0]!.kind === 'left-cantilever';
  const hasRight = layout.parts[layout.parts.length - 1]!.kind === 'right-cantilever';
  def.supports.forEach((support, j) => {
    const k = supportStiffness(support);
    const leftSpan = j >= 1 ? layout.spanPart[j - 1]! : -1;
    const rightSpan = j < spans ? layout.spanPart[j]! : -1;
    if (leftSpan >= 0 && rightSpan >= 0) {
      if (k === 0) site('support', leftSpan, layout.parts[leftSpan]!.length, j, 'both-parts');
      else {
        site('support', leftSpan, layout.parts[leftSpan]!.length, j, 'inward');
        site('support', rightSpan, 0, j, 'inward');
      }
      return;
    }
    const spanPart = leftSpan >= 0 ? leftSpan : rightSpan;
    const s = leftSpan >= 0 ? layout.parts[spanPart]!.length : 0;
    const cantilever = leftSpan >= 0 ? (hasRight ? layout.parts.length - 1 : -1) : hasLeft ? 0 : -1;
    if (k > 0 || cantilever >= 0) site('support', spanPart, s, j, k > 0 ? 'inward' : 'both-parts');
    if (k > 0 && cantilever >= 0) site('cantilever-root', cantilever, leftSpan >= 0 ? 0 : layout.parts[cantilever]!.length, j, 'inward');
  });
  layout.spanPart.forEach((p) => site('span', p, layout.parts[p]!.length / 2, -1, 'both', true));
  for (const z of def.zones) {
    layout.parts.forEach((p, pi) => {
      if (z.from > p.from + 1 && z.from < p.to - 1) site('section-change', pi, z.from - p.from, -1, 'both');
    });
  }
  return sites;
}

/**
 * Local position of the largest sagging moment of a span: the vertex of the parabola through each
 * segment's three samples (exact where the moment is quadratic) or the largest sample.
 */
export function sagMaximum(mesh: BeamMesh, moment: Float64Array, part: number): number | null {
  const [first, end] = mesh.partSegments[part]!;
  let best: number | null = null;
  let bestM = 0;
  for (let k = first; k < end; k++) {
    const seg = mesh.segments[k]!;
    const [ma, mm, mb] = [moment[seg.sample]!, moment[seg.sample + 1]!, moment[seg.sample + 2]!];
    const candidates: [number, number][] = [[0, ma], [0.5, mm], [1, mb]];
    const c = ma - 2 * mm + mb;
    if (c < 0) {
      const t = (3 * ma - 4 * mm + mb) / (4 * c);
      if (t > 0 && t < 1) candidates.push([t, ma + t * (-3 * ma + 4 * mm - mb) + 2 * c * t * t]);
    }
    for (const [t, m] of candidates) if (m > bestM) {
      bestM = m;
      best = seg.s0 + t * (seg.s1 - seg.s0);
    }
  }
  return best;
}

/** The pattern's released moment and the held loads' at a site. */
export function siteMoments(mesh: BeamMesh, site: Site, held: LoadsByPart, pattern: LoadsByPart, fields: { held: ReturnType<typeof releasedField>; pattern: ReturnType<typeof releasedField> }) {
  site.heldMoment = releasedMomentAt(mesh, held, fields.held, site.part, site.s);
  site.patternMoment = releasedMomentAt(mesh, pattern, fields.pattern, site.part, site.s);
}

/** Moment at a site for a state. */
export function siteMoment(mesh: BeamMesh, site: Site, state: StructureState): number {
  const p = mesh.layout.parts[site.part]!;
  let m = site.heldMoment + state.lambda * site.patternMoment;
  if (site.span >= 0) m += state.redundants[2 * site.span]! * (1 - site.s / p.length) + (state.redundants[2 * site.span + 1]! * site.s) / p.length;
  return m;
}

export function asActive(mesh: BeamMesh, site: Site): ActiveHinge {
  const p = mesh.layout.parts[site.part]!;
  const law = site.law!;
  return {
    part: site.part,
    span: site.span,
    fieldLeft: site.span >= 0 ? 1 - site.s / p.length : 0,
    fieldRight: site.span >= 0 ? site.s / p.length : 0,
    heldMoment: site.heldMoment,
    patternMoment: site.patternMoment,
    sign: site.sign,
    moment: law.moment,
    plasticRotation: law.plasticRotation,
  };
}

/** Distance from local s to the first change of sign of the moment, walking one way along the beam (mm). */
function distanceToContraflexure(mesh: BeamMesh, moment: Float64Array, x: number, sign: number, direction: 1 | -1, sameSpanOnly: number): number {
  // Samples ordered by position along the beam.
  let best = Infinity;
  const n = moment.length;
  let lastX = x;
  const order = direction === 1 ? [...Array(n).keys()] : [...Array(n).keys()].reverse();
  for (const q of order) {
    const xq = mesh.sampleX[q]!;
    if (direction * (xq - x) <= 1e-6) continue;
    if (sameSpanOnly >= 0 && mesh.samplePart[q] !== sameSpanOnly) continue;
    if (sign * moment[q]! <= 0) {
      best = Math.abs(xq - x);
      break;
    }
    lastX = xq;
  }
  return Number.isFinite(best) ? best : Math.abs(lastX - x);
}


/**
 * The spans (and cantilevers) that have become beam mechanisms: a hinge at its strength (≥ 95 % of
 * the section's peak moment, or the given fraction) in the span, and at each end either a hogging hinge at its strength on
 * that half of the span or no restraint (a pinned end support without a cantilever). A cantilever
 * is a mechanism with a hinge at its strength at its root.
 */
export function mechanismParts(def: ContinuousBeamDefinition, layout: Layout, mesh: BeamMesh, active: readonly Site[], state: StructureState, fraction = 0.95): number[] {
  const strong = active.filter((a) => Math.abs(siteMoment(mesh, a, state)) >= fraction * (a.sign > 0 ? a.laws.sagging : a.laws.hogging).peakMoment);
  const out: number[] = [];
  layout.parts.forEach((part, pi) => {
    const here = strong.filter((a) => a.part === pi);
    if (part.kind !== 'span') {
      if (here.some((a) => a.kind === 'cantilever-root' || (a.sign < 0 && (part.kind === 'left-cantilever' ? a.s > 0.9 * part.length : a.s < 0.1 * part.length)))) out.push(pi);
      return;
    }
    const sagging = here.some((a) => a.sign > 0);
    const supportFree = (j: number) => supportStiffness(def.supports[j]!) === 0 && (j === 0 ? layout.parts[0]!.kind !== 'left-cantilever' : j === layout.spanPart.length ? layout.parts[layout.parts.length - 1]!.kind !== 'right-cantilever' : false);
    // A hinge at a pinned interior support sits on the left span's end and serves both spans.
    const sharedLeft = strong.some((a) => a.sign < 0 && a.kind === 'support' && a.support === part.span && a.sides === 'both-parts');
    const left = supportFree(part.span) || sharedLeft || here.some((a) => a.sign < 0 && a.s < part.length / 2);
    const right = supportFree(part.span + 1) || here.some((a) => a.sign < 0 && a.s > part.length / 2);
    if (sagging && left && right) out.push(pi);
  });
  return out;
}


export function siteWords(site: Site, layout: Layout): string {
  const part = partName(layout.parts[site.part]!);
  switch (site.kind) {
    case 'support':
      return `support ${site.support + 1}, ${part} side`;
    case 'cantilever-root':
      return `root of the ${part}`;
    case 'span':
      return `in ${part}`;
    case 'section-change':
      return `change of section in ${part}`;
  }
}

/** Hinge length of a site from the moment distribution when it forms. */
export function siteHingeLength(mesh: BeamMesh, site: Site, moment: Float64Array, law: DirectionLaw, input: { readonly hingeLengthMethod: HingeLengthMethod; readonly userHingeLength?: number }): { length: number; formula: Text; shearSpans: number[] } {
  const part = mesh.layout.parts[site.part]!;
  const x = part.from + site.s;
  const sign = site.sign;
  let spans: number[];
  if (site.sides === 'inward') {
    const inward: 1 | -1 = site.s < part.length / 2 ? 1 : -1;
    spans = [distanceToContraflexure(mesh, moment, x, sign, inward, site.part)];
  } else if (site.sides === 'both') {
    spans = [distanceToContraflexure(mesh, moment, x, sign, -1, site.part), distanceToContraflexure(mesh, moment, x, sign, 1, site.part)];
  } else {
    spans = [distanceToContraflexure(mesh, moment, x, sign, -1, -1), distanceToContraflexure(mesh, moment, x, sign, 1, -1)].filter((z) => z > 1);
  }
  const atSupport = site.sides === 'inward';
  const bars = law.bars;
  const result = hingeLength({
    method: input.hingeLengthMethod,
    effectiveDepth: bars.effectiveDepth,
    shearSpans: spans.map((z) => Math.round(z)),
    barDiameter: bars.barDiameter,
    yieldStress: bars.yieldStress,
    ultimateStress: bars.ultimateStress,
    atSupport,
    userLength: input.userHingeLength,
  });
  return { length: result.length, formula: result.formula, shearSpans: spans };
}
