/**
 * Command-line arguments → a typed command, and the help texts. Pure (no I/O); parse errors come
 * back as usage errors with a message and the help topic to point to.
 */
import { parseArgs } from 'node:util';
import { RESULTS_CAUTION } from '../../core/assessment/results.ts';
import type { CodeBasis } from '../../core/materials/specs.ts';
import type { UnitSystem } from '../../core/project/types.ts';

/** Exit codes (docs/cli.md). */
export const EXIT = {
  ok: 0,
  /** validate: the file has errors; analyze: a member is not ok (failing check, brittle, input error, not converged). */
  problems: 1,
  /** Bad arguments, or a file named on the command line that cannot be read or written. */
  usage: 2,
  /** The command needs a part of Hingeline that this installation does not have (the PDF report). */
  missingFeature: 3,
  /** A defect in Hingeline (please report). */
  internal: 4,
  /** Stopped with Ctrl+C (128 + SIGINT). */
  interrupted: 130,
} as const;

export type OutputFormat = 'table' | 'json' | 'csv';

export type Command =
  | { readonly kind: 'help'; readonly topic?: string }
  | { readonly kind: 'version' }
  | { readonly kind: 'analyze'; readonly file: string; readonly members: readonly string[]; readonly format: OutputFormat; readonly units?: UnitSystem; readonly jobs?: number; readonly bom?: boolean; readonly detail?: 'summary' | 'full' }
  | { readonly kind: 'report'; readonly file: string; readonly out: string; readonly members: readonly string[]; readonly jobs?: number }
  | { readonly kind: 'validate'; readonly file: string; readonly format: 'text' | 'json' }
  | { readonly kind: 'demo'; readonly out?: string; readonly si: boolean; readonly force: boolean }
  | ImportCommand;

/**
 * `import`: CSV files into a project. `target` says where the result goes: a new file (`out`), the
 * project itself (`in-place`, keeping the previous version as .bak), a new project created at
 * `file` (`new`, with its code basis and units), or nowhere (`dry-run`: the report only).
 */
export interface ImportCommand {
  readonly kind: 'import';
  readonly file: string;
  readonly membersCsv?: string;
  readonly spansCsv?: string;
  readonly target: { readonly kind: 'out'; readonly out: string } | { readonly kind: 'in-place' } | { readonly kind: 'new'; readonly code: CodeBasis; readonly units: UnitSystem } | { readonly kind: 'dry-run' };
  readonly keepGoodRows: boolean;
  readonly force: boolean;
}

export type ParsedArguments = { readonly ok: true; readonly command: Command } | { readonly ok: false; readonly message: string; readonly topic?: string };

export const COMMANDS = ['analyze', 'report', 'validate', 'import', 'demo'] as const;

const GENERAL_HELP = `hingeline — moment–curvature, load–deflection, plastic hinge and service-deflection
assessment of reinforced-concrete beams, from the command line.

Usage:
  hingeline analyze FILE [--member ID]... [--format table|json [--detail full]|csv [--bom]] [--units us|si] [--jobs N]
  hingeline report FILE --out REPORT.pdf [--member ID]... [--jobs N]
  hingeline validate FILE [--format text|json]
  hingeline import FILE --members CSV [--spans CSV] (--out NEW | --in-place | --dry-run) [--keep-good-rows]
  hingeline import NEW --new --code aci|en [--units us|si] --members CSV [--spans CSV] [--keep-good-rows]
  hingeline demo [--out FILE] [--si] [--force]
  hingeline help [COMMAND]        hingeline --version

FILE is a Hingeline project (.hingeline or .json). Run "hingeline COMMAND --help" for details.

Exit codes: 0 ok; 1 problems found (validation errors, failing checks); 2 usage error or a
file that cannot be read or written; 3 feature not available in this installation;
4 internal error (please report); 130 stopped with Ctrl+C.

${RESULTS_CAUTION}`;

