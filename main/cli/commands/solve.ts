/**
 * `stayset solve FILE [--full] [--json] [--case ID ...]`: validate a project, run the nonlinear
 * analysis of every load case and combination (or the chosen ones) and print the results: a
 * summary per member group when the project has groups, the per-member tables with `--full` (or
 * when it has none), or JSON.
 */
import { solveOnWorkers } from '../solve-on-workers.ts';
import type { ProjectFile, ProjectSolution, SolveControl, SolveProjectOptions, SolveReport } from '../../../solver/index.ts';
import type { CliCommand } from '../command.ts';
import { EXIT, UsageError } from '../cli-io.ts';
import type { CliIO } from '../cli-io.ts';
import { parseOptions } from '../options.ts';
import { readProjectOrReport } from '../read-project-file.ts';
import { checkCaseIds, filterReport } from '../case-selection.ts';
import { nonFinitePaths, replaceNonFinite } from '../format/finite-guard.ts';
import { solveReportText } from '../format/solve-report-text.ts';
import { solveSummaryText } from '../format/solve-summary-text.ts';
import { jsonOutputChunks } from '../format/json-output.ts';
import { RESULTS_DISCLAIMER } from '../disclaimer.ts';
import { runTimes, runTimesLine, withStatsProperty } from '../format/run-times.ts';

const HELP = `Solves every load case and combination of a project file (geometrically nonlinear,
tension-only cables, beam-columns). When the project has member groups it prints a summary: the
status of each case, then per group (guys first) the governing tension with its member and case,
the smallest tension, the highest utilisation under the design basis and the cases in which a
member goes slack. With --full (or without groups) it prints, per case: status, member forces,
beam end actions, node displacements and support reactions (with moments where rotations are
restrained).

Options:
  --full        Print the per-member tables of every case instead of the group summary.
  --json        Print {"cases": [...], "disclaimer": "...", "stats": {...}} instead of tables.
                Numbers are SI (N, m, N·m); tension is positive; reactions are forces and moments
                the supports exert; members[].beam holds beam end actions (node on member end,
                local axes). stats: inputSeconds, analysisSeconds (model and symbolic analysis),
                newtonSeconds, outputSeconds (building and writing the output), seconds (all of
                the solve: analysis and Newton).
  --case ID     Solve only this load case or combination (repeat for several).
  --help        Show this help.

Exit status:
  0  every case converged
  1  some case did not converge (results still printed, marked not converged) or the solver failed
  2  bad input: missing or invalid file, unknown option or case (messages on stderr, nothing on stdout)`;

/** The solver entry the command calls (solveProject; replaceable in tests of the output guards). */
export type ProjectSolver = (project: ProjectFile, control?: SolveControl, options?: SolveProjectOptions) => ProjectSolution | Promise<ProjectSolution>;

async function run(solver: ProjectSolver, args: string[], io: CliIO): Promise<number> {
  const opts = parseOptions(args, { json: { type: 'boolean' }, full: { type: 'boolean' }, case: { type: 'string', multiple: true } });
  if (opts.positionals.length !== 1) {
    throw new UsageError(opts.positionals.length === 0 ? 'solve needs a project FILE' : `solve takes one FILE (got ${opts.positionals.length})`);
  }
  const file = opts.positionals[0];
  const t0 = performance.now();
  const read = readProjectOrReport(file, io);
  const inputSeconds = (performance.now() - t0) / 1000;
  if (!read) return EXIT.badInput;
  const requested = opts.values.get('case') ?? [];
  const project = read.project;
  checkCaseIds(project, requested);
  if (read.migratedFrom !== undefined) {
    io.err(`${file}: note: read as format version ${read.migratedFrom} and migrated; saving would write the current version\n`);
  }

  let report: SolveReport;
  try {
    const only = requested.length > 0 ? { only: [...new Set(requested)] } : {};
    report = filterReport((await solver(project, {}, only)).report, requested);
  } catch (e) {
    io.err(`${file}: the analysis failed: ${(e as Error).message}\n`);
    return EXIT.notConverged;
  }
  const t1 = performance.now();
  const json = opts.flags.has('json');
  if (json) return writeJson(report, file, inputSeconds, t1, io);
  const guarded = replaceNonFinite(report);
  const summary = !opts.flags.has('full') && (project.groups?.length ?? 0) > 0;
  const text = summary ? solveSummaryText(project, guarded.value, RESULTS_DISCLAIMER, file)
    : solveReportText(project, guarded.value, RESULTS_DISCLAIMER);
  const times = runTimes(report, inputSeconds, (performance.now() - t1) / 1000);
  // Tables: the time line goes before the closing caution, which stays the last line.
  const tail = `${RESULTS_DISCLAIMER}\n`;
  io.out(`${text.slice(0, text.length - tail.length)}${runTimesLine(times)}\n\n${tail}`);
  if (reportNonFinite(guarded.paths, file, io)) return EXIT.notConverged;
  return guarded.value.cases.every((c) => c.converged) ? EXIT.ok : EXIT.notConverged;
}

/**
 * --json: the text is written while it is built (json-output.ts), the stats object last; a
 * non-finite number prints as null (as replaceNonFinite would make it) and fails the command.
 */
function writeJson(report: SolveReport, file: string, inputSeconds: number, t1: number, io: CliIO): number {
  const paths = nonFinitePaths(report);
  const rest = jsonOutputChunks({ cases: report.cases, disclaimer: RESULTS_DISCLAIMER }, (chunk) => io.out(chunk));
  io.out(withStatsProperty(rest, runTimes(report, inputSeconds, (performance.now() - t1) / 1000)));
  if (reportNonFinite(paths, file, io)) return EXIT.notConverged;
  return report.cases.every((c) => c.converged) ? EXIT.ok : EXIT.notConverged;
}

/** The message for non-finite numbers in the results (true when there were any). */
function reportNonFinite(paths: string[], file: string, io: CliIO): boolean {
  if (paths.length === 0) return false;
  const shown = paths.slice(0, 10).join(', ');
  const more = paths.length > 10 ? ` and ${paths.length - 10} more` : '';
  io.err(`${file}: error: the solver produced non-finite numbers (printed as null / —) at ${shown}${more}; these results are invalid\n`);
  return true;
}

export function makeSolveCommand(solver: ProjectSolver): CliCommand {
  return {
    name: 'solve',
    summary: 'analyse a project file and print a summary per member group, or member forces, displacements and reactions (--full)',
    usage: 'stayset solve FILE [--full] [--json] [--case ID ...]',
    help: HELP,
    run: (args, io) => run(solver, args, io),
  };
}

/** Several cases: one worker thread per core (solve-on-workers.ts). */
export const solveCommand: CliCommand = makeSolveCommand(solveOnWorkers);
