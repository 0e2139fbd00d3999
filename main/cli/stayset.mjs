#!/usr/bin/env node
// The `stayset` command. Runs the TypeScript sources directly (no build step) through tsx.
import { register } from 'tsx/esm/api';

register();
const { runCli } = await import(new URL('./main.ts', import.meta.url).href);
process.exitCode = await runCli(process.argv.slice(2));
