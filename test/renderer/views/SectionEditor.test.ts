/**
 * The section editor with the real document store (analysis workers that never answer): bar sizes
 * as engineers write them, names that follow the dimensions, bars left behind by a deeper section.
 */
import { mount, type VueWrapper } from '@vue/test-utils';
import { describe, expect, it } from 'vitest';
import { demoProject, demoProjectSI } from '../../../core/project/demo.ts';
import type { Project } from '../../../core/project/types.ts';
import { useDocumentStore } from '../../../renderer/src/stores/document.ts';
import { useWorkspaceStore } from '../../../renderer/src/stores/workspace.ts';
import SectionEditor from '../../../renderer/src/views/member/SectionEditor.vue';
import { setWorkerFactory } from '../../../renderer/src/workers/engine.ts';
import { silentFactory, testEnvironment } from '../support.ts';

function setup(project: Project, memberId: string) {
  const { pinia } = testEnvironment();
  setWorkerFactory(silentFactory);
  const documentStore = useDocumentStore();
  documentStore.load(project, null, null, true);
  const workspace = useWorkspaceStore();
  workspace.openMember(memberId);
  workspace.inputTab = 'section';
  const member = () => documentStore.project!.members.find((m) => m.id === memberId)!;
  const section = () => documentStore.project!.sections.find((s) => s.id === member().zones[0]!.sectionId)!;
  const wrapper = mount(SectionEditor, { props: { member: member() }, global: { plugins: [pinia] }, attachTo: document.body });
  return { wrapper, documentStore, member, section };
}

const input = (wrapper: VueWrapper, testid: string) => wrapper.get(`[data-testid=${testid}]`).element as HTMLInputElement;

