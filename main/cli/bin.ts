/**
 * The `stayset` executable's entry. `npm ci` (the `prepare` script, main/cli/build/build-cli.mjs)
 * bundles this file into dist/cli/stayset.mjs, which package.json names as the bin: the command
 * starts as one plain JavaScript file, with no TypeScript compiled at start.
 */
import { runCli } from './main.ts';

process.exitCode = await runCli(process.argv.slice(2));
