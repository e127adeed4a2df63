/** Messages of the report worker (plain, structured-clone data). */
import type { Project } from '../../../core/project/types.ts';

export interface ReportRequest {
  readonly type: 'report';
  readonly id: number;
  /** The project (or the part of it the report needs), internal units. */
  readonly project: Project;
  /** Members to report, in project order. */
  readonly memberIds: readonly string[];
  /** The project file text the report is tied to (its SHA-256 goes on the cover). */
  readonly projectText: string;
  /** Report date, ISO 8601. */
  readonly generatedOn: string;
  readonly softwareVersion: string;
}

/**
 * Stages of making a report, in order: analysing the members, drawing the charts, laying out the
 * pages (pdfmake, no finer progress), writing the pages (`done` of `total` in thousandths).
 */
export type ReportStage = 'analysing' | 'drawing' | 'laying-out' | 'writing';

export type ReportReply =
  | { readonly type: 'progress'; readonly id: number; readonly stage: ReportStage; readonly done: number; readonly total: number }
  | { readonly type: 'pdf'; readonly id: number; readonly bytes: Uint8Array; readonly pages: number | null }
  | { readonly type: 'error'; readonly id: number; readonly message: string };
