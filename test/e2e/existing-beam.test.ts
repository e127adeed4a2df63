/**
 * An existing beam as an engineer works it in Chromium: open the demo, give the failing L-102 an FRP
 * scheme, watch the comparison fill in and the status of the scheme change, mark it preferred, undo
 * back to where it was, and export the member's PDF with the scheme comparison in its text. The
 * as-found and strengthening panels of B-204 and the shear tab are looked at, at 1440 and 1280 wide.
 */
import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { ARTIFACTS, openApp, snap, startE2e, type E2eContext } from './support/environment.ts';

let context: E2eContext;
let page: Page;
let problems: string[];

const allCurrent = (p: Page) => p.waitForFunction(() => document.querySelector('[data-testid=analysis-status]')?.textContent?.includes('All results current'), undefined, { timeout: 120_000 });

beforeAll(async () => {
  context = await startE2e(inject('e2e'));
  ({ page, problems } = await openApp(context));
  await page.getByTestId('open-demo').click();
  await allCurrent(page);
}, 180_000);

afterAll(async () => {
  await context?.close();
});

describe('strengthening a failing beam', () => {
  it('adds an FRP scheme to L-102: the comparison shows it and its status turns from Check fails to Brittle (the strength check passes with the FRP, but a brittle finding of issue 10 remains, so it never reads OK)', async () => {
    await page.locator('[data-testid=member-list] [data-member="L-102"]').click();
    await expect.poll(() => page.getByTestId('member-title').textContent()).toBe('L-102');
    expect((await page.locator('[data-testid=member-workspace] .title-row .badge').first().textContent())?.trim()).toBe('Check fails');
    await page.getByTestId('inputs-tab-strengthening').click();
    await page.getByTestId('add-frp-scheme').click();
    await expect.poll(() => page.locator('[data-testid^=scheme-name-]').count()).toBe(1);
    await allCurrent(page);
    await page.getByTestId('results-tab-comparison').click();
    const table = page.getByTestId('comparison-table');
    await table.waitFor();
    const headers = (await table.locator('thead th').allTextContents()).map((t) => t.trim());
    expect(headers.slice(1)).toEqual(['design beam', 'Scheme 1: FRP, 2 plies']);
    const status = (await table.locator('[data-row=status] td').allTextContents()).map((t) => t.trim());
    expect(status.slice(1)).toEqual(['Check fails', 'Brittle']);
    expect(await table.locator('[data-row=strength] td').nth(2).textContent()).toMatch(/0\.\d\d/);
    expect(await table.locator('[data-row^=check-]').count()).toBeGreaterThan(0);
    await page.getByTestId('preferred-scheme').selectOption({ label: 'Scheme 1: FRP, 2 plies' });
    await expect.poll(() => page.getByTestId('preferred-status').textContent()).toMatch(/strengthened by “Scheme 1: FRP, 2 plies”:\s*Brittle/i);
    await snap(page, 'existing-01-frp-added');
  });

  it('undo takes the preference and then the scheme away', async () => {
    await page.getByTestId('undo').click();
    await expect.poll(() => page.getByTestId('preferred-status').textContent()).toContain('needs strengthening');
    await page.getByTestId('undo').click();
    await expect.poll(() => page.locator('[data-testid^=scheme-name-]').count()).toBe(0);
    // No scheme and no condition: the comparison tab goes and the response falls back to the first tab.
    await expect.poll(() => page.getByTestId('results-tab-comparison').count()).toBe(0);
    await page.getByTestId('redo').click();
    await expect.poll(() => page.locator('[data-testid^=scheme-name-]').count()).toBe(1);
    await allCurrent(page);
  });

  it('exports the member\'s PDF with the scheme comparison in it', async () => {
    await page.getByTestId('export').click();
    await page.getByTestId('export-member-pdf').click();
    await expect.poll(async () => page.evaluate(() => ((window as unknown as { __hingelinePdf?: number[] }).__hingelinePdf ?? []).length), { timeout: 120_000 }).toBeGreaterThan(1000);
    const bytes = await page.evaluate(() => (window as unknown as { __hingelinePdf: number[] }).__hingelinePdf);
    const file = join(ARTIFACTS, 'existing-L-102.pdf');
    writeFileSync(file, Buffer.from(bytes));
    const text = execFileSync('/usr/bin/pdftotext', [file, '-'], { encoding: 'utf8' });
    expect(text).toContain('Existing beam: as found and strengthening');
    expect(text).toContain('Comparison of the beam as it stands with each scheme');
    expect(text).toContain('Scheme 1: FRP, 2 plies');
    expect(text).toContain('Code checks of the strengthening method');
    expect(text).toContain('Existing beams: strengthening');
  });
});

describe.each([{ width: 1440, height: 900 }, { width: 1280, height: 720 }])('the existing-beam panels at $width × $height', (viewport) => {
  let view: Page;
  beforeAll(async () => {
    ({ page: view } = await openApp(context, {}, viewport));
    await view.getByTestId('open-demo').click();
    await allCurrent(view);
    await view.locator('[data-testid=member-list] [data-member="B-204"]').click();
  }, 180_000);
  afterAll(async () => {
    await view?.close();
  });

  it('shows the as-found data with the derived strength, and the section drawn with its legend', async () => {
    await view.getByTestId('inputs-tab-as-found').click();
    await expect.poll(() => view.getByTestId('core-result-0').textContent()).toContain('ACI 214.4R-10');
    await expect.poll(() => view.getByTestId('as-found-drawing').textContent()).toContain('corroded 8 %');
    // Nothing in the panel is wider than the panel.
    const overflow = await view.locator('[data-testid=as-found-editor]').evaluate((el) => el.scrollWidth - el.clientWidth);
    expect(overflow).toBeLessThanOrEqual(1);
    await snap(view, `existing-${viewport.width}-as-found`);
  });

  it('shows both schemes and the shear tab, and the result tabs fit their bar', async () => {
    await view.getByTestId('inputs-tab-strengthening').click();
    await expect.poll(() => view.locator('[data-testid^=scheme-drawing-]').count()).toBe(2);
    await view.getByTestId('results-tab-shear').click();
    await view.getByTestId('chart-shear').waitFor();
    const tabs = view.locator('[data-testid=response-view] [role=tablist]');
    expect(await tabs.evaluate((el) => el.scrollWidth - el.clientWidth)).toBeLessThanOrEqual(1);
    await snap(view, `existing-${viewport.width}-shear`);
    await view.getByTestId('results-tab-comparison').click();
    await view.getByTestId('comparison-table').waitFor();
    // The inputs panel keeps to its width beside the comparison (the scheme drawings scale down).
    await expect.poll(() => view.locator('[data-testid=strengthening-editor] [data-testid^=scheme-drawing-] img').count()).toBe(2);
    expect(await view.locator('.inputs').evaluate((el) => el.scrollWidth - el.clientWidth)).toBeLessThanOrEqual(1);
    await snap(view, `existing-${viewport.width}-comparison`);
  });
});

it('raised no page or console errors', () => {
  expect(problems).toEqual([]);
});
