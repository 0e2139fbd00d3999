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
 * A task returns the values of the targets its case decides, not the whole case result.
 */
import type { ProjectFile } from '../project/types.ts';
import type { CaseResult } from '../results/types.ts';
import { applyVariables } from './tuning-variables.ts';
import { createCaseSession, type CaseSession } from './case-session.ts';
import { createCaseTargetEvaluator } from './target-evaluation.ts';
import type { CaseSolveFn, ResolvedVariable, TargetValue } from './tuning-types.ts';

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

/**
 * One solved task: whether the case converged (and its status), the values of the targets it
 * decides (target-evaluation.ts, createCaseTargetEvaluator: [target index, value]; none when it did
 * not converge) and, when it converged, its final node positions (3 × node count, m). Small, so
 * it crosses threads cheaply (a whole CaseResult of a 1,350-DOF mast is ~130 kB to clone).
 */
export interface TuningSolvedCase {
  caseId: string;
  converged: boolean;
  status: CaseResult['status'];
  targets: [number, TargetValue][];
  positions: Float64Array | null;
}

/** What solveBatchTask needs besides the session: the cases and the target evaluator of the run. */
export interface TaskContext {
  caseIds: readonly string[];
  evaluate: (result: CaseResult) => [number, TargetValue][];
}

/** The task context of a run (the project as given and the cases its targets name). */
export function taskContext(setup: Pick<TuningSolveSetup, 'project' | 'caseIds'>): TaskContext {
  return { caseIds: setup.caseIds, evaluate: createCaseTargetEvaluator(setup.project) };
}

/** A solved case as a task result (targets evaluated when it converged). */
export function solvedTask(ctx: TaskContext, result: CaseResult, positions: Float64Array | null): TuningSolvedCase {
  return {
    caseId: result.id, converged: result.converged, status: result.status,
    targets: result.converged ? ctx.evaluate(result) : [], positions: result.converged ? positions : null,
  };
}

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
export function solveBatchTask(session: CaseSession, ctx: TaskContext, batch: TuningBatch, t: number): TuningSolvedCase {
  const caseId = ctx.caseIds[t % ctx.caseIds.length];
  const s = session.solve(batch.points[Math.floor(t / ctx.caseIds.length)], caseId, batch.starts.get(caseId));
  return solvedTask(ctx, s.result, s.positions);
}

/** The serial strategy: every task in order on one session in this thread. */
export const createSerialCaseSolver: TuningCaseSolverFactory = (setup) => {
  const session = createCaseSession(setup.project, setup.variables, setup.caseIds);
  const ctx = taskContext(setup);
  return {
    solveBatch(batch) {
      return Array.from({ length: batchTaskCount(batch, setup.caseIds) }, (_, t) => solveBatchTask(session, ctx, batch, t));
    },
  };
};

/**
 * The reference strategy: each point written into a copy of the project (applyVariables) and its
 * cases solved from scratch by `solveCases` (warm starts unused, no positions kept).
 */
export function rebuildCaseSolver(solveCases: CaseSolveFn): TuningCaseSolverFactory {
  return (setup) => {
    const ctx = taskContext(setup);
    return {
      solveBatch(batch) {
        return batch.points.flatMap((point) => {
          const results = solveCases(applyVariables(setup.project, setup.variables, point), setup.caseIds);
          return setup.caseIds.map((id) => solvedTask(ctx, results.get(id)!, null));
        });
      },
    };
  };
}
