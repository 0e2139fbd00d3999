/**
 * One size of the square-net benchmark, run in its own process so that peak memory is that of
 * this solve alone. Prints one JSON line. Usage: node --import tsx tests/bench/net-bench-one.ts CELLS
 */
import { solveProject } from '../../solver/index.ts';
import { squareNetProject } from './square-net.ts';

export interface NetBenchRow {
  cells: number;
  dofs: number;
  iterations: number;
  factorizations: number;
  loadSteps: number;
  factorSeconds: number;
  totalSeconds: number;
  peakMiB: number;
  converged: boolean;
  residual: number;
  maxDeflection: number;
}

function runOnce(cells: number): NetBenchRow {
  const project = squareNetProject(cells);
  const t0 = performance.now();
  const { report } = solveProject(project);
  const totalSeconds = (performance.now() - t0) / 1000;
  const c = report.cases[0];
  return {
    cells, dofs: c.stats.dofs, iterations: c.stats.iterations, factorizations: c.stats.factorizations ?? 0, loadSteps: c.stats.loadSteps,
    factorSeconds: c.stats.factorSeconds ?? 0, totalSeconds, peakMiB: process.resourceUsage().maxRSS / 1024,
    converged: c.converged, residual: c.stats.residual,
    maxDeflection: Math.max(...c.nodes.map((n) => -n.displacement[2])),
  };
}

const cells = Number(process.argv[2]);
if (Number.isInteger(cells) && cells > 0) {
  // The first solve warms up the JIT; report the faster of two further runs.
  runOnce(Math.min(cells, 20));
  const a = runOnce(cells), b = runOnce(cells);
  const best = a.totalSeconds <= b.totalSeconds ? a : b;
  console.log(JSON.stringify({ ...best, peakMiB: process.resourceUsage().maxRSS / 1024 }));
}
