/**
 * What a member's results depend on: the member, its sections, their materials, the code basis
 * and the settings — compared by identity after immutable edits.
 */
import { describe, expect, it } from 'vitest';
import { demoProject } from '../../../core/project/demo.ts';
import { memberInputs, memberOwnMaterialIds, membersUsingSection, sameInputs, sectionsUsingMaterial, subproject } from '../../../renderer/src/project/dependencies.ts';
import { setMaterialField, setMemberField, setSectionField } from '../../../renderer/src/project/edits.ts';
import { setIn } from '../../../renderer/src/project/immutable.ts';

const project = demoProject();

describe('memberInputs', () => {
  it('stay the same when another member changes', () => {
    const next = setMemberField(project, 'B-204', ['span'], 7000);
    expect(sameInputs(memberInputs(project, 'B-201'), memberInputs(next, 'B-201'))).toBe(true);
    expect(sameInputs(memberInputs(project, 'B-204'), memberInputs(next, 'B-204'))).toBe(false);
  });

  it('change for every member using an edited section, and only for them', () => {
    const next = setSectionField(project, 'T24', ['shape', 'height'], 700);
    const users = membersUsingSection(project, 'T24');
    expect(users).toEqual(['B-201', 'B-204']);
    for (const m of project.members) {
      expect(sameInputs(memberInputs(project, m.id), memberInputs(next, m.id))).toBe(!users.includes(m.id));
    }
  });

  it('change through a material for the members of every section using it', () => {
    const next = setMaterialField(project, 'g60', ['yieldStress', ], 420);
    const sections = sectionsUsingMaterial(project, 'g60');
    expect(sections).toContain('R24-support');
    const changed = project.members.filter((m) => !sameInputs(memberInputs(project, m.id), memberInputs(next, m.id))).map((m) => m.id);
    // …and of every member that names it itself (B-204's overlay bars are g60).
    expect(changed).toEqual(project.members.filter((m) => m.zones.some((z) => sections.includes(z.sectionId)) || memberOwnMaterialIds(m).includes('g60')).map((m) => m.id));
    expect(changed).toContain('B-204');
  });

  it('change for all members with the code basis, and for none with the display units', () => {
    const code = setIn(project, ['info', 'codeBasis'], 'EN 1992-1-1');
    const units = setIn(project, ['info', 'unitSystem'], 'si');
    for (const m of project.members) {
      expect(sameInputs(memberInputs(project, m.id), memberInputs(code, m.id))).toBe(false);
      expect(sameInputs(memberInputs(project, m.id), memberInputs(units, m.id))).toBe(true);
    }
  });

  it('are null for a member that is not in the project', () => {
    expect(memberInputs(project, 'nope')).toBeNull();
    expect(sameInputs(null, null)).toBe(false);
  });
});

describe('subproject', () => {
  it('holds the members asked for, the sections they use and those sections’ materials', () => {
    const part = subproject(project, ['F-205']);
    expect(part.members.map((m) => m.id)).toEqual(['F-205']);
    expect(part.sections.map((s) => s.id).sort()).toEqual(['R24-mid', 'R24-support']);
    expect(part.materials.map((m) => m.id).sort()).toEqual(['c3000-brittle', 'g60']);
    expect(part.info).toBe(project.info);
  });
});

describe('the materials an existing beam names itself', () => {
  it('go with the member to the worker: B-204\'s CFRP, the overlay concrete and its bars\' steel', () => {
    const part = subproject(project, ['B-204']);
    expect(part.materials.map((m) => m.id).sort()).toEqual(['c3000-existing', 'c4000-kent-park', 'cfrp-sheet', 'g40', 'g60']);
  });

  it('make the member analysed again when one of them changes', () => {
    const next = setMaterialField(project, 'cfrp-sheet', ['tensileModulus'], 200_000);
    expect(sameInputs(memberInputs(project, 'B-204'), memberInputs(next, 'B-204'))).toBe(false);
    expect(sameInputs(memberInputs(project, 'B-201'), memberInputs(next, 'B-201'))).toBe(true);
  });
});
