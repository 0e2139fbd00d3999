/**
 * Two-node truss / cable element, Total Lagrangian, Green–Lagrange strain.
 *
 * With reference length Lr, current end-to-end vector d = x_b − x_a (m), l² = d·d:
 *   ε = (l² − Lr²) / (2 Lr²)                      Green–Lagrange strain
 *   S = S0 + E (ε − εθ)                            second Piola–Kirchhoff stress, Pa (εθ = α ΔT)
 *   Π_e = A Lr ∫ S dε                              strain energy of the element
 * Gradient and Hessian of Π_e with respect to x_b (those for x_a follow by sign, ∂/∂x_a = −∂/∂x_b):
 *   f_b = (A S / Lr) d                             internal force on node b, N (f_a = −f_b)
 *   k   = (A / Lr) [ (E / Lr²) d dᵀ + S I ]        3×3 block: K_e = [[k, −k], [−k, k]]
 * and the true axial force N = A S l / Lr (positive in tension).
 * Source: the standard TL truss, e.g. Crisfield, Non-linear Finite Element Analysis of Solids and
 * Structures, vol. 1 (1991), ch. 3; Bonet & Wood, Nonlinear Continuum Mechanics for FEA (2008), ch. 7.
 *
 * Tension-only (cables): where S < 0 the element is slack, carries nothing and has no stiffness
 * (the energy density is taken as zero for compression). At S = 0 the tension side's material
 * stiffness is used, so a stress-free straight cable still has axial stiffness.
 * For the tangent only, cables get a small geometric-stiffness floor `sFloor` (Pa) in place of
 * S when S < sFloor: this keeps the tangent non-singular for slack or stress-free cables without
 * touching the internal force, so the converged state is exact.
 */

/** Result codes written to out[OUT_STATE]. */
export const ELEMENT_TAUT = 0;
export const ELEMENT_SLACK = 1;

/** Layout of the `out` array: [f_bx, f_by, f_bz, N, state]. */
export const OUT_FX = 0;
export const OUT_N = 3;
export const OUT_STATE = 4;
export const OUT_SIZE = 5;

/**
 * Evaluate one element at the current end-to-end vector (dx, dy, dz), m.
 * Writes the internal force on node b and the axial force into `out`, and — when `k` is given —
 * the 3×3 block k (row-major, 9 entries) at k[kOffset..kOffset+8]. Allocates nothing.
 */
export function evaluateTrussTL(
  dx: number, dy: number, dz: number,
  Lr: number, S0: number, E: number, A: number, thermalStrain: number,
  tensionOnly: boolean, sFloor: number,
  out: Float64Array, k: Float64Array | null, kOffset: number,
): void {
  const invLr2 = 1 / (Lr * Lr);
  const l2 = dx * dx + dy * dy + dz * dz;
  const eps = 0.5 * (l2 - Lr * Lr) * invLr2;
  const S = S0 + E * (eps - thermalStrain);
  const slack = tensionOnly && S < 0;
  const Sforce = slack ? 0 : S;
  const c = (A * Sforce) / Lr;
  out[0] = c * dx;
  out[1] = c * dy;
  out[2] = c * dz;
  out[OUT_N] = Sforce === 0 ? 0 : (A * Sforce * Math.sqrt(l2)) / Lr;
  out[OUT_STATE] = slack ? ELEMENT_SLACK : ELEMENT_TAUT;
  if (k === null) return;

  const m = slack ? 0 : (A * E * invLr2) / Lr;
  const Sgeo = tensionOnly && S < sFloor ? sFloor : S;
  const g = (A * Sgeo) / Lr;
  const o = kOffset;
  const mx = m * dx, my = m * dy, mz = m * dz;
  k[o] = mx * dx + g;     k[o + 1] = mx * dy;     k[o + 2] = mx * dz;
  k[o + 3] = my * dx;     k[o + 4] = my * dy + g; k[o + 5] = my * dz;
  k[o + 6] = mz * dx;     k[o + 7] = mz * dy;     k[o + 8] = mz * dz + g;
}
