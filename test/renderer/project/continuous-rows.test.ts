/**
 * A continuous member's row in the overview: its governing span and the values picked from its
 * results (core computes them; the row only picks), sorted and filtered with the single spans.
 */
import { describe, expect, it } from 'vitest';
import { analyzeContinuousMembers } from '../../../core/analysis.ts';
import { demoProjectSI } from '../../../core/project/demo.ts';
import { continuousRowData, continuousStatus, supportsText } from '../../../renderer/src/project/continuous-rows.ts';
import { filterRows, sortRows, type OverviewRow } from '../../../renderer/src/project/overview-rows.ts';

const project = demoProjectSI();
const cb2 = project.continuousMembers!.find((m) => m.id === 'CB-2')!;
const cb1 = project.continuousMembers!.find((m) => m.id === 'CB-1')!;
const [result] = analyzeContinuousMembers({ ...project, continuousMembers: [cb2] });

describe('continuous rows', () => {
  it('says how many spans, cantilevers and what supports', () => {
    expect(supportsText(cb2)).toBe('2 spans + cantilever, pins');
    expect(supportsText(cb1)).toBe('3 spans, pins/columns');
  });

  it('picks the governing span, its length and its deflection check from the results', () => {
    const row = continuousRowData(cb2, result!);
    expect(row.governingPart).toBe('span 1');
    expect(row.governingLength).toBeCloseTo(8400, 6);
    expect(row.deflection!.pass).toBe(false);
    expect(row.deflection!.utilisation).toBe(result!.verdict.deflectionUtilisation);
    expect(row.deflection!.description).toMatch(/^span 1: /);
    expect(continuousStatus({ result: result!, current: true })).toBe('check-fails');
    expect(continuousStatus({ result: result!, current: false })).toBe('outdated');
    expect(continuousStatus(null)).toBe('pending');
  });

  it('sorts and filters with the single-span rows', () => {
    const single = (name: string, utilisation: number): OverviewRow => ({
      member: { id: name, name, notes: undefined },
      key: { governingMode: `${name} governs`, deflection: { utilisation, deflection: 1, limit: 1, ratio: 250, pass: utilisation <= 1, limitCase: 'custom', description: '' } } as unknown as OverviewRow['key'],
      status: utilisation <= 1 ? 'ok' : 'check-fails',
    });
    const continuous: OverviewRow = { member: { id: cb2.id, name: cb2.name, notes: cb2.notes }, key: null, status: 'check-fails', continuous: continuousRowData(cb2, result!) };
    const rows = [single('B-1', 0.5), continuous, single('B-2', 2)];
    expect(sortRows(rows, 'utilisation', false).map((r) => r.member.name)).toEqual(['B-1', 'CB-2', 'B-2']);
    expect(sortRows(rows, 'span', false).map((r) => r.member.name)[0]).toBe('CB-2');
    expect(filterRows(rows, 'span 1', 'all').map((r) => r.member.name)).toEqual(['CB-2']);
    expect(filterRows(rows, 'loading bay', 'check-fails').map((r) => r.member.name)).toEqual(['CB-2']);
  });
});
