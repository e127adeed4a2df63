/**
 * EN 1992-1-1 6.2 shear resistance, evaluated by hand for an invented beam:
 *   bw = 300 mm, d = 550 mm, fck = 30 MPa, 3 bars of 25 mm (Asl = 1472.6 mm²), no axial force,
 *   two-leg 8 mm stirrups at 200 mm (Asw = 100.53 mm²), fywk = 500 MPa; γc = 1.5, γs = 1.15.
 */
import { describe, expect, it } from 'vitest';
import { say } from '../../core/units/phrase.ts';
import { enCompressionChordFactor, enConcreteShear, enMaximumShear, enMinimumShearStress, enOptimalStrutAngle, enShearSizeFactor, enShearStrength, enStirrupShear, enStrutReductionFactor } from '../../core/assessment/shear-en.ts';

const bw = 300;
const d = 550;
const fck = 30;
const asl = 3 * Math.PI * 12.5 ** 2; // 1472.62 mm²
const rhoL = asl / (bw * d); // 0.0089250
const asw = 2 * Math.PI * 16; // 100.53 mm²
const beam = { fck, bw, d, rhoL, axialForce: 0, area: 300 * 600 };
const design = { gammaC: 1.5, gammaS: 1.15 };

describe('EN 1992-1-1 6.2.2: members without shear reinforcement', () => {
  it('k = 1 + √(200/550) = 1.60302 ≤ 2 (6.2.2(1)); vmin = 0.035 × 1.60302^1.5 × √30 = 0.38908 MPa (Eq. 6.3N)', () => {
    expect(enShearSizeFactor(550)).toBeCloseTo(1.603023, 6);
    expect(enShearSizeFactor(100)).toBe(2);
    expect(enMinimumShearStress(1.603023, 30)).toBeCloseTo(0.389079, 6);
  });

  it('VRd,c = 0.18/1.5 × 1.60302 × (100 × 0.008925 × 30)^(1/3) × 300 × 550 = 0.12 × 1.60302 × 2.99164 × 165 000 = 94.95 kN ≥ vmin·bw·d = 64.20 kN (Eq. 6.2a/b)', () => {
    const r = enConcreteShear({ ...beam, gammaC: 1.5 });
    expect(r.cRdc).toBeCloseTo(0.12, 12);
    expect(r.value).toBeCloseTo(94_954.2, 0);
    expect(r.governedBy).toBe('6.2a');
  });

  it('the minimum (Eq. 6.2b) governs a lightly reinforced section: ρl = 0.001 → 0.12 × 1.60302 × 3^(1/3) × 165 000 = 45.8 kN < 64.2 kN', () => {
    const r = enConcreteShear({ ...beam, rhoL: 0.001, gammaC: 1.5 });
    expect(r.governedBy).toBe('6.2b');
    expect(r.value).toBeCloseTo(0.389079 * 165_000, 0);
  });

  it('ρl counts up to 0.02, and σcp = NEd/Ac up to 0.2fcd adds k1·σcp = 0.15σcp (6.2.2(1))', () => {
    expect(enConcreteShear({ ...beam, rhoL: 0.05, gammaC: 1.5 }).rhoL).toBe(0.02);
    const compressed = enConcreteShear({ ...beam, axialForce: 360_000, gammaC: 1.5 }); // σcp = 2.0 MPa < 0.2 × 20 = 4
    expect(compressed.value - enConcreteShear({ ...beam, gammaC: 1.5 }).value).toBeCloseTo(0.15 * 2 * 165_000, 3);
    const capped = enConcreteShear({ ...beam, axialForce: 3.6e6, gammaC: 1.5 }); // σcp = 20 MPa → 4 MPa
    expect(capped.sigmaCp).toBeCloseTo(4, 12);
  });
});

