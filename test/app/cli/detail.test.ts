/* eslint-disable @typescript-eslint/no-explicit-any -- the test reads the JSON document as a checker would */
/**
 * `analyze --format json --detail full` (issue 11 item 9): every value with its unit, the numbers the
 * results hold converted exactly, key points a checker can verify by hand.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { analyzeProject, type ProjectResults } from '../../../core/analysis.ts';
import { demoProject } from '../../../core/project/demo.ts';
import type { Project } from '../../../core/project/types.ts';
import { analysisJson } from '../../../app/cli/format.ts';
import { memberDetail } from '../../../app/cli/detail.ts';

let project: Project;
let results: ProjectResults;
beforeAll(() => {
  const full = demoProject();
  project = { ...full, members: full.members.filter((m) => ['B-204', 'C-101'].includes(m.id)) };
  results = analyzeProject(project);
});

/** Every `{ value, unit }` in a document. */
function measuredValues(v: unknown, out: { value: unknown; unit: unknown }[] = []): { value: unknown; unit: unknown }[] {
  if (Array.isArray(v)) v.forEach((x) => measuredValues(x, out));
  else if (v && typeof v === 'object') {
    if ('value' in v && 'unit' in v) out.push(v as { value: unknown; unit: unknown });
    else Object.values(v).forEach((x) => measuredValues(x, out));
  }
  return out;
}

describe('the full detail of the JSON output', () => {
  it('is given per member only with the detail, beside the summary keys', () => {
    const summary = analysisJson(project, results, 'us') as any;
    expect(summary.members[0].detail).toBeUndefined();
    const full = analysisJson(project, results, 'us', undefined, memberDetail) as any;
    const b = full.members.find((m: any) => m.id === 'B-204');
    expect(b.yieldMoment.unit).toBe('kip·ft');
    expect(Object.keys(b.detail)).toEqual(['asFoundConcrete', 'sections', 'loadDeflection', 'ductility', 'hinges', 'service']);
  });

  it('gives an as-found concrete both strengths: the cores\' mean (behaviour) and the lower fractile (code checks)', () => {
    const r = results.members.find((m) => m.memberId === 'B-204')!;
    const [c] = (memberDetail(r, 'us') as any).asFoundConcrete;
    // the demo's cores: mean 3500 psi, n = 6, V = 0.11; ACI 214.4R-10 f′c,eq = f̄c(1 − K·V) (from memory), K from the result
    const k = r.retrofit!.asFound!.concrete[0]!.inPlace.factor;
    expect(c.meanStrength.unit).toBe('psi');
    expect(c.meanStrength.value).toBeCloseTo(3500, 3);
    expect(c.codeStrength.value).toBeCloseTo(3500 * (1 - k * 0.11), 3);
    expect(c.cores).toEqual({ count: 6, coefficientOfVariation: { value: 0.11, unit: '1' } });
    const derived = r.retrofit!.derivedMaterials.find((m) => m.id === c.derivedId) as any;
    expect(derived.meanStrength).toBeCloseTo(3500 * 0.006894757, 4);
    const other = results.members.find((m) => m.memberId === 'C-101')!;
    expect((memberDetail(other, 'us') as any).asFoundConcrete).toEqual([]);
  });

  it('writes every number with a unit, finite, in the chosen system', () => {
    for (const system of ['us', 'si'] as const) {
      const doc = analysisJson(project, results, system, undefined, memberDetail) as any;
      const values = measuredValues(doc.members.map((m: any) => m.detail));
      expect(values.length).toBeGreaterThan(500);
      for (const v of values) {
        expect(typeof v.value).toBe('number');
        expect(Number.isFinite(v.value)).toBe(true);
        expect(typeof v.unit).toBe('string');
      }
      const units = new Set(values.map((v) => v.unit));
      if (system === 'us') expect([...units]).toEqual(expect.arrayContaining(['kip·ft', '1/in', 'in', 'ft', 'kip', 'rad', '1']));
      else expect([...units]).toEqual(expect.arrayContaining(['kN·m', '1/m', 'mm', 'm', 'kN', 'rad', '1']));
    }
  });

  it('gives each section’s key points with strains and neutral axis, the curves in both directions, the load–deflection points, the hinges and both service methods', () => {
    const r = results.members.find((m) => m.memberId === 'B-204')!;
    const d = memberDetail(r, 'si') as any;
    const section = d.sections[0];
    const sagging = section.sagging;
    expect(sagging.keyPoints.map((k: any) => k.name)).toEqual(expect.arrayContaining(['cracking', 'firstYield', 'codeCrushing', 'peak', 'ultimate']));
    expect(sagging.points).toHaveLength(r.sections[0]!.sagging!.points.length);
    expect(section.hogging.points.length).toBeGreaterThan(5);
    // ACI 318-19 22.2.2.1: the code crushing point is where the extreme compression fibre reaches 0.003
    const crushing = sagging.keyPoints.find((k: any) => k.name === 'codeCrushing');
    expect(crushing.compressionFaceStrain).toEqual({ value: 0.003, unit: '1' });
    expect(sagging.concreteLimits.codeCrushingSource).toBe('ACI 318-19 22.2.2.1');
    // plane sections: the neutral axis depth is the compression-face strain over the curvature (common practice, no source)
    const fy = sagging.keyPoints.find((k: any) => k.name === 'firstYield');
    expect(fy.neutralAxisDepth.unit).toBe('mm');
    expect(fy.curvature.unit).toBe('1/m');
    expect(fy.neutralAxisDepth.value / 1000).toBeCloseTo(fy.compressionFaceStrain.value / fy.curvature.value, 4);
    // the moment in kN·m is the internal N·mm value over 10⁶ (SI prefixes), to six significant figures
    expect(fy.moment.value).toBeCloseTo(r.sections[0]!.sagging!.keyPoints.firstYield!.moment / 1e6, 2);
    expect(d.loadDeflection.points).toHaveLength(r.loadDeflection.points.length);
    expect(d.loadDeflection.points[1].totalLoad.unit).toBe('kN');
    expect(d.hinges.length).toBe(r.ductility.hinges.length);
    expect(d.hinges[0].rotationCapacity.unit).toBe('rad');
    expect(Object.keys(d.service.immediate)).toEqual(['integration', 'code']);
    expect(d.service.immediate.code.dead.unit).toBe('mm');
    expect(d.service.checks[0]).toMatchObject({ limitCase: r.service!.checks[0]!.limitCase, spanRatio: r.service!.checks[0]!.ratio });
  });
});
