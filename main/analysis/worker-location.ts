/**
 * Where the analysis worker script is. Inside a bundle (dist/cli/stayset.mjs, dist/main/electron/)
 * it is `analysis-worker.mjs` beside the bundle. From the TypeScript sources (web host and tests
 * run through tsx) it is the bundled dist/cli/analysis-worker.mjs when that exists (built by
 * `npm ci`, `npm run build:cli`, `npm run web` and the vitest globalSetup), so a Run does not
 * compile the solver in every worker; otherwise analysis-worker.ts, started through tsx.
 */
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

export function analysisWorkerUrl(moduleUrl: string): URL {
  if (!new URL(moduleUrl).pathname.endsWith('.ts')) return new URL('./analysis-worker.mjs', moduleUrl);
  const built = new URL('../../dist/cli/analysis-worker.mjs', moduleUrl);
  return existsSync(fileURLToPath(built)) ? built : new URL('./analysis-worker.ts', moduleUrl);
}
