/**
 * A tuning run whose case solves are shared between the calling thread and N − 1 worker threads
 * (the tuner's batch strategy, solver/tuning/tuning-case-solver.ts). A batch — the cases the
 * targets name at one point, or at one point per variable for the finite-difference Jacobian —
 * is dealt out task by task through a shared claim counter (case-shares.ts), the calling thread
 * solving too; every thread keeps its own case session (model, workspace, symbolic
 * factorisation) for the whole run, and only the points' values (and, after an accepted step,
 * the new warm starts) travel. A task's numbers do not depend on the thread that solved it and
 * the results go back in task order, so the run — pretensions found, iterations, solves — is the
 * serial tuneProject's, bit for bit (tested).
 *
 * The calling thread does not wait long on a slower helper: when it has no task left to claim
 * and a helper's result is still missing after about one of its own task times (a helper just
 * started runs the solver before the JIT has compiled it), it solves that task itself and takes
 * whichever result comes first — the two are the same numbers. So the calling thread never solves
 * more than the serial run would, waiting at most about one task time per missing result, and a
 * helper that stops is not waited for.
 *
 * Threads: `workers`, else STAYSET_WORKERS, else the available cores, never more than the
 * largest batch (variables × cases); one thread is the serial strategy (no worker started). The
 * helpers start with the second batch (the first Jacobian): the start's few cold solves are the
 * calling thread's, and a project whose start already meets every target starts no worker.
 * Used by `stayset tune`.
 */
import type { ResourceLimits, Worker } from 'node:worker_threads';
import {
  batchTaskCount, createCaseSession, createSerialCaseSolver, solveBatchTask, taskContext, tuneProjectAsync,
  type ProjectFile, type TuneOptions, type TuningBatch, type TuningCaseSolver,
  type TuningCaseSolverFactory, type TuningResult, type TuningSolvedCase, type TuningSolveSetup,
} from '../../solver/index.ts';
import { spawnWorker } from './analysis-runner.ts';
import { analysisWorkerUrl } from './worker-location.ts';
import { caseClaimer, createClaims, workerCountFor } from './case-shares.ts';
import type { AnalysisWorkerData } from './worker-messages.ts';
import { taskIds, type TuneBatchMessage, type TuneHelperMessage } from './tune-messages.ts';

export interface TuneWorkerOptions {
  /** Threads, the calling one included (default: see the file comment). */
  workers?: number;
  /** Worker script; default the analysis worker (worker-location.ts). */
  workerUrl?: URL;
  execArgv?: string[];
  resourceLimits?: ResourceLimits;
  /**
   * Start the helpers with the first batch and begin it only when every helper has built its
   * session (or stopped), so the helpers share from the first batch on (steady-state
   * measurements, tests). Default false: the calling thread starts at once, helpers with the
   * second batch.
   */
  waitForHelpers?: boolean;
  /**
   * How long the calling thread, out of tasks, waits for a helper's missing result before it
   * solves that task itself, ms. Default: about the time of one of its own tasks. Not waited
   * once a helper has stopped.
   */
  patienceMs?: number;
  /** Told at the end of the run who solved how many tasks. */
  onStats?: (stats: TuneWorkerStats) => void;
}

/**
 * Threads planned for a run, tasks solved by the calling thread (taken-over ones included),
 * results taken from helpers, and tasks a helper had claimed that the calling thread solved itself.
 */
export interface TuneWorkerStats { threads: number; ownTasks: number; helperTasks: number; takenOver: number }

/** The batch being solved: results by task, and a wake-up for the calling thread when one arrives. */
interface Current { seq: number; out: (TuningSolvedCase | undefined)[]; wake: (() => void) | null }

/** What the helpers of a run share with the calling thread. */
interface Shared { current: Current | null; stats: TuneWorkerStats; helperStopped: boolean }

interface Helper { worker: Worker; ready: Promise<void> }

function startHelper(setup: TuningSolveSetup, slot: number, options: TuneWorkerOptions, shared: Shared): Helper {
  const data: AnalysisWorkerData = {
    project: setup.project, cancelFlag: new SharedArrayBuffer(4), progressIntervalMs: 1000,
    tune: { variables: [...setup.variables], caseIds: [...setup.caseIds], slot },
  };
  const worker = spawnWorker(options.workerUrl ?? analysisWorkerUrl(import.meta.url), data, options.execArgv ?? [], options.resourceLimits);
  let isReady = (): void => {};
  const ready = new Promise<void>((resolve) => { isReady = resolve; });
  worker.on('message', (m: TuneHelperMessage) => {
    if (m.type !== 'tune-task') { isReady(); return; }
    const c = shared.current;
    if (!c || c.seq !== m.seq || c.out[m.task]) return;
    c.out[m.task] = m.solved;
    shared.stats.helperTasks++;
    c.wake?.();
  });
  // A helper that fails or stops is not needed: its tasks are solved by the calling thread.
  const stopped = (): void => { shared.helperStopped = true; isReady(); shared.current?.wake?.(); };
  worker.on('error', stopped);
  worker.on('exit', stopped);
  return { worker, ready };
}

