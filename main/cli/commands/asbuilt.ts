/**
 * `stayset asbuilt FILE [--set ID] [--json]`: back-analyse site measurements (project
 * "siteMeasurements"): fit the as-built unstressed lengths, report the as-built state and the
 * design checks on it, the fewest length adjustments that bring every cable within tolerance,
 * and which cables the readings cannot identify.
 */
import { runAsBuilt } from '../../../solver/index.ts';
import type { AsBuiltResult } from '../../../solver/index.ts';
import type { CliCommand } from '../command.ts';
import { EXIT, UsageError } from '../cli-io.ts';
import type { CliIO } from '../cli-io.ts';
import { parseOptions } from '../options.ts';
import { readProjectOrReport } from '../read-project-file.ts';
import { replaceNonFinite } from '../format/finite-guard.ts';
import { fixedText, formatValue } from '../../common/units/index.ts';
import { siteErrorText } from '../../common/site/site-input-text.ts';

const force = (n: number): string => formatValue(n, 'force', 'SI');
const mm = (m: number): string => formatValue(m, 'displacement', 'SI');
const celsius = (k: number): string => formatValue(k, 'temperature', 'SI');
import { textTable } from '../format/text-table.ts';
import { RESULTS_DISCLAIMER } from '../disclaimer.ts';
import { asBuiltIssueText } from '../../common/report/asbuilt-text.ts';
import { singleOption } from './option-helpers.ts';

/** Exit status when some cable is out of tolerance, a reading does not fit, or a check fails on the as-built state. */
export const EXIT_ASBUILT_ACTION = 3;

const HELP = `Back-analyses a set of site measurements ("siteMeasurements"): tension readings by
dynamometer, frequency or sag (each with its accuracy and air temperature) and optional surveyed
node positions. Fits the as-built unstressed lengths by weighted least squares through the
nonlinear solver, prints the as-built tensions at the reference temperature against the design,
the design checks re-run on the as-built state, the fewest length adjustments that bring every
cable within tolerance, and the cables the readings do not identify (measure those first).

Options:
  --set ID   Only this measurement set (default: every set).
  --json     Print {"sets": [AsBuiltResult without the as-built project], "disclaimer"}.

Exit status:
  0  every cable within tolerance, every reading fits, the checks pass on the as-built state
  2  bad input (file, options, readings naming unknown members or nodes)
  3  action needed: adjustments listed, a reading does not fit, or a check fails`;

