/**
 * Compatibility of a continuous beam by the flexibility method, for any curvature law.
 *
 * Unknowns: the redundant span-end moments X (two per span, beyond the released structure's; see
 * model.ts), the curvature κ of every active plastic hinge and, when the load factor is an unknown,
 * λ. Each support contributes one equation per span end meeting it:
 *   pinned, between spans     M⁻ = M⁺ and θ⁻ = θ⁺ (continuity)
 *   fixed                     θ = 0 at every span end
 *   columns (spring k)        θ⁻ = θ⁺ and M⁻ − M⁺ = k·θ (joint equilibrium), one span end: M⁻ − M⁺ = k·θ
 *   pinned end                M = the cantilever's root moment (X = 0)
 * with the span-end rotations (v downward, θ = dv/dx, v″ = −φ, sagging curvature positive)
 *   θL = ∫ φ·(1 − s/L) ds + Σ θp·(1 − sh/L),  θR = −∫ φ·(s/L) ds − Σ θp·sh/L,
 * a plastic hinge acting as a concentrated curvature θp at sh. The integrals run over the Simpson
 * samples of the mesh, so the residual and its exact Jacobian (the tangent flexibilities) cost one
 * pass over the samples. Why flexibility rather than stiffness: the redundants are the support
 * moments the engineer reads (two per span at most, ≤ 16 unknowns), curvature from any moment–
 * curvature law integrates directly (no element stiffness to derive for a varying, cracked section),
 * and hinges enter as concentrated curvatures at any position, not only at nodes.
 * Units: mm, N, N·mm, rad, 1/mm.
 */
import { supportStiffness, type ContinuousSupport } from './definition.ts';
import type { BeamMesh } from './model.ts';

/** Signed curvature (1/mm) and flexibility dφ/dM (1/(N·mm²)) of a zone for a signed moment. */
export interface DistributedLaw {
  curvature(zone: number, moment: number, out: { value: number; slope: number }): void;
}

/** One compatibility or equilibrium equation: Σ θcoef·θ + Σ xcoef·X = 0 (indices 2i = left end, 2i + 1 = right end of span i). */
export interface SupportRow {
  readonly support: number;
  readonly kind: 'rotation' | 'moment';
  readonly theta: Float64Array;
  readonly x: Float64Array;
}

/** The equations of every support (2 per span in all). */
export function supportRows(spanCount: number, supports: readonly ContinuousSupport[]): SupportRow[] {
  const n = 2 * spanCount;
  const rows: SupportRow[] = [];
  const row = (support: number, kind: SupportRow['kind'], theta: [number, number][], x: [number, number][]) => {
    const t = new Float64Array(n);
    const m = new Float64Array(n);
    for (const [i, c] of theta) t[i] = c;
    for (const [i, c] of x) m[i] = c;
    rows.push({ support, kind, theta: t, x: m });
  };
  supports.forEach((support, j) => {
    const k = supportStiffness(support);
    const left = j >= 1 ? 2 * (j - 1) + 1 : -1; // right end of the span on the left
    const right = j < spanCount ? 2 * j : -1; // left end of the span on the right
    if (left >= 0 && right >= 0) {
      if (k === 0) {
        row(j, 'moment', [], [[left, 1], [right, -1]]);
        row(j, 'rotation', [[left, 1], [right, -1]], []);
      } else if (k === Infinity) {
        row(j, 'rotation', [[left, 1]], []);
        row(j, 'rotation', [[right, 1]], []);
      } else {
        row(j, 'rotation', [[left, 1], [right, -1]], []);
        row(j, 'moment', [[right, -k]], [[left, 1], [right, -1]]);
      }
    } else {
      const end = left >= 0 ? left : right;
      const sign = left >= 0 ? 1 : -1; // M⁻ − M⁺ = ±X
      if (k === 0) row(j, 'moment', [], [[end, 1]]);
      else if (k === Infinity) row(j, 'rotation', [[end, 1]], []);
      else row(j, 'moment', [[end, -k]], [[end, sign]]);
    }
  });
  return rows;
}

