/**
 * Compares the project's sparse LDLᵀ with SuiteSparse CHOLMOD (a general-purpose native library,
 * used as the yardstick) on the tangent of the 100 × 100-cell pretensioned net: exports K and a
 * right-hand side as Matrix Market into a folder under os.tmpdir(), compiles the shared
 * ../shared/bench/cholmod_bench.c, runs it single-threaded in simplicial and supernodal mode, and
 * prints both numeric factor times, their ratio and nnz(L) of both orderings. Ours and CHOLMOD
 * alternate for a few rounds on this shared machine; each side keeps its best median.
 *
 * Symbolic analysis is compared in CPU time (a loaded machine inflates wall times unevenly), with
 * the same ordering work on both sides. The benchmark is compiled a second time with a small
 * header (CPU_HEADER) that makes its clock the process CPU clock and, when
 * STAYSET_CHOLMOD_AMD_METIS=1, has cholmod_analyze try AMD and METIS and keep the better
 * (Common->nmethods = 2): the work of our 'auto' (AMD and nested dissection, the smaller fill
 * kept). Ours with AMD only is set against CHOLMOD with AMD only. CHOLMOD's default strategy is
 * printed too: it tries METIS only when AMD's ordering needs ≥ 500 flops per entry of L and
 * nnz(L) ≥ 5 nnz(A) (cholmod_analyze.c), so on these nets it is AMD alone.
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

export interface CholmodRun { order: string; mode: string; factorMs: number; factorMinMs: number; nnzL: number; ordering: string; relres: number; analyzeMs: number; solveMs: number; flops: number }
/** CHOLMOD's analyse in CPU time (median of its 3 analyses), ms, per ordering strategy. */
export interface CholmodAnalyse { strategy: 'amd' | 'metis' | 'amd+metis' | 'default'; cpuMs: number; ordering: string; nnzL: number; flops: number }
export interface CholmodComparison {
  skipped?: string;
  cells: number;
  ours?: ReturnType<typeof benchNet>;
  /** Ours with AMD only (the previous default), for the fill and analyse comparison. */
  oursAmd?: ReturnType<typeof benchNet>;
  cholmod: CholmodRun[];
  /** CHOLMOD's symbolic analysis in CPU time (same run). */
  analyse: CholmodAnalyse[];
  /** nnz of K's lower triangle (CHOLMOD's default strategy compares nnz(L) with it). */
  nnzK?: number;
}

/**
 * Forced into the second build of cholmod_bench.c (gcc -include): the process CPU clock instead
 * of the monotonic one, and AMD + METIS on request (see the file comment).
 */
const CPU_HEADER = `#include <time.h>
#include <stdlib.h>
#include <cholmod.h>
#undef CLOCK_MONOTONIC
#define CLOCK_MONOTONIC CLOCK_PROCESS_CPUTIME_ID
static inline void stayset_methods(cholmod_common *c) {
  if (getenv("STAYSET_CHOLMOD_AMD_METIS")) {
    c->nmethods = 2; c->method[0].ordering = CHOLMOD_AMD; c->method[1].ordering = CHOLMOD_METIS; c->postorder = 1;
  }
}
#define cholmod_analyze(A, c) (stayset_methods(c), cholmod_analyze(A, c))
`;

/** CHOLMOD runs: [ordering, mode]; 'default' = CHOLMOD's own strategy (AMD, and METIS too when AMD fills much). */
const CHOLMOD_RUNS: ReadonlyArray<readonly [string, string]> = [['amd', 'simp'], ['amd', 'super'], ['metis', 'super'], ['default', 'super']];
/** CHOLMOD analyse runs timed in CPU time (supernodal, as ours). */
const ANALYSE_STRATEGIES: ReadonlyArray<CholmodAnalyse['strategy']> = ['amd', 'metis', 'amd+metis', 'default'];

function tryCompile(src: string, exe: string, include?: string): string | undefined {
  try {
    execFileSync('gcc', ['-O2', ...(include ? ['-include', include] : []), '-I/usr/include/suitesparse', '-o', exe, src, '-lcholmod', '-lm'], { stdio: 'pipe' });
    return undefined;
  } catch (e) {
    const err = e as { code?: string; stderr?: Buffer };
    if (err.code === 'ENOENT') return 'gcc is not installed';
    return `could not compile the CHOLMOD benchmark (libsuitesparse-dev missing?): ${String(err.stderr ?? e).split('\n')[0]}`;
  }
}