export function asBuiltText(r: AsBuiltResult): string {
  const out: string[] = [`Measurement set "${r.id}" — tolerance ±${fixedText(r.tolerance * 100, 1)} % of the design tension at ${celsius(r.referenceTemperature)} °C; length prior ±${fixedText(r.lengthUncertainty * 1000, 0)} mm`];
  out.push(textTable(
    [{ title: 'cable' }, { title: 'ΔL mm', align: 'right' }, { title: '± mm', align: 'right' }, { title: 'identified' }, { title: 'design kN', align: 'right' }, { title: 'as built kN', align: 'right' }, { title: 'within tol.' }],
    r.cables.map((c) => [c.member, mm(c.lengthDifference), mm(c.lengthSigma), c.identified ? 'yes' : 'NO', force(c.designTension), force(c.asBuiltTension), c.withinTolerance ? 'yes' : 'NO']),
  ));
  out.push('', 'Readings (tension at the lower end)');
  out.push(textTable(
    [{ title: 'cable' }, { title: 'method' }, { title: 'reading', align: 'right' }, { title: '°C', align: 'right' }, { title: 'T kN', align: 'right' }, { title: '± kN', align: 'right' }, { title: 'fit kN', align: 'right' }, { title: 'residual σ', align: 'right' }],
    r.observations.map((o) => [o.member, o.method, o.method === 'dynamometer' ? `${force(o.reading)} kN` : o.method === 'frequency' ? `${formatValue(o.reading, 'frequency', 'SI')} Hz` : `${formatValue(o.reading, 'sag', 'SI')} mm`,
      celsius(o.temperature), force(o.tension), force(o.sigma), force(o.fitted), fixedText(o.normalisedResidual, 2)]),
  ));
  out.push(`  rms normalised residual ${fixedText(r.rmsResidual, 2)} (about 1 when the stated accuracies are right); ${r.iterations} iteration(s)`);
  out.push('', r.adjustments.length ? 'Adjustments (fewest found; lengths at the reference temperature)' : 'No adjustment needed.');
  if (r.adjustments.length) {
    out.push(textTable(
      [{ title: 'cable' }, { title: 'change mm', align: 'right' }, { title: '' }, { title: 'tension after kN', align: 'right' }, { title: 'identified' }],
      r.adjustments.map((a) => [a.member, mm(a.lengthChange), a.lengthChange < 0 ? 'shorten' : 'lengthen', force(a.targetTension), a.identified ? 'yes' : 'NO — measure first']),
    ));
  }
  const unidentified = r.cables.filter((c) => !c.identified).map((c) => c.member);
  if (unidentified.length) out.push(`  not identified by these readings (held near their design lengths): ${unidentified.join(', ')}`);
  out.push('', r.checks ? (r.checks.pass ? 'Design checks on the as-built state: PASS' : `Design checks on the as-built state: FAIL (${r.checks.failures.length} failure(s): ${r.checks.failures.slice(0, 5).map((f) => `${f.code} ${f.item} in "${f.case}"`).join('; ')})`) : 'Design checks on the as-built state could not run.');
  for (const i of r.issues) out.push(`  ! ${asBuiltIssueText(i)}`);
  return out.join('\n');
}

async function run(args: string[], io: CliIO): Promise<number> {
  const opts = parseOptions(args, { set: { type: 'string' }, json: { type: 'boolean' } });
  if (opts.positionals.length !== 1) throw new UsageError(opts.positionals.length === 0 ? 'asbuilt needs a project FILE' : `asbuilt takes one FILE (got ${opts.positionals.length})`);
  const file = opts.positionals[0];
  const read = readProjectOrReport(file, io);
  if (!read) return EXIT.badInput;
  const project = read.project;
  const wanted = singleOption(opts, 'set');
  const ids = wanted ? [wanted] : (project.siteMeasurements ?? []).map((s) => s.id);
  if (ids.length === 0) { io.err(`${file}: the project has no site measurements ("siteMeasurements")\n`); return EXIT.badInput; }
  const results: AsBuiltResult[] = [];
  for (const id of ids) {
    try {
      results.push(runAsBuilt(project, id));
    } catch (e) {
      io.err(`${file}: ${siteErrorText(e, 'SI')}\n`);
      return EXIT.badInput;
    }
  }
  const guarded = replaceNonFinite({ sets: results.map(({ asBuilt, ...rest }) => { void asBuilt; return rest; }) });
  if (opts.flags.has('json')) io.out(`${JSON.stringify({ ...guarded.value, disclaimer: RESULTS_DISCLAIMER }, null, 2)}\n`);
  else io.out(`${results.map(asBuiltText).join('\n\n')}\n\n${RESULTS_DISCLAIMER}\n`);
  if (guarded.paths.length > 0) {
    io.err(`${file}: error: non-finite numbers at ${guarded.paths.slice(0, 10).join(', ')}; these results are invalid\n`);
    return EXIT.notConverged;
  }
  const fine = results.every((r) => r.issues.length === 0 && r.adjustments.length === 0 && r.cables.every((c) => c.withinTolerance) && (r.checks?.pass ?? false));
  return fine ? EXIT.ok : EXIT_ASBUILT_ACTION;
}

export const asBuiltCommand: CliCommand = {
  name: 'asbuilt',
  summary: 'as-built back-analysis of site measurements; adjustments to make',
  usage: 'stayset asbuilt FILE [--set ID] [--json]',
  help: HELP,
  run,
};
