/**
 * The continuous-beam engine's elastic statics against handbook coefficients for equal spans under
 * uniform load, and against closed forms derived independently here (slope–deflection).
 */
import { describe, expect, it } from 'vitest';
import { analyzeElastic, elasticSolver } from '../../core/continuous/elastic.ts';
import { layoutOf } from '../../core/continuous/layout.ts';
import { caseLoads } from '../../core/continuous/loads.ts';
import { continuousBeam, fixed, pinned, uniformOnSpans } from '../fixtures/continuous.ts';

const L = 6000;
const w = 20; // N/mm
const EI = 4e13; // N·mm²
const near = (actual: number, expected: number, rel = 1e-9) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected) + 1e-9);

function solveDead(def: ReturnType<typeof continuousBeam>, segments = 48) {
  const layout = layoutOf(def);
  const loads = caseLoads(def, layout, 'dead');
  const solver = elasticSolver(def, def.zones.map(() => EI), loads, segments);
  return { solver, result: solver.solve(loads) };
}

/** Moment and deflection at the station nearest x (first match). */
function at(stations: { x: readonly number[] }, values: readonly number[], x: number): number {
  let best = 0;
  stations.x.forEach((xi, i) => {
    if (Math.abs(xi - x) < Math.abs(stations.x[best]! - x)) best = i;
  });
  return values[best]!;
}

describe('two equal spans, uniform load on both', () => {
  const def = continuousBeam([L, L], uniformOnSpans(2, w));
  const { solver, result } = solveDead(def);
  it('support moment −wL²/8 and reactions 3/8, 10/8, 3/8 wL', () => {
    // AISC Manual Table 3-23 case 29 (from memory): M1 = −wl²/8, R1 = 3wl/8, R2 = 10wl/8
    near(at(solver.stations, result.moment, L), (-w * L * L) / 8);
    near(result.reactions[0]!, (3 * w * L) / 8);
    near(result.reactions[1]!, (10 * w * L) / 8);
    near(result.reactions[2]!, (3 * w * L) / 8);
  });
  it('largest sagging 9wL²/128 at 3L/8 and largest deflection 0.00541 wL⁴/EI at 0.4215 L', () => {
    // AISC Manual Table 3-23 case 29 (from memory): Mx = 9wl²/128 at 3l/8, Δmax = wl⁴/185EI at 0.4215l
    near(at(solver.stations, result.moment, (3 * L) / 8), (9 * w * L * L) / 128);
    const maxDeflection = Math.max(...result.deflection);
    // The handbook rounds to 185; the closed form of a propped span (derived: v = w x (L³ − 3Lx² + 2x³)/(48EI))
    // at x = 0.4215L is 0.005416 wL⁴/EI.
    expect(Math.abs(maxDeflection / ((w * L ** 4) / (185 * EI)) - 1)).toBeLessThan(0.002);
    const xi = 0.4215;
    const closed = ((w * L ** 4) / (48 * EI)) * xi * (1 - 3 * xi * xi + 2 * xi ** 3);
    // the maximum lies between stations L/48 apart; the deflection is flat there (error ~ (Δx/L)²)
    expect(Math.abs(maxDeflection / closed - 1)).toBeLessThan(1e-3);
    near(at(solver.stations, result.deflection, 0.375 * L), ((w * L ** 4) / (48 * EI)) * 0.375 * (1 - 3 * 0.375 ** 2 + 2 * 0.375 ** 3), 1e-9);
  });
});

describe('three equal spans, uniform load on all', () => {
  const def = continuousBeam([L, L, L], uniformOnSpans(3, w));
  const { solver, result } = solveDead(def);
  it('support moments −wL²/10 and reactions 0.4, 1.1, 1.1, 0.4 wL', () => {
    // AISC Manual Table 3-23 case 30 / any handbook of continuous beams (from memory): MB = MC = −0.10wl², R = 0.4, 1.1 wl
    near(at(solver.stations, result.moment, L), -0.1 * w * L * L);
    near(at(solver.stations, result.moment, 2 * L), -0.1 * w * L * L);
    [0.4, 1.1, 1.1, 0.4].forEach((c, i) => near(result.reactions[i]!, c * w * L));
  });
  it('end-span sagging 0.08 wL², mid-span sagging 0.025 wL², end-span deflection 0.0069 wL⁴/EI', () => {
    // handbook coefficients for three equal spans (from memory): 0.080, 0.025 wl²; Δmax = 0.0069 wl⁴/EI at 0.446l
    const peak = Math.max(...result.moment.filter((_, i) => solver.stations.x[i]! < L));
    // the maximum (at 0.4L) falls between stations L/48 apart; the moment is flat there
    expect(Math.abs(peak / (0.08 * w * L * L) - 1)).toBeLessThan(2e-4);
    near(at(solver.stations, result.moment, 1.5 * L), 0.025 * w * L * L);
    expect(Math.abs(Math.max(...result.deflection) / ((0.0069 * w * L ** 4) / EI) - 1)).toBeLessThan(0.005);
  });
});

