/**
 * The section integrator reads the concrete laws through per-branch Chebyshev tables
 * (core/section/law-table.ts) instead of calling them at every Gauss point. Two checks that a wrong
 * shortcut fails:
 *  1. the table against the law itself at random strains inside every branch, for every concrete
 *     law, tension law, code basis and the confined core: within 1e-9 of the law's peak stress;
 *  2. whole moment–curvature curves of random sections (every compression law × every tension law,
 *     sagging and hogging) against a plain fine-fibre integration that calls the laws directly: at
 *     every sampled curve point the fibre moment at the engine's strain state within 0.1 % and the
 *     fibre axial force within 0.1 % of the compression carried. Before rational branches were cut
 *     (law-table.ts splits) this failed with and without the tables: 0.38 % in moment (Popovics,
 *     inverted T, hogging) and 0.20 % in axial force (confined Mander at core crushing) — 3-point
 *     Gauss over a whole rational branch;
 *  3. the section forces are continuous in the centroid strain: a number of Gauss parts chosen per
 *     piece from its strain span made N(ε0) jump by up to 56 N on the benchmark T-beam.
 * The fibre integration shares nothing with the engine but the laws and the resolved section model
 * (a fine fibre model is the usual reference for section integration; common practice, no source).
 * Units: mm, MPa, N, N·mm.
 */
import { describe, expect, it } from 'vitest';
import { materialLibrary } from '../../../core/materials/library.ts';
import { CONCRETE_COMPRESSION_MODELS, CONCRETE_TENSION_MODELS, type CodeBasis, type ConcreteSpec, type MaterialSpec, type SteelSpec } from '../../../core/materials/specs.ts';
import type { ConcreteMaterial } from '../../../core/materials/types.ts';
import { buildSectionModel } from '../../../core/section/build.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import { tabulatedLaw } from '../../../core/section/law-table.ts';
import type { SectionModel } from '../../../core/section/model.ts';
import { momentCurvature } from '../../../core/section/moment-curvature.ts';
import { solveEquilibrium } from '../../../core/section/equilibrium.ts';
import { sectionForces } from '../../../core/section/forces.ts';
import { benchProject, benchTee } from '../../fixtures/bench-sections.ts';
import { stripWidthAt } from '../../../core/section/width-profile.ts';

/** Deterministic pseudo-random numbers in [0, 1) (mulberry32; common practice, no source). */
function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

interface Case {
  readonly model: SectionModel;
  readonly label: string;
}

/** A random rectangle, T or inverted T with bars top and bottom, confined or not, for one pair of laws. */
function randomCase(rand: () => number, compression: ConcreteSpec['compressionModel'], tension: ConcreteSpec['tensionModel'], code: CodeBasis): Case {
  const pick = <T,>(list: readonly T[]) => list[Math.floor(rand() * list.length)]!;
  const height = Math.round(350 + 450 * rand());
  const web = Math.round(220 + 200 * rand());
  const kind = pick(['rectangle', 'tee', 'inverted-tee'] as const);
  const flange = Math.round(web * (1.8 + 1.5 * rand()));
  const thickness = Math.round(90 + 60 * rand());
  const shape: SectionDefinition['shape'] = kind === 'rectangle'
    ? { kind, width: web, height }
    : { kind, height, webWidth: web, flangeWidth: flange, flangeThickness: thickness };
  const confine = compression === 'mander' && rand() < 0.7;
  const concrete: ConcreteSpec = { kind: 'concrete', id: 'c', name: 'c', strength: Math.round(20 + 30 * rand()), compressionModel: compression, tensionModel: tension };
  const steel: SteelSpec = { kind: 'steel', id: 's', name: 's', model: 'park-paulay', yieldStress: 420 + Math.round(100 * rand()), ultimateStress: 620, hardeningStrain: 0.008, ruptureStrain: 0.1 };
  const specs: MaterialSpec[] = [concrete, steel];
  const section: SectionDefinition = {
    id: 'r', name: 'random', shape, concreteId: 'c',
    bars: [
      { steelId: 's', depth: height - 55, count: 3 + Math.floor(3 * rand()), diameter: pick([16, 20, 25]) },
      { steelId: 's', depth: 50, count: 2 + Math.floor(2 * rand()), diameter: pick([12, 16, 20]) },
    ],
    hoops: { steelId: 's', diameter: 10, spacing: 75 + Math.round(75 * rand()), verticalLegs: 2, clearCover: 30, confineCore: confine, closedAndAnchored: true },
  };
  const { model } = buildSectionModel(section, materialLibrary(specs, code));
  return { model, label: `${compression} + ${tension}, ${code}, ${kind} ${height} mm${confine ? ', confined core' : ''}` };
}

