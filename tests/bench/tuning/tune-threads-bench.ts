/**
 * Tuning benchmark: `stayset tune`'s run serially (tuneProject, one case session in this thread)
 * and on two threads (main/analysis/tune-on-workers.ts: this thread and one bundled analysis
 * worker, its start-up and session build included), on
 *  - the demo mast (assets/demo-mast.stayset: 2 pretension variables, 4 targets over 3 cases),
 *  - the 200 m bench mast of live-resolve-bench.ts (4 guy levels as variables, 4 tension-share
 *    targets on the dead-load case: the finite-difference columns are the parallel work), and
 *  - the 150 m design mast of design-models.ts with a dead-load case added (5 guy levels as
 *    variables, 5 tension-share targets and no slack in the 24 wind cases at ΔT = +30 K, with and
 *    without ice: 25 cases a point, 125 tasks a Jacobian).
 * The two run in turn, alternating which goes first, for STAYSET_BENCH_ROUNDS rounds (default 3);
 * the table gives medians of wall time, process CPU time (all threads), the calling thread's own
 * CPU time (the run's critical path when the helper has a core of its own), and of the per-round
 * speed-up (serial wall / two-thread wall), the share of the tasks the helper solved, and whether
 * the two runs gave the same result (the whole TuningResult, compared as JSON). Prints a table;
 * nothing is asserted.
 * Run alone (after `npm run build:cli`): node --import tsx tests/bench/tuning/tune-threads-bench.ts
 */
import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { tuneProject } from '../../../solver/index.ts';
import type { ProjectFile, TuningResult } from '../../../solver/index.ts';
import { tuneOnWorkers, type TuneWorkerStats } from '../../../main/analysis/tune-on-workers.ts';
import { mastForBench } from './live-resolve-bench.ts';
import { benchMast } from '../design/design-models.ts';

export interface TuneThreadsRow {
  model: string; variables: number; cases: number; iterations: number; solves: number; rounds: number;
  /** Medians over the rounds, s. */
  serialSeconds: number; serialCpu: number; twoThreadSeconds: number; twoThreadCpu: number;
  /** Medians of the calling thread's own CPU time, s (Linux; NaN elsewhere). */
  serialThreadCpu: number; twoThreadThreadCpu: number;
  /** Median share of the tasks whose result came from the helper thread (tune-on-workers.ts stats). */
  helperShare: number;
  /** Median of the per-round ratios serial wall / two-thread wall. */
  speedup: number;
  identical: boolean;
}

const median = (a: number[]): number => { const s = [...a].sort((x, y) => x - y); return s.length % 2 ? s[s.length >> 1] : 0.5 * (s[s.length / 2 - 1] + s[s.length / 2]); };

/**
 * CPU time of this (the calling) thread, s, from Linux's /proc/self/task/PID/stat (utime + stime,
 * fields 14 and 15, in clock ticks of 1/100 s); NaN elsewhere. Node 20 has no per-thread CPU clock.
 */
function callingThreadCpu(): number {
  const file = `/proc/self/task/${process.pid}/stat`;
  if (!existsSync(file)) return NaN;
  const fields = readFileSync(file, 'utf8').split(') ')[1].split(' ');
  return (Number(fields[11]) + Number(fields[12])) / 100;
}

/** [result, wall s, process CPU s (all threads), calling thread's CPU s]. */
async function timed(f: () => TuningResult | Promise<TuningResult>): Promise<[TuningResult, number, number, number]> {
  const c0 = process.cpuUsage();
  const m0 = callingThreadCpu();
  const t0 = performance.now();
  const v = await f();
  const c = process.cpuUsage(c0);
  return [v, (performance.now() - t0) / 1000, (c.user + c.system) / 1e6, callingThreadCpu() - m0];
}

