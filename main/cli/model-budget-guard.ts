/**
 * Before a command solves: refuse a project whose model would exceed the size budget
 * (solver/model/model-budget.ts), with the message naming the members that drive it and the limit.
 */
import { checkModelBudget, type ModelBudget, type ProjectFile } from '../../solver/index.ts';
import { modelBudgetRefusal } from '../common/limits/model-budget-text.ts';

/** The refusal for `project` as a CLI message (prefixed with the file name), or null when it fits. */
export function modelBudgetMessage(file: string, project: ProjectFile, budget?: ModelBudget): string | null {
  const refusal = modelBudgetRefusal(checkModelBudget(project, budget));
  return refusal === null ? null : `${file}: ${refusal}`;
}
