/**
 * Design benchmark: a generated 150 m mast with 5 guy levels and a 60 × 40 m saddle canopy, each
 * with 72 cases (12 wind directions × with/without ice × 3 temperatures), all solved and checked.
 * Per model and round: the serial in-process solve, the same cases on two threads
 * (main/analysis/parallel-solve.ts: this thread and one bundled worker, start-up included) with a
 * check that the results are identical to the serial run, and — with `--baseline REV` — the serial
 * solve of the solver at git revision REV (its solver/ folder exported to a temporary folder and
 * imported in this process). The three run in turn, in a rotating order, for STAYSET_BENCH_ROUNDS
 * rounds (default 3); the table gives medians of wall time, process CPU time (all threads) and of
 * the per-round ratios, so a machine shared with other work compares like with like. Before each
 * timed run the bench pauses briefly (see settle).
 * Run alone: `node --import tsx tests/bench/design/design-bench.ts [--baseline REV]`; also part
 * of `npm run bench` (baseline from STAYSET_BENCH_BASELINE).
 */
import { execSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { runChecks, solveProject } from '../../../solver/index.ts';
import type { ProjectFile, SolveReport } from '../../../solver/index.ts';
import { solveProjectInWorkers } from '../../../main/analysis/parallel-solve.ts';
import { workerCountFor } from '../../../main/analysis/case-shares.ts';
import { benchCanopy, benchMast } from './design-models.ts';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', '..');
type Solve = (p: ProjectFile) => { report: SolveReport };

/** The report without its timings, for the identity check. */
function withoutTimes(r: SolveReport): string {
  return JSON.stringify(r.cases.map((c) => ({ ...c, stats: { ...c.stats, seconds: 0, factorSeconds: 0 } })));
}

function timed<T>(f: () => T): [T, number, number] {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  const v = f();
  const c = process.cpuUsage(c0);
  return [v, (performance.now() - t0) / 1000, (c.user + c.system) / 1e6];
}

async function timedAsync<T>(f: () => Promise<T>): Promise<[T, number, number]> {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  const v = await f();
  const c = process.cpuUsage(c0);
  return [v, (performance.now() - t0) / 1000, (c.user + c.system) / 1e6];
}

/**
 * A short pause before a timed run: a helper thread that has just finished winds down (its exit
 * and the collector and compiler threads' tails would otherwise be charged to the next run).
 * Forcing a full collection here instead made the runs noisier: the heap then regrows in the run.
 */
async function settle(): Promise<void> {
  await new Promise((resolve) => setTimeout(resolve, 50));
}

const median = (a: number[]): number => { const s = [...a].sort((x, y) => x - y); return s.length % 2 ? s[s.length >> 1] : 0.5 * (s[s.length / 2 - 1] + s[s.length / 2]); };

export interface DesignBenchRow {
  model: string; dofs: number; cases: number; converged: number; iterations: number; rounds: number;
  /** Medians over the rounds: wall and CPU seconds. */
  serialSeconds: number; serialCpu: number; twoThreadSeconds: number; twoThreadCpu: number; identical: boolean;
  baselineSeconds?: number; baselineCpu?: number; baselineIterations?: number;
  /** Medians of the per-round ratios baseline / now. */
  speedupSerialCpu?: number; speedupSerialWall?: number; speedupTwoThreadWall?: number; twoThreadOverSerialWall: number;
  checkSeconds: number; pass: boolean;
  /** Threads a run of this project starts by default (case-shares.ts workerCountFor; the two-thread column forces 2). */
  defaultThreads: number;
}

export async function benchOne(name: string, project: ProjectFile, baseline?: Solve, rounds = Number(process.env.STAYSET_BENCH_ROUNDS ?? 3)): Promise<DesignBenchRow> {
  const serial: [number, number][] = [], two: [number, number][] = [], base: [number, number][] = [];
  let r!: SolveReport, identical = true, baselineIterations: number | undefined;
  let lastTwo!: SolveReport;
  for (let round = 0; round < rounds; round++) {
    const runs: (() => Promise<void>)[] = [
      async () => { const [s, w, c] = timed(() => solveProject(project)); r = s.report; serial.push([w, c]); },
      async () => { const [s, w, c] = await timedAsync(() => solveProjectInWorkers(project, { workers: 2 })); lastTwo = s.report; two.push([w, c]); },
    ];
    if (baseline) runs.push(async () => { const [s, w, c] = timed(() => baseline(project)); baselineIterations = s.report.cases.reduce((a, k) => a + k.stats.iterations, 0); base.push([w, c]); });
    for (let k = 0; k < runs.length; k++) { await settle(); await runs[(k + round) % runs.length](); }
    identical &&= withoutTimes(r) === withoutTimes(lastTwo);
  }
  const [check, checkSeconds] = timed(() => runChecks(project, lastTwo));
  const ratio = (a: [number, number][], b: [number, number][], q: 0 | 1) => median(a.map((x, i) => x[q] / b[i][q]));
  return {
    model: name, dofs: r.cases[0]?.stats.dofs ?? 0, cases: r.cases.length, converged: r.cases.filter((c) => c.converged).length,
    iterations: r.cases.reduce((a, c) => a + c.stats.iterations, 0), rounds,
    serialSeconds: median(serial.map((x) => x[0])), serialCpu: median(serial.map((x) => x[1])),
    twoThreadSeconds: median(two.map((x) => x[0])), twoThreadCpu: median(two.map((x) => x[1])), identical,
    ...(baseline ? {
      baselineSeconds: median(base.map((x) => x[0])), baselineCpu: median(base.map((x) => x[1])), baselineIterations,
      speedupSerialCpu: ratio(base, serial, 1), speedupSerialWall: ratio(base, serial, 0), speedupTwoThreadWall: ratio(base, two, 0),
    } : {}),
    twoThreadOverSerialWall: ratio(serial, two, 0),
    checkSeconds, pass: check.pass, defaultThreads: workerCountFor(project, r.cases.length),
  };
}

export function printDesignRows(rows: DesignBenchRow[], baseline?: string): void {
  console.log(`\nDesign cases: 12 wind directions × (ice / no ice) × 3 temperatures, solved and checked (medians of ${rows[0]?.rounds ?? 0} rounds)`);
  console.log('model      DOFs  cases  conv.  Newton it.  serial s (CPU)   2 threads s (CPU)  2 threads/serial  identical');
  for (const r of rows) {
    console.log(`${r.model.padEnd(8)} ${String(r.dofs).padStart(6)} ${String(r.cases).padStart(6)} ${String(r.converged).padStart(6)} ${String(r.iterations).padStart(11)}`
      + ` ${r.serialSeconds.toFixed(2).padStart(9)} (${r.serialCpu.toFixed(2)}) ${r.twoThreadSeconds.toFixed(2).padStart(10)} (${r.twoThreadCpu.toFixed(2)}) ${r.twoThreadOverSerialWall.toFixed(2).padStart(12)}×`
      + ` ${(r.identical ? 'yes' : 'NO').padStart(10)}   checks ${r.pass ? 'pass' : 'FAIL'} (${r.checkSeconds.toFixed(3)} s); threads by default ${r.defaultThreads}`);
  }
  if (!baseline) return;
  console.log(`against ${baseline} (serial, same rounds): it.  serial s (CPU)   speed-up: serial CPU  serial wall  2 threads wall`);
  for (const r of rows) {
    console.log(`${r.model.padEnd(8)} ${String(r.baselineIterations).padStart(31)} ${r.baselineSeconds!.toFixed(2).padStart(9)} (${r.baselineCpu!.toFixed(2)})`
      + ` ${r.speedupSerialCpu!.toFixed(2).padStart(18)}× ${r.speedupSerialWall!.toFixed(2).padStart(11)}× ${r.speedupTwoThreadWall!.toFixed(2).padStart(14)}×`);
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
