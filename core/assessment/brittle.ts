/**
 * Is the member brittle? A member whose checks pass can still fail without warning; then it is
 * never "ok" and its ductility and hinge rotations are not available. The findings, each for a
 * section in one bending sense:
 *  - shear before flexure: the shear at the flexural mechanism exceeds the nominal shear strength
 *    (shear.ts) — for the member as a whole;
 *  - cracking moment at or above the strength: on the section's moment–curvature curve the
 *    cracking moment is not exceeded once the tension steel has yielded (or, when it never yields,
 *    at the end of the curve): the section fails as it cracks. A rise right after cracking that only
 *    tension stiffening carries does not count — it is lost as the cracks open;
 *  - less than the minimum tension steel: ACI 318-19 9.6.1.2, As,min = max(0.25√f′c, 1.4)·bw·d/fy
 *    (MPa), with bw the lesser of bf and 2bw for a statically determinate beam with its flange in
 *    tension (from memory: the rule of ACI 318-11 10.5.2, kept in 9.6.1.2), unless the steel
 *    provided is a third more than the analysis needs (9.6.1.3, taken as a utilisation of at most
 *    0.75: then As,required ≤ 0.75·As as Mn grows less than in proportion to As); or EN 1992-1-1
 *    9.2.1.1(1) Eq. (9.1N), As,min = max(0.26·fctm/fyk, 0.0013)·bt·d, bt the web width with the
 *    flange in compression and the mean width of the tension zone (gross centroid to tension face)
 *    with a flange in tension;
 *  - strength before yield: the curve ends before the tension steel yields (over-reinforced, or an
 *    FRP limit first), or at the code's design strength the tension steel has not yielded (ACI
 *    318-19 21.2.2 compression-controlled, εt ≤ εty; EN 1992-1-1 εs < fyd/Es);
 *  - under ACI 318-19, a net tensile strain below 0.004 at the design strength (9.3.3.1: the least
 *    a nonprestressed beam may have) — the transition zone, little warning before failure.
 *
 * Where each applies: the code findings (εt) wherever the factored demand has that sense in the
 * zone. The findings about cracking (the first three) where the section cracks in that sense before
 * the member's ultimate: its moment in the member's ultimate state (the member engine's moment
 * distribution at the largest load) reaches 95 % of its cracking moment. A section that stays
 * uncracked in a sense — top hanger bars of a span zone, say — cannot fail as it cracks there
 * (common practice, no source; 95 %: a margin for the engine's discretisation). Without a member
 * ultimate state every zone with demand counts.
 * Units: N, mm, N·mm, MPa.
 */
import { en1992MeanTensileStrength } from '../materials/code/en1992.ts';
import type { CodeBasis, ConcreteSpec } from '../materials/specs.ts';
import { diagnostic, type Diagnostic } from '../diagnostics.ts';
import type { BeamDefinition, SupportType } from '../member/definition.ts';
import type { BendingDirection, SectionModel } from '../section/model.ts';
import { steelYieldStress, tensionSteel } from '../section/model.ts';
import { faces } from '../section/state.ts';
import { crackingStrength, yieldsBeforeEnd } from '../section/cracking-strength.ts';
import { stripWidthAt } from '../section/width-profile.ts';
import { phrase, q, type Text } from '../units/phrase.ts';
import type { BrittleFinding, StrengthCheck } from './results.ts';
import type { ShearResult } from './shear.ts';
import { flexuralDesignResistance } from './resistance.ts';
import { shearSectionGeometry, type ShearZone } from './shear-section.ts';

/** ACI 318-19 9.3.3.1: least net tensile strain of a nonprestressed beam at its design strength. */
export const ACI_BEAM_STRAIN_LIMIT = 0.004;

/** ACI 318-19 9.6.1.3: no minimum where the steel provided is a third more than needed, taken as a utilisation ≤ 0.75 (see the module comment). */
export const ACI_MINIMUM_STEEL_EXEMPT_UTILISATION = 0.75;

