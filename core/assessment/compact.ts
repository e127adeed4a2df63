/**
 * Compact results of beam variants (design, as found, strengthened) and their comparison: the
 * numbers and curve points the app and the report draw on shared charts, without full section
 * states. Every number comes from the variant's run (variant.ts): the checks are not repeated here.
 * Units: N, mm, N·mm, 1/mm, rad.
 */
import { serviceOutsideRange } from '../member/small-deflection.ts';
import type { CodeBasis } from '../materials/specs.ts';
import type { PlasticHinge } from '../member/results.ts';
import type { SectionAnalysis } from '../section/analyze.ts';
import type { BendingDirection } from '../section/model.ts';
import type { MomentCurvatureResult } from '../section/results.ts';
import { joinTexts, phrase, q, type Text } from '../units/phrase.ts';
import { flexuralDesignResistance } from './resistance.ts';
import type { CurveSummary, SchemeComparison, VariantResult } from './results.ts';
import type { Setup, VariantRun } from './variant.ts';
import { prefixed } from './verdict.ts';

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

/** Compact result of a variant. */
export function compactVariant(code: CodeBasis, run: VariantRun, governingMode: Text): VariantResult {
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
  const available = r.ductilityUnavailable === null;
  return {
    key: run.key,
    label: run.label,
    status: r.status,
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
      note: r.ductilityUnavailable ?? r.ultimateOutsideRange ?? 'ductile: the ductility and hinge rotations apply',
      yieldDeflection: finite(r.ductility.yieldDeflection),
      ultimateDeflection: finite(r.ductility.ultimateDeflection),
      displacementDuctility: finite(r.ductility.displacementDuctility),
      hinges: r.ductility.hinges,
    },
    strength: r.strength,
    deflectionChecks: r.service?.checks ?? [],
    serviceOutsideRange: serviceOutsideRange(r.service, r.span),
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

/** Compact result of a run, with its sentence prefixed by the variant's name. */
export function compactOf(setup: Setup, run: VariantRun, prefix: string): VariantResult {
  return compactVariant(setup.code, run, prefixed(run.result.governingMode, prefix));
}