const splitStrains = (m: ConcreteMaterial) => [...new Set([...m.breakpoints, 0])].sort((a, b) => a - b);

/**
 * N (N) and M about the centroid (N·mm) at (ε0, φ) by `count` fibres over the height per concrete
 * part (stress at each fibre's mid-depth), the bars as points net of the concrete they displace, and
 * the tension-stiffening bands limited by their bars' reserve Σ As (fy − σs) (the rule the model
 * states in core/section/model.ts ConcretePart.stiffeningGroup).
 */
function fibreForces(model: SectionModel, eps0: number, phi: number, count: number): { axial: number; moment: number; compression: number } {
  const yg = model.centroidDepth;
  const dy = model.height / count;
  let axial = 0;
  let moment = 0;
  let compression = 0;
  const add = (force: number, y: number) => {
    axial += force;
    moment += force * (yg - y);
    if (force > 0) compression += force;
  };
  const cracked = new Map<number, { axial: number; moment: number }>();
  for (const part of model.concreteParts) {
    const crackedBelow = part.material.crackedBelow ?? -part.material.crackingStrain;
    for (let i = 0; i < count; i++) {
      const y = (i + 0.5) * dy;
      const strip = part.strips.find((s) => y >= s.top && y < s.bottom);
      if (!strip) continue;
      const eps = eps0 + phi * (yg - y);
      const force = part.material.stress(eps) * stripWidthAt(strip, y) * dy;
      if (part.stiffeningGroup !== undefined && eps < crackedBelow) {
        const c = cracked.get(part.stiffeningGroup) ?? { axial: 0, moment: 0 };
        c.axial += force;
        c.moment += force * (yg - y);
        cracked.set(part.stiffeningGroup, c);
      } else {
        add(force, y);
      }
    }
  }
  for (const [group, c] of cracked) {
    let reserve = 0;
    for (const index of model.stiffeningGroups![group]!) {
      const bar = model.elements[index]!;
      const fy = Math.abs(bar.material.stress(-bar.material.yieldStrain!));
      const tensile = Math.max(0, -bar.material.stress(eps0 + phi * (yg - bar.depth) - bar.initialStrain));
      reserve += bar.area * Math.max(0, fy - tensile);
    }
    const k = c.axial < 0 && -c.axial > reserve ? reserve / -c.axial : 1;
    axial += k * c.axial;
    moment += k * c.moment;
  }
  for (const e of model.elements) {
    const eps = eps0 + phi * (yg - e.depth);
    let stress = e.material.stress(eps - e.initialStrain);
    const displaced = e.displacedConcrete ? e.displacedConcrete.stress(eps) : 0;
    if (displaced > 0) stress -= displaced;
    add(stress * e.area, e.depth);
  }
  return { axial, moment, compression };
}