const HELP: Readonly<Record<(typeof COMMANDS)[number], string>> = {
  analyze: `Usage: hingeline analyze FILE [options]

Analyses the members of a project (in parallel on worker threads) and prints the key results per
member: My, Mu, φu/φy, μΔ, θp, the governing service deflection against its limit, the strength
utilisation, the status and the governing mode.

Options:
  --member ID       analyse only this member (repeat for several)
  --format FORMAT   table (default), json (documented in docs/cli.md) or csv
  --detail LEVEL    with --format json: summary (default) or full — per member also every
                    section's key points and curve points, the load–deflection points, the hinges
                    and the service deflections of both methods (docs/cli.md)
  --bom             with --format csv: start with a UTF-8 byte-order mark, so that spreadsheet
                    programs read the units (kip·ft, φu/φy) as UTF-8
  --units SYSTEM    us or si (default: the project's display unit system)
  --jobs N          number of worker threads (default: one per core, at most one per eight
                    members; 1 analyses in this thread)
  -h, --help        show this help

Problems in the file are printed to stderr; members with input errors are reported as such and
the others are analysed. A progress bar is shown on stderr when it is a terminal.

Exit codes: 0 every member ok; 1 a member has a failing check, is brittle, has an input error or
did not converge, or the file cannot be analysed; 2 usage error or unreadable file; 4 internal error.`,
  report: `Usage: hingeline report FILE --out REPORT.pdf [options]

Analyses the project and writes the PDF report.

Options:
  --out PATH        where to write the PDF (required)
  --member ID       report only this member (repeat for several)
  --jobs N          number of worker threads (see "hingeline analyze --help")
  -h, --help        show this help

Exit codes: 0 report written; 1 the file cannot be analysed; 2 usage error or unreadable file;
3 the report builder is not part of this installation; 4 internal error.`,
  validate: `Usage: hingeline validate FILE [options]

Checks a project file and lists every problem at once, with its path and a plain message in the
project's display units; older versions of the format are migrated first.

Options:
  --format FORMAT   text (default) or json
  -h, --help        show this help

Exit codes: 0 no errors (warnings may be listed); 1 the file has errors; 2 usage error or
unreadable file.`,
  import: `Usage: hingeline import FILE --members CSV [--spans CSV] (--out NEW | --in-place | --dry-run) [options]
       hingeline import NEW --new --code aci|en [--units us|si] --members CSV [--spans CSV] [options]

Adds the members listed in CSV files to a project. --members reads single-span members, one row
each; --spans reads continuous members, one row per span (give either or both). The columns, their
units and allowed ranges are in docs/project-format.md ("CSV member lists"), and a template is
docs/examples/members.csv. Every row imported is listed with what it brings; every problem is
listed with its file, row, column and the allowed range. Ids are never renamed: an id already in
the project (or in the other file) is an error naming both.

A file with any error imports nothing and nothing is written, unless --keep-good-rows is given:
then the members without errors are imported and the others are left out (and listed).
Files are written atomically: a project is replaced only by a complete new one, and not at all
when anything goes wrong.

Where the result goes (one of):
  --out NEW         write the project with the imported members to NEW (FILE is not changed)
  --in-place        replace FILE, keeping its previous version as FILE.bak
  --dry-run         only report what would be imported; write nothing
  --new             create the project FILE (it must not exist) with one concrete, one steel and
                    one rectangular section, section-1; the CSV's sections must be among them,
                    so define further sections in the app before importing beams that use them
Options:
  --members CSV     the member list (single spans)
  --spans CSV       the span list (continuous members)
  --keep-good-rows  import the members without errors even when other rows have errors
  --code CODE       with --new: aci (ACI 318-19) or en (EN 1992-1-1); required
  --units SYSTEM    with --new: us or si (default: us with aci, si with en)
  --force           with --out or --new: overwrite an existing file
  -h, --help        show this help

Exit codes: 0 every row imported and written (or, with --dry-run, would be); 1 a row or member has
an error (nothing written; with --keep-good-rows the good ones were written) or the project cannot
be read as a project; 2 usage error, or a file that cannot be read or written.`,
  demo: `Usage: hingeline demo [options]

Writes the demo project: Wrenfield Mill, Building B, an invented light-industrial building being
converted to offices (ten beams, US customary units, ACI 318-19); with --si, a smaller
EN 1992-1-1 project in SI units.

Options:
  --out PATH        write to this file (default: standard output)
  --si              the SI / EN 1992-1-1 demo instead
  --force           overwrite PATH if it exists
  -h, --help        show this help

Exit codes: 0 written; 2 usage error or the file cannot be written (or exists, without --force).`,
};

/** Help text: general, or for one command. */
export function helpText(topic?: string): string {
  return topic && (COMMANDS as readonly string[]).includes(topic) ? HELP[topic as (typeof COMMANDS)[number]] : GENERAL_HELP;
}

function usage(message: string, topic?: string): ParsedArguments {
  return { ok: false, message, ...(topic ? { topic } : {}) };
}

