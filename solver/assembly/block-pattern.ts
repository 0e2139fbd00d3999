/**
 * Sparsity pattern of the global tangent, built once per topology from the element DOF lists of
 * every family present, and reused by every Newton iteration.
 *
 * Numbering: the DOF map's (solver/model/dof-map.ts). Restrained DOFs stay in the system as
 * identity rows (diagonal 1, right-hand side 0). The pattern is the LOWER triangle in compressed
 * sparse columns (CSC), row indices ascending within a column, the diagonal first; every DOF has
 * its diagonal entry.
 *
 * For each family block, `slots[b][S·k + s]` (S = n(n+1)/2 for n DOFs per element) is the index
 * into the values array of the entry that local pair s = (p, q ≤ p) of element k adds to — the
 * global entry (max(d_p, d_q), min(d_p, d_q)) — in row-major lower-triangle order
 * (0,0) (1,0) (1,1) (2,0) …; -1 where either DOF is absent.
 */
import { slotsPerElement } from '../elements/family.ts';

export interface BlockPattern {
  n: number;
  colPtr: Int32Array;
  rowIdx: Int32Array;
  /** Per family block, the value index of each element's local lower-triangle pairs. */
  slots: Int32Array[];
  /** Value index of each DOF's diagonal entry. */
  diagonal: Int32Array;
}

export interface ElementDofLists {
  dofsPerElement: number;
  /** dofsPerElement global DOFs per element, -1 = absent. */
  elementDofs: Int32Array;
}

export function buildBlockPattern(dofCount: number, blocks: readonly ElementDofLists[]): BlockPattern {
  const n = dofCount;
  // Count (row ≥ col) pairs per column, diagonal included once per DOF.
  const count = new Int32Array(n + 1);
  for (let j = 0; j < n; j++) count[j] = 1;
  forEachPair(blocks, (r, c) => { if (r !== c) count[c]++; });
  const start = new Int32Array(n + 1);
  for (let j = 0; j < n; j++) start[j + 1] = start[j] + count[j];
  const rows = new Int32Array(start[n]);
  const fill = start.slice(0, n);
  for (let j = 0; j < n; j++) rows[fill[j]++] = j;
  forEachPair(blocks, (r, c) => { if (r !== c) rows[fill[c]++] = r; });

  // Sort and deduplicate each column (the diagonal is the smallest row, so it comes first).
  const colPtr = new Int32Array(n + 1);
  let len = 0;
  for (let j = 0; j < n; j++) {
    const col = rows.subarray(start[j], start[j + 1]).sort();
    let last = -1;
    for (let q = 0; q < col.length; q++) if (col[q] !== last) { last = col[q]; rows[len++] = last; }
    colPtr[j + 1] = len;
  }
  const rowIdx = rows.slice(0, len);
  const diagonal = new Int32Array(n);
  for (let d = 0; d < n; d++) diagonal[d] = colPtr[d];

  const slots = blocks.map((b) => {
    const m = b.dofsPerElement;
    const elements = b.elementDofs.length / m;
    const s = new Int32Array(slotsPerElement(m) * elements);
    let o = 0;
    for (let e = 0; e < elements; e++) {
      const base = m * e;
      for (let p = 0; p < m; p++) {
        const dp = b.elementDofs[base + p];
        for (let q = 0; q <= p; q++) {
          const dq = b.elementDofs[base + q];
          s[o++] = dp < 0 || dq < 0 ? -1 : findEntry(colPtr, rowIdx, Math.max(dp, dq), Math.min(dp, dq));
        }
      }
    }
    return s;
  });
  return { n, colPtr, rowIdx, slots, diagonal };
}

function forEachPair(blocks: readonly ElementDofLists[], visit: (row: number, col: number) => void): void {
  for (const b of blocks) {
    const m = b.dofsPerElement, dofs = b.elementDofs;
    for (let base = 0; base < dofs.length; base += m) {
      for (let p = 0; p < m; p++) {
        const dp = dofs[base + p];
        if (dp < 0) continue;
        for (let q = 0; q < p; q++) {
          const dq = dofs[base + q];
          if (dq < 0) continue;
          if (dp > dq) visit(dp, dq); else visit(dq, dp);
        }
      }
    }
  }
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
