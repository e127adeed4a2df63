/**
 * As-found concrete from cores (issue 11 item 3), end to end: every code check reads the lower
 * fractile and every number of behaviour reads the measured mean.
 *
 * The proof is by substitution. The beam with cores (A) is analysed beside two beams without an
 * as-found condition whose concrete is given one strength only: F with the lower fractile the cores
 * give, M with the cores' mean (under EN 1992-1-1 as fck = f̄c − 8, so that fcm is the mean). Each
 * code check of A must equal F's — ACI φMn / EN M_Rd at every zone, the shear capacity, the FRP
 * debonding strain εfd and the strengthening limit, the code limits of the service stresses — and
 * each number of behaviour must equal M's — the moment–curvature key points, the load–deflection
 * curve and μΔ, both service-deflection methods, the shear at the flexural mechanism, the concrete
 * and steel service stresses themselves, the soffit strain when the FRP is bonded. A check that read the mean, or a curve that read the fractile, fails here.
 * A hand calculation of φMn with the fractile ties the ACI case to ACI 318-19 22.2 from outside.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { analyzeProject } from '../../core/analysis.ts';
import type { MemberResult, SchemeResult } from '../../core/assessment/results.ts';
import type { CodeBasis, ConcreteSpec } from '../../core/materials/specs.ts';
import type { Project } from '../../core/project/types.ts';
import { aciCoreToleranceFactor, en1990CharacteristicFactor } from '../../core/retrofit/in-place-strength.ts';
import { FRP_SCHEME, retrofitProject } from '../core/retrofit/retrofit-project.ts';

/** Four cores of the invented bay, in-place cylinder strengths: mean 27 MPa, V = 0.12. */
const CORES = { meanStrength: 27, count: 4, coefficientOfVariation: 0.12, note: 'four cores' };

function withConcrete(code: CodeBasis, strength: number, asFound: boolean): Project {
  const base = retrofitProject(code, { schemes: [FRP_SCHEME], ...(asFound ? { asFound: { cores: [CORES] } } : {}) });
  return { ...base, materials: base.materials.map((m) => (m.id === 'c30' ? ({ ...m, strength } as ConcreteSpec) : m)) };
}

function analysed(p: Project): MemberResult {
  const r = analyzeProject(p).members[0]!;
  expect(r.status === 'input-error' ? r.errors : []).toEqual([]);
  return r;
}

function frpScheme(r: MemberResult): SchemeResult {
  const s = r.retrofit?.schemes.find((x) => x.schemeId === FRP_SCHEME.id);
  if (!s) throw new Error('no FRP scheme result');
  return s;
}

const check = (s: SchemeResult, id: string) => {
  const c = s.checks.find((x) => x.id === id);
  if (!c) throw new Error(`no check ${id}`);
  return c;
};

/** The key points of the sagging curve of the (single) zone's section, N·mm and 1/mm. */
function sagging(r: MemberResult) {
  const c = r.sections[0]!.sagging!;
  return { cracking: c.keyPoints.cracking?.moment, firstYield: c.keyPoints.firstYield?.moment, peak: c.keyPoints.peak?.moment, peakCurvature: c.keyPoints.peak?.curvature };
}

const REL = 1e-9;
const same = (a: number | null | undefined, b: number | null | undefined) => {
  expect(typeof a).toBe('number');
  expect(Math.abs(a! - b!)).toBeLessThanOrEqual(REL * Math.max(1, Math.abs(b!)));
};

