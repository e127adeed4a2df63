import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { main } from '../../../app/cli/main.ts';
import { memoryIo, type MemoryIo } from './memory-io.ts';
import { demoProject, demoProjectSI } from '../../../core/project/demo.ts';
import { parseProject, serializeProject } from '../../../core/project/file.ts';
import type { Project } from '../../../core/project/types.ts';

/** Two demo members: B-204 fails a deflection check, C-101 passes everything. */
function twoMembers(): Project {
  const p = demoProject();
  return { ...p, members: p.members.filter((m) => m.id === 'B-204' || m.id === 'C-101') };
}

describe('hingeline help and usage', () => {
  it('prints help to stdout with exit code 0', async () => {
    const io = memoryIo();
    expect(await main(['--help'], io)).toBe(0);
    expect(io.out()).toMatch(/^hingeline — /);
    expect(io.err()).toBe('');
  });

  it('prints a usage error to stderr with exit code 2 and points to the command help', async () => {
    const io = memoryIo();
    expect(await main(['analyze', 'x.json', '--format', 'xml'], io)).toBe(2);
    expect(io.out()).toBe('');
    expect(io.err()).toBe('hingeline: --format must be table, json or csv, got "xml"\nRun "hingeline analyze --help" for usage.\n');
  });

  it('prints the version from package.json', async () => {
    const io = memoryIo();
    expect(await main(['--version'], io)).toBe(0);
    expect(io.out()).toMatch(/^hingeline \d+\.\d+\.\d+\n$/);
  });
});

describe('hingeline demo', () => {
  it('writes the US demo to stdout, a file that reads back without diagnostics but L-102\'s minimum-steel warning', async () => {
    const io = memoryIo();
    expect(await main(['demo'], io)).toBe(0);
    expect(io.out()).toBe(serializeProject(demoProject()));
    // L-102 is below the ACI 318-19 9.6.1.2 minimum on purpose (the demo's beam that fails as it cracks)
    expect(parseProject(io.out()).diagnostics.map((d) => [d.severity, d.path])).toEqual([['warning', 'members[7] "L-102".zones[0].sectionId']]);
  });

  it('writes the SI demo to a file, and refuses to overwrite it without --force', async () => {
    const io = memoryIo();
    expect(await main(['demo', '--si', '--out', 'si.hingeline'], io)).toBe(0);
    expect(parseProject(io.files.get('si.hingeline')!).project!.info.codeBasis).toBe('EN 1992-1-1');
    expect(await main(['demo', '--out', 'si.hingeline'], io)).toBe(2);
    expect(io.err()).toMatch(/si\.hingeline already exists; use --force/);
    expect(await main(['demo', '--out', 'si.hingeline', '--force'], io)).toBe(0);
    expect(parseProject(io.files.get('si.hingeline')!).project!.info.codeBasis).toBe('ACI 318-19');
  });

  it('says when the file cannot be written (exit 2)', async () => {
    const io = memoryIo();
    expect(await main(['demo', '--out', '/no-such-dir/d.hingeline'], io)).toBe(2);
    expect(io.err()).toBe('hingeline: cannot write /no-such-dir/d.hingeline: the folder /no-such-dir does not exist\n');
  });
});

