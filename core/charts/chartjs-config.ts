/**
 * From a library-neutral `ChartSpec` to a chart.js (v4) configuration object. This is the one
 * plotting code of Hingeline: the app passes the result to `new Chart(domCanvasContext, config)`,
 * the report to `new Chart(nodeCanvasContext, config)` — so both draw the same chart.
 *
 * chart.js is not imported here (core stays free of UI libraries); the few types used are declared
 * locally. Marker labels, shaded bands, reference lines, the white background and the "nothing to
 * show" message are drawn by a small inline plugin that only uses the 2D context chart.js hands it.
 */
import { PALETTE, dashPattern, withOpacity } from './palette.ts';
import type { AxisSpec, ChartPoint, ChartSpec, MarkerShape, SeriesSpec } from './types.ts';

/** The 2D drawing context methods the overlay uses (a subset of CanvasRenderingContext2D). */
export interface ChartContext2D {
  save(): void;
  restore(): void;
  beginPath(): void;
  moveTo(x: number, y: number): void;
  lineTo(x: number, y: number): void;
  rect(x: number, y: number, width: number, height: number): void;
  clip(): void;
  stroke(): void;
  fillRect(x: number, y: number, width: number, height: number): void;
  fillText(text: string, x: number, y: number): void;
  measureText(text: string): { width: number };
  setLineDash(segments: number[]): void;
  fillStyle: unknown;
  strokeStyle: unknown;
  lineWidth: number;
  font: string;
  textAlign: string;
  textBaseline: string;
}

/** The parts of a chart.js Chart instance the overlay plugin reads. */
export interface ChartInstanceLike {
  readonly ctx: ChartContext2D;
  readonly width: number;
  readonly height: number;
  readonly chartArea: { readonly left: number; readonly right: number; readonly top: number; readonly bottom: number };
  readonly scales: Readonly<Record<string, ScaleLike | undefined>>;
}

/** The parts of a chart.js scale the overlay and the title fitting read (pixels; bounds once laid out). */
export interface ScaleLike {
  getPixelForValue(value: number): number;
  readonly left?: number;
  readonly right?: number;
  readonly top?: number;
  readonly bottom?: number;
  readonly width?: number;
  readonly height?: number;
}

export interface ChartJsPlugin {
  readonly id: string;
  beforeDraw?(chart: ChartInstanceLike): void;
  beforeDatasetsDraw?(chart: ChartInstanceLike): void;
  afterDatasetsDraw?(chart: ChartInstanceLike): void;
}

export interface ChartJsDataset {
  readonly label: string;
  readonly data: { x: number | null; y: number | null }[];
  readonly xAxisID: string;
  readonly yAxisID: string;
  readonly [option: string]: unknown;
}

/** A chart.js configuration (type `scatter`: every series is x–y data). */
export interface ChartJsConfig {
  readonly type: 'scatter';
  readonly data: { readonly datasets: ChartJsDataset[] };
  readonly options: Record<string, unknown>;
  readonly plugins: ChartJsPlugin[];
  /** chart.js platform class, passed through (e.g. BasicPlatform for a Node canvas). */
  readonly platform?: unknown;
}

export interface ChartJsConfigOptions {
  /** Font family the canvas knows (default `Roboto`: the report registers it; the app loads it with @font-face). */
  readonly fontFamily?: string;
  /** Base text size in CSS pixels (default 9; titles are larger). */
  readonly fontSize?: number;
  /** Device pixel ratio for sharp raster output (default 1). */
  readonly devicePixelRatio?: number;
  /** Show the legend (default true). */
  readonly legend?: boolean;
  /** Draw the title and subtitle inside the chart (default true). */
  readonly title?: boolean;
  /** Background fill (default white; null for transparent). */
  readonly background?: string | null;
  /** Tooltips, for the interactive app (default false). */
  readonly tooltips?: boolean;
  /** chart.js platform class to pass through (the report uses BasicPlatform). */
  readonly platform?: unknown;
}

/** chart.js point style of each marker shape. */
const POINT_STYLE: Readonly<Record<MarkerShape, string>> = {
  circle: 'circle',
  square: 'rect',
  triangle: 'triangle',
  diamond: 'rectRot',
  cross: 'crossRot',
  star: 'star',
};

const TEXT_COLOUR = '#39424c';
const GRID_COLOUR = '#e1e5ea';

type Rect = { x: number; y: number; w: number; h: number };

