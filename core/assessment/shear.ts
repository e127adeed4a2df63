/**
 * What fails first: the shear strength of the member's sections (shear-section.ts), the shear under the factored
 * combination, and the shear when the flexural mechanism forms (with flexural overstrength), so
 * that each member is classed flexure-governed or shear-governed.
 *
 * Shear strength by the project's code basis:
 *  - ACI 318-19 22.5: Vn = Vc + Vs, Vc by Table 22.5.5.1 with the size-effect factor λs, Vs by
 *    Eq. 22.5.8.5.3, the section limit of 22.5.1.2, φ = 0.75 (Table 21.2.1(b)).
 *  - EN 1992-1-1 6.2: VRd,c (Eq. 6.2a/b), VRd,s (Eq. 6.8) and VRd,max (Eq. 6.9) with the strut angle
 *    chosen within 1 ≤ cot θ ≤ 2.5 (Eq. 6.7N) to give the largest resistance (see enShearStrength).
 *
 * Demand (member statics with the loads of core/member/analyze.ts):
 *  - factored: every strength combination (the envelope), with the support moments of an elastic
 *    analysis on gross sections (as the flexural strength check, flexure.ts);
 *  - at the flexural mechanism: every hinge the support type needs at its overstrength moment
 *    Mo = γo·Mpeak, Mpeak the largest moment of the section's moment–curvature curve (the steel law
 *    to its ultimate stress fu — the measured one when coupons are entered), γo = 1.0 by default;
 *    the load pattern of the capacity analysis is scaled until the mechanism forms (lower-bound
 *    statics: hinge moments imposed, λ the smallest factor that brings a span section to Mo).
 * Sections closer than d to a support face are not checked when no point load lies between
 * (ACI 318-19 9.4.3.2; EN 1992-1-1 6.2.1(8)); under EN the support face is checked against
 * VEd ≤ 0.5·bw·d·ν·fcd (Eq. 6.5).
 *
 * Flexure-governed or shear-governed is decided on nominal strengths (ACI Vn with φ = 1; EN with
 * γc = γs = 1): the question is which capacity is reached first, not a design check. The design
 * ratio (φVn, VRd) is reported beside it, as the capacity-design rules of ACI 318-19 18.6.5.1 and
 * EN 1998-1 5.5.2.1 would use it (from memory).
 *
 * Units: N, mm, MPa, N·mm.
 */
import type { CodeBasis } from '../materials/specs.ts';
import type { BeamDefinition } from '../member/definition.ts';
import { memberForcesAt, releasedMoment, totalLoad } from '../member/statics.ts';
import { zoneIndexAt } from '../member/zones.ts';
import type { BendingDirection, DiscreteElement } from '../section/model.ts';
import { tensionSteel } from '../section/model.ts';
import { joinTexts, phrase, q, type Text } from '../units/phrase.ts';
import { combinationText, combinedLoads, memberLoadSets, scaleLoad, type LoadCombination } from './combinations.ts';
import { elasticSupportMoments, type ElasticZone } from './demand.ts';
import { criticalSectionDepth, zoneShearCapacities, type ShearCapacity, type ShearZone } from './shear-section.ts';
import type { AciEdition } from './shear-aci.ts';
import { exceedsBeyondRounding } from '../numeric/ties.ts';

export interface ShearDemandPoint {
  /** mm from the left support, and which side of a discontinuity. */
  readonly position: number;
  /** |V|, N. */
  readonly shear: number;
  readonly sectionId: string;
  readonly direction: BendingDirection;
  /** Capacities there (nominal and design), N. */
  readonly nominal: number;
  readonly design: number;
  /** True when the point is the support face checked against EN 1992-1-1 Eq. (6.5). */
  readonly supportFace: boolean;
}

