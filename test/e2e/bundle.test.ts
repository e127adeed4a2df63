/**
 * What the page loads at start: the engines and the project-file schema belong in the workers
 * (docs/ui.md: "it computes no engineering number itself"); a core import that drags them into
 * the page's bundle slows every cold start. The built web UI is checked, not the sources.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ensureWebBuild, WEB_ROOT } from './support/environment.ts';

describe('the page bundle of the web build', () => {
  it('leaves project-file parsing (zod) and the section engine to the workers', () => {
    ensureWebBuild();
    const html = readFileSync(join(WEB_ROOT, 'index.html'), 'utf8');
    const entry = /<script[^>]+src="\.?\/?([^"]+\.js)"/.exec(html)?.[1];
    expect(entry).toMatch(/\.js$/);
    const page = readFileSync(join(WEB_ROOT, entry!), 'utf8');
    // zod's own class and error names survive minification.
    expect(page).not.toMatch(/\$ZodType|ZodError|_zod/);
    // A sentence of the section engine's equilibrium solver (core/section/equilibrium.ts): in
    // the analysis worker's bundle, never in the page's.
    const worker = readFileSync(join(WEB_ROOT, 'assets', readdirSync(join(WEB_ROOT, 'assets')).find((name) => name.startsWith('analysis-worker-') && name.endsWith('.js'))!), 'utf8');
    expect(worker).toContain('no strain at the centroid balances');
    expect(page).not.toContain('no strain at the centroid balances');
    // A page bundle of a size the start-up can afford (about 650 kB now, production build; 540 kB before the continuous-beam views).
    expect(page.length).toBeLessThan(700_000);
  });
});
