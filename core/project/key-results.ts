/**
 * The few numbers per member that a results table, a CSV summary and the command line show, picked
 * (never recomputed) from a MemberResult. Internal units: moments N·mm, lengths and deflections mm,
 * rotations rad, ratios dimensionless.
 *
 * Which section speaks for the member: the critical section of the plastic hinge that is nearest to
 * where the member reaches its ultimate state (the hinge that ends the load–deflection curve), in that
 * hinge's bending direction; without hinges, the section of the zone where the ultimate state is
 * reached, in the direction of the moment there (sagging for spans, hogging for a cantilever when
 * that is not known).
 */
import type { PlasticHinge, DeflectionCheck } from '../member/results.ts';
import type { MomentCurvatureResult } from '../section/results.ts';
import type { MemberDefinition } from './types.ts';
import type { Problem } from '../diagnostics.ts';
import type { Text } from '../units/phrase.ts';
import { needsStrengthening, type MemberResult } from '../assessment/results.ts';
import { serviceOutsideRange } from '../member/small-deflection.ts';

export interface CriticalSection {
  readonly sectionId: string;
  readonly sectionName: string;
  readonly direction: 'sagging' | 'hogging';
  /** Position of the critical section, mm from the left support (null when not known). */
  readonly position: number | null;
}

export interface MemberKeyResults {
  readonly memberId: string;
  readonly memberName: string;
  readonly supports: MemberResult['supports'];
  /** Span, mm. */
  readonly span: number;
  readonly status: MemberResult['status'];
  /** The governing-mode sentence (quantities as data: say(governingMode, units)). */
  readonly governingMode: Text;
  readonly critical: CriticalSection | null;
  /**
   * Moments of the critical section's moment–curvature curve, N·mm, by the names used everywhere
   * (core/charts/moment-names.ts): first yield M′y (the tension steel first reaches fy), the nominal
   * yield moment My of the bilinear idealisation (null when the curve has none — never first yield
   * in its place), the peak Mmax, and the moment at the ultimate curvature. The code resistance
   * (φMn, M_Rd) is the strength check's, in `strengthUtilisation`.
   */
  readonly firstYieldMoment: number | null;
  readonly yieldMoment: number | null;
  readonly peakMoment: number | null;
  readonly ultimateMoment: number | null;
  /** Curvature ductility φu/φy of the critical section (null for a brittle member). */
  readonly curvatureDuctility: number | null;
  /** Displacement ductility μΔ of the member (null for a brittle member: see ductilityUnavailable). */
  readonly displacementDuctility: number | null;
  /** Why the ductility and hinge rotation are not available (a brittle member), or null. */
  readonly ductilityUnavailable: Text | null;
  /** Why μΔ (and Δu) are not given for a member that is not brittle: its load–deflection curve leaves the small-deflection range (span/50) before its ultimate; else null. */
  readonly ultimateOutsideRange: Text | null;
  /** Plastic rotation capacity θp of the governing hinge, rad (null for a brittle member). */
  readonly plasticRotationCapacity: number | null;
  /** Load factor at ultimate on the load pattern (× service load). */
  readonly ultimateLoadFactor: number | null;
  /** The deflection check with the highest utilisation (null when none was asked for or analysed). */
  readonly deflection: {
    readonly limitCase: DeflectionCheck['limitCase'];
    readonly description: string;
    /** Governing computed deflection and its allowed value, mm. */
    readonly deflection: number;
    readonly limit: number;
    /** Denominator of ℓ/ratio. */
    readonly ratio: number;
    readonly utilisation: number;
    readonly pass: boolean;
  } | null;
  /** Deflection checks that fail / all deflection checks. */
  readonly deflectionChecksFailed: number;
  readonly deflectionChecks: number;
  /**
   * Flexural strength utilisation (demand / design resistance), outcome, and where it governs: the
   * position (mm from the left support), the bending sense and the combination (name and source).
   */
  readonly strengthUtilisation: number | null;
  readonly strengthPass: boolean | null;
  readonly strengthPosition: number | null;
  readonly strengthDirection: 'sagging' | 'hogging' | null;
  readonly strengthCombination: string | null;
  readonly warnings: number;
  readonly errors: readonly Problem[];
  /** Existing beams: whether the beam as it stands needs strengthening, and the scheme the engineer prefers with its status. */
  readonly strengthening: {
    readonly needed: boolean;
    readonly schemes: number;
    readonly preferred: { readonly schemeId: string; readonly name: string; readonly status: MemberResult['status'] | null } | null;
  } | null;
}

const finiteOrNull = (v: number | null | undefined): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);

function governingHinge(result: MemberResult): PlasticHinge | undefined {
  const hinges = result.ductility.hinges;
  if (hinges.length === 0) return undefined;
  const ultimate = result.loadDeflection.events.find((e) => e.kind === 'ultimate');
  if (!ultimate) return hinges[0];
  return hinges.reduce((best, h) => (Math.abs(h.position - ultimate.position) < Math.abs(best.position - ultimate.position) ? h : best));
}

/** Bending direction at `x` in the distribution at ultimate (sign of the moment there), if known. */
function directionAtUltimate(result: MemberResult, x: number): 'sagging' | 'hogging' | undefined {
  const d = result.distributions.find((s) => s.label === 'ultimate');
  if (!d || d.x.length === 0) return undefined;
  let nearest = 0;
  d.x.forEach((xi, i) => {
    if (Math.abs(xi - x) < Math.abs(d.x[nearest]! - x)) nearest = i;
  });
  const moment = d.moment[nearest];
  return moment === undefined || moment === 0 ? undefined : moment > 0 ? 'sagging' : 'hogging';
}

