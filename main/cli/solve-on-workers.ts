/**
 * The solver entry of the CLI's solving commands (`solve`, `check`, `schedule`, `report`): a
 * project whose cases are worth sharing (case-shares.ts workerCountFor: enough DOFs × cases to
 * repay a worker's start) is solved on one thread per core (this one and worker threads,
 * main/analysis/parallel-solve.ts; the report is the serial one's, case for case); a smaller run,
 * or STAYSET_WORKERS=1, is solved in this process. STAYSET_WORKERS=N forces N threads.
 */
import { solveProject } from '../../solver/index.ts';
import type { ProjectFile, ProjectSolution, SolveControl, SolveProjectOptions } from '../../solver/index.ts';
import { caseIds, workerCountFor } from '../analysis/case-shares.ts';
import { solveProjectInWorkers } from '../analysis/parallel-solve.ts';

export function solveOnWorkers(project: ProjectFile, control: SolveControl = {}, options: SolveProjectOptions = {}): ProjectSolution | Promise<ProjectSolution> {
  const workers = workerCountFor(project, caseIds(project, options.only).length);
  if (workers <= 1) return solveProject(project, control, options);
  return solveProjectInWorkers(project, { workers, ...(options.only ? { only: options.only } : {}) });
}
