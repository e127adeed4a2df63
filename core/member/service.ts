/**
 * Service deflections, two methods side by side:
 *  (a) integration of the moment–curvature relation along the span (the section's own tension
 *      model, e.g. tension stiffening), short-term and under sustained load with creep and
 *      shrinkage in the concrete law (core/materials/long-term.ts);
 *  (b) the code method of the project's code basis:
 *      ACI 318-19 — effective moment of inertia Ie (24.2.3.5, Branson's form for comparison),
 *      long-term multiplier λΔ = ξ/(1 + 50ρ′) (24.2.4.1);
 *      EN 1992-1-1 — curvature interpolated between uncracked and cracked states with ζ
 *      (7.4.3(3)), effective modulus for creep (7.20) and shrinkage curvature (7.21).
 * and checks against the limits the engineer picked. Units: mm, N, N·mm.
 */
import type { CodeBasis } from '../materials/specs.ts';
import type { ElasticProperties } from '../section/elastic.ts';
import { elasticProperties } from '../section/elastic.ts';
import type { SectionModel, BendingDirection } from '../section/model.ts';
import type { ServiceSettings, SupportType, DeflectionLimitCase } from './definition.ts';
import { buildBeamModel, zoneCurvature, type BeamModel, type ZoneResponse } from './beam-model.ts';
import { solveStatic, type StaticState } from './static.ts';
import { releasedMoment, type StaticLoad } from './statics.ts';
import type { SectionResponse, ValueAndSlope } from './section-response.ts';
import {
  aciEffectiveInertia,
  aciLongTermMultiplier,
  aciTimeFactor,
  bransonEffectiveInertia,
  enDistributionCoefficient,
  enEffectiveModulus,
  enShrinkageCurvature,
  limitRatio,
} from './code-deflection.ts';
import type { DeflectionCheck, ServiceDeflections, SpanDistribution } from './results.ts';
import { phrase, q, type Text } from '../units/phrase.ts';
import { SUSTAINED_STIFFENING_FACTOR } from '../materials/long-term.ts';
import { pushBetween } from '../numeric/search.ts';

export interface ServiceZone {
  readonly from: number;
  readonly to: number;
  readonly sectionId: string;
  readonly model: SectionModel;
  /** Short-term and sustained-load responses from moment–curvature analysis. */
  readonly shortTerm: ZoneResponse;
  readonly longTerm: ZoneResponse;
  /** Code values of the concrete: modulus (ACI Ec or EN Ecm), tensile strength (ACI fr or EN fctm), MPa. */
  readonly codeModulus: number;
  readonly codeTensileStrength: number;
  readonly creepCoefficient: number;
  readonly shrinkageStrain: number;
}

export interface ServiceInput {
  readonly code: CodeBasis;
  readonly support: SupportType;
  readonly span: number;
  readonly segments: number;
  readonly extraPoints: readonly number[];
  readonly zones: readonly ServiceZone[];
  /** Dead (incl. superimposed and self-weight) and live loads, unfactored. */
  readonly dead: readonly StaticLoad[];
  readonly live: readonly StaticLoad[];
  readonly settings: ServiceSettings;
}

export interface ServiceOutcome {
  readonly service: ServiceDeflections;
  readonly distribution: SpanDistribution | null;
  readonly warnings: Text[];
}

/** A section response given by closed-form curvature functions of the moment magnitude (code methods). */
function functionResponse(curvature: (m: number) => number, flexibility: (m: number) => number): SectionResponse {
  const huge = Number.MAX_VALUE;
  return {
    momentAtZero: 0,
    crackingMoment: null,
    firstYieldMoment: null,
    firstYieldCurvature: null,
    peakMoment: huge,
    peakCurvature: huge,
    ultimateMoment: huge,
    ultimateCurvature: huge,
    nominalYieldCurvature: null,
    nominalMoment: null,
    actualCurvature: curvature,
    integrationCurvature: curvature,
    plasticCurvature: () => 0,
    knots: () => undefined,
    knotMoments: [],
    knotCurvatures: [],
    integration: (m: number, out: ValueAndSlope) => {
      out.value = curvature(m);
      out.slope = flexibility(m);
      return out;
    },
    plastic: (_m: number, out: ValueAndSlope) => {
      out.value = 0;
      out.slope = 0;
      return out;
    },
    softening: { plastic: [0], moment: [huge] },
  };
}

function codeZone(zone: ServiceZone, sagging: SectionResponse, hogging: SectionResponse): ZoneResponse {
  return { sectionId: zone.sectionId, from: zone.from, to: zone.to, sagging, hogging, hingeData: zone.shortTerm.hingeData };
}

