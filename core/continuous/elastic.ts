/**
 * Elastic analysis of a continuous beam: each load case and the live load of each part alone, then
 * the code arrangements of live load combined with the dead cases into envelopes of moment, shear,
 * deflection and reactions, the governing arrangement named at every station and for every span.
 *
 * Stiffness: the flexural stiffness EI given per zone (the caller passes Ec·Ig of each section; a
 * change of section changes the distribution) and the columns' rotational springs.
 * Units: mm, N, N/mm, N·mm, N·mm².
 */
import type { CodeBasis } from '../materials/specs.ts';
import type { LoadFactors } from '../member/definition.ts';
import { solveLinear } from '../numeric/linear.ts';
import type { ContinuousBeamDefinition } from './definition.ts';
import { layoutOf, partName, type Layout, type LoadsByPart } from './layout.ts';
import { caseLoads, combineLoads, liveArrangements, onParts, selfWeightLoads, type Arrangement } from './loads.ts';
import { buildMesh, loadPoints, releasedField, type BeamMesh } from './model.ts';
import { deflections, evaluate, supportRows, type DistributedLaw, type SupportRow } from './structure.ts';

/** What the elastic analysis needs of each zone. */
export interface ElasticZoneData {
  /** Flexural stiffness EI, N·mm². */
  readonly stiffness: number;
  /** Self-weight, N/mm. */
  readonly selfWeight: number;
}

export interface ElasticInput {
  readonly definition: ContinuousBeamDefinition;
  readonly zones: readonly ElasticZoneData[];
  /** Strength combination factors (dead, superimposed, live). */
  readonly strengthFactors: LoadFactors;
  /** A dead-only strength combination factor, e.g. ACI 318-19 Eq. (5.3.1a) 1.4D; omitted → none. */
  readonly deadOnlyFactor?: number;
  /** Equal divisions of each span (default 48). */
  readonly segmentsPerSpan?: number;
  /** Code basis, for the load symbols of the envelopes' descriptions (ACI D/L, EN G/Q); default ACI. */
  readonly code?: CodeBasis;
}

/** Output stations: a position repeats where a part ends and the next begins, at zone changes and at point loads. */
export interface Stations {
  /** Global position, mm from the left end. */
  readonly x: readonly number[];
  /** Part of the beam (index of `parts`). */
  readonly part: readonly number[];
  /** Sample of the mesh each station reads. */
  readonly sample: readonly number[];
}

/** Response of one load set at the stations. */
export interface LoadResponse {
  /** N·mm, sagging positive. */
  readonly moment: readonly number[];
  /** N, V = dM/dx. */
  readonly shear: readonly number[];
  /** mm, downward positive. */
  readonly deflection: readonly number[];
  /** Support reactions, N, upward positive, left to right. */
  readonly reactions: readonly number[];
}

export interface EnvelopeSide {
  readonly value: readonly number[];
  /** Index in `arrangements` of the arrangement that gives it (−1: the dead-only combination). */
  readonly arrangement: readonly number[];
}

export interface Envelope {
  readonly name: 'service' | 'strength' | 'live';
  readonly description: string;
  readonly moment: { readonly max: EnvelopeSide; readonly min: EnvelopeSide };
  readonly shear: { readonly max: EnvelopeSide; readonly min: EnvelopeSide };
  readonly deflection: { readonly max: EnvelopeSide; readonly min: EnvelopeSide };
  readonly reactions: { readonly max: EnvelopeSide; readonly min: EnvelopeSide };
}

/** Extreme of an envelope in one part, with where and under which arrangement. */
export interface PartExtreme {
  readonly value: number;
  readonly x: number;
  readonly arrangement: number;
}

export interface PartSummary {
  readonly part: number;
  readonly name: string;
  readonly from: number;
  readonly to: number;
  /** Strength envelope: largest sagging and hogging moments, N·mm. */
  readonly maxSagging: PartExtreme;
  readonly maxHogging: PartExtreme;
  /** Largest shear magnitude of the strength envelope, N. */
  readonly maxShear: PartExtreme;
  /** Service (D + L) envelope: largest downward deflection, mm; and of the live load alone. */
  readonly maxDeflection: PartExtreme;
  readonly maxLiveDeflection: PartExtreme;
}

