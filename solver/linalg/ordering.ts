import { adjacencyGraph, type SymmetricPattern } from './symmetric-pattern.ts';
import { approximateMinimumDegree } from './amd.ts';
import { sameClosedNeighbourhood } from './dof-groups.ts';

/**
 * Fill-reducing ordering of a symmetric pattern, returned as perm (new → old).
 *
 * With blockSize > 1 the graph is first compressed: runs of up to blockSize consecutive DOFs
 * whose closed adjacency sets {j} ∪ adj(j) are identical (the DOFs of one node in a truss
 * model) become one weighted vertex; AMD orders the weighted node graph and the order is
 * expanded back to DOFs. Identical closed adjacency makes the DOFs indistinguishable, so this
 * changes nothing but the cost of the ordering (Amestoy, Davis & Duff 1996, on
 * indistinguishable nodes). `graph` = adjacencyGraph(p), passed in when the caller has it.
 */
export function fillReducingOrdering(
  p: SymmetricPattern, method: 'amd' | 'natural', blockSize = 1,
  graph: { ptr: Int32Array; idx: Int32Array } = adjacencyGraph(p),
): Int32Array {
  const n = p.n;
  if (method === 'natural' || n === 0) {
    const perm = new Int32Array(n);
    for (let k = 0; k < n; k++) perm[k] = k;
    return perm;
  }
  const g = graph; // lists sorted ascending (adjacencyGraph)
  const groupOf = new Int32Array(n);
  const groupStart: number[] = [];
  for (let j = 0; j < n; j++) {
    const s = groupStart.length - 1;
    if (s >= 0 && j - groupStart[s] < blockSize && sameClosedNeighbourhood(g.ptr, g.idx, groupStart[s], j)) {
      groupOf[j] = s;
    } else {
      groupOf[j] = groupStart.length;
      groupStart.push(j);
    }
  }
  const m = groupStart.length;
  groupStart.push(n);
  const weight = new Int32Array(m);
  for (let s = 0; s < m; s++) weight[s] = groupStart[s + 1] - groupStart[s];
  // Quotient graph of the groups: neighbours of a group's first DOF, mapped to groups.
  const gptr = new Int32Array(m + 1);
  const gidx = new Int32Array(g.idx.length);
  const seen = new Int32Array(m).fill(-1);
  let len = 0;
  for (let s = 0; s < m; s++) {
    const j = groupStart[s];
    seen[s] = s;
    for (let q = g.ptr[j]; q < g.ptr[j + 1]; q++) {
      const t = groupOf[g.idx[q]];
      if (seen[t] !== s) { seen[t] = s; gidx[len++] = t; }
    }
    gptr[s + 1] = len;
  }
  const gperm = approximateMinimumDegree(m, gptr, gidx.subarray(0, len), weight);
  const perm = new Int32Array(n);
  let k = 0;
  for (let t = 0; t < m; t++) {
    const s = gperm[t];
    for (let j = groupStart[s]; j < groupStart[s + 1]; j++) perm[k++] = j;
  }
  return perm;
}
