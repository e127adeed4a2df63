/**
 * Charts drawn from their figure programs (core/report/figure-pdf.ts, pdfmake-figures.ts) print the
 * same as through pdfmake's SVG reader: the same pages and text, each chart a form drawn by
 * reference, identical charts written once.
 */
import { inflateSync } from 'node:zlib';
import { beforeAll, describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { buildReportDocument, reportCharts } from '../../../core/report/document.ts';
import { figureProgram } from '../../../core/report/figure-pdf.ts';
import { DEFAULT_STYLE, STYLES, pageGeometry } from '../../../core/report/layout.ts';
import type { DocumentDefinition } from '../../../core/report/types.ts';
import { nodeReportFontSet } from '../../../app/report/fonts.ts';
import { renderPdf } from '../../../app/report/pdf.ts';
import { renderChartSvg } from '../../../app/report/render-chart.ts';
import { renderReportImages } from '../../../app/report/write-report.ts';
import { loadDeflectionChart } from '../../../core/charts/load-deflection.ts';
import { demoProject, demoProjectSI } from '../../../core/project/demo.ts';
import { reportTestProject } from '../../core/report/fixtures.ts';
import { pdfText, words } from './pdf-text.ts';

const project = reportTestProject();
const results = analyzeProject(project);
const date = '2026-03-14T09:30:00Z';
const meta = { softwareVersion: '0.1.0-test', projectHash: 'x', generatedOn: date };

/** Form XObjects of a PDF with their decompressed content. */
function forms(pdf: Buffer): string[] {
  const text = pdf.toString('latin1');
  const out: string[] = [];
  for (const m of text.matchAll(/<<([^>]*\/Subtype \/Form[\s\S]*?)>>\s*stream\r?\n/g)) {
    const start = m.index + m[0].length;
    out.push(inflateSync(pdf.subarray(start, text.indexOf('endstream', start))).toString('latin1'));
  }
  return out;
}

let direct: Buffer;
let throughSvg: Buffer;
let charts: string[];

beforeAll(async () => {
  const images = await renderReportImages({ project, results }, { workers: 0 });
  const figures = reportCharts({ project, results });
  charts = Object.keys(figures).filter((id) => figures[id]!.kind === 'chart').map((id) => images[id]!);
  const build = (chartPrograms: boolean) => buildReportDocument({ project, results, images, meta, fonts: nodeReportFontSet(), chartPrograms });
  direct = await renderPdf(build(true), date);
  throughSvg = await renderPdf(build(false), date);
}, 240_000); // two whole reports on a shared, busy machine

describe('charts drawn from figure programs', () => {
  it('print the same pages and the same text as through the SVG reader', async () => {
    const [a, b] = [await pdfText(direct), await pdfText(throughSvg)];
    expect(a.pages.length).toBe(b.pages.length);
    // Word for word: where pdf.js breaks lines between two texts of a chart depends on whether the
    // text is placed by its own matrix or by the drawing's (poppler's pdftotext gives the same
    // lines both ways; checked on every page of the demo report).
    a.pages.forEach((page, i) => expect(words(page), `page ${i + 1}`).toBe(words(b.pages[i]!)));
    // Chart text is real text in the PDF, the rotated axis title included.
    expect(a.all).toContain('curvature integrated along the span');
    expect(a.all).toContain('Total load P (kN)');
  });

  it('draw each chart as one form with its paths and text, and no SVG group or mask', () => {
    const list = forms(direct);
    // One form per distinct chart.
    expect(list.length).toBe(new Set(charts).size);
    expect(list.length).toBeGreaterThan(5);
    for (const content of list) {
      expect(content).toMatch(/^[\d.e-]+ 0 0 -[\d.e-]+ 0 1 cm\n/);
      expect(content).toMatch(/ (S|B|f)\n/);
      expect(content).toMatch(/BT \/F\d+ [\d.]+ Tf [-\d. ]+ Tm \[<[0-9a-f]+>/);
    }
    // pdfmake's SVG reader writes a transparency group with a soft mask for clip paths and
    // opacity groups; the forms need neither.
    expect(direct.toString('latin1')).not.toMatch(/\/SMask|\/S \/Transparency/);
    expect(direct.length).toBeLessThan(throughSvg.length * 1.1);
  });

  it('read every chart of both demos (continuous members in one, an existing beam with strengthening schemes in the other), so that none falls back to the SVG reader', async () => {
    for (const demo of [demoProjectSI(), demoProject()]) {
      const demoResults = analyzeProject(demo);
      const figures = reportCharts({ project: demo, results: demoResults });
      const images = await renderReportImages({ project: demo, results: demoResults }, { workers: 0 });
      const chartIds = Object.keys(figures).filter((id) => figures[id]!.kind === 'chart');
      expect(chartIds.length).toBeGreaterThan(30);
      expect(chartIds.filter((id) => figureProgram(images[id]!) === null)).toEqual([]);
    }
  }, 240_000);

  it('write a chart that appears twice once, and draw it at both places', async () => {
    const svg = renderChartSvg(loadDeflectionChart(results.members[0]!, 'si'), 400, 200);
    const program = figureProgram(svg)!;
    const page = pageGeometry('SI');
    const definition: DocumentDefinition = {
      pageSize: page.pageSize, pageOrientation: 'portrait', pageMargins: page.margins,
      info: { title: 't', author: '', subject: '', keywords: '', creator: '', producer: '' },
      content: [{ image: 'a', width: 400, height: 200 }, { image: 'b', width: 200, height: 100 }],
      header: () => null, footer: () => null, styles: STYLES, defaultStyle: DEFAULT_STYLE,
      images: { a: program, b: program }, compress: true,
    };
    const pdf = await renderPdf(definition, date);
    expect(forms(pdf)).toHaveLength(1);
    const text = (await pdfText(pdf)).all;
    expect(text.match(/curvature integrated along the span/g)).toHaveLength(2);
  });
});
