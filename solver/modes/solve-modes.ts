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
import { resolveNamedCaseLoads } from '../loads/resolve-case-loads.ts';
import { modesOfSolvedCase, type ModeOptions } from './case-modes.ts';

export function solveModes(project: ProjectFile, caseId: string, options: ModeOptions = {}, control: SolveControl = {}): ModesOfCase {
  const model = buildModel(project);
  const loads = resolveNamedCaseLoads(model, project, caseId);
  if (!loads) return { caseResult: null, modal: { ok: false, refusal: { code: 'unknownCase', case: caseId } } };
  const ws = createWorkspace(model);
  const solved = solveCase(ws, caseId, loads, { control });
  return { caseResult: solved.result, modal: modesOfSolvedCase(ws, project, loads, solved, options) };
}
