/**
 * The analysis store with the real analysis service running in-process: whole-project analysis
 * with progress, re-analysis of exactly the members an edit touches, diagnostics placed on
 * fields, results of earlier inputs shown again on undo, cancel, and states at a curvature.
 */
import { describe, expect, it } from 'vitest';
import { watch } from 'vue';
import { say } from '../../../core/units/phrase.ts';
import { setMemberField, setSectionField } from '../../../renderer/src/project/edits.ts';
import { useAnalysisStore } from '../../../renderer/src/stores/analysis.ts';
import { useDocumentStore } from '../../../renderer/src/stores/document.ts';
import type { WorkerRequest } from '../../../renderer/src/workers/protocol.ts';
import { setWorkerFactory } from '../../../renderer/src/workers/engine.ts';
import { inProcessWorkerFactory } from '../../../renderer/src/workers/in-process.ts';
import { recordingFactory, testEnvironment, until } from '../support.ts';

type Analyze = Extract<WorkerRequest, { type: 'analyze' }>;
const analyzeRequests = (requests: WorkerRequest[]) => requests.filter((r): r is Analyze => r.type === 'analyze');

/** The demo opened and analysed whole (for real once, then the same replies replayed). */
async function openAndAnalyse(kind: 'si' | 'us' = 'si') {
  const env = testEnvironment({}, { replay: true });
  const documentStore = useDocumentStore();
  const analysis = useAnalysisStore();
  documentStore.openDemo(kind);
  await analysis.analyseAll();
  return { env, documentStore, analysis };
}

const allCurrent = (analysis: ReturnType<typeof useAnalysisStore>, ids: readonly string[]) => ids.every((id) => analysis.keyOf(id)?.current === true);

describe('whole-project analysis', () => {
  it('gives every member current key results and reports progress to the end', async () => {
    const { documentStore, analysis, env } = await openAndAnalyse();
    const ids = documentStore.project!.members.map((m) => m.id);
    expect(allCurrent(analysis, ids)).toBe(true);
    expect(analysis.batch).toMatchObject({ running: false, done: ids.length, total: ids.length, outcome: 'done' });
    expect(analysis.outdatedCount).toBe(0);
    const [request] = analyzeRequests(env.requests);
    expect(request!.memberIds).toEqual(ids);
    expect(request!.validate).toBe(true);
    // Key results are picked by core (memberKeyResults): an idealised yield moment below the ultimate one.
    const key = analysis.keyOf('MB-1')!.key;
    expect(key.yieldMoment).toBeGreaterThan(0);
    expect(key.ultimateMoment!).toBeGreaterThanOrEqual(key.yieldMoment! * 0.8);
    expect(say(key.governingMode, 'si').length).toBeGreaterThan(20);
  }, 240_000);
});