/** Largest downward deflection along the span, mm. */
function maxDeflection(state: StaticState): number {
  let m = 0;
  for (const d of state.deflection) if (d > m) m = d;
  return m;
}

function field(beam: BeamModel, loads: readonly StaticLoad[], factor = 1): Float64Array {
  return Float64Array.from(beam.x, (x) => factor * releasedMoment(beam.support, beam.span, loads, x));
}

function combine(a: Float64Array, b: Float64Array, fb: number): Float64Array {
  return Float64Array.from(a, (v, i) => v + fb * b[i]!);
}

/**
 * A zone's response under a moment after the largest service moment has been reached: the section
 * keeps the damage (cracking, stiffening lost) of that state. With κ = M_max/M (≥ 1) the largest
 * moment the zone saw in a direction for the moment M it now carries, the curvature lies on the
 * secant from the zero-moment state (φ0, the shrinkage curvature under sustained load) to the state
 * at κ·M on the same law, and never below the law itself (a section is not less damaged for having
 * carried more):
 *   φ(M) = max(φ_law(M), φ0 + (φ_law(κ·M) − φ0)/κ).
 * For a cracked section the secant is unloading towards its origin, the assumption the ACI code
 * method makes when it takes Ie at dead + live for the sustained deflection (common practice, no
 * source). The curvature stays piecewise linear — knots of the law, the law's knots over κ, and
 * where the two branches cross — so the member integrator still integrates it exactly. κ = 1 leaves
 * the zone as it is.
 * @param kappa per direction, M_max/M (≥ 1)
 */
export function afterLargestMoment(zone: ZoneResponse, kappa: { readonly sagging: number; readonly hogging: number }): ZoneResponse {
  if (!(kappa.sagging > 1) && !(kappa.hogging > 1)) return zone;
  const scratch: ValueAndSlope = { value: 0, slope: 0 };
  const phi0 = zoneCurvature(zone, 0, scratch).value;
  const m0 = zone.sagging.momentAtZero;
  // Knots of the signed law in (lo, hi), as the member integrator finds them.
  const signedKnots = (lo: number, hi: number): number[] => {
    const out: number[] = [];
    if (hi > m0) zone.sagging.knots(Math.max(lo, m0), hi, out);
    if (lo < m0) {
      const from = out.length;
      zone.hogging.knots(Math.max(-hi, -m0), -lo, out);
      for (let i = from; i < out.length; i++) out[i] = -out[i]!;
      if (hi > m0) out.push(m0);
    }
    return out.filter((k) => k > lo && k < hi);
  };
  const reach = 2 * (Math.max(zone.sagging.ultimateMoment, zone.hogging.ultimateMoment, zone.sagging.peakMoment, zone.hogging.peakMoment) + Math.abs(m0));
  const side = (base: SectionResponse, sign: 1 | -1, kappaSide: number): SectionResponse => {
    const k = kappaSide > 1 ? kappaSide : 1;
    const a: ValueAndSlope = { value: 0, slope: 0 };
    const b: ValueAndSlope = { value: 0, slope: 0 };
    const f0 = sign * phi0;
    // The law (f) and the secant from the largest state (g), as curvature magnitudes of this side.
    const law = (m: number, out: ValueAndSlope) => {
      zoneCurvature(zone, sign * m, out);
      out.value *= sign;
      return out;
    };
    const secant = (m: number, out: ValueAndSlope) => {
      law(k * m, out);
      out.value = f0 + (out.value - f0) / k;
      return out;
    };
    const integration = (m: number, out: ValueAndSlope) => {
      law(m, a);
      secant(m, b);
      const pick = b.value > a.value ? b : a;
      out.value = pick.value;
      out.slope = pick.slope;
      out.piece = -1;
      return out;
    };
    // Knots: the law's, the law's over κ, and the crossings of the two branches between them.
    const own = (sign > 0 ? signedKnots(0, reach) : signedKnots(-reach, 0).map((x) => -x));
    const list = [...new Set([...own, ...own.map((x) => x / k)])].filter((x) => x > 0).sort((p, q) => p - q);
    const knotList: number[] = [];
    const gap = (m: number) => secant(m, b).value - law(m, a).value;
    let prevM = 0;
    let prevGap = gap(0);
    for (const m of list) {
      const g = gap(m);
      if ((prevGap > 0 && g < 0) || (prevGap < 0 && g > 0)) knotList.push(prevM + ((m - prevM) * prevGap) / (prevGap - g));
      knotList.push(m);
      prevM = m;
      prevGap = g;
    }
    const curvature = (m: number) => integration(m, { value: 0, slope: 0 }).value;
    const scaled = (v: number | null) => (v === null ? null : v / k);
    return {
      ...base,
      momentAtZero: 0,
      crackingMoment: scaled(base.crackingMoment),
      firstYieldMoment: scaled(base.firstYieldMoment),
      peakMoment: base.peakMoment / k,
      ultimateMoment: base.ultimateMoment / k,
      nominalMoment: scaled(base.nominalMoment),
      actualCurvature: curvature,
      integrationCurvature: curvature,
      integration,
      // The knots above lo by binary search (the list is ascending), then those below hi.
      knots: (lo: number, hi: number, out: number[]) => pushBetween(knotList, lo, hi, out),
      knotMoments: [],
      knotCurvatures: [],
    };
  };
  return { ...zone, sagging: side(zone.sagging, 1, kappa.sagging), hogging: side(zone.hogging, -1, kappa.hogging) };
}

