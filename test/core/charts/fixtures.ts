/**
 * Results used by the chart tests: the invented report project of test/core/report/fixtures.ts,
 * analysed once (the engine is exercised by its own tests; here it only supplies realistic data).
 */
import { analyzeProject, type ProjectResults } from '../../../core/analysis.ts';
import type { Project } from '../../../core/project/types.ts';
import { reportTestProject } from '../report/fixtures.ts';

let cached: { project: Project; results: ProjectResults } | undefined;

export function analysed(): { project: Project; results: ProjectResults } {
  if (!cached) {
    const project = reportTestProject();
    cached = { project, results: analyzeProject(project) };
  }
  return cached;
}

export function memberResult(id: string) {
  const m = analysed().results.members.find((r) => r.memberId === id);
  if (!m) throw new Error(`no result for ${id}`);
  return m;
}
