/**
 * The member tension schedule for the renderer: solver results → ScheduleDocument → HTML
 * (main/common/schedule), split into its <style> and <body> so it can be shown inside the page.
 * Checks and installation data come from the solver barrel; either may be left out.
 */
import type { ProjectFile, SolveReport } from '../../solver/index.ts';
import { installationData, runChecks, solveProject } from '../../solver/index.ts';
// Imported file by file: the schedule index also exports the CSV writer, whose csv-stringify
// dependency needs Node's Buffer at load time.
import { buildSchedule } from '../../main/common/schedule/build-schedule.ts';
import { scheduleHtml } from '../../main/common/schedule/schedule-html.ts';
import type { UnitSystem } from '../units/quantity-kinds.ts';

export interface SchedulePage {
  css: string;
  body: string;
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
  /** ISO date of issue, YYYY-MM-DD. */
  issueDate: string;
}

export function isoDate(d: Date): string {
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
}

/** Split a complete HTML document into the text of its <style> elements and its body markup. */
export function splitHtml(html: string): { css: string; body: string } {
  const css = [...html.matchAll(/<style[^>]*>([\s\S]*?)<\/style>/gi)].map((m) => m[1]).join('\n');
  const body = /<body[^>]*>([\s\S]*)<\/body>/i.exec(html)?.[1] ?? html;
  return { css, body };
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
  const doc = buildSchedule({ project: input.project, report, checks, installation }, { units: input.units, paper: input.paper, issueDate: input.issueDate });
  return { ...splitHtml(scheduleHtml(doc)), notes };
}