/**
 * κ = M_max/M per zone and direction: at the station of the zone where the moment M of `state` is
 * largest in that direction, the ratio of the moment under the largest service load there (1 where
 * that load gives less, or no moment of that sign).
 */
function damageRatios(beam: BeamModel, state: StaticState, largest: StaticState): { sagging: number; hogging: number }[] {
  return beam.zones.map((_, z) => {
    const ratio = (sign: 1 | -1) => {
      let at = -1;
      let best = 0;
      for (let i = 0; i < beam.x.length; i++) {
        if (beam.stationZone[i] !== z) continue;
        const m = sign * state.moment[i]!;
        if (m > best) {
          best = m;
          at = i;
        }
      }
      if (at < 0) return 1;
      const mMax = sign * largest.moment[at]!;
      return mMax > best ? mMax / best : 1;
    };
    return { sagging: ratio(1), hogging: ratio(-1) };
  });
}

/** First moment of the reinforcement about depth `axis`, mm³ (positive when steel lies below it). */
function steelFirstMoment(model: SectionModel, axis: number): number {
  return model.elements.filter((e) => e.kind !== 'frp').reduce((s, e) => s + e.area * (e.depth - axis), 0);
}

/**
 * The service integration doubles the station spacing's segment count until two successive answers
 * agree to this fraction (0.05 %), at most MAX_SERVICE_REFINEMENTS times (60 → 960 segments by
 * default); where they still differ then, each value that does gets a warning.
 */
export const SERVICE_REFINEMENT_TOLERANCE = 5e-4;
export const MAX_SERVICE_REFINEMENTS = 4;
/** The states the refinement compares, in the order of `values` in serviceDeflections. */
const SERVICE_STATES = ['dead load', 'dead + live load', 'sustained load', 'sustained load, long term'] as const;

