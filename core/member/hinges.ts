/**
 * Plastic hinges of the member engine: where a section's deformation localises (its critical
 * section and where the localised rotation acts), the localisation length Lp from the published
 * expressions (core/member/hinge-length.ts) with the shear spans of the moment diagram at that
 * moment, and the hinges as the results report them — each yielded zone with its spread, localised
 * and strain-penetration rotation, and its rotation capacity.
 * Internal units: mm, N·mm, 1/mm, rad.
 */
import { joinTexts, phrase, q, type Text } from '../units/phrase.ts';
import { fieldValue, type BeamModel } from './beam-model.ts';
import type { CapacitySettings, HingeLengthMethod } from './definition.ts';
import { plasticLawOf, responseOf, type LocalisedHinge, type Memory } from './equations.ts';
import { hingeLength, type HingeLengthInput } from './hinge-length.ts';
import { describeLinePosition, type MemberLayout } from './layout.ts';
import { addTableIntegrals, plasticAt, type PlasticLaw, type TableIntegrals } from './plastic-law.ts';
import type { PlasticHinge } from './results.ts';
import { interpolateWithSlope } from './section-response.ts';

/**
 * A position along the member in words without units (results are shown in SI or US customary;
 * numbers with units come from the numeric fields): "midspan", "0.42ℓ from the left support".
 */
export function describePosition(x: number, layout: MemberLayout): string {
  return describeLinePosition(layout, x);
}

/** What the results keep of a localised hinge besides its mechanics. */
export interface HingeRecord extends LocalisedHinge {
  /** The critical section, mm (where the moment is measured). */
  readonly critical: number;
  readonly sectionId: string;
  readonly lengthFormula: Text;
  readonly shearSpans: readonly number[];
  /** Load factor when the deformation localised. */
  readonly formedAt: number;
  /** True at a support face that takes a moment (end of a restrained span, root of a cantilever, interior support). */
  readonly atSupport: boolean;
}

/** Where the moment of the member crosses zero on each side of x (a free end or a pinned end counts as zero), mm from x. */
export function shearSpans(beam: BeamModel, moment: Float64Array, x: number, sides: 'both' | 'left' | 'right'): number[] {
  const xs = beam.x;
  const n = xs.length;
  // The stations just beyond x on each side, and the moment at x seen from that side.
  let right = 0;
  while (right < n && xs[right]! <= x) right++;
  let left = n - 1;
  while (left >= 0 && xs[left]! >= x) left--;
  const atStation = xs.indexOf(x);
  const valueFrom = (dir: 1 | -1) => (atStation >= 0 ? moment[dir > 0 ? xs.lastIndexOf(x) : atStation]! : interpolateAt(beam, moment, x));
  const walk = (dir: 1 | -1): number => {
    let prevX = x;
    let prevM = valueFrom(dir);
    const sign = Math.sign(prevM) || 1;
    for (let k = dir > 0 ? right : left; k >= 0 && k < n; k += dir) {
      const m = moment[k]!;
      if (Math.sign(m) !== sign || m === 0) {
        const t = prevM / (prevM - m || 1);
        return Math.abs(prevX + t * (xs[k]! - prevX) - x);
      }
      prevX = xs[k]!;
      prevM = m;
    }
    return Math.abs((dir > 0 ? xs[n - 1]! : xs[0]!) - x);
  };
  if (sides === 'left') return [walk(-1)];
  if (sides === 'right') return [walk(1)];
  return [walk(-1), walk(1)];
}

/**
 * Runs of consecutive stations past first yield in one sense (remembered moment at least
 * (1 − tolerance)·M′y of the station's section), as [first, last] station indices; stations in
 * `counted` belong to a run whatever their moment.
 */
export function yieldedRuns(beam: BeamModel, remembered: ArrayLike<number>, sign: 1 | -1, tolerance = 0, counted?: ReadonlySet<number>): [number, number][] {
  const n = beam.x.length;
  const yielded = (i: number) => {
    if (counted?.has(i)) return true;
    const law = plasticLawOf(beam.zones[beam.stationZone[i]!]!, sign);
    return !!law && law.yieldMoment !== null && remembered[i]! >= law.yieldMoment * (1 - tolerance);
  };
  const runs: [number, number][] = [];
  for (let i = 0; i < n; i++) {
    if (!yielded(i)) continue;
    let j = i;
    while (j + 1 < n && yielded(j + 1)) j++;
    runs.push([i, j]);
    i = j;
  }
  return runs;
}