export interface ElasticResult {
  readonly layout: Layout;
  readonly stations: Stations;
  readonly arrangements: readonly Arrangement[];
  readonly cases: {
    /** Dead load including self-weight. */
    readonly dead: LoadResponse;
    readonly superimposed: LoadResponse;
    /** Live load on each part alone (index of `parts`). */
    readonly liveByPart: readonly LoadResponse[];
  };
  readonly envelopes: { readonly service: Envelope; readonly strength: Envelope; readonly live: Envelope };
  readonly parts: readonly PartSummary[];
}

/** Linear curvature law φ = M / EI per zone. */
export function linearLaw(stiffness: readonly number[]): DistributedLaw {
  return {
    curvature(zone, moment, out) {
      const ei = stiffness[zone]!;
      out.value = moment / ei;
      out.slope = 1 / ei;
    },
  };
}

/** The statics solver of one beam: mesh, support equations and a law, solving any load set. */
export interface ElasticSolver {
  readonly mesh: BeamMesh;
  readonly rows: readonly SupportRow[];
  readonly law: DistributedLaw;
  solve(loads: LoadsByPart): LoadResponse & { readonly redundants: Float64Array; readonly sampleMoment: Float64Array; readonly sampleDeflection: Float64Array };
  readonly stations: Stations;
}

/** Scale of the support rows so that moment and rotation equations weigh alike. */
function rowScale(rows: readonly SupportRow[], layout: Layout, stiffness: number): number[] {
  const meanSpan = layout.supportX[layout.supportX.length - 1]! / Math.max(layout.spanPart.length, 1);
  return rows.map((r) => (r.kind === 'rotation' ? stiffness / meanSpan : 1));
}

export function elasticSolver(definition: ContinuousBeamDefinition, stiffness: readonly number[], extraPoints: LoadsByPart, segmentsPerSpan = 48): ElasticSolver {
  const layout = layoutOf(definition);
  const mesh = buildMesh(layout, definition.zones, loadPoints(extraPoints), segmentsPerSpan);
  const rows = supportRows(layout.spanPart.length, definition.supports);
  const law = linearLaw(stiffness);
  const scale = rowScale(rows, layout, Math.max(...stiffness));
  const stations = stationsOf(mesh, loadPoints(extraPoints));
  const nx = 2 * layout.spanPart.length;
  // The law is linear: the Jacobian does not depend on the loads, so one Newton step from X = 0 is exact.
  const solve = (loads: LoadsByPart) => {
    const field = releasedField(mesh, loads);
    const fields = { held: new Float64Array(field.moment.length), pattern: field.moment };
    const state = { redundants: new Float64Array(nx), kappa: new Float64Array(0), lambda: 1 };
    const { linearisation } = evaluate(mesh, rows, law, fields, field.total, [], state, undefined, true);
    const a = linearisation!.jacobian.map((r, i) => Array.from(r, (v) => v * scale[i]!));
    const b = Array.from(linearisation!.residual, (v, i) => -v * scale[i]!);
    const x = solveLinear(a, b);
    if (!x) throw new Error('the supports leave the beam free to move: add a support that restrains it');
    const redundants = Float64Array.from(x);
    const { evaluation } = evaluate(mesh, rows, law, fields, field.total, [], { redundants, kappa: new Float64Array(0), lambda: 1 });
    const sampleDeflection = deflections(mesh, evaluation, []);
    const sampleShear = shearAtSamples(mesh, field.shear, redundants);
    const at = (values: ArrayLike<number>) => stations.sample.map((q) => values[q]!);
    return {
      redundants,
      sampleMoment: evaluation.moment,
      sampleDeflection,
      moment: at(evaluation.moment),
      shear: at(sampleShear),
      deflection: at(sampleDeflection),
      reactions: reactionsOf(mesh, sampleShear),
    };
  };
  return { mesh, rows, law, solve, stations };
}

