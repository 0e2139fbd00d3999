/**
 * The member tension schedule for the renderer: project + solver results → ScheduleDocument
 * (main/common/schedule/build-schedule.ts), rendered by SchedulePrint (components/schedule).
 * Checks and installation data (cut lengths, installation tensions, temperature table) come from
 * the solver barrel; a part that cannot be made is left out and the reason kept in `notes`.
 */
import type { ProjectFile, SolveReport, TuningResult } from '../../solver/index.ts';
import { installationData, runChecks, solveProject } from '../../solver/index.ts';
// Imported file by file: the schedule index also exports the CSV writer, whose csv-stringify
// dependency needs Node's Buffer at load time.
import { buildSchedule } from '../../main/common/schedule/build-schedule.ts';
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

export function isoDate(d: Date): string {
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
}

export function buildSchedulePage(input: ScheduleInput): SchedulePage {
  const notes: string[] = [];
  const report = input.report ?? solveProject(input.project).report;
  let checks = null;
  try {
    checks = runChecks(input.project, report);
  } catch (e) {
    notes.push(`Design checks left out: ${(e as Error).message}`);
  }
  let installation = null;
  if (input.withInstallation) {
    try {
      installation = installationData(input.project);
    } catch (e) {
      notes.push(`Installation table left out: ${(e as Error).message}`);
    }
  }
  const doc = buildSchedule({ project: input.project, report, checks, installation, tuning: input.tuning ?? null }, { units: input.units, paper: input.paper, issueDate: input.issueDate });
  return { doc, notes };
}
