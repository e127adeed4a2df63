/**
 * The commands of the command line. Each reads and writes only through its CliIo and returns an
 * exit code (args.ts EXIT); the text it prints comes from format.ts.
 */
import { fileURLToPath } from 'node:url';
import { analyzeContinuousMembers, analyzeMembers, summarize, type ProjectResults } from '../../core/analysis.ts';
import { continuousJson, continuousTable } from './continuous.ts';
import { resultsSummaryCsv } from '../../core/project/csv.ts';
import { demoProject, demoProjectSI } from '../../core/project/demo.ts';
import { parseProject, serializeProject } from '../../core/project/file.ts';
import { analysisBlockers } from '../../core/project/validate.ts';
import type { Project } from '../../core/project/types.ts';
import { EXIT, type Command } from './args.ts';
import { ownModule } from './bundle.ts';
import { memberDetail } from './detail.ts';
import { analysisJson, diagnosticLines, problemCount, progressLine, RESULTS_CAUTION, tableReport, type Style } from './format.ts';
import type { CliIo } from './io.ts';
import { analyzeMembersParallel, defaultWorkerCount } from './parallel.ts';
import type { MemberResult } from '../../core/assessment/results.ts';

type Io = CliIo;

export const stdoutStyle = (io: Io): Style => ({ enabled: io.stdoutIsTTY && io.colorAllowed });
const stderrStyle = (io: Io): Style => ({ enabled: io.stderrIsTTY && io.colorAllowed });

/** A problem the user can act on: printed as one line on stderr, with an exit code. */
export class CliFailure extends Error {
  readonly exitCode: number;
  constructor(message: string, exitCode: number) {
    super(message);
    this.name = 'CliFailure';
    this.exitCode = exitCode;
  }
}

export async function readProjectText(io: Io, file: string): Promise<string> {
  try {
    return await io.readText(file);
  } catch (error) {
    const code = (error as { code?: string }).code;
    const reason = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : code === 'EACCES' ? 'permission denied' : error instanceof Error ? error.message : String(error);
    throw new CliFailure(`cannot read ${file}: ${reason}`, EXIT.usage);
  }
}

/** Why a write failed, in words (a NotRegularFileError names what is at the path). */
function writeProblem(error: unknown): string {
  const code = (error as { code?: string }).code;
  return code === 'ENOENT' ? 'the folder does not exist' : code === 'EACCES' || code === 'EPERM' ? 'permission denied' : code === 'EISDIR' ? 'it is a folder' : code === 'ENOTDIR' ? 'a part of the path is not a folder' : code === 'ENOSPC' ? 'the disk is full' : code === 'EROFS' ? 'the disk is read-only' : error instanceof Error ? error.message : String(error);
}

/** Fails at once (exit 2) when `file` cannot be written: before the work, not after it. */
export async function checkOutput(io: Io, file: string): Promise<void> {
  const problem = await io.outputProblem(io.resolvePath(file));
  if (problem !== null) throw new CliFailure(`cannot write ${file}: ${problem}`, EXIT.usage);
}

export async function writeOutput(io: Io, file: string, text: string, options?: { readonly keepBackup?: boolean }): Promise<void> {
  try {
    await io.writeText(file, text, options);
  } catch (error) {
    throw new CliFailure(`cannot write ${file}: ${writeProblem(error)}`, EXIT.usage);
  }
}

interface LoadedProject {
  readonly project: Project;
  readonly text: string;
}

/** Reads and checks a project for analysis; prints its problems to stderr. */
async function loadForAnalysis(io: Io, file: string): Promise<LoadedProject> {
  const text = await readProjectText(io, file);
  const { project, diagnostics } = parseProject(text);
  if (diagnostics.length > 0) io.stderr(`${diagnosticLines(diagnostics, stderrStyle(io)).join('\n')}\n`);
  const blocking = analysisBlockers(diagnostics);
  if (!project || blocking.length > 0) {
    const count = project ? blocking.length : diagnostics.filter((d) => d.severity === 'error').length;
    throw new CliFailure(`${file} cannot be analysed: ${count} error${count === 1 ? '' : 's'} to fix first (see above; "hingeline validate ${file}" lists them again)`, EXIT.problems);
  }
  return { project, text };
}