/** Shear at every sample: released shear plus (X_R − X_L)/L on spans. */
export function shearAtSamples(mesh: BeamMesh, released: Float64Array, redundants: Float64Array, lambda = 1, held?: Float64Array): Float64Array {
  const out = new Float64Array(released.length);
  const { parts } = mesh.layout;
  for (let q = 0; q < released.length; q++) {
    const part = parts[mesh.samplePart[q]!]!;
    let v = lambda * released[q]! + (held ? held[q]! : 0);
    if (part.kind === 'span') v += (redundants[2 * part.span + 1]! - redundants[2 * part.span]!) / part.length;
    out[q] = v;
  }
  return out;
}

/** Reactions, N upward: the jump in shear at each support, R = V(x⁺) − V(x⁻). */
export function reactionsOf(mesh: BeamMesh, shear: Float64Array): number[] {
  const { parts, supportX } = mesh.layout;
  return supportX.map((x) => {
    let left = 0;
    let right = 0;
    parts.forEach((part, pi) => {
      const [first, end] = mesh.partSegments[pi]!;
      if (Math.abs(part.to - x) < 1e-6) left = shear[mesh.segments[end - 1]!.sample + 2]!;
      if (Math.abs(part.from - x) < 1e-6) right = shear[mesh.segments[first]!.sample]!;
    });
    return right - left;
  });
}

/** Stations: every segment start; segment ends where a part ends, the zone changes or a point load sits. */
export function stationsOf(mesh: BeamMesh, points: readonly (readonly number[])[]): Stations {
  const x: number[] = [];
  const part: number[] = [];
  const sample: number[] = [];
  mesh.layout.parts.forEach((p, pi) => {
    const [first, end] = mesh.partSegments[pi]!;
    for (let k = first; k < end; k++) {
      const seg = mesh.segments[k]!;
      x.push(p.from + seg.s0);
      part.push(pi);
      sample.push(seg.sample);
      const next = mesh.segments[k + 1];
      const last = k === end - 1;
      const jump = !last && (next!.zone !== seg.zone || (points[pi] ?? []).some((s) => Math.abs(s - seg.s1) < 1e-6));
      if (last || jump) {
        x.push(p.from + seg.s1);
        part.push(pi);
        sample.push(seg.sample + 2);
      }
    }
  });
  return { x, part, sample };
}

function sumResponses(terms: readonly { readonly r: LoadResponse; readonly f: number }[]): LoadResponse {
  const base = terms[0]!.r;
  const add = (key: 'moment' | 'shear' | 'deflection' | 'reactions') => base[key].map((_, i) => terms.reduce((s, t) => s + t.f * t.r[key][i]!, 0));
  return { moment: add('moment'), shear: add('shear'), deflection: add('deflection'), reactions: add('reactions') };
}

/** Envelope over candidates (each a response and the arrangement index that made it). */
function envelopeOf(name: Envelope['name'], description: string, candidates: readonly { readonly r: LoadResponse; readonly arrangement: number }[]): Envelope {
  const side = (key: 'moment' | 'shear' | 'deflection' | 'reactions', sign: 1 | -1): EnvelopeSide => {
    const n = candidates[0]!.r[key].length;
    const value: number[] = new Array<number>(n).fill(sign * -Infinity);
    const arrangement: number[] = new Array<number>(n).fill(-1);
    for (const c of candidates) {
      const values = c.r[key];
      for (let i = 0; i < n; i++) {
        if (arrangement[i] === -1 && value[i] === sign * -Infinity ? true : sign * values[i]! > sign * value[i]! + 1e-9 * Math.abs(value[i]!)) {
          value[i] = values[i]!;
          arrangement[i] = c.arrangement;
        }
      }
    }
    return { value, arrangement };
  };
  const both = (key: 'moment' | 'shear' | 'deflection' | 'reactions') => ({ max: side(key, 1), min: side(key, -1) });
  return { name, description, moment: both('moment'), shear: both('shear'), deflection: both('deflection'), reactions: both('reactions') };
}