describe('after an edit', () => {
  it('shows the section curves of the member on screen before its member result, and keeps them after', async () => {
    const { documentStore, analysis } = await openAndAnalyse();
    analysis.focusedMemberId = 'MB-1';
    await until(() => analysis.detailOf('MB-1')?.current === true, 'full results of MB-1');
    const sectionId = documentStore.project!.members.find((m) => m.id === 'MB-1')!.zones[0]!.sectionId;
    const before = analysis.sectionsOf('MB-1')!;
    documentStore.edit('Change height', (p) => setSectionField(p, sectionId, ['shape', 'height'], 550));
    // New inputs: nothing current until the worker answers.
    expect(analysis.sectionsOf('MB-1')).toBeNull();
    await until(() => analysis.sectionsOf('MB-1') !== null, 'the section curves');
    const early = analysis.sectionsOf('MB-1')!;
    expect(early).not.toBe(before);
    const afterEarly = analysis.detailOf('MB-1');
    // The member result may still be the old one while the new section curves are already there.
    if (afterEarly && !afterEarly.current) expect(afterEarly.result.sections).not.toBe(early);
    await until(() => analysis.detailOf('MB-1')?.current === true, 'the new member result');
    // The member result holds the very objects sent ahead: the chart is not drawn again for nothing.
    expect(analysis.detailOf('MB-1')!.result.sections).toBe(early);
    expect(analysis.sectionsOf('MB-1')).toBe(early);
  }, 240_000);

  it('shows the section curves of a new edit while the worker is still busy with the previous edit’s member analysis', async () => {
    const { documentStore, analysis, env } = await openAndAnalyse();
    analysis.focusedMemberId = 'MB-1';
    await until(() => analysis.detailOf('MB-1')?.current === true, 'full results of MB-1');
    // From now on the analysis jobs are held back: the interactive worker stays busy with the first
    // edit (a member analysis cannot be interrupted), whatever the machine's speed.
    const held: (() => void)[] = [];
    setWorkerFactory(recordingFactory(env.requests, () => {
      const worker = inProcessWorkerFactory();
      const post = worker.postMessage.bind(worker);
      worker.postMessage = (message) => (message.type === 'analyze' ? held.push(() => post(message)) : post(message));
      return worker;
    }));
    const sectionId = documentStore.project!.members.find((m) => m.id === 'MB-1')!.zones[0]!.sectionId;
    const before = analysis.sectionsOf('MB-1')!;
    documentStore.edit('Change height', (p) => setSectionField(p, sectionId, ['shape', 'height'], 520));
    await until(() => held.length === 1, 'the first edit’s job');
    documentStore.edit('Change height', (p) => setSectionField(p, sectionId, ['shape', 'height'], 560));
    await until(() => analysis.sectionsOf('MB-1') !== null, 'the second edit’s section curves');
    const early = analysis.sectionsOf('MB-1')!;
    // They came from the sections worker while the member analysis was still held.
    expect(held.length).toBe(1);
    expect(env.requests.filter((r) => r.type === 'sections').length).toBe(1);
    expect(JSON.stringify(early)).not.toBe(JSON.stringify(before));
    // The held job goes on, ends (stale), and the member result for the second edit keeps those very objects.
    while (held.length > 0) held.shift()!();
    await until(() => {
      while (held.length > 0) held.shift()!();
      return analysis.detailOf('MB-1')?.current === true;
    }, 'the member result of the second edit');
    expect(analysis.detailOf('MB-1')!.result.sections).toBe(early);
    // The curves sent ahead are those of the member analysis of the second edit (same engine, same inputs).
    expect(JSON.stringify(analysis.detailOf('MB-1')!.result.sections)).toBe(JSON.stringify(early));
  }, 240_000);

  it('re-analyses only the edited member, and the member on screen with its full results', async () => {
    const { documentStore, analysis, env } = await openAndAnalyse();
    analysis.focusedMemberId = 'MB-2';
    await until(() => analysis.detailOf('MB-2')?.current === true, 'full results of MB-2');
    const before = analyzeRequests(env.requests).length;
    const otherKey = analysis.keyOf('MB-3')!.key;
    documentStore.edit('Change span', (p) => setMemberField(p, 'MB-1', ['span'], 6900));
    expect(analysis.keyOf('MB-1')!.current).toBe(false);
    await until(() => analysis.keyOf('MB-1')?.current === true, 'MB-1 re-analysed');
    const jobs = analyzeRequests(env.requests).slice(before);
    expect(jobs.flatMap((j) => j.memberIds)).toEqual(['MB-1']);
    expect(jobs[0]!.project.members.map((m) => m.id)).toEqual(['MB-1']);
    expect(analysis.keyOf('MB-3')!.key).toBe(otherKey);
  }, 240_000);

  it('re-analyses every member using an edited section (members elsewhere untouched)', async () => {
    const { documentStore, analysis, env } = await openAndAnalyse();
    const before = analyzeRequests(env.requests).length;
    documentStore.edit('Change height', (p) => setSectionField(p, 'T500-end', ['shape', 'height'], 550));
    await until(() => allCurrent(analysis, documentStore.project!.members.map((m) => m.id)), 'all current again');
    const analysed = analyzeRequests(env.requests).slice(before).flatMap((j) => j.memberIds).sort();
    const users = documentStore.project!.members.filter((m) => m.zones.some((z) => z.sectionId === 'T500-end')).map((m) => m.id).sort();
    expect(analysed).toEqual(users);
    expect(users.length).toBeGreaterThan(0);
    expect(users.length).toBeLessThan(documentStore.project!.members.length);
  }, 240_000);

  it('places core’s message on the field, naming the allowed range, and clears it when fixed', async () => {
    const { documentStore, analysis } = await openAndAnalyse();
    documentStore.edit('Change span', (p) => setMemberField(p, 'MB-1', ['span'], -2000));
    await until(() => analysis.diagnosticsOf('members', 'MB-1', 'span').length > 0, 'a span diagnostic');
    const [d] = analysis.diagnosticsOf('members', 'MB-1', 'span');
    expect(d!.severity).toBe('error');
    expect(say(d!.message, 'si')).toMatch(/greater than 0/);
    expect(say(d!.message, 'si')).toMatch(/-2 m/);
    await until(() => analysis.keyOf('MB-1')?.current === true, 'MB-1 analysed');
    expect(analysis.keyOf('MB-1')!.key.status).toBe('input-error');
    documentStore.edit('Change span', (p) => setMemberField(p, 'MB-1', ['span'], 7200));
    await until(() => analysis.diagnosticsOf('members', 'MB-1', 'span').length === 0, 'the diagnostic to clear');
  }, 240_000);

  it('shows the earlier results again at once on undo, without analysing', async () => {
    const { documentStore, analysis, env } = await openAndAnalyse();
    const original = analysis.keyOf('MB-1')!.key;
    documentStore.edit('Change span', (p) => setMemberField(p, 'MB-1', ['span'], 6900));
    await until(() => analysis.keyOf('MB-1')?.current === true, 'MB-1 re-analysed');
    expect(analysis.keyOf('MB-1')!.key).not.toBe(original);
    const before = analyzeRequests(env.requests).length;
    documentStore.undo();
    expect(analysis.keyOf('MB-1')).toEqual({ key: original, current: true });
    await new Promise((resolve) => setTimeout(resolve, 100));
    expect(analyzeRequests(env.requests).length).toBe(before);
  }, 240_000);
});

