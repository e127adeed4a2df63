/**
 * Code checks of a strengthening method, per scheme, beside the strength, deflection and shear
 * checks every variant gets:
 *
 *  - strengthening limit (bonded FRP and plates): the beam without its strengthening under
 *    1.1 SD + 0.75 LL — ACI 440.2R-17 9.2, Eq. (9.2) (from memory), the check scheme.ts builds;
 *  - FRP debonding: the factored moment Mu within the strengthened design resistance φMn, which
 *    limits the FRP strain to εfd = 0.41√(f′c/(n·Ef·tf)) ≤ 0.9εfu (ACI 440.2R-17 Eq. 10.1.1,
 *    10.2.10) — so the FRP stays below its debonding strain under Mu. This is the strengthened
 *    beam's own flexural check (flexure.ts: every station, every combination) read in the zones
 *    and sense the FRP acts in, not a second check;
 *  - service stresses under the service load D + SD + L by the cracked elastic section with the
 *    substrate strain at bonding (ACI 440.2R-17 10.2.8, Eq. 10.2.8.2a, from memory):
 *      κ = [Ms + Σ εbi·Ef·Af·(df − kd/3)] / Σ E·A·(d − kd/3)(d − kd) over the tension steel, FRP
 *      and plate, kd of the cracked transformed strengthened section at the code modulus Ec;
 *      fs = Es·κ·(d − kd) ≤ 0.80 fy, fc = Ec·κ·kd ≤ 0.45 f′c (10.2.8); under EN 1992-1-1 the
 *      limits of 7.2: σs ≤ 0.8 fyk (7.2(5)), σc ≤ 0.6 fck (7.2(2), characteristic combination)
 *      (from memory);
 *  - FRP creep rupture: ff = Ef·(κ(df − kd) − εbi) under the sustained load D + SD + ψL at most
 *    0.20 ffu (ACI 440.2R-17 10.2.9, Table 10.2.9, from memory: glass 0.20, aramid 0.30, carbon
 *    0.55 ffu). The FRP material names no fibre type, so the strictest limit is used.
 *
 * A steel plate gets the service-stress checks (its own stress against 0.80 fy, by analogy with
 * 10.2.8); a new concrete layer the service stresses only (its method — interface shear — is not
 * modelled, see docs/retrofit.md), the layer transformed at the beam's Ec.
 *
 * Units: moments N·mm, stresses MPa, strains dimensionless (tension positive in the checks).
 */
import type { CodeBasis } from '../materials/specs.ts';
import type { MaterialLibrary } from '../materials/library.ts';
import type { SteelMaterial } from '../materials/types.ts';
import type { FrpDesign, StrengtheningScheme } from '../retrofit/types.ts';
import type { SectionAnalysis } from '../section/analyze.ts';
import { elasticProperties } from '../section/elastic.ts';
import type { BendingDirection, DiscreteElement } from '../section/model.ts';
import { phrase, q } from '../units/phrase.ts';
import { largestZoneMoment } from './demand.ts';
import type { LossOfStrengtheningCheck, StrengthPoint, StrengtheningCheck } from './results.ts';
import type { Setup, VariantRun } from './variant.ts';

/** Limits of the service and creep-rupture checks (ratios of the strength they apply to). */
export const SERVICE_LIMITS = {
  /** ACI 440.2R-17 10.2.8 (from memory): fs,s ≤ 0.80 fy, fc,s ≤ 0.45 f′c. */
  aci: { steel: 0.8, concrete: 0.45, steelClause: 'ACI 440.2R-17 10.2.8', concreteClause: 'ACI 440.2R-17 10.2.8' },
  /** EN 1992-1-1 7.2(5) σs ≤ 0.8 fyk and 7.2(2) σc ≤ 0.6 fck (characteristic combination) (from memory). */
  en: { steel: 0.8, concrete: 0.6, steelClause: 'EN 1992-1-1 7.2(5)', concreteClause: 'EN 1992-1-1 7.2(2)' },
} as const;
/** ACI 440.2R-17 Table 10.2.9 (from memory): sustained-plus-cyclic stress limit of glass FRP, the strictest of the fibre types. */
export const FRP_CREEP_RUPTURE_LIMIT = 0.2;

