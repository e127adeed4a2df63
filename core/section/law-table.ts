/**
 * A stress–strain law as the section integrator reads it: between two breakpoints a law is smooth
 * (the contract of UniaxialMaterial.breakpoints), so each such branch is cut into equal cells and the
 * law is replaced in each cell by its degree-7 interpolating polynomial at the Chebyshev nodes
 * (common practice, no source: Chebyshev interpolation of a smooth function). A cell's polynomial is
 * fitted the first time a strain falls in it and kept only where it reproduces the law to within
 * 1e-10 of the law's largest stress at seven further points of the cell (the Chebyshev extrema); a
 * cell that fails (a power law's singular derivatives at zero strain, a law that is not smooth where
 * its breakpoints say it is) keeps calling the law itself. The rational and power laws (Mander,
 * Popovics, Thorenfeldt) cost an exp and a log per call; a polynomial costs eight multiply–adds —
 * this is where most of the moment–curvature curve's time went (`npm run bench`).
 *
 * A rational branch that 3-point Gauss cannot integrate whole to about 1e-5 is also cut at fixed,
 * equally spaced strains (`splits`), which the integrator treats like breakpoints.
 *
 * Strains outside the outermost breakpoints are passed to the law. The polynomial stands for the law
 * inside a branch only (the Gauss points of core/section/forces.ts never sit on a breakpoint); the
 * value at a breakpoint itself is the law's.
 *
 * Units: strain dimensionless, stress MPa (the material's own sign convention).
 */

/** Cells per branch between two breakpoints. */
const CELLS = 32;
/** Coefficients per cell (degree 7). */
const ORDER = 8;
/** Largest interpolation error accepted, as a fraction of the law's largest stress. */
const RELATIVE_TOLERANCE = 1e-10;

const NODES = Float64Array.from({ length: ORDER }, (_, k) => Math.cos(((2 * k + 1) * Math.PI) / (2 * ORDER)));
const CHECKS = Float64Array.from({ length: ORDER - 1 }, (_, k) => Math.cos(((k + 1) * Math.PI) / ORDER));

/** Relative accuracy asked of 3-point Gauss over a part of a branch, as a fraction of the whole branch's integral. */
const GAUSS_TARGET = 1e-5;
/** At most this many parts per branch. */
const MAX_PARTS = 16;

const G5_NODES = [-0.906179845938664, -0.5384693101056831, 0, 0.5384693101056831, 0.906179845938664];
const G5_WEIGHTS = [0.23692688505618908, 0.47862867049936647, 0.5688888888888889, 0.47862867049936647, 0.23692688505618908];
const G3_NODES = [-0.7745966692414834, 0, 0.7745966692414834];
const G3_WEIGHTS = [0.5555555555555556, 0.8888888888888888, 0.5555555555555556];

/**
 * Relative error of 3-point Gauss over the whole branch [a, b] of a law, in ∫σ dε and ∫σ (ε − a) dε,
 * measured against 5-point Gauss on 32 equal cells (Gauss–Legendre nodes and weights: Abramowitz &
 * Stegun 1964, Table 25.4), as a fraction of ∫|σ| dε (and of W·∫|σ| dε for the first moment).
 */
function gaussErrorOf(law: Law, a: number, b: number): number {
  const w = b - a;
  let force = 0;
  let first = 0;
  let magnitude = 0;
  for (let c = 0; c < 32; c++) {
    const mid = a + ((c + 0.5) * w) / 32;
    const half = w / 64;
    for (let k = 0; k < 5; k++) {
      const e = mid + half * G5_NODES[k]!;
      const s = law.stress(e) * half * G5_WEIGHTS[k]!;
      force += s;
      first += s * (e - a);
      magnitude += Math.abs(s);
    }
  }
  let force3 = 0;
  let first3 = 0;
  for (let k = 0; k < 3; k++) {
    const e = a + 0.5 * w * (1 + G3_NODES[k]!);
    const s = law.stress(e) * 0.5 * w * G3_WEIGHTS[k]!;
    force3 += s;
    first3 += s * (e - a);
  }
  if (!(magnitude > 0)) return 0;
  return Math.max(Math.abs(force3 - force) / magnitude, Math.abs(first3 - first) / (w * magnitude));
}

/** Cell states. */
const UNFITTED = 0;
const FITTED = 1;
const LAW = 2;

export interface TabulatedLaw {
  /** The branch (index between consecutive breakpoints) of a strain inside the tabulated range, or −1 outside it. */
  branchOf(strain: number): number;
  /** Stress (MPa) at `strain`, which lies strictly inside branch `branch` (from branchOf). */
  stressIn(strain: number, branch: number): number;
  /**
   * The strains where the integrator splits the section (ascending): the breakpoints the table was
   * built with, and inside a rational branch that 3-point Gauss cannot integrate whole to about 1e-5
   * of what it carries, equally spaced strains cutting it into as many parts as bring it there (see
   * gaussErrorOf). Fixed strains, not a number of parts chosen per piece: the section forces stay
   * continuous in ε0 (a part count that steps with the strain state made N(ε0) jump by up to 56 N on
   * the benchmark T-beam, against the equilibrium tolerance of the time, 0.009 N; 0.9 N since it is
   * 1e-7 of the squash load).
   */
  readonly splits: Float64Array;
}

interface Law {
  stress(strain: number): number;
  readonly breakpoints: readonly number[];
  readonly peakStress?: number;
}

const tables = new WeakMap<object, TabulatedLaw>();

