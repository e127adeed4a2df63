import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { parseArguments } from '../../../app/cli/args.ts';
import type { CliIo } from '../../../app/cli/io.ts';
import { outputProblem } from '../../../app/cli/io.ts';
import { main } from '../../../app/cli/main.ts';
import { writeFileAtomic } from '../../../app/main/atomic-write.ts';
import { demoProjectSI } from '../../../core/project/demo.ts';
import { parseProject, serializeProject } from '../../../core/project/file.ts';
import type { Project } from '../../../core/project/types.ts';
import { memoryIo } from './memory-io.ts';

/** The SI demo's first two members and its sections: a small project to import into. */
function smallProject(): Project {
  const p = demoProjectSI();
  return { ...p, members: p.members.slice(0, 2), continuousMembers: [] };
}
const project = smallProject();
const sectionId = project.sections[0]!.id;
const existingId = project.members[0]!.id;
const projectText = serializeProject(project);

const GOOD = [
  'id,name,span [m],supports,section,dead [kN/m],live [kN/m]',
  `N-1,Grid 7 A–B,6.0,simple,${sectionId},4.5,7.5`,
  `N-2,Grid 7 B–C,5.5,propped,${sectionId},4.5,7.5`,
].join('\n');

const parsedProject = (text: string | undefined): Project => {
  const parsed = parseProject(text ?? '');
  expect(parsed.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
  return parsed.project!;
};

describe('hingeline import: arguments', () => {
  it('needs a CSV and one destination, and keeps --code and --units to --new', () => {
    expect(parseArguments(['import', 'p.hingeline', '--out', 'q.hingeline'])).toMatchObject({ ok: false, message: expect.stringMatching(/needs --members CSV/) });
    expect(parseArguments(['import', 'p.hingeline', '--members', 'b.csv'])).toMatchObject({ ok: false, message: expect.stringMatching(/--out NEW .* --in-place .* --dry-run .* --new/) });
    expect(parseArguments(['import', 'p.hingeline', '--members', 'b.csv', '--out', 'q', '--in-place'])).toMatchObject({ ok: false, message: '--out and --in-place cannot be combined: choose one' });
    expect(parseArguments(['import', 'p.hingeline', '--members', 'b.csv', '--in-place', '--code', 'en'])).toMatchObject({ ok: false, message: expect.stringMatching(/^--code goes with --new/) });
    expect(parseArguments(['import', 'p.hingeline', '--members', 'b.csv', '--new'])).toMatchObject({ ok: false, message: expect.stringMatching(/--new needs --code aci .* or --code en/) });
    expect(parseArguments(['import', 'p.hingeline', '--members', 'b.csv', '--new', '--code', 'en'])).toEqual({
      ok: true,
      command: { kind: 'import', file: 'p.hingeline', membersCsv: 'b.csv', target: { kind: 'new', code: 'EN 1992-1-1', units: 'si' }, keepGoodRows: false, force: false },
    });
  });

  it('has its own help, listed in the general help', async () => {
    const io = memoryIo();
    expect(await main(['import', '--help'], io)).toBe(0);
    expect(io.out()).toMatch(/^Usage: hingeline import FILE --members CSV/);
    expect(io.out()).toMatch(/--keep-good-rows/);
    const general = memoryIo();
    await main(['--help'], general);
    expect(general.out()).toMatch(/hingeline import FILE --members CSV/);
  });
});

describe('hingeline import: files in memory', () => {
  it('adds the members of a good file to a new file and lists each row; the project is untouched', async () => {
    const io = memoryIo({ 'p.hingeline': projectText, 'beams.csv': GOOD });
    expect(await main(['import', 'p.hingeline', '--members', 'beams.csv', '--out', 'q.hingeline'], io)).toBe(0);
    expect(io.files.get('p.hingeline')).toBe(projectText);
    const out = parsedProject(io.files.get('q.hingeline'));
    expect(out.members.map((m) => m.id)).toEqual([...project.members.map((m) => m.id), 'N-1', 'N-2']);
    // The existing members are kept exactly as they were.
    expect(out.members.slice(0, 2)).toEqual(project.members);
    const n1 = out.members[2]!;
    // 6.0 m = 6000 mm and 7.5 kN/m = 7.5 N/mm (SI definitions, BIPM SI Brochure 9th ed., prefixes k and m)
    expect(n1).toMatchObject({ name: 'Grid 7 A–B', supports: 'simply-supported', span: 6000, zones: [{ from: 0, to: 6000, sectionId }] });
    expect(n1.loads.map((l) => [l.loadCase, l.kind === 'uniform' ? l.magnitude : null])).toEqual([['dead', 4.5], ['live', 7.5]]);
    expect(io.out()).toMatch(/^ {2}row 2 {2}N-1 "Grid 7 A–B" {2}simply supported, span 6\.00 m, section /m);
    expect(io.out()).toMatch(/^ {2}row 3 {2}N-2 "Grid 7 B–C" {2}propped cantilever, span 5\.50 m/m);
    expect(io.out()).toMatch(/Wrote q\.hingeline: 2 members imported \(the project now has 4 members\)\./);
  });

  it('reads US customary units from the header', async () => {
    const us = ['id,span [ft],supports,section,live [kip/ft]', `U-1,20,fixed,${sectionId},1`].join('\r\n');
    const io = memoryIo({ 'p.hingeline': projectText, 'us.csv': us });
    expect(await main(['import', 'p.hingeline', '--members', 'us.csv', '--out', 'q.hingeline'], io)).toBe(0);
    const u1 = parsedProject(io.files.get('q.hingeline')).members[2]!;
    // NIST SP 811 (2008) Appendix B.8: 1 ft = 0.3048 m exactly, so 20 ft = 6096 mm
    expect(u1.span).toBeCloseTo(6096, 9);
    // NIST SP 811 (2008) Appendix B.8: 1 lbf = 4.448222 N, so 1 kip/ft = 4448.222 N / 304.8 mm = 14.5939 N/mm
    expect(u1.loads[0]!.kind === 'uniform' && u1.loads[0]!.magnitude).toBeCloseTo(14.5939, 3);
  });

  it('writes nothing for a file with errors, names row, column and range, and exits with 1', async () => {
    const bad = [
      'id,name,span [m],supports,section,live [kN/m]',
      `N-1,fine,6,simple,${sectionId},5`,
      `N-2,too long,75,simple,${sectionId},5`,
      `N-3,no section,6,simple,S-none,5`,
      `N-4,negative,6,simple,${sectionId},-2`,
    ].join('\n');
    const io = memoryIo({ 'p.hingeline': projectText, 'bad.csv': bad });
    expect(await main(['import', 'p.hingeline', '--members', 'bad.csv', '--in-place'], io)).toBe(1);
    expect(io.files.get('p.hingeline')).toBe(projectText);
    expect([...io.files.keys()].sort()).toEqual(['bad.csv', 'p.hingeline']);
    const out = io.out();
    expect(out).toContain('error: bad.csv row 3, column span: must be greater than 0 and at most 60.00 m, got 75 m');
    expect(out).toMatch(/error: bad\.csv row 4, column section: no section with id "S-none" in the project \(sections: /);
    expect(out).toContain('error: bad.csv row 5, column live: must be from 0 to 10000 kN/m (loads act downward), got -2 kN/m');
    expect(out).toMatch(/Nothing written: 3 errors; p\.hingeline is unchanged\. Fix the rows above and run again, or add --keep-good-rows to import the 1 member without errors and leave the rest out\./);
  });

  it('with --keep-good-rows imports the good rows, says so, and still exits with 1', async () => {
    const bad = ['id,span [m],supports,section', `N-1,6,simple,${sectionId}`, 'N-2,x,simple,S'].join('\n');
    const io = memoryIo({ 'p.hingeline': projectText, 'bad.csv': bad });
    expect(await main(['import', 'p.hingeline', '--members', 'bad.csv', '--out', 'q.hingeline', '--keep-good-rows'], io)).toBe(1);
    expect(parsedProject(io.files.get('q.hingeline')).members.map((m) => m.id)).toEqual([...project.members.map((m) => m.id), 'N-1']);
    expect(io.out()).toMatch(/Wrote q\.hingeline: 1 member imported .*The rows with errors were left out \(listed above\)\./);
  });

  it('refuses an id already in the project, naming both the row and the member; nothing is renamed', async () => {
    const clash = ['id,span [m],supports,section', `${existingId},6,simple,${sectionId}`, `N-9,6,simple,${sectionId}`].join('\n');
    const io = memoryIo({ 'p.hingeline': projectText, 'clash.csv': clash });
    expect(await main(['import', 'p.hingeline', '--members', 'clash.csv', '--out', 'q.hingeline'], io)).toBe(1);
    expect(io.files.has('q.hingeline')).toBe(false);
    expect(io.out()).toContain(`error: clash.csv row 2, column id: member id "${existingId}" is already used by members[0] "${project.members[0]!.name}" of the project; ids must be unique`);
    expect(io.out()).toMatch(new RegExp(`row 2 {2}${existingId} {2}left out: see the error below`));
  });

  it('refuses an id given in both files, naming both rows', async () => {
    const spans = ['member,span [m],section', `N-1,5,${sectionId}`, `N-1,5,${sectionId}`].join('\n');
    const io = memoryIo({ 'p.hingeline': projectText, 'beams.csv': GOOD, 'spans.csv': spans });
    expect(await main(['import', 'p.hingeline', '--members', 'beams.csv', '--spans', 'spans.csv', '--dry-run'], io)).toBe(1);
    expect(io.out()).toContain('error: spans.csv rows 2–3, column member: member id "N-1" is already used by beams.csv row 2; ids must be unique');
    expect(io.out()).toMatch(/Dry run, nothing written: 1 error, 1 warning; 2 members would be imported with --keep-good-rows\./);
  });

  it('imports continuous members from a span list', async () => {
    const spans = [
      'member,name,span [m],left support,right support,section,dead [kN/m],live [kN/m]',
      `CB-9,Grid 9,6.0,pinned,,${sectionId},4,6`,
      `CB-9,,7.0,,,${sectionId},4,6`,
      `CB-9,,6.0,,fixed,${sectionId},4,6`,
    ].join('\n');
    const io = memoryIo({ 'p.hingeline': projectText, 'spans.csv': spans });
    expect(await main(['import', 'p.hingeline', '--spans', 'spans.csv', '--out', 'q.hingeline'], io)).toBe(0);
    const out = parsedProject(io.files.get('q.hingeline'));
    expect(out.members).toEqual(project.members);
    expect(out.continuousMembers).toHaveLength(1);
    expect(out.continuousMembers![0]).toMatchObject({ id: 'CB-9', name: 'Grid 9', spans: [6000, 7000, 6000], supports: [{ kind: 'pinned' }, { kind: 'pinned' }, { kind: 'pinned' }, { kind: 'fixed' }] });
    expect(io.out()).toMatch(/rows 2–4 {2}CB-9 "Grid 9" {2}3 spans 6\.00 m \+ 7\.00 m \+ 6\.00 m, supports pinned–pinned–pinned–fixed/);
    expect(io.out()).toMatch(/1 continuous member imported \(the project now has 2 members, 1 continuous member\)/);
  });

  it('reads quoted commas, doubled quotes and CRLF line ends', async () => {
    // RFC 4180 section 2: rule 1, CRLF ends a record; rule 6, a field with a comma is enclosed in
    // double quotes; rule 7, a double quote inside a quoted field is written twice.
    const text = `id,name,span [m],supports,section,notes\r\nQ-1,"Grid 3, A–B",6,simple,${sectionId},"the ""as built"" sheet"\r\n`;
    const io = memoryIo({ 'p.hingeline': projectText, 'q.csv': text });
    expect(await main(['import', 'p.hingeline', '--members', 'q.csv', '--out', 'q.hingeline'], io)).toBe(0);
    expect(parsedProject(io.files.get('q.hingeline')).members[2]).toMatchObject({ id: 'Q-1', name: 'Grid 3, A–B', notes: 'the "as built" sheet' });
  });

  it('creates a new project with --new, and refuses to overwrite one', async () => {
    const io = memoryIo({ 'beams.csv': ['id,span [m],supports,section', 'N-1,6,simple,section-1'].join('\n') });
    expect(await main(['import', 'new.hingeline', '--new', '--code', 'aci', '--units', 'si', '--members', 'beams.csv'], io)).toBe(0);
    const created = parsedProject(io.files.get('new.hingeline'));
    expect(created.info).toMatchObject({ name: 'new', codeBasis: 'ACI 318-19', unitSystem: 'si' });
    expect(created.members.map((m) => m.id)).toEqual(['N-1']);
    const again = memoryIo({ 'new.hingeline': 'keep me', 'beams.csv': 'id,span [m],supports,section\nN-1,6,simple,section-1' });
    expect(await main(['import', 'new.hingeline', '--new', '--code', 'en', '--members', 'beams.csv'], again)).toBe(2);
    expect(again.files.get('new.hingeline')).toBe('keep me');
    expect(again.err()).toMatch(/new\.hingeline already exists; --new creates a project/);
  });

  it('exits with 2 for a CSV that cannot be read and with 1 for a project that is not one, writing nothing', async () => {
    const missing = memoryIo({ 'p.hingeline': projectText });
    expect(await main(['import', 'p.hingeline', '--members', 'nope.csv', '--in-place'], missing)).toBe(2);
    expect(missing.err()).toBe('hingeline: cannot read nope.csv: no such file\n');
    const broken = memoryIo({ 'p.hingeline': '{"format": "something else"', 'beams.csv': GOOD });
    expect(await main(['import', 'p.hingeline', '--members', 'beams.csv', '--in-place'], broken)).toBe(1);
    expect(broken.files.get('p.hingeline')).toBe('{"format": "something else"');
    expect(broken.err()).toMatch(/p\.hingeline cannot be read as a project \(see above\), so nothing was imported; the file is unchanged/);
  });

  it('reports a failed write with exit 2 and leaves the stored project as it was', async () => {
    const io = memoryIo({ 'p.hingeline': projectText, 'beams.csv': GOOD });
    const failing: CliIo = { ...io, writeText: async () => { throw Object.assign(new Error('ENOSPC'), { code: 'ENOSPC' }); } };
    expect(await main(['import', 'p.hingeline', '--members', 'beams.csv', '--in-place'], failing)).toBe(2);
    expect(io.err()).toBe('hingeline: cannot write p.hingeline: the disk is full\n');
    expect(io.files.get('p.hingeline')).toBe(projectText);
  });
});

describe('hingeline import --in-place on disk', () => {
  const dirs: string[] = [];
  afterEach(() => {
    for (const dir of dirs.splice(0)) rmSync(dir, { recursive: true, force: true });
  });

  /** A CliIo on the real file system (writes through app/main/atomic-write.ts), output collected. */
  function diskIo(dir: string, write: CliIo['writeText'] = async (path, text, options) => void (await writeFileAtomic(path, text, { keepBackup: options?.keepBackup === true }))) {
    const io = memoryIo();
    const disk: CliIo = {
      ...io,
      readText: (path) => readFile(resolve(dir, path), 'utf8'),
      writeText: (path, text, options) => write(resolve(dir, path), text, options),
      outputProblem: (path) => outputProblem(resolve(dir, path)),
      exists: (path) => readdirSync(dir).includes(path),
      resolvePath: (path) => resolve(dir, path),
    };
    return { io, disk };
  }

  function setUp(csv: string): string {
    const dir = mkdtempSync(join(tmpdir(), 'hingeline-import-'));
    dirs.push(dir);
    writeFileSync(join(dir, 'p.hingeline'), projectText);
    writeFileSync(join(dir, 'beams.csv'), csv);
    return dir;
  }

  it('replaces the file whole and keeps the previous version as .bak', async () => {
    const dir = setUp(GOOD);
    const { disk } = diskIo(dir);
    expect(await main(['import', 'p.hingeline', '--members', 'beams.csv', '--in-place'], disk)).toBe(0);
    expect(readFileSync(join(dir, 'p.hingeline.bak'), 'utf8')).toBe(projectText);
    expect(parsedProject(readFileSync(join(dir, 'p.hingeline'), 'utf8')).members.map((m) => m.id)).toEqual([...project.members.map((m) => m.id), 'N-1', 'N-2']);
    expect(readdirSync(dir).sort()).toEqual(['beams.csv', 'p.hingeline', 'p.hingeline.bak']);
  });

  it('leaves the file byte for byte as it was when the CSV has errors', async () => {
    const dir = setUp(['id,span [m],supports,section', `N-1,-6,simple,${sectionId}`].join('\n'));
    const before = statSync(join(dir, 'p.hingeline')).mtimeMs;
    const { disk } = diskIo(dir);
    expect(await main(['import', 'p.hingeline', '--members', 'beams.csv', '--in-place'], disk)).toBe(1);
    expect(readFileSync(join(dir, 'p.hingeline'), 'utf8')).toBe(projectText);
    expect(statSync(join(dir, 'p.hingeline')).mtimeMs).toBe(before);
    expect(readdirSync(dir).sort()).toEqual(['beams.csv', 'p.hingeline']);
  });

  it('leaves the old file whole when the write stops before the rename', async () => {
    const dir = setUp(GOOD);
    // The writer fails after the new text is written and synced to its temp file, before the rename.
    const { io, disk } = diskIo(dir, async (path, text) => {
      await writeFileAtomic(path, text, { keepBackup: true, onProgress: ({ stage }) => { if (stage === 'synced') throw Object.assign(new Error('EIO: stopped'), { code: 'EIO' }); } });
    });
    expect(await main(['import', 'p.hingeline', '--members', 'beams.csv', '--in-place'], disk)).toBe(2);
    expect(io.err()).toMatch(/^hingeline: cannot write p\.hingeline: /);
    expect(readFileSync(join(dir, 'p.hingeline'), 'utf8')).toBe(projectText);
  });
});

describe('the CSV templates and their documentation', () => {
  const root = resolve(import.meta.dirname, '../../..');

  it('docs/examples/members.csv and spans.csv import into a new project with no error and no warning', async () => {
    const io = memoryIo({
      'members.csv': readFileSync(join(root, 'docs/examples/members.csv'), 'utf8'),
      'spans.csv': readFileSync(join(root, 'docs/examples/spans.csv'), 'utf8'),
    });
    expect(await main(['import', 'site.hingeline', '--new', '--code', 'en', '--members', 'members.csv', '--spans', 'spans.csv'], io)).toBe(0);
    expect(io.out()).not.toMatch(/^(error|warning)/m);
    const created = parsedProject(io.files.get('site.hingeline'));
    expect(parseProject(io.files.get('site.hingeline')!).diagnostics).toEqual([]);
    expect(created.members.map((m) => m.id)).toEqual(['B-101', 'B-102', 'B-103', 'B-104', 'B-105']);
    expect(created.continuousMembers!.map((m) => [m.id, m.spans])).toEqual([['CB-1', [6000, 6000, 5000]]]);
    // The template shows RFC 4180 quoting (section 2, rules 6 and 7): a comma and a doubled quote in quoted fields.
    expect(created.members[0]!.name).toBe('Grid 1, A–B');
    expect(created.members[2]!.notes).toBe('edge beam; "as built" sheet 12');
  });

  it('docs/project-format.md lists every column the readers know, with the units of the dimensioned ones', async () => {
    const { MEMBER_CSV_COLUMNS } = await import('../../../core/project/csv.ts');
    const { SPAN_CSV_COLUMNS } = await import('../../../core/project/continuous-import.ts');
    const doc = readFileSync(join(root, 'docs/project-format.md'), 'utf8');
    const section = (title: string, next: string) => doc.slice(doc.indexOf(title), doc.indexOf(next, doc.indexOf(title) + title.length)).toLowerCase();
    const members = section('## CSV member lists', '### Continuous members from CSV');
    const spans = section('### Continuous members from CSV', '\n## ');
    for (const [text, columns] of [[members, MEMBER_CSV_COLUMNS], [spans, SPAN_CSV_COLUMNS]] as const) {
      for (const column of columns) {
        // The table row whose first cell names the column.
        const row = text.split('\n').find((line) => line.startsWith('|') && (line.split('|')[1] ?? '').includes(`\`${column.aliases[0]}\``)) ?? '';
        expect(row, `column ${column.aliases[0]}`).toMatch(/^\| `/);
        if (column.quantity === 'spanLength') expect(row).toMatch(/`mm`, `m`, `in` or `ft` \|[^|]*(greater than 0|0\.5 m to 20 m)/);
        if (column.quantity === 'lineLoad') expect(row).toMatch(/`kn\/m`.*\| 0 to 10 000 kn\/m/);
        if (column.quantity === 'flexuralRigidity') expect(row).toMatch(/`kn·m²`.*\| greater than 0/);
      }
    }
  });
});