function overlaps(a: Rect, b: Rect): boolean {
  return a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;
}

function inside(r: Rect, area: ChartInstanceLike['chartArea']): boolean {
  return r.x >= area.left && r.x + r.w <= area.right && r.y >= area.top && r.y + r.h <= area.bottom;
}

/**
 * The part of the plot a marker belongs to: the chart area, narrowed to its x axis's extent when
 * that axis is one panel of several side by side.
 */
function panelOf(xs: ScaleLike, area: ChartInstanceLike['chartArea']): ChartInstanceLike['chartArea'] {
  if (xs.left === undefined || xs.right === undefined || (xs.left <= area.left + 0.5 && xs.right >= area.right - 0.5)) return area;
  return { left: Math.max(area.left, xs.left), right: Math.min(area.right, xs.right), top: area.top, bottom: area.bottom };
}

function toData(points: readonly ChartPoint[]): { x: number | null; y: number | null }[] {
  return points.map((p) => (p === null ? { x: null, y: null } : { x: p.x, y: p.y }));
}

/**
 * An axis title that fits the length of its axis: the whole label on one line when it fits, else
 * the name and the unit on two lines (`Stress σ, compression +` / `(psi)`), else the name broken
 * at its commas as well. Never cut: a title wider than the plot was clipped at both ends.
 */
export function fitAxisTitle(label: string, available: number, measure: (text: string) => number): string | string[] {
  if (!(available > 0) || measure(label) <= available) return label;
  const open = label.lastIndexOf(' (');
  const name = open > 0 ? label.slice(0, open) : label;
  const unit = open > 0 ? label.slice(open + 1) : '';
  const lines = [name, ...(unit ? [unit] : [])];
  if (lines.every((line) => measure(line) <= available)) return lines;
  const parts = name.split(/,\s+/);
  return [...parts.map((part, i) => (i < parts.length - 1 ? `${part},` : part)), ...(unit ? [unit] : [])];
}

/** Data range of the series and markers drawn on axis `id` (display units), or null. */
function dataRange(spec: ChartSpec, id: 'x' | 'x2'): [number, number] | null {
  let low = Infinity;
  let high = -Infinity;
  const take = (v: number) => {
    if (!Number.isFinite(v)) return;
    low = Math.min(low, v);
    high = Math.max(high, v);
  };
  for (const series of spec.series) if ((series.xAxis ?? 'x') === id) for (const p of series.points) if (p) take(p.x);
  for (const m of spec.markers) if ((m.xAxis ?? 'x') === id) take(m.x);
  return low <= high ? [low, high] : null;
}

