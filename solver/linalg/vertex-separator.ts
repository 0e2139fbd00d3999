/**
 * A small vertex separator of a connected (sub)graph, for nested dissection.
 *
 * 1. Level structures (George & Liu, Computer Solution of Large Sparse Positive Definite
 *    Systems, Prentice-Hall 1981, ch. 8; A. George, "Nested dissection of a regular finite element
 *    mesh", SIAM J. Numer. Anal. 10(2), 1973): breadth-first levels from a pseudo-peripheral
 *    vertex (found by the George–Liu iteration: restart from a vertex of the last level while the
 *    eccentricity grows). Every level is a separator of the levels before it from those after it.
 *    Levels of both ends of the pseudo-diameter are tried; the level with the least
 *    separator weight × total² / (weight before × weight after) is taken (small and balanced).
 * 2. Refinement in the spirit of Fiduccia & Mattheyses ("A linear-time heuristic for improving
 *    network partitions", 19th Design Automation Conference, 1982), for vertex separators:
 *    a separator vertex s may move into side A when its neighbours in B move into the separator
 *    (gain w(s) − w(N(s) ∩ B)), and likewise into B; moves with positive gain, or zero gain that
 *    improves the balance, are made greedily, pass after pass, while the lighter side keeps at
 *    least MIN_SHARE of the weight; as in FM, a vertex moves at most once per pass. No hill climbing.
 *
 * Graph: adjacency ptr/idx (both directions, no self loops), vertex weights. The subgraph is the
 * vertices `verts` with part[v] === id; the result is written into side[v] (0 = A, 1 = B,
 * 2 = separator) for those vertices.
 */

/** Least share of the non-separator weight the lighter side keeps during refinement. */
const MIN_SHARE = 0.3;
const MAX_PASSES = 8;
/** Restarts of the George–Liu iteration (it usually settles after one or two). */
const PSEUDO_PERIPHERAL_RESTARTS = 3;

export interface SeparatorScratch {
  dist: Int32Array;
  queue: Int32Array;
  /** Refinement: stamp of the last pass in which the vertex moved (each moves once per pass). */
  locked: Int32Array;
  pass: number;
}

export function createSeparatorScratch(m: number): SeparatorScratch {
  return { dist: new Int32Array(m).fill(-1), queue: new Int32Array(m), locked: new Int32Array(m), pass: 0 };
}

/** BFS from root inside the part; returns the number of levels; queue holds the visit order. */
function levels(root: number, ptr: Int32Array, idx: Int32Array, part: Int32Array, id: number, s: SeparatorScratch, count: number): number {
  const { dist, queue } = s;
  for (let k = 0; k < count; k++) dist[queue[k]] = -1; // reset the previous BFS over the same part
  let head = 0, tail = 0;
  queue[tail++] = root;
  dist[root] = 0;
  let depth = 0;
  while (head < tail) {
    const v = queue[head++];
    const d = dist[v];
    if (d > depth) depth = d;
    for (let q = ptr[v]; q < ptr[v + 1]; q++) {
      const u = idx[q];
      if (part[u] === id && dist[u] < 0) { dist[u] = d + 1; queue[tail++] = u; }
    }
  }
  return depth + 1;
}

function degreeIn(v: number, ptr: Int32Array, idx: Int32Array, part: Int32Array, id: number): number {
  let d = 0;
  for (let q = ptr[v]; q < ptr[v + 1]; q++) if (part[idx[q]] === id) d++;
  return d;
}

/** Best level of the structure now in scratch: [level, cost]. */
function bestLevel(nLevels: number, weight: Int32Array, s: SeparatorScratch, count: number, total: number): [number, number] {
  const lw = new Float64Array(nLevels);
  for (let k = 0; k < count; k++) { const v = s.queue[k]; lw[s.dist[v]] += weight[v]; }
  let before = 0, best = -1, bestCost = Infinity;
  for (let l = 0; l < nLevels; l++) {
    const after = total - before - lw[l];
    if (l > 0 && after > 0) {
      const cost = (lw[l] * total * total) / (before * after);
      if (cost < bestCost) { bestCost = cost; best = l; }
    }
    before += lw[l];
  }
  return [best, bestCost];
}

/**
 * Splits the part; returns false when no separator with two non-empty sides exists (a clique or
 * a path of two): the caller then orders the part as a leaf.
 */
