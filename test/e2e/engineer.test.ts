/**
 * The workspace as an engineer meets it, in Debian's Chromium against the built web UI, at
 * 1440 × 900 and 1280 × 720: the frame never scrolls away, nothing is cut off, Ctrl+Z in a field
 * is the app's undo, bar sizes as drawings write them, the both-direction moment–curvature chart,
 * a new beam with its own section, and a failing member made to pass by deepening its section.
 * Screenshots go to test-artifacts/e2e/.
 */
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openApp, snap, startE2e, type E2eContext } from './support/environment.ts';

let context: E2eContext;

beforeAll(async () => {
  context = await startE2e(inject('e2e'));
});

afterAll(async () => {
  await context?.close();
});

async function demo(viewport: { width: number; height: number }): Promise<{ page: Page; problems: string[] }> {
  const opened = await openApp(context, {}, viewport);
  await opened.page.getByTestId('open-demo').click();
  await waitForCurrentResults(opened.page);
  return opened;
}

async function waitForCurrentResults(p: Page): Promise<void> {
  await p.waitForFunction(() => document.querySelector('[data-testid=analysis-status]')?.textContent?.includes('All results current'), undefined, { timeout: 90_000 });
}

/** The document never scrolls: the top bar stays at the top and nothing lies below the window. */
async function frameHolds(p: Page): Promise<void> {
  const frame = await p.evaluate(() => ({
    scrollTop: document.scrollingElement!.scrollTop,
    scrollHeight: document.scrollingElement!.scrollHeight,
    scrollWidth: document.scrollingElement!.scrollWidth,
    innerHeight: window.innerHeight,
    innerWidth: window.innerWidth,
    topBar: document.querySelector('.topbar')!.getBoundingClientRect().top,
    statusBar: document.querySelector('.statusbar')!.getBoundingClientRect().bottom,
  }));
  expect(frame.scrollTop).toBe(0);
  expect(frame.scrollHeight).toBeLessThanOrEqual(frame.innerHeight);
  expect(frame.scrollWidth).toBeLessThanOrEqual(frame.innerWidth);
  expect(frame.topBar).toBe(0);
  expect(frame.statusBar).toBeLessThanOrEqual(frame.innerHeight);
}

/** Elements matching `selector` whose content is wider than their box (text cut off). */
async function overflowing(p: Page, selector: string): Promise<string[]> {
  return p.evaluate((sel) => [...document.querySelectorAll<HTMLElement>(sel)]
    .filter((e) => e.offsetParent !== null && e.scrollWidth > e.clientWidth + 1)
    .map((e) => `${e.className || e.tagName}: ${e.textContent?.trim().slice(0, 40)} (${e.scrollWidth} > ${e.clientWidth})`), selector);
}

