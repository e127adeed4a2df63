import { describe, expect, it } from 'vitest';
import type { ChartJob } from '../../../app/report/chart-worker.ts';
import { chartWorkerCount, renderChartsInWorkers } from '../../../app/report/chart-workers.ts';
import { renderChartSvg } from '../../../app/report/render-chart.ts';
import { analyzeProject } from '../../../core/analysis.ts';
import { loadDeflectionChart } from '../../../core/charts/load-deflection.ts';
import { reportTestProject } from '../../core/report/fixtures.ts';

const spec = loadDeflectionChart(analyzeProject(reportTestProject()).members[0]!, 'si');
const jobs: ChartJob[] = [300, 320, 340, 360, 380, 400].map((width) => ({ id: `w${width}`, spec, width, height: 200, format: 'svg' }));

describe('charts drawn on worker threads beside the calling thread', () => {
  it('starts one worker per other core, never as many as the charts', () => {
    expect(chartWorkerCount(100, 2)).toBe(1);
    expect(chartWorkerCount(100, 8)).toBe(7);
    expect(chartWorkerCount(100, 1)).toBe(0);
    expect(chartWorkerCount(3, 8)).toBe(2);
  });

  it('draws every chart exactly as this thread does, whichever thread drew it, and this thread takes its share', async () => {
    const drawnHere: string[] = [];
    const images = await renderChartsInWorkers(jobs, 1, (job) => {
      drawnHere.push(job.id);
      return renderChartSvg(job.spec, job.width, job.height);
    });
    expect(Object.keys(images).sort()).toEqual(jobs.map((j) => j.id).sort());
    for (const job of jobs) expect(images[job.id], job.id).toBe(renderChartSvg(job.spec, job.width, job.height));
    // The calling thread starts drawing at once, while the worker is still starting.
    expect(drawnHere.length).toBeGreaterThan(0);
  }, 180_000);

  it('fails with the chart named when this thread cannot draw one, and refuses to draw with no thread at all', async () => {
    await expect(renderChartsInWorkers(jobs, 0, (job) => {
      throw new Error(`no canvas for ${job.id}`);
    })).rejects.toThrow('no canvas for w300');
    await expect(renderChartsInWorkers(jobs, 0)).rejects.toThrow(/no worker/);
  });
});