describe.each([
  // ACI 214.4R-10 tolerance-factor approach (from memory): f′c,eq = f̄c(1 − K·V), K(n = 4, 10 %, 75 %) = 2.134 (Natrella 1963, Table A-7)
  ['ACI 318-19' as const, 27 * (1 - 2.134 * 0.12), 27],
  // EN 1990 Annex D Eq. (D.1), Table D1 "VX unknown" (from memory): fck,is = f̄c(1 − kn·V), kn(4) = 2.63; fcm = f̄c, so fck = f̄c − 8 (EN 1992-1-1 Table 3.1)
  ['EN 1992-1-1' as const, 27 * (1 - 2.63 * 0.12), 27 - 8],
])('%s: the code checks read the lower fractile, the behaviour the measured mean', (code, fractileByHand, meanAsSpecified) => {
  let A: MemberResult;
  let F: MemberResult;
  let M: MemberResult;
  let fractile: ConcreteSpec;
  beforeAll(() => {
    A = analysed(withConcrete(code, 30, true));
    fractile = A.retrofit!.derivedMaterials.find((m) => m.kind === 'concrete') as ConcreteSpec;
    F = analysed(withConcrete(code, fractile.strength, false));
    M = analysed(withConcrete(code, meanAsSpecified, false));
  });

  it('derives the fractile and keeps the mean', () => {
    // the hand value from the tabulated factor (K to four figures)
    expect(fractile.strength).toBeCloseTo(fractileByHand, code === 'ACI 318-19' ? 2 : 10);
    expect(fractile.strength).toBeCloseTo(27 * (1 - (code === 'ACI 318-19' ? aciCoreToleranceFactor(4) : en1990CharacteristicFactor(4)) * 0.12), 10);
    expect(fractile.meanStrength).toBe(27);
  });

  it('flexural design resistance at every zone and sense, and the strength utilisation, are those of the fractile', () => {
    same(A.strength!.utilisation, F.strength!.utilisation);
    same(A.strength!.resistance, F.strength!.resistance);
    A.strength!.zones.forEach((z, i) => {
      for (const d of ['sagging', 'hogging'] as const) {
        if (z[d]?.resistance !== null && z[d]?.resistance !== undefined) same(z[d]!.resistance, F.strength!.zones[i]![d]!.resistance);
      }
    });
    // and the mean would have given more: the check is not blind to the strength
    expect(M.strength!.resistance!).toBeGreaterThan(A.strength!.resistance! * 1.001);
  });

  it('shear capacity (Vc, Vn, φVn / VRd) is that of the fractile; the shear at the flexural mechanism is that of the mean', () => {
    const a = A.shear!;
    const f = F.shear!;
    expect(a.capacities.length).toBe(f.capacities.length);
    a.capacities.forEach((c, i) => {
      expect(c.concreteStrength).toBeCloseTo(fractile.strength, 10);
      same(c.concreteContribution, f.capacities[i]!.concreteContribution);
      same(c.nominal, f.capacities[i]!.nominal);
      same(c.design, f.capacities[i]!.design);
    });
    same(a.factored!.utilisation, f.factored!.utilisation);
    same(a.mechanism!.governing.shear, M.shear!.mechanism!.governing.shear);
    same(a.mechanism!.loadFactor, M.shear!.mechanism!.loadFactor);
  });

  it('FRP: the debonding check and the strengthening limit read the fractile; the concrete service stress is the mean beam\'s against the fractile\'s limit', () => {
    const a = frpScheme(A);
    const f = frpScheme(F);
    const m = frpScheme(M);
    // ACI 440.2R-17 Eq. (10.1.1) εfd = 0.41√(f′c/(n·Ef·tf)) (from memory): of the characteristic strength
    same(a.frp!.limitStrain, f.frp!.limitStrain);
    expect(a.frp!.limitStrain).not.toBeCloseTo(m.frp!.limitStrain, 6);
    same(check(a, 'strengthening-limit').value, check(f, 'strengthening-limit').value);
    // The strain of the soffit when the FRP is bonded (εbi, ACI 440.2R-17 10.2.3) is a state of the
    // existing beam under its dead load — behaviour, of the mean; φMn (and M_Rd) of the strengthened
    // beam differ from the fractile beam's only through εbi (here by less than 1e-5 of the utilisation).
    same(a.installation[0]!.strain, m.installation[0]!.strain);
    expect(check(a, 'frp-debonding').value).toBeCloseTo(check(f, 'frp-debonding').value, 4);
    expect(check(a, 'frp-debonding').value).not.toBeCloseTo(check(m, 'frp-debonding').value, 3);
    expect(a.variant!.strength!.utilisation).toBeCloseTo(f.variant!.strength!.utilisation, 4);
    expect(a.variant!.strength!.utilisation).not.toBeCloseTo(m.variant!.strength!.utilisation, 3);
    const stress = check(a, 'concrete-service-stress');
    // ACI 440.2R-17 10.2.8 0.45 f′c (from memory) / EN 1992-1-1 7.2(2) k1·fck = 0.6 fck: a limit of the characteristic strength
    same(stress.limit, check(f, 'concrete-service-stress').limit);
    expect(stress.limit).toBeCloseTo((code === 'ACI 318-19' ? 0.45 : 0.6) * fractile.strength, 9);
    same(stress.value, check(m, 'concrete-service-stress').value);
    same(check(a, 'steel-service-stress').value, check(m, 'steel-service-stress').value);
    same(check(a, 'steel-service-stress').limit, check(f, 'steel-service-stress').limit);
  });

  it('moment–curvature, load–deflection, μΔ and both service-deflection methods are those of the mean', () => {
    const a = sagging(A);
    const m = sagging(M);
    same(a.cracking, m.cracking);
    same(a.firstYield, m.firstYield);
    same(a.peak, m.peak);
    same(a.peakCurvature, m.peakCurvature);
    expect(A.loadDeflection.points.length).toBe(M.loadDeflection.points.length);
    same(A.ductility.peak!.loadFactor, M.ductility.peak!.loadFactor);
    same(A.ductility.ultimateDeflection, M.ductility.ultimateDeflection);
    if (M.ductility.displacementDuctility !== null) same(A.ductility.displacementDuctility, M.ductility.displacementDuctility);
    const s = A.service!;
    const sm = M.service!;
    for (const k of ['dead', 'deadPlusLive', 'live'] as const) {
      same(s.immediate.integration[k], sm.immediate.integration[k]);
      same(s.immediate.code[k], sm.immediate.code[k]);
    }
    same(s.longTerm.integrationTotal, sm.longTerm.integrationTotal);
    same(s.longTerm.codeTotal, sm.longTerm.codeTotal);
    // and the fractile would have given a softer beam: the behaviour is not blind to the strength
    expect(F.service!.immediate.code.deadPlusLive).toBeGreaterThan(s.immediate.code.deadPlusLive * 1.001);
  });
});

