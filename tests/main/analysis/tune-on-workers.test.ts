/**
 * Tuning with its case solves shared among threads (main/analysis/tune-on-workers.ts): the run is
 * the serial tuneProject's — pretensions found, iterations, solves, targets, diagnosis, tuned
 * project — bit for bit. The reference is the serial run itself: every solve of an evaluation
 * starts from the solutions at the current point (solver/tuning/tune-project.ts), so the thread
 * that solves it must not matter. A helper that stops costs the run nothing but its share.
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { tuneProject, tuneProjectAsync, type ProjectFile } from '../../../solver/index.ts';
import { createWorkerCaseSolver, tuneOnWorkers, type TuneWorkerStats } from '../../../main/analysis/tune-on-workers.ts';

const demo = (name: string): ProjectFile => JSON.parse(readFileSync(new URL(`../../../assets/${name}`, import.meta.url), 'utf8')) as ProjectFile;

describe('tuning on worker threads', () => {
  it('demo mast on two threads: the serial run, bit for bit, with the helper solving part of it', async () => {
    const p = demo('demo-mast.stayset');
    const serial = tuneProject(p);
    expect(serial.status).toBe('met');
    const pool = createWorkerCaseSolver({ workers: 2, waitForHelpers: true, patienceMs: 60_000 });
    try {
      const parallel = await tuneProjectAsync(p, { caseSolver: pool.factory });
      expect(parallel).toEqual(serial);
      expect(parallel.variables.map((v) => v.final)).toEqual(serial.variables.map((v) => v.final));
    } finally {
      await pool.dispose();
    }
    expect(pool.stats.threads).toBe(2);
    expect(pool.stats.helperTasks).toBeGreaterThan(0);
  });

  it('demo mast through tuneOnWorkers (the CLI path, helper starting beside the run): the serial run', async () => {
    const p = demo('demo-mast.stayset');
    let stats: TuneWorkerStats | null = null;
    const parallel = await tuneOnWorkers(p, { workers: 2, onStats: (s) => { stats = s; } });
    expect(parallel).toEqual(tuneProject(p));
    // Every task is solved once at least: 4 evaluations of 3 cases.
    expect(stats!.ownTasks + stats!.helperTasks).toBeGreaterThanOrEqual(12);
  });

  it('an unmet run (a bound stops it) on three threads: same iterations, values and explanation', async () => {
    const p = demo('demo-mast.stayset');
    // Level 3 may not exceed 18 kN, below what its 10 % share of the breaking load needs.
    p.tuning!.variables[1] = { ...p.tuning!.variables[1], max: 18e3 };
    const serial = tuneProject(p);
    expect(serial.status).toBe('unmet');
    expect(serial.iterations).toBeGreaterThan(1);
    expect(serial.diagnosis.some((d) => d.code === 'atBound')).toBe(true);
    let stats: TuneWorkerStats | null = null;
    const parallel = await tuneOnWorkers(p, { workers: 3, waitForHelpers: true, patienceMs: 60_000, onStats: (s) => { stats = s; } });
    expect(parallel).toEqual(serial);
    expect(stats!.helperTasks).toBeGreaterThan(0);
  });

  it('demo canopy on two threads: the serial run', async () => {
    const p = demo('demo-canopy.stayset');
    expect(await tuneOnWorkers(p, { workers: 2 })).toEqual(tuneProject(p));
  });

  it('a helper that claims a task and stops is not waited for: the calling thread solves that task too', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'stayset-tune-helper-'));
    const script = join(dir, 'claims-then-stops.mjs');
    // Takes one task of the first batch the way a helper does (case-shares.ts) and exits unanswered.
    writeFileSync(script, [
      "import { parentPort, workerData } from 'node:worker_threads';",
      "parentPort.postMessage({ type: 'tune-ready' });",
      'parentPort.on(\'message\', (m) => { const v = new Int32Array(m.claims); Atomics.add(v, workerData.tune.slot, 1); Atomics.add(v, 0, 1); process.exit(0); });',
    ].join('\n'));
    const p = demo('demo-mast.stayset');
    let stats: TuneWorkerStats | null = null;
    const parallel = await tuneOnWorkers(p, { workers: 2, workerUrl: pathToFileURL(script), waitForHelpers: true, patienceMs: 60_000, onStats: (s) => { stats = s; } });
    expect(parallel).toEqual(tuneProject(p));
    expect(stats!.helperTasks).toBe(0);
    expect(stats!.takenOver).toBe(1);
  }, 30_000);
});
