/**
 * The moment–curvature view: the chart spec comes from core's builder for the section shown, the
 * key points are listed, and choosing one shows the strain and stress over the depth from the
 * state the results hold; a point between key points asks the worker for its state.
 */
import { mount } from '@vue/test-utils';
import { defineComponent, h, type PropType } from 'vue';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { analyzeMembers } from '../../../core/analysis.ts';
import type { ChartSpec } from '../../../core/charts/types.ts';
import { demoProjectSI } from '../../../core/project/demo.ts';
import { memberKeyResults } from '../../../core/project/key-results.ts';
import { useAnalysisStore } from '../../../renderer/src/stores/analysis.ts';
import MomentCurvaturePanel from '../../../renderer/src/views/member/MomentCurvaturePanel.vue';
import { setWorkerFactory } from '../../../renderer/src/workers/engine.ts';
import { silentFactory, testEnvironment } from '../support.ts';
import type { MemberResult } from '../../../core/assessment/results.ts';

/** Stands in for the canvas chart: shows the spec's title and lets the test click a plotted point. */
const ChartStub = defineComponent({
  props: { spec: { type: Object as PropType<ChartSpec>, required: true }, testid: { type: String, default: '' } },
  emits: ['pick'],
  setup(props) {
    return () => h('div', { class: 'chart-stub', 'data-testid': props.testid, 'data-title': props.spec.title, 'data-series': props.spec.series.map((s) => s.label).join('|') });
  },
});

let result: MemberResult;
const project = demoProjectSI();

beforeAll(() => {
  result = analyzeMembers(project, ['MB-2'])[0]!;
});

function panel() {
  const env = testEnvironment();
  setWorkerFactory(silentFactory);
  const key = memberKeyResults(result, project.members.find((m) => m.id === 'MB-2'));
  const wrapper = mount(MomentCurvaturePanel, {
    props: { result, keyResults: key, system: 'si' },
    global: { plugins: [env.pinia], stubs: { ChartCanvas: ChartStub } },
  });
  return { wrapper, key, analysis: useAnalysisStore() };
}

describe('MomentCurvaturePanel', () => {
  it('shows the critical section in its governing direction first', () => {
    const { wrapper, key } = panel();
    const chart = wrapper.get('[data-testid=chart-moment-curvature]');
    const critical = result.sections.find((s) => s.sectionId === key.critical!.sectionId)!;
    expect(chart.attributes('data-title')).toBe(`Moment–curvature, section ${critical.sectionName}`);
    expect(chart.attributes('data-series')).toContain(`computed, ${key.critical!.direction}`);
  });

  it('draws both directions on request', async () => {
    const { wrapper } = panel();
    await wrapper.get('[data-testid=direction-both]').trigger('click');
    const series = wrapper.get('[data-testid=chart-moment-curvature]').attributes('data-series')!;
    expect(series).toContain('computed, sagging');
    expect(series).toContain('computed, hogging');
  });

  it('shows the strain and stress profile of a key point from the results', async () => {
    const { wrapper, key } = panel();
    const rows = wrapper.findAll('[data-testid=key-points] tbody tr.clickable');
    const firstYield = rows.find((r) => r.text().startsWith('first yield'))!;
    await firstYield.trigger('click');
    const profile = wrapper.get('[data-testid=section-profile]');
    expect(profile.text()).toContain(`first yield M′y, ${key.critical!.direction}`);
    const section = result.sections.find((s) => s.sectionId === key.critical!.sectionId)!;
    const state = section[key.critical!.direction]!.keyPoints.firstYield!.state;
    expect(profile.findAll('tbody tr').length).toBe(state.elements.length + 1);
    expect(wrapper.find('[data-testid=chart-strain-profile]').exists()).toBe(true);
    expect(wrapper.find('[data-testid=chart-stress-profile]').exists()).toBe(true);
  });

  it('asks the worker for the state at a clicked point between key points', async () => {
    const { wrapper, analysis, key } = panel();
    const section = result.sections.find((s) => s.sectionId === key.critical!.sectionId)!;
    const curve = section[key.critical!.direction]!;
    const point = curve.points[Math.floor(curve.points.length / 2)]!;
    const state = curve.keyPoints.firstYield!.state;
    const stateAt = vi.spyOn(analysis, 'stateAt').mockResolvedValue(state);
    const spec = wrapper.getComponent(ChartStub).props('spec');
    const x = point.curvature * 1000 / spec.x.scale;
    const y = point.moment / 1e6 / spec.y.scale;
    wrapper.getComponent(ChartStub).vm.$emit('pick', { seriesIndex: 0, markerIndex: null, pointIndex: 0, x, y });
    await vi.waitFor(() => expect(wrapper.find('[data-testid=section-profile] table').exists()).toBe(true));
    expect(stateAt).toHaveBeenCalledWith(section.sectionId, key.critical!.direction, point.curvature, point.referenceStrain);
  });
});
