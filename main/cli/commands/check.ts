/**
 * `stayset check FILE [--json]`: solve every load case and combination, run the design checks
 * under the project's design basis and `checks` settings, print the basis with its sources, the
 * governing result of every check and a pass/fail line.
 */
import { CheckInputError, envelopeOf, runChecks } from '../../../solver/index.ts';
import type { CheckReport, Envelope, ProjectFile, SolveReport } from '../../../solver/index.ts';
import type { CliCommand } from '../command.ts';
import { EXIT, UsageError } from '../cli-io.ts';
import type { CliIO } from '../cli-io.ts';
import { parseOptions } from '../options.ts';
import { readProjectOrReport } from '../read-project-file.ts';
import { plausibilityWarnings, resultWarnings } from '../../common/project/plausibility/plausibility-warnings.ts';
import { failureHint } from '../../common/project/plausibility/failure-hint.ts';
import { replaceNonFinite } from '../format/finite-guard.ts';
import { formatValue } from '../../common/units/index.ts';

const force = (n: number): string => formatValue(n, 'force', 'SI');
import { basisLines, checkRow, PURPOSE_NAMES, warningText } from '../../common/checks/check-text.ts';
import { textTable } from '../format/text-table.ts';
import { RESULTS_DISCLAIMER } from '../disclaimer.ts';
import { solveOnWorkers } from '../solve-on-workers.ts';

/** Exit status when every case converged but a design check failed. */
export const EXIT_CHECK_FAILED = 3;

const HELP = `Solves every load case and combination, then checks them under the project's design
basis ("designBasis": limit-state or allowable format, its factors and their sources):
strength (cable design tension / design resistance, bar tension and buckling to EN 1993-1-1
§6.3.1, uplift) on ultimate and accidental cases — every non-component case in the allowable
format — and serviceability (cable service tension, minimum tension, slack, sag, horizontal
displacement, tilt, twist) on serviceability cases; bar slenderness once. Component-only cases
are not checked. Prints the basis, the governing result of every check with its source, and
a pass/fail line. Not checked: connections, local buckling, lateral-torsional buckling.

Options:
  --json        Print {"pass", "check": CheckReport, "rows", "envelope", "disclaimer"} instead of tables.
  --help        Show this help.

Exit status:
  0  every checked case converged and every check passed
  1  some case did not converge (or the solver failed): do not use the results
  2  bad input: missing or invalid file, check settings naming unknown groups or nodes
  3  every case converged but some check failed`;

/** The plain-text summary `stayset check` prints (SI units). */
export function checkReportText(project: ProjectFile, check: CheckReport, env: Envelope): string {
  const out: string[] = [];
  out.push(`Design check — ${project.meta?.name ?? 'project'}`, '');
  out.push(...basisLines(check.basis), '');
  out.push('Cases');
  out.push(textTable(
    [{ title: 'case' }, { title: 'purpose' }, { title: 'converged' }, { title: 'max util.', align: 'right' }, { title: 'member or node' }, { title: 'failures', align: 'right' }, { title: 'result' }],
    check.cases.map((c) => [c.id, PURPOSE_NAMES[c.purpose], c.converged ? 'yes' : 'NO', c.checked && c.converged ? formatValue(c.maxUtilisation, 'ratio', 'SI') : '—', c.maxUtilisationMember, String(c.failures), !c.checked ? 'not checked' : c.pass ? 'pass' : 'FAIL']),
  ));
  const used = check.members.filter((m) => m.utilisation !== null).sort((a, b) => (b.utilisation ?? 0) - (a.utilisation ?? 0)).slice(0, 10);
  if (used.length) {
    out.push('', 'Highest utilisation (design force / design resistance, envelope)');
    out.push(textTable(
      [{ title: 'member' }, { title: 'T max kN', align: 'right' }, { title: 'util.', align: 'right' }, { title: 'case' }, { title: 'status' }],
      used.map((m) => [m.id, force(m.tensionMax), formatValue(m.utilisation ?? 0, 'ratio', 'SI'), m.utilisationCase, m.status]),
    ));
  }
  if (env.reactions.length) {
    out.push('', 'Support reactions (envelope of the checked cases; Fz < 0 = uplift: the support holds the structure down)');
    out.push(textTable(
      [{ title: 'support' }, { title: '|R| max kN', align: 'right' }, { title: 'case' }, { title: 'Fz min kN', align: 'right' }, { title: 'case' }, { title: '' }],
      env.reactions.map((r) => [r.node, force(r.magnitudeMax), r.magnitudeMaxCase, force(r.min[2]), r.minCase[2], r.min[2] < 0 ? 'uplift' : '']),
    ));
  }
  out.push('', 'Governing result of each check (worst first)');
  const rows = check.results.map((r) => checkRow(r, 'SI'));
  const shown = [...rows.filter((r) => r.verdict === 'FAIL'), ...rows.filter((r) => r.verdict === 'pass').slice(0, 20)];
  out.push(textTable(
    [{ title: 'check' }, { title: 'item' }, { title: 'case' }, { title: 'purpose' }, { title: 'value', align: 'right' }, { title: 'limit', align: 'right' }, { title: 'ratio', align: 'right' }, { title: 'result' }, { title: 'source' }],
    shown.map((r) => [r.check, r.item, r.case, r.purpose, r.value, r.limit, r.ratio, r.verdict, r.source]),
  ));
  if (rows.length > shown.length) out.push(`(${rows.length - shown.length} more passing results in --json)`);
  out.push('');
  for (const w of check.warnings) out.push(`note: ${warningText(w)}`);
  const verdict = !check.allConverged
    ? 'CHECK INCOMPLETE: some case did not converge — do not use these results'
    : check.pass ? `CHECK PASSED: ${check.cases.filter((c) => c.checked).length} checked case(s), every check within its limit`
      : `CHECK FAILED: ${check.failures.length} failure(s)`;
  out.push(verdict, '', RESULTS_DISCLAIMER, '');
  return out.join('\n');
}

