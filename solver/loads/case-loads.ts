/**
 * Loads of one analysis case, resolved against an AnalysisModel. All arrays are per node DOF
 * (3 × nodeCount, N) or per element.
 *
 * The analysis applies them at load factor λ ∈ [0, 1]:
 *   f_ext(x, λ) = λ (nodal + g · (gravityFactor · mass + extraMass)) + λ · follower(x)
 * and the thermal strain α ΔT is scaled by λ as well.
 */
export interface CaseLoads {
  /** Fixed-direction nodal forces, N (3 × nodeCount). Gravity of the members is added by the analysis. */
  nodal: Float64Array;
  /** Include member self-weight. */
  selfWeight: boolean;
  /** Scale on gravity loads (combination factor of self-weight); default 1. */
  gravityFactor: number;
  /**
   * Additional mass per unstressed length per element, kg/m (ice), or null. Already factored:
   * applied with gravity whether or not `selfWeight` is set, not scaled by gravityFactor.
   */
  extraMassPerLength: Float64Array | null;
  /** Uniform temperature change, K. */
  temperatureChange: number;
  /** Loads that depend on the current geometry (wind drag), or null. */
  follower: FollowerLoad | null;
  /** Nodal moments (3 × nodeCount, N·m) on nodes with rotations, or absent. */
  moments?: Float64Array | null;
  /**
   * Mass of the ancillaries per node with the case's ice on them, kg (nodeCount), for the modal
   * mass (their weight is already in `nodal`), or absent when the project has none.
   */
  ancillaryMass?: Float64Array | null;
  /** Prescribed displacements of restrained DOFs (m, rad), reached at λ = 1, or absent. */
  prescribed?: { dofs: Int32Array; values: Float64Array } | null;
}

/**
 * A load that follows the structure (evaluated at the current positions inside every Newton
 * iteration). Its stiffness is not added to the tangent (the residual stays exact, so the converged
 * state is exact; convergence becomes linear where the follower term dominates).
 */
export interface FollowerLoad {
  /** Add the load at current positions x (3 × nodeCount, m) into f (N), already scaled by `factor`. */
  accumulate(x: Float64Array, factor: number, f: Float64Array): void;
}

export function emptyCaseLoads(nodeCount: number): CaseLoads {
  return {
    nodal: new Float64Array(3 * nodeCount),
    selfWeight: true,
    gravityFactor: 1,
    extraMassPerLength: null,
    temperatureChange: 0,
    follower: null,
  };
}
