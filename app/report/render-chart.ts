/**
 * Draws chart specs in Node with chart.js, using the same configuration as the app
 * (core/charts/chartjs-config.ts).
 *
 * Vectors (the default): chart.js draws on core's recording canvas (core/report/chart-svg.ts), the
 * same code the app's report worker uses, so both print identical charts; pdfmake embeds the SVG
 * as vectors with real text. PNG (144 dpi, on an @napi-rs/canvas canvas, loaded only then) remains
 * for hosts that ask for images.
 */
import { BasicPlatform, Chart, Filler, Legend, LineElement, LinearScale, PointElement, ScatterController, SubTitle, Title, Tooltip } from 'chart.js';
import { toChartJsConfig, type ChartJsConfigOptions } from '../../core/charts/chartjs-config.ts';
import type { ChartSpec } from '../../core/charts/types.ts';
import { chartSvg } from '../../core/report/chart-svg.ts';
import { REPORT_FONT_FAMILY } from '../../core/report/fonts.ts';
import { nodeReportFontSet, registerCanvasFonts } from './fonts.ts';
import { encodeRgbPng } from './png.ts';

let chartJsReady = false;

function chartJs(): { Chart: typeof Chart; BasicPlatform: typeof BasicPlatform } {
  if (!chartJsReady) {
    // The same components in the same order as the app (renderer/src/charts/chartjs.ts): plugins draw
    // in registration order, so the report's SVG is then the same element for element.
    Chart.register(ScatterController, LineElement, PointElement, LinearScale, Legend, Title, SubTitle, Tooltip, Filler);
    chartJsReady = true;
  }
  return { Chart, BasicPlatform };
}

/**
 * Draws `spec` as an SVG document of `width` × `height` points. Deterministic: the same spec and size
 * give the same text, here and in the app.
 */
export function renderChartSvg(spec: ChartSpec, width: number, height: number): string {
  return chartSvg(chartJs() as never, spec, width, height, nodeReportFontSet());
}

type ChartConstructorConfig = ConstructorParameters<typeof Chart>[1];

/**
 * Draws `spec` as an opaque RGB PNG data URL, `width` × `height` CSS pixels at `pixelRatio`
 * device pixels per CSS pixel (default 2, i.e. 144 dpi at the printed size).
 */
export async function renderChartPng(spec: ChartSpec, width: number, height: number, pixelRatio = 2, options: ChartJsConfigOptions = {}): Promise<string> {
  await registerCanvasFonts();
  const { createCanvas, Path2D: CanvasPath2D } = await import('@napi-rs/canvas');
  const w = Math.round(width * pixelRatio);
  const h = Math.round(height * pixelRatio);
  const canvas = createCanvas(w, h);
  const context = canvas.getContext('2d');
  // The canvas is pixelRatio times the chart's size: chart.js scales by devicePixelRatio itself
  // when told the size in CSS pixels, so hand it a canvas of the CSS size and let it scale up.
  const config = toChartJsConfig(spec, { fontFamily: REPORT_FONT_FAMILY, ...options, devicePixelRatio: pixelRatio, background: '#ffffff', platform: BasicPlatform });
  const { Chart: ChartClass } = chartJs();
  const target = { width: Math.round(width), height: Math.round(height), style: {}, getContext: () => context };
  // chart.js strokes each line through a global Path2D if there was one when it loaded, and this
  // canvas accepts only its own: another library's (pdf.js polyfills one in Node from its own copy of
  // this canvas package) made the stroke throw. Its own is lent while the chart draws (synchronously,
  // in the constructor), as chartSvg lends the recording canvas's; without a global Path2D at load,
  // chart.js draws lines segment by segment and never builds one.
  const host = globalThis as { Path2D?: unknown };
  const hadPath2D = Object.prototype.hasOwnProperty.call(host, 'Path2D');
  const previous = host.Path2D;
  host.Path2D = CanvasPath2D;
  let chart: { destroy(): void };
  try {
    chart = new ChartClass(target as unknown as HTMLCanvasElement, config as unknown as ChartConstructorConfig);
  } finally {
    if (hadPath2D) host.Path2D = previous;
    else delete host.Path2D;
  }
  try {
    const pixels = context.getImageData(0, 0, w, h).data;
    const png = await encodeRgbPng(pixels, w, h);
    return `data:image/png;base64,${png.toString('base64')}`;
  } finally {
    chart.destroy();
  }
}