/** Resolves when `c` is woken (a result arrived) or after `ms`. */
function arrivalOrTimeout(c: Current, ms: number): Promise<void> {
  return new Promise((resolve) => {
    const timer = setTimeout(() => { c.wake = null; resolve(); }, ms);
    c.wake = () => { clearTimeout(timer); c.wake = null; resolve(); };
  });
}

/** A strategy factory on worker threads, and the means to stop its workers after the run. */
export function createWorkerCaseSolver(options: TuneWorkerOptions = {}): { factory: TuningCaseSolverFactory; stats: TuneWorkerStats; dispose(): Promise<void> } {
  const workers: Worker[] = [];
  const stats: TuneWorkerStats = { threads: 1, ownTasks: 0, helperTasks: 0, takenOver: 0 };
  const factory: TuningCaseSolverFactory = (setup) => {
    const largestBatch = setup.variables.length * setup.caseIds.length;
    const threads = Math.max(1, Math.min(options.workers ?? workerCountFor(setup.project, largestBatch), largestBatch));
    if (threads <= 1) return createSerialCaseSolver(setup);
    stats.threads = threads;
    const shared: Shared = { current: null, stats, helperStopped: false };
    const helpers: Helper[] = [];
    const own = createCaseSession(setup.project, setup.variables, setup.caseIds);
    const ctx = taskContext(setup);
    let seq = 0;
    let sentStarts: TuningBatch['starts'] | null = null;
    /** Mean time of one task in this thread, ms: how long a missing helper result is waited for. */
    let taskMs = 50;
    const solveOwn = (batch: TuningBatch, t: number): TuningSolvedCase => {
      stats.ownTasks++;
      const t0 = performance.now();
      const solved = solveBatchTask(own, ctx, batch, t);
      taskMs = 0.5 * taskMs + 0.5 * (performance.now() - t0);
      return solved;
    };
    const solver: TuningCaseSolver = {
      async solveBatch(batch) {
        if (helpers.length === 0 && (seq > 0 || options.waitForHelpers)) {
          for (let k = 0; k < threads - 1; k++) helpers.push(startHelper(setup, k + 2, options, shared));
          workers.push(...helpers.map((h) => h.worker));
          sentStarts = null;
          if (options.waitForHelpers) await Promise.all(helpers.map((h) => h.ready));
        }
        const total = batchTaskCount(batch, setup.caseIds);
        const claims = createClaims(threads);
        const c: Current = { seq: ++seq, out: new Array(total).fill(undefined), wake: null };
        shared.current = c;
        const message: TuneBatchMessage = {
          type: 'tune-batch', seq: c.seq, points: batch.points.map((p) => [...p]), claims,
          ...(batch.starts !== sentStarts ? { starts: [...batch.starts] } : {}),
        };
        if (helpers.length > 0) sentStarts = batch.starts;
        for (const h of helpers) h.worker.postMessage(message);
        const claim = caseClaimer(taskIds(total), claims, 1);
        for (let id = claim(); id !== undefined; id = claim()) c.out[Number(id)] = solveOwn(batch, Number(id));
        // Every task is claimed; the ones still missing are with helpers (or a helper that stopped).
        for (let missing = c.out.indexOf(undefined); missing >= 0; missing = c.out.indexOf(undefined)) {
          if (!shared.helperStopped) await arrivalOrTimeout(c, Math.min(options.patienceMs ?? Math.max(1, taskMs), 2 ** 31 - 1));
          if (!c.out[missing]) {
            stats.takenOver++;
            c.out[missing] = solveOwn(batch, missing);
          }
        }
        shared.current = null;
        return c.out as TuningSolvedCase[];
      },
    };
    return solver;
  };
  return {
    factory,
    stats,
    /** Stops the workers; the run's thread does not wait for them to end (they hold nothing it needs). */
    async dispose() {
      for (const w of workers.splice(0)) {
        w.unref();
        void w.terminate();
      }
    },
  };
}

/** tuneProject with its case solves on worker threads (see the file comment); the same result. */
export async function tuneOnWorkers(project: ProjectFile, options: TuneOptions & TuneWorkerOptions = {}): Promise<TuningResult> {
  const pool = createWorkerCaseSolver(options);
  try {
    const result = await tuneProjectAsync(project, { ...options, caseSolver: pool.factory });
    options.onStats?.({ ...pool.stats });
    return result;
  } finally {
    await pool.dispose();
  }
}