describe('hingeline validate', () => {
  it('reports a valid file with exit 0 (a warning does not make it invalid)', async () => {
    const io = memoryIo({ 'p.hingeline': serializeProject(demoProjectSI()) });
    expect(await main(['validate', 'p.hingeline'], io)).toBe(0);
    expect(io.out()).toMatch(/^p\.hingeline: no problems \(\d+ members, \d+ sections, \d+ materials/);
    const us = memoryIo({ 'p.hingeline': serializeProject(demoProject()) });
    expect(await main(['validate', 'p.hingeline'], us)).toBe(0);
    expect(us.out()).toMatch(/warning: members\[7\] "L-102" zones\[0\]\.sectionId: section .*less than the minimum 2\.23 in²/);
    expect(us.out()).toMatch(/p\.hingeline: 1 warning \(10 members, 10 sections, 7 materials\)\n$/);
  });

  it('lists every problem with exit 1, values in the project’s display units', async () => {
    const p = JSON.parse(serializeProject(demoProject()));
    p.members[3].span = -609.6; // -2 ft
    p.members[5].zones[1].sectionId = 'R99';
    p.members[0].colour = 'blue';
    const io = memoryIo({ 'p.hingeline': JSON.stringify(p) });
    expect(await main(['validate', 'p.hingeline'], io)).toBe(1);
    const lines = io.out().trim().split('\n');
    expect(lines).toContain('warning: members[0] "B-201" colour: is not a field this version of Hingeline knows; it is kept as it is when the project is saved, but it has no effect');
    expect(lines).toContain('error: members[3] "R-305" span: must be greater than 0 ft and at most 196.9 ft, got -2 ft');
    expect(lines).toContain('error: members[5] "F-205" zones[1].sectionId: no section with id "R99" in the project');
    expect(lines[lines.length - 1]).toMatch(/^p\.hingeline: \d+ errors, 2 warnings \(10 members/);
  });

  it('writes JSON with every diagnostic when asked', async () => {
    const io = memoryIo({ 'p.json': '{"format": "hingeline-project", "version": 3}' });
    expect(await main(['validate', 'p.json', '--format', 'json'], io)).toBe(1);
    const doc = JSON.parse(io.out());
    expect(doc).toMatchObject({ file: 'p.json', valid: false });
    expect(doc.diagnostics.map((d: { path: string }) => d.path)).toEqual(['info', 'settings', 'materials', 'sections', 'members']);
  });

  it('says when the file cannot be read (exit 2)', async () => {
    const io = memoryIo();
    expect(await main(['validate', 'missing.hingeline'], io)).toBe(2);
    expect(io.err()).toBe('hingeline: cannot read missing.hingeline: no such file\n');
  });
});

describe('hingeline analyze', () => {
  it('prints the results table and exits 1 when a member has a failing check', async () => {
    const io = memoryIo({ 'p.hingeline': serializeProject(twoMembers()) });
    expect(await main(['analyze', 'p.hingeline', '--jobs', '1'], io)).toBe(1);
    expect(io.out()).toMatch(/^B-204 +simply supported +22\.0 .* check fails$/m);
    expect(io.out()).toMatch(/^C-101 +cantilever +12\.0 .* ok$/m);
    expect(io.out()).toMatch(/2 members: 1 ok, 1 with a failing check/);
    expect(io.err()).toBe('');
  });

  it('exits 0 when every analysed member is ok, and honours --member', async () => {
    const io = memoryIo({ 'p.hingeline': serializeProject(twoMembers()) });
    expect(await main(['analyze', 'p.hingeline', '--member', 'C-101', '--jobs', '1', '--format', 'json'], io)).toBe(0);
    const doc = JSON.parse(io.out());
    expect(doc.members.map((m: { id: string }) => m.id)).toEqual(['C-101']);
    expect(doc.members[0].span).toEqual({ value: 12, unit: 'ft' });
  });

  it('writes CSV with units in the header in the system asked for, and the caution on stderr', async () => {
    const io = memoryIo({ 'p.hingeline': serializeProject(twoMembers()) });
    await main(['analyze', 'p.hingeline', '--jobs', '1', '--format', 'csv', '--units', 'si'], io);
    const [header, first] = io.out().split('\r\n');
    expect(header).toMatch(/^member id,name,supports,span \[m\],status,My \[kN·m\]/);
    expect(first).toMatch(/^B-204,B-204,simply-supported,6\.7056,check-fails,/);
    expect(io.err()).toMatch(/^Caution: Results are for review/);
    expect(io.out().charCodeAt(0)).toBe('m'.charCodeAt(0));
  });

  it('starts the CSV with a UTF-8 byte-order mark with --bom, and is otherwise the same', async () => {
    const text = serializeProject(twoMembers());
    const plain = memoryIo({ 'p.hingeline': text });
    await main(['analyze', 'p.hingeline', '--jobs', '1', '--format', 'csv'], plain);
    const marked = memoryIo({ 'p.hingeline': text });
    await main(['analyze', 'p.hingeline', '--jobs', '1', '--format', 'csv', '--bom'], marked);
    expect(marked.out()).toBe(`\uFEFF${plain.out()}`);
    // As bytes: EF BB BF, then the header with "kip·ft" in UTF-8 (· is C2 B7).
    const bytes = Buffer.from(marked.out(), 'utf8');
    expect([...bytes.subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    expect(bytes.includes(Buffer.from([0x6b, 0x69, 0x70, 0xc2, 0xb7, 0x66, 0x74]))).toBe(true);
  });

  it('analyses on worker threads with --jobs 2 with the same results as in this thread', async () => {
    const text = serializeProject(twoMembers());
    const serial = memoryIo({ 'p.hingeline': text });
    const parallel = memoryIo({ 'p.hingeline': text });
    await main(['analyze', 'p.hingeline', '--jobs', '1', '--format', 'json'], serial);
    await main(['analyze', 'p.hingeline', '--jobs', '2', '--format', 'json'], parallel);
    expect(parallel.out()).toBe(serial.out());
  }, 240_000);

  it('shows a progress bar on stderr only when stderr is a terminal, and clears it', async () => {
    const text = serializeProject(twoMembers());
    const tty = memoryIo({ 'p.hingeline': text }, { tty: true });
    await main(['analyze', 'p.hingeline', '--jobs', '1'], tty);
    expect(tty.err()).toMatch(/\r\[█+░*\] +50% 1\/2 members {2}B-204/);
    expect(tty.err()).toMatch(/100% 2\/2 members {2}C-101/);
    expect(tty.err().endsWith('\r\u001b[K')).toBe(true);
    const piped = memoryIo({ 'p.hingeline': text });
    await main(['analyze', 'p.hingeline', '--jobs', '1'], piped);
    expect(piped.err()).toBe('');
  });

  it('names unknown member ids with a usage error (exit 2)', async () => {
    const io = memoryIo({ 'p.hingeline': serializeProject(twoMembers()) });
    expect(await main(['analyze', 'p.hingeline', '--member', 'Z-9'], io)).toBe(2);
    expect(io.err()).toBe('hingeline: no member with id "Z-9" in the project (members: B-204, C-101)\n');
  });

  it('analyses the other members when one member has an input error, and reports it', async () => {
    const p = JSON.parse(serializeProject(twoMembers()));
    p.members[0].span = 0;
    const io = memoryIo({ 'p.hingeline': JSON.stringify(p) });
    expect(await main(['analyze', 'p.hingeline', '--jobs', '1'], io)).toBe(1);
    expect(io.err()).toMatch(/^error: members\[0\] "B-204" span: must be greater than 0 ft/m);
    expect(io.out()).toMatch(/^B-204 .* input error$/m);
    expect(io.out()).toMatch(/^C-101 .* ok$/m);
  });

  it('refuses to analyse when a shared part of the project has errors (exit 1)', async () => {
    const p = JSON.parse(serializeProject(twoMembers()));
    p.materials[0].strength = 2;
    const io = memoryIo({ 'p.hingeline': JSON.stringify(p) });
    expect(await main(['analyze', 'p.hingeline', '--jobs', '1'], io)).toBe(1);
    expect(io.out()).toBe('');
    expect(io.err()).toMatch(/materials\[0\] "c3000-existing" strength: concrete compressive strength must be at least 1450 psi/);
    expect(io.err()).toMatch(/p\.hingeline cannot be analysed: 1 error to fix first/);
  });

  it('refuses a file that is not JSON, naming the line and column (exit 1)', async () => {
    const io = memoryIo({ 'p.hingeline': '{\n  "format": "hingeline-project",\n  "version": 2\n  "info": {}\n}' });
    expect(await main(['analyze', 'p.hingeline'], io)).toBe(1);
    expect(io.err()).toMatch(/^error: \(file\): is not valid JSON at line 4, column 3: expected ',' or '}', found '"'$/m);
  });
});

describe('hingeline report', () => {
  it('exits 3 with a clear message when the report builder is not installed', async () => {
    const io = memoryIo({ 'p.hingeline': serializeProject(twoMembers()) });
    const missing = pathToFileURL(join(tmpdir(), 'hingeline-no-such-report', 'write-report.ts'));
    expect(await main(['report', 'p.hingeline', '--out', 'r.pdf'], io, { reportModule: missing })).toBe(3);
    expect(io.err()).toMatch(/The PDF report is not available in this installation yet/);
  });

  it('hands the project, the results, the members, the absolute output path and the file text to the builder', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'hingeline-report-'));
    const module = join(dir, 'write-report.mjs');
    writeFileSync(module, `import { writeFileSync } from 'node:fs';
export async function writeReport(o) {
  writeFileSync(${JSON.stringify(join(dir, 'call.json'))}, JSON.stringify({ members: o.results.members.map((m) => m.memberId), memberIds: o.memberIds, outPath: o.outPath, source: o.sourceText.length, name: o.project.info.name }));
}\n`);
    const text = serializeProject(twoMembers());
    const io = memoryIo({ 'p.hingeline': text });
    expect(await main(['report', 'p.hingeline', '--out', 'r.pdf', '--member', 'C-101', '--jobs', '1'], io, { reportModule: pathToFileURL(module) })).toBe(0);
    const call = JSON.parse(readFileSync(join(dir, 'call.json'), 'utf8'));
    expect(call).toEqual({ members: ['C-101'], memberIds: ['C-101'], outPath: '/virtual/r.pdf', source: text.length, name: twoMembers().info.name });
    expect(io.err()).toBe('wrote r.pdf\n');
    rmSync(dir, { recursive: true, force: true });
  });
});

describe('hingeline report --out that cannot be written', () => {
  it('exits 2 at once, before analysing, for a missing folder or a folder at the path (docs/cli.md exit codes)', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'hingeline-report-'));
    const module = join(dir, 'write-report.mjs');
    writeFileSync(module, `export async function writeReport() { throw new Error('must not be called'); }\n`);
    for (const [out, reason] of [['/no-such-dir/r.pdf', 'the folder /no-such-dir does not exist'], ['a-folder', 'it is a folder']]) {
      const io = memoryIo({ 'p.hingeline': serializeProject(twoMembers()) }, { tty: true });
      expect(await main(['report', 'p.hingeline', '--out', out!, '--jobs', '1'], io, { reportModule: pathToFileURL(module) })).toBe(2);
      // Nothing was analysed: no progress bar was drawn.
      expect(io.err()).toBe(`hingeline: cannot write ${out}: ${reason}\n`);
    }
    rmSync(dir, { recursive: true, force: true });
  });

  it('exits 2 with the reason when the write fails after the analysis (the path changed meanwhile)', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'hingeline-report-'));
    const module = join(dir, 'write-report.mjs');
    writeFileSync(module, `export async function writeReport(o) { throw Object.assign(new Error(o.outPath + ' is a named pipe (FIFO), not a regular file; only regular files (or new paths) are written'), { code: 'ENOTREGULAR' }); }\n`);
    const io = memoryIo({ 'p.hingeline': serializeProject(twoMembers()) });
    expect(await main(['report', 'p.hingeline', '--out', 'r.pdf', '--member', 'C-101', '--jobs', '1'], io, { reportModule: pathToFileURL(module) })).toBe(2);
    expect(io.err()).toBe('hingeline: cannot write r.pdf: /virtual/r.pdf is a named pipe (FIFO), not a regular file; only regular files (or new paths) are written\n');
    rmSync(dir, { recursive: true, force: true });
  });
});

describe('internal errors', () => {
  it('exit 4 with one line and no stack trace, the stack only with HINGELINE_DEBUG', async () => {
    const failing = (env: Record<string, string>) => {
      const io = memoryIo({}, { env });
      return { ...io, stdout: () => { throw new Error('stdout closed\n    at somewhere'); } } as MemoryIo;
    };
    const quiet = failing({});
    expect(await main(['demo'], quiet)).toBe(4);
    expect(quiet.err()).toBe('hingeline: internal error (please report it with the file that caused it): stdout closed\n');
    const debug = failing({ HINGELINE_DEBUG: '1' });
    expect(await main(['demo'], debug)).toBe(4);
    expect(debug.err()).toMatch(/\n {4}at /);
  });
});
