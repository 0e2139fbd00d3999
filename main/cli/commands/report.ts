/**
 * `stayset report FILE [--html OUT.html] [--pdf OUT.pdf] [--units SI|US] [--paper a4|letter]
 * [--date YYYY-MM-DD]`: the calculation report — one solve of every case and combination, the
 * design checks, installation data and every tensioning sequence — as printable HTML and/or a
 * PDF printed through headless Chromium. Outputs are written atomically.
 */
import { resolve } from 'node:path';
import { buildReport } from '../../common/report/build-report.ts';
import { reportHtml } from '../../common/report/report-html.ts';
import { collectReportSource, ReportInputError } from '../../common/report/report-source.ts';
import type { ReportSource } from '../../common/report/report-types.ts';
import type { PaperSize } from '../../common/schedule/index.ts';
import type { UnitSystem } from '../../common/units/index.ts';
import type { CliCommand } from '../command.ts';
import { EXIT, UsageError } from '../cli-io.ts';
import type { CliIO } from '../cli-io.ts';
import { parseOptions } from '../options.ts';
import { readProjectOrReport } from '../read-project-file.ts';
import { writeFileAtomic } from '../../store/atomic-write.ts';
import { writePdfOutput } from '../print-pdf.ts';
import { isoToday, singleOption } from './option-helpers.ts';
import { solveOnWorkers } from '../solve-on-workers.ts';

const HELP = `Writes the calculation report an engineer submits: title and revision block
(project "report"), design basis and check settings, model summary with elevation and plan,
materials and sections, actions and combinations, analysis, the governing result of each check
with its case, member and reaction envelopes, natural frequencies about the reference case,
cable frequencies, the tuning record, installation
data and every tensioning sequence — with page numbers and the caution on every page.

Options:
  --html FILE         Write the standalone printable HTML.
  --pdf FILE          Print it to PDF through headless Chromium (STAYSET_CHROMIUM or /usr/bin/chromium).
  --units SI|US       kN, m, °C (default, or the project's display.units) or kip, ft, °F.
  --paper a4|letter   Page size (default a4).
  --date YYYY-MM-DD   Date of issue (default today).
At least one of --html and --pdf is needed.

Exit status:
  0  written, every case converged
  1  written, but some case did not converge (a note says so), or printing failed
  2  bad input (file, options, check settings or sequences naming unknown entries)`;

async function run(args: string[], io: CliIO): Promise<number> {
  const opts = parseOptions(args, { html: { type: 'string' }, pdf: { type: 'string' }, units: { type: 'string' }, paper: { type: 'string' }, date: { type: 'string' } });
  if (opts.positionals.length !== 1) throw new UsageError(opts.positionals.length === 0 ? 'report needs a project FILE' : `report takes one FILE (got ${opts.positionals.length})`);
  const file = opts.positionals[0];
  const htmlOut = singleOption(opts, 'html'), pdfOut = singleOption(opts, 'pdf');
  if (!htmlOut && !pdfOut) throw new UsageError('report needs --html FILE and/or --pdf FILE');
  const units = singleOption(opts, 'units');
  if (units !== undefined && units !== 'SI' && units !== 'US') throw new UsageError(`--units must be SI or US, got "${units}"`);
  const paper = singleOption(opts, 'paper') ?? 'a4';
  if (paper !== 'a4' && paper !== 'letter') throw new UsageError(`--paper must be a4 or letter, got "${paper}"`);
  const date = singleOption(opts, 'date') ?? isoToday();
  if (!/^\d{4}-\d{2}-\d{2}$/.test(date)) throw new UsageError(`--date must be YYYY-MM-DD, got "${date}"`);
  for (const o of [htmlOut, pdfOut]) if (o && resolve(io.cwd, o) === resolve(io.cwd, file)) throw new UsageError(`output ${o} is the project file itself`);
  const read = readProjectOrReport(file, io);
  if (!read) return EXIT.badInput;
  const project = read.project;
  let source: ReportSource;
  try {
    source = collectReportSource(project, (await solveOnWorkers(project)).report);
  } catch (e) {
    if (e instanceof ReportInputError) { for (const p of e.problems) io.err(`${file}: ${p}\n`); return EXIT.badInput; }
    io.err(`${file}: the analysis failed: ${(e as Error).message}\n`);
    return EXIT.notConverged;
  }
  const report = source.report;
  const html = reportHtml(buildReport(source, { issueDate: date, units: units as UnitSystem | undefined, paper: paper as PaperSize }));
  try {
    if (htmlOut) await writeFileAtomic(resolve(io.cwd, htmlOut), html);
  } catch (e) {
    io.err(`${file}: writing the report failed (${(e as NodeJS.ErrnoException).code ?? (e as Error).message}); existing files are unchanged\n`);
    return EXIT.badInput;
  }
  if (htmlOut) io.err(`wrote ${htmlOut}\n`);
  if (pdfOut && !(await writePdfOutput(io, file, pdfOut, html))) return EXIT.notConverged;
  return report.cases.every((c) => c.converged) ? EXIT.ok : EXIT.notConverged;
}

export const reportCommand: CliCommand = {
  name: 'report',
  summary: 'write the calculation report (printable HTML, PDF through Chromium)',
  usage: 'stayset report FILE [--html OUT.html] [--pdf OUT.pdf] [--units SI|US] [--paper a4|letter] [--date YYYY-MM-DD]',
  help: HELP,
  run,
};
