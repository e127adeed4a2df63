/**
 * The code's strength and shear checks of a continuous beam at every station of every span and
 * cantilever, for every strength combination (ACI 318-19 5.3.1; EN 1990 6.4.3.2) and every
 * live-load arrangement of the codes (ACI 318-19 6.4.2; EN 1992-1-1 5.1.3; core/continuous/loads.ts) — and whether
 * the beam is brittle, by the same rules as a single span (brittle.ts).
 *
 * Demand: the elastic analysis of core/continuous/elastic.ts (gross section of each zone at the code modulus, the
 * columns' springs, no redistribution) — each load case and the live load of each part alone,
 * superposed per combination and arrangement. Stations: those of the elastic analysis (equal
 * divisions of each part, both sides of every zone change, point load and support) and, between
 * two of them, the point of zero shear where the moment peaks (exact for the uniform load there).
 *
 * Flexure: flexure.ts checkMoments, the one flexural rule (design resistance of the
 * section at the station in the sense of the moment).
 * Shear: the design shear strength of the section there (shear-section.ts) in the
 * sense of the factored moment; sections closer than d to a support face take the shear at d when
 * no point load lies between (ACI 318-19 9.4.3.2; EN 1992-1-1 6.2.1(8)), and under EN the support
 * itself is checked against Eq. (6.5). Support faces are taken at the support centrelines (no
 * support width is known), which is on the safe side.
 * Shear before flexure: the shear of the analysis to failure at its largest load (each hinge at the
 * moment its section's curve carries; core/continuous/capacity.ts), by statics of each part from its end
 * moments, against the nominal shear strength (ACI Vn; EN with γc = γs = 1).
 *
 * Positions are global (mm from the left end of the beam); every point also names its part and its
 * position from that part's left end. Units: N, mm, N·mm.
 */
import { brittleFindings, shearBeforeFlexure, type UltimateSource } from './brittle.ts';
import { combinationText, type LoadCombination } from './combinations.ts';
import { checkMoments, type FlexureZone, type MomentSample } from './flexure.ts';
import { flexuralDesignResistance } from './resistance.ts';
import type { BrittleFinding, StrengthCheck } from './results.ts';
import { criticalSectionDepth, zoneShearCapacities, type ShearCapacity, type ShearZone } from './shear-section.ts';
import type { AciEdition } from './shear-aci.ts';
import type { CodeBasis } from '../materials/specs.ts';
import type { SupportType } from '../member/definition.ts';
import { zoneIndexAt } from '../member/zones.ts';
import type { BendingDirection } from '../section/model.ts';
import { joinTexts, phrase, q, type Text } from '../units/phrase.ts';
import type { ContinuousBeamDefinition } from '../continuous/definition.ts';
import type { ElasticResult, LoadResponse } from '../continuous/elastic.ts';
import { partName, partStatics, type LoadsByPart } from '../continuous/layout.ts';
import { exceedsBeyondRounding } from '../numeric/ties.ts';

/** The words for a combination without live load (the arrangement does not matter). */
export const NO_LIVE_ARRANGEMENT = 'no live load';

/** One station of a check: where, what it found and what produced it. */
export interface StationCheck {
  /** Part name ("span 2", "left cantilever"); global position and position from the part's left end, mm. */
  readonly part: string;
  readonly x: number;
  readonly s: number;
  readonly sectionId: string;
  readonly direction: BendingDirection;
  /** |M| (N·mm) or |V| (N), and the design resistance there (φMn, M_Rd; φVn, VRd); null: no tension reinforcement. */
  readonly demand: number;
  readonly resistance: number | null;
  readonly utilisation: number;
  /** Combination (name and source) and live-load arrangement (words). */
  readonly combination: string;
  readonly arrangement: string;
}

/** The worst station of each check in one part of the beam. */
export interface PartStationChecks {
  readonly part: string;
  readonly sagging: StationCheck | null;
  readonly hogging: StationCheck | null;
  readonly shear: StationCheck | null;
}