/** Shear of a member: capacities, factored and mechanism demands, and the verdict (N, mm, N·mm). */
export interface ShearResult {
  readonly code: CodeBasis;
  readonly capacities: readonly ShearCapacity[];
  /** Shear under the factored strength combination against the design shear strength. */
  readonly factored: {
    readonly combination: string;
    readonly governing: ShearDemandPoint;
    readonly utilisation: number;
    readonly pass: boolean;
  } | null;
  /** Shear when the flexural mechanism forms (hinges at overstrength). */
  readonly mechanism: {
    readonly overstrengthFactor: number;
    readonly overstrengthBasis: string;
    readonly hinges: readonly { readonly position: number; readonly direction: BendingDirection; readonly moment: number }[];
    /** Load factor on the capacity pattern at the mechanism, and the total load then, N. */
    readonly loadFactor: number;
    readonly totalLoad: number;
    readonly governing: ShearDemandPoint;
    /** V / Vn (nominal) and V / φVn or V / VRd (design) at the governing point. */
    readonly nominalRatio: number;
    readonly designRatio: number;
  } | null;
  readonly governs: 'flexure' | 'shear' | 'undetermined';
  /** Load factor on the capacity pattern at which the nominal shear strength is reached first (determinate members only). */
  readonly shearFailureLoadFactor: number | null;
  /** False when shear governs: the flexural ductility and hinge rotations are then not available. */
  readonly flexuralDuctilityAvailable: boolean;
  /** The shear part of the governing-mode sentence. */
  readonly sentence: Text;
  /** Which sections near the supports were skipped, and why. */
  readonly criticalSectionRule: Text;
  /** Demand and capacity along the span, for the shear diagram. */
  readonly diagram: ShearDiagram;
  readonly warnings: readonly Text[];
}

/**
 * Shear along the span as the check sees it, one entry per station and side (a station where the
 * shear jumps — a point load, a zone boundary — appears twice: left of it, then right of it).
 * Units: x mm from the left support, shears N (magnitudes).
 */
export interface ShearDiagram {
  readonly x: readonly number[];
  /** |V| under the factored combination, and at the flexural mechanism (null when no mechanism was formed). */
  readonly factored: readonly number[];
  readonly mechanism: readonly number[] | null;
  /** Capacities of the section there in the bending direction of the factored moment: nominal (Vn; EN with γ = 1) and design (φVn; VRd). */
  readonly nominal: readonly number[];
  readonly design: readonly number[];
  /** False within d of a support face where no point load lies between: not checked, the shear at d governs. */
  readonly checked: readonly boolean[];
  readonly sectionIds: readonly string[];
}

const EMPTY_DIAGRAM: ShearDiagram = { x: [], factored: [], mechanism: null, nominal: [], design: [], checked: [], sectionIds: [] };

/** Inputs of memberShear. */
export interface MemberShearInput {
  readonly code: CodeBasis;
  readonly member: BeamDefinition;
  /** One per member zone, in the member's zone order. */
  readonly zones: readonly ShearZone[];
  /** The strength combinations; the factored check takes their envelope. */
  readonly combinations: readonly LoadCombination[];
  /** Equal segments along the span (the project setting `stations`; 200 when omitted). */
  readonly segments?: number;
  /** γo on the section peak moment for the mechanism (default 1.0). */
  readonly overstrengthFactor?: number;
  /** ACI: the form of the unit-dependent expressions (λs), the project's unit system; default 'us'. */
  readonly edition?: AciEdition;
}


/** Sagging and hogging hinge moments of a zone (magnitudes, N·mm): γo × the curve's peak, or the cracking moment without tension steel. */
function hingeMoments(zone: ShearZone, gamma: number): { sagging: number; hogging: number } {
  const a = zone.analysis;
  const pick = (dir: BendingDirection) => {
    const peak = a.curves[dir]?.keyPoints.peak?.moment;
    if (peak !== undefined && peak > 0) return gamma * peak;
    return a.elastic ? a.elastic.crackingMoment[dir].transformed : 0;
  };
  return { sagging: pick('sagging'), hogging: pick('hogging') };
}

/**
 * Shear assessment of a member: capacities, factored demand, demand at the flexural mechanism,
 * flexure- or shear-governed, and the sentence for the governing mode.
 * Never throws for physical outcomes; returns `governs: 'undetermined'` with the reason when no
 * mechanism can be formed (empty load pattern, a zone without a model).
 * @see module comment for the clauses
 */
