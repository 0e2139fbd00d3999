/**
 * Start-up benchmark: wall time of a process, median of several alternating runs, for
 *   node -e 0                          (the floor: Node itself)
 *   stayset --version / validate demo  (the bundled bin, dist/cli/stayset.mjs)
 *   the same from the sources via tsx  (what every call cost before the bin was bundled)
 * Run alone: node --import tsx tests/bench/startup-bench.ts; also part of `npm run bench`.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const node = process.execPath;

interface Probe { label: string; args: string[] }

function wallMs(args: string[]): number {
  const t0 = performance.now();
  const r = spawnSync(node, args, { cwd: repo, stdio: 'ignore' });
  if (r.status !== 0) throw new Error(`startup bench: node ${args.join(' ')} exited ${r.status}`);
  return performance.now() - t0;
}

const median = (v: number[]): number => [...v].sort((a, b) => a - b)[Math.floor(v.length / 2)];

export function runStartupBenchmark(rounds = 9): { label: string; ms: number }[] {
  execFileSync(node, [path.join(repo, 'main/cli/build/build-cli.mjs'), '--quiet'], { stdio: 'inherit' });
  const bin = path.join(repo, 'dist/cli/stayset.mjs');
  const src = path.join(repo, 'main/cli/bin.ts');
  const demo = 'assets/demo-mast.stayset';
  const probes: Probe[] = [
    { label: 'node -e 0', args: ['-e', '0'] },
    { label: 'stayset --version (bundle)', args: [bin, '--version'] },
    { label: 'stayset --version (sources via tsx)', args: ['--import', 'tsx', src, '--version'] },
    { label: 'stayset validate demo (bundle)', args: [bin, 'validate', demo] },
    { label: 'stayset validate demo (sources via tsx)', args: ['--import', 'tsx', src, 'validate', demo] },
  ];
  const times = probes.map(() => [] as number[]);
  for (let r = 0; r < rounds; r++) probes.forEach((p, i) => times[i].push(wallMs(p.args)));
  const rows = probes.map((p, i) => ({ label: p.label, ms: median(times[i]) }));
  console.log(`\nStart-up (median of ${rounds} alternating runs, wall time of the whole process)`);
  const floor = rows[0].ms;
  for (const r of rows) console.log(`${r.label.padEnd(42)} ${r.ms.toFixed(0).padStart(6)} ms  ${(r.ms / floor).toFixed(2)}× node -e 0`);
  return rows;
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) runStartupBenchmark();
