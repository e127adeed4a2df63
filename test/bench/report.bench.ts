/**
 * PDF report speed and memory (issue 6): the report of the demo project and of a generated
 * 100-member project (every member different: spans, loads, supports, hinge-length methods; ten
 * sections), from analysed results to PDF bytes — charts drawn (vectors for the demo, images on
 * worker threads for the large project, as `chartFormat: 'auto'` chooses), document built and laid
 * out by pdfmake. Analysis is outside the timed part.
 *
 * Baseline measured in the same run, so that the figures read as ratios on a shared, noisy machine:
 * a plain pdfmake document with the same page count as each report (a heading, a paragraph and a
 * table per page), no charts. Reported: median wall time, median CPU time of the process (all
 * threads; steadier than wall time when other work shares the cores), peak resident memory (RSS
 * sampled every 25 ms; chart worker threads live in this process, so their memory counts), and the
 * ratio to the 10 s target.
 *
 * Run with `npm run bench` (vitest bench --run). Each task runs three times without warm-up.
 */
import { availableParallelism, loadavg } from 'node:os';
import { afterAll, bench, describe } from 'vitest';
import { analyzeProject } from '../../core/analysis.ts';
import { demoProject } from '../../core/project/demo.ts';
import type { DocumentDefinition } from '../../core/report/types.ts';
import { DEFAULT_STYLE, STYLES, dataTable, pageGeometry } from '../../core/report/layout.ts';
import { renderPdf } from '../../app/report/pdf.ts';
import { renderReportBuffer } from '../../app/report/write-report.ts';
import { generatedProject } from '../core/report/fixtures.ts';

const TARGET_SECONDS = 10;
const RUNS = { time: 0, iterations: 3, warmupTime: 0, warmupIterations: 0 } as const;
const GENERATED = 100;

const demo = demoProject();
const demoResults = analyzeProject(demo);
const large = generatedProject(GENERATED);
const largeResults = analyzeProject(large);
const options = (project: typeof demo, results: typeof demoResults) => ({ project, results, sourceText: JSON.stringify(project), generatedOn: '2026-03-14T09:30:00Z' });

interface Run {
  readonly seconds: number;
  /** CPU time of the process over the run (all threads, user + system), s: steadier than wall time on a busy machine. */
  readonly cpuSeconds: number;
  readonly peakMegabytes: number;
  readonly pages: number;
}
const runs: Record<string, Run[]> = { demo: [], demoBaseline: [], large: [], largeBaseline: [] };

const rssMegabytes = () => process.memoryUsage.rss() / 1048576;
const pageCount = (pdf: Buffer) => Number(/\/Type \/Pages\s*\/Count (\d+)/.exec(pdf.toString('latin1'))?.[1] ?? 0);

async function measured(name: string, work: () => Promise<Buffer>): Promise<void> {
  let peak = rssMegabytes();
  const sample = () => {
    const now = rssMegabytes();
    if (now > peak) peak = now;
  };
  const timer = setInterval(sample, 25);
  const cpu = process.cpuUsage();
  const start = performance.now();
  let pdf: Buffer;
  try {
    pdf = await work();
  } finally {
    clearInterval(timer);
  }
  sample();
  const used = process.cpuUsage(cpu);
  runs[name]!.push({ seconds: (performance.now() - start) / 1000, cpuSeconds: (used.user + used.system) / 1e6, peakMegabytes: peak, pages: pageCount(pdf) });
}

