/**
 * `stayset validate FILE [--json]`: check a project file (JSON syntax, format version, schema,
 * ids, references, values) without solving it. For editors, scripts and CI.
 */
import type { CliCommand } from '../command.ts';
import { EXIT, UsageError } from '../cli-io.ts';
import type { CliIO } from '../cli-io.ts';
import { parseOptions } from '../options.ts';
import { readProjectFile } from '../read-project-file.ts';
import { jsonOutput } from '../format/json-output.ts';
import { modelBudgetMessage } from '../model-budget-guard.ts';
import { plausibilityWarnings } from '../../common/project/plausibility/plausibility-warnings.ts';

const HELP = `Checks a project file without solving it: JSON syntax, format and version, the schema,
unique ids, references between entries and values (positive E and area, no zero-length members).

Options:
  --json        Print {"valid": true|false, "errors": [...], "warnings": [...], "counts": {...}}
                on stdout (always, also for an invalid file) instead of a summary line.
Warnings (exit status unchanged) name entries whose values lie outside the ranges of real steel
strand, rod and rope or of site conditions (E typed in MPa, ΔT of thousands of K, ice metres
thick, negative pretension, sags that suggest a unit slip) and models too large to solve.
  --help        Show this help.

Exit status:
  0  the file is valid
  2  the file is missing, unreadable or invalid (messages on stderr, one per line)`;

async function run(args: string[], io: CliIO): Promise<number> {
  const opts = parseOptions(args, { json: { type: 'boolean' } });
  if (opts.positionals.length !== 1) {
    throw new UsageError(opts.positionals.length === 0 ? 'validate needs a project FILE' : `validate takes one FILE (got ${opts.positionals.length})`);
  }
  const file = opts.positionals[0];
  const read = readProjectFile(file, io.cwd);
  const json = opts.flags.has('json');
  if (!read.ok) {
    if (json) io.out(jsonOutput({ valid: false, errors: read.errors }));
    for (const m of read.errors) io.err(`${m}\n`);
    return EXIT.badInput;
  }
  const p = read.project;
  const budget = modelBudgetMessage(file, p);
  const warnings = [...plausibilityWarnings(p).map((w) => `${file}: ${w}`), ...(budget ? [budget] : [])];
  const counts = {
    nodes: p.nodes.length,
    members: p.members.length,
    sections: p.sections.length,
    loadCases: p.loadCases.length,
    combinations: p.combinations?.length ?? 0,
  };
  if (json) {
    io.out(jsonOutput({ valid: true, errors: [], warnings, counts, ...(read.migratedFrom !== undefined ? { migratedFrom: read.migratedFrom } : {}) }));
  } else {
    const migrated = read.migratedFrom !== undefined ? ` (format version ${read.migratedFrom}, migrated on reading)` : '';
    const n = (k: number, one: string, many: string) => `${k} ${k === 1 ? one : many}`;
    io.out(
      `${file}: valid${migrated}: ${n(counts.nodes, 'node', 'nodes')}, ${n(counts.members, 'member', 'members')}, ` +
        `${n(counts.sections, 'section', 'sections')}, ${n(counts.loadCases, 'load case', 'load cases')}, ` +
        `${n(counts.combinations, 'combination', 'combinations')}\n`,
    );
  }
  for (const w of warnings) io.err(`warning: ${w}\n`);
  return EXIT.ok;
}

export const validateCommand: CliCommand = {
  name: 'validate',
  summary: 'check a project file (syntax, schema, references) without solving it',
  usage: 'stayset validate FILE [--json]',
  help: HELP,
  run,
};
