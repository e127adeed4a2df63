/**
 * The strain and stress state of a section at any curvature: what the app shows when the engineer
 * clicks a point of the moment–curvature curve (the worker calls this; the renderer never does).
 */
import { solveEquilibrium } from './equilibrium.ts';
import { directionSign, type BendingDirection, type SectionModel } from './model.ts';
import type { SectionState } from './results.ts';
import { sectionState } from './state.ts';

export type StateOutcome = { readonly ok: true; readonly state: SectionState } | { readonly ok: false; readonly message: string };

/**
 * @param curvature magnitude, 1/mm, in the given direction
 * @param guess centroid strain to start from (e.g. of the nearest curve point); 0 by default
 */
export function sectionStateAtCurvature(model: SectionModel, direction: BendingDirection, curvature: number, guess = 0): StateOutcome {
  if (!Number.isFinite(curvature) || curvature < 0) return { ok: false, message: `curvature must be a finite number ≥ 0 (1/mm), got ${curvature}` };
  const phi = directionSign(direction) * curvature;
  const out = solveEquilibrium(model, phi, guess);
  if (!out.ok) return { ok: false, message: out.reason };
  return { ok: true, state: sectionState(model, direction, phi, out.state.referenceStrain, out.state.moment, out.state.residual) };
}
