/**
 * The PDF report, made off the UI thread: analyse the members (core/analysis), plan and draw the
 * figures (core/report + chart.js on an OffscreenCanvas), build the document definition
 * (core/report) and lay it out with pdfmake 0.3's browser build, Roboto embedded from pdfmake's own
 * font files. Loaded only when a report is asked for.
 */
import pdfMakeModule from 'pdfmake/build/pdfmake.js';
import vfs from 'pdfmake/build/vfs_fonts.js';
import { analyzeMembers, summarize, type ProjectResults } from '../../../core/analysis.ts';
import { buildReportDocument } from '../../../core/report/document.ts';
import { reportCharts } from '../../../core/report/figures.ts';
import { REPORT_FONT_FAMILY, REPORT_FONT_FILES, reportFontDescriptors } from '../../../core/report/fonts.ts';
import { chartPng } from '../report/render-charts.ts';
import type { ReportReply, ReportRequest } from '../report/report-protocol.ts';
import type { MemberResult } from '../../../core/assessment/results.ts';

interface PdfMakeBrowser {
  addVirtualFileSystem(files: Record<string, string>): void;
  setFonts(fonts: Record<string, unknown>): void;
  setUrlAccessPolicy(policy: (url: string) => boolean): void;
  createPdf(definition: unknown): { getBuffer(): Promise<Uint8Array> };
}

interface WorkerScope {
  postMessage(message: ReportReply, transfer?: Transferable[]): void;
  addEventListener(type: 'message', listener: (event: MessageEvent<ReportRequest>) => void): void;
  fonts?: { add(face: FontFace): void };
}

const scope = self as unknown as WorkerScope;
const pdfMake = ((pdfMakeModule as unknown as { default?: PdfMakeBrowser }).default ?? pdfMakeModule) as unknown as PdfMakeBrowser;
const files = ((vfs as unknown as { default?: Record<string, string> }).default ?? vfs) as unknown as Record<string, string>;
let ready: Promise<void> | null = null;

function bytesOf(base64: string): Uint8Array<ArrayBuffer> {
  const text = atob(base64);
  const out = new Uint8Array(text.length);
  for (let i = 0; i < text.length; i++) out[i] = text.charCodeAt(i);
  return out;
}

/** pdfmake's fonts, and the same faces for the chart canvas (so chart text is Roboto too). */
function prepare(): Promise<void> {
  ready ??= (async () => {
    pdfMake.addVirtualFileSystem(files);
    pdfMake.setFonts(reportFontDescriptors());
    pdfMake.setUrlAccessPolicy(() => false);
    if (scope.fonts && typeof FontFace !== 'undefined') {
      const faces = [
        new FontFace(REPORT_FONT_FAMILY, bytesOf(files[REPORT_FONT_FILES.normal]!), { weight: '400' }),
        new FontFace(REPORT_FONT_FAMILY, bytesOf(files[REPORT_FONT_FILES.bold]!), { weight: '500 700' }),
      ];
      for (const face of faces) scope.fonts.add(await face.load());
    }
  })();
  return ready;
}

async function sha256(text: string): Promise<string> {
  if (!crypto?.subtle) throw new Error('This window cannot compute the SHA-256 of the project for the report (no secure context).');
  const digest = await crypto.subtle.digest('SHA-256', new TextEncoder().encode(text));
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}

async function report(request: ReportRequest): Promise<void> {
  await prepare();
  const { project, memberIds } = request;
  const members: MemberResult[] = [];
  for (const id of memberIds) {
    members.push(...analyzeMembers(project, [id]));
    scope.postMessage({ type: 'progress', id: request.id, stage: 'analysing', done: members.length, total: memberIds.length });
  }
  const results: ProjectResults = { projectName: project.info.name, codeBasis: project.info.codeBasis, members, summary: summarize(members) };
  const figures = reportCharts({ project, results, memberIds });
  const images: Record<string, string> = {};
  const entries = Object.entries(figures);
  let drawn = 0;
  for (const [id, figure] of entries) {
    images[id] = figure.kind === 'svg' ? figure.svg : await chartPng(figure.spec, figure.width, figure.height);
    drawn += 1;
    if (drawn % 4 === 0 || drawn === entries.length) scope.postMessage({ type: 'progress', id: request.id, stage: 'drawing', done: drawn, total: entries.length });
  }
  const definition = buildReportDocument({
    project,
    results,
    memberIds,
    images,
    meta: { softwareVersion: request.softwareVersion, projectHash: await sha256(request.projectText), generatedOn: request.generatedOn },
  });
  scope.postMessage({ type: 'progress', id: request.id, stage: 'writing', done: 0, total: 1 });
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