function benchModels(): { name: string; project: ProjectFile }[] {
  const demo = JSON.parse(readFileSync(fileURLToPath(new URL('../../../assets/demo-mast.stayset', import.meta.url)), 'utf8')) as ProjectFile;
  const mast = mastForBench();
  mast.tuning = {
    variables: [1, 2, 3, 4].map((k) => ({ group: `mast/guys level ${k}`, by: 'pretension' as const })),
    targets: [1, 2, 3, 4].map((k) => ({ kind: 'tensionShare' as const, group: `mast/guys level ${k}`, share: 0.08 + 0.01 * k })),
  };
  const design = benchMast();
  design.loadCases.unshift({ id: 'dead', selfWeight: true });
  design.tuning = {
    variables: [1, 2, 3, 4, 5].map((k) => ({ group: `mast/guys level ${k}`, by: 'pretension' as const })),
    targets: [
      ...[1, 2, 3, 4, 5].map((k) => ({ kind: 'tensionShare' as const, group: `mast/guys level ${k}`, share: 0.1 })),
      ...design.loadCases.filter((c) => c.id.endsWith('dT30')).map((c) => ({ kind: 'noSlack' as const, group: 'mast/guys', case: c.id })),
    ],
  };
  return [{ name: 'demo mast', project: demo }, { name: '200 m bench mast', project: mast }, { name: '150 m design mast', project: design }];
}

export async function runTuneThreadsBench(rounds = Number(process.env.STAYSET_BENCH_ROUNDS ?? 3)): Promise<TuneThreadsRow[]> {
  const rows: TuneThreadsRow[] = [];
  for (const { name, project } of benchModels()) {
    const serial: number[][] = [], two: number[][] = [], ratio: number[] = [], share: number[] = [];
    const onStats = (st: TuneWorkerStats): void => { share.push(st.helperTasks / (st.helperTasks + st.ownTasks - st.takenOver)); };
    let identical = true;
    let last: TuningResult | null = null;
    for (let r = 0; r < rounds; r++) {
      const runs = [async () => timed(() => tuneProject(project)), async () => timed(() => tuneOnWorkers(project, { workers: 2, onStats }))];
      const order = r % 2 === 0 ? [0, 1] : [1, 0];
      const out: [TuningResult, number, number, number][] = [];
      for (const k of order) out[k] = await runs[k]();
      const [a, aWall, aCpu, aThread] = out[0];
      const [b, bWall, bCpu, bThread] = out[1];
      serial.push([aWall, aCpu, aThread]);
      two.push([bWall, bCpu, bThread]);
      ratio.push(aWall / bWall);
      identical &&= JSON.stringify(a) === JSON.stringify(b);
      last = a;
    }
    const spec = project.tuning!;
    rows.push({
      model: name, variables: spec.variables.length, cases: new Set(spec.targets.map((t) => ('case' in t ? t.case : 'reference'))).size,
      iterations: last!.iterations, solves: last!.evaluations, rounds,
      serialSeconds: median(serial.map((s) => s[0])), serialCpu: median(serial.map((s) => s[1])),
      twoThreadSeconds: median(two.map((s) => s[0])), twoThreadCpu: median(two.map((s) => s[1])),
      serialThreadCpu: median(serial.map((s) => s[2])), twoThreadThreadCpu: median(two.map((s) => s[2])),
      helperShare: median(share), speedup: median(ratio), identical,
    });
  }
  return rows;
}

export async function runTuneThreadsBenchmark(): Promise<TuneThreadsRow[]> {
  const rows = await runTuneThreadsBench();
  console.log('\nTuning run, serial against two threads (medians of the rounds; CPU = process, all threads; own = the calling thread)');
  console.log('model               vars  cases  iter  solves  serial s  CPU s  own s  2 threads s  CPU s  own s  helper  speed-up  identical');
  for (const r of rows) {
    console.log(`${r.model.padEnd(18)} ${String(r.variables).padStart(5)} ${String(r.cases).padStart(6)} ${String(r.iterations).padStart(5)} ${String(r.solves).padStart(7)}`
      + ` ${r.serialSeconds.toFixed(2).padStart(9)} ${r.serialCpu.toFixed(2).padStart(6)} ${r.serialThreadCpu.toFixed(2).padStart(6)}`
      + ` ${r.twoThreadSeconds.toFixed(2).padStart(12)} ${r.twoThreadCpu.toFixed(2).padStart(6)} ${r.twoThreadThreadCpu.toFixed(2).padStart(6)}`
      + ` ${(100 * r.helperShare).toFixed(0).padStart(5)} % ${r.speedup.toFixed(2).padStart(8)}× ${r.identical ? 'yes' : 'NO'}`);
  }
  return rows;
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) await runTuneThreadsBenchmark();
