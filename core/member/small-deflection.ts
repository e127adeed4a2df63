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

/** The part of a member result the load–deflection range check reads (deflections mm). */
interface LoadDeflectionPart {
  readonly span: number;
  readonly loadDeflection: {
    readonly points: readonly { readonly loadFactor: number; readonly deflection: number }[];
    readonly events: readonly { readonly kind: string; readonly deflection: number }[];
  };
}

/**
 * Whether the member's load–deflection curve leaves the method's range: it passes span/50 before any
 * of its tension steel yields (or, where nothing yields, anywhere before its ultimate). Such a
 * member bends that far while still elastic — too flexible to be analysed as a beam (a 60 m span of
 * a 600 mm beam, a section with almost no steel) — and its ultimate deflection Δu and displacement
 * ductility μΔ are no result (issue 17); this sentence says why, with the limit and the load factor
 * where the curve passes it, never a deflection beyond it. Null otherwise.
 *
 * Past first yield the deflection comes mostly from rotation at the hinges, and ductile beams in
 * tests reach span/50 to span/20 at their ultimate with first-order analysis still in use; a limit
 * of span/50 on the whole curve would withhold μΔ of most ductile beams (8 of the 14 demo members,
 * at span/10 to span/27), so the range is judged on the elastic branch (our reasoning, no source).
 */
export function ultimateOutsideRange(result: LoadDeflectionPart): Text | null {
  const { span, loadDeflection } = result;
  if (!(span > 0)) return null;
  const limit = span / SMALL_DEFLECTION_RATIO;
  const beyond = loadDeflection.points.find((p) => Math.abs(p.deflection) > limit);
  if (!beyond) return null;
  const firstYield = loadDeflection.events.find((e) => e.kind === 'first-yield');
  if (firstYield && Math.abs(firstYield.deflection) <= limit) return null;
  return phrase`Load–deflection: ${OUTSIDE_SMALL_DEFLECTION} — the curve passes span/${SMALL_DEFLECTION_RATIO} = ${q('deflection', limit)} at ${beyond.loadFactor.toFixed(2)} × the load pattern, before ${firstYield ? 'its tension steel first yields' : 'its ultimate (its tension steel never yields)'}: the member is too flexible to be analysed as a beam; the ultimate deflection Δu and the displacement ductility μΔ are not given.`;
}