function selectedMembers(project: Project, ids: readonly string[]): string[] | undefined {
  if (ids.length === 0) return undefined;
  const list = [...project.members, ...(project.continuousMembers ?? [])].map((m) => m.id);
  const known = new Set(list);
  const unknown = ids.filter((id) => !known.has(id));
  if (unknown.length > 0) {
    throw new CliFailure(`no member with id ${unknown.map((u) => `"${u}"`).join(', ')} in the project (members: ${list.slice(0, 20).join(', ')}${list.length > 20 ? ', …' : ''})`, EXIT.usage);
  }
  return [...new Set(ids)];
}

/** Analyses (in parallel unless jobs = 1), with a progress bar on stderr when it is a terminal. */
export async function runAnalysis(io: Io, project: Project, memberIds: readonly string[] | undefined, jobs?: number): Promise<ProjectResults> {
  const showProgress = io.stderrIsTTY;
  const width = Math.max(40, Math.min(io.columns, 120) - 1);
  let last = '';
  const onProgress = (done: number, total: number, memberId: string) => {
    if (!showProgress) return;
    const line = progressLine(done, total, memberId, width);
    if (line !== last) io.stderr(`\r${line}\u001b[K`);
    last = line;
  };
  const total = memberIds?.length ?? project.members.length;
  onProgress(0, total, '');
  let members: MemberResult[];
  // Without --jobs: one worker per core (none for a small project: this thread analyses, which is
  // never slower than a single worker).
  const workers = jobs ?? defaultWorkerCount(total);
  try {
    members = workers === 1
      ? await io.withImmediateInterrupt(() => analyzeMembers(project, memberIds, onProgress))
      : await analyzeMembersParallel(project, memberIds, { workers, signal: io.signal, onProgress });
  } catch (error) {
    if (error instanceof Error && error.name === 'AbortError') throw new CliFailure('stopped: the analysis was cancelled', EXIT.interrupted);
    throw error;
  } finally {
    if (showProgress) io.stderr('\r\u001b[K');
  }
  // Continuous members (few per project) are analysed here, after the single-span members.
  const continuous = analyzeContinuousMembers(project, memberIds);
  return { projectName: project.info.name, codeBasis: project.info.codeBasis, members, ...(continuous.length > 0 ? { continuous } : {}), summary: summarize(members) };
}

async function analyze(io: Io, command: Extract<Command, { kind: 'analyze' }>): Promise<number> {
  const loaded = await loadForAnalysis(io, command.file);
  // With --units the sentences in the results (governing mode, notes) follow the chosen system too.
  const project = command.units ? { ...loaded.project, info: { ...loaded.project.info, unitSystem: command.units } } : loaded.project;
  const ids = selectedMembers(project, command.members);
  const results = await runAnalysis(io, project, ids, command.jobs);
  const system = project.info.unitSystem;
  if (command.format === 'json') {
    const json = analysisJson(project, results, system, command.file, command.detail === 'full' ? memberDetail : undefined) as Record<string, unknown>;
    io.stdout(`${JSON.stringify(results.continuous ? { ...json, continuousMembers: continuousJson(results.continuous, system) } : json, null, 2)}\n`);
  } else if (command.format === 'csv') {
    // A byte-order mark tells spreadsheet programs that the text is UTF-8 (else "kip·ft" shows garbled).
    io.stdout(`${command.bom ? '\uFEFF' : ''}${resultsSummaryCsv(results.members, system, project, results.continuous)}`);
    io.stderr(`Caution: ${RESULTS_CAUTION}\n`);
  } else {
    io.stdout(tableReport(project, results, { system, width: io.stdoutIsTTY ? io.columns : 110, style: stdoutStyle(io) }));
    if (results.continuous) io.stdout(continuousTable(results.continuous, system, io.stdoutIsTTY ? io.columns : 110, stdoutStyle(io)));
  }
  // Every member and every continuous member must read OK (a continuous member under review does not).
  return results.members.every((m) => m.status === 'ok') && (results.continuous ?? []).every((c) => c.verdict.status === 'ok') ? EXIT.ok : EXIT.problems;
}

