/**
 * `stayset schedule FILE --html OUT.html --csv OUT.csv --pdf OUT.pdf [--groups a,b | --all |
 * --cables] [--paper a4|letter] [--units SI|US] [--date YYYY-MM-DD]`: solve every case, run the
 * design checks, the installation data (cut lengths, temperature table, frequencies) and the
 * first natural frequencies, and write the member tension schedule as a standalone printable
 * HTML document, a PDF (headless Chromium) and/or CSV. Each output is written atomically (temp
 * file beside it, synced, renamed), so a partial file is never left behind.
 */
import { resolve } from 'node:path';
import { CheckInputError, installationData, referenceCaseId, runChecks, solveModes } from '../../../solver/index.ts';
import type { CheckReport, InstallationData, ModalOutcome, ScheduleSpec, SolveReport } from '../../../solver/index.ts';
import { buildSchedule, scheduleCsv, scheduleHtml } from '../../common/schedule/index.ts';
import type { PaperSize } from '../../common/schedule/index.ts';
import type { UnitSystem } from '../../common/units/index.ts';
import type { CliCommand } from '../command.ts';
import { EXIT, UsageError } from '../cli-io.ts';
import type { CliIO } from '../cli-io.ts';
import { parseOptions } from '../options.ts';
import { readProjectOrReport } from '../read-project-file.ts';
import { writeFileAtomic } from '../../store/atomic-write.ts';
import { writePdfOutput } from '../print-pdf.ts';
import { SCHEDULE_MODE_COUNT } from '../../common/schedule/schedule-frequencies.ts';
import { solveOnWorkers } from '../solve-on-workers.ts';

const HELP = `Writes the member tension schedule: project header and caution, per member the cut
length, installation tension at the reference temperature, cable frequencies, tension per case
and envelope, utilisation and check results; then support reactions, the first natural
frequencies, the tuning run kept in the project (tuning.lastRun) and the installation
temperature table. The revision block is the project's report.revisions. Every printed page
carries "page k of n".

What is listed: the project's "schedule" field (default: cables only); the options below
override it. Cables get a full row; other listed members (mast bars, beams) one summary row per
group: count, largest tension, smallest axial force and utilisation, with member and case.

Options:
  --html FILE     Write the printable HTML document (print it to PDF from a browser or the app).
  --pdf FILE      Print it to PDF through headless Chromium (STAYSET_CHROMIUM or /usr/bin/chromium).
  --csv FILE      Write the CSV (blocks separated by empty lines; numbers in the chosen units).
  --groups a,b    List the members of these groups (comma-separated group ids).
  --all           List every member (cables in full, the others summarised).
  --cables        List the cables only.
  --paper a4|letter   Page size of the printed document (default a4).
  --units SI|US   kN, m, °C (default, or the project's display.units) or kip, ft, °F.
  --date YYYY-MM-DD   Date of issue printed on the schedule (default today).
  --help          Show this help.
At least one of --html, --pdf and --csv is needed. Existing output files are replaced atomically.

Exit status:
  0  written, every case converged
  1  written, but some case did not converge (its columns are empty and a note says so),
     or the analysis failed (nothing written), or printing the PDF failed
  2  bad input: missing or invalid file, bad option values, unknown group, output path equal to FILE`;

function oneValue(opts: ReturnType<typeof parseOptions>, name: string): string | undefined {
  const v = opts.values.get(name);
  if (!v) return undefined;
  if (v.length > 1) throw new UsageError(`option "--${name}" given more than once`);
  return v[0];
}

