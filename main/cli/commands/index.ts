/** Every `stayset` command, in the order the help lists them. Append new commands here. */
import type { CommandRegistry } from '../command.ts';
import { solveCommand } from './solve.ts';

export const COMMANDS: CommandRegistry = [solveCommand];
