import { supernodePartition } from './supernode-partition.ts';

/**
 * Symbolic analysis for the supernodal LDLᵀ: supernode partition, row structure of each
 * supernode, storage offsets and the scatter plan of A's values into L's storage.
 *
 * Input is the permuted matrix C = P A Pᵀ with P including a postorder of the elimination tree,
 * so the columns of every subtree are contiguous and children precede parents.
 * Supernodes come from supernodePartition (fundamental supernodes, optionally relaxed). Within a
 * supernode the structures of the columns are nested, so its rows are its columns plus the
 * structure of its last column below the block; relaxed supernodes store explicit zeros.
 * Row structure: Struct(s) = {f..l−1} ∪ rows ≥ l of A(:, f..l−1) ∪ Struct(children) ∩ [l, n)
 * (Davis 2006, ch. 4: the pattern of L(:,j) is A's column plus the children's patterns),
 * found on DOF groups and expanded (PermutedGroups).
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
 * The graph the row structure is built on: DOF groups (dof-groups.ts) in the permuted order,
 * group J holding the permuted DOF columns first[J] .. first[J + 1] − 1 (every supernode boundary
 * is a group boundary, since a group's DOFs always form one chain of equal structure), and the
 * permuted group adjacency ptr/idx (both triangles, any order, no diagonal). With one DOF per
 * group this is the DOF graph itself (identityGroups).
 */
export interface PermutedGroups {
  m: number;
  first: Int32Array;
  ptr: Int32Array;
  idx: Int32Array;
}

/** One group per DOF: the permuted DOF adjacency (permuteGraph) as PermutedGroups. */
export function identityGroups(n: number, ptr: Int32Array, idx: Int32Array): PermutedGroups {
  return { m: n, first: Int32Array.from({ length: n + 1 }, (_, k) => k), ptr, idx };
}

/**
 * parent/colCount: elimination tree and below-diagonal column counts of C (DOF level);
 * groups: the permuted group graph (see PermutedGroups). The row structure is found per
 * supernode on groups (a third or a sixth of the entries for 3- and 6-DOF nodes) and expanded.
 */