describe('pattern loading of live load (three equal spans)', () => {
  const def = continuousBeam([L, L, L], uniformOnSpans(3, w, 'live'));
  const elastic = analyzeElastic({ definition: def, zones: [{ stiffness: EI, selfWeight: 0 }], strengthFactors: { dead: 1, superimposed: 1, live: 1 } });
  it('end-span sagging is largest with spans 1 and 3 loaded: 0.101 wL²', () => {
    // ACI 318-19 6.4.2(a) / EN 1992-1-1 5.1.3(a): alternate spans govern the span moment;
    // coefficient for live load on spans 1 and 3 of three equal spans (from memory): +0.101 wl².
    // Closed form: MB = MC = −wL²/20 (three-moment equation), so Mmax = (wL/2 − wL/20)²/(2w) = 0.10125 wL².
    const span1 = elastic.parts.find((p) => p.name === 'span 1')!;
    expect(elastic.arrangements[span1.maxSagging.arrangement]!.description).toMatch(/^spans 1 and 3 loaded/);
    expect(Math.abs(span1.maxSagging.value / (0.10125 * w * L * L) - 1)).toBeLessThan(1e-3);
  });
  it('the support moment is largest with spans 1 and 2 loaded: −0.1167 wL²', () => {
    // ACI 318-19 6.4.2(b) / EN 1992-1-1 5.1.3(b): adjacent spans govern the support moment;
    // three-moment equation with spans 1 and 2 loaded: MB = −7wL²/60 = −0.1167 wL² (handbook value from memory: 0.117).
    const i = elastic.stations.x.findIndex((x) => Math.abs(x - L) < 1e-6);
    expect(elastic.envelopes.strength.moment.min.value[i]! / (w * L * L)).toBeCloseTo(-7 / 60, 6);
    expect(elastic.arrangements[elastic.envelopes.strength.moment.min.arrangement[i]!]!.description).toMatch(/^spans 1 and 2 loaded/);
  });
  it('two spans: one span loaded gives the largest deflection, 0.0092 wL⁴/EI', () => {
    // handbook, two equal spans with one span loaded (from memory): Δmax = 0.0092 wl⁴/EI at 0.472l;
    // closed form (simple span plus MB = −wL²/16 at its end, derived here): 0.0091506 wL⁴/EI at 0.4724L
    const two = analyzeElastic({ definition: continuousBeam([L, L], uniformOnSpans(2, w, 'live')), zones: [{ stiffness: EI, selfWeight: 0 }], strengthFactors: { dead: 1, superimposed: 1, live: 1 } });
    const span1 = two.parts[0]!;
    expect(two.arrangements[span1.maxLiveDeflection.arrangement]!.loadedParts).toEqual([0]);
    expect(Math.abs(span1.maxLiveDeflection.value / ((0.0092 * w * L ** 4) / EI) - 1)).toBeLessThan(0.01);
    expect(Math.abs(span1.maxLiveDeflection.value / ((0.0091506 * w * L ** 4) / EI) - 1)).toBeLessThan(5e-4);
  });
});

describe('supports that restrain rotation', () => {
  it('a fixed interior support makes each span a propped cantilever: −wL²/8 at the support, 3wL/8 at the pin', () => {
    // propped cantilever, AISC Manual Table 3-23 case 12 (from memory): M = −wl²/8, R = 3wl/8 and 5wl/8
    const def = continuousBeam([L, 0.7 * L], [{ kind: 'uniform', loadCase: 'dead', span: 1, magnitude: w }], { supports: [pinned, fixed, pinned] });
    const { solver, result } = solveDead(def);
    const i = solver.stations.x.findIndex((x) => Math.abs(x - L) < 1e-6);
    near(result.moment[i]!, (-w * L * L) / 8);
    near(result.reactions[0]!, (3 * w * L) / 8);
    near(result.reactions[2]!, 0);
  });
  it('a column spring at the end of a single span: end moment −wL²/12 · k/(k + 2EI/L)', () => {
    // slope–deflection (common practice, no source): a span with one end on a rotational spring k and
    // the other fixed carries M = −(wL²/12)·(1 + …); here both ends on springs of equal k:
    // M = −(wL²/12)·k/(k + 2EI/L).
    const column = { stiffness: 2e13, height: 3000, farEnd: 'fixed' as const };
    const support = { kind: 'column' as const, above: column, below: column };
    const k = 2 * ((4 * column.stiffness) / column.height);
    const def = continuousBeam([L], [{ kind: 'uniform', loadCase: 'dead', span: 1, magnitude: w }], { supports: [support, support] });
    const { result } = solveDead(def);
    near(result.moment[0]!, ((-w * L * L) / 12) * (k / (k + (2 * EI) / L)), 1e-9);
  });
  it('a cantilever over a pinned end support: the end span carries the cantilever moment', () => {
    // statics (common practice, no source): with a on the cantilever, MA = −w a²/2; a two-span beam
    // by the three-moment equation: 2·MB·(2L) + MA·L = −wL³/4·2 → MB = (−wL²/2 − MA)/4… checked by equilibrium below.
    const a = 1500;
    const def = continuousBeam([L, L], [...uniformOnSpans(2, w), { kind: 'uniform', loadCase: 'dead', span: 'left-cantilever', magnitude: w }], { leftCantilever: a });
    const { solver, result } = solveDead(def);
    const ma = (-w * a * a) / 2;
    const i = solver.stations.x.findIndex((x) => Math.abs(x - a) < 1e-6);
    near(result.moment[i]!, ma);
    // three-moment equation for equal spans (Clapeyron; common practice, no source): MA + 4MB + MC = −wL²/2, MC = 0
    const mb = (-(w * L * L) / 2 - ma) / 4;
    const j = solver.stations.x.findIndex((x) => Math.abs(x - (a + L)) < 1e-6);
    near(result.moment[j]!, mb, 1e-9);
    // the reactions carry every load
    near(result.reactions.reduce((s, r) => s + r, 0), w * (2 * L + a));
  });
});
