/**
 * End actions of a beam element, for results.
 *
 * Layout (12 per element): [Fx, Fy, Fz, Mx, My, Mz] at the start node a, then the same at the end
 * node b — the force (N) and moment (N·m) the node exerts ON the element end, in the element's
 * co-rotated local axes (x along the element a → b, y and z the section axes of beam-frame.ts).
 * So Fx_b = N and Fx_a = −N (N > 0 tension), Mx_b = torque, and a positive My_a with a positive
 * My_b bends the element like a pair of end moments of equal sense.
 * Moments are the derivatives of the local energy with respect to the local end rotations
 * (θ̄ small, so they are the end moments); shears follow from the moment equilibrium of the
 * element: Fz_b = (My_a + My_b)/L, Fy_b = −(Mz_a + Mz_b)/L, Fy_a = −Fy_b, Fz_a = −Fz_b.
 */
import type { BeamConstants } from './beam-energy.ts';
import { RELEASE_AX, RELEASE_AY, RELEASE_AZ, RELEASE_BX, RELEASE_BY, RELEASE_BZ } from './beam-energy.ts';

/** local = LOCAL of beam-energy.ts: [|d|, θ̄a (3), θ̄b (3), e]. */
export function writeEndActions(c: BeamConstants, local: Float64Array, out: Float64Array, o: number): void {
  if (out.length < o + 12) return;
  const L = local[0];
  const S = c.S0 + c.E * local[7];
  const N = (c.A * S * L) / c.Lr;
  const axial = c.A * c.Lr * S; // ∂Π/∂e
  const rel = c.releases;
  const moments = (p: number, q: number, EI: number, relA: number, relB: number): [number, number] => {
    const fa = (rel & relA) === 0, fb = (rel & relB) === 0;
    if (fa && fb) {
      return [(2 * EI / c.Lr) * (2 * p + q) + axial * (4 * p - q) / 30, (2 * EI / c.Lr) * (2 * q + p) + axial * (4 * q - p) / 30];
    }
    if (fa) return [(3 * EI / c.Lr) * p + axial * p / 5, 0];
    if (fb) return [0, (3 * EI / c.Lr) * q + axial * q / 5];
    return [0, 0];
  };
  const [mya, myb] = moments(local[2], local[5], c.EIy, RELEASE_AY, RELEASE_BY);
  const [mza, mzb] = moments(local[3], local[6], c.EIz, RELEASE_AZ, RELEASE_BZ);
  const torque = (rel & (RELEASE_AX | RELEASE_BX)) === 0 ? (c.GJ / c.Lr) * (local[4] - local[1]) : 0;
  const fzb = (mya + myb) / L, fyb = -(mza + mzb) / L;
  out[o] = -N; out[o + 1] = -fyb; out[o + 2] = -fzb; out[o + 3] = -torque; out[o + 4] = mya; out[o + 5] = mza;
  out[o + 6] = N; out[o + 7] = fyb; out[o + 8] = fzb; out[o + 9] = torque; out[o + 10] = myb; out[o + 11] = mzb;
}
