import { describe, expect, it } from 'vitest';
import { csvField, csvText, importMembersCsv, loadDeflectionCsv, momentCurvatureCsv, parseCsv, resultsSummaryCsv, spanDistributionCsv } from '../../../core/project/csv.ts';
import type { MomentCurvatureResult } from '../../../core/section/results.ts';
import type { MemberResult } from '../../../core/assessment/results.ts';
import { analyzeProject } from '../../../core/analysis.ts';
import { demoProject } from '../../../core/project/demo.ts';

const HEADER_US = 'id,name,span [ft],supports,section,dead [kip/ft],superimposed [kip/ft],live [kip/ft],notes';

describe('parseCsv (RFC 4180)', () => {
  it('reads quoted fields with commas, doubled quotes and line breaks, and CRLF line ends', () => {
    const { records, problems } = parseCsv('a,b,c\r\n"x, y","say ""hi""","two\nlines"\r\n\r\nlast,,\n');
    expect(problems).toEqual([]);
    expect(records).toEqual([
      { line: 1, fields: ['a', 'b', 'c'] },
      { line: 2, fields: ['x, y', 'say "hi"', 'two\nlines'] },
      { line: 5, fields: ['last', '', ''] },
    ]);
  });

  it('reports a quote that is never closed', () => {
    const { problems } = parseCsv('a,b\n"open,1\n');
    expect(problems[0]).toMatchObject({ code: 'parse', path: 'row 2' });
  });

  it('reads CRLF, LF and lone CR line ends alike and numbers the records by the line they start on', () => {
    const { records } = parseCsv('id,name\r1,"two\r\nlines"\n2,x\r\n');
    expect(records).toEqual([{ line: 1, fields: ['id', 'name'] }, { line: 2, fields: ['1', 'two\nlines'] }, { line: 4, fields: ['2', 'x'] }]);
  });

  it('reads back what it writes (quotes, commas, line breaks, edge spaces, empty fields)', () => {
    const rows = [['id', 'name, with comma', 'say "hi"'], ['B-1', 'two\nlines', ' lead'], ['', 'x', '']];
    expect(parseCsv(csvText(rows)).records.map((r) => r.fields)).toEqual(rows);
  });

  it('reads the last record without a final line end, and skips a byte-order mark', () => {
    expect(parseCsv('\uFEFFa,b\n1,2').records).toEqual([{ line: 1, fields: ['a', 'b'] }, { line: 2, fields: ['1', '2'] }]);
  });
});