export function supernodalStructure(
  n: number, groups: PermutedGroups, parent: Int32Array, colCount: Int32Array, relax = true,
): SupernodalStructure {
  // Each step is its own function: the compiled code of a step does not meet the next one's
  // loops without type feedback (one-call functions with several long loops deoptimise at each).
  const superStart = supernodePartition(n, parent, colCount, relax);
  const nsuper = superStart.length - 1;
  const colToSuper = columnOwners(n, superStart);
  const groupAt = columnOwners(n, groups.first); // permuted DOF → permuted group
  const children = supernodeChildren(nsuper, superStart, parent, colToSuper);
  // A supernode's rows are those of its first column (its columns' structures are nested).
  const rowPtr = new Int32Array(nsuper + 1);
  for (let s = 0; s < nsuper; s++) {
    const f = superStart[s], l = superStart[s + 1];
    rowPtr[s + 1] = rowPtr[s] + (l - f) + colCount[l - 1];
  }
  const rows = supernodeRows(superStart, rowPtr, groups, groupAt, children);
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

/** owner[j] = k for start[k] ≤ j < start[k + 1] (start ascending, last entry n). */
function columnOwners(n: number, start: Int32Array): Int32Array {
  const owner = new Int32Array(n);
  for (let k = 0; k + 1 < start.length; k++) for (let j = start[k]; j < start[k + 1]; j++) owner[j] = k;
  return owner;
}

/** Children lists of the supernode tree (head[s], next[c]; -1 ends a list). */
function supernodeChildren(
  nsuper: number, superStart: Int32Array, parent: Int32Array, colToSuper: Int32Array,
): { head: Int32Array; next: Int32Array } {
  const head = new Int32Array(nsuper).fill(-1);
  const next = new Int32Array(nsuper).fill(-1);
  for (let s = nsuper - 1; s >= 0; s--) {
    const p = parent[superStart[s + 1] - 1];
    if (p === -1) continue;
    const ps = colToSuper[p];
    next[s] = head[ps];
    head[ps] = s;
  }
  return { head, next };
}

/**
 * Row lists of the supernodes: own columns, then (on groups) the groups of A's entries below the
 * supernode's groups and of its children's rows, sorted and expanded to DOFs.
 */
function supernodeRows(
  superStart: Int32Array, rowPtr: Int32Array, groups: PermutedGroups, groupAt: Int32Array,
  children: { head: Int32Array; next: Int32Array },
): Int32Array {
  const nsuper = superStart.length - 1;
  const { m, first, ptr: gPtr, idx: gIdx } = groups;
  const { head: childHead, next: childNext } = children;
  const rows = new Int32Array(rowPtr[nsuper]);
  const gRowPtr = new Int32Array(nsuper + 1);
  const gRows = new Int32Array(rowPtr[nsuper]); // group rows below each supernode (≤ its DOF rows)
  const mark = new Int32Array(m).fill(-1);
  for (let s = 0; s < nsuper; s++) {
    const f = superStart[s], l = superStart[s + 1];
    const gs = groupAt[f], ge = groupAt[l - 1];
    for (let J = gs; J <= ge; J++) mark[J] = s;
    const g0 = gRowPtr[s];
    let len = g0;
    for (let J = gs; J <= ge; J++) {
      for (let q = gPtr[J]; q < gPtr[J + 1]; q++) {
        const I = gIdx[q];
        if (I > ge && mark[I] !== s) { mark[I] = s; gRows[len++] = I; } // rows below the diagonal block
      }
    }
    for (let c = childHead[s]; c !== -1; c = childNext[c]) {
      for (let q = gRowPtr[c]; q < gRowPtr[c + 1]; q++) {
        const I = gRows[q];
        if (I > ge && mark[I] !== s) { mark[I] = s; gRows[len++] = I; }
      }
    }
    sortRange(gRows, g0, len);
    gRowPtr[s + 1] = len;
    let dofs = l - f;
    for (let q = g0; q < len; q++) dofs += first[gRows[q] + 1] - first[gRows[q]];
    if (dofs !== rowPtr[s + 1] - rowPtr[s]) {
      throw new Error(`supernodal analysis: supernode ${s} has ${dofs} rows, column counts say ${rowPtr[s + 1] - rowPtr[s]}`);
    }
    let r = rowPtr[s];
    for (let j = f; j < l; j++) rows[r++] = j;
    for (let q = g0; q < len; q++) for (let d = first[gRows[q]]; d < first[gRows[q] + 1]; d++) rows[r++] = d;
  }
  return rows;
}

/**
 * Where A's values go in the supernodal storage: value src[t] of the pattern (original lower
 * entry q = src[t]) is written to storage position pos[t]; supernode s owns t in
 * superPtr[s] .. superPtr[s + 1] − 1 (entries in column order, so a supernode's block is filled
 * front to back). Entry (i, j) goes to row max(pinv i, pinv j), column min(...).
 */
export interface ScatterPlan {
  src: Int32Array;
  pos: Int32Array;
  superPtr: Int32Array;
}

export function supernodalScatter(
  st: SupernodalStructure, colPtr: Int32Array, rowIdx: Int32Array, pinv: Int32Array,
): ScatterPlan {
  const { n, nsuper, superStart, rowPtr, rows, valPtr } = st;
  const nz = colPtr[n];
  const bPtr = new Int32Array(n + 1);
  const src = new Int32Array(nz);
  const pos = new Int32Array(nz); // first the permuted row, then the storage position
  bucketByPermutedColumn(n, colPtr, rowIdx, pinv, bPtr, src, pos);
  const rel = new Int32Array(n);
  const superPtr = new Int32Array(nsuper + 1);
  for (let s = 0; s < nsuper; s++) {
    const f = superStart[s], nr = rowPtr[s + 1] - rowPtr[s];
    for (let t = 0; t < nr; t++) rel[rows[rowPtr[s] + t]] = t;
    for (let c = f; c < superStart[s + 1]; c++) {
      const colBase = valPtr[s] + (c - f) * nr;
      for (let t = bPtr[c]; t < bPtr[c + 1]; t++) pos[t] = colBase + rel[pos[t]];
    }
    superPtr[s + 1] = bPtr[superStart[s + 1]];
  }
  return { src, pos, superPtr };
}

/**
 * Counting sort of A's lower entries by permuted column c = min(pinv i, pinv j): bucket c is
 * src[bPtr[c] .. bPtr[c + 1] − 1] (original entry indices), with the permuted row
 * max(pinv i, pinv j) of each in row[] at the same place.
 */
function bucketByPermutedColumn(
  n: number, colPtr: Int32Array, rowIdx: Int32Array, pinv: Int32Array, bPtr: Int32Array, src: Int32Array, row: Int32Array,
): void {
  for (let j = 0; j < n; j++) {
    const b = pinv[j];
    for (let q = colPtr[j]; q < colPtr[j + 1]; q++) {
      const a = pinv[rowIdx[q]];
      bPtr[(a < b ? a : b) + 1]++;
    }
  }
  for (let j = 0; j < n; j++) bPtr[j + 1] += bPtr[j];
  const next = bPtr.slice(0, n);
  for (let j = 0; j < n; j++) {
    const b = pinv[j];
    for (let q = colPtr[j]; q < colPtr[j + 1]; q++) {
      const a = pinv[rowIdx[q]];
      const t = next[a < b ? a : b]++;
      src[t] = q;
      row[t] = a < b ? b : a;
    }
  }
}

/** Sorts a[lo .. hi − 1] ascending: insertion sort for short runs (most supernodes), else native. */
function sortRange(a: Int32Array, lo: number, hi: number): void {
  if (hi - lo > 24) { a.subarray(lo, hi).sort(); return; }
  for (let i = lo + 1; i < hi; i++) {
    const v = a[i];
    let j = i - 1;
    while (j >= lo && a[j] > v) { a[j + 1] = a[j]; j--; }
    a[j + 1] = v;
  }
}
