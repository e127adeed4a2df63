/**
 * Draws chart specs in Node with chart.js on an @napi-rs/canvas canvas, using the same
 * configuration as the app (core/charts/chartjs-config.ts).
 *
 * The report uses vector output: the canvas's SVG backend records chart.js's drawing as an SVG
 * document, which pdfmake embeds as vectors with real text in the report font. A PNG data URL is
 * available too (the browser's DOM canvas can only give raster images).
 */
import { createCanvas, SvgExportFlag } from '@napi-rs/canvas';
import { BasicPlatform, Chart, registerables } from 'chart.js';
import { toChartJsConfig, type ChartJsConfigOptions } from '../../core/charts/chartjs-config.ts';
import type { ChartSpec } from '../../core/charts/types.ts';
import { REPORT_FONT_FAMILY } from '../../core/report/fonts.ts';
import { registerCanvasFonts } from './fonts.ts';
import { encodeRgbPng } from './png.ts';

let chartJsReady = false;

function prepare(): void {
  registerCanvasFonts();
  if (!chartJsReady) {
    Chart.register(...registerables);
    chartJsReady = true;
  }
}

type ChartConstructorConfig = ConstructorParameters<typeof Chart>[1];

/** Draws the chart, lets `capture` read the canvas, then releases the chart (which clears the canvas). */
function draw<T>(context: unknown, spec: ChartSpec, options: ChartJsConfigOptions, capture: () => T): T {
  const config = toChartJsConfig(spec, { fontFamily: REPORT_FONT_FAMILY, ...options, platform: BasicPlatform });
  // The config is chart.js-shaped by construction; core declares only the subset it uses.
  const chart = new Chart(context as CanvasRenderingContext2D, config as unknown as ChartConstructorConfig);
  try {
    return capture();
  } finally {
    chart.destroy();
  }
}

const LIGATURES: Readonly<Record<string, string>> = { '\uFB00': 'ff', '\uFB01': 'fi', '\uFB02': 'fl', '\uFB03': 'ffi', '\uFB04': 'ffl' };

/**
 * Makes the canvas's SVG text plain for pdfmake's SVG reader: the canvas writes shaped text (with
 * ligature characters such as "ﬁ") and one x position per glyph; the PDF gets the plain characters
 * from the start position, laid out again in the same font (so text stays searchable). Empty text
 * elements are dropped. Nothing else is changed.
 */
export function tidySvg(svg: string): string {
  const tidy = mergeStrokes(mergeWords(svg.replace(/<\?xml[^>]*\?>\s*/, '').replace(/<text[^>]*><\/text>/g, '')))
    .replace(/ ([xy])="([^",]*),[^"]*"/g, ' $1="$2"')
    .replace(/[\uFB00-\uFB04]/g, (c) => LIGATURES[c] ?? c);
  // The canvas numbers clip paths across the whole process: number them per document instead, so
  // that the same chart always gives the same text.
  const ids = new Map<string, string>();
  for (const m of tidy.matchAll(/ id="([^"]+)"/g)) if (!ids.has(m[1]!)) ids.set(m[1]!, `c${ids.size}`);
  return tidy.replace(/( id="|url\(#)([^")]+)/g, (whole, lead: string, id: string) => (ids.has(id) ? `${lead}${ids.get(id)}` : whole));
}

/**
 * Joins consecutive stroked paths that differ only in their geometry (grid lines, tick marks) into
 * one path with several subpaths: the same drawing, fewer elements. Filled paths are left alone
 * (joining them could change how overlaps fill).
 */
export function mergeStrokes(svg: string): string {
  return svg.replace(/(?:<path fill="none"([^>]*?) d="([^"]*)"\/>\s*){2,}/g, (block) => {
    const parts = [...block.matchAll(/<path fill="none"([^>]*?) d="([^"]*)"\/>/g)];
    const groups: { attrs: string; d: string[] }[] = [];
    for (const p of parts) {
      const lastGroup = groups[groups.length - 1];
      if (lastGroup && lastGroup.attrs === p[1]) lastGroup.d.push(p[2]!);
      else groups.push({ attrs: p[1]!, d: [p[2]!] });
    }
    return groups.map((g) => `<path fill="none"${g.attrs} d="${g.d.join(' ')}"/>`).join('');
  });
}

