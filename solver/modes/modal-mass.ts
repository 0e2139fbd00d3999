/**
 * Effective modal mass (as in Chopra, Dynamics of Structures, and Clough & Penzien, Dynamics of
 * Structures, in their chapters on modal analysis of multi-degree-of-freedom systems): for a mass-normalised mode φ (φᵀ M φ = 1) and the rigid-body
 * influence vector r_d (1 at every translational DOF along direction d), the participation factor
 * is Γ_d = φᵀ M r_d and the effective modal mass m_d = Γ_d² (kg). Over all modes the m_d sum to the
 * movable mass along d, which is the reference of the shares.
 */
import type { Vec3 } from '../project/types.ts';

/**
 * @param direction per DOF: 0, 1, 2 for translations along x, y, z; −1 for others (rotations)
 */
export function effectiveModalMasses(
  vectors: readonly Float64Array[], mass: Float64Array, free: Uint8Array, direction: Int8Array,
): { effective: Vec3[]; movable: Vec3 } {
  const movable: Vec3 = [0, 0, 0];
  for (let d = 0; d < mass.length; d++) if (free[d] && direction[d] >= 0) movable[direction[d]] += mass[d];
  const effective = vectors.map((phi): Vec3 => {
    const gamma = [0, 0, 0];
    for (let d = 0; d < mass.length; d++) if (free[d] && direction[d] >= 0) gamma[direction[d]] += mass[d] * phi[d];
    return [gamma[0] ** 2, gamma[1] ** 2, gamma[2] ** 2];
  });
  return { effective, movable };
}
