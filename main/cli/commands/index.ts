/** Every `stayset` command, in the order the help lists them. Append new commands here. */
import type { CommandRegistry } from '../command.ts';
import { solveCommand } from './solve.ts';
import { checkCommand } from './check.ts';
import { tuneCommand } from './tune.ts';
import { scheduleCommand } from './schedule.ts';
import { validateCommand } from './validate.ts';
import { modesCommand } from './modes.ts';
import { sequenceCommand } from './sequence.ts';
import { asBuiltCommand } from './asbuilt.ts';
import { reportCommand } from './report.ts';
import { combineCommand } from './combine.ts';
import { windCommand } from './wind.ts';

export const COMMANDS: CommandRegistry = [solveCommand, checkCommand, tuneCommand, scheduleCommand, validateCommand, modesCommand, sequenceCommand, asBuiltCommand, reportCommand, combineCommand, windCommand];
