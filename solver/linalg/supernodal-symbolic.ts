import { supernodePartition } from './supernode-partition.ts';

/**
 * Symbolic analysis for the supernodal LDLᵀ: supernode partition, row structure of each
 * supernode, storage offsets and the scatter map from A's values into L's storage.
 *
 * Input is the permuted matrix C = P A Pᵀ with P including a postorder of the elimination tree,
 * so the columns of every subtree are contiguous and children precede parents.
 * Supernodes come from supernodePartition (fundamental supernodes, optionally relaxed). Within a
 * supernode the structures of the columns are nested, so its rows are its columns plus the
 * structure of its last column below the block; relaxed supernodes store explicit zeros.
 * Row structure: Struct(s) = {f..l−1} ∪ rows ≥ l of A(:, f..l−1) ∪ Struct(children) ∩ [l, n)
 * (Davis 2006, ch. 4: the pattern of L(:,j) is A's column plus the children's patterns).
 *
 * Storage layout: supernode s owns a dense column-major block of nrows × ncols doubles at
 * valPtr[s] (leading dimension nrows); local row t is global row rows[rowPtr[s] + t]; the first
 * ncols local rows are the supernode's own columns; only the lower part of the diagonal block
 * is used.
 */
export interface SupernodalStructure {
  n: number;
  nsuper: number;
  /** First column of each supernode, length nsuper + 1 (superStart[nsuper] = n). */
  superStart: Int32Array;
  /** colToSuper[j] = supernode holding column j. */
  colToSuper: Int32Array;
  /** Offsets into rows, length nsuper + 1. */
  rowPtr: Int32Array;
  /** Global (permuted) row indices of each supernode, ascending. */
  rows: Int32Array;
  /** Offsets of each supernode's dense block in the value storage, length nsuper + 1. */
  valPtr: Int32Array;
  /** Largest nrows and ncols over the supernodes (workspace sizes). */
  maxRows: number;
  maxCols: number;
  /** nnz(L) including the diagonal (structural, without the explicit zeros of relaxed supernodes). */
  factorNonzeros: number;
  /** Stored entries of L: the lower trapezoid of every supernode block, explicit zeros included. */
  storedNonzeros: number;
}

/**
 * gPtr/gIdx: adjacency of C (both triangles, any order, no diagonal needed; permuteGraph);
 * parent/colCount: elimination tree and below-diagonal column counts of C.
 */
export function supernodalStructure(
  n: number, gPtr: Int32Array, gIdx: Int32Array, parent: Int32Array, colCount: Int32Array, relax = true,
): SupernodalStructure {
  const superStart = supernodePartition(n, parent, colCount, relax);
  const nsuper = superStart.length - 1;
  const colToSuper = new Int32Array(n);
  for (let s = 0; s < nsuper; s++) for (let j = superStart[s]; j < superStart[s + 1]; j++) colToSuper[j] = s;
  // ---- supernode tree and children lists ----
  const childHead = new Int32Array(nsuper).fill(-1);
  const childNext = new Int32Array(nsuper).fill(-1);
  for (let s = nsuper - 1; s >= 0; s--) {
    const p = parent[superStart[s + 1] - 1];
    if (p === -1) continue;
    const ps = colToSuper[p];
    childNext[s] = childHead[ps];
    childHead[ps] = s;
  }
  // ---- row structure ----
  // A supernode's rows are those of its first column (its columns' structures are nested).
  const rowPtr = new Int32Array(nsuper + 1);
  for (let s = 0; s < nsuper; s++) {
    const f = superStart[s], l = superStart[s + 1];
    rowPtr[s + 1] = rowPtr[s] + (l - f) + colCount[l - 1];
  }
  const rows = new Int32Array(rowPtr[nsuper]);
  const mark = new Int32Array(n).fill(-1);
  const buf = new Int32Array(n);
  for (let s = 0; s < nsuper; s++) {
    const f = superStart[s], l = superStart[s + 1];
    let len = 0;
    for (let j = f; j < l; j++) { mark[j] = s; buf[len++] = j; }
    for (let j = f; j < l; j++) {
      for (let q = gPtr[j]; q < gPtr[j + 1]; q++) {
        const i = gIdx[q];
        if (i > j && mark[i] !== s) { mark[i] = s; buf[len++] = i; } // rows below the diagonal
      }
    }
    for (let c = childHead[s]; c !== -1; c = childNext[c]) {
      for (let q = rowPtr[c]; q < rowPtr[c + 1]; q++) {
        const i = rows[q];
        if (i >= f && mark[i] !== s) { mark[i] = s; buf[len++] = i; }
      }
    }
    if (len !== rowPtr[s + 1] - rowPtr[s]) {
      throw new Error(`supernodal analysis: supernode ${s} has ${len} rows, column counts say ${rowPtr[s + 1] - rowPtr[s]}`);
    }
    const seg = rows.subarray(rowPtr[s], rowPtr[s + 1]);
    seg.set(buf.subarray(0, len));
    seg.sort();
  }
  // ---- storage ----
  const valPtr = new Int32Array(nsuper + 1);
  let maxRows = 0, maxCols = 0, lnz = n, stored = 0;
  for (let j = 0; j < n; j++) lnz += colCount[j];
  for (let s = 0; s < nsuper; s++) {
    const nr = rowPtr[s + 1] - rowPtr[s], nc = superStart[s + 1] - superStart[s];
    if (nr > maxRows) maxRows = nr;
    if (nc > maxCols) maxCols = nc;
    valPtr[s + 1] = valPtr[s] + nr * nc;
    stored += nr * nc - (nc * (nc - 1)) / 2;
  }
  return { n, nsuper, superStart, colToSuper, rowPtr, rows, valPtr, maxRows, maxCols, factorNonzeros: lnz, storedNonzeros: stored };
}

/**
 * Scatter map: position in the supernodal value storage of each original lower entry q of A,
 * given pinv (old → new). Entry (i, j) goes to row max(pinv i, pinv j), column min(...).
 */
export function supernodalScatterMap(
  st: SupernodalStructure, colPtr: Int32Array, rowIdx: Int32Array, pinv: Int32Array,
): Int32Array {
  const { n, nsuper, superStart, rowPtr, rows, valPtr } = st;
  const nz = colPtr[n];
  // Bucket the entries by their permuted column.
  const bPtr = new Int32Array(n + 1);
  const colOf = new Int32Array(nz), rowOf = new Int32Array(nz);
  for (let j = 0; j < n; j++) {
    for (let q = colPtr[j]; q < colPtr[j + 1]; q++) {
      const a = pinv[rowIdx[q]], b = pinv[j];
      colOf[q] = a < b ? a : b; rowOf[q] = a < b ? b : a;
      bPtr[colOf[q] + 1]++;
    }
  }
  for (let j = 0; j < n; j++) bPtr[j + 1] += bPtr[j];
  const next = bPtr.slice(0, n);
  const bucket = new Int32Array(nz);
  for (let q = 0; q < nz; q++) bucket[next[colOf[q]]++] = q;
  const rel = new Int32Array(n);
  const map = new Int32Array(nz);
  for (let s = 0; s < nsuper; s++) {
    const f = superStart[s], nr = rowPtr[s + 1] - rowPtr[s];
    for (let t = 0; t < nr; t++) rel[rows[rowPtr[s] + t]] = t;
    for (let c = f; c < superStart[s + 1]; c++) {
      for (let b = bPtr[c]; b < bPtr[c + 1]; b++) {
        const q = bucket[b];
        map[q] = valPtr[s] + (c - f) * nr + rel[rowOf[q]];
      }
    }
  }
  return map;
}
