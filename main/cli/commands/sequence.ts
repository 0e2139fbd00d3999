/**
 * `stayset sequence FILE [--sequence ID] [--json] [--html OUT.html] [--units SI|US] [--date YYYY-MM-DD]`:
 * analyse the project's tensioning sequences stage by stage (solver/sequence) and print, per step,
 * the value to set with its band and correction per degree, the stage checks, and what to change
 * when an order fails; optionally write the printable crew sheet.
 */
import { resolve } from 'node:path';
import { runSequence } from '../../../solver/index.ts';
import type { ProjectFile, SequenceResult } from '../../../solver/index.ts';
import { crewSheetHtml, stepLabel } from '../../common/report/crew-sheet.ts';
import { sequenceIssueText, sequenceSuggestionText } from '../../common/report/sequence-text.ts';
import type { UnitSystem } from '../../common/units/index.ts';
import type { CliCommand } from '../command.ts';
import { EXIT, UsageError } from '../cli-io.ts';
import type { CliIO } from '../cli-io.ts';
import { parseOptions } from '../options.ts';
import { readProjectOrReport } from '../read-project-file.ts';
import { replaceNonFinite } from '../format/finite-guard.ts';
import { fixedText, formatValue, significantText } from '../../common/units/index.ts';
import { tiltText } from '../../common/checks/check-text.ts';

const kN = (n: number): string => formatValue(n, 'force', 'SI');
const celsius = (k: number): string => formatValue(k, 'temperature', 'SI');
import { textTable } from '../format/text-table.ts';
import { RESULTS_DISCLAIMER } from '../disclaimer.ts';
import { writeFileAtomic } from '../../store/atomic-write.ts';
import { isoToday, singleOption } from './option-helpers.ts';

/** Exit status when a sequence has a stage that fails its checks. */
export const EXIT_SEQUENCE_FAILS = 3;

const HELP = `Analyses the tensioning sequences of the project ("sequences"): each step tensions a
cable or a group to its design unstressed length, with the cables not yet installed absent.
Prints per step the value the crew sets (a force at the lower end, or a length mark at the
day's temperature), its tolerance band, the correction per degree, the tensions of the other
cables after the step, and the stage checks (no overload against φ · breaking load, no slack
cable, mast within the plumb tolerance). When an order fails it says what was simulated to
work instead (a reordering, a second pass).

Options:
  --sequence ID   Only this sequence (default: every sequence).
  --json          Print {"sequences": [SequenceResult], "disclaimer"}.
  --html FILE     Write the printable crew sheet (one sequence: with --sequence, or the only one).
  --units SI|US   kN, m, °C (default, or the project's display.units) or kip, ft, °F.
  --date YYYY-MM-DD   Date of issue on the crew sheet (default today).

Exit status:
  0  every stage of every sequence passes
  2  bad input (file, options, a sequence naming unknown members, groups or nodes)
  3  some stage fails (printed with the suggestions)`;

function sequenceText(project: ProjectFile, r: SequenceResult): string {
  const out: string[] = [`Sequence "${r.id}" at ${celsius(r.temperature)} °C (reference ${celsius(r.referenceTemperature)} °C)`];
  const rows: string[][] = [];
  for (const st of r.stages) {
    const check = st.issues.length ? 'FAIL' : 'ok';
    const tilt = st.tilt === null ? '' : tiltText(st.tilt);
    if (st.kind === 'release') { rows.push([String(st.index), `release ${st.released.join(', ')}`, '', '', '', '', tilt, check]); continue; }
    if (!st.settings.length) rows.push([String(st.index), st.members.join(', '), '', 'no equilibrium', '', '', '', check]);
    st.settings.forEach((s) => {
      const force = s.setBy === 'force';
      rows.push([
        String(st.index), s.member, force ? 'force kN' : 'mark m',
        force ? kN(s.value) : formatValue(s.value, 'length', 'SI'),
        force ? `${kN(s.band[0])}…${kN(s.band[1])}` : `${formatValue(s.band[0], 'length', 'SI')}…${formatValue(s.band[1], 'length', 'SI')}`,
        force ? `${significantText(s.perKelvin / 1000, 3)} kN/K` : `${significantText(s.perKelvin * 1000, 3)} mm/K`, tilt, check,
      ]);
    });
  }
  out.push(textTable([{ title: 'stage', align: 'right' }, { title: 'cable' }, { title: 'set by' }, { title: 'value', align: 'right' }, { title: 'band', align: 'right' }, { title: 'per K', align: 'right' }, { title: 'tilt', align: 'right' }, { title: 'check' }], rows));
  for (const i of r.issues) out.push(`  ! ${sequenceIssueText(i, 'SI')}`);
  for (const s of r.suggestions) out.push(`  > ${sequenceSuggestionText(s, r, (k) => stepLabel(project, r, k))}`);
  out.push(r.ok ? `  every stage passes; final state = design state (largest difference ${fixedText(r.finalDifference * 100, 6)} %)` : '  SEQUENCE FAILS as given');
  return out.join('\n');
}

