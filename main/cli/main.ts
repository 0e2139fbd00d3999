/**
 * Entry of the `stayset` command line (bin.ts calls it; the bin is bundled into dist/cli/stayset.mjs).
 * Wires the real process streams to the dispatcher; unexpected errors exit with status 1 and a
 * message asking for a report, never a bare stack trace unless STAYSET_DEBUG is set.
 */
import { COMMANDS } from './commands/index.ts';
import { dispatch } from './dispatch.ts';
import type { CliIO } from './cli-io.ts';
import { packageVersion } from './version.ts';

export async function runCli(argv: readonly string[]): Promise<number> {
  // `stayset solve big.json | head`: the reader closed the pipe; stop quietly, not with a trace.
  process.stdout.on('error', (e: NodeJS.ErrnoException) => {
    if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw e;
  });
  const io: CliIO = {
    out: (text) => void process.stdout.write(text),
    err: (text) => void process.stderr.write(text),
    cwd: process.cwd(),
  };
  try {
    return await dispatch(argv, io, COMMANDS, { version: packageVersion() });
  } catch (e) {
    io.err(`stayset: internal error: ${(e as Error).message}\n`);
    if (process.env.STAYSET_DEBUG) io.err(`${(e as Error).stack ?? ''}\n`);
    return 1;
  }
}
