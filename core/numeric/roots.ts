/**
 * Bracketed root finding:
 *  - Brent's method (brentRoot): robust for any continuous function with a sign change on [a, b],
 *    superlinear near a simple root. Used for neutral-axis equilibrium and for locating events
 *    (cracking, yield, crushing) along a moment–curvature curve.
 *    @see R. P. Brent, "Algorithms for Minimization without Derivatives", 1973, ch. 4.
 *  - a bracketed secant on solved states (locateEvent): where each evaluation is a nonlinear solve
 *    started from the nearer end of the bracket, e.g. the load at which a member event happens;
 *    closed on the parameter, not on the size of the event function.
 */
export interface RootResult {
  /** The root estimate (last iterate). */
  readonly x: number;
  /** f(x). */
  readonly fx: number;
  readonly iterations: number;
  readonly converged: boolean;
}

export interface RootOptions {
  /** Absolute tolerance on x (default 1e-15); the convergence test adds 2·ε·|x| to half of it. */
  readonly xTolerance?: number;
  /** Stop as soon as |f(x)| ≤ fTolerance (default 0: rely on xTolerance). */
  readonly fTolerance?: number;
  readonly maxIterations?: number;
}

/**
 * Finds x in [a, b] with f(x) = 0 given f(a) and f(b) of opposite signs (or one of them zero).
 * Never throws for a valid bracket; reports `converged: false` when the iteration budget runs out.
 * @param fa f(a), already evaluated (saves a call)
 * @param fb f(b), already evaluated
 */
export function brentRoot(
  f: (x: number) => number,
  a: number,
  b: number,
  fa: number,
  fb: number,
  options: RootOptions = {},
): RootResult {
  const xTol = options.xTolerance ?? 1e-15;
  const fTol = options.fTolerance ?? 0;
  const maxIterations = options.maxIterations ?? 100;
  if (fa === 0) return { x: a, fx: 0, iterations: 0, converged: true };
  if (fb === 0) return { x: b, fx: 0, iterations: 0, converged: true };
  if (fa * fb > 0 || !Number.isFinite(fa) || !Number.isFinite(fb)) {
    return { x: Math.abs(fa) < Math.abs(fb) ? a : b, fx: Math.min(Math.abs(fa), Math.abs(fb)), iterations: 0, converged: false };
  }
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    if (fb * fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b; b = c; c = a;
      fa = fb; fb = fc; fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * xTol;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0 || Math.abs(fb) <= fTol) {
      return { x: b, fx: fb, iterations: iteration, converged: true };
    }
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      let p: number;
      let q: number;
      const s = fb / fa;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = d;
      }
    } else {
      d = m;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
    if (!Number.isFinite(fb)) return { x: a, fx: fa, iterations: iteration, converged: false };
  }
  return { x: b, fx: fb, iterations: maxIterations, converged: false };
}

/**
 * Expands outward from a guess until f changes sign, then returns the bracket.
 * `step` is the first half-width; it grows by `growth` each try. Returns undefined when no sign
 * change is found within `maxTries` expansions (the caller reports non-convergence).
 */
export function bracketRoot(
  f: (x: number) => number,
  guess: number,
  step: number,
  growth = 2,
  maxTries = 60,
): { a: number; b: number; fa: number; fb: number } | undefined {
  let a = guess;
  let fa = f(a);
  if (fa === 0) return { a, b: a, fa, fb: fa };
  // Walk in the direction that reduces |f| assuming f increases with x (true for axial force vs.
  // reference strain); if that assumption fails, expansion still finds a sign change.
  let direction = fa > 0 ? -1 : 1;
  let h = step;
  for (let tries = 0; tries < maxTries; tries++) {
    const b = a + direction * h;
    const fb = f(b);
    if (!Number.isFinite(fb)) {
      // No value there (e.g. a state in which a section carries nothing): the root, if any, lies
      // between a and b — come back towards a before giving up on this side.
      if (h > 1e-6 * step) {
        h /= 4;
        continue;
      }
      direction = -direction;
      h = step;
      continue;
    }
    if (fa * fb <= 0) return b > a ? { a, b, fa, fb } : { a: b, b: a, fa: fb, fb: fa };
    if (Math.abs(fb) > Math.abs(fa) && tries > 2) {
      // Moving the wrong way (non-monotone f): try the other side, wider.
      direction = -direction;
    } else {
      a = b;
      fa = fb;
    }
    h *= growth;
  }
  return undefined;
}

/** One end of a bracket of locateEvent: the parameter and the state solved there. */
export interface SolvedPoint<S> {
  readonly x: number;
  readonly state: S;
}

