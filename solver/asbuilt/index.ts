/** As-built back-analysis: public entry points (re-exported by solver/index.ts). */
export type * from './asbuilt-types.ts';
export { runAsBuilt, MAX_FITTED_CABLES, DEFAULT_ASBUILT_TOLERANCE, DEFAULT_LENGTH_UNCERTAINTY, LARGE_RESIDUAL } from './run-asbuilt.ts';
export { identifiability, IDENTIFIED_SIGMA_RATIO } from './identifiability.ts';
export { observedTensions } from './observations.ts';
