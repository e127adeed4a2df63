/**
 * Takes the README screenshots (build/screenshots/) from the built web UI in Chromium:
 *
 *   npx tsx test/e2e/support/readme-screenshots.ts
 *
 * The demo project, 1440 × 900 pixels: the project overview, a member workspace with its charts,
 * the strain and stress profile at a key point, both bending directions side by side, an existing
 * beam's schemes and their comparison, a member after the switch to SI units, a continuous beam
 * of the SI demo, and the preview of a CSV import (docs/examples/members.csv into a new SI project).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT, openApp, startE2e, type E2eContext } from './environment.ts';

const OUT = join(ROOT, 'build', 'screenshots');
const context = await startE2e();
try {
  const { page } = await openApp(context);
  await page.getByTestId('open-demo').click();
  await page.waitForFunction(() => document.querySelector('[data-testid=analysis-status]')?.textContent?.includes('All results current'), undefined, { timeout: 60_000 });
  await page.waitForTimeout(300);
  await page.screenshot({ path: join(OUT, 'overview.png') });

  await page.locator('[data-testid=member-list] [data-member="F-205"]').click();
  await page.getByTestId('chart-moment-curvature').waitFor();
  await page.getByTestId('inputs-tab-section').click();
  await page.getByTestId('section-drawing').waitFor();
  await page.waitForTimeout(500);
  await page.screenshot({ path: join(OUT, 'member-workspace.png') });

  await page.getByTestId('results-tab-load-deflection').click();
  await page.getByTestId('inputs-tab-materials').click();
  await page.waitForTimeout(500);
  await page.screenshot({ path: join(OUT, 'load-deflection-and-materials.png') });

  await page.getByTestId('results-tab-moment-curvature').click();
  await page.getByTestId('inputs-tab-section').click();
  await page.locator('[data-testid=key-points] tbody tr.clickable', { hasText: 'first yield' }).first().click();
  await page.getByTestId('chart-stress-profile').waitFor();
  await page.waitForTimeout(300);
  await page.getByTestId('section-profile').evaluate((element) => element.scrollIntoView({ block: 'end' }));
  await page.waitForTimeout(300);
  await page.screenshot({ path: join(OUT, 'section-profile.png') });

  await page.locator('[data-testid=section-profile]').getByRole('button', { name: 'Close' }).click();
  await page.getByTestId('direction-both').click();
  await page.waitForTimeout(500);
  await page.getByTestId('chart-moment-curvature').evaluate((element) => element.scrollIntoView({ block: 'center' }));
  await page.waitForTimeout(300);
  await page.screenshot({ path: join(OUT, 'moment-curvature-both.png') });

  // An existing beam: its strengthening schemes beside the comparison of the beam as found with each.
  await page.locator('[data-testid=member-list] [data-member="B-204"]').click();
  await page.getByTestId('inputs-tab-strengthening').click();
  await page.getByTestId('results-tab-comparison').click();
  await page.getByTestId('comparison-table').waitFor();
  await page.getByTestId('member-workspace').evaluate((element) => element.parentElement!.scrollTo(0, 0));
  await page.waitForTimeout(600);
  await page.screenshot({ path: join(OUT, 'existing-beam.png') });

  await page.locator('[data-testid=member-list] [data-member="F-205"]').click();
  await page.getByTestId('results-tab-moment-curvature').click();
  await page.getByTestId('inputs-tab-section').click();
  await page.getByTestId('units-si').click();
  await page.getByTestId('member-workspace').evaluate((element) => element.parentElement!.scrollTo(0, 0));
  await page.getByTestId('direction-sagging').click();
  await page.waitForTimeout(600);
  await page.screenshot({ path: join(OUT, 'member-si.png') });

  // A continuous beam of the SI demo: its elevation with the hinges numbered, the span editor and the span table.
  const si = await openApp(context);
  await si.page.getByTestId('open-demo-si').click();
  await si.page.waitForFunction(() => document.querySelector('[data-testid=analysis-status]')?.textContent?.includes('All results current'), undefined, { timeout: 60_000 });
  await si.page.locator('[data-testid=member-list] [data-member="CB-2"]').click();
  await si.page.locator('[data-testid=continuous-elevation] [data-hinge]').first().waitFor();
  await si.page.waitForTimeout(400);
  await si.page.screenshot({ path: join(OUT, 'continuous-beam.png') });
  await importPreview(context);
  console.log(`screenshots written to ${OUT}`);
} finally {
  await context.close();
}

/** The preview of "Import CSV…" with the template of invented beams, into a new SI project. */
async function importPreview(context: E2eContext, out = OUT): Promise<void> {
  const text = readFileSync(join(ROOT, 'docs', 'examples', 'members.csv'), 'utf8');
  const { page } = await openApp(context, { csvQueue: [{ name: 'members.csv', path: null, text }] });
  await page.getByTestId('new-project').click();
  await page.getByTestId('dialog-si-en').click();
  await page.locator('[data-testid=member-list] [data-member="member-1"]').waitFor();
  await page.getByTestId('import-csv').click();
  await page.getByTestId('dialog-grid').waitFor();
  await page.waitForTimeout(300);
  await page.screenshot({ path: join(out, 'import-preview.png') });
  await page.close();
}