function axisOptions(axis: AxisSpec, id: 'x' | 'y' | 'x2' | 'y2', font: (size: number, weight?: string) => Record<string, unknown>, base: number, family: string, spec: ChartSpec): Record<string, unknown> {
  const horizontal = id.startsWith('x');
  // A panel of stacked x axes: its own range with an empty margin at each end, ticks at round values only.
  const range = axis.panelMargin !== undefined && horizontal && axis.min === undefined && axis.max === undefined ? dataRange(spec, id as 'x' | 'x2') : null;
  const panel = range
    ? (() => {
        const low = axis.includeZero ? Math.min(0, range[0]) : range[0];
        const high = axis.includeZero ? Math.max(0, range[1]) : range[1];
        const pad = (high - low || Math.abs(high) || 1) * axis.panelMargin!;
        return { min: low - pad, max: high + pad };
      })()
    : null;
  const titleFont = font(base);
  return {
    type: 'linear',
    axis: horizontal ? 'x' : 'y',
    position: axis.position ?? (horizontal ? 'bottom' : 'left'),
    reverse: axis.reverse ?? false,
    beginAtZero: axis.includeZero ?? false,
    // Head room so that markers and their labels at the ends of the data stay inside the plot.
    ...(axis.min === undefined && axis.max === undefined && !panel ? { grace: '5%' } : {}),
    ...(axis.min !== undefined ? { min: axis.min } : {}),
    ...(axis.max !== undefined ? { max: axis.max } : {}),
    ...(panel ? { min: panel.min, max: panel.max } : {}),
    title: {
      display: true,
      // Scriptable: measured against the axis length once chart.js has laid the axis out.
      text: (context: { chart?: { ctx?: ChartContext2D; width?: number; height?: number; chartArea?: ChartInstanceLike['chartArea'] }; scale?: ScaleLike }) => {
        const chart = context.chart;
        const ctx = chart?.ctx;
        if (!ctx || typeof ctx.measureText !== 'function') return axis.label;
        // The plot's extent from the last layout (the axis is laid out within it), else the chart's
        // size less room for the other axis, the legend and the title; a stacked axis gets its share.
        const area = chart?.chartArea;
        const plot = horizontal
          ? (area && area.right > area.left ? area.right - area.left : (chart?.width ?? 0) - 60)
          : (area && area.bottom > area.top ? area.bottom - area.top : (chart?.height ?? 0) - 70);
        const own = horizontal ? context.scale?.width : context.scale?.height;
        const length = own && own > 0 ? Math.min(own, plot) : plot;
        ctx.save();
        ctx.font = `${titleFont.size as number}px ${family}`;
        const fitted = fitAxisTitle(axis.label, length - 4, (text) => ctx.measureText(text).width);
        ctx.restore();
        return fitted;
      },
      color: TEXT_COLOUR,
      font: titleFont,
    },
    // A category axis: ticks at the whole values only (the range runs half a step beyond each end).
    ...(axis.categories ? { min: -0.5, max: axis.categories.length - 0.5, afterBuildTicks: (scale: { ticks: { value: number }[] }) => { scale.ticks = axis.categories!.map((_, i) => ({ value: i })); } } : {}),
    ticks: axis.categories
      ? { color: TEXT_COLOUR, font: font(base - 0.5), padding: 3, stepSize: 1, autoSkip: false, includeBounds: false, maxRotation: 0, callback: categoryTick(axis.categories) }
      : { color: TEXT_COLOUR, font: font(base - 0.5), maxTicksLimit: horizontal ? (axis.stack !== undefined ? 6 : 9) : 8, padding: 3, ...(panel ? { includeBounds: false } : {}) },
    grid: { color: GRID_COLOUR, drawTicks: false, drawOnChartArea: id === 'x' || id === 'y' || axis.stack !== undefined },
    border: { color: PALETTE.grey },
    ...(axis.stack !== undefined ? { stack: axis.stack, stackWeight: axis.stackWeight ?? 1, offset: true } : {}),
  };
}

/** Tick labels of a category axis: the name at each whole value, nothing between. */
function categoryTick(categories: readonly (string | readonly string[])[]): (value: number | string) => string | string[] {
  return (value) => {
    const v = typeof value === 'number' ? value : Number(value);
    const name = Number.isInteger(v) ? categories[v] : undefined;
    return name === undefined ? '' : typeof name === 'string' ? name : [...name];
  };
}

/** True when a series draws something one can see: two distinct points at least. */
function drawsSomething(series: SeriesSpec): boolean {
  let first: { x: number; y: number } | null = null;
  for (const p of series.points) {
    if (!p || !Number.isFinite(p.x) || !Number.isFinite(p.y)) continue;
    if (!first) first = p;
    else if (p.x !== first.x || p.y !== first.y) return true;
  }
  return false;
}

function datasetOf(series: SeriesSpec): ChartJsDataset {
  const colour = PALETTE[series.colour];
  return {
    label: series.label,
    data: toData(series.points),
    xAxisID: series.xAxis ?? 'x',
    yAxisID: series.yAxis ?? 'y',
    showLine: true,
    borderColor: colour,
    backgroundColor: withOpacity(series.colour, series.fill ? 0.18 : 0.9),
    borderWidth: series.width ?? 1.6,
    borderDash: dashPattern(series.style),
    pointRadius: 0,
    pointHoverRadius: 0,
    // The legend sample: a line in the series' dash and width, or a filled box for a filled series.
    pointStyle: series.fill ? 'rect' : 'line',
    tension: 0,
    spanGaps: false,
    fill: series.fill ? 'shape' : false,
    // A series that draws nothing visible has no place in the legend.
    hideInLegend: (series.hideInLegend ?? false) || !drawsSomething(series),
    order: 2,
  };
}

