/**
 * `stayset modes FILE --case ID [-n N] [--json]`: solve one load case or combination and print the
 * lowest natural frequencies and modes about that state (tangent stiffness of the pretensioned,
 * loaded structure; lumped mass).
 */
import { DEFAULT_MODE_COUNT, solveModes } from '../../../solver/index.ts';
import type { ModesOfCase } from '../../../solver/index.ts';
import type { CliCommand } from '../command.ts';
import { EXIT, UsageError } from '../cli-io.ts';
import type { CliIO } from '../cli-io.ts';
import { parseOptions } from '../options.ts';
import { readProjectOrReport } from '../read-project-file.ts';
import { checkCaseIds } from '../case-selection.ts';
import { replaceNonFinite } from '../format/finite-guard.ts';
import { jsonOutput } from '../format/json-output.ts';
import { modesText } from '../format/modes-text.ts';
import { refusalText } from '../../common/modes/modal-words.ts';
import { RESULTS_DISCLAIMER } from '../disclaimer.ts';

const HELP = `Solves one load case or combination (geometrically nonlinear, from the pretensioned state)
and prints the lowest natural frequencies about that state: the tangent stiffness of the
pretensioned, loaded structure with a lumped mass (member mass, the case's ice, node masses).
Slack members count with their mass only. Per mode: frequency, period, effective modal mass
share per direction and its cumulative sum.

Options:
  --case ID       The load case or combination (required).
  -n, --count N   Number of modes (default ${DEFAULT_MODE_COUNT}).
  --json          Print {"case": {...}, "modes": {...}, "disclaimer": "..."}: SI numbers (Hz, s, kg).
  --help          Show this help.

Exit status:
  0  modes computed
  1  the case did not converge, or no modes exist about it (mechanism, no mass); reason on stderr
  2  bad input: missing or invalid file, unknown option or case`;

async function run(args: string[], io: CliIO): Promise<number> {
  const opts = parseOptions(args.map((a) => (a === '-n' ? '--count' : a)), {
    json: { type: 'boolean' }, case: { type: 'string' }, count: { type: 'string' },
  });
  if (opts.positionals.length !== 1) {
    throw new UsageError(opts.positionals.length === 0 ? 'modes needs a project FILE' : `modes takes one FILE (got ${opts.positionals.length})`);
  }
  const caseId = opts.values.get('case')?.[0];
  if (caseId === undefined) throw new UsageError('modes needs --case ID');
  const countText = opts.values.get('count')?.[0];
  const count = countText === undefined ? DEFAULT_MODE_COUNT : Number(countText);
  if (!Number.isInteger(count) || count < 1 || count > 500) throw new UsageError(`--count must be a whole number from 1 to 500, got "${countText}"`);
  const file = opts.positionals[0];
  const read = readProjectOrReport(file, io);
  if (!read) return EXIT.badInput;
  checkCaseIds(read.project, [caseId]);

  let result: ModesOfCase;
  try {
    result = solveModes(read.project, caseId, { count });
  } catch (e) {
    io.err(`${file}: the analysis failed: ${(e as Error).message}\n`);
    return EXIT.notConverged;
  }
  if (!result.modal.ok) {
    io.err(`${file}: ${refusalText(result.modal.refusal, result.caseResult)}\n`);
    return EXIT.notConverged;
  }
  const analysis = replaceNonFinite(result.modal.analysis);
  if (opts.flags.has('json')) {
    const c = result.caseResult;
    io.out(jsonOutput({
      case: c && { id: c.id, converged: c.converged, status: c.status, stats: c.stats },
      modes: analysis.value, disclaimer: RESULTS_DISCLAIMER,
    }));
  } else {
    io.out(modesText(analysis.value, RESULTS_DISCLAIMER));
  }
  if (analysis.paths.length > 0) {
    io.err(`${file}: error: the modal analysis produced non-finite numbers at ${analysis.paths.slice(0, 10).join(', ')}; these results are invalid\n`);
    return EXIT.notConverged;
  }
  return EXIT.ok;
}

export const modesCommand: CliCommand = {
  name: 'modes',
  summary: 'natural frequencies and modes about a solved load case or combination',
  usage: 'stayset modes FILE --case ID [-n N] [--json]',
  help: HELP,
  run,
};
