/**
 * ACI 318-19 22.5 one-way shear strength, evaluated by hand for an invented beam:
 *   bw = 350 mm, d = 590 mm, f′c = 32 MPa (normal weight, λ = 1), 4 bars of 25 mm (As = 1963.5 mm²),
 *   two-leg 10 mm stirrups at 200 mm (Av = 157.08 mm²), fyt = 420 MPa, no axial force.
 */
import { describe, expect, it } from 'vitest';
import { say } from '../../core/units/phrase.ts';
import { analyzeProject } from '../../core/analysis.ts';
import { smallProject } from '../fixtures/projects.ts';
import { ACI_SHEAR_PHI, aciConcreteShear, aciMinimumShearReinforcement, aciShearStrength, aciSizeEffectFactor, aciStirrupShear } from '../../core/assessment/shear-aci.ts';
import { convertUnit } from '../../core/units/convert.ts';

const bw = 350;
const d = 590;
const fc = 32;
const as = 4 * Math.PI * 12.5 ** 2; // 1963.50 mm²
const rhoW = as / (bw * d); // 0.0095085
const av = 2 * Math.PI * 5 ** 2; // 157.08 mm²
const beam = { fc, lambda: 1, bw, d, rhoW, axialForce: 0, grossArea: 350 * 650 };

describe('ACI 318-19 shear: the beam worked by hand', () => {
  it('Av,min/s = max(0.062√32, 0.35) × 350/420 = 0.3507 × 0.8333 = 0.2923 mm²/mm (Table 9.6.3.4); Av/s = 0.785 ≥ it', () => {
    // 0.062 × 5.65685 = 0.35072 > 0.35
    expect(aciMinimumShearReinforcement(fc, bw, 420)).toBeCloseTo(0.29227, 5);
    expect(av / 200).toBeGreaterThan(0.29227);
  });

  it('Vc with Av ≥ Av,min: (a) 0.17√32 × 350 × 590 = 198.58 kN, (b) 0.66 × 0.009508^(1/3) × √32 × 350 × 590 = 163.33 kN → (a) (Table 22.5.5.1)', () => {
    // ρw^(1/3) = 0.21185; 0.66 × 0.21185 × 5.65685 × 206 500 = 163 334 N
    const vc = aciConcreteShear({ ...beam, meetsMinimum: true });
    expect(vc.value).toBeCloseTo(198_583.9, 0);
    expect(vc.expression).toBe('(a)');
    expect(vc.capped).toBe(false); // cap 0.42√32 × 206 500 = 490.6 kN (22.5.5.1.1)
  });

  it('Vc with Av < Av,min: (c) with λs = √(2/(1 + 590/254)) = 0.77582 → 0.66 × 0.77582 × 0.21185 × √32 × 350 × 590 = 126.72 kN (Eq. 22.5.5.1.3)', () => {
    expect(aciSizeEffectFactor(590)).toBeCloseTo(0.775819, 6);
    const vc = aciConcreteShear({ ...beam, meetsMinimum: false });
    expect(vc.expression).toBe('(c)');
    expect(vc.value).toBeCloseTo(126_717.4, 0);
  });

  it('Vs = Av·fyt·d/s = 157.08 × 420 × 590/200 = 194.62 kN (Eq. 22.5.8.5.3); Vn = 393.21 kN; φVn = 0.75 × 393.21 = 294.90 kN', () => {
    expect(aciStirrupShear(av, 420, d, 200)).toBeCloseTo(194_621.7, 0);
    const r = aciShearStrength({ ...beam, stirrups: { area: av, spacing: 200, yieldStress: 420 } });
    expect(r.meetsMinimum).toBe(true);
    expect(r.nominal).toBeCloseTo(393_205.5, 0);
    expect(r.phi).toBe(0.75); // Table 21.2.1(b)
    expect(r.design).toBeCloseTo(294_904.1, 0);
    expect(ACI_SHEAR_PHI).toBe(0.75);
  });

  it('without stirrups Vn = Vc by (c)', () => {
    const r = aciShearStrength({ ...beam, stirrups: null });
    expect(r.steel).toBe(0);
    expect(r.nominal).toBeCloseTo(126_717.4, 0);
  });
});

