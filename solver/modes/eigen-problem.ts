/**
 * The generic input of the modal eigen-solver: K φ = ω² M φ over the free DOFs, with K a sparse
 * symmetric tangent in the solver's lower-triangle CSC form (solver/linalg) and M a lumped
 * (diagonal) mass. Nothing here knows elements or the DOF map, so the solver works for any family
 * of elements that can assemble a tangent and lump its mass.
 */

export interface EigenProblem {
  /** Number of DOFs (matrix order). */
  n: number;
  /** Lower-triangle CSC pattern: column pointers (n + 1) and row indices, rows ascending, diagonal first. */
  colPtr: Int32Array;
  rowIdx: Int32Array;
  /** Tangent stiffness K, aligned with rowIdx (N/m, N/rad, N·m/rad). Entries touching a DOF that is not free are ignored. */
  stiffness: Float64Array;
  /** Lumped mass per DOF (kg; kg·m² for rotations), ≥ 0. */
  mass: Float64Array;
  /** 1 = the DOF takes part; 0 = restrained or left out. */
  free: Uint8Array;
  /** DOFs per node, for the fill-reducing ordering (3 translations; 6 with rotations). Default 3. */
  blockSize?: number;
}

export interface EigenOptions {
  /** Number of lowest modes wanted. */
  count: number;
  /** Convergence: ‖Op y − θ y‖_M ≤ tolerance · θ for each wanted Ritz pair (default 1e-9). */
  tolerance?: number;
  /** Krylov block size: eigenvalues of multiplicity up to this are found reliably (default 3). */
  krylovBlock?: number;
  /** Largest Krylov basis (default max(4·count + 6, count + 60), capped by the massive DOFs). */
  maxBasis?: number;
  /** Seed of the start block (deterministic pseudo-random numbers). Default 1. */
  seed?: number;
  /** Pivot test of the factorisation of K (default 1e-11, as Newton's). */
  pivotTolerance?: number;
}

/** Why no modes could be computed. */
export type EigenFailure =
  | { code: 'mechanism'; /** DOF of the zero pivot of K. */ dof: number }
  | { code: 'notPositiveDefinite'; /** Negative pivots of K: the state is not stable. */ negativePivots: number }
  | { code: 'noMass' };

export interface EigenSolution {
  /** ω² of the lowest modes, ascending, rad²/s². */
  eigenvalues: Float64Array;
  /** Mode shapes, M-normalised (φᵀ M φ = 1), zero at DOFs that are not free. */
  vectors: Float64Array[];
  /** Relative residual ‖Op y − θ y‖_M / θ of each mode (Op = K⁻¹ M, θ = 1/ω²). */
  residuals: Float64Array;
  /** Every returned mode met the tolerance. */
  converged: boolean;
  /** Linear solves with the factor of K (= operator applications). */
  solves: number;
  /** Final Krylov basis size. */
  basisSize: number;
  /** DOFs that are free and carry mass (the number of finite eigenvalues). */
  massiveDofs: number;
}

export type EigenOutcome = { ok: true; solution: EigenSolution } | { ok: false; failure: EigenFailure };