export interface StrengtheningCheckInput {
  readonly setup: Setup;
  readonly scheme: StrengtheningScheme;
  /** The strengthened beam as analysed, and the materials its sections were built with. */
  readonly run: VariantRun;
  readonly materials: MaterialLibrary;
  /** Library section ids the scheme strengthens → the scheme's section ids. */
  readonly sections: ReadonlyMap<string, string>;
  readonly frp: FrpDesign | null;
  readonly lossOfStrengthening: LossOfStrengtheningCheck | null;
  /** Sustained part of the live load ψ (the member's service settings). */
  readonly sustainedLiveFraction: number;
}

/** Stresses of a cracked elastic section under a moment (MPa, tension positive for steel and FRP, compression positive for concrete). */
export interface CrackedServiceStresses {
  /** Neutral axis depth from the compression face, mm, and the curvature, 1/mm. */
  readonly neutralAxisDepth: number;
  readonly curvature: number;
  readonly concrete: number;
  readonly elements: readonly { readonly element: DiscreteElement; readonly stress: number }[];
}

/**
 * ACI 440.2R-17 10.2.8 (Eq. 10.2.8.2a generalised to every tension element, from memory): the
 * stresses of the cracked elastic section (kd of the cracked transformed section at Ec) under a
 * moment `moment` (N·mm magnitude), bonded elements (FRP, plate) strained from the substrate strain
 * at bonding (their initialStrain, compression positive). Null without tension elements.
 * @param ec the concrete modulus the code uses, MPa
 */
export function crackedServiceStresses(analysis: SectionAnalysis, direction: BendingDirection, moment: number, ec: number): CrackedServiceStresses | null {
  const model = analysis.model;
  if (!model || !(ec > 0)) return null;
  const cracked = elasticProperties(model, { concreteModulus: ec }).cracked[direction];
  if (!cracked) return null;
  const kd = cracked.neutralAxisDepth;
  const depth = (e: DiscreteElement) => (direction === 'sagging' ? e.depth : model.height - e.depth);
  const tension = model.elements.filter((e) => depth(e) > kd);
  let numerator = moment;
  let denominator = 0;
  for (const e of tension) {
    const d = depth(e);
    const es = e.material.initialModulus;
    // εbi: the substrate's tensile strain at bonding (initialStrain is compression positive).
    const bonding = e.kind === 'frp' || e.kind === 'plate' ? Math.max(0, -e.initialStrain) : 0;
    numerator += bonding * es * e.area * (d - kd / 3);
    denominator += es * e.area * (d - kd / 3) * (d - kd);
  }
  if (!(denominator > 0)) return null;
  const curvature = numerator / denominator;
  return {
    neutralAxisDepth: kd,
    curvature,
    concrete: ec * curvature * kd,
    elements: tension.map((e) => {
      const bonding = e.kind === 'frp' || e.kind === 'plate' ? Math.max(0, -e.initialStrain) : 0;
      return { element: e, stress: e.material.initialModulus * (curvature * (depth(e) - kd) - bonding) };
    }),
  };
}

const ratioOf = (value: number, limit: number) => (limit > 0 ? Math.min(value / limit, 99.99) : 99.99);

/** Sections and senses the scheme acts in: a bonded item in the sense its face is in tension; a concrete layer in both. */
function sensesOf(scheme: StrengtheningScheme): BendingDirection[] {
  if (scheme.kind === 'concrete-layer') return ['sagging', 'hogging'];
  return [(scheme.face ?? 'bottom') === 'bottom' ? 'sagging' : 'hogging'];
}

/**
 * The strengthening method's code checks of one scheme (see the module comment), the worst of
 * every strengthened section and sense per check. Empty when the strengthened beam could not be
 * analysed.
 */
