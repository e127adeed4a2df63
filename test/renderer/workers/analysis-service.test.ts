/**
 * The analysis worker's service (run in-process): analysis in chunks that a cancel can stop,
 * full results only where asked, file parsing and writing, and errors as messages.
 */
import { describe, expect, it } from 'vitest';
import { analyzeMembers } from '../../../core/analysis.ts';
import { demoProjectSI } from '../../../core/project/demo.ts';
import { parseProject, serializeProject } from '../../../core/project/file.ts';
import { createAnalysisService } from '../../../renderer/src/workers/analysis-service.ts';
import type { WorkerReply } from '../../../renderer/src/workers/protocol.ts';

function service() {
  const replies: WorkerReply[] = [];
  return { replies, service: createAnalysisService((reply) => replies.push(reply)) };
}

const project = demoProjectSI();
const ids = project.members.map((m) => m.id);

describe('analyze', () => {
  it('sends key results for every member, full results only for those asked, progress, then done', async () => {
    const { replies, service: s } = service();
    await s.handle({ type: 'analyze', id: 1, project, indexMap: null, memberIds: ids, detailIds: ['MB-2'], validate: true, chunkSize: 2 });
    const members = replies.filter((r) => r.type === 'member');
    expect(members.map((r) => r.memberId)).toEqual(ids);
    expect(members.filter((r) => r.detail !== null).map((r) => r.memberId)).toEqual(['MB-2']);
    expect(replies.filter((r) => r.type === 'progress').map((r) => r.done)).toEqual([1, 2, 3, 4]);
    expect(replies.some((r) => r.type === 'diagnostics' && r.covered.project)).toBe(true);
    expect(replies[replies.length - 1]!.type).toBe('done');
  }, 240_000);

  it('stops at the next chunk when cancelled and returns the members not analysed', async () => {
    const { replies, service: s } = service();
    const running = s.handle({ type: 'analyze', id: 7, project, indexMap: null, memberIds: ids, detailIds: [], validate: false, chunkSize: 1 });
    await s.handle({ type: 'cancel', id: 8, target: 7 });
    await running;
    const last = replies[replies.length - 1]!;
    expect(last.type).toBe('cancelled');
    if (last.type === 'cancelled') {
      const done = replies.filter((r) => r.type === 'member').length;
      expect(done).toBeGreaterThanOrEqual(1);
      expect(last.remaining).toEqual(ids.slice(done));
    }
  }, 240_000);

  it('sends the section curves of the member on screen first, equal to those of its member result, and not twice', async () => {
    const { replies, service: s } = service();
    await s.handle({ type: 'analyze', id: 9, project, indexMap: null, memberIds: ['MB-1', 'MB-2'], detailIds: ['MB-1'], validate: false, chunkSize: 4 });
    expect(replies.map((r) => r.type).slice(0, 2)).toEqual(['sections', 'member']);
    const sections = replies[0]!.type === 'sections' ? replies[0]!.sections : [];
    const reply = replies[1]!;
    expect(reply).toMatchObject({ type: 'member', memberId: 'MB-1', sectionsSent: true });
    if (reply.type === 'member') expect(reply.detail!.sections).toEqual([]);
    // The same as the member's own analysis gives.
    expect(sections).toEqual(analyzeMembers(project, ['MB-1'])[0]!.sections);
    // Only for the member whose full results are wanted.
    expect(replies.filter((r) => r.type === 'sections')).toHaveLength(1);
  }, 240_000);

  it('answers a sections request with the curves the member analysis gives, then done; none for a member whose sections its condition derives', async () => {
    const { replies, service: s } = service();
    await s.handle({ type: 'sections', id: 11, project, indexMap: null, memberId: 'MB-1' });
    expect(replies.map((r) => r.type)).toEqual(['sections', 'done']);
    const sent = replies[0]!.type === 'sections' ? replies[0]!.sections : [];
    expect(sent).toEqual(analyzeMembers(project, ['MB-1'])[0]!.sections);
    // An as-found condition changes the sections: they come with the member result only.
    const found = { ...project, members: project.members.map((m) => (m.id === 'MB-1' ? { ...m, asFound: { notes: 'surveyed' } } : m)) };
    const other = service();
    await other.service.handle({ type: 'sections', id: 12, project: found, indexMap: null, memberId: 'MB-1' });
    expect(other.replies.map((r) => r.type)).toEqual(['done']);
  }, 240_000);

  it('ignores ids that are not in the project', async () => {
    const { replies, service: s } = service();
    await s.handle({ type: 'analyze', id: 2, project, indexMap: null, memberIds: ['nope'], detailIds: [], validate: false, chunkSize: 4 });
    expect(replies.map((r) => r.type)).toEqual(['done']);
  });
});

describe('files', () => {
  it('writes the project as core does and reads it back', async () => {
    const { replies, service: s } = service();
    await s.handle({ type: 'serialize', id: 3, project });
    const text = replies[0]!.type === 'text' ? replies[0]!.text : '';
    expect(text).toBe(serializeProject(project));
    await s.handle({ type: 'parse', id: 4, text });
    const parsed = replies[1]!;
    expect(parsed.type).toBe('parsed');
    if (parsed.type === 'parsed') expect(parsed.project).toEqual(parseProject(text).project);
  });

  it('reports a file that is not JSON with core’s diagnostic, not an exception', async () => {
    const { replies, service: s } = service();
    await s.handle({ type: 'parse', id: 5, text: 'not json' });
    expect(replies[0]).toMatchObject({ type: 'parsed', project: null });
  });
});

describe('state', () => {
  it('answers an unknown section with an error message', async () => {
    const { replies, service: s } = service();
    await s.handle({ type: 'state', id: 6, project, sectionId: 'missing', direction: 'sagging', curvature: 1e-5, guess: 0 });
    expect(replies[0]).toMatchObject({ type: 'error', id: 6 });
    if (replies[0]!.type === 'error') expect(replies[0]!.message).toMatch(/no section "missing"/);
  });
});