for (const viewport of [{ width: 1440, height: 900 }, { width: 1280, height: 720 }]) {
  describe(`the workspace at ${viewport.width} × ${viewport.height}`, () => {
    let page: Page;
    let problems: string[];

    beforeAll(async () => {
      ({ page, problems } = await demo(viewport));
    });
    afterAll(async () => {
      await page?.close();
    });

    it('shows every member’s status in the overview, in view', async () => {
      const badges = page.locator('[data-testid=overview-rows] [role=row] .badge');
      await expect.poll(() => badges.count()).toBe(10);
      const right = await badges.evaluateAll((all) => Math.max(...all.map((b) => b.getBoundingClientRect().right)));
      expect(right).toBeLessThanOrEqual(viewport.width);
      // The utilisation ratio is never the part that gives way.
      expect(await overflowing(page, '[data-testid=overview-rows] .c-utilisation .u')).toEqual([]);
      // Nor is the deflection against its limit ("0.0742 / 0.450 in" was cut to "0.450…").
      expect(await overflowing(page, '[data-testid=overview-rows] .c-utilisation .defl')).toEqual([]);
      await frameHolds(page);
      await snap(page, `engineer-${viewport.width}-overview`);
    });

    it('keeps the frame in place while the section editor is worked through with the keyboard', async () => {
      await page.locator('[data-testid=member-list] [data-member="B-201"]').click();
      await page.getByTestId('inputs-tab-section').click();
      await page.getByTestId('bar-depth-0').focus();
      for (let i = 0; i < 25; i++) await page.keyboard.press('Tab');
      await frameHolds(page);
      await page.getByTestId('hoops-toggle').focus();
      await frameHolds(page);
      await snap(page, `engineer-${viewport.width}-section-editor`);
    });

    it('fits the result tabs and the input tables in their panels', async () => {
      const tabs = page.locator('[role=tablist][aria-label=Results]');
      const widths = await tabs.evaluate((e) => ({ scroll: e.scrollWidth, client: e.clientWidth }));
      expect(widths.scroll).toBeLessThanOrEqual(widths.client);
      expect(await overflowing(page, '[data-testid=section-editor] .bar-layer, [data-testid=section-editor] .field')).toEqual([]);
      for (const tab of ['service', 'ductility', 'load-deflection', 'span']) {
        await page.getByTestId(`results-tab-${tab}`).click();
        await page.waitForTimeout(200);
        const panel = await page.locator('#results-panel').evaluate((e) => ({ scroll: e.scrollWidth, client: e.clientWidth }));
        expect(panel.scroll, tab).toBeLessThanOrEqual(panel.client);
      }
      await page.getByTestId('results-tab-service').click();
      await snap(page, `engineer-${viewport.width}-service`);
      await page.getByTestId('results-tab-moment-curvature').click();
    });

    it('raised no page or console errors', () => {
      expect(problems).toEqual([]);
    });
  });
}

