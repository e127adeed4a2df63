import { describe, expect, it } from 'vitest';
import { fitAxisTitle, toChartJsConfig, type ChartContext2D, type ChartInstanceLike } from '../../../core/charts/chartjs-config.ts';
import type { ChartSpec } from '../../../core/charts/types.ts';
import { PALETTE } from '../../../core/charts/palette.ts';

const spec = (over: Partial<ChartSpec> = {}): ChartSpec => ({
  kind: 'load-deflection',
  title: 'Load–deflection',
  subtitle: 'test',
  x: { label: 'Deflection Δ (mm)', unit: 'mm', scale: 1, includeZero: true },
  y: { label: 'Total load P (kN)', unit: 'kN', scale: 1, includeZero: true },
  series: [
    { id: 'a', label: 'curve', points: [{ x: 0, y: 0 }, null, { x: 10, y: 50 }], colour: 'blue', style: 'solid' },
    { id: 'b', label: 'hidden', points: [{ x: 0, y: 0 }, { x: 5, y: 5 }], colour: 'orange', style: 'dashed', hideInLegend: true, yAxis: 'y2' },
  ],
  markers: [
    { x: 10, y: 50, label: 'ultimate', shape: 'cross', colour: 'red' },
    { x: 10, y: 49, label: 'peak', shape: 'star', colour: 'ink' },
  ],
  bands: [{ axis: 'x', from: 2, to: 3, label: 'plastic hinge zone', colour: 'red' }],
  referenceLines: [{ axis: 'y', value: 20, label: 'service load (λ = 1)', colour: 'green', style: 'dashed' }],
  notes: [],
  y2: { label: 'second', unit: '', scale: 1, stack: 'panels', stackWeight: 2 },
  ...over,
});

/** A 2D context that records what the overlay draws. */
function recorder(): { ctx: ChartContext2D; texts: { text: string; x: number; y: number }[]; rects: number[][] } {
  const texts: { text: string; x: number; y: number }[] = [];
  const rects: number[][] = [];
  const ctx: ChartContext2D = {
    save() {}, restore() {}, beginPath() {}, moveTo() {}, lineTo() {}, rect() {}, clip() {}, stroke() {}, setLineDash() {},
    fillRect(x, y, w, h) { rects.push([x, y, w, h]); },
    fillText(text, x, y) { texts.push({ text, x, y }); },
    measureText(text) { return { width: text.length * 5 }; },
    fillStyle: '', strokeStyle: '', lineWidth: 1, font: '', textAlign: 'left', textBaseline: 'alphabetic',
  };
  return { ctx, texts, rects };
}

function chart(ctx: ChartContext2D): ChartInstanceLike {
  const linear = (px0: number, px1: number, v0: number, v1: number) => ({ getPixelForValue: (v: number) => px0 + ((v - v0) / (v1 - v0)) * (px1 - px0) });
  return { ctx, width: 500, height: 300, chartArea: { left: 40, right: 480, top: 20, bottom: 260 }, scales: { x: linear(40, 480, 0, 12), y: linear(260, 20, 0, 60), y2: linear(260, 20, 0, 10) } };
}

