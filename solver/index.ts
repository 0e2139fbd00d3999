/**
 * Public barrel of the Stayset solver. Code outside solver/ imports from here only.
 * The solver is pure TypeScript: no Node, Electron or DOM; it runs in Node, workers and browsers.
 */
export type * from './project/types.ts';
export type * from './project/site-types.ts';
export type * from './results/types.ts';
export type * from './results/message-types.ts';
export { OutcomeError, withRefs } from './results/outcome-error.ts';
export type { AnalysisModel, MemberTopology } from './model/analysis-model.ts';
export type { DofMap } from './model/dof-map.ts';
export type { ElementFamily, FamilyBlock } from './elements/family.ts';
export type { ShapeProperties, LatticeMastInput } from './sections/section-shapes.ts';
export type { CaseLoads, FollowerLoad } from './loads/case-loads.ts';
export type { SolveProgress, SolveControl } from './analysis/progress.ts';
export * from './checks/index.ts';
export { DEFAULT_GUY_PRETENSION_SHARE, DEFAULT_ICE_DENSITY, DEFAULT_AIR_DENSITY, DEFAULT_LATTICE_DRAG_FACTOR } from './loads/defaults.ts';
export type { CaseSolution, SolveCaseOptions } from './analysis/solve-case.ts';
export type { Workspace } from './analysis/workspace.ts';
export type { NewtonOptions } from './analysis/newton.ts';
export type { SolveProjectOptions } from './analysis/solve-project.ts';
export type { SymmetricPattern } from './linalg/index.ts';

export { buildModel, stressFreeLength } from './model/build-model.ts';
export { STANDARD_GRAVITY } from './model/constants.ts';
export { resolveCaseLoads, resolveCombinationLoads } from './loads/resolve-case-loads.ts';
export { createWorkspace, setElementPrestress } from './analysis/workspace.ts';
export { solveCase } from './analysis/solve-case.ts';
export { solveProject } from './analysis/solve-project.ts';
export { DEFAULT_NEWTON_OPTIONS } from './analysis/newton.ts';
export { memberSag, describeDof } from './results/extract.ts';
export { lumpedMass } from './assembly/lumped-mass.ts';
export { ELEMENT_FAMILIES } from './elements/registry.ts';
export { dofOf } from './model/dof-map.ts';
export { circularTube, solidRound, equalAngle, latticeMastEquivalent } from './sections/section-shapes.ts';
export { SparseLDL, writeMatrixMarketSymmetric, writeMatrixMarketDenseVector } from './linalg/index.ts';
export * from './tuning/index.ts';
export * from './installation/index.ts';
export * from './sequence/index.ts';
export { estimateModelSize, checkModelBudget, DEFAULT_MODEL_BUDGET } from './model/model-budget.ts';
export type { ModelBudget, ModelSizeEstimate, BudgetVerdict, BudgetItem, SizeDriver } from './model/model-budget.ts';
export * from './asbuilt/index.ts';
export * from './modes/index.ts';
// design actions: panels and area loads, patch wind, member loss
export { actionCaseIds, derivedLoadCase, hasActionCases } from './analysis/solve-actions.ts';
export { dynamicFactorOf, stepResponsePeak, lostMembers } from './loads/member-loss.ts';
export { defaultPatches } from './loads/patch-wind.ts';
export { windDirectionCases } from './loads/wind-directions.ts';
export { DEFAULT_ICE_WIND_PAIRS, iceWithWindCases, unbalancedIceCases, unbalancedIceUnits } from './loads/ice-cases.ts';
export { windForceFactor, windProfileRows } from './loads/wind-basis.ts';
export type { WindProfileRow } from './loads/wind-basis.ts';
export { latticeForceCoefficient, icedLattice } from './loads/lattice-force-coefficient.ts';
export { ancillaryIce, ancillaryNodalMass, ancillaryShares } from './loads/ancillary-loads.ts';
