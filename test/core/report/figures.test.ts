import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { planReport, reportCharts } from '../../../core/report/figures.ts';
import type { Project } from '../../../core/project/types.ts';
import { reportTestProject } from './fixtures.ts';

describe('report figures', () => {
  const project = reportTestProject();
  const results = analyzeProject(project);

  it('asks for a drawing, a moment–curvature chart and strain and stress profiles per section, and two charts per analysed member', () => {
    const figures = reportCharts({ project, results });
    const ids = Object.keys(figures);
    expect(ids.filter((id) => id.endsWith('/drawing'))).toEqual(['section-0/drawing', 'section-1/drawing']);
    expect(ids.filter((id) => id.endsWith('/moment-curvature'))).toHaveLength(2);
    // both directions of both sections, at first yield and ultimate, strain and stress
    const profiles = ids.filter((id) => id.endsWith('/strain') || id.endsWith('/stress'));
    expect(profiles).toHaveLength(2 * 2 * 2 * 2);
    // B-1, C-1 and F-1 are analysed; X-1 has an input error and no curves
    expect(ids.filter((id) => id.endsWith('/load-deflection'))).toEqual(['member-0/load-deflection', 'member-1/load-deflection', 'member-2/load-deflection']);
    expect(ids.filter((id) => id.endsWith('/span'))).toHaveLength(3);
    expect(figures['section-0/drawing']!.kind).toBe('svg');
    expect(figures['member-0/load-deflection']!.kind).toBe('chart');
  });

  it('shares the figures of identical members instead of drawing them twice', () => {
    const twin: Project = { ...project, members: [...project.members, { ...project.members[0]!, id: 'B-2', name: 'B-2' }] };
    const twinResults = analyzeProject(twin);
    const plan = planReport({ project: twin, results: twinResults });
    const b1 = plan.members.find((m) => m.definition.id === 'B-1')!;
    const b2 = plan.members.find((m) => m.definition.id === 'B-2')!;
    expect(b2.loadDeflection).toBe(b1.loadDeflection);
    expect(b2.span).toBe(b1.span);
    expect(Object.keys(plan.figures)).toHaveLength(Object.keys(reportCharts({ project, results })).length);
  });

  it('gives every figure a size that fits the page width', () => {
    for (const f of Object.values(reportCharts({ project, results }))) {
      expect(f.width).toBeLessThanOrEqual(595.28 - 100);
      expect(f.width).toBeGreaterThan(100);
      expect(f.height).toBeGreaterThan(30);
    }
  });
});
