/**
 * Messages between the analysis runner (main thread) and its worker (analysis-worker.ts).
 *
 * The worker gets `AnalysisWorkerData` as workerData. The cancel flag is an Int32Array of
 * length 1 over a SharedArrayBuffer: 0 = run, 1 = cancel requested; the worker reads it with
 * Atomics.load between Newton iterations (SolveControl.isCancelled).
 *
 * The report is plain JSON-able data; the per-case typed arrays (CaseFields) cross the boundary
 * as transferred ArrayBuffers (no copy). A helper of a parallel run sends its cases packed
 * (packed-cases.ts: the node and member records' numbers as transferred arrays).
 */
import type { CaseFields, ProjectFile, SolveProgress, SolveReport } from '../../solver/index.ts';
import type { SiteOutcome, SiteRequest } from '../common/site/site-run.ts';
import type { TuneHelperSetup } from './tune-messages.ts';
import type { PackedCases } from './packed-cases.ts';
import type { CheckOutcome } from '../common/checks/check-outcome.ts';

export interface AnalysisWorkerData {
  project: ProjectFile;
  cancelFlag: SharedArrayBuffer;
  /** Shortest time between two progress messages, ms (the last iteration of a case is always sent). */
  progressIntervalMs: number;
  /** Only these case ids (default all). */
  only?: string[];
  /**
   * A helper of a parallel run (parallel-solve.ts): the claim buffer (case-shares.ts) and this
   * worker's slot in it; the worker solves the cases it claims, one at a time, until none is left.
   */
  claims?: SharedArrayBuffer;
  claimSlot?: number;
  /** Threads for this run: above 1 the worker deals the cases out to that many workers of its own. */
  workers?: number;
  /** Instead of solving every case: this site request (site-runner.ts), answered with 'site-done'. */
  site?: SiteRequest;
  /** A helper of a tuning run (tune-on-workers.ts): solves the batch tasks it claims until terminated. */
  tune?: TuneHelperSetup;
}

export type WorkerMessage =
  | { type: 'progress'; progress: SolveProgress }
  /** `checks`: the design checks of the report (a run of every case; helpers of a parallel run send 'share-done' without them). */
  | { type: 'done'; report: SolveReport; fields: CaseFields[]; checks?: CheckOutcome }
  /** A helper's share (data.claims set): its cases packed (packed-cases.ts), the report's stats and the fields. */
  | { type: 'share-done'; cases: PackedCases; stats?: SolveReport['stats']; fields: CaseFields[] }
  | { type: 'failed'; error: string }
  | { type: 'site-done'; outcome: SiteOutcome };

export const CANCEL_REQUESTED = 1;

export function createCancelFlag(): { buffer: SharedArrayBuffer; view: Int32Array } {
  const buffer = new SharedArrayBuffer(4);
  return { buffer, view: new Int32Array(buffer) };
}

/** The distinct ArrayBuffers under the fields' typed arrays (a buffer may be listed once only). */
export function transferablesOf(fields: CaseFields[]): ArrayBuffer[] {
  const seen = new Set<ArrayBuffer>();
  for (const f of fields) {
    for (const a of [f.positions, f.elementTension, f.elementSlack, f.elementEndForces]) {
      if (a && a.buffer instanceof ArrayBuffer) seen.add(a.buffer);
    }
  }
  return [...seen];
}
