/**
 * Messages between the renderer and its analysis workers. Everything is plain, structured-clone
 * data. Every request carries an `id`; every reply names the request it answers.
 *
 * Item paths: jobs are sent as a sub-project (only the members asked for and what they use).
 * `indexMap` gives, for each list of the sub-project, the index of each item in the whole project,
 * so that every path the engine writes (`members[0] "B-1".span`) is turned back into the path of
 * the whole project before it reaches the user.
 */
import type { Diagnostic } from '../../../core/diagnostics.ts';
import type { BendingDirection } from '../../../core/section/model.ts';
import type { Project } from '../../../core/project/types.ts';
import type { MemberKeyResults } from '../../../core/project/key-results.ts';
import type { SectionState } from '../../../core/section/results.ts';
import type { MemberResult } from '../../../core/assessment/results.ts';
import type { SectionResult } from '../../../core/member/results.ts';
import type { ContinuousMemberResult } from '../../../core/assessment/continuous-verdict.ts';

export type ItemList = 'materials' | 'sections' | 'members' | 'continuousMembers';

export interface IndexMap {
  readonly materials: readonly number[];
  readonly sections: readonly number[];
  readonly members: readonly number[];
  /** Continuous members (project version 3); omitted: the sub-project holds none. */
  readonly continuousMembers?: readonly number[];
}

/** A diagnostic placed on one item of the project by id, with the field path inside the item. */
export interface ItemDiagnostic {
  /** The list the item is in, or `project` for the file, info and settings. */
  readonly list: ItemList | 'project';
  /** Item id (empty for `project`). */
  readonly itemId: string;
  /** Field path inside the item, e.g. `span`, `zones[1].from`, `shape.width` (empty: the item itself). */
  readonly field: string;
  /** The whole-project path as the engine wrote it, for lists of problems. */
  readonly path: string;
  readonly code: Diagnostic['code'];
  readonly severity: Diagnostic['severity'];
  readonly message: string;
}

/** The items a validation covered: their old diagnostics are replaced by the new ones. */
export interface CoveredItems {
  readonly materials: readonly string[];
  readonly sections: readonly string[];
  readonly members: readonly string[];
  readonly continuousMembers: readonly string[];
  /** True when the file-level, info and settings checks were part of it. */
  readonly project: boolean;
}

export type WorkerRequest =
  | {
      readonly type: 'analyze';
      readonly id: number;
      readonly project: Project;
      readonly indexMap: IndexMap | null;
      /** Members to analyse, in the order wanted (the member on screen first). */
      readonly memberIds: readonly string[];
      /** Members whose full results are wanted back (not only the key results). */
      readonly detailIds: readonly string[];
      /** Validate the (sub-)project first and send its diagnostics. */
      readonly validate: boolean;
      /** Members analysed together (sharing section analyses) between two checks for cancellation. */
      readonly chunkSize: number;
    }
  /**
   * The section results (moment–curvature) of one member only, for its current inputs: sent to a
   * worker of its own while the interactive worker is still busy with an earlier edit's member
   * analysis, so that the section chart follows the edit at once. Answered with a `sections` reply
   * (none for a member whose sections come from an as-found condition or a scheme), then `done`.
   */
  | { readonly type: 'sections'; readonly id: number; readonly project: Project; readonly indexMap: IndexMap | null; readonly memberId: string }
  | { readonly type: 'cancel'; readonly id: number; readonly target: number }
  | { readonly type: 'validate'; readonly id: number; readonly project: Project; readonly indexMap: IndexMap | null }
  | { readonly type: 'parse'; readonly id: number; readonly text: string }
  | { readonly type: 'serialize'; readonly id: number; readonly project: Project }
  | {
      readonly type: 'state';
      readonly id: number;
      readonly project: Project;
      readonly sectionId: string;
      readonly direction: BendingDirection;
      /** Curvature magnitude, 1/mm, and a first guess of the centroid strain. */
      readonly curvature: number;
      readonly guess: number;
    }
  | { readonly type: 'csv'; readonly id: number; readonly project: Project }
  /**
   * Continuous members to analyse (`memberIds`, in that order). The sub-project keeps the whole
   * project's `continuousMembers` list (so that result paths name the right index) with the
   * sections and materials of those asked for.
   */
  | { readonly type: 'analyze-continuous'; readonly id: number; readonly project: Project; readonly memberIds: readonly string[] };

export type WorkerReply =
  /**
   * A member analysed: key results, and the full result when asked for. `sectionsSent`: its
   * sections went ahead in a `sections` reply of this job and are left out of `detail` (empty),
   * so that the largest part of the result crosses to the page once.
   */
  | { readonly type: 'member'; readonly id: number; readonly memberId: string; readonly key: MemberKeyResults; readonly detail: MemberResult | null; readonly sectionsSent?: boolean }
  /**
   * The section results (moment–curvature) of the member on screen, sent before its member
   * analysis: the section chart follows an edit without waiting for the load–deflection analysis.
   * The same objects as the `sections` of the member result that follows (same inputs, same engine).
   * Also the answer to a `sections` request.
   */
  | { readonly type: 'sections'; readonly id: number; readonly memberId: string; readonly sections: readonly SectionResult[] }
  /** A continuous member analysed (its full results: a few per project, each small). */
  | { readonly type: 'continuous'; readonly id: number; readonly memberId: string; readonly result: ContinuousMemberResult }
  | { readonly type: 'progress'; readonly id: number; readonly done: number; readonly total: number; readonly memberId: string }
  | { readonly type: 'diagnostics'; readonly id: number; readonly diagnostics: readonly ItemDiagnostic[]; readonly covered: CoveredItems }
  | { readonly type: 'done'; readonly id: number; readonly elapsedMs: number }
  | { readonly type: 'cancelled'; readonly id: number; readonly remaining: readonly string[] }
  | { readonly type: 'parsed'; readonly id: number; readonly project: Project | null; readonly diagnostics: readonly Diagnostic[] }
  | { readonly type: 'text'; readonly id: number; readonly text: string }
  | { readonly type: 'state'; readonly id: number; readonly state: SectionState }
  | { readonly type: 'error'; readonly id: number; readonly message: string };

/** Distributes the `Omit` over a union, so that each request keeps its own fields. */
export type WithoutId<T> = T extends unknown ? Omit<T, 'id'> : never;
