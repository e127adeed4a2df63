/**
 * Newton's method on the continuous-beam equations (structure.ts) with row and column scaling and a
 * damped step, and the static solution of a load set with any curvature law (service states).
 * Units: mm, N, N·mm, rad, 1/mm.
 */
import { solveLinear } from '../numeric/linear.ts';
import type { ContinuousBeamDefinition } from './definition.ts';
import { layoutOf, type LoadsByPart } from './layout.ts';
import { buildMesh, loadPoints, releasedField, type BeamMesh } from './model.ts';
import { deflections, evaluate, supportRows, type ActiveHinge, type DistributedLaw, type StructureState, type SupportRow } from './structure.ts';

/** Reference sizes of the unknowns and equations, so that all weigh alike in the linear solves. */
export interface Scales {
  readonly moment: number;
  readonly rotation: number;
  readonly deflection: number;
  readonly lambda: number;
  /** One per active hinge: its first-yield curvature, 1/mm. */
  readonly curvature: readonly number[];
}

/**
 * Solves the equations for the state in place: support rows, hinge laws and (with `control`) the
 * work-conjugate deflection = target, λ then being an unknown. Converged when every scaled residual
 * is below 1e-9 (1e-7 when the tangent becomes singular at the solution).
 */
export function newton(
  mesh: BeamMesh,
  rows: readonly SupportRow[],
  law: DistributedLaw,
  fields: { held: Float64Array; pattern: Float64Array },
  total: number,
  hinges: readonly ActiveHinge[],
  state: StructureState,
  control: { target: number } | undefined,
  scales: Scales,
): { converged: boolean; iterations: number; worst: number } {
  const nx = state.redundants.length;
  const nh = hinges.length;
  const rowScale = (r: number) => (r < nx ? (rows[r]!.kind === 'rotation' ? 1 / scales.rotation : 1 / scales.moment) : r < nx + nh ? 1 / scales.moment : 1 / scales.deflection);
  const colScale = (c: number) => (c < nx ? scales.moment : c < nx + nh ? scales.curvature[c - nx]! : scales.lambda);
  const norm = (res: Float64Array) => res.reduce((m, v, r) => Math.max(m, Math.abs(v * rowScale(r))), 0);
  let worst = Infinity;
  for (let iteration = 0; iteration < 60; iteration++) {
    const { linearisation } = evaluate(mesh, rows, law, fields, total, hinges, state, control, true);
    const { residual, jacobian } = linearisation!;
    const size = residual.length;
    worst = norm(residual);
    if (worst < 1e-9) return { converged: true, iterations: iteration, worst };
    const a = jacobian.map((row, r) => Array.from(row, (v, c) => v * rowScale(r) * colScale(c)));
    const b = Array.from(residual, (v, r) => -v * rowScale(r));
    const du = solveLinear(a, b);
    if (!du) return { converged: worst < 1e-7, iterations: iteration, worst };
    // Damped step: halve until the residual falls.
    const base = { x: Float64Array.from(state.redundants), k: Float64Array.from(state.kappa), l: state.lambda };
    let factor = 1;
    for (let tries = 0; tries < 12; tries++) {
      for (let c = 0; c < size; c++) {
        const d = du[c]! * colScale(c) * factor;
        if (c < nx) state.redundants[c] = base.x[c]! + d;
        else if (c < nx + nh) state.kappa[c - nx] = Math.max(base.k[c - nx]! + d, 0);
        else state.lambda = base.l + d;
      }
      const trial = evaluate(mesh, rows, law, fields, total, hinges, state, control, true).linearisation!.residual;
      if (norm(trial) < worst || tries === 11) break;
      factor /= 2;
    }
  }
  return { converged: worst < 1e-7, iterations: 60, worst };
}

export interface StaticSolution {
  readonly mesh: BeamMesh;
  readonly converged: boolean;
  /** Moment (N·mm) and deflection (mm) at every sample of the mesh. */
  readonly moment: Float64Array;
  readonly deflection: Float64Array;
}

/**
 * Equilibrium and compatibility of the beam under a load set with a curvature law (no hinges).
 * @param meshLoads loads whose positions the mesh must contain (all the cases that will be compared)
 */
export function staticSolution(def: ContinuousBeamDefinition, law: DistributedLaw, loads: LoadsByPart, meshLoads: LoadsByPart, segmentsPerSpan: number): StaticSolution {
  const layout = layoutOf(def);
  const mesh = buildMesh(layout, def.zones, loadPoints(meshLoads), segmentsPerSpan);
  const rows = supportRows(layout.spanPart.length, def.supports);
  const field = releasedField(mesh, loads);
  const fields = { held: new Float64Array(field.moment.length), pattern: field.moment };
  const state: StructureState = { redundants: new Float64Array(2 * layout.spanPart.length), kappa: new Float64Array(0), lambda: 1 };
  const reference = Math.max(...Array.from(field.moment, Math.abs), 1);
  const meanSpan = layout.supportX[layout.supportX.length - 1]! / Math.max(layout.spanPart.length, 1);
  const probe = { value: 0, slope: 0 };
  law.curvature(0, reference, probe);
  const rotation = Math.max(Math.abs(probe.value) * meanSpan, 1e-9);
  const result = newton(mesh, rows, law, fields, field.total, [], state, undefined, { moment: reference, rotation, deflection: 1, lambda: 1, curvature: [] });
  const { evaluation } = evaluate(mesh, rows, law, fields, field.total, [], state);
  return { mesh, converged: result.converged, moment: evaluation.moment, deflection: deflections(mesh, evaluation, []) };
}
