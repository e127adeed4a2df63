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
  readonly scales: Readonly<Record<string, { getPixelForValue(value: number): number } | undefined>>;
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

function toData(points: readonly ChartPoint[]): { x: number | null; y: number | null }[] {
  return points.map((p) => (p === null ? { x: null, y: null } : { x: p.x, y: p.y }));
}

function axisOptions(axis: AxisSpec, id: 'x' | 'y' | 'x2' | 'y2', font: (size: number, weight?: string) => Record<string, unknown>, base: number): Record<string, unknown> {
  const horizontal = id.startsWith('x');
  return {
    type: 'linear',
    axis: horizontal ? 'x' : 'y',
    position: axis.position ?? (horizontal ? 'bottom' : 'left'),
    reverse: axis.reverse ?? false,
    beginAtZero: axis.includeZero ?? false,
    // Head room so that markers and their labels at the ends of the data stay inside the plot.
    ...(axis.min === undefined && axis.max === undefined ? { grace: '5%' } : {}),
    ...(axis.min !== undefined ? { min: axis.min } : {}),
    ...(axis.max !== undefined ? { max: axis.max } : {}),
    title: { display: true, text: axis.label, color: TEXT_COLOUR, font: font(base) },
    ticks: { color: TEXT_COLOUR, font: font(base - 0.5), maxTicksLimit: horizontal ? 9 : 8, padding: 3 },
    grid: { color: GRID_COLOUR, drawTicks: false, drawOnChartArea: id === 'x' || id === 'y' || axis.stack !== undefined },
    border: { color: PALETTE.grey },
    ...(axis.stack !== undefined ? { stack: axis.stack, stackWeight: axis.stackWeight ?? 1, offset: true } : {}),
  };
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
    pointStyle: 'line',
    tension: 0,
    spanGaps: false,
    fill: series.fill ? 'shape' : false,
    hideInLegend: series.hideInLegend ?? false,
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
        const r = { x: Math.max(x + 2, area.left + 2), y: area.top + 2, w: ctx.measureText(band.label).width, h: height };
        if (r.x + r.w > area.right) r.x = area.right - r.w - 2;
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
      // Marker labels: try eight places around each marker, keep clear of earlier labels and markers.
      const markerBoxes: Rect[] = spec.markers.flatMap((m) => {
        const xs = chart.scales[m.xAxis ?? 'x'];
        const ys = chart.scales[m.yAxis ?? 'y'];
        if (!xs || !ys) return [];
        return [{ x: xs.getPixelForValue(m.x) - 4, y: ys.getPixelForValue(m.y) - 4, w: 8, h: 8 }];
      });
      for (const m of spec.markers) {
        if (m.label === '') continue;
        const xs = chart.scales[m.xAxis ?? 'x'];
        const ys = chart.scales[m.yAxis ?? 'y'];
        if (!xs || !ys) continue;
        const px = xs.getPixelForValue(m.x);
        const py = ys.getPixelForValue(m.y);
        const w = ctx.measureText(m.label).width;
        const candidates: Rect[] = [];
        for (const reach of [0, 1, 2, 3]) {
          const d = reach * (height + 1);
          candidates.push(
            { x: px + 6, y: py - height - 2 - d, w, h: height },
            { x: px + 6, y: py + 2 + d, w, h: height },
            { x: px - w - 6, y: py - height - 2 - d, w, h: height },
            { x: px - w - 6, y: py + 2 + d, w, h: height },
          );
          if (reach === 0) candidates.push({ x: px - w / 2, y: py - height - 6, w, h: height }, { x: px - w / 2, y: py + 6, w, h: height });
        }
        const clear = (c: Rect) => inside(c, area) && !placed.some((q) => overlaps(c, q)) && !markerBoxes.some((q) => overlaps(c, q));
        const r = candidates.find(clear) ?? candidates.find((c) => inside(c, area) && !placed.some((q) => overlaps(c, q))) ?? candidates.find((c) => inside(c, area)) ?? candidates[0]!;
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
        label(ctx, m.label, r);
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
    x: axisOptions(spec.x, 'x', font, size),
    y: axisOptions(spec.y, 'y', font, size),
  };
  if (spec.x2) scales.x2 = axisOptions(spec.x2, 'x2', font, size);
  if (spec.y2) scales.y2 = axisOptions(spec.y2, 'y2', font, size);
  const showTitle = options.title ?? true;
  const legendWanted = (options.legend ?? true) && spec.series.some((s) => !s.hideInLegend);
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
            boxWidth: 18,
            boxHeight: 6,
            padding: 8,
            filter: (item: { datasetIndex?: number }, data: { datasets: { hideInLegend?: boolean }[] }) => !(data.datasets[item.datasetIndex ?? -1]?.hideInLegend ?? false),
          },
        },
        tooltip: { enabled: options.tooltips ?? false },
      },
    },
    plugins: [overlayPlugin(spec, family, size, options.background === undefined ? '#ffffff' : options.background)],
    ...(options.platform !== undefined ? { platform: options.platform } : {}),
  };
}