export function serviceDeflections(input: ServiceInput): ServiceOutcome {
  const warnings: Text[] = [];
  const { support, span, segments, extraPoints, settings } = input;
  const psi = settings.sustainedLiveFraction;

  // (a) integration, short term and sustained. Station spacing is refined until doubling the
  // number of segments changes no deflection by more than 0.05 % (brittle cracking makes the
  // cracked length near supports sensitive to it), up to 16× the base count.
  // Each station spacing's solves note their own warnings; only those of the spacing whose values
  // are shown are reported (a solve that failed on a coarser spacing and converged on the one
  // shown is no warning: before 4 Dec 2026 generated members G-0142 and G-0567 said "did not
  // converge" of a value solved to the tolerance).
  const solve = (beam: BeamModel, f: Float64Array, label: string, notes: string[]) => {
    const s = solveStatic(beam, f);
    if (!s.converged) notes.push(`Service deflection (${label}) did not converge: the value shown is the last iterate.`);
    if (s.peakRatio > 1) notes.push(`Under ${label} a section is past its peak moment: service deflections are not meaningful.`);
    else if (s.yieldRatio > 1) notes.push(`Under ${label} the reinforcement yields: the member is not in a service state.`);
    return s;
  };
  // Load history: dead load, then the live load (the largest service state), then the sustained
  // part stays. The sustained states, short and long term, keep the damage of the largest state
  // (afterLargestMoment), with the moment ratio κ of the short-term solutions.
  const integrateAt = (count: number) => {
    const notes: string[] = [];
    const shortBeam = buildBeamModel(support, span, input.zones.map((z) => z.shortTerm), extraPoints, count);
    const deadField = field(shortBeam, input.dead);
    const liveField = field(shortBeam, input.live);
    const sustainedField = combine(deadField, liveField, psi);
    const total = solve(shortBeam, combine(deadField, liveField, 1), 'dead + live load', notes);
    const kappa = damageRatios(shortBeam, solveStatic(shortBeam, sustainedField, false), total);
    // The same stations with other laws: the zones' extents, which alone place the stations, are the same.
    const historyBeam: BeamModel = { ...shortBeam, zones: input.zones.map((z, i) => afterLargestMoment(z.shortTerm, kappa[i]!)) };
    const longBeam: BeamModel = { ...shortBeam, zones: input.zones.map((z, i) => afterLargestMoment(z.longTerm, kappa[i]!)) };
    const dead = solve(shortBeam, deadField, 'dead load', notes);
    const sustained = solve(historyBeam, sustainedField, 'sustained load', notes);
    const sustainedLong = solve(longBeam, sustainedField, 'sustained load, long term', notes);
    return { shortBeam, dead, total, sustained, sustainedLong, notes };
  };
  const values = (r: ReturnType<typeof integrateAt>) => [r.dead, r.total, r.sustained, r.sustainedLong].map(maxDeflection);
  let count = segments;
  let run = integrateAt(count);
  const tried = [count];
  // The values that still differ by more than the tolerance between the last two spacings (none once
  // two agree).
  let unsettled: { label: string; coarse: number; fine: number }[] = [];
  for (let refinements = 0; refinements < MAX_SERVICE_REFINEMENTS; refinements++) {
    const finer = integrateAt(count * 2);
    const a = values(run);
    const b = values(finer);
    const scale = Math.max(...b.map(Math.abs), 1e-9);
    run = finer;
    count *= 2;
    tried.push(count);
    unsettled = a.flatMap((v, i) => (Math.abs(v - b[i]!) <= SERVICE_REFINEMENT_TOLERANCE * Math.max(Math.abs(b[i]!), 0.01 * scale) ? [] : [{ label: SERVICE_STATES[i]!, coarse: v, fine: b[i]! }]));
    if (unsettled.length === 0) break;
  }
  const { shortBeam, dead, total, sustained, sustainedLong } = run;
  warnings.push(...run.notes);
  // Refinement that stopped at its last spacing with values still moving: said, not hidden.
  for (const u of unsettled) {
    const difference = Math.abs(u.fine - u.coarse);
    const change = (100 * difference) / Math.max(Math.abs(u.fine), 1e-300);
    // Decimals enough that the two values print differently (in mm; one more covers inches).
    const decimals = Math.min(8, Math.max(3, Math.ceil(-Math.log10(Math.max(difference, 1e-8))) + 2));
    warnings.push(phrase`Service deflection (${u.label}) by integration did not settle as the station spacing was refined (${tried.join(', ')} segments): ${q('deflection', u.coarse, { decimals })} with ${count / 2} segments, ${q('deflection', u.fine, { decimals })} with ${count}, ${change.toPrecision(2)} % apart where the refinement asks for ${100 * SERVICE_REFINEMENT_TOLERANCE} %; the value shown is the one with ${count} segments.`);
  }
  const integration = {
    dead: maxDeflection(dead),
    deadPlusLive: maxDeflection(total),
    live: maxDeflection(total) - maxDeflection(dead),
    sustained: maxDeflection(sustained),
  };
  const integrationLongTotal = maxDeflection(sustainedLong);
  const integrationAdditional = integrationLongTotal - integration.sustained;

  // (b) code method.
  let code: { dead: number; deadPlusLive: number; live: number; sustained: number };
  let codeTotal: number;
  let codeAdditional: number;
  let multiplier: number | null = null;
  let codeName: string;
  let effectiveInertia: { dead: number; deadPlusLive: number; sustained: number } | null = null;
  let notes: string;
  let legacy: { dead: number; deadPlusLive: number; live: number } | null = null;
  if (input.code === 'ACI 318-19') {
    const aci = aciMethod(input);
    code = aci.immediate;
    effectiveInertia = aci.inertia;
    legacy = aci.branson;
    const xi = aciTimeFactor(settings.durationMonths);
    multiplier = aciLongTermMultiplier(xi, aci.compressionRatio);
    codeAdditional = multiplier * code.sustained;
    codeTotal = code.sustained + codeAdditional;
    codeName = 'ACI 318-19 24.2.3.5 effective moment of inertia; long-term multiplier 24.2.4.1';
    notes = `Ie from Eq. (24.2.3.5a) with Mcr = fr·Ig/yt (Eq. 24.2.3.5b), ${aci.where}; Ie constant along the member, each zone with its own Ec. ξ = ${xi.toFixed(2)} for ${settings.durationMonths} months, ρ′ = ${aci.compressionRatio.toFixed(4)}, λΔ = ${multiplier.toFixed(3)}. The sustained deflection uses Ie at dead + live (the member has been cracked by the full service load).`;
  } else {
    const en = enMethod(input);
    code = en.immediate;
    codeTotal = en.longTermTotal;
    codeAdditional = codeTotal - code.sustained;
    codeName = 'EN 1992-1-1 7.4.3: ζ-interpolated curvature, effective modulus and shrinkage curvature';
    notes = `ζ = 1 − β(Mcr/M)² at every station (Eq. 7.19), β = 1.0 short term and 0.5 sustained; Ec,eff = Ecm/(1 + φ) (Eq. 7.20); shrinkage curvature εcs·αe·S/I (Eq. 7.21)${settings.includeShrinkage === false ? ' not included (switched off)' : ''}.`;
  }

  const differences = methodDifferences(input, shortBeam, total, {
    immediate: [integration.deadPlusLive, code.deadPlusLive],
    longTerm: [integrationAdditional, codeAdditional],
    multiplier,
  });

  const ell = span;
  const checks: DeflectionCheck[] = settings.limitCases.map((c) => {
    const ratio = limitRatio(c, settings.customLimitRatio);
    const limit = ell / ratio;
    const [quantity, description, a, b] = checkQuantity(c, ratio, {
      liveI: integration.live, liveC: code.live,
      addI: integrationAdditional, addC: codeAdditional,
      totalLongI: integrationLongTotal, totalLongC: codeTotal,
      deadI: integration.dead, deadC: code.dead,
      transientLiveI: integration.deadPlusLive - integration.sustained, transientLiveC: code.deadPlusLive - code.sustained,
    });
    const governing = Math.max(a, b);
    return { limitCase: c, description, quantity, ratio, limit, byIntegration: a, byCode: b, governing, utilisation: governing / limit, pass: governing <= limit };
  });

  const distribution: SpanDistribution = {
    label: 'service: dead + live',
    loadFactor: 1,
    x: [...shortBeam.x],
    moment: [...total.moment],
    curvature: [...total.curvature],
    deflection: [...total.deflection],
    hingeZones: [],
  };
  return {
    service: {
      immediate: { integration, code },
      longTerm: {
        method: `${input.code === 'ACI 318-19' ? 'ACI 318-19 24.2.4.1 multiplier (code)' : 'EN 1992-1-1 7.4.3 (code)'}; integration: creep, shrinkage and tension stiffening decayed to β = ${SUSTAINED_STIFFENING_FACTOR} in the section law, the sustained state kept on the secant from the largest service state`,
        multiplier,
        integrationAdditional,
        codeAdditional,
        integrationTotal: integrationLongTotal,
        codeTotal,
      },
      codeMethod: { name: codeName, effectiveInertia, notes, ...(legacy ? { legacyBranson: legacy } : {}) },
      ...(differences.length > 0 ? { methodDifferences: differences } : {}),
      checks,
    },
    distribution,
    warnings: [...new Set(warnings)],
  };
}