/** Fraction of the cracking moment the section's ultimate-state moment must reach to count as cracked. */
const CRACKED_FRACTION = 0.95;

/**
 * Minimum tension steel of a beam section, mm² (see the module comment) — the one formula: the
 * verdicts' brittle finding and the validation warning both call it.
 *
 * The concrete strength it reads: the measured mean where the concrete has one (an as-found
 * concrete from cores), else the specified strength. The rule keeps a section from failing as it
 * cracks, and a stronger concrete cracks at a higher moment; the lower fractile the code checks
 * use would lower the minimum (unsafe), so this one check reads the mean (issue 11 item 3;
 * our reasoning, no source). Under EN fctm is then that of fck = fcm − 8 (Table 3.1).
 * @param concrete the concrete spec's `strength` (f′c / fck) and `meanStrength` (MPa)
 * @param steelYield fy / fyk of the main tension bars, MPa
 * @param width bw (ACI) or bt (EN), mm; @param effectiveDepth d, mm
 */
export function minimumTensionSteel(code: CodeBasis, concrete: Pick<ConcreteSpec, 'strength' | 'meanStrength'>, steelYield: number, width: number, effectiveDepth: number): { area: number; clause: string } {
  if (code === 'ACI 318-19') {
    const fc = concrete.meanStrength ?? concrete.strength;
    return { area: (Math.max(0.25 * Math.sqrt(fc), 1.4) * width * effectiveDepth) / steelYield, clause: 'ACI 318-19 9.6.1.2' };
  }
  const fck = concrete.meanStrength !== undefined ? concrete.meanStrength - 8 : concrete.strength;
  return { area: Math.max((0.26 * en1992MeanTensileStrength(fck)) / steelYield, 0.0013) * width * effectiveDepth, clause: 'EN 1992-1-1 9.2.1.1(1), Eq. (9.1N)' };
}

/** A face with less tension steel than the minimum: the areas (mm²), the clause and the width and depth used (mm). */
export interface MinimumSteelShortfall {
  readonly area: number;
  readonly minimum: number;
  readonly clause: string;
  readonly widthRule: string;
  readonly width: number;
  readonly effectiveDepth: number;
}

/**
 * Whether the tension face of a section in one sense has less steel than the minimum (null when it
 * has enough, or has no tension bars — a section without bars is `no-tension-steel`).
 */
export function minimumSteelShortfall(code: CodeBasis, supports: SupportType, model: SectionModel, direction: BendingDirection, concrete: Pick<ConcreteSpec, 'strength' | 'meanStrength'>): MinimumSteelShortfall | null {
  const steel = tensionSteel(model, direction);
  const main = steel.reduce<(typeof steel)[number] | undefined>((m, e) => (!m || e.area > m.area ? e : m), undefined);
  const fy = main ? steelYieldStress(main) : undefined;
  const geometry = shearSectionGeometry(model, direction);
  if (!geometry.hasTensionBars || fy === undefined) return null;
  const width = minimumSteelWidth(code, supports, model, direction, geometry.webWidth);
  const min = minimumTensionSteel(code, concrete, fy, width.width, geometry.effectiveDepth);
  if (!(geometry.tensionBarArea < min.area * (1 - 1e-9))) return null;
  return { area: geometry.tensionBarArea, minimum: min.area, clause: min.clause, widthRule: width.how, width: width.width, effectiveDepth: geometry.effectiveDepth };
}

/** The words of a shortfall: "tension steel A is less than the minimum B (clause; width rule = b, d = d)". */
export function shortfallText(s: MinimumSteelShortfall): Text {
  return phrase`tension steel ${q('area', s.area)} is less than the minimum ${q('area', s.minimum)} (${s.clause}; ${s.widthRule} = ${q('sectionLength', s.width)}, d = ${q('sectionLength', s.effectiveDepth)})`;
}

