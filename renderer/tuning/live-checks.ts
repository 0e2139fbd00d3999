/**
 * The design checks of a live slider step, run in the tuning worker beside the re-solve so the
 * main thread does not run them on every step: the analysed report with the re-solved case in
 * its place, checked under the project with the group's pretension committed — what the
 * checks show after the slider is released (commitPretension), so they do not jump on release.
 * Results are for review by a qualified engineer; local codes and licensed practice govern.
 */
import type { CaseResult, ProjectFile, SolveReport } from '../../solver/index.ts';
import { checkOutcome, type CheckOutcome } from '../../main/common/checks/check-outcome.ts';
import { commitPretension } from './tuning-edits.ts';

/** `report` with case `caseId` replaced by `result` (a live re-solve). */
export function withLiveCase(report: SolveReport, caseId: string, result: CaseResult): SolveReport {
  return { ...report, cases: report.cases.map((c) => (c.id === caseId ? result : c)) };
}

/** Checks of `report` with `caseId` re-solved as `result`, `group` at `pretension` N in `project`. */
export function liveStepChecks(project: ProjectFile, report: SolveReport, caseId: string, group: string, pretension: number, result: CaseResult): CheckOutcome {
  let checked = project;
  try {
    checked = commitPretension(project, group, pretension);
  } catch {
    // Not a pretension the slider can set: the re-solve refused it already; check the project as it is.
  }
  return checkOutcome(checked, withLiveCase(report, caseId, result));
}
