/**
 * The `stayset` dispatcher: `--help`, `--version`, `help [COMMAND]`, `COMMAND --help`, and
 * running a command from the registry. Usage errors print one line plus a hint on stderr and
 * give exit status 2.
 */
import type { CliCommand, CommandRegistry } from './command.ts';
import { EXIT, UsageError } from './cli-io.ts';
import type { CliIO } from './cli-io.ts';
import { closestName } from '../common/project/validation/closest-name.ts';

export interface DispatchInfo {
  version: string;
}

function generalHelp(registry: CommandRegistry): string {
  const width = Math.max(...registry.map((c) => c.name.length), 4);
  const list = registry.map((c) => `  ${c.name.padEnd(width)}  ${c.summary}`).join('\n');
  return `stayset: pretension design of guyed masts and cable canopies (command line)

Usage:
  stayset COMMAND [ARGS...]
  stayset help COMMAND      help for one command
  stayset --help | --version

Commands:
${list}

Exit status: 0 done, 1 some analysis did not converge, 2 bad input or usage.
Results are for review by a qualified engineer; local codes and licensed practice govern.
`;
}

function commandHelp(c: CliCommand): string {
  return `Usage: ${c.usage}\n\n${c.help}\n`;
}

function usageFailure(io: CliIO, message: string, hint: string): number {
  io.err(`stayset: ${message}\n${hint}\n`);
  return EXIT.badInput;
}

function unknownCommand(io: CliIO, registry: CommandRegistry, name: string): number {
  const guess = closestName(name, registry.map((c) => c.name));
  const mean = guess ? ` (did you mean "${guess}"?)` : '';
  return usageFailure(io, `unknown command "${name}"${mean}`, 'Run "stayset --help" for the list of commands.');
}

export async function dispatch(argv: readonly string[], io: CliIO, registry: CommandRegistry, info: DispatchInfo): Promise<number> {
  const [first, ...rest] = argv;
  if (first === undefined) {
    io.err(generalHelp(registry));
    return EXIT.badInput;
  }
  if (first === '--help' || first === '-h') {
    io.out(generalHelp(registry));
    return EXIT.ok;
  }
  if (first === '--version' || first === '-v') {
    io.out(`stayset ${info.version}\n`);
    return EXIT.ok;
  }
  if (first === 'help') {
    if (rest.length === 0) {
      io.out(generalHelp(registry));
      return EXIT.ok;
    }
    const c = registry.find((x) => x.name === rest[0]);
    if (!c || rest.length > 1) return c ? usageFailure(io, 'help takes one COMMAND', 'Usage: stayset help COMMAND') : unknownCommand(io, registry, rest[0]);
    io.out(commandHelp(c));
    return EXIT.ok;
  }
  if (first.startsWith('-')) return usageFailure(io, `unknown option "${first}"`, 'Run "stayset --help" for usage.');
  const command = registry.find((c) => c.name === first);
  if (!command) return unknownCommand(io, registry, first);
  if (rest.includes('--help') || rest.includes('-h')) {
    io.out(commandHelp(command));
    return EXIT.ok;
  }
  try {
    return await command.run(rest, io);
  } catch (e) {
    if (e instanceof UsageError) return usageFailure(io, `${command.name}: ${e.message}`, `Usage: ${command.usage}`);
    throw e;
  }
}