/** A plastic hinge as the equations see it. */
export interface ActiveHinge {
  readonly part: number;
  /** 0-based span of the part, −1 on a cantilever. */
  readonly span: number;
  /** Fields of the span's redundants at the hinge: (1 − s/L) and s/L. */
  readonly fieldLeft: number;
  readonly fieldRight: number;
  /** Released moments at the hinge of the held and the factored load sets, N·mm. */
  readonly heldMoment: number;
  readonly patternMoment: number;
  /** +1 sagging, −1 hogging. */
  readonly sign: number;
  /** Hinge law: moment magnitude for a curvature magnitude, and the plastic rotation θp. */
  moment(kappa: number, out: { value: number; slope: number }): void;
  plasticRotation(kappa: number, out: { value: number; slope: number }): void;
}

/** State of the unknowns. */
export interface StructureState {
  readonly redundants: Float64Array;
  readonly kappa: Float64Array;
  lambda: number;
}

/** The released fields the moment is built from: M = held + λ·pattern + X fields. */
export interface LoadFields {
  readonly held: Float64Array;
  readonly pattern: Float64Array;
}

export interface Evaluation {
  /** Moment and curvature at every sample. */
  readonly moment: Float64Array;
  readonly curvature: Float64Array;
  /** Span-end rotations θL, θR of every span (index 2i, 2i + 1), rad. */
  readonly rotations: Float64Array;
  /** Plastic rotations of the hinges (signed, sagging positive), rad. */
  readonly hingeRotations: Float64Array;
  /** Work-conjugate deflection of the pattern, (1/P)·Σ ∫ M̄·φ, mm (see `controlDeflection`). */
  readonly work: number;
}

export interface Linearisation {
  readonly residual: Float64Array;
  /** Row-major Jacobian; columns: X (2n), κ (hinges), λ (when free). */
  readonly jacobian: Float64Array[];
}

const scratch = { value: 0, slope: 0 };

/**
 * Evaluates the moment and curvature fields, the span-end rotations and the work-conjugate
 * deflection for a state, and optionally the residual and Jacobian of
 *   [support rows (2n); hinge laws (κ ↦ M = M at the hinge); control (work deflection = target)].
 * `control` undefined: λ is given (its column and the control row are left out).
 */