/** The overlay plugin: background, bands, reference lines, marker labels, empty message. */
function overlayPlugin(spec: ChartSpec, fontFamily: string, fontSize: number, background: string | null): ChartJsPlugin {
  const font = (size: number) => `${size}px ${fontFamily}`;
  const label = (ctx: ChartContext2D, text: string, r: Rect) => {
    ctx.fillStyle = 'rgba(255, 255, 255, 0.85)';
    ctx.fillRect(r.x - 1, r.y, r.w + 2, r.h);
    ctx.fillStyle = TEXT_COLOUR;
    ctx.textAlign = 'left';
    ctx.textBaseline = 'middle';
    ctx.fillText(text, r.x, r.y + r.h / 2);
  };
  return {
    id: 'hingelineOverlay',
    beforeDraw(chart) {
      if (background === null) return;
      const ctx = chart.ctx;
      ctx.save();
      ctx.fillStyle = background;
      ctx.fillRect(0, 0, chart.width, chart.height);
      ctx.restore();
    },
    beforeDatasetsDraw(chart) {
      const { ctx, chartArea: area } = chart;
      ctx.save();
      ctx.beginPath();
      ctx.rect(area.left, area.top, area.right - area.left, area.bottom - area.top);
      ctx.clip();
      for (const band of spec.bands) {
        const scale = chart.scales[band.axis];
        if (!scale) continue;
        const a = scale.getPixelForValue(band.from);
        const b = scale.getPixelForValue(band.to);
        ctx.fillStyle = withOpacity(band.colour, 0.13);
        if (band.axis === 'x') ctx.fillRect(Math.min(a, b), area.top, Math.max(Math.abs(b - a), 1), area.bottom - area.top);
        else ctx.fillRect(area.left, Math.min(a, b), area.right - area.left, Math.max(Math.abs(b - a), 1));
      }
      for (const line of spec.referenceLines) {
        const scale = chart.scales[line.axis];
        if (!scale) continue;
        const p = scale.getPixelForValue(line.value);
        ctx.strokeStyle = PALETTE[line.colour];
        ctx.lineWidth = line.style === 'solid' && line.label === '' ? 0.7 : 1;
        ctx.setLineDash(dashPattern(line.style));
        ctx.beginPath();
        if (line.axis === 'x') {
          ctx.moveTo(p, area.top);
          ctx.lineTo(p, area.bottom);
        } else {
          ctx.moveTo(area.left, p);
          ctx.lineTo(area.right, p);
        }
        ctx.stroke();
      }
      ctx.setLineDash([]);
      ctx.restore();
      // Panels side by side (stacked x axes): a rule at the left edge of each panel after the first.
      const panels = (['x', 'x2'] as const).map((id) => (spec[id]?.stack !== undefined ? chart.scales[id] : undefined)).filter((sc): sc is ScaleLike => sc?.left !== undefined);
      if (panels.length > 1) {
        ctx.save();
        ctx.strokeStyle = PALETTE.grey;
        ctx.lineWidth = 1;
        ctx.setLineDash([]);
        for (const sc of panels) {
          if (sc.left! <= area.left + 0.5) continue;
          ctx.beginPath();
          ctx.moveTo(sc.left!, area.top);
          ctx.lineTo(sc.left!, area.bottom);
          ctx.stroke();
        }
        ctx.restore();
      }
    },
    afterDatasetsDraw(chart) {
      const { ctx, chartArea: area } = chart;
      ctx.save();
      ctx.font = font(fontSize - 0.5);
      const height = fontSize + 2;
      const placed: Rect[] = [];
      // Band labels at the top of each band.
      for (const band of spec.bands) {
        const scale = chart.scales[band.axis];
        if (!scale || band.label === '' || band.axis !== 'x') continue;
        const x = Math.min(scale.getPixelForValue(band.from), scale.getPixelForValue(band.to));
        // At the top of the band, or a row lower where an earlier band's label is.
        const rows = [0, 1, 2, 3].map((k) => {
          const r = { x: Math.max(x + 2, area.left + 2), y: area.top + 2 + k * height, w: ctx.measureText(band.label).width, h: height };
          if (r.x + r.w > area.right) r.x = area.right - r.w - 2;
          return r;
        });
        const r = rows.find((c) => !placed.some((q) => overlaps(c, q))) ?? rows[0]!;
        label(ctx, band.label, r);
        placed.push(r);
      }
      // Reference line labels: at the right end of horizontal lines, the top of vertical ones.
      for (const line of spec.referenceLines) {
        const scale = chart.scales[line.axis];
        if (!scale || line.label === '') continue;
        const p = scale.getPixelForValue(line.value);
        const w = ctx.measureText(line.label).width;
        const candidates: Rect[] = line.axis === 'y'
          ? [{ x: area.right - w - 4, y: p - height - 1, w, h: height }, { x: area.right - w - 4, y: p + 1, w, h: height }, { x: area.left + 4, y: p - height - 1, w, h: height }]
          : [0, 1, 2, 3].flatMap((k) => [{ x: p + 3, y: area.top + 2 + k * height, w, h: height }, { x: p - w - 3, y: area.top + 2 + k * height, w, h: height }]);
        const r = candidates.find((c) => inside(c, area) && !placed.some((q) => overlaps(c, q))) ?? candidates.find((c) => inside(c, area));
        if (!r) continue;
        label(ctx, line.label, r);
        placed.push(r);
      }
      // Marker labels. Markers within a few pixels of each other (peak and ultimate at the end of
      // a curve) share one label; each label tries places around its marker, nearest first, clear
      // of earlier labels and of every marker, inside the marker's own panel.
      const positioned = spec.markers.flatMap((m) => {
        const xs = chart.scales[m.xAxis ?? 'x'];
        const ys = chart.scales[m.yAxis ?? 'y'];
        if (!xs || !ys) return [];
        const px = xs.getPixelForValue(m.x);
        const py = ys.getPixelForValue(m.y);
        return Number.isFinite(px) && Number.isFinite(py) ? [{ m, px, py, bounds: panelOf(xs, area) }] : [];
      });
      const markerBoxes: Rect[] = positioned.map(({ px, py }) => ({ x: px - 4, y: py - 4, w: 8, h: 8 }));
      const groups: { px: number; py: number; texts: string[]; bounds: ChartInstanceLike['chartArea'] }[] = [];
      for (const { m, px, py, bounds } of positioned) {
        if (m.label === '') continue;
        const near = groups.find((g) => g.bounds.left === bounds.left && g.bounds.right === bounds.right && Math.hypot(g.px - px, g.py - py) < 7);
        if (near) {
          if (!near.texts.includes(m.label)) near.texts.push(m.label);
        } else groups.push({ px, py, texts: [m.label], bounds });
      }
      for (const { px, py, texts, bounds } of groups) {
        const text = texts.join(', ');
        const w = ctx.measureText(text).width;
        const candidates: Rect[] = [];
        for (const reach of [0, 1, 2, 3, 4, 5]) {
          const d = reach * (height + 1);
          candidates.push(
            { x: px + 6, y: py - height - 2 - d, w, h: height },
            { x: px + 6, y: py + 2 + d, w, h: height },
            { x: px - w - 6, y: py - height - 2 - d, w, h: height },
            { x: px - w - 6, y: py + 2 + d, w, h: height },
          );
          if (reach === 0) candidates.push({ x: px - w / 2, y: py - height - 6, w, h: height }, { x: px - w / 2, y: py + 6, w, h: height }, { x: px + 8, y: py - height / 2, w, h: height }, { x: px - w - 8, y: py - height / 2, w, h: height });
        }
        const within = (c: Rect) => inside(c, bounds);
        const clear = (c: Rect) => within(c) && !placed.some((q) => overlaps(c, q)) && !markerBoxes.some((q) => overlaps(c, q));
        const r = candidates.find(clear) ?? candidates.find((c) => within(c) && !placed.some((q) => overlaps(c, q))) ?? candidates.find((c) => inside(c, area) && !placed.some((q) => overlaps(c, q))) ?? candidates.find(within) ?? candidates[0]!;
        // A label moved away from its marker gets a thin leader line.
        const nx = Math.min(Math.max(px, r.x), r.x + r.w);
        const ny = Math.min(Math.max(py, r.y), r.y + r.h);
        if (Math.hypot(nx - px, ny - py) > height + 4) {
          ctx.strokeStyle = PALETTE.grey;
          ctx.lineWidth = 0.6;
          ctx.beginPath();
          ctx.moveTo(px, py);
          ctx.lineTo(nx, ny);
          ctx.stroke();
        }
        label(ctx, text, r);
        placed.push(r);
      }
      if (spec.emptyMessage) {
        ctx.font = font(fontSize + 1);
        ctx.fillStyle = TEXT_COLOUR;
        ctx.textAlign = 'center';
        ctx.textBaseline = 'middle';
        ctx.fillText(spec.emptyMessage, (area.left + area.right) / 2, (area.top + area.bottom) / 2);
      }
      ctx.restore();
    },
  };
}

