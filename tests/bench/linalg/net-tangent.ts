import { patternFromCoordinates, type SymmetricPattern } from '../../../solver/linalg/index.ts';

/**
 * Tangent stiffness of a flat pretensioned square cable net of N × N cells (invented benchmark
 * model): nodes on a unit grid, cables between grid neighbours in x and y, EA = 1.5e-4 m² ·
 * 160 GPa, pretension 50 kN in every cable, boundary nodes fixed, interior nodes free in x, y, z.
 * Element tangent of the node-pair block (standard geometrically nonlinear truss element,
 * material + geometric stiffness): k = (EA/L³) d dᵀ + (N/L) I, assembled as [k −k; −k k].
 * The pattern holds full 3×3 blocks per node pair (as an assembler would), zeros included.
 * DOFs: free node m (row-major over interior nodes) has DOFs 3m, 3m+1, 3m+2.
 */
export interface NetTangent { pattern: SymmetricPattern; values: Float64Array; n: number }

/** `axialForce` N in every cable (default the 50 kN pretension; negative = compression, for tests). */
export function netTangent(cells: number, axialForce = 50e3): NetTangent {
  const EA = 1.5e-4 * 160e9; // N
  const N = axialForce; // N
  const side = cells + 1;
  const free = (ix: number, iy: number): number =>
    ix <= 0 || iy <= 0 || ix >= cells || iy >= cells ? -1 : (iy - 1) * (cells - 1) + (ix - 1);
  const rows: number[] = [], cols: number[] = [], vals: number[] = [];
  const addBlock = (a: number, b: number, k: number[], sign: number): void => {
    for (let r = 0; r < 3; r++) for (let c = 0; c < 3; c++) {
      const i = 3 * a + r, j = 3 * b + c;
      if (i < j) continue; // lower triangle only (the symmetric partner carries the same value)
      rows.push(i); cols.push(j); vals.push(sign * k[3 * r + c]);
    }
  };
  for (let iy = 0; iy < side; iy++) for (let ix = 0; ix < side; ix++) {
    for (const [dx, dy] of [[1, 0], [0, 1]]) {
      const jx = ix + dx, jy = iy + dy;
      if (jx >= side || jy >= side) continue;
      const a = free(ix, iy), b = free(jx, jy);
      if (a < 0 && b < 0) continue;
      const L = 1;
      const dv = [dx, dy, 0]; // node-to-node vector, m (length L)
      const k: number[] = [];
      for (let r = 0; r < 3; r++) for (let c = 0; c < 3; c++) k.push((EA / L ** 3) * dv[r] * dv[c] + (r === c ? N / L : 0));
      if (a >= 0) addBlock(a, a, k, 1);
      if (b >= 0) addBlock(b, b, k, 1);
      if (a >= 0 && b >= 0) { if (a > b) addBlock(a, b, k, -1); else addBlock(b, a, k, -1); }
    }
  }
  const n = 3 * (cells - 1) * (cells - 1);
  const { pattern, slot } = patternFromCoordinates(n, rows, cols);
  const values = new Float64Array(pattern.rowIdx.length);
  for (let q = 0; q < slot.length; q++) values[slot[q]] += vals[q];
  return { pattern, values, n };
}
