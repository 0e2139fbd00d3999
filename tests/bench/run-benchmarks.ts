/**
 * `npm run bench`: the project's benchmarks (not timed tests). Prints tables; nothing is asserted.
 *  1. Square pretensioned nets 20×20 … 100×100 cells: DOFs, Newton iterations, factorisation
 *     time, total time, peak memory (each size in its own process).
 *  2. Ordering, symbolic analysis (CPU time) and one numeric factorisation of the 100×100 and
 *     200×200 net tangents against CHOLMOD on the same matrix; then the whole `stayset solve
 *     --json` process on the 200×200 net against its stats.seconds (cli-solve-bench.ts).
 *  0. Start-up of the `stayset` bin (bundle and sources) against `node -e 0`.
 *  3. Further suites registered below (design cases, live re-solve, tuning serial against two
 *     threads, modes, responsiveness of the browser edition in Chromium) when present.
 */
import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { NetBenchRow } from './net-bench-one.ts';

const here = dirname(fileURLToPath(import.meta.url));

function netRows(sizes: number[]): NetBenchRow[] {
  return sizes.map((cells) => {
    const out = execFileSync(process.execPath, ['--import', 'tsx', join(here, 'net-bench-one.ts'), String(cells)], { encoding: 'utf8' });
    return JSON.parse(out.trim().split('\n').pop()!) as NetBenchRow;
  });
}

function printNets(rows: NetBenchRow[]): void {
  console.log('\nSquare pretensioned nets (self-weight + uniform nodal load, boundary fixed)');
  console.log('cells      DOFs  Newton  factorisations  factor s  total s  peak MiB  residual   max defl. m');
  for (const r of rows) {
    console.log(
      `${String(r.cells).padStart(3)}×${String(r.cells).padEnd(3)} ${String(r.dofs).padStart(7)} ${String(r.iterations).padStart(6)} ${String(r.factorizations).padStart(15)}`
      + ` ${r.factorSeconds.toFixed(3).padStart(9)} ${r.totalSeconds.toFixed(3).padStart(8)} ${r.peakMiB.toFixed(0).padStart(9)}`
      + `  ${r.residual.toExponential(1).padStart(8)} ${r.maxDeflection.toFixed(3).padStart(10)}${r.converged ? '' : '  NOT CONVERGED'}`,
    );
  }
  if (rows.length >= 2) {
    const a = rows[0], b = rows[rows.length - 1];
    const exponent = Math.log(b.totalSeconds / a.totalSeconds) / Math.log(b.dofs / a.dofs);
    console.log(`total time grows about as DOFs^${exponent.toFixed(2)} between ${a.dofs} and ${b.dofs} DOFs`);
  }
}

async function optionalSuite(file: string, exportName: string): Promise<void> {
  const path = join(here, file);
  if (!existsSync(path)) return;
  const mod = (await import(path)) as Record<string, unknown>;
  const run = mod[exportName];
  if (typeof run === 'function') await run();
}

async function main(): Promise<void> {
  (await import('./startup-bench.ts')).runStartupBenchmark();
  printNets(netRows([20, 40, 60, 80, 100]));
  const cholmod = await import('./cholmod-compare.ts');
  console.log('\nOrdering, symbolic analysis and one numeric factorisation of the 100×100 and 200×200 net tangents against CHOLMOD');
  cholmod.printCholmodComparison(cholmod.runCholmodComparison(100));
  cholmod.printCholmodComparison(cholmod.runCholmodComparison(200, 3, 1));
  const cli = await import('./cli-solve-bench.ts');
  cli.printCliSolveBenchmark(200, cli.runCliSolveBenchmark(200, 3));
  await optionalSuite('design/design-bench.ts', 'runDesignBenchmark');
  await optionalSuite('tuning/live-resolve-bench.ts', 'runLiveResolveBenchmark');
  await optionalSuite('tuning/tune-threads-bench.ts', 'runTuneThreadsBenchmark');
  await optionalSuite('modes/modes-bench.ts', 'runModesBenchmark');
  await optionalSuite('view/responsiveness-bench.ts', 'runResponsivenessBenchmark');
}

await main();