/** Shear along the beam as the check sees it (envelope over combinations and arrangements), for the diagram. */
export interface ContinuousShearDiagram {
  /** Global position, mm, and part index (a position repeats at a discontinuity). */
  readonly x: readonly number[];
  readonly part: readonly number[];
  /** Largest |V| of any combination and arrangement, N; and at the largest load of the analysis to failure (null: none). */
  readonly factored: readonly number[];
  readonly mechanism: readonly number[] | null;
  /** Smallest design and nominal shear strength of the senses met there, N. */
  readonly design: readonly number[];
  readonly nominal: readonly number[];
  /** False within d of a support face where no point load lies between. */
  readonly checked: readonly boolean[];
}

export interface ContinuousShearCheck {
  readonly capacities: readonly ShearCapacity[];
  readonly governing: StationCheck & { readonly supportFace: boolean };
  readonly utilisation: number;
  readonly pass: boolean;
  /** Shear at the largest load of the analysis to failure against the nominal strength (null: no such analysis). */
  readonly mechanism: { readonly governing: StationCheck; readonly nominalRatio: number; readonly loadFactor: number } | null;
  readonly governs: 'flexure' | 'shear' | 'undetermined';
  readonly criticalSectionRule: Text;
  readonly diagram: ContinuousShearDiagram;
}

/** Strength and shear at every station of a continuous beam, and its brittleness. */
export interface ContinuousChecks {
  /** The flexural check (positions global); its governing station named in `flexureGoverning`. */
  readonly flexure: StrengthCheck;
  readonly flexureGoverning: StationCheck;
  readonly shear: ContinuousShearCheck;
  /** Worst station per part. */
  readonly parts: readonly PartStationChecks[];
  /** Every combination checked (name and source) and the number of live-load arrangements. */
  readonly combinations: readonly string[];
  readonly arrangementCount: number;
  /** Why the beam is brittle (empty when it is not). */
  readonly brittle: readonly BrittleFinding[];
  /** Design flexural resistance of every zone in both senses (φMn, M_Rd; N·mm; null: no tension steel on that side), positions global. */
  readonly resistances: readonly { readonly from: number; readonly to: number; readonly sectionId: string; readonly sagging: number | null; readonly hogging: number | null }[];
}

export interface ContinuousChecksInput {
  readonly code: CodeBasis;
  readonly definition: ContinuousBeamDefinition;
  readonly elastic: ElasticResult;
  /** One per definition zone, positions global. */
  readonly zones: readonly ShearZone[];
  readonly combinations: readonly LoadCombination[];
  readonly edition?: AciEdition;
  /** The analysis to failure at its largest load: the loads held and the pattern scaled by `loadFactor`, the moment at the stations. */
  readonly failure: {
    readonly held: LoadsByPart;
    readonly pattern: LoadsByPart;
    readonly loadFactor: number;
    readonly peak: { readonly x: readonly number[]; readonly part: readonly number[]; readonly moment: readonly number[] };
    readonly distributions: UltimateSource['distributions'];
  } | null;
}

interface Sample extends MomentSample {
  readonly part: number;
  readonly arrangement: string;
  readonly shear: number;
}

const TOL = 1e-6;

