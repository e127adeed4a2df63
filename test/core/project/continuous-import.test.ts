/**
 * Continuous members from CSV, one row per span: geometry, supports (shared between rows), support
 * zones, column springs and loads in internal units; every bad cell named by row and column.
 */
import { describe, expect, it } from 'vitest';
import { importContinuousMembersCsv } from '../../../core/project/continuous-import.ts';

const HEADER = 'member,name,span [m],left support,right support,section,left section,left zone [m],right section,right zone [m],dead [kN/m],live [kN/m]';

describe('continuous members from CSV', () => {
  it('reads a three-span member: spans, supports, support zones merged across the supports, loads per span', () => {
    const text = [
      HEADER,
      'CB-7,B-7/A–D,6.0,pinned,pinned,S-span,,,S-sup,1.5,12,10',
      'CB-7,,7.2,,,S-span,S-sup,1.5,S-sup,1.5,12,10',
      'CB-7,,6.0,,pinned,S-span,S-sup,1.5,,,12,10',
    ].join('\n');
    const { members, diagnostics } = importContinuousMembersCsv(text, { sectionIds: new Set(['S-span', 'S-sup']) });
    expect(diagnostics).toEqual([]);
    expect(members).toHaveLength(1);
    const m = members[0]!;
    expect(m.id).toBe('CB-7');
    expect(m.name).toBe('B-7/A–D');
    expect(m.spans).toEqual([6000, 7200, 6000]);
    expect(m.supports).toEqual([{ kind: 'pinned' }, { kind: 'pinned' }, { kind: 'pinned' }, { kind: 'pinned' }]);
    // 1 kN/m = 1 N/mm
    expect(m.zones).toEqual([
      { from: 0, to: 4500, sectionId: 'S-span' },
      { from: 4500, to: 7500, sectionId: 'S-sup' },
      { from: 7500, to: 11700, sectionId: 'S-span' },
      { from: 11700, to: 14700, sectionId: 'S-sup' },
      { from: 14700, to: 19200, sectionId: 'S-span' },
    ]);
    expect(m.loads.filter((l) => l.loadCase === 'live').map((l) => [l.span, l.magnitude])).toEqual([[1, 10], [2, 10], [3, 10]]);
    expect(m.loads.filter((l) => l.loadCase === 'dead').every((l) => l.magnitude === 12)).toBe(true);
  });

  it('reads column supports (EI and storey height, above and below) and a right cantilever, in US units', () => {
    const text = [
      'member,part,span [ft],left support,right support,right column EI [kip·in²],right column height [ft],columns,section,live [kip/ft]',
      'CB-9,span,20,pinned,column,1.2e7,12,below,S1,0.8',
      'CB-9,span,24,,,,,,S1,0.8',
      'CB-9,right cantilever,5,,,,,,S1,0.4',
    ].join('\n');
    const { members, diagnostics } = importContinuousMembersCsv(text);
    expect(diagnostics).toEqual([]);
    const m = members[0]!;
    // 1 ft = 304.8 mm; 1 kip·in² = 4448.2216 N × 25.4² mm²; 1 kip/ft = 14.5939 N/mm
    expect(m.spans[0]).toBeCloseTo(6096, 6);
    expect(m.rightCantilever).toBeCloseTo(1524, 6);
    expect(m.supports[1]).toEqual({ kind: 'column', below: { stiffness: expect.closeTo(1.2e7 * 4448.2216152605 * 645.16, -3), height: expect.closeTo(3657.6, 6), farEnd: 'fixed' } });
    expect(m.supports[2]).toEqual({ kind: 'pinned' });
    expect(m.loads.find((l) => l.span === 'right-cantilever')!.magnitude).toBeCloseTo(0.4 * 14.593903, 4);
  });

  it('names every bad cell by row and column and imports the other members', () => {
    const text = [
      HEADER,
      'CB-1,,6.0,pinned,fixed,S-span,,,,,12,10',
      'CB-1,,5.0,pinned,pinned,S-span,,,,,12,10',
      'CB-2,,six,hinge,,S-x,S-sup,,,,-3,10',
      'CB-3,,4.0,,,S-span,S-sup,2.5,S-sup,2.0,1,1',
      'CB-4,,5.0,,,S-span,,,,,1,1',
    ].join('\n');
    const { members, diagnostics } = importContinuousMembersCsv(text, { sectionIds: new Set(['S-span', 'S-sup']) });
    const at = (path: string) => diagnostics.filter((d) => d.path === path).map((d) => d.message);
    expect(at('row 3, column left support')).toEqual([expect.stringMatching(/^"pinned" disagrees with the right support "fixed" of the span on row 2/)]);
    expect(at('row 4, column span')).toEqual(['must be a number in m, got "six"']);
    expect(at('row 4, column left support')).toEqual([expect.stringMatching(/^must be pinned, fixed, column/)]);
    expect(at('row 4, column section')).toEqual([expect.stringMatching(/^no section with id "S-x"/)]);
    expect(at('row 4, column left zone')).toEqual([expect.stringMatching(/needs the length of its zone/)]);
    expect(at('row 4, column dead')).toEqual([expect.stringMatching(/^must be at least 0 and at most .* kN\/m, got -3 kN\/m/)]);
    expect(at('row 5, column right zone')).toEqual([expect.stringMatching(/support zones \(4\.5 m together\) must be shorter than the span/)]);
    expect(diagnostics.every((d) => d.severity === 'error')).toBe(true);
    expect(members.map((m) => m.id)).toEqual(['CB-4']);
  });

  it('refuses a header without the required columns or units', () => {
    const { members, diagnostics } = importContinuousMembersCsv('member,span,section\nCB-1,6,S1');
    expect(members).toEqual([]);
    expect(diagnostics).toContainEqual(expect.objectContaining({ path: 'row 1, column span', message: expect.stringMatching(/must name the unit/) }));
  });

  it('checks the assembled member like a project file (more spans than allowed)', () => {
    const rows = Array.from({ length: 9 }, () => 'CB-1,,5.0,,,S-span,,,,,1,1');
    const { members, diagnostics } = importContinuousMembersCsv([HEADER, ...rows].join('\n'));
    expect(members).toEqual([]);
    expect(diagnostics).toContainEqual(expect.objectContaining({ path: 'row 2', message: 'member "CB-1" must have 1 to 8 span rows, got 9' }));
  });
});
