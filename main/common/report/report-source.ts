/**
 * Everything the calculation report prints, computed once from the project: one solve of every
 * case and combination (or the solve the caller passes in, e.g. one shared among worker threads), the design checks on that solve, installation data, every tensioning
 * sequence and the modes about the reference case. The CLI's `report` command and the app's report
 * (through the host's worker) both build it here.
 * Throws ReportInputError, naming the entries, when the check settings or a sequence cannot be
 * used; an error of the analysis itself is thrown as it comes.
 */
import { CheckInputError, installationData, referenceCaseId, runChecks, runSequence, solveModes, solveProject } from '../../../solver/index.ts';
import type { CheckReport, InstallationData, ModalOutcome, ProjectFile, SequenceResult, SolveReport } from '../../../solver/index.ts';
import type { ReportSource } from './report-types.ts';

export class ReportInputError extends Error {
  constructor(readonly problems: string[]) {
    super(problems.join('; '));
    this.name = 'ReportInputError';
  }
}

export function collectReportSource(project: ProjectFile, report: SolveReport = solveProject(project).report): ReportSource {
  const notes: string[] = [];
  let checks: CheckReport;
  try {
    checks = runChecks(project, report);
  } catch (e) {
    if (e instanceof CheckInputError) throw new ReportInputError(e.problems);
    throw e;
  }
  let installation: InstallationData | null = null;
  try {
    installation = installationData(project);
  } catch (e) {
    notes.push(`Installation data left out: ${(e as Error).message}.`);
  }
  const sequences: SequenceResult[] = (project.sequences ?? []).map((s) => {
    try {
      return runSequence(project, s.id);
    } catch (e) {
      throw new ReportInputError([(e as Error).message]);
    }
  });
  let modes: ModalOutcome | null = null;
  try {
    modes = solveModes(project, referenceCaseId(project)).modal;
  } catch (e) {
    notes.push(`Natural frequencies left out: ${(e as Error).message}.`);
  }
  return { project, report, checks, installation, sequences, modes, notes };
}
