/**
 * The beam editor with @pinia/testing: each field turns into one undoable edit of the project
 * (the store's `edit` is a spy; the change it is given is applied here to check it), and core's
 * messages appear next to the fields they name.
 */
import { createTestingPinia } from '@pinia/testing';
import { mount } from '@vue/test-utils';
import { describe, expect, it, vi } from 'vitest';
import { demoProjectSI } from '../../../core/project/demo.ts';
import type { Project, MemberDefinition } from '../../../core/project/types.ts';
import { createFakeHost, setHostForTesting } from '../../../renderer/src/host/index.ts';
import { useAnalysisStore } from '../../../renderer/src/stores/analysis.ts';
import { useDocumentStore } from '../../../renderer/src/stores/document.ts';
import BeamEditor from '../../../renderer/src/views/member/BeamEditor.vue';
import { setWorkerFactory } from '../../../renderer/src/workers/engine.ts';
import { silentFactory } from '../support.ts';

function setup() {
  setHostForTesting(createFakeHost());
  setWorkerFactory(silentFactory);
  const pinia = createTestingPinia({
    createSpy: vi.fn,
    stubActions: (name, store) => (store.$id === 'document' && name === 'edit') || (store.$id === 'analysis' && name === 'diagnosticsOf'),
  });
  const documentStore = useDocumentStore(pinia);
  const project = demoProjectSI();
  documentStore.load(project, null, null, true);
  const analysis = useAnalysisStore(pinia);
  vi.mocked(analysis.diagnosticsOf).mockReturnValue([]);
  const member = project.members[0]!;
  const wrapper = mount(BeamEditor, { props: { member }, global: { plugins: [pinia] } });
  /** The last edit: its label, options, and the project its change function produces. */
  const lastEdit = () => {
    const call = vi.mocked(documentStore.edit).mock.lastCall!;
    const [label, change, options] = call as [string, (p: Project) => Project, { coalesceKey?: string } | undefined];
    const next = change(project);
    return { label, options, next, member: next.members.find((m) => m.id === member.id) as MemberDefinition };
  };
  return { wrapper, documentStore, analysis, project, member, lastEdit };
}

describe('BeamEditor', () => {
  it('shows the span in the project’s units with its unit', () => {
    const { wrapper } = setup();
    const span = wrapper.get('[data-testid=member-span]');
    expect((span.element as HTMLInputElement).value).toBe('7.2');
    expect(span.element.closest('.field')!.textContent).toContain('m');
  });

  it('a new span is one edit that also moves the end of the last zone', async () => {
    const { wrapper, lastEdit, member } = setup();
    await wrapper.get('[data-testid=member-span]').setValue('7.5');
    const edit = lastEdit();
    expect(edit.label).toBe('Change span');
    expect(edit.options?.coalesceKey).toBe(`members:${member.id}:span`);
    expect(edit.member.span).toBe(7500);
    expect(edit.member.zones[edit.member.zones.length - 1]!.to).toBe(7500);
  });

  it('renaming the member is an edit of its name only', async () => {
    const { wrapper, lastEdit, project } = setup();
    await wrapper.get('[data-testid=member-name]').setValue('MB-1a');
    const edit = lastEdit();
    expect(edit.member.name).toBe('MB-1a');
    expect(edit.next.members[1]).toBe(project.members[1]);
  });

  it('adds a line load', async () => {
    const { wrapper, lastEdit, member } = setup();
    await wrapper.get('[data-testid=add-line-load]').trigger('click');
    const edit = lastEdit();
    expect(edit.label).toBe('Add line load');
    expect(edit.member.loads).toHaveLength(member.loads.length + 1);
    expect(edit.member.loads[edit.member.loads.length - 1]).toMatchObject({ kind: 'uniform', magnitude: 0 });
  });

  it('offers the deflection limits of the project’s code and toggles them', async () => {
    const { wrapper, lastEdit } = setup();
    const labels = wrapper.findAll('fieldset.limits label').map((l) => l.text());
    expect(labels.some((l) => l.includes('EN 1992-1-1 7.4.1(4)'))).toBe(true);
    expect(labels.some((l) => l.includes('ACI 318-19'))).toBe(false);
    const afterConstruction = wrapper.findAll('fieldset.limits label').find((l) => l.text().includes('7.4.1(5)'))!;
    await afterConstruction.get('input').setValue(false);
    expect(lastEdit().member.service.limitCases).toEqual(['en-appearance']);
  });

  it('shows core’s message next to the field it names', async () => {
    const { wrapper, analysis } = setup();
    vi.mocked(analysis.diagnosticsOf).mockImplementation((list, _id, field) => (list === 'members' && field === 'span'
      ? [{ list: 'members', itemId: 'MB-1', field: 'span', path: 'members[0] "MB-1".span', code: 'must-be-positive', severity: 'error', message: 'must be greater than 0 m and at most 60 m, got -2 m' }]
      : []));
    await wrapper.setProps({ member: { ...(wrapper.props('member') as MemberDefinition), span: -2000 } });
    const span = wrapper.get('[data-testid=member-span]');
    expect(span.attributes('aria-invalid')).toBe('true');
    expect(span.element.closest('.field')!.textContent).toContain('must be greater than 0 m');
  });
});
