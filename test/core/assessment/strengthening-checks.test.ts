/**
 * The code checks of a strengthening method (core/assessment/strengthening-checks.ts), on the
 * invented 6 m bay (300 × 600, 3 Ø20 at d = 540, 2 Ø16 at 55, f′c 30 MPa) with two plies of CFRP
 * and with a steel plate: the service stresses against ACI 440.2R-17 Eq. (10.2.8.2a) worked by
 * hand, the creep-rupture stress, debonding within φMn, and the strengthening limit of 9.2.
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { FRP_CREEP_RUPTURE_LIMIT } from '../../../core/assessment/strengthening-checks.ts';
import { materialLibrary } from '../../../core/materials/library.ts';
import { STANDARD_GRAVITY } from '../../../core/section/analyze.ts';
import { FRP_SCHEME, OVERLAY_SCHEME, PLATE_SCHEME, retrofitProject } from '../retrofit/retrofit-project.ts';

const L = 6000;
const b = 300;
const d = 540;
const dTop = 55;
const As = 3 * Math.PI * 100;
const AsTop = 2 * Math.PI * 64;
const selfWeight = 2400 * STANDARD_GRAVITY * 300 * 600 * 1e-9; // N/mm, the fixture's default density

const project = retrofitProject('ACI 318-19', { schemes: [FRP_SCHEME, PLATE_SCHEME, OVERLAY_SCHEME] });
const result = analyzeProject(project).members[0]!;
const [frp, plate, overlay] = result.retrofit!.schemes;
const check = (s: typeof frp, id: string) => s!.checks.find((c) => c.id === id)!;
const es = materialLibrary(project.materials, 'ACI 318-19').steel('b500')!.initialModulus;
// ACI 318-19 19.2.2.1(b): Ec = 4700√f′c (MPa)
const ec = 4700 * Math.sqrt(30);

/**
 * Neutral axis depth of the cracked transformed rectangle with compression bars (displacing
 * concrete) and tension elements: b·c²/2 + (n′ − 1)·A′(c − d′) = Σ n·A·(d − c), solved exactly.
 */
function crackedDepth(tension: readonly { n: number; area: number; depth: number }[]): number {
  const nTop = es / ec - 1;
  // b/2·c² + (nTop·A′ + Σ nA)·c − (nTop·A′·d′ + Σ nA·d) = 0
  const qa = b / 2;
  const qb = nTop * AsTop + tension.reduce((s, t) => s + t.n * t.area, 0);
  const qc = -(nTop * AsTop * dTop + tension.reduce((s, t) => s + t.n * t.area * t.depth, 0));
  return (-qb + Math.sqrt(qb * qb - 4 * qa * qc)) / (2 * qa);
}