describe('SectionEditor', () => {
  it('shows bar sizes as designations of the project’s system and reads them back', async () => {
    const { wrapper, section, documentStore } = setup(demoProject(), 'B-201');
    // B-201's bottom layer: 3 #8 (ASTM A615 #8 = 1.000 in nominal diameter)
    expect(input(wrapper, 'bar-size-0').value).toBe('#8');
    await wrapper.get('[data-testid=bar-size-0]').setValue('#9');
    // ASTM A615 Table 1: #9 = 1.128 in = 28.6512 mm
    expect(section().bars[0]!.diameter).toBeCloseTo(28.6512, 9);
    expect(documentStore.undoLabel).toBe('Change bar size');
    await wrapper.get('[data-testid=bar-size-0]').setValue('4 #10');
    expect(section().bars[0]).toMatchObject({ count: 4 });
    expect(section().bars[0]!.diameter).toBeCloseTo(1.27 * 25.4, 9);
    await wrapper.get('[data-testid=bar-size-0]').setValue('#12');
    const field = wrapper.get('[data-testid=bar-size-0]').element.closest('.field')!;
    expect(field.textContent).toContain('#12 is not an ASTM A615 bar size');
    expect(section().bars[0]!.diameter).toBeCloseTo(1.27 * 25.4, 9);
    wrapper.unmount();
  });

  it('reads Ø20 and 20M in an SI project and shows metric sizes with Ø', async () => {
    const { wrapper, section } = setup(demoProjectSI(), 'MB-1');
    await wrapper.get('[data-testid=bar-size-0]').setValue('20M');
    // CSA G30.18 Table 1: 20M = 19.5 mm
    expect(section().bars[0]!.diameter).toBe(19.5);
    await wrapper.get('[data-testid=bar-size-0]').trigger('blur');
    expect(input(wrapper, 'bar-size-0').value).toBe('20M');
    await wrapper.get('[data-testid=bar-size-0]').setValue('Ø25');
    await wrapper.get('[data-testid=bar-size-0]').trigger('blur');
    expect(section().bars[0]!.diameter).toBe(25);
    expect(input(wrapper, 'bar-size-0').value).toBe('Ø25');
    // A plain diameter still works: 22.2 mm is no tabulated size and shows as a number.
    await wrapper.get('[data-testid=bar-size-0]').setValue('22.2');
    await wrapper.get('[data-testid=bar-size-0]').trigger('blur');
    expect(input(wrapper, 'bar-size-0').value).toBe('22.2');
    wrapper.unmount();
  });

  it('keeps the section name true to its dimensions, in the same undo step', async () => {
    const { wrapper, section, documentStore } = setup(demoProject(), 'B-201');
    expect(section().name).toBe('T 24 × 12 in web, 54 in flange (Level 2 floor)');
    const height = wrapper.get('[data-testid=shape-height]');
    await height.trigger('focus');
    await height.setValue('3');
    await height.setValue('30');
    expect(section().name).toBe('T 30 × 12 in web, 54 in flange (Level 2 floor)');
    const steps = documentStore.past.length;
    documentStore.undo();
    expect(documentStore.past.length).toBe(steps - 1);
    expect(section().name).toBe('T 24 × 12 in web, 54 in flange (Level 2 floor)');
    expect(section().shape).toMatchObject({ height: 609.6 });
    wrapper.unmount();
  });

  it('says when a deeper section left its bottom bars behind, and moves them with the soffit', async () => {
    const { wrapper, section, documentStore } = setup(demoProject(), 'B-201');
    const bottom = section().bars[0]!.depth;
    expect(wrapper.find('[data-testid=bars-left-behind]').exists()).toBe(false);
    await wrapper.get('[data-testid=shape-height]').setValue('30');
    const note = wrapper.get('[data-testid=bars-left-behind]');
    // 30 in − 24 in = 6 in deeper; bottom layer at 21.5 in: 8.50 in from the soffit instead of 2.50 in
    expect(note.text()).toContain('6.00 in deeper');
    expect(note.text()).toContain('8.50 in from the soffit (was 2.50 in)');
    await wrapper.get('[data-testid=move-bars]').trigger('click');
    expect(section().bars[0]!.depth).toBeCloseTo(bottom + 6 * 25.4, 6);
    // The top layer (above mid-depth) stays.
    expect(section().bars[1]!.depth).toBe(demoProject().sections.find((s) => s.id === 'T24')!.bars[1]!.depth);
    expect(documentStore.undoLabel).toBe('Move bottom bars with the soffit');
    expect(wrapper.find('[data-testid=bars-left-behind]').exists()).toBe(false);
    wrapper.unmount();
  });

  it('drops the note when the height goes back or the user keeps the bars where they are', async () => {
    const { wrapper } = setup(demoProject(), 'B-201');
    await wrapper.get('[data-testid=shape-height]').setValue('26');
    expect(wrapper.find('[data-testid=bars-left-behind]').exists()).toBe(true);
    await wrapper.get('[data-testid=shape-height]').setValue('24');
    expect(wrapper.find('[data-testid=bars-left-behind]').exists()).toBe(false);
    await wrapper.get('[data-testid=shape-height]').setValue('20');
    expect(wrapper.get('[data-testid=bars-left-behind]').text()).toContain('shallower');
    await wrapper.get('[data-testid=keep-bars]').trigger('click');
    expect(wrapper.find('[data-testid=bars-left-behind]').exists()).toBe(false);
    wrapper.unmount();
  });
  it('keeps a layer label and the section name naming the bars, in one undo step', async () => {
    const { wrapper, section, documentStore } = setup(demoProject(), 'F-205');
    // F-205's support section: "Rectangle 14 × 24 in, support: top 4 #8, bottom 3 #7", bottom layer labelled "bottom 3 #7"
    expect(section().bars[1]!.label).toBe('bottom 3 #7');
    await wrapper.get('[data-testid=bar-count-1]').setValue('4');
    expect(section().bars[1]).toMatchObject({ count: 4, label: 'bottom 4 #7' });
    expect(section().name).toBe('Rectangle 14 × 24 in, support: top 4 #8, bottom 4 #7');
    await wrapper.get('[data-testid=bar-size-1]').setValue('#9');
    expect(section().bars[1]!.label).toBe('bottom 4 #9');
    expect(section().name).toBe('Rectangle 14 × 24 in, support: top 4 #8, bottom 4 #9');
    documentStore.undo();
    expect(section().bars[1]!.label).toBe('bottom 4 #7');
    documentStore.undo();
    expect(section().bars[1]).toMatchObject({ count: 3, label: 'bottom 3 #7' });
    expect(section().name).toBe('Rectangle 14 × 24 in, support: top 4 #8, bottom 3 #7');
    wrapper.unmount();
  });
});