/** The moment at x, linear between stations (at a doubled position, the right-hand copy). */
export function interpolateAt(beam: BeamModel, values: ArrayLike<number>, x: number): number {
  return interpolateWithSlope(beam.x, values, x, { value: 0, slope: 0 }).value;
}

/** Stations bracketing x and the weight of the right one, for a hinge measured at x. */
function bracket(beam: BeamModel, x: number, preferLeft: boolean): { a: number; b: number; w: number } {
  const xs = beam.x;
  const n = xs.length;
  for (let i = 0; i < n; i++) {
    if (xs[i] === x) {
      // On a doubled station the side of the hinge decides which copy.
      const j = !preferLeft && i + 1 < n && xs[i + 1] === x ? i + 1 : i;
      return { a: j, b: j, w: 0 };
    }
  }
  let lo = 0;
  while (lo < n - 2 && xs[lo + 1]! < x) lo++;
  const dx = xs[lo + 1]! - xs[lo]!;
  return { a: lo, b: lo + 1, w: dx > 0 ? (x - xs[lo]!) / dx : 0 };
}

/**
 * A localised hinge at a critical section that has just reached its localisation moment.
 * @param critical the critical section, mm
 * @param station  a station of the critical section's zone (the one that reached the moment)
 */
export function localiseAt(beam: BeamModel, moment: Float64Array, critical: number, station: number, sign: 1 | -1, lambda: number, capacity: CapacitySettings): HingeRecord {
  const { layout } = beam;
  const zoneIndex = beam.stationZone[station]!;
  const zone = beam.zones[zoneIndex]!;
  const law = plasticLawOf(zone, sign)!;
  const data = sign > 0 ? zone.hingeData.sagging : zone.hingeData.hogging;
  const tol = 1e-6 * layout.length;
  const support = layout.supports.find((s) => Math.abs(s.x - critical) <= tol);
  // At a support: which faces carry the member, and whether the support anchors the bars.
  const hasLeft = support ? support.x > tol : false;
  const hasRight = support ? support.x < layout.length - tol : false;
  const restrained = support ? support.kind !== 'pinned' || (hasLeft && hasRight) : false;
  // Over a pinned support the member is continuous and the hinge sits over it; at a restrained
  // support it forms on the face with the larger moment (the only face at an end).
  let sides: 'both' | 'left' | 'right' = 'both';
  if (support && !(hasLeft && hasRight && support.kind === 'pinned')) {
    const faces = beam.supportStations[support.index]!;
    const left = hasLeft ? sign * moment[faces.left]! : -Infinity;
    const right = hasRight ? sign * moment[faces.right]! : -Infinity;
    sides = left >= right ? 'left' : 'right';
  }
  const spans = shearSpans(beam, moment, critical, sides === 'both' ? 'both' : sides);
  const input: HingeLengthInput = {
    method: capacity.hingeLengthMethod,
    effectiveDepth: data.effectiveDepth,
    shearSpans: spans,
    barDiameter: data.barDiameter,
    yieldStress: data.yieldStress,
    ultimateStress: data.ultimateStress,
    atSupport: restrained,
    ...(capacity.userHingeLength !== undefined ? { userLength: capacity.userHingeLength } : {}),
  };
  const perFace = capacity.spanHingeRule === 'per-face' && spans.length === 2 && capacity.hingeLengthMethod !== 'user';
  const hl = perFace ? perFaceLength(input) : hingeLength(input);
  const length = Math.max(hl.length, 1);
  // The localised rotation acts at the middle of the hinge: Lp/2 from a support face into the member
  // (Park & Paulay 1975 §6.5, from memory), at the critical section inside a span or over an
  // interior support.
  let position = critical;
  if (support && sides !== 'both') {
    const bay = layout.bays.find((b) => (sides === 'right' ? b.from === support.x : b.to === support.x))!;
    position = sides === 'right' ? critical + Math.min(length / 2, bay.length / 2) : critical - Math.min(length / 2, bay.length / 2);
  }
  const at = bracket(beam, critical, sides === 'left');
  const sideName = position === critical && sides !== 'both' ? sides : 'both';
  return {
    sign,
    position,
    ...at,
    zone: zoneIndex,
    law,
    length,
    fields: Float64Array.from(beam.redundants, (r) => fieldValue(r, position, sideName)),
    rotation: 0,
    critical,
    sectionId: zone.sectionId,
    lengthFormula: hl.formula,
    shearSpans: spans,
    formedAt: lambda,
    atSupport: restrained,
  };
}