describe('chart.js configuration from a chart spec', () => {
  it('maps series to scatter datasets in display units, with gaps as null points and dashes by style', () => {
    const config = toChartJsConfig(spec());
    expect(config.type).toBe('scatter');
    const [a, b] = config.data.datasets;
    expect(a!.data).toEqual([{ x: 0, y: 0 }, { x: null, y: null }, { x: 10, y: 50 }]);
    expect(a!.borderColor).toBe(PALETTE.blue);
    expect(b!.borderDash).toEqual([6, 4]);
    expect(b!.yAxisID).toBe('y2');
  });

  it('puts the markers in one point dataset with a chart.js point style per shape, left out of the legend', () => {
    const config = toChartJsConfig(spec());
    const markers = config.data.datasets.find((d) => d.label === 'markers')!;
    expect(markers.pointStyle).toEqual(['crossRot', 'star']);
    const filter = ((config.options.plugins as Record<string, { labels?: { filter: (item: { datasetIndex: number }, data: { datasets: { hideInLegend?: boolean }[] }) => boolean } }>).legend!.labels!.filter);
    const data = { datasets: config.data.datasets as unknown as { hideInLegend?: boolean }[] };
    expect(config.data.datasets.map((_, i) => filter({ datasetIndex: i }, data))).toEqual([true, false, false]);
  });

  it('writes axis titles and ranges from the spec, and stacks panels that share a stack', () => {
    const config = toChartJsConfig(spec({ x: { label: 'X (mm)', unit: 'mm', scale: 1, min: -5, max: 5, reverse: true } }));
    const scales = config.options.scales as Record<string, Record<string, unknown>>;
    const title = (scales.x!.title as { text: (context: object) => string | string[] }).text;
    // Without a drawing context (no measuring possible) the title is the spec's label.
    expect(title({})).toBe('X (mm)');
    expect(scales.x!.min).toBe(-5);
    expect(scales.x!.reverse).toBe(true);
    expect(scales.x!.grace).toBeUndefined();
    expect(scales.y2!.stack).toBe('panels');
    expect(scales.y2!.stackWeight).toBe(2);
    expect(config.options.responsive).toBe(false);
    expect(config.options.animation).toBe(false);
    expect(config.options.locale).toBe('en-US');
  });

  it('draws reference-line, band and marker labels inside the plot without overlapping each other', () => {
    const config = toChartJsConfig(spec());
    const overlay = config.plugins[0]!;
    const { ctx, texts, rects } = recorder();
    const c = chart(ctx);
    overlay.beforeDraw!(c);
    overlay.beforeDatasetsDraw!(c);
    overlay.afterDatasetsDraw!(c);
    expect(rects[0]).toEqual([0, 0, 500, 300]);
    // 'ultimate' (10, 50) and 'peak' (10, 49) are 4 px apart: one label names both.
    expect(texts.map((t) => t.text).sort()).toEqual(['plastic hinge zone', 'service load (λ = 1)', 'ultimate, peak']);
    const boxes = texts.map((t) => ({ x: t.x, y: t.y, w: t.text.length * 5 }));
    for (const b of boxes) {
      expect(b.x).toBeGreaterThanOrEqual(40);
      expect(b.x + b.w).toBeLessThanOrEqual(480);
    }
    for (let i = 0; i < boxes.length; i++) {
      for (let j = i + 1; j < boxes.length; j++) {
        const a = boxes[i]!;
        const b = boxes[j]!;
        const apart = a.x + a.w <= b.x || b.x + b.w <= a.x || Math.abs(a.y - b.y) >= 10;
        expect(apart).toBe(true);
      }
    }
  });

  it('labels markers apart from each other and from every marker, also when many crowd one corner', () => {
    const crowd = spec({
      bands: [],
      referenceLines: [],
      markers: [0, 1, 2, 3, 4, 5].map((i) => ({ x: 0.3 + 0.25 * i, y: 2 + 1.5 * i, label: `point ${i}`, shape: 'circle' as const, colour: 'blue' as const })),
    });
    const { ctx, texts } = recorder();
    toChartJsConfig(crowd).plugins[0]!.afterDatasetsDraw!(chart(ctx));
    expect(texts.map((t) => t.text).sort()).toEqual(['point 0', 'point 1', 'point 2', 'point 3', 'point 4', 'point 5']);
    const boxes = texts.map((t) => ({ x: t.x, top: t.y - 5.5, w: t.text.length * 5, h: 11 }));
    for (let i = 0; i < boxes.length; i++) {
      for (let j = i + 1; j < boxes.length; j++) {
        const a = boxes[i]!;
        const b = boxes[j]!;
        expect(a.x + a.w <= b.x || b.x + b.w <= a.x || a.top + a.h <= b.top || b.top + b.h <= a.top, `${texts[i]!.text} / ${texts[j]!.text}`).toBe(true);
      }
    }
  });

  it('keeps a label inside the panel of its marker when x axes stand side by side', () => {
    const panels = spec({
      bands: [],
      referenceLines: [],
      x: { label: 'φ, sagging', unit: '', scale: 1, stack: 'panels', panelMargin: 0.04 },
      x2: { label: 'φ, hogging', unit: '', scale: 1, stack: 'panels', panelMargin: 0.04 },
      series: [{ id: 'h', label: 'hogging', points: [{ x: 0, y: 0 }, { x: 1, y: 40 }], colour: 'orange', style: 'solid', xAxis: 'x2' }],
      markers: [{ x: 1, y: 40, label: 'a rather long label', shape: 'cross', colour: 'orange', xAxis: 'x2' }],
    });
    const { ctx, texts } = recorder();
    const linear = (px0: number, px1: number, v0: number, v1: number) => ({ getPixelForValue: (v: number) => px0 + ((v - v0) / (v1 - v0)) * (px1 - px0), left: px0, right: px1 });
    const c: ChartInstanceLike = { ctx, width: 500, height: 300, chartArea: { left: 40, right: 480, top: 20, bottom: 260 }, scales: { x: linear(40, 260, 0, 10), x2: linear(260, 480, 0, 1.05), y: { getPixelForValue: (v: number) => 260 - v * 4 } } };
    toChartJsConfig(panels).plugins[0]!.afterDatasetsDraw!(c);
    const text = texts.find((t) => t.text === 'a rather long label')!;
    expect(text.x).toBeGreaterThanOrEqual(260);
    expect(text.x + 'a rather long label'.length * 5).toBeLessThanOrEqual(480);
  });

  it('gives panels their own range with a margin, ticks at round values only', () => {
    const panels = spec({
      x: { label: 'φ, sagging', unit: '', scale: 1, includeZero: true, stack: 'panels', panelMargin: 0.05 },
      x2: { label: 'φ, hogging', unit: '', scale: 1, includeZero: true, stack: 'panels', panelMargin: 0.05 },
      series: [{ id: 's', label: 'sagging', points: [{ x: 0, y: 0 }, { x: 2, y: 40 }], colour: 'blue', style: 'solid' }, { id: 'h', label: 'hogging', points: [{ x: 0, y: 0 }, { x: 0.1, y: 30 }], colour: 'orange', style: 'solid', xAxis: 'x2' }],
      markers: [],
    });
    const scales = toChartJsConfig(panels).options.scales as Record<string, Record<string, unknown>>;
    expect(scales.x!.min).toBeCloseTo(-0.1, 12);
    expect(scales.x!.max).toBeCloseTo(2.1, 12);
    expect(scales.x2!.min).toBeCloseTo(-0.005, 12);
    expect(scales.x2!.max).toBeCloseTo(0.105, 12);
    expect((scales.x2!.ticks as { includeBounds: boolean }).includeBounds).toBe(false);
    expect(scales.x2!.stack).toBe('panels');
  });

  it('leaves a series that draws nothing out of the legend, and draws legend samples long enough to show a dash', () => {
    const config = toChartJsConfig(spec({
      series: [
        { id: 'a', label: 'curve', points: [{ x: 0, y: 0 }, { x: 10, y: 50 }], colour: 'blue', style: 'solid' },
        { id: 'b', label: 'mechanism', points: [{ x: 10, y: 50 }, { x: 10, y: 50 }, { x: 10, y: 50 }], colour: 'orange', style: 'dashed' },
        { id: 'c', label: 'one point', points: [{ x: 3, y: 3 }, null], colour: 'green', style: 'solid' },
      ],
    }));
    expect(config.data.datasets.slice(0, 3).map((d) => d.hideInLegend)).toEqual([false, true, true]);
    const labels = (config.options.plugins as { legend: { labels: { pointStyleWidth: number; usePointStyle: boolean } } }).legend.labels;
    expect(labels.usePointStyle).toBe(true);
    // dashPattern('dashed') = [6, 4]: a 34 px sample shows three dashes and more.
    expect(labels.pointStyleWidth).toBeGreaterThanOrEqual(30);
    // The sample is drawn with the series' own dash and width (not a point's solid 1 px border).
    const generate = (config.options.plugins as { legend: { labels: { generateLabels: (chart: object) => { text: string; lineDash: number[]; lineWidth: number; pointStyle: string }[] } } }).legend.labels.generateLabels;
    const items = generate({ data: config.data, isDatasetVisible: () => true });
    expect(items[1]).toMatchObject({ text: 'mechanism', lineDash: [6, 4], pointStyle: 'line' });
    expect(items[0]!.lineWidth).toBe(1.6);
  });

  it('fits an axis title to its axis on one line, or on two (name, then unit), never cut', () => {
    const measure = (text: string) => text.length * 6;
    expect(fitAxisTitle('Stress σ, compression + (psi)', 400, measure)).toBe('Stress σ, compression + (psi)');
    expect(fitAxisTitle('Stress σ, compression + (psi)', 150, measure)).toEqual(['Stress σ, compression +', '(psi)']);
    expect(fitAxisTitle('Bending moment M, sagging + (kip·ft)', 100, measure)).toEqual(['Bending moment M,', 'sagging +', '(kip·ft)']);
    expect(fitAxisTitle('Deflection', 10, measure)).toEqual(['Deflection']);
  });

  it('writes the reason in place of the plot when there is nothing to show', () => {
    const config = toChartJsConfig(spec({ series: [], markers: [], bands: [], referenceLines: [], emptyMessage: 'No curve.' }));
    const { ctx, texts } = recorder();
    config.plugins[0]!.afterDatasetsDraw!(chart(ctx));
    expect(texts).toEqual([{ text: 'No curve.', x: 260, y: 140 }]);
    expect((config.options.plugins as { legend: { display: boolean } }).legend.display).toBe(false);
  });

  it('passes a platform through and leaves the background transparent when asked', () => {
    const platform = class {};
    const config = toChartJsConfig(spec(), { platform, background: null, devicePixelRatio: 2 });
    expect(config.platform).toBe(platform);
    expect(config.options.devicePixelRatio).toBe(2);
    const { ctx, rects } = recorder();
    config.plugins[0]!.beforeDraw!(chart(ctx));
    expect(rects).toHaveLength(0);
  });
});
