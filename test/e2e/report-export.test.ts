/**
 * The PDF export of the app (issue 15 items 5 and 9, issue 16): a progress bar with Cancel, and the
 * same PDF as `hingeline report` for the same project — one chart path (core's recording canvas),
 * the same fonts, the same layout. Runs the web build in Debian's Chromium with the fake host.
 */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { inflateSync } from 'node:zlib';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { analyzeProject } from '../../core/analysis.ts';
import { demoProjectSI } from '../../core/project/demo.ts';
import { serializeProject } from '../../core/project/file.ts';
import { CAUTION_TEXT } from '../../core/report/layout.ts';
import { renderReportBuffer } from '../../app/report/write-report.ts';
import packageJson from '../../package.json' with { type: 'json' };
import { cautionOnlyPages, pdfText } from '../app/report/pdf-text.ts';
import { ARTIFACTS, openApp, snap, startE2e, type E2eContext } from './support/environment.ts';

let context: E2eContext;
let page: Page;
let problems: string[];

interface HostView {
  exports: { name: string; mime: string; byteLength: number }[];
}
const host = (p: Page) => p.evaluate(() => (window as unknown as { hingelineTestHost: HostView }).hingelineTestHost);

/** Path operators (move, line, curve, rectangle) and painting operators (stroke, fill) in the PDF's content streams. */
function drawingOperators(pdf: Buffer): Record<'m' | 'l' | 'c' | 're' | 'S' | 'f', number> {
  const counts = { m: 0, l: 0, c: 0, re: 0, S: 0, f: 0 };
  const text = pdf.toString('latin1');
  for (const stream of text.matchAll(/stream\r?\n/g)) {
    const start = stream.index + stream[0].length;
    // Page and form content only (the charts are forms): font files (/Length1) and other typed streams (/Subtype) are skipped.
    const dictionary = text.slice(text.lastIndexOf(' obj', stream.index), stream.index);
    if (/\/Length1|\/Subtype \/(?!Form)/.test(dictionary)) continue;
    let content: string;
    try {
      content = inflateSync(pdf.subarray(start, text.indexOf('endstream', start))).toString('latin1');
    } catch {
      continue; // not compressed: not page content (pdfmake compresses every page)
    }
    for (const op of Object.keys(counts) as (keyof typeof counts)[]) counts[op] += content.match(new RegExp(`(?<=\\s)${op}(?=\\s)`, 'g'))?.length ?? 0;
  }
  return counts;
}

beforeAll(async () => {
  context = await startE2e(inject('e2e'));
  ({ page, problems } = await openApp(context));
  await page.getByTestId('open-demo-si').click();
  await page.waitForFunction(() => document.querySelector('[data-testid=analysis-status]')?.textContent?.includes('All results current'), undefined, { timeout: 120_000 });
});

afterAll(async () => {
  await context?.close();
});

async function exportProjectPdf(p: Page): Promise<void> {
  await p.getByTestId('export').click();
  await p.getByTestId('export-project-pdf').click();
}

describe('PDF export in the app', () => {
  it('shows a progress bar and stops at once on Cancel, exporting nothing', async () => {
    await exportProjectPdf(page);
    const bar = page.getByTestId('report-progress-bar');
    await bar.waitFor({ state: 'visible', timeout: 60_000 });
    expect(await page.getByTestId('report-progress').textContent()).toContain('PDF report of the project');
    await snap(page, 'report-progress');
    await page.getByTestId('report-cancel').click();
    await page.getByTestId('report-progress').waitFor({ state: 'detached', timeout: 10_000 });
    expect((await host(page)).exports).toHaveLength(0);
    await expect.poll(() => page.locator('body').textContent()).toContain('The PDF report was cancelled.');
  });

  it('exports the same PDF as the command line for the same project: same pages, same text, same size', async () => {
    await exportProjectPdf(page);
    // The bar moves forward while the report is made.
    const values: number[] = [];
    while ((await host(page)).exports.length === 0) {
      const now = await page.getByTestId('report-progress-bar').getAttribute('aria-valuenow', { timeout: 1000 }).catch(() => null);
      if (now !== null) values.push(Number(now));
      await page.waitForTimeout(250);
    }
    expect(values.length).toBeGreaterThan(0);
    expect(values).toEqual([...values].sort((a, b) => a - b));
    const exported = (await host(page)).exports[0]!;
    expect(exported.mime).toBe('application/pdf');
    const app = Buffer.from(await page.evaluate(() => (window as unknown as { __hingelinePdf?: number[] }).__hingelinePdf ?? []));
    writeFileSync(join(ARTIFACTS, 'report-app-si.pdf'), app);

    // The command line's report of the same project, with the date the app printed on the cover.
    const a = await pdfText(app);
    const stamp = /Report generated (\d{4}-\d{2}-\d{2}) (\d{2}:\d{2}) UTC/.exec(a.pages[0]!);
    expect(stamp).not.toBeNull();
    const generatedOn = `${stamp![1]}T${stamp![2]}:00Z`;
    const project = demoProjectSI();
    const cli = await renderReportBuffer({ project, results: analyzeProject(project), sourceText: serializeProject(project), generatedOn, softwareVersion: packageJson.version, chartWorkers: 0 });
    writeFileSync(join(ARTIFACTS, 'report-cli-si.pdf'), cli);

    const c = await pdfText(cli);
    expect(a.pages.length).toBe(c.pages.length);
    a.pages.forEach((text, i) => expect(text, `page ${i + 1}`).toBe(c.pages[i]));
    // The demo report's layout (issue 15 item 12), checked here on the report rendered anyway: no
    // page holds only the caution box.
    expect(cautionOnlyPages(c, `${project.info.name} ${project.info.codeBasis} · SI units`, CAUTION_TEXT)).toEqual([]);
    // Same figures drawn the same way: the files differ at most by how each build of pdfmake writes them.
    // (3 %: the load–deflection figures hold about twice the points since the curves follow their
    // descending branch and the member is integrated at 120 or more stations; 2.5 % measured;
    // 3.5 %: with the continuous members' chapters and their figures, 3.05 % measured.)
    expect(Math.abs(app.length - cli.length) / cli.length).toBeLessThan(0.035);
    // Same drawings, segment for segment: the app's PDF once lost every chart's data lines (chart.js
    // stroked them as a browser Path2D the recording canvas could not read) while its text matched
    // and its size stayed within 3 %.
    // Counted per operator, within a few segments: the browser's JavaScript engine and Node's round
    // the last bits of some functions differently, and a curve sampled adaptively (the concrete
    // stress block of a section at its crushing strain) may then take a point or two elsewhere
    // (Chromium 156.0.8078.114 against Node 20: 6,724 against 6,726 line segments, one figure).
    const [appOps, cliOps] = [drawingOperators(app), drawingOperators(cli)];
    for (const op of Object.keys(cliOps) as (keyof typeof cliOps)[]) expect(Math.abs(appOps[op] - cliOps[op]), `${op}: app ${appOps[op]}, command line ${cliOps[op]}`).toBeLessThanOrEqual(Math.max(4, 0.002 * cliOps[op]));
    expect(app.toString('latin1').match(/\/Subtype \/Image/g)).toBeNull();
    expect(problems).toEqual([]);
  }, 600_000);
});
