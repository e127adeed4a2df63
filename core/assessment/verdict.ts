/**
 * The verdict of a beam variant: its status (results.ts MEMBER_STATUSES) and the one-sentence
 * governing mode, from the member engine's result and the checks — flexural strength (flexure.ts),
 * deflections (core/member/service.ts), shear (shear.ts) and brittleness (brittle.ts). A brittle
 * member's ductility and hinge rotations are withdrawn (null) with the reason.
 * Units: N, mm, N·mm, rad.
 */
import type { Problem } from '../diagnostics.ts';
import type { BeamAnalysis } from '../member/analyze.ts';
import type { BeamDefinition } from '../member/definition.ts';
import type { BeamResult } from '../member/results.ts';
import { OUTSIDE_SMALL_DEFLECTION, SMALL_DEFLECTION_RATIO, serviceOutsideRange, ultimateOutsideRange } from '../member/small-deflection.ts';
import { capitalised, joinTexts, phrase, q, withoutFinalStop, type Text } from '../units/phrase.ts';
import type { BrittleFinding, MemberResult, MemberStatus, StrengthCheck } from './results.ts';
import type { ShearResult } from './shear.ts';
import { exceedsBeyondRounding } from '../numeric/ties.ts';

/** What the verdict is built from. */
export interface VerdictInput {
  readonly member: BeamDefinition;
  readonly beam: BeamAnalysis;
  readonly strength: StrengthCheck | null;
  readonly shear: ShearResult | null;
  readonly brittle: readonly BrittleFinding[];
  /** Checks that failed with an internal error: the verdict is withheld. */
  readonly defects?: readonly Problem[];
}

/** Status from the checks: a failing check before brittleness, brittleness before OK. */
export function memberStatus(converged: boolean, result: BeamResult, strength: StrengthCheck | null, shear: ShearResult | null, brittle: readonly BrittleFinding[]): MemberStatus {
  // The code checks of strength and shear do not depend on the behaviour solver: a failing one
  // is a failed check even where the load–deflection analysis did not converge.
  const strengthFails = strength ? !strength.pass : false;
  const shearFails = shear?.factored ? !shear.factored.pass : false;
  if (strengthFails || shearFails) return 'check-fails';
  if (!converged) return 'not-converged';
  const serviceFails = (result.service?.checks ?? []).some((c) => !c.pass);
  if (serviceFails) return 'check-fails';
  return brittle.length > 0 ? 'brittle' : 'ok';
}

/** The ductility of a beam with its capacities withdrawn (null) when it is brittle. */
/**
 * The ductility figures of a load–deflection curve that leaves the method's range before its
 * ultimate (small-deflection.ts): Δu and μΔ withheld, the hinges' rotation at ultimate too (a state
 * beyond the range), and any other deflection of the block that itself lies beyond span/50.
 */
function beyondRange(ductility: BeamResult['ductility'], span: number): BeamResult['ductility'] {
  const limit = span / SMALL_DEFLECTION_RATIO;
  const within = (v: number | null) => (v !== null && Math.abs(v) <= limit ? v : null);
  return {
    ...ductility,
    firstYieldDeflection: within(ductility.firstYieldDeflection),
    yieldDeflection: within(ductility.yieldDeflection),
    ultimateDeflection: null,
    displacementDuctility: null,
    ...(ductility.peak ? { peak: Math.abs(ductility.peak.deflection) <= limit ? ductility.peak : null } : {}),
    ...(ductility.codeUltimate ? { codeUltimate: Math.abs(ductility.codeUltimate.deflection) <= limit ? ductility.codeUltimate : null } : {}),
    hinges: ductility.hinges.map((h) => ({ ...h, rotationAtUltimate: null })),
  };
}

function withdrawn(ductility: BeamResult['ductility']): BeamResult['ductility'] {
  return {
    ...ductility,
    displacementDuctility: null,
    hinges: ductility.hinges.map((h) => ({ ...h, rotationCapacity: null, rotationAtUltimate: null, curvatureDuctility: null })),
  };
}

