/**
 * Charts of existing beams and of the new result tabs: variants on shared axes, the drawing of a
 * variant's section, the shear diagram and the service deflections by load step.
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { shownVariants, variantLoadDeflectionChart, variantMomentCurvatureChart, variantSectionDrawing } from '../../../core/charts/retrofit.ts';
import { CHECK_STEPS, checkIncrease, SERVICE_STEPS, serviceDeflectionChart } from '../../../core/charts/service.ts';
import { shearDiagramChart } from '../../../core/charts/shear.ts';
import { demoProject, demoProjectSI } from '../../../core/project/demo.ts';
import { CORES_AND_DEFECTS, FRP_SCHEME, OVERLAY_SCHEME, retrofitProject } from '../retrofit/retrofit-project.ts';

const project = retrofitProject('ACI 318-19', { asFound: CORES_AND_DEFECTS, schemes: [FRP_SCHEME, OVERLAY_SCHEME] });
const result = analyzeProject(project).members[0]!;
const retrofit = result.retrofit!;

describe('variants of an existing beam on shared charts', () => {
  it('lists the design beam, the beam as found and each scheme, in that order', () => {
    expect(shownVariants(retrofit).map((v) => [v.key, v.role])).toEqual([['original', 'design'], ['as-found', 'reference'], ['frp2', 'scheme'], ['ov75', 'scheme']]);
  });

  it('draws every variant\'s moment–curvature curve of the section on one pair of axes, with its points', () => {
    const spec = variantMomentCurvatureChart(retrofit, 'r1', 'sagging', 'si');
    expect(spec.series.map((s) => s.label)).toEqual(['design beam', 'as found', 'CFRP, 2 plies', 'Overlay 75 mm']);
    const asFound = retrofit.asFound!.variant!.sections[0]!.curves.find((c) => c.direction === 'sagging')!;
    const last = asFound.points[asFound.points.length - 1]!;
    const drawn = spec.series[1]!.points[spec.series[1]!.points.length - 1]!;
    // kN·m and 1/m at a ×10⁻³ factor: the plotted point is the result's, converted.
    expect(drawn.y * spec.y.scale).toBeCloseTo(last.moment / 1e6, 6);
    expect(drawn.x * spec.x.scale).toBeCloseTo(last.curvature * 1000, 9);
  });

  it('draws every variant\'s load–deflection curve and the service load of the beam as found', () => {
    const spec = variantLoadDeflectionChart(retrofit, 'si');
    expect(spec.series).toHaveLength(4);
    expect(spec.referenceLines.map((l) => l.label)).toEqual(['service load (λ = 1)']);
  });

  it('draws the FRP under the soffit and names it in the display units, and the lost concrete dashed', () => {
    const frp = shownVariants(retrofit).find((v) => v.key === 'frp2')!;
    const us = variantSectionDrawing(frp.variant.sections[0]!, project.sections[0]!, 0, 'us').svg;
    // 2 plies × 0.165 mm = 0.330 mm = 0.01299 in; 250 mm = 9.84 in (1 in = 25.4 mm)
    expect(us).toContain('FRP 0.01299 in × 9.84 in');
    expect(us).not.toMatch(/\d mm/);
    const asFound = shownVariants(retrofit).find((v) => v.key === 'as-found')!;
    const spalled = variantSectionDrawing(asFound.variant.sections[0]!, project.sections[0]!, 0, 'si').svg;
    expect(spalled).toContain('outline before the concrete was lost');
    expect(spalled).toContain('stroke-dasharray');
  });
});

describe('the shear diagram', () => {
  it('draws demand and capacity from the results, names the code method and marks the governing points', () => {
    const spec = shearDiagramChart(result.shear, 'si');
    expect(spec.subtitle).toContain('ACI 318-19 22.5');
    expect(spec.series.map((s) => s.id)).toEqual(['design', 'nominal', 'factored', 'mechanism']);
    const g = result.shear!.factored!.governing;
    const marker = spec.markers.find((m) => m.label.startsWith('governing, factored'))!;
    // m and kN
    expect(marker.x * spec.x.scale).toBeCloseTo(g.position / 1000, 9);
    expect(marker.y * spec.y.scale).toBeCloseTo(g.shear / 1000, 9);
    expect(spec.bands.some((b) => b.label.startsWith('2-leg Ø10 at 150'))).toBe(true);
    expect(spec.bands.some((b) => b.label === 'within d: not checked')).toBe(true);
  });

  it('says why there is nothing to draw', () => {
    expect(shearDiagramChart(undefined, 'si').emptyMessage).toMatch(/No shear diagram/);
  });
});

describe('service deflections by load step', () => {
  const us = analyzeProject({ ...demoProject(), members: demoProject().members.filter((m) => ['B-204', 'R-305'].includes(m.id)) });
  const si = analyzeProject({ ...demoProjectSI(), members: demoProjectSI().members.slice(0, 1) });
  const members = [...us.members, ...si.members];

  it('covers every limit case the results can hold', () => {
    const cases = new Set(members.flatMap((m) => m.service!.checks.map((c) => c.limitCase)));
    for (const c of ['aci-floor-immediate', 'aci-sensitive-after-attachment', 'custom', 'en-appearance', 'en-after-construction'] as const) expect(cases.has(c)).toBe(true);
  });

  it('places each check at the steps whose difference is the deflection the check compares, by both methods', () => {
    for (const m of members) {
      for (const c of m.service!.checks) {
        expect(checkIncrease(m.service!, c, 'integration')).toBeCloseTo(c.byIntegration, 9);
        expect(checkIncrease(m.service!, c, 'code')).toBeCloseTo(c.byCode, 9);
      }
    }
  });

  it('draws the limit at the governing method\'s starting deflection plus the allowed increase, over the step it is checked at', () => {
    const m = us.members.find((x) => x.memberId === 'B-204')!;
    const spec = serviceDeflectionChart(m.service, 'us', 60);
    expect(spec.x.categories).toHaveLength(SERVICE_STEPS.length);
    m.service!.checks.forEach((c, k) => {
      const line = spec.series.find((s) => s.id === `limit-${k}`)!;
      const { at, from } = CHECK_STEPS[c.limitCase];
      const governing = c.byIntegration >= c.byCode ? 'integration' : 'code';
      const start = governing === 'integration' ? m.service!.immediate.integration : m.service!.immediate.code;
      const fromValue = from === 'dead' ? start.dead : 0;
      // in = mm / 25.4
      expect(line.points[0]!.y * spec.y.scale).toBeCloseTo((fromValue + c.limit) / 25.4, 9);
      expect(Math.abs(line.points[0]!.x + line.points[1]!.x) / 2).toBeCloseTo(SERVICE_STEPS.indexOf(at), 0);
      expect(line.label).toContain(`ℓ/${c.ratio}`);
    });
  });
});
