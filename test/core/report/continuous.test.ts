/**
 * The report's chapter for continuous members (core/report/continuous.ts): one chapter per member
 * with the elevation, envelopes, station checks, hinge sequence, redistribution, deflections per
 * span and the caution; a row per member in the project summary.
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { buildReportDocument } from '../../../core/report/document.ts';
import { planReport, reportCharts } from '../../../core/report/figures.ts';
import { CAUTION_TEXT } from '../../../core/report/layout.ts';
import type { ReportInput } from '../../../core/report/types.ts';
import { demoProjectSI } from '../../../core/project/demo.ts';
import { texts } from './content.ts';

const project = demoProjectSI();
const memberIds = ['CB-1', 'CB-2'];
const results = analyzeProject({ ...project, members: [] });
const meta = { softwareVersion: '9.8.7', projectHash: 'cd'.repeat(32), generatedOn: '2026-03-14T09:30:00Z' };
const images = Object.fromEntries(Object.entries(reportCharts({ project, results, memberIds })).map(([id, f]) => [id, f.kind === 'svg' ? f.svg : `<svg xmlns="http://www.w3.org/2000/svg" width="${f.width}" height="${f.height}"><text x="2" y="10">${f.spec.title}</text></svg>`]));
const input: ReportInput = { project, results, memberIds, images, meta };
const doc = buildReportDocument(input);
const all = texts(doc.content);
const joined = all.join('\n');

describe('the continuous-member chapter', () => {
  it('plans an elevation, a moment and a shear envelope per member, the elevation numbering every hinge in order of formation', () => {
    const plan = planReport(input);
    expect(plan.continuous.map((c) => c.definition.id)).toEqual(memberIds);
    for (const c of plan.continuous) {
      expect(plan.figures[c.elevation!]!.kind).toBe('svg');
      const moment = plan.figures[c.moment!]!;
      expect(moment.kind === 'chart' && moment.spec.series.map((s) => s.id)).toEqual(['sagging', 'hogging', 'resistance-sagging', 'resistance-hogging']);
      const shear = plan.figures[c.shear!]!;
      expect(shear.kind === 'chart' && shear.spec.series.map((s) => s.id)).toEqual(['design', 'nominal', 'factored', 'mechanism']);
      const svg = (plan.figures[c.elevation!] as { svg: string }).svg;
      const hinges = c.result!.capacity!.hinges;
      expect(hinges.length).toBeGreaterThan(0);
      // every hinge's number is drawn in the elevation, supports numbered too
      for (const h of hinges) expect(svg).toContain(`>${h.order}</text>`);
      expect((svg.match(/<path d="M /g) ?? []).length + (svg.match(/<rect x="[^"]+" y="72" width="6"/g) ?? []).length).toBeGreaterThanOrEqual(c.definition.supports.length - 1);
    }
  });

  it('writes a chapter per member: status, envelopes with the governing arrangement, station checks, hinges, redistribution, deflections per span, caution', () => {
    for (const heading of ['Continuous member CB-1', 'Continuous member CB-2', 'Moment and shear envelopes', 'Strength and shear at every station', 'Analysis to failure: hinge sequence', 'Redistribution of moments', 'Deflections per span']) {
      expect(all).toContain(heading);
    }
    // the arrangements of the codes named (EN 1992-1-1 5.1.3: alternate and adjacent spans)
    expect(joined).toMatch(/spans 1 and 3 loaded \(alternate spans; ACI 318-19 6\.4\.2\(a\), EN 1992-1-1 5\.1\.3\(a\)\)/);
    // the redistribution permitted by EN 1992-1-1 5.5(4) beside the one used
    expect(joined).toMatch(/EN 1992-1-1 5\.5\(4\)/);
    // the hinge table: order, load factor, rotation demand and capacity
    const cb1 = results.continuous!.find((r) => r.memberId === 'CB-1')!;
    expect(all).toContain('θ capacity');
    expect(cb1.capacity!.hinges.every((h) => all.includes(String(h.order)))).toBe(true);
    // deflections: both methods and the limit of EN 1992-1-1 7.4.1(5)
    expect(joined).toMatch(/span\/500/);
    // CB-2's short span 2 rises under the long span's load: its cells say upward (both methods), the limits apply to the magnitude
    expect(all.some((t) => /^\d+\.\d mm upward \/ \d+\.\d mm upward$/.test(t))).toBe(true);
    expect(joined).toMatch(/Deflections are downward unless marked upward/);
    expect(all.filter((t) => t === CAUTION_TEXT).length).toBeGreaterThanOrEqual(1 + memberIds.length);
    expect(joined).toMatch(/Flexure: passes, utilisation 0\.\d\d at span \d/);
  });

  it('lists the continuous members in the project summary with their status', () => {
    expect(all).toContain('Continuous members');
    const cb2 = results.continuous!.find((r) => r.memberId === 'CB-2')!;
    expect(cb2.verdict.status).toBe('check-fails');
    expect(all).toContain('CHECK FAILS');
    expect(all).toContain('OK');
  });
});
