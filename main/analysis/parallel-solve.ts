/**
 * The cases of a project solved on several threads at once: the calling thread and N − 1 worker
 * threads. Every case starts from the pretensioned state and depends on nothing another case
 * computes, so each thread takes the next unsolved case as soon as it is free (case-shares.ts:
 * a shared counter, so a slow start or a costly case does not leave a core idle), runs it through
 * solveProject (model and symbolic analysis built once per thread), and the reports and fields are
 * put back in the project's order: the numbers are those of a serial run.
 *
 * The calling thread starts solving at once while the workers boot; a worker that has not claimed
 * a case by the time the last one is taken is stopped unwaited, so a small project costs no more
 * than its serial solve plus the spawn. Projects with action-derived cases (patch wind, member
 * loss, wind directions) need their base cases in the same solve and run in the calling thread.
 *
 * Used by the CLI (`solve`, `check`, `schedule`, `report`) and, inside the analysis worker, by the
 * app's analysis runner. STAYSET_WORKERS=N sets the number of threads (1 = the serial solve).
 */
import type { ResourceLimits, Worker } from 'node:worker_threads';
import { solveProject } from '../../solver/index.ts';
import type { CaseFields, CaseResult, ProjectFile, ProjectSolution, SolveControl, SolveProgress } from '../../solver/index.ts';
import { spawnWorker } from './analysis-runner.ts';
import { analysisWorkerUrl } from './worker-location.ts';
import { CANCEL_REQUESTED, type AnalysisWorkerData, type WorkerMessage } from './worker-messages.ts';
import { caseClaimer, caseIds, claimedBy, createClaims, workerCountFor } from './case-shares.ts';
import { hasActionCases } from '../../solver/index.ts';
import { unpackCases } from './packed-cases.ts';

export interface ParallelSolveOptions {
  /** Threads, the calling one included; default workerCountFor. */
  workers?: number;
  /** Worker script; default the analysis worker (worker-location.ts). */
  workerUrl?: URL;
  execArgv?: string[];
  /** Heap limits of every worker (default none). */
  resourceLimits?: ResourceLimits;
  /** Shared cancel flag (worker-messages.ts), read by this thread and passed on to every worker. */
  cancelFlag?: SharedArrayBuffer;
  progressIntervalMs?: number;
  /** Progress with the case index and count of the whole run. */
  onProgress?: (p: SolveProgress) => void;
  /** Only these case / combination ids (default all). */
  only?: string[];
}

interface Share { report: { cases: CaseResult[]; stats?: { analysisSeconds: number } }; fields: CaseFields[] }

interface Helper { worker: Worker; slot: number; result: Promise<Share>; stop: () => void }

function startHelper(project: ProjectFile, slot: number, claims: SharedArrayBuffer, cancelFlag: SharedArrayBuffer, options: ParallelSolveOptions,
  progress: (p: SolveProgress) => void): Helper {
  const data: AnalysisWorkerData = {
    project, cancelFlag, progressIntervalMs: options.progressIntervalMs ?? 50, claims, claimSlot: slot,
    ...(options.only ? { only: options.only } : {}),
  };
  const worker = spawnWorker(options.workerUrl ?? analysisWorkerUrl(import.meta.url), data, options.execArgv ?? [], options.resourceLimits);
  let stop = (): void => {};
  const result = new Promise<Share>((resolve, reject) => {
    let settled = false;
    const settle = (f: () => void): void => { if (!settled) { settled = true; f(); void worker.terminate(); } };
    stop = () => settle(() => resolve({ report: { cases: [] }, fields: [] }));
    worker.on('message', (m: WorkerMessage) => {
      if (m.type === 'progress') progress(m.progress);
      else if (m.type === 'done') settle(() => resolve({ report: m.report, fields: m.fields }));
      else if (m.type === 'share-done') settle(() => resolve({ report: { cases: unpackCases(m.cases), stats: m.stats }, fields: m.fields }));
      else if (m.type === 'failed') settle(() => reject(new Error(m.error)));
    });
    worker.on('error', (e) => settle(() => reject(e)));
    worker.on('exit', (code) => settle(() => reject(new Error(`analysis worker stopped unexpectedly (exit code ${code})`))));
  });
  return { worker, slot, result, stop: () => stop() };
}

export async function solveProjectInWorkers(project: ProjectFile, options: ParallelSolveOptions = {}): Promise<ProjectSolution> {
  const t0 = performance.now();
  const ids = caseIds(project, options.only);
  const indexOf = new Map(ids.map((id, i) => [id, i] as const));
  const cancelFlag = options.cancelFlag ?? new SharedArrayBuffer(4);
  const flag = new Int32Array(cancelFlag);
  const progress = (p: SolveProgress): void => {
    options.onProgress?.({ ...p, caseIndex: indexOf.get(p.caseId) ?? p.caseIndex, caseCount: ids.length });
  };
  const control: SolveControl = {
    isCancelled: () => Atomics.load(flag, 0) === CANCEL_REQUESTED,
    ...(options.onProgress ? { onProgress: progress } : {}),
  };
  const derived = hasActionCases(project);
  const threads = derived ? 1 : Math.max(1, Math.min(options.workers ?? workerCountFor(project, ids.length), ids.length));
  if (threads <= 1) return solveProject(project, control, options.only ? { only: options.only } : {});

  const claims = createClaims(threads);
  const helpers = Array.from({ length: threads - 1 }, (_, k) => startHelper(project, k + 2, claims, cancelFlag, options, progress));
  let own: ProjectSolution;
  try {
    own = solveProject(project, control, { nextCase: caseClaimer(ids, claims, 1) });
  } catch (e) {
    for (const h of helpers) h.stop();
    throw e;
  }
  // Every case is claimed now; a helper that holds none (still booting) is not waited for.
  for (const h of helpers) if (claimedBy(claims, h.slot) === 0) h.stop();
  const shares: Share[] = [own, ...(await Promise.all(helpers.map((h) => h.result)))];

  const cases = new Array<CaseResult>(ids.length);
  const fields = new Array<CaseFields>(ids.length);
  let analysisSeconds = 0;
  for (const s of shares) {
    s.report.cases.forEach((c, k) => { const i = indexOf.get(c.id)!; cases[i] = c; fields[i] = s.fields[k]; });
    analysisSeconds = Math.max(analysisSeconds, s.report.stats?.analysisSeconds ?? 0);
  }
  const missing = ids.filter((_, i) => cases[i] === undefined);
  if (missing.length > 0) throw new Error(`the parallel solve lost case(s) ${missing.join(', ')}`);
  const seconds = (performance.now() - t0) / 1000;
  return { report: { cases, stats: { analysisSeconds, newtonSeconds: seconds - analysisSeconds, seconds } }, fields };
}