describe('an engineer at work (1440 × 900)', () => {
  let page: Page;
  let problems: string[];

  beforeAll(async () => {
    ({ page, problems } = await demo({ width: 1440, height: 900 }));
    await page.locator('[data-testid=member-list] [data-member="B-201"]').click();
    await page.getByTestId('chart-moment-curvature').waitFor();
  });
  afterAll(async () => {
    await page?.close();
  });

  it('lists key-point curvatures with one factor in the heading, never long decimals', async () => {
    const table = page.getByTestId('key-points');
    await expect.poll(() => table.locator('thead th').allTextContents()).toContain('Curvature φ (×10⁻⁶ 1/in)');
    const cracking = table.locator('tbody tr', { hasText: 'cracking' }).first();
    // B-201 cracks at the direct cracking stress 0.33√f′c of its tension-stiffening law: φ = 4.54 × 10⁻⁶ 1/in
    expect((await cracking.locator('td').nth(1).textContent())?.trim()).toBe('4.54');
    expect(await table.textContent()).not.toMatch(/0\.0000/);
  });

  it('draws both bending directions side by side, each readable, with one curvature factor', async () => {
    await page.getByTestId('direction-both').click();
    const chart = page.getByTestId('chart-moment-curvature').locator('canvas');
    await expect.poll(() => chart.getAttribute('aria-label')).toContain('Curvature φ, hogging (×10⁻³ 1/in)');
    expect(await chart.getAttribute('aria-label')).toContain('Curvature φ, sagging (×10⁻³ 1/in)');
    await page.waitForTimeout(300);
    await page.getByTestId('chart-moment-curvature').screenshot({ path: `${process.cwd()}/test-artifacts/e2e/engineer-mc-both.png` });
    await page.getByTestId('direction-hogging').click();
    // The hogging curve alone keeps the section's factor (×10⁻³, not ×10⁻⁶).
    await expect.poll(() => chart.getAttribute('aria-label')).toContain('Curvature φ (×10⁻³ 1/in)');
    await page.getByTestId('direction-sagging').click();
  });

  it('names a point picked on the curve with its real curvature (the axis factor kept)', async () => {
    const canvas = page.getByTestId('chart-moment-curvature').locator('canvas');
    await page.waitForTimeout(300);
    // Find the computed curve (series colour #2364aa) in a column from 40 % of the plot's width on
    // (a key-point label may hide it in one column), and click it.
    const hit = await canvas.evaluate((element: HTMLCanvasElement) => {
      const ctx = element.getContext('2d')!;
      const ratio = element.width / element.clientWidth;
      for (const fraction of [0.4, 0.45, 0.5, 0.55, 0.6]) {
        const x = Math.round(element.width * fraction);
        const column = ctx.getImageData(x, 0, 1, element.height).data;
        for (let y = 0; y < element.height; y++) {
          const [r, g, b] = [column[4 * y]!, column[4 * y + 1]!, column[4 * y + 2]!];
          if (Math.abs(r - 0x23) < 30 && Math.abs(g - 0x64) < 30 && Math.abs(b - 0xaa) < 30) return { x: x / ratio, y: y / ratio };
        }
      }
      return null;
    });
    expect(hit).not.toBeNull();
    await canvas.click({ position: hit! });
    await page.getByTestId('section-profile').waitFor();
    // 1/in with the power-of-ten factor of the axis put back: "φ = 1.1×10⁻³ 1/in" or "φ = 908×10⁻⁶ 1/in"
    // (the factor follows the curve's extent), never "φ = 1.1 1/in".
    await expect.poll(() => page.locator('[data-testid=section-profile] h3').textContent()).toMatch(/sagging, φ = \d+(\.\d+)?×10⁻[³⁶] 1\/in/);
    await expect.poll(() => page.getByTestId('chart-strain-profile').textContent()).toMatch(/φ = \d+(\.\d+)?×10⁻[³⁶] 1\/in/);
    await page.getByTestId('section-profile').getByRole('button', { name: 'Close' }).click();
  });

  it('takes Ctrl+Z in a field for the app’s undo: the value and its text come back, no other field changes', async () => {
    await page.getByTestId('inputs-tab-section').click();
    const height = page.getByTestId('shape-height');
    const web = page.getByTestId('shape-webWidth');
    await height.click();
    await height.fill('30');
    await expect.poll(() => page.getByTestId('section-drawing').locator('svg').getAttribute('aria-label')).toContain('30.0 in');
    await page.keyboard.press('Control+z');
    await expect.poll(() => height.inputValue()).toBe('24');
    await expect.poll(() => page.getByTestId('section-drawing').locator('svg').getAttribute('aria-label')).toContain('24.0 in');
    expect(await web.inputValue()).toBe('12');
    // Text that is not a number yet goes first; the stored value is untouched.
    await height.fill('2x');
    await page.keyboard.press('Control+z');
    await expect.poll(() => height.inputValue()).toBe('24');
    expect(await height.getAttribute('aria-invalid')).toBe('false');
    // Redo brings the edit back into the focused field.
    await page.keyboard.press('Control+y');
    await expect.poll(() => height.inputValue()).toBe('30');
    await page.keyboard.press('Control+z');
    await expect.poll(() => height.inputValue()).toBe('24');
    // The same after a unit switch (where the browser's own undo replayed old text into the field).
    await page.getByTestId('units-si').click();
    await expect.poll(() => height.inputValue()).toBe('609.6');
    await height.click();
    await height.fill('700');
    await page.keyboard.press('Control+z');
    await expect.poll(() => height.inputValue()).toBe('609.6');
    await page.keyboard.press('Control+z');
    await expect.poll(() => height.inputValue()).toBe('24');
    expect(await web.inputValue()).toBe('12');
    expect(await page.getByTestId('dirty-flag').count()).toBe(0);
  });

  it('reads bar sizes as drawings write them and shows them so', async () => {
    const size = page.getByTestId('bar-size-0');
    expect(await size.inputValue()).toBe('#8');
    await size.fill('4 #9');
    await page.getByTestId('bar-depth-0').click();
    await expect.poll(() => page.getByTestId('bar-count-0').inputValue()).toBe('4');
    expect(await size.inputValue()).toBe('#9');
    // The drawing labels the layer as drawings do.
    await expect.poll(() => page.getByTestId('section-drawing').textContent()).toContain('4 #9 at 21.5 in');
    await size.fill('#12');
    await expect.poll(() => size.getAttribute('aria-invalid')).toBe('true');
    expect(await page.getByTestId('bar-layer-0').textContent()).toContain('#12 is not an ASTM A615 bar size');
    await page.keyboard.press('Escape');
    await page.keyboard.press('Control+z');
    await expect.poll(() => size.inputValue()).toBe('#8');
    expect(await page.getByTestId('bar-count-0').inputValue()).toBe('3');
  });

  it('adds a beam with a section of its own and a name that follows its dimensions', async () => {
    await page.getByTestId('sidebar-add-member').click();
    await expect.poll(() => page.getByTestId('member-title').textContent()).toBe('B-1');
    await expect.poll(() => page.getByTestId('notice').first().textContent()).toContain('has its own section');
    await page.getByTestId('inputs-tab-section').click();
    await expect(page.getByTestId('section-shared').count()).resolves.toBe(0);
    await page.getByTestId('shape-height').fill('28');
    const name = page.locator('[data-testid=section-editor] .group').nth(2).locator('input').first();
    await expect.poll(() => name.inputValue()).toBe('T 28 × 12 in web, 54 in flange (Level 2 floor) (copy)');
    await page.getByTestId('governing-mode').waitFor({ timeout: 60_000 });
    await snap(page, 'engineer-new-beam');
  });

  it('makes a failing member pass: a deeper section of its own, bottom bars moved with the soffit', async () => {
    await page.locator('[data-testid=member-list] [data-member="R-301"]').click();
    await expect.poll(() => page.locator('.title-row .badge').textContent()).toContain('Check fails');
    await page.getByTestId('inputs-tab-section').click();
    await page.getByTestId('section-shared').getByRole('button', { name: 'Copy for this zone' }).click();
    await expect(page.getByTestId('section-shared').count()).resolves.toBe(0);
    await page.getByTestId('shape-height').fill('30');
    const note = page.getByTestId('bars-left-behind');
    await expect.poll(() => note.textContent()).toContain('10.00 in deeper');
    await page.getByTestId('move-bars').click();
    // 17.5 in + 10 in = 27.5 in
    await expect.poll(() => page.getByTestId('bar-depth-0').inputValue()).toBe('27.5');
    await waitForCurrentResults(page);
    await expect.poll(() => page.locator('.title-row .badge').textContent(), { timeout: 60_000 }).toContain('OK');
    await page.getByTestId('results-tab-service').click();
    await expect.poll(() => page.getByTestId('service-checks').textContent()).not.toContain('fails');
    await snap(page, 'engineer-r301-passes');
    // R-305 kept the original section.
    await page.locator('[data-testid=member-list] [data-member="R-305"]').click();
    await page.getByTestId('inputs-tab-section').click();
    await expect.poll(() => page.getByTestId('shape-height').inputValue()).toBe('20');
  });

  it('offers New… and the keyboard shortcuts once a project is open', async () => {
    await page.keyboard.press('Control+/');
    await page.getByTestId('dialog-table').waitFor();
    expect(await page.getByTestId('dialog-table').textContent()).toContain('Undo');
    await page.keyboard.press('Escape');
    await page.getByTestId('new-project').click();
    await expect.poll(() => page.getByTestId('dialog').textContent()).toContain('Unsaved changes');
    await page.getByTestId('dialog-cancel').click();
  });

  it('raised no page or console errors', () => {
    expect(problems).toEqual([]);
  });
});
