/**
 * Worker-thread body of chart-workers.ts: draws the chart jobs it receives, one at a time, with
 * the same renderer as the main thread (render-chart.ts) and posts each result back.
 * Messages from the parent: `ChartJob`; to the parent: `ChartJobResult`.
 */
import { parentPort } from 'node:worker_threads';
import type { ChartSpec } from '../../core/charts/types.ts';
import { renderChartPng, renderChartSvg } from './render-chart.ts';

export interface ChartJob {
  readonly id: string;
  readonly spec: ChartSpec;
  readonly width: number;
  readonly height: number;
  readonly format: 'svg' | 'png';
}

export type ChartJobResult = { readonly id: string; readonly ok: true; readonly data: string } | { readonly id: string; readonly ok: false; readonly message: string };

if (parentPort) {
  const port = parentPort;
  port.on('message', (job: ChartJob) => {
    const reply = (result: ChartJobResult) => port.postMessage(result);
    const work = job.format === 'svg' ? Promise.resolve(renderChartSvg(job.spec, job.width, job.height)) : renderChartPng(job.spec, job.width, job.height);
    work.then((data) => reply({ id: job.id, ok: true, data }), (error: unknown) => reply({ id: job.id, ok: false, message: error instanceof Error ? error.message : String(error) }));
  });
}