/** The published one-sided expression applied to each side of the critical section, the two lengths added. */
function perFaceLength(input: HingeLengthInput): { length: number; formula: Text } {
  const sides = input.shearSpans.map((z) => hingeLength({ ...input, shearSpans: [z], atSupport: input.atSupport }));
  const length = sides.reduce((s, h) => s + h.length, 0);
  return {
    length,
    formula: phrase`Lp = Lp(z1) + Lp(z2), each side by its one-sided expression: ${joinTexts(sides.map((h) => h.formula), '; ')}; Lp = ${q('sectionLength', length)}`,
  };
}

/** Integral of the plastic curvature over the member from the memory, restricted to [from, to], rad. */
function spreadRotation(beam: BeamModel, memory: Memory, sign: 1 | -1, from: number, to: number, scaleTo?: { factor: number; cap: (zone: number) => number }): number {
  const xs = beam.x;
  const out: TableIntegrals = { i0: 0, i1: 0, j00: 0, j01: 0, j11: 0 };
  let total = 0;
  const mem = sign > 0 ? memory.sag : memory.hog;
  const innerOf = sign > 0 ? memory.sagInner : memory.hogInner;
  for (let k = 0; k < xs.length - 1; k++) {
    const a = Math.max(xs[k]!, from);
    const b = Math.min(xs[k + 1]!, to);
    const h = xs[k + 1]! - xs[k]!;
    if (!(b > a) || !(h > 0)) continue;
    const law = plasticLawOf(beam.zones[beam.segmentZone[k]!]!, sign);
    if (!law || law.knotMoments.length === 0) continue;
    const cap = scaleTo ? scaleTo.cap(beam.segmentZone[k]!) : 0;
    const scaled = (m: number) => (scaleTo ? Math.min(m * scaleTo.factor, cap) : m);
    const lo = (a - xs[k]!) / h;
    const hi = (b - xs[k]!) / h;
    // The remembered moment piece by piece between its breakpoints inside the segment (Memory).
    const inner = innerOf?.[k];
    const count = inner ? inner.length / 2 : 0;
    out.i0 = 0;
    for (let j = 0; j <= count; j++) {
      const t0 = j === 0 ? 0 : inner![2 * j - 2]!;
      const t1 = j === count ? 1 : inner![2 * j]!;
      const mu0 = scaled(j === 0 ? mem[k]! : inner![2 * j - 1]!);
      const mu1 = scaled(j === count ? mem[k + 1]! : inner![2 * j + 1]!);
      const p0 = Math.max(t0, lo);
      const p1 = Math.min(t1, hi);
      if (!(p1 > p0) || !(t1 > t0)) continue;
      if (count === 0) {
        addTableIntegrals(law.knotMoments, law.knotPlastic, mu0, mu1, p0, p1, false, out);
        continue;
      }
      const slope = (mu1 - mu0) / (t1 - t0);
      const base = mu0 - slope * t0;
      addTableIntegrals(law.knotMoments, law.knotPlastic, base, base + slope, p0, p1, false, out);
    }
    total += out.i0 * h;
  }
  return total;
}

/** What reporting needs from the analysis at its ultimate state. */
export interface HingeReportInput {
  readonly beam: BeamModel;
  readonly memory: Memory;
  readonly hinges: readonly HingeRecord[];
  /** λ at which each station first yielded, per sense (NaN: never). */
  readonly yieldedAt: { readonly sag: Float64Array; readonly hog: Float64Array };
  /** Strain-penetration rotation (plastic part) at each support face with a moment, rad, and where. */
  readonly penetration: readonly { readonly position: number; readonly sign: 1 | -1; readonly plastic: number; readonly capacity: number }[];
  readonly method: HingeLengthMethod;
  readonly capacity: CapacitySettings;
}

/**
 * The member's plastic hinges at ultimate: every zone that yielded (a run of stations past first
 * yield in one sense) and every localisation, in the order they formed.
 */
