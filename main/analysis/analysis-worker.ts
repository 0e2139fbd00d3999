/**
 * Worker-thread entry: solves the project in workerData and posts progress and the result to
 * the parent (messages in worker-messages.ts). Runs solveProject from the solver barrel.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { solveProject } from '../../solver/index.ts';
import { createProgressThrottle } from './progress-throttle.ts';
import { failureHint } from '../common/project/plausibility/failure-hint.ts';
import { CANCEL_REQUESTED, transferablesOf, type AnalysisWorkerData, type WorkerMessage } from './worker-messages.ts';

function post(message: WorkerMessage, transfer: ArrayBuffer[] = []): void {
  parentPort?.postMessage(message, transfer);
}

function run(): void {
  const data = workerData as AnalysisWorkerData;
  const flag = new Int32Array(data.cancelFlag);
  const pass = createProgressThrottle(data.progressIntervalMs);
  try {
    const solution = solveProject(data.project, {
      isCancelled: () => Atomics.load(flag, 0) === CANCEL_REQUESTED,
      onProgress: (progress) => {
        if (pass(progress)) post({ type: 'progress', progress });
      },
    });
    post({ type: 'done', report: solution.report, fields: solution.fields }, transferablesOf(solution.fields));
  } catch (e) {
    post({ type: 'failed', error: (e instanceof Error ? e.message : String(e)) + failureHint(data.project) });
  }
}

run();