/** How far apart (relative to the larger) the two methods may be before the results say why: 25 %. */
export const METHODS_APART = 0.25;

/**
 * Sentences saying which assumptions differ where the integration and the code method are more than
 * METHODS_APART apart: immediately under dead + live load (cracking moment, tension stiffening, one Ie
 * for the member), and in the long-term addition (how creep and shrinkage enter).
 */
function methodDifferences(
  input: ServiceInput,
  beam: BeamModel,
  total: StaticState,
  v: { immediate: [number, number]; longTerm: [number, number]; multiplier: number | null },
): Text[] {
  const out: Text[] = [];
  const apart = ([a, b]: [number, number]) => Math.max(a, b) > 1e-6 && Math.abs(a - b) / Math.max(a, b) > METHODS_APART;
  const aci = input.code === 'ACI 318-19';
  const pct = ([a, b]: [number, number]) => `${Math.round((100 * Math.abs(a - b)) / Math.max(a, b))} %`;
  if (apart(v.immediate)) {
    // The critical section: the station of the largest moment under dead + live load.
    let at = 0;
    for (let i = 0; i < total.moment.length; i++) if (Math.abs(total.moment[i]!) > Math.abs(total.moment[at]!)) at = i;
    const z = beam.stationZone[at]!;
    const zone = input.zones[z]!;
    const dir: BendingDirection = total.moment[at]! >= 0 ? 'sagging' : 'hogging';
    const lawCracking = beam.zones[z]![dir].crackingMoment;
    const codeCracking = elasticProperties(zone.model, { concreteModulus: zone.codeModulus, tensileStrength: zone.codeTensileStrength }).crackingMoment[dir].gross;
    const cracking = lawCracking !== null && Math.abs(lawCracking - codeCracking) > 0.05 * codeCracking
      ? phrase`the curves crack at ${q('moment', lawCracking)} (the tensile strength the concrete law is fed), the code method at Mcr = ${q('moment', codeCracking)} (${aci ? 'fr' : 'fctm'}); `
      : '';
    out.push(phrase`Immediately under dead + live load the two methods are ${pct(v.immediate)} apart (${q('deflection', v.immediate[0])} by integration, ${q('deflection', v.immediate[1])} by the code method). Assumptions that differ: ${cracking}tension stiffening follows the concrete law between cracks, where the code method interpolates ${aci ? 'Ie between Ig and Icr (ACI 318-19 24.2.3.5)' : 'the curvature between the uncracked and cracked states with ζ (EN 1992-1-1 Eq. 7.19)'}${aci ? '; and the code method takes one Ie for the whole member from its critical section, where the integration follows the cracked length along the span' : ''}.`);
  }
  if (apart(v.longTerm)) {
    const zone = input.zones[0]!;
    const codeWords = aci
      ? phrase`multiplies the sustained immediate deflection by λΔ = ${v.multiplier?.toFixed(2) ?? '–'} (ACI 318-19 24.2.4.1), one empirical factor for creep and shrinkage together`
      : phrase`interpolates curvatures with Ec,eff = Ecm/(1 + φ) (Eq. 7.20) and ζ with β = 0.5 from the quasi-permanent moment alone (it keeps no memory of the cracks the full service load opened), and adds the shrinkage curvature of Eq. 7.21 on the uncracked and cracked sections`;
    out.push(phrase`The long-term addition is ${pct(v.longTerm)} apart (${q('deflection', v.longTerm[0])} by integration, ${q('deflection', v.longTerm[1])} by the code method). The integration takes creep through the effective modulus Ec/(1 + φ) (φ = ${zone.creepCoefficient.toFixed(2)}) on the whole concrete law, shrinkage εcs = ${(zone.shrinkageStrain * 1000).toFixed(2)} ‰ as a strain imposed on the concrete and restrained by the bars, and tension stiffening halved (β = ${SUSTAINED_STIFFENING_FACTOR}), from the damage of the largest service load; the code method ${codeWords}.`);
  }
  return out;
}

