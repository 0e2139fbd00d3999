/**
 * The shape of one `stayset` command. Each command lives in its own file under commands/ and
 * is listed in commands/index.ts; the dispatcher (dispatch.ts) handles help, version and
 * unknown names for all of them.
 *
 * To add a command (e.g. `check`): create commands/check.ts exporting a CliCommand, parse its
 * arguments with parseOptions (options.ts), read projects with readProjectFile
 * (read-project-file.ts), return an EXIT status, then append it to COMMANDS in commands/index.ts
 * and add a test under tests/main/cli/ that runs the built bin (tests/main/cli/run-stayset.ts).
 */
import type { CliIO } from './cli-io.ts';

export interface CliCommand {
  /** The word typed after `stayset`. */
  name: string;
  /** One line for the command list. */
  summary: string;
  /** Synopsis, e.g. "stayset solve FILE [--json] [--case ID ...]". */
  usage: string;
  /** Full help text (options, output, exit status), without the usage line. */
  help: string;
  /** Runs with the arguments after the command name; returns the exit status. */
  run(args: string[], io: CliIO): Promise<number> | number;
}

export type CommandRegistry = readonly CliCommand[];
