/**
 * Design benchmark: a generated 150 m mast with 5 guy levels and a 60 × 40 m saddle canopy, each
 * with 72 cases (12 wind directions × with/without ice × 3 temperatures), all solved and checked.
 * Cases are independent, so they are split over worker threads. Reports time per model, per case,
 * 1 vs 2 workers, and the cumulative time against the number of cases.
 * Run alone: `node --import tsx tests/bench/design/design-bench.ts`; also part of `npm run bench`.
 * Timings are wall-clock on a shared machine: compare them within one run only.
 */
import { fileURLToPath } from 'node:url';
import { runChecks, solveProject } from '../../../solver/index.ts';
import type { ProjectFile, SolveReport } from '../../../solver/index.ts';
import { spawnWorker } from '../../../main/analysis/analysis-runner.ts';
import { benchCanopy, benchMast } from './design-models.ts';

interface WorkerOut { report: SolveReport; seconds: number }

function solveInWorker(project: ProjectFile, only: string[]): Promise<WorkerOut> {
  return new Promise((resolve, reject) => {
    const w = spawnWorker(new URL('./solve-worker.ts', import.meta.url), { project, only }, []);
    w.once('message', (m: WorkerOut) => { resolve(m); void w.terminate(); });
    w.once('error', reject);
  });
}

async function solveSplit(project: ProjectFile, workers: number): Promise<{ report: SolveReport; seconds: number; solveSeconds: number }> {
  const ids = project.loadCases.map((c) => c.id);
  const parts = Array.from({ length: workers }, (_, k) => ids.filter((_, i) => i % workers === k));
  const t0 = performance.now();
  const outs = await Promise.all(parts.map((only) => solveInWorker(project, only)));
  const byId = new Map(outs.flatMap((o) => o.report.cases).map((c) => [c.id, c] as const));
  const solveSeconds = Math.max(...outs.map((o) => o.seconds));
  return { report: { cases: ids.map((id) => byId.get(id)!) }, seconds: (performance.now() - t0) / 1000, solveSeconds };
}

export interface DesignBenchRow {
  model: string; dofs: number; cases: number; converged: number; inProcessSeconds: number;
  /** Wall time including worker start-up (tsx loader and module compile in each thread). */
  oneWorkerSeconds: number; twoWorkerSeconds: number;
  /** Solve time inside the slowest worker (start-up excluded). */
  oneWorkerSolveSeconds: number; twoWorkerSolveSeconds: number;
  checkSeconds: number; pass: boolean;
  cumulative: { cases: number; seconds: number }[];
}

export async function benchOne(name: string, project: ProjectFile): Promise<DesignBenchRow> {
  const t0 = performance.now();
  const { report } = solveProject(project);
  const inProcess = (performance.now() - t0) / 1000;
  const one = await solveSplit(project, 1);
  const two = await solveSplit(project, 2);
  const t1 = performance.now();
  const check = runChecks(project, two.report);
  const checkSeconds = (performance.now() - t1) / 1000;
  let acc = 0;
  const cumulative = report.cases.map((c, i) => ({ cases: i + 1, seconds: (acc += c.stats.seconds) })).filter((r) => r.cases % 18 === 0);
  return {
    model: name, dofs: report.cases[0]?.stats.dofs ?? 0, cases: report.cases.length,
    converged: two.report.cases.filter((c) => c.converged).length, inProcessSeconds: inProcess,
    oneWorkerSeconds: one.seconds, twoWorkerSeconds: two.seconds, oneWorkerSolveSeconds: one.solveSeconds, twoWorkerSolveSeconds: two.solveSeconds, checkSeconds, pass: check.pass, cumulative,
  };
}

export function printDesignRows(rows: DesignBenchRow[]): void {
  console.log('\nDesign cases: 12 wind directions × (ice / no ice) × 3 temperatures, solved and checked');
  console.log('(worker columns: wall time incl. start-up / solve time inside the slowest worker)');
  console.log('model      DOFs  cases  conv.  in-proc s   1 worker s    2 workers s  speed-up  s/case  check s  checks');
  for (const r of rows) {
    console.log(`${r.model.padEnd(8)} ${String(r.dofs).padStart(6)} ${String(r.cases).padStart(6)} ${String(r.converged).padStart(6)}`
      + ` ${r.inProcessSeconds.toFixed(2).padStart(10)} ${`${r.oneWorkerSeconds.toFixed(2)}/${r.oneWorkerSolveSeconds.toFixed(2)}`.padStart(12)}`
      + ` ${`${r.twoWorkerSeconds.toFixed(2)}/${r.twoWorkerSolveSeconds.toFixed(2)}`.padStart(14)}`
      + ` ${(r.oneWorkerSolveSeconds / r.twoWorkerSolveSeconds).toFixed(2).padStart(9)} ${(r.inProcessSeconds / r.cases).toFixed(3).padStart(7)}`
      + ` ${r.checkSeconds.toFixed(3).padStart(8)}  ${r.pass ? 'pass' : 'FAIL'}`);
    console.log(`         cumulative solve time (in-process): ${r.cumulative.map((c) => `${c.cases} cases ${c.seconds.toFixed(2)} s`).join(', ')}`);
  }
}

export async function runDesignBenchmark(): Promise<DesignBenchRow[]> {
  const rows = [await benchOne('mast150', benchMast()), await benchOne('canopy', benchCanopy())];
  printDesignRows(rows);
  return rows;
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) await runDesignBenchmark();
