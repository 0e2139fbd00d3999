/** Vibration modes about a solved case (public part; see case-modes.ts and block-lanczos.ts). */
export type * from './modes-types.ts';
export type { EigenProblem, EigenOptions, EigenOutcome, EigenSolution, EigenFailure } from './eigen-problem.ts';
export type { ModeOptions } from './case-modes.ts';
export { lowestModes } from './block-lanczos.ts';
export { modesOfSolvedCase, DEFAULT_MODE_COUNT } from './case-modes.ts';
export { solveModes } from './solve-modes.ts';
