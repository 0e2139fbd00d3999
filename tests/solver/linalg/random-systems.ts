import { patternFromCoordinates, type SymmetricPattern } from '../../../solver/linalg/index.ts';

/** Seeded PRNG (mulberry32, a public-domain 32-bit generator): uniform in [0, 1). */
export function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export interface TestSystem { pattern: SymmetricPattern; values: Float64Array; dense: number[][] }

/**
 * Random sparse symmetric matrix: `nodes` nodes of `block` DOFs each, node pairs coupled with
 * probability `density` by a full block of random entries in [-1, 1]. The diagonal is set to
 * sign · (row sum of |off-diagonal| + 1 + rand), so the matrix is strictly diagonally dominant
 * (nonsingular, and LDLᵀ without pivoting exists); with all signs +1 it is SPD
 * (Gershgorin circle theorem). `negativeShare` of the diagonal signs are −1 (and the middle one, when it is > 0).
 */
export function randomSystem(rand: () => number, nodes: number, block: number, density: number, negativeShare = 0): TestSystem {
  const n = nodes * block;
  const dense: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let a = 0; a < nodes; a++) for (let b = 0; b <= a; b++) {
    if (a !== b && rand() >= density) continue;
    for (let r = 0; r < block; r++) for (let c = 0; c < block; c++) {
      const i = a * block + r, j = b * block + c;
      if (i <= j) continue;
      const v = 2 * rand() - 1;
      dense[i][j] = v; dense[j][i] = v;
    }
  }
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let j = 0; j < n; j++) if (j !== i) s += Math.abs(dense[i][j]);
    const sign = rand() < negativeShare || (negativeShare > 0 && i === n >> 1) ? -1 : 1;
    dense[i][i] = sign * (s + 1 + rand());
  }
  return fromDense(dense);
}

/** Lower-triangle pattern + values of a dense symmetric matrix (exact zeros off the diagonal dropped). */
export function fromDense(dense: number[][]): TestSystem {
  const n = dense.length;
  const rows: number[] = [], cols: number[] = [], vals: number[] = [];
  for (let j = 0; j < n; j++) for (let i = j; i < n; i++) {
    if (i !== j && dense[i][j] === 0) continue;
    rows.push(i); cols.push(j); vals.push(dense[i][j]);
  }
  const { pattern, slot } = patternFromCoordinates(n, rows, cols);
  const values = new Float64Array(pattern.rowIdx.length);
  for (let q = 0; q < slot.length; q++) values[slot[q]] += vals[q];
  return { pattern, values, dense };
}

/** 2D five-point grid Laplacian on an m × m grid with Dirichlet boundary (SPD). */
export function gridLaplacian(m: number): TestSystem {
  const n = m * m;
  const rows: number[] = [], cols: number[] = [], vals: number[] = [];
  for (let y = 0; y < m; y++) for (let x = 0; x < m; x++) {
    const i = y * m + x;
    rows.push(i); cols.push(i); vals.push(4);
    if (x > 0) { rows.push(i); cols.push(i - 1); vals.push(-1); }
    if (y > 0) { rows.push(i); cols.push(i - m); vals.push(-1); }
  }
  const { pattern, slot } = patternFromCoordinates(n, rows, cols);
  const values = new Float64Array(pattern.rowIdx.length);
  for (let q = 0; q < slot.length; q++) values[slot[q]] += vals[q];
  return { pattern, values, dense: [] };
}
