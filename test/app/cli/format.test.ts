/* eslint-disable @typescript-eslint/no-explicit-any -- the tests edit project JSON freely to build malformed files */
import { beforeAll, describe, expect, it } from 'vitest';
import { analyzeProject, type ProjectResults } from '../../../core/analysis.ts';
import { demoProject } from '../../../core/project/demo.ts';
import type { Project } from '../../../core/project/types.ts';
import {
  analysisJson, diagnosticLines, fixedQuantityText, problemCount, progressLine, renderTable, resultColumns, tableReport, visibleLength, wrap, wrapLines,
} from '../../../app/cli/format.ts';

let project: Project;
let results: ProjectResults;
beforeAll(() => {
  const full = demoProject();
  project = { ...full, members: full.members.filter((m) => ['B-204', 'C-101', 'P-206'].includes(m.id)) };
  results = analyzeProject(project);
});

describe('renderTable', () => {
  it('aligns columns (left text, right numbers) under a header, a unit row and a rule', () => {
    const text = renderTable(
      [{ header: 'Member', unit: '', align: 'left' }, { header: 'Span', unit: 'ft', align: 'right' }],
      [['B-1', '24.0'], ['LONGER-ID', '8.5']],
    );
    expect(text.split('\n')).toEqual([
      'Member     Span',
      '             ft',
      '─────────  ────',
      'B-1        24.0',
      'LONGER-ID   8.5',
    ]);
  });

  it('measures width without colour codes', () => {
    expect(visibleLength('\u001b[31mfail\u001b[0m')).toBe(4);
    const text = renderTable([{ header: 'S', unit: '', align: 'left' }, { header: 'X', unit: '', align: 'left' }], [['\u001b[31mab\u001b[0m', 'c']], { enabled: false });
    expect(text.split('\n')[3]).toBe('\u001b[31mab\u001b[0m  c');
  });
});

describe('wrap', () => {
  it('breaks at spaces within the width and indents continuation lines', () => {
    expect(wrapLines('aaa bbb ccc ddd', 7)).toEqual(['aaa bbb', 'ccc ddd']);
    expect(wrap('one two three four five six seven eight nine ten eleven twelve', 30, 4)).toBe('one two three four five\n    six seven eight nine ten\n    eleven twelve');
  });
});

describe('fixedQuantityText', () => {
  it('shows spans to 0.1 ft and 0.01 m, deflections to 0.01 in and 0.1 mm (1 ft = 304.8 mm, 1 in = 25.4 mm)', () => {
    expect(fixedQuantityText('spanLength', 7315.2, 'us')).toBe('24.0');
    expect(fixedQuantityText('spanLength', 7315.2, 'si')).toBe('7.32');
    expect(fixedQuantityText('deflection', 12.7, 'us')).toBe('0.50');
    expect(fixedQuantityText('deflection', 12.7, 'si')).toBe('12.7');
    // 1 kip·ft = 4448.2216 N × 304.8 mm = 1.355 818 × 10⁶ N·mm (NIST SP 811 B.8)
    expect(fixedQuantityText('moment', 1.3558179483314004e8, 'us')).toBe('100.0');
    expect(fixedQuantityText('rotation', 0.0125, 'us', 'mrad')).toBe('12.5');
  });

  it('shows — for a missing or non-finite value, never NaN', () => {
    expect(fixedQuantityText('moment', null, 'si')).toBe('—');
    expect(fixedQuantityText('moment', Number.NaN, 'si')).toBe('—');
    expect(fixedQuantityText('moment', Number.POSITIVE_INFINITY, 'si')).toBe('—');
  });
});

