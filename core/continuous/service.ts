/**
 * Service deflections of every span and cantilever of a continuous beam, by two methods:
 *  (a) integration of the sections' own moment–curvature laws along the whole beam (short term, and
 *      sustained with creep and shrinkage built into the concrete law), with redundants by
 *      compatibility;
 *  (b) the code method — ACI 318-19: Ie (Eq. 24.2.3.5a) of each span as the average of the values at
 *      its critical positive and negative moment sections (24.2.3.6; at the support for a cantilever,
 *      24.2.3.7), Ec·Ie per span in an elastic analysis, λΔ = ξ/(1 + 50ρ′) with ρ′ at midspan or at
 *      the support of a cantilever (24.2.4.1); EN 1992-1-1: ζ-interpolated curvature at every station
 *      (7.4.3, Eq. 7.18–7.21) integrated along the whole beam.
 * The live load of each part is arranged to give that part its largest downward deflection (the
 * elastic envelope names the arrangement) and, where the live load elsewhere lifts the part, also its
 * largest upward one; each check takes the worse arrangement. Deflections are signed, downward
 * positive: a part that deflects upward (a short span beside a long loaded one) reports its upward
 * value as negative, and every quantity is the value of largest magnitude within the part, taken
 * point by point (the live increment is D + L minus D at the same point). Checks compare the
 * magnitude with the limit: ACI 318-19 Table 24.2.2 and EN 1992-1-1 7.4.1(5) give the limits
 * without a direction, and 7.4.1(4) holds an upward pre-camber to the same span/250 as the sag — our
 * reading: an upward deflection beyond the limit fails as a downward one does. Checks use the larger
 * of the two methods, per part. Units: mm, N, N·mm, MPa.
 */
import type { CodeBasis } from '../materials/specs.ts';
import { aciEffectiveInertia, aciLongTermMultiplier, aciTimeFactor, enDistributionCoefficient, enEffectiveModulus, enShrinkageCurvature, limitRatio } from '../member/code-deflection.ts';
import type { DeflectionCheck } from '../member/results.ts';
import type { DeflectionLimitCase } from '../member/definition.ts';
import { checkQuantity } from '../member/service.ts';
import { elasticProperties } from '../section/elastic.ts';
import type { BendingDirection, SectionModel } from '../section/model.ts';
import type { ContinuousBeamDefinition } from './definition.ts';
import { elasticSolver, type ElasticResult } from './elastic.ts';
import { partName, type LoadsByPart } from './layout.ts';
import { distributedLaw, type ZoneLaws } from './laws.ts';
import { combineLoads, onParts } from './loads.ts';
import { staticSolution } from './newton.ts';
import type { DistributedLaw } from './structure.ts';

export interface ServiceZoneData {
  readonly model: SectionModel;
  readonly shortTerm: ZoneLaws;
  readonly longTerm: ZoneLaws;
  /** Code modulus (ACI Ec, EN Ecm) and tensile strength (fr, fctm), MPa. */
  readonly codeModulus: number;
  readonly codeTensileStrength: number;
  readonly creepCoefficient: number;
  readonly shrinkageStrain: number;
}

export interface ServiceInput {
  readonly definition: ContinuousBeamDefinition;
  readonly code: CodeBasis;
  readonly zones: readonly ServiceZoneData[];
  readonly elastic: ElasticResult;
  /** Dead (with self-weight and superimposed) and live loads by part. */
  readonly dead: LoadsByPart;
  readonly live: LoadsByPart;
  readonly segmentsPerSpan?: number;
}

/** Deflections of one part, mm, downward positive: the value of largest magnitude within the part (negative: upward). */
export interface ServiceValues {
  readonly dead: number;
  readonly deadPlusLive: number;
  readonly live: number;
  readonly sustained: number;
  readonly longTermAdditional: number;
  readonly longTermTotal: number;
}

export interface PartService {
  readonly part: number;
  readonly name: string;
  /** Length the limits refer to (span, or the cantilever's length), mm. */
  readonly length: number;
  /** Live-load arrangement that gives this part its largest deflection. */
  readonly arrangement: string;
  readonly integration: ServiceValues;
  readonly code: ServiceValues;
  /** ACI only: Ie of the part under dead and dead + live load, mm⁴, and the long-term multiplier. */
  readonly effectiveInertia: { readonly dead: number; readonly deadPlusLive: number } | null;
  readonly multiplier: number | null;
  readonly checks: readonly PartDeflectionCheck[];
}