/** Advance of a space in the report font, in em (Roboto: 507/2048). */
const SPACE_EM = 0.2476;

/**
 * The canvas writes one text element per word. Consecutive elements with the same attributes on the
 * same baseline, one space apart (judged from the glyph positions the canvas wrote), are joined into
 * one: the PDF then holds a few text runs per chart instead of dozens (each costs pdfmake's SVG
 * reader about half a millisecond). Words further apart (legend entries) stay separate.
 */
export function mergeWords(svg: string): string {
  const pattern = /<text([^>]*?) x="([^"]*)" y="([^"]*)">([^<]*)<\/text>/g;
  type Word = { attrs: string; xs: number[]; y: string; text: string };
  const out: string[] = [];
  let last = 0;
  let run: Word | null = null;
  let runEnd = 0;
  const flush = () => {
    if (run) out.push(`<text${run.attrs} x="${run.xs.join(', ')}" y="${run.y}">${run.text}</text>`);
    run = null;
  };
  for (const m of svg.matchAll(pattern)) {
    const between = svg.slice(last, m.index);
    if (between.trim() !== '') {
      flush();
      out.push(between);
    }
    last = m.index + m[0].length;
    const word: Word = { attrs: m[1]!, xs: m[2]!.split(',').map((v) => v.trim()).filter((v) => v !== '').map(Number), y: m[3]!, text: m[4]! };
    const size = Number(/font-size="([^"]+)"/.exec(word.attrs)?.[1] ?? 10);
    if (run !== null) {
      const current: Word = run;
      const n = current.xs.length;
      const advance = n > 1 ? (current.xs[n - 1]! - current.xs[0]!) / (n - 1) : 0.55 * size;
      const gap = (word.xs[0] ?? Number.NaN) - (current.xs[n - 1]! + advance);
      if (current.attrs === word.attrs && current.y.split(',')[0] === word.y.split(',')[0] && Math.abs(gap - SPACE_EM * size) < 0.3 * size) {
        current.xs.push(Number.NaN, ...word.xs);
        current.text = `${current.text} ${word.text}`;
        runEnd = last;
        continue;
      }
      flush();
    }
    run = word;
    runEnd = last;
  }
  flush();
  out.push(svg.slice(Math.max(last, runEnd)));
  return out.join('');
}

/**
 * Draws `spec` as an SVG document of `width` × `height` CSS pixels (= points in the report).
 * Deterministic: the same spec and size give the same text.
 */
export function renderChartSvg(spec: ChartSpec, width: number, height: number, options: ChartJsConfigOptions = {}): string {
  prepare();
  const canvas = createCanvas(Math.round(width), Math.round(height), SvgExportFlag.NoPrettyXML);
  return draw(canvas.getContext('2d'), spec, { ...options, devicePixelRatio: 1 }, () => tidySvg(canvas.getContent().toString('utf8')));
}

/**
 * Draws `spec` as an opaque RGB PNG data URL, `width` × `height` CSS pixels at `pixelRatio`
 * device pixels per CSS pixel (default 2, i.e. 144 dpi at the printed size).
 */
export async function renderChartPng(spec: ChartSpec, width: number, height: number, pixelRatio = 2, options: ChartJsConfigOptions = {}): Promise<string> {
  prepare();
  const w = Math.round(width * pixelRatio);
  const h = Math.round(height * pixelRatio);
  const canvas = createCanvas(w, h);
  const context = canvas.getContext('2d');
  const pixels = draw(context, spec, { ...options, devicePixelRatio: pixelRatio, background: '#ffffff' }, () => context.getImageData(0, 0, w, h).data);
  const png = await encodeRgbPng(pixels, w, h);
  return `data:image/png;base64,${png.toString('base64')}`;
}
