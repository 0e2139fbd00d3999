/**
 * The helper side of a tuning run on worker threads (runs inside the analysis worker script when
 * AnalysisWorkerData.tune is set; messages in tune-messages.ts). It keeps one case session (model,
 * workspace, symbolic factorisation) for the whole run, and for each batch solves the tasks it
 * claims with the same routine as the calling thread (solveBatchTask), so a task's numbers do not
 * depend on the thread that solved it, and posts each result at once.
 */
import { parentPort } from 'node:worker_threads';
import { createCaseSession, solveBatchTask, taskContext, type CaseSession, type ProjectFile, type TuningSolvedCase } from '../../solver/index.ts';
import { caseClaimer } from './case-shares.ts';
import { taskIds, type TuneBatchMessage, type TuneHelperMessage, type TuneHelperSetup } from './tune-messages.ts';

function post(message: TuneHelperMessage, transfer: ArrayBuffer[] = []): void {
  parentPort?.postMessage(message, transfer);
}

const errorText = (e: unknown): string => (e instanceof Error ? e.message : String(e));

export function serveTuneHelper(project: ProjectFile, setup: TuneHelperSetup): void {
  let session: CaseSession;
  try {
    session = createCaseSession(project, setup.variables, setup.caseIds);
  } catch (e) {
    post({ type: 'failed', error: errorText(e) });
    return;
  }
  const ctx = taskContext({ project, caseIds: setup.caseIds });
  post({ type: 'tune-ready' });
  let starts = new Map<string, Float64Array>();
  parentPort?.on('message', (m: TuneBatchMessage) => {
    try {
      if (m.starts) starts = new Map(m.starts);
      const batch = { points: m.points, starts };
      const claim = caseClaimer(taskIds(m.points.length * setup.caseIds.length), m.claims, setup.slot);
      for (let id = claim(); id !== undefined; id = claim()) {
        const task = Number(id);
        const solved: TuningSolvedCase = solveBatchTask(session, ctx, batch, task);
        post({ type: 'tune-task', seq: m.seq, task, solved }, solved.positions && solved.positions.buffer instanceof ArrayBuffer ? [solved.positions.buffer] : []);
      }
    } catch (e) {
      post({ type: 'failed', error: errorText(e) });
    }
  });
}
