/**
 * The governing deflection check of a continuous beam — kept apart from the verdict (which pulls in
 * the assessment engine) so the app's page and the CSV summary can use it with type imports only.
 */
import type { DeflectionCheck } from '../member/results.ts';
import type { ContinuousBeamResult } from './analyze.ts';

/** The deflection check of the governing span or cantilever (largest utilisation), null when none. */
export function governingDeflection(result: Pick<ContinuousBeamResult, 'service'>): { readonly part: string; readonly check: DeflectionCheck } | null {
  let best: { part: string; check: DeflectionCheck } | null = null;
  for (const part of result.service?.parts ?? []) for (const check of part.checks) if (!best || check.utilisation > best.check.utilisation) best = { part: part.name, check };
  return best;
}
