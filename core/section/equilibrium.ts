/**
 * Neutral axis by force equilibrium: for a given curvature, find the strain at the centroid ε0
 * such that the internal axial force equals the applied one. A bracketed Brent search makes this
 * robust on softening branches where Newton's method can jump.
 */
import { brentRoot, bracketRoot } from '../numeric/roots.ts';
import type { SectionModel } from './model.ts';
import { sectionForces, type SectionForces } from './forces.ts';

export interface EquilibriumState {
  /** Signed curvature φ, 1/mm (sagging positive). */
  readonly curvature: number;
  /** Strain at the centroid ε0 (compression positive). */
  readonly referenceStrain: number;
  /** Moment about the centroid, N·mm, sagging positive. */
  readonly moment: number;
  /** Internal axial force minus applied axial force, N (the equilibrium residual). */
  readonly residual: number;
}

export type EquilibriumOutcome =
  | { readonly ok: true; readonly state: EquilibriumState }
  | { readonly ok: false; readonly reason: string };

/** Force tolerance, N: a billionth of the squash load of the concrete (about 0.003 N for a 300 × 500 beam). */
export function forceTolerance(model: SectionModel): number {
  let squash = 0;
  for (const part of model.concreteParts) {
    let area = 0;
    for (const s of part.strips) area += 0.5 * (s.widthTop + s.widthBottom) * (s.bottom - s.top);
    squash += area * part.material.peakStress;
  }
  return Math.max(1e-9 * squash, 1e-9);
}

const scratch: SectionForces = { axial: 0, moment: 0 };

/**
 * Solves ε0 for the signed curvature φ (1/mm), starting the search at `guess`.
 * Returns a reason instead of throwing when no equilibrium exists near the guess.
 */
export function solveEquilibrium(model: SectionModel, curvature: number, guess: number, tolerance = forceTolerance(model)): EquilibriumOutcome {
  const applied = model.axialForce;
  const f = (eps0: number) => sectionForces(model, eps0, curvature, scratch).axial - applied;
  const step = Math.max(2e-6, Math.abs(curvature) * model.height * 0.02);
  const bracket = bracketRoot(f, guess, step, 2, 60);
  if (!bracket) {
    return { ok: false, reason: `no strain at the centroid balances the axial force of ${(applied / 1000).toFixed(1)} kN at φ = ${curvature.toExponential(3)} 1/mm (the section cannot carry it)` };
  }
  const root = bracket.a === bracket.b ? { x: bracket.a, fx: bracket.fa, converged: true } : brentRoot(f, bracket.a, bracket.b, bracket.fa, bracket.fb, { fTolerance: tolerance, xTolerance: 1e-16, maxIterations: 200 });
  if (!root.converged || !(Math.abs(root.fx) <= Math.max(tolerance * 1000, 1e-6))) {
    return { ok: false, reason: `force equilibrium not reached at φ = ${curvature.toExponential(3)} 1/mm (residual ${root.fx.toExponential(2)} N after ${'iterations' in root ? root.iterations : 0} iterations)` };
  }
  const forces = sectionForces(model, root.x, curvature, scratch);
  return { ok: true, state: { curvature, referenceStrain: root.x, moment: forces.moment, residual: forces.axial - applied } };
}
