/**
 * Limits of one analysis run: the model-size budget checked before a worker is started, the
 * worker's V8 heap limit, the grace a cancelled worker gets, and the words for a worker that died.
 *
 * The heap limit (worker_threads resourceLimits) bounds JS objects only; the solver's typed
 * arrays live outside the V8 heap, which is why the size budget is checked first
 * (solver/model/model-budget.ts). A worker that exceeds its heap is stopped by Node
 * (ERR_WORKER_OUT_OF_MEMORY) without taking the host process down.
 */
import type { ResourceLimits } from 'node:worker_threads';
import { checkModelBudget, DEFAULT_MODEL_BUDGET, type ModelBudget, type ProjectFile } from '../../solver/index.ts';
import { modelBudgetRefusal } from '../common/limits/model-budget-text.ts';

/** V8 old-generation limit of an analysis worker, MB (common practice for this program). */
export const DEFAULT_WORKER_HEAP_MB = 1536;

/** A cancelled run is reported as cancelled, and its worker terminated, at most this long after cancel(), ms. */
export const CANCEL_GRACE_MS = 500;

export function defaultResourceLimits(): ResourceLimits {
  return { maxOldGenerationSizeMb: DEFAULT_WORKER_HEAP_MB };
}

/** Why a project may not be started, or null. */
export function runRefusal(project: ProjectFile, budget: ModelBudget = DEFAULT_MODEL_BUDGET): string | null {
  return modelBudgetRefusal(checkModelBudget(project, budget));
}

/** The message for a worker that stopped with an error event. */
export function workerDeathMessage(e: Error & { code?: string }, limits: ResourceLimits | undefined): string {
  if (e.code === 'ERR_WORKER_OUT_OF_MEMORY') {
    const mb = limits?.maxOldGenerationSizeMb;
    return `The analysis ran out of memory${mb ? ` (limit ${mb} MB)` : ''} and was stopped; nothing else was affected. `
      + 'Reduce the segments of the most divided members or the number of cases and run again.';
  }
  return `Analysis worker failed: ${e.message}`;
}
