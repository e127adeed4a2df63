/* eslint-disable @typescript-eslint/no-explicit-any -- the test reads the JSON document as a checker would */
/**
 * The CLI with a member whose load–deflection curve passes span/50 before its ultimate (issue 17):
 * the table's μΔ cell is empty and the governing-mode line says why; the JSON summary and the full
 * detail give null with the reason beside it — never a number.
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { analysisJson, keyResultsOf, resultColumns, resultRow, tableReport } from '../../../app/cli/format.ts';
import { memberDetail } from '../../../app/cli/detail.ts';
import { NOT_A_VALUE } from '../../../core/units/index.ts';
import { longProject, REASON_60M } from '../../core/assessment/beam-fixtures.ts';

const project = longProject();
const results = analyzeProject(project);

describe('CLI: Δu and μΔ outside the small-deflection range', () => {
  it('table: μΔ is not a number, the governing-mode line names the range', () => {
    const [k] = keyResultsOf(project, results.members);
    const mu = resultColumns('si').findIndex((c) => c.header === 'μΔ');
    expect(resultRow(k!, 'si')[mu]).toBe(NOT_A_VALUE);
    const text = tableReport(project, results, { system: 'si', width: 200 }).replace(/\s+/g, ' ');
    expect(text).toContain('load–deflection outside the small-deflection range of the method (beyond span/50): no μΔ');
    expect(text).not.toMatch(/μΔ = \d/);
    expect(text).toContain(`warning: ${REASON_60M}`);
  });

  it('JSON: displacementDuctility null with ultimateOutsideRange; the detail has no Δu and says why', () => {
    const doc = analysisJson(project, results, 'si', undefined, memberDetail) as any;
    const m = doc.members[0];
    expect(m.displacementDuctility).toBeNull();
    expect(m.ultimateOutsideRange).toBe(REASON_60M);
    expect(m.detail.ductility.ultimateDeflection).toBeNull();
    expect(m.detail.ductility.displacementDuctility).toBeNull();
    expect(m.detail.ductility.ultimateOutsideRange).toBe(m.ultimateOutsideRange);
  });
});
