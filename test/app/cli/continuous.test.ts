/** The command line's table and JSON of continuous members: one row per member with its governing span. */
import { describe, expect, it } from 'vitest';
import { analyzeContinuousMembers } from '../../../core/analysis.ts';
import { demoProjectSI } from '../../../core/project/demo.ts';
import { continuousJson, continuousTable } from '../../../app/cli/continuous.ts';

describe('continuous members on the command line', () => {
  const results = analyzeContinuousMembers(demoProjectSI());
  it('prints a row per member: spans, governing span, station-check utilisations, status', () => {
    const table = continuousTable(results, 'si', 110);
    const rows = table.split('\n').filter((l) => /^CB-\d\s/.test(l));
    expect(rows).toHaveLength(2);
    expect(rows[0]).toMatch(/^CB-1\s+6\.00 \+ 7\.00 \+ 6\.00\s+span [13]\s+0\.\d\d\s+0\.\d\d\s.*ok$/);
    expect(rows[1]).toMatch(/^CB-2\s+8\.40 \+ 4\.20 \+ c1\.50\s+span 1\s+0\.\d\d\s+0\.\d\d\s.*check fails$/);
    expect(table).toMatch(/CB-2: Deflection check fails in span 1 \(utilisation 1\.\d\d\)/);
    expect(table).toMatch(/CB-1: Strength check passes \(utilisation 0\.\d\d: span [13], hogging at/);
  });
  it('writes the same in JSON, with the hinge sequence and the redistribution', () => {
    const json = continuousJson(results, 'si') as { id: string; status: string; governingSpan: string; hinges: { order: number }[]; redistribution: unknown[] }[];
    expect(json.map((j) => [j.id, j.status, j.governingSpan])).toEqual([['CB-1', 'ok', results[0]!.verdict.governingSpan], ['CB-2', 'check-fails', 'span 1']]);
    const strength = (json[0] as unknown as { strength: { governing: { part: string; combination: string; arrangement: string; direction: string } } }).strength;
    expect(strength.governing).toEqual(expect.objectContaining({ part: results[0]!.verdict.governingSpan, direction: 'hogging', combination: '1.35G + 1.5Q (EN 1990 Eq. (6.10))' }));
    expect(strength.governing.arrangement).toMatch(/loaded/);
    expect(json[0]!.hinges.map((h) => h.order)).toEqual(json[0]!.hinges.map((_, i) => i + 1));
    expect(json[0]!.redistribution).toHaveLength(2);
  });
  it('gives every span its signed service deflections: the short span of CB-2 rises under the load of the long one', () => {
    type Values = { deadPlusLive: number; longTermTotal: number };
    type Service = { part: string; integrationMm: Values; codeMm: Values; checks: { valueMm: number; direction: string; utilisation: number; limitMm: number }[] }[];
    const cb2 = (continuousJson(results, 'si') as { serviceDeflections: Service; deflection: { direction: string; valueMm: number } }[])[1]!;
    const span2 = cb2.serviceDeflections.find((p) => p.part === 'span 2')!;
    // A short unloaded-side span beside a long loaded one is lifted (three-moment equation; test/references/continuous-upward-deflection.test.ts).
    expect(span2.integrationMm.longTermTotal).toBeLessThan(-1);
    expect(span2.codeMm.deadPlusLive).toBeLessThan(0);
    for (const c of span2.checks) {
      expect(c.direction).toBe('upward');
      expect(c.utilisation).toBeCloseTo(-c.valueMm / c.limitMm, 12);
    }
    expect(cb2.deflection.direction).toBe('downward');
    expect(cb2.deflection.valueMm).toBeGreaterThan(0);
  });
});