/**
 * chart.js configuration of a chart spec. The numbers are used as they are (the spec is already in
 * display units); axis titles, ranges and reversal come from the spec's axes.
 * The result holds functions (legend filter, plugin hooks), so it is for direct use, not for
 * serialisation. Deterministic: the same spec and options give the same configuration and, on the
 * same canvas implementation, the same drawing.
 */
export function toChartJsConfig(spec: ChartSpec, options: ChartJsConfigOptions = {}): ChartJsConfig {
  const family = options.fontFamily ?? 'Roboto';
  const size = options.fontSize ?? 9;
  const font = (s: number, weight?: string) => ({ family, size: s, ...(weight ? { weight } : {}) });
  const datasets: ChartJsDataset[] = spec.series.map(datasetOf);
  if (spec.markers.length > 0) {
    const byAxes = new Map<string, typeof spec.markers[number][]>();
    for (const m of spec.markers) {
      const key = `${m.xAxis ?? 'x'}|${m.yAxis ?? 'y'}`;
      byAxes.set(key, [...(byAxes.get(key) ?? []), m]);
    }
    for (const [key, markers] of byAxes) {
      const [xAxisID, yAxisID] = key.split('|') as [string, string];
      datasets.push({
        label: 'markers',
        data: markers.map((m) => ({ x: m.x, y: m.y })),
        xAxisID,
        yAxisID,
        showLine: false,
        pointStyle: markers.map((m) => POINT_STYLE[m.shape]),
        pointRadius: 4,
        pointHoverRadius: 5,
        pointBorderWidth: 1.4,
        pointBackgroundColor: markers.map((m) => (m.shape === 'cross' ? PALETTE[m.colour] : withOpacity(m.colour, 0.85))),
        pointBorderColor: markers.map((m) => PALETTE[m.colour]),
        hideInLegend: true,
        order: 0,
      });
    }
  }
  const scales: Record<string, unknown> = {
    x: axisOptions(spec.x, 'x', font, size, family, spec),
    y: axisOptions(spec.y, 'y', font, size, family, spec),
  };
  if (spec.x2) scales.x2 = axisOptions(spec.x2, 'x2', font, size, family, spec);
  if (spec.y2) scales.y2 = axisOptions(spec.y2, 'y2', font, size, family, spec);
  const showTitle = options.title ?? true;
  const legendWanted = (options.legend ?? true) && datasets.some((d) => d.label !== 'markers' && !d.hideInLegend);
  return {
    type: 'scatter',
    data: { datasets },
    options: {
      responsive: false,
      maintainAspectRatio: false,
      animation: false,
      devicePixelRatio: options.devicePixelRatio ?? 1,
      locale: 'en-US',
      layout: { padding: { left: 4, right: 10, top: 2, bottom: 2 } },
      scales,
      plugins: {
        title: { display: showTitle, text: spec.title, color: PALETTE.ink, font: font(size + 2, '500'), padding: { top: 2, bottom: spec.subtitle ? 1 : 6 } },
        subtitle: { display: showTitle && spec.subtitle !== '', text: spec.subtitle, color: TEXT_COLOUR, font: font(size - 0.5), padding: { bottom: 6 } },
        legend: {
          display: legendWanted,
          position: 'bottom',
          labels: {
            color: TEXT_COLOUR,
            font: font(size - 0.5),
            usePointStyle: true,
            // Samples long enough to tell a dashed line (6 on, 4 off) from a solid one.
            pointStyleWidth: 34,
            boxWidth: 34,
            boxHeight: 8,
            padding: 10,
            filter: (item: { datasetIndex?: number }, data: { datasets: { hideInLegend?: boolean }[] }) => !(data.datasets[item.datasetIndex ?? -1]?.hideInLegend ?? false),
            // chart.js would draw point-style samples with the style of a point (solid, width 1):
            // the sample is the series' own line instead, with its dash, width and colour.
            generateLabels: (chart: { data: { datasets: readonly ChartJsDataset[] }; isDatasetVisible?: (index: number) => boolean }) => chart.data.datasets.map((d, i) => ({
              text: d.label,
              datasetIndex: i,
              hidden: chart.isDatasetVisible ? !chart.isDatasetVisible(i) : false,
              fillStyle: d.backgroundColor,
              strokeStyle: d.borderColor,
              lineWidth: d.borderWidth,
              lineDash: d.borderDash,
              pointStyle: d.pointStyle,
              fontColor: TEXT_COLOUR,
            })),
          },
        },
        tooltip: { enabled: options.tooltips ?? false },
      },
    },
    plugins: [overlayPlugin(spec, family, size, options.background === undefined ? '#ffffff' : options.background)],
    ...(options.platform !== undefined ? { platform: options.platform } : {}),
  };
}
