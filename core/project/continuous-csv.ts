/**
 * Continuous members in the results summary CSV: one row per member, in the columns of
 * resultsSummaryCsv (core/project/csv.ts), the governing span named in the supports and mode cells.
 */
import type { ContinuousMemberResult } from '../assessment/continuous-verdict.ts';
import { governingDeflection } from '../continuous/governing.ts';
import { displaySystem, say, toDisplay, type Quantity } from '../units/index.ts';
import type { UnitSystem } from './types.ts';

const shown = (quantity: Quantity, value: number | null | undefined, system: UnitSystem): number | null =>
  typeof value === 'number' && Number.isFinite(value) ? toDisplay(quantity, value, displaySystem(system)) : null;

/** Rows for resultsSummaryCsv's columns (id, name, supports, span, status, My, Mu, φu/φy, μΔ, θp, ultimate load factor, deflection, limit, limit case, utilisations, warnings, governing mode, strength position, sense, combination, ductility not available). */
export function continuousSummaryRows(results: readonly ContinuousMemberResult[], system: UnitSystem): (string | number | null)[][] {
  return results.map((r) => {
    const g = governingDeflection(r);
    const f = r.checks?.flexureGoverning;
    const governingPart = r.verdict.governingSpan;
    const part = r.parts.find((p) => p.name === governingPart);
    const hinge = r.capacity?.hinges.find((h) => h.part === governingPart) ?? r.capacity?.hinges[0];
    return [
      r.memberId, r.memberName,
      `continuous, ${r.parts.filter((p) => p.kind === 'span').length} spans; governing ${governingPart ?? 'none'}`,
      shown('spanLength', part ? part.to - part.from : null, system),
      r.verdict.status,
      null, shown('moment', hinge?.peakMoment, system), null, r.capacity?.displacementDuctility ?? null,
      shown('rotation', hinge?.rotationCapacity, system), r.verdict.collapseRatio,
      // Signed, downward positive: a span lifted by its neighbours' load shows a negative deflection.
      shown('deflection', g?.check.governing, system), shown('deflection', g?.check.limit, system), g?.check.limitCase ?? null,
      g?.check.utilisation ?? null, r.verdict.strengthUtilisation, r.warnings.map((w) => say(w, system)).join('; '), `${governingPart ? `${governingPart}: ` : ''}${say(r.verdict.governingMode, system)}`,
      // Where the flexural check governs: position from the left end of its span, sense and span, combination and arrangement.
      shown('spanLength', f?.s, system), f ? `${f.direction}, ${f.part}` : null, f ? `${f.combination}; ${f.arrangement}` : null,
      r.verdict.ductilityAvailable ? null : (r.checks?.brittle ?? []).map((b) => say(b.text, system)).join('; ') || null,
    ];
  });
}
