/**
 * Measurements of the web UI in Debian's Chromium, shared by `npm run bench` (test/bench/run.ts) and
 * the fuller `npx tsx test/bench/ui-speed.ts`: the app leaves performance marks (`hl:edit`,
 * `hl:analysis:sent`, `hl:analysis:sections`, `hl:chart:<kind>`, `hl:overview:painted`,
 * `hl:interactive`) and the figures are read inside the page, so browser-automation round trips are
 * not counted. Not a test: speed is never asserted.
 */
import type { Browser, Page } from 'playwright-core';

export const median = (values: readonly number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
};

/**
 * Types `value` into the field and resolves with ms until the named mark (after the edit) and the
 * frame after it. With `afterResults`, the mark must follow the arrival of the new section curves
 * (`hl:analysis:sections`): a redraw of the curves already on screen does not count.
 */
export async function editUntilMark(page: Page, selector: string, value: string, mark: string, afterResults = false): Promise<{ mark: number; frame: number; sent: number | null; sections: number | null; detail: number | null }> {
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
export async function clickUntilMark(page: Page, selector: string, mark: string): Promise<{ mark: number; frame: number }> {
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
export async function clickUntilFrame(page: Page, selector: string): Promise<number> {
  return page.evaluate(async (selector) => {
    const t0 = performance.now();
    document.querySelector<HTMLElement>(selector)!.click();
    await new Promise((resolve) => requestAnimationFrame(() => setTimeout(resolve, 0)));
    return performance.now() - t0;
  }, selector);
}

/** ms to load a tiny static file from the server into a fresh browser context: the UI rows' baseline. */
export async function emptyPageLoad(browser: Browser, url: string): Promise<number> {
  const empty = await browser.newContext();
  try {
    const page = await empty.newPage();
    await page.goto(`${url}favicon.svg`);
    return await page.evaluate(() => {
      const nav = performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming;
      return nav.loadEventEnd > 0 ? nav.loadEventEnd : performance.now();
    });
  } finally {
    await empty.close();
  }
}

/** A section height to type for edit `i`: never one typed before (24.05 in, 26.10 in, 24.15 in, …), so every edit is a new analysis. */
export const editedHeight = (i: number) => ((i % 2 === 0 ? 24 : 26) + 0.05 * (i + 1)).toFixed(2);

/**
 * Opens the demo in `page`, waits for every result, and shows member B-201's section inputs, whose
 * height field the edit rows type into (its moment–curvature chart on screen).
 */
export async function showDemoSection(page: Page): Promise<void> {
  await page.getByTestId('open-demo').click();
  await page.waitForFunction(() => document.querySelector('[data-testid=analysis-status]')?.textContent?.includes('All results current'), undefined, { timeout: 300_000 });
  await page.locator('[data-testid=member-list] [data-member="B-201"]').click();
  await page.getByTestId('chart-moment-curvature').waitFor();
  await page.getByTestId('inputs-tab-section').click();
  await page.getByTestId('shape-height').waitFor();
}
