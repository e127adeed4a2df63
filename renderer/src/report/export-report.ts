/**
 * "Export report": the PDF of the member on screen or of the whole project, made in a report
 * worker (report-worker.ts) and handed to the host to save (and open with the system viewer).
 */
import { projectFileStem } from '../../../core/project/file-stem.ts';
import type { Project } from '../../../core/project/types.ts';
import { toRaw } from 'vue';
import packageJson from '../../../package.json';
import { getHost } from '../host/index.ts';
import { subproject } from '../project/dependencies.ts';
import { useDocumentStore } from '../stores/document.ts';
import { useWorkspaceStore } from '../stores/workspace.ts';
import { endExport, reportProgress, startExport } from './export-progress.ts';
import type { ReportReply, ReportRequest } from './report-protocol.ts';

/** Version printed on the report's cover. */
export const SOFTWARE_VERSION: string = packageJson.version;

let nextId = 1;

/** Error of a report that was cancelled (name `AbortError`). */
export function cancelledError(): Error {
  const error = new Error('The report was cancelled.');
  error.name = 'AbortError';
  return error;
}

/**
 * Runs one report request in a fresh worker (terminated afterwards: pdfmake and its fonts are large).
 * Aborting `signal` terminates the worker at once and rejects with an AbortError.
 */
export function makeReportPdf(request: Omit<ReportRequest, 'id' | 'type'>, onProgress?: (reply: Extract<ReportReply, { type: 'progress' }>) => void, signal?: AbortSignal): Promise<Uint8Array> {
  if (signal?.aborted) return Promise.reject(cancelledError());
  const worker = new Worker(new URL('../workers/report-worker.ts', import.meta.url), { type: 'module', name: 'hingeline-report' });
  const id = nextId++;
  return new Promise<Uint8Array>((resolve, reject) => {
    const finish = () => {
      worker.terminate();
      signal?.removeEventListener('abort', onAbort);
    };
    const onAbort = () => {
      finish();
      reject(cancelledError());
    };
    signal?.addEventListener('abort', onAbort, { once: true });
    worker.onmessage = (event: MessageEvent<ReportReply>) => {
      const reply = event.data;
      if (reply.id !== id) return;
      if (reply.type === 'progress') onProgress?.(reply);
      else {
        finish();
        if (reply.type === 'pdf') resolve(reply.bytes);
        else reject(new Error(reply.message));
      }
    };
    worker.onerror = (event) => {
      finish();
      reject(new Error(`The report worker stopped: ${event.message || 'unknown error'}`));
    };
    worker.postMessage({ ...request, type: 'report', id } satisfies ReportRequest);
  });
}

const fileBase = projectFileStem;

/**
 * Makes and exports the report. `member`: the member on screen; `project`: every member. Progress
 * and Cancel are shown by ReportProgress.vue (export-progress.ts). Returns what the host wrote, or
 * null when the user cancelled the report or the save dialog.
 */
export async function exportReport(scope: 'member' | 'project'): Promise<{ name: string; path: string | null } | null> {
  const documentStore = useDocumentStore();
  const workspace = useWorkspaceStore();
  const project = documentStore.project ? (toRaw(documentStore.project) as Project) : null;
  if (!project) throw new Error('No project is open.');
  // The project's report covers its continuous members too (core/report/continuous.ts), as the command line's does.
  const memberIds = scope === 'member' && workspace.selectedMemberId ? [workspace.selectedMemberId] : [...project.members.map((m) => m.id), ...(project.continuousMembers ?? []).map((m) => m.id)];
  if (memberIds.length === 0) throw new Error('The project has no members to report.');
  const part = scope === 'member' ? subproject(project, memberIds) : project;
  const projectText = await documentStore.text();
  const member = project.members.find((m) => m.id === memberIds[0]);
  const subject = scope === 'member' ? `member ${member?.name ?? memberIds[0]}` : `the project (${memberIds.length} member${memberIds.length === 1 ? '' : 's'})`;
  const controller = new AbortController();
  let bytes: Uint8Array;
  startExport(subject, () => controller.abort());
  try {
    bytes = await makeReportPdf({ project: part, memberIds, projectText, generatedOn: new Date().toISOString(), softwareVersion: SOFTWARE_VERSION }, (progress) => reportProgress(progress.stage, progress.done, progress.total), controller.signal);
  } catch (error) {
    if (error instanceof Error && error.name === 'AbortError') {
      workspace.notify('info', 'The PDF report was cancelled.', 3000);
      return null;
    }
    throw error;
  } finally {
    endExport();
  }
  const base = fileBase(documentStore.title);
  const suggestedName = scope === 'member' && member ? `${base} ${member.name} report.pdf` : `${base} report.pdf`;
  return getHost().exportFile(bytes, { suggestedName, mime: 'application/pdf', openAfterwards: true });
}
