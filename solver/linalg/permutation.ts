/**
 * Permutations. Convention: perm[k] = old index placed at new position k ("new → old");
 * pinv[old] = k ("old → new"). The permuted matrix is C = P A Pᵀ with C[k, m] = A[perm[k], perm[m]].
 */

/** Throws unless perm is a permutation of 0..n-1. */
export function validatePermutation(perm: ArrayLike<number>, n: number): void {
  if (perm.length !== n) throw new Error(`permutation: expected ${n} entries, got ${perm.length}`);
  const seen = new Uint8Array(n);
  for (let k = 0; k < n; k++) {
    const v = perm[k];
    if (!Number.isInteger(v) || v < 0 || v >= n) throw new Error(`permutation: entry ${k} = ${v} is outside 0..${n - 1}`);
    if (seen[v]) throw new Error(`permutation: index ${v} appears twice`);
    seen[v] = 1;
  }
}

/** pinv[perm[k]] = k. */
export function invertPermutation(perm: Int32Array): Int32Array {
  const pinv = new Int32Array(perm.length);
  for (let k = 0; k < perm.length; k++) pinv[perm[k]] = k;
  return pinv;
}

/** perm ∘ inner: result[k] = perm[inner[k]] (apply `inner` to the already permuted numbering). */
export function composePermutations(perm: Int32Array, inner: Int32Array): Int32Array {
  const out = new Int32Array(perm.length);
  for (let k = 0; k < perm.length; k++) out[k] = perm[inner[k]];
  return out;
}

/**
 * Adjacency graph relabelled by a permutation: column k lists pinv[u] for every neighbour u of
 * perm[k] (both triangles of C = P A Pᵀ, no diagonal, unsorted). The symbolic routines read the
 * entries below (i > k) or above (i < k) the diagonal from it without forming C.
 */
export function permuteGraph(
  ptr: Int32Array, idx: Int32Array, perm: Int32Array, pinv: Int32Array,
): { ptr: Int32Array; idx: Int32Array } {
  const n = perm.length;
  const p2 = new Int32Array(n + 1);
  const i2 = new Int32Array(ptr[n]);
  let len = 0;
  for (let k = 0; k < n; k++) {
    const v = perm[k];
    for (let q = ptr[v]; q < ptr[v + 1]; q++) i2[len++] = pinv[idx[q]];
    p2[k + 1] = len;
  }
  return { ptr: p2, idx: i2 };
}
