import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { migrateProject, migrateV1ToV2 } from '../../../core/project/migrate.ts';
import { parseProject, serializeProject } from '../../../core/project/file.ts';

const v1Text = readFileSync(new URL('./fixtures/v1-project.json', import.meta.url), 'utf8');
const v1 = () => JSON.parse(v1Text) as Record<string, unknown>;

describe('migration of version-1 project files', () => {
  it('reads the version-1 fixture as a valid current (version-3) project, with a warning that it was migrated', () => {
    const { project, diagnostics } = parseProject(v1Text);
    expect(project).not.toBeNull();
    expect(diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    expect(diagnostics).toContainEqual(expect.objectContaining({ code: 'unsupported-version', path: 'version', severity: 'warning' }));
    expect(project!.version).toBe(3);
    expect(project!.members.map((m) => m.id)).toEqual(['DB-1', 'DB-2']);
  });

  it('moves project information to info, code to codeBasis and units to unitSystem, with an empty description', () => {
    const { project } = parseProject(v1Text);
    expect(project!.info).toEqual({
      name: 'Kestrel Lane garage — deck beams', number: 'HL-V1-007', description: '', engineer: 'R. T.', checker: 'M. K.',
      revision: 'B', date: '2025-11-20', codeBasis: 'ACI 318-19', unitSystem: 'us',
    });
  });

  it('converts spans and zone ends from metres to millimetres and point loads from kN to N (SI prefixes: 1 m = 1000 mm, 1 kN = 1000 N)', () => {
    const { project } = parseProject(v1Text);
    const [a, b] = project!.members;
    expect(a!.span).toBeCloseTo(7315.2, 9); // 24 ft = 7.3152 m exactly (NIST SP 811 B.8: 1 ft = 0.3048 m)
    expect(a!.zones).toEqual([{ from: 0, to: a!.span, sectionId: 'S1' }]);
    expect(b!.zones.map((z) => [z.from, z.to, z.sectionId])).toEqual([[0, expect.closeTo(1219.2, 9), 'S1-end'], [expect.closeTo(1219.2, 9), expect.closeTo(6096, 9), 'S1']]);
    const point = a!.loads.find((l) => l.kind === 'point');
    expect(point).toEqual({ kind: 'point', loadCase: 'dead', magnitude: expect.closeTo(13300, 9), position: expect.closeTo(2438.4, 9), label: 'sprinkler main hanger' });
  });

  it('turns the flat loads object into a list of uniform loads whose kN/m values carry over as N/mm (1 kN/m = 1 N/mm)', () => {
    const { project } = parseProject(v1Text);
    expect(project!.members[1]!.loads).toEqual([
      { kind: 'uniform', loadCase: 'dead', magnitude: 2 },
      { kind: 'uniform', loadCase: 'live', magnitude: 7.3 },
    ]);
    expect(project!.members[0]!.loads.filter((l) => l.kind === 'uniform').map((l) => [l.loadCase, l.magnitude])).toEqual([['superimposed', 4.4], ['live', 7.3]]);
  });

  it('renames support words, stirrups, mark, deflection and hinge settings, and fills bilinearMethod', () => {
    const { project } = parseProject(v1Text);
    const b = project!.members[1]!;
    expect(project!.members.map((m) => m.supports)).toEqual(['simply-supported', 'propped-cantilever']);
    expect(b.name).toBe('DB-2');
    expect(b.includeSelfWeight).toBe(false);
    expect(b.strengthFactors).toEqual({ dead: 1.2, superimposed: 1.2, live: 1.6 });
    expect(b.service).toEqual({ sustainedLiveFraction: 0.3, durationMonths: 12, limitCases: ['aci-sensitive-after-attachment', 'custom'], customLimitRatio: 600 });
    expect(b.capacity).toEqual({ pattern: 'live-only', hingeLengthMethod: 'user', userHingeLength: 300 });
    expect(b.notes).toBe('propped at the ramp');
    expect(project!.sections[0]!.hoops).toEqual({ steelId: 'g60', diameter: 9.525, spacing: 254, verticalLegs: 2, clearCover: 38.1, confineCore: false });
    expect(project!.sections[0]).not.toHaveProperty('stirrups');
    expect(project!.settings).toEqual({ bilinearMethod: 'priestley-2007', momentDropFraction: 0.8, stations: 200 });
  });

  it('keeps fields version 1 did not define either, and reports them as unknown', () => {
    const { project, diagnostics } = parseProject(v1Text);
    expect((project!.members[0] as unknown as Record<string, unknown>).inspectedBy).toBe('survey 2025-10');
    expect(diagnostics).toContainEqual(expect.objectContaining({ code: 'unknown-field', path: 'members[0] "DB-1".inspectedBy', severity: 'warning' }));
  });

  it('keeps unknown keys of the old loads object beside the loads instead of dropping them', () => {
    const data = v1();
    ((data.beams as Record<string, unknown>[])[1]!.loads as Record<string, unknown>).windKNm = 1.5;
    const migrated = migrateV1ToV2(data);
    const member = (migrated.members as Record<string, unknown>[])[1]!;
    expect(member.version1Loads).toEqual({ windKNm: 1.5 });
  });

  it('saves a migrated file as version 3, and that file reads back identically without the migration warning', () => {
    const first = parseProject(v1Text);
    const text = serializeProject(first.project!);
    expect(JSON.parse(text).version).toBe(3);
    const second = parseProject(text);
    expect(second.project).toEqual(first.project);
    expect(second.diagnostics.some((d) => d.code === 'unsupported-version')).toBe(false);
  });

  it('leaves wrong values for validation to report at their version-2 path', () => {
    const data = v1();
    (data.beams as Record<string, unknown>[])[0]!.spanM = 'seven';
    const { project, diagnostics } = parseProject(JSON.stringify(data));
    expect(project).toBeNull();
    expect(diagnostics).toContainEqual(expect.objectContaining({ code: 'not-a-number', path: 'members[0] "DB-1".span' }));
  });
});

describe('format and version checks', () => {
  it('refuses a file of another format', () => {
    const r = migrateProject({ format: 'something-else', version: 2 });
    expect(r.data).toBeNull();
    expect(r.diagnostics[0]).toMatchObject({ code: 'schema', path: 'format', severity: 'error' });
  });

  it('refuses a newer version and says a newer Hingeline is needed', () => {
    const r = migrateProject({ format: 'hingeline-project', version: 4 });
    expect(r.data).toBeNull();
    expect(r.diagnostics[0]).toMatchObject({ code: 'unsupported-version', severity: 'error' });
    expect(r.diagnostics[0]!.message).toMatch(/newer Hingeline/);
  });

  it.each([[0], [-1], [1.5], ['2'], [null], [undefined]])('refuses version %j', (version) => {
    const r = migrateProject({ format: 'hingeline-project', version });
    expect(r.data).toBeNull();
    expect(r.diagnostics[0]!.code).toBe('unsupported-version');
  });

  it.each([[null], [[]], ['text'], [42]])('refuses JSON that is not an object: %j', (raw) => {
    const r = migrateProject(raw);
    expect(r.data).toBeNull();
    expect(r.diagnostics[0]).toMatchObject({ code: 'schema', path: '(file)' });
  });

  it('passes a current file through unchanged and without diagnostics', () => {
    const data = { format: 'hingeline-project', version: 3, extra: 1 };
    const r = migrateProject(data);
    expect(r.data).toBe(data);
    expect(r.diagnostics).toEqual([]);
    expect(r.fromVersion).toBe(3);
  });

  it('brings a version-2 file to version 3 by its number alone, every other field as it was', () => {
    const data = { format: 'hingeline-project', version: 2, extra: 1, members: [{ id: 'B-1', span: 6000 }] };
    const r = migrateProject(data);
    expect(r.data).toEqual({ ...data, version: 3 });
    expect(r.fromVersion).toBe(2);
    expect(r.diagnostics).toContainEqual(expect.objectContaining({ code: 'unsupported-version', severity: 'warning' }));
  });
});