/** A deflection check of a part: `byIntegration`, `byCode` and `governing` signed (negative: upward), `utilisation` = |governing| / limit. */
export interface PartDeflectionCheck extends DeflectionCheck {
  /** The live-load arrangement that governs this check (it may differ from the part's). */
  readonly arrangement: string;
}

export interface ContinuousService {
  readonly codeMethod: string;
  readonly parts: readonly PartService[];
  readonly warnings: readonly string[];
}

/** Deflection fields of one method and one arrangement at the samples of its mesh, mm, downward positive. */
interface Fields {
  readonly samplePart: Int32Array;
  readonly dead: Float64Array;
  readonly total: Float64Array;
  readonly sustained: Float64Array;
  /** Long-term total under the sustained load; null: the sustained field times a multiplier of the part (ACI). */
  readonly long: Float64Array | null;
}

/** The four deflections of a method at one sample, mm, signed (creep multiplies the sustained deflection with its sign). */
interface PointValues { dead: number; total: number; sustained: number; long: number }

/** The signed value of largest magnitude of f over the samples of a part (a tie keeps the downward one), mm. */
function extremeIn(fields: Fields, part: number, multiplier: number, f: (v: PointValues) => number): number {
  let best = 0;
  const v: PointValues = { dead: 0, total: 0, sustained: 0, long: 0 };
  for (let q = 0; q < fields.samplePart.length; q++) {
    if (fields.samplePart[q] !== part) continue;
    v.dead = fields.dead[q]!;
    v.total = fields.total[q]!;
    v.sustained = fields.sustained[q]!;
    v.long = fields.long ? fields.long[q]! : v.sustained * (1 + multiplier);
    const value = f(v);
    if (Math.abs(value) > Math.abs(best) || (Math.abs(value) === Math.abs(best) && value > best)) best = value;
  }
  return best;
}

function partValues(fields: Fields, part: number, multiplier: number): ServiceValues {
  const ext = (f: (v: PointValues) => number) => extremeIn(fields, part, multiplier, f);
  return {
    dead: ext((v) => v.dead),
    deadPlusLive: ext((v) => v.total),
    live: ext((v) => v.total - v.dead),
    sustained: ext((v) => v.sustained),
    longTermAdditional: ext((v) => v.long - v.sustained),
    longTermTotal: ext((v) => v.long),
  };
}

/** The quantity a limit case compares (core/member/service.ts checkQuantity), point by point, its signed extreme in the part, mm. */
function checkedValue(fields: Fields, part: number, multiplier: number, c: DeflectionLimitCase, ratio: number): number {
  return extremeIn(fields, part, multiplier, (v) => {
    const live = v.total - v.dead;
    const add = v.long - v.sustained;
    const transient = v.total - v.sustained;
    return checkQuantity(c, ratio, { liveI: live, liveC: live, addI: add, addC: add, totalLongI: v.long, totalLongC: v.long, deadI: v.dead, deadC: v.dead, transientLiveI: transient, transientLiveC: transient })[2];
  });
}

/** EN 1992-1-1 7.4.3 law of a zone: ζ-interpolation between uncracked and cracked curvature (Eq. 7.18, 7.19), creep and shrinkage (7.20, 7.21). */
function enZoneLaw(z: ServiceZoneData, longTerm: boolean, withShrinkage: boolean) {
  const ec = longTerm ? enEffectiveModulus(z.codeModulus, z.creepCoefficient) : z.codeModulus;
  const beta = longTerm ? 0.5 : 1.0;
  const p = elasticProperties(z.model, { concreteModulus: ec, tensileStrength: z.codeTensileStrength });
  const steel = z.model.elements.find((e) => e.kind === 'bar');
  const alpha = (steel?.material.initialModulus ?? 200000) / ec;
  const eps = longTerm && withShrinkage ? z.shrinkageStrain : 0;
  const firstMoment = (axis: number) => z.model.elements.filter((e) => e.kind !== 'frp').reduce((s, e) => s + e.area * (e.depth - axis), 0);
  const csUncracked = eps > 0 ? enShrinkageCurvature(eps, alpha, firstMoment(p.uncrackedCentroidDepth), p.uncrackedInertia) : 0;
  const branch = (dir: BendingDirection) => {
    const s = dir === 'sagging' ? 1 : -1;
    const cracked = p.cracked[dir];
    const iI = p.uncrackedInertia;
    const iII = cracked?.inertia ?? iI;
    const h = z.model.height;
    const naFromTop = cracked ? (dir === 'sagging' ? cracked.neutralAxisDepth : h - cracked.neutralAxisDepth) : p.uncrackedCentroidDepth;
    const csCracked = eps > 0 && cracked ? enShrinkageCurvature(eps, alpha, firstMoment(naFromTop), iII) : csUncracked;
    const mcr = p.crackingMoment[dir].transformed;
    // Signed (sagging-positive) curvature for a moment magnitude m in this direction.
    return (m: number) => {
      const zeta = enDistributionCoefficient(m, mcr, beta);
      return s * (zeta * (m / (ec * iII)) + (1 - zeta) * (m / (ec * iI))) + zeta * csCracked + (1 - zeta) * csUncracked;
    };
  };
  return { sagging: branch('sagging'), hogging: branch('hogging') };
}

