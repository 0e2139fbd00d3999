/**
 * The solver entry of the CLI's solving commands (`solve`, `check`, `schedule`, `report`): a
 * project with several cases is solved on one thread per core (this one and worker threads,
 * main/analysis/parallel-solve.ts; the report is the serial one's, case for case); a single case,
 * or STAYSET_WORKERS=1, is solved in this process.
 */
import { solveProject } from '../../solver/index.ts';
import type { ProjectFile, ProjectSolution, SolveControl, SolveProjectOptions } from '../../solver/index.ts';
import { caseIds, defaultWorkerCount } from '../analysis/case-shares.ts';
import { solveProjectInWorkers } from '../analysis/parallel-solve.ts';

export function solveOnWorkers(project: ProjectFile, control: SolveControl = {}, options: SolveProjectOptions = {}): ProjectSolution | Promise<ProjectSolution> {
  const workers = defaultWorkerCount(caseIds(project, options.only).length);
  if (workers <= 1) return solveProject(project, control, options);
  return solveProjectInWorkers(project, { workers, ...(options.only ? { only: options.only } : {}) });
}
