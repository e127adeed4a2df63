/** Paths written for a sub-project are turned back into paths of the whole project. */
import { describe, expect, it } from 'vitest';
import { demoProject } from '../../../core/project/demo.ts';
import { subproject } from '../../../renderer/src/project/dependencies.ts';
import { indexMapOf, placeDiagnostic, remapPaths } from '../../../renderer/src/workers/paths.ts';

const whole = demoProject();
const part = subproject(whole, ['F-205']);
const map = indexMapOf(whole, part);

describe('remapPaths', () => {
  it('rewrites item indices of the sub-project to those of the whole project', () => {
    const memberIndex = whole.members.findIndex((m) => m.id === 'F-205');
    const sectionIndex = whole.sections.findIndex((s) => s.id === part.sections[1]!.id);
    expect(remapPaths('members[0] "F-205".span and sections[1] "x".bars[0]', map)).toBe(`members[${memberIndex}] "F-205".span and sections[${sectionIndex}] "x".bars[0]`);
  });

  it('leaves text without paths, and any text when there is no map', () => {
    expect(remapPaths('no paths here', map)).toBe('no paths here');
    expect(remapPaths('members[0].span', null)).toBe('members[0].span');
  });
});

describe('placeDiagnostic', () => {
  it('names the item by id and the field inside it', () => {
    const d = placeDiagnostic({ code: 'out-of-range', path: `sections[0] "${part.sections[0]!.name}".bars[2].depth`, severity: 'error', message: 'must be …' }, part, map);
    expect(d).toMatchObject({ list: 'sections', itemId: part.sections[0]!.id, field: 'bars[2].depth', severity: 'error' });
  });

  it('gives the item itself an empty field, and file-level problems to the project', () => {
    expect(placeDiagnostic({ code: 'inconsistent', path: 'members[0] "F-205"', severity: 'warning', message: 'w' }, part, map)).toMatchObject({ list: 'members', itemId: 'F-205', field: '' });
    expect(placeDiagnostic({ code: 'schema', path: 'info.date', severity: 'error', message: 'e' }, part, map)).toMatchObject({ list: 'project', itemId: '', field: 'info.date' });
  });
});
