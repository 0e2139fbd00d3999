/**
 * Runs analyses off the UI / request thread, in a Node worker_threads worker per run.
 *
 * - Progress (case k of n, iteration, load factor) is forwarded as AnalysisProgress.
 * - Cancel sets the shared Atomics flag (the solver stops between iterations and reports
 *   'cancelled'); a worker that has not finished `cancelGraceMs` later is reported cancelled
 *   and terminated (run-limits.ts: budget checked before a worker starts, heap limit, grace).
 * - One run at a time: starting a run cancels the previous one (reported as 'cancelled').
 * - The worker file: see worker-location.ts (the bundled worker wherever one is available).
 */
import { randomBytes } from 'node:crypto';
import { createRequire } from 'node:module';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { Worker, type ResourceLimits } from 'node:worker_threads';
import type { CaseFields, ModelBudget, ProjectFile } from '../../solver/index.ts';
import type { AnalysisDone, AnalysisProgress } from '../common/host-contract.ts';
import { analysisWorkerUrl } from './worker-location.ts';
import { caseIds, workerCountFor } from './case-shares.ts';
import { CANCEL_GRACE_MS, defaultResourceLimits, runRefusal, workerDeathMessage } from './run-limits.ts';
import { CANCEL_REQUESTED, createCancelFlag, type AnalysisWorkerData, type WorkerMessage } from './worker-messages.ts';

export interface AnalysisRunnerOptions {
  onProgress: (p: AnalysisProgress) => void;
  /** Called exactly once per run. `fields` are the raw per-case arrays when status is 'done'. */
  onDone: (d: AnalysisDone, fields?: CaseFields[]) => void;
  /** Worker script; default: analysis-worker.(ts|mjs) beside this module. */
  workerUrl?: URL;
  /** Node options for the worker (default none). */
  execArgv?: string[];
  /** After cancel(), the run is reported cancelled and its worker terminated within this, ms (default CANCEL_GRACE_MS). */
  cancelGraceMs?: number;
  progressIntervalMs?: number;
  /** Threads per run (the cases are dealt out; parallel-solve.ts). Default: workerCountFor (one thread for a run too small to repay a worker). */
  workers?: number;
  /** Worker heap limits (default run-limits.ts); workers a run deals cases to get the same. */
  resourceLimits?: ResourceLimits;
  /** Model-size budget checked before a worker starts (default the solver's). */
  budget?: ModelBudget;
}

interface ActiveRun {
  worker: Worker;
  flag: Int32Array;
  cancelRequested: boolean;
  finished: boolean;
  killTimer?: ReturnType<typeof setTimeout>;
}

export function defaultWorkerUrl(moduleUrl: string = import.meta.url): URL {
  return analysisWorkerUrl(moduleUrl);
}

/** File URL of tsx's ESM register API (the package's `./esm/api` import export). */
function tsxEsmApiUrl(): string {
  const require = createRequire(import.meta.url);
  const pkgFile = require.resolve('tsx/package.json');
  const pkg = require(pkgFile) as { exports: Record<string, { import: { default: string } }> };
  return pathToFileURL(path.join(path.dirname(pkgFile), pkg.exports['./esm/api'].import.default)).href;
}

/**
 * Start a worker. A .ts worker (running from sources) is started through a small eval'd
 * bootstrap that registers tsx's loader in the worker thread first (Node 20 ignores
 * `--import` in worker execArgv); a .js worker (the bundle) is started directly.
 */
export function spawnWorker(url: URL, workerData: unknown, execArgv: string[], resourceLimits?: ResourceLimits): Worker {
  if (!url.pathname.endsWith('.ts')) return new Worker(url, { workerData, execArgv, resourceLimits });
  const tsxApi = tsxEsmApiUrl();
  const code = `(async () => { const { register } = await import(${JSON.stringify(tsxApi)}); register(); await import(${JSON.stringify(url.href)}); })()
    .catch((e) => { throw e; });`;
  return new Worker(code, { eval: true, workerData, execArgv, resourceLimits });
}

export function newRunId(): string {
  return randomBytes(8).toString('hex');
}

/** How many finished runs keep their raw fields for caseFields(). */
const KEPT_RUNS = 2;

export class AnalysisRunner {
  /** Fields of the last finished runs, oldest first (Map keeps insertion order). */
  private readonly kept = new Map<string, CaseFields[]>();
  private readonly runs = new Map<string, ActiveRun>();
  private readonly workerUrl: URL;
  private readonly execArgv: string[];

