import { describe, expect, it } from 'vitest';
import { say } from '../../../core/units/phrase.ts';
import { analyzeProject } from '../../../core/analysis.ts';
import { buildReportDocument } from '../../../core/report/document.ts';
import { planReport, reportCharts } from '../../../core/report/figures.ts';
import { reportFormatter } from '../../../core/report/format.ts';
import { CAUTION_TEXT, FOOTER_CAUTION } from '../../../core/report/layout.ts';
import type { ReportInput } from '../../../core/report/types.ts';
import { reportTestProject } from './fixtures.ts';
import { nodes, texts } from './content.ts';

const project = reportTestProject();
const results = analyzeProject(project);
const meta = { softwareVersion: '9.8.7', projectHash: 'ab'.repeat(32), generatedOn: '2026-03-14T09:30:00Z' };

/** Every figure supplied: charts as a stand-in SVG (drawing them is the host's job), drawings as they are. */
function images(input: Pick<ReportInput, 'project' | 'results' | 'memberIds'>): Record<string, string> {
  return Object.fromEntries(Object.entries(reportCharts(input)).map(([id, f]) => [id, f.kind === 'svg' ? f.svg : `<svg xmlns="http://www.w3.org/2000/svg" width="${f.width}" height="${f.height}"><text x="2" y="10">${f.spec.title}</text></svg>`]));
}

const input: ReportInput = { project, results, images: images({ project, results }), meta };
const doc = buildReportDocument(input);
const all = texts(doc.content);
const joined = all.join('\n');

