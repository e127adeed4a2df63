/**
 * Compact results of beam variants (design, as found, strengthened) and their comparison: the
 * numbers and curve points the app and the report draw on shared charts, without full section
 * states. Also the station-by-station flexural check that every variant is compared on (with ψf on
 * FRP), and the one-sentence governing modes.
 * Units: N, mm, N·mm, 1/mm, rad.
 */
import type { CodeBasis } from '../materials/specs.ts';
import type { BeamDefinition, LoadFactors } from '../member/definition.ts';
import type { PlasticHinge } from '../member/results.ts';
import type { SectionAnalysis } from '../section/analyze.ts';
import type { BendingDirection } from '../section/model.ts';
import type { MomentCurvatureResult } from '../section/results.ts';
import { flexuralDesignResistance } from './resistance.ts';
import type { CurveSummary, FlexuralCheck, MemberResult, SchemeComparison, VariantResult } from './results.ts';
import { combinedLoads, memberLoadSets } from './combinations.ts';
import { elasticSupportMoments, type ElasticZone } from './demand.ts';
import { memberForcesAt } from '../member/statics.ts';
import type { ShearResult } from './shear.ts';
import { strengthCombination } from './combinations.ts';
import type { Setup, VariantRun } from './variant.ts';
import { capitalised, joinTexts, lowerFirst, phrase, q, withoutFinalStop, type Text } from '../units/phrase.ts';
import { OUTSIDE_SMALL_DEFLECTION, serviceOutsideRange } from '../member/small-deflection.ts';

const finite = (x: number | null | undefined): number | null => (x !== null && x !== undefined && Number.isFinite(x) ? x : null);

/** A compact curve with its design resistance. */
export function curveSummary(code: CodeBasis, analysis: SectionAnalysis, curve: MomentCurvatureResult): CurveSummary {
  const resistance = flexuralDesignResistance(code, analysis, curve.direction);
  const kp = curve.keyPoints;
  return {
    direction: curve.direction,
    points: curve.points.map((p) => ({ curvature: p.curvature, moment: p.moment })),
    keyPoints: Object.values(kp).filter((k) => k !== undefined).map((k) => ({ name: k!.name, curvature: k!.curvature, moment: k!.moment, description: k!.description })),
    ultimateCause: curve.status.kind === 'complete' ? curve.status.ultimateCause : null,
    status: curve.status.message,
    peakMoment: finite(kp.peak?.moment),
    firstYieldMoment: finite(kp.firstYield?.moment),
    curvatureDuctility: finite(curve.curvatureDuctility),
    designResistance: finite(resistance.value),
    designResistanceNote: resistance.note,
  };
}

/**
 * Flexural check station by station: |M(x)| of an elastic analysis (gross sections, code modulus —
 * as the engine's strength check) against the design resistance of the zone and direction there
 * (flexuralDesignResistance: ψf on FRP). Null when the member has no zones to check.
 */
export function flexuralCheck(code: CodeBasis, member: BeamDefinition, zones: readonly { from: number; to: number; analysis: SectionAnalysis }[], factors: LoadFactors, combination: string, segments: number): FlexuralCheck | null {
  if (zones.length === 0 || zones.some((z) => !z.analysis.model || !z.analysis.elastic)) return null;
  const span = member.span;
  const sets = memberLoadSets(member, zones.map((z) => z.analysis.selfWeight));
  const loads = combinedLoads(sets, factors);
  const elasticZones: ElasticZone[] = zones.map((z) => ({ from: z.from, to: z.to, sectionId: z.analysis.sectionId, stiffness: z.analysis.codeModulus * z.analysis.elastic!.grossInertia }));
  const ends = elasticSupportMoments(member, elasticZones, loads, segments);
  const resist = zones.map((z) => ({ sagging: flexuralDesignResistance(code, z.analysis, 'sagging'), hogging: flexuralDesignResistance(code, z.analysis, 'hogging') }));
  const xs = new Set<number>();
  for (let i = 0; i <= segments; i++) xs.add((span * i) / segments);
  for (const z of zones) xs.add(z.from);
  for (const l of member.loads) if (l.kind === 'point') xs.add(l.position);
  let worst: FlexuralCheck | null = null;
  let worstRatio = -1;
  for (const x of [...xs].sort((a, b) => a - b)) {
    for (const side of ['left', 'right'] as const) {
      const { moment } = memberForcesAt(member.supports, span, loads, ends, x, side);
      let index = zones.findIndex((z) => (side === 'right' ? x >= z.from && x < z.to : x > z.from && x <= z.to));
      if (index < 0) index = x <= 0 ? 0 : zones.length - 1;
      const direction: BendingDirection = moment >= 0 ? 'sagging' : 'hogging';
      const r = resist[index]![direction];
      const demand = Math.abs(moment);
      const ratio = demand <= 1e-6 ? 0 : r.value && r.value > 0 ? demand / r.value : 99.99;
      if (ratio > worstRatio) {
        worstRatio = ratio;
        worst = {
          combination,
          utilisation: Math.min(ratio, 99.99),
          pass: ratio <= 1,
          position: x,
          sectionId: zones[index]!.analysis.sectionId,
          direction,
          demand,
          resistance: r.value,
          notes: phrase`${zones[index]!.analysis.sectionName}, ${direction}: ${r.note}`,
        };
      }
    }
  }
  return worst;
}

