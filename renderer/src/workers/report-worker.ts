/**
 * The PDF report, made off the UI thread with the same code as the command line: analyse the
 * members (core/analysis), draw the charts with chart.js on core's recording canvas (chartSvg, the
 * same SVG as `hingeline report`), build the document definition (core/report, with the fallback
 * fonts for names in other scripts) and lay it out with pdfmake 0.3's browser build, adjusted as in
 * the command line (charts drawn from their figure programs, words that print alike written as one
 * text object), so both write the same pages. Loaded only when
 * a report is asked for; the page stops it (terminate) to cancel.
 */
import pdfMakeModule from 'pdfmake/build/pdfmake.js';
import { BasicPlatform } from 'chart.js';
import { analyzeContinuousMembers, analyzeMembers, summarize, type ProjectResults } from '../../../core/analysis.ts';
import { chartSvg } from '../../../core/report/chart-svg.ts';
import { buildReportDocument } from '../../../core/report/document.ts';
import { reportCharts } from '../../../core/report/figures.ts';
import { reportFontDescriptors } from '../../../core/report/fonts.ts';
import { findBundledClasses, installReportAdjustments } from '../../../core/report/pdfmake-classes.ts';
import type { MemberResult } from '../../../core/assessment/results.ts';
import { chartJs } from '../charts/chartjs.ts';
import { loadReportFonts, type BrowserReportFonts } from '../report/report-fonts.ts';
import type { ReportReply, ReportRequest } from '../report/report-protocol.ts';

interface PdfMakeBrowser {
  addVirtualFileSystem(files: Record<string, string>): void;
  setFonts(fonts: Record<string, unknown>): void;
  setUrlAccessPolicy(policy: (url: string) => boolean): void;
  setProgressCallback(callback: ((fraction: number) => void) | undefined): void;
  createPdf(definition: unknown): { getBuffer(): Promise<Uint8Array>; getStream(): Promise<object> };
}

interface WorkerScope {
  postMessage(message: ReportReply, transfer?: Transferable[]): void;
  addEventListener(type: 'message', listener: (event: MessageEvent<ReportRequest>) => void): void;
}

const scope = self as unknown as WorkerScope;
const pdfMake = ((pdfMakeModule as unknown as { default?: PdfMakeBrowser }).default ?? pdfMakeModule) as unknown as PdfMakeBrowser;
let ready: Promise<BrowserReportFonts> | null = null;

/** pdfmake's fonts (Roboto and the Noto fallbacks), loaded once per worker. */
function prepare(): Promise<BrowserReportFonts> {
  ready ??= loadReportFonts().then(async (loaded) => {
    pdfMake.addVirtualFileSystem(loaded.vfs);
    pdfMake.setFonts(reportFontDescriptors());
    pdfMake.setUrlAccessPolicy(() => false);
    // The same adjustments of pdfmake as in the command line (charts drawn from their figure
    // programs, inline measuring, words that print alike as one text object). The browser build
    // exports none of the classes they change: a one-line document shows them
    // (core/report/pdfmake-classes.ts). Nothing else runs in this worker until it is ready.
    installReportAdjustments(await findBundledClasses(pdfMake));
    return loaded;
  });
  return ready;
}

async function sha256(text: string): Promise<string> {
  if (!crypto?.subtle) throw new Error('This window cannot compute the SHA-256 of the project for the report (no secure context).');
  const digest = await crypto.subtle.digest('SHA-256', new TextEncoder().encode(text));
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}

async function report(request: ReportRequest): Promise<void> {
  const { fonts } = await prepare();
  const progress = (stage: Extract<ReportReply, { type: 'progress' }>['stage'], done: number, total: number) => scope.postMessage({ type: 'progress', id: request.id, stage, done, total });
  const { project, memberIds } = request;
  const members: MemberResult[] = [];
  const continuousIds = new Set((project.continuousMembers ?? []).map((m) => m.id));
  const single = memberIds.filter((id) => !continuousIds.has(id));
  for (const id of single) {
    members.push(...analyzeMembers(project, [id]));
    progress('analysing', members.length, memberIds.length);
  }
  const wantedContinuous = memberIds.filter((id) => continuousIds.has(id));
  const continuous = wantedContinuous.length > 0 ? analyzeContinuousMembers(project, wantedContinuous) : [];
  if (continuous.length > 0) progress('analysing', memberIds.length, memberIds.length);
  const results: ProjectResults = { projectName: project.info.name, codeBasis: project.info.codeBasis, members, ...(continuous.length > 0 ? { continuous } : {}), summary: summarize(members) };
  const figures = Object.entries(reportCharts({ project, results, memberIds }));
  const images: Record<string, string> = {};
  const library = { Chart: chartJs(), BasicPlatform };
  let drawn = 0;
  for (const [id, figure] of figures) {
    images[id] = figure.kind === 'svg' ? figure.svg : chartSvg(library as never, figure.spec, figure.width, figure.height, fonts);
    drawn += 1;
    if (drawn % 4 === 0 || drawn === figures.length) progress('drawing', drawn, figures.length);
  }
  const definition = buildReportDocument({
    project,
    results,
    memberIds,
    images,
    meta: { softwareVersion: request.softwareVersion, projectHash: await sha256(request.projectText), generatedOn: request.generatedOn },
    fonts,
    chartPrograms: true,
  });
  progress('laying-out', 0, 1);
  let reported = -1;
  pdfMake.setProgressCallback((fraction) => {
    const thousandths = Math.floor(fraction * 1000);
    if (thousandths - reported >= 10) {
      reported = thousandths;
      progress('writing', thousandths, 1000);
    }
  });
  const creationDate = new Date(request.generatedOn);
  const buffer = await pdfMake.createPdf({ ...definition, info: { ...definition.info, creationDate } }).getBuffer();
  const bytes = new Uint8Array(buffer.byteLength);
  bytes.set(buffer);
  scope.postMessage({ type: 'pdf', id: request.id, bytes, pages: null }, [bytes.buffer]);
}

scope.addEventListener('message', (event) => {
  report(event.data).catch((error: unknown) => {
    scope.postMessage({ type: 'error', id: event.data.id, message: error instanceof Error ? error.message : String(error) });
  });
});