export function checkQuantity(
  c: DeflectionLimitCase,
  ratio: number,
  v: { liveI: number; liveC: number; addI: number; addC: number; totalLongI: number; totalLongC: number; deadI: number; deadC: number; transientLiveI: number; transientLiveC: number },
): [string, string, number, number] {
  switch (c) {
    case 'aci-roof-immediate':
      return ['immediate deflection under live load', `ACI 318-19 Table 24.2.2: flat roof not supporting elements likely to be damaged, ℓ/${ratio}`, v.liveI, v.liveC];
    case 'aci-floor-immediate':
      return ['immediate deflection under live load', `ACI 318-19 Table 24.2.2: floor not supporting elements likely to be damaged, ℓ/${ratio}`, v.liveI, v.liveC];
    case 'aci-sensitive-after-attachment':
      return ['long-term deflection under sustained load plus immediate live deflection', `ACI 318-19 Table 24.2.2: supporting elements likely to be damaged, ℓ/${ratio}`, v.addI + v.liveI, v.addC + v.liveC];
    case 'aci-insensitive-after-attachment':
      return ['long-term deflection under sustained load plus immediate live deflection', `ACI 318-19 Table 24.2.2: supporting elements not likely to be damaged, ℓ/${ratio}`, v.addI + v.liveI, v.addC + v.liveC];
    case 'en-appearance':
      return ['total long-term deflection under the quasi-permanent load', `EN 1992-1-1 7.4.1(4): appearance, span/${ratio}`, v.totalLongI, v.totalLongC];
    case 'en-after-construction':
      return ['long-term deflection after construction (total minus immediate dead-load deflection)', `EN 1992-1-1 7.4.1(5): may damage adjacent parts, span/${ratio}`, v.totalLongI - v.deadI, v.totalLongC - v.deadC];
    case 'custom':
      return ['total deflection: long term under sustained load plus the non-sustained live load', `Limit set by the engineer, span/${ratio}`, v.totalLongI + v.transientLiveI, v.totalLongC + v.transientLiveC];
  }
}

