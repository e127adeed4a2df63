/**
 * Moment–curvature speed (issue 2): a T-beam with three steel layers and a Mander-confined web,
 * full curve to ultimate, against a plain 1,000-fibre bisection baseline measured in the same run.
 * Vitest prints the ratio ("× faster than"); agreement of the key points within 0.2 % is a test:
 * test/core/section/fibre-agreement.test.ts.
 */
import { bench, describe } from 'vitest';
import { benchProject, benchTee } from '../fixtures/bench-sections.ts';
import { baselineMomentCurvature } from '../fixtures/fibre-baseline.ts';
import { materialLibrary } from '../../core/materials/library.ts';
import { buildSectionModel } from '../../core/section/build.ts';
import { momentCurvature } from '../../core/section/moment-curvature.ts';

const project = benchProject();
const { model } = buildSectionModel(benchTee, materialLibrary(project.materials, 'ACI 318-19'));
const yieldStrain = model.elements[0]!.material.yieldStrain!;

describe('moment–curvature of the benchmark T-beam, to ultimate', () => {
  bench('engine: piecewise Gauss integration, located events', () => {
    momentCurvature(model, 'sagging', { codeCrushingStrain: 0.003 });
  }, { time: 2000 });
  bench('baseline: 1,000 fibres, bisection, 400 fixed steps', () => {
    baselineMomentCurvature(model, 0.003, yieldStrain, 400, 1000);
  }, { time: 2000, iterations: 5 });
});
