/**
 * Equilibrium and deflected shape under a fixed load, with the nonlinear-elastic law only (no
 * plasticity, no localisation): the service states and the elastic analyses of the strength checks.
 * Internal units: mm, N·mm, 1/mm.
 */
import type { BeamModel } from './beam-model.ts';
import { deflectionShape } from './deflection.ts';
import { Equations, newton, type LoadingFields } from './equations.ts';

export interface StaticState {
  readonly converged: boolean;
  readonly redundants: readonly number[];
  readonly moment: Float64Array;
  readonly curvature: Float64Array;
  readonly deflection: Float64Array;
  /** Largest |M|/M′y over the stations (> 1: the load passes first yield somewhere). */
  readonly yieldRatio: number;
  /** Largest |M|/Mpeak over the stations (> 1: the section cannot carry the load). */
  readonly peakRatio: number;
}

/**
 * Equilibrium and deflected shape under a fixed load (no plastic hinges): the service states.
 * @param fields released-structure moments of the load at every station, N·mm
 * @param shape  false: the moments and curvatures only (`deflection` empty)
 */
export function solveStatic(beam: BeamModel, fields: Float64Array, shape = true): StaticState {
  const loads: LoadingFields = { constant: fields, pattern: new Float64Array(fields.length), constantTotal: 0, patternTotal: 0 };
  const eq = new Equations(beam, loads);
  const res = newton(eq, [], [], false, { redundants: new Array(beam.redundants.length).fill(0), lambda: 0, rotations: [] });
  eq.moments(res.redundants, 0);
  const moment = Float64Array.from(eq.moment);
  const curvature = new Float64Array(moment.length);
  // The last evaluation of a converged solve integrated the segments at this very state (and found
  // the curvature at every station on the way): reused.
  const integrals = res.integralsAtSolution && eq.r > 0 ? { i0: eq.segmentI0, i1: eq.segmentI1 } : undefined;
  if (integrals) eq.endCurvatures(curvature);
  const deflection = shape ? deflectionShape(eq, null, [], integrals ? undefined : curvature, integrals) : new Float64Array(0);
  if (!shape && !integrals) {
    const c = { value: 0, slope: 0 };
    for (let i = 0; i < moment.length; i++) curvature[i] = eq.stationCurvature(i, null, c).value;
  }
  let yieldRatio = 0;
  let peakRatio = 0;
  for (let i = 0; i < moment.length; i++) {
    const m = moment[i]!;
    const zone = beam.zones[beam.stationZone[i]!]!;
    const resp = m >= 0 ? zone.sagging : zone.hogging;
    if (resp.firstYieldMoment) yieldRatio = Math.max(yieldRatio, Math.abs(m) / resp.firstYieldMoment);
    if (resp.peakMoment > 0) peakRatio = Math.max(peakRatio, Math.abs(m) / resp.peakMoment);
  }
  return { converged: res.converged, redundants: res.redundants, moment, curvature, deflection, yieldRatio, peakRatio };
}
