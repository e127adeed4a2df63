/**
 * The flexural strength check of a member (issue 10 items 1 and 3): factored demand against the code
 * design resistance at every station, both senses, every zone, for every strength combination, and
 * the governing point reported. Worked by hand with the rectangular stress block.
 * Everything goes through the project file API (parseProject → analyzeProject).
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../core/analysis.ts';
import type { MemberResult } from '../../core/assessment/results.ts';
import { say } from '../../core/units/phrase.ts';
import { parseProject, serializeProject } from '../../core/project/file.ts';
import type { MemberDefinition, Project } from '../../core/project/types.ts';
import type { SteelSpec } from '../../core/materials/specs.ts';
import { member, smallProject } from '../fixtures/projects.ts';

const fc = 30;
const fy = 420;
const b = 300;
const d = 540;
const L = 6000;
const bar20 = Math.PI * 10 ** 2;

/**
 * ACI 318-19 design moment of a singly reinforced rectangle by hand: rectangular block (22.2.2.4.1,
 * 0.85 f′c over a = β1·c), εcu = 0.003 (22.2.2.1), yielded steel, φ from εt (Table 21.2.2).
 */
function aciRectangle(as: number, width = b, depth = d, fcp = fc, fyp = fy) {
  // ACI 318-19 Table 22.2.2.4.3 (MPa): β1 = 0.85 − 0.05(f′c − 28)/7 between 28 and 55 MPa
  const beta1 = fcp <= 28 ? 0.85 : Math.max(0.65, 0.85 - (0.05 * (fcp - 28)) / 7);
  const a = (as * fyp) / (0.85 * fcp * width);
  const c = a / beta1;
  const epsT = (0.003 * (depth - c)) / c;
  const epsY = fyp / 200_000;
  // ACI 318-19 Table 21.2.2, other transverse reinforcement
  const phi = epsT >= epsY + 0.003 ? 0.9 : epsT <= epsY ? 0.65 : 0.65 + (0.25 * (epsT - epsY)) / 0.003;
  const mn = as * fyp * (depth - a / 2);
  return { a, c, epsT, phi, mn, design: phi * mn };
}

const elasticPlastic: SteelSpec = { kind: 'steel', id: 'g420', name: 'Grade 420, no hardening', model: 'elastic-plastic', yieldStress: fy, ultimateStress: fy, ruptureStrain: 0.1 };
const hardening: SteelSpec = { kind: 'steel', id: 'g420', name: 'Grade 420, hardening', model: 'park-paulay', yieldStress: fy, ultimateStress: 1.5 * fy, hardeningStrain: 0.008, ruptureStrain: 0.12 };

/**
 * The beam: 6 m simply supported 300 × 600, 2-T20 / 4-T20 / 2-T20 with the extra bars cut off
 * at L/3 and 2L/3; no self-weight; superimposed 20 N/mm and live 15 N/mm, so 1.2D + 1.6L = 48 N/mm.
 */
function cutOffProject(steel: SteelSpec, overrides: Partial<MemberDefinition> = {}): Project {
  const base = smallProject('ACI 318-19');
  const section = (id: string, count: number) => ({
    id, name: `300 × 600, ${count}-T20`, shape: { kind: 'rectangle' as const, width: b, height: 600 }, concreteId: 'c30',
    bars: [{ steelId: steel.id, depth: d, count, diameter: 20 }],
    hoops: { steelId: steel.id, diameter: 10, spacing: 150, verticalLegs: 2, clearCover: 30, confineCore: false },
  });
  const m = member('CUT', 'simply-supported', L, 's2', {
    zones: [{ from: 0, to: 2000, sectionId: 's2' }, { from: 2000, to: 4000, sectionId: 's4' }, { from: 4000, to: L, sectionId: 's2' }],
    loads: [{ kind: 'uniform', loadCase: 'superimposed', magnitude: 20 }, { kind: 'uniform', loadCase: 'live', magnitude: 15 }],
    includeSelfWeight: false,
    ...overrides,
  });
  return {
    ...base,
    materials: [{ kind: 'concrete', id: 'c30', name: 'C30', strength: fc, compressionModel: 'hognestad', tensionModel: 'tension-stiffening' }, steel],
    sections: [section('s2', 2), section('s4', 4)],
    members: [m],
  };
}

function run(project: Project): MemberResult {
  const parsed = parseProject(serializeProject(project));
  expect(parsed.diagnostics.filter((x) => x.severity === 'error')).toEqual([]);
  return analyzeProject(parsed.project!).members[0]!;
}

