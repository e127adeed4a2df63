/**
 * A large invented project for benchmarks and parallel-analysis tests: `count` members whose spans,
 * sections, supports and loads vary deterministically (a linear congruential generator with the
 * constants of Numerical Recipes, 2nd ed., §7.1 — from memory — so every run builds the same
 * project). SI internal units (mm, N, MPa, N/mm), EN 1992-1-1.
 */
import type { SupportType } from '../../../core/member/definition.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import { DEFAULT_SETTINGS, type Project, type MemberDefinition } from '../../../core/project/types.ts';

function generator(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 4294967296;
  };
}

const SUPPORTS: readonly SupportType[] = ['simply-supported', 'simply-supported', 'cantilever', 'fixed-fixed', 'propped-cantilever'];

/** Twelve sections: rectangles and tees 400–700 mm deep with 3–5 bars, and support versions with top bars. */
function sections(): SectionDefinition[] {
  const out: SectionDefinition[] = [];
  const hoops = { steelId: 'b500', diameter: 8, spacing: 150, verticalLegs: 2, horizontalLegs: 2, clearCover: 30, confineCore: false };
  [400, 500, 600, 700].forEach((h, k) => {
    const bottom = { steelId: 'b500', depth: h - 50, count: 3 + (k % 3), diameter: 16 + 4 * (k % 2), label: 'bottom' };
    out.push({ id: `R${h}`, name: `Rectangle 300 × ${h}`, concreteId: 'c30', shape: { kind: 'rectangle', width: 300, height: h }, bars: [bottom, { steelId: 'b500', depth: 45, count: 2, diameter: 12 }], hoops });
    out.push({ id: `T${h}`, name: `T ${h}`, concreteId: 'c30ts', shape: { kind: 'tee', height: h, webWidth: 300, flangeWidth: 1200, flangeThickness: 150 }, bars: [bottom, { steelId: 'b500', depth: 45, count: 2, diameter: 12 }], hoops });
    out.push({ id: `E${h}`, name: `Support ${h}`, concreteId: 'c30', shape: { kind: 'rectangle', width: 300, height: h }, bars: [{ steelId: 'b500', depth: 50, count: 4, diameter: 20 }, bottom], hoops: { ...hoops, spacing: 100 } });
  });
  return out;
}

/** A project of `count` members (default 1000), the same on every call. */
export function generatedProject(count = 1000, seed = 20260302): Project {
  const random = generator(seed);
  const pick = <T>(list: readonly T[]): T => list[Math.floor(random() * list.length)]!;
  const members: MemberDefinition[] = [];
  for (let i = 0; i < count; i++) {
    const supports = pick(SUPPORTS);
    const depth = pick([400, 500, 600, 700]);
    const span = Math.round((supports === 'cantilever' ? 1500 + random() * 1500 : 3500 + random() * (depth * 11 - 3500)) / 50) * 50;
    const mid = `${pick(['R', 'T'])}${depth}`;
    const end = `E${depth}`;
    const zones = supports === 'fixed-fixed'
      ? [{ from: 0, to: span * 0.2, sectionId: end }, { from: span * 0.2, to: span * 0.8, sectionId: mid }, { from: span * 0.8, to: span, sectionId: end }]
      : supports === 'propped-cantilever'
        ? [{ from: 0, to: span * 0.25, sectionId: end }, { from: span * 0.25, to: span, sectionId: mid }]
        : [{ from: 0, to: span, sectionId: supports === 'cantilever' ? end : mid }];
    const live = Math.round(4 + random() * 14);
    members.push({
      id: `G-${String(i + 1).padStart(4, '0')}`,
      name: `G-${i + 1}`,
      supports,
      span,
      zones,
      loads: [
        { kind: 'uniform', loadCase: 'superimposed', magnitude: Math.round(2 + random() * 6) },
        { kind: 'uniform', loadCase: 'live', magnitude: live },
        ...(random() < 0.3 ? [{ kind: 'point' as const, loadCase: 'live' as const, magnitude: Math.round(5000 + random() * 20000), position: Math.round(span * (0.3 + random() * 0.4)) }] : []),
      ],
      service: { sustainedLiveFraction: 0.3, durationMonths: 60, limitCases: ['en-appearance', 'en-after-construction'] },
      capacity: { pattern: 'proportional', hingeLengthMethod: pick(['priestley-2007', 'paulay-priestley-1992', 'mattock-1967'] as const) },
    });
  }
  return {
    format: 'hingeline-project',
    version: 3,
    info: { name: `Generated project, ${count} members`, number: 'BENCH', description: 'Invented members for benchmarks.', engineer: '', checker: '', revision: '0', date: '2026-03-02', codeBasis: 'EN 1992-1-1', unitSystem: 'si' },
    materials: [
      { kind: 'concrete', id: 'c30', name: 'C30/37', strength: 30, compressionModel: 'en1992-nonlinear', tensionModel: 'linear-brittle' },
      { kind: 'concrete', id: 'c30ts', name: 'C30/37 tension stiffening', strength: 30, compressionModel: 'en1992-nonlinear', tensionModel: 'tension-stiffening' },
      { kind: 'steel', id: 'b500', name: 'B500B', model: 'park-paulay', yieldStress: 500, ultimateStress: 540, hardeningStrain: 0.01, ruptureStrain: 0.05 },
    ],
    sections: sections(),
    members,
    settings: { ...DEFAULT_SETTINGS },
  };
}
