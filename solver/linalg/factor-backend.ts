/**
 * What SparseLDL needs from a numeric LDLᵀ implementation working in the permuted numbering
 * (C = P A Pᵀ). `values` are the ORIGINAL lower-triangle values of A, aligned with the pattern;
 * the backend scatters them through maps built in the symbolic phase.
 */
export interface FactorBackend {
  /** -1 on success, else the permuted column of the first pivot with |d| <= tol · max(|c_kk|, tiny). */
  factor(values: Float64Array, tol: number, tiny: number): number;
  /** x ← C⁻¹ x in the permuted numbering, in place, no allocation. */
  solveInPlace(x: Float64Array): void;
  /** Number of negative entries of D from the last factor. */
  negativeCount(): number;
  /** The arrays that hold the numeric factor (copied out and back by SparseLDL's snapshots). */
  factorArrays(): Float64Array[];
  /** nnz(L) including the unit diagonal. */
  readonly factorNonzeros: number;
}