describe('EN 1992-1-1 6.2.3: members with shear reinforcement, strut angle between cot θ = 1 and 2.5', () => {
  // z = 0.9d = 495 mm; fywd = 500/1.15 = 434.78 MPa; ν1 = ν = 0.6(1 − 30/250) = 0.528 (Eq. 6.6N); fcd = 30/1.5 = 20 MPa; αcw = 1
  it('ν = 0.528 (Eq. 6.6N); αcw = 1 without axial force and 1 + σcp/fcd up to 0.25fcd (Eq. 6.11aN)', () => {
    expect(enStrutReductionFactor(30)).toBeCloseTo(0.528, 12);
    expect(enCompressionChordFactor(0, 20)).toBe(1);
    expect(enCompressionChordFactor(4, 20)).toBeCloseTo(1.2, 12);
    expect(enCompressionChordFactor(8, 20)).toBe(1.25);
    expect(enCompressionChordFactor(15, 20)).toBeCloseTo(2.5 * (1 - 0.75), 12);
  });

  it('light stirrups: cot θ = 2.5; VRd,s = 0.50265 × 495 × 434.78 × 2.5 = 270.45 kN (Eq. 6.8) < VRd,max = 300 × 495 × 0.528 × 20/(2.5 + 0.4) = 540.74 kN (Eq. 6.9)', () => {
    // √(300 × 0.528 × 20/(0.50265 × 434.78) − 1) = √13.496 = 3.674 > 2.5 → 2.5
    const r = enShearStrength({ ...beam, stirrups: { area: asw, spacing: 200, yieldStress: 500 } }, design);
    expect(r.cotTheta).toBe(2.5);
    expect(r.z).toBeCloseTo(495, 12);
    expect(r.steel).toBeCloseTo(270_450.2, 0);
    expect(r.maximum).toBeCloseTo(540_744.8, 0);
    expect(r.value).toBeCloseTo(270_450.2, 0); // max(VRd,c = 94.95, min(VRd,s, VRd,max))
    expect(r.supportLimit).toBeCloseTo(0.5 * 300 * 550 * 0.528 * 20, 6); // Eq. 6.5: 871.2 kN
  });

  it('medium stirrups (Asw/s = 1.5 mm²/mm): the angle where VRd,s = VRd,max, cot θ = √(300 × 0.528 × 20/(1.5 × 434.78) − 1) = 1.96408, both 634.06 kN', () => {
    const cot = enOptimalStrutAngle(1.5, 500 / 1.15, 1, bw, 0.528, 20);
    expect(cot).toBeCloseTo(1.964077, 5);
    expect(enStirrupShear(1.5, 495, 500 / 1.15, cot)).toBeCloseTo(634_055.4, 0);
    expect(enMaximumShear(1, bw, 495, 0.528, 20, cot)).toBeCloseTo(634_055.4, 0);
  });

  it('heavy stirrups (4 legs of 12 mm at 100 mm): the struts govern at cot θ = 1, VRd,max = 300 × 495 × 0.528 × 20/2 = 784.08 kN', () => {
    const r = enShearStrength({ ...beam, stirrups: { area: 4 * Math.PI * 36, spacing: 100, yieldStress: 500 } }, design);
    expect(r.cotTheta).toBe(1);
    expect(r.maximum).toBeCloseTo(784_080, 3);
    expect(r.value).toBeCloseTo(784_080, 3);
    expect(r.notes.map((w) => say(w, 'si')).join(' ')).toMatch(/struts govern/);
  });

  it('the chosen angle gives the largest min(VRd,s, VRd,max) of every cot θ in [1, 2.5]', () => {
    for (const aps of [0.3, 0.8, 1.5, 3, 6]) {
      const fywd = 500 / 1.15;
      const best = enOptimalStrutAngle(aps, fywd, 1, bw, 0.528, 20);
      const at = (c: number) => Math.min(enStirrupShear(aps, 495, fywd, c), enMaximumShear(1, bw, 495, 0.528, 20, c));
      for (let c = 1; c <= 2.5; c += 0.05) expect(at(best)).toBeGreaterThanOrEqual(at(c) - 1e-6);
    }
  });

  it('nominal strengths (γc = γs = 1) are the design values without partial factors: VRk,c = 0.18 × … = 142.43 kN', () => {
    const r = enShearStrength({ ...beam, stirrups: null }, { gammaC: 1, gammaS: 1 });
    expect(r.concrete.value).toBeCloseTo(142_431.4, 0);
    expect(r.value).toBeCloseTo(142_431.4, 0);
  });

  it('ρw,min = 0.08√fck/fyk = 0.000876 (Eq. 9.5N): the 8 mm stirrups at 200 mm (ρw = 0.001676) meet it', () => {
    const r = enShearStrength({ ...beam, stirrups: { area: asw, spacing: 200, yieldStress: 500 } }, design);
    expect(r.minimumRatio).toBeCloseTo((0.08 * Math.sqrt(30)) / 500, 12);
    expect(r.meetsMinimum).toBe(true);
  });
});