/** Concrete width of the model at depth y, mm. */
function widthAt(model: SectionModel, y: number): number {
  let w = 0;
  for (const part of model.concreteParts) for (const s of part.strips) if (y >= s.top && y <= s.bottom) w += Math.max(0, stripWidthAt(s, y));
  return w;
}

/** Mean concrete width between depths a and b, mm (the area of that band over its height). */
function meanWidth(model: SectionModel, a: number, b: number): number {
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  let area = 0;
  for (const part of model.concreteParts) {
    for (const s of part.strips) {
      const top = Math.max(lo, s.top);
      const bottom = Math.min(hi, s.bottom);
      if (bottom > top) area += 0.5 * (stripWidthAt(s, top) + stripWidthAt(s, bottom)) * (bottom - top);
    }
  }
  return hi > lo ? area / (hi - lo) : 0;
}

/** The width the minimum-steel rule uses (see the module comment), with how it was taken. */
function minimumSteelWidth(code: CodeBasis, supports: SupportType, model: SectionModel, direction: BendingDirection, webWidth: number): { width: number; how: string } {
  const face = faces(model, direction);
  // Just inside the tension face: the width of the flange when the flange is in tension.
  const inside = face.tension + (direction === 'sagging' ? -1e-6 : 1e-6) * model.height;
  const flange = widthAt(model, inside);
  if (!(flange > webWidth * (1 + 1e-9))) return { width: webWidth, how: 'bw' };
  if (code === 'ACI 318-19') {
    const determinate = supports === 'simply-supported' || supports === 'cantilever';
    return determinate ? { width: Math.min(flange, 2 * webWidth), how: 'lesser of bf and 2bw, flange in tension' } : { width: webWidth, how: 'bw' };
  }
  return { width: meanWidth(model, model.centroidDepth, face.tension), how: 'bt, mean width of the tension zone' };
}

/** Where the section is used and how hard: the largest demand of the sense in the zone and its moment at the member's ultimate. */
interface Use {
  /** Largest factored utilisation of the sense in the zones using the section (strength check). */
  readonly utilisation: number;
  /** Largest moment of the sense in those zones in the member's ultimate state, N·mm (null: not known). */
  readonly ultimateMoment: number | null;
}

