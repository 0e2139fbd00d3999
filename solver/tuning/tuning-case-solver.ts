/**
 * How the tuner has its cases solved: an injectable strategy (TuneOptions.caseSolver) that
 * solves a batch of tasks — every case the targets name, at each of several variable values
 * ("points") — and returns the results in a fixed order. The tuner asks for one point (the start,
 * a trial step) or for one point per variable (the finite-difference columns of the Jacobian); all
 * solves of a batch start from the same warm starts (the solutions at the current point), so no
 * task depends on another and they may run in any order, on any thread.
 *
 * The serial strategy (createSerialCaseSolver) solves the tasks in order on one case session
 * (case-session.ts). Another strategy (e.g. worker threads, main/analysis/tune-on-workers.ts) must
 * give the same numbers: it solves the same tasks with solveBatchTask on sessions of its own.
 */
import type { ProjectFile } from '../project/types.ts';
import type { CaseResult } from '../results/types.ts';
import { applyVariables } from './tuning-variables.ts';
import { createCaseSession, type CaseSession } from './case-session.ts';
import type { CaseSolveFn, ResolvedVariable } from './tuning-types.ts';

/** What a strategy is built for: the project as given, its resolved variables, the cases the targets need. */
export interface TuningSolveSetup {
  project: ProjectFile;
  variables: readonly ResolvedVariable[];
  caseIds: readonly string[];
}

export interface TuningBatch {
  /** Variable values of each point (pretension N or length factor, in the order of the variables). */
  points: readonly (readonly number[])[];
  /**
   * Warm start per case id: node positions (3 × node count, m) of the case's solution at the
   * current point; a case without one starts from the pretensioned start shape. The tuner passes
   * the same Map object until the current point changes, so a strategy may send it on only then.
   */
  starts: ReadonlyMap<string, Float64Array>;
}

/** One solved task: the case result and, when it converged, the final node positions (3 × node count, m). */
export interface TuningSolvedCase { result: CaseResult; positions: Float64Array | null }

/** Results of a batch, task by task: task t is point ⌊t / cases⌋, case t mod cases (setup order). */
export type TuningBatchResult = TuningSolvedCase[];

export interface TuningCaseSolver {
  solveBatch(batch: TuningBatch): TuningBatchResult | Promise<TuningBatchResult>;
}

/** Makes the strategy for one tuning run. */
export type TuningCaseSolverFactory = (setup: TuningSolveSetup) => TuningCaseSolver;

/** Number of tasks of a batch (points × cases). */
export function batchTaskCount(batch: TuningBatch, caseIds: readonly string[]): number {
  return batch.points.length * caseIds.length;
}

/** Task t of a batch solved on `session`: the one routine every strategy runs per task. */
export function solveBatchTask(session: CaseSession, batch: TuningBatch, caseIds: readonly string[], t: number): TuningSolvedCase {
  const caseId = caseIds[t % caseIds.length];
  const s = session.solve(batch.points[Math.floor(t / caseIds.length)], caseId, batch.starts.get(caseId));
  return { result: s.result, positions: s.result.converged ? s.positions : null };
}

/** The serial strategy: every task in order on one session in this thread. */
export const createSerialCaseSolver: TuningCaseSolverFactory = (setup) => {
  const session = createCaseSession(setup.project, setup.variables, setup.caseIds);
  return {
    solveBatch(batch) {
      return Array.from({ length: batchTaskCount(batch, setup.caseIds) }, (_, t) => solveBatchTask(session, batch, setup.caseIds, t));
    },
  };
};

/**
 * The reference strategy: each point written into a copy of the project (applyVariables) and its
 * cases solved from scratch by `solveCases` (warm starts unused, no positions kept).
 */
export function rebuildCaseSolver(solveCases: CaseSolveFn): TuningCaseSolverFactory {
  return (setup) => ({
    solveBatch(batch) {
      return batch.points.flatMap((point) => {
        const results = solveCases(applyVariables(setup.project, setup.variables, point), setup.caseIds);
        return setup.caseIds.map((id) => ({ result: results.get(id)!, positions: null }));
      });
    },
  });
}
