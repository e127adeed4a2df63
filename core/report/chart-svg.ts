/**
 * One chart of the report as SVG text: chart.js (injected, core stays free of it) draws the spec's
 * configuration (core/charts/chartjs-config.ts, the same as on screen) on the recording canvas of
 * svg-canvas.ts. Used by the command line and by the app's report worker alike, so both print the
 * same figures.
 */
import { toChartJsConfig } from '../charts/chartjs-config.ts';
import type { ChartSpec } from '../charts/types.ts';
import type { ReportFontSet } from './scripts.ts';
import { RecordedPath, SvgCanvasContext } from './svg-canvas.ts';

/** The parts of chart.js this needs: the Chart class (with its registerables registered) and BasicPlatform. */
export interface ChartJsLibrary {
  readonly Chart: new (item: unknown, config: never) => { destroy(): void };
  readonly BasicPlatform: unknown;
}

/**
 * `spec` drawn at `width` × `height` points (= CSS pixels of the canvas) as an SVG document.
 * Deterministic: the same spec, size and fonts give the same text.
 */
export function chartSvg(chartJs: ChartJsLibrary, spec: ChartSpec, width: number, height: number, fonts: ReportFontSet): string {
  const context = new SvgCanvasContext(Math.round(width), Math.round(height), fonts);
  const config = toChartJsConfig(spec, { fontFamily: fonts.primary.family, devicePixelRatio: 1, platform: chartJs.BasicPlatform });
  // Where the host has a Path2D (a browser), chart.js builds each line as one and strokes it in one
  // call; the host's Path2D cannot be read back, so the recording canvas lends its own while the
  // chart is drawn (synchronously, in the constructor: the report's charts are not animated).
  const host = globalThis as { Path2D?: unknown };
  const own = Object.prototype.hasOwnProperty.call(host, 'Path2D');
  const previous = host.Path2D;
  host.Path2D = RecordedPath;
  try {
    const chart = new chartJs.Chart(context.canvas, config as never);
    try {
      return context.toSvg();
    } finally {
      chart.destroy();
    }
  } finally {
    if (own) host.Path2D = previous;
    else delete host.Path2D;
  }
}