/** The findings for one section in one sense (empty when it is ductile). */
function sectionFindings(codeBasis: CodeBasis, supports: SupportType, zone: ShearZone, direction: BendingDirection, use: Use): BrittleFinding[] {
  const a = zone.analysis;
  const model = a.model;
  if (!model) return [];
  const curve = a.curves[direction];
  const out: BrittleFinding[] = [];
  const at = phrase`section "${a.sectionName}", ${direction}`;
  const find = (cause: BrittleFinding['cause'], text: Text) => out.push({ cause, sectionId: a.sectionId, direction, text: phrase`${at}: ${text}` });
  const kp = curve?.keyPoints;
  const cracking = kp?.cracking;
  const cracks = use.ultimateMoment === null || !cracking || use.ultimateMoment >= CRACKED_FRACTION * cracking.moment;

  // Findings of the section's own curve.
  if (curve && kp && curve.status.kind === 'complete' && cracks) {
    const strength = crackingStrength(curve);
    const yields = yieldsBeforeEnd(curve);
    if (strength?.failsAsItCracks) {
      const largest = strength.beforeYield > kp.cracking!.moment * (1 + 1e-9) ? 'the largest moment before its tension steel yields' : 'the cracking moment';
      find('cracking-above-strength', phrase`${largest} ${q('moment', strength.beforeYield)} is at or above what the section carries once ${yields ? 'its tension steel yields' : 'it is cracked'}, ${q('moment', strength.afterYield)}: the section fails as it cracks`);
    }
    if (!yields && out.length === 0) {
      const cause = curve.status.ultimateCause;
      const frp = cause === 'frp-debonding' || cause === 'frp-rupture';
      find('no-yield-before-strength', phrase`the section reaches its ultimate state (${frp ? 'FRP limit' : cause.replace(/-/g, ' ')}) before its tension steel yields${frp ? '' : ' (over-reinforced)'}`);
    }
  }

  // Findings of the code's design state (wherever the sense carries demand).
  const code = flexuralDesignResistance(codeBasis, a, direction);
  const epsT = code.netTensileStrain;
  const epsY = code.steelYieldStrain;
  if (epsT !== null && epsY !== null && !out.some((f) => f.cause === 'no-yield-before-strength')) {
    const permille = (x: number) => `${(x * 1000).toFixed(2)} ‰`;
    if (epsT <= epsY) {
      const clause = codeBasis === 'ACI 318-19' ? 'compression-controlled, ACI 318-19 21.2.2' : 'EN 1992-1-1 3.2.7, εyd = fyd/Es';
      find('no-yield-before-strength', `at the design strength the tension steel has not yielded (ε = ${permille(epsT)} against ${permille(epsY)}; ${clause}): over-reinforced`);
    } else if (codeBasis === 'ACI 318-19' && epsT < ACI_BEAM_STRAIN_LIMIT) {
      find('below-strain-limit', `at the design strength the net tensile strain εt = ${permille(epsT)} is below the 4.00 ‰ ACI 318-19 9.3.3.1 requires of a beam: little warning before failure`);
    }
  }

  // Minimum tension steel.
  const exempt = codeBasis === 'ACI 318-19' && use.utilisation <= ACI_MINIMUM_STEEL_EXEMPT_UTILISATION;
  const shortfall = cracks && !exempt ? minimumSteelShortfall(codeBasis, supports, model, direction, zone.concrete) : null;
  if (shortfall) find('below-minimum-steel', shortfallText(shortfall));
  return out;
}

/** Moment distributions of an analysis to failure (a member's BeamResult, a continuous beam's capacity result): x mm, moment N·mm. */
export interface UltimateSource {
  readonly distributions: readonly { readonly loadFactor: number; readonly x: readonly number[]; readonly moment: readonly number[] }[];
}

/** The engine's moment distribution in its ultimate state (the largest load), or null. */
function ultimateDistribution(beam: UltimateSource | null): UltimateSource['distributions'][number] | null {
  if (!beam) return null;
  return beam.distributions.reduce<UltimateSource['distributions'][number] | null>((best, d) => (d.moment.length > 0 && (!best || d.loadFactor > best.loadFactor) ? d : best), null);
}

/**
 * The finding "shear before flexure": at the flexural mechanism the shear `shear` (N) at `where`
 * exceeds the nominal shear strength `nominal` (N; ACI Vn, EN VRk with γ = 1).
 */
export function shearBeforeFlexure(code: CodeBasis, shear: number, nominal: number, where: Text): BrittleFinding {
  return {
    cause: 'shear-before-flexure',
    sectionId: null,
    direction: null,
    text: phrase`shear would be reached before the flexural mechanism: ${q('force', shear)} at ${where} against ${code === 'ACI 318-19' ? 'Vn' : 'VRk'} = ${q('force', nominal)}`,
  };
}

/**
 * Why a member is brittle (see the module comment); empty when it is not.
 * @param zones the member's zones with their sections, in zone order
 * @param strength the flexural check, whose zones tell which senses carry demand
 * @param beam the engine's result to failure (its ultimate moment distribution), or null
 */
