/**
 * `--case ID ...`: checks that every requested id is a load case or combination of the project
 * (the solver is then asked for those only), and keeps the report to the requested ids.
 */
import type { ProjectFile, SolveReport } from '../../solver/index.ts';
import { actionCaseIds, hasActionCases } from '../../solver/index.ts';
import { UsageError } from './cli-io.ts';

/** Throws UsageError naming every unknown id and listing the cases the file has. */
export function checkCaseIds(project: ProjectFile, requested: readonly string[]): void {
  const ids = [...project.loadCases.map((c) => c.id), ...(project.combinations ?? []).map((c) => c.id)];
  if (hasActionCases(project)) ids.push(...actionCaseIds(project));
  const unknown = requested.filter((id) => !ids.includes(id));
  if (unknown.length > 0) {
    const names = unknown.map((id) => JSON.stringify(id)).join(', ');
    throw new UsageError(`unknown case ${names} (the file has: ${ids.join(', ')})`);
  }
}

/** The report restricted to the requested ids (all cases when none were requested). */
export function filterReport(report: SolveReport, requested: readonly string[]): SolveReport {
  if (requested.length === 0) return report;
  const want = new Set(requested);
  return { ...report, cases: report.cases.filter((c) => want.has(c.id)) };
}