describe('strengthening code checks, FRP (ACI 440.2R-17)', () => {
  const Af = 2 * 0.165 * 250;
  const Ef = 230_000;
  const df = 600;
  const epsBi = -frp!.installation[0]!.strain; // tension at the soffit when the sheet is bonded

  it('finds the steel and concrete stresses under D + SD + L as Eq. (10.2.8.2a) gives them', () => {
    expect(ec).toBeCloseTo(result.retrofit!.schemes[0]!.installation[0]!.concreteModulus, 6);
    // Statics, simple span: Ms = w·L²/8 with w = self-weight + 8 + 12 N/mm
    const ms = ((selfWeight + 8 + 12) * L * L) / 8;
    const kd = crackedDepth([{ n: es / ec, area: As, depth: d }, { n: Ef / ec, area: Af, depth: df }]);
    // ACI 440.2R-17 Eq. (10.2.8.2a) (from memory): fs,s = [Ms + εbi·Af·Ef·(df − kd/3)]·(d − kd)·Es / [As·Es·(d − kd/3)(d − kd) + Af·Ef·(df − kd/3)(df − kd)]
    const fs = ((ms + epsBi * Af * Ef * (df - kd / 3)) * (d - kd) * es) / (As * es * (d - kd / 3) * (d - kd) + Af * Ef * (df - kd / 3) * (df - kd));
    const steel = check(frp, 'steel-service-stress');
    expect(steel.value / fs).toBeCloseTo(1, 6);
    // ACI 440.2R-17 10.2.8 (from memory): fs,s ≤ 0.80 fy
    expect(steel.limit).toBeCloseTo(0.8 * 500, 9);
    expect(steel.pass).toBe(fs <= 400);
    // Concrete: fc = Ec·κ·kd with κ = fs/(Es·(d − kd)); ≤ 0.45 f′c
    const concrete = check(frp, 'concrete-service-stress');
    expect(concrete.value / ((ec * fs * kd) / (es * (d - kd)))).toBeCloseTo(1, 6);
    expect(concrete.limit).toBeCloseTo(0.45 * 30, 9);
  });

  it('takes the FRP stress under the sustained load D + SD + ψL and holds it to 0.20 ffu', () => {
    const ms = ((selfWeight + 8 + 0.3 * 12) * L * L) / 8;
    const kd = crackedDepth([{ n: es / ec, area: As, depth: d }, { n: Ef / ec, area: Af, depth: df }]);
    const curvature = (ms + epsBi * Af * Ef * (df - kd / 3)) / (As * es * (d - kd / 3) * (d - kd) + Af * Ef * (df - kd / 3) * (df - kd));
    // ACI 440.2R-17 Eq. (10.2.9) form (from memory): ff,s = Ef·(κ(df − kd) − εbi)
    const ff = Math.max(0, Ef * (curvature * (df - kd) - epsBi));
    const creep = check(frp, 'frp-creep-rupture');
    expect(creep.value).toBeCloseTo(ff, 6);
    // ACI 440.2R-17 Table 10.2.9 (from memory): glass 0.20 ffu, ffu = CE·ε*fu·Ef
    expect(FRP_CREEP_RUPTURE_LIMIT).toBe(0.2);
    expect(creep.limit).toBeCloseTo(0.2 * 0.95 * 0.0167 * Ef, 6);
  });

  it('holds the factored moment within φMn of the strengthened section, whose FRP strain is limited to εfd', () => {
    // ACI 318-19 Eq. (5.3.1b): Mu = (1.2(D + SD) + 1.6L)·L²/8
    const mu = ((1.2 * (selfWeight + 8) + 1.6 * 12) * L * L) / 8;
    const phiMn = frp!.variant!.sections[0]!.curves.find((c) => c.direction === 'sagging')!.designResistance!;
    const debonding = check(frp, 'frp-debonding');
    expect(debonding.value).toBeCloseTo(mu / phiMn, 6);
    expect(debonding.pass).toBe(mu <= phiMn);
  });

  it('carries the strengthening limit of 9.2 from the beam without its strengthening', () => {
    const limit = check(frp, 'strengthening-limit');
    expect(limit.value).toBe(frp!.lossOfStrengthening!.check.utilisation);
    expect(limit.pass).toBe(frp!.lossOfStrengthening!.check.pass);
  });

  it('fails a check once the loads outgrow it: three times the live load breaks the steel service stress', () => {
    const heavy = analyzeProject(retrofitProject('ACI 318-19', {
      schemes: [FRP_SCHEME],
      loads: [{ kind: 'uniform', loadCase: 'superimposed', magnitude: 8 }, { kind: 'uniform', loadCase: 'live', magnitude: 36 }],
    })).members[0]!.retrofit!.schemes[0]!;
    const steel = heavy.checks.find((c) => c.id === 'steel-service-stress')!;
    expect(steel.ratio).toBeGreaterThan(check(frp, 'steel-service-stress').ratio);
    expect(heavy.checks.some((c) => !c.pass)).toBe(true);
  });
});

describe('strengthening code checks of a plate and of a concrete layer', () => {
  it('checks the plate stress against 0.80 fy of the plate steel, by analogy', () => {
    const c = check(plate, 'plate-service-stress');
    expect(c.limit).toBeCloseTo(0.8 * 355, 9);
    expect(c.value).toBeGreaterThan(0);
    expect(plate!.checks.map((x) => x.id)).toContain('strengthening-limit');
    expect(plate!.checks.map((x) => x.id)).not.toContain('frp-debonding');
  });

  it('gives a cast layer the service stresses only, its own concrete at the compression face', () => {
    expect(overlay!.checks.map((x) => x.id).sort()).toEqual(['concrete-service-stress', 'steel-service-stress']);
    // ACI 440.2R-17 10.2.8 limit applied to the 40 MPa layer concrete on top.
    expect(check(overlay, 'concrete-service-stress').limit).toBeCloseTo(0.45 * 40, 9);
  });
});
