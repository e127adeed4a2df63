/**
 * The governing deflection check of a continuous beam — kept apart from the verdict (which pulls in
 * the assessment engine) so the app's page and the CSV summary can use it with type imports only.
 */
import type { ContinuousBeamResult } from './analyze.ts';
import type { PartDeflectionCheck } from './service.ts';
import { exceedsBeyondRounding } from '../numeric/ties.ts';

/** The deflection check of the governing span or cantilever (largest utilisation), null when none. */
export function governingDeflection(result: Pick<ContinuousBeamResult, 'service'>): { readonly part: string; readonly check: PartDeflectionCheck } | null {
  let best: { part: string; check: PartDeflectionCheck } | null = null;
  for (const part of result.service?.parts ?? []) for (const check of part.checks) if (!best || exceedsBeyondRounding(check.utilisation, best.check.utilisation)) best = { part: part.name, check };
  return best;
}

/**
 * A signed deflection (mm, downward positive) as its magnitude and sense, for every presenter: the
 * magnitude to format, and the word that follows it ('' downward — the convention — 'upward').
 */
export function deflectionSense(value: number): { readonly magnitude: number; readonly sense: '' | ' upward' } {
  return value < 0 ? { magnitude: -value, sense: ' upward' } : { magnitude: value, sense: '' };
}
