/**
 * `stayset wind FILE [--json]`: the basis and velocity-pressure profile of every wind action of a
 * project (what the speed stands for, the factors on the forces, q(z) = ½ ρ V(z)²), without solving.
 */
import type { CliCommand } from '../command.ts';
import { EXIT, UsageError } from '../cli-io.ts';
import type { CliIO } from '../cli-io.ts';
import { parseOptions } from '../options.ts';
import { readProjectOrReport } from '../read-project-file.ts';
import { jsonOutput } from '../format/json-output.ts';
import { textTable } from '../format/text-table.ts';
import { RESULTS_DISCLAIMER } from '../disclaimer.ts';
import { windReadout } from '../../common/wind-readout.ts';
import { fixedText, formatValue } from '../../common/units/index.ts';

const HELP = `Prints, for every load case with wind: the direction, the speed and what it stands for
(mean or peak, averaging period), the gust and structural factors on the forces, the profile, and
a table of height, speed, velocity pressure q = ½ρV² and the factored pressure the drag uses.

Options:
  --json        Print {"wind": [...], "disclaimer": "..."} (SI: m, m/s, Pa).
  --help        Show this help.

Exit status:
  0  printed
  2  bad input (missing or invalid file)`;

async function run(args: string[], io: CliIO): Promise<number> {
  const opts = parseOptions(args, { json: { type: 'boolean' } });
  if (opts.positionals.length !== 1) throw new UsageError(opts.positionals.length === 0 ? 'wind needs a project FILE' : `wind takes one FILE (got ${opts.positionals.length})`);
  const read = readProjectOrReport(opts.positionals[0], io);
  if (!read) return EXIT.badInput;
  const all = windReadout(read.project);
  if (opts.flags.has('json')) { io.out(jsonOutput({ wind: all, disclaimer: RESULTS_DISCLAIMER })); return EXIT.ok; }
  const parts: string[] = [];
  if (all.length === 0) parts.push('No load case has wind.\n');
  for (const w of all) {
    parts.push(
      `Load case ${JSON.stringify(w.caseId)}: wind toward ${w.direction}°, ${w.speed} m/s at 10 m\n` +
      `  basis: ${w.basis}; force factor ${w.forceFactor}\n  profile: ${w.profile}; air density ${w.airDensity} kg/m³\n`,
    );
    const r = 'right' as const;
    parts.push(textTable(
      [{ title: 'z m', align: r }, { title: 'V m/s', align: r }, { title: 'q Pa', align: r }, { title: 'factored q Pa', align: r }],
      w.rows.map((x) => [fixedText(x.z, 1), formatValue(x.speed, 'speed', 'SI'), formatValue(x.pressure, 'pressure', 'SI'), formatValue(x.factoredPressure, 'pressure', 'SI')]),
    ) + '\n');
  }
  parts.push(`${RESULTS_DISCLAIMER}\n`);
  io.out(parts.join('\n'));
  return EXIT.ok;
}

export const windCommand: CliCommand = {
  name: 'wind',
  summary: 'print the wind basis and velocity-pressure profile of every wind action',
  usage: 'stayset wind FILE [--json]',
  help: HELP,
  run,
};