function enLaw(zones: readonly ServiceZoneData[], longTerm: boolean, withShrinkage: boolean): DistributedLaw {
  const laws = zones.map((z) => enZoneLaw(z, longTerm, withShrinkage));
  const at = (zone: number, m: number) => (m >= 0 ? laws[zone]!.sagging(m) : laws[zone]!.hogging(-m));
  return {
    curvature(zone, m, out) {
      out.value = at(zone, m);
      const dm = Math.max(Math.abs(m) * 1e-6, 1);
      out.slope = (at(zone, m + dm) - at(zone, m - dm)) / (2 * dm);
    },
  };
}

/** Compression steel ratio ρ′ = As′/(b·d) of a section in a direction (ACI 318-19 24.2.4.1.1). */
function compressionRatio(model: SectionModel, dir: BendingDirection): number {
  const above = (depth: number) => (dir === 'sagging' ? depth < model.centroidDepth : depth > model.centroidDepth);
  const bars = model.elements.filter((e) => e.kind === 'bar');
  const compression = bars.filter((e) => above(e.depth));
  const tension = bars.filter((e) => !above(e.depth));
  const area = tension.reduce((s, e) => s + e.area, 0);
  const face = dir === 'sagging' ? 0 : model.height;
  const d = area > 0 ? Math.abs(tension.reduce((s, e) => s + e.area * e.depth, 0) / area - face) : model.height;
  const strips = model.concreteParts.flatMap((p) => p.strips);
  const width = dir === 'sagging'
    ? strips.filter((s) => s.top === Math.min(...strips.map((t) => t.top))).reduce((w, s) => w + s.widthTop, 0)
    : strips.filter((s) => s.bottom === Math.max(...strips.map((t) => t.bottom))).reduce((w, s) => w + s.widthBottom, 0);
  return compression.reduce((s, e) => s + e.area, 0) / Math.max(width * d, 1);
}

