/**
 * Importing members from CSV in the web build, in Debian's Chromium: a new SI project, the top bar's
 * "Import CSV…" answered through the browser's real <input type=file> (the page's file chooser), a
 * file with an error previewed and cancelled (nothing changes), the template docs/examples/members.csv
 * previewed and imported, the import undone and redone as one step, and one imported member
 * analysed. Screenshots go to test-artifacts/e2e/.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { ROOT, openApp, snap, startE2e, type E2eContext } from './support/environment.ts';

let context: E2eContext;
let page: Page;
let problems: string[];

const memberIds = (p: Page) => p.locator('[data-testid=member-list] [data-member]').evaluateAll((buttons) => buttons.map((b) => b.getAttribute('data-member')));

/** Clicks "Import CSV…" and answers the browser's file chooser with `name` holding `text`. */
async function importFile(name: string, text: string): Promise<void> {
  const chooser = page.waitForEvent('filechooser');
  await page.getByTestId('import-csv').click();
  await (await chooser).setFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(text, 'utf8') });
  await page.getByTestId('dialog').waitFor();
}

beforeAll(async () => {
  context = await startE2e(inject('e2e'));
  // Each import answers its file dialog through the real <input type=file> of the web host.
  ({ page, problems } = await openApp(context, { csvQueue: ['input', 'input'] }));
  await page.getByTestId('new-project').click();
  await page.getByTestId('dialog-si-en').click();
  await page.locator('[data-testid=member-list] [data-member="member-1"]').waitFor();
});

afterAll(async () => {
  await page?.close();
  await context?.close();
});

describe('Import members from CSV', () => {
  it('previews a file with an error, names its row, column and range, and imports nothing on Cancel', async () => {
    const text = 'id,name,span [m],supports,section,live [kN/m]\r\nX-1,good one,6,simple,section-1,5\r\nX-2,too long,75,simple,section-1,5\r\n';
    await importFile('with-error.csv', text);
    const dialog = page.getByTestId('dialog');
    expect(await dialog.textContent()).toContain('with-error.csv, read as a member list (one row per member), has 1 error: nothing is imported unless you choose to import the 1 member without errors');
    expect(await dialog.textContent()).toContain('error: with-error.csv row 3, column span: must be greater than 0 and at most 60.00 m, got 75 m');
    expect(await page.getByTestId('dialog-import-good').textContent()).toBe('Import the 1 member without errors');
    expect(await page.getByTestId('dialog-import').count()).toBe(0);
    await page.getByTestId('dialog-cancel').click();
    expect(await memberIds(page)).toEqual(['member-1']);
    expect(await page.getByTestId('undo').getAttribute('title')).not.toMatch(/Import/);
  });

  it('previews the template, imports its five beams in one step that undo and redo take back and forth', async () => {
    await importFile('members.csv', readFileSync(join(ROOT, 'docs/examples/members.csv'), 'utf8'));
    const rows = page.locator('[data-testid=dialog-grid] tbody tr');
    await expect.poll(() => rows.count()).toBe(5);
    // RFC 4180 section 2, rule 6: the quoted comma stays inside the name.
    expect(await rows.nth(0).textContent()).toMatch(/row 2\s*B-101\s*Grid 1, A–B\s*simply supported, span 6\.00 m, section section-1; dead 4\.50 kN\/m/);
    expect(await rows.nth(2).textContent()).toContain('cantilever, span 2.00 m');
    await snap(page, 'import-preview');
    await page.getByTestId('dialog-import').click();
    await expect.poll(() => memberIds(page)).toEqual(['member-1', 'B-101', 'B-102', 'B-103', 'B-104', 'B-105']);
    expect(await page.getByTestId('undo').getAttribute('title')).toBe('Undo Import from members.csv (Ctrl+Z)');
    await page.getByTestId('undo').click();
    await expect.poll(() => memberIds(page)).toEqual(['member-1']);
    await page.getByTestId('redo').click();
    await expect.poll(() => memberIds(page)).toEqual(['member-1', 'B-101', 'B-102', 'B-103', 'B-104', 'B-105']);
  });

  it('analyses an imported member', async () => {
    await page.locator('[data-testid=member-list] [data-member="B-101"]').click();
    const badge = page.locator('[data-testid=member-list] [data-member="B-101"] .badge');
    await expect.poll(() => badge.getAttribute('data-status'), { timeout: 180_000, interval: 500 }).toMatch(/^(ok|check-fails|brittle|not-converged)$/);
    expect(await page.getByTestId('governing-mode').textContent()).toMatch(/\S/);
    await snap(page, 'import-analysed-member');
  });

  it('raised no page or console errors', () => {
    expect(problems).toEqual([]);
  });
});
