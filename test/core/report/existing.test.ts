/**
 * An existing beam in the report: the as-found inputs with their statistics, the defects, each
 * scheme's inputs and drawing, the comparison charts and table with the strengthening method's
 * checks, the governing mode before and after, the shear diagram; the project summary says which
 * members need strengthening and the preferred scheme. A member that is not an existing beam gets
 * none of it.
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { variantComparisonTable } from '../../../core/charts/variant-table.ts';
import { buildReportDocument } from '../../../core/report/document.ts';
import { planReport, reportCharts } from '../../../core/report/figures.ts';
import type { ReportInput } from '../../../core/report/types.ts';
import type { Project } from '../../../core/project/types.ts';
import { CORES_AND_DEFECTS, FRP_SCHEME, OVERLAY_SCHEME, retrofitProject } from '../retrofit/retrofit-project.ts';
import { texts } from './content.ts';

const base = retrofitProject('ACI 318-19', { asFound: CORES_AND_DEFECTS, schemes: [FRP_SCHEME, OVERLAY_SCHEME], preferredSchemeId: 'ov75' });
const plain = { ...base.members[0]!, id: 'P-1', name: 'P-1' };
delete (plain as { asFound?: unknown }).asFound;
delete (plain as { schemes?: unknown }).schemes;
delete (plain as { preferredSchemeId?: unknown }).preferredSchemeId;
const project: Project = { ...base, members: [...base.members, plain] };
const results = analyzeProject(project);
const meta = { softwareVersion: '1.0.0', projectHash: 'cd'.repeat(32), generatedOn: '2026-05-02T10:00:00Z' };
const figures = reportCharts({ project, results });
const images = Object.fromEntries(Object.entries(figures).map(([id, f]) => [id, f.kind === 'svg' ? f.svg : `<svg xmlns="http://www.w3.org/2000/svg" width="${f.width}" height="${f.height}"><text x="2" y="10">${f.spec.title}</text></svg>`]));
const input: ReportInput = { project, results, images, meta };
const all = texts(buildReportDocument(input).content);
const joined = all.join('\n');
const existing = project.members[0]!;
const retrofit = results.members.find((m) => m.memberId === existing.id)!.retrofit!;

describe('the report of an existing beam', () => {
  it('plans the as-found and scheme drawings, the comparison charts and the shear diagram for the existing beam only', () => {
    const plan = planReport({ project, results });
    const [ex, other] = plan.members;
    expect(ex!.existing!.asFound.map((a) => a.baseSectionId)).toEqual(['r1']);
    expect(ex!.existing!.schemes.map((s) => s.schemeId)).toEqual(['frp2', 'ov75']);
    // Each of the three comparison drawings is a planned chart with at least the design beam drawn.
    for (const id of [ex!.existing!.momentCurvature, ex!.existing!.loadDeflection, ex!.existing!.shear]) {
      const figure = plan.figures[id!];
      expect(figure?.kind).toBe('chart');
      expect(figure?.kind === 'chart' && figure.spec.series.length).toBeGreaterThan(0);
    }
    const mc = plan.figures[ex!.existing!.momentCurvature!]!;
    expect(mc.kind === 'chart' && mc.spec.series.map((s) => s.label)).toEqual(['design beam', 'as found', 'CFRP, 2 plies', 'Overlay 75 mm']);
    expect(other!.existing).toBeNull();
  });

  it('lists the cores with their statistics and the characteristic strength by the method named', () => {
    const core = retrofit.asFound!.concrete[0]!;
    expect(joined).toContain('Tested concrete strength (cores)');
    expect(all).toContain(String(core.cores.count));
    // ACI 214.4R-10 (from memory): f′c,eq = f̄c(1 − K·V), printed to three significant figures in MPa.
    const expected = core.cores.meanStrength * (1 - core.inPlace.factor * core.cores.coefficientOfVariation);
    expect(core.inPlace.strength).toBeCloseTo(expected, 6);
    expect(all).toContain(`${expected.toPrecision(3)} MPa`);
    expect(joined).toContain('ACI 214.4R-10');
    // both strengths with their use (issue 11 item 3)
    expect(joined).toContain('Mean fc,mean (behaviour)');
    expect(joined).toContain('f′c,eq (code checks)');
    expect(joined).toMatch(/mean fc,mean is used for the behaviour .*; f′c,eq for the code checks/);
    // The report font has no arrow: what a defect did reads "a to b".
    expect(joined).toMatch(/Bar section loss: .* to /);
    expect(joined).not.toContain('→');
  });

  it('gives each scheme its inputs and the comparison table the app shows, with the strengthening checks', () => {
    expect(joined).toContain('Scheme: CFRP, 2 plies');
    expect(joined).toContain('Scheme: Overlay 75 mm');
    expect(joined).toContain('Strain limit (ACI 440.2R-17)');
    const table = variantComparisonTable(retrofit, 'si', 'ACI 318-19');
    const strength = table.rows.find((r) => r.id === 'strength')!;
    const i = all.indexOf('Strength: factored M / φMn');
    expect(i).toBeGreaterThan(0);
    expect(all.slice(i + 2, i + 2 + strength.cells.length)).toEqual(strength.cells.map((c) => c.text));
    expect(all).toContain('Overlay 75 mm (preferred)');
    expect(joined).toContain('Code checks of the strengthening method');
    expect(joined).toContain('Reinforcing steel stress under service load');
  });

  it('states the governing mode of every variant, before and after, and draws the shear along the span', () => {
    expect(joined).toContain('Governing mode, before and after');
    expect(all.filter((t) => t.startsWith('as found: ') || t === 'as found: ')).toHaveLength(1);
    expect(joined).toContain('Shear along the span');
  });

  it('lists in the project summary the members that need strengthening and the preferred scheme', () => {
    const i = all.indexOf('Existing beams: strengthening');
    expect(i).toBeGreaterThan(0);
    const summary = all.slice(i, i + 20);
    const needs = results.members[0]!.status === 'check-fails';
    expect(summary).toContain(existing.name);
    expect(summary).toContain(needs ? 'yes' : 'no');
    expect(summary).toContain('Overlay 75 mm');
    // P-1 is not an existing beam: it is not listed there.
    expect(summary).not.toContain('P-1');
  });
});