/** Elastic analysis with pattern loading. */
export function analyzeElastic(input: ElasticInput): ElasticResult {
  const { definition } = input;
  const layout = layoutOf(definition);
  const dead = combineLoads(
    [
      { loads: caseLoads(definition, layout, 'dead'), factor: 1 },
      { loads: selfWeightLoads(definition, layout, input.zones.map((z) => z.selfWeight)), factor: 1 },
    ],
    layout.parts.length,
  );
  const superimposed = caseLoads(definition, layout, 'superimposed');
  const live = caseLoads(definition, layout, 'live');
  const all = combineLoads([{ loads: dead, factor: 1 }, { loads: superimposed, factor: 1 }, { loads: live, factor: 1 }], layout.parts.length);
  const solver = elasticSolver(definition, input.zones.map((z) => z.stiffness), all, input.segmentsPerSpan ?? 48);
  const deadR = solver.solve(dead);
  const superR = solver.solve(superimposed);
  const liveByPart = layout.parts.map((_, p) => solver.solve(onParts(live, [p])));
  const arrangements = liveArrangements(layout);
  const liveOf = (a: Arrangement, f: number) => a.loadedParts.map((p) => ({ r: liveByPart[p]!, f }));
  const f = input.strengthFactors;
  // Load symbols of the code: ACI 318-19 5.3 D and L; EN 1990 6.10 G and Q.
  const [D, L] = input.code === 'EN 1992-1-1' ? ['G', 'Q'] : ['D', 'L'];
  const service = envelopeOf(
    'service',
    `${D} + ${L}`,
    arrangements.map((a, i) => ({ r: sumResponses([{ r: deadR, f: 1 }, { r: superR, f: 1 }, ...liveOf(a, 1)]), arrangement: i })),
  );
  const strengthCandidates = arrangements.map((a, i) => ({ r: sumResponses([{ r: deadR, f: f.dead }, { r: superR, f: f.superimposed }, ...liveOf(a, f.live)]), arrangement: i }));
  if (input.deadOnlyFactor) strengthCandidates.push({ r: sumResponses([{ r: deadR, f: input.deadOnlyFactor }, { r: superR, f: input.deadOnlyFactor }]), arrangement: -1 });
  const strength = envelopeOf('strength', `${f.dead}${D} + ${f.live}${L}${input.deadOnlyFactor ? `; ${input.deadOnlyFactor}${D}` : ''}`, strengthCandidates);
  const liveEnvelope = envelopeOf('live', L, arrangements.map((a, i) => ({ r: sumResponses(liveOf(a, 1)), arrangement: i })));
  const stations = solver.stations;
  const extreme = (pi: number, s: EnvelopeSide, sign: 1 | -1, magnitude = false): PartExtreme => {
    let best: PartExtreme = { value: 0, x: layout.parts[pi]!.from, arrangement: -1 };
    stations.part.forEach((p, i) => {
      if (p !== pi) return;
      const v = s.value[i]!;
      const key = magnitude ? Math.abs(v) : sign * v;
      const bestKey = magnitude ? Math.abs(best.value) : sign * best.value;
      if (key > bestKey) best = { value: v, x: stations.x[i]!, arrangement: s.arrangement[i]! };
    });
    return best;
  };
  const parts: PartSummary[] = layout.parts.map((part, pi) => {
    const shearMax = extreme(pi, strength.shear.max, 1, true);
    const shearMin = extreme(pi, strength.shear.min, -1, true);
    return {
      part: pi,
      name: partName(part),
      from: part.from,
      to: part.to,
      maxSagging: extreme(pi, strength.moment.max, 1),
      maxHogging: extreme(pi, strength.moment.min, -1),
      maxShear: Math.abs(shearMax.value) >= Math.abs(shearMin.value) ? shearMax : shearMin,
      maxDeflection: extreme(pi, service.deflection.max, 1),
      maxLiveDeflection: extreme(pi, liveEnvelope.deflection.max, 1),
    };
  });
  return {
    layout,
    stations,
    arrangements,
    cases: { dead: deadR, superimposed: superR, liveByPart },
    envelopes: { service, strength, live: liveEnvelope },
    parts,
  };
}