describe('report document', () => {
  it('puts project information, software version and the project-file hash on the cover', () => {
    for (const expected of ['Harbour shed annex', 'HS-204', 'R. Okafor', 'L. Brandt', 'ACI 318-19', 'SI (mm, m, kN, kN·m, MPa)', 'Hingeline 9.8.7', meta.projectHash, '2026-03-14 09:30 UTC', '4 of 4']) {
      expect(all.slice(0, 40)).toContain(expected);
    }
  });

  it('carries the caution on the cover, in the method, at the end of every member, and on every page', () => {
    expect(all.filter((t) => t === CAUTION_TEXT).length).toBe(1 + 1 + project.members.length);
    const footer = texts(doc.footer(3, 12)!);
    expect(footer).toContain(FOOTER_CAUTION);
    expect(footer).toContain('Page 3 of 12');
    expect(footer).toContain('Project HS-204 · revision B');
    expect(doc.header(1, 12)).toBeNull();
    expect(texts(doc.header(2, 12)!)).toContain('Harbour shed annex');
  });

  it('prints key results of each member as the results hold them, formatted in the project units', () => {
    const f = reportFormatter('si');
    for (const m of results.members.filter((r) => r.status !== 'input-error')) {
      expect(joined).toContain(say(m.governingMode, 'si'));
      expect(all).toContain(f.fixed(m.strength!.utilisation, 2));
      for (const c of m.service!.checks) {
        expect(all).toContain(f.deflection(c.byIntegration));
        expect(all).toContain(f.deflection(c.byCode));
      }
      expect(all).toContain(f.deflection(m.ductility.ultimateDeflection));
      for (const h of m.ductility.hinges) expect(joined).toContain(say(h.lengthFormula, 'si'));
    }
    const section = results.members[0]!.sections[0]!;
    expect(all).toContain(f.moment(section.sagging!.keyPoints.firstYield!.moment));
    expect(all).toContain(f.curvature(section.sagging!.keyPoints.ultimate!.curvature));
  });

  it('reports the shear check when the analysis made one, and says so in the limitations', () => {
    const f = reportFormatter('si');
    const checked = results.members.filter((m) => m.shear?.factored);
    expect(checked.length).toBeGreaterThan(0);
    for (const m of checked) {
      expect(all).toContain(f.fixed(m.shear!.factored!.utilisation, 2));
      expect(all).toContain(say(m.shear!.sentence, 'si'));
    }
    expect(joined).toContain('Flexure and shear only: torsion');
    expect(joined).not.toContain('Flexure only: shear');
  });

  it('reports the member with input errors with its errors instead of results', () => {
    const x = results.members.find((m) => m.memberId === 'X-1')!;
    expect(x.status).toBe('input-error');
    expect(all).toContain('INPUT ERROR');
    for (const e of x.errors) expect(joined).toContain(`${e.path}: ${say(e.message, 'si')}`);
  });

  it('lists every cited source once, numbered, with every marker pointing at an entry', () => {
    const start = all.lastIndexOf('References');
    const numbers = all.slice(start).filter((t) => /^\[\d+\]$/.test(t)).map((t) => Number(t.slice(1, -1)));
    expect(numbers).toEqual(numbers.map((_, i) => i + 1));
    const cited = new Set([...joined.matchAll(/\[(\d+(?:[–,] ?\d+)*)\]/g)].flatMap((m) => m[1]!.split(/, ?/).flatMap((part) => {
      const [a, b] = part.split('–').map(Number);
      return b === undefined ? [a!] : Array.from({ length: b - a! + 1 }, (_, k) => a! + k);
    })));
    for (const n of cited) expect(numbers).toContain(n);
    for (const source of ['Hognestad, E. (1951)', 'Mander, J. B., Priestley, M. J. N. & Park, R. (1988)', 'Park, R. & Paulay, T. (1975)', 'ACI Committee 318 (2019)', 'Bischoff, P. H. (2005)', 'Mattock, A. H. (1967)', 'Paulay, T. & Priestley, M. J. N. (1992)']) {
      expect(all.slice(start).some((t) => t.startsWith(source))).toBe(true);
    }
  });

  it('has one chapter per member and per section used, each with a page anchor', () => {
    const plan = planReport({ project, results });
    const ids = new Set(nodes(doc.content).map((n) => n.id).filter((id) => id !== undefined));
    for (const m of plan.members) expect(ids).toContain(m.anchor);
    for (const s of plan.sections) expect(ids).toContain(s.anchor);
    const references = nodes(doc.content).map((n) => n.pageReference).filter((r) => r !== undefined);
    for (const r of references) expect(ids).toContain(r);
    expect(plan.sections.map((s) => s.definition.id)).toEqual(['r1', 'r2']);
  });

  it('places every figure it was given, and a visible note for a missing one', () => {
    const used = nodes(doc.content).filter((n) => n.svg !== undefined || n.image !== undefined);
    const figures = reportCharts({ project, results });
    expect(new Set(used.map((n) => n.svg as string))).toEqual(new Set(Object.values(input.images)));
    // Without images, every chart placement becomes a note; section drawings are drawn by the builder itself.
    const chartImages = new Set(Object.entries(figures).filter(([, f]) => f.kind === 'chart').map(([id]) => input.images[id]));
    const chartPlacements = used.filter((n) => chartImages.has(n.svg as string)).length;
    const missing = buildReportDocument({ ...input, images: {} });
    const notes = texts(missing.content).filter((t) => t.startsWith('Figure "'));
    expect(chartPlacements).toBeGreaterThan(0);
    expect(notes).toHaveLength(chartPlacements);
    const png = 'data:image/png;base64,iVBORw0KGgo=';
    const id = Object.keys(figures).find((k) => figures[k]!.kind === 'chart')!;
    const withPng = buildReportDocument({ ...input, images: { ...input.images, [id]: png } });
    expect(withPng.images[id]).toBe(png);
    expect(nodes(withPng.content).some((n) => n.image === id)).toBe(true);
  });

  it('reports only the members asked for, and only the sections they use', () => {
    const one = buildReportDocument({ ...input, memberIds: ['C-1'] });
    const t = texts(one.content);
    expect(t).toContain('Member C-1');
    expect(t).not.toContain('Member B-1');
    expect(t).toContain('Section R2 300 × 550 support');
    expect(t).not.toContain('Section R1 300 × 550');
    expect(t).toContain('1 of 4');
  });

  it('is deterministic and free of NaN, Infinity and undefined text', () => {
    expect(JSON.stringify(buildReportDocument(input).content)).toBe(JSON.stringify(doc.content));
    expect(joined).not.toMatch(/\bNaN\b|Infinity|undefined|\[object Object\]/);
    expect(doc.info.creationDate).toBeUndefined();
    expect(doc.pageSize).toBe('A4');
    expect(buildReportDocument({ ...input, project: reportTestProject('EN 1992-1-1', 'us'), results: analyzeProject(reportTestProject('EN 1992-1-1', 'us')) }).pageSize).toBe('LETTER');
  });

  it('keeps tables whole row by row, with their header repeated on a new page', () => {
    const tables = nodes(doc.content).filter((n) => n.table !== undefined).map((n) => n.table as { dontBreakRows?: boolean; headerRows?: number; keepWithHeaderRows?: number; body: unknown[][] });
    expect(tables.length).toBeGreaterThan(20);
    for (const t of tables) expect(t.dontBreakRows ?? t.body.length === 1).toBe(true);
    const withHeader = tables.filter((t) => t.headerRows === 1);
    expect(withHeader.length).toBeGreaterThan(10);
    for (const t of withHeader) expect(t.keepWithHeaderRows).toBe(1);
  });
});