describe('tableReport', () => {
  it('shows units in the header for US and SI, each member, the summary and the caution', () => {
    const us = tableReport(project, results, { system: 'us' });
    expect(us).toMatch(/Span +My +Mu/);
    expect(us.split('\n')[3]).toMatch(/ft +kip·ft +kip·ft .* mrad +in +in/);
    expect(us).toMatch(/^B-204 +simply supported +22\.0 /m);
    expect(us).toMatch(/^C-101 +cantilever +12\.0 /m);
    expect(us).toMatch(/check fails/);
    expect(us).toMatch(/Caution: Results are for review by a qualified engineer/);
    expect(us).not.toMatch(/NaN|Infinity|undefined/);
    const si = tableReport(project, results, { system: 'si' });
    expect(si.split('\n')[3]).toMatch(/m +kN·m +kN·m .* mrad +mm +mm/);
    expect(si).toMatch(/^B-204 +simply supported +6\.71 /m);
  });

  it('a brittle member reads "brittle", never ok, with its ductility and rotation as —; the summary counts it', () => {
    const us = tableReport(project, results, { system: 'us' });
    const row = us.split('\n').find((l) => l.startsWith('P-206'))!;
    expect(row).toMatch(/ brittle$/);
    // φu/φy, μΔ and θp are not given for a brittle member
    expect(row).toMatch(/propped cantilever +20\.0 +[\d.]+ +[\d.]+ +— +— +— /);
    expect(us).toMatch(/^3 members: 1 ok, 1 with a failing check, 1 brittle, 0 not converged, 0 with input errors\.$/m);
  });

  it('keeps lines within the width given, apart from the table itself', () => {
    const text = tableReport(project, results, { system: 'us', width: 80 });
    const afterTable = text.split('\n').slice(text.split('\n').findIndex((l) => l.startsWith('Governing mode')));
    for (const line of afterTable) expect(visibleLength(line)).toBeLessThanOrEqual(104); // the caution line is one sentence
    expect(afterTable.filter((l) => l.startsWith('        ')).length).toBeGreaterThan(2);
  });

  it('has a column per key result, with units', () => {
    expect(resultColumns('us').map((c) => `${c.header} ${c.unit}`.trim())).toEqual([
      'Member', 'Supports', 'Span ft', 'My kip·ft', 'Mu kip·ft', 'φu/φy', 'μΔ', 'θp mrad', 'Δ in', 'Δ limit in', 'Δ/limit', 'Strength util.', 'Status',
    ]);
  });
});

describe('analysisJson', () => {
  it('names the unit of every quantity beside its value, in the chosen system', () => {
    const doc = analysisJson(project, results, 'us', 'demo.hingeline') as any;
    expect(doc.format).toBe('hingeline-analysis-summary');
    expect(doc.caution).toMatch(/qualified engineer/);
    const b = doc.members.find((m: any) => m.id === 'B-204');
    expect(b.span).toEqual({ value: 22, unit: 'ft' });
    expect(b.yieldMoment.unit).toBe('kip·ft');
    expect(b.plasticRotationCapacity.unit).toBe('rad');
    expect(b.curvatureDuctility.unit).toBe('1');
    expect(b.deflection).toMatchObject({ limitCase: 'aci-sensitive-after-attachment', spanRatio: 480, pass: false, limit: { value: 0.55, unit: 'in' } });
    expect(b.deflectionChecks).toHaveLength(2);
    // where the strength check governs, and under which combination
    expect(b.strength).toMatchObject({ pass: false, direction: 'sagging', combination: '1.2D + 1.6L (ACI 318-19 Eq. (5.3.1b))' });
    expect(b.strength.position.unit).toBe('ft');
    expect(b.strength.combinations.map((c: any) => c.combination)).toEqual(['1.4D (ACI 318-19 Eq. (5.3.1a))', '1.2D + 1.6L (ACI 318-19 Eq. (5.3.1b))']);
    expect(b.ductilityUnavailable).toBeNull();
    expect(doc.summary).toEqual({ members: 3, ok: 1, checkFails: 1, brittle: 1, notConverged: 0, inputErrors: 0 });
    const si = analysisJson(project, results, 'si') as any;
    expect(si.members[0].span).toEqual({ value: 6.7056, unit: 'm' });
    expect(si.members[0].yieldMoment.unit).toBe('kN·m');
  });

  it('contains no NaN or Infinity (JSON would write them as null silently)', () => {
    const text = JSON.stringify(analysisJson(project, results, 'us'));
    const scan = (v: unknown): void => {
      if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);
      else if (v && typeof v === 'object') Object.values(v).forEach(scan);
    };
    scan(JSON.parse(text));
    scan(analysisJson(project, results, 'us'));
  });
});

describe('diagnostics and progress', () => {
  it('prints errors and warnings as single lines, and counts them', () => {
    const d = [
      { code: 'must-be-positive' as const, path: 'members[3] "B-12".span', message: 'must be greater than 0 m, got -2 m', severity: 'error' as const },
      { code: 'unknown-field' as const, path: 'info.colour', message: 'is not a field', severity: 'warning' as const },
    ];
    expect(diagnosticLines(d)).toEqual(['error: members[3] "B-12" span: must be greater than 0 m, got -2 m', 'warning: info.colour: is not a field']);
    expect(problemCount(d)).toBe('1 error, 1 warning');
    expect(problemCount([])).toBe('no problems');
  });

  it('draws a progress bar no wider than asked, cutting the member id to fit', () => {
    expect(progressLine(5, 20, 'B-204', 80)).toBe(`[${'█'.repeat(8)}${'░'.repeat(22)}]  25% 5/20 members  B-204`);
    const narrow = progressLine(1, 3, 'A-VERY-LONG-MEMBER-IDENTIFIER', 50);
    expect(visibleLength(narrow)).toBeLessThanOrEqual(50);
    expect(narrow).toMatch(/…$/);
    expect(progressLine(0, 0, '', 80)).toMatch(/ {2}0% 0\/0 members$/);
  });
});