/** Joins the engine's flexural sentence and the shear sentence into one governing-mode sentence. */
export function composeGoverningMode(flexure: Text, shear: ShearResult | null, prefix = ''): Text {
  const body = withoutFinalStop(flexure);
  if (!shear) return phrase`${prefix}${body}.`;
  if (shear.governs === 'shear') return phrase`${prefix}${capitalised(shear.sentence)}; flexure (not reached first): ${lowerFirst(body)}.`;
  return phrase`${prefix}${body}; ${shear.sentence}.`;
}

/** The flexural sentence of a variant with the station-by-station strength check (ψf on FRP). */
export function variantFlexureSentence(result: MemberResult, strength: FlexuralCheck | null, pattern: 'proportional' | 'live-only'): Text {
  if (result.status === 'input-error') return result.governingMode;
  const parts: Text[] = [];
  const ultimate = result.loadDeflection.events.find((e) => e.kind === 'ultimate');
  const mu = result.ductility.displacementDuctility;
  if (ultimate && result.ductility.failureCause) {
    parts.push(`Flexure: ${result.ductility.failureCause} at ${ultimate.loadFactor.toFixed(2)} × the ${pattern === 'proportional' ? 'service load' : 'live load (dead load held)'}${mu ? `, displacement ductility μΔ = ${mu.toFixed(1)}` : ''}`);
  } else {
    parts.push(`Flexure: ${result.loadDeflection.status}`);
  }
  if (strength) parts.push(phrase`strength check ${strength.pass ? 'passes' : 'fails'} (utilisation ${strength.utilisation.toFixed(2)} at ${q('spanLength', strength.position)} under ${strength.combination})`);
  const checks = result.service?.checks ?? [];
  const fails = checks.filter((c) => !c.pass);
  if (fails.length > 0) {
    const w = fails.reduce((a, b) => (b.utilisation > a.utilisation ? b : a));
    parts.push(serviceOutsideRange(result.service, result.span) ? `deflection checks fail: ${OUTSIDE_SMALL_DEFLECTION}` : `deflection check fails: ${w.utilisation.toFixed(2)} × ℓ/${w.ratio} (${w.quantity})`);
  } else if (checks.length > 0) parts.push('deflection checks pass');
  return phrase`${joinTexts(parts, '; ')}.`;
}

/** Status of a variant from its own checks (strength with ψf, deflections, factored shear). */
export function variantStatus(result: MemberResult, strength: FlexuralCheck | null, shear: ShearResult | null): MemberResult['status'] {
  if (result.status === 'input-error' || result.status === 'not-converged') return result.status;
  const serviceFails = (result.service?.checks ?? []).some((c) => !c.pass);
  const strengthFails = strength ? !strength.pass : result.strength ? !result.strength.pass : false;
  const shearFails = shear?.factored ? !shear.factored.pass : false;
  return serviceFails || strengthFails || shearFails ? 'check-fails' : 'ok';
}