/** ACI 318-19: one Ie for the member from its critical section(s), elastic deflection with each zone's Ec times that Ie. */
function aciMethod(input: ServiceInput) {
  const psi = input.settings.sustainedLiveFraction;
  const props = input.zones.map((z) => elasticProperties(z.model, { concreteModulus: z.codeModulus, tensileStrength: z.codeTensileStrength }));
  // Moment distribution from an uncracked elastic analysis (gross stiffness per zone).
  const elasticBeam = buildBeamModel(input.support, input.span, input.zones.map((z, i) => {
    const ei = z.codeModulus * props[i]!.grossInertia;
    const lin = functionResponse((m) => m / ei, () => 1 / ei);
    return codeZone(z, lin, lin);
  }), input.extraPoints, input.segments);
  const zoneAt = (x: number) => Math.max(0, input.zones.findIndex((z) => x >= z.from && x <= z.to));
  const critical = (M: Float64Array, dir: BendingDirection) => {
    let best = 0;
    let at = 0;
    M.forEach((m, i) => {
      const v = dir === 'sagging' ? m : -m;
      if (v > best) {
        best = v;
        at = i;
      }
    });
    return { moment: best, zone: zoneAt(elasticBeam.x[at]!) };
  };
  // The elastic moments of each load field, solved once (both Ie rules read them).
  const elasticMoments = new Map<Float64Array, Float64Array>();
  const ieFor = (f: Float64Array, rule: (ma: number, mcr: number, ig: number, icr: number) => number): number => {
    let M = elasticMoments.get(f);
    if (!M) {
      M = solveStatic(elasticBeam, f, false).moment;
      elasticMoments.set(f, M);
    }
    const value = (dir: BendingDirection) => {
      const c = critical(M, dir);
      const p = props[c.zone]!;
      const icr = p.cracked[dir]?.inertia ?? p.grossInertia;
      return { ie: rule(c.moment, p.crackingMoment[dir].gross, p.grossInertia, icr), moment: c.moment };
    };
    switch (input.support) {
      case 'simply-supported':
        return value('sagging').ie;
      case 'cantilever':
        return value('hogging').ie;
      default: {
        const pos = value('sagging');
        const neg = value('hogging');
        return (pos.ie + neg.ie) / 2;
      }
    }
  };
  // One Ie for the member, each zone with its own Ec (a zone of other concrete keeps its modulus).
  const deflectionWith = (ie: number, f: Float64Array) => {
    // The elastic model's stations (the zones' extents alone place them) with the laws of this Ie.
    const b: BeamModel = { ...elasticBeam, zones: input.zones.map((z) => {
      const ei = z.codeModulus * ie;
      const lin = functionResponse((m) => m / ei, () => 1 / ei);
      return codeZone(z, lin, lin);
    }) };
    return maxDeflection(solveStatic(b, f));
  };
  const deadField = field(elasticBeam, input.dead);
  const liveField = field(elasticBeam, input.live);
  const fD = deadField;
  const fDL = combine(deadField, liveField, 1);
  const fS = combine(deadField, liveField, psi);
  const run = (rule: typeof aciEffectiveInertia) => {
    const ieD = ieFor(fD, rule);
    const ieDL = ieFor(fDL, rule);
    const d = deflectionWith(ieD, fD);
    const dl = deflectionWith(ieDL, fDL);
    return { ieD, ieDL, d, dl, s: deflectionWith(ieDL, fS) };
  };
  const current = run(aciEffectiveInertia);
  const old = run(bransonEffectiveInertia);
  // ρ′ at midspan (simple, continuous) or at the support (cantilever): ACI 318-19 24.2.4.1.2.
  const dir: BendingDirection = input.support === 'cantilever' ? 'hogging' : 'sagging';
  const z = input.support === 'cantilever' ? input.zones[0]! : input.zones[zoneAt(input.span / 2)]!;
  const model = z.model;
  const compressionFace = dir === 'sagging' ? 0 : model.height;
  const compressionSteel = model.elements.filter((e) => e.kind === 'bar' && (dir === 'sagging' ? e.depth < model.centroidDepth : e.depth > model.centroidDepth));
  const tensionSteel = model.elements.filter((e) => e.kind === 'bar' && (dir === 'sagging' ? e.depth > model.centroidDepth : e.depth < model.centroidDepth));
  const tensionArea = tensionSteel.reduce((s, e) => s + e.area, 0);
  const d = tensionArea > 0 ? Math.abs(tensionSteel.reduce((s, e) => s + e.area * e.depth, 0) / tensionArea - compressionFace) : model.height;
  const width = compressionWidth(model, dir);
  const compressionRatio = compressionSteel.reduce((s, e) => s + e.area, 0) / (width * d);
  return {
    immediate: { dead: current.d, deadPlusLive: current.dl, live: current.dl - current.d, sustained: current.s },
    inertia: { dead: current.ieD, deadPlusLive: current.ieDL, sustained: current.ieDL },
    branson: { dead: old.d, deadPlusLive: old.dl, live: old.dl - old.d },
    compressionRatio,
    where: input.support === 'simply-supported' ? 'Ma at midspan (24.2.3.7)' : input.support === 'cantilever' ? 'Ma at the support (24.2.3.7)' : 'average of Ie at the critical positive and negative moment sections (24.2.3.6)',
  };
}

