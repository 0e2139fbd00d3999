/**
 * Sparsity pattern of the global tangent, built once per topology and reused by every Newton
 * iteration.
 *
 * Numbering: all 3 × nodeCount DOFs (DOF 3i + c is node i, direction c = x, y, z). Restrained DOFs
 * stay in the system as identity rows (diagonal 1, right-hand side 0), so every node is one 3×3
 * block and the factorisation can order on nodes. The pattern is the LOWER triangle in compressed
 * sparse columns (CSC), row indices ascending within a column, the diagonal first.
 *
 * For each element e joining nodes a and b, `slots[21e + s]` is the index into the values array of
 * the tangent entry it adds to, in this fixed order:
 *   s = 0..5   lower triangle of block (a, a), row-major (r ≥ c): (0,0) (1,0) (1,1) (2,0) (2,1) (2,2)
 *   s = 6..11  the same for block (b, b)
 *   s = 12..20 block (hi, lo) of the two nodes (hi = max(a, b), lo = min(a, b)), 3×3 row-major
 */
export interface BlockPattern {
  n: number;
  colPtr: Int32Array;
  rowIdx: Int32Array;
  /** 21 value indices per element (see above). */
  slots: Int32Array;
  /** Value index of each DOF's diagonal entry. */
  diagonal: Int32Array;
}

export const SLOTS_PER_ELEMENT = 21;

export function buildBlockPattern(nodeCount: number, elemNodes: Int32Array): BlockPattern {
  const elementCount = elemNodes.length >> 1;
  // Node adjacency (neighbours with a larger index), as sorted unique lists.
  const degree = new Int32Array(nodeCount + 1);
  for (let e = 0; e < elementCount; e++) {
    const a = elemNodes[2 * e], b = elemNodes[2 * e + 1];
    degree[Math.min(a, b)]++;
  }
  const start = new Int32Array(nodeCount + 1);
  for (let i = 0; i < nodeCount; i++) start[i + 1] = start[i] + degree[i];
  const fill = start.slice(0, nodeCount);
  const upper = new Int32Array(start[nodeCount]);
  for (let e = 0; e < elementCount; e++) {
    const a = elemNodes[2 * e], b = elemNodes[2 * e + 1];
    const lo = Math.min(a, b), hi = Math.max(a, b);
    upper[fill[lo]++] = hi;
  }
  const neighbourStart = new Int32Array(nodeCount + 1);
  const neighbours: number[] = [];
  for (let i = 0; i < nodeCount; i++) {
    const list = Array.from(upper.subarray(start[i], start[i + 1])).sort((x, y) => x - y);
    let last = -1;
    for (const j of list) if (j !== last) { neighbours.push(j); last = j; }
    neighbourStart[i + 1] = neighbours.length;
  }

  const n = 3 * nodeCount;
  const colPtr = new Int32Array(n + 1);
  for (let i = 0; i < nodeCount; i++) {
    const nb = neighbourStart[i + 1] - neighbourStart[i];
    for (let c = 0; c < 3; c++) colPtr[3 * i + c + 1] = colPtr[3 * i + c] + (3 - c) + 3 * nb;
  }
  const rowIdx = new Int32Array(colPtr[n]);
  for (let i = 0; i < nodeCount; i++) {
    for (let c = 0; c < 3; c++) {
      let p = colPtr[3 * i + c];
      for (let r = c; r < 3; r++) rowIdx[p++] = 3 * i + r;
      for (let q = neighbourStart[i]; q < neighbourStart[i + 1]; q++) {
        const j = neighbours[q];
        rowIdx[p++] = 3 * j; rowIdx[p++] = 3 * j + 1; rowIdx[p++] = 3 * j + 2;
      }
    }
  }

  const diagonal = new Int32Array(n);
  for (let d = 0; d < n; d++) diagonal[d] = colPtr[d];

  const slots = new Int32Array(SLOTS_PER_ELEMENT * elementCount);
  for (let e = 0; e < elementCount; e++) {
    const a = elemNodes[2 * e], b = elemNodes[2 * e + 1];
    const o = SLOTS_PER_ELEMENT * e;
    let s = 0;
    for (const node of [a, b]) {
      for (let r = 0; r < 3; r++) for (let c = 0; c <= r; c++) {
        slots[o + s++] = findEntry(colPtr, rowIdx, 3 * node + r, 3 * node + c);
      }
    }
    const lo = Math.min(a, b), hi = Math.max(a, b);
    for (let r = 0; r < 3; r++) for (let c = 0; c < 3; c++) {
      slots[o + s++] = findEntry(colPtr, rowIdx, 3 * hi + r, 3 * lo + c);
    }
  }
  return { n, colPtr, rowIdx, slots, diagonal };
}

function findEntry(colPtr: Int32Array, rowIdx: Int32Array, row: number, col: number): number {
  let lo = colPtr[col], hi = colPtr[col + 1] - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const r = rowIdx[mid];
    if (r === row) return mid;
    if (r < row) lo = mid + 1; else hi = mid - 1;
  }
  throw new Error(`tangent pattern has no entry (${row}, ${col}): rebuild the pattern after a topology change`);
}