export function evaluate(
  mesh: BeamMesh,
  rows: readonly SupportRow[],
  law: DistributedLaw,
  fields: LoadFields,
  patternTotal: number,
  hinges: readonly ActiveHinge[],
  state: StructureState,
  control?: { readonly target: number },
  linearise = false,
): { evaluation: Evaluation; linearisation?: Linearisation } {
  const spans = mesh.layout.spanPart.length;
  const nx = 2 * spans;
  const nh = hinges.length;
  const free = control !== undefined;
  const nu = nx + nh + (free ? 1 : 0);
  const samples = mesh.sampleS.length;
  const moment = new Float64Array(samples);
  const curvature = new Float64Array(samples);
  const rotations = new Float64Array(nx);
  // Derivatives of θ (per span end) with respect to X of its span (two) and λ.
  const dRot = Array.from({ length: nx }, () => new Float64Array(3));
  const dWork = new Float64Array(nu);
  const { redundants: X, lambda } = state;
  const spanOfPart = new Int32Array(mesh.layout.parts.length).fill(-1);
  mesh.layout.spanPart.forEach((p, i) => (spanOfPart[p] = i));
  let work = 0;
  for (let q = 0; q < samples; q++) {
    const span = spanOfPart[mesh.samplePart[q]!]!;
    const fl = mesh.fieldLeft[q]!;
    const fr = mesh.fieldRight[q]!;
    const mp = fields.pattern[q]!;
    let m = fields.held[q]! + lambda * mp;
    if (span >= 0) m += X[2 * span]! * fl + X[2 * span + 1]! * fr;
    law.curvature(mesh.sampleZone[q]!, m, scratch);
    moment[q] = m;
    const phi = scratch.value;
    curvature[q] = phi;
    const w = mesh.sampleWeight[q]!;
    work += w * phi * mp;
    if (!linearise && span < 0) continue;
    const wf = w * scratch.slope;
    if (span >= 0) {
      const a = 2 * span;
      rotations[a]! += w * phi * fl;
      rotations[a + 1]! -= w * phi * fr;
      if (linearise) {
        const dl = dRot[a]!;
        const dr = dRot[a + 1]!;
        dl[0]! += wf * fl * fl;
        dl[1]! += wf * fl * fr;
        dl[2]! += wf * fl * mp;
        dr[0]! -= wf * fr * fl;
        dr[1]! -= wf * fr * fr;
        dr[2]! -= wf * fr * mp;
        dWork[a]! += wf * fl * mp;
        dWork[a + 1]! += wf * fr * mp;
      }
    }
    if (linearise && free) dWork[nu - 1]! += wf * mp * mp;
  }
  const hingeRotations = new Float64Array(nh);
  const hingeSlope = new Float64Array(nh);
  hinges.forEach((h, i) => {
    h.plasticRotation(state.kappa[i]!, scratch);
    hingeRotations[i] = h.sign * scratch.value;
    hingeSlope[i] = h.sign * scratch.slope;
    work += hingeRotations[i]! * h.patternMoment;
    if (h.span >= 0) {
      rotations[2 * h.span]! += hingeRotations[i]! * h.fieldLeft;
      rotations[2 * h.span + 1]! -= hingeRotations[i]! * h.fieldRight;
    }
  });
  const total = patternTotal > 0 ? patternTotal : 1;
  work /= total;
  const evaluation: Evaluation = { moment, curvature, rotations, hingeRotations, work };
  if (!linearise) return { evaluation };

  const residual = new Float64Array(nx + nh + (free ? 1 : 0));
  const jacobian = Array.from({ length: residual.length }, () => new Float64Array(nu));
  // Support rows.
  rows.forEach((row, r) => {
    let value = 0;
    const jr = jacobian[r]!;
    for (let e = 0; e < nx; e++) {
      const tc = row.theta[e]!;
      const xc = row.x[e]!;
      if (xc !== 0) {
        value += xc * X[e]!;
        jr[e]! += xc;
      }
      if (tc === 0) continue;
      value += tc * rotations[e]!;
      const span = e >> 1;
      const d = dRot[e]!;
      jr[2 * span]! += tc * d[0]!;
      jr[2 * span + 1]! += tc * d[1]!;
      if (free) jr[nu - 1]! += tc * d[2]!;
      // Hinges of this span: θ depends on their κ.
      hinges.forEach((h, i) => {
        if (h.span !== span) return;
        const field = (e & 1) === 0 ? h.fieldLeft : -h.fieldRight;
        jr[nx + i]! += tc * hingeSlope[i]! * field;
      });
    }
    residual[r] = value;
  });
  // Hinge laws: sign·M(κ) − M(x_h) = 0.
  hinges.forEach((h, i) => {
    const r = nx + i;
    const jr = jacobian[r]!;
    h.moment(state.kappa[i]!, scratch);
    let mh = h.heldMoment + lambda * h.patternMoment;
    if (h.span >= 0) {
      mh += X[2 * h.span]! * h.fieldLeft + X[2 * h.span + 1]! * h.fieldRight;
      jr[2 * h.span]! -= h.fieldLeft;
      jr[2 * h.span + 1]! -= h.fieldRight;
    }
    residual[r] = h.sign * scratch.value - mh;
    jr[nx + i]! += h.sign * scratch.slope;
    if (free) jr[nu - 1]! -= h.patternMoment;
  });
  if (free) {
    const r = nx + nh;
    residual[r] = work - control!.target;
    const jr = jacobian[r]!;
    for (let e = 0; e < nx; e++) jr[e] = dWork[e]! / total;
    jr[nu - 1] = dWork[nu - 1]! / total;
    hinges.forEach((h, i) => (jr[nx + i]! += (hingeSlope[i]! * h.patternMoment) / total));
  }
  return { evaluation, linearisation: { residual, jacobian } };
}