/** Width of the concrete at the compression face (b in ρ′ = As′/(b·d)), mm. */
function compressionWidth(model: SectionModel, dir: BendingDirection): number {
  const strips = model.concreteParts.flatMap((p) => p.strips);
  if (dir === 'sagging') {
    const top = Math.min(...strips.map((s) => s.top));
    return strips.filter((s) => s.top === top).reduce((w, s) => w + s.widthTop, 0);
  }
  const bottom = Math.max(...strips.map((s) => s.bottom));
  return strips.filter((s) => s.bottom === bottom).reduce((w, s) => w + s.widthBottom, 0);
}

/** EN 1992-1-1 7.4.3: ζ-interpolated curvatures integrated along the span. */
function enMethod(input: ServiceInput) {
  const psi = input.settings.sustainedLiveFraction;
  const withShrinkage = input.settings.includeShrinkage !== false;
  const zonesFor = (longTerm: boolean, beta: number): ZoneResponse[] =>
    input.zones.map((z) => {
      const ec = longTerm ? enEffectiveModulus(z.codeModulus, z.creepCoefficient) : z.codeModulus;
      const p: ElasticProperties = elasticProperties(z.model, { concreteModulus: ec, tensileStrength: z.codeTensileStrength });
      const steel = z.model.elements.find((e) => e.kind === 'bar');
      const alpha = (steel?.material.initialModulus ?? 200000) / ec;
      const eps = longTerm && withShrinkage ? z.shrinkageStrain : 0;
      const h = z.model.height;
      const csUncracked = eps > 0 ? enShrinkageCurvature(eps, alpha, steelFirstMoment(z.model, p.uncrackedCentroidDepth), p.uncrackedInertia) : 0;
      const branch = (dir: BendingDirection): SectionResponse => {
        const s = dir === 'sagging' ? 1 : -1;
        const cracked = p.cracked[dir];
        const iI = p.uncrackedInertia;
        const iII = cracked?.inertia ?? iI;
        const naFromTop = cracked ? (dir === 'sagging' ? cracked.neutralAxisDepth : h - cracked.neutralAxisDepth) : p.uncrackedCentroidDepth;
        const csCracked = eps > 0 && cracked ? enShrinkageCurvature(eps, alpha, steelFirstMoment(z.model, naFromTop), iII) : csUncracked;
        const mcr = p.crackingMoment[dir].transformed;
        // Curvature magnitude in this direction; shrinkage (signed sagging) converted with s.
        const curvature = (m: number) => {
          const zeta = enDistributionCoefficient(m, mcr, beta);
          return zeta * (m / (ec * iII) + s * csCracked) + (1 - zeta) * (m / (ec * iI) + s * csUncracked);
        };
        const flexibility = (m: number) => {
          const dm = Math.max(Math.abs(m) * 1e-6, 1);
          return (curvature(m + dm) - curvature(Math.max(m - dm, 0))) / (m + dm - Math.max(m - dm, 0));
        };
        return functionResponse(curvature, flexibility);
      };
      return codeZone(z, branch('sagging'), branch('hogging'));
    });
  const shortZones = zonesFor(false, 1.0);
  const longZones = zonesFor(true, 0.5);
  const shortBeam = buildBeamModel(input.support, input.span, shortZones, input.extraPoints, input.segments);
  // The same stations (the zones' extents alone place them) with the long-term laws.
  const longBeam: BeamModel = { ...shortBeam, zones: longZones };
  const fD = field(shortBeam, input.dead);
  const fL = field(shortBeam, input.live);
  const d = maxDeflection(solveStatic(shortBeam, fD));
  const dl = maxDeflection(solveStatic(shortBeam, combine(fD, fL, 1)));
  const s = maxDeflection(solveStatic(shortBeam, combine(fD, fL, psi)));
  const longTermTotal = maxDeflection(solveStatic(longBeam, combine(fD, fL, psi)));
  return { immediate: { dead: d, deadPlusLive: dl, live: dl - d, sustained: s }, longTermTotal };
}
