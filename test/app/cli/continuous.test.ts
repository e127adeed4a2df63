/** The command line's table and JSON of continuous members: one row per member with its governing span. */
import { describe, expect, it } from 'vitest';
import { analyzeContinuousMembers } from '../../../core/analysis.ts';
import { demoProjectSI } from '../../../core/project/demo.ts';
import { continuousJson, continuousTable } from '../../../app/cli/continuous.ts';

describe('continuous members on the command line', () => {
  const results = analyzeContinuousMembers(demoProjectSI());
  it('prints a row per member: spans, governing span, status; never a plain OK', () => {
    const table = continuousTable(results, 'si', 110);
    const rows = table.split('\n').filter((l) => /^CB-\d\s/.test(l));
    expect(rows).toHaveLength(2);
    expect(rows[0]).toMatch(/^CB-1\s+6\.00 \+ 7\.00 \+ 6\.00\s+span [13].*review$/);
    expect(rows[1]).toMatch(/^CB-2\s+8\.40 \+ 4\.20 \+ c1\.50\s+span 1.*check fails$/);
    expect(table).not.toMatch(/\bok\b/);
    expect(table).toMatch(/CB-2: deflection of span 1/);
  });
  it('writes the same in JSON, with the hinge sequence and the redistribution', () => {
    const json = continuousJson(results, 'si') as { id: string; status: string; governingSpan: string; hinges: { order: number }[]; redistribution: unknown[] }[];
    expect(json.map((j) => [j.id, j.status, j.governingSpan])).toEqual([['CB-1', 'review', results[0]!.verdict.governingSpan], ['CB-2', 'check-fails', 'span 1']]);
    expect(json[0]!.hinges.map((h) => h.order)).toEqual(json[0]!.hinges.map((_, i) => i + 1));
    expect(json[0]!.redistribution).toHaveLength(2);
  });
});