export function hingeReport(input: HingeReportInput): PlasticHinge[] {
  const { beam, memory, hinges, yieldedAt } = input;
  const xs = beam.x;
  const n = xs.length;
  const found: (PlasticHinge & { order: number })[] = [];
  const used = new Set<HingeRecord>();
  for (const sign of [1, -1] as const) {
    const mem = sign > 0 ? memory.sag : memory.hog;
    const when = sign > 0 ? yieldedAt.sag : yieldedAt.hog;
    for (const [i, j] of yieldedRuns(beam, mem, sign)) {
      // The zone ends where the remembered moment crosses first yield, between the last station
      // below it and the first above (linear between stations, as the integration takes it).
      const edge = (inside: number, outside: number): number => {
        if (outside < 0 || outside >= n || xs[outside] === xs[inside]) return xs[inside]!;
        const yIn = plasticLawOf(beam.zones[beam.stationZone[inside]!]!, sign)!.yieldMoment!;
        const a = mem[outside]!;
        const b = mem[inside]!;
        const t = b > a ? Math.min(Math.max((yIn - a) / (b - a), 0), 1) : 1;
        return xs[outside]! + t * (xs[inside]! - xs[outside]!);
      };
      const from = edge(i, i - 1);
      const to = edge(j, j + 1);
      // Critical section: the largest moment relative to the localisation moment of its section
      // (the middle of a run of equal ratios: a zone of equal moment, or the tension shift's plateau).
      let best = -Infinity;
      let first = Infinity;
      const ratio = (k: number) => mem[k]! / plasticLawOf(beam.zones[beam.stationZone[k]!]!, sign)!.localisationMoment;
      for (let k = i; k <= j; k++) {
        best = Math.max(best, ratio(k));
        if (Number.isFinite(when[k]!)) first = Math.min(first, when[k]!);
      }
      let lo = -1;
      let hi = -1;
      for (let k = i; k <= j; k++) {
        if (ratio(k) < best * (1 - 1e-9)) continue;
        if (lo < 0) lo = k;
        hi = k;
      }
      const middle = 0.5 * (xs[lo]! + xs[hi]!);
      let crit = lo;
      for (let k = lo; k <= hi; k++) if (Math.abs(xs[k]! - middle) < Math.abs(xs[crit]! - middle)) crit = k;
      const tol = Math.max((xs[Math.min(j + 1, n - 1)]! - xs[Math.max(i - 1, 0)]!) * 1e-9, 1e-9);
      const local = hinges.filter((h) => h.sign === sign && h.critical >= from - tol && h.critical <= to + tol);
      local.forEach((h) => used.add(h));
      found.push(zoneHinge(input, sign, from, to, crit, local, Number.isFinite(first) ? first : local[0]?.formedAt ?? 0));
    }
  }
  // Localisations with no yielded zone: sections that reached their peak before the steel yielded.
  for (const h of hinges) if (!used.has(h)) found.push(zoneHinge(input, h.sign, h.critical, h.critical, h.a, [h], h.formedAt));
  // In order of formation; hinges that started at the same load factor (twins of a symmetric member,
  // within 1e-6) share their place, left to right — which twin the solver met first is noise.
  found.sort((p, q) => p.yieldLoadFactor - q.yieldLoadFactor || p.position - q.position);
  const out: PlasticHinge[] = [];
  for (let i = 0; i < found.length; ) {
    const lead = found[i]!.yieldLoadFactor;
    let j = i + 1;
    while (j < found.length && found[j]!.yieldLoadFactor - lead <= 1e-6 * Math.abs(lead)) j++;
    const group = found.slice(i, j).sort((p, q) => p.position - q.position);
    for (const h of group) {
      const others = group.filter((o) => o !== h).map((o) => o.position);
      out.push({ ...h, order: i + 1, ...(others.length > 0 ? { together: others } : {}) });
    }
    i = j;
  }
  return out;
}

