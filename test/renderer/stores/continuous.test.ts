/**
 * The continuous members' store with the real analysis service in-process: the SI demo's CB-1 and
 * CB-2 analysed after opening, CB-2's end span failing in deflection, an edit analysed again and
 * undo showing the earlier result at once; Analyse all sending them all again; a span out of range
 * gets core's message on its field.
 */
import { describe, expect, it } from 'vitest';
import { replaceContinuousMember, withSpanLength } from '../../../renderer/src/project/continuous-edits.ts';
import { setItemField } from '../../../renderer/src/project/edits.ts';
import { useAnalysisStore } from '../../../renderer/src/stores/analysis.ts';
import { useContinuousStore } from '../../../renderer/src/stores/continuous.ts';
import { useDocumentStore } from '../../../renderer/src/stores/document.ts';
import { testEnvironment, until } from '../support.ts';

/** The SI demo opened, its continuous beams analysed (for real once, then replayed). */
async function open() {
  const env = testEnvironment({}, { replay: true });
  const documentStore = useDocumentStore();
  const analysis = useAnalysisStore();
  const continuous = useContinuousStore();
  documentStore.openDemo('si');
  await until(() => ['CB-1', 'CB-2'].every((id) => continuous.resultOf(id)?.current === true), 'results of CB-1 and CB-2', 60_000);
  return { env, documentStore, analysis, continuous };
}

describe('continuous members in the app', () => {
  it('analyses the demo’s continuous beams in the worker; CB-2 fails in its end span', async () => {
    const { continuous, env } = await open();
    const cb2 = continuous.resultOf('CB-2')!.result;
    expect(cb2.verdict.status).toBe('check-fails');
    expect(cb2.verdict.governingSpan).toBe('span 1');
    expect(cb2.verdict.deflectionUtilisation!).toBeGreaterThan(1);
    // CB-1 passes what is checked: never a failure (and not a plain OK while station checks are missing).
    expect(continuous.resultOf('CB-1')!.result.verdict.status).not.toBe('check-fails');
    const request = env.requests.find((r) => r.type === 'analyze-continuous');
    // Only what the members need is sent: no single-span members.
    expect(request && 'project' in request ? request.project.members : null).toEqual([]);
    expect(continuous.outdatedCount()).toBe(0);
  }, 240_000);

  it('analyses an edited beam again, and undo shows the earlier result at once', async () => {
    const { continuous, documentStore } = await open();
    const before = continuous.resultOf('CB-2')!.result;
    documentStore.edit('Change span', (p) => replaceContinuousMember(p, withSpanLength(p.continuousMembers!.find((m) => m.id === 'CB-2')!, 0, 6500)));
    expect(continuous.resultOf('CB-2')!.current).toBe(false);
    expect(continuous.resultOf('CB-1')!.current).toBe(true);
    await until(() => continuous.resultOf('CB-2')?.current === true, 'CB-2 analysed again', 60_000);
    const after = continuous.resultOf('CB-2')!.result;
    expect(after.verdict.deflectionUtilisation!).toBeLessThan(before.verdict.deflectionUtilisation! * 0.8);
    documentStore.undo();
    expect(continuous.resultOf('CB-2')).toEqual({ result: before, current: true });
  }, 240_000);

  it('Analyse all analyses every continuous member again; an edited one comes back with new results', async () => {
    const { continuous, documentStore, analysis, env } = await open();
    const before = { cb1: continuous.resultOf('CB-1')!.result, cb2: continuous.resultOf('CB-2')!.result };
    const sentBefore = env.requests.filter((r) => r.type === 'analyze-continuous').length;
    documentStore.edit('Change span', (p) => replaceContinuousMember(p, withSpanLength(p.continuousMembers!.find((m) => m.id === 'CB-2')!, 0, 6500)));
    await analysis.analyseAll();
    // Both are sent again — the unchanged CB-1 too — and both are current when Analyse all is done.
    const sent = env.requests.filter((r) => r.type === 'analyze-continuous').slice(sentBefore);
    expect(sent.flatMap((r) => ('memberIds' in r ? r.memberIds : [])).sort()).toEqual(['CB-1', 'CB-2']);
    expect(continuous.resultOf('CB-1')).toEqual({ result: expect.anything(), current: true });
    expect(continuous.resultOf('CB-1')!.result).not.toBe(before.cb1);
    expect(continuous.resultOf('CB-1')!.result.verdict).toEqual(before.cb1.verdict);
    const cb2 = continuous.resultOf('CB-2')!;
    expect(cb2.current).toBe(true);
    expect(cb2.result.verdict.deflectionUtilisation!).toBeLessThan(before.cb2.verdict.deflectionUtilisation! * 0.8);
  }, 120_000);

  it('puts core’s message for a span out of range on that span’s field, with the range', async () => {
    const { documentStore, analysis } = await open();
    documentStore.edit('Change span', (p) => setItemField(p, 'continuousMembers', 'CB-2', ['spans', 1], 50));
    await until(() => analysis.diagnosticsOf('continuousMembers', 'CB-2', 'spans[1]').length > 0, 'the message on spans[1]', 30_000);
    const [message] = analysis.diagnosticsOf('continuousMembers', 'CB-2', 'spans[1]');
    expect(message!.severity).toBe('error');
    expect(message!.message).toMatch(/0\.1|100/);
    expect(message!.path).toMatch(/^continuousMembers\[1\] "CB-2"\.spans\[1\]/);
    documentStore.undo();
    await until(() => analysis.diagnosticsOf('continuousMembers', 'CB-2').length === 0, 'the message gone after undo', 30_000);
  }, 240_000);
});
