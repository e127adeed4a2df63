/**
 * The test harness's replaying workers (test/renderer/support.ts): an analysis job runs once, the
 * same request later gets the recorded replies with its own id, and a cancel stops a replay as it
 * stops a job. Checked against a scripted worker, so each reply is known.
 */
import { describe, expect, it } from 'vitest';
import type { WorkerFactory, WorkerLike } from '../../../renderer/src/workers/engine.ts';
import type { WorkerReply, WorkerRequest } from '../../../renderer/src/workers/protocol.ts';
import { smallProject } from '../../fixtures/projects.ts';
import { replayingFactory, until } from '../support.ts';

type ContinuousJob = Extract<WorkerRequest, { type: 'analyze-continuous' }>;

/** A worker that answers `analyze-continuous` with one `progress` reply per member, then `done`; it counts the jobs it ran. */
function scriptedWorker(ran: WorkerRequest[]): WorkerFactory {
  return () => {
    const worker: WorkerLike = {
      onmessage: null,
      onerror: null,
      postMessage(message) {
        ran.push(message);
        if (message.type !== 'analyze-continuous') return;
        const replies: WorkerReply[] = [
          ...message.memberIds.map((memberId, i) => ({ type: 'progress' as const, id: message.id, done: i + 1, total: message.memberIds.length, memberId })),
          { type: 'done', id: message.id, elapsedMs: 7 },
        ];
        for (const reply of replies) setTimeout(() => worker.onmessage?.({ data: reply } as MessageEvent<WorkerReply>), 0);
      },
      terminate: () => undefined,
    };
    return worker;
  };
}

function listen(worker: WorkerLike): WorkerReply[] {
  const got: WorkerReply[] = [];
  worker.onmessage = (event) => got.push(event.data);
  return got;
}

// A project no other test file sends (its name), so no recording of another file can answer it.
const project = { ...smallProject(), info: { ...smallProject().info, name: 'replaying-factory test' } };
const job = (id: number, memberIds = ['A', 'B', 'C']): ContinuousJob => ({ type: 'analyze-continuous', id, project, memberIds });

describe('replayingFactory', () => {
  it('runs a job once; the same request again gets the same replies with its own id, one per task', async () => {
    const ran: WorkerRequest[] = [];
    const factory = replayingFactory(scriptedWorker(ran));
    const first = factory();
    const firstReplies = listen(first);
    first.postMessage(job(1));
    await until(() => firstReplies.some((r) => r.type === 'done'), 'the first job');
    expect(ran).toHaveLength(1);

    const second = factory();
    const secondReplies = listen(second);
    second.postMessage(job(42));
    // Not answered in the same task: replies come as a worker's would.
    expect(secondReplies).toEqual([]);
    await until(() => secondReplies.some((r) => r.type === 'done'), 'the replayed job');
    expect(ran).toHaveLength(1);
    expect(secondReplies).toEqual(firstReplies.map((r) => ({ ...r, id: 42 })));

    // Another request (other members) runs for real.
    second.postMessage(job(43, ['A']));
    await until(() => secondReplies.some((r) => r.type === 'done' && r.id === 43), 'the other job');
    expect(ran).toHaveLength(2);
  });

  it('stops a replay on cancel and names the members not yet answered', async () => {
    const ran: WorkerRequest[] = [];
    const factory = replayingFactory(scriptedWorker(ran));
    const recorder = factory();
    const recorded = listen(recorder);
    recorder.postMessage(job(1, ['A', 'B', 'C', 'D']));
    await until(() => recorded.some((r) => r.type === 'done'), 'the recorded job');

    const worker = factory();
    const got = listen(worker);
    worker.postMessage(job(2, ['A', 'B', 'C', 'D']));
    worker.postMessage({ type: 'cancel', id: 3, target: 2 });
    await until(() => got.some((r) => r.type === 'cancelled'), 'the cancelled reply');
    expect(got).toEqual([{ type: 'cancelled', id: 2, remaining: ['A', 'B', 'C', 'D'] }]);
    // Only the first job ran for real, and the cancel went no further than the replay.
    expect(ran.map((r) => r.type)).toEqual(['analyze-continuous']);
  });

  it('sends nothing more once terminated', async () => {
    const ran: WorkerRequest[] = [];
    const factory = replayingFactory(scriptedWorker(ran));
    const recorder = factory();
    const recorded = listen(recorder);
    recorder.postMessage(job(1, ['E']));
    await until(() => recorded.some((r) => r.type === 'done'), 'the recorded job');
    const worker = factory();
    const got = listen(worker);
    worker.postMessage(job(2, ['E']));
    worker.terminate();
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(got).toEqual([]);
  });
});
