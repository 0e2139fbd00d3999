/**
 * Bundles the Electron side into dist/main/electron/ with esbuild:
 *   main.js            ESM, the main process (package.json "main")
 *   preload.cjs        CommonJS, the sandboxed preload (sandboxed preloads cannot import files)
 *   analysis-worker.js ESM, the worker_threads analysis worker (unpacked from asar)
 * `electron` stays external; everything else (solver, project validation, ajv) is bundled.
 * Run: node --import tsx main/electron/build-main.ts
 */
import { build, type BuildOptions } from 'esbuild';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const outdir = path.join(repo, 'dist', 'main', 'electron');

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

await Promise.all([
  build({ ...common, entryPoints: [path.join(repo, 'main/electron/main.ts')], outfile: path.join(outdir, 'main.js'), format: 'esm', banner: { js: requireShim } }),
  build({ ...common, entryPoints: [path.join(repo, 'main/analysis/analysis-worker.ts')], outfile: path.join(outdir, 'analysis-worker.js'), format: 'esm', banner: { js: requireShim } }),
  build({ ...common, entryPoints: [path.join(repo, 'main/electron/preload.ts')], outfile: path.join(outdir, 'preload.cjs'), format: 'cjs', platform: 'browser', target: 'chrome130' }),
]);
