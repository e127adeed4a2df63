/**
 * A load–deflection curve that passes span/50 while the member is still elastic (before any tension
 * steel yields) is outside the small-deflection range of the method (issue 17): the ultimate
 * deflection Δu and the displacement ductility μΔ are withheld with that reason in the member
 * result, the key results, the CSV summary, the report and the chart — never a number. A ductile
 * beam that passes span/50 only after it yields keeps them. (The CLI table/JSON and the app panel:
 * test/app/cli/ultimate-range.test.ts, test/renderer/views/DuctilityPanel.test.ts.)
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { loadDeflectionChart } from '../../../core/charts/load-deflection.ts';
import { OUTSIDE_SMALL_DEFLECTION, SMALL_DEFLECTION_RATIO, ultimateOutsideRange } from '../../../core/member/small-deflection.ts';
import { resultsSummaryCsv } from '../../../core/project/csv.ts';
import { memberKeyResults } from '../../../core/project/key-results.ts';
import { buildReportDocument } from '../../../core/report/document.ts';
import { reportCharts } from '../../../core/report/figures.ts';
import { say } from '../../../core/units/phrase.ts';
import { member, smallProject } from '../../fixtures/projects.ts';
import { texts } from '../report/content.ts';
import { longProject, REASON_60M } from './beam-fixtures.ts';

describe('a load–deflection curve beyond span/50 before the member yields', () => {
  const p60 = longProject();
  const r60 = analyzeProject(p60).members[0]!;

  it('the member result withholds Δu, μΔ and the hinge rotation at ultimate, and says why in the warnings and the governing mode', () => {
    const limit = r60.span / SMALL_DEFLECTION_RATIO;
    // the premise: the curve passes the limit, and first yield lies beyond it
    expect(r60.loadDeflection.events.find((e) => e.kind === 'first-yield')!.deflection).toBeGreaterThan(limit);
    expect(say(r60.ultimateOutsideRange!, 'si')).toBe(REASON_60M);
    expect(r60.ductility.ultimateDeflection).toBeNull();
    expect(r60.ductility.displacementDuctility).toBeNull();
    expect(r60.ductility.hinges.every((h) => h.rotationAtUltimate === null)).toBe(true);
    for (const v of [r60.ductility.firstYieldDeflection, r60.ductility.yieldDeflection, r60.ductility.peak?.deflection ?? null]) if (v !== null) expect(Math.abs(v)).toBeLessThanOrEqual(limit);
    const warnings = r60.warnings.map((w) => say(w, 'si'));
    expect(warnings).toContain(REASON_60M);
    expect(warnings.join(' ')).not.toMatch(/μΔ = \d/);
    const mode = say(r60.governingMode, 'si');
    expect(mode).toContain(`load–deflection ${OUTSIDE_SMALL_DEFLECTION} (beyond span/50): no μΔ`);
    expect(mode).not.toMatch(/μΔ = \d/);
  });

  it('key results and the CSV summary: μΔ empty, the reason in "ductility not available"', () => {
    const k = memberKeyResults(r60);
    expect(k.displacementDuctility).toBeNull();
    expect(k.ultimateOutsideRange).toBe(r60.ultimateOutsideRange);
    const rows = resultsSummaryCsv([r60], 'si').trim().split(/\r?\n/);
    const mu = rows[0]!.split(',').indexOf('μΔ [-]');
    expect(mu).toBeGreaterThan(0);
    expect(rows[1]).toContain(REASON_60M);
    expect(rows[1]!.split(',')[mu]).toBe('');
  });

  it('the report: Δu and μΔ read "not given" with the reason', () => {
    const results = analyzeProject(p60);
    const figures = reportCharts({ project: p60, results });
    const images = Object.fromEntries(Object.entries(figures).map(([id, f]) => [id, f.kind === 'svg' ? f.svg : '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"></svg>']));
    const all = texts(buildReportDocument({ project: p60, results, images, meta: { softwareVersion: '1.0.0', projectHash: 'ab'.repeat(32), generatedOn: '2026-12-03T10:00:00Z' } }).content);
    const at = (label: string) => all[all.indexOf(label) + 1];
    expect(at('Ultimate deflection Δu')).toBe('not given');
    expect(at('Displacement ductility μΔ = Δu/Δy')).toBe('not given');
    expect(at('Outside the small-deflection range: Δu and μΔ')).toBe(REASON_60M);
  });

  it('the load–deflection chart draws span/50 instead of a Δu line and notes why', () => {
    const spec = loadDeflectionChart(r60, 'SI');
    const labels = spec.referenceLines.map((l) => l.label);
    expect(labels).toContain('span/50: end of the small-deflection range');
    expect(labels).not.toContain('Δu');
    // 1200 mm on the chart's deflection axis (mm in SI)
    expect(spec.referenceLines.find((l) => l.label.startsWith('span/50'))!.value).toBeCloseTo(1200, 6);
    expect(spec.notes).toContain('Beyond span/50 the curve is outside the small-deflection range of the method: Δu and μΔ are not given.');
  });

  it('a 20 m beam that passes span/50 only after it yields keeps its Δu and μΔ (hinge rotation, not elastic flexibility)', () => {
    const r = analyzeProject(smallProject('ACI 318-19', [member('B', 'simply-supported', 20000, 'r1', { loads: [{ kind: 'uniform', loadCase: 'superimposed', magnitude: 1 }, { kind: 'uniform', loadCase: 'live', magnitude: 1 }] })])).members[0]!;
    const limit = r.span / SMALL_DEFLECTION_RATIO;
    expect(r.ductility.ultimateDeflection!).toBeGreaterThan(limit);
    expect(r.loadDeflection.events.find((e) => e.kind === 'first-yield')!.deflection).toBeLessThan(limit);
    expect(ultimateOutsideRange(r)).toBeNull();
    expect(r.ultimateOutsideRange).toBeNull();
    expect(r.ductility.displacementDuctility).toBeGreaterThan(1);
  });
});
