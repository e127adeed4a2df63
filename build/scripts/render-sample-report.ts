/**
 * Sample report of the demo project (core/project/demo.ts): the PDF, written with the same code as
 * `hingeline report` (app/report/write-report.ts) and a fixed date so that it only changes when the
 * report or the engine changes, plus PNG renders of chosen pages (poppler-utils `pdftoppm`; install
 * with `apt-get install poppler-utils`).
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, readdirSync, renameSync, rmSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { analyzeProject } from '../../core/analysis.ts';
import { demoProject, demoProjectSI } from '../../core/project/demo.ts';
import { serializeProject } from '../../core/project/file.ts';
import { writeReport } from '../../app/report/write-report.ts';

/** Fixed report date of the sample. */
const SAMPLE_DATE = '2026-03-14T09:00:00Z';

function pageList(text: string): number[] {
  return text.split(',').flatMap((part) => {
    const [a, b] = part.split('-').map(Number);
    return b === undefined ? [a!] : Array.from({ length: b - a! + 1 }, (_, i) => a! + i);
  });
}

export async function main(args: readonly string[]): Promise<number> {
  const option = (name: string) => {
    const i = args.indexOf(name);
    return i >= 0 ? args[i + 1] : undefined;
  };
  const out = resolve(option('--out') ?? 'build/sample');
  const dpi = Number(option('--dpi') ?? 70);
  mkdirSync(out, { recursive: true });
  const samples = [
    { name: 'demo-report', project: demoProject(), pages: pageList(option('--pages') ?? '1-4') },
    { name: 'demo-report-si', project: demoProjectSI(), pages: pageList(option('--pages-si') ?? '1') },
  ];
  for (const sample of samples) {
    const results = analyzeProject(sample.project);
    const pdf = join(out, `${sample.name}.pdf`);
    const start = performance.now();
    await writeReport({ project: sample.project, results, outPath: pdf, sourceText: serializeProject(sample.project), generatedOn: SAMPLE_DATE });
    process.stdout.write(`${pdf} (${((performance.now() - start) / 1000).toFixed(1)} s)\n`);
    for (const old of readdirSync(out).filter((f) => f.startsWith(`${sample.name}-page-`))) rmSync(join(out, old));
    for (const page of sample.pages) {
      const prefix = join(out, `${sample.name}-tmp`);
      try {
        execFileSync('pdftoppm', ['-png', '-r', String(dpi), '-f', String(page), '-l', String(page), '-singlefile', pdf, prefix]);
      } catch (error) {
        process.stderr.write(`pdftoppm failed (is poppler-utils installed?): ${error instanceof Error ? error.message : String(error)}\n`);
        return 1;
      }
      const target = join(out, `${sample.name}-page-${String(page).padStart(3, '0')}.png`);
      renameSync(`${prefix}.png`, target);
      process.stdout.write(`${target}\n`);
    }
  }
  return 0;
}
