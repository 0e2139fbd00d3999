/**
 * `stayset tune FILE [--write] [--json]`: adjust group pretensions (tuning.variables) so the
 * tuning targets are met, print per target the value reached and per variable its final value,
 * and with --write save the tuned pretensions into FILE (atomic replace, previous file kept as
 * FILE.bak). The case solves of each step are shared out to one thread per core
 * (main/analysis/tune-on-workers.ts; STAYSET_WORKERS=1 solves in this thread); the result is the
 * serial run's.
 */
import { serializeProject } from '../../common/project/index.ts';
import { tuneOnWorkers } from '../../analysis/tune-on-workers.ts';
import { tuningRunRecord } from '../../common/tuning/tuning-record.ts';
import type { ProjectFile, TuningResult } from '../../../solver/index.ts';
import type { CliCommand } from '../command.ts';
import { EXIT, UsageError } from '../cli-io.ts';
import type { CliIO } from '../cli-io.ts';
import { parseOptions } from '../options.ts';
import { readProjectOrReport } from '../read-project-file.ts';
import { fixedText, formatWithUnit, unitLabels, type UnitSystem } from '../../common/units/index.ts';
import { targetText, targetValueText, tuningDiagnosisText, tuningSummaryText } from '../../common/tuning/tuning-text.ts';
import { textTable } from '../format/text-table.ts';
import { RESULTS_DISCLAIMER } from '../disclaimer.ts';
import { writeTunedFile } from '../tune-write.ts';
import { resolve } from 'node:path';

/** Exit status when every case converged but some tuning target is not met. */
export const EXIT_TARGETS_UNMET = 3;

const HELP = `Tunes the pretension of the groups listed in the project's tuning.variables (one value
per group: a force in N, or a factor on the unstressed length) so that tuning.targets are met:
sag limits, tension share of the breaking load at installation (reference case, normally dead
load), no slack, mast plumb, reaction limits. Each step re-solves the cases the targets name
(Levenberg–Marquardt with finite-difference sensitivities, bounds by projection), sharing the
solves out to one thread per core. Targets that conflict or cannot be met are explained.

Options:
  --write       Save the tuned pretensions and the run (tuning.lastRun: targets,
                values, variables, date) into FILE: written to a temp file
                beside it, synced, then renamed over it; the previous file is kept as FILE.bak.
                Not done when a case did not converge, nor when FILE changed on disk while
                tune ran (the other version is kept; exit 1).
  --json        Print {"status", "targets", "variables", "iterations", "evaluations",
                "diagnosis", "summary", "cancelled", "disclaimer"} instead of tables (SI: N, m).
Tables use the project's display units (display.units: SI → kN, m; US → kip, ft).
  --help        Show this help.

Exit status:
  0  every target met
  1  a case did not converge, or --write could not save (nothing written)
  2  bad input: missing or invalid file, no tuning section, unknown groups, cases or nodes
  3  the cases converged but some target is not met`;

/** Tuning result as text tables; forces in kN (SI) or kip (US), lengths in m or ft. */
export function tuningText(r: TuningResult, project: ProjectFile, units: UnitSystem = 'SI'): string {
  const variableText = (by: 'pretension' | 'unstressedLength', v: number): string =>
    by === 'pretension' ? formatWithUnit(v, 'force', units) : `factor ${fixedText(v, 6)}`;
  const targets = textTable(
    [{ title: 'target' }, { title: 'value', align: 'right' }, { title: 'limit', align: 'right' }, { title: 'governing' }, { title: 'met' }],
    r.targets.map((t) => [targetText(project, t.target, units), targetValueText(t, t.value, units), t.target.kind === 'noSlack' ? `> 0 ${unitLabels(units).force}` : (t.sense === 'equal' ? '= ' : '≤ ') + targetValueText(t, t.limit, units), t.governing, t.met ? 'yes' : 'NO']),
  );
  const vars = textTable(
    [{ title: 'group' }, { title: 'by' }, { title: 'start', align: 'right' }, { title: 'final', align: 'right' }, { title: 'bounds' }],
    r.variables.map((v) => [v.group, v.by, variableText(v.by, v.initial), variableText(v.by, v.final),
      `${variableText(v.by, v.lower)} … ${variableText(v.by, v.upper)}${v.atBound ? ` (at ${v.atBound} bound)` : ''}`]),
  );
  const notes = tuningDiagnosisText(r, project, units);
  const diag = notes.length ? `\nWhy:\n${notes.map((d) => `  - ${d}`).join('\n')}\n` : '';
  return `Tuning targets\n${targets}\nVariables\n${vars}\n${tuningSummaryText(r, project, units)}\n${diag}\n${RESULTS_DISCLAIMER}\n`;
}

async function run(args: string[], io: CliIO): Promise<number> {
  const opts = parseOptions(args, { write: { type: 'boolean' }, json: { type: 'boolean' } });
  if (opts.positionals.length !== 1) {
    throw new UsageError(opts.positionals.length === 0 ? 'tune needs a project FILE' : `tune takes one FILE (got ${opts.positionals.length})`);
  }
  const file = opts.positionals[0];
  const read = readProjectOrReport(file, io);
  if (!read) return EXIT.badInput;
  const project: ProjectFile = read.project;
  const units: UnitSystem = project.display?.units === 'US' ? 'US' : 'SI';
  let result: TuningResult;
  try {
    result = await tuneOnWorkers(project);
  } catch (e) {
    io.err(`${file}: ${(e as Error).message}\n`);
    return EXIT.badInput;
  }
  if (opts.flags.has('json')) {
    const { project: _omit, ...rest } = result;
    io.out(`${JSON.stringify({ ...rest, disclaimer: RESULTS_DISCLAIMER }, null, 2)}\n`);
  } else {
    io.out(tuningText(result, project, units));
  }
  if (result.status === 'notConverged') {
    io.err(`${file}: ${tuningDiagnosisText(result, project, units).join(' ')}\n`);
    return EXIT.notConverged;
  }
  if (opts.flags.has('write')) {
    const tuned: ProjectFile = {
      ...result.project,
      tuning: { ...result.project.tuning!, lastRun: tuningRunRecord(result, project, units, new Date().toISOString()) },
    };
    const failed = await writeTunedFile(resolve(io.cwd, file), file, serializeProject(tuned), read.stamp);
    if (failed !== null) {
      io.err(`${failed}\n`);
      return EXIT.notConverged;
    }
    io.err(`${file}: tuned pretensions written (previous file kept as ${file}.bak)\n`);
  }
  return result.status === 'met' ? EXIT.ok : EXIT_TARGETS_UNMET;
}

export const tuneCommand: CliCommand = {
  name: 'tune',
  summary: 'tune group pretensions to meet sag, tension-share, slack, plumb and reaction targets',
  usage: 'stayset tune FILE [--write] [--json]',
  help: HELP,
  run,
};
