/**
 * Runs the real `stayset` bin, the bundle dist/cli/stayset.mjs (built by `npm ci` and by the
 * vitest globalSetup), as a child process (as a user or a script would).
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

export const REPO_ROOT = fileURLToPath(new URL('../../../', import.meta.url));
export const BIN = fileURLToPath(new URL('../../../dist/cli/stayset.mjs', import.meta.url));
export const FIXTURES = 'tests/fixtures/projects';

export interface RunResult {
  code: number | null;
  stdout: string;
  stderr: string;
}

export function runStayset(args: readonly string[], cwd = REPO_ROOT): RunResult {
  const r = spawnSync(process.execPath, [BIN, ...args], { cwd, encoding: 'utf8', timeout: 60_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

export function fixture(name: string): string {
  return `${FIXTURES}/${name}`;
}
