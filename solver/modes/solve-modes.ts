/**
 * `solveModes(project, caseId)`: build the model, solve the load case or combination (from the
 * pretensioned state, as solveProject does) and compute the lowest modes about it. A case that
 * does not converge is refused (ModalRefusal 'caseNotConverged'), its CaseResult still returned.
 */
import type { ProjectFile } from '../project/types.ts';
import type { SolveControl } from '../analysis/progress.ts';
import type { ModesOfCase } from './modes-types.ts';
import { buildModel } from '../model/build-model.ts';
import { createWorkspace } from '../analysis/workspace.ts';
import { solveCase } from '../analysis/solve-case.ts';
import { resolveCaseLoads, resolveCombinationLoads } from '../loads/resolve-case-loads.ts';
import { modesOfSolvedCase, type ModeOptions } from './case-modes.ts';

export function solveModes(project: ProjectFile, caseId: string, options: ModeOptions = {}, control: SolveControl = {}): ModesOfCase {
  const model = buildModel(project);
  const spec = project.loadCases.find((c) => c.id === caseId);
  const combination = spec ? undefined : (project.combinations ?? []).find((c) => c.id === caseId);
  if (!spec && !combination) return { caseResult: null, modal: { ok: false, refusal: { code: 'unknownCase', case: caseId } } };
  const ws = createWorkspace(model);
  const loads = spec ? resolveCaseLoads(model, project, spec) : resolveCombinationLoads(model, project, combination!);
  const solved = solveCase(ws, caseId, loads, { control });
  return { caseResult: solved.result, modal: modesOfSolvedCase(ws, project, loads, solved, options) };
}
