import { describe, expect, it } from 'vitest';
import { EXIT, helpText, parseArguments } from '../../../app/cli/args.ts';

const command = (argv: string[]) => {
  const r = parseArguments(argv);
  if (!r.ok) throw new Error(`expected a command, got the usage error: ${r.message}`);
  return r.command;
};
const usage = (argv: string[]) => {
  const r = parseArguments(argv);
  if (r.ok) throw new Error('expected a usage error');
  return r;
};

describe('parseArguments', () => {
  it('reads analyze with repeated --member, format, units and jobs', () => {
    expect(command(['analyze', 'p.hingeline', '--member', 'B-1', '--member=B-2', '--format', 'json', '--units', 'si', '--jobs', '2'])).toEqual({
      kind: 'analyze', file: 'p.hingeline', members: ['B-1', 'B-2'], format: 'json', units: 'si', jobs: 2,
    });
    expect(command(['analyze', 'p.json'])).toEqual({ kind: 'analyze', file: 'p.json', members: [], format: 'table' });
  });

  it('reads report, validate and demo', () => {
    expect(command(['report', 'p.json', '--out', 'r.pdf', '--member', 'A'])).toEqual({ kind: 'report', file: 'p.json', out: 'r.pdf', members: ['A'] });
    expect(command(['analyze', 'p.hingeline', '--format', 'json', '--detail', 'full'])).toEqual({ kind: 'analyze', file: 'p.hingeline', members: [], format: 'json', detail: 'full' });
    expect(command(['validate', 'p.json', '--format', 'json'])).toEqual({ kind: 'validate', file: 'p.json', format: 'json' });
    expect(command(['demo'])).toEqual({ kind: 'demo', si: false, force: false });
    expect(command(['demo', '--out', 'd.hingeline', '--si', '--force'])).toEqual({ kind: 'demo', out: 'd.hingeline', si: true, force: true });
  });

  it('gives help for no arguments, --help, help COMMAND and COMMAND --help, and the version', () => {
    expect(command([])).toEqual({ kind: 'help' });
    expect(command(['-h'])).toEqual({ kind: 'help' });
    expect(command(['help', 'analyze'])).toEqual({ kind: 'help', topic: 'analyze' });
    expect(command(['validate', '--help'])).toEqual({ kind: 'help', topic: 'validate' });
    expect(command(['--version'])).toEqual({ kind: 'version' });
    // Help about help is help (issue 15 item 10: `hingeline help --help` exited 2).
    expect(command(['help', '--help'])).toEqual({ kind: 'help' });
    expect(command(['help', '-h', 'report'])).toEqual({ kind: 'help', topic: 'report' });
  });

  it.each([
    [['frobnicate'], /unknown command "frobnicate"/],
    [['--frob'], /unknown option "--frob"/],
    [['analyze'], /needs a project FILE/],
    [['analyze', 'a', 'b'], /takes one project FILE/],
    [['analyze', 'a', '--format', 'xml'], /--format must be table, json or csv/],
    [['analyze', 'a', '--units', 'imperial'], /--units must be us or si/],
    [['analyze', 'a', '--jobs', '0'], /--jobs must be a whole number from 1 to 256/],
    [['analyze', 'a', '--jobs', 'many'], /--jobs must be a whole number/],
    [['analyze', 'a', '--bogus'], /unknown option '--bogus'/i],
    [['analyze', 'a', '--out', 'x'], /"analyze" does not take --out/],
    [['report', 'a'], /needs --out/],
    [['validate', 'a', '--format', 'csv'], /--format must be text or json/],
    [['demo', 'file.json'], /takes no file argument/],
    [['help', 'nope'], /unknown command "nope"/],
    [['help', 'analyze', 'report'], /"help" takes one command, got 2/],
    [['analyze', 'a', '--bom'], /--bom goes with --format csv/],
    [['validate', 'a', '--bom'], /"validate" does not take --bom/],
    [['analyze', 'a', '--member'], /argument missing/i],
    [['analyze', 'a', '--detail', 'full'], /--detail goes with --format json/],
    [['analyze', 'a', '--format', 'json', '--detail', 'all'], /--detail must be summary or full/],
    [['validate', 'a', '--detail', 'full'], /"validate" does not take --detail/],
  ])('refuses %j', (argv, message) => {
    expect(usage(argv as string[]).message).toMatch(message);
  });

  it('points a usage error to the help of its command', () => {
    expect(usage(['analyze', 'a', '--format', 'xml']).topic).toBe('analyze');
  });
});

describe('help and exit codes', () => {
  it('documents every command in the general help and gives each its own', () => {
    const general = helpText();
    for (const c of ['analyze', 'report', 'validate', 'demo']) {
      expect(general).toContain(`hingeline ${c}`);
      expect(helpText(c)).toMatch(new RegExp(`^Usage: hingeline ${c}`));
      expect(helpText(c)).toMatch(/Exit codes:/);
    }
    expect(general).toMatch(/qualified engineer/);
  });

  it('uses distinct exit codes', () => {
    expect(EXIT).toEqual({ ok: 0, problems: 1, usage: 2, missingFeature: 3, internal: 4, interrupted: 130 });
  });
});
