/**
 * The cases of a project solved on several worker threads at once. Every case starts from the
 * pretensioned state and depends on nothing another case computes, so the cases are dealt out
 * round-robin (case i to worker i mod N, which also spreads the costly and the cheap ones), each
 * worker runs solveProject on its share (model and symbolic analysis included), and the reports
 * and fields are put back in the project's order: the numbers are those of a serial run.
 *
 * Used by the CLI (`stayset solve`) and, inside the analysis worker, by the app's analysis runner.
 * STAYSET_WORKERS=N sets the number of threads (1 = the serial in-process solve).
 */
import type { ResourceLimits } from 'node:worker_threads';
import type { CaseFields, CaseResult, ProjectFile, ProjectSolution, SolveProgress } from '../../solver/index.ts';
import { spawnWorker } from './analysis-runner.ts';
import { analysisWorkerUrl } from './worker-location.ts';
import type { AnalysisWorkerData, WorkerMessage } from './worker-messages.ts';
import { caseIds, defaultWorkerCount, splitCases } from './case-shares.ts';
import { hasActionCases } from '../../solver/index.ts';

export interface ParallelSolveOptions {
  /** Threads; default defaultWorkerCount. */
  workers?: number;
  /** Worker script; default the analysis worker (worker-location.ts). */
  workerUrl?: URL;
  execArgv?: string[];
  /** Heap limits of every worker (default none). */
  resourceLimits?: ResourceLimits;
  /** Shared cancel flag (worker-messages.ts), passed on to every worker. */
  cancelFlag?: SharedArrayBuffer;
  progressIntervalMs?: number;
  /** Progress with the case index and count of the whole run. */
  onProgress?: (p: SolveProgress) => void;
  /** Only these case / combination ids (default all). */
  only?: string[];
}

interface Share { report: { cases: CaseResult[]; stats?: { analysisSeconds: number } }; fields: CaseFields[] }

export async function solveProjectInWorkers(project: ProjectFile, options: ParallelSolveOptions = {}): Promise<ProjectSolution> {
  const t0 = performance.now();
  // Cases derived from actions (patch wind, member loss, wind directions) need their base cases in
  // the same solve: such projects run as one share, in solveProject's own order.
  const derived = hasActionCases(project);
  const ids = caseIds(project, options.only);
  const parts: (string[] | undefined)[] = derived ? [options.only] : splitCases(ids, options.workers ?? defaultWorkerCount(ids.length));
  const indexOf = new Map(ids.map((id, i) => [id, i] as const));
  const url = options.workerUrl ?? analysisWorkerUrl(import.meta.url);
  const cancelFlag = options.cancelFlag ?? new SharedArrayBuffer(4);
  const shares = await Promise.all(parts.map((only) => new Promise<Share>((resolve, reject) => {
    const data: AnalysisWorkerData = { project, cancelFlag, progressIntervalMs: options.progressIntervalMs ?? 50, only };
    const worker = spawnWorker(url, data, options.execArgv ?? [], options.resourceLimits);
    let settled = false;
    const settle = (f: () => void): void => { if (!settled) { settled = true; f(); void worker.terminate(); } };
    worker.on('message', (m: WorkerMessage) => {
      if (m.type === 'progress') {
        const p = m.progress;
        options.onProgress?.({ ...p, caseIndex: indexOf.get(p.caseId) ?? p.caseIndex, caseCount: ids.length });
      } else if (m.type === 'done') settle(() => resolve({ report: m.report, fields: m.fields }));
      else settle(() => reject(new Error(m.error)));
    });
    worker.on('error', (e) => settle(() => reject(e)));
    worker.on('exit', (code) => settle(() => reject(new Error(`analysis worker stopped unexpectedly (exit code ${code})`))));
  })));
  const elapsed = () => (performance.now() - t0) / 1000;
  if (derived) {
    const s = shares[0], analysis = s.report.stats?.analysisSeconds ?? 0, total = elapsed();
    return { report: { cases: s.report.cases, stats: { analysisSeconds: analysis, newtonSeconds: total - analysis, seconds: total } }, fields: s.fields };
  }
  const cases = new Array<CaseResult>(ids.length);
  const fields = new Array<CaseFields>(ids.length);
  let analysisSeconds = 0;
  for (const s of shares) {
    s.report.cases.forEach((c, k) => { const i = indexOf.get(c.id)!; cases[i] = c; fields[i] = s.fields[k]; });
    analysisSeconds = Math.max(analysisSeconds, s.report.stats?.analysisSeconds ?? 0);
  }
  const seconds = elapsed();
  return { report: { cases, stats: { analysisSeconds, newtonSeconds: seconds - analysisSeconds, seconds } }, fields };
}
