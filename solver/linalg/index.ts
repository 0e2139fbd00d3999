/** Sparse symmetric direct solver: patterns, ordering, LDLᵀ factorisation, Matrix Market export. */
export type { SymmetricPattern } from './symmetric-pattern.ts';
export { validatePattern, patternFromCoordinates, findEntry, symmetricMultiply } from './symmetric-pattern.ts';
export { SparseLDL, DEFAULT_PIVOT_TOLERANCE } from './sparse-ldl.ts';
export type { SparseLDLOptions, FactorSnapshot } from './sparse-ldl.ts';
export { fillReducingOrdering } from './ordering.ts';
export { writeMatrixMarketSymmetric, writeMatrixMarketDenseVector } from './matrix-market.ts';
