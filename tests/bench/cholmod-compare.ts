/**
 * Compares the project's sparse LDLᵀ with SuiteSparse CHOLMOD (a general-purpose native library,
 * used as the yardstick) on the tangent of the 100 × 100-cell pretensioned net: exports K and a
 * right-hand side as Matrix Market into a folder under os.tmpdir(), compiles the shared
 * ../shared/bench/cholmod_bench.c, runs it single-threaded in simplicial and supernodal mode, and
 * prints both numeric factor times, their ratio and nnz(L) of both orderings. Ours and CHOLMOD
 * alternate for a few rounds on this shared machine; each side keeps its best median.
 * Skips with a message when gcc, the CHOLMOD headers/library or the benchmark source are missing.
 * Run: node --import tsx tests/bench/cholmod-compare.ts [cells]
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { writeMatrixMarketSymmetric, writeMatrixMarketDenseVector } from '../../solver/linalg/index.ts';
import { netTangent } from './linalg/net-tangent.ts';
import { benchNet, formatRow } from './linalg/factor-bench.ts';

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

export interface CholmodRun { mode: string; factorMs: number; factorMinMs: number; nnzL: number; ordering: string; relres: number; analyzeMs: number; solveMs: number }
export interface CholmodComparison {
  skipped?: string;
  cells: number;
  ours?: ReturnType<typeof benchNet>;
  cholmod: CholmodRun[];
}

function tryCompile(src: string, exe: string): string | undefined {
  try {
    execFileSync('gcc', ['-O2', '-I/usr/include/suitesparse', '-o', exe, src, '-lcholmod', '-lm'], { stdio: 'pipe' });
    return undefined;
  } catch (e) {
    const err = e as { code?: string; stderr?: Buffer };
    if (err.code === 'ENOENT') return 'gcc is not installed';
    return `could not compile the CHOLMOD benchmark (libsuitesparse-dev missing?): ${String(err.stderr ?? e).split('\n')[0]}`;
  }
}

function runCholmod(exe: string, kFile: string, bFile: string, reps: number, mode: string, cells: number): CholmodRun {
  let out: string;
  try {
    out = execFileSync(exe, [kFile, bFile, String(reps), '--order', 'amd', '--mode', mode, '--label', `net${cells}-${mode}`], {
      encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'], env: { ...process.env, OPENBLAS_NUM_THREADS: '1', OMP_NUM_THREADS: '1' },
    });
  } catch (e) {
    const err = e as { status?: number; stderr?: string };
    throw new Error(`CHOLMOD benchmark failed in --mode ${mode} (exit ${err.status ?? '?'}): ${String(err.stderr ?? e).trim()}`);
  }
  const line = out.split('\n').find((l) => l.startsWith('JSON '));
  if (!line) throw new Error(`CHOLMOD benchmark printed no JSON line in --mode ${mode}:\n${out}`);
  const j = JSON.parse(line.slice(5)) as Record<string, number | string | boolean>;
  if (j.spd !== true) throw new Error(`CHOLMOD reports the net tangent as not positive definite (--mode ${mode})`);
  return {
    mode, factorMs: Number(j.factorize_ms), factorMinMs: Number(j.factorize_min_ms), nnzL: Number(j.nnzL),
    ordering: String(j.ordering), relres: Number(j.relres), analyzeMs: Number(j.analyze_ms), solveMs: Number(j.solve_ms),
  };
}

/** CHOLMOD is run with AMD only (--order amd), so the fill comparison is AMD against AMD. */
export function runCholmodComparison(cells = 100, reps = 15, rounds = 3): CholmodComparison {
  const src = path.resolve(repoRoot, '..', 'shared', 'bench', 'cholmod_bench.c');
  if (!existsSync(src)) return { skipped: `CHOLMOD benchmark source not found at ${src}`, cells, cholmod: [] };
  const dir = mkdtempSync(path.join(os.tmpdir(), 'stayset-cholmod-'));
  try {
    return compareIn(dir, src, cells, reps, rounds);
  } finally {
    // The exported matrices are large; keep them only on request (STAYSET_KEEP_BENCH_FILES=1).
    if (process.env.STAYSET_KEEP_BENCH_FILES === '1') console.log(`benchmark files kept in ${dir}`);
    else rmSync(dir, { recursive: true, force: true });
  }
}

function compareIn(dir: string, src: string, cells: number, reps: number, rounds: number): CholmodComparison {
  const exe = path.join(dir, 'cholmod_bench');
  const problem = tryCompile(src, exe);
  if (problem) return { skipped: problem, cells, cholmod: [] };
  const { pattern, values, n } = netTangent(cells);
  const kFile = path.join(dir, `net${cells}.mtx`), bFile = path.join(dir, `net${cells}-b.mtx`);
  writeFileSync(kFile, writeMatrixMarketSymmetric(pattern, values));
  writeFileSync(bFile, writeMatrixMarketDenseVector(Float64Array.from({ length: n }, (_, i) => Math.sin(0.37 * i) + 0.1)));
  // The machine is shared: alternate ours and CHOLMOD for a few rounds and keep each one's best
  // median, so a burst of load does not land on one side only.
  const best = new Map<string, CholmodRun>();
  let ours: ReturnType<typeof benchNet> | undefined;
  for (let round = 0; round < rounds; round++) {
    const mine = benchNet(cells, 'supernodal', reps);
    if (!ours || mine.factorMs < ours.factorMs) ours = mine;
    for (const mode of ['simp', 'super']) {
      const run = runCholmod(exe, kFile, bFile, reps, mode, cells);
      const prev = best.get(mode);
      if (!prev || run.factorMs < prev.factorMs) best.set(mode, run);
    }
  }
  const cholmod = [...best.values()];
  return { cells, ours, cholmod };
}

export function printCholmodComparison(c: CholmodComparison): void {
  if (c.skipped) { console.log(`CHOLMOD comparison skipped: ${c.skipped}`); return; }
  if (!c.ours) return;
  console.log(formatRow(c.ours));
  for (const r of c.cholmod) {
    console.log(`CHOLMOD ${r.mode.padEnd(5)} (${r.ordering}, 1 thread): nnz(L)=${r.nnzL}  analyse ${r.analyzeMs.toFixed(1)} ms  ` +
      `factor ${r.factorMs.toFixed(1)} ms (min ${r.factorMinMs.toFixed(1)})  solve ${r.solveMs.toFixed(2)} ms  residual ${r.relres.toExponential(2)}  ` +
      `→ ours / CHOLMOD factor = ${(c.ours.factorMs / r.factorMs).toFixed(2)} (medians), ${(c.ours.factorMinMs / r.factorMinMs).toFixed(2)} (minima)`);
  }
  const ref = c.cholmod[0];
  if (ref) console.log(`fill: nnz(L) ours ${c.ours.nnzL} vs CHOLMOD AMD ${ref.nnzL} (ratio ${(c.ours.nnzL / ref.nnzL).toFixed(3)})`);
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  const cells = Number(process.argv[2] ?? 100);
  printCholmodComparison(runCholmodComparison(cells));
}
