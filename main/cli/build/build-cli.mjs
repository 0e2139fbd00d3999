/**
 * Builds the command line and the analysis worker into dist/cli/ with esbuild (one file each):
 *   stayset.mjs          the `stayset` bin (main/cli/bin.ts), ESM with a shebang
 *   analysis-worker.mjs  the worker_threads analysis worker (main/analysis/analysis-worker.ts),
 *                        found beside the bin by AnalysisRunner
 * Runs as the package's `prepare` script (so `npm ci` builds them) and needs only esbuild, no
 * TypeScript loader. Usage: node main/cli/build/build-cli.mjs [OUTDIR] [--quiet]
 */
import { build } from 'esbuild';
import { chmodSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', '..');
export const CLI_OUTDIR = path.join(repo, 'dist', 'cli');

// Bundled CommonJS dependencies (ajv) may call require(); give the ESM output a real one.
const requireShim = "import { createRequire as __stayset_createRequire } from 'node:module'; const require = __stayset_createRequire(import.meta.url);";

/** Bundles both entries into outdir; resolves when both files are written. */
export async function buildCli(outdir = CLI_OUTDIR, quiet = false) {
  const common = {
    bundle: true, platform: 'node', target: 'node20', format: 'esm', legalComments: 'none',
    logLevel: quiet ? 'warning' : 'info',
  };
  await Promise.all([
    build({ ...common, entryPoints: [path.join(repo, 'main/cli/bin.ts')], outfile: path.join(outdir, 'stayset.mjs'),
      external: ['playwright-core'], // loaded at run time by `stayset report --pdf` only (main/cli/print-pdf.ts)
      banner: { js: `#!/usr/bin/env node\n${requireShim}` } }),
    build({ ...common, entryPoints: [path.join(repo, 'main/analysis/analysis-worker.ts')], outfile: path.join(outdir, 'analysis-worker.mjs'),
      banner: { js: requireShim } }),
  ]);
  chmodSync(path.join(outdir, 'stayset.mjs'), 0o755);
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const args = process.argv.slice(2);
  const out = args.find((a) => !a.startsWith('--'));
  await buildCli(out ? path.resolve(out) : CLI_OUTDIR, args.includes('--quiet'));
}
