/* eslint-disable @typescript-eslint/no-explicit-any -- the tests edit project JSON freely to build malformed files */
import { describe, expect, it } from 'vitest';
import { lineAndColumn, parseProject, serializeProject } from '../../../core/project/file.ts';
import { demoProject, demoProjectSI } from '../../../core/project/demo.ts';
import type { Project } from '../../../core/project/types.ts';
import { smallProject, member } from '../../fixtures/projects.ts';

const fixture = (): Project => smallProject('ACI 318-19', [member('B-1', 'simply-supported', 6000, 'r1'), member('B-2', 'cantilever', 2500, 't1')]);

describe('serializeProject', () => {
  it('writes 2-space JSON with a final newline (RFC 8259 text)', () => {
    const text = serializeProject(fixture());
    expect(text.endsWith('}\n')).toBe(true);
    expect(text.split('\n')[1]).toBe('  "format": "hingeline-project",');
    expect(() => JSON.parse(text)).not.toThrow();
  });

  it('orders keys the same way whatever order the object was built in', () => {
    const p = fixture();
    const shuffled = JSON.parse(JSON.stringify(p), function (this: unknown, _key, value: unknown) {
      if (value && typeof value === 'object' && !Array.isArray(value)) return Object.fromEntries(Object.entries(value).reverse());
      return value;
    }) as Project;
    expect(Object.keys(shuffled)[0]).toBe('settings');
    expect(serializeProject(shuffled)).toBe(serializeProject(p));
  });

  it('puts known fields in documented order and unknown ones after them, sorted', () => {
    const p = { ...fixture(), zeta: 1, alpha: { b: 2, a: 1 } } as unknown as Project;
    const keys = Object.keys(JSON.parse(serializeProject(p)));
    expect(keys).toEqual(['format', 'version', 'info', 'materials', 'sections', 'members', 'settings', 'alpha', 'zeta']);
    expect(serializeProject(p)).toContain('"alpha": {\n    "a": 1,\n    "b": 2\n  }');
  });

  it('leaves optional fields out rather than writing undefined', () => {
    const p = fixture();
    const text = serializeProject({ ...p, members: [{ ...p.members[0]!, notes: undefined }] } as unknown as Project);
    expect(text).not.toContain('"notes"');
  });
});

describe('load → save → load', () => {
  it.each([
    ['the US demo', demoProject],
    ['the SI demo', demoProjectSI],
    ['a small engine fixture', fixture],
  ])('gives identical data and identical text for %s', (_name, make) => {
    const text = serializeProject(make());
    const first = parseProject(text);
    expect(first.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    expect(first.project).toEqual(make());
    const again = serializeProject(first.project!);
    expect(again).toBe(text);
    expect(parseProject(again).project).toEqual(first.project);
  });

  it('keeps unknown fields at every level through the round trip, and warns about each', () => {
    const p = JSON.parse(serializeProject(fixture())) as Record<string, any>;
    p.futureTopLevel = { nested: [1, 2, { deep: true }] };
    p.info.projectManager = 'A. B.';
    p.materials[0].supplierGrade = 'C4';
    p.sections[0].shape.chamfer = 20;
    p.sections[0].bars[0].coating = 'epoxy';
    p.members[1].zones[0].comment = 'as built';
    p.members[1].loads[0].source = 'survey';
    p.members[1].service.vibration = { frequency: 8 };
    p.settings.solver = 'next';
    const text = JSON.stringify(p);
    const first = parseProject(text);
    expect(first.project).not.toBeNull();
    const unknown = first.diagnostics.filter((d) => d.code === 'unknown-field').map((d) => d.path);
    expect(unknown).toEqual(expect.arrayContaining([
      'futureTopLevel', 'info.projectManager', 'materials[0] "c30".supplierGrade', 'sections[0] "300 × 600".shape.chamfer',
      'sections[0] "300 × 600".bars[0].coating', 'members[1] "B-2".zones[0].comment', 'members[1] "B-2".loads[0].source',
      'members[1] "B-2".service.vibration', 'settings.solver',
    ]));
    expect(unknown).toHaveLength(9);
    expect(first.diagnostics.every((d) => d.severity === 'warning')).toBe(true);
    const saved = JSON.parse(serializeProject(first.project!)) as Record<string, any>;
    expect(saved.futureTopLevel).toEqual({ nested: [1, 2, { deep: true }] });
    expect(saved.members[1].service.vibration).toEqual({ frequency: 8 });
    expect(saved.sections[0].bars[0].coating).toBe('epoxy');
    expect(parseProject(serializeProject(first.project!)).project).toEqual(first.project);
  });
});

describe('parseProject on text that is not a project', () => {
  it('names the line and column of a JSON syntax error', () => {
    const { project, diagnostics } = parseProject('{\n  "format": "hingeline-project",\n  "version": 2,,\n}');
    expect(project).toBeNull();
    expect(diagnostics).toHaveLength(1);
    expect(diagnostics[0]).toMatchObject({ code: 'parse', path: '(file)', severity: 'error' });
    expect(diagnostics[0]!.message).toMatch(/line 3, column 16/);
  });

  it.each([[''], ['   \n'], ['\uFEFF']])('says an empty file is empty (%j)', (text) => {
    expect(parseProject(text).diagnostics[0]!.message).toBe('is empty');
  });

  it('accepts a UTF-8 byte-order mark before the JSON', () => {
    const { project } = parseProject(`\uFEFF${serializeProject(fixture())}`);
    expect(project).not.toBeNull();
  });

  it('refuses absurdly deep nesting without recursing through it', () => {
    const deep = `{"format":"hingeline-project","version":2,"x":${'['.repeat(5000)}${']'.repeat(5000)}}`;
    const { project, diagnostics } = parseProject(deep);
    expect(project).toBeNull();
    expect(diagnostics[0]!.message).toMatch(/more than 64 levels/);
  });

  it('reports every structural problem of a file at once', () => {
    const p = JSON.parse(serializeProject(fixture())) as Record<string, any>;
    p.info.codeBasis = 'BS 8110';
    p.members[0].span = '6000';
    p.members[1].supports = 'hinged';
    delete p.sections[1].concreteId;
    p.settings.stations = true;
    const { project, diagnostics } = parseProject(JSON.stringify(p));
    expect(project).toBeNull();
    expect(diagnostics.map((d) => [d.code, d.path])).toEqual([
      ['unknown-option', 'info.codeBasis'],
      ['not-a-number', 'settings.stations'],
      ['required', 'sections[1] "T 1200 × 600".concreteId'],
      ['not-a-number', 'members[0] "B-1".span'],
      ['unknown-option', 'members[1] "B-2".supports'],
    ]);
  });
});

describe('lineAndColumn', () => {
  it('counts lines and columns from 1', () => {
    expect(lineAndColumn('ab\ncd', 0)).toEqual({ line: 1, column: 1 });
    expect(lineAndColumn('ab\ncd', 4)).toEqual({ line: 2, column: 2 });
  });
});
