import { describe, expect, it } from 'vitest';
import { demoProjectSI } from '../../../core/project/demo.ts';
import { planImport } from '../../../core/project/import.ts';
import { csvKindOf, importDialog } from '../../../renderer/src/project/import-preview.ts';

const project = { ...demoProjectSI(), members: demoProjectSI().members.slice(0, 1), continuousMembers: [] };
const section = project.sections[0]!.id;

describe('csvKindOf', () => {
  it('reads a header with supports as a member list and one with span-only columns as a span list', () => {
    expect(csvKindOf('id,span [m],supports,section\nB-1,6,simple,S')).toBe('members');
    expect(csvKindOf('\uFEFFmember;span [m];left support;section\nCB-1;6;pinned;S')).toBe('spans');
    expect(csvKindOf('member,span [m],section\nCB-1,6,S')).toBe('spans');
    expect(csvKindOf('"id","span [ft]","supports","section"')).toBe('members');
  });
});

describe('importDialog', () => {
  it('lists every member read and offers the import when there is no error', () => {
    const plan = planImport(project, { members: { name: 'beams.csv', text: `id,name,span [m],supports,section,live [kN/m]\nN-1,Grid 9,6,simple,${section},5` } });
    const dialog = importDialog(plan, 'si', 'beams.csv', 'members', 1);
    expect(dialog.message).toBe('beams.csv, read as a member list (one row per member): 1 member will be added after the project’s 1 member. The import is one step: Undo (Ctrl+Z) takes it all back.');
    expect(dialog.grid?.rows).toEqual([['row 2', 'N-1', 'Grid 9', `simply supported, span 6.00 m, section ${section}; live 5.00 kN/m (self-weight added)`]]);
    expect(dialog.buttons.map((b) => b.id)).toEqual(['import', 'switch', 'cancel']);
  });

  it('with errors offers only the members without them, lists each problem, and says nothing is imported otherwise', () => {
    const text = `id,span [ft],supports,section\nN-1,20,simple,${section}\nN-2,-3,simple,${section}\n${project.members[0]!.id},20,simple,${section}`;
    const plan = planImport(project, { members: { name: 'b.csv', text } });
    const dialog = importDialog(plan, 'si', 'b.csv', 'members', 1);
    expect(dialog.message).toMatch(/^b\.csv, read as a member list \(one row per member\), has 2 errors: nothing is imported unless you choose to import the 1 member without errors/);
    expect(dialog.buttons.map((b) => b.id)).toEqual(['import-good', 'switch', 'cancel']);
    // 60 m = 196.9 ft (NIST SP 811 Appendix B.8: 1 ft = 0.3048 m exactly).
    expect(dialog.details).toContain('error: b.csv row 3, column span: must be greater than 0 and at most 196.9 ft, got -3 ft');
    expect(dialog.grid?.rows.map((r) => [r[0], r[1], r[3]!.startsWith('left out')])).toEqual([['row 2', 'N-1', false], ['row 4', project.members[0]!.id, true]]);
  });

  it('offers no import when nothing can be imported', () => {
    const plan = planImport(project, { spans: { name: 's.csv', text: 'member,span [m],section\n' } });
    const dialog = importDialog(plan, 'si', 's.csv', 'spans', 1);
    expect(dialog.message).toBe('s.csv, read as a span list (one row per span of a continuous member), lists no members (only a header?).');
    expect(dialog.buttons.map((b) => b.id)).toEqual(['switch', 'cancel']);
  });
});
