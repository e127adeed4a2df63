/**
 * The span editor of a continuous beam with @pinia/testing: each field is one undoable edit of the
 * project (the store's `edit` is a spy; the change it is given is applied here to check it), typing
 * in one field merges into one undo step, and core's messages appear under the fields they name.
 */
import { createTestingPinia } from '@pinia/testing';
import { mount } from '@vue/test-utils';
import { describe, expect, it, vi } from 'vitest';
import { demoProjectSI } from '../../../core/project/demo.ts';
import type { ContinuousMemberDefinition, Project } from '../../../core/project/types.ts';
import { createFakeHost, setHostForTesting } from '../../../renderer/src/host/index.ts';
import { useAnalysisStore } from '../../../renderer/src/stores/analysis.ts';
import { useDocumentStore } from '../../../renderer/src/stores/document.ts';
import SpanEditor from '../../../renderer/src/views/continuous/SpanEditor.vue';
import { setWorkerFactory } from '../../../renderer/src/workers/engine.ts';
import type { ItemDiagnostic } from '../../../renderer/src/workers/protocol.ts';
import { silentFactory } from '../support.ts';

function setup(id = 'CB-2', system: 'si' | 'us' = 'si', diagnostics: ItemDiagnostic[] = []) {
  setHostForTesting(createFakeHost());
  setWorkerFactory(silentFactory);
  const pinia = createTestingPinia({
    createSpy: vi.fn,
    stubActions: (name, store) => (store.$id === 'document' && name === 'edit') || (store.$id === 'analysis' && name === 'diagnosticsOf'),
  });
  const documentStore = useDocumentStore(pinia);
  const demo = demoProjectSI();
  const project: Project = { ...demo, info: { ...demo.info, unitSystem: system } };
  documentStore.load(project, null, null, true);
  const analysis = useAnalysisStore(pinia);
  vi.mocked(analysis.diagnosticsOf).mockImplementation((list, itemId, field, prefix) => diagnostics.filter((d) => d.list === list && d.itemId === itemId && (field === undefined || d.field === field || (prefix === true && d.field.startsWith(`${field}.`)))));
  const member = project.continuousMembers!.find((m) => m.id === id)!;
  const wrapper = mount(SpanEditor, { props: { member }, global: { plugins: [pinia] } });
  const lastEdit = () => {
    const [label, change, options] = vi.mocked(documentStore.edit).mock.lastCall! as [string, (p: Project) => Project, { coalesceKey?: string } | undefined];
    const next = change(project);
    return { label, options, next, member: next.continuousMembers!.find((m) => m.id === id) as ContinuousMemberDefinition };
  };
  return { wrapper, project, member, lastEdit, documentStore };
}

describe('SpanEditor', () => {
  it('shows each span in the project’s units: metres in SI, feet in US', () => {
    expect((setup().wrapper.get('[data-testid=span-length-1]').element as HTMLInputElement).value).toBe('8.4');
    expect((setup('CB-2', 'us').wrapper.get('[data-testid=span-length-1]').element as HTMLInputElement).value).toMatch(/^27\.559/);
  });

  it('a new span length is one edit, merged while typing, that moves the zones beyond it', async () => {
    const { wrapper, lastEdit, member, project } = setup();
    await wrapper.get('[data-testid=span-length-1]').setValue('9');
    const edit = lastEdit();
    expect(edit.label).toBe('Change span');
    expect(edit.options?.coalesceKey).toBe(`continuousMembers:${member.id}:spans[0]`);
    expect(edit.member.spans).toEqual([9000, 4200]);
    expect(edit.member.zones[edit.member.zones.length - 1]!.to).toBe(14700);
    // Nothing else changes.
    expect(edit.next.members).toBe(project.members);
    expect(edit.next.continuousMembers![0]).toBe(project.continuousMembers![0]);
  });

  it('keeps text that is not a number in the field and stores nothing', async () => {
    const { wrapper, documentStore } = setup();
    const input = wrapper.get('[data-testid=span-length-2]');
    await input.setValue('4,2 m?');
    expect((input.element as HTMLInputElement).value).toBe('4,2 m?');
    expect(documentStore.edit).not.toHaveBeenCalled();
    expect(wrapper.find('[data-span="2"] .field-msg').text()).toMatch(/4\.2/);
  });

  it('adds, removes and moves spans', async () => {
    const { wrapper, lastEdit } = setup('CB-1');
    await wrapper.get('[data-testid=add-span-3]').trigger('click');
    expect(lastEdit().member.spans).toEqual([6000, 7000, 6000, 6000]);
    await wrapper.get('[data-testid=remove-span-2]').trigger('click');
    expect(lastEdit().label).toBe('Remove span');
    expect(lastEdit().member.spans).toEqual([6000, 6000]);
    await wrapper.get('[aria-label="Move span 2 right"]').trigger('click');
    expect(lastEdit().member.spans).toEqual([6000, 6000, 7000]);
  });

  it('never offers to go below two spans', () => {
    const { wrapper } = setup('CB-2');
    expect((wrapper.get('[data-testid=remove-span-1]').element as HTMLButtonElement).disabled).toBe(true);
  });

  it('turns a support into a column spring with its stiffness, height and far end', async () => {
    const { wrapper, lastEdit } = setup('CB-2');
    await wrapper.get('[data-testid=support-kind-2]').setValue('column');
    const support = lastEdit().member.supports[1]!;
    expect(support.kind).toBe('column');
    expect(support.below).toMatchObject({ height: 3500, farEnd: 'fixed' });
    expect(support.below!.stiffness).toBeGreaterThan(0);
  });

  it('removing the cantilever removes its loads in the same step', async () => {
    const { wrapper, lastEdit } = setup('CB-2');
    await wrapper.get('[data-testid=right-cantilever]').setValue('');
    const edit = lastEdit();
    expect(edit.member.rightCantilever).toBeUndefined();
    expect(edit.member.loads.some((l) => l.span === 'right-cantilever')).toBe(false);
  });

  it('adds a line load on the span chosen, and moves a load to another span', async () => {
    const { wrapper, lastEdit, member } = setup('CB-2');
    await wrapper.setProps({ selectedSpan: 1 });
    await wrapper.get('[data-testid=continuous-add-line-load]').trigger('click');
    const added = lastEdit().member.loads;
    expect(added).toHaveLength(member.loads.length + 1);
    expect(added[added.length - 1]).toMatchObject({ kind: 'uniform', span: 2, magnitude: 0 });
    await wrapper.get('[data-load-row="1"] select').setValue('right-cantilever');
    expect(lastEdit().member.loads[0]!.span).toBe('right-cantilever');
  });

  it('shows core’s message under the field it names', () => {
    const message = 'must be between 100 mm and 60000 mm, got 50 mm';
    const { wrapper } = setup('CB-2', 'si', [{ list: 'continuousMembers', itemId: 'CB-2', field: 'spans[1]', path: 'continuousMembers[1] "CB-2".spans[1]', code: 'out-of-range', severity: 'error', message }]);
    expect(wrapper.get('[data-span="2"] .field-msg').text()).toBe(message);
    expect(wrapper.get('[data-testid=span-length-2]').attributes('aria-invalid')).toBe('true');
  });
});
