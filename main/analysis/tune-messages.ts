/**
 * Messages between a tuning run's calling thread (tune-on-workers.ts) and its helper workers
 * (the analysis worker script with `tune` set, tune-helper.ts).
 *
 * A helper gets the project (AnalysisWorkerData.project), the resolved variables and the case ids
 * once, builds its case session, posts 'tune-ready', and then answers one 'tune-batch' after another: it claims tasks
 * from the batch's claim buffer (case-shares.ts; task t = point ⌊t / cases⌋, case t mod cases),
 * solves them and posts each result as 'tune-task' as soon as it has it.
 * Only the points' variable values travel with a batch; the warm starts (node positions) travel
 * only when the current point has changed, and stay with the helper until then.
 */
import type { ResolvedVariable, TuningSolvedCase } from '../../solver/index.ts';

export interface TuneHelperSetup {
  variables: ResolvedVariable[];
  caseIds: string[];
  /** This helper's slot in every batch's claim buffer (≥ 2; the calling thread is 1). */
  slot: number;
}

export interface TuneBatchMessage {
  type: 'tune-batch';
  /** Batch number, from 1. */
  seq: number;
  /** Variable values of each point (N or length factor). */
  points: number[][];
  claims: SharedArrayBuffer;
  /** New warm starts [case id, positions (3 × node count, m)], when they changed since the last batch. */
  starts?: [string, Float64Array][];
}

export type TuneHelperMessage =
  | { type: 'tune-ready' }
  | { type: 'tune-task'; seq: number; task: number; solved: TuningSolvedCase }
  | { type: 'failed'; error: string };

/** Ids the claim counter hands out for a batch of `count` tasks: the task indices as text. */
export function taskIds(count: number): string[] {
  return Array.from({ length: count }, (_, t) => String(t));
}
