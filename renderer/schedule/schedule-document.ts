/**
 * The member tension schedule for the renderer: project + solver results → ScheduleDocument
 * (main/common/schedule/build-schedule.ts), rendered by SchedulePrint (components/schedule).
 * Checks, installation data (cut lengths, installation tensions, temperature table) and the first
 * natural frequencies come from the solver barrel (`scheduleParts`, the slow part, done once per
 * result); the document is then laid out from them (`schedulePageFrom`, quick), so a change of the
 * listing or the revisions re-lays it out without solving again. A part that cannot be made is
 * left out and the reason kept in `notes`.
 */
import type { CheckReport, InstallationData, ModalOutcome, ProjectFile, SolveReport, TuningResult } from '../../solver/index.ts';
import { installationData, referenceCaseId, runChecks, solveModes, solveProject } from '../../solver/index.ts';
// Imported file by file: the schedule index also exports the CSV writer, whose csv-stringify
// dependency needs Node's Buffer at load time.
import { buildSchedule } from '../../main/common/schedule/build-schedule.ts';
import { SCHEDULE_MODE_COUNT } from '../../main/common/schedule/schedule-frequencies.ts';
import type { ScheduleDocument } from '../../main/common/schedule/schedule-types.ts';
import type { UnitSystem } from '../../main/common/units/index.ts';

export interface SchedulePage {
  doc: ScheduleDocument;
  /** Why a part is missing (checks settings invalid, installation failed …). */
  notes: string[];
}

export interface ScheduleInput {
  project: ProjectFile;
  /** Results to use; solved here when null (print window). */
  report: SolveReport | null;
  units: UnitSystem;
  paper: 'a4' | 'letter';
  withInstallation: boolean;
  /** A tuning run whose values are in `project`, to summarise (else project.tuning.lastRun). */
  tuning?: TuningResult | null;
  /** ISO date of issue, YYYY-MM-DD. */
  issueDate: string;
}

/** What the schedule needs from the solver for one analysed state of the project. */
export interface ScheduleParts {
  report: SolveReport;
  checks: CheckReport | null;
  installation: InstallationData | null;
  modes: ModalOutcome | null;
  notes: string[];
}

export function isoDate(d: Date): string {
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
}

/** Checks, installation data and modes of `project` (solved here when `report` is null). */
export function scheduleParts(project: ProjectFile, report: SolveReport | null, withInstallation: boolean): ScheduleParts {
  const notes: string[] = [];
  const solved = report ?? solveProject(project).report;
  let checks: CheckReport | null = null;
  try {
    checks = runChecks(project, solved);
  } catch (e) {
    notes.push(`Design checks left out: ${(e as Error).message}`);
  }
  let installation: InstallationData | null = null;
  if (withInstallation) {
    try {
      installation = installationData(project);
    } catch (e) {
      notes.push(`Installation table left out: ${(e as Error).message}`);
    }
  }
  let modes: ModalOutcome | null = null;
  try {
    modes = solveModes(project, referenceCaseId(project), { count: SCHEDULE_MODE_COUNT }).modal;
  } catch (e) {
    notes.push(`Natural frequencies left out: ${(e as Error).message}`);
  }
  return { report: solved, checks, installation, modes, notes };
}

/** Lay out the schedule of `project` from parts computed for the same analysed state. */
export function schedulePageFrom(project: ProjectFile, parts: ScheduleParts, input: Pick<ScheduleInput, 'units' | 'paper' | 'issueDate' | 'tuning'>): SchedulePage {
  const { report, checks, installation, modes } = parts;
  const doc = buildSchedule({ project, report, checks, installation, modes, tuning: input.tuning ?? null }, { units: input.units, paper: input.paper, issueDate: input.issueDate });
  return { doc, notes: [...parts.notes] };
}

export function buildSchedulePage(input: ScheduleInput): SchedulePage {
  return schedulePageFrom(input.project, scheduleParts(input.project, input.report, input.withInstallation), input);
}
