/**
 * Geometry of a panel (a loop of n ≥ 3 nodes) for area loads.
 *
 * The panel surface is the fan of triangles T_k = (c, x_k, x_{k+1}), c = (Σ x_k)/n the mean of
 * the corners, with vector areas a_k = ½ (x_k − c) × (x_{k+1} − c) (normal by the right-hand rule
 * on the loop order). Σ a_k = ½ Σ x_k × x_{k+1}, the vector area of the loop (independent of c).
 *
 * Tributary shares: each triangle gives a third of its area to each of its three corners (the
 * consistent nodal load of a uniform pressure on a flat triangle with linear shape functions),
 * and the third that falls on c is spread equally over the n corners (c moves as their mean).
 * Corner k thus receives  (a_{k−1} + a_k)/3 + (Σ a)/(3n).  The shares sum to the panel's area.
 */

/**
 * Vector tributary areas of the corners, m² (3 × n into `out`), of the panel whose corner
 * positions are x[3·nodes[k] ..] (m). `measure` chooses what is shared:
 *   'vector' — the vector areas a_k (for a pressure normal to the surface),
 *   'plan'   — |a_k,z| along z only (plan projection, for snow),
 *   'true'   — |a_k| along z only (true area, for a weight per sloping area).
 * Returns the total of the shared measure (|Σ a| for 'vector').
 */
export function panelShares(
  x: ArrayLike<number>, nodes: ArrayLike<number>, measure: 'vector' | 'plan' | 'true', out: Float64Array,
): number {
  const n = nodes.length;
  let cx = 0, cy = 0, cz = 0;
  for (let k = 0; k < n; k++) { const i = 3 * nodes[k]; cx += x[i]; cy += x[i + 1]; cz += x[i + 2]; }
  cx /= n; cy /= n; cz /= n;
  out.fill(0, 0, 3 * n);
  let sx = 0, sy = 0, sz = 0;
  for (let k = 0; k < n; k++) {
    const i = 3 * nodes[k], j = 3 * nodes[(k + 1) % n];
    const ux = x[i] - cx, uy = x[i + 1] - cy, uz = x[i + 2] - cz;
    const vx = x[j] - cx, vy = x[j + 1] - cy, vz = x[j + 2] - cz;
    let ax = 0.5 * (uy * vz - uz * vy), ay = 0.5 * (uz * vx - ux * vz), az = 0.5 * (ux * vy - uy * vx);
    if (measure === 'plan') { az = Math.abs(az); ax = 0; ay = 0; }
    else if (measure === 'true') { az = Math.hypot(ax, ay, az); ax = 0; ay = 0; }
    sx += ax; sy += ay; sz += az;
    const k1 = (k + 1) % n;
    out[3 * k] += ax / 3; out[3 * k + 1] += ay / 3; out[3 * k + 2] += az / 3;
    out[3 * k1] += ax / 3; out[3 * k1 + 1] += ay / 3; out[3 * k1 + 2] += az / 3;
  }
  for (let k = 0; k < n; k++) {
    out[3 * k] += sx / (3 * n); out[3 * k + 1] += sy / (3 * n); out[3 * k + 2] += sz / (3 * n);
  }
  return Math.hypot(sx, sy, sz);
}
