/**
 * `hingeline import`: members from CSV files into a project (core/project/import.ts reads, checks and
 * plans; this file reads and writes the files and prints the report). Nothing is written when a
 * file has errors unless --keep-good-rows; every write is atomic (app/main/atomic-write.ts), and
 * --in-place keeps the previous version as .bak. Report on stdout; exit codes in args.ts (EXIT).
 */
import { parseProject, serializeProject } from '../../core/project/file.ts';
import { projectFileStem } from '../../core/project/file-stem.ts';
import { applyImport, describeImportedItem, importCountText, planImport, type CsvSource, type ImportPlan } from '../../core/project/import.ts';
import { starterProject } from '../../core/project/starter.ts';
import type { Project } from '../../core/project/types.ts';
import { displaySystem, unitLabel } from '../../core/units/index.ts';
import { EXIT, type ImportCommand } from './args.ts';
import { checkOutput, CliFailure, readProjectText, stdoutStyle, writeOutput } from './commands.ts';
import { diagnosticLines, problemCount } from './format.ts';
import type { CliIo } from './io.ts';

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
const countText = importCountText;

/**
 * The report of a plan: per file, each member read (its rows, id, name and what it brings, or
 * "left out"), then every problem with its file, row and column. Lines without a final newline.
 */
export function importReportLines(plan: ImportPlan, project: Project, files: readonly string[], color: boolean): string[] {
  const system = project.info.unitSystem;
  const units = displaySystem(system);
  const lines = [`Project "${project.info.name}": ${project.info.codeBasis}, ${system === 'us' ? 'US customary' : 'SI'} units (lengths in ${unitLabel('spanLength', units)}, line loads in ${unitLabel('lineLoad', units)})`];
  for (const file of files) {
    const items = plan.items.filter((i) => i.source === file);
    const errors = plan.diagnostics.filter((d) => d.severity === 'error' && d.path.startsWith(`${file} `)).length;
    lines.push('', `${file}: ${countText(items)} read${errors > 0 ? `, ${plural(errors, 'error')}` : ''}`);
    const rowWidth = Math.max(0, ...items.map((i) => i.rows.length));
    const idWidth = Math.max(0, ...items.map((i) => i.definition.id.length));
    for (const item of items) {
      const name = item.definition.name !== item.definition.id ? ` "${item.definition.name}"` : '';
      const what = item.ready ? describeImportedItem(item, system) : 'left out: see the error below';
      lines.push(`  ${item.rows.padEnd(rowWidth)}  ${item.definition.id.padEnd(idWidth)}${name}  ${what}`);
    }
  }
  if (plan.diagnostics.length > 0) lines.push('', ...diagnosticLines(plan.diagnostics, { enabled: color }));
  return lines;
}

export async function importCommand(io: CliIo, command: ImportCommand): Promise<number> {
  // The CSV files first: a path that cannot be read is a usage error before anything else.
  const sources: { members?: CsvSource; spans?: CsvSource } = {};
  if (command.membersCsv !== undefined) sources.members = { name: command.membersCsv, text: await readProjectText(io, command.membersCsv) };
  if (command.spansCsv !== undefined) sources.spans = { name: command.spansCsv, text: await readProjectText(io, command.spansCsv) };
  if (command.membersCsv !== undefined && command.spansCsv !== undefined && io.resolvePath(command.membersCsv) === io.resolvePath(command.spansCsv)) {
    throw new CliFailure(`--members and --spans name the same file, ${command.membersCsv}: a member list has one row per member, a span list one row per span`, EXIT.usage);
  }

  const target = command.target;
  let project: Project;
  let destination: string | null;
  if (target.kind === 'new') {
    if (io.exists(command.file) && !command.force) throw new CliFailure(`${command.file} already exists; --new creates a project. To add to it use --out NEW or --in-place (or --force to replace it with a new project)`, EXIT.usage);
    await checkOutput(io, command.file);
    // The project's date is today's (yyyy-mm-dd, UTC); its name the file's.
    project = starterProject(target.units, target.code, new Date().toISOString().slice(0, 10), projectFileStem(command.file.replace(/^.*[\\/]/, '')) || 'Imported beams');
    destination = command.file;
  } else {
    const text = await readProjectText(io, command.file);
    const parsed = parseProject(text);
    if (!parsed.project) {
      io.stderr(`${diagnosticLines(parsed.diagnostics).join('\n')}\n`);
      throw new CliFailure(`${command.file} cannot be read as a project (see above), so nothing was imported; the file is unchanged`, EXIT.problems);
    }
    project = parsed.project;
    const before = parsed.diagnostics.filter((d) => d.severity === 'error').length;
    if (before > 0) io.stderr(`note: ${command.file} already has ${plural(before, 'error')} of its own ("hingeline validate ${command.file}" lists them); the import leaves them as they are\n`);
    destination = target.kind === 'out' ? target.out : target.kind === 'in-place' ? command.file : null;
    if (target.kind === 'out') {
      if (io.resolvePath(target.out) === io.resolvePath(command.file)) throw new CliFailure(`--out names the project itself; use --in-place to replace ${command.file} (its previous version is kept as ${command.file}.bak)`, EXIT.usage);
      if (io.exists(target.out) && !command.force) throw new CliFailure(`${target.out} already exists; use --force to overwrite it, or --in-place to add to the project itself`, EXIT.usage);
    }
    if (destination !== null) await checkOutput(io, destination);
  }

  const plan = planImport(project, sources);
  const files = [sources.members?.name, sources.spans?.name].filter((f): f is string => f !== undefined);
  io.stdout(`${importReportLines(plan, project, files, stdoutStyle(io).enabled).join('\n')}\n\n`);
  const good = plan.items.filter((i) => i.ready);
  const status = plan.errors > 0 ? EXIT.problems : EXIT.ok;

  if (plan.items.length === 0 && plan.errors === 0) {
    io.stdout(`Nothing written: ${files.join(' and ')} list${files.length === 1 ? 's' : ''} no members (only a header?).\n`);
    return EXIT.problems;
  }
  if (destination === null) {
    io.stdout(`Dry run, nothing written: ${plan.errors > 0 ? `${problemCount(plan.diagnostics)}; ` : ''}${good.length > 0 ? `${countText(good)} would be imported${plan.errors > 0 ? ' with --keep-good-rows' : ''}` : 'no member could be imported'}.\n`);
    return status;
  }
  const applied = applyImport(project, plan, { keepGoodRows: command.keepGoodRows });
  if (!applied) {
    const hint = good.length > 0 && !command.keepGoodRows
      ? ` Fix the rows above and run again, or add --keep-good-rows to import the ${countText(good)} without errors and leave the rest out.`
      : ' Fix the rows above and run again.';
    io.stdout(`Nothing written: ${problemCount(plan.diagnostics)}; ${target.kind === 'new' ? `${command.file} was not created` : `${command.file} is unchanged`}.${hint}\n`);
    return EXIT.problems;
  }
  await writeOutput(io, destination, serializeProject(applied.project), { keepBackup: target.kind === 'in-place' });
  const total = `${plural(applied.project.members.length, 'member')}${applied.project.continuousMembers?.length ? `, ${plural(applied.project.continuousMembers.length, 'continuous member')}` : ''}`;
  const backup = target.kind === 'in-place' ? `; the previous version is kept as ${command.file}.bak` : '';
  const leftOut = plan.errors > 0 ? ' The rows with errors were left out (listed above).' : '';
  io.stdout(`Wrote ${destination}: ${countText(applied.added)} imported (the project now has ${total})${backup}.${leftOut}\n`);
  return status;
}
