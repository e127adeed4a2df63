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
import type { Page } from 'playwright-core';
import { demoProject } from '../../core/project/demo.ts';
import { serializeProject } from '../../core/project/file.ts';
import type { Project } from '../../core/project/types.ts';
import { ARTIFACTS, openApp, startE2e } from '../e2e/support/environment.ts';

const median = (values: readonly number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
};

/**
 * Types `value` into the field and resolves with ms until the named mark (after the edit) and the
 * frame after it. With `afterResults`, the mark must follow the arrival of the new section curves
 * (`hl:analysis:sections`): a redraw of the curves already on screen does not count.
 */
async function editUntilMark(page: Page, selector: string, value: string, mark: string, afterResults = false): Promise<{ mark: number; frame: number; sent: number | null; sections: number | null; detail: number | null }> {
  return page.evaluate(async ({ selector, value, mark, afterResults }) => {
    const input = document.querySelector<HTMLInputElement>(selector);
    if (!input) throw new Error(`no field ${selector}`);
    input.focus();
    const t0 = performance.now();
    const seen = new Promise<number>((resolve) => {
      let arrived = afterResults ? Infinity : t0;
      const observer = new PerformanceObserver((list) => {
        for (const entry of list.getEntries()) {
          if (entry.startTime <= t0) continue;
          if (entry.name === 'hl:analysis:sections') arrived = Math.min(arrived, entry.startTime);
          if (entry.name === mark && entry.startTime >= arrived) {
            observer.disconnect();
            resolve(entry.startTime);
          }
        }
      });
      observer.observe({ type: 'mark' });
    });
    input.value = value;
    input.dispatchEvent(new Event('input', { bubbles: true }));
    const at = await seen;
    await new Promise((resolve) => requestAnimationFrame(() => resolve(undefined)));
    // (No named helper functions inside page code: the script runner would wrap them in a helper the page lacks.)
    const sent = performance.getEntriesByName('hl:analysis:sent').find((e) => e.startTime > t0 && e.startTime <= at)?.startTime ?? null;
    const sections = performance.getEntriesByName('hl:analysis:sections').find((e) => e.startTime > t0 && e.startTime <= at)?.startTime ?? null;
    const detail = performance.getEntriesByName('hl:analysis:detail').find((e) => e.startTime > t0 && e.startTime <= at)?.startTime ?? null;
    return { mark: at - t0, frame: performance.now() - t0, sent: sent === null ? null : sent - t0, sections: sections === null ? null : sections - t0, detail: detail === null ? null : detail - t0 };
  }, { selector, value, mark, afterResults });
}

/** ms from a click on `selector` until `mark` and the frame after it. */
async function clickUntilMark(page: Page, selector: string, mark: string): Promise<{ mark: number; frame: number }> {
  return page.evaluate(async ({ selector, mark }) => {
    const t0 = performance.now();
    const seen = new Promise<number>((resolve) => {
      const observer = new PerformanceObserver((list) => {
        for (const entry of list.getEntries()) if (entry.name === mark && entry.startTime > t0) {
          observer.disconnect();
          resolve(entry.startTime);
        }
      });
      observer.observe({ type: 'mark' });
    });
    document.querySelector<HTMLElement>(selector)!.click();
    const at = await seen;
    return { mark: at - t0, frame: performance.now() - t0 };
  }, { selector, mark });
}

/** ms from a click until the next animation frame (DOM updated and painted). */
async function clickUntilFrame(page: Page, selector: string): Promise<number> {
  return page.evaluate(async (selector) => {
    const t0 = performance.now();
    document.querySelector<HTMLElement>(selector)!.click();
    await new Promise((resolve) => requestAnimationFrame(() => setTimeout(resolve, 0)));
    return performance.now() - t0;
  }, selector);
}

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
    const empty = await context.browser.newContext();
    const page = await empty.newPage();
    await page.goto(`${context.server.url}favicon.svg`);
    baseline.push(await page.evaluate(() => {
      const nav = performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming;
      return nav.loadEventEnd > 0 ? nav.loadEventEnd : performance.now();
    }));
    await empty.close();
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
  await page.getByTestId('open-demo').click();
  await page.waitForFunction(() => document.querySelector('[data-testid=analysis-status]')?.textContent?.includes('All results current'), undefined, { timeout: 60_000 });
  await page.locator('[data-testid=member-list] [data-member="B-201"]').click();
  await page.getByTestId('chart-moment-curvature').waitFor();
  await page.getByTestId('inputs-tab-section').click();
  await page.getByTestId('shape-height').waitFor();
  const edits: number[] = [];
  const framed: number[] = [];
  const sent: number[] = [];
  const roundTrip: number[] = [];
  const render: number[] = [];
  for (let i = 0; i < 21; i++) {
    // A new height each time (24.05 in, 26.10 in, 24.15 in, …): every edit is a new analysis.
    const height = ((i % 2 === 0 ? 24 : 26) + 0.05 * (i + 1)).toFixed(2);
    const result = await editUntilMark(page, '[data-testid=shape-height]', height, 'hl:chart:moment-curvature', true);
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