export function continuousService(input: ServiceInput): ContinuousService {
  const { definition: def, elastic, zones } = input;
  const layout = elastic.layout;
  const n = layout.parts.length;
  const settings = def.service;
  const psi = settings.sustainedLiveFraction;
  const segments = input.segmentsPerSpan ?? 40;
  const warnings: string[] = [];
  const allLoads = combineLoads([{ loads: input.dead, factor: 1 }, { loads: input.live, factor: 1 }], n);
  const shortLaw = distributedLaw(zones.map((z) => z.shortTerm));
  const longLaw = distributedLaw(zones.map((z) => z.longTerm));
  const withShrinkage = settings.includeShrinkage !== false;
  const enShort = input.code === 'EN 1992-1-1' ? enLaw(zones, false, withShrinkage) : null;
  const enLong = input.code === 'EN 1992-1-1' ? enLaw(zones, true, withShrinkage) : null;
  const solve = (law: DistributedLaw, loads: LoadsByPart, label: string) => {
    const s = staticSolution(def, law, loads, allLoads, segments);
    if (!s.converged) warnings.push(`Service deflection (${label}) did not converge: the value shown is the last iterate.`);
    return s;
  };
  // Gross-stiffness elastic solver for the ACI moments.
  const grossStiffness = zones.map((z) => z.codeModulus * elasticProperties(z.model, { concreteModulus: z.codeModulus, tensileStrength: z.codeTensileStrength }).grossInertia);
  const gross = input.code === 'ACI 318-19' ? elasticSolver(def, grossStiffness, allLoads, segments) : null;
  const xi = aciTimeFactor(settings.durationMonths);

  // One set of solutions per live arrangement (parts share arrangements).
  const cache = new Map<number, ReturnType<typeof byArrangement>>();
  const byArrangement = (index: number) => {
    const arrangement = elastic.arrangements[index];
    const live = arrangement ? onParts(input.live, arrangement.loadedParts) : input.live;
    const total = combineLoads([{ loads: input.dead, factor: 1 }, { loads: live, factor: 1 }], n);
    const sustained = combineLoads([{ loads: input.dead, factor: 1 }, { loads: live, factor: psi }], n);
    const d = solve(shortLaw, input.dead, 'dead load');
    const integration: Fields = {
      samplePart: d.mesh.samplePart,
      dead: d.deflection,
      total: solve(shortLaw, total, 'dead + live load').deflection,
      sustained: solve(shortLaw, sustained, 'sustained load').deflection,
      long: solve(longLaw, sustained, 'sustained load, long term').deflection,
    };
    let code: Fields;
    let inertia: { dead: number[]; total: number[] } | null = null;
    if (enShort && enLong) {
      const ed = solve(enShort, input.dead, 'EN dead');
      code = { samplePart: ed.mesh.samplePart, dead: ed.deflection, total: solve(enShort, total, 'EN dead + live').deflection, sustained: solve(enShort, sustained, 'EN sustained').deflection, long: solve(enLong, sustained, 'EN long term').deflection };
    } else {
      const ie = (loads: LoadsByPart) => aciPartInertia(gross!, loads, zones, def);
      const ieD = ie(input.dead);
      const ieT = ie(total);
      inertia = { dead: ieD, total: ieT };
      const partDef = { ...def, zones: layout.parts.map((p, i) => ({ from: p.from, to: p.to, sectionId: String(i) })) };
      const withIe = (ies: number[]) => elasticSolver(partDef, layout.parts.map((p, i) => zones[zoneIndexAt(def, 0.5 * (p.from + p.to))]!.codeModulus * ies[i]!), allLoads, segments);
      const solverD = withIe(ieD);
      const solverT = withIe(ieT);
      // The long-term deflection is the sustained one times (1 + λΔ) of each part, with its sign (extremeIn).
      code = { samplePart: solverD.mesh.samplePart, dead: solverD.solve(input.dead).sampleDeflection, total: solverT.solve(total).sampleDeflection, sustained: solverT.solve(sustained).sampleDeflection, long: null };
    }
    return { integration, code, inertia };
  };
  const get = (index: number) => {
    if (!cache.has(index)) cache.set(index, byArrangement(index));
    return cache.get(index)!;
  };
  const liveUp = elastic.envelopes.live.deflection.min;

  const parts: PartService[] = layout.parts.map((part, i) => {
    let multiplier: number | null = null;
    if (input.code === 'ACI 318-19') {
      // ρ′ at midspan (spans) or at the support (cantilevers), ACI 318-19 24.2.4.1.2.
      const x = part.kind === 'span' ? 0.5 * (part.from + part.to) : part.kind === 'left-cantilever' ? part.to : part.from;
      const z = zones[zoneIndexAt(def, x)]!;
      multiplier = aciLongTermMultiplier(xi, compressionRatio(z.model, part.kind === 'span' ? 'sagging' : 'hogging'));
    }
    // Candidates: the arrangement of the largest downward live deflection and, where live load elsewhere lifts the part, of the largest upward one.
    const down = elastic.parts[i]!.maxLiveDeflection.arrangement;
    let up = -1;
    let upValue = 0;
    elastic.stations.part.forEach((p, k) => {
      if (p === i && liveUp.value[k]! < upValue) {
        upValue = liveUp.value[k]!;
        up = liveUp.arrangement[k]!;
      }
    });
    const candidates = up >= 0 && up !== down ? [down, up] : [down];
    const evaluated = candidates.map((arrangementIndex) => {
      const run = get(arrangementIndex);
      const integration = partValues(run.integration, i, 0);
      const code = partValues(run.code, i, multiplier ?? 0);
      const arrangement = elastic.arrangements[arrangementIndex]?.description ?? 'all spans loaded';
      const checks: PartDeflectionCheck[] = settings.limitCases.map((c) => {
        const ratio = limitRatio(c, settings.customLimitRatio);
        const limit = part.length / ratio;
        const [quantity, description] = checkQuantity(c, ratio, { liveI: 0, liveC: 0, addI: 0, addC: 0, totalLongI: 0, totalLongC: 0, deadI: 0, deadC: 0, transientLiveI: 0, transientLiveC: 0 });
        const a = checkedValue(run.integration, i, 0, c, ratio);
        const b = checkedValue(run.code, i, multiplier ?? 0, c, ratio);
        // The larger magnitude governs, with its sign (a tie keeps the downward value).
        const governing = Math.abs(a) > Math.abs(b) || (Math.abs(a) === Math.abs(b) && a > b) ? a : b;
        return { limitCase: c, description, quantity, ratio, limit, byIntegration: a, byCode: b, governing, utilisation: Math.abs(governing) / limit, pass: Math.abs(governing) <= limit, arrangement };
      });
      return { arrangementIndex, arrangement, integration, code, checks, run };
    });
    const worstOf = (e: (typeof evaluated)[number]) => Math.max(0, ...e.checks.map((c) => c.utilisation));
    // The part shows the arrangement of its worst check; each check takes the worse of the candidates.
    const shown = evaluated.reduce((a, e) => (worstOf(e) > worstOf(a) ? e : a));
    const checks = shown.checks.map((c, k) => evaluated.reduce((worse, e) => (e.checks[k]!.utilisation > worse.utilisation ? e.checks[k]! : worse), c));
    return {
      part: i,
      name: partName(part),
      length: part.length,
      arrangement: shown.arrangement,
      integration: shown.integration,
      code: shown.code,
      effectiveInertia: shown.run.inertia ? { dead: shown.run.inertia.dead[i]!, deadPlusLive: shown.run.inertia.total[i]! } : null,
      multiplier,
      checks,
    };
  });
  const codeMethod = input.code === 'ACI 318-19'
    ? 'ACI 318-19 24.2.3.5 Ie per span, averaged over its critical positive and negative moment sections (24.2.3.6), at the support of a cantilever (24.2.3.7); λΔ = ξ/(1 + 50ρ′) (24.2.4.1)'
    : 'EN 1992-1-1 7.4.3: ζ-interpolated curvature at every station (Eq. 7.18–7.19), Ec,eff (7.20) and shrinkage curvature (7.21), integrated along the beam';
  return { codeMethod, parts, warnings: [...new Set(warnings)] };
}