/** Compact result of a variant. */
export function compactVariant(code: CodeBasis, run: VariantRun, strength: FlexuralCheck | null, governingMode: Text): VariantResult {
  const r = run.result;
  const sectionIds = [...new Set(run.member.zones.map((z) => z.sectionId))];
  const sections = sectionIds.flatMap((id) => {
    const a = run.analyses.get(id);
    const def = run.definitions.get(id);
    if (!a || !def) return [];
    const curves = (['sagging', 'hogging'] as const).map((d) => a.curves[d]).filter((c): c is MomentCurvatureResult => c !== undefined).map((c) => curveSummary(code, a, c));
    return [{ sectionId: id, baseSectionId: run.baseOf.get(id) ?? id, sectionName: a.sectionName, definition: def, added: run.added.get(id) ?? [], curves }];
  });
  let peak: { loadFactor: number; totalLoad: number } | null = null;
  for (const p of r.loadDeflection.points) if (!peak || p.totalLoad > peak.totalLoad) peak = p;
  const available = run.shear?.flexuralDuctilityAvailable ?? true;
  return {
    key: run.key,
    label: run.label,
    status: variantStatus(r, strength, run.shear),
    governingMode,
    sections,
    loadDeflection: {
      pattern: r.loadDeflection.pattern,
      controlPosition: r.loadDeflection.controlPosition,
      points: r.loadDeflection.points.map((p) => ({ loadFactor: p.loadFactor, totalLoad: p.totalLoad, deflection: p.deflection })),
      events: r.loadDeflection.events,
    },
    capacity: {
      peakLoadFactor: finite(peak?.loadFactor),
      peakTotalLoad: finite(peak?.totalLoad),
      ultimateDeflection: finite(r.ductility.ultimateDeflection),
      failureCause: r.ductility.failureCause,
    },
    ductility: {
      available,
      note: available ? 'flexure governs: ductility and hinge rotations apply' : 'not available: shear governs before the flexural mechanism (values kept for reference only)',
      yieldDeflection: finite(r.ductility.yieldDeflection),
      ultimateDeflection: finite(r.ductility.ultimateDeflection),
      displacementDuctility: finite(r.ductility.displacementDuctility),
      hinges: r.ductility.hinges,
    },
    strength,
    deflectionChecks: r.service?.checks ?? [],
    shear: run.shear,
    warnings: r.warnings,
    errors: r.errors,
  };
}

const change = (a: number | null, b: number | null): number | null => (a !== null && b !== null && a > 0 ? ((b - a) / a) * 100 : null);

/** The hinge of a variant nearest `position` (mm) in `direction`: where the compared beam's strength check governs. */
export function criticalHinge(hinges: readonly PlasticHinge[], direction: BendingDirection, position: number): PlasticHinge | undefined {
  return hinges.filter((h) => h.direction === direction).reduce<PlasticHinge | undefined>((best, h) => (!best || Math.abs(h.position - position) < Math.abs(best.position - position) ? h : best), undefined);
}