function runCholmod(exe: string, kFile: string, bFile: string, reps: number, order: string, mode: string, cells: number, amdMetis = false): CholmodRun {
  let out: string;
  try {
    const env = { ...process.env, OPENBLAS_NUM_THREADS: '1', OMP_NUM_THREADS: '1', ...(amdMetis ? { STAYSET_CHOLMOD_AMD_METIS: '1' } : {}) };
    out = execFileSync(exe, [kFile, bFile, String(reps), '--order', order, '--mode', mode, '--label', `net${cells}-${mode}`], {
      encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'], env,
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
    order, mode, factorMs: Number(j.factorize_ms), factorMinMs: Number(j.factorize_min_ms), nnzL: Number(j.nnzL),
    ordering: String(j.ordering), relres: Number(j.relres), analyzeMs: Number(j.analyze_ms), solveMs: Number(j.solve_ms), flops: Number(j.flops),
  };
}

/**
 * CHOLMOD with AMD (simplicial and supernodal), with METIS, and with its default strategy; ours
 * with its default ('auto': AMD or nested dissection by predicted fill) and with AMD only.
 */
export function runCholmodComparison(cells = 100, reps = 15, rounds = 3): CholmodComparison {
  // ../shared/bench beside the repository (or beside its worktree folder), or STAYSET_CHOLMOD_BENCH.
  const src = [process.env.STAYSET_CHOLMOD_BENCH, path.resolve(repoRoot, '..', 'shared', 'bench', 'cholmod_bench.c'),
    path.resolve(repoRoot, '..', '..', 'shared', 'bench', 'cholmod_bench.c')].find((f) => f && existsSync(f)) ?? path.resolve(repoRoot, '..', 'shared', 'bench', 'cholmod_bench.c');
  if (!existsSync(src)) return { skipped: `CHOLMOD benchmark source not found at ${src}`, cells, cholmod: [], analyse: [] };
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
  if (problem) return { skipped: problem, cells, cholmod: [], analyse: [] };
  const cpuExe = path.join(dir, 'cholmod_bench_cpu'), header = path.join(dir, 'cpu-clock.h');
  writeFileSync(header, CPU_HEADER);
  const cpuProblem = tryCompile(src, cpuExe, header);
  if (cpuProblem) return { skipped: cpuProblem, cells, cholmod: [], analyse: [] };
  const { pattern, values, n } = netTangent(cells);
  const kFile = path.join(dir, `net${cells}.mtx`), bFile = path.join(dir, `net${cells}-b.mtx`);
  writeFileSync(kFile, writeMatrixMarketSymmetric(pattern, values));
  writeFileSync(bFile, writeMatrixMarketDenseVector(Float64Array.from({ length: n }, (_, i) => Math.sin(0.37 * i) + 0.1)));
  // The machine is shared: alternate ours and CHOLMOD for a few rounds and keep each one's best
  // median, so a burst of load does not land on one side only.
  const best = new Map<string, CholmodRun>();
  const analyse = new Map<CholmodAnalyse['strategy'], CholmodAnalyse>();
  let ours: ReturnType<typeof benchNet> | undefined;
  let oursAmd: ReturnType<typeof benchNet> | undefined;
  for (let round = 0; round < rounds; round++) {
    const mine = benchNet(cells, 'supernodal', reps);
    if (!ours || mine.factorMs < ours.factorMs) ours = mine;
    const amd = benchNet(cells, 'supernodal', Math.min(reps, 3), 'amd');
    if (!oursAmd || amd.analyseRepeatMs < oursAmd.analyseRepeatMs) oursAmd = amd;
    for (const [order, mode] of CHOLMOD_RUNS) {
      const run = runCholmod(exe, kFile, bFile, reps, order, mode, cells);
      const prev = best.get(`${order} ${mode}`);
      if (!prev || run.factorMs < prev.factorMs) best.set(`${order} ${mode}`, run);
    }
    for (const strategy of ANALYSE_STRATEGIES) {
      const run = runCholmod(cpuExe, kFile, bFile, 1, strategy === 'amd+metis' ? 'default' : strategy, 'super', cells, strategy === 'amd+metis');
      const prev = analyse.get(strategy);
      if (!prev || run.analyzeMs < prev.cpuMs) analyse.set(strategy, { strategy, cpuMs: run.analyzeMs, ordering: run.ordering, nnzL: run.nnzL, flops: run.flops });
    }
  }
  const cholmod = [...best.values()];
  return { cells, ours, oursAmd, cholmod, analyse: [...analyse.values()], nnzK: pattern.rowIdx.length };
}

export function printCholmodComparison(c: CholmodComparison): void {
  if (c.skipped) { console.log(`CHOLMOD comparison skipped: ${c.skipped}`); return; }
  if (!c.ours) return;
  console.log(formatRow(c.ours));
  if (c.oursAmd) console.log(formatRow(c.oursAmd));
  for (const r of c.cholmod) {
    console.log(`CHOLMOD --order ${r.order} ${r.mode.padEnd(5)} (${r.ordering}, 1 thread): nnz(L)=${r.nnzL}  analyse ${r.analyzeMs.toFixed(1)} ms  ` +
      `factor ${r.factorMs.toFixed(1)} ms (min ${r.factorMinMs.toFixed(1)})  solve ${r.solveMs.toFixed(2)} ms  residual ${r.relres.toExponential(2)}  ` +
      `→ ours / CHOLMOD factor = ${(c.ours.factorMs / r.factorMs).toFixed(2)} (medians), ${(c.ours.factorMinMs / r.factorMinMs).toFixed(2)} (minima)`);
  }
  const find = (order: string) => c.cholmod.find((r) => r.order === order && r.mode === 'super');
  const amd = find('amd'), metis = find('metis'), def = find('default');
  if (amd) console.log(`fill: nnz(L) ours ${c.ours.nnzL} (${c.ours.ordering}) vs CHOLMOD AMD ${amd.nnzL} (ratio ${(c.ours.nnzL / amd.nnzL).toFixed(3)})`);
  if (metis) console.log(`fill: nnz(L) ours ${c.ours.nnzL} vs CHOLMOD METIS ${metis.nnzL} (ratio ${(c.ours.nnzL / metis.nnzL).toFixed(3)}); ours AMD only ${c.oursAmd?.nnzL ?? '?'}`);
  const a = (strategy: CholmodAnalyse['strategy']) => c.analyse.find((r) => r.strategy === strategy);
  const both = a('amd+metis'), amdOnly = a('amd'), metisOnly = a('metis'), dflt = a('default');
  const ratio = (ours: number, r?: CholmodAnalyse) => (r ? `${(ours / r.cpuMs).toFixed(2)}×` : '?');
  console.log(`symbolic analysis, CPU time (medians, same run): ours auto (AMD and nested dissection, smaller fill kept → ${c.ours.ordering}) `
    + `${c.ours.analyseRepeatCpuMs.toFixed(1)} ms vs CHOLMOD AMD+METIS (both tried, better kept → ${both?.ordering ?? '?'}) ${both?.cpuMs.toFixed(1) ?? '?'} ms: `
    + `${ratio(c.ours.analyseRepeatCpuMs, both)}; ours AMD only ${c.oursAmd?.analyseRepeatCpuMs.toFixed(1) ?? '?'} ms vs CHOLMOD AMD ${amdOnly?.cpuMs.toFixed(1) ?? '?'} ms: `
    + `${c.oursAmd ? ratio(c.oursAmd.analyseRepeatCpuMs, amdOnly) : '?'}; CHOLMOD METIS alone ${metisOnly?.cpuMs.toFixed(1) ?? '?'} ms`);
  if (dflt && amdOnly) {
    const flPerL = amdOnly.flops / amdOnly.nnzL, fill = c.nnzK ? amdOnly.nnzL / c.nnzK : NaN;
    console.log(`CHOLMOD default analyse ${dflt.cpuMs.toFixed(1)} ms CPU chose ${dflt.ordering}: it tries METIS only when AMD needs ≥ 500 flops per entry of L `
      + `and nnz(L) ≥ 5 nnz(A); here ${flPerL.toFixed(0)} flops per entry, nnz(L)/nnz(A) ${fill.toFixed(1)} (nnz(A) as one triangle)`);
  }
  console.log(`symbolic analysis, wall time (repeat median; a loaded machine inflates the longer runs most): ours ${c.ours.analyseRepeatMs.toFixed(1)} ms, `
    + `AMD only ${c.oursAmd?.analyseRepeatMs.toFixed(1) ?? '?'} ms; first in process ${c.ours.analyseMs.toFixed(1)} ms; CHOLMOD (wall) AMD ${amd?.analyzeMs.toFixed(1) ?? '?'} ms, `
    + `METIS ${metis?.analyzeMs.toFixed(1) ?? '?'} ms, default ${def?.analyzeMs.toFixed(1) ?? '?'} ms`);
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  const cells = Number(process.argv[2] ?? 100);
  printCholmodComparison(cells >= 150 ? runCholmodComparison(cells, 3, 1) : runCholmodComparison(cells));
}
