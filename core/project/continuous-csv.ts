/**
 * Continuous members in the results summary CSV: one row per member, in the columns of
 * resultsSummaryCsv (core/project/csv.ts), the governing span named in the supports and mode cells.
 */
import { governingDeflection, type ContinuousMemberResult } from '../continuous/verdict.ts';
import { displaySystem, say, toDisplay, type Quantity } from '../units/index.ts';
import type { UnitSystem } from './types.ts';

const shown = (quantity: Quantity, value: number | null | undefined, system: UnitSystem): number | null =>
  typeof value === 'number' && Number.isFinite(value) ? toDisplay(quantity, value, displaySystem(system)) : null;

/** Rows for resultsSummaryCsv's columns (id, name, supports, span, status, My, Mu, φu/φy, μΔ, θp, ultimate load factor, deflection, limit, limit case, utilisations, warnings, governing mode). */
export function continuousSummaryRows(results: readonly ContinuousMemberResult[], system: UnitSystem): (string | number | null)[][] {
  return results.map((r) => {
    const g = governingDeflection(r);
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
      shown('deflection', g?.check.governing, system), shown('deflection', g?.check.limit, system), g?.check.limitCase ?? null,
      g?.check.utilisation ?? null, null, r.warnings.map((w) => say(w, system)).join('; '), `${governingPart ? `${governingPart}: ` : ''}${r.verdict.governingMode}`,
    ];
  });
}