/** What locateEvent found. */
export interface LocatedEvent<S> {
  /** The bracketing point on the event side (g ≥ 0). */
  readonly point: SolvedPoint<S>;
  /** The point just before it (g < 0). */
  readonly before: SolvedPoint<S>;
  /** True when the bracket was closed to the tolerance; false when a solve failed or the budget ran out. */
  readonly converged: boolean;
  /** Number of solves spent. */
  readonly solves: number;
}

/**
 * The state where an event function g crosses zero between two solved states (g(a) < 0 ≤ g(b)),
 * closed to a bracket narrower than xTolerance(x of its upper end) in the parameter itself — never
 * by the size of g: an event function can be nearly flat past its root (a section on the steep band
 * that spreads a cracking jump carries almost the same moment over a wide range of load), and a test
 * on g there left the load factor of the event undetermined by several per cent.
 *
 * Each new point is predicted by a secant through the two latest points before the event (the state
 * evolves smoothly up to the event, whereas past it g may have a kink) after a point before it, by
 * regula falsi with the Illinois rule after a point past it, and by bisection when two predictions in
 * a row have not halved the bracket.
 * A prediction is placed a quarter of the tolerance towards the wider side of the bracket, so that
 * an accurate one closes the bracket from both sides in two solves. Each point is solved from the
 * nearer end of the bracket, from the other one when that fails, and nearer the lower end when
 * both fail (a steep band can defeat a solve that crosses it).
 * @param before a solved point before `a` with g(before) < g(a) < 0, when known (the step before)
 */
export function locateEvent<S>(
  a: SolvedPoint<S>,
  b: SolvedPoint<S>,
  solve: (x: number, from: S) => S | undefined,
  g: (state: S) => number,
  options: { readonly maxIterations: number; readonly xTolerance: (upper: number) => number; readonly before?: SolvedPoint<S> },
): LocatedEvent<S> {
  let lo = a;
  let hi = b;
  let gLo = g(lo.state);
  let gHi = g(hi.state);
  let prev = options.before;
  let gPrev = prev ? g(prev.state) : Number.NaN;
  let solves = 0;
  let lastSide = 0;
  let loWeight = 1;
  const widths: number[] = [hi.x - lo.x];
  for (let it = 0; it < options.maxIterations; it++) {
    const width = hi.x - lo.x;
    const tol = options.xTolerance(hi.x);
    if (width <= tol) return { point: hi, before: lo, converged: true, solves };
    let x: number;
    const halved = widths.length < 3 || width <= 0.5 * widths[widths.length - 3]!;
    if (!halved) x = lo.x + 0.5 * width;
    else {
      // After a point before the event: the secant through the two latest such points. After a point
      // past it: regula falsi, the lower end's g halved for each further point past it in a row (the
      // Illinois rule), so that a flat stretch past the event cannot hold the bracket open.
      if (lastSide <= 0 && prev && gPrev < gLo && lo.x > prev.x) x = lo.x + ((lo.x - prev.x) * -gLo) / (gLo - gPrev);
      else {
        const gl = gLo * loWeight;
        x = lo.x + (gHi > gl ? (-gl / (gHi - gl)) * width : 0.5 * width);
      }
      if (!Number.isFinite(x)) x = lo.x + 0.5 * width;
      x += x - lo.x > hi.x - x ? -0.25 * tol : 0.25 * tol;
    }
    x = Math.min(Math.max(x, lo.x + 0.25 * tol), hi.x - 0.25 * tol);
    let state: S | undefined;
    for (let tries = 0; tries < 4 && state === undefined; tries++) {
      const nearLo = x - lo.x <= hi.x - x;
      state = solve(x, (nearLo ? lo : hi).state);
      solves++;
      if (state === undefined) {
        state = solve(x, (nearLo ? hi : lo).state);
        solves++;
      }
      if (state === undefined) x = lo.x + 0.5 * (x - lo.x);
    }
    if (state === undefined) return { point: hi, before: lo, converged: false, solves };
    const gx = g(state);
    if (gx >= 0) {
      hi = { x, state };
      gHi = gx;
      if (lastSide === 1) loWeight /= 2;
      lastSide = 1;
    } else {
      prev = lo;
      gPrev = gLo;
      lo = { x, state };
      gLo = gx;
      loWeight = 1;
      lastSide = -1;
    }
    widths.push(hi.x - lo.x);
  }
  return { point: hi, before: lo, converged: hi.x - lo.x <= options.xTolerance(hi.x), solves };
}
