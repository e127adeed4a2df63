/**
 * Speed of the workspace in Debian's Chromium (a measurement script, not a test):
 *
 *   npx tsx test/bench/ui-speed.ts            (builds the web UI first when it is out of date)
 *
 * Measured inside the page with performance marks the app leaves (`hl:edit`, `hl:chart:<kind>`,
 * `hl:overview:painted`, `hl:interactive`), so browser-automation round trips are not counted:
 *  - cold start of the web build to interactive (fresh browser context, nothing cached);
 *  - edit-to-redrawn-chart for one member: a section dimension typed → re-analysis in the worker →
 *    moment–curvature chart redrawn (target: median at most 30 ms), and the live views that need no
 *    analysis (section drawing, material law). Every edit types a height not typed before, so no
 *    result of earlier inputs can stand in for a new analysis;
 *  - project overview render with 500 members (target: under 300 ms), and a re-sort.
 * Every figure is reported as a median with its ratio to a baseline measured in the same run (an
 * empty page loaded from the same server), so machines of different speed can be compared.
 */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { demoProject } from '../../core/project/demo.ts';
import { serializeProject } from '../../core/project/file.ts';
import type { Project } from '../../core/project/types.ts';
import { ARTIFACTS, openApp, startE2e } from '../e2e/support/environment.ts';
import { clickUntilFrame, clickUntilMark, editUntilMark, editedHeight, emptyPageLoad, median, showDemoSection } from './ui-measure.ts';

function bigProject(count: number): Project {
  const demo = demoProject();
  const members = Array.from({ length: count }, (_, i) => ({ ...demo.members[i % demo.members.length]!, id: `m${i + 1}`, name: `${demo.members[i % demo.members.length]!.name}-${String(Math.floor(i / demo.members.length) + 1).padStart(2, '0')}` }));
  return { ...demo, info: { ...demo.info, name: `${count} members (speed measurement)` }, members };
}

const context = await startE2e();
const rows: { what: string; median: number; runs: number; target?: number }[] = [];
const record = (what: string, values: number[], target?: number) => rows.push({ what, median: median(values), runs: values.length, ...(target !== undefined ? { target } : {}) });