/** A plain document of `pages` pages in the report's page set-up and styles: heading, paragraph, table. */
function baselineDocument(pages: number): DocumentDefinition {
  const page = pageGeometry('SI');
  const content = Array.from({ length: pages }, (_, i) => [
    { text: `Baseline page ${i + 1}`, style: 'h2', ...(i > 0 ? { pageBreak: 'before' } : {}) },
    { text: 'Plain text of the size of a report paragraph, laid out by pdfmake with the same font and styles as the report, so that the ratio shows what the report adds: charts, drawings, many tables and page references. '.repeat(3), style: 'body' },
    dataTable({ widths: ['*', 80, 80, 80], header: ['Quantity', 'A', 'B', 'C'], rows: Array.from({ length: 12 }, (_, k) => [`row ${k + 1}`, `${k}.00 kN·m`, `${k * 2}.0 mm`, `${k * 3} ‰`]) }),
  ]).flat();
  return {
    pageSize: page.pageSize, pageOrientation: 'portrait', pageMargins: page.margins,
    info: { title: 'baseline', author: '', subject: '', keywords: '', creator: '', producer: '' },
    content, header: () => null, footer: (p, n) => ({ text: `Page ${p} of ${n}`, alignment: 'center', fontSize: 7.5 }),
    styles: STYLES, defaultStyle: DEFAULT_STYLE, images: {}, compress: true,
  };
}

const pagesOf = (name: string) => runs[name]![0]?.pages ?? 100;

describe(`PDF report: demo project (${demo.members.length} members) and a generated ${GENERATED}-member project`, () => {
  bench('demo project report', async () => {
    await measured('demo', () => renderReportBuffer(options(demo, demoResults)));
  }, RUNS);
  bench('baseline: plain document, as many pages as the demo report', async () => {
    await measured('demoBaseline', () => renderPdf(baselineDocument(pagesOf('demo')), '2026-03-14T09:30:00Z'));
  }, RUNS);
  bench(`${GENERATED}-member report`, async () => {
    await measured('large', () => renderReportBuffer(options(large, largeResults)));
  }, RUNS);
  bench(`baseline: plain document, as many pages as the ${GENERATED}-member report`, async () => {
    await measured('largeBaseline', () => renderPdf(baselineDocument(pagesOf('large')), '2026-03-14T09:30:00Z'));
  }, RUNS);
});

const median = (values: readonly number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
};

afterAll(() => {
  if (Object.values(runs).some((r) => r.length === 0)) return;
  const row = (label: string, list: Run[], baseline: Run[]) => {
    const seconds = median(list.map((r) => r.seconds));
    const cpuSeconds = median(list.map((r) => r.cpuSeconds));
    const memory = Math.max(...list.map((r) => r.peakMegabytes));
    const base = median(baseline.map((r) => r.seconds));
    const baseCpu = median(baseline.map((r) => r.cpuSeconds));
    const baseMemory = Math.max(...baseline.map((r) => r.peakMegabytes));
    return [
      label.padEnd(30),
      `${list[0]!.pages}`.padStart(6),
      `${seconds.toFixed(2)} s`.padStart(9),
      `${cpuSeconds.toFixed(2)} s`.padStart(9),
      `${memory.toFixed(0)} MB`.padStart(9),
      `${(seconds / base).toFixed(2)}`.padStart(11),
      `${(cpuSeconds / baseCpu).toFixed(2)}`.padStart(10),
      `${(memory / baseMemory).toFixed(2)}`.padStart(12),
      `${(seconds / TARGET_SECONDS).toFixed(2)}`.padStart(8),
    ].join('  ');
  };
  console.log([
    '',
    `Report benchmark: ${availableParallelism()} cores, median of ${RUNS.iterations} runs, peak RSS over the runs`,
    `machine load average at the end (1, 5, 15 min): ${loadavg().map((l) => l.toFixed(2)).join(', ')}`,
    `${'task'.padEnd(30)}  ${'pages'.padStart(6)}  ${'median'.padStart(9)}  ${'CPU'.padStart(9)}  ${'peak RSS'.padStart(9)}  ${'÷ baseline'.padStart(11)}  ${'CPU ÷ base'.padStart(10)}  ${'RSS ÷ base'.padStart(12)}  ${'÷ 10 s'.padStart(8)}`,
    row(`demo (${demo.members.length} members)`, runs.demo!, runs.demoBaseline!),
    row('  baseline, same pages', runs.demoBaseline!, runs.demoBaseline!),
    row(`generated (${GENERATED} members)`, runs.large!, runs.largeBaseline!),
    row('  baseline, same pages', runs.largeBaseline!, runs.largeBaseline!),
    '',
  ].join('\n'));
});