describe('ACI 318-19 shear limits', () => {
  it('fyt is limited to 420 MPa for shear (Table 20.2.2.4(a)): 520 MPa stirrups give the 420 MPa Vs', () => {
    const r = aciShearStrength({ ...beam, stirrups: { area: av, spacing: 200, yieldStress: 520 } });
    expect(r.stirrupYield).toBe(420);
    expect(r.steel).toBeCloseTo(194_621.7, 0);
    expect(r.notes.map((w) => say(w, 'si')).join(' ')).toMatch(/420 MPa/);
  });

  it('Vs counts up to 0.66√f′c·bw·d (22.5.1.2): 4 legs of 16 mm at 50 mm would give 1868 kN, limited to 771.0 kN', () => {
    const heavy = 4 * Math.PI * 64;
    const r = aciShearStrength({ ...beam, stirrups: { area: heavy, spacing: 50, yieldStress: 420 } });
    expect(r.steelUnlimited).toBeCloseTo((heavy * 420 * 590) / 50, 3);
    expect(r.steel).toBeCloseTo(0.66 * Math.sqrt(32) * 350 * 590, 3); // 770 972.7 N
  });

  it('√f′c is limited to 8.3 MPa (22.5.3.1): f′c = 90 MPa gives the Vc of f′c = 68.9 MPa', () => {
    const vc = aciConcreteShear({ ...beam, fc: 90, meetsMinimum: true });
    expect(vc.sqrtFc).toBe(8.3);
    expect(vc.value).toBeCloseTo(0.17 * 8.3 * bw * d, 6);
  });

  it('axial compression adds Nu/6Ag, at most 0.05f′c; tension reduces Vc but not below zero (Table 22.5.5.1, 22.5.5.1.1)', () => {
    const ag = 350 * 650;
    const compressed = aciConcreteShear({ ...beam, axialForce: 500_000, meetsMinimum: true });
    expect(compressed.axialStress).toBeCloseTo(500_000 / (6 * ag), 10);
    const squeezed = aciConcreteShear({ ...beam, axialForce: 1e8, meetsMinimum: true });
    expect(squeezed.axialStress).toBeCloseTo(0.05 * fc, 10);
    const pulled = aciConcreteShear({ ...beam, axialForce: -1e8, meetsMinimum: true });
    expect(pulled.value).toBe(0);
  });

  it('the size effect λs is 1 for d ≤ 254 mm and falls with depth', () => {
    expect(aciSizeEffectFactor(200)).toBe(1);
    expect(aciSizeEffectFactor(254)).toBe(1);
    expect(aciSizeEffectFactor(1500)).toBeLessThan(aciSizeEffectFactor(800));
  });
});

describe('ACI 318-19 SI constants against the in.-lb. forms', () => {
  const psiToMPa = (x: number) => convertUnit(x, 'psi', 'MPa');
  it('2λ√f′c psi ≈ 0.17λ√f′c MPa and 8λρw^(1/3)√f′c psi ≈ 0.66λρw^(1/3)√f′c MPa (within 3 %)', () => {
    for (const fcPsi of [3000, 4000, 6000, 8000]) {
      const fcMPa = psiToMPa(fcPsi);
      expect(Math.abs(psiToMPa(2 * Math.sqrt(fcPsi)) / (0.17 * Math.sqrt(fcMPa)) - 1)).toBeLessThan(0.03);
      expect(Math.abs(psiToMPa(8 * Math.sqrt(fcPsi)) / (0.66 * Math.sqrt(fcMPa)) - 1)).toBeLessThan(0.03);
    }
  });

  it('λs = √(2/(1 + d/10)) with d in inches equals the d/254 form in mm, and the SI edition\'s 1 + 0.004d within 1 %', () => {
    for (const dMm of [300, 600, 1000, 2000]) {
      const us = Math.min(1, Math.sqrt(2 / (1 + dMm / 25.4 / 10)));
      expect(aciSizeEffectFactor(dMm)).toBeCloseTo(us, 12);
      expect(Math.abs(Math.min(1, Math.sqrt(2 / (1 + 0.004 * dMm))) / us - 1)).toBeLessThan(0.01);
    }
  });
});

describe('ACI 318-19 Eq. 22.5.5.1.3 in the SI form for SI projects', () => {
  it('λs = √(2/(1 + 0.004d)) with d in mm: d = 500 mm gives √(2/3), d = 250 mm gives 1', () => {
    // ACI 318-19 (SI edition) Eq. 22.5.5.1.3: λs = √(2/(1 + 0.004d)) ≤ 1, d in mm
    expect(aciSizeEffectFactor(500, 'si')).toBeCloseTo(Math.sqrt(2 / 3), 12);
    expect(aciSizeEffectFactor(250, 'si')).toBe(1);
    // ACI 318-19 Eq. 22.5.5.1.3 (in.-lb.): λs = √(2/(1 + d/10)), d in inches
    expect(aciSizeEffectFactor(500, 'us')).toBeCloseTo(Math.sqrt(2 / (1 + 500 / 25.4 / 10)), 12);
  });

  it('a member without stirrups takes Vc of Table 22.5.5.1(c) with the form of its project\'s unit system', () => {
    const vcOf = (unitSystem: 'si' | 'us') => {
      const project = smallProject('ACI 318-19', [{
        id: 'B', name: 'B', supports: 'simply-supported', span: 6000, zones: [{ from: 0, to: 6000, sectionId: 'bare' }],
        loads: [{ kind: 'uniform', loadCase: 'superimposed', magnitude: 8 }, { kind: 'uniform', loadCase: 'live', magnitude: 12 }],
        service: { sustainedLiveFraction: 0.25, durationMonths: 60, limitCases: ['aci-floor-immediate'] },
        capacity: { pattern: 'proportional', hingeLengthMethod: 'priestley-2007' },
      }]);
      const bare = { ...project.sections[0]!, id: 'bare', name: 'no stirrups' };
      delete (bare as { hoops?: unknown }).hoops;
      const p = { ...project, info: { ...project.info, unitSystem }, sections: [...project.sections, bare] };
      const cap = analyzeProject(p).members[0]!.shear!.capacities.find((c) => c.direction === 'sagging')!;
      return { vc: cap.concreteContribution, d: cap.effectiveDepth };
    };
    const si = vcOf('si');
    const us = vcOf('us');
    // d = 540 mm: λs = √(2/(1 + 0.004·540)) in SI, √(2/(1 + 540/254)) in in.-lb.; Vc of row (c) is proportional to λs (ACI 318-19 Table 22.5.5.1(c))
    expect(si.d).toBeCloseTo(540, 9);
    expect(si.vc / us.vc).toBeCloseTo(Math.sqrt((1 + 540 / 254) / (1 + 0.004 * 540)), 9);
  });
});