function jobsOption(value: string | undefined, topic: string): number | ParsedArguments | undefined {
  if (value === undefined) return undefined;
  const n = Number(value);
  if (!/^\d+$/.test(value) || !Number.isInteger(n) || n < 1 || n > 256) return usage(`--jobs must be a whole number from 1 to 256, got "${value}"`, topic);
  return n;
}

/** Parses the arguments after `hingeline` (process.argv.slice(2)). */
export function parseArguments(argv: readonly string[]): ParsedArguments {
  const [first, ...rest] = argv;
  if (first === undefined || first === '--help' || first === '-h') return { ok: true, command: { kind: 'help' } };
  if (first === '--version' || first === '-v') return { ok: true, command: { kind: 'version' } };
  if (first === 'help') {
    // `help --help`, `help analyze -h`: asking for help about help is still asking for help.
    const words = rest.filter((word) => word !== '--help' && word !== '-h');
    if (words.length > 1) return usage(`"help" takes one command, got ${words.length}: ${words.join(' ')}`);
    if (words[0] !== undefined && !(COMMANDS as readonly string[]).includes(words[0])) return usage(`unknown command "${words[0]}" (commands: ${COMMANDS.join(', ')})`);
    return { ok: true, command: { kind: 'help', ...(words[0] ? { topic: words[0] } : {}) } };
  }
  if (!(COMMANDS as readonly string[]).includes(first)) {
    return usage(first.startsWith('-') ? `unknown option "${first}" (a command comes first: ${COMMANDS.join(', ')})` : `unknown command "${first}" (commands: ${COMMANDS.join(', ')})`);
  }
  const topic = first;
  if (rest.includes('--help') || rest.includes('-h')) return { ok: true, command: { kind: 'help', topic } };

  let parsed: ReturnType<typeof parseArgs>;
  try {
    parsed = parseArgs({
      args: [...rest],
      allowPositionals: true,
      strict: true,
      options: {
        member: { type: 'string', multiple: true },
        format: { type: 'string' },
        detail: { type: 'string' },
        units: { type: 'string' },
        jobs: { type: 'string' },
        out: { type: 'string' },
        si: { type: 'boolean' },
        force: { type: 'boolean' },
        bom: { type: 'boolean' },
        members: { type: 'string' },
        spans: { type: 'string' },
        'in-place': { type: 'boolean' },
        'dry-run': { type: 'boolean' },
        'keep-good-rows': { type: 'boolean' },
        new: { type: 'boolean' },
        code: { type: 'string' },
      },
    });
  } catch (error) {
    const message = error instanceof Error ? error.message.replace(/\. To specify a positional argument[\s\S]*$/, '') : String(error);
    return usage(message.charAt(0).toLowerCase() + message.slice(1), topic);
  }
  const values = parsed.values as { member?: string[]; format?: string; units?: string; jobs?: string; out?: string; si?: boolean; force?: boolean; bom?: boolean; detail?: string; members?: string; spans?: string; 'in-place'?: boolean; 'dry-run'?: boolean; 'keep-good-rows'?: boolean; new?: boolean; code?: string };
  const positionals = parsed.positionals;
  const allowed: Readonly<Record<string, readonly string[]>> = {
    analyze: ['member', 'format', 'units', 'jobs', 'bom', 'detail'],
    report: ['member', 'out', 'jobs'],
    validate: ['format'],
    demo: ['out', 'si', 'force'],
    import: ['members', 'spans', 'out', 'in-place', 'dry-run', 'keep-good-rows', 'new', 'code', 'units', 'force'],
  };
  const stray = Object.keys(values).filter((k) => values[k as keyof typeof values] !== undefined && !allowed[topic]!.includes(k));
  if (stray.length > 0) return usage(`"${topic}" does not take --${stray[0]}`, topic);

  if (topic === 'demo') {
    if (positionals.length > 0) return usage(`"demo" takes no file argument, got "${positionals[0]}" (use --out FILE)`, topic);
    if (values.out === '') return usage('--out needs a file path', topic);
    return { ok: true, command: { kind: 'demo', ...(values.out !== undefined ? { out: values.out } : {}), si: values.si === true, force: values.force === true } };
  }
  if (positionals.length === 0) return usage(`"${topic}" needs a project FILE`, topic);
  if (positionals.length > 1) return usage(`"${topic}" takes one project FILE, got ${positionals.length}: ${positionals.join(' ')}`, topic);
  const file = positionals[0]!;
  const members = values.member ?? [];
  if (members.some((m) => m.trim() === '')) return usage('--member needs a member id', topic);

  if (topic === 'import') return importArguments(file, values);
  if (topic === 'validate') {
    const format = values.format ?? 'text';
    if (format !== 'text' && format !== 'json') return usage(`--format must be text or json, got "${format}"`, topic);
    return { ok: true, command: { kind: 'validate', file, format } };
  }
  const jobs = jobsOption(values.jobs, topic);
  if (typeof jobs === 'object') return jobs;
  if (topic === 'report') {
    if (!values.out) return usage('"report" needs --out REPORT.pdf', topic);
    return { ok: true, command: { kind: 'report', file, out: values.out, members, ...(jobs ? { jobs } : {}) } };
  }
  const format = values.format ?? 'table';
  if (format !== 'table' && format !== 'json' && format !== 'csv') return usage(`--format must be table, json or csv, got "${format}"`, topic);
  const units = values.units;
  if (units !== undefined && units !== 'us' && units !== 'si') return usage(`--units must be us or si, got "${units}"`, topic);
  if (values.bom && format !== 'csv') return usage('--bom goes with --format csv', topic);
  const detail = values.detail;
  if (detail !== undefined && detail !== 'summary' && detail !== 'full') return usage(`--detail must be summary or full, got "${detail}"`, topic);
  if (detail !== undefined && format !== 'json') return usage('--detail goes with --format json', topic);
  return { ok: true, command: { kind: 'analyze', file, members, format, ...(units ? { units } : {}), ...(jobs ? { jobs } : {}), ...(values.bom ? { bom: true } : {}), ...(detail ? { detail } : {}) } };
}

