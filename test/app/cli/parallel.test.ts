import { describe, expect, it } from 'vitest';
import { analyzeMembers } from '../../../core/analysis.ts';
import { demoProject } from '../../../core/project/demo.ts';
import { analyzeMembersParallel, defaultWorkerCount, partition } from '../../../app/cli/parallel.ts';
import { generatedProject } from '../../core/project/generated-project.ts';

describe('partition', () => {
  it('deals items round-robin into non-empty groups', () => {
    expect(partition(['a', 'b', 'c', 'd', 'e'], 2)).toEqual([['a', 'c', 'e'], ['b', 'd']]);
    expect(partition(['a', 'b'], 4)).toEqual([['a'], ['b']]);
    expect(partition(['a'], 0)).toEqual([['a']]);
    expect(partition([], 3)).toEqual([]);
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
