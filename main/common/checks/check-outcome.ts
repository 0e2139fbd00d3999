/**
 * The design checks of a solved report as the app shows them, wherever they are computed: in the
 * analysis worker with the solve (main/analysis/analysis-worker.ts), in the tuning worker with each
 * live re-solve (renderer/tuning/live-checks.ts) or, after an edit of the check settings alone, on
 * the renderer's main thread (renderer/stores/checks.ts).
 *
 * What is checked: the analysed model (every part of the project the results were computed from)
 * under the current check settings — `checks` and `designBasis`, the two parts of the file that
 * only the checks read. A model edit leaves the checks with the results it made stale.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import type { CheckReport, ProjectFile, SolveReport } from '../../../solver/index.ts';
import { runChecks } from '../../../solver/index.ts';

export interface CheckOutcome {
  report: CheckReport | null;
  /** Why there is no report although there are results (check settings naming missing groups or nodes). */
  error: string | null;
}

/** runChecks with its refusal as a message instead of an exception. */
export function checkOutcome(project: ProjectFile, report: SolveReport): CheckOutcome {
  try {
    return { report: runChecks(project, report), error: null };
  } catch (e) {
    return { report: null, error: e instanceof Error ? e.message : String(e) };
  }
}

/** The analysed model `model` with the check settings of `settings` (returns `model` when they are the same). */
export function withCheckSettings(model: ProjectFile, settings: ProjectFile): ProjectFile {
  if (sameCheckSettings(model, settings)) return model;
  return { ...model, checks: settings.checks, designBasis: settings.designBasis };
}

/** True when both projects hold the same check settings (by reference: edits share unchanged parts). */
export function sameCheckSettings(a: ProjectFile, b: ProjectFile): boolean {
  return a.checks === b.checks && a.designBasis === b.designBasis;
}