function zoneHinge(input: HingeReportInput, sign: 1 | -1, from: number, to: number, crit: number, local: readonly HingeRecord[], yieldLoadFactor: number): PlasticHinge & { order: number } {
  const { beam, memory } = input;
  const zoneIndex = local[0]?.zone ?? beam.stationZone[crit]!;
  const zone = beam.zones[zoneIndex]!;
  const law: PlasticLaw | null = plasticLawOf(zone, sign);
  const resp = responseOf(zone, sign);
  const position = local[0]?.critical ?? beam.x[crit]!;
  // The zone runs to where the remembered moment crosses first yield: its plastic curvature is nil beyond.
  const spread = spreadRotation(beam, memory, sign, from, to);
  const localised = local.reduce((s, h) => s + h.rotation, 0);
  const tol = 1e-6 * beam.span;
  const faces = input.penetration.filter((p) => p.sign === sign && p.position >= from - tol && p.position <= to + tol);
  const penetration = faces.reduce((s, p) => s + p.plastic, 0);
  // Capacity: the spread part when the critical section is brought to its localisation moment with
  // the moment diagram of the ultimate state, plus the whole localised branch over Lp, plus the
  // strain penetration at the faces with the section at its localisation moment.
  let capacity: number;
  const lp = local[0]?.length ?? 0;
  if (local.length > 0) {
    capacity = spread + local.reduce((s, h) => s + h.law.ultimateLocalised * h.length, 0) + faces.reduce((s, p) => s + p.capacity, 0);
  } else if (law) {
    const mem = sign > 0 ? memory.sag : memory.hog;
    const factor = mem[crit]! > 0 ? law.localisationMoment / mem[crit]! : 1;
    const extend = (beam.x[beam.x.length - 1]! - beam.x[0]!);
    capacity = spreadRotation(beam, memory, sign, from - extend, to + extend, { factor, cap: (z) => plasticLawOf(beam.zones[z]!, sign)?.localisationMoment ?? Infinity }) + faces.reduce((s, p) => s + p.capacity, 0);
  } else capacity = 0;
  const phiY = resp.nominalYieldCurvature;
  const first = local[0];
  return {
    position,
    direction: sign > 0 ? 'sagging' : 'hogging',
    sectionId: zone.sectionId,
    length: lp,
    lengthMethod: input.method,
    lengthFormula: first?.lengthFormula ?? 'no localisation: the zone stayed on its section\u2019s ascending branch',
    shearSpan: first ? first.shearSpans.reduce((a, b) => a + b, 0) : 0,
    rotationCapacity: capacity,
    rotationAtUltimate: spread + localised + penetration,
    curvatureDuctility: phiY && phiY > 0 ? resp.ultimateCurvature / phiY : null,
    order: 0,
    yieldLoadFactor,
    plasticZone: [from, to],
    localised: local.length > 0,
    localisationLoadFactor: first ? first.formedAt : null,
    rotationParts: { spread, localised, penetration },
    location: describePosition(position, beam.layout),
  };
}

/** Plastic curvature of a station's section in one sense for a remembered moment, 1/mm. */
export function stationPlastic(beam: BeamModel, i: number, sign: 1 | -1, mu: number): number {
  const law = plasticLawOf(beam.zones[beam.stationZone[i]!]!, sign);
  if (!law) return 0;
  return plasticAt(law, mu, { value: 0, slope: 0 }).value;
}

/** Why a section reached its limit, in words (for the failure cause). */
export function limitWords(beam: BeamModel, h: HingeRecord): string {
  const where = describePosition(h.critical, beam.layout);
  const direction = h.sign > 0 ? 'sagging' : 'hogging';
  if (h.law.yieldMoment === null) {
    const response = responseOf(beam.zones[h.zone]!, h.sign);
    const cracking = response.crackingMoment !== null && response.crackingMoment >= h.law.peakMoment * (1 - 1e-6);
    return cracking
      ? `the section at ${where} cracks at its peak ${direction} moment and its ${h.sign > 0 ? 'bottom' : 'top'} steel cannot carry the cracking moment: a brittle failure with no plastic hinge`
      : (h.sign > 0 ? beam.zones[h.zone]!.hingeData.sagging : beam.zones[h.zone]!.hingeData.hogging).barDiameter > 0
        ? `the section at ${where} reaches its peak ${direction} moment before its tension steel yields (over-reinforced, or an FRP limit first): a brittle failure with no plastic hinge`
        : `the section at ${where} reaches its cracking moment in ${direction} with no ${h.sign > 0 ? 'bottom' : 'top'} reinforcement there: a brittle failure with no plastic hinge`;
  }
  const cause = h.law.ultimateCause;
  const what = cause === 'steel-rupture' ? 'its tension steel ruptures' : cause === 'frp-rupture' ? 'its FRP ruptures' : cause === 'frp-debonding' ? 'its FRP debonds' : cause === 'moment-drop' ? 'its moment falls below the section curve\u2019s drop limit' : cause === 'core-crushing' ? 'its confined core crushes' : 'its concrete crushes';
  return `the ${direction} hinge at ${where} reaches its rotation capacity, the end of its section's curve (${what})`;
}
