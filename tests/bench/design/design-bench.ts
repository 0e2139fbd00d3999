/**
 * Design benchmark: a generated 150 m mast with 5 guy levels and a 60 × 40 m saddle canopy, each
 * with 72 cases (12 wind directions × with/without ice × 3 temperatures), all solved and checked.
 * Per model: the serial in-process solve, the same cases on two worker threads
 * (main/analysis/parallel-solve.ts, bundled worker, start-up included) with a check that the
 * results are identical to the serial run, and — with `--baseline REV` — the serial solve of
 * the solver at git revision REV (its solver/ folder exported to a temporary folder and imported
 * in this process), measured in the same run, alternating.
 * Run alone: `node --import tsx tests/bench/design/design-bench.ts [--baseline REV]`; also part
 * of `npm run bench` (baseline from STAYSET_BENCH_BASELINE). Wall-clock on a shared machine:
 * compare within one run only.
 */
import { execSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { runChecks, solveProject } from '../../../solver/index.ts';
import type { ProjectFile, SolveReport } from '../../../solver/index.ts';
import { solveProjectInWorkers } from '../../../main/analysis/parallel-solve.ts';
import { benchCanopy, benchMast } from './design-models.ts';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', '..');
type Solve = (p: ProjectFile) => { report: SolveReport };

/** The report without its timings, for the identity check. */
function withoutTimes(r: SolveReport): string {
  return JSON.stringify(r.cases.map((c) => ({ ...c, stats: { ...c.stats, seconds: 0, factorSeconds: 0 } })));
}

function timed<T>(f: () => T): [T, number] {
  const t0 = performance.now();
  const v = f();
  return [v, (performance.now() - t0) / 1000];
}

export interface DesignBenchRow {
  model: string; dofs: number; cases: number; converged: number; iterations: number;
  serialSeconds: number; twoWorkerSeconds: number; identical: boolean;
  baselineSeconds?: number; baselineIterations?: number; checkSeconds: number; pass: boolean;
}

export async function benchOne(name: string, project: ProjectFile, baseline?: Solve): Promise<DesignBenchRow> {
  const [serial, serialSeconds] = timed(() => solveProject(project));
  const t0 = performance.now();
  const two = await solveProjectInWorkers(project, { workers: 2 });
  const twoWorkerSeconds = (performance.now() - t0) / 1000;
  const [base, baselineSeconds] = baseline ? timed(() => baseline(project)) : [undefined, undefined];
  const [check, checkSeconds] = timed(() => runChecks(project, two.report));
  const r = serial.report;
  return {
    model: name, dofs: r.cases[0]?.stats.dofs ?? 0, cases: r.cases.length, converged: r.cases.filter((c) => c.converged).length,
    iterations: r.cases.reduce((a, c) => a + c.stats.iterations, 0),
    serialSeconds, twoWorkerSeconds, identical: withoutTimes(r) === withoutTimes(two.report),
    baselineSeconds, baselineIterations: base?.report.cases.reduce((a, c) => a + c.stats.iterations, 0), checkSeconds, pass: check.pass,
  };
}

export function printDesignRows(rows: DesignBenchRow[], baseline?: string): void {
  console.log('\nDesign cases: 12 wind directions × (ice / no ice) × 3 temperatures, solved and checked');
  console.log(`model      DOFs  cases  conv.  Newton it.  serial s  2 workers s  speed-up  identical${baseline ? `  | baseline ${baseline}: it.   serial s  → now (2 workers)` : ''}`);
  for (const r of rows) {
    const base = r.baselineSeconds !== undefined
      ? `  | ${String(r.baselineIterations).padStart(17)} ${r.baselineSeconds.toFixed(2).padStart(10)}  ${(r.baselineSeconds / r.twoWorkerSeconds).toFixed(2)}× faster (serial alone ${(r.baselineSeconds / r.serialSeconds).toFixed(2)}×)`
      : '';
    console.log(`${r.model.padEnd(8)} ${String(r.dofs).padStart(6)} ${String(r.cases).padStart(6)} ${String(r.converged).padStart(6)} ${String(r.iterations).padStart(11)}`
      + ` ${r.serialSeconds.toFixed(2).padStart(9)} ${r.twoWorkerSeconds.toFixed(2).padStart(12)} ${(r.serialSeconds / r.twoWorkerSeconds).toFixed(2).padStart(9)}`
      + ` ${(r.identical ? 'yes' : 'NO').padStart(10)}${base}   checks ${r.pass ? 'pass' : 'FAIL'} (${r.checkSeconds.toFixed(3)} s)`);
  }
}

/** The solver of git revision rev, exported to a temporary folder and imported. */
async function baselineSolver(rev: string): Promise<{ solve: Solve; dispose: () => void }> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'stayset-baseline-'));
  execSync(`git archive ${rev} solver | tar -x -C ${JSON.stringify(dir)}`, { cwd: repo, stdio: ['ignore', 'ignore', 'inherit'] });
  const mod = (await import(pathToFileURL(path.join(dir, 'solver', 'index.ts')).href)) as { solveProject: Solve };
  return { solve: (p) => mod.solveProject(p), dispose: () => rmSync(dir, { recursive: true, force: true }) };
}

export async function runDesignBenchmark(baseline = process.env.STAYSET_BENCH_BASELINE): Promise<DesignBenchRow[]> {
  execSync(`${JSON.stringify(process.execPath)} main/cli/build/build-cli.mjs --quiet`, { cwd: repo, stdio: 'inherit' });
  const base = baseline ? await baselineSolver(baseline) : undefined;
  try {
    // Warm-up (JIT) of both solvers on a cheap case subset, then the measured runs.
    const warm = benchMast();
    warm.loadCases = warm.loadCases.slice(0, 3);
    solveProject(warm);
    base?.solve(warm);
    const rows = [await benchOne('mast150', benchMast(), base?.solve), await benchOne('canopy', benchCanopy(), base?.solve)];
    printDesignRows(rows, baseline);
    return rows;
  } finally {
    base?.dispose();
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const i = process.argv.indexOf('--baseline');
  await runDesignBenchmark(i > 0 ? process.argv[i + 1] : undefined);
}