/** The options of `import` (see its help): one destination, at least one CSV, --code only with --new. */
function importArguments(file: string, values: { out?: string; units?: string; force?: boolean; members?: string; spans?: string; 'in-place'?: boolean; 'dry-run'?: boolean; 'keep-good-rows'?: boolean; new?: boolean; code?: string }): ParsedArguments {
  const topic = 'import';
  if (values.members === undefined && values.spans === undefined) return usage('"import" needs --members CSV (single-span members) and/or --spans CSV (continuous members)', topic);
  if (values.members === '' || values.spans === '') return usage(`--${values.members === '' ? 'members' : 'spans'} needs a CSV file path`, topic);
  const destinations = [values.out !== undefined && '--out', values['in-place'] && '--in-place', values['dry-run'] && '--dry-run', values.new && '--new'].filter((d): d is string => typeof d === 'string');
  if (destinations.length === 0) return usage('say where the result goes: --out NEW (a new file), --in-place (replace FILE, keeping FILE.bak), --dry-run (write nothing) or --new (create FILE)', topic);
  if (destinations.length > 1) return usage(`${destinations.join(' and ')} cannot be combined: choose one`, topic);
  if (values.out === '') return usage('--out needs a file path', topic);
  if (!values.new && (values.code !== undefined || values.units !== undefined)) return usage(`--${values.code !== undefined ? 'code' : 'units'} goes with --new (an existing project keeps its own code basis and units)`, topic);
  if (values.force && !values.new && values.out === undefined) return usage('--force goes with --out or --new', topic);
  const common = { kind: 'import' as const, file, ...(values.members !== undefined ? { membersCsv: values.members } : {}), ...(values.spans !== undefined ? { spansCsv: values.spans } : {}), keepGoodRows: values['keep-good-rows'] === true, force: values.force === true };
  if (values.new) {
    if (values.code === undefined) return usage('--new needs --code aci (ACI 318-19) or --code en (EN 1992-1-1)', topic);
    if (values.code !== 'aci' && values.code !== 'en') return usage(`--code must be aci or en, got "${values.code}"`, topic);
    if (values.units !== undefined && values.units !== 'us' && values.units !== 'si') return usage(`--units must be us or si, got "${values.units}"`, topic);
    const code: CodeBasis = values.code === 'en' ? 'EN 1992-1-1' : 'ACI 318-19';
    const units: UnitSystem = (values.units as UnitSystem | undefined) ?? (values.code === 'en' ? 'si' : 'us');
    return { ok: true, command: { ...common, target: { kind: 'new', code, units } } };
  }
  if (values.out !== undefined) return { ok: true, command: { ...common, target: { kind: 'out', out: values.out } } };
  return { ok: true, command: { ...common, target: values['in-place'] ? { kind: 'in-place' } : { kind: 'dry-run' } } };
}
