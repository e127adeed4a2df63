import { describe, expect, it } from 'vitest';
import { toChartJsConfig, type ChartContext2D, type ChartInstanceLike } from '../../../core/charts/chartjs-config.ts';
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
    expect((scales.x!.title as { text: string }).text).toBe('X (mm)');
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
    expect(texts.map((t) => t.text).sort()).toEqual(['peak', 'plastic hinge zone', 'service load (λ = 1)', 'ultimate']);
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
