/**
 * The application shell with the fake host: the recovery offer at start, menu commands (open the
 * demo, add a member, undo, analyse), files opened from outside with unsaved changes, and the
 * caution always on screen.
 */
import { flushPromises, mount, type VueWrapper } from '@vue/test-utils';
import { afterEach, describe, expect, it } from 'vitest';
import { demoProjectSI } from '../../../core/project/demo.ts';
import { serializeProject } from '../../../core/project/file.ts';
import App from '../../../renderer/src/App.vue';
import type { FakeHostSeed } from '../../../renderer/src/host/index.ts';
import { useDocumentStore } from '../../../renderer/src/stores/document.ts';
import { useWorkspaceStore } from '../../../renderer/src/stores/workspace.ts';
import { testEnvironment, until } from '../support.ts';

let wrapper: VueWrapper | null = null;
afterEach(() => {
  wrapper?.unmount();
  wrapper = null;
});

/** The shell needs no analysis results here: the workers read and write files but do not analyse. */
async function app(seed: FakeHostSeed = {}) {
  const env = testEnvironment(seed, { analyse: false });
  wrapper = mount(App, { attachTo: document.body, global: { plugins: [env.pinia], stubs: { ChartCanvas: true, MemberWorkspace: true } } });
  await flushPromises();
  return { env, wrapper, documentStore: useDocumentStore() };
}

const memberCount = (w: VueWrapper) => w.findAll('[data-testid=member-list] li').length;