describe('one flexural check at every station (issue 10 item 1)', () => {
  const result = run(cutOffProject(elasticPlastic));
  const two = aciRectangle(2 * bar20);
  const four = aciRectangle(4 * bar20);
  // statics of a simple span: M(x) = w·x·(L − x)/2
  const demandAt = (x: number) => (48 * x * (L - x)) / 2;

  it('hand numbers: φMn(2-T20) = 124.2 kN·m and φMn(4-T20) = 240.1 kN·m, both tension-controlled', () => {
    expect(two.design / 1e6).toBeCloseTo(124.2, 1);
    expect(four.design / 1e6).toBeCloseTo(240.1, 1);
    expect(two.phi).toBe(0.9);
    expect(four.phi).toBe(0.9);
  });

  it('fails at the cut-off: 192 kN·m at x = 2 m against φMn(2-T20), utilisation 1.55 (the peak alone read 0.90)', () => {
    const s = result.strength!;
    expect(demandAt(2000) / 1e6).toBeCloseTo(192, 9);
    expect(s.pass).toBe(false);
    expect(s.utilisation).toBeCloseTo(demandAt(2000) / two.design, 4);
    expect(s.utilisation).toBeCloseTo(1.546, 3);
    expect(s.direction).toBe('sagging');
    expect([2000, 4000]).toContain(s.position);
    expect(s.demand).toBeCloseTo(192e6, -2);
    expect(s.resistance! / two.design).toBeCloseTo(1, 6);
    // The middle zone's own worst point is the peak: 216 kN·m against φMn(4-T20) = 0.90.
    const middle = s.zones[1]!.sagging!;
    expect(middle.position).toBeCloseTo(3000, 6);
    expect(middle.utilisation).toBeCloseTo(demandAt(3000) / four.design, 4);
    expect(middle.utilisation).toBeCloseTo(0.90, 2);
    expect(s.zones[0]!.sagging!.utilisation).toBeCloseTo(s.utilisation, 9);
    expect(s.zones[0]!.hogging).toBeNull();
    expect(result.status).toBe('check-fails');
    expect(say(result.governingMode, 'si')).toMatch(/strength check fails \(utilisation 1\.55 at (2\.00|4\.00) m, sagging/);
  });

  it('no station count hides it: with 20 equal segments (none at 2 m or 4 m) the zone boundaries are still checked', () => {
    const coarse = run({ ...cutOffProject(elasticPlastic), settings: { ...smallProject().settings, stations: 20 } });
    expect(coarse.strength!.utilisation).toBeCloseTo(result.strength!.utilisation, 9);
  });

  it('a strain-hardening steel law (fu = 1.5 fy) changes nothing in the check: ACI 318-19 20.2.2.1, fs ≤ fy', () => {
    const hardened = run(cutOffProject(hardening)).strength!;
    expect(hardened.utilisation).toBe(result.strength!.utilisation);
    expect(hardened.zones.map((z) => z.sagging?.resistance)).toEqual(result.strength!.zones.map((z) => z.sagging?.resistance));
  });

  it('the member\'s own capacity curve fails at the cut-off too: the check and the analysis agree', () => {
    // The member engine ends the curve at a cut-off (x = L/3 or 2L/3): the weak zone's section at its
    // boundary reaches the top of its curve and its hinge reaches the end of the curve; nothing at
    // midspan. The weak section's steel feels the larger moment a_l into the strong zone
    // (EN 1992-1-1 9.2.1.3(2) tension shift), so the hinge forms before the peak moment of 2-T20
    // alone would be reached at 2 m.
    expect(result.ductility.failureCause).toMatch(/hinge at 0\.(33|67)ℓ from the left support reaches its rotation capacity/);
    expect(result.ductility.failureCause).not.toMatch(/midspan|not converged/);
    expect(result.loadDeflection.status).toBe('complete');
    const hinges = result.ductility.hinges;
    expect(hinges.map((h) => h.position).sort((a, b) => a - b)).toEqual([2000, 4000]);
    expect(hinges.every((h) => h.sectionId === 's2' && h.direction === 'sagging' && h.localised)).toBe(true);
    // Statics: the hinge forms where w·x(L − x)/2 shifted by a_l = 0.45d (243 mm) into the strong
    // zone reaches the weak section's moment, M(2.243 m) = 147.4 kN·m per λ; that moment is the
    // section's strength with its own laws, within 0.97–1.1 of Mn(2-T20) = φMn/0.9 by the ACI 318-19
    // rectangular block (elastic–plastic steel, Hognestad concrete; band: common practice, no source)
    const lambdaHinge = hinges[0]!.localisationLoadFactor!;
    const last = result.loadDeflection.points[result.loadDeflection.points.length - 1]!;
    // the pattern is the whole (unfactored) load, proportional: w per unit λ = total load / λ / L
    const wPerLambda = last.totalLoad / last.loadFactor / L;
    expect(wPerLambda).toBeCloseTo(35, 6);
    const mShifted = (lambdaHinge * wPerLambda * (2000 + 0.45 * d) * (L - 2000 - 0.45 * d)) / 2 / 1e6;
    expect(mShifted).toBeGreaterThan((0.97 * two.mn) / 1e6);
    expect(mShifted).toBeLessThan((1.1 * two.mn) / 1e6);
    expect(result.status).not.toBe('ok');
  });
});

describe('load combinations (issue 10 item 3)', () => {
  it('ACI 318-19 5.3.1: 1.4D governs a beam with little live load and is named', () => {
    // D = 30 N/mm, L = 2 N/mm: (a) 1.4 × 30 = 42 N/mm; (b) 1.2 × 30 + 1.6 × 2 = 39.2 N/mm.
    const r = run(cutOffProject(elasticPlastic, { loads: [{ kind: 'uniform', loadCase: 'superimposed', magnitude: 30 }, { kind: 'uniform', loadCase: 'live', magnitude: 2 }] }));
    const s = r.strength!;
    expect(s.combination).toBe('1.4D (ACI 318-19 Eq. (5.3.1a))');
    // at x = 2 m: 42 × 2000 × 4000 / 2 = 168 kN·m against φMn(2-T20)
    expect(s.utilisation).toBeCloseTo(168e6 / aciRectangle(2 * bar20).design, 4);
    expect(s.combinations.map((c) => c.combination)).toEqual(['1.4D (ACI 318-19 Eq. (5.3.1a))', '1.2D + 1.6L (ACI 318-19 Eq. (5.3.1b))']);
    expect(s.combinations[1]!.utilisation).toBeCloseTo(156.8e6 / aciRectangle(2 * bar20).design, 4);
    expect(say(r.governingMode, 'si')).toContain('under 1.4D (ACI 318-19 Eq. (5.3.1a))');
    // shear takes the same envelope
    expect(r.shear!.factored!.combination).toBe('1.4D (ACI 318-19 Eq. (5.3.1a))');
  });

  it('own load factors replace the code\'s combinations and are named as such', () => {
    const r = run(cutOffProject(elasticPlastic, { strengthFactors: { dead: 1, superimposed: 1, live: 1 } }));
    expect(r.strength!.combinations).toHaveLength(1);
    expect(r.strength!.combination).toBe('1D + 1SD + 1L (load factors set for the member)');
    expect(r.strength!.utilisation).toBeCloseTo(((35 * 2000 * 4000) / 2) / aciRectangle(2 * bar20).design, 4);
  });

  it('EN 1990: Eq. (6.10) by default, or the less favourable of (6.10a) and (6.10b) when chosen', () => {
    const en = (rule?: '6.10' | '6.10a-6.10b', psi0?: number): Project => {
      const p = cutOffProject(elasticPlastic, { loads: [{ kind: 'uniform', loadCase: 'superimposed', magnitude: 20 }, { kind: 'uniform', loadCase: 'live', magnitude: 15 }] });
      return { ...p, info: { ...p.info, codeBasis: 'EN 1992-1-1' }, settings: { ...p.settings, ...(rule ? { enCombination: rule } : {}), ...(psi0 !== undefined ? { liveCombinationFactor: psi0 } : {}) } };
    };
    const single = run(en()).strength!;
    expect(single.combination).toBe('1.35G + 1.5Q (EN 1990 Eq. (6.10))');
    const pair = run(en('6.10a-6.10b')).strength!;
    // EN 1990 Table A1.2(B): (6.10a) 1.35G + 1.5ψ0Q = 27 + 1.05 × 15 = 42.75 N/mm;
    // (6.10b) 0.85 × 1.35G + 1.5Q = 22.95 + 22.5 = 45.45 N/mm — (6.10b) governs, below (6.10) 49.5 N/mm.
    expect(pair.combinations.map((c) => c.combination)).toEqual(['1.35G + 1.05Q (EN 1990 Eq. (6.10a), ψ0 = 0.7)', '1.1475G + 1.5Q (EN 1990 Eq. (6.10b), ξ = 0.85)']);
    expect(pair.combination).toBe('1.1475G + 1.5Q (EN 1990 Eq. (6.10b), ξ = 0.85)');
    expect(pair.utilisation / single.utilisation).toBeCloseTo(45.45 / 49.5, 6);
    // With ψ0 = 1.0 (e.g. storage, EN 1990 Table A1.1 category E) (6.10a) gives 27 + 22.5 = 49.5 and governs.
    expect(run(en('6.10a-6.10b', 1)).strength!.combination).toBe('1.35G + 1.5Q (EN 1990 Eq. (6.10a), ψ0 = 1)');
  });
});
