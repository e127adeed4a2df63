/**
 * ChartCanvas draws a core chart spec through core's toChartJsConfig, updates the same chart in
 * place when the spec changes, describes the chart in words, and reports clicks. happy-dom has no
 * canvas: a recording 2D context stands in for it.
 */
import { mount } from '@vue/test-utils';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { momentCurvatureChart } from '../../../core/charts/moment-curvature.ts';
import type { ChartSpec } from '../../../core/charts/types.ts';
import ChartCanvas from '../../../renderer/src/components/ChartCanvas.vue';

const drawn: string[] = [];

/** A 2D context that accepts every call and records the text drawn. */
function recordingContext(canvas: HTMLCanvasElement): CanvasRenderingContext2D {
  const state: Record<string | symbol, unknown> = { canvas, font: '10px sans-serif', lineWidth: 1 };
  return new Proxy(state, {
    get(target, key) {
      if (key in target) return target[key];
      if (key === 'measureText') return (text: string) => ({ width: text.length * 6, actualBoundingBoxAscent: 8, actualBoundingBoxDescent: 2 });
      if (key === 'fillText') return (text: string) => void drawn.push(text);
      if (key === 'createLinearGradient' || key === 'createRadialGradient' || key === 'createPattern') return () => ({ addColorStop: () => undefined });
      if (key === 'getImageData') return () => ({ data: new Uint8ClampedArray(4) });
      if (key === 'getLineDash') return () => [];
      if (key === 'getTransform') return () => ({ a: 1, d: 1 });
      if (key === 'isPointInPath') return () => false;
      return () => undefined;
    },
    set(target, key, value) {
      target[key] = value;
      return true;
    },
  }) as unknown as CanvasRenderingContext2D;
}

beforeAll(() => {
  vi.spyOn(HTMLCanvasElement.prototype, 'getContext').mockImplementation(function (this: HTMLCanvasElement) {
    return recordingContext(this);
  } as never);
});
afterAll(() => {
  vi.restoreAllMocks();
});

function spec(title: string, moment: number, system: 'si' | 'us' = 'si'): ChartSpec {
  const point = (curvature: number, m: number) => ({ curvature, moment: m, neutralAxisDepth: 100, compressionFaceStrain: 0, tensionFaceStrain: 0, maxSteelTensileStrain: 0, referenceStrain: 0, residual: 0 });
  return {
    ...momentCurvatureChart({
      direction: 'sagging',
      status: { kind: 'complete', ultimateCause: 'concrete-crushing', message: 'Ultimate: concrete crushing.' },
      concreteLimits: { codeCrushingStrain: 0.003, codeCrushingSource: 'ACI 318-19 22.2.2.1', ultimateStrain: null },
      points: [point(0, 0), point(1e-6, moment * 0.8), point(5e-5, moment)],
      keyPoints: {},
      curvatureDuctility: null,
      firstYieldCurvatureDuctility: null,
      warnings: [],
      solves: 3,
    }, system),
    title,
  };
}

describe('ChartCanvas', () => {
  it('draws the spec with chart.js and describes it for screen readers', async () => {
    const wrapper = mount(ChartCanvas, { props: { spec: spec('Moment–curvature A', 2e8) }, attachTo: document.body });
    const exposed = wrapper.vm as unknown as { chart: { data: { datasets: { label: string; data: { x: number; y: number }[] }[] } } | null };
    expect(exposed.chart).not.toBeNull();
    expect(exposed.chart!.data.datasets[0]!.label).toBe('computed, sagging');
    // 2e8 N·mm = 200 kN·m (display units of core/units)
    expect(exposed.chart!.data.datasets[0]!.data[2]!.y).toBeCloseTo(200, 9);
    const label = wrapper.get('canvas').attributes('aria-label');
    expect(label).toContain('Moment–curvature A');
    expect(label).toContain('Curvature φ');
    expect(wrapper.text()).toContain('Moment–curvature A');
    wrapper.unmount();
  });

  it('updates the same chart in place when the spec changes', async () => {
    const wrapper = mount(ChartCanvas, { props: { spec: spec('A', 2e8) }, attachTo: document.body });
    const exposed = wrapper.vm as unknown as { chart: { data: { datasets: { data: { y: number }[] }[] } } | null };
    const first = exposed.chart;
    await wrapper.setProps({ spec: spec('B', 3e8) });
    expect(exposed.chart).toBe(first);
    expect(exposed.chart!.data.datasets[0]!.data[2]!.y).toBeCloseTo(300, 9);
    expect(performance.getEntriesByName('hl:chart:moment-curvature').length).toBeGreaterThanOrEqual(2);
    wrapper.unmount();
  });

  it('names a clicked point with the axis factor put back (0.00127 1/in, not 1.27 1/in)', () => {
    const us = spec('US', 2e8, 'us');
    // 5e-5 1/mm × 25.4 mm/in = 1.27e-3 1/in (NIST SP 811 B.8): plotted as 1.27 on a ×10⁻³ axis
    expect(us.x.scale).toBe(1e-3);
    const wrapper = mount(ChartCanvas, { props: { spec: us, clickable: true }, attachTo: document.body });
    const exposed = wrapper.vm as unknown as { chart: { options: { plugins: { tooltip: { callbacks: { label: (item: object) => string } } } }; data: { datasets: { data: { x: number; y: number }[] }[] } } };
    const point = exposed.chart.data.datasets[0]!.data[2]!;
    expect(point.x).toBeCloseTo(1.27, 9);
    const text = exposed.chart.options.plugins.tooltip.callbacks.label({ datasetIndex: 0, dataIndex: 2, parsed: point });
    expect(text).toMatch(/^computed, sagging: 1\.27(0)?×10⁻³ 1\/in, \d+(\.\d+)? kip·ft$/);
    wrapper.unmount();
  });

  it('shows the spec’s notes under the chart', () => {
    const withNotes: ChartSpec = { ...spec('A', 2e8), notes: ['sagging: not converged at φ = 1e-4 1/mm'] };
    const wrapper = mount(ChartCanvas, { props: { spec: withNotes }, attachTo: document.body });
    expect(wrapper.get('.notes').text()).toContain('not converged');
    wrapper.unmount();
  });
});