export function vertexSeparator(
  verts: Int32Array, ptr: Int32Array, idx: Int32Array, weight: Int32Array,
  part: Int32Array, id: number, side: Uint8Array, s: SeparatorScratch,
): boolean {
  const count = verts.length;
  let total = 0;
  let root = verts[0], minDeg = Infinity;
  for (let k = 0; k < count; k++) {
    const v = verts[k];
    total += weight[v];
    const d = degreeIn(v, ptr, idx, part, id);
    if (d < minDeg) { minDeg = d; root = v; }
  }
  for (let k = 0; k < count; k++) s.queue[k] = verts[k];
  // ---- pseudo-peripheral vertex (George & Liu 1981) ----
  let depth = levels(root, ptr, idx, part, id, s, count);
  for (let iter = 0; iter < PSEUDO_PERIPHERAL_RESTARTS; iter++) {
    let next = -1, nd = Infinity;
    for (let k = count - 1; k >= 0; k--) {
      const v = s.queue[k];
      if (s.dist[v] !== depth - 1) break;
      const d = degreeIn(v, ptr, idx, part, id);
      if (d < nd) { nd = d; next = v; }
    }
    const d2 = levels(next, ptr, idx, part, id, s, count);
    if (d2 <= depth) { levels(root, ptr, idx, part, id, s, count); break; }
    root = next; depth = d2;
  }
  if (depth < 3) return false;
  // ---- levels from both ends of the pseudo-diameter; keep the better cut ----
  const [l1, c1] = bestLevel(depth, weight, s, count, total);
  const far = s.queue[count - 1];
  const distFromRoot = new Int32Array(count);
  for (let k = 0; k < count; k++) distFromRoot[k] = s.dist[verts[k]];
  const depth2 = levels(far, ptr, idx, part, id, s, count);
  const [l2, c2] = bestLevel(depth2, weight, s, count, total);
  if (c1 <= c2) {
    for (let k = 0; k < count; k++) { const d = distFromRoot[k]; side[verts[k]] = d < l1 ? 0 : d === l1 ? 2 : 1; }
  } else {
    for (let k = 0; k < count; k++) { const v = verts[k], d = s.dist[v]; side[v] = d < l2 ? 0 : d === l2 ? 2 : 1; }
  }
  for (let k = 0; k < count; k++) s.dist[verts[k]] = -1;
  refineSeparator(verts, ptr, idx, weight, part, id, side, s);
  let wa = 0, wb = 0;
  for (let k = 0; k < count; k++) { const v = verts[k]; if (side[v] === 0) wa += weight[v]; else if (side[v] === 1) wb += weight[v]; }
  return wa > 0 && wb > 0;
}

/** Greedy FM-style passes over the separator (see the file comment). */
function refineSeparator(
  verts: Int32Array, ptr: Int32Array, idx: Int32Array, weight: Int32Array,
  part: Int32Array, id: number, side: Uint8Array, s: SeparatorScratch,
): void {
  const locked = s.locked;
  const w = [0, 0, 0];
  const sep: number[] = [];
  for (let k = 0; k < verts.length; k++) { const v = verts[k]; w[side[v]] += weight[v]; if (side[v] === 2) sep.push(v); }
  for (let pass = 0; pass < MAX_PASSES; pass++) {
    let moved = false;
    const stamp = ++s.pass;
    for (let t = 0; t < sep.length; t++) {
      const v = sep[t];
      if (side[v] !== 2 || locked[v] === stamp) continue;
      let toA = 0, toB = 0; // weight of neighbours in A and in B
      for (let q = ptr[v]; q < ptr[v + 1]; q++) {
        const u = idx[q];
        if (part[u] !== id) continue;
        if (side[u] === 0) toA += weight[u]; else if (side[u] === 1) toB += weight[u];
      }
      const wv = weight[v];
      // Into A: N(v) ∩ B joins the separator. Into B: N(v) ∩ A joins it.
      const gainA = wv - toB, gainB = wv - toA;
      const okA = Math.min(w[0] + wv, w[1] - toB) >= MIN_SHARE * (w[0] + w[1] + wv - toB);
      const okB = Math.min(w[1] + wv, w[0] - toA) >= MIN_SHARE * (w[0] + w[1] + wv - toA);
      const balA = w[0] < w[1], balB = w[1] < w[0]; // the move feeds the lighter side
      let target = -1;
      if (okA && (gainA > 0 || (gainA === 0 && balA)) && (gainA > gainB || !okB || (gainA === gainB && balA))) target = 0;
      else if (okB && (gainB > 0 || (gainB === 0 && balB))) target = 1;
      if (target < 0) continue;
      const other = 1 - target;
      side[v] = target;
      locked[v] = stamp;
      w[2] -= wv; w[target] += wv;
      for (let q = ptr[v]; q < ptr[v + 1]; q++) {
        const u = idx[q];
        if (part[u] === id && side[u] === other) { side[u] = 2; locked[u] = stamp; w[other] -= weight[u]; w[2] += weight[u]; sep.push(u); }
      }
      moved = true;
    }
    if (!moved) break;
  }
}
