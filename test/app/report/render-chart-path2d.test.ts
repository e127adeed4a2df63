/**
 * A PNG chart draws whatever Path2D the process has (app/report/render-chart.ts): chart.js strokes
 * through a global Path2D if one existed when it loaded, and @napi-rs/canvas accepts only its own.
 * pdf.js (read by the report tests) installs one from its own copy of the canvas package, and
 * renderChartPng then threw "parameter 1 is not of type 'Path2D'" in whichever test file came after.
 * Isolated (vi.stubGlobal): chart.js is loaded here after a foreign Path2D is in place.
 */
import { afterAll, describe, expect, it, vi } from 'vitest';

/** A Path2D of another library: the right methods, not the canvas's class. */
class ForeignPath2D {
  moveTo(): void {}
  lineTo(): void {}
  bezierCurveTo(): void {}
  quadraticCurveTo(): void {}
  arc(): void {}
  rect(): void {}
  closePath(): void {}
}

afterAll(() => {
  vi.unstubAllGlobals();
});

describe('PNG charts with a foreign global Path2D', () => {
  it('draws, the same pixels as without one', async () => {
    vi.stubGlobal('Path2D', ForeignPath2D);
    const { renderChartPng } = await import('../../../app/report/render-chart.ts');
    const { loadDeflectionChart } = await import('../../../core/charts/load-deflection.ts');
    const { analyzeProject } = await import('../../../core/analysis.ts');
    const { reportTestProject } = await import('../../core/report/fixtures.ts');
    const spec = loadDeflectionChart(analyzeProject(reportTestProject()).members[0]!, 'si');
    const png = await renderChartPng(spec, 300, 200);
    expect(png.startsWith('data:image/png;base64,')).toBe(true);
    // The lent Path2D is taken back.
    expect(globalThis.Path2D).toBe(ForeignPath2D);
    // The same image as a process without a global Path2D draws (chart.js then strokes segment by
    // segment): sha-256 of the data URL, measured in a clean process.
    const { createHash } = await import('node:crypto');
    expect(createHash('sha256').update(png).digest('hex').slice(0, 16)).toBe('90585ecfeb367435');
  });
});
