/**
 * Sparsity pattern of a symmetric matrix, stored as its LOWER triangle in compressed sparse
 * column (CSC) form.
 *
 * Layout: column j owns rowIdx[colPtr[j] .. colPtr[j+1]-1]; row indices are sorted ascending
 * within each column, every row index is >= j, and the diagonal (row j) is present and first.
 * Values that belong to a pattern are a Float64Array aligned with rowIdx.
 */
export interface SymmetricPattern {
  /** Order of the matrix. */
  n: number;
  /** Column pointers, length n + 1, colPtr[0] = 0. */
  colPtr: Int32Array;
  /** Row indices of the lower triangle, length colPtr[n]. */
  rowIdx: Int32Array;
}

/** Throws a clear error when the pattern breaks one of the SymmetricPattern rules. */
export function validatePattern(p: SymmetricPattern): void {
  const { n, colPtr, rowIdx } = p;
  if (!Number.isInteger(n) || n < 0) throw new Error(`pattern: n must be a non-negative integer, got ${n}`);
  if (colPtr.length !== n + 1) throw new Error(`pattern: colPtr must have n + 1 = ${n + 1} entries, has ${colPtr.length}`);
  if (colPtr[0] !== 0) throw new Error('pattern: colPtr[0] must be 0');
  if (colPtr[n] !== rowIdx.length) {
    throw new Error(`pattern: colPtr[n] = ${colPtr[n]} but rowIdx has ${rowIdx.length} entries`);
  }
  for (let j = 0; j < n; j++) {
    const a = colPtr[j], b = colPtr[j + 1];
    if (b <= a) throw new Error(`pattern: column ${j} is empty (the diagonal must be present)`);
    if (rowIdx[a] !== j) throw new Error(`pattern: column ${j} must start with its diagonal, starts with row ${rowIdx[a]}`);
    for (let q = a + 1; q < b; q++) {
      const i = rowIdx[q];
      if (i >= n) throw new Error(`pattern: column ${j} has row ${i} outside 0..${n - 1}`);
      if (i <= rowIdx[q - 1]) throw new Error(`pattern: column ${j} rows are not strictly ascending at entry ${q}`);
    }
  }
}

/**
 * Builds the lower-triangle pattern from coordinate lists (any triangle, duplicates allowed).
 * Each pair (rows[k], cols[k]) is mapped to the lower triangle; the diagonal is always added.
 * Returns the pattern and `slot[k]`, the index in rowIdx/values of coordinate entry k, so an
 * assembler can add its contributions with `values[slot[k]] += v[k]`.
 */
export function patternFromCoordinates(
  n: number, rows: ArrayLike<number>, cols: ArrayLike<number>,
): { pattern: SymmetricPattern; slot: Int32Array } {
  if (rows.length !== cols.length) throw new Error(`pattern: ${rows.length} row indices but ${cols.length} column indices`);
  const m = rows.length;
  const count = new Int32Array(n + 1);
  for (let k = 0; k < m; k++) {
    const i = rows[k], j = cols[k];
    if (!(Number.isInteger(i) && Number.isInteger(j) && i >= 0 && j >= 0 && i < n && j < n)) {
      throw new Error(`pattern: entry ${k} (${i}, ${j}) is outside the ${n}×${n} matrix`);
    }
    count[Math.min(i, j)]++;
  }
  // Bucket by column (diagonal included once per column), then sort and deduplicate.
  const start = new Int32Array(n + 1);
  for (let j = 0; j < n; j++) start[j + 1] = start[j] + count[j] + 1;
  const fill = start.slice(0, n);
  const tmpRow = new Int32Array(start[n]);
  for (let j = 0; j < n; j++) tmpRow[fill[j]++] = j;
  for (let k = 0; k < m; k++) {
    const i = rows[k], j = cols[k];
    const c = Math.min(i, j);
    tmpRow[fill[c]++] = Math.max(i, j);
  }
  const colPtr = new Int32Array(n + 1);
  const out: number[] = [];
  for (let j = 0; j < n; j++) {
    const seg = tmpRow.subarray(start[j], start[j + 1]).sort();
    let last = -1;
    for (let q = 0; q < seg.length; q++) if (seg[q] !== last) { out.push(seg[q]); last = seg[q]; }
    colPtr[j + 1] = out.length;
  }
  const pattern: SymmetricPattern = { n, colPtr, rowIdx: Int32Array.from(out) };
  const slot = new Int32Array(m);
  for (let k = 0; k < m; k++) {
    const i = rows[k], j = cols[k];
    slot[k] = findEntry(pattern, Math.max(i, j), Math.min(i, j));
  }
  return { pattern, slot };
}

/** Index in rowIdx of entry (i, j) of the lower triangle (i >= j), or -1 if absent. Binary search. */
export function findEntry(p: SymmetricPattern, i: number, j: number): number {
  if (i < j) { const t = i; i = j; j = t; }
  let lo = p.colPtr[j], hi = p.colPtr[j + 1] - 1;
  const r = p.rowIdx;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const v = r[mid];
    if (v === i) return mid;
    if (v < i) lo = mid + 1; else hi = mid - 1;
  }
  return -1;
}

/**
 * Adjacency graph of the full symmetric pattern without the diagonal, in CSC form
 * (both triangles: j appears in column i and i in column j). Used by the orderings.
 * Each list comes out sorted ascending: vertex v first receives the columns j < v that hold it
 * (in increasing j), then its own lower entries (rows > v, already ascending).
 */
export function adjacencyGraph(p: SymmetricPattern): { ptr: Int32Array; idx: Int32Array } {
  const { n, colPtr, rowIdx } = p;
  const deg = new Int32Array(n);
  for (let j = 0; j < n; j++) {
    for (let q = colPtr[j]; q < colPtr[j + 1]; q++) {
      const i = rowIdx[q];
      if (i !== j) { deg[i]++; deg[j]++; }
    }
  }
  const ptr = new Int32Array(n + 1);
  for (let j = 0; j < n; j++) ptr[j + 1] = ptr[j] + deg[j];
  const next = ptr.slice(0, n);
  const idx = new Int32Array(ptr[n]);
  for (let j = 0; j < n; j++) {
    for (let q = colPtr[j]; q < colPtr[j + 1]; q++) {
      const i = rowIdx[q];
      if (i !== j) { idx[next[i]++] = j; idx[next[j]++] = i; }
    }
  }
  return { ptr, idx };
}

/** y = K x for a symmetric K given by its lower triangle (pattern + values). y must not alias x. */
export function symmetricMultiply(p: SymmetricPattern, values: Float64Array, x: Float64Array, y: Float64Array): void {
  const { n, colPtr, rowIdx } = p;
  y.fill(0, 0, n);
  for (let j = 0; j < n; j++) {
    const xj = x[j];
    let s = 0;
    for (let q = colPtr[j]; q < colPtr[j + 1]; q++) {
      const i = rowIdx[q], v = values[q];
      if (i === j) { s += v * xj; continue; }
      y[i] += v * xj;
      s += v * x[i];
    }
    y[j] += s;
  }
}