async function run(args: string[], io: CliIO): Promise<number> {
  const opts = parseOptions(args, {
    sequence: { type: 'string' }, json: { type: 'boolean' }, html: { type: 'string' }, units: { type: 'string' }, date: { type: 'string' },
  });
  if (opts.positionals.length !== 1) throw new UsageError(opts.positionals.length === 0 ? 'sequence needs a project FILE' : `sequence takes one FILE (got ${opts.positionals.length})`);
  const file = opts.positionals[0];
  const units = singleOption(opts, 'units');
  if (units !== undefined && units !== 'SI' && units !== 'US') throw new UsageError(`--units must be SI or US, got "${units}"`);
  const date = singleOption(opts, 'date') ?? isoToday();
  if (!/^\d{4}-\d{2}-\d{2}$/.test(date)) throw new UsageError(`--date must be YYYY-MM-DD, got "${date}"`);
  const read = readProjectOrReport(file, io);
  if (!read) return EXIT.badInput;
  const project = read.project;
  const wanted = singleOption(opts, 'sequence');
  const ids = wanted ? [wanted] : (project.sequences ?? []).map((s) => s.id);
  if (ids.length === 0) { io.err(`${file}: the project has no tensioning sequences ("sequences")\n`); return EXIT.badInput; }
  const htmlOut = singleOption(opts, 'html');
  if (htmlOut && ids.length !== 1) throw new UsageError(`--html writes one crew sheet: choose the sequence with --sequence (the project has ${ids.length})`);
  const results: SequenceResult[] = [];
  for (const id of ids) {
    try {
      results.push(runSequence(project, id));
    } catch (e) {
      io.err(`${file}: ${(e as Error).message}\n`);
      return EXIT.badInput;
    }
  }
  const guarded = replaceNonFinite({ sequences: results.map((r) => ({ ...r, finalDifference: Number.isFinite(r.finalDifference) ? r.finalDifference : null })) });
  if (opts.flags.has('json')) io.out(`${JSON.stringify({ ...guarded.value, disclaimer: RESULTS_DISCLAIMER }, null, 2)}\n`);
  else io.out(`${results.map((r) => sequenceText(project, r)).join('\n\n')}\n\n${RESULTS_DISCLAIMER}\n`);
  if (htmlOut) {
    try {
      await writeFileAtomic(resolve(io.cwd, htmlOut), crewSheetHtml(project, results[0], { issueDate: date, units: units as UnitSystem | undefined }));
    } catch (e) {
      io.err(`${file}: writing the crew sheet failed (${(e as NodeJS.ErrnoException).code ?? (e as Error).message}); existing files are unchanged\n`);
      return EXIT.badInput;
    }
    io.err(`wrote ${htmlOut}\n`);
  }
  return results.every((r) => r.ok) ? EXIT.ok : EXIT_SEQUENCE_FAILS;
}

export const sequenceCommand: CliCommand = {
  name: 'sequence',
  summary: 'tensioning sequence: value to set per step, stage checks, crew sheet',
  usage: 'stayset sequence FILE [--sequence ID] [--json] [--html OUT.html] [--units SI|US] [--date YYYY-MM-DD]',
  help: HELP,
  run,
};
