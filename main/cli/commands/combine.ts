/**
 * `stayset combine FILE [--write] [--no-accompanying] [--json]`: build the ultimate and
 * serviceability combinations of the project's design basis from the load cases that name their
 * `action` (solver buildCombinations), print them, and with --write store them in FILE in place
 * of earlier generated ones ("basis/…"; user combinations are kept), marking the action cases
 * component-only. The user edits them afterwards like any combination.
 */
import { resolve } from 'node:path';
import { applyBuiltCombinations, buildCombinations, resolveDesignBasis } from '../../../solver/index.ts';
import { serializeProject } from '../../common/project/index.ts';
import { basisLines, PURPOSE_NAMES } from '../../common/checks/check-text.ts';
import type { CliCommand } from '../command.ts';
import { EXIT, UsageError } from '../cli-io.ts';
import type { CliIO } from '../cli-io.ts';
import { parseOptions } from '../options.ts';
import { readProjectOrReport } from '../read-project-file.ts';
import { textTable } from '../format/text-table.ts';
import { writeFileAtomic } from '../../store/atomic-write.ts';

const HELP = `Builds the combinations of the design basis from the load cases marked with "action"
(permanent, wind, ice, iceWithWind, temperature, accidental): each variable action leading with
the others accompanying at ψ0; limit state: ultimate (γ factors, and permanent favourable with
wind) and serviceability (γ = 1); allowable: unfactored service combinations; accidental G + A.

Options:
  --write            Store them in FILE (replacing earlier "basis/…" combinations; previous file
                     kept as FILE.bak) and mark the action cases componentOnly.
  --no-accompanying  Leading actions alone (fewer combinations).
  --json             Print {"combinations", "componentCases", "problems"} instead of a table.
  --help             Show this help.

Exit status:
  0  combinations built (and written with --write)
  2  bad input: missing or invalid file, no case with an action`;

const PROBLEM_TEXT = {
  noPermanentCase: 'no load case has action "permanent": the combinations hold no self-weight',
  noVariableAction: 'no load case has a variable or accidental action: nothing to combine',
  actionCaseHasSelfWeight: 'these action cases include self-weight (set selfWeight: false), so combinations would count it twice',
} as const;

async function run(args: string[], io: CliIO): Promise<number> {
  const opts = parseOptions(args, { write: { type: 'boolean' }, 'no-accompanying': { type: 'boolean' }, json: { type: 'boolean' } });
  if (opts.positionals.length !== 1) throw new UsageError(opts.positionals.length === 0 ? 'combine needs a project FILE' : `combine takes one FILE (got ${opts.positionals.length})`);
  const file = opts.positionals[0];
  const read = readProjectOrReport(file, io);
  if (!read) return EXIT.badInput;
  const project = read.project;
  const basis = resolveDesignBasis(project);
  const built = buildCombinations(project, basis, { withAccompanying: !opts.flags.has('no-accompanying') });
  for (const p of built.problems) io.err(`${file}: ${PROBLEM_TEXT[p.code]}${p.cases.length ? `: ${p.cases.map((c) => `"${c}"`).join(', ')}` : ''}\n`);
  if (built.problems.some((p) => p.code === 'noVariableAction')) return EXIT.badInput;
  if (opts.flags.has('json')) io.out(`${JSON.stringify(built, null, 2)}\n`);
  else {
    io.out(`${basisLines(basis).join('\n')}\n\n`);
    io.out(textTable([{ title: 'combination' }, { title: 'purpose' }, { title: 'factors' }],
      built.combinations.map((c) => [c.id, PURPOSE_NAMES[c.purpose ?? 'ultimate'], c.label ?? ''])));
    io.out(`\n${built.combinations.length} combination(s); component-only cases: ${built.componentCases.join(', ') || 'none'}\n`);
  }
  if (opts.flags.has('write')) {
    try {
      await writeFileAtomic(resolve(io.cwd, file), serializeProject(applyBuiltCombinations(project, built)), { backup: true });
    } catch (e) {
      io.err(`${file}: saving failed (${(e as NodeJS.ErrnoException).code ?? (e as Error).message}); the file is unchanged\n`);
      return EXIT.badInput;
    }
    io.err(`${file}: ${built.combinations.length} combination(s) written (previous file kept as ${file}.bak)\n`);
  }
  return EXIT.ok;
}

export const combineCommand: CliCommand = {
  name: 'combine',
  summary: 'build the combinations of the design basis from the load cases\' actions',
  usage: 'stayset combine FILE [--write] [--no-accompanying] [--json]',
  help: HELP,
  run,
};
