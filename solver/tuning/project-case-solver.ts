/**
 * The CaseSolveFn the tuner uses by default: a full nonlinear solve (solveProject) of only the
 * named cases, each from the pretensioned state of the given project.
 */
import type { ProjectFile } from '../project/types.ts';
import type { CaseResult } from '../results/types.ts';
import { solveProject } from '../analysis/solve-project.ts';
import type { CaseSolveFn } from './tuning-types.ts';

export const solveNamedCases: CaseSolveFn = (project: ProjectFile, caseIds: readonly string[]) => {
  const solution = solveProject(project, {}, { only: [...caseIds] });
  const out = new Map<string, CaseResult>();
  for (const r of solution.report.cases) out.set(r.id, r);
  for (const id of caseIds) if (!out.has(id)) throw new Error(`case "${id}" does not exist`);
  return out;
};
