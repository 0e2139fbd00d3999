/**
 * Bundles the Electron side into dist/main/electron/ with esbuild:
 *   main.js            ESM, the main process (package.json "main")
 *   preload.cjs        CommonJS, the sandboxed preload (sandboxed preloads cannot import files)
 *   analysis-worker.mjs ESM, the worker_threads analysis worker (unpacked from asar)
 * `electron` stays external; everything else (solver, project validation, ajv) is bundled.
 * Run: node --import tsx main/electron/build-main.ts [OUTDIR]
 */
import { build, type BuildOptions } from 'esbuild';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
export const DEFAULT_OUTDIR = path.join(repo, 'dist', 'main', 'electron');

// Bundled CommonJS dependencies may call require(); give ESM output a real one.
const requireShim = "import { createRequire as __stayset_createRequire } from 'node:module'; const require = __stayset_createRequire(import.meta.url);";

const common: BuildOptions = {
  bundle: true,
  platform: 'node',
  target: 'node20',
  external: ['electron'],
  sourcemap: true,
  logLevel: 'info',
  legalComments: 'none',
};

export async function buildMain(outdir: string = DEFAULT_OUTDIR, logLevel: BuildOptions['logLevel'] = 'info'): Promise<void> {
  const o = { ...common, logLevel };
  await Promise.all([
    build({ ...o, entryPoints: [path.join(repo, 'main/electron/main.ts')], outfile: path.join(outdir, 'main.js'), format: 'esm', banner: { js: requireShim } }),
    build({ ...o, entryPoints: [path.join(repo, 'main/analysis/analysis-worker.ts')], outfile: path.join(outdir, 'analysis-worker.mjs'), format: 'esm', banner: { js: requireShim } }),
    build({ ...o, entryPoints: [path.join(repo, 'main/electron/preload.ts')], outfile: path.join(outdir, 'preload.cjs'), format: 'cjs', platform: 'browser', target: 'chrome130' }),
  ]);
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  await buildMain(process.argv[2] ? path.resolve(process.argv[2]) : DEFAULT_OUTDIR);
}
