/**
 * Approximate minimum degree ordering on a (possibly weighted) undirected graph, written from the
 * algorithm description of P. R. Amestoy, T. A. Davis and I. S. Duff, "An approximate minimum
 * degree ordering algorithm", SIAM J. Matrix Anal. Appl. 17(4), 1996, pp. 886–905:
 *  - quotient graph: each uneliminated variable i keeps A_i (variable neighbours) and E_i
 *    (adjacent elements); each element e keeps L_e (its variables);
 *  - element absorption when a pivot is eliminated, and aggressive absorption of any element e
 *    with |L_e \ L_p| = 0;
 *  - approximate external degree  d_i = min( n_left − |i|,  d_i_old + |L_p \ i|,
 *    |A_i \ i| + |L_p \ i| + Σ_{e ∈ E_i \ p} |L_e \ L_p| ), with |L_e \ L_p| counted for all e
 *    in one pass over the variables of L_p (the paper's eq. (4) and Algorithm 2);
 *  - indistinguishable variables found by hashing (A_i, E_i) and merged into supervariables;
 *  - mass elimination of variables adjacent to the pivot element only.
 * Dense-row handling is not implemented (structural models do not have dense rows).
 *
 * Input: adjacency of the graph without self loops (ptr/idx, both directions), vertex weights
 * (e.g. DOFs per node; weight 1 = plain AMD). Output: perm, perm[k] = vertex eliminated k-th.
 * The ordering phase allocates freely; it runs once per sparsity pattern.
 */

const VARIABLE = 0;
const ELEMENT = 1;
const DEAD = 2;

