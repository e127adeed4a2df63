/**
 * A continuous beam as an engineer meets it, in Debian's Chromium against the built web UI: the SI
 * demo's CB-1 and CB-2 in the overview, CB-2 opened with its elevation, its long end span failing
 * in deflection, a span length edited and the result following, undo restoring it. Screenshots go
 * to test-artifacts/e2e/.
 */
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openApp, snap, startE2e, type E2eContext } from './support/environment.ts';

let context: E2eContext;
let page: Page;
let problems: string[];

beforeAll(async () => {
  context = await startE2e(inject('e2e'));
  ({ page, problems } = await openApp(context, {}, { width: 1440, height: 900 }));
  await page.getByTestId('open-demo-si').click();
  await page.waitForFunction(() => document.querySelector('[data-testid=analysis-status]')?.textContent?.includes('All results current'), undefined, { timeout: 120_000 });
});

afterAll(async () => {
  await page?.close();
  await context?.close();
});

/** The text of the governing check's utilisation in the row of a part of the span table. */
async function utilisationOf(part: string): Promise<number> {
  const text = await page.locator(`[data-testid=span-table] tr[data-part="${part}"] td.util`).textContent();
  return Number(text?.trim());
}

describe('continuous beams in the app', () => {
  it('lists CB-1 and CB-2 in the overview with a status and their governing span', async () => {
    const rows = page.locator('[data-testid=overview-rows] [role=row]');
    const cb2 = rows.filter({ hasText: 'CB-2' });
    await expect.poll(() => cb2.locator('.badge').getAttribute('data-status')).toBe('check-fails');
    const cb1 = rows.filter({ hasText: 'CB-1' });
    // CB-1 passes its deflection limits and its mechanism check: never a plain failure, and not OK while station checks are missing.
    expect(await cb1.locator('.badge').getAttribute('data-status')).not.toBe('check-fails');
    expect(await cb2.locator('.c-governing').textContent()).toContain('span 1');
    await snap(page, 'continuous-overview');
  });

  it('opens CB-2: elevation with both spans and the cantilever, the end span failing in deflection', async () => {
    await page.locator('[data-testid=member-list] button', { hasText: 'CB-2' }).click();
    await expect.poll(() => page.getByTestId('continuous-workspace').count()).toBe(1);
    const elevation = page.getByTestId('continuous-elevation');
    await expect.poll(() => elevation.locator('.part').count()).toBe(3);
    expect(await elevation.locator('[data-support]').count()).toBe(3);
    await expect.poll(() => page.locator('[data-testid=span-table] tr[data-part="span 1"]').count()).toBe(1);
    expect(await utilisationOf('span 1')).toBeGreaterThan(1);
    expect(await page.getByTestId('governing-mode').textContent()).toMatch(/Deflection check fails in span 1 \(utilisation 1\.\d\d\)/);
    // The short span is lifted by the long one's load: its deflections say so, with a magnitude.
    expect(await page.locator('[data-testid=span-table] tr[data-part="span 2"]').textContent()).toMatch(/\d\.\d+ upward \/ \d\.\d+ upward/);
    // Hinges of the analysis to failure are numbered on the elevation.
    await expect.poll(() => elevation.locator('[data-hinge]').count()).toBeGreaterThan(0);
    await snap(page, 'continuous-cb2');
  });

  it('follows an edit of the end span and returns on undo', async () => {
    const before = await utilisationOf('span 1');
    const field = page.getByTestId('span-length-1');
    await field.fill('6.5');
    await field.press('Enter');
    await expect.poll(() => utilisationOf('span 1'), { timeout: 60_000 }).toBeLessThan(before * 0.8);
    expect(await page.locator('.badge[data-status]').first().getAttribute('data-status')).not.toBe('outdated');
    await snap(page, 'continuous-cb2-shorter');
    await page.getByTestId('undo').click();
    await expect.poll(() => utilisationOf('span 1'), { timeout: 60_000 }).toBeCloseTo(before, 2);
    expect(await field.inputValue()).toBe('8.4');
  });

  it('keeps a length that is not a number in its field and names the range of one out of range', async () => {
    const field = page.getByTestId('span-length-2');
    await field.fill('4,2 m?');
    expect(await field.inputValue()).toBe('4,2 m?');
    await field.fill('0.05');
    await field.press('Tab');
    const message = page.locator('[data-span="2"] .field-msg');
    await expect.poll(() => message.textContent(), { timeout: 30_000 }).toMatch(/spans\[1\]|span|0\.1/i);
    await page.getByTestId('undo').click();
    await expect.poll(() => field.inputValue()).toBe('4.2');
  });

  it('adds a continuous beam that is analysed, deletes it, and brings it back with undo', async () => {
    await page.getByTestId('sidebar-add-continuous').click();
    await expect.poll(() => page.getByTestId('member-title').textContent()).toBe('CB-3');
    expect(await page.locator('[data-testid=span-editor] [data-span]').count()).toBe(2);
    await expect.poll(() => page.locator('[data-testid=continuous-workspace] .title-row .badge').getAttribute('data-status'), { timeout: 60_000 }).not.toMatch(/pending|outdated/);
    await page.getByTestId('delete-member').click();
    await expect.poll(() => page.locator('[data-testid=member-list] [data-member]').filter({ hasText: 'CB-3' }).count()).toBe(0);
    await page.getByTestId('undo').click();
    await expect.poll(() => page.locator('[data-testid=member-list] [data-member]').filter({ hasText: 'CB-3' }).count()).toBe(1);
    await page.locator('[data-testid=member-list] [data-member]', { hasText: 'CB-2' }).click();
  });

  it('shows the envelopes and the hinge sequence', async () => {
    await page.getByRole('tab', { name: /envelopes/i }).click();
    await expect.poll(() => page.getByTestId('chart-moment-envelope').count()).toBe(1);
    await snap(page, 'continuous-envelopes');
    await page.getByRole('tab', { name: /hinges/i }).click();
    await expect.poll(() => page.locator('[data-testid=hinge-table] tbody tr').count()).toBeGreaterThan(0);
    await snap(page, 'continuous-hinges');
    expect(problems).toEqual([]);
  });
});
