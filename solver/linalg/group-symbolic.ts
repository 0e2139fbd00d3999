/**
 * Elimination tree and column counts on the group graph (dof-groups.ts), and their expansion to
 * DOFs. With group weights w, the DOF columns of group J (eliminated in a row) have the other
 * DOFs of J after them plus every DOF of the groups in the structure of J below it:
 *   count(J, t) = (w_J − 1 − t) + Σ_{K ∈ struct(J)} w_K,   t = 0 … w_J − 1,
 * so nnz(L) (diagonal included) = Σ_J w_J (w_J + 1) / 2 + w_J · Σ_{K ∈ struct(J)} w_K.
 * Methods as in elimination-tree.ts (Davis 2006, ch. 4), on the smaller graph.
 */
import { invertPermutation, permuteGraph } from './permutation.ts';
import { eliminationTree } from './elimination-tree.ts';

/** Σ_{K ∈ struct(J)} w_K for every column J of the permuted graph (row-subtree walk, O(nnz(L_groups))). */
export function weightedColumnCounts(m: number, ptr: Int32Array, idx: Int32Array, parent: Int32Array, w: Int32Array): Float64Array {
  const count = new Float64Array(m);
  const flag = new Int32Array(m).fill(-1);
  for (let k = 0; k < m; k++) {
    flag[k] = k;
    const wk = w[k];
    for (let q = ptr[k]; q < ptr[k + 1]; q++) {
      let i = idx[q];
      while (i < k && flag[i] !== k) {
        count[i] += wk;
        flag[i] = k;
        i = parent[i];
      }
    }
  }
  return count;
}

export interface GroupSymbolic {
  /** Permuted group graph (both triangles), its elimination tree and weighted counts. */
  ptr: Int32Array;
  idx: Int32Array;
  parent: Int32Array;
  counts: Float64Array;
  /** Group weights in the permuted order. */
  w: Int32Array;
  /** nnz(L) in DOFs, diagonal included. */
  factorNonzeros: number;
}

/** Symbolic analysis of the group graph under `order` (new → old). */
export function groupSymbolic(m: number, ptr: Int32Array, idx: Int32Array, weight: Int32Array, order: Int32Array): GroupSymbolic {
  const pinv = invertPermutation(order);
  const pg = permuteGraph(ptr, idx, order, pinv);
  const parent = eliminationTree(m, pg.ptr, pg.idx);
  const w = new Int32Array(m);
  for (let k = 0; k < m; k++) w[k] = weight[order[k]];
  const counts = weightedColumnCounts(m, pg.ptr, pg.idx, parent, w);
  let nnz = 0;
  for (let k = 0; k < m; k++) nnz += (w[k] * (w[k] + 1)) / 2 + w[k] * counts[k];
  return { ptr: pg.ptr, idx: pg.idx, parent, counts, w, factorNonzeros: nnz };
}

/**
 * DOF-level permutation, elimination tree and below-diagonal column counts from a group-level
 * analysis under `order`: perm lists the DOFs of order[0], then of order[1], …; first[J] is the
 * first permuted DOF of permuted group J (first[m] = n).
 */
export function expandToDofs(
  n: number, groupStart: Int32Array, order: Int32Array, sym: GroupSymbolic,
): { perm: Int32Array; parent: Int32Array; counts: Int32Array; first: Int32Array } {
  const m = order.length;
  const perm = new Int32Array(n), parent = new Int32Array(n), counts = new Int32Array(n);
  const first = new Int32Array(m + 1); // first permuted DOF of each permuted group; first[m] = n
  let k = 0;
  for (let J = 0; J < m; J++) {
    first[J] = k;
    const g = order[J];
    for (let d = groupStart[g]; d < groupStart[g + 1]; d++) perm[k++] = d;
  }
  for (let J = 0; J < m; J++) {
    const w = sym.w[J], f = first[J], below = sym.counts[J], p = sym.parent[J];
    for (let t = 0; t < w; t++) {
      parent[f + t] = t < w - 1 ? f + t + 1 : p < 0 ? -1 : first[p];
      counts[f + t] = w - 1 - t + below;
    }
  }
  first[m] = n;
  return { perm, parent, counts, first };
}