export function brittleFindings(code: CodeBasis, supports: SupportType, zones: readonly ShearZone[], strength: StrengthCheck | null, shear: ShearResult | null, beam: UltimateSource | null): BrittleFinding[] {
  const out: BrittleFinding[] = [];
  if (shear?.governs === 'shear' && shear.mechanism) {
    const g = shear.mechanism.governing;
    out.push(shearBeforeFlexure(code, g.shear, g.nominal, phrase`${q('spanLength', g.position)}`));
  }
  if (!strength) return out;
  const ultimate = ultimateDistribution(beam);
  const ultimateMoment = (sectionId: string, direction: BendingDirection): number | null => {
    if (!ultimate) return null;
    const sign = direction === 'sagging' ? 1 : -1;
    let m = 0;
    ultimate.x.forEach((x, i) => {
      if (zones.some((z) => z.analysis.sectionId === sectionId && x >= z.from && x <= z.to)) m = Math.max(m, sign * ultimate.moment[i]!);
    });
    return m;
  };
  const seen = new Set<string>();
  strength.zones.forEach((z, i) => {
    const zone = zones[i];
    if (!zone) return;
    for (const direction of ['sagging', 'hogging'] as const) {
      if (!z[direction]) continue;
      const id = zone.analysis.sectionId;
      const key = `${id}|${direction}`;
      if (seen.has(key)) continue;
      seen.add(key);
      const utilisation = Math.max(...strength.zones.map((x, k) => (zones[k]?.analysis.sectionId === id ? x[direction]?.utilisation ?? 0 : 0)));
      out.push(...sectionFindings(code, supports, zone, direction, { utilisation, ultimateMoment: ultimateMoment(id, direction) }));
    }
  });
  return out;
}

/**
 * The critical sections of each sense under a uniform load, as fractions of the span from x = 0
 * (common practice, no source: the elastic moment of a prismatic beam — the largest sagging moment
 * at midspan, or 5/8 of the span from the fixed end of a propped cantilever; hogging at fixed ends).
 */
function criticalPoints(supports: SupportType): Record<BendingDirection, readonly number[]> {
  switch (supports) {
    case 'simply-supported': return { sagging: [0.5], hogging: [] };
    case 'cantilever': return { sagging: [], hogging: [0] };
    case 'fixed-fixed': return { sagging: [0.5], hogging: [0, 1] };
    case 'propped-cantilever': return { sagging: [0.625], hogging: [0] };
  }
}

/** One zone's section as validation built it: the model, its concrete and the section's path. */
export interface BuiltSection {
  readonly model: SectionModel;
  readonly concrete: Pick<ConcreteSpec, 'strength' | 'meanStrength'>;
  readonly name: string;
}

/**
 * Validation's warning for steel below the minimum (issue 17): before any analysis, the section of
 * each zone holding a critical section of a sense under a uniform load, in that sense, by the same rule as the
 * verdicts' brittle finding (minimumSteelShortfall). A warning, not an error: the analysis decides
 * (a face that never cracks under the member's loads, or an ACI section carrying a third more steel
 * than needed, 9.6.1.3, is not brittle), and says so in its status.
 * @param path the member's path, e.g. `members[2] "B-3"`
 */
export function minimumSteelWarnings(code: CodeBasis, member: Pick<BeamDefinition, 'supports' | 'span' | 'zones'>, path: string, sectionOf: (sectionId: string) => BuiltSection | undefined): Diagnostic[] {
  const out: Diagnostic[] = [];
  const points = criticalPoints(member.supports);
  const seen = new Set<string>();
  member.zones.forEach((zone, i) => {
    const section = sectionOf(zone.sectionId);
    if (!section || !(member.span > 0)) return;
    for (const direction of ['sagging', 'hogging'] as const) {
      const critical = points[direction].some((t) => t * member.span >= zone.from && t * member.span <= zone.to);
      const key = `${zone.sectionId}|${direction}`;
      if (!critical || seen.has(key)) continue;
      seen.add(key);
      const shortfall = minimumSteelShortfall(code, member.supports, section.model, direction, section.concrete);
      if (!shortfall) continue;
      out.push(diagnostic('out-of-range', `${path}.zones[${i}].sectionId`, 'warning',
        phrase`section "${section.name}", ${direction}: ${shortfallText(shortfall)}; where that face cracks under the loads the member is brittle (it fails as it cracks) and is never reported OK`));
    }
  });
  return out;
}
