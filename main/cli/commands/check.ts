/**
 * `stayset check FILE [--json]`: solve every load case and combination, run the design checks of
 * the project's `checks` settings over them (utilisation against φ · breaking load, slack, sag,
 * displacement, tilt, uplift) and print a pass/fail summary.
 */
import { CheckInputError, envelopeOf, runChecks, solveProject } from '../../../solver/index.ts';
import type { CheckReport, Envelope, ProjectFile, SolveReport } from '../../../solver/index.ts';
import type { CliCommand } from '../command.ts';
import { EXIT, UsageError } from '../cli-io.ts';
import type { CliIO } from '../cli-io.ts';
import { parseOptions } from '../options.ts';
import { readProjectOrReport } from '../read-project-file.ts';
import { plausibilityWarnings, resultWarnings } from '../../common/project/plausibility/plausibility-warnings.ts';
import { failureHint } from '../../common/project/plausibility/failure-hint.ts';
import { replaceNonFinite } from '../format/finite-guard.ts';
import { fixed, kN } from '../format/number-text.ts';
import { textTable } from '../format/text-table.ts';
import { RESULTS_DISCLAIMER } from '../disclaimer.ts';

/** Exit status when every case converged but a design check failed. */
export const EXIT_CHECK_FAILED = 3;

const HELP = `Solves every load case and combination, then checks them against the project's
"checks" settings: utilisation T / (φ · breaking load) (φ default 0.5), members that must
not go slack, sag limits, node displacement limits, mast tilt limits and uplift at listed
supports. Prints the governing case of every failure and a pass/fail line.
Not checked: compression, buckling or connection strength of bars (mast members); check
those separately.

Options:
  --json        Print {"pass", "check": CheckReport, "envelope", "disclaimer"} instead of tables.
  --help        Show this help.

Exit status:
  0  every case converged and every check passed
  1  some case did not converge (or the solver failed): do not use the results
  2  bad input: missing or invalid file, check settings naming unknown groups or nodes
  3  every case converged but some check failed`;

const ratioText = (r: number | null) => (r === null ? '—' : fixed(r, 3));

function valueText(kind: string, v: number): string {
  if (kind === 'utilisation' || kind === 'uplift' || kind === 'slack') return `${kN(v)} kN`;
  if (kind === 'tilt') return v > 0 ? `1/${fixed(1 / v, 0)}` : '0';
  if (kind === 'notConverged') return '';
  return `${fixed(v, 3)} m`;
}

/** The plain-text summary `stayset check` prints. */
export function checkReportText(project: ProjectFile, check: CheckReport, env: Envelope): string {
  const out: string[] = [];
  out.push(`Design check — ${project.meta?.name ?? 'project'}   (φ = ${check.resistanceFactor} on breaking load)`);
  out.push('');
  out.push('Cases');
  out.push(textTable(
    [{ title: 'case' }, { title: 'converged' }, { title: 'max util.', align: 'right' }, { title: 'member' }, { title: 'failures', align: 'right' }, { title: 'result' }],
    check.cases.map((c) => [c.id, c.converged ? 'yes' : 'NO', c.converged ? fixed(c.maxUtilisation, 3) : '—', c.maxUtilisationMember, String(c.failures), c.pass ? 'pass' : 'FAIL']),
  ));
  const used = check.members.filter((m) => m.utilisation !== null).sort((a, b) => (b.utilisation ?? 0) - (a.utilisation ?? 0)).slice(0, 10);
  if (used.length) {
    out.push('', 'Highest utilisation (envelope)');
    out.push(textTable(
      [{ title: 'member' }, { title: 'T max kN', align: 'right' }, { title: 'util.', align: 'right' }, { title: 'case' }, { title: 'status' }],
      used.map((m) => [m.id, kN(m.tensionMax), fixed(m.utilisation ?? 0, 3), m.utilisationCase, m.status]),
    ));
  }
  if (env.reactions.length) {
    out.push('', 'Support reactions (envelope; Fz < 0 = uplift: the support holds the structure down)');
    out.push(textTable(
      [{ title: 'support' }, { title: '|R| max kN', align: 'right' }, { title: 'case' }, { title: 'Fz min kN', align: 'right' }, { title: 'case' }, { title: '' }],
      env.reactions.map((r) => [r.node, kN(r.magnitudeMax), r.magnitudeMaxCase, kN(r.min[2]), r.minCase[2], r.min[2] < 0 ? 'uplift' : '']),
    ));
  }
  out.push('');
  if (check.failures.length) {
    out.push('Failures (worst case of each)');
    out.push(textTable(
      [{ title: 'check' }, { title: 'item' }, { title: 'case' }, { title: 'value', align: 'right' }, { title: 'limit', align: 'right' }, { title: 'ratio', align: 'right' }],
      check.failures.map((f) => [f.kind, f.id, f.case, valueText(f.kind, f.value), f.kind === 'notConverged' ? '' : valueText(f.kind, f.limit), ratioText(f.ratio)]),
    ));
    out.push('');
  }
  for (const w of check.warnings) out.push(`note: ${w}`);
  if (project.members.some((m) => m.kind === 'bar')) out.push('note: bars (mast members) are not checked for compression, buckling or connections here');
  const verdict = !check.allConverged
    ? 'CHECK INCOMPLETE: some case did not converge — do not use these results'
    : check.pass ? `CHECK PASSED: ${check.cases.length} case(s), every check within its limit`
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
    report = solveProject(project).report;
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
  const env = envelopeOf(report);
  // Plausibility warnings are part of the report: inputs outside real ranges, sags of a unit slip.
  const plausibility = [...plausibilityWarnings(project), ...resultWarnings(project, report)];
  const guarded = replaceNonFinite({ pass: check.pass, check, envelope: env, plausibility });
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
