/**
 * The elevation of a continuous beam: spans and cantilevers to one scale with their lengths in the
 * project's units, a symbol per support kind, zones shaded by section, loads in a row per case,
 * hinges numbered in order of formation, a span chosen by a click, and a beam that cannot be drawn
 * to scale saying why.
 */
import { mount } from '@vue/test-utils';
import { describe, expect, it } from 'vitest';
import type { ContinuousBeamDefinition } from '../../../core/continuous/definition.ts';
import { demoProjectSI } from '../../../core/project/demo.ts';
import ContinuousElevation from '../../../renderer/src/components/ContinuousElevation.vue';

const project = demoProjectSI();
const cb1 = project.continuousMembers!.find((m) => m.id === 'CB-1')!;
const cb2 = project.continuousMembers!.find((m) => m.id === 'CB-2')!;

function draw(member: ContinuousBeamDefinition, extra: Record<string, unknown> = {}) {
  return mount(ContinuousElevation, { props: { member, sections: project.sections, system: 'si', initialWidth: 1000, ...extra } });
}

/** x of the support symbols, px. */
const supportXs = (wrapper: ReturnType<typeof draw>) => wrapper.findAll('[data-support]').map((s) => Number(/translate\(([\d.]+)/.exec(s.attributes('transform')!)![1]));

describe('ContinuousElevation', () => {
  it('draws every span and the cantilever to one scale with their lengths', () => {
    const wrapper = draw(cb2);
    expect(wrapper.findAll('.part').map((p) => p.find('.length').text())).toEqual(['8.40 m', '4.20 m', '1.500 m']);
    const xs = supportXs(wrapper);
    expect(xs).toHaveLength(3);
    // 8.4 m and 4.2 m spans: the first is drawn twice as long as the second.
    expect((xs[1]! - xs[0]!) / (xs[2]! - xs[1]!)).toBeCloseTo(2, 1);
    expect(wrapper.find('svg').attributes('aria-label')).toContain('2 spans, 1 cantilever(s)');
  });

  it('shows the support kinds: pins, columns below, a fixed support', () => {
    expect(draw(cb2).findAll('[data-support]').map((s) => s.attributes('data-support'))).toEqual(['pinned', 'pinned', 'pinned']);
    const w1 = draw(cb1);
    expect(w1.findAll('[data-support]').map((s) => s.attributes('data-support'))).toEqual(['pinned', 'column', 'column', 'pinned']);
    expect(w1.findAll('.column rect')).toHaveLength(2);
    const fixed = draw({ ...cb1, supports: [{ kind: 'fixed' }, ...cb1.supports.slice(1)] });
    expect(fixed.find('[data-support=fixed] .wall').exists()).toBe(true);
  });

  it('shades zones by section (the same section, the same shade) and names them', () => {
    const wrapper = draw(cb1);
    const fills = wrapper.findAll('.zone rect').map((r) => r.attributes('fill'));
    expect(fills).toHaveLength(5);
    expect(fills[0]).toBe(fills[2]);
    expect(fills[0]).not.toBe(fills[1]);
    expect(wrapper.findAll('.zone title').map((t) => t.text())[1]).toContain(project.sections.find((s) => s.id === cb1.zones[1]!.sectionId)!.name);
  });

  it('puts loads in one row per load case, each over its own span', () => {
    const wrapper = draw(cb2);
    expect(wrapper.findAll('.row-label').map((t) => t.text())).toEqual(['superimp.', 'live']);
    const loads = wrapper.findAll('.load');
    expect(loads).toHaveLength(cb2.loads.length);
    const xs = supportXs(wrapper);
    const first = loads[0]!.findAll('.load-line')[0]!;
    expect(Number(first.attributes('x1'))).toBeCloseTo(xs[0]!, 0);
    expect(Number(first.attributes('x2'))).toBeCloseTo(xs[1]!, 0);
    expect(loads[0]!.find('title').text()).toContain('4.00 kN/m');
  });

  it('numbers the hinges in order of formation at their positions, hogging on top', () => {
    const hinges = [
      { order: 1, position: 7200, direction: 'hogging' as const, part: 'span 1', loadFactor: 0.83 },
      { order: 2, position: 3390, direction: 'sagging' as const, part: 'span 1', loadFactor: 1.75 },
    ];
    const wrapper = draw(cb2, { hinges });
    const marks = wrapper.findAll('[data-hinge]');
    expect(marks.map((m) => m.find('text').text())).toEqual(['1', '2']);
    expect(marks[0]!.classes()).toContain('hogging');
    expect(marks[0]!.find('title').text()).toContain('λ = 0.83');
  });

  it('reports a click on a span and highlights the span chosen', async () => {
    const wrapper = draw(cb2, { selectedSpan: 1 });
    expect(wrapper.findAll('.selected-span')).toHaveLength(1);
    await wrapper.findAll('.part.span')[0]!.trigger('click');
    expect(wrapper.emitted('select-span')).toEqual([[0]]);
  });

  it('draws a beam with a span that is not valid with equal spans and says why', () => {
    const wrapper = draw({ ...cb2, spans: [Number.NaN, 4200] });
    expect(wrapper.find('.problem').text()).toMatch(/not valid/);
    expect(wrapper.html()).not.toMatch(/NaN|Infinity/);
  });
});
