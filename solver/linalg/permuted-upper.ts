import type { SymmetricPattern } from './symmetric-pattern.ts';

/**
 * Upper triangle of C = P A Pᵀ in CSC form (column k holds rows i <= k, sorted ascending, the
 * diagonal last), built from the lower-triangle pattern of A and pinv (old → new).
 * `map[q]` is the position in `idx` of original lower entry q (aligned with pattern.rowIdx), so
 * numeric values scatter as cx[map[q]] = values[q]. The upper triangle by columns is the lower
 * triangle by rows, which is what the up-looking factorisation reads.
 */
export interface PermutedUpper {
  ptr: Int32Array;
  idx: Int32Array;
  map: Int32Array;
}

export function permutedUpper(p: SymmetricPattern, pinv: Int32Array): PermutedUpper {
  const { n, colPtr, rowIdx } = p;
  const nz = colPtr[n];
  const cnt = new Int32Array(n);
  for (let j = 0; j < n; j++) {
    const pj = pinv[j];
    for (let q = colPtr[j]; q < colPtr[j + 1]; q++) {
      const pi = pinv[rowIdx[q]];
      cnt[pi > pj ? pi : pj]++;
    }
  }
  const ptr = new Int32Array(n + 1);
  for (let k = 0; k < n; k++) ptr[k + 1] = ptr[k] + cnt[k];
  // Bucket the entries by row first, then place them column by column in increasing row order,
  // so every column comes out sorted.
  const byRowPtr = new Int32Array(n + 1);
  const rowOf = new Int32Array(nz);
  const colOf = new Int32Array(nz);
  for (let j = 0; j < n; j++) {
    const pj = pinv[j];
    for (let q = colPtr[j]; q < colPtr[j + 1]; q++) {
      const pi = pinv[rowIdx[q]];
      const r = pi < pj ? pi : pj;
      rowOf[q] = r; colOf[q] = pi > pj ? pi : pj;
      byRowPtr[r + 1]++;
    }
  }
  for (let r = 0; r < n; r++) byRowPtr[r + 1] += byRowPtr[r];
  const fillRow = byRowPtr.slice(0, n);
  const order = new Int32Array(nz);
  for (let q = 0; q < nz; q++) order[fillRow[rowOf[q]]++] = q;
  const next = ptr.slice(0, n);
  const idx = new Int32Array(nz);
  const map = new Int32Array(nz);
  for (let t = 0; t < nz; t++) {
    const q = order[t];
    const pos = next[colOf[q]]++;
    idx[pos] = rowOf[q];
    map[q] = pos;
  }
  return { ptr, idx, map };
}
