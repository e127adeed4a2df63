import { describe, expect, it } from 'vitest';
import { analyzeMembers } from '../../../core/analysis.ts';
import { demoProject } from '../../../core/project/demo.ts';
import { analyzeMembersParallel, chunkSize, defaultWorkerCount, MAX_CHUNK } from '../../../app/cli/parallel.ts';
import { generatedProject } from '../../core/project/generated-project.ts';

describe('chunkSize', () => {
  it('hands out a quarter of an equal share, at most MAX_CHUNK, shrinking to one member at the end', () => {
    expect(chunkSize(1000, 2)).toBe(MAX_CHUNK);
    expect(chunkSize(40, 2)).toBe(5);
    expect(chunkSize(3, 2)).toBe(1);
    expect(chunkSize(1, 8)).toBe(1);
    expect(chunkSize(5, 0)).toBe(2);
    // Every member is handed out exactly once, and the last chunks are single members.
    let left = 1000;
    const sizes: number[] = [];
    while (left > 0) {
      const size = chunkSize(left, 2);
      sizes.push(size);
      left -= size;
    }
    expect(sizes.reduce((a, b) => a + b, 0)).toBe(1000);
    expect(sizes.slice(-3)).toEqual([1, 1, 1]);
    expect(sizes.every((size, i) => i === 0 || size <= sizes[i - 1]!)).toBe(true);
  });
});

describe('defaultWorkerCount', () => {
  it('is the number of cores, one per eight members at most, and at least one (1: this thread)', () => {
    expect(defaultWorkerCount(1000, 2)).toBe(2);
    expect(defaultWorkerCount(1000, 8)).toBe(8);
    expect(defaultWorkerCount(20, 8)).toBe(2);
    expect(defaultWorkerCount(7, 8)).toBe(1);
    expect(defaultWorkerCount(0, 8)).toBe(1);
  });
});

describe('analyzeMembersParallel', () => {
  it('gives results identical to the serial analysis, in project order, with progress for every member', async () => {
    const project = demoProject();
    const serial = analyzeMembers(project);
    const progress: [number, number, string][] = [];
    const parallel = await analyzeMembersParallel(project, undefined, { workers: 3, onProgress: (d, t, id) => progress.push([d, t, id]) });
    expect(parallel).toEqual(serial);
    expect(JSON.stringify(parallel)).toBe(JSON.stringify(serial));
    expect(progress.map((p) => p[0])).toEqual(Array.from({ length: project.members.length }, (_, i) => i + 1));
    expect(progress.every((p) => p[1] === project.members.length)).toBe(true);
    expect(new Set(progress.map((p) => p[2]))).toEqual(new Set(project.members.map((m) => m.id)));
  }, 240_000);

  it('analyses only the members asked for, in project order, like the serial entry point', async () => {
    const project = generatedProject(12);
    const ids = ['G-0009', 'G-0002', 'G-0005'];
    const parallel = await analyzeMembersParallel(project, ids, { workers: 2 });
    expect(parallel.map((r) => r.memberId)).toEqual(['G-0002', 'G-0005', 'G-0009']);
    expect(parallel).toEqual(analyzeMembers(project, ids));
  }, 240_000);

  it('gives the serial results for a project of many chunks (each worker asks for more until none is left)', async () => {
    const project = generatedProject(24);
    const progress: number[] = [];
    const parallel = await analyzeMembersParallel(project, undefined, { workers: 2, onProgress: (done) => progress.push(done) });
    expect(parallel.map((r) => r.memberId)).toEqual(project.members.map((m) => m.id));
    expect(JSON.stringify(parallel)).toBe(JSON.stringify(analyzeMembers(project)));
    expect(progress).toEqual(Array.from({ length: 24 }, (_, i) => i + 1));
  }, 240_000);

  it('returns nothing for no members without starting workers', async () => {
    await expect(analyzeMembersParallel(demoProject(), [])).resolves.toEqual([]);
  });

  it('rejects at once when the signal is already aborted', async () => {
    const controller = new AbortController();
    controller.abort();
    await expect(analyzeMembersParallel(demoProject(), undefined, { signal: controller.signal })).rejects.toMatchObject({ name: 'AbortError' });
  });

  it('stops the workers and rejects with an AbortError when cancelled during the run', async () => {
    const project = generatedProject(200);
    const controller = new AbortController();
    let seen = 0;
    const run = analyzeMembersParallel(project, undefined, {
      workers: 2,
      signal: controller.signal,
      onProgress: (done) => {
        seen = done;
        if (done === 3) controller.abort();
      },
    });
    await expect(run).rejects.toMatchObject({ name: 'AbortError' });
    const atRejection = seen;
    expect(atRejection).toBeLessThan(200);
    // Nothing is reported after the rejection.
    await new Promise((resolve) => setTimeout(resolve, 400));
    expect(seen).toBe(atRejection);
  }, 240_000);

  it('refuses duplicate member ids, whose results could not be told apart', async () => {
    const project = demoProject();
    const twice = { ...project, members: [project.members[0]!, project.members[0]!] };
    await expect(analyzeMembersParallel(twice)).rejects.toThrow(/unique/);
  });
});
