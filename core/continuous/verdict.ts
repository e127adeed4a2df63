/**
 * The status of a continuous member and the span that governs it, from its results: what the
 * command line's row, the overview and the report's summary line say.
 */
import type { DeflectionCheck } from '../member/results.ts';
import type { ContinuousBeamResult } from './analyze.ts';

export type ContinuousStatus = 'check-fails' | 'not-converged' | 'input-error' | 'review';

export interface ContinuousVerdict {
  readonly status: ContinuousStatus;
  /** The span (or cantilever) with the largest utilisation, e.g. "span 1". */
  readonly governingSpan: string | null;
  /** The governing check in words. */
  readonly governingMode: string;
  /** Largest deflection utilisation of any span (governing method / limit). */
  readonly deflectionUtilisation: number | null;
  /** Largest load of the analysis to failure over the factored load of the same arrangement. */
  readonly collapseRatio: number | null;
}

/**
 * Fails when a span fails a deflection limit or the beam's mechanism load lies below the factored
 * loads. Never a plain OK: the code's strength and shear checks at every station are not yet made
 * for continuous members, so a beam that passes these is marked for review.
 */
export function continuousVerdict(result: ContinuousBeamResult): ContinuousVerdict {
  if (result.errors.length > 0) return { status: 'input-error', governingSpan: null, governingMode: 'input errors', deflectionUtilisation: null, collapseRatio: null };
  let worst: { utilisation: number; span: string; words: string } | null = null;
  for (const part of result.service?.parts ?? []) {
    for (const check of part.checks) {
      if (!worst || check.utilisation > worst.utilisation) worst = { utilisation: check.utilisation, span: part.name, words: `deflection of ${part.name}: ${check.quantity} against ${check.description}` };
    }
  }
  const collapseRatio = result.strengthLevel?.ratio ?? null;
  const deflectionUtilisation = worst?.utilisation ?? null;
  const capacity = result.capacity;
  if (capacity && !capacity.converged) return { status: 'not-converged', governingSpan: worst?.span ?? null, governingMode: capacity.failureCause, deflectionUtilisation, collapseRatio };
  const firstHinge = capacity?.hinges[0]?.part ?? null;
  if (collapseRatio !== null && collapseRatio < 1) {
    return { status: 'check-fails', governingSpan: firstHinge, governingMode: `the beam fails at ${(collapseRatio * 100).toFixed(0)} % of the factored loads (${capacity!.failureCause})`, deflectionUtilisation, collapseRatio };
  }
  if (worst && worst.utilisation > 1) return { status: 'check-fails', governingSpan: worst.span, governingMode: worst.words, deflectionUtilisation, collapseRatio };
  return {
    status: 'review',
    governingSpan: worst?.span ?? firstHinge,
    governingMode: 'deflections within their limits and the mechanism above the factored loads; strength and shear at every station are to be checked by the code method',
    deflectionUtilisation,
    collapseRatio,
  };
}

/** A continuous member's results with its verdict (what a project's results hold for it). */
export interface ContinuousMemberResult extends ContinuousBeamResult {
  readonly verdict: ContinuousVerdict;
}

/** The results of a continuous member with its verdict. */
export function withVerdict(result: ContinuousBeamResult): ContinuousMemberResult {
  return { ...result, verdict: continuousVerdict(result) };
}

/** The deflection check of the governing span (largest utilisation), null when none. */
export function governingDeflection(result: ContinuousBeamResult): { readonly part: string; readonly check: DeflectionCheck } | null {
  let best: { part: string; check: DeflectionCheck } | null = null;
  for (const part of result.service?.parts ?? []) for (const check of part.checks) if (!best || check.utilisation > best.check.utilisation) best = { part: part.name, check };
  return best;
}
