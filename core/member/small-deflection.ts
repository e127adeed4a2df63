/**
 * The range of the method: curvature integrated along the undeformed span (small deflections, no
 * second-order or membrane action). A computed service deflection beyond span/50 is outside it —
 * such a beam does not carry its service load as a beam (too little steel, a span far too long for
 * its depth) — and is reported in words, never as a number presented as a result (issue 17).
 * Units: mm.
 */
import { phrase, q, type Text } from '../units/phrase.ts';
import type { ServiceDeflections } from './results.ts';

/** Deflections up to span / SMALL_DEFLECTION_RATIO are within the method (span/50, issue 17). */
export const SMALL_DEFLECTION_RATIO = 50;

/** What presenters show instead of a deflection outside the range. */
export const OUTSIDE_SMALL_DEFLECTION = 'outside the small-deflection range of the method';

/** Every service deflection the result presents, mm (parts a caller left out are skipped). */
function serviceValues(s: ServiceDeflections): number[] {
  const { immediate, longTerm, checks } = s as Partial<ServiceDeflections>;
  return [
    ...(immediate ? [...Object.values(immediate.integration), ...Object.values(immediate.code)] : []),
    ...(longTerm ? [longTerm.integrationAdditional, longTerm.codeAdditional, longTerm.integrationTotal, longTerm.codeTotal] : []),
    ...(checks ?? []).flatMap((c) => [c.byIntegration, c.byCode, c.governing]),
  ];
}

/**
 * Whether a member's service deflections lie outside the method's range (any of them beyond
 * span/50 in either direction), with the sentence that says so; null when they are within it.
 */
export function serviceOutsideRange(service: ServiceDeflections | null, span: number): Text | null {
  if (!service || !(span > 0)) return null;
  const limit = span / SMALL_DEFLECTION_RATIO;
  if (serviceValues(service).every((v) => Math.abs(v) <= limit)) return null;
  return phrase`Service deflections: ${OUTSIDE_SMALL_DEFLECTION} (a computed deflection exceeds span/${SMALL_DEFLECTION_RATIO} = ${q('deflection', limit)}): the beam does not carry its service load as a beam — check the reinforcement and the span; the deflection checks fail and no deflection is given as a result.`;
}

/** The part of a member result the load–deflection range check reads. */
interface LoadDeflectionPart {
  readonly span: number;
  readonly loadDeflection: { readonly points: readonly { readonly loadFactor: number; readonly deflection: number }[] };
}

/**
 * Whether the member's load–deflection curve leaves the method's range (beyond span/50) at or
 * before its ultimate; then its ultimate deflection Δu and displacement ductility μΔ are no result
 * (issue 17) and this sentence says why — with the limit and the load factor where the curve
 * passes it, never a deflection beyond it. Null when the curve stays within the range.
 */
export function ultimateOutsideRange(result: LoadDeflectionPart): Text | null {
  const { span, loadDeflection } = result;
  if (!(span > 0)) return null;
  const limit = span / SMALL_DEFLECTION_RATIO;
  // The curve ends at its ultimate, so any point beyond the limit lies at or before it.
  const beyond = loadDeflection.points.find((p) => Math.abs(p.deflection) > limit);
  if (!beyond) return null;
  return phrase`Load–deflection: ${OUTSIDE_SMALL_DEFLECTION} — the curve passes span/${SMALL_DEFLECTION_RATIO} = ${q('deflection', limit)} at ${beyond.loadFactor.toFixed(2)} × the load pattern, before its ultimate; the ultimate deflection Δu and the displacement ductility μΔ are not given.`;
}
