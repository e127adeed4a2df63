/**
 * A load–deflection curve that passes span/50 before its ultimate is outside the small-deflection
 * range of the method (issue 17): the ultimate deflection Δu and the displacement ductility μΔ are
 * withheld with that reason in the member result, the key results, the CSV summary and the report —
 * never a number. (The CLI table/JSON and the app panel: test/app/cli/ultimate-range.test.ts,
 * test/renderer/views/DuctilityPanel.test.ts.)
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { loadDeflectionChart } from '../../../core/charts/load-deflection.ts';
import type { MemberResult } from '../../../core/assessment/results.ts';
import { OUTSIDE_SMALL_DEFLECTION, SMALL_DEFLECTION_RATIO, ultimateOutsideRange } from '../../../core/member/small-deflection.ts';
import { resultsSummaryCsv } from '../../../core/project/csv.ts';
import { memberKeyResults } from '../../../core/project/key-results.ts';
import { buildReportDocument } from '../../../core/report/document.ts';
import { reportCharts } from '../../../core/report/figures.ts';
import type { Project } from '../../../core/project/types.ts';
import { say } from '../../../core/units/phrase.ts';
import { member, smallProject } from '../../fixtures/projects.ts';
import { texts } from '../report/content.ts';
import { REASON_20M, slenderProject } from './slender-beams.ts';

describe('a load–deflection curve beyond span/50 before its ultimate', () => {
  // The 60 m span of the 300 × 600 section of issue 17 (it printed μΔ = 3.3 and Δu = 7.7 m), and a
  // slender 20 m beam whose checks pass but whose curve passes 400 mm at 1.5 × its service load.
  const p60: Project = smallProject('ACI 318-19', [member('B', 'simply-supported', 60000, 'r1')]);
  const r60 = analyzeProject(p60).members[0]!;
  const p20 = slenderProject();
  const r20 = analyzeProject(p20).members[0]!;

  it('the member result withholds Δu and μΔ (and the hinge rotation at ultimate) and says why, in the warnings and the governing mode', () => {
    for (const r of [r60, r20]) {
      const limit = r.span / SMALL_DEFLECTION_RATIO;
      // the curve does pass the limit: the premise of the test
      expect(Math.max(...r.loadDeflection.points.map((q) => q.deflection))).toBeGreaterThan(limit);
      expect(r.ultimateOutsideRange).not.toBeNull();
      expect(r.ductility.ultimateDeflection).toBeNull();
      expect(r.ductility.displacementDuctility).toBeNull();
      expect(r.ductility.hinges.every((h) => h.rotationAtUltimate === null)).toBe(true);
      for (const v of [r.ductility.firstYieldDeflection, r.ductility.yieldDeflection, r.ductility.peak?.deflection ?? null]) if (v !== null) expect(Math.abs(v)).toBeLessThanOrEqual(limit);
      expect(r.warnings.map((w) => say(w, 'SI'))).toContain(say(r.ultimateOutsideRange!, 'SI'));
      const mode = say(r.governingMode, 'SI');
      expect(mode).toContain(`load–deflection ${OUTSIDE_SMALL_DEFLECTION} (beyond span/50): no μΔ`);
      expect(mode).not.toMatch(/μΔ = \d/);
      expect(r.warnings.map((w) => say(w, 'SI')).join(' ')).not.toMatch(/μΔ = \d/);
    }
    expect(say(r20.ultimateOutsideRange!, 'SI')).toBe(`${REASON_20M} 1.50 × the load pattern, before its ultimate; the ultimate deflection Δu and the displacement ductility μΔ are not given.`);
    // the 20 m beam passes its checks: its status is not touched, only the ductility figures are withheld
    expect(r20.status).toBe('ok');
  });

  it('key results and the CSV summary: μΔ empty, the reason in "ductility not available"', () => {
    const k = memberKeyResults(r60);
    expect(k.displacementDuctility).toBeNull();
    expect(k.ultimateOutsideRange).toBe(r60.ultimateOutsideRange);
    const rows = resultsSummaryCsv([r60, r20], 'si').trim().split(/\r?\n/);
    const head = rows[0]!.split(',');
    const mu = head.indexOf('μΔ [-]');
    expect(mu).toBeGreaterThan(0);
    for (const row of rows.slice(1)) {
      expect(row).toContain(OUTSIDE_SMALL_DEFLECTION);
      expect(row.split(',')[mu]).toBe('');
    }
  });

  it('the report: Δu and μΔ read "not given" with the reason', () => {
    const project: Project = { ...p20, members: [...p20.members] };
    const results = analyzeProject(project);
    const figures = reportCharts({ project, results });
    const images = Object.fromEntries(Object.entries(figures).map(([id, f]) => [id, f.kind === 'svg' ? f.svg : '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"></svg>']));
    const all = texts(buildReportDocument({ project, results, images, meta: { softwareVersion: '1.0.0', projectHash: 'ab'.repeat(32), generatedOn: '2026-12-03T10:00:00Z' } }).content);
    const at = (label: string) => all[all.indexOf(label) + 1];
    expect(at('Ultimate deflection Δu')).toBe('not given');
    expect(at('Displacement ductility μΔ = Δu/Δy')).toBe('not given');
    expect(at('Outside the small-deflection range: Δu and μΔ')).toMatch(/^Load–deflection: outside the small-deflection range of the method — the curve passes span\/50 = 400 mm/);
  });

  it('the load–deflection chart draws span/50 instead of a Δu line and notes why', () => {
    const spec = loadDeflectionChart(r20, 'SI');
    expect(spec.referenceLines?.map((l) => l.label)).toContain('span/50: end of the small-deflection range');
    expect(spec.referenceLines?.map((l) => l.label)).not.toContain('Δu');
    // 400 mm on the chart's deflection axis (mm in SI)
    expect(spec.referenceLines?.find((l) => l.label.startsWith('span/50'))?.value).toBeCloseTo(400, 6);
    expect(spec.notes).toContain('Beyond span/50 the curve is outside the small-deflection range of the method: Δu and μΔ are not given.');
  });

  it('an ordinary 6 m beam stays within the range and keeps its μΔ', () => {
    const r: MemberResult = analyzeProject(smallProject('ACI 318-19', [member('A', 'simply-supported', 6000, 'r1')])).members[0]!;
    expect(ultimateOutsideRange(r)).toBeNull();
    expect(r.ultimateOutsideRange).toBeNull();
    expect(r.ductility.ultimateDeflection).toBeGreaterThan(0);
  });
});