/** The strength clause: passes or fails, the utilisation, where, under which combination. */
export function strengthClause(strength: StrengthCheck): Text {
  return phrase`strength check ${strength.pass ? 'passes' : 'fails'} (utilisation ${strength.utilisation.toFixed(2)} at ${q('spanLength', strength.position)}, ${strength.direction}, under ${strength.combination})`;
}

/** The verdict of a variant: the member result with status, governing mode, brittleness and ductility. */
export function memberVerdict(input: VerdictInput): MemberResult {
  const { member, beam, strength, shear, brittle } = input;
  const defects = input.defects ?? [];
  const result = beam.result;
  const brittleMember = brittle.length > 0;
  const status = memberStatus(beam.converged && defects.length === 0, result, strength, shear, brittle);
  const parts: Text[] = [];
  const capacity = beam.capacity;
  // A curve beyond span/50 before its ultimate: no Δu or μΔ (issue 17), the reason instead.
  const outside = ultimateOutsideRange(result);
  const mu = outside ? null : result.ductility.displacementDuctility;
  if (capacity && capacity.ultimateLoadFactor !== null) {
    const pattern = member.capacity.pattern === 'proportional' ? 'service load' : 'live load (dead load held)';
    const ductilityWords = outside ? `, load–deflection ${OUTSIDE_SMALL_DEFLECTION} (beyond span/${SMALL_DEFLECTION_RATIO}): no μΔ` : mu && !brittleMember ? `, displacement ductility μΔ = ${mu.toFixed(1)}` : '';
    parts.push(`${capacity.failureCause} at ${capacity.ultimateLoadFactor.toFixed(2)} × the ${pattern}${ductilityWords}`);
  } else if (capacity) {
    parts.push(capacity.status);
  } else {
    parts.push(result.loadDeflection.status);
  }
  if (strength) parts.push(strengthClause(strength));
  const checks = result.service?.checks ?? [];
  const serviceFails = checks.filter((c) => !c.pass);
  if (serviceFails.length > 0) {
    const worst = serviceFails.reduce((a, b) => (exceedsBeyondRounding(b.utilisation, a.utilisation) ? b : a));
    parts.push(serviceOutsideRange(result.service, result.span) ? `deflection checks fail: ${OUTSIDE_SMALL_DEFLECTION}` : `deflection check fails: ${worst.utilisation.toFixed(2)} × ℓ/${worst.ratio} (${worst.quantity})`);
  } else if (checks.length > 0) {
    parts.push('deflection checks pass');
  }
  let sentence: Text = joinTexts(parts, '; ');
  // The flexural part is headed "Flexure:", or follows the shear sentence as "flexure (not reached first):".
  if (shear?.governs === 'shear') sentence = phrase`${capitalised(shear.sentence)}; flexure (not reached first): ${sentence}`;
  else sentence = shear ? phrase`Flexure: ${sentence}; ${shear.sentence}` : phrase`Flexure: ${sentence}`;
  const flexural = brittle.filter((b) => b.cause !== 'shear-before-flexure');
  if (flexural.length > 0) sentence = phrase`${sentence}; brittle: ${joinTexts(flexural.map((b) => b.text), '; ')}`;
  const unavailable: Text | null = brittleMember ? phrase`not available: ${joinTexts(brittle.map((b) => b.text), '; ')}` : null;
  const ductility = outside ? beyondRange(result.ductility, result.span) : result.ductility;
  return {
    ...result,
    ductility: brittleMember ? withdrawn(ductility) : ductility,
    ultimateOutsideRange: outside,
    status,
    governingMode: phrase`${withoutFinalStop(sentence)}.`,
    strength,
    ...(shear ? { shear } : {}),
    brittle,
    ductilityUnavailable: unavailable,
    warnings: [...result.warnings, ...(outside ? [outside] : []), ...(shear?.warnings ?? [])],
    errors: [...result.errors, ...defects],
  };
}

/** A sentence with a prefix naming the variant, e.g. `As found: `. */
export function prefixed(text: Text, prefix: string): Text {
  return prefix === '' ? text : phrase`${prefix}${text}`;
}
