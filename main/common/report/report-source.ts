/**
 * Everything the calculation report prints, computed once from the project: one solve of every
 * case and combination, the design checks on that solve, installation data, every tensioning
 * sequence and the modes about the reference case. Used by the app's report (through the host's
 * worker); the CLI's `report` command makes the same calls with its own exit codes.
 * Throws an Error naming the entry when the checks or a sequence refer to something that does not exist.
 */
import { CheckInputError, installationData, referenceCaseId, runChecks, runSequence, solveModes, solveProject } from '../../../solver/index.ts';
import type { CheckReport, InstallationData, ModalOutcome, ProjectFile, SequenceResult } from '../../../solver/index.ts';
import type { ReportSource } from './report-types.ts';

export function collectReportSource(project: ProjectFile): ReportSource {
  const notes: string[] = [];
  const report = solveProject(project).report;
  let checks: CheckReport;
  try {
    checks = runChecks(project, report);
  } catch (e) {
    if (e instanceof CheckInputError) throw new Error(`the check settings cannot be used: ${e.problems.join('; ')}`);
    throw e;
  }
  let installation: InstallationData | null = null;
  try {
    installation = installationData(project);
  } catch (e) {
    notes.push(`Installation data left out: ${(e as Error).message}.`);
  }
  const sequences: SequenceResult[] = (project.sequences ?? []).map((s) => runSequence(project, s.id));
  let modes: ModalOutcome | null = null;
  try {
    modes = solveModes(project, referenceCaseId(project)).modal;
  } catch (e) {
    notes.push(`Natural frequencies left out: ${(e as Error).message}.`);
  }
  return { project, report, checks, installation, sequences, modes, notes };
}