/**
 * Deflection at the middle of a segment of (signed) length h from its start (deflection v, slope
 * θ), the curvature quadratic through pa, pm, pb: v + θ·h/2 − ∫₀^{h/2} (h/2 − t)·φ dt.
 */
function midpointDeflection(v: number, theta: number, h: number, pa: number, pm: number, pb: number): number {
  return v + (theta * h) / 2 - ((h * h) / 192) * (14 * pa + 12 * pm - 2 * pb);
}

/**
 * Deflection (mm, downward positive) and slope at every sample, by marching along each part from
 * its supports: spans from v = 0 and θ = θL at their left end, cantilevers from their support with
 * the joint's rotation. Hinge rotations are kinks at their positions.
 */
export function deflections(mesh: BeamMesh, evaluation: Evaluation, hinges: readonly { readonly part: number; readonly s: number }[]): Float64Array {
  const out = new Float64Array(mesh.sampleS.length);
  const { parts, spanPart } = mesh.layout;
  const phi = evaluation.curvature;
  const kinksOf = (pi: number) => hinges.map((h, i) => ({ s: h.s, theta: evaluation.hingeRotations[i]!, part: h.part })).filter((k) => k.part === pi);
  parts.forEach((part, pi) => {
    const [first, end] = mesh.partSegments[pi]!;
    const kinks = kinksOf(pi);
    if (part.kind !== 'left-cantilever') {
      // March to the right from s = 0.
      let v = 0;
      let theta: number;
      if (part.kind === 'span') theta = evaluation.rotations[2 * part.span]!;
      else theta = evaluation.rotations[2 * (spanPart.length - 1) + 1]!;
      for (let k = first; k < end; k++) {
        const seg = mesh.segments[k]!;
        const q = seg.sample;
        const h = seg.s1 - seg.s0;
        out[q] = v;
        const pa = phi[q]!;
        const pm = phi[q + 1]!;
        const pb = phi[q + 2]!;
        out[q + 1] = midpointDeflection(v, theta, h, pa, pm, pb);
        let vb = v + theta * h - ((h * h) / 6) * (pa + 2 * pm);
        let tb = theta - (h / 6) * (pa + 4 * pm + pb);
        for (const kink of kinks) {
          const isLast = k === end - 1;
          if (kink.s >= seg.s0 && (kink.s < seg.s1 || (isLast && kink.s <= seg.s1))) {
            tb -= kink.theta;
            vb -= kink.theta * (seg.s1 - kink.s);
          }
        }
        out[q + 2] = vb;
        v = vb;
        theta = tb;
      }
    } else {
      // Left cantilever: march to the left from the support.
      let v = 0;
      let theta = evaluation.rotations[0]!;
      for (const kink of kinks) theta += kink.theta;
      for (let k = end - 1; k >= first; k--) {
        const seg = mesh.segments[k]!;
        const q = seg.sample;
        const h = seg.s0 - seg.s1;
        out[q + 2] = v;
        const pa = phi[q + 2]!;
        const pm = phi[q + 1]!;
        const pb = phi[q]!;
        out[q + 1] = midpointDeflection(v, theta, h, pa, pm, pb);
        const vb = v + theta * h - ((h * h) / 6) * (pa + 2 * pm);
        theta = theta - (h / 6) * (pa + 4 * pm + pb);
        v = vb;
        out[q] = vb;
      }
    }
  });
  return out;
}
