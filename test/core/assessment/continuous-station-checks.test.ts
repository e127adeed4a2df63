/**
 * The code's strength and shear checks of a continuous beam at every station, for every strength
 * combination and live-load arrangement (core/assessment/continuous.ts through the one flexural rule of
 * core/assessment/flexure.ts), and the verdict they give: OK, check fails, brittle.
 */
import { describe, expect, it } from 'vitest';
import { codeCombinations } from '../../../core/assessment/combinations.ts';
import type { ContinuousBeamDefinition } from '../../../core/continuous/definition.ts';
import { assessContinuousMember, type ContinuousAssessmentContext } from '../../../core/assessment/continuous-verdict.ts';
import { materialLibrary } from '../../../core/materials/library.ts';
import type { CodeBasis, MaterialSpec } from '../../../core/materials/specs.ts';
import { analyzeSection, type SectionAnalysis } from '../../../core/section/analyze.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import { say } from '../../../core/units/index.ts';
import { continuousBeam } from '../../fixtures/continuous.ts';

const specs: MaterialSpec[] = [
  { kind: 'concrete', id: 'c30', name: 'C30', strength: 30, compressionModel: 'hognestad', tensionModel: 'tension-stiffening' },
  { kind: 'steel', id: 'b500', name: 'B500', model: 'park-paulay', yieldStress: 500, ultimateStress: 600, hardeningStrain: 0.01, ruptureStrain: 0.1 },
  { kind: 'steel', id: 's420', name: 'stirrups 420', model: 'elastic-plastic', yieldStress: 420, ultimateStress: 420, ruptureStrain: 0.1 },
];
const hoops = { steelId: 's420', diameter: 10, spacing: 150, verticalLegs: 2, clearCover: 30, confineCore: false };
/** 300×600 with `bottom` and `top` bar layers (count × diameter). */
function section(id: string, bottom: [number, number], top: [number, number]): SectionDefinition {
  return {
    id, name: id, shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c30', hoops,
    bars: [{ steelId: 'b500', depth: 540, count: bottom[0], diameter: bottom[1] }, { steelId: 'b500', depth: 55, count: top[0], diameter: top[1] }],
  };
}
const sections = [
  section('weak-top', [4, 20], [2, 16]),
  section('span', [4, 20], [2, 12]),
  section('support', [4, 20], [5, 20]),
  section('light', [2, 10], [5, 20]),
];

function context(code: CodeBasis): ContinuousAssessmentContext {
  const library = materialLibrary(specs, code);
  const cache = new Map<string, SectionAnalysis>();
  for (const s of sections) cache.set(s.id, analyzeSection(s, `sections[${s.id}]`, library, { code, momentDropFraction: 0.8, bilinearMethod: 'priestley-2007' }));
  const combinations = codeCombinations(code);
  return {
    code,
    segments: 40,
    section: (id) => cache.get(id),
    sectionIds: new Set(cache.keys()),
    path: 'continuousMembers[0] "CB"',
    strengthFactors: combinations.at(-1)!.factors,
    deadOnlyFactor: code === 'ACI 318-19' ? 1.4 : undefined,
    checks: {
      combinations,
      zone: (id) => {
        const definition = sections.find((s) => s.id === id)!;
        return { definition, concrete: library.concreteSpec('c30')!, stirrupYield: 420 };
      },
    },
  };
}

/** Two equal spans of 6 m, dead 15 N/mm and live 10 N/mm on both, zones as given. */
function twoSpans(zones: ContinuousBeamDefinition['zones']): ContinuousBeamDefinition {
  const loads = [1, 2].flatMap((span) => [
    { kind: 'uniform' as const, loadCase: 'dead' as const, span, magnitude: 15 },
    { kind: 'uniform' as const, loadCase: 'live' as const, span, magnitude: 10 },
  ]);
  return continuousBeam([6000, 6000], loads, { zones });
}

const L = 6000;
/** Factored load of ACI 318-19 Eq. (5.3.1b), 1.2D + 1.6L, N/mm. */
const wu = 1.2 * 15 + 1.6 * 10;