function today(): string {
  const d = new Date();
  const p = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${p(d.getMonth() + 1)}-${p(d.getDate())}`;
}

/** --groups / --all / --cables → a listing over the project's, or undefined (use the project's). */
function listingOption(opts: ReturnType<typeof parseOptions>): ScheduleSpec | undefined {
  const groups = (opts.values.get('groups') ?? []).flatMap((g) => g.split(',')).map((g) => g.trim()).filter(Boolean);
  const all = opts.flags.has('all'), cables = opts.flags.has('cables');
  if ([groups.length > 0, all, cables].filter(Boolean).length > 1) throw new UsageError('choose one of --groups, --all and --cables');
  if (opts.values.has('groups') && !groups.length) throw new UsageError('--groups needs group ids, e.g. --groups "guys,mast legs"');
  if (groups.length) return { list: 'groups', groups };
  if (all) return { list: 'all' };
  if (cables) return { list: 'cables' };
  return undefined;
}

async function run(args: string[], io: CliIO): Promise<number> {
  const opts = parseOptions(args, {
    html: { type: 'string', multiple: true }, csv: { type: 'string', multiple: true },
    paper: { type: 'string', multiple: true }, units: { type: 'string', multiple: true }, date: { type: 'string', multiple: true },
    pdf: { type: 'string', multiple: true }, groups: { type: 'string', multiple: true }, all: { type: 'boolean' }, cables: { type: 'boolean' },
  });
  if (opts.positionals.length !== 1) {
    throw new UsageError(opts.positionals.length === 0 ? 'schedule needs a project FILE' : `schedule takes one FILE (got ${opts.positionals.length})`);
  }
  const file = opts.positionals[0];
  const htmlOut = oneValue(opts, 'html');
  const csvOut = oneValue(opts, 'csv');
  const pdfOut = oneValue(opts, 'pdf');
  if (!htmlOut && !csvOut && !pdfOut) throw new UsageError('schedule needs --html FILE, --pdf FILE and/or --csv FILE');
  const listing = listingOption(opts);
  const paper = (oneValue(opts, 'paper') ?? 'a4').toLowerCase();
  if (paper !== 'a4' && paper !== 'letter') throw new UsageError(`--paper must be a4 or letter, got "${paper}"`);
  const unitsRaw = oneValue(opts, 'units');
  const units = unitsRaw?.toUpperCase();
  if (units !== undefined && units !== 'SI' && units !== 'US') throw new UsageError(`--units must be SI or US, got "${unitsRaw}"`);
  const date = oneValue(opts, 'date') ?? today();
  if (!/^\d{4}-\d{2}-\d{2}$/.test(date) || Number.isNaN(Date.parse(date))) throw new UsageError(`--date must be a date as YYYY-MM-DD, got "${date}"`);
  const inputPath = resolve(io.cwd, file);
  const outputs = [htmlOut, csvOut, pdfOut].filter((x): x is string => !!x).map((o) => resolve(io.cwd, o));
  if (outputs.includes(inputPath)) throw new UsageError(`an output path is the project file itself (${file}); choose another name`);
  if (new Set(outputs).size < outputs.length) throw new UsageError('two of --html, --pdf and --csv name the same file');

  const read = readProjectOrReport(file, io);
  if (!read) return EXIT.badInput;
  const project = read.project;
  let report: SolveReport;
  let checks: CheckReport | null = null;
  let installation: InstallationData | null = null;
  const notes: string[] = [];
  try {
    report = (await solveOnWorkers(project)).report;
  } catch (e) {
    io.err(`${file}: the analysis failed: ${(e as Error).message}\n`);
    return EXIT.notConverged;
  }
  try {
    checks = runChecks(project, report);
  } catch (e) {
    if (e instanceof CheckInputError) {
      io.err(`${file}: ${e.message}\n`);
      return EXIT.badInput;
    }
    throw e;
  }
  try {
    installation = installationData(project);
  } catch (e) {
    notes.push(`Installation data left out: ${(e as Error).message}.`);
    io.err(`${file}: installation data left out: ${(e as Error).message}\n`);
  }
  let modes: ModalOutcome | null = null;
  try {
    modes = solveModes(project, referenceCaseId(project), { count: SCHEDULE_MODE_COUNT }).modal;
  } catch (e) {
    notes.push(`Natural frequencies left out: ${(e as Error).message}.`);
  }
  let doc;
  try {
    doc = buildSchedule({ project, report, checks, installation, modes, notes }, {
      issueDate: date, paper: paper as PaperSize, units: units as UnitSystem | undefined, ...(listing ? { listing } : {}),
    });
  } catch (e) {
    io.err(`${file}: ${(e as Error).message}\n`);
    return EXIT.badInput;
  }
  const html = htmlOut || pdfOut ? scheduleHtml(doc) : '';
  try {
    if (htmlOut) await writeFileAtomic(resolve(io.cwd, htmlOut), html);
    if (csvOut) await writeFileAtomic(resolve(io.cwd, csvOut), scheduleCsv(doc));
  } catch (e) {
    io.err(`${file}: writing the schedule failed (${(e as NodeJS.ErrnoException).code ?? (e as Error).message}); existing files are unchanged\n`);
    return EXIT.badInput;
  }
  for (const o of [htmlOut, csvOut]) if (o) io.err(`wrote ${o}\n`);
  if (pdfOut && !(await writePdfOutput(io, file, pdfOut, html))) return EXIT.notConverged;
  return report.cases.every((c) => c.converged) ? EXIT.ok : EXIT.notConverged;
}

export const scheduleCommand: CliCommand = {
  name: 'schedule',
  summary: 'write the member tension schedule (printable HTML and CSV)',
  usage: 'stayset schedule FILE [--html OUT.html] [--pdf OUT.pdf] [--csv OUT.csv] [--groups a,b | --all | --cables] [--paper a4|letter] [--units SI|US] [--date YYYY-MM-DD]',
  help: HELP,
  run,
};
