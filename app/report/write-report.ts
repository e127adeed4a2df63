/**
 * The review report from Node (the `hingeline report` command and the desktop app's main process):
 * hash the project file, draw the charts with chart.js on @napi-rs/canvas, build the document
 * (core/report) and write the PDF atomically.
 */
import { createHash } from 'node:crypto';
import type { ProjectResults } from '../../core/analysis.ts';
import type { Project } from '../../core/project/types.ts';
import { buildReportDocument } from '../../core/report/document.ts';
import { reportCharts } from '../../core/report/figures.ts';
import { writeFileAtomic } from '../main/atomic-write.ts';
import packageJson from '../../package.json' with { type: 'json' };
import { nodeReportFontSet } from './fonts.ts';
import { renderPdf } from './pdf.ts';
import type { ChartJob } from './chart-worker.ts';
import { chartWorkerCount, renderChartsInWorkers } from './chart-workers.ts';
import { renderChartPng, renderChartSvg } from './render-chart.ts';

/** Version of the program, printed on the cover. */
export const SOFTWARE_VERSION: string = packageJson.version;

export interface ReportOptions {
  readonly project: Project;
  readonly results: ProjectResults;
  /** Members to include (default: all), in project order. */
  readonly memberIds?: readonly string[];
  /** Text of the project file as read from disk; its SHA-256 goes on the cover. */
  readonly sourceText: string;
  /** Report date, ISO 8601 (default: now). Fix it for reproducible files. */
  readonly generatedOn?: string;
  /** Version printed on the cover (default: the package version). */
  readonly softwareVersion?: string;
  /** Charts as vectors or as 144 dpi images (default `auto`: vectors). */
  readonly chartFormat?: ChartFormat | 'auto';
  /** Worker threads for the charts (see `ImageOptions.workers`). */
  readonly chartWorkers?: number;
}

export interface WriteReportOptions extends ReportOptions {
  /** Where to write the PDF. */
  readonly outPath: string;
}

/** SHA-256 of the project file text (UTF-8), lowercase hex. */
export function projectHash(sourceText: string): string {
  return createHash('sha256').update(sourceText, 'utf8').digest('hex');
}

/**
 * How charts go into the PDF: vector (SVG, the default, also for `auto`) or raster (PNG at 144 dpi).
 * The charts are recorded as compact SVG (core/report/svg-canvas.ts: a few kB and a few ms of
 * pdfmake's time each), smaller in the PDF than images and sharp in print.
 */
export type ChartFormat = 'svg' | 'png';

export interface ImageOptions {
  /** Chart format (default and `auto`: `svg`). */
  readonly format?: ChartFormat | 'auto';
  /** Worker threads drawing charts beside this thread: 0 draws on this thread alone (default: 0 below 40 charts, else one per other core). */
  readonly workers?: number;
}

/** Charts from which the default is to draw on worker threads (their start-up costs about half a second). */
export const WORKER_THRESHOLD = 40;

/**
 * Draws every chart the report needs and passes the section drawings through. Resolves with the
 * images by figure id (SVG text or PNG data URL).
 */
export async function renderReportImages(options: Pick<ReportOptions, 'project' | 'results' | 'memberIds'>, imageOptions: ImageOptions = {}): Promise<Record<string, string>> {
  const figures = reportCharts(options);
  const format: ChartFormat = imageOptions.format === 'png' ? 'png' : 'svg';
  const images: Record<string, string> = {};
  const jobs: ChartJob[] = [];
  for (const [id, figure] of Object.entries(figures)) {
    if (figure.kind === 'svg') images[id] = figure.svg;
    else jobs.push({ id, spec: figure.spec, width: figure.width, height: figure.height, format });
  }
  const workers = imageOptions.workers ?? (jobs.length >= WORKER_THRESHOLD ? chartWorkerCount(jobs.length) : 0);
  const drawHere = (job: ChartJob) => (job.format === 'svg' ? renderChartSvg(job.spec, job.width, job.height) : renderChartPng(job.spec, job.width, job.height));
  if (workers > 0) {
    Object.assign(images, await renderChartsInWorkers(jobs, workers, drawHere));
  } else {
    for (const job of jobs) images[job.id] = await drawHere(job);
  }
  // Figure order, whatever order the workers finished in.
  return Object.fromEntries(Object.keys(figures).map((id) => [id, images[id]!]));
}

/** The report as PDF bytes (for tests and for hosts that write the file themselves). */
export async function renderReportBuffer(options: ReportOptions): Promise<Buffer> {
  const generatedOn = options.generatedOn ?? new Date().toISOString();
  const definition = buildReportDocument({
    project: options.project,
    results: options.results,
    ...(options.memberIds ? { memberIds: options.memberIds } : {}),
    images: await renderReportImages(options, { format: options.chartFormat ?? 'auto', ...(options.chartWorkers !== undefined ? { workers: options.chartWorkers } : {}) }),
    meta: { softwareVersion: options.softwareVersion ?? SOFTWARE_VERSION, projectHash: projectHash(options.sourceText), generatedOn },
    fonts: nodeReportFontSet(),
    // renderPdf's pdfmake draws charts from their figure programs.
    chartPrograms: true,
  });
  return renderPdf(definition, generatedOn);
}

/**
 * Writes the report to `outPath` atomically (temp file, fsync, rename): a reader never sees a
 * half-written PDF, and an existing file is replaced only by a complete one.
 */
export async function writeReport(options: WriteReportOptions): Promise<void> {
  const bytes = await renderReportBuffer(options);
  await writeFileAtomic(options.outPath, bytes);
}
