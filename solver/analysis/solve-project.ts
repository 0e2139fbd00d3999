/**
 * Solve every load case and then every combination of a project, each from the pretensioned
 * state (the modelled geometry with its initial stresses), on one shared workspace.
 */
import type { ProjectFile } from '../project/types.ts';
import type { ProjectSolution } from '../results/types.ts';
import type { SolveControl } from './progress.ts';
import { buildModel } from '../model/build-model.ts';
import { resolveCaseLoads, resolveCombinationLoads } from '../loads/resolve-case-loads.ts';
import { createWorkspace } from './workspace.ts';
import { solveCase } from './solve-case.ts';
import { appendActionCases } from './solve-actions.ts';
import { nowMs } from './clock.ts';

export interface SolveProjectOptions {
  /** Only these case / combination ids (default: all). */
  only?: string[];
  /**
   * Dynamic sharing of the cases among several solvers (main/analysis/parallel-solve.ts): when
   * given, the load cases and combinations solved are those this returns, one call per case,
   * until it returns undefined (ids it does not know are skipped); the report lists them in the
   * order taken. Action-derived cases are then not appended (they need their base cases in the
   * same solve).
   */
  nextCase?: () => string | undefined;
}

export function solveProject(project: ProjectFile, control: SolveControl = {}, options: SolveProjectOptions = {}): ProjectSolution {
  const t0 = nowMs();
  const model = buildModel(project);
  const ws = createWorkspace(model);
  const t1 = nowMs();
  const wanted = (id: string) => !options.only || options.only.includes(id);
  const jobs = [
    ...project.loadCases.filter((c) => wanted(c.id)).map((c) => ({ id: c.id, loads: () => resolveCaseLoads(model, project, c) })),
    ...(project.combinations ?? []).filter((c) => wanted(c.id)).map((c) => ({ id: c.id, loads: () => resolveCombinationLoads(model, project, c) })),
  ];
  const solution: ProjectSolution = { report: { cases: [] }, fields: [] };
  const solve = (job: (typeof jobs)[number], caseIndex: number): void => {
    const { result, fields } = solveCase(ws, job.id, job.loads(), {
      control, tag: { caseIndex, caseCount: jobs.length, caseId: job.id },
    });
    solution.report.cases.push(result);
    solution.fields.push(fields);
  };
  if (options.nextCase) {
    const indexOf = new Map(jobs.map((job, i) => [job.id, i] as const));
    for (let id = options.nextCase(); id !== undefined; id = options.nextCase()) {
      const i = indexOf.get(id);
      if (i !== undefined) solve(jobs[i], i);
    }
  } else {
    jobs.forEach(solve);
    appendActionCases(project, model, ws, solution, control, wanted);
  }
  const t2 = nowMs();
  solution.report.stats = { analysisSeconds: (t1 - t0) / 1000, newtonSeconds: (t2 - t1) / 1000, seconds: (t2 - t0) / 1000 };
  return solution;
}
