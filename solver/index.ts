/**
 * Public barrel of the Stayset solver. Code outside solver/ imports from here only.
 * The solver is pure TypeScript: no Node, Electron or DOM; it runs in Node, workers and browsers.
 */
export type * from './project/types.ts';
export type * from './results/types.ts';
export type { AnalysisModel, MemberTopology } from './model/analysis-model.ts';
export type { CaseLoads, FollowerLoad } from './loads/case-loads.ts';
export type { SolveProgress, SolveControl } from './analysis/progress.ts';
