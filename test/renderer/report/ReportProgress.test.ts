/**
 * The PDF export's progress bar and Cancel (issue 15 item 9): hidden when no export runs, a bar that
 * follows the worker's stages over the whole export, and a Cancel that stops the export.
 */
import { mount } from '@vue/test-utils';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { nextTick } from 'vue';
import ReportProgress from '../../../renderer/src/report/ReportProgress.vue';
import { endExport, exportProgress, reportProgress, startExport } from '../../../renderer/src/report/export-progress.ts';

afterEach(() => endExport());

describe('ReportProgress', () => {
  it('shows nothing while no report is being made', () => {
    const wrapper = mount(ReportProgress);
    expect(wrapper.find('[data-testid=report-progress]').exists()).toBe(false);
  });

  it('shows the subject, the stage with its count and a bar over the whole export', async () => {
    const wrapper = mount(ReportProgress);
    startExport('the project (10 members)', () => undefined);
    reportProgress('analysing', 5, 10);
    await nextTick();
    expect(wrapper.text()).toContain('PDF report of the project (10 members)');
    expect(wrapper.get('[data-testid=report-progress-label]').text()).toBe('Analysing the members: 5 of 10');
    const bar = wrapper.get('[data-testid=report-progress-bar]');
    expect(bar.attributes('role')).toBe('progressbar');
    expect(bar.attributes('aria-valuenow')).toBe('15');
    reportProgress('drawing', 110, 110);
    reportProgress('laying-out', 0, 1);
    await nextTick();
    expect(bar.attributes('aria-valuenow')).toBe('40');
    expect(wrapper.get('[data-testid=report-progress-label]').text()).toBe('Laying out the pages');
    reportProgress('writing', 500, 1000);
    await nextTick();
    expect(bar.attributes('aria-valuenow')).toBe('88');
    expect(wrapper.get('[data-testid=report-progress-label]').text()).toBe('Writing the PDF: 50 %');
  });

  it('never moves the bar backwards', () => {
    startExport('member B-201', () => undefined);
    reportProgress('writing', 800, 1000);
    const before = exportProgress.fraction;
    reportProgress('drawing', 1, 100);
    expect(exportProgress.fraction).toBe(before);
  });

  it('cancels the export with the Cancel button', async () => {
    const cancel = vi.fn();
    const wrapper = mount(ReportProgress);
    startExport('member B-201', cancel);
    await nextTick();
    await wrapper.get('[data-testid=report-cancel]').trigger('click');
    expect(cancel).toHaveBeenCalledTimes(1);
    endExport();
    await nextTick();
    expect(wrapper.find('[data-testid=report-progress]').exists()).toBe(false);
  });
});