describe('strength and shear at every station of a continuous beam', () => {
  it('hogging steel too small at the interior support: fails there, under 1.2D + 1.6L with both spans loaded', () => {
    const r = assessContinuousMember(twoSpans([{ from: 0, to: 2 * L, sectionId: 'weak-top' }]), context('ACI 318-19'));
    expect(r.errors).toEqual([]);
    const g = r.checks!.flexureGoverning;
    expect(g.x).toBeCloseTo(L, 6);
    expect(g.direction).toBe('hogging');
    // Two equal spans, uniform load on both: support moment −wL²/8 (standard beam tables; from memory)
    expect(g.demand / ((wu * L * L) / 8)).toBeCloseTo(1, 6);
    expect(g.combination).toMatch(/^1\.2D \+ 1\.6L \(ACI 318-19 Eq\. \(5\.3\.1b\)\)$/);
    expect(g.arrangement).toMatch(/^spans 1 and 2 loaded/);
    expect(g.utilisation).toBeGreaterThan(1);
    expect(r.checks!.flexure.pass).toBe(false);
    expect(r.verdict.status).toBe('check-fails');
    expect(r.verdict.governingSpan).toBe(g.part);
    const words = say(r.verdict.governingMode, 'si');
    expect(words).toMatch(/^Strength check fails \(utilisation \d\.\d\d: span 1, hogging at 6\.00 m from its left end, under 1\.2D \+ 1\.6L .*spans 1 and 2 loaded/);
    // every combination of the code was checked (ACI 318-19 5.3.1 (a) and (b))
    expect(r.checks!.combinations).toEqual(['1.4D (ACI 318-19 Eq. (5.3.1a))', '1.2D + 1.6L (ACI 318-19 Eq. (5.3.1b))']);
  });

  it('top bars cut off too early: fails at the cut-off, in the span section, though the support itself passes', () => {
    const r = assessContinuousMember(twoSpans([
      { from: 0, to: 5400, sectionId: 'span' },
      { from: 5400, to: 6600, sectionId: 'support' },
      { from: 6600, to: 2 * L, sectionId: 'span' },
    ]), context('ACI 318-19'));
    const g = r.checks!.flexureGoverning;
    expect([5400, 6600]).toContainEqual(Math.round(g.x));
    expect(g.sectionId).toBe('span');
    expect(g.direction).toBe('hogging');
    // Two equal spans, both loaded: end reaction 3wL/8, so M(x) = 3wLx/8 − wx²/2 (standard beam tables; from memory).
    // At x = 0.9L: 1.2D + 1.6L on both spans gives the largest hogging of the arrangements (the span-2-only
    // arrangement gives 3·18·6000·5400/8 − 9·5400² − 6000·5400 = −76.1 kN·m against −82.6 kN·m).
    const x = 5400;
    const hand = -((3 * wu * L * x) / 8 - (wu * x * x) / 2);
    // zone stiffness Ec·Ig differs by the bars only: 1 % on the moment
    expect(g.demand / hand).toBeCloseTo(1, 2);
    expect(g.arrangement).toMatch(/^spans 1 and 2 loaded/);
    expect(g.utilisation).toBeGreaterThan(1);
    expect(r.verdict.status).toBe('check-fails');
    // the support section (5 Ø20 top) carries −wL²/8 at the support
    const supportZone = r.checks!.flexure.zones[1]!;
    expect(supportZone.hogging!.utilisation).toBeLessThan(1);
    expect(supportZone.hogging!.demand / ((wu * L * L) / 8)).toBeCloseTo(1, 2);
  });

  it('a beam that passes every check and is ductile reads OK, naming its governing station', () => {
    const r = assessContinuousMember(twoSpans([{ from: 0, to: 2 * L, sectionId: 'support' }]), context('ACI 318-19'));
    expect(r.checks!.flexure.pass).toBe(true);
    expect(r.checks!.shear.pass).toBe(true);
    expect(r.checks!.brittle).toEqual([]);
    expect(r.verdict.status).toBe('ok');
    expect(r.verdict.ductilityAvailable).toBe(true);
    expect(r.verdict.strengthUtilisation).toBeGreaterThan(0.3);
    // the shear check: largest at the interior support side, 5wL/8 (standard beam tables; from memory) at d
    const v = r.checks!.shear.governing;
    expect(v.part).toMatch(/span [12]/);
    expect(v.demand).toBeLessThan((5 * wu * L) / 8);
    expect(v.demand).toBeGreaterThan((5 * wu * L) / 8 - wu * 600);
    expect(say(r.verdict.governingMode, 'si')).toMatch(/^Strength check passes .*; shear check passes .*; deflections within their limits/);
  });

  it('too little bottom steel: brittle (EN 1992-1-1 9.2.1.1 minimum), never a plain OK', () => {
    const loads = [1, 2].map((span) => ({ kind: 'uniform' as const, loadCase: 'dead' as const, span, magnitude: 4 }));
    const def = continuousBeam([L, L], loads, { zones: [{ from: 0, to: 2 * L, sectionId: 'light' }] });
    const r = assessContinuousMember(def, context('EN 1992-1-1'));
    expect(r.checks!.flexure.pass).toBe(true);
    // EN 1992-1-1 Eq. (9.1N): As,min = max(0.26 fctm/fyk, 0.0013)·bt·d, fctm = 2.9 MPa for C30/37 (Table 3.1)
    const asMin = Math.max((0.26 * 2.9) / 500, 0.0013) * 300 * 540;
    expect(2 * Math.PI * 25).toBeLessThan(asMin);
    expect(r.checks!.brittle.map((b) => b.cause)).toContain('below-minimum-steel');
    expect(r.verdict.status).toBe('brittle');
    expect(r.verdict.ductilityAvailable).toBe(false);
    expect(say(r.verdict.governingMode, 'si')).toMatch(/^Brittle: /);
  });
});