export function memberShear(input: MemberShearInput): ShearResult {
  const { code, member, zones } = input;
  const span = member.span;
  const segments = input.segments ?? 200;
  const gamma = input.overstrengthFactor ?? 1;
  const warnings: Text[] = [];

  // --- capacities per zone and direction ----------------------------------------------------------
  const { caps, capacities } = zoneShearCapacities(code, zones, input.edition);
  const empty = (sentence: string): ShearResult => ({
    code, capacities, factored: null, mechanism: null, governs: 'undetermined', shearFailureLoadFactor: null,
    flexuralDuctilityAvailable: true, sentence, criticalSectionRule: '', diagram: EMPTY_DIAGRAM, warnings,
  });
  if (caps.some((c) => !c.sagging && !c.hogging)) return empty('shear not assessed: a section of the member has no valid model');

  const zoneAt = (x: number, side: 'left' | 'right') => zoneIndexAt(zones, x, side);
  const capacityAt = (x: number, side: 'left' | 'right', moment: number) => {
    const i = zoneAt(x, side);
    const c = caps[i]!;
    const dir: BendingDirection = moment >= 0 ? 'sagging' : 'hogging';
    const cap = c[dir] ?? c[dir === 'sagging' ? 'hogging' : 'sagging']!;
    return { zone: i, cap };
  };

  // --- loads ----------------------------------------------------------------------------------------
  const sets = memberLoadSets(member, zones.map((z) => z.analysis.selfWeight));
  const dead = [...sets.selfWeight, ...sets.dead, ...sets.superimposed];
  const live = sets.live;
  const proportional = member.capacity.pattern === 'proportional';
  const constant = proportional ? [] : dead;
  const pattern = proportional ? [...dead, ...live] : live;

  // --- stations and the critical sections near supports ----------------------------------------------
  const pointPositions = member.loads.filter((l) => l.kind === 'point').map((l) => (l as { position: number }).position);
  const supportsAt = member.supports === 'cantilever' ? [0] : [0, span];
  const skip: { readonly side: 'left' | 'right'; readonly limit: number }[] = [];
  const ruleParts: Text[] = [];
  for (const xs of supportsAt) {
    const zi = zoneAt(xs, xs === 0 ? 'right' : 'left');
    const c = caps[zi]!;
    const d = Math.min(criticalSectionDepth(c), span);
    const left = xs === 0;
    const loaded = pointPositions.some((p) => (left ? p > 0 && p <= d : p >= span - d && p < span));
    if (loaded) ruleParts.push(phrase`a point load lies within d = ${q('sectionLength', d)} of the support at ${q('spanLength', xs)}: checked up to the support face`);
    else {
      skip.push({ side: left ? 'left' : 'right', limit: left ? d : span - d });
      ruleParts.push(phrase`sections within d = ${q('sectionLength', d)} of the support at ${q('spanLength', xs)} take the shear at d`);
    }
  }
  const criticalSectionRule = phrase`${joinTexts(ruleParts, '; ')} (${code === 'ACI 318-19' ? 'ACI 318-19 9.4.3.2' : 'EN 1992-1-1 6.2.1(8); the support face is checked against Eq. 6.5'}).`;
  const stationSet = new Set<number>();
  for (let i = 0; i <= segments; i++) stationSet.add((span * i) / segments);
  for (const z of zones) {
    stationSet.add(z.from);
    stationSet.add(z.to);
  }
  for (const p of pointPositions) if (p >= 0 && p <= span) stationSet.add(p);
  for (const s of skip) stationSet.add(s.limit);
  const stations = [...stationSet].filter((x) => x >= 0 && x <= span).sort((a, b) => a - b);
  const skipped = (x: number) => skip.some((s) => (s.side === 'left' ? x < s.limit - 1e-9 : x > s.limit + 1e-9));
  // A span shorter than 2d would skip everything: then every station is checked.
  const checked = stations.some((x) => !skipped(x)) ? (x: number) => !skipped(x) : () => true;

  type Best = ShearDemandPoint & { ratio: number };
  /** Largest demand/capacity over the stations for a force state, on nominal and on design strengths (one pass); `record` sees every station and side. */
  type Recorder = (x: number, shear: number, cap: ShearCapacity, checked: boolean) => void;
  const scan = (forces: (x: number, side: 'left' | 'right') => { moment: number; shear: number }, record?: Recorder): { nominal: Best; design: Best } => {
    let nominal: Best | undefined;
    let design: Best | undefined;
    const ratioOf = (v: number, capacity: number) => (capacity > 0 ? v / capacity : v > 0 ? 99.99 : 0);
    const consider = (point: ShearDemandPoint) => {
      const rn = ratioOf(point.shear, point.nominal);
      const rd = ratioOf(point.shear, point.design);
      if (!nominal || rn > nominal.ratio) nominal = { ...point, ratio: rn };
      if (!design || rd > design.ratio) design = { ...point, ratio: rd };
    };
    for (const x of stations) {
      for (const side of ['left', 'right'] as const) {
        if ((x === 0 && side === 'left') || (x === span && side === 'right')) continue;
        const f = forces(x, side);
        const { cap } = capacityAt(x, side, f.moment);
        const shear = Math.abs(f.shear);
        record?.(x, shear, cap, checked(x));
        if (checked(x)) consider({ position: x, shear, sectionId: cap.sectionId, direction: cap.direction, nominal: cap.nominal, design: cap.design, supportFace: false });
        if (cap.supportLimit && supportsAt.includes(x)) consider({ position: x, shear, sectionId: cap.sectionId, direction: cap.direction, nominal: cap.supportLimit.nominal, design: cap.supportLimit.design, supportFace: true });
      }
    }
    return { nominal: nominal!, design: design! };
  };

  // --- factored combinations (the envelope) ---------------------------------------------------------------
  const elasticZones: ElasticZone[] = zones.map((z) => ({ from: z.from, to: z.to, sectionId: z.definition.id, stiffness: z.analysis.codeModulus * (z.analysis.elastic?.grossInertia ?? 0) }));
  let f: Best | null = null;
  let governingCombination = '';
  // The diagram is the envelope: the largest |V| of any combination at each station and side, with
  // the smaller capacity where the combinations bend the section in different senses.
  const trace = { x: [] as number[], factored: [] as number[], nominal: [] as number[], design: [] as number[], checked: [] as boolean[], sectionIds: [] as string[] };
  input.combinations.forEach((c, k) => {
    const factoredLoads = combinedLoads(sets, c.factors);
    const factoredEnds = elasticSupportMoments(member, elasticZones, factoredLoads, segments);
    let i = 0;
    const design = scan((x, side) => memberForcesAt(member.supports, span, factoredLoads, factoredEnds, x, side), (x, shear, cap, isChecked) => {
      if (k === 0) {
        trace.x.push(x);
        trace.factored.push(shear);
        trace.nominal.push(cap.nominal);
        trace.design.push(cap.design);
        trace.checked.push(isChecked);
        trace.sectionIds.push(cap.sectionId);
      } else {
        trace.factored[i] = Math.max(trace.factored[i]!, shear);
        trace.nominal[i] = Math.min(trace.nominal[i]!, cap.nominal);
        trace.design[i] = Math.min(trace.design[i]!, cap.design);
      }
      i++;
    }).design;
    if (!f || exceedsBeyondRounding(design.ratio, f.ratio)) {
      f = design;
      governingCombination = combinationText(c);
    }
  });
  let mechanismTrace: number[] | null = null;
  const factored = f ? { combination: governingCombination, governing: stripRatio(f), utilisation: Math.min((f as Best).ratio, 99.99), pass: (f as Best).ratio <= 1 } : null;

  // --- mechanism ------------------------------------------------------------------------------------------
  const hinge = zones.map((z) => hingeMoments(z, gamma));
  const overstrengthBasis = `hinge moments = ${gamma.toFixed(2)} × the peak moment of each section's moment–curvature curve (steel law to its ultimate stress fu)`;
  const noHardening = zones.some((z) => {
    const model = z.analysis.model;
    if (!model) return false;
    return (['sagging', 'hogging'] as const).some((dir) => {
      const main = tensionSteel(model, dir).reduce<DiscreteElement | undefined>((a, b) => (!a || b.area > a.area ? b : a), undefined);
      const law = main?.material as { yieldStress?: number; ultimateStress?: number } | undefined;
      return law?.yieldStress !== undefined && law.ultimateStress !== undefined && law.ultimateStress <= law.yieldStress * 1.0001;
    });
  });
  if (noHardening) {
    warnings.push('The main tension steel has no strain hardening (fu = fy): the flexural overstrength at the mechanism is only what the curve holds (ACI 318-19 18.6.5.1 would use 1.25 fy); consider a hardening law or measured fu.');
  }
  const patternTotal = totalLoad(pattern);
  let mechanism: ShearResult['mechanism'] = null;
  let governs: ShearResult['governs'] = 'undetermined';
  let shearFailureLoadFactor: number | null = null;
  let mechanismNote = '';
  if (!(Math.abs(patternTotal) > 0)) {
    mechanismNote = 'no load pattern to scale (no live load for a live-only pattern)';
  } else {
    const hingeAt = (x: number, side: 'left' | 'right') => hinge[zoneAt(x, side)]!;
    const ends = {
      left: member.supports === 'fixed-fixed' || member.supports === 'propped-cantilever' ? -hingeAt(0, 'right').hogging : 0,
      right: member.supports === 'fixed-fixed' ? -hingeAt(span, 'left').hogging : 0,
    };
    // λ: smallest factor bringing a section to its hinge moment (span sections; for determinate
    // members every section in either sense).
    let lambda = Infinity;
    let hingeX = 0;
    let hingeDir: BendingDirection = 'sagging';
    const indeterminate = member.supports === 'fixed-fixed' || member.supports === 'propped-cantilever';
    for (const x of stations) {
      for (const side of ['left', 'right'] as const) {
        if ((x === 0 && side === 'left') || (x === span && side === 'right')) continue;
        if (indeterminate && (x === 0 || (member.supports === 'fixed-fixed' && x === span))) continue;
        const a = releasedMoment(member.supports, span, constant, x) + (member.supports === 'cantilever' ? 0 : ends.left * (1 - x / span) + (ends.right * x) / span);
        const b = releasedMoment(member.supports, span, pattern, x);
        const h = hingeAt(x, side);
        if (b > 1e-9) {
          const l = (h.sagging - a) / b;
          if (l < lambda) {
            lambda = l;
            hingeX = x;
            hingeDir = 'sagging';
          }
        } else if (b < -1e-9 && !indeterminate) {
          const l = (-h.hogging - a) / b;
          if (l < lambda) {
            lambda = l;
            hingeX = x;
            hingeDir = 'hogging';
          }
        }
      }
    }
    if (!Number.isFinite(lambda)) {
      mechanismNote = 'the load pattern brings no section to its flexural capacity';
    } else if (!(lambda > 0)) {
      mechanismNote = 'the constant (dead) load alone exceeds the flexural capacity';
      warnings.push('The dead load alone exceeds the flexural capacity at the mechanism: no shear demand at the mechanism can be formed.');
    } else {
      const loads = [...constant, ...pattern.map((l) => scaleLoad(l, lambda))];
      const forces = (x: number, side: 'left' | 'right') => memberForcesAt(member.supports, span, loads, ends, x, side);
      const shears: number[] = [];
      const { nominal, design } = scan(forces, (_x, shear) => shears.push(shear));
      mechanismTrace = shears;
      // Hogging moments beyond the hinge capacity elsewhere mean another mechanism would form first.
      for (const x of stations) {
        const mx = forces(x, 'right').moment;
        if (mx < 0 && -mx > hingeAt(x, 'right').hogging * 1.001 && x > 0 && x < span) {
          warnings.push(phrase`At the assumed mechanism the hogging moment at ${q('spanLength', x)} exceeds that section's capacity: the true mechanism differs and its shear may be higher.`);
          break;
        }
      }
      const hinges: { position: number; direction: BendingDirection; moment: number }[] = [];
      if (ends.left !== 0) hinges.push({ position: 0, direction: 'hogging', moment: -ends.left });
      if (ends.right !== 0) hinges.push({ position: span, direction: 'hogging', moment: -ends.right });
      hinges.push({ position: hingeX, direction: hingeDir, moment: Math.abs(forces(hingeX, 'right').moment) });
      mechanism = {
        overstrengthFactor: gamma,
        overstrengthBasis,
        hinges,
        loadFactor: lambda,
        totalLoad: totalLoad(loads),
        governing: stripRatio(nominal),
        nominalRatio: Math.min(nominal.ratio, 99.99),
        designRatio: Math.min(design.ratio, 99.99),
      };
      governs = nominal.ratio > 1 ? 'shear' : 'flexure';
      if (governs === 'shear' && !indeterminate) {
        // V = Va + λ·Vb at every checked station: the first λ at which |V| reaches Vn.
        let first = Infinity;
        for (const x of stations) {
          if (!checked(x)) continue;
          for (const side of ['left', 'right'] as const) {
            if ((x === 0 && side === 'left') || (x === span && side === 'right')) continue;
            const va = memberForcesAt(member.supports, span, constant, { left: 0, right: 0 }, x, side);
            const vb = memberForcesAt(member.supports, span, pattern, { left: 0, right: 0 }, x, side);
            const { cap } = capacityAt(x, side, va.moment + lambda * vb.moment);
            for (const target of [cap.nominal, -cap.nominal]) {
              if (Math.abs(vb.shear) < 1e-12) continue;
              const l = (target - va.shear) / vb.shear;
              if (l > 0 && l < first) first = l;
            }
          }
        }
        shearFailureLoadFactor = Number.isFinite(first) ? first : null;
      }
    }
  }

  // --- sentence ---------------------------------------------------------------------------------------------
  const factoredText = factored
    ? phrase`factored shear check ${factored.pass ? 'passes' : 'fails'} (utilisation ${factored.utilisation.toFixed(2)} at ${q('spanLength', factored.governing.position)} under ${factored.combination})`
    : 'no factored combination';
  const capName = code === 'ACI 318-19' ? 'Vn' : 'VRk (γ = 1)';
  const designName = code === 'ACI 318-19' ? 'φVn' : 'VRd';
  let sentence: Text;
  if (mechanism && governs === 'shear') {
    const g = mechanism.governing;
    const at = shearFailureLoadFactor !== null ? `, reached at about ${(shearFailureLoadFactor / mechanism.loadFactor).toFixed(2)} × the flexural collapse load` : '';
    sentence = phrase`shear governs (brittle): at the flexural mechanism the shear would reach ${q('force', g.shear)} at ${q('spanLength', g.position)}, above ${capName} = ${q('force', g.nominal)} (ratio ${mechanism.nominalRatio.toFixed(2)})${at}, so the ductility and plastic hinge rotations are not available; ${factoredText}`;
  } else if (mechanism) {
    const g = mechanism.governing;
    const margin = mechanism.designRatio > 1 ? phrase`, though above ${designName} = ${q('force', g.design)} (capacity-design ratio ${mechanism.designRatio.toFixed(2)})` : '';
    sentence = phrase`shear: flexure governs — at the flexural mechanism the shear reaches ${q('force', g.shear)} at ${q('spanLength', g.position)} against ${capName} = ${q('force', g.nominal)} (ratio ${mechanism.nominalRatio.toFixed(2)})${margin}; ${factoredText}`;
  } else {
    sentence = phrase`shear: ${factoredText}; failure mode not determined (${mechanismNote})`;
  }
  return {
    code,
    capacities,
    factored,
    mechanism,
    governs,
    shearFailureLoadFactor,
    flexuralDuctilityAvailable: governs !== 'shear',
    sentence,
    criticalSectionRule,
    diagram: { ...trace, mechanism: mechanismTrace },
    warnings,
  };
}

function stripRatio(p: ShearDemandPoint & { ratio: number }): ShearDemandPoint {
  return { position: p.position, shear: p.shear, sectionId: p.sectionId, direction: p.direction, nominal: p.nominal, design: p.design, supportFace: p.supportFace };
}
