/**
 * Timing of the sparse LDLᵀ on the tangent of a flat pretensioned N × N-cell cable net
 * (see net-tangent.ts), N = 20, 50, 100: symbolic analysis, numeric factorisation (median of
 * several repetitions) and solve, with nnz(L) and the relative residual ‖Kx − b‖/‖b‖.
 * Run: node --import tsx tests/bench/linalg/factor-bench.ts [N ...]
 */
import { pathToFileURL } from 'node:url';
import { SparseLDL, symmetricMultiply } from '../../../solver/linalg/index.ts';
import { netTangent } from './net-tangent.ts';

export interface FactorBenchRow {
  cells: number; n: number; nnzK: number; nnzL: number;
  /** First analysis in this call (cold in a fresh process) and a repeated one. */
  analyseMs: number; analyseRepeatMs: number; /** Median CPU time of the repeats (this process), ms: robust on a shared machine. */ analyseRepeatCpuMs: number; factorMs: number; factorMinMs: number; solveMs: number; relResidual: number;
  kernel: string;
  /** Ordering used ('auto' picks AMD or nested dissection by predicted fill) and nnz(L) of each tried. */
  ordering: string; predicted: Record<string, number | undefined>;
}

const median = (v: number[]): number => { const s = [...v].sort((a, b) => a - b); const m = s.length >> 1; return s.length % 2 ? s[m] : 0.5 * (s[m - 1] + s[m]); };

export function benchNet(
  cells: number, kernel: 'supernodal' | 'simplicial' = 'supernodal', reps = 9, ordering: 'auto' | 'amd' | 'nd' = 'auto',
): FactorBenchRow {
  const { pattern, values, n } = netTangent(cells);
  let t0 = performance.now();
  const ldl = SparseLDL.analyse(pattern, { blockSize: 3, kernel, ordering });
  const analyseMs = performance.now() - t0;
  const repeats: number[] = [], cpuRepeats: number[] = [];
  for (let r = 0; r < 3; r++) {
    t0 = performance.now();
    const c0 = process.cpuUsage();
    SparseLDL.analyse(pattern, { blockSize: 3, kernel, ordering });
    const c = process.cpuUsage(c0);
    repeats.push(performance.now() - t0);
    cpuRepeats.push((c.user + c.system) / 1000);
  }
  const analyseRepeatMs = median(repeats);
  const analyseRepeatCpuMs = median(cpuRepeats);
  const tf: number[] = [], ts: number[] = [];
  const b = Float64Array.from({ length: n }, (_, i) => Math.sin(0.37 * i) + 0.1);
  const x = new Float64Array(n);
  for (let r = 0; r < reps; r++) {
    t0 = performance.now();
    const k = ldl.factor(values);
    tf.push(performance.now() - t0);
    if (k !== -1) throw new Error(`net ${cells}: zero pivot at DOF ${k}`);
    t0 = performance.now();
    ldl.solve(b, x);
    ts.push(performance.now() - t0);
  }
  const y = new Float64Array(n);
  symmetricMultiply(pattern, values, x, y);
  let rn = 0, bn = 0;
  for (let i = 0; i < n; i++) { rn += (y[i] - b[i]) ** 2; bn += b[i] ** 2; }
  return {
    cells, n, nnzK: pattern.rowIdx.length, nnzL: ldl.factorNonzeros, analyseMs, analyseRepeatMs, analyseRepeatCpuMs,
    factorMs: median(tf), factorMinMs: Math.min(...tf), solveMs: median(ts), relResidual: Math.sqrt(rn / bn), kernel,
    ordering: ordering === 'auto' ? `auto → ${ldl.ordering.chosen}` : ordering, predicted: ldl.ordering.predicted,
  };
}

export function formatRow(r: FactorBenchRow): string {
  return `net ${r.cells}×${r.cells} (${r.kernel}, ${r.ordering}): n=${r.n} nnz(K,lower)=${r.nnzK} nnz(L)=${r.nnzL}  ` +
    `analyse ${r.analyseMs.toFixed(1)} ms (repeat median ${r.analyseRepeatMs.toFixed(1)})  factor median ${r.factorMs.toFixed(1)} ms (min ${r.factorMinMs.toFixed(1)})  ` +
    `solve ${r.solveMs.toFixed(2)} ms  residual ${r.relResidual.toExponential(2)}`;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  const args = process.argv.slice(2);
  const kernel = args.includes('--simplicial') ? 'simplicial' : 'supernodal';
  const sizes = args.filter((a) => /^\d+$/.test(a)).map(Number);
  for (const cells of sizes.length ? sizes : [20, 50, 100]) console.log(formatRow(benchNet(cells, kernel)));
}