describe('ACI 318-19: φMn of the as-found beam by hand with the fractile', () => {
  it('300 × 600, 3-T20 at d = 540, 2-T16 at 55, fy = 500 MPa: strain compatibility with the 0.85f′c block', () => {
    const A = analysed(withConcrete('ACI 318-19', 30, true));
    const fc = (A.retrofit!.derivedMaterials.find((m) => m.kind === 'concrete') as ConcreteSpec).strength;
    const b = 300;
    const d = 540;
    const dPrime = 55;
    const As = 3 * (Math.PI / 4) * 20 ** 2;
    const AsPrime = 2 * (Math.PI / 4) * 16 ** 2;
    const fy = 500;
    const Es = 200_000;
    // ACI 318-19 22.2.2.4.3: β1 = 0.85 for 17 ≤ f′c ≤ 28 MPa
    const beta1 = 0.85;
    // ACI 318-19 22.2.2.1 εcu = 0.003; the compression bars (below yield) displace block concrete: As′(Es·εs′ − 0.85f′c)
    // 0.85f′c·b·β1·c + As′(Es·0.003(c − d′)/c − 0.85f′c) = As·fy  →  a c² + p c + r = 0
    const a = 0.85 * fc * b * beta1;
    const p = AsPrime * (Es * 0.003 - 0.85 * fc) - As * fy;
    const r = -AsPrime * Es * 0.003 * dPrime;
    const c = (-p + Math.sqrt(p * p - 4 * a * r)) / (2 * a);
    const fsPrime = Es * 0.003 * (c - dPrime) / c;
    expect(fsPrime).toBeLessThan(fy);
    const block = 0.85 * fc * b * beta1 * c;
    const bars = AsPrime * (fsPrime - 0.85 * fc);
    const Mn = block * (d - (beta1 * c) / 2) + bars * (d - dPrime);
    // ACI 318-19 Table 21.2.2: εt = 0.003(d − c)/c ≥ 0.005 → φ = 0.90
    expect((0.003 * (d - c)) / c).toBeGreaterThan(0.005);
    const phiMn = 0.9 * Mn;
    expect(A.strength!.saggingResistance! / phiMn).toBeCloseTo(1, 2);
  });
});