function zoneIndexAt(def: ContinuousBeamDefinition, x: number): number {
  const i = def.zones.findIndex((z) => x >= z.from - 1e-6 && x <= z.to + 1e-6);
  return Math.max(i, 0);
}

/**
 * ACI 318-19 Ie of every part under a load set: Eq. (24.2.3.5a) at the critical sections (largest
 * sagging moment in the span; the hogging moment at each continuous end), averaged per 24.2.3.6 as
 * Ie = ½·Ie,m + ¼·(Ie,1 + Ie,2) (both ends continuous) or ½·(Ie,m + Ie,1) (one end) — the usual
 * reading of "the average of the critical positive and negative moment sections" (ACI 435R,
 * from memory); a cantilever takes Ie at its support (24.2.3.7).
 */
function aciPartInertia(gross: ReturnType<typeof elasticSolver>, loads: LoadsByPart, zones: readonly ServiceZoneData[], def: ContinuousBeamDefinition): number[] {
  const r = gross.solve(loads);
  const { x, part } = gross.stations;
  const layout = gross.mesh.layout;
  const props = zones.map((z) => elasticProperties(z.model, { concreteModulus: z.codeModulus, tensileStrength: z.codeTensileStrength }));
  const ieAt = (xs: number, ma: number, dir: BendingDirection) => {
    const p = props[zoneIndexAt(def, xs)]!;
    return aciEffectiveInertia(ma, p.crackingMoment[dir].gross, p.grossInertia, p.cracked[dir]?.inertia ?? p.grossInertia);
  };
  return layout.parts.map((p, pi) => {
    const idx = x.map((_, i) => i).filter((i) => part[i] === pi);
    const first = idx[0]!;
    const last = idx[idx.length - 1]!;
    if (p.kind !== 'span') {
      const root = p.kind === 'left-cantilever' ? last : first;
      return ieAt(x[root]!, Math.abs(Math.min(r.moment[root]!, 0)), 'hogging');
    }
    let mPos = 0;
    let xPos = 0.5 * (p.from + p.to);
    for (const i of idx) if (r.moment[i]! > mPos) {
      mPos = r.moment[i]!;
      xPos = x[i]!;
    }
    const iem = ieAt(xPos, mPos, 'sagging');
    const ends = [first, last].filter((i) => r.moment[i]! < 0).map((i) => ieAt(x[i]!, -r.moment[i]!, 'hogging'));
    if (ends.length === 2) return 0.5 * iem + 0.25 * (ends[0]! + ends[1]!);
    if (ends.length === 1) return 0.5 * (iem + ends[0]!);
    return iem;
  });
}