describe('cancel', () => {
  it('stops the whole-project analysis at once and keeps what was done', async () => {
    testEnvironment();
    const documentStore = useDocumentStore();
    const analysis = useAnalysisStore();
    documentStore.openDemo('us');
    // Cancel the moment the first member is done (a synchronous watcher), not at the next poll: on an
    // idle machine the whole batch could finish between two polls and the test would depend on speed.
    const stop = watch(() => analysis.batch.done, (done) => { if (done >= 1) analysis.cancelAll(); }, { flush: 'sync' });
    const running = analysis.analyseAll();
    await until(() => analysis.batch.done >= 1, 'the first member');
    await running;
    stop();
    expect(analysis.batch.running).toBe(false);
    expect(analysis.batch.outcome).toBe('cancelled');
    const ids = documentStore.project!.members.map((m) => m.id);
    const analysed = ids.filter((id) => analysis.keyOf(id) !== null).length;
    expect(analysed).toBeGreaterThanOrEqual(1);
    expect(analysed).toBeLessThan(ids.length);
    // Members left unanalysed are not picked up behind the user's back.
    await new Promise((resolve) => setTimeout(resolve, 200));
    expect(ids.filter((id) => analysis.keyOf(id) !== null).length).toBe(analysed);
  }, 240_000);
});

describe('state at a curvature', () => {
  it('reproduces the moment of a key point at its curvature (same solver as the curve)', async () => {
    const { analysis } = await openAndAnalyse();
    analysis.focusedMemberId = 'MB-1';
    await until(() => analysis.detailOf('MB-1')?.current === true, 'full results of MB-1');
    const section = analysis.detailOf('MB-1')!.result.sections[0]!;
    const firstYield = section.sagging!.keyPoints.firstYield!;
    const state = await analysis.stateAt(section.sectionId, 'sagging', firstYield.curvature, firstYield.referenceStrain);
    expect(state.point.curvature).toBeCloseTo(firstYield.curvature, 12);
    expect(Math.abs(state.point.moment - firstYield.moment) / firstYield.moment).toBeLessThan(1e-3);
    expect(state.elements.length).toBeGreaterThan(0);
  }, 240_000);

  it('says why when the section does not exist', async () => {
    const { analysis } = await openAndAnalyse();
    await expect(analysis.stateAt('nope', 'sagging', 1e-5, 0)).rejects.toThrow(/no section "nope"/);
  }, 240_000);
});
