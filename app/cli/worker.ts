/**
 * Worker-thread body of parallel.ts: receives the project once (workerData), then analyses the
 * members of each chunk the parent sends with the core entry point and posts the results back as
 * plain data. One section cache serves every chunk, so each section is analysed once per worker.
 * Messages from the parent: `{ type: 'analyze', memberIds }`. Messages to the parent:
 *  - `{ type: 'progress', memberId }` after each member;
 *  - `{ type: 'results', packed }` once per chunk, with its MemberResults; the section curves and
 *    properties they share go once per worker (shared-sections.ts), so they stay shared;
 *  - `{ type: 'failed', message }` when something outside a member's analysis goes wrong.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { analyzeMembers, sectionCache } from '../../core/analysis.ts';
import type { Project } from '../../core/project/types.ts';
import { resultPacker, type PackedResults } from './shared-sections.ts';

export interface WorkerInput {
  readonly project: Project;
}

export type ParentMessage = { readonly type: 'analyze'; readonly memberIds: readonly string[] };

export type WorkerMessage =
  | { readonly type: 'progress'; readonly memberId: string }
  | { readonly type: 'results'; readonly packed: PackedResults }
  | { readonly type: 'failed'; readonly message: string };

function run(port: NonNullable<typeof parentPort>, input: WorkerInput): void {
  const post = (message: WorkerMessage) => port.postMessage(message);
  const sections = sectionCache(input.project);
  const pack = resultPacker();
  port.on('message', (message: ParentMessage) => {
    try {
      const results = analyzeMembers(input.project, message.memberIds, (_done, _total, memberId) => post({ type: 'progress', memberId }), sections);
      post({ type: 'results', packed: pack(results) });
    } catch (error) {
      post({ type: 'failed', message: error instanceof Error ? error.message : String(error) });
    }
  });
}

if (parentPort) run(parentPort, workerData as WorkerInput);