/**
 * The tabulated form of `law` (cached per law object), its branches split at `breakpoints`
 * (ascending; the integrator's split strains, which include zero for concrete).
 */
export function tabulatedLaw(law: Law, breakpoints: readonly number[]): TabulatedLaw {
  let table = tables.get(law);
  if (!table) {
    table = buildTable(law, breakpoints);
    tables.set(law, table);
  }
  return table;
}

function buildTable(law: Law, breakpoints: readonly number[]): TabulatedLaw {
  // A branch whose 3-point Gauss error over its whole width exceeds GAUSS_TARGET is cut into K equal
  // parts: the error falls with the sixth power of the part's width, so K = (error / target)^(1/6).
  const refined: number[] = [];
  for (let b = 0; b + 1 < breakpoints.length; b++) {
    const a = breakpoints[b]!;
    const c = breakpoints[b + 1]!;
    refined.push(a);
    const error = gaussErrorOf(law, a, c);
    const parts = error > GAUSS_TARGET ? Math.min(Math.ceil(Math.pow(error / GAUSS_TARGET, 1 / 6)), MAX_PARTS) : 1;
    for (let k = 1; k < parts; k++) refined.push(a + ((c - a) * k) / parts);
  }
  if (breakpoints.length > 0) refined.push(breakpoints[breakpoints.length - 1]!);
  const edges = Float64Array.from(refined);
  const branches = Math.max(edges.length - 1, 0);
  const lo = new Float64Array(branches);
  const scale = new Float64Array(branches);
  for (let b = 0; b < branches; b++) {
    lo[b] = edges[b]!;
    scale[b] = CELLS / (edges[b + 1]! - edges[b]!);
  }
  const state = new Uint8Array(branches * CELLS);
  const coefficients = new Float64Array(branches * CELLS * ORDER);
  // The tolerance scale: the law's peak when it states one, else its largest stress at the breakpoints' midpoints.
  let largest = Math.abs(law.peakStress ?? 0);
  for (let b = 0; b < branches; b++) largest = Math.max(largest, Math.abs(law.stress(0.5 * (edges[b]! + edges[b + 1]!))));
  const tolerance = RELATIVE_TOLERANCE * Math.max(largest, 1e-6);
  const values = new Float64Array(ORDER);
  const cheb = new Float64Array(ORDER);

  /** Fits cell `cell` of branch `b`: Chebyshev coefficients → monomials in t ∈ [−1, 1], then checked. */
  const fit = (b: number, cell: number, index: number) => {
    const width = 1 / scale[b]!;
    const start = lo[b]! + cell * width;
    const strainAt = (t: number) => start + 0.5 * (t + 1) * width;
    for (let k = 0; k < ORDER; k++) values[k] = law.stress(strainAt(NODES[k]!));
    // Chebyshev coefficients c_j = (2/n) Σ_k f(t_k) T_j(t_k) (c_0 halved).
    for (let j = 0; j < ORDER; j++) {
      let sum = 0;
      for (let k = 0; k < ORDER; k++) sum += values[k]! * Math.cos((j * (2 * k + 1) * Math.PI) / (2 * ORDER));
      cheb[j] = ((j === 0 ? 1 : 2) / ORDER) * sum;
    }
    // Monomial coefficients of Σ c_j T_j(t), by the recurrence T_{j+1} = 2t T_j − T_{j−1}.
    const base = index * ORDER;
    coefficients.fill(0, base, base + ORDER);
    let previous = new Float64Array(ORDER);
    let current = new Float64Array(ORDER);
    previous[0] = 1; // T_0
    current[1] = 1; // T_1
    for (let j = 0; j < ORDER; j++) {
      const t = j === 0 ? previous : current;
      for (let m = 0; m < ORDER; m++) coefficients[base + m] = coefficients[base + m]! + cheb[j]! * t[m]!;
      if (j >= 1) {
        const next = new Float64Array(ORDER);
        for (let m = 0; m < ORDER; m++) next[m] = (m > 0 ? 2 * current[m - 1]! : 0) - previous[m]!;
        previous = current;
        current = next;
      }
    }
    let ok = true;
    for (let k = 0; k < CHECKS.length && ok; k++) {
      const t = CHECKS[k]!;
      const exact = law.stress(strainAt(t));
      ok = Number.isFinite(exact) && Math.abs(horner(coefficients, base, t) - exact) <= tolerance;
    }
    state[index] = ok ? FITTED : LAW;
  };

  return {
    splits: edges,
    branchOf(strain: number): number {
      if (!(strain > edges[0]! && strain < edges[branches]!)) return -1;
      let b = 0;
      while (strain >= edges[b + 1]!) b++;
      return b;
    },
    stressIn(strain: number, b: number): number {
      const u = (strain - lo[b]!) * scale[b]!;
      let cell = u | 0;
      if (cell < 0) cell = 0;
      else if (cell >= CELLS) cell = CELLS - 1;
      const index = b * CELLS + cell;
      let s = state[index]!;
      if (s === UNFITTED) {
        fit(b, cell, index);
        s = state[index]!;
      }
      if (s === LAW) return law.stress(strain);
      return horner(coefficients, index * ORDER, 2 * (u - cell) - 1);
    },
  };
}

function horner(c: Float64Array, base: number, t: number): number {
  return c[base]! + t * (c[base + 1]! + t * (c[base + 2]! + t * (c[base + 3]! + t * (c[base + 4]! + t * (c[base + 5]! + t * (c[base + 6]! + t * c[base + 7]!))))));
}
