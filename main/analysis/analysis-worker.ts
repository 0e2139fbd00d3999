/**
 * Worker-thread entry: solves the project in workerData and posts progress and the result to
 * the parent (messages in worker-messages.ts). Runs solveProject from the solver barrel on the
 * cases in `only` (default all); with `workers` > 1 it shares the cases with workers of its own
 * (parallel-solve.ts, this thread solving too) and passes their progress and merged result on;
 * as a helper of such a run (`claims`) it solves the cases it claims (case-shares.ts).
 * A run of every case also posts the design checks of its report (checkOutcome), so the app's
 * main thread does not run them again.
 * With `site` set it runs that site request instead (main/common/site/site-run.ts) and posts 'site-done';
 * with `tune` set it serves a tuning run's batches (tune-helper.ts) until terminated.
 */
import { parentPort, resourceLimits, workerData } from 'node:worker_threads';
import { solveProject } from '../../solver/index.ts';
import type { SolveProgress } from '../../solver/index.ts';
import { solveProjectInWorkers } from './parallel-solve.ts';
import { createProgressThrottle } from './progress-throttle.ts';
import { caseClaimer, caseIds } from './case-shares.ts';
import { failureHint } from '../common/project/plausibility/failure-hint.ts';
import { runSiteRequest } from '../common/site/site-run.ts';
import { serveTuneHelper } from './tune-helper.ts';
import { packCases } from './packed-cases.ts';
import { checkOutcome } from '../common/checks/check-outcome.ts';
import { CANCEL_REQUESTED, transferablesOf, type AnalysisWorkerData, type WorkerMessage } from './worker-messages.ts';

function post(message: WorkerMessage, transfer: ArrayBuffer[] = []): void {
  parentPort?.postMessage(message, transfer);
}

async function run(): Promise<void> {
  const data = workerData as AnalysisWorkerData;
  const flag = new Int32Array(data.cancelFlag);
  const pass = createProgressThrottle(data.progressIntervalMs);
  const onProgress = (progress: SolveProgress): void => { if (pass(progress)) post({ type: 'progress', progress }); };
  if (data.tune) {
    serveTuneHelper(data.project, data.tune);
    return;
  }
  if (data.site) {
    try {
      post({ type: 'site-done', outcome: runSiteRequest(data.project, data.site) });
    } catch (e) {
      post({ type: 'failed', error: e instanceof Error ? e.message : String(e) });
    }
    return;
  }
  try {
    const solution = (data.workers ?? 1) > 1
      ? await solveProjectInWorkers(data.project, {
        workers: data.workers, workerUrl: new URL(import.meta.url), cancelFlag: data.cancelFlag,
        progressIntervalMs: data.progressIntervalMs, onProgress, resourceLimits, ...(data.only ? { only: data.only } : {}),
      })
      : solveProject(data.project, { isCancelled: () => Atomics.load(flag, 0) === CANCEL_REQUESTED, onProgress },
        data.claims ? { nextCase: caseClaimer(caseIds(data.project, data.only), data.claims, data.claimSlot ?? 2) } : data.only ? { only: data.only } : {});
    if (data.claims) {
      const { packed, transfer } = packCases(solution.report.cases);
      post({ type: 'share-done', cases: packed, stats: solution.report.stats, fields: solution.fields }, [...transfer, ...transferablesOf(solution.fields)]);
    } else {
      const checks = data.only ? undefined : checkOutcome(data.project, solution.report);
      post({ type: 'done', report: solution.report, fields: solution.fields, ...(checks ? { checks } : {}) }, transferablesOf(solution.fields));
    }
  } catch (e) {
    // A helper's failure is reported by the thread that shares the cases, with the hint added once.
    post({ type: 'failed', error: (e instanceof Error ? e.message : String(e)) + (data.claims ? '' : failureHint(data.project)) });
  }
}

void run();