describe('App', () => {
  it('starts on the start screen with the caution in view', async () => {
    const { wrapper } = await app();
    expect(wrapper.find('[data-testid=start-screen]').exists()).toBe(true);
    expect(wrapper.get('[data-testid=caution]').text()).toBe('Results are for review by a qualified engineer and defer to local codes and licensed practice.');
  });

  it('offers to restore work autosaved by a session that ended abnormally', async () => {
    const recovery = { text: serializeProject(demoProjectSI()), savedAt: '2026-03-02T10:15:00.000Z', name: 'yard.hingeline' };
    const { env, wrapper, documentStore } = await app({ recovery });
    await until(() => wrapper.find('[data-testid=dialog]').exists(), 'the recovery dialog');
    expect(wrapper.get('[data-testid=dialog]').text()).toContain('yard.hingeline');
    await wrapper.get('[data-testid=dialog-restore]').trigger('click');
    await until(() => documentStore.project !== null, 'the restored project');
    await until(() => env.host.calls.some((c) => c.method === 'clearRecovery'), 'clearRecovery');
    expect(documentStore.dirty).toBe(true);
    expect(env.host.recovery).toBeNull();
  });

  it('discards the autosaved work when asked, and forgets it', async () => {
    const recovery = { text: serializeProject(demoProjectSI()), savedAt: '2026-03-02T10:15:00.000Z', name: 'yard.hingeline' };
    const { env, wrapper, documentStore } = await app({ recovery });
    await until(() => wrapper.find('[data-testid=dialog]').exists(), 'the recovery dialog');
    await wrapper.get('[data-testid=dialog-discard]').trigger('click');
    await until(() => env.host.recovery === null, 'clearRecovery');
    expect(documentStore.project).toBeNull();
  });

  it('follows menu commands: open the demo, add a member, undo', async () => {
    const { env, wrapper, documentStore } = await app();
    env.host.emitMenuCommand('open-demo');
    await until(() => documentStore.project !== null, 'the demo');
    await flushPromises();
    expect(memberCount(wrapper)).toBe(10);
    expect(wrapper.find('[data-testid=overview]').exists()).toBe(true);
    env.host.emitMenuCommand('add-member');
    await flushPromises();
    expect(memberCount(wrapper)).toBe(11);
    expect(env.host.documentState.dirty).toBe(true);
    env.host.emitMenuCommand('undo');
    await flushPromises();
    expect(memberCount(wrapper)).toBe(10);
    expect(env.host.documentState.dirty).toBe(false);
    // Opening the demo analyses every member: seconds on a busy shared machine, so not the default 5 s.
  }, 60_000);

  it('asks before a file opened from outside replaces unsaved changes', async () => {
    const { env, wrapper, documentStore } = await app();
    env.host.emitMenuCommand('open-demo');
    await until(() => documentStore.project !== null, 'the demo');
    env.host.emitMenuCommand('add-member');
    await flushPromises();
    env.host.emitOpenFile({ name: 'yard.hingeline', path: '/p/yard.hingeline', text: serializeProject(demoProjectSI()) });
    await until(() => wrapper.find('[data-testid=dialog]').exists(), 'the unsaved-changes question');
    expect(wrapper.get('[data-testid=dialog]').text()).toContain('Save the changes');
    await wrapper.get('[data-testid=dialog-discard]').trigger('click');
    await until(() => documentStore.fileName === 'yard.hingeline', 'the file to open');
    await flushPromises();
    // Four single-span members and the two continuous beams (CB-1, CB-2).
    expect(memberCount(wrapper)).toBe(6);
  });

  it('keeps the project when the user cancels at the unsaved-changes question', async () => {
    const { env, wrapper, documentStore } = await app();
    env.host.emitMenuCommand('open-demo');
    await until(() => documentStore.project !== null, 'the demo');
    env.host.emitMenuCommand('add-member');
    await flushPromises();
    env.host.emitMenuCommand('open-demo');
    await until(() => wrapper.find('[data-testid=dialog]').exists(), 'the unsaved-changes question');
    await wrapper.get('[data-testid=dialog-cancel]').trigger('click');
    await flushPromises();
    expect(memberCount(wrapper)).toBe(11);
  });

  it('switches the display units as an undoable edit', async () => {
    const { env, wrapper, documentStore } = await app();
    env.host.emitMenuCommand('open-demo');
    await until(() => documentStore.project !== null, 'the demo');
    await flushPromises();
    await wrapper.get('[data-testid=units-si]').trigger('click');
    expect(documentStore.project!.info.unitSystem).toBe('si');
    expect(documentStore.undoLabel).toBe('Show SI units');
    expect(wrapper.get('[data-testid=units-si]').attributes('aria-checked')).toBe('true');
    documentStore.undo();
    expect(documentStore.project!.info.unitSystem).toBe('us');
  });

  it('gives a member added from the open member a copy of its section, never a silent share', async () => {
    const { env, wrapper, documentStore } = await app();
    env.host.emitMenuCommand('open-demo');
    await until(() => documentStore.project !== null, 'the demo');
    const workspace = useWorkspaceStore();
    workspace.openMember('B-201');
    await flushPromises();
    const sectionsBefore = documentStore.project!.sections.length;
    env.host.emitMenuCommand('add-member');
    await flushPromises();
    const project = documentStore.project!;
    const added = project.members.find((m) => m.id === workspace.selectedMemberId)!;
    expect(project.members.indexOf(added)).toBe(project.members.findIndex((m) => m.id === 'B-201') + 1);
    expect(project.sections).toHaveLength(sectionsBefore + 1);
    const own = project.sections.find((s) => s.id === added.zones[0]!.sectionId)!;
    const template = project.sections.find((s) => s.id === 'T24')!;
    expect(own.id).not.toBe('T24');
    expect(own.shape).toEqual(template.shape);
    expect(own.name).toBe(`${template.name} (copy)`);
    // No other member uses the copy.
    expect(project.members.filter((m) => m.zones.some((z) => z.sectionId === own.id))).toEqual([added]);
    expect(wrapper.get('[data-testid=notice]').text()).toContain('has its own section');
    // One undo step takes the member and its section away.
    env.host.emitMenuCommand('undo');
    await flushPromises();
    expect(documentStore.project!.sections).toHaveLength(sectionsBefore);
  });

  it('offers New… in the top bar once a project is open', async () => {
    const { env, wrapper, documentStore } = await app();
    env.host.emitMenuCommand('open-demo');
    await until(() => documentStore.project !== null, 'the demo');
    await flushPromises();
    await wrapper.get('[data-testid=new-project]').trigger('click');
    await until(() => wrapper.find('[data-testid=dialog]').exists(), 'the new-project question');
    expect(wrapper.get('[data-testid=dialog]').text()).toContain('Units and design code');
    await wrapper.get('[data-testid=dialog-si-en]').trigger('click');
    await until(() => documentStore.project?.info.codeBasis === 'EN 1992-1-1', 'the new project');
    expect(documentStore.project!.members).toHaveLength(1);
  });

  it('shows every member again when another file opens (filters of the last file reset)', async () => {
    const { env, wrapper, documentStore } = await app();
    env.host.emitMenuCommand('open-demo');
    await until(() => documentStore.project !== null, 'the demo');
    const workspace = useWorkspaceStore();
    workspace.statusFilter = 'check-fails';
    workspace.filterText = 'B-2';
    workspace.memberFilter = 'R-';
    await flushPromises();
    env.host.emitOpenFile({ name: 'yard.hingeline', path: '/p/yard.hingeline', text: serializeProject(demoProjectSI()) });
    await until(() => documentStore.fileName === 'yard.hingeline', 'the file to open');
    await flushPromises();
    expect(workspace.statusFilter).toBe('all');
    expect(workspace.filterText).toBe('');
    // Four single-span members and the two continuous beams (CB-1, CB-2).
    expect(memberCount(wrapper)).toBe(6);
  });

  it('lists the keyboard shortcuts (Ctrl+/ or the ? button)', async () => {
    const { env, wrapper } = await app();
    env.host.emitMenuCommand('shortcuts');
    await until(() => wrapper.find('[data-testid=dialog-table]').exists(), 'the shortcut list');
    const rows = wrapper.findAll('[data-testid=dialog-table] tr').map((r) => r.text());
    expect(rows.some((r) => r.startsWith('Ctrl+Z') && r.includes('Undo'))).toBe(true);
    expect(rows.some((r) => r.startsWith('Ctrl+/'))).toBe(true);
    await wrapper.get('[data-testid=dialog-ok]').trigger('click');
    await flushPromises();
    await wrapper.get('[data-testid=shortcuts]').trigger('click');
    await until(() => wrapper.find('[data-testid=dialog-table]').exists(), 'the shortcut list from the button');
  });

  it('takes the browser’s own undo of a field (its menu) for the app’s undo', async () => {
    const { env, wrapper, documentStore } = await app();
    env.host.emitMenuCommand('open-demo');
    await until(() => documentStore.project !== null, 'the demo');
    await wrapper.get('[data-testid=units-si]').trigger('click');
    expect(documentStore.project!.info.unitSystem).toBe('si');
    const event = new InputEvent('beforeinput', { inputType: 'historyUndo', bubbles: true, cancelable: true });
    document.body.dispatchEvent(event);
    expect(event.defaultPrevented).toBe(true);
    expect(documentStore.project!.info.unitSystem).toBe('us');
  });
});
