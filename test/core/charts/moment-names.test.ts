/**
 * One set of moment names (core/charts/moment-names.ts): first yield M′y, the nominal yield My of the
 * bilinear idealisation, the peak, and the code resistance — and the numbers behind them are the
 * ones the names promise.
 */
import { describe, expect, it } from 'vitest';
import { analyzeMembers } from '../../../core/analysis.ts';
import { sectionMomentCurvatureChart } from '../../../core/charts/moment-curvature.ts';
import { codeResistanceName, KEY_POINT_LABELS, MOMENT_NAMES } from '../../../core/charts/moment-names.ts';
import { demoProjectSI } from '../../../core/project/demo.ts';
import { memberKeyResults } from '../../../core/project/key-results.ts';

const project = demoProjectSI();
const result = analyzeMembers(project, ['MB-1'])[0]!;
const key = memberKeyResults(result, project.members.find((m) => m.id === 'MB-1'));
const section = result.sections.find((s) => s.sectionId === key.critical!.sectionId)!;
const curve = section[key.critical!.direction]!;

describe('moment names', () => {
  it('never call anything plain "nominal": the code\'s Mn and the idealisation\'s My differ', () => {
    for (const label of Object.values(KEY_POINT_LABELS)) expect(label).not.toMatch(/\bnominal\b|\(Mn\)/);
    expect(MOMENT_NAMES.idealisedYield.meaning).toContain('not first yield');
    expect(codeResistanceName('ACI 318-19').symbol).toBe('φMn');
    expect(codeResistanceName('EN 1992-1-1').symbol).toBe('M_Rd');
  });

  it('key results give first yield, the idealisation\'s My and the peak of the critical curve, each its own', () => {
    expect(key.firstYieldMoment).toBe(curve.keyPoints.firstYield!.moment);
    expect(key.yieldMoment).toBe(curve.bilinear!.yieldMoment);
    expect(key.peakMoment).toBe(curve.keyPoints.peak!.moment);
    // Priestley, Calvi & Kowalsky (2007) §4.2 (from memory): the bilinear's yield moment is the moment
    // at the limit strains εc = 0.004 or εs = 0.015, reached on the elastic line through first yield.
    expect(project.settings.bilinearMethod).toBe('priestley-2007');
    expect(curve.bilinear!.yieldMoment).toBeCloseTo(curve.keyPoints.nominal!.moment, 0);
    const elastic = curve.keyPoints.firstYield!.moment / curve.keyPoints.firstYield!.curvature;
    expect(curve.bilinear!.yieldCurvature).toBeCloseTo(curve.bilinear!.yieldMoment / elastic, 12);
  });

  it('the chart marks each key point by these names', () => {
    const spec = sectionMomentCurvatureChart(section, 'si', { keyPoints: ['firstYield', 'nominal', 'peak'] });
    const labels = spec.markers.map((m) => m.label).join(' | ');
    expect(labels).toContain('first yield M′y');
    expect(labels).toContain('limit strain εc 0.004 / εs 0.015');
  });
});
