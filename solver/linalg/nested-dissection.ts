/**
 * Nested-dissection ordering of a weighted graph (A. George, "Nested dissection of a regular
 * finite element mesh", SIAM J. Numer. Anal. 10(2), 1973; George & Liu 1981, ch. 8): split the
 * graph by a small vertex separator (vertex-separator.ts), order both sides first, recursively,
 * and the separator last. Disconnected parts are ordered one after the other without a
 * separator. Parts of at most LEAF_VERTICES vertices are ordered by approximate minimum degree
 * (amd.ts) on their own subgraph, as nested-dissection codes commonly do for the small pieces.
 *
 * Input: adjacency ptr/idx (both directions, no self loops), vertex weights (DOFs per vertex).
 * Output: perm, perm[k] = vertex eliminated k-th. Allocates; runs once per sparsity pattern.
 */
import { approximateMinimumDegree } from './amd.ts';
import { createSeparatorScratch, vertexSeparator } from './vertex-separator.ts';

/** Parts this small (vertices) are ordered by AMD instead of being split further. */
export const LEAF_VERTICES = 96;

interface Part { verts: Int32Array; lo: number; id: number }

export function nestedDissection(m: number, ptr: Int32Array, idx: Int32Array, weight: Int32Array): Int32Array {
  const perm = new Int32Array(m);
  const part = new Int32Array(m); // id of the part a vertex is in; -1 once placed
  const side = new Uint8Array(m);
  const local = new Int32Array(m).fill(-1);
  const scratch = createSeparatorScratch(m);
  let nextId = 1;
  const stack: Part[] = [{ verts: Int32Array.from({ length: m }, (_, i) => i), lo: 0, id: 0 }];
  const place = (verts: Int32Array, at: number): void => {
    const id = nextId++;
    for (let k = 0; k < verts.length; k++) part[verts[k]] = id;
    stack.push({ verts, lo: at, id });
  };
  while (stack.length > 0) {
    const p = stack.pop()!;
    const { verts, lo, id } = p;
    if (verts.length <= LEAF_VERTICES) { orderLeaf(p, ptr, idx, weight, part, local, perm); continue; }
    const comps = components(verts, ptr, idx, part, id, scratch.queue, local);
    if (comps.length > 1) {
      let at = lo;
      for (const c of comps) { place(c, at); at += c.length; }
      continue;
    }
    if (!vertexSeparator(verts, ptr, idx, weight, part, id, side, scratch)) { orderLeaf(p, ptr, idx, weight, part, local, perm); continue; }
    let na = 0, nb = 0;
    for (let k = 0; k < verts.length; k++) { const s = side[verts[k]]; if (s === 0) na++; else if (s === 1) nb++; }
    const a = new Int32Array(na), b = new Int32Array(nb);
    let ia = 0, ib = 0, is = lo + na + nb;
    for (let k = 0; k < verts.length; k++) {
      const v = verts[k], s = side[v];
      if (s === 0) a[ia++] = v;
      else if (s === 1) b[ib++] = v;
      else { perm[is++] = v; part[v] = -1; }
    }
    place(a, lo);
    place(b, lo + na);
  }
  return perm;
}

/** Connected components of the part (vertex lists); local is scratch, left at -1. */
function components(
  verts: Int32Array, ptr: Int32Array, idx: Int32Array, part: Int32Array, id: number, queue: Int32Array, seen: Int32Array,
): Int32Array[] {
  const out: Int32Array[] = [];
  let done = 0;
  for (let k = 0; k < verts.length && done < verts.length; k++) {
    const r = verts[k];
    if (seen[r] >= 0) continue;
    let head = 0, tail = 0;
    queue[tail++] = r; seen[r] = 1;
    while (head < tail) {
      const v = queue[head++];
      for (let q = ptr[v]; q < ptr[v + 1]; q++) {
        const u = idx[q];
        if (part[u] === id && seen[u] < 0) { seen[u] = 1; queue[tail++] = u; }
      }
    }
    out.push(queue.slice(0, tail));
    done += tail;
  }
  for (let k = 0; k < verts.length; k++) seen[verts[k]] = -1;
  return out;
}

/** AMD on the subgraph induced by the part; writes perm[lo ..]. */
function orderLeaf(
  p: Part, ptr: Int32Array, idx: Int32Array, weight: Int32Array, part: Int32Array, local: Int32Array, perm: Int32Array,
): void {
  const { verts, lo, id } = p;
  const c = verts.length;
  for (let k = 0; k < c; k++) local[verts[k]] = k;
  const lptr = new Int32Array(c + 1);
  let len = 0;
  for (let k = 0; k < c; k++) { const v = verts[k]; len += ptr[v + 1] - ptr[v]; }
  const lidx = new Int32Array(len);
  const w = new Int32Array(c);
  len = 0;
  for (let k = 0; k < c; k++) {
    const v = verts[k];
    w[k] = weight[v];
    for (let q = ptr[v]; q < ptr[v + 1]; q++) { const u = idx[q]; if (part[u] === id) lidx[len++] = local[u]; }
    lptr[k + 1] = len;
  }
  const lp = approximateMinimumDegree(c, lptr, lidx.subarray(0, len), w);
  for (let k = 0; k < c; k++) { perm[lo + k] = verts[lp[k]]; part[verts[lp[k]]] = -1; }
  for (let k = 0; k < c; k++) local[verts[k]] = -1;
}