describe('concrete laws read through their tables', () => {
  const rand = random(20261203);
  const cases: Case[] = [];
  for (const code of ['ACI 318-19', 'EN 1992-1-1'] as const) {
    for (const compression of CONCRETE_COMPRESSION_MODELS) {
      for (const tension of CONCRETE_TENSION_MODELS) cases.push(randomCase(rand, compression, tension, code));
    }
  }

  it('every law, every branch: the table equals the law within 1e-9 of its peak stress', () => {
    let checked = 0;
    for (const { model, label } of cases) {
      for (const part of model.concreteParts) {
        const law = part.material;
        const edges = splitStrains(law);
        const table = tabulatedLaw(law, edges);
        const tolerance = 1e-9 * law.peakStress;
        for (let b = 0; b + 1 < edges.length; b++) {
          for (let i = 0; i < 60; i++) {
            const strain = edges[b]! + (edges[b + 1]! - edges[b]!) * (0.001 + 0.998 * rand());
            const branch = table.branchOf(strain);
            // The table's branches are the law's, some cut by split strains (law-table.ts splits).
            expect(strain > table.splits[branch]! && strain < table.splits[branch + 1]!, `${label}, ${part.label}: branch ${branch} of ${strain}`).toBe(true);
            const exact = law.stress(strain);
            const tabulated = table.stressIn(strain, branch);
            if (Math.abs(tabulated - exact) > tolerance) {
              expect.fail(`${label}, ${part.label}: at ε = ${strain} the table gives ${tabulated} MPa, the law ${exact} MPa`);
            }
            checked++;
          }
        }
        // Every breakpoint of the law (and zero) is a split strain of its table.
        for (const e of edges) expect(table.splits.includes(e), `${label}, ${part.label}: split at ${e}`).toBe(true);
        // Outside the outermost breakpoints the integrator calls the law itself.
        expect(table.branchOf(edges[0]! - 1e-3)).toBe(-1);
        expect(table.branchOf(edges[edges.length - 1]! + 1e-3)).toBe(-1);
      }
    }
    expect(checked).toBeGreaterThan(5000);
  });

  it('random sections, every pair of laws, both senses: moment and axial force at every sampled curve point agree with 20,000 fibres within 0.1 %', { timeout: 240_000 }, () => {
    for (const { model, label } of cases) {
      for (const direction of ['sagging', 'hogging'] as const) {
        const curve = momentCurvature(model, direction, { codeCrushingStrain: 0.003 });
        expect(curve.points.length, `${label}, ${direction}: curve points`).toBeGreaterThan(10);
        const sign = direction === 'sagging' ? 1 : -1;
        const peak = Math.max(...curve.points.map((p) => Math.abs(p.moment)));
        // Every third point, and the key points: the fibre integration is slow.
        const sampled = [...curve.points.filter((_, i) => i % 3 === 1), ...Object.values(curve.keyPoints).filter((k) => k.curvature > 0)];
        for (const point of sampled) {
          const phi = sign * point.curvature;
          const fibres = fibreForces(model, point.referenceStrain, phi, 20_000);
          const where = `${label}, ${direction}, φ = ${point.curvature.toExponential(3)} 1/mm${'name' in point ? ` (${String(point.name)})` : ''}`;
          // 0.1 % of the moment (plus 0.01 % of the curve's peak where the moment is small, just after zero curvature).
          expect(Math.abs(sign * point.moment - fibres.moment), `${where}: moment ${sign * point.moment} against ${fibres.moment} N·mm`).toBeLessThanOrEqual(1e-3 * Math.abs(fibres.moment) + 1e-4 * peak);
          expect(Math.abs(fibres.axial - model.axialForce), `${where}: axial force by fibres ${fibres.axial} N`).toBeLessThanOrEqual(1e-3 * fibres.compression);
        }
      }
    }
  });

  it('the section forces are continuous in the centroid strain (no jumps where rational branches are cut)', () => {
    const project = benchProject();
    const { model } = buildSectionModel(benchTee, materialLibrary(project.materials, 'ACI 318-19'));
    // Around the equilibrium at φ = 6e-5 1/mm (confined core and cover on their rational branches):
    // 40,000 steps of 5e-9 in ε0. N is smooth there, so its second differences are round-off and
    // curvature, far below the equilibrium tolerance (~0.9 N, core/section/equilibrium.ts
    // forceTolerance); the part count that stepped with ε0 gave a jump of 56 N at ε0 + 8e-5.
    const phi = 6e-5;
    const root = solveEquilibrium(model, phi, 0);
    expect(root.ok).toBe(true);
    const x = root.ok ? root.state.referenceStrain : 0;
    let previous = Number.NaN;
    let previousStep = Number.NaN;
    let largest = 0;
    for (let i = -20_000; i <= 20_000; i++) {
      const n = sectionForces(model, x + i * 5e-9, phi).axial;
      const step = n - previous;
      if (Number.isFinite(previousStep)) largest = Math.max(largest, Math.abs(step - previousStep));
      previous = n;
      previousStep = step;
    }
    expect(largest).toBeLessThan(1e-3);
  });
});
