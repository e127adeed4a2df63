/**
 * Whole-project speed and memory (issue 4): a generated 1,000-member project (spans, sections,
 * supports and loads varied deterministically, test/core/project/generated-project.ts) analysed end
 * to end — serially in this thread, and in parallel on worker threads (app/cli/parallel.ts) — in the
 * same run. Reported: median wall time, CPU time of the process (all threads) and peak resident memory
 * (process.memoryUsage().rss, sampled after every member and every 25 ms; worker threads live in this
 * process, so their memory counts), as ratios to the serial run and to a fixed arithmetic yardstick
 * measured in the same run, and against the targets (3 s, 500 MB). The CPU ratio separates the
 * workers' own overhead (start-up, compiling, warming up) from time lost to other work on the machine.
 *
 * Run with `npm run bench` (vitest bench --run). Each analysis takes tens of seconds, so each task
 * runs three times without warm-up.
 */
import { availableParallelism, loadavg } from 'node:os';
import { afterAll, bench, describe } from 'vitest';
import { analyzeMembers } from '../../core/analysis.ts';
import { analyzeMembersParallel, defaultWorkerCount } from '../../app/cli/parallel.ts';
import { parseProject, serializeProject } from '../../core/project/file.ts';
import { generatedProject } from '../core/project/generated-project.ts';

const MEMBERS = 1000;
const TARGET_SECONDS = 3;
const TARGET_MEGABYTES = 500;
const RUNS = { time: 0, iterations: 3, warmupTime: 0, warmupIterations: 0 } as const;

// End to end includes reading the file: the project goes through text and parseProject.
const text = serializeProject(generatedProject(MEMBERS));
const workers = defaultWorkerCount(MEMBERS);

interface Run {
  readonly seconds: number;
  /** CPU time of the whole process (all threads), s: tells overhead from waiting for a busy machine. */
  readonly cpuSeconds: number;
  readonly peakMegabytes: number;
  /** Peak minus the RSS at the start of the run (what this run added, whatever earlier runs left). */
  readonly growthMegabytes: number;
}
const runs: Record<string, Run[]> = { serial: [], parallel: [], yardstick: [] };

const rssMegabytes = () => process.memoryUsage.rss() / 1048576;

async function measured(name: string, work: (sample: () => void) => Promise<unknown> | unknown): Promise<void> {
  const startRss = rssMegabytes();
  let peak = startRss;
  const sample = () => {
    const now = rssMegabytes();
    if (now > peak) peak = now;
  };
  const timer = setInterval(sample, 25);
  const cpuStart = process.cpuUsage();
  const start = performance.now();
  try {
    await work(sample);
  } finally {
    clearInterval(timer);
  }
  sample();
  const cpu = process.cpuUsage(cpuStart);
  runs[name]!.push({ seconds: (performance.now() - start) / 1000, cpuSeconds: (cpu.user + cpu.system) / 1e6, peakMegabytes: peak, growthMegabytes: peak - startRss });
}

const median = (values: readonly number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
};

describe(`${MEMBERS}-member project, end to end (parse, analyse every member)`, () => {
  bench('yardstick: 2·10⁷ square roots (fixed arithmetic workload)', async () => {
    await measured('yardstick', () => {
      let s = 0;
      for (let i = 0; i < 20_000_000; i++) s += Math.sqrt(i);
      if (s < 0) throw new Error('unreachable');
    });
  }, RUNS);

  bench('serial: analyzeMembers in one thread', async () => {
    await measured('serial', (sample) => {
      const { project } = parseProject(text);
      const results = analyzeMembers(project!, undefined, () => sample());
      if (results.length !== MEMBERS) throw new Error('members missing');
    });
  }, RUNS);

  bench(`parallel: ${workers} worker threads`, async () => {
    await measured('parallel', async (sample) => {
      const { project } = parseProject(text);
      const results = await analyzeMembersParallel(project!, undefined, { workers, onProgress: () => sample() });
      if (results.length !== MEMBERS) throw new Error('members missing');
    });
  }, RUNS);
});

afterAll(() => {
  const serial = runs.serial!;
  const parallel = runs.parallel!;
  const yardstick = runs.yardstick!;
  if (serial.length === 0 || parallel.length === 0 || yardstick.length === 0) return;
  const base = median(serial.map((r) => r.seconds));
  const baseCpu = median(serial.map((r) => r.cpuSeconds));
  const yard = median(yardstick.map((r) => r.seconds));
  const row = (label: string, list: Run[]) => {
    const seconds = median(list.map((r) => r.seconds));
    const memory = Math.max(...list.map((r) => r.peakMegabytes));
    const growth = Math.max(...list.map((r) => r.growthMegabytes));
    const cpu = median(list.map((r) => r.cpuSeconds));
    return [
      label.padEnd(26),
      `${seconds.toFixed(2)} s`.padStart(9),
      `${cpu.toFixed(2)} s`.padStart(9),
      `${(cpu / baseCpu).toFixed(2)}`.padStart(9),
      `${memory.toFixed(0)} MB`.padStart(8),
      `+${growth.toFixed(0)} MB`.padStart(9),
      `${(seconds / base).toFixed(2)}`.padStart(9),
      `${(seconds / yard).toFixed(1)}`.padStart(10),
      `${(seconds / TARGET_SECONDS).toFixed(2)}`.padStart(9),
      `${(memory / TARGET_MEGABYTES).toFixed(2)}`.padStart(10),
    ].join('  ');
  };
  const lines = [
    '',
    `Project benchmark: ${MEMBERS} members, ${availableParallelism()} cores, median of ${RUNS.iterations} runs, peak RSS over the runs`,
    // Other work on the machine takes cores from the parallel run first: read the ratios with the load.
    `machine load average at the end (1, 5, 15 min): ${loadavg().map((l) => l.toFixed(2)).join(', ')}`,
    `${'task'.padEnd(26)}  ${'median'.padStart(9)}  ${'CPU'.padStart(9)}  ${'CPU ÷ ser'.padStart(9)}  ${'peak RSS'.padStart(8)}  ${'growth'.padStart(9)}  ${'÷ serial'.padStart(9)}  ${'÷ yardstick'.padStart(10)}  ${'÷ 3 s'.padStart(9)}  ${'÷ 500 MB'.padStart(10)}`,
    row('serial (this thread)', serial),
    row(`parallel (${workers} workers)`, parallel),
    row('yardstick (arithmetic)', yardstick),
    `per member: serial ${((base / MEMBERS) * 1000).toFixed(1)} ms, parallel ${((median(parallel.map((r) => r.seconds)) / MEMBERS) * 1000).toFixed(1)} ms`,
    '',
  ];
  console.log(lines.join('\n'));
});
