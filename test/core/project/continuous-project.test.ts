/**
 * Continuous members in the project file (version 3): the SI demo's two continuous beams validate,
 * survive a save and reopen unchanged, are analysed with the project, and bad fields are named with
 * their path and range. A version-2 file reads unchanged.
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { resultsSummaryCsv } from '../../../core/project/csv.ts';
import { demoProjectSI } from '../../../core/project/demo.ts';
import { parseProject, serializeProject } from '../../../core/project/file.ts';
import { validateProject } from '../../../core/project/validate.ts';
import { say } from '../../../core/units/index.ts';
import { smallProject, member } from '../../fixtures/projects.ts';

describe('continuous members in a version-3 project', () => {
  const project = demoProjectSI();
  it('the demo validates without diagnostics and reads back identically after saving', () => {
    expect(validateProject(project)).toEqual([]);
    const text = serializeProject(project);
    expect(JSON.parse(text).version).toBe(3);
    const back = parseProject(text);
    expect(back.diagnostics).toEqual([]);
    expect(back.project!.continuousMembers).toEqual(project.continuousMembers);
  });

  it('analyses them with the project: CB-1 passes every check (OK), CB-2 fails by the deflection of its long end span', () => {
    const results = analyzeProject(project);
    const [cb1, cb2] = results.continuous!;
    // CB-1: strength and shear at every station, for EN 1990 Eq. (6.10) and every arrangement, pass; ductile
    expect(cb1!.verdict.status).toBe('ok');
    expect(cb1!.verdict.collapseRatio!).toBeGreaterThan(1);
    expect(cb1!.checks!.combinations).toEqual(['1.35G + 1.5Q (EN 1990 Eq. (6.10))']);
    expect(cb1!.checks!.arrangementCount).toBe(5);
    expect(cb1!.verdict.strengthUtilisation!).toBeLessThan(1);
    expect(cb1!.verdict.shearUtilisation!).toBeLessThan(1);
    expect(cb1!.checks!.brittle).toEqual([]);
    // CB-2: the station checks pass (its long end span's sagging close to the limit), the deflection fails
    expect(cb2!.checks!.flexure.pass).toBe(true);
    expect(cb2!.checks!.flexureGoverning.part).toBe('span 1');
    expect(cb2!.checks!.flexureGoverning.direction).toBe('sagging');
    expect(cb2!.verdict.status).toBe('check-fails');
    expect(cb2!.verdict.governingSpan).toBe('span 1');
    expect(say(cb2!.verdict.governingMode, 'si')).toMatch(/^Deflection check fails in span 1 \(utilisation 1\.\d\d\): .* mm against 16\.80 mm, .*; strength check passes \(utilisation 0\.\d\d: span 1, sagging at/);
    // the CSV carries a row per continuous member naming its governing span
    const csv = resultsSummaryCsv(results.members, 'si', project, results.continuous);
    expect(csv).toMatch(/CB-2,CB-2,"continuous, 2 spans; governing span 1",8.4,check-fails/);
  });

  it('names a bad field of a continuous member with its path and allowed range', () => {
    const bad = { ...project, continuousMembers: [{ ...project.continuousMembers![0]!, spans: [6000, 50, 6000] }, { ...project.continuousMembers![1]!, id: 'MB-1' }] };
    const diagnostics = validateProject(bad);
    expect(diagnostics).toContainEqual(expect.objectContaining({ path: 'continuousMembers[0] "CB-1".spans[1]', severity: 'error', message: expect.stringMatching(/at least 0\.1 m/) }));
    expect(diagnostics).toContainEqual(expect.objectContaining({ path: 'continuousMembers[1] "CB-2".id', code: 'duplicate-id' }));
  });

  it('a version-2 file of single-span members reads unchanged and gives the same results as before', () => {
    const v3 = smallProject('ACI 318-19', [member('B-1', 'simply-supported', 6000, 'r1')]);
    const v2text = serializeProject(v3).replace('"version": 3', '"version": 2');
    const read = parseProject(v2text);
    expect(read.diagnostics.map((d) => d.code)).toEqual(['unsupported-version']);
    expect(read.project).toEqual(v3);
    // the same project object gives the same numbers (bit for bit)
    expect(JSON.stringify(analyzeProject(read.project!))).toBe(JSON.stringify(analyzeProject(v3)));
  });
});
