/**
 * The whole `stayset solve --json` process on a large net against the solve inside it: builds the
 * CLI bundle, saves the N × N square net (square-net.ts) as a project file the way the program
 * saves one (serializeProject), runs the bundled CLI under /usr/bin/time a few times and prints,
 * per run, the process's wall and CPU time (user + system) beside the `stats` the command reports
 * (input, analysis, Newton, output, and `seconds`, all of the solve). The ratio process wall /
 * stats.seconds is what the input checks, the output and the process start and exit add. As
 * wall times mean little on a loaded machine, each round also times the same solve alone in a
 * fresh process (solve-cpu-one.ts, CPU time of one cold solveProject call) and prints the
 * process's CPU time over it.
 * With --baseline BUNDLE (ROOT/dist/cli/stayset.mjs built in a checkout ROOT of another revision)
 * the two alternate, run by run; copy solve-cpu-one.ts into ROOT/tests/bench to time its solve alone.
 * On a loaded machine compare ratios within one run, not absolute times.
 * Run: node --import tsx tests/bench/cli-solve-bench.ts [cells=200] [runs=3] [--baseline BUNDLE]
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, openSync, closeSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { serializeProject } from '../../main/common/project/index.ts';
import { squareNetProject } from './square-net.ts';

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

export interface CliSolveRun {
  /** 'current' or 'baseline'. */
  build: string;
  wallSeconds: number;
  cpuSeconds: number;
  peakMiB: number;
  outputMiB: number;
  stats: { inputSeconds: number; analysisSeconds: number; newtonSeconds: number; outputSeconds: number; seconds: number };
  /** CPU time of the same solve alone in a fresh process (this round), s. */
  solveCpuSeconds: number;
}

/** The solve alone in the tree `root` (NaN when that tree has no solve-cpu-one.ts). */
function solveAloneCpu(root: string, file: string): number {
  const script = path.join(root, 'tests/bench/solve-cpu-one.ts');
  if (!existsSync(script)) return NaN;
  const out = execFileSync(process.execPath, ['--import', 'tsx', script, file], { encoding: 'utf8', cwd: root });
  return (JSON.parse(out.trim().split('\n').pop() as string) as { cpuSeconds: number }).cpuSeconds;
}

export function runCliSolveBenchmark(cells = 200, runs = 3, baseline?: string): CliSolveRun[] | string {
  if (!existsSync('/usr/bin/time')) return '/usr/bin/time is not installed';
  execFileSync(process.execPath, [path.join(repoRoot, 'main/cli/build/build-cli.mjs'), '--quiet'], { stdio: 'inherit' });
  const dir = mkdtempSync(path.join(os.tmpdir(), 'stayset-cli-bench-'));
  try {
    const file = path.join(dir, `net${cells}.stayset`);
    writeFileSync(file, serializeProject(squareNetProject(cells)));
    const out = path.join(dir, 'out.json');
    const rows: CliSolveRun[] = [];
    const builds: [string, string][] = [['current', path.join(repoRoot, 'dist/cli/stayset.mjs')], ...(baseline ? [['baseline', baseline] as [string, string]] : [])];
    for (let r = 0; r < runs; r++) {
      for (const [build, bundle] of builds) {
        // The bundle is ROOT/dist/cli/stayset.mjs; its tree's own solve is timed alone.
        const solveCpuSeconds = solveAloneCpu(path.resolve(path.dirname(bundle), '..', '..'), file);
      const fd = openSync(out, 'w');
      const res = spawnSync('/usr/bin/time', ['-f', 'TIME %e %U %S %M', process.execPath, bundle, 'solve', file, '--json'], {
        stdio: ['ignore', fd, 'pipe'], encoding: 'utf8',
      });
      closeSync(fd);
      const line = (res.stderr ?? '').split('\n').find((l) => l.startsWith('TIME '));
      if (res.status !== 0 || !line) throw new Error(`stayset solve failed (exit ${res.status}): ${res.stderr}`);
      const [wall, user, sys, rssKiB] = line.slice(5).split(' ').map(Number);
      const json = JSON.parse(readFileSync(out, 'utf8')) as { stats: CliSolveRun['stats'] };
      rows.push({ build, wallSeconds: wall, cpuSeconds: user + sys, peakMiB: rssKiB / 1024, outputMiB: statSync(out).size / 2 ** 20, stats: json.stats, solveCpuSeconds });
      }
    }
    return rows;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

export function printCliSolveBenchmark(cells: number, rows: CliSolveRun[] | string): void {
  if (typeof rows === 'string') { console.log(`CLI solve benchmark skipped: ${rows}`); return; }
  console.log(`\nstayset solve --json on the ${cells}×${cells} net (bundled CLI, one process per run)`);
  console.log('  build     run  process wall  CPU (user+sys)  peak RSS  output | input  analysis  Newton  output  seconds | wall / seconds | solve alone CPU, process CPU / it');
  rows.forEach((r, i) => {
    const s = r.stats;
    console.log(`  ${r.build.padEnd(8)} ${String(i + 1).padStart(3)}  ${r.wallSeconds.toFixed(2).padStart(10)} s  ${r.cpuSeconds.toFixed(2).padStart(12)} s  `
      + `${r.peakMiB.toFixed(0).padStart(5)} MiB  ${r.outputMiB.toFixed(1).padStart(4)} MiB | ${s.inputSeconds.toFixed(2).padStart(5)}  ${s.analysisSeconds.toFixed(2).padStart(8)}  `
      + `${s.newtonSeconds.toFixed(2).padStart(6)}  ${s.outputSeconds.toFixed(2).padStart(6)}  ${s.seconds.toFixed(2).padStart(7)} | ${(r.wallSeconds / s.seconds).toFixed(2).padStart(14)} | `
      + `${r.solveCpuSeconds.toFixed(2)} s, ${(r.cpuSeconds / r.solveCpuSeconds).toFixed(2)}`);
  });
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  const args = process.argv.slice(2);
  const b = args.indexOf('--baseline');
  const baseline = b >= 0 ? path.resolve(args[b + 1]) : undefined;
  const nums = args.filter((a, i) => /^\d+$/.test(a) && (b < 0 || i !== b + 1)).map(Number);
  const cells = nums[0] ?? 200, runs = nums[1] ?? 3;
  printCliSolveBenchmark(cells, runCliSolveBenchmark(cells, runs, baseline));
}