/** Factored responses at the stations: one per combination and arrangement (a combination without live load once). */
function factoredCases(elastic: ElasticResult, combinations: readonly LoadCombination[]): { combination: string; arrangement: string; moment: number[]; shear: number[] }[] {
  const { dead, superimposed, liveByPart } = elastic.cases;
  const n = elastic.stations.x.length;
  const out: { combination: string; arrangement: string; moment: number[]; shear: number[] }[] = [];
  const sum = (key: 'moment' | 'shear', terms: readonly { r: LoadResponse; f: number }[]) => {
    const v = new Array<number>(n).fill(0);
    for (const { r, f } of terms) if (f !== 0) for (let i = 0; i < n; i++) v[i]! += f * r[key][i]!;
    return v;
  };
  for (const c of combinations) {
    const base = [{ r: dead, f: c.factors.dead }, { r: superimposed, f: c.factors.superimposed }];
    const name = combinationText(c);
    if (c.factors.live === 0) {
      out.push({ combination: name, arrangement: NO_LIVE_ARRANGEMENT, moment: sum('moment', base), shear: sum('shear', base) });
      continue;
    }
    for (const a of elastic.arrangements) {
      const terms = [...base, ...a.loadedParts.map((p) => ({ r: liveByPart[p]!, f: c.factors.live }))];
      out.push({ combination: name, arrangement: a.description, moment: sum('moment', terms), shear: sum('shear', terms) });
    }
  }
  return out;
}

/** The side of a discontinuity a station stands for: the second of two stations at one position is its right side. */
function sidesOf(x: readonly number[]): ('left' | 'right')[] {
  return x.map((xi, i) => (i > 0 && Math.abs(x[i - 1]! - xi) < TOL ? 'right' : 'left'));
}

/** Sections within d of a support face, per part: the support position and the limit, or none when a point load lies within d. */
interface Skip {
  readonly part: number;
  readonly support: number;
  readonly limit: number;
}

/** Moment and shear at local s of a part from its own loads and its end moments (N·mm, N). */
function partForces(elastic: ElasticResult, loads: LoadsByPart, ends: readonly { left: number; right: number }[], p: number, s: number, side: 'left' | 'right'): { moment: number; shear: number } {
  const part = elastic.layout.parts[p]!;
  const st = partStatics(part, loads[p] ?? [], s, side);
  if (part.kind !== 'span') return st;
  const e = ends[p]!;
  return { moment: st.moment + e.left * (1 - s / part.length) + (e.right * s) / part.length, shear: st.shear + (e.right - e.left) / part.length };
}

/**
 * Strength and shear at every station, and brittleness (see the module comment). Null when a zone
 * has no section model or there are no combinations.
 */
