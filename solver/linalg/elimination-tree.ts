/**
 * Elimination tree, postorder and column counts of L for C = LDLᵀ, from the upper triangle of C
 * in CSC form (column k holds rows i <= k; entries i > k, as in a full symmetric adjacency graph,
 * are ignored, so the graph from permuteGraph works as well). Methods: Liu's elimination-tree algorithm with path
 * compression and the row-subtree traversal for the pattern of row k of L
 * (T. A. Davis, Direct Methods for Sparse Linear Systems, SIAM 2006, ch. 4).
 */

/** parent[k] = parent of k in the elimination tree, -1 for a root. */
export function eliminationTree(n: number, ptr: Int32Array, idx: Int32Array): Int32Array {
  const parent = new Int32Array(n).fill(-1);
  const ancestor = new Int32Array(n).fill(-1);
  for (let k = 0; k < n; k++) {
    for (let q = ptr[k]; q < ptr[k + 1]; q++) {
      let i = idx[q];
      while (i !== -1 && i < k) {
        const inext = ancestor[i];
        ancestor[i] = k; // path compression
        if (inext === -1) parent[i] = k;
        i = inext;
      }
    }
  }
  return parent;
}

/**
 * Elimination tree of C = P A Pᵀ straight from the adjacency graph of A (both triangles, no
 * diagonal) and the permutation, without forming C: column k of C's upper triangle holds
 * pinv[u] for the neighbours u of perm[k] with pinv[u] < k. Same algorithm as eliminationTree.
 */
export function eliminationTreeOfPermuted(
  n: number, gptr: Int32Array, gidx: Int32Array, perm: Int32Array, pinv: Int32Array,
): Int32Array {
  const parent = new Int32Array(n).fill(-1);
  const ancestor = new Int32Array(n).fill(-1);
  for (let k = 0; k < n; k++) {
    const v = perm[k];
    for (let q = gptr[v]; q < gptr[v + 1]; q++) {
      let i = pinv[gidx[q]];
      while (i !== -1 && i < k) {
        const inext = ancestor[i];
        ancestor[i] = k;
        if (inext === -1) parent[i] = k;
        i = inext;
      }
    }
  }
  return parent;
}

/** Postorder of a forest: post[k] = node visited k-th (children before parents, in index order). */
export function postorderTree(parent: Int32Array): Int32Array {
  const n = parent.length;
  const head = new Int32Array(n).fill(-1);
  const next = new Int32Array(n);
  for (let j = n - 1; j >= 0; j--) {
    const p = parent[j];
    if (p === -1) continue;
    next[j] = head[p];
    head[p] = j;
  }
  const post = new Int32Array(n);
  const stack = new Int32Array(n);
  let k = 0;
  for (let root = 0; root < n; root++) {
    if (parent[root] !== -1) continue;
    let top = 0;
    stack[0] = root;
    while (top >= 0) {
      const p = stack[top];
      const c = head[p];
      if (c === -1) { top--; post[k++] = p; } else { head[p] = next[c]; stack[++top] = c; }
    }
  }
  return post;
}

/**
 * Column counts of L (strictly below the diagonal) by walking the row subtrees:
 * row k of L is the set of nodes reached from each i in column k of the upper triangle up
 * the tree until k. Cost O(nnz(L)).
 */
export function columnCounts(n: number, ptr: Int32Array, idx: Int32Array, parent: Int32Array): Int32Array {
  const count = new Int32Array(n);
  const flag = new Int32Array(n).fill(-1);
  for (let k = 0; k < n; k++) {
    flag[k] = k;
    for (let q = ptr[k]; q < ptr[k + 1]; q++) {
      let i = idx[q];
      while (i < k && flag[i] !== k) {
        count[i]++;
        flag[i] = k;
        i = parent[i];
      }
    }
  }
  return count;
}
