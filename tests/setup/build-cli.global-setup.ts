/**
 * vitest globalSetup: bundles the `stayset` bin and the analysis worker into dist/cli/ (the same
 * build `npm ci` runs as `prepare`), so the CLI tests run the built command from the current
 * sources, as a user would.
 */
import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

export default function setup(): void {
  const script = fileURLToPath(new URL('../../main/cli/build/build-cli.mjs', import.meta.url));
  execFileSync(process.execPath, [script, '--quiet'], { stdio: 'inherit' });
}