export function approximateMinimumDegree(
  n: number, ptr: Int32Array, idx: Int32Array, weight?: Int32Array,
): Int32Array {
  const nv = weight ? Int32Array.from(weight) : new Int32Array(n).fill(1);
  let total = 0;
  for (let i = 0; i < n; i++) total += nv[i];
  const status = new Uint8Array(n);
  const A: number[][] = new Array(n);
  const E: number[][] = new Array(n);
  const Lel: number[][] = new Array(n);
  const Lsize = new Int32Array(n);
  const deg = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    const a: number[] = [];
    let d = 0;
    for (let q = ptr[i]; q < ptr[i + 1]; q++) {
      const j = idx[q];
      if (j !== i) { a.push(j); d += nv[j]; }
    }
    A[i] = a; E[i] = []; Lel[i] = [];
    deg[i] = d;
  }
  // Degree buckets: doubly linked lists, head[d].
  const head = new Int32Array(total + 1).fill(-1);
  const next = new Int32Array(n).fill(-1);
  const prev = new Int32Array(n).fill(-1);
  const insert = (i: number, d: number): void => {
    deg[i] = d;
    const h = head[d];
    next[i] = h; prev[i] = -1;
    if (h !== -1) prev[h] = i;
    head[d] = i;
  };
  const remove = (i: number): void => {
    const a = prev[i], b = next[i];
    if (a !== -1) next[a] = b; else head[deg[i]] = b;
    if (b !== -1) prev[b] = a;
  };
  for (let i = 0; i < n; i++) insert(i, deg[i]);
  // Member lists of supervariables (for the output order).
  const mHead = new Int32Array(n), mTail = new Int32Array(n), mNext = new Int32Array(n).fill(-1);
  for (let i = 0; i < n; i++) { mHead[i] = i; mTail[i] = i; }
  const perm = new Int32Array(n);
  let out = 0;
  const emit = (i: number): void => { for (let v = mHead[i]; v !== -1; v = mNext[v]) perm[out++] = v; };

  const mark = new Int32Array(n);
  const extTag = new Int32Array(n);
  const ext = new Int32Array(n);
  const cmp = new Int32Array(n);
  const hash = new Float64Array(n);
  let tag = 0;
  let nleft = total;
  let mindeg = 0;

  while (nleft > 0) {
    while (head[mindeg] === -1) mindeg++;
    const p = head[mindeg];
    remove(p);
    status[p] = ELEMENT;
    // ---- form L_p = (A_p ∪ ⋃_{e∈E_p} L_e) \ {p}; absorb the elements of E_p ----
    tag++;
    mark[p] = tag;
    const Lp: number[] = [];
    for (const j of A[p]) {
      if (status[j] === VARIABLE && mark[j] !== tag) { mark[j] = tag; Lp.push(j); }
    }
    for (const e of E[p]) {
      if (status[e] !== ELEMENT) continue;
      for (const j of Lel[e]) {
        if (status[j] === VARIABLE && mark[j] !== tag) { mark[j] = tag; Lp.push(j); }
      }
      status[e] = DEAD;
      Lel[e] = [];
    }
    A[p] = []; E[p] = [];
    emit(p);
    nleft -= nv[p];
    for (const i of Lp) remove(i);
    // ---- |L_e \ L_p| for every element adjacent to L_p ----
    for (const i of Lp) {
      const w = nv[i];
      for (const e of E[i]) {
        if (status[e] !== ELEMENT) continue;
        if (extTag[e] !== tag) { extTag[e] = tag; ext[e] = Lsize[e]; }
        ext[e] -= w;
      }
    }
    // ---- prune A_i and E_i, partial degrees, mass elimination ----
    const keep: number[] = [];
    for (const i of Lp) {
      // Compact E_i and A_i in place (fewer short-lived arrays), then add p to E_i.
      const Ei = E[i];
      let d = 0;
      let h = p;
      let ne = 0;
      for (let t = 0; t < Ei.length; t++) {
        const e = Ei[t];
        if (status[e] !== ELEMENT) continue;
        const de = ext[e];
        if (de > 0) { d += de; Ei[ne++] = e; h += e; } else { status[e] = DEAD; Lel[e] = []; }
      }
      Ei.length = ne;
      Ei.push(p);
      const Ai = A[i];
      let na = 0;
      for (let t = 0; t < Ai.length; t++) {
        const j = Ai[t];
        if (status[j] === VARIABLE && mark[j] !== tag) { Ai[na++] = j; d += nv[j]; h += j; }
      }
      Ai.length = na;
      if (d === 0) {
        // Mass elimination: i is adjacent to element p only, eliminate it together with p.
        emit(i);
        nleft -= nv[i];
        nv[i] = 0;
        status[i] = DEAD;
        A[i] = []; E[i] = [];
        continue;
      }
      ext[i] = d; // partial degree (outside L_p), kept in ext[] of the variable slot
      hash[i] = h % 1000003;
      keep.push(i);
    }
    // ---- supervariable detection: equal hash, then equal (A_i, E_i) ----
    keep.sort((a, b) => hash[a] - hash[b] || a - b);
    for (let s = 0; s < keep.length; s++) {
      const i = keep[s];
      if (status[i] !== VARIABLE) continue;
      let marked = false;
      for (let t = s + 1; t < keep.length && hash[keep[t]] === hash[i]; t++) {
        const j = keep[t];
        if (status[j] !== VARIABLE) continue;
        if (A[j].length !== A[i].length || E[j].length !== E[i].length) continue;
        if (!marked) {
          tag++;
          for (const v of A[i]) cmp[v] = tag;
          for (const v of E[i]) cmp[v] = tag;
          marked = true;
        }
        let same = true;
        for (const v of A[j]) if (cmp[v] !== tag) { same = false; break; }
        if (same) for (const v of E[j]) if (cmp[v] !== tag) { same = false; break; }
        if (!same) continue;
        nv[i] += nv[j];
        nv[j] = 0;
        status[j] = DEAD;
        A[j] = []; E[j] = [];
        mNext[mTail[i]] = mHead[j];
        mTail[i] = mTail[j];
        deg[i] = Math.min(deg[i], deg[j]);
      }
    }
    // ---- final approximate degrees, element p ----
    const Lfinal: number[] = [];
    let lpw = 0;
    for (const i of keep) if (status[i] === VARIABLE) { Lfinal.push(i); lpw += nv[i]; }
    Lel[p] = Lfinal;
    Lsize[p] = lpw;
    for (const i of Lfinal) {
      const w = nv[i];
      let d = Math.min(deg[i], ext[i]) + lpw - w;
      d = Math.min(d, nleft - w);
      if (d < 0) d = 0;
      insert(i, d);
      if (d < mindeg) mindeg = d;
    }
  }
  return perm;
}
