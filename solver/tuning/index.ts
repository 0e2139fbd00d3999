/** Pretension tuning: public entry points (re-exported by solver/index.ts). */
export type * from './tuning-types.ts';
export { tuneProject, tuneProjectAsync, type TuneOptions } from './tune-project.ts';
export {
  createSerialCaseSolver, rebuildCaseSolver, solveBatchTask, batchTaskCount, taskContext, solvedTask,
  type TaskContext, type TuningBatch, type TuningBatchResult, type TuningCaseSolver, type TuningCaseSolverFactory, type TuningSolvedCase, type TuningSolveSetup,
} from './tuning-case-solver.ts';
export { createCaseSession, type CaseSession, type SessionSolve } from './case-session.ts';
export { solveNamedCases } from './project-case-solver.ts';
export { referenceCaseId } from './reference-case.ts';
export { memberPretension, memberUnstressedLength, resolveVariables, applyVariables } from './tuning-variables.ts';
export { createLiveResolver, type LiveResolver, type LiveStep } from './live-resolve.ts';