describe('importMembersCsv', () => {
  it('reads members in US units and converts them exactly (1 ft = 304.8 mm; 1 kip/ft = 14.593 903 N/mm, NIST SP 811 B.8)', () => {
    const text = `${HEADER_US}\nB-1,Beam one,24,simply-supported,T24,,0.3,0.5,typical bay\nC-1,,12,cantilever,R22,0.1,0,0.25,\n`;
    const { members, diagnostics } = importMembersCsv(text, { sectionIds: new Set(['T24', 'R22']) });
    expect(diagnostics).toEqual([]);
    expect(members).toHaveLength(2);
    const [b, c] = members;
    expect(b!.span).toBeCloseTo(7315.2, 9);
    expect(b!.zones).toEqual([{ from: 0, to: b!.span, sectionId: 'T24' }]);
    expect(b!.loads.map((l) => [l.loadCase, l.magnitude])).toEqual([['superimposed', expect.closeTo(4.3781709, 6)], ['live', expect.closeTo(7.2969514, 6)]]);
    expect(b!.notes).toBe('typical bay');
    expect(c!.name).toBe('C-1'); // no name → the id
    expect(c!.supports).toBe('cantilever');
    expect(c!.loads.map((l) => l.loadCase)).toEqual(['dead', 'live']); // zero loads are left out
    expect(b!.service.limitCases).toEqual(['aci-floor-immediate', 'aci-insensitive-after-attachment']);
  });

  it('reads SI units, semicolons and decimal commas (as spreadsheets in many locales write them)', () => {
    const text = 'id;span [m];supports;section;live [kN/m]\nM-1;7,2;propped;T500;7,5\n';
    const { members, diagnostics } = importMembersCsv(text, { codeBasis: 'EN 1992-1-1' });
    expect(diagnostics).toEqual([]);
    expect(members[0]).toMatchObject({ id: 'M-1', span: 7200, supports: 'propped-cantilever', loads: [{ kind: 'uniform', loadCase: 'live', magnitude: 7.5 }] });
    expect(members[0]!.service.limitCases).toEqual(['en-appearance', 'en-after-construction']);
  });

  it('accepts lb/ft for line loads (1 lb/ft = 0.001 kip/ft)', () => {
    const { members } = importMembersCsv('id,span (ft),supports,section,live (plf)\nA,20,simple,S,500\n');
    expect(members[0]!.loads[0]!.magnitude).toBeCloseTo(7.2969514, 6);
  });

  it('reports row-level errors with the row (file line) and column, and keeps the good rows', () => {
    const text = [
      HEADER_US,
      'B-1,,24,simply-supported,T24,,0.3,0.5,',
      'B-2,,-2,simply-supported,T24,,0.3,0.5,',
      'B-3,,twenty,hinged,T99,,x,-1,',
      'B-1,,20,cantilever,T24,,,,',
      'B-5,,20,cantilever',
      ',,20,cantilever,T24,,,,',
      'B-7,,250,fixed,T24,,,,',
    ].join('\n');
    const { members, diagnostics } = importMembersCsv(text, { sectionIds: new Set(['T24']) });
    expect(members.map((m) => m.id)).toEqual(['B-1']);
    expect(diagnostics.map((d) => `${d.path}: ${d.code}`)).toEqual([
      'row 3, column span: must-be-positive',
      'row 4, column span: not-a-number',
      'row 4, column supports: unknown-option',
      'row 4, column section: unknown-reference',
      'row 4, column superimposed: not-a-number',
      'row 4, column live: out-of-range',
      'row 5, column id: duplicate-id',
      'row 6: schema',
      'row 7, column id: required',
      'row 8, column span: out-of-range',
    ]);
    // 60 m = 196.85 ft (NIST SP 811 Appendix B: 1 ft = 0.3048 m exactly): the range in the column's unit.
    expect(diagnostics[0]!.message).toBe('must be greater than 0 and at most 196.9 ft, got -2 ft');
    expect(diagnostics[1]!.message).toBe('must be a number in ft (greater than 0 and at most 196.9 ft), got "twenty"');
    expect(diagnostics[6]!.message).toBe('"B-1" is already used on row 2');
    expect(diagnostics[9]!.message).toBe('must be greater than 0 and at most 196.9 ft, got 250 ft');
  });

  it('requires the unit of every dimensioned column in the header', () => {
    const { members, diagnostics } = importMembersCsv('id,span,supports,section,live [kN/m]\nA,6,simple,S,5\n');
    expect(members).toEqual([]);
    expect(diagnostics).toEqual([expect.objectContaining({ code: 'required', path: 'row 1, column span' })]);
    expect(diagnostics[0]!.message).toMatch(/span \[ft\] or span \[m\]/);
  });

  it('refuses unknown units and reports missing required columns', () => {
    const { diagnostics } = importMembersCsv('id,span [furlong],live [kN/m]\nA,6,5\n');
    expect(diagnostics.map((d) => d.code)).toEqual(['unknown-option', 'required', 'required']);
  });

  it('warns about columns it does not read, and refuses a column given twice', () => {
    const r = importMembersCsv('id,span [m],supports,section,colour\nA,6,simple,S,red\n');
    expect(r.members).toHaveLength(1);
    expect(r.diagnostics).toEqual([expect.objectContaining({ code: 'unknown-field', severity: 'warning', path: 'row 1, column 5' })]);
    expect(importMembersCsv('id,span [m],span [ft],supports,section\n').diagnostics[0]!.code).toBe('duplicate-id');
  });

  it('says an empty file needs a header', () => {
    expect(importMembersCsv('').diagnostics[0]!.message).toMatch(/header row/);
  });

  it('refuses ids already used in the project', () => {
    const r = importMembersCsv('id,span [m],supports,section\nA,6,simple,S\n', { existingMemberIds: new Set(['A']) });
    expect(r.diagnostics[0]).toMatchObject({ code: 'duplicate-id', path: 'row 2, column id' });
  });
});

describe('csvField and csvText', () => {
  it('quotes fields with commas, quotes, line breaks or edge spaces', () => {
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "x"')).toBe('"say ""x"""');
    expect(csvField(' lead')).toBe('" lead"');
    expect(csvField('plain')).toBe('plain');
  });

  it('writes missing and non-finite numbers as empty fields, never NaN', () => {
    expect(csvField(null)).toBe('');
    expect(csvField(Number.NaN)).toBe('');
    expect(csvField(Number.POSITIVE_INFINITY)).toBe('');
    expect(csvField(1234.567891234)).toBe('1234.56789');
    expect(csvField(-0)).toBe('0');
  });

  it('defuses text that a spreadsheet would run as a formula (OWASP CSV injection)', () => {
    expect(csvField('=HYPERLINK("x")')).toBe(`"'=HYPERLINK(""x"")"`);
    expect(csvField('-B1')).toBe("'-B1");
  });

  it('ends rows with CRLF (RFC 4180)', () => {
    expect(csvText([['a', 1], ['b', null]])).toBe('a,1\r\nb,\r\n');
  });
});