try {
  // Baseline: an empty page (a tiny static file) from the same server, fresh context each time.
  const baseline: number[] = [];
  const cold: number[] = [];
  for (let i = 0; i < 7; i++) {
    baseline.push(await emptyPageLoad(context.browser, context.server.url));
    const fresh = await context.browser.newContext({ viewport: { width: 1440, height: 900 } });
    const appPage = await fresh.newPage();
    await appPage.addInitScript(() => { (window as unknown as { hingelineTestHost: unknown }).hingelineTestHost = {}; });
    await appPage.goto(context.server.url);
    await appPage.waitForSelector('[data-testid=open-demo]');
    cold.push(await appPage.evaluate(() => performance.getEntriesByName('hl:interactive')[0]!.startTime));
    await fresh.close();
  }
  record('baseline: empty page load', baseline);
  record('cold start of the web build to interactive', cold);

  // One member: edits that re-analyse, and live views that need no analysis.
  const { page } = await openApp(context);
  await showDemoSection(page);
  const edits: number[] = [];
  const framed: number[] = [];
  const sent: number[] = [];
  const roundTrip: number[] = [];
  const render: number[] = [];
  for (let i = 0; i < 21; i++) {
    const result = await editUntilMark(page, '[data-testid=shape-height]', editedHeight(i), 'hl:chart:moment-curvature', true);
    edits.push(result.mark);
    framed.push(result.frame);
    // The chart is drawn from the section curves sent ahead of the member result (or, were they
    // missing, from the member result).
    const arrived = result.sections ?? result.detail;
    if (result.sent !== null && arrived !== null) {
      sent.push(result.sent);
      roundTrip.push(arrived - result.sent);
      render.push(result.mark - arrived);
    }
    await page.waitForTimeout(150);
  }
  record('edit → moment–curvature redrawn (re-analysed in the worker)', edits, 30);
  record('edit → moment–curvature redrawn, on screen (next frame)', framed);
  record('  of which: edit → job sent (debounce)', sent);
  record('  of which: worker: section curves of B-201 and their reply', roundTrip);
  record('  of which: section curves → chart redrawn (Vue + chart.js)', render);
  const drawing: number[] = [];
  for (let i = 0; i < 21; i++) {
    drawing.push(await page.evaluate(async (value) => {
      const input = document.querySelector<HTMLInputElement>('[data-testid=shape-webWidth]')!;
      const t0 = performance.now();
      input.value = value;
      input.dispatchEvent(new Event('input', { bubbles: true }));
      await new Promise((resolve) => requestAnimationFrame(() => resolve(undefined)));
      return performance.now() - t0;
    }, i % 2 === 0 ? '13' : '12'));
    await page.waitForTimeout(120);
  }
  record('edit → section drawing redrawn (no analysis), next frame', drawing);
  await page.getByTestId('inputs-tab-materials').click();
  await page.getByTestId('concrete-strength').waitFor();
  const law: number[] = [];
  for (let i = 0; i < 21; i++) {
    law.push((await editUntilMark(page, '[data-testid=concrete-strength]', i % 2 === 0 ? '3500' : '3000', 'hl:chart:material-law')).mark);
    await page.waitForTimeout(120);
  }
  record('edit → stress–strain law redrawn (no analysis)', law);

  // The overview: 10 members (the demo), then 500.
  const overview10: number[] = [];
  for (let i = 0; i < 11; i++) {
    await page.getByTestId('nav-project').click();
    overview10.push((await clickUntilMark(page, '[data-testid=nav-overview]', 'hl:overview:painted')).mark);
  }
  record('overview render, 10 members', overview10);
  await page.close();

  const big = bigProject(500);
  const { page: bigPage } = await openApp(context, { openQueue: [{ name: 'speed-500.hingeline', path: '/fake/speed-500.hingeline', text: serializeProject(big) }] });
  await bigPage.getByTestId('open-project').click();
  await bigPage.getByTestId('overview').waitFor({ timeout: 60_000 });
  const analysedAt = Date.now();
  await bigPage.waitForFunction(() => !document.querySelector('[data-testid=batch-progress]'), undefined, { timeout: 600_000 });
  const analysisSeconds = (Date.now() - analysedAt) / 1000;
  const overview500: number[] = [];
  for (let i = 0; i < 11; i++) {
    await bigPage.getByTestId('nav-project').click();
    await bigPage.getByTestId('project-settings').waitFor();
    overview500.push((await clickUntilMark(bigPage, '[data-testid=nav-overview]', 'hl:overview:painted')).mark);
  }
  record('overview render, 500 members (all analysed)', overview500, 300);
  const sorting: number[] = [];
  for (let i = 0; i < 11; i++) sorting.push(await clickUntilFrame(bigPage, '[data-testid=sort-utilisation]'));
  record('overview re-sort, 500 members (click → painted)', sorting);
  const analysedRows = await bigPage.locator('[data-testid=overview-rows] [role=row]').count();

  const base = rows[0]!.median;
  const lines = [
    `Hingeline UI speed — Chromium ${context.browser.version()}, ${new Date().toISOString()}`,
    '',
    `${'measurement'.padEnd(64)} ${'median ms'.padStart(10)} ${'× baseline'.padStart(11)} ${'runs'.padStart(5)}  target`,
    ...rows.map((r) => `${r.what.padEnd(64)} ${r.median.toFixed(1).padStart(10)} ${(r.median / base).toFixed(2).padStart(11)} ${String(r.runs).padStart(5)}  ${r.target !== undefined ? `< ${r.target} ms ${r.median < r.target ? 'met' : 'MISSED'}` : ''}`),
    '',
    `whole-project analysis of 500 members in the worker: ${analysisSeconds.toFixed(1)} s; rows in the page at once: ${analysedRows} of 500`,
  ];
  const text = lines.join('\n');
  console.log(text);
  writeFileSync(join(ARTIFACTS, 'ui-speed.txt'), `${text}\n`);
} finally {
  await context.close();
}
