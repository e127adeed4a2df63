/**
 * Worker-thread body of parallel.ts: analyses the members it is given with the core entry point and
 * posts the results back as plain data. Messages to the parent:
 *  - `{ type: 'progress', done, total, memberId }` after each member;
 *  - `{ type: 'done', results }` once, with every MemberResult (one message, so that section results
 *    shared between members stay shared after the structured clone);
 *  - `{ type: 'failed', message }` when something outside a member's analysis goes wrong.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { analyzeMembers } from '../../core/analysis.ts';
import type { Project } from '../../core/project/types.ts';

export interface WorkerInput {
  readonly project: Project;
  readonly memberIds: readonly string[];
}

export type WorkerMessage =
  | { readonly type: 'progress'; readonly done: number; readonly total: number; readonly memberId: string }
  | { readonly type: 'done'; readonly results: ReturnType<typeof analyzeMembers> }
  | { readonly type: 'failed'; readonly message: string };

function run(port: NonNullable<typeof parentPort>, input: WorkerInput): void {
  const post = (message: WorkerMessage) => port.postMessage(message);
  try {
    const results = analyzeMembers(input.project, input.memberIds, (done, total, memberId) => post({ type: 'progress', done, total, memberId }));
    post({ type: 'done', results });
  } catch (error) {
    post({ type: 'failed', message: error instanceof Error ? error.message : String(error) });
  }
}

if (parentPort) run(parentPort, workerData as WorkerInput);
