/**
 * Force density method (Schek, "The force density method for form finding and computation of
 * general networks", Comp. Meth. Appl. Mech. Eng. 3 (1974) 115–134): with a force density
 * q = N / l chosen for every link, the equilibrium of each free node i,
 *   Σ_j q_ij (x_j − x_i) + p_i = 0,
 * is linear in the coordinates, one symmetric positive definite system per axis. Solved here by
 * conjugate gradients with a Jacobi preconditioner (the systems are small and sparse).
 */
export interface ForceDensityNetwork {
  /** Coordinates [x, y, z] per node, m; fixed nodes keep theirs, free ones are start values. */
  coords: Float64Array;
  /** 1 where the node is fixed (a support for form finding). */
  fixed: Uint8Array;
  /** Links as node index pairs [i0, j0, i1, j1, …]. */
  links: Int32Array;
  /** Force density per link, N/m (> 0). */
  q: Float64Array;
  /** Optional nodal loads (3 × nodes), N. */
  loads?: Float64Array;
}

/** Solve for the free coordinates (returns new coordinates; the input is not changed). */
export function solveForceDensity(net: ForceDensityNetwork): Float64Array {
  const n = net.fixed.length;
  const x = new Float64Array(net.coords);
  const nl = net.links.length / 2;
  const diag = new Float64Array(n);
  for (let k = 0; k < nl; k++) {
    if (!(net.q[k] > 0)) throw new Error(`force density of link ${k} must be positive (got ${net.q[k]})`);
    diag[net.links[2 * k]] += net.q[k];
    diag[net.links[2 * k + 1]] += net.q[k];
  }
  for (let i = 0; i < n; i++) if (!net.fixed[i] && !(diag[i] > 0)) throw new Error(`node ${i} is free but joined to nothing`);
  // A·v over free nodes: (A v)_i = Σ_j q_ij (v_i − v_j) with v_j = 0 at fixed nodes.
  const apply = (v: Float64Array, out: Float64Array) => {
    out.fill(0);
    for (let k = 0; k < nl; k++) {
      const i = net.links[2 * k], j = net.links[2 * k + 1], q = net.q[k];
      const vi = net.fixed[i] ? 0 : v[i], vj = net.fixed[j] ? 0 : v[j];
      if (!net.fixed[i]) out[i] += q * (vi - vj);
      if (!net.fixed[j]) out[j] += q * (vj - vi);
    }
  };
  for (let d = 0; d < 3; d++) {
    const b = new Float64Array(n);
    for (let k = 0; k < nl; k++) {
      const i = net.links[2 * k], j = net.links[2 * k + 1], q = net.q[k];
      if (!net.fixed[i] && net.fixed[j]) b[i] += q * net.coords[3 * j + d];
      if (!net.fixed[j] && net.fixed[i]) b[j] += q * net.coords[3 * i + d];
    }
    if (net.loads) for (let i = 0; i < n; i++) if (!net.fixed[i]) b[i] += net.loads[3 * i + d];
    const v = new Float64Array(n);
    for (let i = 0; i < n; i++) v[i] = net.fixed[i] ? 0 : net.coords[3 * i + d];
    conjugateGradient(apply, b, v, diag, net.fixed);
    for (let i = 0; i < n; i++) if (!net.fixed[i]) x[3 * i + d] = v[i];
  }
  return x;
}

function conjugateGradient(
  apply: (v: Float64Array, out: Float64Array) => void, b: Float64Array, v: Float64Array, diag: Float64Array, fixed: Uint8Array,
): void {
  const n = b.length;
  const r = new Float64Array(n), z = new Float64Array(n), p = new Float64Array(n), ap = new Float64Array(n);
  apply(v, ap);
  let bnorm = 0;
  for (let i = 0; i < n; i++) { r[i] = fixed[i] ? 0 : b[i] - ap[i]; bnorm += b[i] * b[i]; }
  bnorm = Math.sqrt(bnorm) || 1;
  for (let i = 0; i < n; i++) { z[i] = fixed[i] ? 0 : r[i] / diag[i]; p[i] = z[i]; }
  let rz = dot(r, z);
  if (Math.sqrt(dot(r, r)) < 1e-13 * bnorm) return;
  for (let it = 0; it < 20 * n + 100; it++) {
    apply(p, ap);
    const alpha = rz / dot(p, ap);
    for (let i = 0; i < n; i++) { v[i] += alpha * p[i]; r[i] -= alpha * ap[i]; }
    if (Math.sqrt(dot(r, r)) < 1e-13 * bnorm) return;
    for (let i = 0; i < n; i++) z[i] = fixed[i] ? 0 : r[i] / diag[i];
    const rzNew = dot(r, z);
    const beta = rzNew / rz;
    rz = rzNew;
    for (let i = 0; i < n; i++) p[i] = z[i] + beta * p[i];
  }
  throw new Error('force density form finding did not converge');
}

function dot(a: Float64Array, b: Float64Array): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] * b[i];
  return s;
}