  constructor(private readonly options: AnalysisRunnerOptions) {
    this.workerUrl = options.workerUrl ?? defaultWorkerUrl();
    this.execArgv = options.execArgv ?? [];
  }

  /** Ids of runs not yet finished. */
  activeRuns(): string[] {
    return [...this.runs.keys()];
  }

  start(project: ProjectFile): { runId: string } {
    for (const id of this.runs.keys()) this.cancel(id);
    const runId = newRunId();
    const refusal = runRefusal(project, this.options.budget);
    if (refusal !== null) {
      // Reported like any failed run, after the caller has the run id.
      setTimeout(() => this.options.onDone({ runId, status: 'failed', error: refusal }), 0);
      return { runId };
    }
    const cancel = createCancelFlag();
    const data: AnalysisWorkerData = {
      project,
      cancelFlag: cancel.buffer,
      progressIntervalMs: this.options.progressIntervalMs ?? 50,
      workers: this.options.workers ?? workerCountFor(project, caseIds(project).length),
    };
    const limits = this.options.resourceLimits ?? defaultResourceLimits();
    const worker = spawnWorker(this.workerUrl, data, this.execArgv, limits);
    const run: ActiveRun = { worker, flag: cancel.view, cancelRequested: false, finished: false };
    this.runs.set(runId, run);
    worker.on('message', (m: WorkerMessage) => this.onMessage(runId, run, m));
    worker.on('error', (e) => this.finish(runId, run, { runId, status: 'failed', error: workerDeathMessage(e, limits) }));
    worker.on('exit', (code) => {
      if (run.cancelRequested) this.finish(runId, run, { runId, status: 'cancelled' });
      else this.finish(runId, run, { runId, status: 'failed', error: `Analysis worker stopped unexpectedly (exit code ${code}).` });
    });
    return { runId };
  }

  cancel(runId: string): void {
    const run = this.runs.get(runId);
    if (!run || run.finished || run.cancelRequested) return;
    run.cancelRequested = true;
    Atomics.store(run.flag, 0, CANCEL_REQUESTED);
    // A solver busy outside its Newton loop (model building, ordering) does not see the flag:
    // after the grace the run is reported cancelled and the worker terminated regardless.
    run.killTimer = setTimeout(() => this.finish(runId, run, { runId, status: 'cancelled' }), this.options.cancelGraceMs ?? CANCEL_GRACE_MS);
  }

  /** Stop every run now (host shutdown). */
  async dispose(): Promise<void> {
    const runs = [...this.runs.values()];
    for (const r of runs) r.cancelRequested = true;
    await Promise.all(runs.map((r) => r.worker.terminate()));
  }

  private onMessage(runId: string, run: ActiveRun, m: WorkerMessage): void {
    if (run.finished) return;
    if (m.type === 'progress') {
      const p = m.progress;
      this.options.onProgress({ runId, caseIndex: p.caseIndex, caseCount: p.caseCount, caseId: p.caseId, iteration: p.iteration, loadFactor: p.loadFactor });
    } else if (m.type === 'done') {
      const status = run.cancelRequested ? 'cancelled' : 'done';
      this.finish(runId, run, { runId, status, report: m.report, ...(m.checks ? { checks: m.checks } : {}) }, m.fields);
    } else if (m.type === 'failed') {
      this.finish(runId, run, { runId, status: run.cancelRequested ? 'cancelled' : 'failed', error: m.error });
    }
  }

  private finish(runId: string, run: ActiveRun, done: AnalysisDone, fields?: CaseFields[]): void {
    if (run.finished) return;
    run.finished = true;
    if (run.killTimer) clearTimeout(run.killTimer);
    this.runs.delete(runId);
    void run.worker.terminate();
    if (done.status === 'done' && fields) {
      this.kept.set(runId, fields);
      for (const old of this.kept.keys()) if (this.kept.size > KEPT_RUNS) this.kept.delete(old);
    }
    this.options.onDone(done, done.status === 'done' ? fields : undefined);
  }

  /** Raw fields of case `caseIndex` of one of the last finished runs, or null. */
  caseFields(runId: string, caseIndex: number): CaseFields | null {
    return this.kept.get(runId)?.[caseIndex] ?? null;
  }
}