/** How a strengthened variant compares with its reference (see SchemeComparison). */
export function compareVariants(reference: VariantResult, scheme: VariantResult, schemeLabel: string): SchemeComparison {
  const refStrength = reference.strength;
  const criticalDirection: BendingDirection = refStrength?.direction ?? 'sagging';
  const criticalPosition = refStrength?.position ?? 0;
  const baseIds = [...new Set(scheme.sections.map((s) => s.baseSectionId))];
  const moments = baseIds.flatMap((baseId) => {
    const rs = reference.sections.find((s) => s.baseSectionId === baseId);
    const ss = scheme.sections.find((s) => s.baseSectionId === baseId);
    return (['sagging', 'hogging'] as const).flatMap((direction) => {
      const rc = rs?.curves.find((c) => c.direction === direction);
      const sc = ss?.curves.find((c) => c.direction === direction);
      if (!rc && !sc) return [];
      return [{
        baseSectionId: baseId,
        direction,
        referencePeak: rc?.peakMoment ?? null,
        schemePeak: sc?.peakMoment ?? null,
        peakGainPercent: change(rc?.peakMoment ?? null, sc?.peakMoment ?? null),
        referenceDesign: rc?.designResistance ?? null,
        schemeDesign: sc?.designResistance ?? null,
        designGainPercent: change(rc?.designResistance ?? null, sc?.designResistance ?? null),
        firstYieldGainPercent: change(rc?.firstYieldMoment ?? null, sc?.firstYieldMoment ?? null),
      }];
    });
  });
  // Critical section: where the reference's strength check is most utilised.
  const criticalBase = reference.sections.find((z) => z.sectionId === refStrength?.sectionId)?.baseSectionId ?? reference.sections[0]?.baseSectionId ?? '';
  const refCurve = reference.sections.find((s) => s.baseSectionId === criticalBase)?.curves.find((c) => c.direction === criticalDirection);
  const schCurve = scheme.sections.find((s) => s.baseSectionId === criticalBase)?.curves.find((c) => c.direction === criticalDirection);
  const mu = { reference: reference.ductility.displacementDuctility, scheme: scheme.ductility.displacementDuctility };
  const phi = { reference: refCurve?.curvatureDuctility ?? null, scheme: schCurve?.curvatureDuctility ?? null };
  const refHinge = criticalHinge(reference.ductility.hinges, criticalDirection, criticalPosition);
  const schHinge = criticalHinge(scheme.ductility.hinges, criticalDirection, criticalPosition);
  const theta = { reference: finite(refHinge?.rotationCapacity), scheme: finite(schHinge?.rotationCapacity) };
  const capacity = { reference: reference.capacity.peakTotalLoad, scheme: scheme.capacity.peakTotalLoad };
  const critical = moments.find((x) => x.baseSectionId === criticalBase && x.direction === criticalDirection);

  const words: Text[] = [];
  const signed = (x: number) => `${x >= 0 ? '+' : '−'}${Math.abs(x).toFixed(0)} %`;
  if (critical?.designGainPercent !== null && critical?.designGainPercent !== undefined) {
    words.push(phrase`${schemeLabel}: design moment ${signed(critical.designGainPercent)} at section "${criticalBase}" ${criticalDirection} (${q('moment', critical.referenceDesign!)} → ${q('moment', critical.schemeDesign!)})`);
  } else {
    words.push(`${schemeLabel}:`);
  }
  const capChange = change(capacity.reference, capacity.scheme);
  if (capChange !== null) words.push(`member load capacity ${signed(capChange)}`);
  const duct = (name: string, a: number | null, b: number | null) => {
    const c = change(a, b);
    if (c === null) return null;
    if (Math.abs(c) < 2) return `${name} practically unchanged (${a!.toFixed(1)} → ${b!.toFixed(1)})`;
    return `${name} ${c < 0 ? 'falls' : 'rises'} from ${a!.toFixed(1)} to ${b!.toFixed(1)} (${signed(c)})`;
  };
  const ductWords = [duct('displacement ductility', mu.reference, mu.scheme), duct('curvature ductility', phi.reference, phi.scheme)].filter((w): w is string => w !== null);
  const lowers = [change(mu.reference, mu.scheme), change(phi.reference, phi.scheme)].some((c) => c !== null && c <= -2);
  let statement: Text = joinTexts(words, ', ');
  const loses = [critical?.designGainPercent ?? null, capChange].some((c) => c !== null && c < 0);
  if (loses) {
    const cause = schCurve?.ultimateCause;
    const frp = cause === 'frp-debonding' || cause === 'frp-rupture';
    statement = phrase`${statement}${frp
      ? `; at ultimate the scheme adds no strength: the FRP reaches its ${cause === 'frp-debonding' ? 'debonding' : 'rupture'} limit before the unstrengthened section develops its strain-hardened capacity, and past that the beam carries no more than unstrengthened`
      : '; at ultimate the scheme adds no strength'}`;
    const yieldGain = critical?.firstYieldGainPercent ?? null;
    if (yieldGain !== null && yieldGain > 0) statement = phrase`${statement} (it raises the first-yield moment by ${signed(yieldGain)})`;
  }
  if (ductWords.length > 0) statement = phrase`${statement}; ${ductWords.join(' and ')}`;
  if (lowers) statement = phrase`${statement}: the strengthening lowers the ductility`;
  if (!scheme.ductility.available) statement = phrase`${statement}; shear governs the strengthened beam, so its ductility is not available`;
  return {
    referenceKey: reference.key,
    critical: { baseSectionId: criticalBase, direction: criticalDirection },
    moments,
    memberCapacity: { reference: capacity.reference, scheme: capacity.scheme, gainPercent: capChange },
    curvatureDuctility: { reference: phi.reference, scheme: phi.scheme, changePercent: change(phi.reference, phi.scheme) },
    displacementDuctility: { reference: mu.reference, scheme: mu.scheme, changePercent: change(mu.reference, mu.scheme) },
    hingeRotation: { reference: theta.reference, scheme: theta.scheme, changePercent: change(theta.reference, theta.scheme) },
    governingMode: { reference: reference.governingMode, scheme: scheme.governingMode },
    statement: phrase`${statement}.`,
  };
}

/** The station-by-station strength check of a variant (ψf on FRP). */
export function strengthOf(setup: Setup, run: VariantRun) {
  if (run.result.status === 'input-error') return null;
  const { factors, text } = strengthCombination(run.member, setup.code);
  return flexuralCheck(setup.code, run.member, run.zones, factors, text, setup.segments);
}

/** Compact result of a run, with its sentence. */
export function compactOf(setup: Setup, run: VariantRun, prefix: string): VariantResult {
  const strength = strengthOf(setup, run);
  const sentence = composeGoverningMode(variantFlexureSentence(run.result, strength, run.member.capacity.pattern), run.shear, prefix);
  return compactVariant(setup.code, run, strength, sentence);
}