export function strengtheningChecks(input: StrengtheningCheckInput): StrengtheningCheck[] {
  const { setup, scheme, run, materials } = input;
  const code: CodeBasis = setup.code;
  const aci = code === 'ACI 318-19';
  const limits = aci ? SERVICE_LIMITS.aci : SERVICE_LIMITS.en;
  const checks: StrengtheningCheck[] = [];
  const keepWorst = (check: StrengtheningCheck) => {
    const i = checks.findIndex((c) => c.id === check.id);
    if (i < 0) checks.push(check);
    else if (check.ratio > checks[i]!.ratio) checks[i] = check;
  };

  if (input.lossOfStrengthening) {
    const c = input.lossOfStrengthening.check;
    checks.push({
      id: 'strengthening-limit', name: 'Strengthening limit: the beam without its strengthening carries 1.1 SD + 0.75 LL', clause: 'ACI 440.2R-17 9.2, Eq. (9.2)',
      quantity: 'ratio', value: c.utilisation, limit: 1, ratio: c.utilisation, pass: c.pass,
      note: phrase`utilisation of the unstrengthened beam ${c.utilisation.toFixed(2)} at ${q('spanLength', c.position)}`,
    });
  }
  if (run.result.status === 'input-error') return checks;

  const service = { dead: 1, superimposed: 1, live: 1 };
  const sustained = { dead: 1, superimposed: 1, live: input.sustainedLiveFraction };
  for (const [baseId, sectionId] of input.sections) {
    const analysis = run.analyses.get(sectionId);
    if (!analysis?.model) continue;
    const definition = run.definitions.get(sectionId);
    const ec = analysis.codeModulus;
    const zoneIndices = run.member.zones.map((z, i) => (z.sectionId === sectionId ? i : -1)).filter((i) => i >= 0);
    for (const direction of sensesOf(scheme)) {
      const where = (x: number) => phrase`section "${baseId}", ${direction}, at ${q('spanLength', x)}`;
      // Moments within round-off of zero (a pinned end in hogging) are no demand.
      const negligible = 1e-6 * Math.max(analysis.curves[direction]?.keyPoints.peak?.moment ?? 0, 1);

      // --- service stresses (D + SD + L), cracked elastic ------------------------------------------------
      const ms = largestZoneMoment(run.member, run.zones, service, zoneIndices, direction, setup.segments);
      const stresses = ms.moment > negligible ? crackedServiceStresses(analysis, direction, ms.moment, ec) : null;
      if (stresses) {
        const kd = q('sectionLength', stresses.neutralAxisDepth);
        for (const { element, stress } of stresses.elements) {
          if (element.kind !== 'bar' && element.kind !== 'plate') continue;
          const fy = (element.material as SteelMaterial).yieldStress;
          if (!(fy > 0)) continue;
          const value = Math.max(0, stress);
          const limit = limits.steel * fy;
          const plate = element.kind === 'plate';
          keepWorst({
            id: plate ? 'plate-service-stress' : 'steel-service-stress',
            name: plate ? `Plate stress under service load ≤ ${limits.steel} fy` : `Reinforcing steel stress under service load ≤ ${limits.steel} fy`,
            clause: plate ? `${limits.steelClause}, by analogy` : limits.steelClause,
            quantity: 'stress', value, limit, ratio: ratioOf(value, limit), pass: value <= limit,
            note: phrase`${where(ms.position)}, D + SD + L, Ms = ${q('moment', ms.moment)}, cracked elastic section (kd = ${kd}): ${element.label} at ${q('stress', value)} against ${limits.steel} × ${q('stress', fy)}`,
          });
        }
        // Concrete at the compression face: the beam's concrete, or the new layer's where it is on that face.
        const layerOnFace = scheme.kind === 'concrete-layer' && (scheme.face === 'top') === (direction === 'sagging');
        const concreteId = layerOnFace && scheme.kind === 'concrete-layer' ? scheme.concreteId : definition?.concreteId;
        const fc = concreteId ? materials.concreteSpec(concreteId)?.strength : undefined;
        if (fc !== undefined && fc > 0) {
          const limit = limits.concrete * fc;
          keepWorst({
            id: 'concrete-service-stress', name: `Concrete stress under service load ≤ ${limits.concrete} ${aci ? 'f′c' : 'fck'}`, clause: limits.concreteClause,
            quantity: 'stress', value: stresses.concrete, limit, ratio: ratioOf(stresses.concrete, limit), pass: stresses.concrete <= limit,
            note: phrase`${where(ms.position)}, D + SD + L, Ms = ${q('moment', ms.moment)}: ${layerOnFace ? 'the new layer' : 'the beam'}'s concrete at the compression face ${q('concreteStress', stresses.concrete)} against ${limits.concrete} × ${q('concreteStress', fc)} (Ec = ${q('modulus', ec)})`,
          });
        }
      }

      // --- FRP: debonding (Mu within φMn with εfe ≤ εfd), creep rupture under sustained load ---------------
      if (scheme.kind !== 'frp' || !input.frp) continue;
      const design = input.frp;
      // The strengthened beam's flexural check (flexure.ts) in the zones of this section and sense.
      const points = zoneIndices.map((i) => run.result.strength?.zones[i]?.[direction]).filter((p): p is StrengthPoint => p !== null && p !== undefined && p.demand > negligible);
      const mu = points.reduce<StrengthPoint | null>((w, p) => (!w || p.utilisation > w.utilisation ? p : w), null);
      if (mu) {
        const limitName = design.limitCause === 'frp-debonding' ? 'εfd' : '0.9εfu';
        keepWorst({
          id: 'frp-debonding', name: `Factored moment within the design resistance with the FRP strain limited to ${limitName}`, clause: 'ACI 440.2R-17 Eq. (10.1.1), 10.2.10',
          quantity: 'ratio', value: mu.utilisation, limit: 1, ratio: mu.utilisation, pass: mu.utilisation <= 1,
          note: phrase`${where(mu.position)}, ${mu.combination}: Mu = ${q('moment', mu.demand)} against ${aci ? 'φMn' : 'M_Rd'} = ${mu.resistance !== null ? q('moment', mu.resistance) : '—'} with εfe ≤ ${design.limitStrain.toExponential(3)} (${design.limitCause === 'frp-debonding' ? 'debonding' : 'rupture'} governs)`,
        });
      }
      const msus = largestZoneMoment(run.member, run.zones, sustained, zoneIndices, direction, setup.segments);
      const sus = msus.moment > negligible ? crackedServiceStresses(analysis, direction, msus.moment, ec) : null;
      const frpStress = sus?.elements.find((e) => e.element.kind === 'frp')?.stress;
      if (frpStress !== undefined) {
        const ffu = design.tensileModulus * design.designRuptureStrain;
        const value = Math.max(0, frpStress);
        const limit = FRP_CREEP_RUPTURE_LIMIT * ffu;
        keepWorst({
          id: 'frp-creep-rupture', name: `FRP stress under sustained load ≤ ${FRP_CREEP_RUPTURE_LIMIT} ffu`, clause: 'ACI 440.2R-17 10.2.9, Table 10.2.9',
          quantity: 'stress', value, limit, ratio: ratioOf(value, limit), pass: value <= limit,
          note: phrase`${where(msus.position)}, D + SD + ${input.sustainedLiveFraction.toFixed(2)}L, M = ${q('moment', msus.moment)}: ff,s = ${q('stress', value)} against ${FRP_CREEP_RUPTURE_LIMIT} × ffu = ${q('stress', limit)} (the limit for glass fibre, the strictest of Table 10.2.9: the FRP material does not name its fibre; carbon allows 0.55 ffu)`,
        });
      }
    }
  }
  const order: StrengtheningCheck['id'][] = ['strengthening-limit', 'frp-debonding', 'steel-service-stress', 'plate-service-stress', 'concrete-service-stress', 'frp-creep-rupture'];
  return checks.sort((a, b) => order.indexOf(a.id) - order.indexOf(b.id));
}
