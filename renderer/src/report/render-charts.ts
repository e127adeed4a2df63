/**
 * Draws the report's chart figures with chart.js on an OffscreenCanvas, through the same
 * `toChartJsConfig` the app and the Node report use, and returns PNG data URLs (a browser canvas
 * gives raster images only). Works in a worker and on the page.
 */
import { BasicPlatform, type ChartConfiguration } from 'chart.js';
import { toChartJsConfig } from '../../../core/charts/chartjs-config.ts';
import type { ChartSpec } from '../../../core/charts/types.ts';
import { REPORT_FONT_FAMILY } from '../../../core/report/fonts.ts';
import { chartJs } from '../charts/chartjs.ts';

/** Device pixels per point of the PNG charts (2 → 144 dpi in the PDF). */
export const REPORT_PIXEL_RATIO = 2;

function base64(bytes: Uint8Array): string {
  let text = '';
  const step = 0x8000;
  for (let i = 0; i < bytes.length; i += step) text += String.fromCharCode(...bytes.subarray(i, i + step));
  return btoa(text);
}

/** `spec` drawn at `width` × `height` points as a PNG data URL. */
export async function chartPng(spec: ChartSpec, width: number, height: number, ratio = REPORT_PIXEL_RATIO): Promise<string> {
  const Chart = chartJs();
  const canvas = new OffscreenCanvas(Math.round(width * ratio), Math.round(height * ratio));
  const config = toChartJsConfig(spec, { fontFamily: REPORT_FONT_FAMILY, devicePixelRatio: ratio, platform: BasicPlatform });
  const chart = new Chart(canvas as unknown as HTMLCanvasElement, config as unknown as ChartConfiguration);
  try {
    const blob = await canvas.convertToBlob({ type: 'image/png' });
    return `data:image/png;base64,${base64(new Uint8Array(await blob.arrayBuffer()))}`;
  } finally {
    chart.destroy();
  }
}