const curve: MomentCurvatureResult = {
  direction: 'sagging',
  status: { kind: 'complete', ultimateCause: 'concrete-crushing', message: '' },
  concreteLimits: { codeCrushingStrain: 0.003, codeCrushingSource: 'ACI 318-19 22.2.2.1', ultimateStrain: null },
  points: [
    { curvature: 0, moment: 0, neutralAxisDepth: null, compressionFaceStrain: 0, tensionFaceStrain: 0, maxSteelTensileStrain: 0, referenceStrain: 0, residual: 0 },
    { curvature: 1 / 25.4e3, moment: 1.3558179483314004e6 * 100, neutralAxisDepth: 127, compressionFaceStrain: 0.001, tensionFaceStrain: -0.004, maxSteelTensileStrain: 0.0035, referenceStrain: 0, residual: 0 },
  ],
  keyPoints: {},
  curvatureDuctility: null,
  firstYieldCurvatureDuctility: null,
  warnings: [],
  solves: 2,
};

describe('curve export', () => {
  it('writes moment–curvature points with units in the header (US: 1/in, kip·ft, in)', () => {
    const text = momentCurvatureCsv(curve, 'us');
    const [header, first, second] = text.split('\r\n');
    expect(header).toBe('curvature [1/in],moment [kip·ft],neutral axis depth [in],compression face strain [-],tension face strain [-],largest steel tensile strain [-]');
    expect(first).toBe('0,0,,0,0,0');
    // 1/25 400 per mm = 0.001 per in; 1.355 818 × 10⁸ N·mm = 100 kip·ft; 127 mm = 5 in
    expect(second).toBe('0.001,100,5,0.001,-0.004,0.0035');
  });

  it('writes load–deflection points in SI (kN, mm)', () => {
    const text = loadDeflectionCsv([{ loadFactor: 1.5, totalLoad: 120000, deflection: 12.5, stage: 'integration' }], 'si');
    expect(text).toBe('load factor [-],total load [kN],deflection [mm],stage\r\n1.5,120,12.5,integration\r\n');
  });

  it('writes values along the span (m, kN·m, 1/m, mm)', () => {
    const text = spanDistributionCsv({ label: 'service', loadFactor: 1, x: [0, 3000], moment: [0, 2e8], curvature: [0, 2e-6], deflection: [0, 10], hingeZones: [] }, 'si');
    expect(text.split('\r\n').slice(0, 3)).toEqual(['x [m],moment [kN·m],curvature [1/m],deflection [mm]', '0,0,0,0', '3,200,0.002,10']);
  });
});

describe('results summary export', () => {
  it('writes one row per member with the units in the header and empty fields for missing values', () => {
    const result = {
      memberId: 'B-1', memberName: 'B-1', supports: 'simply-supported', span: 7315.2, status: 'input-error', governingMode: 'Not analysed: 1 input problem to fix first.',
      sections: [], loadDeflection: { pattern: '', controlPosition: 0, points: [], events: [], status: 'not analysed' },
      ductility: { firstYieldDeflection: null, yieldDeflection: null, ultimateDeflection: null, displacementDuctility: null, hinges: [], failureCause: '' },
      distributions: [], service: null, strength: null, brittle: [], ductilityUnavailable: null, warnings: [], errors: [{ path: 'members[0].span', message: 'bad' }],
    } as MemberResult;
    const [header, row] = resultsSummaryCsv([result], 'us').split('\r\n');
    expect(header).toBe('member id,name,supports,span [ft],status,My [kip·ft],Mu [kip·ft],φu/φy [-],μΔ [-],θp [rad],ultimate load factor [-],deflection [in],deflection limit [in],limit case,deflection utilisation [-],strength utilisation [-],warnings,governing mode,strength position [ft],strength sense,strength combination,ductility not available');
    expect(row).toBe('B-1,B-1,simply-supported,24,input-error,,,,,,,,,,,,0,Not analysed: 1 input problem to fix first.,,,,');
  });

  it('a brittle member: its status, the governing point of the strength check, and why μΔ and θp are empty', () => {
    const project = demoProject();
    const results = analyzeProject({ ...project, members: project.members.filter((m) => m.id === 'P-206') });
    const [header, row] = resultsSummaryCsv(results.members, 'us', project).split('\r\n');
    const cells = parseCsv(`${header}\n${row}`).records.map((r) => r.fields);
    const value = (column: string) => cells[1]![cells[0]!.indexOf(column)];
    expect(value('status')).toBe('brittle');
    expect(value('μΔ [-]')).toBe('');
    expect(value('θp [rad]')).toBe('');
    expect(value('strength sense')).toBe('sagging');
    expect(value('strength combination')).toBe('1.2D + 1.6L (ACI 318-19 Eq. (5.3.1b))');
    expect(Number(value('strength position [ft]'))).toBeGreaterThan(0);
    expect(value('ductility not available')).toMatch(/^not available: shear would be reached before the flexural mechanism/);
  });
});
