/**
 * The project overview: every member with its key results, sorting by a column (missing values
 * last), filtering by text and status, and only the rows in view in the page for large projects.
 */
import { mount } from '@vue/test-utils';
import { describe, expect, it } from 'vitest';
import type { Project } from '../../../core/project/types.ts';
import { filterRows, sortRows, type OverviewRow } from '../../../renderer/src/project/overview-rows.ts';
import { useAnalysisStore } from '../../../renderer/src/stores/analysis.ts';
import { useDocumentStore } from '../../../renderer/src/stores/document.ts';
import ProjectOverview from '../../../renderer/src/views/ProjectOverview.vue';
import { setWorkerFactory } from '../../../renderer/src/workers/engine.ts';
import { silentFactory, testEnvironment } from '../support.ts';

/** The SI demo analysed whole (for real once, then replayed) and the overview mounted. */
async function analysedSI() {
  const env = testEnvironment({}, { replay: true });
  const documentStore = useDocumentStore();
  const analysis = useAnalysisStore();
  documentStore.openDemo('si');
  await analysis.analyseAll();
  const wrapper = mount(ProjectOverview, { global: { plugins: [env.pinia] } });
  return { wrapper, documentStore, analysis };
}

const order = (wrapper: ReturnType<typeof mount>) => wrapper.findAll('[data-testid=overview-rows] [role=row]').map((r) => r.attributes('data-member'));
/** The single-span members' rows (continuous beams sort by their governing span once analysed). */
const singleOrder = (wrapper: ReturnType<typeof mount>) => order(wrapper).filter((id) => !id?.startsWith('CB-'));

describe('ProjectOverview', () => {
  it('lists every member with its key results in the project’s units', async () => {
    const { wrapper } = await analysedSI();
    // Sorted by mark: the continuous beams (one row each) among the single-span members.
    expect(order(wrapper)).toEqual(['CB-1', 'CB-2', 'MB-1', 'MB-2', 'MB-3', 'WK-1']);
    const first = wrapper.get('[data-member="MB-1"]').text();
    expect(first).toContain('7.20 m');
    expect(first).toMatch(/kN·m/);
    expect(first).toMatch(/OK|Check fails/);
  }, 240_000);

  it('sorts by span, and the other way on a second click', async () => {
    const { wrapper, documentStore } = await analysedSI();
    const bySpan = [...documentStore.project!.members].sort((a, b) => a.span - b.span || 0).map((m) => m.id);
    await wrapper.get('[data-testid=sort-span]').trigger('click');
    expect(singleOrder(wrapper)).toEqual(bySpan);
    expect(wrapper.get('[role=columnheader][aria-sort=ascending]').text()).toContain('Span');
    await wrapper.get('[data-testid=sort-span]').trigger('click');
    expect(singleOrder(wrapper)).toEqual([...bySpan].reverse());
  }, 240_000);

  it('filters by text and by status', async () => {
    const { wrapper } = await analysedSI();
    await wrapper.get('[data-testid=overview-filter]').setValue('wk');
    expect(order(wrapper)).toEqual(['WK-1']);
    await wrapper.get('[data-testid=overview-filter]').setValue('');
    const statuses = wrapper.findAll('[data-testid=overview-rows] [role=row] .badge').map((b) => b.attributes('data-status'));
    const failing = statuses.filter((s) => s === 'check-fails').length;
    const button = wrapper.findAll('.seg-btn').find((b) => b.text().startsWith('Check fails'))!;
    await button.trigger('click');
    expect(order(wrapper)).toHaveLength(failing);
  }, 240_000);

  it('puts only the rows in view into the page for a project of 500 members', async () => {
    const env = testEnvironment();
    setWorkerFactory(silentFactory);
    const documentStore = useDocumentStore();
    documentStore.openDemo('us');
    const demo = documentStore.project!;
    const members = Array.from({ length: 500 }, (_, i) => ({ ...demo.members[i % demo.members.length]!, id: `m${i}`, name: `B-${i + 1}` }));
    documentStore.load({ ...demo, members } as Project, null, null, true);
    const wrapper = mount(ProjectOverview, { global: { plugins: [env.pinia] } });
    const rendered = wrapper.findAll('[data-testid=overview-rows] [role=row]').length;
    expect(rendered).toBeGreaterThan(10);
    expect(rendered).toBeLessThan(60);
    expect(wrapper.get('[role=table]').attributes('aria-rowcount')).toBe('501');
    expect(wrapper.text()).toContain('500 not analysed');
  });
});

describe('sortRows and filterRows', () => {
  const row = (name: string, utilisation: number | null, status: OverviewRow['status']): OverviewRow => ({
    member: { id: name, name, supports: 'simply-supported', span: 1000, zones: [], loads: [], service: { sustainedLiveFraction: 0, durationMonths: 0, limitCases: [] }, capacity: { pattern: 'proportional', hingeLengthMethod: 'priestley-2007' } },
    key: utilisation === null ? null : ({ governingMode: `${name} governs`, deflection: { utilisation, deflection: 1, limit: 1, ratio: 240, pass: utilisation <= 1, limitCase: 'custom', description: '' } } as unknown as OverviewRow['key']),
    status,
  });
  const rows = [row('B-10', 0.5, 'ok'), row('B-2', null, 'pending'), row('B-1', 1.3, 'check-fails')];

  it('sorts marks in natural order (B-2 before B-10)', () => {
    expect(sortRows(rows, 'name', false).map((r) => r.member.name)).toEqual(['B-1', 'B-2', 'B-10']);
  });

  it('puts members without a value last in both directions', () => {
    expect(sortRows(rows, 'utilisation', false).map((r) => r.member.name)).toEqual(['B-10', 'B-1', 'B-2']);
    expect(sortRows(rows, 'utilisation', true).map((r) => r.member.name)).toEqual(['B-1', 'B-10', 'B-2']);
  });

  it('sorts by status with the most severe first', () => {
    expect(sortRows(rows, 'status', false).map((r) => r.status)).toEqual(['check-fails', 'pending', 'ok']);
  });

  it('filters by status and by text in the mark or the governing mode', () => {
    expect(filterRows(rows, '', 'pending').map((r) => r.member.name)).toEqual(['B-2']);
    expect(filterRows(rows, 'B-10 GOV', 'all').map((r) => r.member.name)).toEqual(['B-10']);
    expect(filterRows(rows, 'governs here', 'all')).toEqual([]);
    expect(filterRows(rows, '  ', 'all')).toHaveLength(3);
  });
});
