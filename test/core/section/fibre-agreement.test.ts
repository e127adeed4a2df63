/**
 * The engine's piecewise-Gauss integration with exactly located events agrees with a plain
 * 1,000-fibre, fixed-step, bisection analysis of the same section within 0.2 % at every key point
 * (the benchmark's acceptance criterion; common practice, no source: a fine fibre model is the
 * usual reference for section integration).
 */
import { describe, expect, it } from 'vitest';
import { benchProject, benchTee } from '../../fixtures/bench-sections.ts';
import { baselineMomentCurvature } from '../../fixtures/fibre-baseline.ts';
import { materialLibrary } from '../../../core/materials/library.ts';
import { buildSectionModel } from '../../../core/section/build.ts';
import { momentCurvature } from '../../../core/section/moment-curvature.ts';

describe('engine versus a 1,000-fibre baseline (T-beam, three layers, Mander-confined web)', () => {
  const project = benchProject();
  const { model } = buildSectionModel(benchTee, materialLibrary(project.materials, 'ACI 318-19'));
  const engine = momentCurvature(model, 'sagging', { codeCrushingStrain: 0.003 });
  const yieldStrain = model.elements[0]!.material.yieldStrain!;
  const base = baselineMomentCurvature(model, 0.003, yieldStrain, 2000, 1000);
  const close = (a: number, b: number) => Math.abs(a / b - 1);
  it('first yield: curvature and moment within 0.2 %', () => {
    expect(close(engine.keyPoints.firstYield!.curvature, base.firstYield.kappa)).toBeLessThan(0.002);
    expect(close(engine.keyPoints.firstYield!.moment, base.firstYield.moment)).toBeLessThan(0.002);
  });
  it('extreme fibre at 0.003: curvature and moment within 0.2 %', () => {
    expect(close(engine.keyPoints.codeCrushing!.curvature, base.codeCrushing.kappa)).toBeLessThan(0.002);
    expect(close(engine.keyPoints.codeCrushing!.moment, base.codeCrushing.moment)).toBeLessThan(0.002);
  });
  it('peak moment within 0.2 %', () => {
    expect(close(engine.keyPoints.peak!.moment, base.peak.moment)).toBeLessThan(0.002);
  });
  it('ultimate (core crushing) curvature within 0.2 %', () => {
    expect(engine.status.kind === 'complete' && engine.status.ultimateCause).toBe('core-crushing');
    expect(close(engine.keyPoints.ultimate!.curvature, base.ultimate.kappa)).toBeLessThan(0.002);
    expect(close(engine.keyPoints.ultimate!.moment, base.ultimate.moment)).toBeLessThan(0.002);
  });
});