function criticalSection(result: MemberResult, definition?: MemberDefinition): { critical: CriticalSection; curve: MomentCurvatureResult | undefined; hinge?: PlasticHinge } | null {
  const hinge = governingHinge(result);
  if (hinge) {
    const section = result.sections.find((s) => s.sectionId === hinge.sectionId);
    return {
      critical: { sectionId: hinge.sectionId, sectionName: section?.sectionName ?? hinge.sectionId, direction: hinge.direction, position: hinge.position },
      curve: section?.[hinge.direction],
      hinge,
    };
  }
  // No hinge: the section where the member reaches its ultimate state, in the direction of the moment there.
  const ultimate = result.loadDeflection.events.find((e) => e.kind === 'ultimate');
  const zone = ultimate && definition ? definition.zones.find((z) => ultimate.position >= z.from && ultimate.position <= z.to) : undefined;
  const direction = (ultimate && directionAtUltimate(result, ultimate.position)) ?? (result.supports === 'cantilever' ? 'hogging' : 'sagging');
  const section = (zone && result.sections.find((s) => s.sectionId === zone.sectionId)) ?? result.sections.find((s) => s[direction]) ?? result.sections[0];
  if (!section) return null;
  return {
    critical: { sectionId: section.sectionId, sectionName: section.sectionName, direction, position: zone && ultimate ? ultimate.position : null },
    curve: section[direction],
  };
}

/**
 * Picks the key results of one member (see the file comment for the choice of section).
 * @param definition the member's definition, which tells the section at a position when no hinge formed
 */
export function memberKeyResults(result: MemberResult, definition?: MemberDefinition): MemberKeyResults {
  const picked = criticalSection(result, definition);
  const curve = picked?.curve;
  const checks = result.service?.checks ?? [];
  const worst = checks.reduce<DeflectionCheck | undefined>((a, b) => (!a || b.utilisation > a.utilisation ? b : a), undefined);
  const ultimate = result.loadDeflection.events.find((e) => e.kind === 'ultimate');
  return {
    memberId: result.memberId,
    memberName: result.memberName,
    supports: result.supports,
    span: result.span,
    status: result.status,
    governingMode: result.governingMode,
    critical: picked?.critical ?? null,
    firstYieldMoment: finiteOrNull(curve?.keyPoints.firstYield?.moment),
    yieldMoment: finiteOrNull(curve?.bilinear?.yieldMoment),
    peakMoment: finiteOrNull(curve?.keyPoints.peak?.moment),
    ultimateMoment: finiteOrNull(curve?.bilinear?.ultimateMoment ?? curve?.keyPoints.ultimate?.moment),
    curvatureDuctility: result.ductilityUnavailable ? null : finiteOrNull(curve?.curvatureDuctility),
    displacementDuctility: finiteOrNull(result.ductility.displacementDuctility),
    ductilityUnavailable: result.ductilityUnavailable ?? null,
    ultimateOutsideRange: result.ultimateOutsideRange ?? null,
    plasticRotationCapacity: finiteOrNull(picked?.hinge?.rotationCapacity),
    ultimateLoadFactor: finiteOrNull(ultimate?.loadFactor),
    // A deflection outside the method's range is no result (core/member/small-deflection.ts); the warnings say why.
    deflection: worst && !serviceOutsideRange(result.service, result.span) && Number.isFinite(worst.governing) && Number.isFinite(worst.limit) && Number.isFinite(worst.utilisation)
      ? { limitCase: worst.limitCase, description: worst.description, deflection: worst.governing, limit: worst.limit, ratio: worst.ratio, utilisation: worst.utilisation, pass: worst.pass }
      : null,
    deflectionChecksFailed: checks.filter((c) => !c.pass).length,
    deflectionChecks: checks.length,
    strengthUtilisation: finiteOrNull(result.strength?.utilisation),
    strengthPass: result.strength ? result.strength.pass : null,
    strengthPosition: finiteOrNull(result.strength?.position),
    strengthDirection: result.strength?.direction ?? null,
    strengthCombination: result.strength?.combination ?? null,
    warnings: result.warnings.length,
    errors: result.errors,
    strengthening: strengtheningOf(result, definition),
  };
}

/** Existing beams (a condition or schemes given): whether strengthening is needed and the preferred scheme's status. */
function strengtheningOf(result: MemberResult, definition?: MemberDefinition): MemberKeyResults['strengthening'] {
  const retrofit = result.retrofit;
  const schemes = definition?.schemes ?? [];
  if (!retrofit && schemes.length === 0 && !definition?.asFound) return null;
  const preferredId = definition?.preferredSchemeId;
  const scheme = preferredId !== undefined ? schemes.find((s) => s.id === preferredId) : undefined;
  const analysed = preferredId !== undefined ? retrofit?.schemes.find((s) => s.schemeId === preferredId) : undefined;
  return {
    needed: needsStrengthening(result),
    schemes: schemes.length,
    preferred: scheme ? { schemeId: scheme.id, name: scheme.name, status: analysed?.variant?.status ?? null } : null,
  };
}
