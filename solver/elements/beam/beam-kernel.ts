/**
 * Internal force and consistent tangent of one co-rotational beam element: the gradient and the
 * exact Hessian of its strain energy (beam-energy.ts, one second-order Taylor evaluation), mapped
 * from the 9 energy variables (Δ, θ_a, θ_b) to the 12 element DOFs
 *   [u_a (x, y, z), θ_a (x, y, z), u_b (x, y, z), θ_b (x, y, z)]   (m, rad; forces N, N·m)
 * with Δ = u_b − u_a, so ∂/∂u_a = −∂/∂Δ and ∂/∂u_b = ∂/∂Δ. Allocates nothing.
 */
import { T, gradientOf, hessianOf } from './taylor2.ts';
import { beamEnergy, type BeamConstants } from './beam-energy.ts';

/** Energy variable of each element DOF and its sign. */
const VAR_OF = [0, 1, 2, 3, 4, 5, 0, 1, 2, 6, 7, 8];
const SIGN_OF = [-1, -1, -1, 1, 1, 1, 1, 1, 1, 1, 1, 1];

/** Evaluate at variables x (9): writes f (12) and, when k is given, K (12×12 row-major). Returns Π, J. */
export function evaluateBeam(c: BeamConstants, x: Float64Array, f: Float64Array, k: Float64Array | null): number {
  const e = beamEnergy(c, x, k !== null);
  for (let p = 0; p < 12; p++) f[p] = SIGN_OF[p] * gradientOf(e, VAR_OF[p]);
  if (k) {
    for (let p = 0; p < 12; p++) {
      const vp = VAR_OF[p], sp = SIGN_OF[p];
      for (let q = 0; q <= p; q++) {
        const v = sp * SIGN_OF[q] * hessianOf(e, vp, VAR_OF[q]);
        k[12 * p + q] = v;
        k[12 * q + p] = v;
      }
    }
  }
  return T[e];
}