async function validate(io: Io, command: Extract<Command, { kind: 'validate' }>): Promise<number> {
  const text = await readProjectText(io, command.file);
  const { project, diagnostics } = parseProject(text);
  const errors = diagnostics.filter((d) => d.severity === 'error').length;
  if (command.format === 'json') {
    io.stdout(`${JSON.stringify({ file: command.file, valid: errors === 0, errors, warnings: diagnostics.length - errors, diagnostics }, null, 2)}\n`);
  } else {
    const lines = diagnosticLines(diagnostics, stdoutStyle(io));
    const members = project ? `${project.members.length} member${project.members.length === 1 ? '' : 's'}, ${project.sections.length} section${project.sections.length === 1 ? '' : 's'}, ${project.materials.length} material${project.materials.length === 1 ? '' : 's'}` : 'not readable as a project';
    io.stdout(`${[...lines, `${command.file}: ${problemCount(diagnostics)} (${members})`].join('\n')}\n`);
  }
  return errors > 0 ? EXIT.problems : EXIT.ok;
}

async function demo(io: Io, command: Extract<Command, { kind: 'demo' }>): Promise<number> {
  const text = serializeProject(command.si ? demoProjectSI() : demoProject());
  if (command.out === undefined) {
    io.stdout(text);
    return EXIT.ok;
  }
  if (io.exists(command.out) && !command.force) throw new CliFailure(`${command.out} already exists; use --force to overwrite it`, EXIT.usage);
  await checkOutput(io, command.out);
  await writeOutput(io, command.out, text);
  io.stderr(`wrote ${command.out}\n`);
  return EXIT.ok;
}

/** The report builder's entry, when this installation has it (app/report/write-report.ts). */
export type WriteReport = (options: { project: Project; results: ProjectResults; memberIds?: string[]; outPath: string; sourceText: string }) => Promise<void>;

const REPORT_MODULE = ownModule(import.meta.url, 'write-report.mjs', '../report/write-report.ts');

/** Loads the report builder; null when the module is not part of this installation. */
export async function loadReportWriter(io: Io, moduleUrl: URL = REPORT_MODULE): Promise<WriteReport | null> {
  const path = fileURLToPath(moduleUrl);
  if (!io.exists(path)) return null;
  const module = (await import(moduleUrl.href)) as { writeReport?: unknown };
  if (typeof module.writeReport !== 'function') throw new Error(`${path} does not export writeReport`);
  return module.writeReport as WriteReport;
}

async function report(io: Io, command: Extract<Command, { kind: 'report' }>, reportModule?: URL): Promise<number> {
  const writeReport = await loadReportWriter(io, reportModule);
  if (!writeReport) {
    io.stderr('The PDF report is not available in this installation yet (its builder, app/report/write-report.ts, is missing). Use "hingeline analyze" for the results meanwhile.\n');
    return EXIT.missingFeature;
  }
  await checkOutput(io, command.out);
  const { project, text } = await loadForAnalysis(io, command.file);
  const ids = selectedMembers(project, command.members);
  const results = await runAnalysis(io, project, ids, command.jobs);
  const outPath = io.resolvePath(command.out);
  try {
    await io.withImmediateInterrupt(() => writeReport({ project, results, ...(ids ? { memberIds: ids } : {}), outPath, sourceText: text }));
  } catch (error) {
    // The path was fine at the start; it may have changed since, or the disk may be full.
    if (/^E[A-Z]+$/.test(String((error as { code?: unknown }).code))) throw new CliFailure(`cannot write ${command.out}: ${writeProblem(error)}`, EXIT.usage);
    throw error;
  }
  io.stderr(`wrote ${command.out}\n`);
  return EXIT.ok;
}

/** Runs one parsed command. `reportModule` replaces the report builder's location (tests). */
export async function runCommand(io: Io, command: Command, options: { reportModule?: URL } = {}): Promise<number> {
  switch (command.kind) {
    case 'analyze':
      return analyze(io, command);
    case 'validate':
      return validate(io, command);
    case 'demo':
      return demo(io, command);
    case 'report':
      return report(io, command, options.reportModule);
    case 'import':
      return (await import('./import.ts')).importCommand(io, command);
    case 'help':
    case 'version':
      throw new Error(`${command.kind} is handled by main`);
  }
}