export function continuousChecks(input: ContinuousChecksInput): ContinuousChecks | null {
  const { code, definition, elastic, zones } = input;
  if (zones.length === 0 || input.combinations.length === 0 || zones.some((z) => !z.analysis.model || !z.analysis.elastic)) return null;
  const { layout, stations } = elastic;
  const parts = layout.parts;
  const names = parts.map(partName);
  const sides = sidesOf(stations.x);
  const cases = factoredCases(elastic, input.combinations);

  // --- flexure: every station and every peak between stations ------------------------------------
  const samples: Sample[] = [];
  for (const c of cases) {
    for (let i = 0; i < stations.x.length; i++) {
      samples.push({ x: stations.x[i]!, side: sides[i]!, moment: c.moment[i]!, shear: c.shear[i]!, combination: c.combination, part: stations.part[i]!, arrangement: c.arrangement });
      const j = i + 1;
      if (j >= stations.x.length || stations.part[j] !== stations.part[i]) continue;
      const h = stations.x[j]! - stations.x[i]!;
      const va = c.shear[i]!;
      const vb = c.shear[j]!;
      if (!(h > TOL) || !(va * vb < 0)) continue;
      // Shear linear between the stations (no point load between them): the moment peaks where it vanishes.
      const t = (va * h) / (va - vb);
      samples.push({ x: stations.x[i]! + t, side: 'left', moment: c.moment[i]! + (va * t) / 2, shear: 0, combination: c.combination, part: stations.part[i]!, arrangement: c.arrangement });
    }
  }
  const flexureZones: FlexureZone[] = zones.map((z) => ({ from: z.from, to: z.to, analysis: z.analysis }));
  const combinationNames = input.combinations.map(combinationText);
  const moments = checkMoments(code, flexureZones, samples, combinationNames, (s) => String(s.part));
  if (!moments) return null;
  const station = (s: Sample, zone: number, direction: BendingDirection, demand: number, resistance: number | null, utilisation: number): StationCheck => ({
    part: names[s.part]!,
    x: s.x,
    s: s.x - parts[s.part]!.from,
    sectionId: zones[zone]!.analysis.sectionId,
    direction,
    demand,
    resistance,
    utilisation,
    combination: s.combination,
    arrangement: s.arrangement,
  });
  const g = moments.governing;
  const flexureGoverning = station(g.sample, g.zone, g.direction, g.demand, g.resistance, g.utilisation);

  // --- shear --------------------------------------------------------------------------------------
  const { caps, capacities } = zoneShearCapacities(code, zones, input.edition);
  if (caps.some((c) => !c.sagging && !c.hogging)) return null;
  const capacityAt = (x: number, side: 'left' | 'right', moment: number) => {
    const zone = zoneIndexAt(zones, x, side);
    const c = caps[zone]!;
    const dir: BendingDirection = moment >= 0 ? 'sagging' : 'hogging';
    return { zone, cap: (c[dir] ?? c[dir === 'sagging' ? 'hogging' : 'sagging'])! };
  };
  const pointsOf = (p: number) => definition.loads.filter((l) => l.kind === 'point' && partIndexOf(p) === l.span).map((l) => (l as { position: number }).position);
  const partIndexOf = (p: number) => {
    const part = parts[p]!;
    return part.kind === 'span' ? part.span + 1 : part.kind;
  };
  const skips: Skip[] = [];
  const ruleParts: Text[] = [];
  layout.supportX.forEach((xs, j) => {
    parts.forEach((part, p) => {
      const atStart = Math.abs(part.from - xs) < TOL;
      const atEnd = Math.abs(part.to - xs) < TOL;
      if (!atStart && !atEnd) return;
      const c = caps[zoneIndexAt(zones, xs, atStart ? 'right' : 'left')]!;
      const d = Math.min(criticalSectionDepth(c), part.length);
      const loaded = pointsOf(p).some((a) => (atStart ? a > 0 && a <= d : a >= part.length - d && a < part.length));
      const where = phrase`${names[p]!} at support ${j + 1}`;
      if (loaded) ruleParts.push(phrase`${where}: a point load lies within d = ${q('sectionLength', d)}, checked up to the support`);
      else {
        skips.push({ part: p, support: xs, limit: atStart ? xs + d : xs - d });
        ruleParts.push(phrase`${where}: sections within d = ${q('sectionLength', d)} take the shear at d`);
      }
    });
  });
  const criticalSectionRule = phrase`${joinTexts(ruleParts, '; ')} (${code === 'ACI 318-19' ? 'ACI 318-19 9.4.3.2' : 'EN 1992-1-1 6.2.1(8); the support is checked against Eq. 6.5'}; support faces taken at the centrelines).`;
  const skipped = (p: number, x: number) => skips.some((k) => k.part === p && (k.limit > k.support ? x < k.limit - 1e-9 : x > k.limit + 1e-9));
  const isSupport = (x: number) => layout.supportX.some((xs) => Math.abs(xs - x) < TOL);
  // Stations at d from the supports, between two stations of the same part (interpolated exactly: shear linear, moment quadratic).
  const dPoints: { i: number; t: number }[] = [];
  for (const k of skips) {
    for (let i = 0; i + 1 < stations.x.length; i++) {
      if (stations.part[i] !== k.part || stations.part[i + 1] !== k.part) continue;
      const a = stations.x[i]!;
      const b = stations.x[i + 1]!;
      if (b - a > TOL && k.limit >= a && k.limit <= b) {
        dPoints.push({ i, t: k.limit - a });
        break;
      }
    }
  }

  type ShearPoint = StationCheck & { supportFace: boolean; nominal: number };
  let governing: ShearPoint | null = null;
  const worstShear = new Map<number, ShearPoint>();
  const n = stations.x.length;
  const trace = { factored: new Array<number>(n).fill(0), design: new Array<number>(n).fill(Infinity), nominal: new Array<number>(n).fill(Infinity), checked: stations.x.map((x, i) => !skipped(stations.part[i]!, x)) };
  const considerShear = (c: { combination: string; arrangement: string }, p: number, x: number, side: 'left' | 'right', moment: number, shear: number, face: boolean) => {
    const { zone, cap } = capacityAt(x, side, moment);
    const limit = face ? cap.supportLimit : { design: cap.design, nominal: cap.nominal };
    if (!limit) return;
    const v = Math.abs(shear);
    const utilisation = limit.design > 0 ? Math.min(v / limit.design, 99.99) : v > 0 ? 99.99 : 0;
    const point: ShearPoint = { part: names[p]!, x, s: x - parts[p]!.from, sectionId: zones[zone]!.analysis.sectionId, direction: cap.direction, demand: v, resistance: limit.design, utilisation, combination: c.combination, arrangement: c.arrangement, supportFace: face, nominal: limit.nominal };
    if (!governing || exceedsBeyondRounding(utilisation, governing.utilisation)) governing = point;
    const known = worstShear.get(p);
    if (!known || exceedsBeyondRounding(utilisation, known.utilisation)) worstShear.set(p, point);
  };
  for (const c of cases) {
    for (let i = 0; i < n; i++) {
      const x = stations.x[i]!;
      const p = stations.part[i]!;
      const { cap } = capacityAt(x, sides[i]!, c.moment[i]!);
      trace.factored[i] = Math.max(trace.factored[i]!, Math.abs(c.shear[i]!));
      trace.design[i] = Math.min(trace.design[i]!, cap.design);
      trace.nominal[i] = Math.min(trace.nominal[i]!, cap.nominal);
      if (trace.checked[i]) considerShear(c, p, x, sides[i]!, c.moment[i]!, c.shear[i]!, false);
      if (isSupport(x)) considerShear(c, p, x, sides[i]!, c.moment[i]!, c.shear[i]!, true);
    }
    for (const { i, t } of dPoints) {
      const h = stations.x[i + 1]! - stations.x[i]!;
      const va = c.shear[i]!;
      const vb = c.shear[i + 1]!;
      const shear = va + ((vb - va) * t) / h;
      const moment = c.moment[i]! + va * t + ((vb - va) / (2 * h)) * t * t;
      considerShear(c, stations.part[i]!, stations.x[i]! + t, 'left', moment, shear, false);
    }
  }
  const gs = governing as ShearPoint | null;
  if (!gs) return null;
  const strip = ({ nominal: _n, ...rest }: ShearPoint) => rest;

  // --- shear at the largest load of the analysis to failure ----------------------------------------------
  let mechanism: ContinuousShearCheck['mechanism'] = null;
  let mechanismTrace: number[] | null = null;
  const failure = input.failure;
  if (failure && failure.loadFactor > 0 && failure.peak.x.length > 0) {
    const loads: LoadsByPart = parts.map((_, p) => [...(failure.held[p] ?? []), ...(failure.pattern[p] ?? []).map((l) => (l.kind === 'point' ? { ...l, p: l.p * failure.loadFactor } : { ...l, w: l.w * failure.loadFactor }))]);
    const ends = parts.map((_, p) => {
      const idx = failure.peak.part.map((pp, i) => (pp === p ? i : -1)).filter((i) => i >= 0);
      return { left: idx.length > 0 ? failure.peak.moment[idx[0]!]! : 0, right: idx.length > 0 ? failure.peak.moment[idx[idx.length - 1]!]! : 0 };
    });
    let worst: (StationCheck & { ratio: number }) | null = null;
    mechanismTrace = [];
    for (let i = 0; i < n; i++) {
      const x = stations.x[i]!;
      const p = stations.part[i]!;
      const f = partForces(elastic, loads, ends, p, x - parts[p]!.from, sides[i]!);
      mechanismTrace.push(Math.abs(f.shear));
      if (!trace.checked[i]) continue;
      const { zone, cap } = capacityAt(x, sides[i]!, f.moment);
      const v = Math.abs(f.shear);
      const ratio = cap.nominal > 0 ? v / cap.nominal : v > 0 ? 99.99 : 0;
      if (!worst || exceedsBeyondRounding(ratio, worst.ratio)) {
        worst = { part: names[p]!, x, s: x - parts[p]!.from, sectionId: zones[zone]!.analysis.sectionId, direction: cap.direction, demand: v, resistance: cap.nominal, utilisation: Math.min(ratio, 99.99), combination: `the largest load of the analysis to failure (${failure.loadFactor.toFixed(2)} × the pattern)`, arrangement: '', ratio };
      }
    }
    if (worst) {
      const { ratio, ...point } = worst;
      mechanism = { governing: point, nominalRatio: Math.min(ratio, 99.99), loadFactor: failure.loadFactor };
    }
  }
  const governs: ContinuousShearCheck['governs'] = mechanism ? (mechanism.nominalRatio > 1 ? 'shear' : 'flexure') : 'undetermined';
  const shear: ContinuousShearCheck = {
    capacities,
    governing: strip(gs),
    utilisation: gs.utilisation,
    pass: gs.utilisation <= 1,
    mechanism,
    governs,
    criticalSectionRule,
    diagram: { x: stations.x, part: stations.part, factored: trace.factored, mechanism: mechanismTrace, design: trace.design, nominal: trace.nominal, checked: trace.checked },
  };

  // --- per part, brittleness ------------------------------------------------------------------------------
  const partChecks: PartStationChecks[] = parts.map((_, p) => {
    const of = (d: BendingDirection) => {
      const w = moments.worstByGroup.get(`${p}|${d}`);
      return w && w.demand > 0 ? station(w.sample, w.zone, w.direction, w.demand, w.resistance, w.utilisation) : null;
    };
    const v = worstShear.get(p);
    return { part: names[p]!, sagging: of('sagging'), hogging: of('hogging'), shear: v ? strip(v) : null };
  });
  const brittle: BrittleFinding[] = [];
  if (mechanism && governs === 'shear') {
    const m = mechanism.governing;
    brittle.push(shearBeforeFlexure(code, m.demand, m.resistance ?? 0, phrase`${m.part}, ${q('spanLength', m.s)} from its left end`));
  }
  brittle.push(...brittleFindings(code, supportTypeOf(definition), zones, moments.check, null, failure ? { distributions: failure.distributions } : null));
  return {
    flexure: moments.check,
    flexureGoverning,
    shear,
    parts: partChecks,
    combinations: combinationNames,
    arrangementCount: elastic.arrangements.length,
    brittle,
    resistances: zones.map((z) => ({ from: z.from, to: z.to, sectionId: z.analysis.sectionId, sagging: flexuralDesignResistance(code, z.analysis, 'sagging').value, hogging: flexuralDesignResistance(code, z.analysis, 'hogging').value })),
  };
}

/**
 * The support type the minimum-steel rule reads (ACI 318-19 9.6.1.2: a statically determinate beam
 * with its flange in tension): a single pinned span, with or without cantilevers, is determinate;
 * anything else is not.
 */
function supportTypeOf(def: ContinuousBeamDefinition): SupportType {
  const determinate = def.spans.length === 1 && def.supports.every((s) => s.kind === 'pinned');
  return determinate ? 'simply-supported' : 'fixed-fixed';
}

/** "span 2, hogging at 6.00 m from its left end (x = 12.0 m), under 1.2D + 1.6L (…), spans 1 and 2 loaded (…)". */
export function stationWords(p: StationCheck, what: 'moment' | 'shear'): Text {
  const sense = what === 'moment' ? `${p.direction} ` : '';
  const arrangement = p.arrangement ? `, ${p.arrangement}` : '';
  return phrase`${p.part}, ${sense}at ${q('spanLength', p.s)} from its left end, under ${p.combination}${arrangement}`;
}