function plausibilityText(warnings: string[]): string {
  if (warnings.length === 0) return '';
  return `Plausibility warnings (the results below may rest on a unit slip):\n${warnings.map((w) => `  warning: ${w}`).join('\n')}\n\n`;
}

async function run(args: string[], io: CliIO): Promise<number> {
  const opts = parseOptions(args, { json: { type: 'boolean' } });
  if (opts.positionals.length !== 1) {
    throw new UsageError(opts.positionals.length === 0 ? 'check needs a project FILE' : `check takes one FILE (got ${opts.positionals.length})`);
  }
  const file = opts.positionals[0];
  const read = readProjectOrReport(file, io);
  if (!read) return EXIT.badInput;
  const project = read.project;
  let report: SolveReport;
  try {
    report = (await solveOnWorkers(project)).report;
  } catch (e) {
    io.err(`${file}: the analysis failed: ${(e as Error).message}${failureHint(project)}\n`);
    return EXIT.notConverged;
  }
  let check: CheckReport;
  try {
    check = runChecks(project, report);
  } catch (e) {
    if (e instanceof CheckInputError) {
      for (const p of e.problems) io.err(`${file}: ${p}\n`);
      return EXIT.badInput;
    }
    throw e;
  }
  const env = envelopeOf(report, check.cases.filter((c) => c.checked).map((c) => c.id));
  // Plausibility warnings are part of the report: inputs outside real ranges, sags of a unit slip.
  const plausibility = [...plausibilityWarnings(project), ...resultWarnings(project, report)];
  const guarded = replaceNonFinite({ pass: check.pass, check, rows: check.results.map((r) => checkRow(r, 'SI')), envelope: env, plausibility });
  if (opts.flags.has('json')) io.out(`${JSON.stringify({ ...guarded.value, disclaimer: RESULTS_DISCLAIMER }, null, 2)}\n`);
  else io.out(plausibilityText(plausibility) + checkReportText(project, check, env));
  if (guarded.paths.length > 0) {
    io.err(`${file}: error: the solver produced non-finite numbers at ${guarded.paths.slice(0, 10).join(', ')}; these results are invalid\n`);
    return EXIT.notConverged;
  }
  if (!check.allConverged) return EXIT.notConverged;
  return check.pass ? EXIT.ok : EXIT_CHECK_FAILED;
}

export const checkCommand: CliCommand = {
  name: 'check',
  summary: 'solve a project and run the design checks; pass/fail summary',
  usage: 'stayset check FILE [--json]',
  help: HELP,
  run,
};
