/** Tensioning sequences: public entry points (re-exported by solver/index.ts). */
export type * from './sequence-types.ts';
export { runSequence, MAX_REORDER_STEPS } from './run-sequence.ts';
export { resolveSequence, DEFAULT_FORCE_TOLERANCE, DEFAULT_LENGTH_TOLERANCE, type ResolvedSequence } from './resolve-sequence.ts';
export { designUnstressedLengths, withUnstressedLengths, stressFreeLengthAt, stressFreeLengthPerKelvin } from './design-lengths.ts';
export { stageProject, solveStage, STAGE_CASE_ID, type StageSpec, type StageSolution } from './stage-solver.ts';
export { simulateSequence, type SimulateOptions, type Simulation } from './simulate-sequence.ts';
