import { adjacencyGraph, type SymmetricPattern } from './symmetric-pattern.ts';
import { approximateMinimumDegree } from './amd.ts';

/**
 * Fill-reducing ordering of a symmetric pattern, returned as perm (new → old).
 *
 * With blockSize > 1 the graph is first compressed: runs of up to blockSize consecutive DOFs
 * whose closed adjacency sets {j} ∪ adj(j) are identical (the DOFs of one node in a truss
 * model) become one weighted vertex; AMD orders the weighted node graph and the order is
 * expanded back to DOFs. Identical closed adjacency makes the DOFs indistinguishable, so this
 * changes nothing but the cost of the ordering (Amestoy, Davis & Duff 1996, §2 on
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
  const gidx: number[] = [];
  const seen = new Int32Array(m).fill(-1);
  for (let s = 0; s < m; s++) {
    const j = groupStart[s];
    seen[s] = s;
    for (let q = g.ptr[j]; q < g.ptr[j + 1]; q++) {
      const t = groupOf[g.idx[q]];
      if (seen[t] !== s) { seen[t] = s; gidx.push(t); }
    }
    gptr[s + 1] = gidx.length;
  }
  const gperm = approximateMinimumDegree(m, gptr, Int32Array.from(gidx), weight);
  const perm = new Int32Array(n);
  let k = 0;
  for (let t = 0; t < m; t++) {
    const s = gperm[t];
    for (let j = groupStart[s]; j < groupStart[s + 1]; j++) perm[k++] = j;
  }
  return perm;
}

/** True when {a} ∪ adj(a) equals {b} ∪ adj(b), with adjacency lists sorted ascending. */
function sameClosedNeighbourhood(ptr: Int32Array, idx: Int32Array, a: number, b: number): boolean {
  // Both closed sets have the same size iff the open lists have the same length (a ∈ adj(b) required).
  if (ptr[a + 1] - ptr[a] !== ptr[b + 1] - ptr[b]) return false;
  let qa = ptr[a], qb = ptr[b];
  const ea = ptr[a + 1], eb = ptr[b + 1];
  // Merge-walk the sets adj(a) ∪ {a} and adj(b) ∪ {b}.
  let insA = false, insB = false;
  for (;;) {
    let va: number, vb: number;
    if (!insA && (qa >= ea || idx[qa] > a)) { va = a; } else va = qa < ea ? idx[qa] : -1;
    if (!insB && (qb >= eb || idx[qb] > b)) { vb = b; } else vb = qb < eb ? idx[qb] : -1;
    if (va === -1 && vb === -1) return true;
    if (va !== vb) return false;
    if (va === a && !insA) insA = true; else qa++;
    if (vb === b && !insB) insB = true; else qb++;
  }
}
