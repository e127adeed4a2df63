/**
 * The ductility panel of a member whose load–deflection curve passes span/50 before its ultimate
 * (issue 17): Δu and μΔ read as no value, and the reason is shown beside them.
 */
import { mount } from '@vue/test-utils';
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { NOT_A_VALUE } from '../../../core/units/index.ts';
import DuctilityPanel from '../../../renderer/src/views/member/DuctilityPanel.vue';
import { longProject, REASON_60M } from '../../core/assessment/beam-fixtures.ts';
import { member, smallProject } from '../../fixtures/projects.ts';

describe('DuctilityPanel', () => {
  it('withholds Δu and μΔ beyond span/50 and says why', () => {
    const result = analyzeProject(longProject()).members[0]!;
    const wrapper = mount(DuctilityPanel, { props: { result, system: 'si' } });
    const value = (label: string) => wrapper.findAll('dt').find((d) => d.text() === label)!.element.nextElementSibling!.textContent;
    expect(value('Displacement ductility μΔ = Δu/Δy')).toBe(NOT_A_VALUE);
    expect(value('Deflection at ultimate Δu')).toBe(NOT_A_VALUE);
    expect(wrapper.get('[data-testid=ultimate-outside-range] dd').text()).toBe(REASON_60M);
  });

  it('an ordinary beam shows its μΔ and no such line', () => {
    const result = analyzeProject(smallProject('ACI 318-19', [member('A', 'simply-supported', 6000, 'r1')])).members[0]!;
    const wrapper = mount(DuctilityPanel, { props: { result, system: 'si' } });
    expect(wrapper.find('[data-testid=ultimate-outside-range]').exists()).toBe(false);
    expect(wrapper.findAll('dt').find((d) => d.text() === 'Deflection at ultimate Δu')!.element.nextElementSibling!.textContent).toMatch(/^\d/);
  });

  it('hinges that formed together (both supports of a symmetric beam) share their order and name each other', () => {
    const result = analyzeProject(smallProject('ACI 318-19', [member('S', 'fixed-fixed', 6000, 'r1')])).members[0]!;
    const wrapper = mount(DuctilityPanel, { props: { result, system: 'si' } });
    const rows = wrapper.get('[data-testid=hinges]').findAll('tbody tr:not(.sub)').map((r) => r.findAll('td').map((c) => c.text()));
    const subs = wrapper.get('[data-testid=hinges]').findAll('tbody tr.sub').map((r) => r.text());
    // The supports come first, left to right, both 1; the span hinge after them is 3.
    expect(rows.slice(0, 2).map((r) => [r[0], r[1]])).toEqual([['1', '0 m'], ['1', '6.00 m']]);
    expect(subs[0]).toMatch(/^Formed at the same load factor as the hinge at 6\.00 m · Section/);
    expect(subs[1]).toMatch(/^Formed at the same load factor as the hinge at 0 m · Section/);
    if (rows.length > 2) expect(rows[2]![0]).toBe('3');
  });
});
