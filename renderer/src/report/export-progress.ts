/**
 * The state of the PDF export in progress, for the progress bar (ReportProgress.vue): one export at a
 * time, its stage and fraction done, and how to cancel it.
 */
import { reactive } from 'vue';
import type { ReportStage } from './report-protocol.ts';

/** Share of the bar each stage fills, from measurements of the demo report (drawing is quick, pdfmake slow). */
const STAGE_SPAN: Readonly<Record<ReportStage, readonly [number, number]>> = {
  analysing: [0, 0.3],
  drawing: [0.3, 0.4],
  'laying-out': [0.4, 0.75],
  writing: [0.75, 1],
};

const STAGE_WORDS: Readonly<Record<ReportStage, string>> = {
  analysing: 'Analysing the members',
  drawing: 'Drawing the charts',
  'laying-out': 'Laying out the pages',
  writing: 'Writing the PDF',
};

export interface ExportProgress {
  /** True while a report is being made. */
  active: boolean;
  /** What is being reported, e.g. "the project (10 members)". */
  subject: string;
  stage: ReportStage | null;
  /** Words for the stage with its count, e.g. "Analysing the members: 3 of 10". */
  label: string;
  /** 0–1 over the whole export. */
  fraction: number;
  /** Stops the export (set while active). */
  cancel: (() => void) | null;
}

export const exportProgress: ExportProgress = reactive({ active: false, subject: '', stage: null, label: '', fraction: 0, cancel: null });

/** Marks the start of an export. */
export function startExport(subject: string, cancel: () => void): void {
  Object.assign(exportProgress, { active: true, subject, stage: null, label: 'Starting', fraction: 0, cancel });
}

/** Records a progress message of the report worker. */
export function reportProgress(stage: ReportStage, done: number, total: number): void {
  const [from, to] = STAGE_SPAN[stage];
  const part = total > 0 ? Math.min(1, Math.max(0, done / total)) : 0;
  const counted = stage === 'analysing' || stage === 'drawing' ? `: ${done} of ${total}` : stage === 'writing' ? `: ${Math.round(part * 100)} %` : '';
  Object.assign(exportProgress, { stage, label: `${STAGE_WORDS[stage]}${counted}`, fraction: Math.max(exportProgress.fraction, from + (to - from) * part) });
}

/** Marks the end of the export (done, failed or cancelled). */
export function endExport(): void {
  Object.assign(exportProgress, { active: false, subject: '', stage: null, label: '', fraction: 0, cancel: null });
}
