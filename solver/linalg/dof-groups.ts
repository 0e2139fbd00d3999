/**
 * The graph the orderings and the symbolic analysis work on: groups of DOFs instead of DOFs.
 *
 * A group is a run of consecutive DOFs of one node (block) whose closed adjacency sets
 * {j} ∪ adj(j) are identical — the 3 translations of a truss node, or the 6 DOFs of a beam node,
 * minus any DOF decoupled from the rest (a restrained DOF kept as an identity row is its own
 * group). DOFs of a group are indistinguishable in the elimination (Amestoy, Davis & Duff 1996;
 * George & Liu 1981 on indistinguishable nodes): they are eliminated together, their columns of L
 * form a dense triangle over one shared structure. So ordering, elimination tree and column
 * counts are computed once per group, with the group's DOF count as its weight, and expanded.
 *
 * Blocks: blockStart[b] = first DOF of node b (ascending, blockStart[last] = n); any DOF count
 * per node (3 or 6 in structural models). Groups never cross a block boundary.
 */
export interface DofGroups {
  /** Number of groups. */
  m: number;
  /** DOFs of group g: start[g] .. start[g + 1] − 1 (length m + 1). */
  start: Int32Array;
  /** DOFs per group. */
  weight: Int32Array;
  /** Group adjacency (both directions, no self loops). */
  ptr: Int32Array;
  idx: Int32Array;
}

/** blockStart for nodes of `size` DOFs each (n a multiple of size, else a shorter last block). */
export function uniformBlocks(n: number, size: number): Int32Array {
  const nb = Math.ceil(n / size);
  const out = new Int32Array(nb + 1);
  for (let b = 0; b <= nb; b++) out[b] = Math.min(n, b * size);
  return out;
}

export function validateBlocks(n: number, blockStart: ArrayLike<number>): void {
  const nb = blockStart.length - 1;
  if (nb < 0 || blockStart[0] !== 0 || blockStart[nb] !== n) {
    throw new Error(`SparseLDL: blockStart must run from 0 to n = ${n} (got ${blockStart[0]} … ${blockStart[nb]})`);
  }
  for (let b = 0; b < nb; b++) {
    if (!(blockStart[b + 1] > blockStart[b])) throw new Error(`SparseLDL: blockStart must be strictly ascending (block ${b})`);
  }
}

/** graph: DOF adjacency with every list sorted ascending (adjacencyGraph). */
export function groupDofs(n: number, graph: { ptr: Int32Array; idx: Int32Array }, blockStart: ArrayLike<number>): DofGroups {
  const { ptr, idx } = graph;
  const groupOf = new Int32Array(n);
  const starts: number[] = [];
  let block = 0;
  for (let j = 0; j < n; j++) {
    const newBlock = j === blockStart[block];
    if (newBlock) block++;
    const s = starts.length - 1;
    if (!newBlock && s >= 0 && sameClosedNeighbourhood(ptr, idx, starts[s], j)) groupOf[j] = s;
    else { groupOf[j] = starts.length; starts.push(j); }
  }
  const m = starts.length;
  starts.push(n);
  const start = Int32Array.from(starts);
  const weight = new Int32Array(m);
  for (let g = 0; g < m; g++) weight[g] = start[g + 1] - start[g];
  // Quotient graph: the neighbours of a group's first DOF, mapped to groups.
  const gptr = new Int32Array(m + 1);
  const gidx = new Int32Array(idx.length);
  const seen = new Int32Array(m).fill(-1);
  let len = 0;
  for (let g = 0; g < m; g++) {
    const j = start[g];
    seen[g] = g;
    for (let q = ptr[j]; q < ptr[j + 1]; q++) {
      const t = groupOf[idx[q]];
      if (seen[t] !== g) { seen[t] = g; gidx[len++] = t; }
    }
    gptr[g + 1] = len;
  }
  return { m, start, weight, ptr: gptr, idx: gidx.slice(0, len) };
}

/**
 * True when {a} ∪ adj(a) equals {b} ∪ adj(b) (a != b, lists sorted ascending, no self loops):
 * b ∈ adj(a) and adj(a) \ {b} = adj(b) \ {a}.
 */
export function sameClosedNeighbourhood(ptr: Int32Array, idx: Int32Array, a: number, b: number): boolean {
  const ea = ptr[a + 1], eb = ptr[b + 1];
  if (ea - ptr[a] !== eb - ptr[b]) return false;
  let qa = ptr[a], qb = ptr[b];
  let sawB = false;
  for (;;) {
    if (qa < ea && idx[qa] === b) { qa++; sawB = true; continue; }
    if (qb < eb && idx[qb] === a) { qb++; continue; }
    if (qa >= ea || qb >= eb) return sawB && qa >= ea && qb >= eb;
    if (idx[qa] !== idx[qb]) return false;
    qa++; qb++;
  }
}
